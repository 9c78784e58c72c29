# -*- coding: utf-8 -*-
"""Hand-written page-type families, part B (university, shop help, forum,
legacy club site, personal notes). Same notation as content_a."""

from content_a import P, H, UL, OL, T, S

FAMILIES = {}

# ---------------------------------------------------------------- hollowmere university
FAMILIES["hm_seminar"] = dict(
    site="hollowmere", section="seminars",
    vary=["date1", "time1", "room", "person2", "n_mid"],
    pools=dict(
        speaker=["Dr Ines Castellane", "Professor Kofi Oyelaran", "Dr Saoirse Halloran", "Dr Teodor Moravec", "Professor Anouk Lindqvist", "Dr Idris Marchbank",
                 "Dr Fenna Strand", "Professor Bram Kellaway"],
        inst=["the University of Saltmarsh", "Coldstream Institute of Technology", "the Brayford Marine Laboratory", "Kingsmead College", "the Northfell Observatory"],
        topic=["sediment transport in tidal estuaries", "early warning signs of slope failure", "the chemistry of ancient lake beds", "groundwater recharge under farmland",
               "volcanic ash and aviation", "glacial meltwater and sea level", "microplastics in river gravels", "peat bogs as carbon stores"],
        room=["Lecture Theatre B", "the Harland Room", "Seminar Room 2.14", "the Garrow Building foyer", "Room G.07"],
        method=["field measurements collected over {n_small} winters", "laboratory flume experiments", "satellite radar images", "cores drilled from {n_mid} sites",
                "a numerical model of the catchment", "interviews with farmers and water managers"],
        finding=["small changes in flow can move large volumes of sand", "warning signs appear weeks before a collapse", "the lake was far saltier than expected",
                 "recharge is much slower than models assume", "fine ash travels further than coarse particles", "plastics gather where the current slows"],
    ),
    title=["Seminar: {topic} || Departmental seminar - {speaker} on {topic} || {speaker}: {topic}"],
    sections=[
        S(P("{speaker} from {inst} will give this week's departmental seminar on {topic}. || This week {speaker} of {inst} joins us to talk about {topic}. || "
            "Our seminar speaker is {speaker} from {inst}, who will discuss {topic}.",
            "The talk is in {room} on {date1} at {time1}. || Join us in {room} at {time1} on {date1}. || It starts at {time1} on {date1} in {room}."), opt=False),
        S(H("Abstract"),
          P("The talk draws on {method} to ask how {topic} should be studied. || Using {method}, the speaker shows that {finding}. || "
            "Recent work based on {method} suggests that {finding}.",
            "The results matter for anyone planning long term monitoring. || This has practical consequences for planners and engineers. || "
            "The talk ends with open questions for the next decade of work.")),
        S(H("About the speaker"),
          P("{speaker} leads a research group of {n_small} people and has worked on {topic} for {n_mid} years. || Before joining {inst}, {speaker} spent {n_small} years in industry. || "
            "{speaker} is known for fieldwork in remote places and for clear public talks.")),
        S(P("Tea and coffee will be served after the talk. || Refreshments follow in the common room. || The talk will be followed by drinks in the foyer.",
            "The seminar is hosted by {person2}. || Questions about the series can be sent to {person2}. || The series is organised by {person2}."), opt=False),
    ],
)

