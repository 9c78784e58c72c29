#!/usr/bin/env python3
"""Blind benchmark corpus generator: near-duplicate detection under heavy site templates.

All text below is hand-written for this corpus; the script only combines it.
Standard library only, deterministic (fixed seed).  Run:  python3 make_corpus.py
"""
import datetime, html, json, os, random, re, shutil, itertools

SEED = 20261202
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "out")

# ---------------------------------------------------------------------------
# Slot pools (invented places, streets, names)
# ---------------------------------------------------------------------------
TOWNS = ["Ashcombe", "Kelby Cross", "Tarnwick", "Elmsford Green", "Hollin Bridge", "Marrow Vale",
         "Ostley", "Penhallow", "Quarry End", "Sandleigh", "Westbury Fold", "Brackenmoor",
         "Dunmere", "Fenwold", "Gallow Hill", "Larkstone", "Nether Ambry", "Ravensett",
         "Stowick", "Upper Caddon", "Wychcombe", "Yarrow Heath", "Corbin Mill", "Lowhaven"]
STREET_A = ["Mill", "Church", "Orchard", "Station", "Tanner", "Quarry", "Rope", "Vicarage", "Kiln",
            "Foundry", "Meadow", "Pinfold", "Chantry", "Weaver", "Cooper", "Sheep", "Ferry",
            "Beacon", "Linden", "Garth", "Priory", "Saddler", "Barley", "Heron"]
STREET_B = ["Lane", "Road", "Street", "Close", "Row", "Way", "Walk", "Terrace", "Crescent", "Gardens"]
PEOPLE = ["Mara Vennick", "Tobias Ardley", "Ines Halloway", "Ruth Carrow", "Declan Oyelaran",
          "Priya Marchetti", "Samuel Threlfall", "Hedda Kristiansen", "Owen Pascoe", "Lena Drubek",
          "Femi Adeyinka", "Clara Boswell", "Rafael Montane", "Greta Whitlock", "Anselm Roud"]
VENUES = ["the Corn Exchange", "St Aldric's Hall", "the Old Drill Hall", "the Riverside Pavilion",
          "Larkstone Community Centre", "the Guildhall Annexe", "the Market House",
          "Fenwold Village Hall", "the Quayside Rooms", "the Tithe Barn"]
MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August",
          "September", "October", "November", "December"]
WEEKDAYS = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"]


def fdate(d):
    return "%d %s %d" % (d.day, MONTHS[d.month - 1], d.year)


def fday(d):
    return "%s %d %s" % (WEEKDAYS[d.weekday()], d.day, MONTHS[d.month - 1])


def street(rng):
    return "%s %s" % (rng.choice(STREET_A), rng.choice(STREET_B))


def streets(rng, n):
    out = []
    while len(out) < n:
        s = street(rng)
        if s not in out:
            out.append(s)
    return out


def rdate(rng):
    return datetime.date(2026, 1, 5) + datetime.timedelta(days=rng.randrange(0, 330))


def rtime(rng, lo=6, hi=20):
    return "%02d:%s" % (rng.randrange(lo, hi), rng.choice(["00", "15", "30", "45"]))


def phone(rng):
    return "01632 %03d %03d" % (rng.randrange(100, 999), rng.randrange(100, 999))

# Blocks: ("h", text) heading, ("p", text), ("ul", [items]), ("table", [header], [[row]...])

# ---------------------------------------------------------------------------
# Notice families: hand-written form letters with alternative sentences and slots
# ---------------------------------------------------------------------------
ADVICE_WATER = [
    "Fill a kettle and a few bottles with drinking water before the work begins.",
    "Avoid running the washing machine or dishwasher while the supply is off.",
    "When the water returns it may look cloudy for a short time; this is air and will clear.",
    "Run your cold kitchen tap for a couple of minutes before drinking once supply is restored.",
    "If you rely on water for a medical device, call us now so we can arrange bottled supplies.",
    "Do not use any combination boiler until the pressure has fully returned.",
    "Check on elderly neighbours who may not have seen this notice.",
]


def fam_water(rng, short=False):
    area = rng.choice(TOWNS)
    d = rdate(rng)
    t1 = rtime(rng, 7, 11); t2 = rtime(rng, 13, 17)
    sts = streets(rng, rng.randrange(3, 6))
    ref = "WS-%05d" % rng.randrange(10000, 99999)
    main = rng.choice(["Ostley Road", "Kiln Bank", "Priory Fields", "Sheep Street", "Ferry Lane", "Heron Walk"])
    b = [("h", "Planned interruption to water supply in %s" % area)]
    b.append(("p", rng.choice([
        "We will be carrying out essential repairs to the trunk main under %s on %s. To do this safely we need to turn off the supply to some homes and businesses in %s between %s and %s." % (main, fday(d), area, t1, t2),
        "Our engineers need to replace a section of ageing pipe beneath %s, and the work is booked for %s. Properties in parts of %s will be without water from %s until roughly %s." % (main, fday(d), area, t1, t2),
        "On %s a crew will connect a new valve to the main running along %s. While they work, the supply to several streets in %s will be off from %s, and we expect it back by %s." % (fday(d), main, area, t1, t2),
    ])))
    if not short:
        b.append(("h", "Streets affected"))
        if rng.random() < 0.6:
            rows = []
            for s in sts:
                rows.append([s, "%s" % rng.choice(["Numbers 1 to 40", "Odd numbers only", "Whole street", "Numbers 2 to 58", "Flats 1 to 24"]), rng.choice([t1, rtime(rng, 7, 11)])])
            b.append(("table", ["Street", "Properties", "Supply off from"], rows))
        else:
            b.append(("ul", sts))
    else:
        b.append(("p", "The streets affected are %s and %s." % (", ".join(sts[:-1]), sts[-1])))
    b.append(("p", rng.choice([
        "Please take a few simple steps to get ready:",
        "To make the day easier, we suggest the following:",
        "A little preparation will help while the water is off:",
    ])))
    b.append(("ul", rng.sample(ADVICE_WATER, 3 if short else rng.randrange(3, 6))))
    b.append(("p", rng.choice([
        "If the work finishes early we will restore supply straight away. Quote reference %s if you call us on %s." % (ref, phone(rng)),
        "We are sorry for the inconvenience. For updates on the day, call %s and quote %s." % (phone(rng), ref),
        "The reference for this job is %s. Our customer line on %s is open from 8am to 8pm." % (ref, phone(rng)),
    ])))
    return "water", b


def fam_power(rng, short=False):
    area = rng.choice(TOWNS)
    d = rdate(rng)
    t1 = rtime(rng, 8, 10); t2 = rtime(rng, 14, 17)
    sub = "%s %s" % (rng.choice(["Tarn", "Kelby", "Mill", "Beacon", "Garth", "Linden"]), rng.choice(["primary substation", "switching station", "pole transformer"]))
    ref = "PN/%d/%04d" % (d.year, rng.randrange(1000, 9999))
    sts = streets(rng, rng.randrange(2, 5))
    b = [("h", "Electricity network upgrade: %s" % area)]
    b.append(("p", rng.choice([
        "We are upgrading equipment at the %s which feeds homes in %s. The work takes place on %s and power will be switched off between %s and %s." % (sub, area, fday(d), t1, t2),
        "To keep supplies reliable in %s we are replacing cables connected to the %s. On %s the electricity to your address will be off from %s to %s." % (area, sub, fday(d), t1, t2),
    ])))
    if not short:
        b.append(("p", rng.choice([
            "The outage affects %s. Street lighting on these roads will also be off, although it is daylight for the whole of the planned window." % ", ".join(sts),
            "Customers on %s will be affected. If you have a mobility scooter or stairlift, please make sure it is fully charged the evening before." % ", ".join(sts),
            "Homes on %s are included. Businesses with refrigerated stock may wish to move it or arrange a generator." % ", ".join(sts),
        ])))
        b.append(("h", "What you should do"))
        b.append(("ul", rng.sample([
            "Switch off sensitive equipment such as computers and televisions at the wall.",
            "Keep fridge and freezer doors closed; food will stay cold for several hours.",
            "Do not touch any of our equipment or temporary barriers in the street.",
            "Treat every cable as live until our engineers have left the site.",
            "Have a torch ready in case the work overruns into the evening.",
            "Tell us if anyone in your household is on our priority services register.",
        ], rng.randrange(3, 5))))
    b.append(("p", rng.choice([
        "Your reference is %s. If the power is not back by %s, call our free number 0800 555 %03d." % (ref, t2, rng.randrange(100, 999)),
        "Please keep this letter. If you have questions, quote %s when you contact us." % ref,
    ])))
    return "power", b


DIVERSIONS = ["via the A-road ring route and Beacon Hill", "along Kiln Bank and back through the market square",
              "using the bypass and the old quarry road", "through the industrial estate and Ferry Lane",
              "by way of Stowick Road and the Linden roundabout"]


def fam_road(rng, short=False):
    town = rng.choice(TOWNS)
    st = street(rng)
    d1 = rdate(rng); d2 = d1 + datetime.timedelta(days=rng.randrange(2, 30))
    order = "Traffic Regulation Order %d/%03d" % (d1.year, rng.randrange(10, 400))
    reason = rng.choice(["resurfacing the carriageway", "replacing a collapsed drain", "gas main renewal",
                         "installing a new pedestrian crossing", "repairs to the retaining wall",
                         "laying fibre ducts", "bridge parapet strengthening"])
    b = [("h", "Temporary road closure: %s, %s" % (st, town))]
    b.append(("p", rng.choice([
        "Notice is given that %s in %s will be closed to through traffic from %s to %s to allow %s. The closure is made under %s." % (st, town, fdate(d1), fdate(d2), reason, order),
        "From %s until %s, %s, %s, will be shut to vehicles while contractors carry out %s. This notice is issued under %s." % (fdate(d1), fdate(d2), st, town, reason, order),
        "The highway authority has made %s closing %s in %s between %s and %s. The closure is needed for %s." % (order, st, town, fdate(d1), fdate(d2), reason),
    ])))
    if not short:
        b.append(("h", "Diversion"))
        b.append(("p", rng.choice([
            "A signed diversion will be in place %s. Drivers should allow an extra ten minutes." % rng.choice(DIVERSIONS),
            "Traffic will be directed %s. Expect queues at peak times." % rng.choice(DIVERSIONS),
        ])))
        if rng.random() < 0.5:
            phases = []
            dd = d1
            for i, part in enumerate(rng.sample(["North end", "South end", "Junction with %s" % street(rng), "Central section", "Bridge approach"], 3)):
                e = dd + datetime.timedelta(days=rng.randrange(2, 8))
                phases.append(["Phase %d" % (i + 1), part, fdate(dd), fdate(e)])
                dd = e + datetime.timedelta(days=1)
            b.append(("table", ["Phase", "Section", "Start", "End"], phases))
        b.append(("ul", rng.sample([
            "Pedestrian access to homes and shops will be maintained at all times.",
            "Emergency vehicles will be let through the works.",
            "Bus stops on the closed section will be suspended.",
            "Parking bays on the street will be suspended for the duration.",
            "Refuse collections will take place as normal from the end of the road.",
            "Cyclists must dismount and walk through the site.",
        ], 3)))
    b.append(("p", rng.choice([
        "Enquiries should be made to the Streetworks Team on %s, quoting %s." % (phone(rng), order),
        "For questions about this closure contact the Network Management Officer, %s, on %s." % (rng.choice(PEOPLE), phone(rng)),
    ])))
    return "road", b


