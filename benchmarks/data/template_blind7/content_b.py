"""Page families for the advisories, bird survey, walking club, court listings and two small sites."""
from corpus_facts import P, H2, UL, TABLE, fmt_date, Sent

# ---------------------------------------------------------------- security advisories (small vendor)
PRODUCTS = ["Quillpine Ledger", "Quillpine Sync Agent", "Quillpine Forms Server", "Quillpine Backup Relay",
            "Quillpine Print Gateway", "Quillpine Desk Client", "Quillpine Archive Indexer"]
FLAWS = [("a path traversal in the file upload handler", "read files outside the upload folder"),
         ("missing authorisation checks on the export endpoint", "download reports belonging to other users"),
         ("a cross-site scripting flaw in the comments field", "run script in another user's browser session"),
         ("an integer overflow in the image thumbnail code", "crash the service with a crafted image"),
         ("weak default permissions on the log directory", "read session tokens written to the logs"),
         ("an open redirect on the sign-in page", "send users to a look-alike site after sign-in"),
         ("unsafe parsing of uploaded spreadsheet files", "exhaust memory on the server"),
         ("a timing difference in password checks", "learn whether an account name exists")]
ADV_DISCLAIMER = ("This advisory is provided for the information of customers and partners; "
                  "details may be revised as our investigation continues.")


def adv_advisory(g, size):
    prod = g.pick(PRODUCTS)
    flaw, impact = g.uniq(FLAWS)
    aid = f"QPS-{g.pick(['2026', '2026', '2025'])}-{g.num(1, 48):03d}"
    sev = g.pick(["Low", "Medium", "High", "Critical"])
    fixed = f"{g.num(3, 9)}.{g.num(0, 12)}.{g.num(1, 9)}"
    rep = g.person()
    title = g.s(f"{aid}: {flaw} in {prod}", f"Security advisory {aid} - {prod}")
    blocks = [P(g.s(f"{prod} contains {flaw}.", f"We have found {flaw} in {prod}."),
                g.s(f"An attacker with network access could use it to {impact}.",
                    f"Someone able to reach the service over the network could {impact}."),
                g.s(f"We rate the severity as {sev}.", f"Our severity rating is {sev}.")),
              TABLE([["Product", "Affected versions", "Fixed in"],
                     [prod, f"{fixed.split('.')[0]}.0.0 to {fixed.split('.')[0]}.{max(0, int(fixed.split('.')[1]) - 1)}.9", fixed]]
                    + ([[g.pick(PRODUCTS), f"{g.num(2, 5)}.x", "not affected"]] if g.coin() else [])),
              H2(g.ch(["What you should do", "Remediation", "Recommended action"])),
              UL([f"upgrade to {fixed} or later", g.ch(["restart the service after upgrading", "restart every node once the upgrade completes"]),
                  g.ch(["review access logs for unusual requests", "check the logs for requests you do not recognise"])][:g.num(2, 3)]),
              ]
    if size != "short":
        blocks.append(H2(g.ch(["Details", "Technical summary"])))
        blocks.append(P(g.s(f"The issue was reported to us on {fmt_date(g.date(), False)} by {rep}, to whom we are grateful.",
                            f"{rep} reported the problem on {fmt_date(g.date(), False)}; we thank them for doing so responsibly."),
                        g.s(f"We are not aware of it being exploited against customers.",
                            "We have seen no sign that it has been used against customers."),
                        g.s(f"Hosted customers were upgraded on {fmt_date(g.date(), False)} and need take no action.",
                            f"No action is needed by hosted customers, who were upgraded on {fmt_date(g.date(), False)}.")))
    if size == "long":
        blocks.append(P(g.s(f"If you cannot upgrade straight away, you can {g.pick(['disable the affected endpoint in the admin settings', 'restrict access to the service to trusted addresses', 'turn off file uploads until the upgrade'])}.",
                            f"As a stop-gap before upgrading, {g.pick(['disable the affected endpoint in the admin settings', 'restrict access to the service to trusted addresses', 'turn off file uploads until the upgrade'])}."),
                        g.s(f"Support staff can help with the change; quote {aid} when you contact them.",
                            f"Quote {aid} if you need help from support with this change.")))
        blocks.append(TABLE([["Date", "Event"], [fmt_date(g.date(), False), "Report received"],
                             [fmt_date(g.date(), False), "Fix released"], [fmt_date(g.date(), False), "Advisory published"]]))
    blocks.append(P(Sent([ADV_DISCLAIMER], 0)))
    return title, blocks