FAMILIES["hm_studentship"] = dict(
    site="hollowmere", section="study",
    vary=["date1", "date2", "money", "n_small", "person", "person2"],
    pools=dict(
        project=["Tracking sand on a changing coast", "Landslides and rainfall in upland valleys", "Water quality in former mining catchments", "Soil carbon under new woodland",
                 "Earthquake records in lake sediments", "Flood risk in small market towns"],
        funder=["the Northern Earth Research Partnership", "the Hollowmere Graduate School", "the Saltmarsh Water Trust", "an industrial sponsor"],
        skill=["fieldwork in all weathers", "programming in Python or R", "a full driving licence", "basic laboratory chemistry", "map and GIS work",
               "clear scientific writing", "statistics"],
        degree=["geology", "physical geography", "environmental science", "civil engineering", "chemistry", "physics or mathematics"],
    ),
    title=["PhD studentship: {project} || Funded PhD - {project} || {project} (PhD opportunity)"],
    sections=[
        S(P("Applications are invited for a fully funded PhD studentship on the project {project}, supported by {funder}. || "
            "We are looking for a PhD student to join the project {project}, funded by {funder}. || {funder} is funding a new PhD project, {project}.",
            "The closing date is {date1}. || Apply by {date1}. || The deadline for applications is {date1}."), opt=False),
        S(H("The project"),
          P("The student will spend about {n_small} months of each year in the field and the rest in the department. || "
            "Most of the data will be collected during {n_small} field seasons. || The project combines field surveys with work in the laboratory.",
            "They will be supervised by {person} and {person2}. || Supervision will be shared between {person} and {person2}. || {person} is the lead supervisor.")),
        S(H("Funding"),
          P("The award covers fees and pays a stipend of {money} a year for {n_small2} years. || A stipend of {money} per year is provided, along with fees. || "
            "Fees and a stipend of {money} per year are included.")),
        S(H("Who should apply || Requirements"),
          P("Applicants should hold a good degree in {degree} or a related subject. || We welcome applicants with a background in {degree}."),
          UL(["{skill_r}"], k=(2, 4))),
        S(H("How to apply"),
          OL(["Send a CV and a cover letter to {person}.", "Give the names of two referees.", "Say which field seasons you could attend.",
              "Interviews will take place on {date2}.", "Include a short piece of your own writing."], k=(2, 4))),
    ],
)

# ---------------------------------------------------------------- bracken shop help
FAMILIES["bk_returns"] = dict(
    site="bracken", section="returns",
    vary=["n_small", "n_mid", "price", "courier", "days"],
    pools=dict(
        cat=["garden furniture", "kitchen appliances", "bedding and towels", "lighting", "rugs", "children's toys", "outdoor clothing", "paint and decorating"],
        days=["14", "28", "30", "60", "90"],
        courier=["Parcelwick", "Swiftlane Couriers", "Hedgerow Freight", "the Bracken van"],
        cond=["unused and in the original packaging", "with all parts and instructions", "free from stains or damage", "with the swing tag attached",
              "clean and dry", "in a condition we can sell again"],
        excl=["made-to-measure items", "items that have been assembled", "opened bedding for hygiene reasons", "mixed paint", "clearance items marked as final sale",
              "personalised products"],
    ),
    title=["Returning {cat} || How to return {cat} || Returns policy for {cat}"],
    sections=[
        S(P("You can return {cat} within {days} days of delivery for a full refund. || If you change your mind, {cat} can be sent back within {days} days. || "
            "We accept returns of {cat} up to {days} days after they arrive.",
            "Items must be {cond}. || Please make sure the item is {cond}. || We can only refund items that are {cond}."), opt=False),
        S(H("Items we cannot take back || Exceptions"),
          UL(["{excl_r}"], k=(2, 4))),
        S(H("Booking a collection || Sending it back"),
          P("Large items are collected by {courier}; we will email you a collection date within {n_small} working days. || "
            "For bulky items, {courier} will contact you to arrange a collection. || Small items can be dropped at any Parcelwick point; larger ones are collected by {courier}.",
            "Collection costs {price}, which is taken from your refund. || There is a collection charge of {price}. || Collection is free if the item is faulty.")),
        S(H("Refund times || When you get your money"),
          T("Payment method|Refund time", ["{pay_r}|{n_small_r} working days"], k=(2, 4))),
        S(P("Still need help? Start a chat with the customer team, or call {phone}. || If your question is not answered here, call {phone}. || "
            "Our team can help on {phone} from {time1} to {time2}."), opt=False),
    ],
)