def fam_planning(rng, short=False):
    town = rng.choice(TOWNS)
    addr = "%d %s, %s" % (rng.randrange(1, 120), street(rng), town)
    ref = "%s/%d/%04d/%s" % (rng.choice(["RV", "KC", "TW"]), 26, rng.randrange(1, 2999), rng.choice(["FUL", "HOU", "LBC", "OUT"]))
    prop = rng.choice([
        "erection of a two-storey rear extension and a detached garden office",
        "change of use from a retail unit to a café with outdoor seating",
        "demolition of a garage and construction of two semi-detached dwellings",
        "installation of eight solar panels on a listed barn roof",
        "conversion of a former chapel into four flats with cycle storage",
        "replacement of timber sash windows with double-glazed units",
        "construction of a single-storey agricultural storage building",
        "outline permission for up to fourteen homes with access from the lane",
    ])
    d = rdate(rng); dl = d + datetime.timedelta(days=21)
    b = [("h", "Planning application %s" % ref)]
    b.append(("p", rng.choice([
        "An application has been received for the %s at %s. The applicant is %s." % (prop, addr, rng.choice(PEOPLE)),
        "The planning authority has received proposals for the %s at %s, submitted on behalf of %s." % (prop, addr, rng.choice(PEOPLE)),
    ])))
    b.append(("p", rng.choice([
        "The plans and supporting documents can be viewed online using the reference above, or at the main library during opening hours.",
        "You can inspect the drawings at the planning reception desk or on the online register by searching for the reference number.",
        "Paper copies of the application are available for inspection at the town hall; the full file is also published online.",
    ])))
    if not short:
        b.append(("h", "Making comments"))
        b.append(("ul", rng.sample([
            "Comments must be made in writing and include your name and postal address.",
            "Anonymous comments cannot be taken into account.",
            "Only material planning considerations, such as overlooking, parking and design, can be considered.",
            "Loss of a private view and effects on property values are not planning matters.",
            "Your comments will be published on the register with your signature removed.",
            "Petitions should name a lead petitioner who will receive correspondence.",
        ], 4)))
        b.append(("p", rng.choice([
            "This application affects the setting of a conservation area and has been advertised in the press.",
            "The site lies within a flood zone and the lead local flood authority has been consulted.",
            "The proposal departs from the local plan and may be referred to the planning committee.",
            "Neighbouring occupiers have been sent individual letters about this proposal.",
        ])))
    b.append(("p", rng.choice([
        "Representations must be received by %s. Decisions are usually made within eight weeks of validation." % fdate(dl),
        "The closing date for comments is %s. Any comments received after this date may not be considered." % fdate(dl),
    ])))
    return "planning", b


def fam_bins(rng, short=False):
    hol, d = rng.choice([("the Christmas and New Year holidays", datetime.date(2026, 12, 24)),
                         ("the Easter bank holiday", datetime.date(2026, 4, 3)),
                         ("the late May bank holiday", datetime.date(2026, 5, 25)),
                         ("the August bank holiday", datetime.date(2026, 8, 31)),
                         ("the early May bank holiday", datetime.date(2026, 5, 4))])
    d = d + datetime.timedelta(days=rng.choice([-1, 0, 0, 1]))
    area = rng.choice(TOWNS)
    b = [("h", "Bin collections over %s" % hol.replace("the ", "", 1))]
    b.append(("p", rng.choice([
        "Collection days for households in %s will change over %s. Please put your bins out by 6.30am on the new day shown below." % (area, hol),
        "Because of %s, rounds covering %s will run later than usual. Check the table for your revised collection day." % (hol, area),
        "Our crews will be working through %s, but some days move. Residents in %s should use the revised dates below." % (hol, area),
    ])))
    rows = []
    dd = d
    for i in range(3 if short else rng.randrange(4, 7)):
        nd = dd + datetime.timedelta(days=rng.choice([1, 1, 2]))
        rows.append([fday(dd), fday(nd), rng.choice(["General waste", "Recycling", "Garden waste", "Food waste", "Recycling and food"])])
        dd = dd + datetime.timedelta(days=1)
    b.append(("table", ["Normal day", "Revised day", "Bin"], rows))
    if not short:
        b.append(("p", rng.choice([
            "Extra recycling can be left next to your blue bin in a clear bag or a cardboard box. Please flatten boxes and remove any polystyrene.",
            "Real trees can be recycled if they are cut into pieces no longer than one metre and placed beside your garden waste bin.",
            "Side waste will not be collected with general rubbish. Take larger amounts to the household recycling centre at %s." % rng.choice(TOWNS),
            "Garden waste collections pause for one week and resume on the usual fortnightly cycle afterwards.",
        ])))
        b.append(("ul", rng.sample([
            "Leave bins at the kerb with the handle facing the road.",
            "Do not overfill bins; lids must close so the lifter can tip them.",
            "Glass goes in the separate box, not the recycling bin.",
            "Report a missed bin after 4pm on the day of collection.",
            "Household recycling centres close early on the day before the holiday.",
        ], 3)))
    b.append(("p", rng.choice([
        "Thank you for your patience, and thank you to our crews who keep the service going over the holiday.",
        "Sign up for reminder emails to hear about future changes to your round.",
    ])))
    return "bins", b


def fam_hours(rng, short=False):
    fac = rng.choice(["%s Library" % rng.choice(TOWNS), "%s Leisure Pool" % rng.choice(TOWNS),
                      "the Records Office", "%s Museum" % rng.choice(TOWNS), "the Adult Learning Centre"])
    d = rdate(rng)
    why = rng.choice(["staff training", "a new self-service system", "roof repairs", "reduced winter demand",
                      "a public consultation last year", "changes to the building lease"])
    b = [("h", "New opening hours at %s" % fac)]
    b.append(("p", rng.choice([
        "From %s, %s will open at different times following %s. The new hours are set out below." % (fday(d), fac, why),
        "Opening hours at %s are changing from %s. The change follows %s." % (fac, fdate(d), why),
    ])))
    days = WEEKDAYS[:]
    rows = []
    for dn in days:
        if rng.random() < 0.15:
            rows.append([dn, "Closed"])
        else:
            rows.append([dn, "%s to %s" % (rtime(rng, 8, 11), rtime(rng, 13, 20))])
    b.append(("table", ["Day", "Hours"], rows))
    if not short:
        b.append(("p", rng.choice([
            "The book drop outside the entrance remains available at all times and items returned there are checked in the next working day.",
            "Swimming lessons keep their current slots; only public sessions are affected.",
            "Appointments to view original documents must still be made at least three working days in advance.",
            "Wi-Fi and printing remain available throughout the new opening hours.",
        ])))
        b.append(("ul", rng.sample([
            "Members can renew loans online or by phone at any time.",
            "Group visits can be arranged outside public hours.",
            "Accessible parking is available next to the side entrance.",
            "Holiday closures will be announced separately.",
            "The café keeps its current hours.",
        ], 3)))
    b.append(("p", rng.choice([
        "If you have comments on the new hours please speak to a member of staff or email the service manager, %s." % rng.choice(PEOPLE),
        "We will review the pattern after six months and publish the results.",
    ])))
    return "hours", b


def fam_timetable(rng, short=False):
    route = "%s%d" % (rng.choice(["", "X", "N"]), rng.randrange(2, 99))
    a = rng.choice(TOWNS); z = rng.choice([t for t in TOWNS if t != a])
    d = rdate(rng)
    b = [("h", "Route %s timetable change from %s" % (route, fdate(d)))]
    b.append(("p", rng.choice([
        "Route %s between %s and %s gets a revised timetable from %s. Journeys will be retimed to improve connections with trains at %s." % (route, a, z, fday(d), rng.choice(TOWNS)),
        "From %s, buses on route %s from %s to %s will run to new times. Passenger numbers have grown and we are adding capacity at peak hours." % (fday(d), route, a, z),
        "We are changing the %s service linking %s and %s on %s. Some early evening journeys are withdrawn because of very low use." % (route, a, z, fday(d)),
    ])))
    rows = []
    for stop in [a] + rng.sample([t for t in TOWNS if t not in (a, z)], 2 if short else 3) + [z]:
        rows.append([stop] + [rtime(rng, 6, 22) for _ in range(3)])
    b.append(("table", ["Stop", "First bus", "Midday", "Last bus"], rows))
    if not short:
        b.append(("h", "What is changing"))
        b.append(("ul", rng.sample([
            "Sunday journeys will run every hour instead of every ninety minutes.",
            "The stop outside the hospital moves fifty metres to the new shelter.",
            "School-day journeys are unchanged.",
            "The last departure is now five minutes earlier.",
            "Two extra morning journeys run on weekdays.",
            "The route no longer serves the retail park after 7pm.",
            "Low-floor buses will operate every journey.",
        ], rng.randrange(3, 5))))
    b.append(("p", rng.choice([
        "Printed timetables are available on board and at the travel centre. Live departure times are shown at stops with a display screen.",
        "Season tickets and day passes remain valid. Ask your driver if you are unsure which journey to catch.",
    ])))
    return "timetable", b


