# -*- coding: utf-8 -*-
"""Hand-written extra optional sections, appended to the families of parts
A and B (inserted before each family's closing section) so that longer
articles can be built. Same notation as content_a."""

from content_a import P, H, UL, OL, T, S

EXTRA = {}

EXTRA["rv_roadworks"] = [
    S(H("Noise and dust || Living near the works"),
      P("Some of the work, such as breaking out the old surface, will be noisy, and {contractor} will try to finish the loudest jobs before midday. || "
        "The noisiest work, including cutting and breaking the road, is planned for the first {n_small} days. || "
        "Residents near {junc1} may notice noise and vibration while the old surface is removed.",
        "Crews will damp down the site to keep dust to a minimum. || Water will be sprayed on the site to stop dust blowing into gardens. || "
        "If dust becomes a problem, tell the site supervisor and it will be dealt with that day.",
        "No work will take place on Sundays or bank holidays. || Work will stop at {time2} and will not restart before {time1}. || "
        "Night work is not planned, but a small team may check the signs after dark.")),
    S(H("Businesses on {road} || Support for traders"),
      P("Shops and cafes on {road} remain open as usual throughout the closure. || Every business on {road} is open as normal, and signs will say so at each end of the road. || "
        "The council has written to the {n_mid} businesses on {road} to explain what the closure means for them.",
        "Traders can ask for a loading slot by calling {person} on {phone}. || {person} is the council's contact for businesses and can arrange loading times. || "
        "If your business relies on deliveries, speak to {person} before the work starts.")),
    S(H("Keeping you informed"),
      P("We will post updates on this page if the dates change, for example because of bad weather. || If rain or frost delays the work, the new dates will be published here. || "
        "Any change to the programme will be shown on the signs at {junc1} and on this page.",
        "You can also sign up for roadworks alerts for {ward} ward. || Email alerts for roadworks in {ward} are available from the council website. || "
        "Residents of {ward} can ask to be sent a text message when the dates change.")),
]
EXTRA["rv_bins"] = [
    S(H("Bank holiday weeks || Holiday arrangements"),
      P("In weeks with a bank holiday, collections run one day later than usual, so a {wd2} collection will take place on the following day. || "
        "Bank holidays push collections back by a day for the rest of that week. || During bank holiday weeks the crews work on Saturday to catch up.",
        "The calendar for {area} shows every changed date up to {month3}. || A printed calendar for {area} will be delivered with the next council newsletter. || "
        "You can download a calendar for your street from the bins page.")),
    S(H("Extra waste || Side waste"),
      P("Extra bags left beside the {bin} will not be taken, except in the week after Christmas. || Crews can only empty what fits in the {bin} with the lid closed. || "
        "If you often have more waste than fits, you can ask for a larger {bin} for a one-off charge of {price}.",
        "Large items can be booked for a bulky waste collection instead. || Furniture and appliances can go to the recycling centre at the {depot}. || "
        "Up to {n_small} bulky items can be collected for a single fee.")),
    S(H("Why we are changing rounds || About the new rounds"),
      P("The new rounds were planned so that lorries spend less time driving between streets and more time collecting. || "
        "Rounds have been redrawn using the addresses of {n_big} households so that each crew has a fair share of the work. || "
        "The change means the collection fleet will travel around {n_mid} fewer miles each week.",
        "This will cut fuel use and make collection times more reliable. || We expect fewer missed bins once crews are used to the new rounds. || "
        "Crews helped to plan the new rounds and have walked them in advance.")),
]
EXTRA["rv_consult"] = [
    S(H("Why we are consulting || The reasons behind the proposal"),
      P("The council has to balance the needs of people who live nearby with those of visitors, businesses and the wider borough. || "
        "Feedback from the last residents survey showed that {pct} per cent of people wanted change. || "
        "The proposal responds to concerns raised at the {ward} ward forum over the last {n_small} meetings.",
        "No decision has been made yet, and every response will be read. || Your views will help shape the final plan. || "
        "Responses from {group} and individual residents carry equal weight.")),
    S(H("Who we are asking || Who can respond"),
      P("Anyone who lives, works or studies in the borough can respond. || We want to hear from residents of {ward} in particular, but the consultation is open to everyone. || "
        "Responses are welcome from individuals, businesses and groups such as {group}.",
        "Young people can respond through their school council. || A short easy read version is available for people who find the full document hard to follow. || "
        "Groups responding on behalf of members should say how many people they represent.")),
    S(H("Questions we are asking || Your views"),
      UL(["Do you agree with the proposal as a whole?", "Which of the options do you prefer, and why?", "How often do you use the area affected?",
          "Would the change affect you or your family?", "Is there anything we have missed?", "How did you hear about this consultation?",
          "Would you like to be kept informed about the outcome?"], k=(3, 6))),
    S(H("Equality and access"),
      P("We have carried out an equality impact assessment, which is available on request. || An assessment of how the proposal affects different groups will be published with the report. || "
        "The assessment will be updated in light of what people tell us.",
        "Large print and other formats are available from {phone}. || The drop-in venues are all accessible to wheelchair users. || "
        "A hearing loop will be available at {venue}.")),
]
EXTRA["hd_council"] = [
    S(H("What happens now || Next steps"),
      P("Officers will now draw up a detailed timetable, which is expected to be published within {n_small} weeks. || The next step is a detailed business case, due in {month3}. || "
        "Contracts could be signed as early as {month3}, according to the report.",
        "Any councillor can ask for the decision to be reviewed within five working days. || The decision can be called in by the scrutiny panel before it takes effect. || "
        "Opponents have {n_small} days to lodge a formal objection.")),
    S(H("A long running row || The history"),
      P("This is not the first time the issue has divided the chamber, and a similar motion was defeated by {n_small} votes in {year_prev}. || "
        "The subject has come up at {n_small} meetings since {year_prev}, often to packed public galleries. || "
        "Letters to the Herald on the subject have outnumbered those on any other topic this year.",
        "At one point the meeting was adjourned for {n_small2} minutes after shouting from the gallery. || "
        "The chair reminded members of the public to stay quiet during the debate. || The debate was broadcast online and watched by {n_big} people.")),
    S(H("By the numbers"),
      T("Figure|Value", ["{stat_r}|{n_mid_r}"], k=(2, 4))),
    S(H("What readers told us || Your views"),
      P("When we asked readers on our website, {pct} per cent said they backed the decision. || A Herald poll found readers split almost evenly. || "
        "Readers who contacted the newsroom were mostly worried about the cost.",
        "{person3} wrote: \"I just want to know when it will be finished.\" || One reader, {person3}, said the town had waited long enough. || "
        "Several readers, including {person3}, asked why the decision was not put to a public vote.")),
]
EXTRA["hd_event"] = [
    S(H("Food and drink || Eating and drinking"),
      P("Around {n_mid} stalls will sell food and drink, from wood fired pizza to local cider. || The food court near {place2} will have {n_mid} traders, most of them from within ten miles. || "
        "Local cafes will stay open late, and the market hall will host a street food area.",
        "Visitors are asked to bring reusable cups, which can be refilled for free at water points. || Alcohol will not be sold after {time2}. || "
        "Picnics are welcome in the park area.")),
    S(H("Accessibility || Access for all"),
      P("A quiet area will be available for people who find crowds difficult. || There will be a changing places toilet near the main entrance. || "
        "Wheelchair users can borrow a free all-terrain chair if they book ahead.",
        "British Sign Language interpreters will be at the main stage in the afternoon. || Assistance dogs are welcome across the site. || "
        "Stewards in yellow tabards can help anyone who needs assistance.")),
    S(H("Volunteers wanted || Get involved"),
      P("The organisers still need {n_small} more volunteers to help with stewarding and litter picking. || Anyone who can spare a few hours on {date1} is asked to get in touch with {person2}. || "
        "Volunteers get a free t-shirt and a meal voucher.",
        "Shifts last about three hours. || No experience is needed, and training is given on the morning. || Volunteers must be over sixteen.")),
    S(H("Weather || If it rains"),
      P("The event will go ahead whatever the weather, although some outdoor performances may move indoors. || In heavy rain the children's activities move into the Corn Exchange. || "
        "The committee will post any changes on social media by {time1} on the day.")),
]
EXTRA["hd_business"] = [
    S(H("From the customers || What customers say"),
      P("Regular customer {person3} said: \"You get proper advice here, not just a sale.\" || Customers queued outside on the first morning, according to {person}. || "
        "Many customers have been coming since the shop first opened.",
        "Others said they would miss the old layout. || Some regulars worry that prices will rise. || One customer brought flowers to mark the news.")),
    S(H("Plans for the future || What comes next"),
      P("{person} said the plan is to add an online shop within {n_small} months. || The owners hope to open on Sundays from {month3}. || "
        "The next step will be a small workshop space at the back of the shop.",
        "They are also looking at running evening classes for beginners. || A loyalty card is planned for later in the year. || "
        "More staff will be taken on if the new premises are busy.")),
    S(H("Support for small firms || Help available"),
      P("The district council offers grants of up to {money} for independent shops that improve their shop fronts. || "
        "Business advice sessions are held at the library on the first {wd1} of every month. || "
        "The chamber of trade runs a free mentoring scheme for new businesses.",
        "Applications for the current round close on {date2}. || {n_mid} businesses have already applied this year. || The scheme is funded until {month3}.")),
]
EXTRA["qs_config"] = [
    S(H("Precedence || How values are resolved"),
      P("Values are resolved in this order: command line flags, environment variables, the configuration file, then built in defaults. || "
        "A flag on the command line always wins, followed by {env}-style environment variables and then quillstack.toml. || "
        "When the same setting appears in more than one place, the most specific source is used.",
        "Run quill config show to print the values the {comp} is actually using. || The effective configuration is logged at startup at info level. || "
        "Use quill config diff to compare two nodes.")),
    S(H("Performance tuning || Tuning for large clusters"),
      P("On clusters with more than {n_mid} nodes, raise {key} gradually and watch the latency graphs for {n_small} hours after each change. || "
        "Large deployments usually need a higher {key} than the default, but going above {n_big} rarely helps. || "
        "Tuning {key} has the largest effect on throughput when the {comp} is under constant load.",
        "Memory use grows roughly in line with this value. || Each increase adds a little memory overhead per worker. || "
        "Measure before and after; guesses are often wrong.")),
    S(H("Deprecated options"),
      UL(["{key2} was renamed in version {version} and the old name will be removed in the next major release.",
          "legacy_mode has no effect since version {version}.", "The [{comp_key}.compat] table is ignored and can be deleted.",
          "Setting {key} to zero used to mean unlimited; it is now rejected."], k=(1, 3))),
]
EXTRA["qs_howto"] = [
    S(H("How long it takes || Timing"),
      P("On a cluster of {n_small} nodes the whole procedure usually takes {n_mid} minutes, most of it spent waiting for restarts. || "
        "Allow about {n_mid} minutes for a small cluster and longer if you have many tenants. || "
        "Timing depends mainly on how long each node takes to rejoin the cluster.",
        "You can pause between steps; nothing breaks if you stop halfway for a while. || Do not leave the cluster half done overnight. || "
        "Plan to finish in one session if you can.")),
    S(H("Common problems || Troubleshooting"),
      UL(["A node refuses to rejoin: check that its clock is in sync.", "The apply step times out: increase the timeout with --wait {n_mid}s.",
          "Permission denied: run {tool} as the quillstack service user.", "Health page stays amber: look for a stuck lease in the logs.",
          "The command is not found: make sure {tool} is on your PATH.", "Old settings return after a restart: a local override file is winning."], k=(2, 4))),
    S(H("Automating the procedure || Scripting it"),
      P("Every step in this guide can be scripted, and {tool} returns a non-zero exit code when something fails. || "
        "Teams that run this often wrap the steps in a small script and run it from their deployment pipeline. || "
        "If you automate this, add a pause after each restart and check the health endpoint before moving on.",
        "A sample script is included in the examples folder of the release archive. || Keep a human in the loop for production clusters. || "
        "Test the script against a staging cluster first.")),
    S(H("See also || Related reading"),
      P("The operations handbook explains how to plan maintenance windows. || For background on how nodes agree on configuration, read the concepts page on consensus. || "
        "The release notes for version {version} list changes that affect this procedure.")),
]
EXTRA["qs_release"] = [
    S(H("Known issues"),
      UL(["The {comp2} may log a harmless warning about a missing index on first start.", "Dashboards created before {version} need to be reimported.",
          "Very large snapshots can take {n_small} times longer to restore than before.", "The dry run mode does not yet cover plugin settings.",
          "Windows builds are delayed and will follow within {n_small} weeks."], k=(1, 3))),
    S(H("Performance || Benchmarks"),
      P("In our benchmark cluster of {n_small} nodes, the {comp} handled {n_mid} per cent more requests per second than in the previous release. || "
        "Startup time on a cluster with {n_big} tenants fell from minutes to seconds. || "
        "Memory use of the {comp2} dropped by about {n_mid} per cent under the same load.",
        "Your results will depend on hardware and workload. || The benchmark setup is described in the repository. || These figures come from our nightly test runs.")),
    S(H("Deprecations || Removals"),
      P("The old REST endpoints under /v1 are deprecated and will be removed in version {version2}. || Support for the XML configuration format ends with this release. || "
        "The quill legacy command now prints a warning and will be removed in a future release.",
        "Plan to migrate before then. || The migration guide explains the replacements. || Contact support if you rely on these features.")),
]
EXTRA["hm_seminar"] = [
    S(H("Related reading || Before the talk"),
      P("Students who want to prepare can read the speaker's recent review article, which is available through the library. || "
        "A short reading list has been posted on the seminar noticeboard outside {room}. || "
        "Background papers on {topic} are available from {person2}.")),
    S(H("Attending || Practical information"),
      P("The seminar is open to all staff and students, and external visitors are welcome if they register in advance. || "
        "Visitors from outside the university should sign in at the Garrow Building reception. || "
        "There is no need to book, but seating in {room} is limited to {n_mid} people.",
        "The talk will also be streamed for those who cannot attend in person. || A recording will be available for {n_small} weeks afterwards. || "
        "Please arrive a few minutes early, as the doors close when the talk starts.")),
    S(H("Meet the speaker || Student session"),
      P("Research students can meet {speaker} over lunch before the talk; places are limited to {n_small}. || "
        "There will be a short informal session for doctoral students at noon in the common room. || "
        "Students who would like a one to one conversation with {speaker} should email {person2}.")),
]
EXTRA["hm_studentship"] = [
    S(H("Training and development || What you will learn"),
      P("The student will receive training in field safety, data management and scientific communication. || "
        "The graduate school runs courses in statistics, writing and teaching, which the student will be expected to attend. || "
        "There will be opportunities to present at national meetings in the second and third years.",
        "A placement of up to {n_small} months with {funder} is included. || The student will also help to demonstrate in undergraduate field classes. || "
        "A budget for conference travel is provided.")),
    S(H("The research group || Where you will work"),
      P("The student will join a group of {n_mid} researchers working on landscapes, water and climate. || "
        "The group meets weekly and shares a laboratory on the ground floor of the Garrow Building. || "
        "Current group members work on projects across the uplands and the coast.")),
    S(H("Informal enquiries || Questions"),
      P("Informal enquiries are welcome and should be sent to {person}. || Potential applicants are encouraged to contact {person} before applying. || "
        "For questions about eligibility, contact the postgraduate office.",
        "We particularly welcome applications from groups that are under represented in the geosciences. || "
        "Part time study may be possible; please ask. || Applicants with relevant work experience are encouraged to apply.")),
]
EXTRA["bk_returns"] = [
    S(H("Faulty items || If something is broken"),
      P("If your {cat} arrives damaged or develops a fault, you can return it at any time within the guarantee period. || "
        "Faulty {cat} can be returned free of charge, even after {days} days. || "
        "Please tell us about damage within {n_small} days of delivery so we can claim from {courier}.",
        "Send us a photo of the fault and we will arrange a replacement or refund. || We may ask you to try a simple fix first. || "
        "A replacement will be sent as soon as the faulty item is collected.")),
    S(H("Packing your return || Packaging"),
      P("Use the original box if you still have it, or any strong box that fits the item. || Wrap fragile parts in paper, not plastic, where you can. || "
        "Remove old delivery labels so the parcel is not sent back to you.",
        "Attach the returns label to the largest side of the box. || Keep your proof of postage until the refund arrives. || "
        "For multi part items, label each box 1 of {n_small}, 2 of {n_small} and so on.")),
    S(H("Returning to a store || In store returns"),
      P("Most {cat} can also be returned to any Bracken store with your order number. || Store returns are usually refunded on the spot. || "
        "Large {cat} cannot be returned in store and must be collected.")),
]
EXTRA["bk_payment"] = [
    S(H("Security checks || Verifying your payment"),
      P("Your bank may ask you to confirm the payment in its app or with a code sent by text message. || "
        "Extra checks are normal for larger orders and for new cards. || If the check window does not appear, make sure pop ups are allowed.",
        "We never ask for your PIN or full card number by phone or email. || Bracken staff will never ask you to read out a security code. || "
        "If you get a message asking for card details, do not reply and report it to us.")),
    S(H("Vouchers and gift cards || Using codes"),
      P("Only one voucher code can be used per order, and it must be entered before payment. || Gift cards can be combined with a card payment. || "
        "Codes are case sensitive and cannot be used on delivery charges.",
        "Codes from newsletters usually expire after {n_mid} days. || A code that has already been used will show as invalid. || "
        "If your code came from a partner site, check its terms.")),
    S(H("Refunds to cards || Refunds"),
      P("Refunds go back to the card you paid with. || If the card has expired, your bank will pass the refund to the new card. || "
        "Refunds to gift cards appear straight away.",
        "Allow {n_small} working days for the money to reach your account. || The refund will show as a credit from Bracken Home and Garden. || "
        "We will email you when the refund is issued.")),
]
EXTRA["tk_printer"] = [
    S(P("Also worth knowing: {fil} behaves very differently from batch to batch, so what worked on the last spool may not work now. || "
        "A small fan pointed at the wrong place can also cause this on a {printer}. || "
        "If you changed the build plate recently, the new surface may need a different first layer height.",
        "Keep notes of every change so you can go back. || Change one setting at a time. || Take a photo of each test print.")),
    S(P("For reference, my working profile is {temp} degrees for the first layer, {n_small} top layers and a {speed} mm/s outer wall. || "
        "On my own {printer} the fix was a new nozzle and a fresh spool of {fil}. || "
        "I run the same {printer} with {fil} most days and these settings have been stable for months.")),
]
EXTRA["tk_electronics"] = [
    S(P("I have attached a photo of the wiring and the breadboard layout. || Here is the schematic I followed, from the board's getting started guide. || "
        "Wiring is on a breadboard at the moment, with jumper wires about {n_mid} cm long.",
        "Any ideas? || What should I check first? || Is this a hardware or software problem?")),
    S(P("A quick way to confirm this is to run the {board} from a bench supply with a current limit. || "
        "You can also log the supply voltage with a spare analogue pin and print it to the serial monitor. || "
        "If you do not have a scope, a cheap logic analyser will show the glitches.",
        "When the voltage dips below about {volt} volts the problem will appear. || Look for dips that line up with the fault. || "
        "The fault usually shows up as a short drop lasting a few milliseconds.")),
]
EXTRA["rc_excursion"] = [
    S(P("Lunch is not included, but there is a buffet at the station and a pub within walking distance. || Bring a packed lunch if you prefer; there are benches on the platform. || "
        "The hosts have offered tea and biscuits on arrival.",
        "Please wear sensible shoes, as some areas are uneven. || Hi-vis vests will be provided for the shed visit. || Children must be accompanied at all times.")),
    S(P("This trip was suggested by {person2} at the last club night and has been arranged with the help of the host railway's volunteers. || "
        "Our thanks to the volunteers at {dest} for making us welcome again. || "
        "Members who went last time will remember the excellent tour by {person2}.")),
]
EXTRA["rc_minutes"] = [
    S(H("Apologies"),
      P("Apologies were received from {person3} and {n_small2} other members. || Apologies: {person3}. || No apologies were received.")),
    S(H("Any other business || AOB"),
      P("{person3} asked whether the club could buy a new projector for talks. || A member raised the state of the car park, which will be reported to the landlord. || "
        "It was agreed to send a card to a long standing member who is unwell.",
        "This will be discussed at the next meeting. || The secretary will write a letter. || Agreed unanimously.")),
    S(H("Exhibition || Open day"),
      P("The exhibition committee reported that {n_mid} visitors came to the open day. || Planning for the exhibition is on track, with {n_small} layouts booked. || "
        "Volunteers are still needed for the door and the refreshments.")),
]
EXTRA["mn_garden"] = [
    S(P("The soil on my plot is heavy clay, so everything takes a little longer to get going in spring. || My neighbour on the next plot swears by seaweed feed. || "
        "The water butts were empty by the middle of the week.",
        "I will try a raised bed at the top end next year. || Next year I will grow fewer courgettes. || I need to fix the shed door before winter.")),
    S(H("Next week || Plans"),
      P("Next week I plan to sow {plant2} and tidy the compost bays. || If the weather holds, the beds by the gate will be dug over. || "
        "The plan for next week is weeding, weeding and more weeding.")),
]


EXTRA_POOLS = {
    "hd_council": dict(stat=["Votes in favour", "Votes against", "Councillors absent", "Years since first proposed", "Public speakers", "Letters received"]),
    "rv_consult": dict(ward=["Northgate", "Saltmarsh", "Holt End", "Kingsmead", "Abbeyfields", "Tannery"]),
}


EXTRA_AT = {"tk_electronics": {0: 2}}   # extra section 0 belongs to the question, before the answer


def install(families):
    for fam, pools in EXTRA_POOLS.items():
        families[fam]["pools"].update(pools)
    for fam, secs in EXTRA.items():
        f = families[fam]
        if not f.get("_extended") and fam in EXTRA_AT:
            secs = list(secs)
            for k, pos in sorted(EXTRA_AT[fam].items(), reverse=True):
                f["sections"].insert(pos, secs.pop(k))
        if not f.get("_extended"):
            f["sections"] = f["sections"][:-1] + secs + f["sections"][-1:] if not f["sections"][-1]["opt"] else f["sections"] + secs
            f["_extended"] = True