FAMILIES["bk_payment"] = dict(
    site="bracken", section="payments",
    vary=["n_small", "n_mid", "price", "time1", "time2"],
    pools=dict(
        problem=["my card was declined", "I was charged twice", "my voucher code does not work", "the payment page keeps reloading", "my gift card balance is wrong",
                 "I cannot pay with my instalment plan", "the checkout says my address is invalid"],
        cause=["the billing address does not match the one your bank holds", "the bank asked for extra security checks", "the voucher has expired or has a minimum spend",
               "a browser extension is blocking the payment window", "an earlier attempt is still being held by the bank", "the basket contains an item excluded from the offer"],
        fix=["Check that the billing address matches your bank statement", "Try a different browser or turn off extensions", "Wait {n_mid} minutes and try again",
             "Remove excluded items from the basket", "Contact your bank to approve the payment", "Clear your cookies and sign in again", "Use another card"],
    ),
    title=["Help: {problem} || What to do if {problem} || Why {problem}"],
    sections=[
        S(P("When a customer tells us \"{problem}\", the most common reason is that {cause}. || If you are writing to say \"{problem}\", it is usually because {cause}. || Customers who tell us \"{problem}\" often find that {cause}.",
            "No order is placed until payment goes through. || You will not be charged for an order that failed. || Any failed attempt is released by your bank."), opt=False),
        S(H("Things to try || Quick fixes"),
          OL(["{fix_r}."], k=(3, 5))),
        S(H("Pending payments || Held money"),
          P("A pending payment can stay on your statement for up to {n_small} days before it disappears. || Banks can hold the money for up to {n_small} days. || "
            "If you see two charges, one is usually a hold that drops off within {n_small} days.")),
        S(H("Payment methods we accept"),
          T("Method|Minimum order|Notes", ["{pay_r}|{price_r}|{note_r}"], k=(2, 4))),
        S(P("If none of this helps, contact us with your order number and the time you tried to pay. || Still stuck? Chat to us between {time1} and {time2}. || "
            "Our payments team answers messages within {n_small} hours."), opt=False),
    ],
)

# ---------------------------------------------------------------- tinkerers forum (body = question + accepted answer)
FAMILIES["tk_printer"] = dict(
    site="tinkerers", section="3d-printing",
    vary=["n_small", "n_mid", "temp", "speed", "fil"],
    pools=dict(
        printer=["Corvid Mk3", "Lumen P1", "Forgebox S2", "Quillmaker 220", "Brambleprint Mini"],
        fil=["PLA", "PETG", "ABS", "TPU", "nylon"],
        symptom=["the first layer will not stick", "there are gaps in the walls", "the prints have stringing between parts", "the top layers have holes",
                 "the corners lift after an hour", "the nozzle clogs halfway through"],
        tried=["levelled the bed three times", "cleaned the plate with alcohol", "raised the nozzle temperature", "swapped to a new spool",
               "slowed the first layer down", "replaced the nozzle"],
        answer=["the Z offset is too high", "the extruder is under-extruding", "the retraction distance is too short", "there are not enough top layers",
                "the room is too cold for that filament", "the filament has absorbed moisture"],
    ),
    title=["{printer}: {symptom} with {fil} || {symptom} on {printer} using {fil} || {printer} problem: {symptom}"],
    sections=[
        S(P("I have a {printer} and with {fil} {symptom}. || Since last week {symptom} on my {printer} when printing {fil}. || Printing {fil} on a {printer}, {symptom}.",
            "I have already {tried} and {tried2}. || So far I have {tried} and also {tried2}. || I {tried}, then {tried2}, with no change."),
          P("Settings: nozzle {temp} degrees, bed {n_mid} degrees, speed {speed} mm/s. || I print at {temp} degrees with the bed at {n_mid} and a speed of {speed} mm/s. || "
            "Current profile is {temp} on the nozzle, {n_mid} on the bed, {speed} mm/s."), opt=False),
        S(P("From your description, {answer}. || This sounds like {answer}. || Almost certainly {answer}.",
            "Start by printing a single layer test square and watch it closely. || Print a calibration cube and look at the walls. || Print a small test piece before changing anything else."), opt=False),
        S(OL(["Lower the nozzle by 0.05 mm and print again. || Adjust the Z offset in small steps of 0.05 mm.", "Dry the {fil} at {n_mid} degrees for {n_small} hours.",
              "Increase retraction by 1 mm at a time.", "Add {n_small} more top layers in the slicer.", "Close the enclosure or move the printer away from draughts.",
              "Check the extruder gear for ground filament.", "Recalibrate the e-steps."], k=(3, 5))),
        S(P("With {fil} in particular, a speed of {speed} mm/s is on the high side for a {printer}. || The {printer} firmware is also known to reset the offset after an update. || "
            "After this my prints came out clean, so it is worth checking before buying parts.")),
    ],
)

