"""Hand-written body material for the set-5 corpus.

Every organisation, person, street and town here is invented.  Sentence
frames carry slots ({street}, {name1} ...) that are filled from the fact
pools below, so two pages of one family share frames but not facts.
Each pool entry is a list of alternative phrasings of the same sentence;
the alternatives are used for the "reword" edit operation.
"""
import datetime

FIRST = ["Ines", "Tobias", "Marguerite", "Osric", "Delphine", "Anwen", "Ruaridh", "Hester", "Caspian",
         "Noor", "Bartholomew", "Elspeth", "Jory", "Perpetua", "Lucan", "Wilhelmina", "Dariusz",
         "Saoirse", "Ambrose", "Ottilie", "Fenella", "Kwabena", "Rosalind", "Tamsin", "Idris", "Greer"]
LAST = ["Quarrie", "Fenwright", "Hollingdrake", "Marchbank", "Ottaway", "Pellowe", "Drummell", "Siskin",
        "Varleigh", "Ambridge-Kett", "Coldharbour", "Tresillian", "Mawdsley", "Lorrimer", "Bexwell",
        "Crannock", "Dunstaple", "Feverell", "Gadsworth", "Hennage", "Imrie-Cole", "Jessop-Vane",
        "Kilbride", "Larkworth", "Moorcock", "Nettleford"]
PLACES = ["Quillmere", "Oxlade Green", "Marrowby", "Fennick Hollow", "Dunmarrow", "Ashcombe Lees",
          "Keldwick", "Brindle Cross", "Sallowfield", "Wrenholt", "Tansey Reach", "Hobbesdale",
          "Farrowby", "Pellingham Vale", "Ostley Cross", "Larkspur Bay", "Cobbold End", "Thistlecombe"]
STREETS = ["Cinder Lane", "Tanners Row", "Orchard Rise", "Kiln Street", "Mallow Road", "Saltings Way",
           "Ropewalk", "Chandler Street", "Beacon Hill Road", "Weir Lane", "Heron Close", "Quarry Bank",
           "Millrace Court", "Stonechat Drive", "Lantern Yard", "Bellfounder Way", "Pumphouse Lane",
           "Gravel Pits Road", "Osier Walk", "Tollgate Crescent", "Farriers Mews", "Cooper Terrace"]
MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September",
          "October", "November", "December"]


def date_text(rng, year=2026):
    d = datetime.date(year, 1, 1) + datetime.timedelta(days=rng.randrange(0, 330))
    return "%s %d %s" % (d.strftime("%A"), d.day, MONTHS[d.month - 1]), d


def base_facts(rng):
    f = {}
    names = rng.sample(range(len(FIRST)), 4)
    lasts = rng.sample(range(len(LAST)), 4)
    for i in range(4):
        f["name%d" % (i + 1)] = FIRST[names[i]] + " " + LAST[lasts[i]]
        f["first%d" % (i + 1)] = FIRST[names[i]]
        f["last%d" % (i + 1)] = LAST[lasts[i]]
    p = rng.sample(PLACES, 3)
    f["place"], f["place2"], f["place3"] = p
    s = rng.sample(STREETS, 5)
    f["street"], f["street2"], f["street3"], f["street4"], f["street5"] = s
    f["day"], d = date_text(rng)
    f["day2"], _ = date_text(rng)
    f["month"] = MONTHS[d.month - 1]
    f["time1"] = "%d.%02d%s" % (rng.choice([7, 8, 9, 10, 11]), rng.choice([0, 15, 30, 45]), "am")
    f["time2"] = "%d.%02d%s" % (rng.choice([1, 2, 3, 4, 5, 6]), rng.choice([0, 15, 30, 45]), "pm")
    f["n1"] = str(rng.randint(3, 9))
    f["n2"] = str(rng.randint(12, 48))
    f["n3"] = str(rng.randint(60, 900))
    f["price"] = "%d" % rng.choice([8, 12, 15, 18, 22, 25, 30, 35, 42, 48, 55])
    f["ref"] = "%s-%04d" % (rng.choice(["QA", "KX", "TR", "MB", "LF", "DW"]), rng.randint(100, 9999))
    return f


def pick(rng, f, key, pool):
    f[key] = rng.choice(pool)


# ---------------------------------------------------------------------------
# Family definitions.  sections: list of dicts
#   kind para: heading variants (or None), pool of sentence alternatives, n=(lo,hi)
#   kind list: heading variants, pool of item alternatives, n
#   kind table: heading variants, builder name
# "opt": probability that an optional section is included.
# ---------------------------------------------------------------------------

FAMILIES = {}


def family(name, **kw):
    FAMILIES[name] = kw


# ---- water: short outage notices (hard case) -------------------------------
CAUSES = ["a burst six-inch main", "a failed valve under the carriageway", "a leaking joint on the trunk main",
          "damage caused by a contractor digging for cable ducts", "a cracked cast-iron pipe laid in the 1930s",
          "a power cut at the booster pump", "an air lock after overnight repairs", "a collapsed service pipe"]
family("outage_notice",
       titles=["Supply interruption on {street}, {place}", "No water or low pressure: {street} area of {place}",
               "{place}: burst main affecting {street}", "Water off in parts of {place} near {street}",
               "Low pressure reported around {street} in {place}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["Customers on {street} and nearby roads in {place} may have no water or very low pressure since {time1} on {day}.",
                "Since {time1} on {day}, homes on {street} in {place} may be without water or have very low pressure."],
               ["Our crew traced the fault to {cause} close to the junction with {street2}.",
                "The fault has been found: {cause} near where {street} meets {street2}."],
               ["About {n3} properties are affected at present.",
                "We think roughly {n3} homes and businesses are affected."],
               ["Engineers from the {place2} depot have been on site since the first report came in.",
                "A repair team from our {place2} depot reached the site shortly after the first call."],
               ["Some customers on {street3} have also reported cloudy water this morning.",
                "Cloudy water has also been reported by a few households on {street3}."],
           ]),
           dict(kind="para", heading=["What we are doing", "Repair progress", "Latest on the repair"], n=(1, 2), pool=[
               ["We expect supplies to return by {time2}, although pressure may stay low for an hour after that.",
                "Supplies should be back by {time2}; pressure can take a further hour to recover."],
               ["Temporary traffic lights are in place on {street2} while the road is open.",
                "Please expect temporary lights on {street2} while we dig down to the pipe."],
               ["Bottled water is available from the car park at {venue} until {time2}.",
                "You can collect bottled water from {venue}, where we have a stand in the car park, until {time2}."],
               ["Tankers are topping up the network from {street4} to keep the hospital wing supplied.",
                "We have two tankers feeding the network from {street4} so that the care home keeps its supply."],
           ]),
           dict(kind="list", heading=["Streets affected", "Roads we know are affected"], opt=0.6, n=(2, 4), pool=[
               ["{street} (all numbers)"], ["{street3}, odd numbers only"], ["{street4} between {street2} and the river"],
               ["{street5} and the flats behind it"], ["Upper part of {street2}"]]),
           dict(kind="para", heading=["If you need help", "Priority services"], opt=0.7, n=(1, 1), pool=[
               ["If someone in your home relies on water for medical equipment, call us on the priority line quoting {ref}.",
                "Customers on our priority register will get a doorstep delivery; quote {ref} if you have not been contacted."],
               ["Run the cold kitchen tap for a few minutes once the supply returns, until the water runs clear.",
                "When the water comes back, run your cold kitchen tap until it runs clear before drinking."],
           ]),
       ])
VENUES_W = ["St Aldric's church hall", "the Marrowby leisure centre", "Keldwick community library",
            "the old cattle market", "Fennick Hollow primary school", "the Saltings sailing club"]


def facts_outage_notice(rng, site):
    f = base_facts(rng)
    pick(rng, f, "cause", CAUSES)
    pick(rng, f, "venue", VENUES_W)
    return f


# ---- water: planned works ---------------------------------------------------
WORKS = ["replacing the trunk main", "renewing lead service pipes", "upgrading the sewer pumping station",
         "lining the old cast-iron mains", "installing new pressure-reducing valves", "rebuilding the reservoir outlet"]
