"""Hand-written page families, part B: procurement portal, museum, insurer help, travel operator, statistics office."""
from .common import date_pair, person, date_str, time_str, money, TOWN, STREET, WEEKDAY, MONTH
from .engine import Family, Section, Opt, PARA
from .content_a import cap


# ====================================================================== tenders (procurement portal)
BUYERS = ["Harlow Cross County Council", "Cardale Water Board", "Netherwold Schools Partnership",
          "Saltreach Harbour Authority", "Gorsethwaite District Council", "Lanternfield Housing Trust"]
SUBJECTS = [("grounds maintenance for parks and cemeteries", "services"), ("school meal catering", "services"),
            ("road gritting vehicles", "supplies"), ("LED street lighting replacement", "works"),
            ("library book supply", "supplies"), ("office cleaning", "services"), ("harbour wall repairs", "works"),
            ("fleet tyre supply and fitting", "supplies"), ("playground equipment renewal", "works"),
            ("home care visits", "services"), ("IT hardware recycling", "services"), ("roof repairs to council houses", "works")]


def tender_facts(r):
    subj, kind = r.choice(SUBJECTS)
    qd, dl = date_pair(r, min_gap=10, max_gap=30)
    return dict(buyer=r.choice(BUYERS), subj=subj, Subj=cap(subj), kind=kind,
                ref=f"HCP-{r.randint(2025, 2026)}-{r.randint(100, 999)}", value=money(r, 60000, 4800000, 1000),
                years=str(r.randint(2, 5)), ext=r.choice(["one year", "two years", "up to two years"]), deadline=dl, t1=time_str(r, 10, 15),
                start=date_str(r, 2027), officer=person(r), lots=str(r.randint(2, 4)), town=r.choice(TOWN),
                q_deadline=qd, price=str(r.choice([40, 50, 60, 70])), quality=None,
                social=str(r.choice([5, 10, 15])), sites=str(r.randint(4, 60)))


def tender_facts_c(r):
    f = tender_facts(r)
    f["quality"] = str(100 - int(f["price"]) - int(f["social"]))
    return f


def tender_lots(r, f):
    rows = [["Lot", "Description", "Estimated value"]]
    areas = r.sample(["North", "South", "East", "West", "Central", "Coastal", "Upland"], int(f["lots"]))
    for i, a in enumerate(areas, 1):
        rows.append([str(i), f"{cap(f['subj'])} - {a} area", money(r, 20000, 900000, 500)])
    return rows


def tender_docs(r, f):
    pool = ["Specification and service levels", "Pricing schedule", "Draft contract terms",
            "Site list covering {sites} locations", "Social value questionnaire", "Insurance requirements",
            "TUPE information where staff may transfer", "Health and safety method statement template"]
    return [p.format(**f) for p in r.sample(pool, r.randint(3, 7))]