def fam_event(rng, short=False):
    town = rng.choice(TOWNS)
    ev = rng.choice(["Summer Fair", "Lantern Walk", "Harvest Market", "Heritage Open Day", "Riverside Regatta",
                     "Makers' Market", "Midsummer Picnic", "Apple Day", "Winter Lights Evening"])
    d = rdate(rng); v = rng.choice(VENUES)
    b = [("h", "%s %s %d" % (town, ev, d.year))]
    b.append(("p", rng.choice([
        "The %s returns to %s on %s, starting at %s at %s. Entry is free and everyone is welcome." % (ev, town, fday(d), rtime(rng, 10, 15), v),
        "Join us at %s on %s for the %s %s. Gates open at %s, with stalls and music until early evening." % (v, fday(d), town, ev, rtime(rng, 10, 14)),
        "Save the date: %s's %s takes place on %s at %s. This year's theme is %s." % (town, ev, fday(d), v, rng.choice(["the river", "local trades", "a century of the railway", "food and growing", "light and sound"])),
    ])))
    if not short:
        b.append(("h", "On the day"))
        b.append(("ul", rng.sample([
            "Craft stalls from more than thirty local makers",
            "A brass band on the green from two o'clock",
            "Children's trail with a small prize for every finisher",
            "Tours of the bell tower, booked on arrival",
            "Refreshments served by volunteers from the scout group",
            "A dog show with classes for young handlers",
            "Demonstrations of traditional hedge laying",
            "Storytelling in the marquee for under-sevens",
        ], rng.randrange(3, 6))))
        b.append(("p", rng.choice([
            "Parking is limited, so please walk, cycle or use the shuttle bus from %s." % rng.choice(TOWNS),
            "The event is run entirely by volunteers. If you can give an hour on the day, contact %s." % rng.choice(PEOPLE),
            "Stallholder places are still available; the fee is %d pounds for a three-metre pitch." % rng.choice([10, 15, 20, 25]),
        ])))
    b.append(("p", rng.choice([
        "In case of heavy rain the programme moves indoors to %s." % rng.choice(VENUES),
        "Accessible toilets and a quiet space are provided. Assistance dogs are welcome throughout.",
    ])))
    return "event", b


def fam_vacancy(rng, short=False):
    role = rng.choice(["Grounds Maintenance Operative", "Customer Services Adviser", "Trainee Network Engineer",
                       "Library Assistant", "Community Transport Driver", "Parks Ranger", "Finance Officer",
                       "Building Surveyor", "Events Coordinator"])
    sal = rng.randrange(21, 44) * 1000
    d = rdate(rng)
    b = [("h", "Vacancy: %s" % role)]
    b.append(("p", rng.choice([
        "We are looking for a %s to join a friendly team based at %s. The post is %s and the salary is %d pounds a year." % (role, rng.choice(VENUES), rng.choice(["full time", "part time, 22 hours a week", "a twelve-month fixed term"]), sal),
        "An opportunity has arisen for a %s. This is a %s post paying %d pounds per annum, working mainly around %s." % (role, rng.choice(["permanent", "temporary", "job-share"]), sal, rng.choice(TOWNS)),
    ])))
    if not short:
        b.append(("h", "Main duties"))
        b.append(("ul", rng.sample([
            "Dealing with enquiries from the public in person and by telephone",
            "Keeping accurate records and updating the case management system",
            "Carrying out routine inspections and reporting defects",
            "Working safely with machinery after full training",
            "Supporting colleagues at busy times and covering absences",
            "Driving a small van between sites in the district",
            "Preparing simple reports for the team leader",
            "Helping to organise volunteer days",
        ], rng.randrange(3, 6))))
        b.append(("p", rng.choice([
            "You will need a full driving licence and a willingness to work outdoors in all weathers.",
            "No formal qualifications are required; full training is given.",
            "A relevant qualification, or willingness to work towards one, is essential.",
        ])))
    b.append(("p", rng.choice([
        "The closing date for applications is %s. Interviews are expected the following week. For an informal chat call %s on %s." % (fdate(d), rng.choice(PEOPLE), phone(rng)),
        "Apply by %s using the standard application form. We guarantee an interview to disabled applicants who meet the essential criteria." % fdate(d),
    ])))
    return "vacancy", b


AGENDA = ["Apologies for absence", "Declarations of interest", "Minutes of the previous meeting",
          "Public questions", "Budget monitoring report", "Allotment rents for next year",
          "Update on the play area refurbishment", "Grant applications from local groups",
          "Speed limit review on the main road", "Correspondence received", "Date of next meeting",
          "Tree preservation order requests", "Cemetery fees review", "Report from the ward councillor"]


def fam_meeting(rng, short=False):
    body = rng.choice(["%s Parish Council" % rng.choice(TOWNS), "the Environment Committee", "the Transport Users' Panel",
                       "the Board of Directors", "the Licensing Sub-Committee", "the Residents' Forum"])
    d = rdate(rng); v = rng.choice(VENUES); t = rtime(rng, 18, 20)
    b = [("h", "Notice of meeting: %s" % body[0].upper() + body[1:] if body.startswith("the") else "Notice of meeting: %s" % body)]
    b.append(("p", rng.choice([
        "A meeting of %s will be held at %s on %s at %s. Members of the public are welcome to attend." % (body, v, fday(d), t),
        "Notice is hereby given that %s will meet on %s, beginning at %s, at %s." % (body, fday(d), t, v),
    ])))
    b.append(("h", "Agenda"))
    items = AGENDA[:3] + rng.sample(AGENDA[3:], 2 if short else rng.randrange(3, 7))
    b.append(("ul", items))
    if not short:
        b.append(("p", rng.choice([
            "Up to fifteen minutes is set aside for questions from the public. Please give notice of your question to the clerk by noon on the day before.",
            "Papers for the meeting are available from the clerk and will be published online five clear working days beforehand.",
            "The meeting may exclude the press and public for any item involving confidential staffing matters.",
        ])))
    b.append(("p", rng.choice([
        "Signed %s, Clerk, %s." % (rng.choice(PEOPLE), fdate(d - datetime.timedelta(days=7))),
        "Contact the clerk, %s, on %s with any questions." % (rng.choice(PEOPLE), phone(rng)),
    ])))
    return "meeting", b


def fam_consult(rng, short=False):
    topic = rng.choice(["the future of the covered market", "a new cycle route through %s" % rng.choice(TOWNS),
                        "charges for residents' parking permits", "the draft tree strategy",
                        "changes to school transport eligibility", "a twenty mph limit across %s" % rng.choice(TOWNS),
                        "the redesign of the bus station", "a new walking trail along the estuary"])
    d1 = rdate(rng); d2 = d1 + datetime.timedelta(days=rng.choice([28, 42, 56]))
    b = [("h", "Have your say on %s" % topic)]
    b.append(("p", rng.choice([
        "We want to hear your views on %s. The consultation opens on %s and closes on %s." % (topic, fdate(d1), fdate(d2)),
        "A public consultation on %s runs from %s to %s. Everyone who lives, works or studies in the area can take part." % (topic, fdate(d1), fdate(d2)),
    ])))
    b.append(("p", rng.choice([
        "The proposals have been shaped by earlier conversations with residents, businesses and community groups, and nothing has been decided yet.",
        "Three options are set out in the consultation document, together with their estimated costs and the likely effects on traffic.",
        "The plans respond to concerns raised at public meetings last year about safety, noise and the look of the area.",
    ])))
    if not short:
        b.append(("h", "Drop-in sessions"))
        rows = []
        for v in rng.sample(VENUES, rng.randrange(2, 5)):
            dd = d1 + datetime.timedelta(days=rng.randrange(3, 25))
            rows.append([fday(dd), v, "%s to %s" % (rtime(rng, 10, 14), rtime(rng, 15, 20))])
        b.append(("table", ["Date", "Venue", "Time"], rows))
        b.append(("ul", rng.sample([
            "Complete the online survey, which takes about ten minutes.",
            "Pick up a paper questionnaire from any library.",
            "Email your comments to the project team.",
            "Request the documents in large print or another language.",
            "Attend one of the drop-in sessions listed above.",
        ], 3)))
    b.append(("p", rng.choice([
        "A summary of responses will be published, and a final decision is expected in the autumn.",
        "Your answers are anonymous unless you choose to give contact details.",
    ])))
    return "consult", b


FAMILIES = [fam_water, fam_power, fam_road, fam_planning, fam_bins, fam_hours,
            fam_timetable, fam_event, fam_vacancy, fam_meeting, fam_consult]