def adv_release(g, size):
    prod = g.pick(PRODUCTS)
    ver = f"{g.num(3, 9)}.{g.num(0, 12)}.{g.num(0, 9)}"
    n = g.num(2, 6)
    title = g.s(f"Security fixes in {prod} {ver}", f"{prod} {ver}: security release notes")
    blocks = [P(g.s(f"{prod} {ver} includes {n} security fixes and is recommended for all customers.",
                    f"We recommend that every customer installs {prod} {ver}, which contains {n} security fixes."),
                g.s(f"It is available now from the customer portal and through automatic updates.",
                    "You can get it now from the customer portal or through automatic updates.")),
              UL(g.sample(["tightened cookie flags on the session cookie", "removed an unused debug page",
                           "updated the bundled compression library", "stricter checks on uploaded file names",
                           "rate limiting on the password reset form", "safer defaults for new log folders",
                           "escaped user names in audit emails"], min(n, 5)))]
    if size != "short":
        blocks.append(P(g.s(f"None of these issues is known to have been exploited.", "We know of no exploitation of any of these issues."),
                        g.s(f"Thanks to {g.person()} and {g.person()} for their reports.",
                            f"Our thanks go to {g.person()} and {g.person()}, who reported several of them.")))
    blocks.append(P(Sent([ADV_DISCLAIMER], 0)))
    return title, blocks


ADV_EXTRA = ["Customers on extended support will receive the fix in the next maintenance bundle.",
             "Checksums for the release are listed on the download page."]
ADV_APPEND = ["Revision 2: the affected version range was corrected after further testing.",
              "Revision 2: a workaround for offline installations has been added."]

# ---------------------------------------------------------------- citizen-science garden bird count
SPECIES = ["house sparrow", "blue tit", "starling", "blackbird", "goldfinch", "woodpigeon", "robin",
           "great tit", "long-tailed tit", "chaffinch", "collared dove", "dunnock", "wren", "greenfinch",
           "jackdaw", "siskin", "coal tit", "bullfinch", "song thrush", "fieldfare"]


def bird_square(g, size):
    sq = f"{g.pick(['TF', 'TL', 'SK', 'TG'])}{g.num(10, 99)}{g.pick(['A', 'B', 'C', 'D'])}"
    place = g.place()
    n = g.num(6, 58)
    sp = g.sample(SPECIES, 6)
    title = g.s(f"Results for square {sq} ({place})", f"Square {sq}, {place}: this winter's count")
    blocks = [P(g.s(f"{n} gardens in square {sq}, around {place}, sent in counts this winter.",
                    f"This winter {n} gardens around {place} returned counts for square {sq}."),
                g.s(f"The most widespread bird was the {sp[0]}, seen in almost every garden.",
                    f"Almost every garden recorded the {sp[0]}, the most widespread species.")),
              TABLE([["Species", "Gardens", "Average count"]] +
                    [[s, str(g.num(2, n)), f"{g.num(1, 9)}.{g.num(0, 9)}"] for s in sp[:g.num(4, 6)]]),
              P(g.s(f"Numbers of {sp[1]} were {g.pick(['up', 'down'])} on last year, while the {sp[2]} held steady.",
                    f"The {sp[2]} held steady, but {sp[1]} numbers went {g.pick(['up', 'down'])} compared with last year."))]
    if size != "short":
        blocks.append(P(g.s(f"Square organiser {g.person()} thanks everyone who counted, especially the {g.num(3, 12)} new households.",
                            f"{g.person()}, who organises the square, thanks all counters and the {g.num(3, 12)} households taking part for the first time."),
                        g.s(f"A {sp[3]} visiting a garden on {g.street()} was the first record for the square.",
                            f"The square's first ever {sp[3]} turned up in a garden on {g.street()}.")))
    return title, blocks