family("planned_works",
       titles=["Planned works: {works} in {place}", "{place} {works_short} scheme, {month} update",
               "Work starts on {street}: {works}", "Upcoming work in {place}: what to expect"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["From {day} we will be {works} along {street} and {street2} in {place}.",
                "Starting on {day}, our teams will be {works} on {street} and {street2}, {place}."],
               ["The work is part of a {n2}-month programme to cut leakage across the {place} supply zone.",
                "This is one stage of a {n2}-month plan to reduce leakage in the {place} zone."],
               ["The pipes in this area were laid in the {decade} and have burst {n1} times in the last two years.",
                "Pipes here date from the {decade}; they have failed {n1} times in two years."],
               ["Our contractor for this stage is {contractor}, who will carry our identity badges.",
                "{contractor} is carrying out this stage on our behalf and staff will show our badge."],
           ]),
           dict(kind="table", heading=["Phases and dates", "Timetable", "When we will be where"], builder="phases"),
           dict(kind="para", heading=["Why this work is needed", "Why we are doing this"], opt=0.7, n=(2, 4), pool=[
               ["Leakage in the {place} zone is about {n2} per cent higher than the average across our area.",
                "The {place} zone loses roughly {n2} per cent more water through leaks than our area as a whole."],
               ["Old iron mains corrode from the inside, which narrows the pipe and can discolour the water.",
                "Iron pipes rust from the inside over time, narrowing the bore and sometimes turning the water brown."],
               ["Each burst on {street} has meant digging up the road at short notice, often at night.",
                "Every burst on {street} has forced us to dig the road up at short notice, usually overnight."],
               ["The new plastic pipe is expected to last at least a hundred years.",
                "We expect the new plastic main to last for a century or more."],
               ["Doing the whole street in one go causes less disruption than repeated emergency repairs.",
                "Renewing the whole street at once is less disruptive than repairing it burst by burst."],
           ]),
           dict(kind="para", heading=["Looking after the area", "Environment and noise"], opt=0.6, n=(2, 3), pool=[
               ["Work will not start before 8am or continue after 6pm, except in an emergency.",
                "Apart from emergencies, we will work only between 8am and 6pm."],
               ["We will protect the roots of the lime trees on {street3} by digging by hand near them.",
                "Near the lime trees on {street3}, the team will dig by hand to protect the roots."],
               ["Spoil from the trench is taken away each evening rather than left in heaps.",
                "We remove dug material every evening instead of leaving it piled beside the road."],
               ["Grass verges will be reseeded in the next planting season.",
                "Any verges we disturb will be reseeded at the next planting season."],
           ]),
           dict(kind="para", heading=["Traffic and parking", "Getting around"], n=(2, 3), pool=[
               ["{street2} will be closed to through traffic between {time1} and {time2} on weekdays.",
                "On weekdays {street2} will be shut to through traffic from {time1} to {time2}."],
               ["Residents' parking will move to {street4} while each section is dug.",
                "While each section is open, residents may park on {street4} instead."],
               ["Bus route {n2} will divert via {street5}, adding about {n1} minutes to journeys.",
                "The number {n2} bus will use {street5} instead, so allow an extra {n1} minutes."],
               ["Pedestrian access to every property will be kept open at all times.",
                "You will always be able to reach your front door on foot."],
           ]),
           dict(kind="para", heading=["Will my supply be affected?", "Your water supply"], opt=0.8, n=(1, 2), pool=[
               ["Most homes will keep their supply, but we will need to switch water off for up to {n1} hours when your connection is moved.",
                "Your water will stay on for most of the scheme, apart from a break of up to {n1} hours when we connect your home to the new pipe."],
               ["We will post a card through your door at least 48 hours before any planned interruption.",
                "Expect a calling card at least two days before any planned break in supply."],
               ["If your house still has a lead supply pipe, we will replace our section free of charge.",
                "Where a lead pipe runs to your property, we will renew the part we own at no cost to you."],
           ]),
           dict(kind="para", heading=["Contact the project team", "Questions"], opt=0.5, n=(1, 1), pool=[
               ["Our liaison officer {name1} runs a drop-in session at {venue} every {weekday} afternoon.",
                "You can meet our liaison officer, {name1}, at {venue} each {weekday} afternoon."],
           ]),
       ])
CONTRACTORS = ["Hobbesdale Civils", "Brackwater Pipeline Services", "Farrowby and Daughters Groundworks",
               "Tidemark Utilities Partnership", "Lockspit Engineering"]


def facts_planned_works(rng, site):
    f = base_facts(rng)
    w = rng.choice(WORKS)
    f["works"] = w
    f["works_short"] = w.split(" ", 1)[1]
    pick(rng, f, "decade", ["1920s", "1930s", "1950s", "1960s", "1970s"])
    pick(rng, f, "contractor", CONTRACTORS)
    pick(rng, f, "venue", VENUES_W)
    pick(rng, f, "weekday", ["Monday", "Tuesday", "Wednesday", "Thursday"])
    return f


# ---- vets: clinic notices ---------------------------------------------------
family("vet_notice",
       titles=["{branch} surgery: {topic}", "Notice for {branch} clients: {topic}", "{topic_cap} at our {branch} branch",
               "Changes at {branch}: {topic}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["From {day} our {branch} surgery on {street} will {change}.",
                "Our {branch} surgery on {street} will {change} from {day}."],
               ["We know this affects many of you, and we are sorry for the disruption.",
                "We appreciate this is a nuisance for regular clients and apologise for it."],
               ["{name1}, who has led the {branch} team for {n2} years, will remain your first point of contact.",
                "Your first point of contact remains {name1}, head of the {branch} team for {n2} years."],
               ["Appointments already booked for that week will be moved to {branch2} unless you tell us otherwise.",
                "Unless you ask us not to, we will move appointments booked that week to {branch2}."],
               ["The change follows a review of how many clients used the late clinic over the winter.",
                "We made the decision after counting how many people used the late clinic this winter."],
           ]),
           dict(kind="para", heading=["Emergencies", "Out of hours care", "Urgent cases"], n=(1, 2), pool=[
               ["Out of hours, emergencies are seen at our {branch2} hospital, which is staffed all night.",
                "Emergency cases after closing time go to the {branch2} hospital, where a vet is on duty overnight."],
               ["Please ring before travelling so the team can prepare for your arrival.",
                "Call ahead before you set off so the night team can get ready for you."],
               ["The out-of-hours consultation fee is {price} pounds plus any treatment.",
                "An out-of-hours consultation costs {price} pounds, with treatment charged on top."],
           ]),
           dict(kind="list", heading=["What this means for you", "In short"], opt=0.6, n=(2, 4), pool=[
               ["Repeat prescriptions can still be collected from reception at {branch}."],
               ["Vaccination reminders will name the branch you are booked into."],
               ["Nurse clinics for weight checks move to {weekday} mornings."],
               ["Parking at {street} is unchanged; the barrier code stays the same."],
               ["Insurance claim forms can be left in the box by the front door."]]),
           dict(kind="para", heading=["Get in touch", "Questions"], opt=0.5, n=(1, 1), pool=[
               ["If you have any questions, speak to {name2} on reception or reply to your reminder email.",
                "Questions can go to {name2} at reception, or simply reply to your reminder email."],
           ]),
       ])
BRANCHES = ["Quillmere", "Oxlade Green", "Keldwick", "Sallowfield", "Wrenholt", "Brindle Cross"]
VET_TOPICS = [("new opening hours", "close at 6pm on weekdays instead of 8pm"),
              ("late clinic ends", "stop running its Thursday late clinic"),
              ("temporary closure for refurbishment", "close for three weeks while the consulting rooms are refitted"),
              ("car park resurfacing", "have no patient parking for ten days while the car park is resurfaced"),
              ("new phone system", "answer calls through a single number shared by all our branches"),
              ("Saturday surgery moves", "stop offering Saturday afternoon appointments"),
              ("early drop-off surgery", "open at 7.30am so that pets can be dropped off before work")]