FAMILIES["tk_electronics"] = dict(
    site="tinkerers", section="electronics",
    vary=["n_small", "n_mid", "volt", "part2"],
    pools=dict(
        board=["Pebble32 board", "Wrenduino Nano", "Kestrel M4 board", "Tinkerpad Mini", "Glowworm S3 module"],
        part=["a DS18-style temperature sensor", "an I2C OLED display", "a small servo", "a relay module", "a strip of addressable LEDs", "a rotary encoder"],
        part2=["a buck converter", "a level shifter", "a capacitor bank", "a USB power bank", "a second sensor"],
        symptom=["the board resets at random", "the readings jump about", "the display stays blank", "the servo jitters when idle", "the LEDs flicker at the far end", "the encoder skips steps"],
        answer=["the supply sags when the load switches on", "the pull-up resistors are missing", "the signal wire is too long and picks up noise",
                "the grounds of the two supplies are not connected", "the logic levels do not match", "the contacts bounce and need debouncing"],
    ),
    title=["{board} with {part}: {symptom} || {symptom} - {board} and {part} || Help: {symptom} ({board})"],
    sections=[
        S(P("I am driving {part} from a {board} and {symptom}. || My {board} is connected to {part}, and {symptom}. || Project uses {part} on a {board}; {symptom}.",
            "Power comes from {part2} at {volt} volts. || The supply is {part2} set to {volt} V. || Everything runs from {part2} giving {volt} volts."), opt=False),
        S(P("The code is the example sketch with a {n_mid} ms delay in the loop. || I have not changed the example code apart from a {n_mid} ms delay. || "
            "It happens within {n_small} minutes of switching on.")),
        S(P("The usual cause is that {answer}. || I think {answer}. || In my experience {answer}.",
            "Put a scope or a meter on the supply while it runs. || Measure the voltage at the board while the fault happens. || Check it with a meter first."), opt=False),
        S(UL(["Add a 470 uF capacitor across the supply near the load.", "Fit 4.7k pull-up resistors on the data lines.", "Keep signal wires under {n_mid} cm or use twisted pair.",
              "Join the grounds of both supplies.", "Use a level shifter between 5 V and 3.3 V parts.", "Debounce the inputs in software.",
              "Power {part} separately from the board."], k=(3, 5))),
        S(P("Once I joined the grounds the {board} stopped resetting. || That fixed it for me on the same {board}. || After the change it ran for {n_small} days without a fault.")),
    ],
)

# ---------------------------------------------------------------- railclub (legacy)
FAMILIES["rc_excursion"] = dict(
    site="railclub", section="excursions",
    vary=["date1", "time1", "time2", "price", "person", "n_mid", "n_small"],
    pools=dict(
        dest=["the Wendle Valley Railway", "Brayford engine sheds", "the Saltmarsh narrow gauge line", "the Coldstream signal box museum", "Fennick Junction", "the Northfell tramway"],
        loco=["tank engine No. 4", "the Sentinel shunter", "locomotive Ashdown Castle", "the diesel railcar", "engine number 7 Kittiwake"],
        meet=["the station forecourt", "the Old Quay car park", "platform two", "the Fleece Inn", "the club room"],
        see=["the restored booking office", "a ride on the footplate for members who book ahead", "the carriage works", "the signal box in use", "the museum archive",
             "a demonstration of single line token working"],
    ),
    title=["Excursion to {dest} || Club outing: {dest} || Members' trip to {dest}"],
    sections=[
        S(P("The club is running an excursion to {dest} on {date1}. || On {date1} members are invited on a trip to {dest}. || Our next outing is to {dest}, on {date1}.",
            "We meet at {meet} at {time1}. || Please be at {meet} by {time1}. || The coach leaves {meet} at {time1} sharp."), opt=False),
        S(P("The day includes {see} and a chance to see {loco} in steam. || Highlights are {see}, and {loco} should be running. || "
            "We hope to see {loco}, and the hosts have promised {see}."),
          UL(["{see_r}"], k=(2, 4))),
        S(T("Item|Cost", ["{cost_r}|{price_r}"], k=(2, 3))),
        S(P("Return is expected at about {time2}. || We aim to be back by {time2}. || The coach should be home around {time2}.",
            "Names to {person} by {date2}, please. || Book with {person} before {date2}. || Bookings close on {date2}; contact {person}."), opt=False),
    ],
)