TEN_TENDER = Family(
    "tenders", "tender", "notices", tender_facts_c,
    ["{Subj} ({ref})", "Invitation to tender: {subj}", "{buyer}: {subj}"],
    [Section(None, [
        ["{buyer} invites tenders for {subj} across {town} and the surrounding district.",
         "Tenders are invited by {buyer} for {subj} in {town} and nearby areas."],
        ["The contract is for {years} years with the option to extend by {ext}, with an estimated total value of {value} pounds.",
         "An initial term of {years} years, extendable by {ext}, is offered; the estimated value is {value} pounds."],
        Opt(["Work is expected to start on {start}.",
             "The planned start date is {start}."]),
    ]),
     Section(["Lots", "Lot structure"], [
         ["The requirement is divided into {lots} lots, and suppliers may bid for one lot or several.",
          "Bidders may tender for any or all of the {lots} lots below."],
     ], table=tender_lots),
     Section(["Tender documents", "Documents"], [
         Opt(["The tender pack contains the following documents.",
              "These documents make up the tender pack for reference {ref}."]),
     ], items=tender_docs, opt=True, min_items=3),
     Section(["How bids will be evaluated", "Evaluation"], [
         ["Bids will be scored {price} percent on price, {quality} percent on quality and {social} percent on social value.",
          "The weighting is {price} percent price, {quality} percent quality and {social} percent social value."],
         Opt(["Quality answers are limited to five hundred words each and will be scored by a panel of three officers.",
              "A panel of three officers will mark the quality answers, each limited to five hundred words."]),
     ]),
     Section(["Social value and sustainability", "Social value"], [
         ["Suppliers will be asked how they will employ and train people from {town} during the contract.",
          "Bidders must explain how the contract will create jobs and training for people living in {town}."],
         Opt(["Vehicles used on the contract should meet the latest emission standard by the end of the second year.",
              "By the end of the second year, every vehicle used on the contract should meet the current emission standard."]),
         Opt(["{buyer} will publish a short annual report on the social value delivered.",
              "An annual summary of the social value achieved will be published by {buyer}."]),
     ], opt=True),
     Section(["Deadlines", "Key dates"], [
         ["Clarification questions must be submitted through the portal by {q_deadline}.",
          "Send any clarification questions via the portal no later than {q_deadline}."],
         ["Completed tenders must be uploaded by {t1} on {deadline}; late bids cannot be accepted.",
          "The deadline for tenders is {t1} on {deadline}, and the portal will not accept late uploads."],
         Opt(["The procurement officer for this notice is {officer}.",
              "{officer} is the named procurement officer."]),
     ])],
    extra=["A site visit can be arranged on request before {q_deadline}.",
           "Small and medium-sized suppliers are encouraged to bid for individual lots."],
    size=(120, 420))


def award_facts(r):
    subj, kind = r.choice(SUBJECTS)
    return dict(buyer=r.choice(BUYERS), subj=subj, Subj=cap(subj), ref=f"HCP-{r.randint(2025, 2026)}-{r.randint(100, 999)}",
                winner=r.choice(["Kelderby Grounds Ltd", "Saltreach Marine Works", "Pellowick Facilities Co-operative",
                                 "Brackwater Fleet Services", "Hatherwick Catering Partnership", "Tollbridge Lighting Ltd",
                                 "Emberley Care Collective", "Netherwold Building Services"]),
                value=money(r, 50000, 3900000, 1000), bids=str(r.randint(2, 14)), date=date_str(r),
                years=str(r.randint(2, 5)), officer=person(r), score=str(r.randint(61, 94)))


TEN_AWARD = Family(
    "tenders", "award", "awards", award_facts,
    ["Contract award: {subj}", "Award notice {ref}"],
    [Section(None, [
        ["{buyer} has awarded the contract for {subj} (reference {ref}) to {winner}.",
         "The {subj} contract, reference {ref}, has been awarded by {buyer} to {winner}."],
        ["The contract runs for {years} years from {date} and is worth {value} pounds.",
         "It is a {years} year contract starting {date}, valued at {value} pounds."],
        ["{bids} compliant bids were received and the winning bid scored {score} out of 100.",
         "Of {bids} compliant bids, the successful one scored {score} out of 100."],
        ["The contract will be managed by the {subj} team at {buyer} and reviewed each year against agreed service levels.",
         "Performance on the {subj} contract will be reviewed every year by {buyer} against the agreed service levels."],
        Opt(["Unsuccessful bidders have been offered feedback by {officer}.",
             "{officer} has offered feedback to every unsuccessful bidder."]),
    ])],
    extra=["A standstill period of ten days applied before the award was confirmed."],
    size=(60, 110))


# ====================================================================== museum
GALLERIES = ["the Ropewalk Gallery", "the Loom Room", "the Harbour Hall", "the Mezzanine", "the Print Shop gallery",
             "the Long Gallery"]
THEMES = [("Salt and Smoke", "the fish curing yards that lined the estuary"),
          ("Threads", "a century of home dressmaking and mending"),
          ("The Night Shift", "people who worked while the town slept"),
          ("Bread and Wages", "bakeries, co-operative stores and the price of a loaf"),
          ("Iron Road", "the branch line and the families who ran it"),
          ("Small Hands", "children at work in mills and farms"),
          ("Tide Tables", "pilots, ferrymen and the harbour office"),
          ("Brick by Brick", "the clay pits and kilns north of the town")]