def facts_vet_notice(rng, site):
    f = base_facts(rng)
    b = rng.sample(BRANCHES, 2)
    f["branch"], f["branch2"] = b
    f["topic"], f["change"] = rng.choice(VET_TOPICS)
    f["topic_cap"] = f["topic"][0].upper() + f["topic"][1:]
    pick(rng, f, "weekday", ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday"])
    return f


# ---- vets: advice articles --------------------------------------------------
family("vet_advice",
       titles=["{condition_cap} in {animal}s: what owners should know", "A practical guide to {condition} in {animal}s",
               "Spotting {condition} early in your {animal}", "Caring for a {animal} with {condition}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["{condition_cap} is one of the commonest reasons {animal} owners bring their pets to see us.",
                "Among {animal} owners, {condition} is one of the most frequent reasons for a visit to our clinics."],
               ["In our {branch} clinic alone we saw {n3} cases last year, most of them in older animals.",
                "Last year our {branch} clinic treated {n3} cases, mostly in older animals."],
               ["The good news is that most cases can be managed well if they are caught early.",
                "Caught early, the majority of cases respond well to treatment."],
               ["This guide was written by {name1}, one of our senior vets, with help from the nursing team.",
                "Our senior vet {name1} wrote this guide together with the nursing team."],
           ]),
           dict(kind="list", heading=["Signs to look out for", "Warning signs", "Early signs"], n=(3, 5), pool=[
               ["Drinking more water than usual"], ["Weight loss despite a good appetite"],
               ["Stiffness when getting up after rest"], ["Bad breath or dropping food"],
               ["Sleeping in unusual places"], ["Scratching at one ear or shaking the head"],
               ["Reluctance to jump onto furniture"], ["Changes in litter tray or toilet habits"]]),
           dict(kind="para", heading=["How we diagnose it", "Diagnosis"], n=(2, 3), pool=[
               ["Your vet will start with a full examination and a conversation about your {animal}'s routine.",
                "We begin with a thorough examination and questions about your {animal}'s daily routine."],
               ["A blood test is usually needed, and results come back from our lab within {n1} hours.",
                "Most cases need a blood sample; our in-house laboratory returns results within {n1} hours."],
               ["Sometimes we recommend an X-ray or scan, which means a day admission at {branch2}.",
                "An X-ray or ultrasound scan may be advised, which involves a day stay at {branch2}."],
               ["We will talk through costs with you before any test is carried out.",
                "Before any tests go ahead, we will explain the likely cost."],
           ]),
           dict(kind="para", heading=["Treatment and home care", "Living with the condition"], n=(2, 4), pool=[
               ["Treatment often combines a change of diet with daily medication.",
                "A diet change alongside daily medicine is the usual approach."],
               ["Most {animal}s need a check-up every {n1} months once they are stable.",
                "When the condition is stable, a check every {n1} months is usually enough."],
               ["Keep a simple diary of appetite, drinking and energy so you can spot changes.",
                "A short daily note of appetite, thirst and energy levels helps you notice changes."],
               ["Our nurses run free follow-up clinics on {weekday} evenings for owners with questions.",
                "On {weekday} evenings our nurses hold free clinics for owners who want advice."],
               ["Pet insurance usually covers the tests, but check whether your policy has a time limit for ongoing conditions.",
                "Insurance normally pays for tests, though some policies cap cover for long-term conditions."],
           ]),
           dict(kind="para", heading=["Diet and exercise", "Food, weight and activity"], opt=0.7, n=(2, 4), pool=[
               ["Weigh your {animal} once a fortnight, ideally on the same scales at the same time of day.",
                "A fortnightly weigh-in, on the same scales and at the same time of day, is the best habit to build."],
               ["Prescription diets work best when they are the only food offered, so ask family members not to share treats.",
                "A prescription diet only works if nothing else is fed, which means no shared treats from the family."],
               ["Short, regular walks are kinder to sore joints than one long outing at the weekend.",
                "Several short walks a day suit stiff joints far better than one long weekend hike."],
               ["Puzzle feeders slow down fast eaters and give indoor pets something to do.",
                "For quick eaters and indoor pets, a puzzle feeder slows meals down and adds some interest."],
               ["Our nurses can build a weight plan with you, with a target for each month.",
                "Ask a nurse to set up a weight plan with a monthly target that you can check at home."],
           ]),
           dict(kind="para", heading=["A case from our clinic", "One patient's story"], opt=0.6, n=(3, 4), pool=[
               ["{pet}, a {age}-year-old {animal} from {place}, first came to us because {owner} noticed {pet} was {symptom}.",
                "{owner} brought {pet}, a {animal} of {age} from {place}, to see us after noticing that {pet} was {symptom}."],
               ["Tests at {branch} confirmed {condition} within a couple of days.",
                "Within two days the tests at our {branch} clinic had confirmed {condition}."],
               ["After {n1} months on treatment, {pet} is back to {hobby} most mornings.",
                "{n1} months into treatment, {pet} is once again {hobby} most mornings."],
               ["{owner} says the hardest part was sticking to the new diet when {pet} begged at the table.",
                "According to {owner}, the toughest thing was keeping to the diet when {pet} begged for scraps."],
               ["We share this story with {owner}'s permission, and {pet} sends a wag of thanks to the nursing team.",
                "{owner} kindly agreed that we could tell this story, and {pet} sends thanks to the nurses."],
           ]),
           dict(kind="table", heading=["Typical costs", "What it costs"], opt=0.4, builder="vetcosts"),
           dict(kind="para", heading=["When to call us straight away", "Urgent signs"], opt=0.6, n=(1, 2), pool=[
               ["Call us at once if your {animal} collapses, stops eating for more than a day or has trouble breathing.",
                "Phone immediately if your {animal} collapses, refuses food for over a day or struggles to breathe."],
               ["Do not give human painkillers, which can be dangerous for {animal}s.",
                "Never give painkillers meant for people; several are toxic to {animal}s."],
           ]),
       ])
CONDITIONS = [("kidney disease", "dog"), ("arthritis", "dog"), ("dental disease", "cat"), ("thyroid disease", "cat"),
              ("ear disease", "dog"), ("diabetes", "cat"), ("obesity", "rabbit"), ("dental disease", "rabbit"),
              ("arthritis", "cat"), ("heart disease", "dog")]


def facts_vet_advice(rng, site):
    f = base_facts(rng)
    pick(rng, f, "pet", ["Biscuit", "Mungo", "Pickle", "Saffy", "Barnaby", "Tilly", "Nutmeg", "Otto", "Clementine", "Rolo"])
    f["owner"] = f["name3"]
    f["age"] = str(rng.randint(6, 14))
    pick(rng, f, "symptom", ["slower on walks", "leaving food in the bowl", "drinking from the bath", "hiding under the bed",
                             "limping after rest", "off colour for a week"])
    pick(rng, f, "hobby", ["racing round the garden", "sunbathing on the windowsill", "chasing the postman's van",
                           "begging at the back door", "climbing the stairs without help"])
    c, a = rng.choice(CONDITIONS)
    f["condition"], f["animal"] = c, a
    f["condition_cap"] = c[0].upper() + c[1:]
    b = rng.sample(BRANCHES, 2)
    f["branch"], f["branch2"] = b
    pick(rng, f, "weekday", ["Monday", "Tuesday", "Wednesday", "Thursday"])
    return f


# ---- vacancies (shared across employer sites, syndicated to the job board) --
EMPLOYERS = {
    "vets": (["Registered Veterinary Nurse", "Client Care Receptionist", "Small Animal Vet", "Kennel Assistant"],
             "Quillmere Veterinary Group"),
    "theatre": (["Box Office Supervisor", "Lighting Technician", "Front of House Assistant", "Wardrobe Assistant"],
                "the Lampwick Playhouse"),
    "schools": (["Teaching Assistant", "Site Caretaker", "Year 4 Class Teacher", "School Business Officer"],
                "Fennick Valley School District"),
    "water": (["Network Technician", "Leakage Inspector", "Customer Liaison Officer", "Treatment Works Operator"],
              "Marrowby Water"),
    "ferry": (["Deckhand", "Ticket Office Clerk", "Marine Engineer", "Port Operations Assistant"],
              "Skerrin Sound Ferries"),
    "jobs": (["Warehouse Team Leader", "Bookkeeper", "Bakery Assistant", "Delivery Driver", "Care Worker",
              "Garden Centre Assistant"], None),
}
SMALL_EMPLOYERS = ["Tansey Reach Bakery", "Cobbold End Garden Centre", "Hobbesdale Home Care",
                   "Ostley Cross Freight", "Larkspur Bay Boatyard", "Thistlecombe Accounts"]
family("vacancy",
       titles=["{role}, {place}", "Vacancy: {role} ({hours_short})", "{role} wanted at {employer_short}",
               "Join us as a {role} in {place}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["{employer_cap} is looking for a {role} to join the team in {place}.",
                "We are recruiting a {role} for our team in {place} at {employer}."],
               ["This is a {contract} post working {hours} hours a week.",
                "The post is {contract}, with {hours} hours of work each week."],
               ["The salary is {salary} pounds a year, depending on experience.",
                "Pay starts at {salary} pounds a year and rises with experience."],
               ["You will report to {name1}, who has been with us for {n2} years.",
                "Your line manager will be {name1}, a member of the team for {n2} years."],
           ]),
           dict(kind="list", heading=["What you will do", "Main duties", "The role"], n=(3, 5), pool=[
               ["Greet visitors and answer questions in person and by phone"], ["Keep accurate daily records"],
               ["Work safely and follow our written procedures"], ["Help train new starters in the first weeks"],
               ["Check stock and equipment at the start of each shift"], ["Cover for colleagues during holidays"],
               ["Take part in a weekend rota about one week in {n1}"]]),
           dict(kind="list", heading=["What we are looking for", "About you"], n=(2, 4), pool=[
               ["A calm, friendly manner under pressure"], ["Good written English and basic spreadsheet skills"],
               ["A full driving licence, as the job covers {place} and {place2}"],
               ["Experience in a similar role, though training is given"], ["Willingness to work some evenings"]]),
           dict(kind="para", heading=["How to apply", "Applying"], n=(1, 2), pool=[
               ["Send a short letter and your CV to {name2} quoting reference {ref}.",
                "To apply, email your CV and a covering letter to {name2}, quoting {ref}."],
               ["The closing date is {day}, and interviews will be held the following week in {place}.",
                "Applications close on {day}; interviews take place in {place} the week after."],
               ["We welcome applications from people returning to work after a career break.",
                "People coming back to work after a break are very welcome to apply."],
           ]),
       ])