def bird_species(g, size):
    sp = g.uniq(SPECIES)
    pct = g.num(3, 48)
    yrs = g.num(5, 20)
    title = g.s(f"Species spotlight: the {sp}", f"Spotlight on the {sp}")
    blocks = [P(g.s(f"Over the last {yrs} winters the {sp} has been reported from {pct} per cent {g.pick(['more', 'fewer'])} gardens in our survey area.",
                    f"Our counters have recorded the {sp} in {pct} per cent {g.pick(['more', 'fewer'])} gardens than {yrs} winters ago."),
                g.s(f"Volunteer {g.person()} has looked at the records to see what might lie behind the change.",
                    f"To understand the change, volunteer {g.person()} has been going through the records.")),
              P(g.s(f"Gardens with {g.pick(['dense hedges', 'feeders kept clean', 'ponds', 'fruit trees'])} were far more likely to report the bird.",
                    f"The bird was much more often reported from gardens that have {g.pick(['dense hedges', 'feeders kept clean', 'ponds', 'fruit trees'])}."),
                g.s(f"Cold snaps bring larger flocks into {g.pick(['towns', 'villages', 'the fen edge'])}, which can make a single winter look unusual.",
                    f"A single cold snap can push bigger flocks into {g.pick(['towns', 'villages', 'the fen edge'])} and make one winter look odd."))]
    if size != "short":
        blocks.append(H2(g.ch(["How you can help", "Helping the species"])))
        blocks.append(UL(g.sample(["keep feeders and water dishes clean", "leave some seed heads standing over winter",
                                   "plant native shrubs with berries", "record zero counts as well as sightings",
                                   "site feeders near cover but away from fences cats can use"], g.num(3, 4))))
        blocks.append(P(g.s(f"Full figures for the {sp} will appear in the annual report in {g.pick(['May', 'June', 'July'])}.",
                            f"The annual report, due in {g.pick(['May', 'June', 'July'])}, will include full figures for the {sp}.")))
    return title, blocks


def bird_update(g, size):
    who = g.person()
    d = g.date()
    total = g.num(1200, 4800)
    title = g.s(f"Volunteer update: {fmt_date(d, False)}", f"News for counters, {fmt_date(d, False)}")
    blocks = [P(g.s(f"Thank you to the {total} households who have already sent in this season's counts.",
                    f"So far {total} households have returned their counts for the season, and we are very grateful."),
                g.s(f"The closing date for forms is {fmt_date(d)}.", f"Forms must reach us by {fmt_date(d)}.")),
              P(g.s(f"{who} has joined the team as data volunteer and will be checking unusual records.",
                    f"Unusual records will now be checked by {who}, our new data volunteer."),
                g.s(f"If you are asked to confirm a sighting, a photograph or a short description is all we need.",
                    "Should we ask you about a sighting, a photo or short description will be enough."))]
    if size != "short":
        blocks.append(UL([f"training evening at {g.place()} on {fmt_date(g.date(), False)}",
                          f"count weekend: {fmt_date(g.date(), False)}", f"results talk by {g.person()}"]))
    return title, blocks


BIRD_EXTRA = ["Counts of zero are useful too, so please send them in.", "Paper forms can be returned in the freepost envelope."]
BIRD_APPEND = ["Update: late returns have now been added to the figures above.",
               "A printable version of the results is available from the square organiser."]

# ---------------------------------------------------------------- hill-walking club
FELLS = ["Hartsop Crag", "Raven Pike", "Blea Knott", "Gowder Edge", "Scarth Fell", "Mardale Rigg",
         "Howe Tarn", "Swirl Top", "Greystone Moor", "Kidsty Nab", "Brackenhow", "Lingmoor End"]