def exhibition_facts(r):
    title, about = r.choice(THEMES)
    return dict(show=title, about=about, gallery=r.choice(GALLERIES), curator=person(r), opens=date_str(r),
                closes=date_str(r, 2027), n_obj=str(r.randint(40, 260)), lender=r.choice(
                    ["the Cardale county archive", "private collectors in {0}".format(r.choice(TOWN)),
                     "the Quarnby Wells history society", "families who answered our appeal"]),
                town=r.choice(TOWN), oral=str(r.randint(6, 40)), price=r.choice(["free with museum admission",
                                                                                  "four pounds for adults",
                                                                                  "pay what you can"]),
                talk_day=r.choice(WEEKDAY), t1=time_str(r, 11, 15), donor=r.choice(["the Saltreach Maritime Fund",
                                                                                     "an anonymous local donor",
                                                                                     "the Friends of the Museum"]),
                year1=str(r.randint(1850, 1900)), year2=str(r.randint(1930, 1985)))


def exhibition_items(r, f):
    pool = ["a working model of the harbour front as it stood in {year1}",
            "{oral} recorded memories from former workers and their children",
            "wage books, ration cards and letters lent by {lender}",
            "photographs taken in {town} between {year1} and {year2}",
            "a hands-on table where visitors can try the tools of the trade",
            "a map of every workplace in the district around {year2}",
            "a quiet corner with benches and a reading shelf"]
    return [cap(p.format(**f)) for p in r.sample(pool, r.randint(3, 6))]


MUS_EXHIBITION = Family(
    "museum", "exhibition", "exhibitions", exhibition_facts,
    ["{show}", "{show}: a new exhibition", "Exhibition: {show}"],
    [Section(None, [
        ["{show} tells the story of {about}, and opens in {gallery} on {opens}.",
         "Opening on {opens} in {gallery}, {show} explores {about}."],
        ["The exhibition brings together {n_obj} objects, many shown in public for the first time.",
         "More than {n_obj} objects are on display, many never exhibited before."],
        Opt(["It runs until {closes}.", "You can see it until {closes}."]),
    ]),
     Section(["About the exhibition", "The story"], [
         ["Curator {curator} spent two years gathering material, much of it lent by {lender}.",
          "Much of the material was lent by {lender}, after two years of work by curator {curator}."],
         ["The story starts around {year1} and follows the work through to {year2}, when the last of it came to an end in {town}.",
          "From about {year1} to {year2}, the displays follow the work until it disappeared from {town}."],
         Opt(["Visitors can listen to {oral} recorded conversations with people who remember it.",
              "Listening posts play {oral} interviews recorded with people who lived it."]),
     ]),
     Section(["Highlights", "What you will see"], [], items=exhibition_items, opt=True, min_items=3),
     Section(["Behind the scenes", "Making the exhibition"], [
         ["Conservators spent several months cleaning and stabilising the most fragile objects lent by {lender}.",
          "Before anything went on display, the conservation team spent months stabilising fragile items from {lender}."],
         Opt(["Volunteers transcribed more than {oral} hours of recordings so that every interview has a written version.",
              "Every interview has a printed transcript, thanks to volunteers who typed up more than {oral} hours of audio."]),
         Opt(["Families from {town} helped choose which photographs would be enlarged for the walls.",
              "The enlarged photographs on the walls were picked with the help of families from {town}."]),
     ], opt=True),
     Section(["Talks and tours", "Events"], [
         ["{curator} gives a free gallery talk every {talk_day} at {t1}.",
          "Every {talk_day} at {t1} there is a free talk in the gallery with {curator}."],
         Opt(["School groups can book a guided session with a handling box of objects.",
              "Schools may book a guided visit that includes a box of objects to handle."]),
     ], opt=True),
     Section(["Visiting", "Plan your visit"], [
         ["Entry to {show} is {price}.", "Admission to the exhibition is {price}."],
         Opt(["The exhibition is supported by {donor}.", "{donor} has supported the exhibition."]),
         Opt(["{gallery} is step-free and has seating throughout.",
              "There is step-free access to {gallery} and seating in every room."]),
     ])],
    extra=["A large print guide is available at the entrance to {gallery}.",
           "The museum shop stocks a booklet about {about}."],
    size=(100, 400))