def facts_vacancy(rng, site):
    f = base_facts(rng)
    roles, emp = EMPLOYERS[site]
    f["role"] = rng.choice(roles)
    if emp is None:
        emp = rng.choice(SMALL_EMPLOYERS)
    f["employer"] = emp
    f["employer_cap"] = emp[0].upper() + emp[1:]
    f["employer_short"] = emp.replace("the ", "")
    pick(rng, f, "contract", ["permanent", "fixed-term", "temporary", "seasonal"])
    h = rng.choice([16, 22.5, 30, 37.5, 40])
    f["hours"] = ("%g" % h)
    f["hours_short"] = "full time" if h >= 37 else "part time"
    f["salary"] = "{:,}".format(rng.randrange(19000, 42000, 250))
    return f


# ---- theatre: production pages ---------------------------------------------
PLAYS = [("The Salt Ledger", "a new drama about a fishing family who lose their boat", "drama"),
         ("Eleven Lanterns", "a comedy set in a village hall on the night of a power cut", "comedy"),
         ("Brass and Feathers", "a family musical about a marching band", "musical"),
         ("The Cartographer's Daughter", "a period drama about a woman who maps the coast", "drama"),
         ("Quiet Hours", "a two-hander set in a night-shift laundry", "drama"),
         ("Mr Pellowe's Umbrellas", "a farce set in a failing umbrella shop", "comedy"),
         ("The Winter Orchard", "a folk opera told through songs from the valley", "opera"),
         ("Harbour Lights Revue", "an evening of sketches and songs by the youth company", "revue"),
         ("A Clock for Keldwick", "a community play about the building of the town clock", "community play"),
         ("Ferryman", "a one-woman show about the last ferry across the estuary", "solo show")]
family("production",
       titles=["{play}", "{play}: {genre} at the Lampwick", "{play} ({run})", "Now booking: {play}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["{play} is {blurb}.", "Our {season} production, {play}, is {blurb}."],
               ["It runs in the {stage} from {day} for {n1} weeks.",
                "Performances are in the {stage}, opening on {day} and running for {n1} weeks."],
               ["Written by {name1} and directed by {name2}, it is the first time the piece has been staged in {place}.",
                "{name2} directs this first {place} staging of the play by {name1}."],
               ["Audiences at the preview in {place2} gave it a standing ovation.",
                "The preview run in {place2} ended with a standing ovation every night."],
           ]),
           dict(kind="table", heading=["Cast", "Company"], opt=0.7, builder="cast"),
           dict(kind="para", heading=["Tickets", "Prices and booking"], n=(2, 3), pool=[
               ["Tickets cost from {price} pounds, with concessions for students and over-sixties.",
                "Seats start at {price} pounds; students and over-sixties pay less."],
               ["There is a captioned performance on {day2} and a relaxed performance the following afternoon.",
                "We have a captioned show on {day2} and a relaxed matinee the next day."],
               ["Running time is about {runtime}, including one interval.",
                "The show lasts roughly {runtime} with an interval."],
               ["The play contains some strong language and is recommended for ages {age} and over.",
                "Recommended for ages {age} and up because of some strong language."],
           ]),
           dict(kind="para", heading=["Behind the scenes", "About the production"], opt=0.6, n=(1, 2), pool=[
               ["The set was built in our own workshop from timber reclaimed from the old pier at {place3}.",
                "Our workshop built the set using timber saved from the old {place3} pier."],
               ["Costumes were made by volunteers from the {place} sewing circle over {n2} evenings.",
                "Volunteers from the {place} sewing circle spent {n2} evenings making the costumes."],
           ]),
       ])


def facts_production(rng, site):
    f = base_facts(rng)
    p, b, g = rng.choice(PLAYS)
    f["play"], f["blurb"], f["genre"] = p, b, g
    pick(rng, f, "stage", ["Main House", "Studio", "Loft Theatre", "Courtyard stage"])
    pick(rng, f, "season", ["spring", "summer", "autumn", "winter"])
    f["run"] = "%s to %s" % (f["month"], rng.choice(MONTHS))
    pick(rng, f, "runtime", ["two hours", "two hours and twenty minutes", "ninety minutes", "two and a half hours"])
    pick(rng, f, "age", ["12", "14", "8", "16"])
    return f


# ---- theatre: access / visitor notices ---------------------------------------
family("venue_notice",
       titles=["{topic_cap} at the Lampwick", "Visiting us: {topic}", "Important: {topic} from {day}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["From {day}, {change} while {reason}.", "While {reason}, {change} from {day}."],
               ["We expect this to last about {n1} weeks.", "The arrangement should last roughly {n1} weeks."],
               ["Our duty manager {name1} will be in the foyer from an hour before each show to help.",
                "{name1}, our duty manager, will be in the foyer an hour before curtain up to help."],
               ["Please allow an extra {n2} minutes to get to your seat.",
                "We suggest arriving {n2} minutes earlier than usual."],
           ]),
           dict(kind="list", heading=["Access arrangements", "Getting in"], opt=0.7, n=(2, 4), pool=[
               ["Step-free entry is through the {street} door"], ["Wheelchair spaces can be booked by phone"],
               ["The hearing loop covers rows A to H"], ["Assistance dogs are welcome; ask for a water bowl"],
               ["Large print programmes are available at the bar"]]),
           dict(kind="para", heading=["Parking and transport", "Getting here"], n=(1, 2), pool=[
               ["The {street2} car park closes at {time2}, so please use the multi-storey on {street3} for evening shows.",
                "For evening shows use the multi-storey on {street3}; the {street2} car park shuts at {time2}."],
               ["The last bus to {place} leaves from outside the theatre at 10.50pm.",
                "Buses to {place} leave from the stop outside, the last at 10.50pm."],
           ]),
       ])
THEATRE_TOPICS = [("temporary entrance", "the main entrance will be on {street}", "the foyer is rebuilt"),
                  ("bar refurbishment", "the circle bar will be closed", "new flooring and counters are fitted"),
                  ("lift out of service", "the lift to the circle will be out of use", "the lift is replaced"),
                  ("new cloakroom rules", "bags larger than a cabin case must go to the cloakroom",
                   "the aisles are kept clear for the new seating layout"),
                  ("changes to the box office hours", "the box office will open at noon",
                   "the box office team moves into the new ticket hall")]


def facts_venue_notice(rng, site):
    f = base_facts(rng)
    t, c, r = rng.choice(THEATRE_TOPICS)
    f["topic"], f["change"], f["reason"] = t, c.format(**f), r
    f["topic_cap"] = t[0].upper() + t[1:]
    return f


# ---- lettings: property listings ----------------------------------------------
family("listing",
       titles=["{beds} bedroom {ptype} to let, {street}, {place}", "{ptype_cap} on {street}, {place}",
               "To let: {beds} bed {ptype} in {place}", "{street}, {place}: {beds} bedroom {ptype}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["A {adj} {beds} bedroom {ptype} on {street}, a short walk from {place} station.",
                "This {adj} {ptype} with {beds} bedrooms sits on {street}, a few minutes from {place} station."],
               ["The property is available from {day} on a {term}-month tenancy.",
                "It is available to move into from {day}, on a tenancy of {term} months."],
               ["Rent is {rent} pounds per calendar month, and the holding deposit is one week's rent.",
                "The rent is {rent} pounds a month with a holding deposit of one week's rent."],
               ["The landlord has {feature}, and the {room} was redecorated last {season}.",
                "Recently the landlord has {feature}; the {room} was repainted last {season}."],
           ]),
           dict(kind="table", heading=["Key facts", "At a glance"], builder="propfacts"),
           dict(kind="list", heading=["Features", "Highlights"], opt=0.7, n=(3, 5), pool=[
               ["Gas central heating with a new boiler"], ["Double glazing throughout"], ["South-facing rear garden"],
               ["Allocated parking space"], ["Separate utility room"], ["Bike store by the front door"],
               ["Fibre broadband connected"], ["Pets considered by arrangement"]]),
           dict(kind="para", heading=["Viewings", "Arrange a viewing"], opt=0.7, n=(1, 2), pool=[
               ["Viewings are by appointment with {name1} from our {place2} office.",
                "Call {name1} at our {place2} office to book a viewing."],
               ["Block viewings are held on {weekday} evenings between 5pm and 7pm.",
                "We run group viewings on {weekday} evenings from 5pm to 7pm."],
           ]),
       ])
PTYPES = ["terraced house", "flat", "semi-detached house", "maisonette", "cottage", "bungalow"]