# Extra hand-written paragraphs per family, used to reach the target body length.
EXTRA = {
    "water": [
        "The pipe being replaced was laid more than eighty years ago and has burst three times in the last two winters. Renewing it now should prevent unplanned interruptions and the discoloured water some customers have reported.",
        "Our crew will set up a small compound at the roadside with lighting and welfare cabins. There may be some noise from the excavator and compressor, but no work will take place after seven in the evening.",
        "Businesses that depend on water, such as cafés and hairdressers, can ask us for a standpipe or bowser to be placed nearby. Please give us at least two working days' notice so we can plan deliveries.",
        "Once the new section is connected we will flush the main and take water samples. Supply is only returned when the samples show the water meets every drinking water standard.",
        "Low pressure may continue for an hour or two after the supply returns while the network refills. If it lasts longer than that, please let us know so an engineer can check your stop tap.",
    ],
    "power": [
        "The equipment being replaced was installed in the nineteen-seventies and is reaching the end of its working life. New switchgear will allow our control room to reroute power remotely if a fault occurs in future.",
        "Our teams carry identity cards and will never ask to enter your home as part of this work. If someone claims to be from the network operator and you are unsure, do not let them in and call us.",
        "Generators may be used to keep some properties supplied during the outage. You may hear them running at the end of the street; they are monitored throughout the day.",
        "When power is restored, switch appliances back on one at a time to avoid tripping your fuse box. Reset clocks, timers and heating controls if necessary.",
        "Sometimes planned work has to be postponed because of high winds or a fault elsewhere on the network. If that happens we will write to you again with a new date.",
    ],
    "road": [
        "The work has been timed to avoid the school holidays and the busiest shopping weekends. Contractors will work extended hours where possible so that the road can reopen as early as practical.",
        "Residents will be able to reach their driveways outside the hours of active working, although there may be short waits while plant is moved. Please speak to the site supervisor if you have a particular need.",
        "Signs warning of the closure will be put up at least seven days in advance. Satellite navigation providers have been notified, but drivers should follow the yellow diversion signs rather than their device.",
        "The closure will only be in force while the works are taking place and the signs are displayed. If the work is finished early, the road will be reopened without further notice.",
        "Businesses on the street remain open as usual. A temporary loading bay has been agreed at the end of the road for deliveries before ten in the morning.",
    ],
    "planning": [
        "The planning officer will visit the site and may take photographs from neighbouring land with the owner's permission. A site notice has been displayed on the nearest lamp post.",
        "If the application is decided by the committee, anyone who has commented will be told the date of the meeting and how to register to speak for up to three minutes.",
        "Trees on and next to the site are protected. The applicant has submitted an arboricultural report showing how roots will be protected during construction.",
        "Highways officers will assess the proposed access and the number of parking spaces, and drainage engineers will check how surface water is to be managed.",
        "Amended plans may be submitted while the application is being considered. Where the changes are significant, neighbours will be consulted again for fourteen days.",
    ],
    "bins": [
        "Our crews collect from more than forty thousand homes every week, and holiday changes affect every round. The revised days keep the collection gap as short as possible for everyone.",
        "Wrapping paper that is foil-coated or glittery cannot be recycled and should go in your general waste bin. Plain paper passes the scrunch test: if it stays scrunched, it can be recycled.",
        "If bad weather prevents crews from reaching your street, leave your bin out and we will collect it as soon as the roads are safe. Updates are posted on our website each morning.",
        "Please make sure cars are parked so that the collection vehicle can get through. Narrow streets are often missed because a single vehicle blocks the way.",
        "Food waste caddies should be lined with compostable bags or newspaper. Please do not use plastic bags, as they cannot be processed at the composting plant.",
    ],
    "hours": [
        "The new pattern concentrates staffed hours on the times when visitor numbers are highest. Footfall counts showed that early mornings were consistently the quietest part of the day.",
        "Staff will continue to offer help with online forms, printing and digital skills sessions. Sessions can be booked at the front desk or by telephone.",
        "Community groups that meet in the building outside the new hours can still use the rooms by arrangement. Please contact the building manager to confirm access arrangements.",
        "No posts are being lost as a result of this change. Staff hours have been rearranged with the agreement of the team and their representatives.",
        "We know that changes to opening times can be frustrating. We have tried to keep late opening on at least one evening a week for people who work during the day.",
    ],
    "timetable": [
        "The changes follow a review of ticket machine data and comments from passengers collected at the travel centre. We have tried to protect journeys used by commuters and students.",
        "Journey times have been lengthened slightly in the afternoon to reflect congestion in the town centre. This should make buses more punctual, even if the printed times look later.",
        "Concessionary passes remain valid at the usual times. Under-nineteens continue to travel for a flat fare on all journeys.",
        "Buses will carry notices about the change for two weeks before it takes effect, and our staff will be at the main stops on the first morning to answer questions.",
        "If the new times cause you a particular difficulty, please tell us. We review the timetable every six months and passenger feedback is considered at each review.",
    ],
    "event": [
        "Last year more than two thousand people came along, and the organisers raised enough to repair the roof of the village hall. This year's proceeds will go towards new play equipment.",
        "Food stalls will include local bakers, a cider maker and a vegetarian kitchen. Please bring a reusable cup; water refill points will be provided.",
        "Photographs will be taken during the event for the newsletter. If you do not want to appear, please tell one of the volunteers wearing an orange tabard.",
        "The road beside the green will be closed to traffic for the afternoon. Blue badge holders can park in the marked area next to the church.",
        "A lost children point will be set up next to the first aid tent. Please agree a meeting point with your family when you arrive.",
    ],
    "vacancy": [
        "We offer a generous leave allowance, a pension scheme with employer contributions, flexible working where the role allows and a cycle-to-work scheme.",
        "The successful candidate will be subject to a basic disclosure check. References will be requested for shortlisted applicants before interview.",
        "We welcome applications from people of all backgrounds and particularly encourage applicants from groups who are under-represented in our workforce.",
        "Training is provided throughout the first year, including health and safety, customer care and the use of specialist equipment.",
        "Please do not send a curriculum vitae on its own. Tell us in your supporting statement how you meet each of the essential criteria.",
    ],
    "meeting": [
        "Recording and reporting of the meeting is permitted, provided it does not disrupt proceedings. Please let the chair know before the meeting begins if you intend to film.",
        "The venue has step-free access and a hearing loop. Anyone needing other adjustments should contact the clerk at least two days beforehand.",
        "Members are reminded to declare any interest in items on the agenda and to leave the room where a pecuniary interest arises.",
        "Minutes of the meeting will be available in draft within ten working days and will be approved at the following meeting.",
        "Refreshments will be available from half an hour before the start. The meeting is expected to last around two hours.",
    ],
    "consult": [
        "Information gathered during the consultation will be used only for this purpose and kept for no longer than two years. A privacy notice is available on request.",
        "Young people are encouraged to take part, and a shorter version of the survey has been prepared with local schools.",
        "An equality impact assessment has been carried out and is published alongside the consultation documents.",
        "Printed copies of the plans will be on display at the drop-in sessions, and officers will be there to answer questions.",
        "Feedback from the previous round showed strong support for safer crossings and more seating, and both are included in the options.",
    ],
}

GENERIC = [
    "This information is available in large print, braille, audio and other languages on request. Please ask and we will do our best to help.",
    "If you have a hearing or speech impairment you can contact us using the text relay service.",
    "We publish notices like this one online and in the local press. Previous notices can be found in the archive.",
    "Please share this notice with anyone who might not have internet access.",
    "Please note that our offices are closed on public holidays, and messages left then will be answered on the next working day.",
    "Any personal information you give us is handled in line with our privacy notice.",
]

# ---------------------------------------------------------------------------
# Site templates (hand-written navigation, teasers, footers)
# ---------------------------------------------------------------------------
MENU_A = {
    "Bins and recycling": ["Collection days", "Missed bins", "Garden waste permits", "Bulky items", "Recycling centres", "Clinical waste", "Commercial waste", "New bins", "What goes where", "Fly-tipping"],
    "Roads and transport": ["Roadworks", "Potholes", "Parking permits", "Penalty charges", "Blue badges", "Bus passes", "Street lighting", "Gritting", "Dropped kerbs", "Road safety"],
    "Planning and building": ["Search applications", "Comment on a plan", "Apply for permission", "Building control", "Local plan", "Conservation areas", "Tree orders", "Enforcement", "Street naming", "Land charges"],
    "Council tax": ["Pay online", "Discounts", "Bands", "Moving home", "Direct debit", "Arrears", "Single person discount", "Empty homes", "Appeals", "Support scheme"],
    "Housing": ["Apply for housing", "Homelessness", "Private renting", "Repairs", "Adaptations", "Houses in multiple occupation", "Energy grants", "Tenancy help"],
    "Libraries and culture": ["Find a library", "Renew loans", "E-books", "Museums", "Archives", "Arts grants", "Events", "Room hire"],
    "Health and care": ["Adult care", "Carers", "Children's services", "Public health", "Safeguarding", "Mental wellbeing", "Stop smoking", "Day centres"],
    "Your council": ["Councillors", "Meetings", "Budgets", "Elections", "Jobs", "Complaints", "Freedom of information", "Consultations", "News", "Contact us"],
    "Business": ["Licences", "Business rates", "Food hygiene", "Markets", "Tenders", "Grants", "Trading standards", "Economic growth"],
}
MENU_B = {
    "Plan a journey": ["Journey planner", "Live departures", "Route maps", "Timetables", "Accessible travel", "Park and ride", "Night buses", "Ferry crossings", "Rail links", "Airport shuttle", "Cycle hire", "Travel alerts"],
    "Tickets": ["Fares", "Day passes", "Season tickets", "Student tickets", "Concessions", "Contactless", "Smartcards", "Group travel", "Refunds", "Lost cards", "Ticket machines", "Penalty fares"],
    "Routes": ["City routes", "Rural routes", "Express routes", "School routes", "Harbour ferries", "Demand responsive", "Route changes", "Planned diversions", "Stop closures", "New stops"],
    "Help": ["Lost property", "Contact centre", "Complaints", "Feedback", "Assistance booking", "Travel training", "Safety on board", "FAQs", "Service status", "Accessibility guide"],
    "About us": ["Our board", "Annual report", "Performance", "Careers", "Apprenticeships", "Procurement", "Press office", "Sustainability", "Fleet", "Depots", "History", "Privacy"],
}
MENU_C = {
    "Your supply": ["Check your area", "Report a leak", "No water", "Low pressure", "Water quality", "Power cut", "Priority services", "Planned works", "Incident map", "Hosepipe guidance"],
    "Your account": ["Pay a bill", "Read your meter", "Moving home", "Direct debit", "Payment help", "Social tariff", "Change details", "Paperless bills", "Debt advice", "Compensation"],
    "Saving": ["Save water", "Save energy", "Free devices", "Smart meters", "Insulation grants", "Rainwater", "Garden tips", "Home audit"],
    "Developers": ["New connections", "Diversions", "Sewer adoption", "Capacity checks", "Self-lay", "Charges", "Build over", "Trade effluent"],
    "Environment": ["Rivers", "Reservoirs", "Catchment plans", "Biodiversity", "Net zero", "Storm overflows", "Bathing waters"],
    "Company": ["About us", "Leadership", "Regulation", "Reports", "Investors", "Careers", "News", "Contact", "Media centre", "Supplier portal", "Modern slavery statement", "Gender pay report"],
    "Help": ["Emergency numbers", "Customer promise", "Complaints", "Accessibility", "Translation service", "Scam awareness", "Frequently asked questions", "Live chat"],
}