OBJECTS = [("brass ship's bell", "brass"), ("hand-stitched wedding quilt", "cotton"), ("rope-maker's spinning wheel", "oak"),
           ("co-operative store till", "cast iron"), ("railway signal lamp", "tinplate"), ("clay pipe mould", "iron"),
           ("herring basket", "willow"), ("school slate and pencil case", "slate"), ("midwife's bag", "leather"),
           ("fire bucket", "leather")]


def object_facts(r):
    obj, mat = r.choice(OBJECTS)
    return dict(obj=obj, Obj=cap(obj), mat=mat, year=str(r.randint(1840, 1960)), donor=person(r), town=r.choice(TOWN),
                acc=f"SM.{r.randint(1950, 2025)}.{r.randint(1, 400)}", gallery=r.choice(GALLERIES),
                cm=str(r.randint(12, 140)), owner=person(r), trade=r.choice(["a harbour pilot", "a baker", "a weaver",
                                                                              "a signalman", "a midwife", "a fish curer"]))


MUS_OBJECT = Family(
    "museum", "object", "collection/objects", object_facts,
    ["Object of the month: {obj}", "{Obj}, about {year}"],
    [Section(None, [
        ["This {obj} was made around {year} and belonged to {owner}, {trade} in {town}.",
         "Made in about {year}, the {obj} was owned by {owner}, who worked as {trade} in {town}."],
        ["It is {cm} centimetres across and made mostly of {mat}.",
         "Mostly {mat}, it measures {cm} centimetres across."],
        ["{donor} gave it to the museum, and it is catalogued as {acc}.",
         "It came to us as a gift from {donor} (catalogue number {acc})."],
        ["Its surface shows the wear of daily use, with repairs made by hand over many years in {town}.",
         "Several old repairs show how long it stayed in daily use in {town} before it was put away."],
        Opt(["You can see it in {gallery} until the end of the month.",
             "It is on show in {gallery} for the rest of the month."]),
    ])],
    extra=["Conservators cleaned it by hand before it went on display."],
    size=(60, 100))


# ====================================================================== insurance (FAQ help centre)
TOPICS = [("make a claim for a burst pipe", "home"), ("add a named driver", "motor"), ("cover a bicycle away from home", "home"),
          ("claim for a cancelled holiday", "travel"), ("change the address on my policy", "home"),
          ("report a windscreen chip", "motor"), ("cover a student's belongings at university", "home"),
          ("claim for lost luggage", "travel"), ("cancel my policy in the cooling-off period", "any"),
          ("pay my premium monthly", "any"), ("insure a garden office", "home"), ("get cover while my car is abroad", "motor")]


def faq_facts(r):
    q, line = r.choice(TOPICS)
    qy = " ".join("your" if w == "my" else w for w in q.split())
    return dict(q=q, qy=qy, line=line, days=str(r.randint(3, 30)), excess=str(r.choice([50, 75, 100, 150, 250, 350])),
                limit=money(r, 500, 25000, 250), phone=f"0808 157 0{r.randint(100, 999)}",
                t1=time_str(r, 8, 9), t2=time_str(r, 17, 20), hours=str(r.choice([24, 48, 72])),
                fee=str(r.choice([0, 15, 20, 25, 30])), app=r.choice(["the Brightwell app", "your online account",
                                                                      "the customer portal"]),
                team=r.choice(["claims team", "policy services team", "customer care team"]),
                adviser=person(r), pct=str(r.randint(60, 95)))