def facts_listing(rng, site):
    f = base_facts(rng)
    pick(rng, f, "ptype", PTYPES)
    f["ptype_cap"] = f["ptype"][0].upper() + f["ptype"][1:]
    f["beds"] = str(rng.randint(1, 4))
    pick(rng, f, "adj", ["bright", "well kept", "spacious", "newly modernised", "cosy", "quiet"])
    pick(rng, f, "term", ["6", "12", "18", "24"])
    f["rent"] = "{:,}".format(rng.randrange(650, 1900, 25))
    pick(rng, f, "feature", ["fitted a new kitchen", "replaced the windows", "added loft insulation",
                             "installed a heat pump", "rewired the whole house"])
    pick(rng, f, "room", ["living room", "main bedroom", "hallway", "kitchen"])
    pick(rng, f, "season", ["spring", "summer", "autumn", "winter"])
    pick(rng, f, "weekday", ["Tuesday", "Wednesday", "Thursday"])
    pick(rng, f, "epc", ["B", "C", "D", "E"])
    pick(rng, f, "council_band", ["A", "B", "C", "D"])
    return f


# ---- lettings: landlord guides -------------------------------------------------
family("landlord_guide",
       titles=["Landlord guide: {topic}", "{topic_cap}: a guide for landlords", "What landlords need to know about {topic}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["This guide explains {topic} for landlords who let through our {place} office.",
                "Landlords letting through our {place} branch often ask us about {topic}, so we wrote this guide."],
               ["It was last checked by our compliance lead, {name1}, on {day}.",
                "{name1}, who handles compliance for us, last reviewed it on {day}."],
               ["The rules change often, so please treat it as a starting point rather than legal advice.",
                "Rules change frequently; read this as a starting point, not as legal advice."],
           ]),
           dict(kind="para", heading=["The basics", "What the rules say"], n=(2, 4), pool=[
               ["You must give tenants a copy of the current {certificate} before they move in.",
                "Tenants must receive a copy of the current {certificate} before the tenancy starts."],
               ["The check has to be repeated every {n1} years by a qualified person.",
                "A qualified engineer must repeat the check every {n1} years."],
               ["Keep copies of every certificate for at least {n1} years after the tenancy ends.",
                "Hold on to old certificates for {n1} years after each tenancy finishes."],
               ["Fines for missing paperwork can reach {fine} pounds per property.",
                "Missing paperwork can lead to fines of up to {fine} pounds for each property."],
               ["Our managed service books the check for you and sends a reminder {n2} days before it is due.",
                "On our managed service we arrange the check and remind you {n2} days ahead."],
           ]),
           dict(kind="list", heading=["Checklist", "Before the tenancy starts"], n=(3, 5), pool=[
               ["Book the {certificate} check"], ["Test every smoke alarm on the day of check-in"],
               ["Photograph meter readings"], ["Protect the deposit within 30 days"],
               ["Give the tenant the how-to-rent booklet"], ["Record the condition of the garden"]]),
           dict(kind="list", heading=["Common mistakes", "Where landlords go wrong"], opt=0.6, n=(3, 5), pool=[
               ["Giving the tenant an out-of-date copy of the {certificate}"], ["Relying on a verbal promise from a contractor"],
               ["Forgetting to re-check after replacing an appliance"], ["Letting a tenant move in before the paperwork is ready"],
               ["Keeping records only on paper in one place"], ["Assuming the previous agent handled it"]]),
           dict(kind="para", heading=["A worked example", "An example from our files"], opt=0.6, n=(3, 4), pool=[
               ["Last year a landlord with {n1} houses in {place2} asked us to take over management.",
                "A landlord owning {n1} homes in {place2} moved to our managed service last year."],
               ["When we checked the files, two properties had no valid {certificate} at all.",
                "Our file check found that two of the homes lacked any valid {certificate}."],
               ["We booked the checks within a week, and one boiler had to be replaced at a cost of {cost} pounds.",
                "Checks were booked inside a week; one boiler failed and cost {cost} pounds to replace."],
               ["Had a tenant complained first, the landlord could have faced a fine and lost the right to end the tenancy.",
                "If a tenant had complained before we found it, a fine and problems ending the tenancy could have followed."],
               ["The landlord now gets a calendar reminder for every property from our compliance team.",
                "Every property now has a reminder in our compliance calendar, sent to the landlord too."],
           ]),
           dict(kind="para", heading=["How we can help", "Our service"], opt=0.6, n=(1, 2), pool=[
               ["Our fully managed fee is {pct} per cent of the monthly rent, plus VAT.",
                "Full management costs {pct} per cent of the rent each month, plus VAT."],
               ["Talk to {name2} at the {place2} branch if you are thinking of switching agents.",
                "If you are considering a change of agent, {name2} at our {place2} branch can help."],
           ]),
       ])
LL_TOPICS = [("gas safety checks", "gas safety certificate"), ("electrical safety reports", "electrical safety report"),
             ("energy performance ratings", "energy performance certificate"), ("deposit protection", "deposit certificate"),
             ("smoke and carbon monoxide alarms", "alarm test record"), ("right to rent checks", "right to rent record")]


def facts_landlord_guide(rng, site):
    f = base_facts(rng)
    t, c = rng.choice(LL_TOPICS)
    f["topic"], f["certificate"] = t, c
    f["topic_cap"] = t[0].upper() + t[1:]
    pick(rng, f, "fine", ["5,000", "30,000", "6,000", "10,000"])
    pick(rng, f, "pct", ["10", "12", "14"])
    f["cost"] = "{:,}".format(rng.randrange(1800, 4200, 50))
    return f


# ---- schools: newsletter items -------------------------------------------------
SCHOOLS = ["Fennick Hollow Primary", "Oxlade Green Infants", "Brindle Cross Academy", "Keldwick Juniors",
           "Sallowfield High", "Wrenholt Middle School"]
family("newsletter_item",
       titles=["{school}: {event}", "{event} at {school}", "News from {school}: {event}", "{event_cap} round-up"],
       sections=[
           dict(kind="para", heading=None, n=(2, 4), pool=[
               ["Pupils at {school} {did} on {day}.", "On {day}, pupils from {school} {did}."],
               ["Headteacher {name1} said the children had worked on it for {n1} weeks.",
                "The children spent {n1} weeks preparing, according to headteacher {name1}."],
               ["Parents raised {n3} pounds for the library fund on the day.",
                "On the day, families raised {n3} pounds towards new library books."],
               ["Special thanks go to {name2}, who organised the volunteers.",
                "We owe a big thank you to {name2} for organising the volunteers."],
               ["Photographs are on display in the main corridor until half term.",
                "You can see photographs in the main corridor until half term."],
           ]),
           dict(kind="para", heading=["Coming up", "Dates for your diary", "Next steps"], n=(1, 3), pool=[
               ["Year {n1} will visit {place2} museum on {day2}; consent forms are due back by Friday.",
                "On {day2} Year {n1} travel to the museum at {place2}; please return consent forms by Friday."],
               ["The after-school {club} club restarts next week in the hall.",
                "Next week the {club} club starts again after school in the hall."],
               ["Flu vaccinations for reception pupils will take place on {day2}.",
                "Reception children receive their flu vaccination on {day2}."],
               ["The uniform exchange will be open in the playground on Friday morning.",
                "On Friday morning the uniform swap rail will be in the playground."],
           ]),
           dict(kind="list", heading=["Reminders", "Please remember"], opt=0.5, n=(2, 3), pool=[
               ["Label every item of uniform with your child's name"], ["Water bottles only, no fizzy drinks"],
               ["The car park is for staff and blue badge holders"], ["Lunch money must be paid online by Monday"],
               ["Reading records are checked every Thursday"]]),
       ])
SCHOOL_EVENTS = [("Harvest festival", "led the harvest festival service at the parish church"),
                 ("Science week", "showed their science week experiments to parents"),
                 ("Litter pick", "collected litter along the river path"),
                 ("Sports day", "competed in the summer sports day on the field"),
                 ("Book week", "dressed up as characters for book week"),
                 ("Choir success", "sang at the district music festival"),
                 ("Eco garden", "planted the new eco garden behind the kitchen")]


def facts_newsletter_item(rng, site):
    f = base_facts(rng)
    pick(rng, f, "school", SCHOOLS)
    e, d = rng.choice(SCHOOL_EVENTS)
    f["event"], f["did"] = e, d
    f["event_cap"] = e
    pick(rng, f, "club", ["chess", "gardening", "coding", "netball", "drama", "knitting"])
    return f


# ---- schools: term and closure notices -----------------------------------------
family("term_notice",
       titles=["Term dates {year}", "{school}: term dates and training days", "District calendar for {year}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["These are the agreed term dates for {school} and the other district schools for {year}.",
                "The district has agreed the {year} term dates below, which apply to {school}."],
               ["Each school also has {n1} staff training days, listed separately.",
                "Schools set {n1} training days each, shown in the second table."],
               ["The dates were agreed by the governors' committee chaired by {name1}.",
                "{name1}, who chairs the governors' committee, signed off the dates."],
           ]),
           dict(kind="table", heading=["Term dates", "Terms"], builder="terms"),
           dict(kind="para", heading=["Holidays in term time", "Absence requests"], n=(1, 2), pool=[
               ["Requests for leave in term time must be made to the headteacher at least {n2} days ahead.",
                "Ask the headteacher in writing at least {n2} days ahead for any term-time leave."],
               ["Leave is only granted in exceptional circumstances.",
                "Term-time leave is granted only in exceptional cases."],
           ]),
       ])