def walk_report(g, size):
    fell = g.uniq(FELLS)
    leader = g.person()
    n = g.num(6, 24)
    d = g.date()
    km = g.num(9, 26)
    title = g.s(f"Walk report: {fell} on {fmt_date(d, False)}", f"{fell} in the {g.pick(['rain', 'sun', 'mist', 'wind'])}: walk report")
    blocks = [P(g.s(f"{n} members met {leader} at the {g.pick(['village hall', 'quarry car park', 'church gate', 'pub car park'])} in {g.place()} for the walk up {fell}.",
                    f"For the {fell} walk, {n} of us gathered with leader {leader} in {g.place()}."),
                g.s(f"The forecast promised {g.pick(['showers', 'low cloud', 'a bright morning', 'strong westerlies'])}, and for once it was right.",
                    f"We had been told to expect {g.pick(['showers', 'low cloud', 'a bright morning', 'strong westerlies'])}, and that is exactly what came.")),
              P(g.s(f"We climbed steadily by the old peat road and reached the summit cairn just after {g.pick(['eleven', 'noon', 'one o clock'])}.",
                    f"The old peat road took us up steadily, and we were at the cairn soon after {g.pick(['eleven', 'noon', 'one o clock'])}."),
                g.s(f"Lunch was taken in the lee of a wall, with views across to {g.uniq(FELLS)}.",
                    f"We ate lunch behind a wall looking over towards {g.uniq(FELLS)}."))]
    if size != "short":
        blocks.append(P(g.s(f"The descent by {g.pick(['the beck', 'the old mine track', 'the north ridge'])} was slippery in places, and {g.person()} earned applause for a graceful recovery.",
                            f"Coming down by {g.pick(['the beck', 'the old mine track', 'the north ridge'])} was slippery, and {g.person()} was applauded for an elegant save."),
                        g.s(f"In all we covered {km} kilometres with {g.num(400, 1100)} metres of ascent.",
                            f"The day's totals were {km} kilometres and {g.num(400, 1100)} metres of climbing.")))
        blocks.append(UL([f"Distance: {km} km", f"Leader: {leader}", f"Walkers: {n}",
                          f"Refreshments: {g.pick(['the Drovers Arms', 'the tea room at the mill', 'the Crook Inn', 'flasks in the car park'])}"]))
    if size == "long":
        blocks.append(H2(g.ch(["Notes for next time", "Things we learned"])))
        blocks.append(P(g.s(f"The stile at the top of the intake wall is broken, and {leader} has reported it to the ranger.",
                            f"{leader} has told the ranger about the broken stile at the top of the intake wall."),
                        g.s("Gaiters would have been a good idea on the boggy section below the tarn.",
                            "The boggy ground beneath the tarn made us wish for gaiters."),
                        g.s(f"Photographs from the day are in the members' album, thanks to {g.person()}.",
                            f"{g.person()} has put photographs from the day in the members' album.")))
        blocks.append(P(g.s(f"We hope to repeat the route in {g.pick(['spring', 'autumn', 'winter'])} when the bracken has died back.",
                            f"A repeat is planned for {g.pick(['spring', 'autumn', 'winter'])}, once the bracken is down."),
                        g.s("New members are welcome on any walk graded moderate or easier.",
                            "Anyone new is welcome on walks graded moderate or below.")))
    return title, blocks


def walk_upcoming(g, size):
    fell = g.uniq(FELLS)
    d = g.date()
    leader = g.person()
    grade = g.pick(["Easy", "Moderate", "Strenuous", "Hard"])
    title = g.s(f"Coming up: {fell}, {fmt_date(d, False)}", f"Next walk: {fell} ({grade})")
    blocks = [P(g.s(f"{leader} leads a {grade.lower()} walk over {fell} on {fmt_date(d)}.",
                    f"On {fmt_date(d)}, {leader} will lead a {grade.lower()} route over {fell}."),
                g.s("Bring waterproofs, lunch and a torch, whatever the forecast says.",
                    "Whatever the forecast, please carry waterproofs, a torch and lunch.")),
              TABLE([["Meet", "Time", "Distance", "Grade"],
                     [f"{g.pick(['Car park', 'Bus stop', 'Village green'])}, {g.place()}", g.pick(["8.30am", "9am", "9.15am"]),
                      f"{g.num(8, 25)} km", grade]]),
              P(g.s(f"Car sharing can be arranged through {g.person()} by the Thursday before.",
                    f"Contact {g.person()} by the Thursday before to arrange a lift."))]
    if size != "short":
        blocks.append(P(g.s(f"The walk may be shortened or changed if the weather is poor on the tops.",
                            "In poor weather on the tops the leader may shorten or change the route.")))
    return title, blocks


def walk_safety(g, size):
    topic = g.ch(["winter skills", "river crossings", "navigation in mist", "walking after dark",
                  "cattle and footpaths", "heat and hydration", "ticks and bracken"])
    who = g.person()
    title = g.s(f"Safety note: {topic}", f"Staying safe: {topic}")
    blocks = [P(g.s(f"Our safety officer, {who}, has put together a few reminders about {topic}.",
                    f"{who}, the club safety officer, offers some reminders about {topic}."),
                g.s(f"They follow a {g.pick(['near miss', 'question from a new member', 'talk by the mountain rescue team'])} earlier this season.",
                    f"These come after a {g.pick(['near miss', 'question from a new member', 'talk by the mountain rescue team'])} this season.")),
              UL(g.sample(["tell someone your route and expected return", "carry a map and compass and know how to use them",
                           "turn back early rather than late", "keep the group together at junctions",
                           "check the forecast for the summits, not the valley", "pack a spare warm layer",
                           "know the grid reference of where you are"], g.num(3, 5))),
              P(g.s(f"A practical session on {topic} will be run at {g.place()} on {fmt_date(g.date())}.",
                    f"{who} will run a practical session on {topic} at {g.place()} on {fmt_date(g.date())}."))]
    return title, blocks