def faq_items(r, f):
    pool = ["your policy number, which starts with the letters BM",
            "the date and time the problem happened",
            "photographs of the damage taken before anything is thrown away",
            "receipts or bank statements showing what you paid",
            "a crime reference number if anything was stolen",
            "the name and insurer of anyone else involved",
            "a contact number where the {team} can reach you between {t1} and {t2}"]
    return [cap(p.format(**f)) for p in r.sample(pool, r.randint(3, 6))]


INS_FAQ = Family(
    "insurance", "faq", "help/answers", faq_facts,
    ["How do I {q}?", "Can I {q}?", "Help: how to {q}"],
    [Section(None, [
        ["Yes, you can {qy} through {app} or by calling our {team} on {phone}.",
         "You can {qy} in {app}, or phone the {team} on {phone}."],
        ["Lines are open {t1} to {t2} on weekdays, and most requests are dealt with in a single call.",
         "Our phone lines are staffed from {t1} until {t2}, Monday to Friday."],
        Opt(["About {pct} percent of customers finish this online without needing to speak to us.",
             "Most customers, about {pct} percent, complete this online in a few minutes."]),
    ]),
     Section(["What you will need", "Before you start"], [
         Opt(["Have these details ready before you start.",
              "It is quicker if you gather the following first."]),
     ], items=faq_items, min_items=3),
     Section(["What happens next", "After you contact us"], [
         ["We aim to reply within {hours} hours, and we will tell you straight away if we need anything else.",
          "Expect a reply within {hours} hours; if anything is missing we will ask for it promptly."],
         Opt(["An excess of {excess} pounds applies to most claims of this kind.",
              "Most claims like this carry an excess of {excess} pounds."]),
         Opt(["The most we will pay under this part of the policy is {limit} pounds.",
              "This section of the policy has a limit of {limit} pounds."]),
         Opt(["There is an administration fee of {fee} pounds for this change.",
              "We charge {fee} pounds to make this change."]),
     ], opt=True),
     Section(["Things to check first", "Common questions"], [
         ["Check your policy schedule in {app} to see whether this is covered, because cover differs between {line} policies.",
          "Cover varies between {line} policies, so look at your schedule in {app} before you start."],
         Opt(["If you pay monthly, a missed payment may pause your cover until it is settled.",
              "Monthly payers should know that cover can pause if a payment is missed."]),
         Opt(["Changes made within {days} days of renewal are usually free of charge.",
              "There is normally no charge for changes made in the {days} days after renewal."]),
     ], opt=True),
     Section(["Still need help?", "Talk to us"], [
         Opt(["If your situation is unusual, ask to speak to a senior adviser such as {adviser}.",
              "For unusual cases you can ask for a senior adviser; {adviser} leads that team."]),
     ], opt=True)],
    extra=["Calls may be recorded for training purposes.",
           "You can track progress at any time in {app}."],
    size=(60, 250))


# ====================================================================== travel operator
REGIONS = [("the Cardale Fells", "walking"), ("the Saltreach coast path", "walking"), ("the Netherwold canals", "cycling"),
           ("the Kelderby moors", "walking"), ("the Lanternfield lakes", "cycling"),
           ("the Harrowdene valleys", "cycling")]
INNS = ["the Drover's Rest", "Wickhollow Farmhouse", "the Old Customs House", "Tarn End Guesthouse", "the Ferryman Inn",
        "Hatherwick Lodge", "Brackwater Mill Hotel", "the Signal Box B&B"]


def itin_facts(r):
    reg, act = r.choice(REGIONS)
    inns = r.sample(INNS, 4)
    towns = r.sample(TOWN, 5)
    return dict(region=reg, act=act, nights=str(r.randint(3, 7)), price=money(r, 390, 1900, 5), km=str(r.randint(9, 24)),
                km2=str(r.randint(30, 90)), inn1=inns[0], inn2=inns[1], inn3=inns[2], inn4=inns[3], t1=towns[0],
                t2=towns[1], t3=towns[2], t4=towns[3], t5=towns[4], guide=person(r), station=f"{towns[0]} station",
                months=r.choice(["April to October", "May to September", "March to November", "June to August"]),
                grade=r.choice(["easy", "moderate", "challenging"]), single=str(r.choice([80, 120, 150, 190])),
                group=str(r.randint(6, 14)))