def facts_term_notice(rng, site):
    f = base_facts(rng)
    pick(rng, f, "school", SCHOOLS)
    pick(rng, f, "year", ["2026 to 2027", "2027 to 2028"])
    return f


# ---- podcasts: episode notes ------------------------------------------------------
SHOWS = [("Slow Water", "rivers, canals and the people who live beside them"),
         ("The Night Desk", "local newsrooms after dark"),
         ("Bread and Circuits", "home baking and small electronics"),
         ("Field Notes from Nowhere", "amateur naturalists and their obsessions"),
         ("Second Act", "people who changed career after fifty"),
         ("Rust and Rivets", "restoring old machines")]
family("episode_notes",
       titles=["{show} {epno}: {topic_cap}", "Episode {epno} of {show}: {topic_cap}", "{topic_cap} ({show}, episode {epno})"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["In this episode of {show}, {host} talks to {guest} about {topic}.",
                "{host} is joined by {guest} on this {show} episode to discuss {topic}."],
               ["{guest_first} has spent {n2} years working in {place} and tells some stories that surprised us.",
                "After {n2} years in {place}, {guest_first} has some stories that took us by surprise."],
               ["We recorded the conversation in {venue} on a very wet {weekday}.",
                "This one was recorded in {venue} on a rainy {weekday}."],
               ["It is the {ordinal} episode in our series on {series}.",
                "This is episode {ordinal_short} in our run on {series}."],
           ]),
           dict(kind="para", heading=["About our guest", "Who is {guest_first}?"], opt=0.6, n=(2, 4), pool=[
               ["{guest_first} grew up in {place2} and left school at sixteen to work for {mentor}.",
                "Born in {place2}, {guest_first} left school at sixteen and went to work for {mentor}."],
               ["These days {guest_first} teaches evening classes and runs a small workshop behind the house.",
                "Now {guest_first} runs a small workshop at home and teaches evening classes."],
               ["{guest_first}'s notebooks, kept since {year}, fill a whole shelf of the workshop.",
                "A whole workshop shelf is filled with the notebooks {guest_first} has kept since {year}."],
               ["When we asked for advice for beginners, the answer was simply to start small and keep records.",
                "Asked what beginners should do, {guest_first} said: start small and write everything down."],
           ]),
           dict(kind="para", heading=["From the mailbag", "Your letters"], opt=0.5, n=(2, 3), pool=[
               ["Last time {name4} wrote from {place3} to say our episode on {old_topic} brought back memories.",
                "{name4} got in touch from {place3} after our episode on {old_topic}, with memories of their own."],
               ["Several of you asked where the music comes from; it is recorded in a church hall in {place}.",
                "Lots of listeners asked about the music, which we record in a church hall in {place}."],
               ["One listener corrected our pronunciation of {place2}, and we stand corrected.",
                "We got the pronunciation of {place2} wrong, and a listener kindly put us right."],
           ]),
           dict(kind="table", heading=["Chapters", "In this episode"], opt=0.8, builder="chapters"),
           dict(kind="list", heading=["Mentioned in the episode", "Links and references"], opt=0.7, n=(2, 4), pool=[
               ["The {place} local history society archive"], ["{guest_first}'s pamphlet on {topic}"],
               ["Our earlier episode with {name3}"], ["The {place2} river survey maps"],
               ["A recipe for {food}, as promised"]]),
           dict(kind="para", heading=["Credits", "Thanks"], n=(1, 2), pool=[
               ["Produced by {name4}, with music by the {band}.",
                "{name4} produced the episode and the music is by the {band}."],
               ["If you enjoyed it, tell a friend; that is how most listeners find us.",
                "Most listeners hear about us from a friend, so please pass it on."],
               ["A full transcript will follow within {n1} days.",
                "We will post a transcript within {n1} days."],
           ]),
       ])
PODTOPICS = ["the lost watermills of the valley", "printing a newspaper by hand", "keeping bees on a rooftop",
             "repairing a 1950s radio", "night fishing for eels", "teaching yourself to navigate by the stars",
             "restoring a narrowboat engine", "running a village shop", "writing obituaries for a weekly paper",
             "building a bread oven from clay"]


def facts_episode_notes(rng, site):
    f = base_facts(rng)
    s, series = rng.choice(SHOWS)
    f["show"], f["series"] = s, series
    f["epno"] = str(rng.randint(12, 140))
    t = rng.choice(PODTOPICS)
    f["topic"], f["topic_cap"] = t, t[0].upper() + t[1:]
    f["host"], f["guest"], f["guest_first"] = f["name1"], f["name2"], f["first2"]
    pick(rng, f, "venue", ["a boathouse in {place}".format(**f), "our cupboard studio", "the back room of the {place} library".format(**f),
                           "a community hall in {place2}".format(**f)])
    pick(rng, f, "weekday", ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday"])
    o = rng.randint(2, 9)
    f["ordinal"] = ["", "", "second", "third", "fourth", "fifth", "sixth", "seventh", "eighth", "ninth"][o]
    f["ordinal_short"] = str(o)
    pick(rng, f, "food", ["eel pie", "nettle soup", "oat biscuits", "damson jam", "seed bread"])
    pick(rng, f, "mentor", ["a boatyard", "the county archive", "a printing works", "a clockmaker", "the railway"])
    f["year"] = str(rng.randint(1979, 2012))
    pick(rng, f, "old_topic", PODTOPICS)
    pick(rng, f, "band", ["Tollgate Trio", "Heron Sisters", "Quarry Bank Brass", "Millrace Collective"])
    return f


# ---- gardening society -------------------------------------------------------------
family("growing_notes",
       titles=["Growing {crop} on heavy clay", "{crop_cap}: notes from the {month} meeting", "Members' notes: {crop}",
               "Getting the best from {crop}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["At the {month} meeting, {name1} talked about growing {crop} on the clay soils around {place}.",
                "{name1} spoke at our {month} meeting about {crop} on the heavy clay of {place}."],
               ["These notes summarise the talk and the questions afterwards.",
                "What follows is a summary of the talk and the discussion that came after."],
               ["{first1} has grown {crop} on the same allotment for {n2} years.",
                "For {n2} years {first1} has grown {crop} on one allotment plot."],
           ]),
           dict(kind="para", heading=["Soil and sowing", "Getting started"], n=(2, 3), pool=[
               ["Dig in plenty of leaf mould in autumn and leave the ground rough over winter.",
                "In autumn, fork in lots of leaf mould and let the frost break up the clods."],
               ["Sow in modules under glass in {sow_month} rather than straight into cold ground.",
                "Start plants in modules under cover in {sow_month}; cold clay rots seed."],
               ["Plant out when the soil has warmed, usually around the middle of {plant_month}.",
                "Move plants outside once the soil warms, normally mid {plant_month}."],
               ["Raised beds about {n2} centimetres deep make a great difference on wet sites.",
                "On wet plots, raised beds roughly {n2} centimetres deep help a great deal."],
           ]),
           dict(kind="list", heading=["Varieties that did well", "Recommended varieties"], opt=0.7, n=(2, 4), pool=[
               ["{var1}, reliable even in a cold spring"], ["{var2}, good flavour and stores well"],
               ["{var3}, shorter and sturdier in wind"], ["A local strain saved by {name2} since the 1990s"]]),
           dict(kind="para", heading=["Pests and problems", "Troubles"], opt=0.8, n=(1, 2), pool=[
               ["Slugs are the main enemy on clay; {first1} uses beer traps and evening patrols.",
                "On clay the worst pest is the slug, which {first1} tackles with beer traps and torch-lit rounds."],
               ["Pigeons can strip young plants in a morning, so net them straight after planting.",
                "Net young plants immediately, as pigeons can clear a row in a single morning."],
           ]),
           dict(kind="para", heading=["Harvest and storage", "Lifting and keeping"], opt=0.7, n=(2, 4), pool=[
               ["{first1} starts lifting {crop} in {lift_month} and carries on as long as the ground allows.",
                "Lifting begins in {lift_month}, says {first1}, and continues for as long as the soil can be worked."],
               ["Anything damaged at harvest should be used first, as it will not keep.",
                "Use damaged specimens straight away, because they rot in store."],
               ["A cool shed at about {n1} degrees is ideal; a warm kitchen is not.",
                "Store them somewhere cool, around {n1} degrees, rather than in a warm kitchen."],
               ["Members with small plots found that sowing little and often gave a steadier supply.",
                "Several members with small plots said that small sowings every few weeks kept supplies steady."],
           ]),
           dict(kind="para", heading=["Questions from the floor", "Discussion"], opt=0.6, n=(2, 4), pool=[
               ["{name3} asked whether seaweed feed was worth the money; {first1} thought a home-made comfrey brew did as well.",
                "Asked by {name3} about seaweed feed, {first1} suggested home-made comfrey liquid works just as well."],
               ["Several members reported poor germination from one mail-order supplier this spring.",
                "This spring a number of members had poor germination from a single mail-order seed firm."],
               ["{name4} recommended a board to kneel on so that the soil is not compacted.",
                "To avoid compacting the soil, {name4} suggested kneeling on a plank."],
               ["The society's seed swap on {day2} will include some of {first1}'s saved seed.",
                "Some of {first1}'s own saved seed will be at the society seed swap on {day2}."],
               ["There was a lively debate about whether to dig at all, which the chairman wisely ended with tea.",
                "A heated argument about no-dig growing was ended, sensibly, by the chairman calling for tea."],
           ]),
       ])