WALK_EXTRA = ["Dogs are welcome on most walks if kept on a lead near livestock.", "Please let the leader know if you leave the walk early."]
WALK_APPEND = ["Postscript: the broken stile has since been repaired by the ranger service.",
               "Postscript: a second group will repeat this route next month for those who missed it."]

# ---------------------------------------------------------------- court service listings notices
COURTS = ["Wrayfield Magistrates' Court", "Kelsworth County Court", "Saltreach Combined Court",
          "Deepford Family Court", "Harrowgill Tribunal Centre", "Ambersett Magistrates' Court"]
COURT_STOCK = "Listings are published by 4pm on the working day before the hearing and may change without notice."


def court_notice(g, size):
    court = g.pick(COURTS)
    d = g.wdate()
    what = g.ch(["Courtroom {r} will not sit", "Hearings listed in courtroom {r} will move to courtroom {q}",
                 "The list in courtroom {r} will start at 11am", "The public counter will close at 1pm",
                 "The building will open at 9.30am because of a fire drill", "Video hearings in courtroom {r} will be heard by telephone",
                 "The afternoon list in courtroom {r} is vacated", "The hearing loop in courtroom {r} is out of use"])
    what = what.format(r=g.num(1, 9), q=g.num(1, 9))
    contact = g.pick(["the listing office", "the court office", "the usher on duty", "the enquiry desk"])
    title = g.s(f"{court}: notice for {fmt_date(d, False)}", f"Listing notice, {court}, {fmt_date(d, False)}")
    blocks = [P(g.s(f"{what} at {court} on {fmt_date(d)}.", f"On {fmt_date(d)}: {what[0].lower() + what[1:]} at {court}."),
                g.s(f"Parties affected have been told by {contact}.", f"Those affected have been contacted by {contact}.")),
              P(g.s(f"Please check the daily list on the morning of {fmt_date(d, False)} before travelling.",
                    "Before travelling, check the daily list on the morning of the hearing."),
                Sent([COURT_STOCK], 0))]
    if size != "short":
        blocks.append(P(g.s(f"Questions should go to {contact}, quoting your case number.",
                            f"Quote your case number when asking {contact} about this change.")))
    return title, blocks


def court_closure(g, size):
    court = g.pick(COURTS)
    d = g.wdate()
    days = g.num(2, 10)
    alt = g.pick([c for c in COURTS if c != court])
    title = g.s(f"{court} closed from {fmt_date(d, False)}", f"Temporary closure of {court}")
    blocks = [P(g.s(f"{court} will be closed for {days} days from {fmt_date(d)} while {g.pick(['the heating is replaced', 'the cells are refurbished', 'asbestos is removed from the basement', 'the roof is repaired'])}.",
                    f"From {fmt_date(d)}, {court} closes for {days} days so that {g.pick(['the heating can be replaced', 'the cells can be refurbished', 'asbestos can be removed', 'the roof can be repaired'])}."),
                g.s(f"Urgent work will be heard at {alt}.", f"{alt} will hear any urgent business.")),
              TABLE([["Type of hearing", "Where it will be heard"],
                     ["Urgent applications", alt], ["Remand hearings", g.pick(COURTS)], ["Everything else", "Relisted after reopening"]]),
              P(Sent([COURT_STOCK], 0),
                g.s(f"Court staff will be at {alt} during the closure and can answer questions there.",
                    f"During the closure staff will work from {alt} and can take enquiries there."))]
    if size != "short":
        blocks.append(UL(["bring your hearing letter", "allow extra time for security checks",
                          f"parking near {alt} is limited", "interpreters booked for you will be told of the move"][:g.num(2, 4)]))
    return title, blocks