def itin_table(r, f):
    rows = [["Day", "Route", "Distance", "Overnight"]]
    n = int(f["nights"]) + 1
    stops = [f["t1"], f["t2"], f["t3"], f["t4"], f["t5"]]
    inns = [f["inn1"], f["inn2"], f["inn3"], f["inn4"]]
    for d in range(1, min(n, 7) + 1):
        route = f"{stops[d - 1]} to {stops[d]}" if d <= 4 else f"Circular route from {stops[4]}"
        rows.append([f"Day {d}", route, f"{r.randint(8, 26)} km", inns[(d - 1) % 4] if d < n else "Departure"])
    return rows


def itin_items(r, f):
    pool = ["{nights} nights in hand-picked inns and guesthouses", "breakfast every day and {nights} packed lunches",
            "luggage moved between overnight stops", "detailed route notes and maps", "a welcome briefing with {guide}",
            "emergency support by phone throughout", "transfers from {station} on the first day"]
    return [cap(p.format(**f)) for p in r.sample(pool, r.randint(3, 6))]


TRV_ITIN = Family(
    "travel", "itinerary", "holidays", itin_facts,
    ["{region}: {nights} nights of {act}", "Self-guided {act} in {region}", "{act} holiday: {t1} to {t5}"],
    [Section(None, [
        ["This self-guided {act} holiday takes you through {region} over {nights} nights, from {t1} to {t5}.",
         "Over {nights} nights you travel under your own steam through {region}, starting in {t1} and finishing at {t5}."],
        ["Prices start at {price} pounds per person sharing, and the trip runs from {months}.",
         "From {price} pounds per person, sharing a room; departures run {months}."],
        Opt(["We grade it as {grade}, with daily distances of about {km} kilometres on foot or {km2} by bike.",
             "The grade is {grade}: expect around {km} kilometres a day walking, or {km2} cycling."]),
    ]),
     Section(["Day by day", "Itinerary"], [
         ["Each day ends at a small inn or guesthouse, and your luggage goes ahead of you.",
          "Your bags are carried ahead each morning to the next inn, starting with {inn1}."],
     ], table=itin_table),
     Section(["The route", "About the route"], [
         ["The first day is the gentlest, following old drove roads out of {t1} before a short climb to {t2}.",
          "You ease in on day one along drove roads from {t1}, with one short climb before {t2}."],
         ["The longest stage, between {t3} and {t4}, is best started early so that you reach {inn3} in daylight.",
          "Start early on the stage from {t3} to {t4}, the longest of the trip, to arrive at {inn3} before dark."],
         Opt(["There are cafes in {t2} and {t4}, but the middle days have few places to buy food.",
              "Food stops are easy in {t2} and {t4}; on the middle days carry your lunch."]),
     ], opt=True),
     Section(["What is included", "Included"], [], items=itin_items, min_items=3, opt=True),
     Section(["Good to know", "Before you book"], [
         ["The nearest railway station is {station}, and we can arrange a transfer on the first afternoon.",
          "Arrive by train at {station}; a transfer to {inn1} can be booked."],
         Opt(["Solo travellers pay a supplement of {single} pounds.",
              "A single supplement of {single} pounds applies."]),
         Opt(["Our route planner {guide} walks or rides every route before the season opens.",
              "{guide} checks each route in person before the first departure of the season."]),
         Opt(["Small groups of up to {group} friends can book the same dates and stay together.",
              "Groups of up to {group} can travel together on the same departure."]),
     ], opt=True)],
    extra=["Dogs are welcome at {inn2} and {inn3}.",
           "Route notes are also available as a phone download."],
    size=(100, 420))