CROPS = [("parsnips", ["Tender and True", "Gladiator Pale", "Hollow Crown Long"]),
         ("leeks", ["Musselburgh Blue", "Winter Giant", "Bandit Stalk"]),
         ("onions", ["Sturon Brown", "Red Baron Flat", "Keldwick Globe"]),
         ("broad beans", ["Aquadulce Claudia", "The Sutton Dwarf", "Witkiem Tall"]),
         ("sweet peas", ["Cupani Old", "Matucana Dark", "Wrenholt Blush"]),
         ("dahlias", ["Bishop of Fennick", "Cafe au Lait Pale", "Moonfire Low"])]


def facts_growing_notes(rng, site):
    f = base_facts(rng)
    c, v = rng.choice(CROPS)
    f["crop"], f["crop_cap"] = c, c[0].upper() + c[1:]
    f["var1"], f["var2"], f["var3"] = v
    pick(rng, f, "sow_month", ["February", "March", "April"])
    pick(rng, f, "plant_month", ["April", "May", "June"])
    pick(rng, f, "lift_month", ["August", "September", "October", "November"])
    return f


family("show_schedule",
       titles=["{season_cap} show {year}: schedule", "Schedule for the {season} show at {venue}", "{season_cap} show classes and rules"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["Our {season} show will be held at {venue} on {day}.",
                "This year the {season} show takes place on {day} at {venue}."],
               ["Entries must be staged between {time1} and 10.30am, when judging begins.",
                "Stage your entries from {time1}; judging starts at 10.30am sharp."],
               ["Entry is free for members and {price} pence per class for visitors.",
                "Members enter free; visitors pay {price} pence for each class."],
           ]),
           dict(kind="table", heading=["Classes", "Show classes"], builder="classes"),
           dict(kind="para", heading=["Rules", "Show rules"], n=(2, 3), pool=[
               ["All exhibits must have been grown by the exhibitor for at least {n1} weeks.",
                "Exhibitors must have grown every entry themselves for at least {n1} weeks."],
               ["The judge's decision, made by {name1} this year, is final.",
                "This year's judge is {name1}, whose decision is final."],
               ["Prize money will be paid at the tea tent after {time2}.",
                "Collect any prize money from the tea tent after {time2}."],
           ]),
       ])


def facts_show_schedule(rng, site):
    f = base_facts(rng)
    pick(rng, f, "season", ["spring", "summer", "autumn"])
    f["season_cap"] = f["season"].capitalize()
    pick(rng, f, "venue", ["the Keldwick village hall", "Sallowfield scout hut", "the Quillmere memorial hall",
                           "St Aldric's school hall"])
    pick(rng, f, "year", ["2026", "2027"])
    return f


# ---- ferry ---------------------------------------------------------------------------
ROUTES = [("Skerrin Quay", "Larkspur Bay"), ("Skerrin Quay", "Inchmurr"), ("Larkspur Bay", "Holm of Tarran"),
          ("Dunmarrow Pier", "Inchmurr"), ("Skerrin Quay", "Cobbold End")]
VESSELS = ["MV Guillemot", "MV Sound of Tarran", "MV Lady Elspeth", "MV Kittiwake", "MV Island Venture"]
family("service_update",
       titles=["{from_} to {to} sailings: {status}", "Service update for {day}: {from_} route", "{vessel}: {status}",
               "Disruption on the {to} crossing"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["Sailings between {from_} and {to} on {day} are {status} because of {reason}.",
                "Because of {reason}, crossings from {from_} to {to} on {day} are {status}."],
               ["The {time1} departure will be operated by {vessel}, which carries fewer cars.",
                "{vessel} will run the {time1} sailing; it has less space for vehicles."],
               ["Foot passengers can still travel on all remaining sailings.",
                "All remaining sailings will still take foot passengers."],
               ["We will review the forecast at {time2} and post the next update then.",
                "Our next update follows the {time2} forecast review."],
           ]),
           dict(kind="table", heading=["Revised sailings", "Today's sailings"], opt=0.6, builder="sailings"),
           dict(kind="para", heading=["If you have booked", "Existing bookings"], n=(1, 2), pool=[
               ["If your sailing is cancelled you can rebook free of charge or claim a full refund.",
                "Cancelled bookings can be moved at no cost or refunded in full."],
               ["Vehicles with bookings on cancelled sailings will be given priority on the next available crossing.",
                "Booked vehicles from cancelled crossings go first on the next sailing with space."],
               ["Island residents should show their resident card at the {from_} office.",
                "Residents of the islands should show their card at the {from_} ticket office."],
           ]),
       ])


def facts_service_update(rng, site):
    f = base_facts(rng)
    r = rng.choice(ROUTES)
    f["from_"], f["to"] = r
    pick(rng, f, "vessel", VESSELS)
    pick(rng, f, "status", ["cancelled", "at risk of cancellation", "running to a reduced timetable", "delayed by about an hour"])
    pick(rng, f, "reason", ["a gale warning", "a technical fault on the ramp", "low tide at the slipway",
                            "crew shortages", "thick fog in the sound"])
    return f


family("route_guide",
       titles=["Travelling to {to}", "{from_} to {to}: route guide", "Your crossing to {to}", "Guide to the {to} route"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["The crossing from {from_} to {to} takes about {mins} minutes.",
                "It is roughly {mins} minutes from {from_} to {to} by ferry."],
               ["{vessel} is the usual vessel on this route and carries up to {n2} cars.",
                "This route is normally served by {vessel}, with room for {n2} cars."],
               ["{to} has a shop, a post office and a cafe open from Easter to October.",
                "On {to} you will find a shop, a post office and a seasonal cafe."],
               ["The island's population is about {n3}, and it rises in the summer months.",
                "Around {n3} people live on {to}, with more in summer."],
           ]),
           dict(kind="table", heading=["Fares", "Single fares"], builder="fares"),
           dict(kind="list", heading=["Before you travel", "Good to know"], n=(2, 4), pool=[
               ["Check in at least {n2} minutes before departure with a vehicle"], ["Dogs travel free on a lead"],
               ["Bikes are carried free but space is limited"], ["There is no fuel on {to}"],
               ["Cash machines on the island are unreliable"], ["The cafe on board takes cards only"]]),
           dict(kind="para", heading=["On arrival", "When you get there"], opt=0.7, n=(1, 2), pool=[
               ["A minibus meets most sailings and goes to {place} village.",
                "Most sailings are met by a minibus to {place} village."],
               ["The slipway is steep, so take care walking off with luggage.",
                "Watch your footing on the steep slipway if you are carrying bags."],
           ]),
           dict(kind="para", heading=["History of the route", "A little history"], opt=0.6, n=(2, 4), pool=[
               ["A ferry has crossed to {to} since at least {year}, when a rowing boat carried the mail.",
                "Since {year} or earlier a boat has crossed to {to}, starting with a rowing boat for the mail."],
               ["The first car ferry, a converted landing craft, arrived in {year2}.",
                "In {year2} a converted landing craft became the first boat able to take cars."],
               ["Older islanders still call the crossing the {nickname}.",
                "Many older residents still know the crossing as the {nickname}."],
               ["The present slipway at {from_} was rebuilt after storm damage in {year3}.",
                "Storms damaged the {from_} slipway in {year3}, and it was rebuilt the following year."],
           ]),
       ])


def facts_route_guide(rng, site):
    f = base_facts(rng)
    r = rng.choice(ROUTES)
    f["from_"], f["to"] = r
    pick(rng, f, "vessel", VESSELS)
    pick(rng, f, "mins", ["20", "35", "45", "55", "70"])
    f["year"] = str(rng.randint(1780, 1890))
    f["year2"] = str(rng.randint(1948, 1972))
    f["year3"] = str(rng.randint(1990, 2020))
    pick(rng, f, "nickname", ["long pull", "mail run", "Tuesday boat", "grey crossing", "short sea"])
    return f