FAMILIES["rc_minutes"] = dict(
    site="railclub", section="minutes",
    vary=["date1", "n_small", "n_mid", "money", "person", "person2", "person3"],
    pools=dict(
        meeting=["committee meeting", "annual general meeting", "special general meeting", "working party meeting"],
        venue=["the club room", "the Fleece Inn back room", "the Wendle Valley station buffet", "the Methodist hall"],
        item=["The layout needs new baseboards before the exhibition", "The library has received a donation of {n_mid} magazines", "The website will be moved to a new host",
              "Subscriptions will rise by one pound next year", "The Christmas social will be held in the club room", "A new key holder is needed for Tuesdays",
              "The exhibition raised {money} for club funds", "The coal stage model is nearly finished"],
    ),
    title=["Minutes of the {meeting}, {date1} || {meeting} - minutes || Minutes: {meeting} held on {date1}"],
    sections=[
        S(P("Minutes of the {meeting} held at {venue} on {date1}. || The {meeting} took place at {venue} on {date1}. || Held on {date1} at {venue}.",
            "Present: {person}, {person2}, {person3} and {n_small} other members. || {n_small} members attended, with {person} in the chair. || "
            "Chair: {person}. Secretary: {person2}."), opt=False),
        S(H("Matters arising || Business"),
          OL(["{item_r}."], k=(3, 5))),
        S(H("Treasurer's report"),
          P("The treasurer reported a balance of {money}. || Funds stand at {money}. || {person3} said the accounts show {money} in hand."),
          T("Account|Balance", ["{acct_r}|{money_r}"], k=(2, 3))),
        S(P("The meeting closed at {time2}. Next meeting {date2}. || Next meeting on {date2}; closed at {time2}. || There being no other business the meeting closed at {time2}."), opt=False),
    ],
)

# ---------------------------------------------------------------- mirelle notes (light blog)
FAMILIES["mn_garden"] = dict(
    site="mirelle", section="garden",
    vary=["date1", "n_small", "n_mid", "plant2", "weather"],
    pools=dict(
        plant=["broad beans", "runner beans", "garlic", "sweet peas", "rhubarb", "blackcurrants", "leeks", "squash"],
        plant2=["marigolds", "comfrey", "nasturtiums", "borage", "chard", "lettuce"],
        weather=["a wet week", "the first frost", "a dry spell", "a windy weekend", "a warm spell"],
        job=["mulched the beds with leaf mould", "put up netting against pigeons", "tied in the new growth", "sowed a second row", "lifted and divided the old crowns",
             "watered every evening", "cut back the dead stems"],
        lesson=["sowing little and often works better than one big sowing", "the sheltered bed is a fortnight ahead of the open one",
                "slugs are worst after rain, not during it", "the cheap compost was a false economy", "labels fade faster than I think"],
    ),
    title=["Allotment notes: {plant} after {weather} || {plant}, week {n_small} || Notes from the plot: {plant}"],
    sections=[
        S(P("After {weather} the {plant} look better than I expected. || {weather} has been kind to the {plant}. || I went up to the plot after {weather} to check the {plant}.",
            "This week I {job} and {job2}. || Jobs done: I {job}, and {job2}. || I {job} on Saturday and {job2} on Sunday."), opt=False),
        S(P("Next to them the {plant2} are doing well, which I put down to the shelter of the hedge. || The {plant2} I sowed in {month_prev} are only just showing. || "
            "The {plant2} have self-seeded everywhere again.")),
        S(H("What I learned || Lessons"),
          P("The main lesson this year is that {lesson}. || If there is one thing to remember, it is that {lesson}. || Again, {lesson}.")),
        S(UL(["{job_r}"], k=(2, 4))),
        S(P("Harvest so far: {n_mid} pounds, weighed on the kitchen scales. || So far I have picked about {n_mid} pounds. || No harvest yet, but {n_small} flowers have set.")),
    ],
)