def update_facts(r):
    dd = date_pair(r, min_gap=5, max_gap=60)
    return dict(route=r.choice(["the {0} ferry".format(r.choice(TOWN)), "the coast path near {0}".format(r.choice(TOWN)),
                                "the branch line to {0}".format(r.choice(TOWN)),
                                "the mountain road over {0} pass".format(r.choice(["Gorse", "Kelder", "Wyke"]))]),
                date=dd[0], date2=dd[1], reason=r.choice(["a landslip", "storm damage", "engineering work",
                                                                        "a bridge inspection", "flooding"]),
                alt=r.choice(["a replacement minibus", "a signed diversion inland", "an extra night at the previous inn",
                              "a later ferry crossing"]),
                extra_km=str(r.randint(2, 9)), contact=person(r), region=r.choice(REGIONS)[0])


TRV_UPDATE = Family(
    "travel", "travel-update", "updates", update_facts,
    ["Travel update: {route}", "Disruption on {route} from {date}"],
    [Section(None, [
        ["From {date}, {route} in {region} is affected by {reason}.",
         "Because of {reason}, {route} in {region} is disrupted from {date}."],
        ["Guests booked on affected departures will be offered {alt}, adding about {extra_km} kilometres or an hour to the day.",
         "Where a departure is affected we will arrange {alt}, which adds roughly {extra_km} kilometres or an hour."],
        ["Bookings on unaffected dates go ahead exactly as planned, and there is no need to call us about {route}.",
         "If your dates are not affected, nothing changes and you do not need to contact us about {route}."],
        Opt(["We expect normal arrangements to return by {date2}.", "Normal routes should resume around {date2}."]),
        Opt(["Your trip coordinator, {contact}, will contact you directly if you are affected.",
             "{contact} will be in touch personally with anyone affected."]),
    ])],
    extra=["There is no charge for these changes."],
    size=(60, 100))


# ====================================================================== stats (statistics bulletin)
MEASURES = [("house prices", "average house price", "pounds"), ("employment", "employment rate", "percent"),
            ("visitor numbers", "overnight visitors", "thousand"), ("retail sales", "retail sales index", "index points"),
            ("population", "resident population", "thousand"), ("bus use", "bus journeys", "thousand"),
            ("farm output", "farm output index", "index points"), ("household energy use", "average annual use", "kWh")]
DISTRICTS = ["Cardale North", "Cardale South", "Kelderby", "Saltreach", "Netherwold", "Gorsethwaite", "Marrowby"]


def bulletin_facts(r):
    topic, measure, unit = r.choice(MEASURES)
    q = r.choice(["first quarter", "second quarter", "third quarter", "fourth quarter"])
    hi, lo = r.sample(DISTRICTS, 2)
    return dict(topic=topic, Topic=cap(topic), measure=measure, unit=unit, q=q, year=str(r.choice([2025, 2026])),
                chg=f"{r.randint(1, 9)}.{r.randint(0, 9)}", dir=r.choice(["rose", "fell"]),
                hi=hi, lo=lo, stat=person(r), date=date_str(r),
                next=date_str(r), resp=str(r.randint(1200, 9800)), rate=str(r.randint(48, 81)),
                email=r.choice(["bulletins", "economy.stats", "population.stats", "enquiries"]))


def bulletin_table(r, f):
    rows = [["District", "This quarter", "Previous quarter", "Change"]]
    for d in r.sample(DISTRICTS, r.randint(4, 7)):
        a = r.randint(80, 990)
        b = a + r.randint(-40, 40)
        rows.append([d, str(a), str(b), f"{a - b:+d}"])
    return rows


def bulletin_items(r, f):
    pool = ["{measure} {dir} by {chg} percent compared with the same quarter last year",
            "the largest change was in {hi}, the smallest in {lo}",
            "figures for {lo} are provisional and may be revised",
            "the survey achieved a response rate of {rate} percent",
            "seasonally adjusted and unadjusted series moved in the same direction",
            "{hi} has now recorded growth for three quarters in a row"]
    return [cap(p.format(**f)) for p in r.sample(pool, r.randint(3, 5))]