# ---- open-source wiki ------------------------------------------------------------
family("howto",
       titles=["How to {task}", "{task_cap}", "Guide: {task}", "HOWTO {task}"],
       sections=[
           dict(kind="para", heading=None, n=(2, 3), pool=[
               ["This page explains how to {task} with Quernstone {version}.",
                "Here we describe how to {task} using Quernstone {version}."],
               ["It assumes you have already cloned the repository and run the setup script.",
                "We assume the repository is cloned and the setup script has been run."],
               ["The steps were last tested by {handle} on {os}.",
                "{handle} last tested these steps on {os}."],
           ]),
           dict(kind="list", heading=["Steps", "Procedure"], n=(3, 6), pool=[
               ["Run quern doctor and fix anything it reports"], ["Create a branch named after the issue number"],
               ["Edit the file under {path}"], ["Run the test suite with quern test --fast"],
               ["Rebuild the docs with quern docs build"], ["Push the branch and open a merge request"],
               ["Ask {handle2} for a review in the chat channel"], ["Update the changelog fragment"]]),
           dict(kind="para", heading=["Troubleshooting", "Common problems"], n=(1, 3), pool=[
               ["If the build fails with a missing header, install the {pkg} development package.",
                "A missing header error usually means the {pkg} development package is not installed."],
               ["On {os} the cache lives in a different directory, so clear it by hand.",
                "The cache directory is different on {os}; delete it manually."],
               ["Slow tests can be skipped with the --quick flag, but CI will still run them.",
                "You can skip slow tests with --quick, though CI runs them anyway."],
           ]),
           dict(kind="para", heading=["Background", "Why it works this way"], opt=0.5, n=(2, 3), pool=[
               ["Before version {version} this was done by hand, which caused {n1} broken releases.",
                "Until {version} the job was manual, and that led to {n1} broken releases."],
               ["The current approach was proposed by {handle2} in a design note that is linked from the index.",
                "{handle2} proposed the present approach in a design note, linked from the index page."],
               ["It trades a slightly slower first run for much faster rebuilds afterwards.",
                "The first run is a little slower, but later rebuilds are far quicker."],
           ]),
           dict(kind="list", heading=["Checking your work", "Before you ask for review"], opt=0.5, n=(2, 4), pool=[
               ["The test suite passes locally"], ["New options are documented in the reference pages"],
               ["The changelog fragment names the issue number"], ["No debug output is left in the code"],
               ["Screenshots are attached for interface changes"]]),
           dict(kind="para", heading=["See also", "Related pages"], opt=0.5, n=(1, 1), pool=[
               ["The release checklist and the style guide cover related ground.",
                "For related topics, read the style guide and the release checklist."],
           ]),
       ])
TASKS = ["build the documentation locally", "add a new storage backend", "run the benchmarks",
         "cut a release candidate", "translate the user interface", "debug a failing plugin",
         "set up a development container", "profile memory use", "write a migration script"]


def facts_howto(rng, site):
    f = base_facts(rng)
    t = rng.choice(TASKS)
    f["task"], f["task_cap"] = t, t[0].upper() + t[1:]
    f["version"] = "%d.%d" % (rng.randint(2, 4), rng.randint(0, 12))
    f["handle"] = (f["first1"] + "_" + f["last1"][:3]).lower()
    f["handle2"] = (f["first2"][0] + f["last2"]).lower()
    pick(rng, f, "os", ["the Larkspur build image", "the old Tarran CI runner", "a 32-bit test board", "the offline laptop image", "the nightly container"])
    pick(rng, f, "path", ["src/quern/backends", "docs/source", "plugins/contrib", "tools/release"])
    pick(rng, f, "pkg", ["libquern", "quern-compress", "ledgerstore", "tessera-ffi"])
    return f


family("meeting_notes",
       titles=["Maintainers meeting, {day}", "Notes: maintainers call {day}", "Meeting notes {month} ({place})"],
       sections=[
           dict(kind="para", heading=None, n=(1, 2), pool=[
               ["Present: {name1}, {name2}, {name3} and {name4}; notes taken by {first3}.",
                "Attending were {name1}, {name2}, {name3} and {name4}, with {first3} taking notes."],
               ["The call lasted {n2} minutes and was held on the usual video link.",
                "We met for {n2} minutes over the regular video link."],
           ]),
           dict(kind="list", heading=["Decisions", "Agreed"], n=(2, 4), pool=[
               ["Version {version} will be the last to support the old plugin interface"], ["{first2} becomes release manager for {month}"],
               ["The {pkg} dependency will be pinned until the bug is fixed"], ["Weekly triage moves to {weekday}"],
               ["Security reports go to the private list only"]]),
           dict(kind="table", heading=["Actions", "Action items"], builder="actions"),
           dict(kind="para", heading=["Other business", "AOB"], opt=0.6, n=(1, 2), pool=[
               ["{first4} reported that the mirror in {place} has been slow since the upgrade.",
                "According to {first4}, the {place} mirror has been slow since it was upgraded."],
               ["The next meeting is on {day2}.", "We meet again on {day2}."],
           ]),
       ])


def facts_meeting_notes(rng, site):
    f = facts_howto(rng, site)
    pick(rng, f, "weekday", ["Monday", "Tuesday", "Wednesday", "Thursday"])
    return f


FACTS = {k: globals()["facts_" + k] for k in FAMILIES}


# ---- table builders ------------------------------------------------------------
def table(name, f, rng):
    if name == "phases":
        rows = [["Phase", "Street", "Start", "Weeks"]]
        for i, s in enumerate(rng.sample([f["street"], f["street2"], f["street3"], f["street4"]], rng.randint(2, 4))):
            rows.append([str(i + 1), s, date_text(rng)[0], str(rng.randint(2, 9))])
        return rows
    if name == "vetcosts":
        rows = [["Item", "Cost in pounds"]]
        for it in rng.sample(["Consultation", "Blood test", "X-ray", "Dental scale and polish", "Urine test",
                              "Follow-up check"], 3):
            rows.append([it, str(rng.randrange(25, 380, 5))])
        return rows
    if name == "cast":
        rows = [["Role", "Played by"]]
        for role in rng.sample(["Mother", "The Skipper", "Young Tom", "Mrs Pellowe", "The Harbourmaster",
                                "Narrator", "The Daughter", "Constable"], rng.randint(3, 5)):
            rows.append([role, rng.choice(FIRST) + " " + rng.choice(LAST)])
        return rows
    if name == "propfacts":
        return [["Feature", "Detail"], ["Rent", f["rent"] + " pcm"], ["Bedrooms", f["beds"]],
                ["Energy rating", f["epc"]], ["Council tax band", f["council_band"]], ["Available", f["day"]]]
    if name == "terms":
        rows = [["Term", "Starts", "Ends"]]
        for t in ["Autumn", "Spring", "Summer"]:
            rows.append([t, date_text(rng)[0], date_text(rng)[0]])
        return rows
    if name == "chapters":
        rows = [["Time", "Topic"]]
        m = 0
        for t in rng.sample(["Introductions", "How it started", "The hardest winter", "Tools of the trade",
                             "A listener question", "What comes next", "Where to find out more"], rng.randint(3, 5)):
            rows.append(["%02d:%02d" % (m, rng.randint(0, 59)), t])
            m += rng.randint(4, 14)
        return rows
    if name == "classes":
        rows = [["Class", "Description"]]
        for i, c in enumerate(rng.sample(["Three onions, dressed", "Five pods of broad beans", "A vase of sweet peas",
                                          "Heaviest marrow", "Three dahlia blooms", "A jar of jam",
                                          "Longest runner bean", "Children's vegetable animal"], rng.randint(3, 5))):
            rows.append([str(i + 1), c])
        return rows
    if name == "sailings":
        rows = [["Departs", "From", "Status"]]
        for h in sorted(rng.sample(range(7, 19), 3)):
            rows.append(["%02d:%02d" % (h, rng.choice([0, 15, 30, 45])), rng.choice([f["from_"], f["to"]]),
                         rng.choice(["Cancelled", "Running", "Delayed", "Under review"])])
        return rows
    if name == "fares":
        return [["Ticket", "Single fare"], ["Adult", "%d.%02d" % (rng.randint(4, 9), rng.choice([0, 50, 80]))],
                ["Child", "%d.%02d" % (rng.randint(2, 4), rng.choice([0, 40]))],
                ["Car up to 5 metres", "%d.00" % rng.randint(18, 45)], ["Bicycle", "Free"]]
    if name == "actions":
        rows = [["Owner", "Action"]]
        for a in rng.sample(["update the release checklist", "fix the flaky upload test", "email the mirror hosts",
                             "draft the funding report", "review open security issues", "tidy the wiki index"],
                            rng.randint(2, 4)):
            rows.append([rng.choice(FIRST), a])
        return rows
    raise KeyError(name)


# appended paragraphs for republication edits (per family kind, with slots)
APPEND = [
    "Update {day2}: this page was reissued after readers asked for the details to be repeated.",
    "Editor's note: we added this paragraph on {day2} after {name3} wrote in with a question.",
    "Correction made on {day2}: an earlier version gave the wrong contact name.",
    "This item was also shared in the {place3} community bulletin on {day2}.",
]