TEASERS_A = [
    "Garden waste permits for next season go on sale next month. Buy early online to guarantee your first collection and receive a free caddy liner pack with every new permit.",
    "Our new library app lets you borrow e-books, renew loans and reserve titles from your phone. Download it today and sign in with your existing library card number.",
    "Council tax bills for the new financial year are on their way. Find out how your money is spent and which discounts you may be entitled to claim.",
    "Winter gritting routes are now published. Check whether your road is on a priority route and where to find the nearest grit bin for pavements and steps.",
    "Fancy a career that makes a difference? We are recruiting care workers across the county, with paid training, mileage allowance and flexible shifts to fit around family life.",
    "Report a pothole in less than two minutes using our online form. Add a photo and a map pin, and we will tell you when the repair is booked.",
    "The annual residents' survey is open. Tell us what matters most in your neighbourhood and you could win a family pass to the county museums.",
    "Help for households struggling with bills is available this winter, including food vouchers, energy advice and small grants for essential items such as cookers and beds.",
    "Volunteer litter-pickers collected over four tonnes of rubbish last spring. Borrow a free kit from your local library and join a community clean-up near you.",
    "Planning to get married? Our registration team can help you choose a licensed venue and book a ceremony date up to two years in advance.",
    "Keep your children safe online with free evening workshops for parents, covering privacy settings, gaming chat and what to do if something goes wrong.",
    "Electric vehicle charge points are being installed in twelve council car parks this year. See the map of locations and the tariff for each charger.",
    "Are you registered to vote? Check your details before the deadline so you can take part in the next local elections. It only takes five minutes.",
    "Our adult learning courses start again in September, with classes in languages, pottery, bookkeeping and computer skills at centres across the county.",
    "Dog owners are reminded that bags can be placed in any public litter bin. Fines for failing to clean up after your dog have increased this year.",
    "The county archives have digitised over ten thousand historic photographs. Browse streets, schools and shops as they looked a century ago from home.",
    "Thinking of fostering? Information evenings are held on the first Tuesday of every month. Come along to meet foster carers and ask questions without obligation.",
    "Free swimming for under-elevens continues during the school holidays at all council pools. Sessions are popular, so please book a lane in advance.",
    "Our food hygiene ratings are updated every week. Search for a café, takeaway or restaurant before you eat out and see how it scored.",
    "Blue badge applications can now be completed entirely online. Upload your photograph and evidence and track progress without needing to call us.",
    "Trading standards warn of doorstep callers offering cheap roof repairs. Never agree to work on the spot and always check with a trusted neighbour first.",
    "Market stalls are available to rent on Saturdays from just fifteen pounds. New traders receive their first month at half price with free advice.",
    "Books, boxes and bikes: the household recycling centres now accept more items for reuse. Find out what you can drop off at the reuse shop.",
    "Councillors' surgeries are held every month in community centres. Find your ward councillor and the dates when you can raise a local issue in person.",
]

TEASERS_B = [
    "Tap on, tap off: contactless capping means you never pay more than a day pass, however many journeys you make across the network.",
    "Our new electric buses are arriving on routes 4 and 11 this spring. They are quieter, cleaner and have charging sockets at every pair of seats.",
    "Students can save up to forty percent with an academic year pass. Apply online with your college email address and collect the card at any travel centre.",
    "Harbour ferry timetables change with the tides in winter. Check the live board before you set off and allow extra time on stormy days.",
    "Left something on a bus? Lost property is held at the central depot for twenty-eight days and can be traced online using your route and time.",
    "Need help getting on and off? Book assistance up to two hours before you travel and a member of staff will meet you at the stop.",
    "Park and ride sites are open seven days a week with secure parking, toilets and waiting rooms. One ticket covers the car and everyone inside it.",
    "Night buses now run every twenty minutes on Friday and Saturday nights between the city centre and the three largest suburbs.",
    "Sign up for travel alerts and we will send a text or email when your regular route is diverted, delayed or affected by roadworks.",
    "Our annual customer satisfaction results are published. Punctuality improved for the third year in a row, and cleanliness scores reached a record high.",
    "Apprenticeships in engineering, operations and customer service are open for applications. Earn while you learn, with a guaranteed job on completion.",
    "Cycle hire docks are now located at every major interchange. The first thirty minutes are free for holders of a monthly season ticket.",
    "Travel training helps young people and adults with learning disabilities gain confidence using buses independently. Sessions are free and tailored to each person.",
    "Group tickets for up to five people travelling together cost less than three single fares. Perfect for family days out to the coast.",
    "Safety on board matters. Our drivers are trained to help anyone who feels unsafe, and every bus carries recording cameras inside and out.",
    "The airport shuttle runs every fifteen minutes from early morning to midnight, with space for luggage and a guaranteed seat for ticket holders.",
    "We are consulting on a new network for the eastern suburbs. Look at the proposed route map and tell us what you think before the closing date.",
    "Older persons' passes can be renewed online. You will receive a reminder letter three months before your current pass expires.",
    "School buses return on the first day of term. Check the updated list of school routes and the stops where pupils can board safely.",
    "Our fleet now includes twenty hydrogen buses, helping cut emissions across the harbour district. Find out how the new refuelling station works.",
    "Smartcard holders can top up online, at ticket machines or in more than two hundred shops. Balance checks are free at every machine.",
    "Demand responsive minibuses serve villages without a regular route. Book a journey by phone or app up to a week ahead.",
    "Bike racks on rural routes carry two bicycles at a time. Ask the driver to help you load and unload safely.",
    "Refunds for cancelled journeys are processed within ten working days. Keep your ticket and apply online with your journey details.",
    "Depot open days give families a chance to see behind the scenes, sit in the driver's seat and learn how our engineers keep buses running.",
    "Report a problem at a stop, such as a broken shelter or missing timetable, and our maintenance team will visit within five working days.",
    "Our sustainability plan commits to a fully zero-emission fleet within eight years. Read the plan and the progress we have made so far.",
    "Free wi-fi is available on all city and express buses. Connect once and your device will reconnect automatically on every later journey.",
    "Accessible route maps in large print and high contrast can be downloaded or posted to you free of charge. Ask the contact centre.",
    "Ticket inspectors are working across the network this month. Make sure you have a valid ticket or pass before you travel to avoid a penalty fare.",
]

TEASERS_C = [
    "Worried about paying your bill? Our social tariff can cut charges by up to half for eligible households. Check whether you qualify in five minutes.",
    "Free water-saving packs include a shower timer, tap inserts and a cistern bag. Order yours online and start saving on metered bills straight away.",
    "Join our priority services register if you rely on water or power for medical equipment, have young children or need information in another format.",
    "Spotted a leak in the street? Report it online with a photo. Our leakage teams fix most reported leaks within five working days of the report.",
    "Smart meter installations are now under way in the western districts. Appointments take about an hour and there is no charge for the installation.",
    "Our reservoirs are currently at eighty-two percent of capacity. See the weekly levels and the long-term outlook for summer supplies across the region.",
    "Storm overflow data is published in near real time. View the map to see which overflows have operated in the last twenty-four hours.",
    "Moving home? Tell us your moving date and final meter reading and we will close your account and send a final bill within ten days.",
    "Our annual performance report shows fewer interruptions and faster responses to bursts. Read how we compare with other regional suppliers this year.",
    "Grants for loft and cavity wall insulation are available to homeowners and tenants on qualifying benefits. Apply through our home energy partner.",
    "Building an extension over a public sewer? You will need our agreement before work starts. Read the guidance and submit an application online.",
    "Rainwater butts are available at a discount this spring. Collect water for the garden and reduce runoff into drains during heavy storms.",
    "Beware of callers claiming to be from the water company. Our staff always carry identity cards and you can check them using our password scheme.",
    "We are planting one hundred thousand trees along river catchments to slow flood water, improve habitats and keep reservoirs cleaner.",
    "Fats, oils and grease cause thousands of sewer blockages each year. Let cooking fat cool, scrape it into the bin and never pour it down the sink.",
    "Pay your bill in instalments that suit you, weekly, fortnightly or monthly. Set up a plan online and change the dates at any time.",
    "Schools can book free education visits to our treatment works, with hands-on activities about the water cycle for pupils aged seven to eleven.",
    "Power cut? Call one-zero-five from any phone to report it and get the latest information about restoration times in your area.",
    "Our graduate scheme for engineers and scientists opens in October. Spend two years rotating through operations, planning and asset management teams.",
    "Hosepipe guidance for this summer: water gardens in the early morning or evening and use a watering can where you can, to reduce demand.",
    "Trade effluent consents are required for businesses discharging anything other than domestic sewage. Read the charges and apply for a consent online.",
    "Our community fund awards grants of up to two thousand pounds to local groups working on water, environment and energy projects.",
    "Frozen pipes can burst during cold snaps. Lag pipes in lofts and garages, and make sure you know where your stop tap is before winter.",
    "Compensation is paid automatically if your supply is interrupted for longer than our guaranteed standards. Find out how much you may receive.",
]

FOOTER_A = ("Rivermoor County Council, County Hall, Ashcombe Road, Rivermoor. The information on this website is provided by the Council for general guidance and is reviewed regularly, "
            "but we cannot guarantee that it is complete, accurate or up to date at the moment you read it. Nothing on this site forms part of a contract or creates any legal obligation. "
            "Links to external websites are provided for convenience and the Council is not responsible for their content or availability. "
            "Personal information submitted through online forms is processed in accordance with data protection legislation and our corporate privacy notice, which explains the purposes for which we use your data, "
            "the lawful basis we rely on, how long we keep records and your rights to access, correct or erase them. Telephone calls to the contact centre may be recorded for training and quality purposes. "
            "Copyright in the content, layout and graphics of this website belongs to the Council unless otherwise stated, and material may be reproduced free of charge for non-commercial purposes provided it is reproduced accurately and the source is acknowledged. "
            "Maps are reproduced under licence and may not be copied. The Council is committed to making this website accessible in line with the relevant accessibility regulations; "
            "our accessibility statement describes known issues and how to request information in an alternative format. Complaints about our services should be made using the corporate complaints procedure; "
            "if you remain dissatisfied you may refer the matter to the independent ombudsman. The Council publishes information about spending over five hundred pounds, senior salaries and contracts under its transparency commitments. "
            "Registered office for our trading companies as shown in the companies register. All rights reserved.")