def court_guide(g, size):
    court = g.pick(COURTS)
    who = g.person()
    title = g.s(f"Attending a hearing at {court}", f"Your hearing at {court}: a short guide")
    blocks = [P(g.s(f"This guide explains what to expect when you come to a hearing at {court}.",
                    f"Coming to {court} for a hearing? This guide sets out what to expect."),
                g.s(f"It was written with the help of {who} from the court user group.",
                    f"{who} of the court user group helped us write it.")),
              H2(g.ch(["Before you arrive", "Getting ready"])),
              UL(g.sample(["check the daily list the evening before", "bring photo identification",
                           "arrive 45 minutes early for security checks", "bring any papers the court asked for",
                           "tell us in advance if you need an interpreter", "ask about a separate waiting room if you need one"], 4)),
              P(g.s(f"The building is on {g.street()}, a short walk from the {g.pick(['bus station', 'railway station', 'market square'])}.",
                    f"You will find us on {g.street()}, a few minutes from the {g.pick(['bus station', 'railway station', 'market square'])}."),
                Sent([COURT_STOCK], 0))]
    if size != "short":
        blocks.append(H2(g.ch(["On the day", "When you arrive"])))
        blocks.append(P(g.s("Report to the usher, who will tell you which courtroom you are in and roughly when you will be called.",
                            "The usher will tell you your courtroom and give you an idea of when you will be called."),
                        g.s(f"Refreshments are available from a machine on the {g.pick(['ground', 'first', 'second'])} floor.",
                            f"There is a drinks machine on the {g.pick(['ground', 'first', 'second'])} floor.")))
    return title, blocks


COURT_EXTRA = ["Mobile phones must be switched off in courtrooms.", "Free wifi is available in the waiting areas."]
COURT_APPEND = ["Amended: the start time above has been confirmed by the listing office.",
                "Amended: the alternative venue has been confirmed for the whole period."]

# ---------------------------------------------------------------- small site: ski school
def ski_page(g, size):
    topic = g.ch(["Beginner lessons", "Children's snow club", "Private coaching", "Avalanche awareness evening",
                  "Equipment hire", "Season passes"])
    who = g.person()
    title = g.s(f"{topic} at Corrie Ridge", f"Corrie Ridge Ski School: {topic.lower()}")
    blocks = [P(g.s(f"{topic} run every {g.pick(['morning', 'afternoon', 'weekend'])} from the base hut when the tows are open.",
                    f"When the tows are running, {topic.lower()} start from the base hut every {g.pick(['morning', 'afternoon', 'weekend'])}."),
                g.s(f"Instructor {who} has taught on the ridge for {g.num(3, 25)} seasons.",
                    f"{who} has been teaching on the ridge for {g.num(3, 25)} seasons.")),
              TABLE([["Session", "Length", "Price"]] + [[g.pick(["Morning", "Afternoon", "Full day", "Evening"]), f"{g.num(1, 6)} hours", f"{g.num(25, 140)} pounds"] for _ in range(g.num(2, 3))]),
              P(g.s(f"Book at the hut or by phone; groups are kept to {g.num(4, 8)} people.",
                    f"Groups have at most {g.num(4, 8)} people and can be booked at the hut or by phone."),
                g.s(f"If the road to {g.place()} is closed by snow, sessions move to the following day.",
                    f"Sessions move to the next day if snow closes the road from {g.place()}."))]
    if size != "short":
        blocks.append(P(g.s("Helmets are provided free with every lesson.", "Every lesson includes a free helmet."),
                        g.s(f"Hot drinks are served in the hut afterwards by {g.person()}.", f"Afterwards {g.person()} serves hot drinks in the hut.")))
    return title, blocks

# ---------------------------------------------------------------- small site: observatory public nights
def obs_page(g, size):
    d = g.date()
    target = g.ch(["Saturn and its rings", "the Orion Nebula", "the Moon's terminator", "the Andromeda galaxy",
                   "double stars in Cygnus", "Jupiter's moons", "a meteor shower"])
    who = g.person()
    title = g.s(f"Public night: {target}, {fmt_date(d, False)}", f"Hollin Hill public night - {target}")
    blocks = [P(g.s(f"Our next public night is on {fmt_date(d)}, when we hope to show {target} through the main telescope.",
                    f"On {fmt_date(d)} we open the dome to the public, hoping to show {target} through the main telescope."),
                g.s(f"{who} will give a short talk in the classroom at 7pm, whatever the sky is doing.",
                    f"At 7pm, clear or cloudy, {who} gives a short classroom talk.")),
              UL([f"Doors open: {g.pick(['6.30pm', '6.45pm', '7pm'])}", f"Entry: {g.num(3, 8)} pounds, children free",
                  "Wrap up warmly - the dome is not heated", f"Parking: the lane below {g.place()} lodge"]),
              P(g.s(f"If the sky is cloudy we will tour the dome and show images taken by members.",
                    "On a cloudy night there is a tour of the dome and a show of images taken by members."))]
    if size != "short":
        blocks.append(P(g.s("Please use red torches only in the grounds after dark.", "After dark, only red torches please in the grounds.")))
    return title, blocks