STA_BULLETIN = Family(
    "stats", "bulletin", "bulletins", bulletin_facts,
    ["{Topic} in Cardale: {q} {year}", "Statistical bulletin: {topic}, {q} {year}", "{Topic}, {q} {year}"],
    [Section(None, [
        ["This bulletin reports {topic} in the Cardale region for the {q} of {year}.",
         "Figures in this bulletin cover {topic} across Cardale in the {q} of {year}."],
        ["The {measure} {dir} by {chg} percent on a year earlier.",
         "Compared with a year before, the {measure} {dir} {chg} percent."],
    ]),
     Section(["Main points", "Key findings"], [], items=bulletin_items, min_items=2),
     Section(["Figures by district", "District results"], [
         ["The table shows the {measure} by district, in {unit}.",
          "Results for each district are given below in {unit}."],
     ], table=bulletin_table),
     Section(["Longer-term trend", "Trend"], [
         ["Over the past five years the {measure} in {hi} has moved further from the regional average than any other district.",
          "Since five years ago, {hi} has drifted further from the regional average {measure} than any other district."],
         Opt(["{lo} has stayed closest to the regional figure throughout the period.",
              "Throughout the period {lo} tracked the regional figure most closely."]),
         Opt(["The {q} has shown the largest seasonal swing in three of the last five years.",
              "In three of the last five years, the largest seasonal swing came in the {q}."]),
     ], opt=True),
     Section(["About these figures", "Methods and quality"], [
         ["The estimates are based on {resp} survey returns and administrative records.",
          "We used {resp} survey responses together with administrative data."],
         Opt(["Small differences between districts should be treated with caution.",
              "Differences of less than one percent between districts are within the margin of error."]),
         Opt(["Revisions to earlier quarters are marked in the accompanying data tables.",
              "Where earlier quarters have been revised, the data tables say so."]),
     ], opt=True),
     Section(["Contact", "Further information"], [
         ["The statistician responsible is {stat}, who can be contacted at {email}@stats.cardale.test.",
          "Questions go to {stat} at {email}@stats.cardale.test."],
         Opt(["The next bulletin will be published on {next}.", "Next publication: {next}."]),
     ])],
    extra=["All figures are rounded independently, so totals may not add up.",
           "An easy read version of this bulletin is available on request."],
    size=(90, 420))


def revision_facts(r):
    topic, measure, unit = r.choice(MEASURES)
    old = r.randint(10, 95)
    new = old + r.choice([-7, -5, -3, -2, 2, 3, 4, 6])
    return dict(topic=topic, measure=measure, q=r.choice(["first", "second", "third", "fourth"]),
                year=str(r.choice([2025, 2026])), old=f"{old // 10}.{old % 10}",
                new=f"{new // 10}.{new % 10}", dist=r.choice(DISTRICTS), date=date_str(r),
                cause=r.choice(["late survey returns", "a processing error in the weighting step",
                                "a change to administrative records", "a duplicated batch of responses"]),
                stat=person(r))


STA_REVISION = Family(
    "stats", "revision", "revisions", revision_facts,
    ["Revision to {topic} figures", "Correction: {topic}, {q} quarter {year}"],
    [Section(None, [
        ["On {date} we revised the {q} quarter {year} estimate of {measure} for {dist} from {old} to {new} percent.",
         "The {measure} estimate for {dist} in the {q} quarter of {year} has been revised from {old} to {new} percent, as of {date}."],
        ["The revision follows {cause}.", "This change was caused by {cause}."],
        ["Updated tables for the {q} quarter have been published alongside this notice, and the earlier files for {dist} have been withdrawn.",
         "Corrected tables for {dist} and the region are now online and replace the files issued earlier."],
        Opt(["Regional totals are not materially affected.", "The effect on the regional total is negligible."]),
        Opt(["We apologise for the error; {stat} can answer questions about it.",
             "Please direct questions about the revision to {stat}."]),
    ])],
    extra=["The corrected tables replace the earlier versions."],
    size=(60, 100))


FAMILIES_B = [TEN_TENDER, TEN_AWARD, MUS_EXHIBITION, MUS_OBJECT, INS_FAQ, TRV_ITIN, TRV_UPDATE, STA_BULLETIN,
              STA_REVISION]