FOOTER_B = ("Harbourline Transit Authority is a statutory passenger transport body. Conditions of carriage apply to all journeys and tickets; copies are available at travel centres and on request. "
            "Fares, routes and timetables shown on this website are correct at the time of publication but may change without notice, and the Authority accepts no liability for any loss arising from reliance on them, "
            "including missed connections, delays caused by traffic, weather, roadworks or events outside our control. Live departure information is an estimate generated from vehicle location data and should be treated as a guide only. "
            "Penalty fares may be charged to passengers unable to present a valid ticket. CCTV operates on all vehicles, stops and premises for the prevention and detection of crime and to protect passengers and staff; "
            "images are retained for thirty-one days unless required for an investigation. We collect and process personal data in accordance with data protection law; our privacy notice explains how we use smartcard journey data, "
            "how long we keep it and how you can request a copy. Cookies are used to remember your preferences and to help us understand how the site is used. "
            "This site is designed to meet recognised accessibility guidelines; please tell us if you encounter any difficulty. Logos, route numbers, map designs and photographs are protected by copyright and trade mark rights and may not be reproduced without permission. "
            "Complaints that cannot be resolved by our customer relations team may be referred to the independent passenger ombudsman.")
FOOTER_C = ("Brenfield Water and Energy Limited, registered office Reservoir House, Kiln Bank, Brenfield. Registered number 0000000. Regulated by the economic regulator for water and energy services. "
            "Charges scheme and customer code of practice available on request. The information on this website is provided for general purposes only and does not constitute professional advice. "
            "Although we take reasonable care to keep it accurate, we make no warranty as to its completeness, and we are not liable for any loss or damage arising from its use, except where such liability cannot be excluded by law. "
            "Planned work dates may change because of weather, operational priorities or incidents elsewhere on the network. Customers on the priority services register will be contacted directly about interruptions. "
            "Calls may be recorded. We process personal data as a controller in line with data protection law and our privacy notice; you have the right to request access to your data, to ask for corrections and to complain to the supervisory authority. "
            "Guaranteed standards of service set out the compensation payable when we fail to meet specified levels of service. Our complaints procedure has two internal stages, after which you may refer your complaint to the independent consumer council. "
            "Copyright and database rights in this website are owned by the company. Do not rely on this website in an emergency: if you smell gas or see a damaged electricity cable, keep clear and call the emergency number immediately.")

COOKIE_A = "We use cookies to make this website work and to understand how you use it. Some are essential; others help us improve our services. You can accept all cookies or choose which ones to allow."
COOKIE_B = "Cookies help us give you live departure times and remember your favourite stops. Accept all, or manage your preferences to turn off analytics and personalisation cookies."
COOKIE_C = "This site uses necessary cookies to keep you signed in and optional analytics cookies to improve our pages. Please tell us whether you accept optional cookies."

UPDATES = [
    "Update: this notice has been revised since it was first published. The contact details above are now correct.",
    "Update: following feedback from residents, the start time has been confirmed and the arrangements below still apply.",
    "Please note that an earlier version of this notice contained an error in the reference number, which has now been corrected.",
    "Update: the contractor has confirmed that the work remains on schedule. We will post again if anything changes.",
    "This notice replaces the version circulated last week. Please discard any earlier copies you may have received.",
    "Late addition: copies of this notice have also been placed in the local library and the post office window.",
]
SUBST = [
    ("essential", "necessary"), ("carrying out", "undertaking"), ("Please", "Kindly"), ("welcome", "invited"),
    ("available", "on offer"), ("approximately", "about"), ("as soon as", "once"), ("will be", "is to be"),
    ("homes", "households"), ("information", "details"), ("contact", "get in touch with"), ("usual", "normal"),
    ("the following", "these"), ("questions", "queries"), ("Residents", "Householders"), ("expect", "anticipate"),
    ("local", "nearby"), ("free", "free of charge"), ("must", "should"), ("at least", "no fewer than"),
    ("changes", "alterations"), ("public", "general public"), ("each", "every"), ("help", "assist"),
]
DATE_RE = re.compile(r"\b(?:(Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday) )?(\d{1,2}) (%s)(?: (\d{4}))?\b" % "|".join(MONTHS))


def shift_date_text(text, days):
    def rep(m):
        y = int(m.group(4)) if m.group(4) else 2026
        d = datetime.date(y, MONTHS.index(m.group(3)) + 1, int(m.group(2))) + datetime.timedelta(days=days)
        s = ("%s " % WEEKDAYS[d.weekday()] if m.group(1) else "") + "%d %s" % (d.day, MONTHS[d.month - 1])
        if m.group(4):
            s += " %d" % d.year
        return s
    return DATE_RE.sub(rep, text, count=1)

# ---------------------------------------------------------------------------
# Body helpers
# ---------------------------------------------------------------------------

def block_lines(blocks):
    out = []
    for b in blocks:
        if b[0] in ("h", "p"):
            out.append(b[1])
        elif b[0] == "ul":
            out.extend(b[1])
        elif b[0] == "table":
            out.append("\t".join(b[1]))
            out.extend("\t".join(r) for r in b[2])
    return out


def body_text(blocks):
    return "\n".join(block_lines(blocks)) + "\n"


def words(text):
    return re.sub(r"[^\w\s]", "", text.lower()).split()


def shingles(text, k=5):
    w = words(text)
    if len(w) < k:
        return {tuple(w)}
    return {tuple(w[i:i + k]) for i in range(len(w) - k + 1)}


def jacc(a, b):
    if not a and not b:
        return 1.0
    return len(a & b) / len(a | b)


def make_body(rng, fam, short):
    lo, hi = (150, 200) if short else (rng.choice([200, 240, 280, 330, 380, 420]), 470)
    for attempt in range(200):
        name, blocks = fam(rng, short)
        extras = rng.sample(EXTRA[name], len(EXTRA[name]))
        gen = rng.sample(GENERIC, len(GENERIC))
        nwords = len(words(body_text(blocks)))
        ins = len(blocks) - 1
        pool = extras + gen[:3]
        while nwords < lo and pool:
            para = pool.pop(0)
            blocks.insert(ins, ("p", para)); ins += 1
            nwords = len(words(body_text(blocks)))
        floor = 150 if short else 200
        if floor <= nwords <= hi and (nwords >= lo or not pool):
            return name, blocks
    raise RuntimeError("could not reach length for %s" % fam.__name__)


def has_structure(blocks):
    kinds = {b[0] for b in blocks}
    return "table" in kinds and "ul" in kinds and sum(1 for b in blocks if b[0] == "h") >= 2


def edit_blocks(blocks, rng, strength):
    """Return an edited copy. strength: 'light' (~1 %) or 'medium' (1-10 %)."""
    nb = [(b[0], b[1]) if b[0] in ("h", "p") else (b[0], list(b[1])) if b[0] == "ul" else (b[0], list(b[1]), [list(r) for r in b[2]]) for b in blocks]
    ops = []
    if strength == "light":
        ops = [rng.choice(["subst", "date"])]
    else:
        ops = rng.sample(["subst", "subst2", "date", "add", "drop", "subst"], rng.randrange(1, 4))
    desc = []
    for op in ops:
        if op == "date":
            idx = [i for i, b in enumerate(nb) if b[0] in ("h", "p") and DATE_RE.search(b[1])]
            if idx:
                i = rng.choice(idx)
                days = rng.choice([-7, -2, -1, 1, 2, 3, 7, 14])
                nb[i] = (nb[i][0], shift_date_text(nb[i][1], days))
                desc.append("date moved %+d days" % days)
        elif op in ("subst", "subst2"):
            n = 1 if op == "subst" else rng.randrange(2, 4)
            for _ in range(n):
                cands = [(i, a, c) for i, b in enumerate(nb) if b[0] == "p" for a, c in SUBST if re.search(r"\b%s\b" % re.escape(a), b[1])]
                if cands:
                    i, a, c = rng.choice(cands)
                    nb[i] = ("p", re.sub(r"\b%s\b" % re.escape(a), c, nb[i][1], count=1))
                    desc.append("'%s'->'%s'" % (a, c))
        elif op == "add":
            ps = [i for i, b in enumerate(nb) if b[0] == "p"]
            nb.insert(ps[-1] + 1 if rng.random() < 0.5 else ps[0] + 1, ("p", rng.choice(UPDATES)))
            desc.append("paragraph added")
        elif op == "drop":
            ps = [i for i, b in enumerate(nb) if b[0] == "p"][1:-1]
            ls = [i for i, b in enumerate(nb) if b[0] == "ul" and len(b[1]) > 3]
            if ps and rng.random() < 0.6:
                del nb[rng.choice(ps)]
                desc.append("paragraph removed")
            elif ls:
                i = rng.choice(ls)
                items = list(nb[i][1]); del items[rng.randrange(len(items))]
                nb[i] = ("ul", items)
                desc.append("list item removed")
    return nb, desc


def changed_fraction(t1, t2):
    import difflib
    a, b = words(t1), words(t2)
    sm = difflib.SequenceMatcher(None, a, b, autojunk=False)
    m = sum(x.size for x in sm.get_matching_blocks())
    return 1 - m / max(len(a), len(b))

# ---------------------------------------------------------------------------
# Rendering
# ---------------------------------------------------------------------------
E = html.escape


def body_html(blocks, style="semantic"):
    out = []
    first = True
    for b in blocks:
        if b[0] == "h":
            tag = "h1" if first else "h2"
            if style == "legacy" and not first:
                out.append("<p><b>%s</b></p>" % E(b[1]))
            else:
                out.append("<%s>%s</%s>" % (tag, E(b[1]), tag))
            first = False
        elif b[0] == "p":
            out.append("<p>%s</p>" % E(b[1]))
        elif b[0] == "ul":
            out.append("<ul>\n" + "\n".join("  <li>%s</li>" % E(x) for x in b[1]) + "\n</ul>")
        elif b[0] == "table":
            rows = "\n".join("  <tr>" + "".join("<td>%s</td>" % E(c) for c in r) + "</tr>" for r in b[2])
            out.append('<table class="data">\n  <thead><tr>' + "".join("<th>%s</th>" % E(c) for c in b[1]) +
                       "</tr></thead>\n  <tbody>\n" + rows + "\n  </tbody>\n</table>")
    return "\n".join(out)


def body_txt(blocks, table_style):
    import textwrap
    out = []
    first = True
    for b in blocks:
        if b[0] == "h":
            out.append(b[1]); out.append(("=" if first else "-") * len(b[1])); first = False
        elif b[0] == "p":
            out.append(textwrap.fill(b[1], 72))
        elif b[0] == "ul":
            out.append("\n".join("  * " + x for x in b[1]))
        elif b[0] == "table":
            if table_style == "tab":
                out.append("\n".join("\t".join(r) for r in [b[1]] + b[2]))
            else:
                out.append("\n".join(" | ".join(r) for r in [b[1]] + b[2]))
        out.append("")
    return "\n".join(out)


def body_md(blocks):
    out = []
    first = True
    for b in blocks:
        if b[0] == "h":
            out.append(("# " if first else "## ") + b[1]); first = False
        elif b[0] == "p":
            out.append(b[1])
        elif b[0] == "ul":
            out.append("\n".join("- " + x for x in b[1]))
        elif b[0] == "table":
            out.append("| " + " | ".join(b[1]) + " |\n|" + "|".join("---" for _ in b[1]) + "|\n" +
                       "\n".join("| " + " | ".join(r) + " |" for r in b[2]))
        out.append("")
    return "\n".join(out)


def teaser_title(t):
    w = t.split()
    return " ".join(w[:4]).rstrip(".,?:")


def mega_menu(menu, host):
    parts = ['<nav class="mega-menu" aria-label="Main menu">', "<ul>"]
    for sec, links in menu.items():
        slug = re.sub(r"[^a-z]+", "-", sec.lower()).strip("-")
        parts.append('<li class="mega-section"><a href="/%s/">%s</a><ul class="mega-panel">' % (slug, E(sec)))
        for l in links:
            parts.append('<li><a href="/%s/%s">%s</a></li>' % (slug, re.sub(r"[^a-z]+", "-", l.lower()).strip("-"), E(l)))
        parts.append("</ul></li>")
    parts.append("</ul></nav>")
    return "\n".join(parts)


def page_site_a(title, bhtml, crumbs, teasers, rng):
    host = "portal.rivermoor.example.org"
    aside = "\n".join('<div class="teaser"><h3><a href="/news/%d">%s</a></h3><p>%s</p><a class="more" href="/news/%d">Read more</a></div>' % (i, E(teaser_title(t)), E(t), i) for i, t in enumerate(teasers))
    return """<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><title>%s | Rivermoor County Council</title>
<link rel="stylesheet" href="/assets/portal.css"></head>
<body>
<div id="cookie-banner" role="dialog"><p>%s</p><button>Accept all cookies</button> <button>Manage cookies</button></div>
<header class="site-header"><a href="/" class="logo">Rivermoor County Council</a>
<form class="search" action="/search"><input name="q" placeholder="Search the council website"><button>Search</button></form>
<a href="/account">My account</a> | <a href="/report">Report it</a> | <a href="/pay">Pay it</a> | <a href="/apply">Apply for it</a></header>
%s
<nav class="breadcrumb" aria-label="Breadcrumb"><ol>%s</ol></nav>
<div class="layout">
<main id="main-content"><article class="notice">
%s
<p class="page-meta">Last reviewed by the web team. Was this page useful? <a href="/feedback">Yes</a> / <a href="/feedback">No</a></p>
</article></main>
<aside class="related" aria-label="Also on this site">
<h2>Also on Rivermoor Council</h2>
%s
</aside>
</div>
<footer class="legal"><p>%s</p>
<ul class="footer-links"><li><a href="/privacy">Privacy</a></li><li><a href="/accessibility">Accessibility statement</a></li><li><a href="/cookies">Cookies</a></li><li><a href="/terms">Terms of use</a></li><li><a href="/contact">Contact us</a></li></ul></footer>
</body></html>
""" % (E(title), E(COOKIE_A), mega_menu(MENU_A, host), "".join('<li><a href="#">%s</a></li>' % E(c) for c in crumbs), bhtml, aside, E(FOOTER_A))


def page_site_b(title, bhtml, crumbs, teasers, rng):
    side = "\n".join('<div class="promo"><div class="promo-title">%s</div><div class="promo-text">%s</div></div>' % (E(teaser_title(t)), E(t)) for t in teasers)
    menu = mega_menu(MENU_B, "").replace("<nav", "<div").replace("</nav>", "</div>")
    return """<!DOCTYPE html>
<html><head><meta charset="utf-8"><title>Harbourline Transit - %s</title></head>
<body>
<div class="cookie-notice">%s <a href="/cookies">Cookie settings</a> <a href="#" class="ok">OK</a></div>
<div class="topbar"><span class="brand">Harbourline Transit</span> <span class="status">Service status: see live updates</span></div>
%s
<div class="crumbs">%s</div>
<div class="wrapper">
<div class="sidebar"><div class="sidebar-heading">Travel news and offers</div>
%s
</div>
<div class="content">
%s
</div>
</div>
<div class="footer"><div class="footer-text">%s</div><div class="footer-copy">Harbourline Transit Authority. Conditions of carriage apply.</div></div>
</body></html>
""" % (E(title), E(COOKIE_B), menu, " &gt; ".join(E(c) for c in crumbs), side, bhtml, E(FOOTER_B))


def page_site_c(title, bhtml, crumbs, teasers, rng):
    left = "\n".join('<tr><td class="menuhead"><b>%s</b></td></tr>\n' % E(sec) + "\n".join('<tr><td class="menuitem"><a href="/%s">%s</a></td></tr>' % (re.sub(r"[^a-z]+", "-", l.lower()), E(l)) for l in links) for sec, links in MENU_C.items())
    right = "\n".join('<tr><td class="box"><b>%s</b><br>%s</td></tr>' % (E(teaser_title(t)), E(t)) for t in teasers)
    return """<html><head><title>%s - Brenfield Water and Energy</title></head>
<body bgcolor="#ffffff">
<table width="100%%" cellpadding="0" cellspacing="0" border="0">
<tr><td colspan="3" class="cookiebar">%s [Accept] [Reject optional]</td></tr>
<tr><td colspan="3" class="masthead">Brenfield Water and Energy &nbsp; | &nbsp; Emergencies: call the number on your bill</td></tr>
<tr><td colspan="3" class="crumbtrail">You are here: %s</td></tr>
<tr>
<td width="20%%" valign="top"><table class="leftnav" width="100%%">
%s
</table></td>
<td width="55%%" valign="top" class="maincell">
%s
</td>
<td width="25%%" valign="top"><table class="rightcol" width="100%%">
%s
</table></td>
</tr>
<tr><td colspan="3" class="legal">%s</td></tr>
</table>
</body></html>
""" % (E(title), E(COOKIE_C), " / ".join(E(c) for c in crumbs), left, bhtml, right, E(FOOTER_C))


def page_site_d(title, bhtml, crumbs, teasers, rng):
    return """<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><title>%s - The Valley Courier</title></head>
<body>
<header><a href="/">The Valley Courier</a> <nav><a href="/news">News</a> <a href="/notices">Public notices</a> <a href="/sport">Sport</a> <a href="/whats-on">What's on</a></nav></header>
<article>
<p class="kicker">Public notice</p>
%s
</article>
<footer><p>The Valley Courier, community news for the valley. Notices are published as supplied.</p></footer>
</body></html>
""" % (E(title), bhtml)


def page_site_e(title, bhtml, crumbs, teasers, rng):
    return """<!DOCTYPE html>
<html><head><meta charset="utf-8"><title>%s :: Oakridge Community Association</title></head>
<body>
<div class="header"><h2 class="sitename">Oakridge Community Association</h2></div>
<div class="menu"><a href="/">Home</a> · <a href="/noticeboard">Noticeboard</a> · <a href="/hall">Hall hire</a> · <a href="/join">Join us</a></div>
<div class="content">
%s
</div>
<div class="side"><p>Noticeboard items are posted by volunteers. Contact the secretary to add a notice.</p></div>
<div class="foot">Oakridge Community Association, registered charity.</div>
</body></html>
""" % (E(title), bhtml)


def page_site_f(title, bhtml, crumbs, teasers, rng):
    return """<html><head><title>Northgate Parish Newsletter: %s</title></head>
<body>
<table width="760" align="center" border="0">
<tr><td><font size="5">Northgate Parish Newsletter</font><br><a href="index.html">Index</a> | <a href="archive.html">Archive</a></td></tr>
<tr><td>
%s
</td></tr>
<tr><td><font size="1">Printed and published by the parish office.</font></td></tr>
</table>
</body></html>
""" % (E(title), bhtml)


SITES = {
    # key: (host, renderer, heavy, body style, doc count, family weights, teasers, rotating)
    "rivermoor": dict(host="portal.rivermoor.example.org", render=page_site_a, heavy=True, style="semantic", n=48,
                      fams=["road", "planning", "bins", "hours", "meeting", "consult", "vacancy", "event"], teasers=TEASERS_A, rotate=False,
                      crumbs=["Home", "Your council", "News and notices"], path="news/notices"),
    "harbourline": dict(host="www.harbourline.example.net", render=page_site_b, heavy=True, style="semantic", n=48,
                        fams=["timetable", "road", "vacancy", "consult", "meeting", "hours"], teasers=TEASERS_B, rotate=True,
                        crumbs=["Home", "Routes", "Service changes"], path="service-changes"),
    "brenfield": dict(host="utilities.brenfield.test", render=page_site_c, heavy=True, style="legacy", n=48,
                      fams=["water", "power", "vacancy", "road", "consult"], teasers=TEASERS_C, rotate=False,
                      crumbs=["Home", "Your supply", "Planned works"], path="supply/planned-works"),
    "courier": dict(host="news.valleycourier.example.com", render=page_site_d, heavy=False, style="semantic", n=36,
                    fams=["planning", "road", "event", "meeting", "vacancy", "water", "power", "timetable"], teasers=None, rotate=False,
                    crumbs=[], path="notices"),
    "oakridge": dict(host="oakridge.example.net", render=page_site_e, heavy=False, style="semantic", n=36,
                     fams=["event", "meeting", "bins", "hours", "consult", "planning"], teasers=None, rotate=False,
                     crumbs=[], path="noticeboard"),
    "northgate": dict(host="www.northgate-parish.test", render=page_site_f, heavy=False, style="legacy", n=36,
                      fams=["meeting", "event", "planning", "bins", "road", "water"], teasers=None, rotate=False,
                      crumbs=[], path="newsletter"),
}
ARCHIVE_HOST = "records.example.org"
FAMBYNAME = {f.__name__[4:]: f for f in FAMILIES}

# ---------------------------------------------------------------------------
# Main generation
# ---------------------------------------------------------------------------

def slugify(s):
    return re.sub(r"[^a-z0-9]+", "-", s.lower()).strip("-")[:60]


def main():
    rng = random.Random(SEED)
    if os.path.exists(OUT):
        shutil.rmtree(OUT)
    os.makedirs(os.path.join(OUT, "inbox"))
    os.makedirs(os.path.join(OUT, "bodies"))

    html_sites = list(SITES)
    # 1. copy jobs: (kind, src_site, dst_site)
    jobs = []
    for i in range(44):
        dst = rng.choice(html_sites)
        src = dst if rng.random() < 0.4 else rng.choice([s for s in html_sites if s != dst])
        jobs.append(("near", src, dst))
    for i in range(14):
        dst = rng.choice(html_sites)
        src = rng.choice([s for s in html_sites if s != dst])
        jobs.append(("exact", src, dst))
    load = {s: 0 for s in html_sites}
    for k, s, d in jobs:
        load[d] += 1
    nbases = {s: SITES[s]["n"] - load[s] for s in html_sites}

    # 2. base bodies with rejection of accidental similarity
    docs = []          # dict(path, url, site, blocks, family, cluster, fmt)
    base_sh = []
    cluster_id = 0
    seen_paths = set()

    def add_doc(site, blocks, family, cluster, fmt="html", role="base", note=""):
        title = blocks[0][1]
        stem = slugify(title)
        p = "%s/%s.%s" % (site, stem, fmt)
        n = 2
        while p in seen_paths:
            p = "%s/%s-%d.%s" % (site, stem, n, fmt); n += 1
        seen_paths.add(p)
        d = dict(path=p, site=site, blocks=blocks, family=family, cluster=cluster, fmt=fmt, role=role, note=note,
                 title=title, text=body_text(blocks))
        d["sh"] = shingles(d["text"])
        docs.append(d)
        return d

    for s in html_sites:
        cfg = SITES[s]
        for i in range(nbases[s]):
            short = cfg["heavy"] and rng.random() < 0.3
            for attempt in range(100):
                fam = FAMBYNAME[rng.choice(cfg["fams"])]
                name, blocks = make_body(rng, fam, short)
                sh = shingles(body_text(blocks))
                if all(jacc(sh, o) < 0.40 for o in base_sh):
                    break
            else:
                raise RuntimeError("too similar")
            base_sh.append(sh)
            add_doc(s, blocks, name, cluster_id, role="base-short" if short else "base")
            cluster_id += 1

    bases = [d for d in docs]
    used = set()
    pairs = []

    def pair(a, b, rel, note):
        j = jacc(a["sh"], b["sh"])
        pairs.append(dict(a=a["path"], b=b["path"], relation=rel, body_jaccard=round(j, 4), note=note))
        return j

    # 3. cross-format sources (need h2 + list + table), 24 of them
    structured = [d for d in bases if has_structure(d["blocks"])]
    rng.shuffle(structured)
    xf = structured[:24]
    for d in xf:
        used.add(d["path"])

    # 4. copy jobs
    for kind, src, dst in jobs:
        cands = [d for d in bases if d["site"] == src and d["path"] not in used]
        d = rng.choice(cands)
        used.add(d["path"])
        if kind == "exact":
            c = add_doc(dst, d["blocks"], d["family"], d["cluster"], role="exact-copy", note="syndicated from %s" % src)
            pair(d, c, "exact-body", "identical body republished on %s (template %s -> %s)" % (dst, src, dst))
        else:
            for attempt in range(60):
                nb, desc = edit_blocks(d["blocks"], rng, "medium")
                t = body_text(nb)
                j = jacc(d["sh"], shingles(t))
                cf = changed_fraction(d["text"], t)
                if j >= 0.80 and 0.01 <= cf <= 0.10 and t != d["text"] and 150 <= len(words(t)) <= 470:
                    break
            else:
                raise RuntimeError("no acceptable edit for %s" % d["path"])
            c = add_doc(dst, nb, d["family"], d["cluster"], role="near-copy")
            where = "same site" if src == dst else "other site %s" % dst
            pair(d, c, "near-duplicate", "republished on %s with edits: %s; %.1f%% of body words changed" % (where, ", ".join(desc), 100 * cf))

    # 5. cross-format copies into the archive site
    for k, d in enumerate(xf):
        made = []
        for fmt in ("txt", "md"):
            for attempt in range(60):
                nb, desc = edit_blocks(d["blocks"], rng, "light")
                t = body_text(nb)
                cf = changed_fraction(d["text"], t)
                if t != d["text"] and cf <= 0.03 and jacc(d["sh"], shingles(t)) >= 0.80 and all(t != m[0]["text"] for m in made):
                    break
            else:
                raise RuntimeError("no light edit")
            c = add_doc("records", nb, d["family"], d["cluster"], fmt=fmt, role="%s-copy" % fmt)
            c["table_style"] = "tab" if k % 2 == 0 else "pipe"
            made.append((c, desc, cf))
            note = "cross-format: HTML (%s) vs %s export; edit: %s (%.1f%% words changed); HTML headings/list/table rendered as %s" % (
                d["site"], fmt.upper(), ", ".join(desc), 100 * cf,
                ("underlined headings, '*' bullets, %s-separated table lines" % ("tab" if c["table_style"] == "tab" else "pipe")) if fmt == "txt" else "Markdown #/## headings, '-' list, pipe table")
            pair(d, c, "near-duplicate", note)
        (t1, de1, _), (t2, de2, _) = made
        pair(t1, t2, "near-duplicate", "cross-format: TXT vs MD export of the same notice, independently edited (%s / %s)" % (", ".join(de1), ", ".join(de2)))

    # fix relation for any near pair that fell below 0.80 (should not happen)
    for p in pairs:
        if p["relation"] == "near-duplicate" and p["body_jaccard"] < 0.80:
            raise RuntimeError("near pair below threshold: %r" % p)

    # 6. random distinct pairs per site (different clusters)
    all_sites = html_sites + ["records"]
    labelled = {(p["a"], p["b"]) for p in pairs}
    for s in all_sites:
        sd = [d for d in docs if d["site"] == s]
        got = 0
        tries = 0
        while got < 35 and tries < 10000:
            tries += 1
            a, b = rng.sample(sd, 2)
            if a["cluster"] == b["cluster"] or (a["path"], b["path"]) in labelled or (b["path"], a["path"]) in labelled:
                continue
            labelled.add((a["path"], b["path"]))
            pair(a, b, "distinct", "random same-site pair on %s (shared template, different notices: %s vs %s)" % (s, a["family"], b["family"]))
            got += 1

    # 7. hard negatives: same family form letters, different clusters, 30-60 % shared words
    cand = []
    for a, b in itertools.combinations(docs, 2):
        if a["family"] != b["family"] or a["cluster"] == b["cluster"]:
            continue
        if (a["path"], b["path"]) in labelled or (b["path"], a["path"]) in labelled:
            continue
        wa, wb = set(words(a["text"])), set(words(b["text"]))
        wj = len(wa & wb) / len(wa | wb)
        if 0.30 <= wj <= 0.60:
            cand.append((jacc(a["sh"], b["sh"]), wj, a, b))
    cand.sort(key=lambda x: -x[0])
    # half of the hard negatives are the most similar form letters, half are drawn at random
    # from the remaining candidates with at least some shared 5-word phrasing
    top, rest = cand[:150], [c for c in cand[150:] if c[0] >= 0.12]
    rng.shuffle(rest)
    cand = [c for pair_ in zip(top, rest) for c in pair_] + top[len(rest):] + rest[len(top):]
    perfam = {}
    hn = 0
    usedhn = {}
    for sj, wj, a, b in cand:
        if perfam.get(a["family"], 0) >= 8 or usedhn.get(a["path"], 0) >= 2 or usedhn.get(b["path"], 0) >= 2:
            continue
        perfam[a["family"]] = perfam.get(a["family"], 0) + 1
        usedhn[a["path"]] = usedhn.get(a["path"], 0) + 1
        usedhn[b["path"]] = usedhn.get(b["path"], 0) + 1
        labelled.add((a["path"], b["path"]))
        pair(a, b, "distinct", "hard negative: two '%s' form-letter notices with different facts (word-set overlap %.2f, %s)" % (
            a["family"], wj, "same site" if a["site"] == b["site"] else "%s vs %s" % (a["site"], b["site"])))
        hn += 1
        if hn >= 60:
            break

    # 8. write documents
    manifest = []
    for i, d in enumerate(docs):
        full = os.path.join(OUT, "inbox", d["path"])
        os.makedirs(os.path.dirname(full), exist_ok=True)
        if d["site"] == "records":
            url = "https://%s/exports/%s" % (ARCHIVE_HOST, d["path"].split("/", 1)[1])
            content = body_txt(d["blocks"], d["table_style"]) if d["fmt"] == "txt" else body_md(d["blocks"])
        else:
            cfg = SITES[d["site"]]
            url = "https://%s/%s/%s" % (cfg["host"], cfg["path"], d["path"].split("/", 1)[1])
            teasers = cfg["teasers"]
            if teasers and cfg["rotate"]:
                teasers = random.Random("%s-%s" % (SEED, d["path"])).sample(teasers, 24)
            crumbs = cfg["crumbs"] + [d["title"]] if cfg["crumbs"] else []
            content = cfg["render"](d["title"], body_html(d["blocks"], cfg["style"]), crumbs, teasers, rng)
        with open(full, "w", encoding="utf-8") as f:
            f.write(content)
        bp = os.path.join(OUT, "bodies", d["path"] + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        with open(bp, "w", encoding="utf-8") as f:
            f.write(d["text"])
        manifest.append(dict(path=d["path"], source_url=url))
    with open(os.path.join(OUT, "manifest.jsonl"), "w") as f:
        for m in manifest:
            f.write(json.dumps(m) + "\n")
    with open(os.path.join(OUT, "pairs.jsonl"), "w") as f:
        for p in pairs:
            f.write(json.dumps(p) + "\n")
    # cluster map (for auditing; not needed by the benchmark)
    with open(os.path.join(OUT, "clusters.jsonl"), "w") as f:
        for d in docs:
            f.write(json.dumps(dict(path=d["path"], cluster=d["cluster"], family=d["family"], role=d["role"], body_words=len(words(d["text"])))) + "\n")
    print("documents:", len(docs), "pairs:", len(pairs))


if __name__ == "__main__":
    main()
