#!/usr/bin/env python3
"""Blind near-duplicate benchmark corpus generator (blind13v2).

Writes a corpus of thin web pages wrapped in heavy/light site templates, plus
plain-text / Markdown / PDF exports, together with ground-truth bodies and
pair labels.  Standard library + fpdf2 only.  Fully deterministic (fixed seed).

    python3 make_corpus.py [--out DIR]
"""
import argparse
import copy
import datetime
import html
import json
import os
import random
import re
import shutil
import textwrap

SEED = 1302
HERE = os.path.dirname(os.path.abspath(__file__))

# ---------------------------------------------------------------------------
# Jaccard machinery (must match the README / validate.py definition exactly)
# ---------------------------------------------------------------------------
_PUNCT = re.compile(r"[^\w\s]")


def norm_tokens(text):
    return _PUNCT.sub("", text.lower()).split()


def shingles(text):
    t = norm_tokens(text)
    return set(tuple(t[i:i + 5]) for i in range(len(t) - 4))


def jacc(a, b):
    if not a and not b:
        return 1.0
    return len(a & b) / len(a | b)


def R(key):
    """Deterministic sub-generator (string seeds are hashed with sha512)."""
    return random.Random("%d/%s" % (SEED, key))


# ---------------------------------------------------------------------------
# Block helpers.  A body is a list of blocks:
#   ("h1", text) ("h2", text) ("p", text) ("ul", [items]) ("ol", [items])
#   ("table", [header_row, row, ...])
# ---------------------------------------------------------------------------
def body_lines(blocks):
    out = []
    for b in blocks:
        k, v = b
        if k in ("h1", "h2", "p"):
            out.append(v)
        elif k in ("ul", "ol"):
            out.extend(v)
        elif k == "table":
            out.extend("\t".join(r) for r in v)
    return out


def body_text(blocks):
    return "\n".join(body_lines(blocks))


def word_count(blocks):
    return len(norm_tokens(body_text(blocks)))


def pick(rng, seq, k):
    k = max(0, min(k, len(seq)))
    return rng.sample(list(seq), k)


# ---------------------------------------------------------------------------
# Shared slot values
# ---------------------------------------------------------------------------
MONTHS = ["January", "February", "March", "April", "May", "June", "July",
          "August", "September", "October", "November", "December"]
WEEKDAYS = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday",
            "Saturday", "Sunday"]
YEARS = [2024, 2025, 2026]


def a_date(rng, year=None):
    y = year or rng.choice(YEARS)
    m = rng.randrange(12)
    d = rng.randint(1, 28)
    wd = WEEKDAYS[datetime.date(y, m + 1, d).weekday()]
    return "%s %d %s %d" % (wd, d, MONTHS[m], y)


def a_time(rng, lo=8, hi=20):
    h = rng.randint(lo, hi)
    return "%d:%s" % (h, rng.choice(["00", "30", "15", "45"]))


PEOPLE = ["Dr. Maren Oduya", "Prof. Tobias Wrenfield", "Dr. Ilse Carraway",
          "Dr. Samir Quellet", "Prof. Hedda Lindqvar", "Dr. Owen Pratchley",
          "Dr. Rosa Ventimor", "Prof. Anton Kyriel", "Dr. Lina Hobbewell",
          "Dr. Petra Snowcombe"]

# ===========================================================================
# FAMILY 1: course descriptions  (university department portal)
# ===========================================================================
COURSES = [
    ("CS 110", "Introduction to Programming", "first-year",
     ["Students write small programs in Python from the first week and gradually move on to functions, files and simple data analysis.",
      "No prior programming experience is assumed, but regular practice between sessions is essential."],
     ["variables, expressions and types", "conditionals and loops", "functions and modules",
      "reading and writing files", "testing small programs", "working with lists and dictionaries"]),
    ("CS 210", "Data Structures", "second-year",
     ["The course studies how the choice of a data structure shapes the running time and memory use of a program.",
      "Weekly labs ask students to implement each structure themselves and to measure it on realistic inputs."],
     ["arrays and linked lists", "stacks and queues", "hash tables and collisions",
      "binary search trees", "heaps and priority queues", "graph representations"]),
    ("CS 225", "Computer Organisation", "second-year",
     ["This module follows a program all the way down to the instructions that a processor actually executes.",
      "Students build a tiny processor in a logic simulator and write short routines in assembly language."],
     ["binary and hexadecimal representation", "logic gates and circuits", "assembly language",
      "the memory hierarchy and caches", "pipelining", "interrupts and input and output"]),
    ("CS 240", "Databases", "second-year",
     ["Almost every application stores data, and this course shows how to model it, query it and keep it consistent.",
      "Coursework is built around a single case study of a lending library that grows in complexity during the term."],
     ["the relational model", "writing SQL queries", "normalisation and schema design",
      "transactions and isolation levels", "indexes and query plans", "backup and recovery"]),
    ("CS 305", "Operating Systems", "third-year",
     ["Operating systems sit between hardware and applications, and this course explains the abstractions they provide.",
      "Students extend a small teaching kernel with a scheduler, a simple file system and system calls."],
     ["processes and threads", "CPU scheduling policies", "virtual memory and paging",
      "file systems", "synchronisation and deadlock", "device drivers"]),
    ("CS 318", "Computer Networks", "third-year",
     ["The course takes a top-down view of networking, starting with applications that students already use every day.",
      "Practical sessions use packet captures to show what really travels over the wire."],
     ["application protocols", "transport protocols and congestion control", "routing and addressing",
      "link layers and wireless networks", "network security basics", "measuring latency and throughput"]),
    ("CS 330", "Software Engineering Studio", "third-year",
     ["Teams of five build and ship a working product for an external client over the course of the term.",
      "The studio format replaces lectures with weekly stand-ups, design reviews and a public demo day."],
     ["requirements gathering with a client", "version control and code review", "automated testing",
      "continuous integration", "estimating and planning work", "presenting a product"]),
    ("CS 342", "Human-Computer Interaction", "third-year",
     ["This course is about designing software that people can actually use, and about checking that they can.",
      "Students run small usability studies with volunteers and redesign an interface based on what they observe."],
     ["user research methods", "sketching and prototyping", "usability testing",
      "accessibility guidelines", "visual hierarchy and layout", "evaluating designs with data"]),
    ("CS 355", "Machine Learning Foundations", "third-year",
     ["The module introduces the core ideas of learning from data, with an emphasis on understanding rather than tools.",
      "Each algorithm is first derived on paper and then implemented from scratch in a notebook."],
     ["linear and logistic regression", "overfitting and regularisation", "decision trees",
      "evaluation and cross-validation", "clustering", "the ethics of automated decisions"]),
    ("CS 361", "Compilers", "fourth-year",
     ["Over the term students write a complete compiler for a small teaching language called Tern.",
      "The project is split into milestones so that every stage, from the lexer to code generation, is tested on its own."],
     ["lexical analysis", "parsing and syntax trees", "type checking",
      "intermediate representations", "register allocation", "simple optimisations"]),
    ("CS 372", "Computer Security", "fourth-year",
     ["The course looks at how systems fail under attack and how careful design can prevent the most common failures.",
      "Lab exercises take place in an isolated network where students attack and then repair deliberately weak services."],
     ["threat modelling", "memory safety bugs", "web application vulnerabilities",
      "cryptography in practice", "authentication and passwords", "responsible disclosure"]),
    ("CS 410", "Distributed Systems", "fourth-year",
     ["Modern services run on many machines at once, and this module explains how they stay correct when parts fail.",
      "The main assignment is a replicated key-value store that must survive the loss of any single node."],
     ["clocks and ordering of events", "replication", "consensus protocols",
      "partitioning and sharding", "fault tolerance", "consistency models"]),
    ("CS 421", "Computer Graphics", "fourth-year",
     ["Students learn how images are produced from geometric descriptions, from the maths of transformations to shading.",
      "By the end of the course each student has written a small ray tracer and a real-time renderer."],
     ["transformations and projections", "rasterisation", "lighting and shading models",
      "textures and sampling", "ray tracing", "animation basics"]),
    ("CS 455", "Research Methods Seminar", "fourth-year",
     ["The seminar prepares final-year students for their dissertation by practising how research questions are framed and tested.",
      "Every week one student presents a published paper and leads the discussion that follows."],
     ["reading a research paper critically", "framing a research question", "experimental design",
      "statistics for computer scientists", "writing a literature review", "research ethics approval"]),
]
COURSE_TERMS = ["autumn", "spring", "summer"]
COURSE_ROOMS = ["Hallam Building room 2.14", "the Mercer Lecture Theatre", "Lab B in the Foundry Wing",
                "Seminar Room 4 in the Old Library", "room G.07 of the Castell Building"]
COURSE_DAYS = ["Mondays and Wednesdays", "Tuesdays and Thursdays", "Mondays and Fridays",
               "Wednesdays and Fridays", "Tuesdays and Fridays"]
COURSE_SLOTS = ["9:00 to 10:30", "11:00 to 12:30", "13:30 to 15:00", "15:30 to 17:00"]
COURSE_INTRO = [
    "This {level} module runs in the {term} term of {year} and carries {credits} credits.",
    "{name} is offered in the {term} term of {year} and is worth {credits} credit points.",
    "The module is taught in the {term} term of {year}; it is a {credits}-credit option for {level} students.",
    "In {year} the course runs during the {term} term and counts for {credits} credits towards the degree.",
]
COURSE_TOPIC_H = ["Topics", "What you will learn", "Course content", "Syllabus outline"]
COURSE_TEACH = [
    "Lectures take place on {days} from {slot} in {room}, and there is a {lab}-hour lab every week.",
    "Teaching consists of two lectures a week on {days}, {slot}, held in {room}, plus a weekly {lab}-hour practical.",
    "Expect {lab} hours of supervised lab work each week in addition to lectures on {days} ({slot}, {room}).",
]
COURSE_PREREQ = [
    "Students should have passed {pre} or an equivalent course before enrolling.",
    "The formal prerequisite is {pre}; students from other programmes may ask the coordinator for an exception.",
    "You will need {pre}, or comparable experience confirmed by the admissions tutor.",
]
COURSE_STAFF = [
    "The course is coordinated by {who}, whose office hours are on {ohday} afternoons.",
    "{who} leads the module this year and answers questions on the course forum.",
    "Questions about the module can be sent to the coordinator, {who}, or raised at the {ohday} drop-in.",
]
COURSE_OUTCOMES = [
    "explain the main ideas of the module in their own words",
    "apply the techniques covered to unfamiliar problems",
    "write clear, tested code that others can read",
    "compare alternative solutions and justify a choice",
    "work effectively in a small team",
    "present technical work to a non-specialist audience",
    "find and evaluate relevant technical literature",
]
ASSESS = [("Weekly labs", [10, 15, 20]), ("Problem sheets", [10, 15]), ("Midterm test", [20, 25]),
          ("Group project", [20, 25, 30]), ("Individual report", [15, 20]), ("Final exam", [30, 40, 50])]


def gen_course(rng, item, size):
    code, name, level, blurb, topics = item
    year = rng.choice(YEARS)
    f = dict(code=code, name=name, level=level, term=rng.choice(COURSE_TERMS), year=year,
             credits=rng.choice([10, 15, 20, 30]))
    title = "%s: %s" % (code, name)
    b = [("h1", title)]
    sents = list(blurb)
    if rng.random() < 0.35:
        sents = sents[:1]
    intro = rng.choice(COURSE_INTRO).format(**f)
    intro = intro[0].upper() + intro[1:]
    b.append(("p", " ".join([intro] + sents) if rng.random() < 0.5 else " ".join(sents + [intro])))
    b.append(("h2", rng.choice(COURSE_TOPIC_H)))
    b.append(("ul", pick(rng, topics, rng.randint(3, 6))))
    long_ = size == "long"
    if long_ or rng.random() < 0.4:
        b.append(("h2", rng.choice(["Teaching and assessment", "How the course is taught", "Teaching"])))
        b.append(("p", rng.choice(COURSE_TEACH).format(days=rng.choice(COURSE_DAYS), slot=rng.choice(COURSE_SLOTS),
                                                       room=rng.choice(COURSE_ROOMS), lab=rng.choice([1, 2, 3]))))
    if long_ or rng.random() < 0.3:
        comps = pick(rng, ASSESS, rng.randint(2, 4))
        rows = [["Component", "Weight", "Due"]]
        left = 100
        for i, (c, ws) in enumerate(comps):
            w = left if i == len(comps) - 1 else min(rng.choice(ws), left - 10 * (len(comps) - i - 1))
            left -= w
            rows.append([c, "%d%%" % w, "week %d" % rng.randint(3, 12) if "exam" not in c.lower() else "exam period"])
        b.append(("table", rows))
    if long_ and rng.random() < 0.8:
        b.append(("h2", rng.choice(["Learning outcomes", "By the end of the course"])))
        b.append(("p", rng.choice(["Students who complete the module will be able to:",
                                   "On successful completion students should be able to:"])))
        b.append(("ul", pick(rng, COURSE_OUTCOMES, rng.randint(3, 5))))
    other = [c for c in COURSES if c[0] < code]
    pre = ("%s %s" % (rng.choice(other)[0], rng.choice(other)[1]) if other else "A-level mathematics")
    tail = []
    if rng.random() < 0.6:
        tail.append(rng.choice(COURSE_PREREQ).format(pre=pre if other else "a qualification in mathematics"))
    if rng.random() < 0.6 or not tail:
        tail.append(rng.choice(COURSE_STAFF).format(who=rng.choice(PEOPLE), ohday=rng.choice(WEEKDAYS[:5])))
    b.append(("h2", rng.choice(["Practical information", "Enrolment", "Contact and requirements"])))
    b.append(("p", " ".join(tail)))
    return title, b


# ===========================================================================
# FAMILY 2: event listings (university + tourism + local notes)
# ===========================================================================
EVENTS = [
    ("uni", "Open Day for Prospective Students",
     ["Visitors can tour the teaching labs, sit in on a taster lecture and talk to current students about life in the department.",
      "Parents and carers are welcome, and there is a separate question session about funding and accommodation."],
     ["Welcome talk from the head of department", "Taster lecture on algorithms", "Lab tours in small groups",
      "Lunch with current students", "Funding and accommodation questions", "Campus walk"]),
    ("uni", "Careers Fair for Computing Students",
     ["Around thirty employers, from small studios to public-sector teams, will be recruiting for placements and graduate roles.",
      "Bring a few printed copies of your CV; the careers team will also run quick CV checks on the day."],
     ["Doors open", "Panel on first graduate jobs", "Employer stands", "Quick CV checks",
      "Talk on placement years", "Closing networking session"]),
    ("uni", "Student Hackathon: Build for the Town",
     ["Teams of up to four have one day to build something useful for a local charity, using open data supplied by the town council.",
      "Mentors from the department will be on hand all day, and no previous hackathon experience is needed."],
     ["Registration and team forming", "Briefing from the charities", "Hacking begins", "Pizza break",
      "Mentor check-ins", "Final demos and judging"]),
    ("uni", "Research Seminar: Verifying Small Programs",
     ["The speaker will show how lightweight proof tools can catch bugs in short but critical pieces of code, such as parsers.",
      "The talk is aimed at a general computing audience and assumes no background in formal methods."],
     ["Coffee and introductions", "Main talk", "Live demonstration", "Questions from the audience"]),
    ("uni", "Alumni Evening: Careers in Games",
     ["Three former students who now work in game development will talk about how they got their first jobs.",
      "The evening ends with an informal reception where current students can ask questions in small groups."],
     ["Arrival and refreshments", "Short talks from three alumni", "Panel discussion", "Reception"]),
    ("uni", "Women in Computing Networking Breakfast",
     ["The breakfast brings together students and staff for an informal morning of conversation and mentoring.",
      "It is organised by the student society together with the department's equality committee."],
     ["Breakfast is served", "Welcome from the society", "Mentoring tables", "Close"]),
    ("uni", "Coding Club for Secondary Schools",
     ["Pupils aged 13 to 16 spend the afternoon programming small robots with help from undergraduate volunteers.",
      "Places are booked through schools, and each school may bring up to eight pupils with one teacher."],
     ["Arrival and safety briefing", "Introduction to the robots", "Programming challenge",
      "Robot race", "Certificates"]),
    ("uni", "Dissertation Poster Exhibition",
     ["Final-year students present posters on their dissertation projects, covering everything from robotics to music software.",
      "Staff, students and members of the public are invited to browse the posters and vote for their favourite."],
     ["Exhibition opens", "Guided walk-round with the judges", "Public voting", "Prize announcement"]),
    ("town", "Harbour Lantern Parade",
     ["Hundreds of paper lanterns made in community workshops are carried along the quay from the fish market to the lifeboat station.",
      "The parade is led by a brass band and ends with a short display of lights on the water."],
     ["Lantern collection at the fish market", "Parade sets off", "Brass band on the quay",
      "Light display over the harbour", "Hot drinks at the lifeboat station"]),
    ("town", "Saturday Farmers' Market",
     ["Around forty stalls sell vegetables, cheese, bread and smoked fish from farms and kitchens within thirty miles of the bay.",
      "Many traders accept cards, but it is worth bringing some cash and a shopping bag."],
     ["Market opens", "Cookery demonstration", "Children's tasting trail", "Market closes"]),
    ("town", "Jazz on the Quay",
     ["Local and visiting bands play on an open-air stage beside the old customs house, with seating on the harbour steps.",
      "Food stalls stay open throughout, and the programme moves indoors to the Assembly Rooms if it rains."],
     ["First set from a local trio", "Swing band", "Interval", "Headline set", "Late jam session"]),
    ("town", "Maritime Museum Late Opening",
     ["The museum opens its galleries after dark, with torch-lit tours of the ship models and talks from volunteer curators.",
      "The cafe serves supper, and the rooftop terrace is open for views over the harbour."],
     ["Doors open", "Torch-lit gallery tour", "Curator talk on shipwrecks", "Rooftop terrace opens",
      "Last admission"]),
    ("town", "Guided Walk on the Coastal Path",
     ["A ranger leads a walk of about eight kilometres along the cliffs, pointing out seabird colonies and old smugglers' coves.",
      "The route is uneven in places, so sturdy shoes and a waterproof jacket are essential."],
     ["Meet at the lighthouse car park", "Seabird colony viewpoint", "Rest stop at Gull Point",
      "Descent to the cove", "Return by the inland path"]),
    ("town", "Seafood Festival",
     ["Restaurants from around the bay cook on the harbour front, and local boats bring in the catch during the morning.",
      "There are cookery demonstrations, a children's area and live music on both days."],
     ["Festival opens", "Catch landed by local boats", "Cookery demonstration", "Oyster shucking contest",
      "Live music"]),
    ("town", "Open-Air Cinema in Castle Gardens",
     ["A family film is shown on a large screen in the castle gardens, with deckchairs for hire and blankets welcome.",
      "The screening starts at dusk, and the gates open an hour earlier for picnics."],
     ["Gates open for picnics", "Pre-show quiz", "Screening begins", "Gates close"]),
    ("town", "Kite Festival on the Dunes",
     ["Kite flyers from across the region fill the sky above the north dunes with giant show kites and synchronised teams.",
      "Children can make a simple kite in the craft tent and fly it in the junior arena."],
     ["Arena opens", "Junior kite making", "Team flying display", "Giant kite parade", "Night kites with lights"]),
    ("town", "Winter Craft Market",
     ["More than sixty makers sell pottery, knitwear, prints and wooden toys in the covered market hall.",
      "Carol singers perform on the steps outside, and the hall stays open late on the Friday."],
     ["Market opens", "Carol singers", "Late opening", "Market closes"]),
    ("town", "Harbour Regatta",
     ["Rowing crews and sailing dinghies race across the bay in a programme that has run, with a few breaks, for over a century.",
      "The best views are from the harbour wall, where a commentary is broadcast over speakers."],
     ["Junior rowing heats", "Dinghy race", "Veterans' rowing", "Gig racing final", "Prize giving"]),
]
EVENT_VENUES = {
    "uni": ["the Hallam Building foyer", "the Mercer Lecture Theatre", "the Foundry Wing labs",
            "the Student Union main hall", "the Castell Building atrium"],
    "town": ["the harbour front", "Castle Gardens", "the Assembly Rooms", "the covered market hall",
             "the north dunes", "the fish market square"],
}
EVENT_WHEN = [
    "{title} takes place on {date} from {start} to {end} at {venue}.",
    "Join us at {venue} on {date}, {start} to {end}.",
    "The event runs from {start} until {end} on {date}, at {venue}.",
    "Date: {date}. Time: {start} to {end}. Place: {venue}.",
]
EVENT_PRICE = [
    "Entry is free, but please register in advance so that we can plan numbers.",
    "Tickets cost {p} for adults and {c} for under-16s, and can be bought on the day.",
    "Admission is {p}; children under five go free.",
    "The event is free and there is no need to book.",
    "Places are limited to {n} and must be booked in advance.",
]
EVENT_GOOD = [
    "The venue is step-free and has accessible toilets.",
    "There is no parking on site; the nearest car park is a ten-minute walk away.",
    "Dogs on leads are welcome.",
    "The event goes ahead in light rain but may be cancelled in high winds.",
    "Food and drink will be available to buy.",
    "Photographs will be taken for publicity; tell a steward if you prefer not to appear.",
    "Under-16s must be accompanied by an adult.",
    "Bring a water bottle; refill points are available.",
    "Quiet space is available for anyone who needs a break.",
]
EVENT_CONTACT = [
    "For questions, email {mail} or call {phone}.",
    "Contact the organisers at {mail}.",
    "Enquiries: {phone} (weekdays, 9:00 to 17:00).",
]


def phone(rng):
    return "0100 555 0%03d" % rng.randint(100, 199)


def gen_event(rng, item, size):
    kind, title0, desc, prog = item
    year = rng.choice(YEARS)
    title = title0 if rng.random() < 0.6 else "%s %d" % (title0, year)
    date = a_date(rng, year)
    sh = rng.randint(9, 17)
    f = dict(title=title0, date=date, start="%d:00" % sh, end="%d:%s" % (sh + rng.randint(2, 5), rng.choice(["00", "30"])),
             venue=rng.choice(EVENT_VENUES[kind]))
    b = [("h1", title)]
    d = list(desc)
    if rng.random() < 0.3:
        d = d[:1]
    when = rng.choice(EVENT_WHEN).format(**f)
    b.append(("p", when))
    b.append(("p", " ".join(d)))
    long_ = size == "long"
    if long_ or rng.random() < 0.4:
        b.append(("h2", rng.choice(["Programme", "Schedule", "What's on"])))
        steps = prog[:]
        if len(steps) > 3 and rng.random() < 0.5:
            steps = steps[:len(steps) - 1]
        t = sh * 60
        rows = [["Time", "Activity"]]
        for s in steps:
            rows.append(["%d:%02d" % (t // 60, t % 60), s])
            t += rng.choice([15, 30, 45, 60])
        b.append(("table", rows))
    b.append(("h2", rng.choice(["Tickets", "Admission", "Booking"])))
    b.append(("p", rng.choice(EVENT_PRICE).format(p="%d pounds" % rng.randint(3, 15), c="%d pounds" % rng.randint(1, 5),
                                                  n=rng.choice([40, 60, 80, 120]))))
    if long_ or rng.random() < 0.5:
        b.append(("h2", rng.choice(["Good to know", "Before you come", "Practical details"])))
        b.append(("ul", pick(rng, EVENT_GOOD, rng.randint(2, 5 if long_ else 3))))
    if rng.random() < 0.7:
        mail = "events@%s" % ("cs.northvale-university.example.org" if kind == "uni" else "visit-marlowbay.example.com")
        b.append(("p", rng.choice(EVENT_CONTACT).format(mail=mail, phone=phone(rng))))
    return title, b


# ===========================================================================
# FAMILY 3: help-centre articles (e-commerce help + forum KB)
# ===========================================================================
HELP = [
    ("How do I return an item?",
     "You can send back most items within {days} days of delivery, as long as they are unused and in their original packaging.",
     ["Sign in and open Your orders.", "Choose the order and select Return an item.",
      "Pick a reason for the return and how you would like to be refunded.",
      "Print the prepaid label, or show the QR code at a drop-off point.",
      "Hand the parcel to the courier or drop it off within seven days."],
     ["Personalised items and opened hygiene products cannot be returned.",
      "Large items are collected from your door instead of dropped off.",
      "You will get an email when the warehouse has checked your return."]),
    ("Tracking your order",
     "Once your order has been dispatched we send you an email with a tracking link from the courier.",
     ["Open the dispatch email and select Track parcel.", "Or sign in and go to Your orders.",
      "Select the order to see its current status and the expected delivery date.",
      "If the tracking has not changed for three working days, contact us."],
     ["Orders with several items may arrive in separate parcels, each with its own tracking link.",
      "Tracking can take up to 24 hours to appear after dispatch.",
      "Some couriers let you choose a safe place or a neighbour from the tracking page."]),
    ("Changing your delivery address",
     "You can change the delivery address for an order until it has been packed in our warehouse.",
     ["Sign in and open Your orders.", "Select the order and choose Change address.",
      "Pick a saved address or add a new one.", "Confirm the change; we will email you to say it has been applied."],
     ["Once an order has been packed the address can only be changed with the courier.",
      "Changing the address may change the delivery charge.",
      "For security, some address changes need to be confirmed by text message."]),
    ("Using a gift card",
     "Gift cards can be used to pay for all or part of an order on the website and in the app.",
     ["Add items to your basket and go to checkout.", "In the payment step, select Add a gift card.",
      "Enter the sixteen-digit card number and the four-digit PIN.",
      "Pay any remaining balance with another payment method."],
     ["Gift cards are valid for {months} months from the date of purchase.",
      "You can check the balance of a card at any time from your account.",
      "Gift cards cannot be exchanged for cash."]),
    ("Why was my payment declined?",
     "A payment can be declined by your bank for several reasons, and we are not always told which one applies.",
     ["Check that the card number, expiry date and security code are entered correctly.",
      "Make sure the billing address matches the address your bank holds.",
      "Approve the payment in your banking app if you are asked to.",
      "Try another card, or contact your bank if the problem continues."],
     ["We never store your full card number.",
      "A declined payment does not leave a charge on your account, although a pending amount may show for a few days.",
      "Some banks block online payments above a certain amount by default."]),
    ("Cancelling an order",
     "Orders can be cancelled free of charge until they are dispatched from our warehouse.",
     ["Sign in and open Your orders.", "Select the order and choose Cancel items.",
      "Tick the items you want to cancel and confirm.", "You will receive a cancellation email within a few minutes."],
     ["If the order has already been dispatched, you can return it instead.",
      "Refunds for cancelled orders are made to the original payment method.",
      "Pre-orders can be cancelled at any time before release."]),
    ("Delivery options and costs",
     "We deliver to every address in the country, and you can choose a delivery option at checkout.",
     ["Add your items to the basket.", "At checkout, enter your postcode to see the options available.",
      "Choose a delivery option and, if offered, a delivery day.", "Complete your payment."],
     ["Orders are not delivered on public holidays.",
      "Remote areas may take one extra working day.",
      "Large items are delivered by a two-person team who will call ahead."]),
    ("Reporting a damaged parcel",
     "We are sorry if your order arrived damaged; please tell us within {days} days so that we can put it right.",
     ["Take photographs of the parcel and of the damaged item.", "Sign in and open Your orders.",
      "Select the order and choose Report a problem.", "Upload the photographs and say whether you want a replacement or a refund."],
     ["Please keep the packaging until the claim is settled.",
      "You do not need to send back small damaged items.",
      "If the parcel looks damaged at the door, you can refuse it."]),
    ("Setting up two-step verification",
     "Two-step verification adds a second check when you sign in, so that your password alone is not enough to access your account.",
     ["Sign in and open Account settings.", "Choose Security and then Two-step verification.",
      "Scan the code with an authenticator app, or choose text messages.",
      "Enter the six-digit code to finish.", "Save your backup codes somewhere safe."],
     ["You can turn two-step verification off again in the same menu.",
      "If you lose your phone, use a backup code to sign in.",
      "We will never ask you for a verification code by phone."]),
    ("Updating your payment details",
     "Saved cards make checkout quicker, and you can add, edit or remove them at any time.",
     ["Sign in and open Account settings.", "Choose Payment methods.",
      "Select Add a card, or choose Edit next to an existing card.", "Save your changes."],
     ["Cards used for an open order cannot be removed until the order is complete.",
      "Expired cards are removed automatically after {months} months.",
      "Your full card number is never shown again after it is saved."]),
    ("Price match promise",
     "If you find the same item cheaper at another retailer within {days} days of buying it from us, we will refund the difference.",
     ["Find the lower price on the other retailer's website.", "Sign in and open Your orders.",
      "Choose Price match on the item and paste the link to the cheaper offer.",
      "We will check the claim within two working days."],
     ["The item must be identical, new and in stock at the other retailer.",
      "Prices in marketplace listings and clearance sales are excluded.",
      "Only one price match can be claimed per item."]),
    ("Exchanging an item for a different size",
     "Clothing and footwear can be exchanged for a different size within {days} days, with free delivery on the replacement.",
     ["Sign in and open Your orders.", "Select the item and choose Exchange.",
      "Pick the new size; we will reserve it for you.",
      "Send back the original item using the prepaid label.",
      "The replacement is dispatched as soon as the courier scans your parcel."],
     ["Exchanges are only possible when the new size is in stock.",
      "If the price has changed, you keep the original price.",
      "Items bought in a sale can be exchanged but not returned after {days} days."]),
]
HELP_REGIONS = [("United Kingdom", "pounds"), ("Ireland", "euros"), ("Netherlands", "euros"),
                ("Denmark", "kroner"), ("Norway", "kroner")]
HELP_CLOSE = [
    "Still need help? Our support team replies within {h} hours on working days.",
    "If this did not answer your question, contact us through the chat button and an agent will reply within {h} hours.",
    "Can't find what you need? Call us on {phone}, {wd} to Friday, 8:00 to {end}.",
    "You can also message us from the app; most messages are answered within {h} hours.",
]
HELP_STEPS_H = ["Steps", "How to do it", "Step by step", "What to do"]
HELP_NOTES_H = ["Good to know", "Things to check", "Please note", "Before you start"]


def gen_help(rng, item, size):
    title0, intro, steps, notes = item
    region, cur = rng.choice(HELP_REGIONS)
    f = dict(days=rng.choice([14, 28, 30, 60]), months=rng.choice([12, 24, 36]))
    title = title0
    b = [("h1", title)]
    lead = intro.format(**f)
    extra = rng.choice(["This page applies to orders delivered in the %s." % region,
                        "The information below is for customers in the %s." % region,
                        "These rules apply to deliveries in the %s." % region, ""])
    b.append(("p", (lead + " " + extra).strip()))
    b.append(("h2", rng.choice(HELP_STEPS_H)))
    st = steps[:]
    if len(st) > 3 and rng.random() < 0.4:
        st.pop(rng.randrange(1, len(st)))
    b.append(("ol", st))
    long_ = size == "long"
    if "Delivery" in title0 or long_ and rng.random() < 0.6:
        rows = [["Option", "Cost", "Delivery time"]]
        opts = [("Standard", "3 to 5 working days"), ("Express", "next working day"),
                ("Nominated day", "on the day you choose"), ("Click and collect", "2 to 4 working days"),
                ("Evening", "next working day, 18:00 to 22:00")]
        for o, t in pick(rng, opts, rng.randint(2, 4)):
            rows.append([o, "%d.%02d %s" % (rng.randint(0, 9), rng.choice([0, 49, 95, 99]), cur), t])
        b.append(("table", rows))
    if long_ or rng.random() < 0.5:
        b.append(("h2", rng.choice(HELP_NOTES_H)))
        b.append(("ul", [n.format(**f) for n in pick(rng, notes, rng.randint(2, 3))]))
    if long_:
        b.append(("h2", rng.choice(["Refunds", "When will I get my money back?", "Refund timing"])))
        rows = [["Payment method", "Refund time"]]
        for m in pick(rng, ["Card", "Gift card", "Digital wallet", "Pay later", "Bank transfer"], 3):
            rows.append([m, "%d to %d working days" % ((lambda a: (a, a + rng.randint(2, 5)))(rng.randint(1, 5)))])
        b.append(("table", rows))
        b.append(("p", rng.choice([
            "Refunds are issued as soon as your return has been checked, which usually takes two working days after it reaches us.",
            "We start your refund once the returned item has been inspected at our warehouse.",
            "Your bank may take a few extra days to show the refund on your statement."])))
    b.append(("p", rng.choice(HELP_CLOSE).format(h=rng.choice([12, 24, 48]), phone=phone(rng),
                                                 wd=rng.choice(["Monday"]), end=rng.choice(["18:00", "20:00"]))))
    return title, b


# ===========================================================================
# FAMILY 4: product FAQ answers
# ===========================================================================
PRODUCTS = [
    ("Alder 30L daypack", "bag", "The Alder has a padded laptop sleeve, a roll-top closure and side pockets sized for a one-litre bottle.",
     [("Volume", "30 litres"), ("Weight", "890 g"), ("Fabric", "recycled nylon with a waxed coating"), ("Laptop sleeve", "up to 16 inches")]),
    ("Brisk 2 electric kettle", "appliance", "The Brisk 2 boils a full jug in just under three minutes and has five temperature presets for different teas.",
     [("Capacity", "1.7 litres"), ("Power", "2200 W"), ("Presets", "70, 80, 85, 90 and 100 degrees"), ("Keep warm", "up to 30 minutes")]),
    ("Cobble desk lamp", "light", "The Cobble lamp has a weighted concrete base, a dimmable LED head and a USB-C port for charging a phone.",
     [("Brightness", "up to 600 lumens"), ("Colour temperature", "2700 K to 5000 K"), ("Base", "cast concrete"), ("Charging port", "USB-C, 15 W")]),
    ("Drift wireless earbuds", "audio", "Drift earbuds offer about seven hours of playback per charge and another twenty hours from the charging case.",
     [("Battery", "7 hours, 27 with case"), ("Water resistance", "IPX4"), ("Bluetooth", "5.3"), ("Charging", "USB-C and wireless")]),
    ("Ember cast-iron skillet", "kitchen", "The Ember skillet is pre-seasoned with vegetable oil and works on gas, electric, induction and open fires.",
     [("Diameter", "26 cm"), ("Weight", "2.4 kg"), ("Finish", "pre-seasoned"), ("Oven safe", "up to 260 degrees")]),
    ("Fjell down jacket", "clothing", "The Fjell uses responsibly sourced down and a windproof outer shell that packs into its own pocket.",
     [("Fill", "700 fill power down"), ("Shell", "recycled polyester"), ("Weight", "410 g"), ("Fit", "regular")]),
    ("Gale stand fan", "appliance", "The Gale fan has twelve speed settings, a night mode and a remote control that stores inside the base.",
     [("Height", "adjustable, 95 to 125 cm"), ("Speeds", "12"), ("Timer", "1 to 8 hours"), ("Noise", "from 24 dB")]),
    ("Heron bird feeder camera", "outdoor", "The Heron feeder takes a photo whenever a bird lands and sends it to the companion app over Wi-Fi.",
     [("Camera", "5 MP with night vision"), ("Power", "rechargeable battery and optional solar panel"), ("Seed capacity", "1.5 litres"), ("Connectivity", "2.4 GHz Wi-Fi")]),
    ("Isla yoga mat", "sport", "The Isla mat is made from natural rubber with a grippy top layer and alignment lines printed along its length.",
     [("Size", "183 by 61 cm"), ("Thickness", "4 mm"), ("Material", "natural rubber"), ("Weight", "2.5 kg")]),
    ("Juniper plant pot set", "home", "The Juniper set contains three glazed stoneware pots with matching saucers and drainage holes.",
     [("Sizes", "12, 15 and 18 cm"), ("Material", "glazed stoneware"), ("Saucers", "included"), ("Frost proof", "no")]),
    ("Kestrel bike light set", "sport", "The Kestrel set includes a front light and a rear light, both rechargeable and visible from about five hundred metres.",
     [("Front output", "400 lumens"), ("Rear output", "50 lumens"), ("Run time", "up to 12 hours"), ("Mount", "tool-free silicone strap")]),
    ("Loam compost bin", "outdoor", "The Loam bin is made from recycled plastic and has a hatch at the base for removing finished compost.",
     [("Capacity", "330 litres"), ("Material", "recycled polypropylene"), ("Lid", "hinged with locking catch"), ("Base hatch", "yes")]),
]
FAQ_Q = [
    ("Can I wash the {p}?", [
        "Yes, but please follow the care label and avoid high temperatures.",
        "It can be cleaned, but not every part is suitable for washing.",
        "We recommend gentle cleaning by hand rather than a machine wash."],
     ["Wipe off loose dirt with a damp cloth first.", "Use a mild detergent and lukewarm water.",
      "Never use bleach or solvent cleaners.", "Let it dry naturally away from direct heat.",
      "Check that it is completely dry before storing it."]),
    ("What is the warranty on the {p}?", [
        "The {p} comes with a {y}-year warranty that covers manufacturing faults.",
        "Every {p} is guaranteed against defects for {y} years from the date of delivery.",
        "Our warranty on the {p} lasts {y} years and covers faults in materials and workmanship."],
     ["Keep your order number as proof of purchase.", "Wear and tear and accidental damage are not covered.",
      "Register the product to extend the warranty by one year.", "Claims are handled through the Report a problem form.",
      "Repairs are free of charge during the warranty period."]),
    ("How do I register my {p}?", [
        "Registering takes a couple of minutes and lets us contact you about safety notices.",
        "You can register the {p} online or in the app.",
        "Registration is optional but extends your warranty by a year."],
     ["Find the serial number on the label or box.", "Sign in to your account.",
      "Open Your products and choose Register a product.", "Enter the serial number and the date of purchase.",
      "You will receive a confirmation email."]),
    ("Where can I buy spare parts for the {p}?", [
        "Spare parts for the {p} are sold through our parts shop.",
        "Most parts of the {p} can be replaced, and we keep spares for at least {y} years.",
        "We sell spares for the {p} so that it can be repaired rather than replaced."],
     ["Find the model number on the product label.", "Search for the model in the parts shop.",
      "Check the diagram to identify the part.", "Parts are usually dispatched within two working days.",
      "Fitting instructions are included with each part."]),
]
FAQ_CLOSE = [
    "If you still have questions about the {p}, our product specialists are happy to help.",
    "Contact customer care if your {p} does not behave as described here.",
    "For anything not covered here, send us a message and include your order number.",
]


def gen_faq(rng, item, size):
    (pname, cat, desc, specs), (q, answers, tips) = item
    y = rng.choice([2, 3, 5])
    title = q.format(p=pname)
    b = [("h1", title)]
    a = rng.choice(answers).format(p=pname, y=y)
    b.append(("p", a + (" " + desc if rng.random() < 0.6 else "")))
    b.append(("h2", rng.choice(["What to do", "Our advice", "Steps", "In short"])))
    b.append(("ul", pick(rng, tips, rng.randint(3, 5))))
    long_ = size == "long"
    if long_ or rng.random() < 0.4:
        b.append(("h2", rng.choice(["Product details", "Specifications", "Key facts"])))
        rows = [["Feature", "Detail"]] + [list(s) for s in pick(rng, specs, rng.randint(2, 4))]
        b.append(("table", rows))
    if long_:
        b.append(("p", rng.choice([
            "Every product we sell is tested in our own workshop before it goes on sale, and we publish the results on each product page.",
            "We design our products to be repaired, which is why manuals and exploded diagrams are available for every model.",
            "If a fault appears soon after delivery, we will usually replace the product rather than repair it."])))
        b.append(("ul", pick(rng, ["Manuals can be downloaded from the product page.",
                                   "Customers in the loyalty scheme get free delivery on spare parts.",
                                   "Old products can be returned to us for recycling.",
                                   "Our workshop offers paid repairs after the warranty ends.",
                                   "Replacement packaging is not available."], 3)))
    b.append(("p", rng.choice(FAQ_CLOSE).format(p=pname)))
    return title, b


# ===========================================================================
# FAMILY 5: clinic notices (opening hours etc.)
# ===========================================================================
BRANCHES = ["Harbourview Main Clinic", "Northgate Family Practice", "Elm Street Health Centre",
            "Quayside Walk-in Centre", "Fernhill Community Clinic"]
NOTICES = [
    ("Opening hours over Christmas and New Year", "the Christmas and New Year period",
     ["24 December", "25 December", "26 December", "27 December", "31 December", "1 January", "2 January"]),
    ("Opening hours over Easter", "the Easter weekend",
     ["Good Friday", "Holy Saturday", "Easter Sunday", "Easter Monday", "Easter Tuesday"]),
    ("Bank holiday opening hours", "the bank holiday weekend",
     ["Friday", "Saturday", "Sunday", "Bank holiday Monday", "Tuesday"]),
    ("Temporary closure for refurbishment", "the refurbishment works",
     ["Week 1", "Week 2", "Week 3", "Week 4"]),
    ("Flu vaccination clinic times", "the autumn flu vaccination season",
     ["Monday", "Wednesday", "Thursday", "Saturday"]),
    ("Changes to blood test appointments", "the change to blood test appointments",
     ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday"]),
    ("Saturday morning clinic", "the new Saturday morning clinic",
     ["First Saturday", "Second Saturday", "Third Saturday", "Fourth Saturday"]),
]
CLINIC_INTRO = [
    "{branch} will be open on reduced hours during {period} in {year}.",
    "Please note the changes to our hours at {branch} during {period} ({year}).",
    "During {period} in {year}, {branch} will keep the hours shown below.",
    "We have changed the opening times of {branch} for {period}, {year}.",
]
CLINIC_WHY = [
    "This allows our staff to spend time with their families while keeping an urgent service running.",
    "The changes follow feedback from patients who asked for appointments outside working hours.",
    "Building work needs to take place while the waiting areas are empty.",
    "We are moving to a booked system so that patients spend less time waiting.",
    "Staffing levels are lower at this time of year, so some services are combined.",
    "The change means that the nurse team can offer more appointments on weekdays.",
]
CLINIC_ALT_H = ["If you need care while we are closed", "When we are closed", "Other services", "Urgent help"]
CLINIC_ALT = [
    "Call the out-of-hours service on {ooh} for urgent medical advice.",
    "For a life-threatening emergency, call the emergency number straight away.",
    "The Quayside Walk-in Centre is open from 8:00 to 20:00 every day.",
    "Community pharmacies can advise on minor illnesses without an appointment.",
    "Use the online symptom checker on our website for advice at any time.",
    "Mental health crisis support is available on {crisis}, day and night.",
    "Dental emergencies should be directed to the out-of-hours dental line on {dental}.",
]
CLINIC_PRESC = [
    "Please order repeat prescriptions by {date} to make sure they are ready before we close.",
    "Repeat prescription requests made after {date} may not be processed until we reopen.",
    "Allow at least three working days for repeat prescriptions and order them before {date}.",
]
CLINIC_END = [
    "Thank you for your patience and understanding.",
    "We apologise for any inconvenience this may cause.",
    "Normal opening hours resume on {resume}.",
    "Our usual hours are Monday to Friday, 8:00 to 18:30.",
]


def gen_clinic(rng, item, size):
    branch, (title0, period, days) = item
    year = rng.choice(YEARS)
    title = title0
    b = [("h1", title)]
    f = dict(branch=branch, period=period, year=year)
    intro = rng.choice(CLINIC_INTRO).format(**f)
    if rng.random() < 0.6:
        intro += " " + rng.choice(CLINIC_WHY)
    b.append(("p", intro))
    rows = [["Day", "Hours", "Services"]]
    svc = ["Urgent appointments only", "Full service", "Nurse clinic", "Telephone advice", "Closed",
           "Pharmacy counter only", "Booked appointments", "Vaccinations by appointment"]
    for d in days:
        if rng.random() < 0.2:
            rows.append([d, "Closed", "Closed"])
        else:
            s = rng.randint(7, 10)
            rows.append([d, "%d:%s to %d:%s" % (s, rng.choice(["00", "30"]), s + rng.randint(3, 10),
                                                 rng.choice(["00", "30"])), rng.choice(svc[:4] + svc[5:])])
    b.append(("table", rows))
    long_ = size == "long"
    b.append(("h2", rng.choice(CLINIC_ALT_H)))
    b.append(("ul", [x.format(ooh=phone(rng), crisis=phone(rng), dental=phone(rng))
                     for x in pick(rng, CLINIC_ALT, rng.randint(2, 5 if long_ else 3))]))
    if long_ or rng.random() < 0.5:
        b.append(("h2", rng.choice(["Repeat prescriptions", "Medication", "Prescriptions"])))
        b.append(("p", rng.choice(CLINIC_PRESC).format(date=a_date(rng, year))))
    if long_:
        b.append(("h2", rng.choice(["Appointments", "Booking an appointment", "Making an appointment"])))
        b.append(("p", rng.choice([
            "Routine appointments can be booked online up to four weeks ahead, or by phone from 8:00 each weekday.",
            "Same-day appointments are released at 8:00 and are offered to patients with urgent needs first.",
            "Appointments with the nurse team can be booked through the patient app or at reception."])
            + " " + rng.choice([
                "If you cannot attend, please cancel so that the slot can be offered to someone else.",
                "Please arrive five minutes early and let reception know if you need an interpreter.",
                "Patients with hearing loss can book by text message on %s." % phone(rng)])))
        b.append(("ul", pick(rng, ["Bring a list of any medicines you take.",
                                   "Wear a short-sleeved top for vaccinations and blood tests.",
                                   "Children must be accompanied by a parent or guardian.",
                                   "Masks are available at the entrance.",
                                   "Step-free access is via the side entrance on Mill Lane.",
                                   "Free parking is available for up to two hours."], rng.randint(2, 4))))
    b.append(("p", rng.choice(CLINIC_END).format(resume=a_date(rng, year))))
    return title, b


# ===========================================================================
# FAMILY 6: release notes (software documentation portal)
# ===========================================================================
COMPONENTS = ["Quillstack CLI", "Quillstack Python SDK", "Quillstack JavaScript SDK", "Quillstack Server"]
FEATURES = [
    "Added a --dry-run flag to the deploy command that prints the planned changes without applying them.",
    "New export command writes collections to JSON Lines or CSV.",
    "Webhooks can now be filtered by event type when they are created.",
    "Added support for signing requests with short-lived tokens.",
    "The status command shows the version of every connected workspace.",
    "Collections can be renamed without breaking existing links.",
    "Added a retry policy option for network requests, with exponential backoff.",
    "Search queries now support prefix matching on text fields.",
    "Bulk import accepts gzip-compressed files.",
    "New audit log endpoint lists changes made by each API key.",
    "The client can now be configured from environment variables.",
    "Added type hints to all public functions.",
    "Pagination helpers now return an iterator over all pages.",
    "Added an option to limit the number of concurrent uploads.",
    "Dark mode for the admin console.",
    "The login command can open a browser for single sign-on.",
    "Scheduled jobs can be paused and resumed from the console.",
    "Added a health check endpoint for load balancers.",
    "Support for custom date formats in exported files.",
    "Field-level permissions can be set per role.",
]
FIXES = [
    "Fixed a crash when a collection name contained a trailing space.",
    "Uploads larger than two gigabytes no longer stall at 99 percent.",
    "Corrected the time zone used in scheduled job reports.",
    "The config command no longer overwrites comments in the settings file.",
    "Fixed a memory leak in long-running watch mode.",
    "Error messages now include the request identifier.",
    "Fixed incorrect totals in paginated responses when filters were applied.",
    "Resolved an issue where expired tokens were not refreshed automatically.",
    "Autocomplete for shell commands works again in zsh.",
    "Fixed sorting of accented characters in search results.",
    "The SDK no longer retries requests that returned a validation error.",
    "Fixed a race condition when two workers claimed the same job.",
    "Downloads now resume correctly after a dropped connection.",
    "Fixed broken links in the generated API reference.",
    "Deleting a webhook now removes its pending deliveries.",
    "Progress bars no longer flicker on Windows terminals.",
]
DEPRECATIONS = [
    "The legacy v1 search endpoint is deprecated and will be removed in the next major release.",
    "The --force flag of the sync command is deprecated; use --overwrite instead.",
    "Support for Python 3.8 ends with this release.",
    "Basic authentication with a username and password is deprecated in favour of API keys.",
    "The XML export format is deprecated.",
    "Node.js 16 is no longer tested.",
]
UPGRADE = [
    "To upgrade, run the package manager's update command and restart any long-running workers.",
    "Upgrading from the previous minor version needs no configuration changes.",
    "Before upgrading, back up your workspace settings; the migration runs automatically on first start.",
    "Read the deprecation notes carefully if you still use the legacy endpoints.",
]


def gen_release(rng, item, size):
    comp, ver = item
    title = "%s %s release notes" % (comp, ver)
    b = [("h1", title)]
    b.append(("p", rng.choice([
        "Version {v} of the {c} was released on {d}.",
        "{c} {v} is now available. It was published on {d}.",
        "Released {d}. This is a {k} release of the {c}.",
    ]).format(v=ver, c=comp, d=a_date(rng), k=rng.choice(["minor", "maintenance", "feature"]))
        + " " + rng.choice(["It contains new features and bug fixes.",
                            "Most users should upgrade.",
                            "This release focuses on reliability.",
                            "Highlights are listed below."])))
    long_ = size == "long"
    b.append(("h2", rng.choice(["New features", "What's new", "Added"])))
    b.append(("ul", pick(rng, FEATURES, rng.randint(2, 6 if long_ else 3))))
    b.append(("h2", rng.choice(["Bug fixes", "Fixed", "Fixes"])))
    b.append(("ul", pick(rng, FIXES, rng.randint(2, 6 if long_ else 3))))
    if long_ or rng.random() < 0.3:
        b.append(("h2", "Deprecations"))
        b.append(("ul", pick(rng, DEPRECATIONS, rng.randint(1, 2))))
    if long_ or rng.random() < 0.4:
        b.append(("h2", rng.choice(["Compatibility", "Requirements", "Supported versions"])))
        rows = [["Component", "Minimum version"]]
        for c, vs in pick(rng, [("Python", ["3.9", "3.10", "3.11"]), ("Node.js", ["18", "20"]),
                                ("Quillstack Server", ["5.0", "5.2", "6.0"]), ("PostgreSQL", ["13", "14", "15"]),
                                ("Docker Engine", ["20.10", "24.0"])], rng.randint(2, 4)):
            rows.append([c, rng.choice(vs)])
        b.append(("table", rows))
    if long_ or rng.random() < 0.5:
        b.append(("h2", rng.choice(["Upgrading", "How to upgrade"])))
        b.append(("p", " ".join(pick(rng, UPGRADE, rng.randint(1, 2)))))
    return title, b


# ===========================================================================
# FAMILY 7: API how-tos
# ===========================================================================
APIS = ["Orders API", "Customers API", "Inventory API", "Content API"]
HOWTOS = [
    ("How to paginate results with the {api}",
     "List endpoints of the {api} return results in pages, so large collections must be fetched with several requests.",
     ["Send the first request with the page_size parameter.", "Read the next_cursor field from the response.",
      "Pass the cursor in the cursor parameter of the next request.", "Stop when next_cursor is empty."],
     [("page_size", "integer", "Number of items per page, up to 200"), ("cursor", "string", "Opaque cursor from the previous page"),
      ("order", "string", "Either asc or desc")]),
    ("How to authenticate requests to the {api}",
     "Every request to the {api} must carry an API key, sent in the Authorization header.",
     ["Create a key in the console under Settings and then API keys.", "Copy the key; it is shown only once.",
      "Add the header Authorization: Bearer followed by your key.", "Rotate keys regularly and delete unused ones."],
     [("Authorization", "header", "Bearer token with your API key"), ("X-Workspace", "header", "Workspace identifier"),
      ("scope", "string", "Optional list of permissions")]),
    ("How to receive webhooks from the {api}",
     "Webhooks let the {api} notify your server when something changes, instead of you polling for updates.",
     ["Expose an HTTPS endpoint that accepts POST requests.", "Register the endpoint in the console and pick the event types.",
      "Verify the signature header on every delivery.", "Respond with status 200 within ten seconds.",
      "Process the event asynchronously if it takes longer."],
     [("X-Signature", "header", "HMAC of the request body"), ("event_type", "string", "Name of the event"),
      ("delivery_id", "string", "Unique identifier of the delivery")]),
    ("How to handle rate limits in the {api}",
     "The {api} limits how many requests each key can make per minute, and returns status 429 when the limit is reached.",
     ["Read the X-RateLimit-Remaining header on each response.", "When you receive status 429, wait for the number of seconds in Retry-After.",
      "Retry the request with exponential backoff.", "Spread batch jobs over time instead of sending bursts."],
     [("X-RateLimit-Limit", "header", "Requests allowed per minute"), ("X-RateLimit-Remaining", "header", "Requests left in the window"),
      ("Retry-After", "header", "Seconds to wait before retrying")]),
    ("How to upload files with the {api}",
     "Files are uploaded to the {api} in two steps: you request an upload URL and then send the file to it.",
     ["Call the uploads endpoint with the file name and size.", "Send the file with a PUT request to the returned URL.",
      "Confirm the upload by calling the complete endpoint.", "Attach the returned file identifier to your record."],
     [("file_name", "string", "Original name of the file"), ("size_bytes", "integer", "File size, up to 5 GB"),
      ("content_type", "string", "MIME type of the file")]),
    ("How to filter and sort results in the {api}",
     "Most list endpoints of the {api} accept filter and sort parameters, which are applied on the server.",
     ["Choose the fields you want to filter on.", "Add a filter parameter for each field, such as status=open.",
      "Add the sort parameter with a field name, prefixed with a minus sign for descending order.",
      "Combine filters with pagination for large result sets."],
     [("filter", "string", "Field and value, for example status=open"), ("sort", "string", "Field name, optional minus prefix"),
      ("fields", "string", "Comma-separated list of fields to return")]),
    ("How to make safe retries with idempotency keys in the {api}",
     "Network errors can leave you unsure whether a request to the {api} succeeded; idempotency keys make retries safe.",
     ["Generate a unique key for each logical operation.", "Send it in the Idempotency-Key header.",
      "If the request fails, retry with the same key.", "The API returns the original result instead of repeating the action."],
     [("Idempotency-Key", "header", "Unique string, up to 64 characters"), ("expires", "duration", "Keys are remembered for 24 hours")]),
    ("How to test against the {api} sandbox",
     "The sandbox is a separate copy of the {api} where you can experiment without touching live data.",
     ["Create a sandbox key in the console.", "Point your client at the sandbox base URL.",
      "Use the test data set, which is reset every night.", "Switch to a live key only after your tests pass."],
     [("base_url", "string", "Sandbox or live endpoint"), ("reset", "schedule", "Nightly at 02:00 UTC"),
      ("test_cards", "list", "Card numbers that simulate payment outcomes")]),
]
HOWTO_NOTES = [
    "All examples use version {v} of the API.",
    "Requests and responses are encoded as JSON.",
    "The SDKs wrap these steps in a single helper function.",
    "Requests made with a sandbox key never affect live data.",
    "Timestamps are returned in UTC using the ISO 8601 format.",
    "Errors are returned with a machine-readable code and a message.",
]


def gen_howto(rng, item, size):
    api, (t0, intro, steps, params) = item
    title = t0.format(api=api)
    b = [("h1", title)]
    notes = pick(rng, HOWTO_NOTES, 3)
    b.append(("p", intro.format(api=api) + " " + notes[0].format(v=rng.choice(["2", "3", "2024-06"]))))
    long_ = size == "long"
    if long_ or rng.random() < 0.5:
        b.append(("h2", rng.choice(["Before you start", "Prerequisites", "You will need"])))
        b.append(("ul", pick(rng, ["An account with access to the console.", "An API key with the right scopes.",
                                   "A tool for sending HTTP requests, such as curl.",
                                   "The latest version of the SDK for your language.",
                                   "A test workspace, if you do not want to touch live data."], rng.randint(2, 4))))
    b.append(("h2", rng.choice(["Steps", "How to do it", "Walkthrough"])))
    b.append(("ol", steps))
    if long_ or rng.random() < 0.6:
        b.append(("h2", rng.choice(["Parameters", "Reference", "Fields used"])))
        b.append(("table", [["Name", "Type", "Description"]] + [list(p) for p in params]))
    if long_:
        b.append(("h2", rng.choice(["Troubleshooting", "Common problems"])))
        b.append(("ul", pick(rng, [
            "A 401 response means the key is missing, expired or revoked.",
            "A 403 response means the key does not have the required scope.",
            "A 404 response usually means the resource belongs to another workspace.",
            "A 422 response lists every field that failed validation.",
            "Timeouts are more likely on very large pages; reduce page_size.",
            "Check the status page if many requests fail at once."], rng.randint(3, 4))))
        b.append(("p", " ".join(notes[1:]).format(v="3")))
    return title, b


# ===========================================================================
# FAMILY 8: attraction guides (tourism)
# ===========================================================================
ATTRACTIONS = [
    ("Marlow Bay Maritime Museum", "The museum tells the story of the bay's fishing fleet and its lifeboat crews through ship models, photographs and a restored wheelhouse.",
     "the harbour front, next to the old customs house"),
    ("The Old Lighthouse", "Climb the 118 steps of the lighthouse for a view along the whole coast; the lamp room still holds the original lens.",
     "the end of the north pier"),
    ("Saltmarsh Nature Reserve", "Boardwalks cross the saltmarsh to two bird hides, where waders and geese gather in large numbers in winter.",
     "the estuary road, two kilometres west of the town"),
    ("Castle Gardens", "Terraced gardens climb the slope below the castle ruins, with a walled kitchen garden and a sheltered palm walk.",
     "the top of Castle Street"),
    ("Harbour Boat Trips", "Small boats leave the harbour several times a day for trips to the seal colony and the sea caves below the cliffs.",
     "the pontoon beside the fish market"),
    ("The Cliff Railway", "This water-powered railway has carried passengers between the beach and the upper town since the Victorian era.",
     "the promenade, opposite the bandstand"),
    ("Marlow Bay Aquarium", "Tanks show the animals that live in the bay, from crabs and anemones in the touch pools to a shoal of mackerel.",
     "the east end of the promenade"),
    ("The Covered Market Hall", "The iron-framed market hall houses around forty independent traders selling food, books and crafts.",
     "the corner of Bridge Street and Market Row"),
    ("Gull Point Fort", "A coastal fort built to guard the bay now houses a small military museum and a cafe with sea views.",
     "the headland at Gull Point, reached by the coastal path"),
    ("Town Heritage Trail", "A waymarked trail of bronze plaques leads past twenty historic buildings in the old town.",
     "the tourist information centre on Harbour Street"),
]


def gen_attraction(rng, item, size):
    name, desc, where = item
    year = rng.choice(YEARS)
    title = name
    b = [("h1", title), ("p", desc + " " + rng.choice([
        "It is one of the most visited places in the bay.", "Allow about two hours for a visit.",
        "It is a good choice for a rainy day.", "Families will find plenty to do here."]))]
    b.append(("h2", rng.choice(["Opening times", "When to visit", "Opening hours %d" % year])))
    rows = [["Season", "Days", "Hours"]]
    for s in pick(rng, ["April to June", "July and August", "September and October", "November to March",
                        "School holidays"], rng.randint(2, 3)):
        o = rng.randint(9, 11)
        rows.append([s, rng.choice(["Daily", "Tuesday to Sunday", "Weekends only", "Wednesday to Sunday"]),
                     "%d:00 to %d:%s" % (o, o + rng.randint(5, 8), rng.choice(["00", "30"]))])
    b.append(("table", rows))
    long_ = size == "long"
    if long_ or rng.random() < 0.6:
        b.append(("h2", rng.choice(["Admission", "Prices", "Tickets"])))
        rows = [["Ticket", "Price"]]
        for t in pick(rng, ["Adult", "Child (5 to 15)", "Family (2 adults, 2 children)", "Concession", "Annual pass"],
                      rng.randint(2, 4)):
            rows.append([t, "%d.%02d pounds" % (rng.randint(2, 30), rng.choice([0, 50]))])
        b.append(("table", rows))
    b.append(("h2", rng.choice(["Getting there", "How to find it", "Location"])))
    b.append(("p", rng.choice(["You will find it at %s." % where, "It is located at %s." % where,
                               "Look for it at %s." % where])))
    if long_ or rng.random() < 0.4:
        b.append(("ul", pick(rng, ["The number 7 bus stops nearby every twenty minutes.",
                                   "Parking is limited, so arrive early in summer.",
                                   "Bicycle racks are available at the entrance.",
                                   "The site is partly accessible to wheelchair users.",
                                   "Dogs are welcome on the outdoor areas only.",
                                   "Tickets bought online are valid for a year."], rng.randint(2, 4))))
    if long_:
        b.append(("p", rng.choice([
            "Combine your visit with a walk along the promenade and lunch at one of the harbour cafes.",
            "The visitor centre can suggest a half-day route that links several nearby attractions.",
            "Check the events calendar, as special openings and guided tours are added during the season."])))
    return title, b


# ===========================================================================
# Extra hand-written sections used by long pages (with slot values)
# ===========================================================================
EXTRA = {
    "course": [
        ("Workload", "Students should plan for about {n} hours of independent study each week on top of timetabled sessions. The heaviest weeks are usually those before the project deadline, so it helps to start the coursework as soon as the brief is released rather than waiting for the final fortnight."),
        ("Feedback", "Marked lab work is returned within {n} working days with written comments. Each student also has a short one-to-one feedback meeting in week {w}, where the tutor goes through the midterm work and suggests what to focus on for the rest of the term."),
        ("Software and equipment", "All the software used on the course is free and runs on the lab machines as well as on personal laptops. If you do not have a suitable computer, the department can lend you one for the term; ask at the teaching office in the first week."),
        ("Academic integrity", "You may discuss ideas with other students, but the code and writing you submit must be your own. Every submission is checked with a similarity tool, and suspected cases are referred to the academic integrity panel, which meets every {n} weeks."),
        ("Attendance", "Attendance at labs is recorded. If you miss more than {n} sessions without telling the teaching office, your personal tutor will contact you to check that everything is all right and to agree a plan for catching up."),
        ("Reading", "There is no single set textbook. A reading list of about {n} items is published on the virtual learning environment before the term starts, and most items are available as electronic copies through the library."),
        ("Support", "Peer-assisted study sessions run every {day} during term. They are led by students who took the course last year and are a relaxed place to go over lecture material and ask questions you might not ask in a large lecture."),
        ("After this course", "The module is a prerequisite for several third- and fourth-year options, and it is good preparation for a summer placement. About {n} percent of last year's students went on to choose a related project for their dissertation."),
    ],
    "event": [
        ("Accessibility", "The venue has step-free access from the main entrance and a hearing loop at the information desk. If you need a seat near the front, a companion ticket or any other adjustment, let us know at least {n} days before the event and we will do our best to help."),
        ("Getting there", "The number {bus} bus stops a short walk from the venue, and the railway station is about {n} minutes away on foot. Parking nearby is limited on event days, so we recommend coming by public transport or by bike if you can."),
        ("Volunteering", "We are looking for about {n} volunteers to help with welcoming visitors, giving directions and clearing up afterwards. Volunteers get a free lunch and a thank-you certificate; email the organisers if you would like to help."),
        ("Weather", "Most of the programme takes place outdoors. If the forecast is very poor, a decision about going ahead will be published on this page by {t} on the day, and any ticket holders will be contacted by email."),
        ("Food and drink", "Several local traders will be selling hot and cold food, including vegetarian and vegan options. Please bring a refillable cup; a small charge of {n} pence applies to disposable cups to encourage reuse."),
        ("History", "The event was first held {n} years ago as a small gathering organised by volunteers. It has grown steadily since then and now attracts visitors from across the region, while keeping its friendly, local character."),
        ("Families", "Children are very welcome, and there is a quiet area with seating for families who need a break. Baby-changing facilities are available, and children under {n} must stay with an adult at all times."),
        ("Photography", "Official photographers will be working throughout the event. If you would prefer not to be photographed, please speak to a steward, who can give you a coloured wristband so that the photographers know to avoid you."),
    ],
    "help": [
        ("Who to contact", "Our customer care team can help with anything on this page. Chat is available from 8:00 to 22:00, and phone lines are open from 8:00 to 20:00 on weekdays. Please have your order number ready; it starts with the letters SV and has {n} digits."),
        ("Orders from marketplace sellers", "Some items on our website are sold and sent by independent sellers. For these items the seller's own policy applies, which is shown on the product page. If a seller does not reply within {n} working days, contact us and we will step in."),
        ("Your statutory rights", "Nothing on this page affects your statutory rights. If an item is faulty, you are entitled to a repair, a replacement or a refund, and you have longer to report a fault than the normal {n}-day return period."),
        ("Fraud and scam warnings", "We will never ask you to pay for an order by bank transfer, and we never ask for your password. If you receive a suspicious message that claims to be from us, forward it to our security team and then delete it."),
        ("Business customers", "If you buy on a business account, the same steps apply, but refunds are made to the account rather than a card. Business customers with more than {n} orders a month can ask for a named account manager."),
        ("Using the app", "Everything described here can also be done in the ShopVantage app. Open the menu, choose Orders and follow the same steps. The app also sends you a notification when the status of an order changes."),
        ("Accessibility", "If you have difficulty using our website or app, you can call our accessible customer care line on {phone}. We also accept calls through text relay services, and letters can be sent in large print or braille on request."),
        ("Why we ask for information", "We ask for a reason when you report a problem so that we can improve our products and packaging. Your answers are anonymised and reviewed every {n} weeks by the quality team."),
    ],
    "faq": [
        ("Safety", "Read the safety leaflet in the box before first use and keep it somewhere you can find it. Do not use the product if it is visibly damaged, and keep it out of reach of children under {n} unless the leaflet says otherwise."),
        ("Recycling", "When the product reaches the end of its life, do not put it in general household waste. You can return it to any of our stores for free recycling, or use a local recycling centre; the packaging is made from at least {n} percent recycled material."),
        ("Buying accessories", "Compatible accessories are listed on the product page under Goes well with. Using accessories from other brands does not affect your warranty, but we cannot guarantee that they will fit or work as intended."),
        ("Customer reviews", "The product has an average rating of {r} out of 5 from {n} verified customers. Reviews are shown in full, including negative ones, and we reply to every review that mentions a problem."),
        ("Delivery of replacements", "If we agree to replace your product, the replacement is usually sent within {n} working days. We will send a courier to collect the faulty one at the same time, so you do not need to go to a post office."),
        ("Where it is made", "The product is designed by our own team and made by a supplier we have worked with for more than {n} years. We audit the factory every year against our code of conduct for suppliers."),
        ("Manuals", "A printed quick-start guide comes in the box. The full manual, including diagrams and troubleshooting tables, can be downloaded as a PDF from the product page and is available in {n} languages."),
        ("Second-hand purchases", "If you bought the product second-hand, the warranty still applies as long as it is within the warranty period and you have a copy of the original proof of purchase from the first owner."),
    ],
    "clinic": [
        ("Online services", "Many things can be done without calling the practice. Register for online services at reception with photo identification, and you will be able to book some appointments, order repeat prescriptions and read parts of your record. Around {n} percent of our patients already use it."),
        ("Home visits", "Home visits are for patients who are housebound or too unwell to travel. Please call before 10:30 if you think you need a visit, so that the duty doctor can plan the day. The doctor may call you back first to discuss the best option."),
        ("Test results", "Please call for test results after 14:00, when the phone lines are quieter. Results usually arrive within {n} working days. If a result needs action, we will contact you, so please make sure we have your current mobile number."),
        ("Travel advice", "If you are travelling abroad, book a travel health appointment at least {n} weeks before you leave. Some vaccinations are free, while others are charged privately; the nurse will explain which apply to your trip."),
        ("Feedback", "We welcome comments about our service. You can fill in a feedback card at reception, write to the practice manager or use the form on our website. Last year we received {n} comments and made several changes as a result."),
        ("Students", "Students who live in the area during term time can register with us as well as with a practice at home. Bring your student card and proof of address; registration takes about {n} minutes at reception."),
        ("Chaperones", "All patients can ask for a chaperone to be present during an examination. Please tell the receptionist when you book, or ask the clinician at the start of your appointment, and we will arrange one."),
        ("Interpreters", "If English is not your first language, we can book a professional interpreter for your appointment, either in person or by telephone. Please let us know when booking so that we can allow a longer appointment of {n} minutes."),
    ],
    "release": [
        ("Known issues", "On some systems the first run after upgrading takes up to {n} seconds longer while caches are rebuilt. This is expected and only happens once. A fix for slow startup on network drives is planned for the next patch release."),
        ("Security", "This release includes updated dependencies that address {n} publicly reported vulnerabilities. None of them were known to affect the default configuration, but we recommend upgrading as soon as practical."),
        ("Performance", "Internal benchmarks show that bulk operations are about {n} percent faster than in the previous release, mostly because of fewer round trips to the server and better reuse of connections."),
        ("Thanks", "This release includes contributions from {n} people outside the core team. Thank you to everyone who reported bugs, reviewed pull requests and tested the release candidates."),
        ("Support policy", "Each minor version receives bug fixes for {n} months after release and security fixes for a further six months. Older versions continue to work but no longer receive updates."),
        ("Documentation", "The guides for scheduled jobs, webhooks and exports have been rewritten to match the new behaviour. The API reference is now generated from the same schema that the server uses, so it can no longer drift out of date."),
        ("Telemetry", "Anonymous usage statistics remain switched off by default. If you have opted in, this release also reports the duration of commands, rounded to the nearest {n} milliseconds, to help us find slow operations."),
        ("Breaking changes", "There are no breaking changes in this release. Scripts written for the previous minor version should run unchanged, although some deprecated options now print a warning on every run."),
    ],
    "howto": [
        ("Example", "A typical integration makes {n} requests per minute at most. If you need more, consider batching updates or subscribing to webhooks so that your system only fetches data when something has actually changed."),
        ("Security advice", "Never embed API keys in client-side code or mobile apps, where they can be extracted. Keep them on your server, give each integration its own key with the smallest scope it needs, and revoke keys that have not been used for {n} days."),
        ("Testing", "Write automated tests that run against the sandbox before each deployment. The sandbox behaves like the live API, but it is reset every night and limited to {n} requests per minute per key."),
        ("Logging", "Log the request identifier returned in every response. If you contact support, including this identifier lets the team find your request in the server logs within seconds rather than hours."),
        ("Versioning", "The API is versioned by date. Pin the version in your client configuration so that your integration is not affected by changes, and review the changelog at least every {n} months before moving to a newer version."),
        ("Limits", "Individual requests time out after {n} seconds. Requests that need to process a lot of data should use the asynchronous job endpoints, which return a job identifier that you can poll until the result is ready."),
        ("SDK support", "Official SDKs are available for Python and JavaScript and handle authentication, retries and pagination for you. Community libraries exist for other languages but are not reviewed by the Quillstack team."),
        ("Getting help", "If you are stuck, search the community forum first; many questions have already been answered there. Paying customers can also open a support ticket, which is answered within {n} business hours."),
    ],
    "attraction": [
        ("Accessibility", "Most of the site can be reached without steps, and a limited number of wheelchairs can be borrowed free of charge from the entrance. Assistance dogs are welcome everywhere. Carers accompanying a disabled visitor go free."),
        ("Eating", "There is a small cafe on site serving soup, sandwiches and cakes made by a local bakery. Picnics are welcome in the outdoor areas, and there are around {n} picnic tables near the entrance."),
        ("Groups and schools", "Groups of {n} or more receive a discount when booking in advance. School visits can include a guided session linked to the curriculum; teachers can arrange a free planning visit beforehand."),
        ("Best time to visit", "The site is busiest between 11:00 and 15:00 in the school holidays. Arrive early or late in the day for a quieter visit, and consider a weekday outside the peak summer weeks."),
        ("History", "The site has been open to the public for more than {n} years. It is looked after by a charitable trust, and every ticket helps pay for conservation work and for the volunteers who keep it running."),
        ("Volunteering", "More than {n} volunteers help run the site, from guiding visitors to repairing paths. New volunteers are always welcome, and no experience is needed; training is given on the job."),
        ("Shop", "The gift shop sells books about the bay, prints by local artists and souvenirs made in the region. Members of the trust receive a ten percent discount on all purchases."),
        ("Nearby", "The visitor information centre on Harbour Street is a {n}-minute walk away and can suggest places to eat, walks and other attractions to combine with your visit."),
    ],
}

EXTRA_RANGES = {
    ("course", "Workload"): (6, 12), ("course", "Feedback"): (5, 15), ("course", "Academic integrity"): (2, 6),
    ("course", "Attendance"): (2, 4), ("course", "Reading"): (10, 30), ("course", "After this course"): (10, 40),
    ("event", "Accessibility"): (3, 10), ("event", "Getting there"): (5, 20), ("event", "Volunteering"): (10, 40),
    ("event", "Food and drink"): (10, 50), ("event", "History"): (5, 60), ("event", "Families"): (8, 12),
    ("help", "Who to contact"): (8, 10), ("help", "Orders from marketplace sellers"): (2, 5),
    ("help", "Your statutory rights"): (14, 30), ("help", "Business customers"): (10, 50),
    ("help", "Why we ask for information"): (2, 8),
    ("faq", "Safety"): (3, 8), ("faq", "Recycling"): (50, 90), ("faq", "Customer reviews"): (20, 900),
    ("faq", "Delivery of replacements"): (2, 5), ("faq", "Where it is made"): (3, 15), ("faq", "Manuals"): (4, 12),
    ("clinic", "Online services"): (20, 70), ("clinic", "Test results"): (3, 7), ("clinic", "Travel advice"): (4, 8),
    ("clinic", "Feedback"): (30, 200), ("clinic", "Students"): (5, 15), ("clinic", "Interpreters"): (20, 40),
    ("release", "Known issues"): (10, 60), ("release", "Security"): (2, 6), ("release", "Performance"): (5, 30),
    ("release", "Thanks"): (3, 25), ("release", "Support policy"): (6, 18), ("release", "Telemetry"): (10, 100),
    ("howto", "Example"): (30, 120), ("howto", "Security advice"): (30, 90), ("howto", "Testing"): (30, 120),
    ("howto", "Versioning"): (3, 12), ("howto", "Limits"): (10, 60), ("howto", "Getting help"): (4, 24),
    ("attraction", "Eating"): (4, 20), ("attraction", "Groups and schools"): (10, 20), ("attraction", "History"): (20, 150),
    ("attraction", "Volunteering"): (20, 120), ("attraction", "Nearby"): (3, 15),
}


def add_extra(rng, fam, blocks, k):
    for head, text in pick(rng, EXTRA[fam], k):
        blocks.append(("h2", head))
        blocks.append(("p", text.format(n=rng.randint(*EXTRA_RANGES.get((fam, head), (3, 40))), w=rng.randint(4, 9), day=rng.choice(WEEKDAYS[:5]),
                                        bus=rng.randint(2, 30), t=rng.choice(["8:00", "9:00", "10:00"]),
                                        r=rng.choice(["4.1", "4.3", "4.6", "3.9"]), phone=phone(rng))))
    return blocks


FAMILY_GEN = {"course": gen_course, "event": gen_event, "help": gen_help, "faq": gen_faq,
              "clinic": gen_clinic, "release": gen_release, "howto": gen_howto, "attraction": gen_attraction}


def family_items(fam):
    if fam == "course":
        return list(COURSES)
    if fam == "event":
        return list(EVENTS)
    if fam == "help":
        return list(HELP)
    if fam == "faq":
        return [(p, q) for p in PRODUCTS for q in FAQ_Q]
    if fam == "clinic":
        return [(br, n) for n in NOTICES for br in BRANCHES]
    if fam == "release":
        return [(c, "%d.%d.%d" % (ma, mi, pa)) for c in COMPONENTS for ma in (3, 4) for mi in range(0, 6)
                for pa in (0, 1)]
    if fam == "howto":
        return [(a, h) for h in HOWTOS for a in APIS]
    if fam == "attraction":
        return list(ATTRACTIONS)
    raise KeyError(fam)


# ===========================================================================
# Hand-written edit operations (republication edits and conversion noise)
# ===========================================================================
SYN = [("purchase", "order"), ("receive", "get"), ("usually", "normally"), ("contact", "get in touch with"),
       ("choose", "select"), ("Choose", "Select"), ("select", "pick"), ("Select", "Pick"),
       ("quicker", "faster"), ("as soon as", "once"), ("free of charge", "for free"), ("at any time", "whenever you like"),
       ("in advance", "beforehand"), ("Please note", "Note"), ("is now available", "has been released"),
       ("We apologise for", "We are sorry for"), ("around", "about"), ("about", "roughly"), ("large", "big"),
       ("essential", "a must"), ("welcome", "very welcome"), ("Students", "Learners"), ("students", "learners"),
       ("module", "course"), ("begins", "starts"), ("will be", "is going to be"), ("must", "have to"),
       ("Make sure", "Check"), ("Added", "Introduced"), ("Fixed", "Resolved"), ("no longer", "not any more"),
       ("several", "a few"), ("help", "assist"), ("instead of", "rather than"), ("each", "every"),
       ("Thank you", "Many thanks"), ("also", "as well"), ("can be", "may be"), ("small", "little"),
       ("Please", "Kindly"), ("appointments", "bookings"), ("walk", "stroll"), ("a few", "some")]
EDITOR_NOTES = [
    "This article has been lightly edited for length.",
    "Details were confirmed with the organisers before publication.",
    "Updated after readers pointed out a mistake in the original version.",
    "Reproduced with permission.",
    "Information correct at the time of writing.",
    "Minor corrections were made after the first version went out.",
    "Some details may change, so check again closer to the date.",
]
PHRASES = ["In most cases, ", "As a rule, ", "Where possible, ", "For most people, ", "Generally, "]


def _units(blocks):
    u = []
    for i, (k, v) in enumerate(blocks):
        if k in ("h2", "p"):
            u.append((i, None))
        elif k in ("ul", "ol"):
            u.extend((i, j) for j in range(len(v)))
        elif k == "table":
            u.extend((i, (r, c)) for r in range(1, len(v)) for c in range(len(v[r])))
    return u


def _get(blocks, ref):
    i, j = ref
    k, v = blocks[i]
    if j is None:
        return v
    if isinstance(j, tuple):
        return v[j[0]][j[1]]
    return v[j]


def _set(blocks, ref, text):
    i, j = ref
    k, v = blocks[i]
    if j is None:
        blocks[i] = (k, text)
    elif isinstance(j, tuple):
        v[j[0]][j[1]] = text
    else:
        v[j] = text


def op_syn(b, rng):
    cands = []
    for ref in _units(b):
        t = _get(b, ref)
        for a, z in SYN:
            if re.search(r"\b%s\b" % re.escape(a), t):
                cands.append((ref, a, z))
    if not cands:
        return False
    ref, a, z = rng.choice(cands)
    _set(b, ref, re.sub(r"\b%s\b" % re.escape(a), z, _get(b, ref), count=1))
    return True


def op_typo(b, rng):
    refs = [r for r in _units(b) if re.search(r"\b[a-z]{7,}\b", _get(b, r))]
    if not refs:
        return False
    ref = rng.choice(refs)
    t = _get(b, ref)
    words = list(re.finditer(r"\b[a-z]{7,}\b", t))
    m = rng.choice(words)
    w = m.group(0)
    p = rng.randint(2, len(w) - 3)
    w2 = w[:p] + w[p + 1] + w[p] + w[p + 2:]
    if w2 == w:
        w2 = w[:p] + w[p + 1:]
    _set(b, ref, t[:m.start()] + w2 + t[m.end():])
    return True


def op_note(b, rng):
    note = rng.choice(EDITOR_NOTES)
    if rng.random() < 0.5:
        b.append(("p", note))
    else:
        ps = [i for i, (k, v) in enumerate(b) if k == "p"]
        if not ps:
            return False
        i = rng.choice(ps)
        b[i] = ("p", b[i][1] + " " + note)
    return True


def op_drop_sentence(b, rng):
    ps = [i for i, (k, v) in enumerate(b) if k == "p" and len(re.split(r"(?<=[.!?]) ", v)) >= 2]
    if not ps:
        return False
    i = rng.choice(ps)
    s = re.split(r"(?<=[.!?]) ", b[i][1])
    s.pop(rng.randrange(len(s)))
    b[i] = ("p", " ".join(s))
    return True


def op_drop_item(b, rng):
    ls = [i for i, (k, v) in enumerate(b) if k in ("ul", "ol") and len(v) >= 3]
    if not ls:
        return False
    i = rng.choice(ls)
    v = list(b[i][1])
    v.pop(rng.randrange(len(v)))
    b[i] = (b[i][0], v)
    return True


def op_number(b, rng):
    refs = [r for r in _units(b) if re.search(r"\b\d+\b", _get(b, r))]
    if not refs:
        return False
    ref = rng.choice(refs)
    t = _get(b, ref)
    ms = list(re.finditer(r"\b\d+\b", t))
    m = rng.choice(ms)
    n = int(m.group(0))
    n2 = n + rng.choice([1, 2, -1]) if n > 2 else n + 1
    _set(b, ref, t[:m.start()] + str(n2) + t[m.end():])
    return True


def op_phrase(b, rng):
    ps = [i for i, (k, v) in enumerate(b) if k == "p" and v[:1].isupper() and not v.startswith(("I ", "A "))]
    if not ps:
        return False
    i = rng.choice(ps)
    v = b[i][1]
    b[i] = ("p", rng.choice(PHRASES) + v[0].lower() + v[1:])
    return True


def op_swap_items(b, rng):
    ls = [i for i, (k, v) in enumerate(b) if k == "ul" and len(v) >= 3]
    if not ls:
        return False
    i = rng.choice(ls)
    v = list(b[i][1])
    j = rng.randrange(len(v) - 1)
    v[j], v[j + 1] = v[j + 1], v[j]
    b[i] = ("ul", v)
    return True


REPUB_OPS = [(op_syn, 4), (op_note, 1), (op_drop_sentence, 1), (op_drop_item, 1), (op_number, 2),
             (op_phrase, 1), (op_typo, 1), (op_swap_items, 1)]
CONVERT_OPS = [(op_typo, 2), (op_syn, 1)]


def weighted(rng, ops):
    tot = sum(w for _, w in ops)
    x = rng.uniform(0, tot)
    for o, w in ops:
        x -= w
        if x <= 0:
            return o
    return ops[-1][0]


def republish(blocks, rng, refs_sh, lo=0.80, hi=0.97):
    """Apply hand-written edits until Jaccard with the original drops to a
    random target inside [lo, hi]; all refs (other cluster members) >= lo."""
    orig_sh = shingles(body_text(blocks))
    target = rng.uniform(lo + 0.03, hi - 0.02)
    cur = copy.deepcopy(blocks)
    j = 1.0
    ops_done = []
    for _ in range(80):
        cand = copy.deepcopy(cur)
        op = weighted(rng, REPUB_OPS)
        if not op(cand, rng):
            continue
        csh = shingles(body_text(cand))
        jj = jacc(orig_sh, csh)
        if jj < lo or any(jacc(r, csh) < lo for r in refs_sh):
            continue
        cur, j = cand, jj
        ops_done.append(op.__name__[3:])
        if j <= target:
            break
    if not (lo <= j <= hi):
        return None, None
    return cur, ops_done


def convert_noise(blocks, rng, n):
    cur = copy.deepcopy(blocks)
    done = []
    for _ in range(n * 5):
        if len(done) >= n:
            break
        op = weighted(rng, CONVERT_OPS)
        if op(cur, rng):
            done.append(op.__name__[3:])
    return cur, done


# ===========================================================================
# HTML rendering of bodies (four markup styles; same text)
# ===========================================================================
E = html.escape


def body_html(blocks, style):
    out = []
    for k, v in blocks:
        if k == "h1":
            if style == "legacy":
                out.append('<font size="5" face="Verdana"><b>%s</b></font><br><br>' % E(v))
            elif style == "divsoup":
                out.append('<div class="art-title"><h1 class="t">%s</h1></div>' % E(v))
            elif style == "forum":
                continue  # title rendered in the thread header
            else:
                out.append("<h1>%s</h1>" % E(v))
        elif k == "h2":
            if style == "legacy":
                out.append('<font size="3" color="#004466"><b>%s</b></font><br>' % E(v))
            elif style == "forum":
                out.append("<h3>%s</h3>" % E(v))
            elif style == "divsoup":
                out.append('<h2 class="art-h2"><span>%s</span></h2>' % E(v))
            else:
                out.append("<h2>%s</h2>" % E(v))
        elif k == "p":
            if style == "legacy":
                out.append("%s<br><br>" % E(v))
            elif style == "divsoup":
                out.append('<div class="art-p"><p>%s</p></div>' % E(v))
            else:
                out.append("<p>%s</p>" % E(v))
        elif k in ("ul", "ol"):
            out.append("<%s>%s</%s>" % (k, "".join("<li>%s</li>" % E(i) for i in v), k))
        elif k == "table":
            if style == "legacy":
                rows = ['<tr>%s</tr>' % "".join('<td bgcolor="#dde8ee"><b>%s</b></td>' % E(c) for c in v[0])]
                rows += ["<tr>%s</tr>" % "".join("<td>%s</td>" % E(c) for c in r) for r in v[1:]]
                out.append('<table border="1" cellpadding="4" cellspacing="0">%s</table><br>' % "".join(rows))
            else:
                head = "<thead><tr>%s</tr></thead>" % "".join("<th>%s</th>" % E(c) for c in v[0])
                rows = "".join("<tr>%s</tr>" % "".join("<td>%s</td>" % E(c) for c in r) for r in v[1:])
                cls = ' class="data-table"' if style == "divsoup" else ""
                out.append('<div class="tbl-wrap"><table%s>%s<tbody>%s</tbody></table></div>' % (cls, head, rows)
                           if style == "divsoup" else "<table>%s<tbody>%s</tbody></table>" % (head, rows))
    return "\n".join(out)


def visible_words(page_html):
    t = re.sub(r"(?is)<(script|style|head)\b.*?</\1>", " ", page_html)
    t = re.sub(r"(?s)<[^>]+>", " ", t)
    return len(norm_tokens(html.unescape(t)))


def ul_links(items, cls=None):
    c = ' class="%s"' % cls if cls else ""
    return "<ul%s>%s</ul>" % (c, "".join('<li><a href="%s">%s</a></li>' % (E(h), E(t)) for t, h in items))


def teaser_html(items, tag="div", cls="teaser"):
    return "\n".join('<%s class="%s"><a href="%s"><strong>%s</strong></a><p>%s</p></%s>' % (
        tag, cls, E(h), E(t), E(s), tag) for t, h, s in items)


# ---------------------------------------------------------------------------
# Site 1: university department portal (semantic main/article, heavy)
# ---------------------------------------------------------------------------
NV_MENU = [("Study", ["Undergraduate degrees", "Postgraduate taught courses", "PhD opportunities", "Course catalogue",
                      "Timetables", "Fees and funding", "Scholarships", "How to apply"]),
           ("Research", ["Research groups", "Seminar series", "Publications", "Research impact", "Industry partnerships",
                         "Research facilities"]),
           ("Student life", ["Student societies", "Wellbeing support", "Careers and placements", "Study abroad",
                             "Peer mentoring", "Library services"]),
           ("About us", ["Welcome from the head of department", "Staff directory", "Vacancies", "Equality and diversity",
                         "Our history", "Contact and directions"])]
NV_NEWS = [
    ("Department wins teaching award", "The School of Computing has received a university award for its redesigned first-year programme, which pairs every new student with a peer mentor."),
    ("New robotics lab opens", "A refurbished space in the Foundry Wing now houses twelve robot arms and a motion-capture area for student projects."),
    ("Apply now for summer research placements", "Undergraduates can spend eight paid weeks working alongside a research group; applications close at the end of the spring term."),
    ("Student team reaches national programming final", "Three second-year students will represent the department at the national collegiate programming contest."),
    ("Library extends opening hours during exams", "The main library will stay open until midnight for the four weeks of the examination period."),
    ("Alumni mentoring scheme returns", "Graduates working in industry are volunteering to mentor final-year students through their job search."),
    ("Open lecture series announced", "This year's public lectures will explore how software shapes transport, health and local democracy."),
    ("Scholarships for postgraduate study", "Several fee scholarships are available for home and international applicants to taught master's courses."),
]
NV_LEGAL = ("Northvale University is an exempt charity and a company limited by guarantee registered in the county of "
            "Westmere. The information on these pages is provided for general guidance and may change; course details "
            "are checked each year but the university reserves the right to alter modules, staffing and timetables. "
            "Please read our privacy notice to find out how we process personal data submitted through this website.")


def render_northvale(pg, ctx):
    rng = ctx["rng"]
    menu = "\n".join('<li class="menu-group"><span>%s</span>%s</li>' % (
        E(g), ul_links([(x, "/%s/%s" % (g.lower().replace(" ", "-"), x.lower().replace(" ", "-"))) for x in xs]))
        for g, xs in NV_MENU)
    sect = "Course catalogue" if pg["family"] == "course" else "Events and seminars"
    side = [("All %s" % sect.lower(), "/%s" % pg["section"]), ("Timetables", "/study/timetables"),
            ("Key dates %d" % rng.choice(YEARS), "/study/key-dates")] + [(t, h) for t, h, _ in ctx["related"][:3]]
    news = teaser_html(ctx["teasers"], "article", "news-card")
    rel = teaser_html(ctx["related"][3:], "div", "related")
    return """<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><title>{title} | School of Computing | Northvale University</title>
<meta name="viewport" content="width=device-width, initial-scale=1">
<link rel="stylesheet" href="/static/nv.css"><script>window.nvAnalytics={{site:"computing",page:"{slug}"}};</script></head>
<body class="nv">
<a class="skip" href="#content">Skip to main content</a>
<header class="nv-header"><div class="brand"><a href="/">Northvale University</a> <span>School of Computing</span></div>
<ul class="utility"><li><a href="/study">Study</a></li><li><a href="/research">Research</a></li><li><a href="/partners">Partners</a></li>
<li><a href="/alumni">Alumni</a></li><li><a href="/intranet">Staff intranet</a></li><li><a href="/library">Library</a></li><li><a href="/give">Give to Northvale</a></li></ul>
<form class="search" action="/search"><label for="q">Search the School of Computing website</label><input id="q" name="q"><button>Search</button></form>
<nav class="mega" aria-label="Main"><ul>{menu}</ul></nav></header>
<nav class="breadcrumbs" aria-label="Breadcrumb"><a href="/">Home</a> &gt; <a href="/computing">School of Computing</a> &gt; <a href="/{section}">{sect}</a> &gt; <span>{title}</span></nav>
<main id="content">
<article class="page-body">
{body}
</article>
<aside class="section-nav"><h2>In this section</h2>{side}</aside>
<aside class="news"><h2>Department news</h2>{news}</aside>
<section class="related"><h2>You may also be interested in</h2>{rel}</section>
</main>
<footer class="nv-footer"><div class="addr"><strong>School of Computing</strong><br>Hallam Building, Northvale University, Westmere campus<br>Telephone 0100 555 0110 | computing@northvale-university.example.org</div>
<ul class="social"><li>Follow us on our video channel</li><li>Read the department blog</li><li>Subscribe to the seminar newsletter</li></ul>
<ul class="legal"><li><a href="/privacy">Privacy notice</a></li><li><a href="/cookies">Cookie policy</a></li><li><a href="/accessibility">Accessibility statement</a></li>
<li><a href="/foi">Freedom of information</a></li><li><a href="/modern-slavery">Modern slavery statement</a></li><li><a href="/terms">Terms of use</a></li></ul>
<p class="small">{legal}</p><p class="small">Copyright 2026 Northvale University. All rights reserved.</p></footer>
</body></html>
""".format(title=E(pg["title"]), slug=E(pg["slug"]), menu=menu, section=pg["section"], sect=E(sect),
           body=body_html(pg["blocks"], "semantic"), side=ul_links(side), news=news, rel=rel, legal=E(NV_LEGAL))


# ---------------------------------------------------------------------------
# Site 2: e-commerce help centre (div soup, cookie banner, rotating teasers)
# ---------------------------------------------------------------------------
SV_CATS = [("Orders", "Track, change or cancel an order"), ("Delivery", "Options, costs and delivery times"),
           ("Returns and refunds", "Send something back and get your money"), ("Payments", "Cards, wallets and pay later"),
           ("Your account", "Sign in, security and personal details"), ("Gift cards", "Buy, redeem and check a balance"),
           ("Product help", "Manuals, warranties and spare parts"), ("Vantage Plus membership", "Free delivery and member prices")]
SV_TRENDING = [
    ("Where is my refund?", "Refunds usually reach your account within five working days after we have checked the returned item."),
    ("Can I change my order after placing it?", "You can edit items and the delivery address until the order has been packed in our warehouse."),
    ("Do you deliver to parcel lockers?", "Most small parcels can be sent to a locker; choose the option at checkout to see lockers near you."),
    ("How do I unsubscribe from marketing emails?", "Use the link at the bottom of any marketing email, or change your preferences in your account."),
    ("What is Vantage Plus?", "Vantage Plus is our membership scheme with free next-day delivery and early access to sales."),
    ("My discount code does not work", "Codes are case sensitive and may only apply to selected items; check the terms in the email."),
    ("Is it safe to save my card?", "Card details are stored by our payment provider and protected with strong encryption."),
    ("Can I collect from a store?", "Click and collect is free on orders over twenty pounds and available at over two hundred stores."),
]
SV_LEGAL = ("ShopVantage is a trading name of Vantage Retail Group Ltd, registered in Westmere, company number 00000000. "
            "Registered office: 1 Example Wharf, Westmere. Prices and availability are subject to change. Offers are "
            "subject to terms and conditions and may be withdrawn at any time.")


def render_shopvantage(pg, ctx):
    rng = ctx["rng"]
    cats = "".join('<div class="cat-tile"><a href="/hc/%s"><div class="cat-name">%s</div><div class="cat-desc">%s</div></a></div>' % (
        c.lower().replace(" ", "-"), E(c), E(d)) for c, d in SV_CATS)
    left = "".join('<div class="side-link"><a href="%s">%s</a></div>' % (E(h), E(t)) for t, h, _ in ctx["related"][:5])
    trend = teaser_html(ctx["teasers"], "div", "trend-item")
    rel = teaser_html(ctx["related"][5:], "div", "rel-item")
    votes = rng.randint(12, 900)
    return """<!doctype html><html><head><meta charset="utf-8"><title>{title} - ShopVantage Help Centre</title>
<style>.hc-cookie{{position:fixed;bottom:0}}.col-l{{float:left;width:22%}}</style></head><body>
<div class="hc-cookie" id="cookie-banner"><div class="cb-inner"><div class="cb-text">We use cookies to make our website work, to understand how you use it and to show you relevant offers. You can accept all cookies, or choose which ones we may use. Read our cookie policy for details.</div>
<div class="cb-btns"><span class="btn">Accept all cookies</span><span class="btn">Manage preferences</span></div></div></div>
<div class="hc-wrap"><div class="hc-topbar"><div>Free standard delivery on orders over 40 pounds</div><div>Download the ShopVantage app</div><div>Store finder</div></div>
<div class="hc-header"><div class="logo">ShopVantage <span>Help Centre</span></div><div class="hc-search"><div class="lbl">How can we help?</div><input placeholder="Search help articles"></div>
<div class="acct"><a href="/account">Sign in</a> <a href="/basket">Basket</a></div></div>
<div class="hc-cats">{cats}</div>
<div class="crumbs"><a href="/hc">Help Centre</a> / <a href="/hc/{section}">{section_name}</a> / <span>{title}</span></div>
<div class="hc-row"><div class="col-l"><div class="side-h">Articles in this section</div>{left}</div>
<div class="col-m"><div class="art"><div class="art-meta">Updated {upd} days ago</div><div class="art-body">
{body}
</div><div class="helpful"><div>Was this article helpful?</div><span>Yes</span><span>No</span><div class="cnt">{votes} out of {votes2} found this helpful</div></div></div>
<div class="rel"><div class="rel-h">Related articles</div>{rel}</div></div>
<div class="col-r"><div class="trend-h">Trending questions</div>{trend}
<div class="contact-box"><div class="cb-h">Still need help?</div><div>Chat with us from 8:00 to 22:00, seven days a week.</div><div>Call 0100 555 0123</div></div></div></div>
<div class="hc-footer"><div class="f-cols"><div><div class="f-h">Shopping with us</div><div>Delivery</div><div>Returns</div><div>Price match</div><div>Gift cards</div></div>
<div><div class="f-h">About ShopVantage</div><div>Careers</div><div>Sustainability report</div><div>Modern slavery statement</div><div>Press office</div></div>
<div><div class="f-h">Legal</div><div>Terms and conditions</div><div>Privacy notice</div><div>Cookie policy</div><div>Accessibility</div></div></div>
<div class="f-legal">{legal}</div></div></div></body></html>
""".format(title=E(pg["title"]), cats=cats, section=pg["section"], section_name=E(pg["section"].replace("-", " ").title()),
           left=left, upd=rng.randint(2, 300), body=body_html(pg["blocks"], "divsoup"), votes=votes,
           votes2=votes + rng.randint(3, 200), rel=rel, trend=trend, legal=E(SV_LEGAL))


# ---------------------------------------------------------------------------
# Site 3: documentation portal (long sidebar TOC BEFORE the content)
# ---------------------------------------------------------------------------
QS_TOC = [("Getting started", ["Overview", "Installation", "Quickstart", "Concepts", "Glossary"]),
          ("Guides", ["Workspaces", "Collections", "Permissions and roles", "Scheduled jobs", "Importing data",
                      "Exporting data", "Search", "Webhooks", "Single sign-on"]),
          ("API reference", ["Authentication", "Errors", "Pagination", "Rate limits", "Orders API", "Customers API",
                             "Inventory API", "Content API", "Uploads", "Audit log"]),
          ("SDKs and tools", ["Quillstack CLI", "Python SDK", "JavaScript SDK", "Terraform provider", "Postman collection"]),
          ("Operations", ["Self-hosting Quillstack Server", "Backups", "Monitoring", "Scaling workers", "Upgrading"]),
          ("Release notes", ["CLI", "Python SDK", "JavaScript SDK", "Server", "Deprecation schedule"])]
QS_TEASE = [
    ("Quillstack Server 6 is here", "Faster search, field-level permissions and a new audit log. Read the upgrade guide before moving production workspaces."),
    ("Join the community forum", "Ask questions, share recipes and vote on the roadmap with other Quillstack users."),
    ("Status page", "Check current uptime and subscribe to incident notifications for the hosted service."),
    ("Training courses", "Self-paced courses cover modelling content, automation and operating Quillstack at scale."),
    ("Security advisories", "Subscribe to receive advisories for the server and SDKs as soon as they are published."),
]


def render_quillstack(pg, ctx):
    rng = ctx["rng"]
    toc = "\n".join('<li class="toc-sec"><span class="toc-h">%s</span>%s</li>' % (E(s), ul_links(
        [(x, "/docs/%s/%s" % (s.lower().replace(" ", "-"), x.lower().replace(" ", "-"))) for x in xs], "toc-sub"))
        for s, xs in QS_TOC)
    onpage = "".join("<li>%s</li>" % E(v) for k, v in pg["blocks"] if k == "h2")
    rel = teaser_html(ctx["related"], "div", "see-also")
    tz = teaser_html(ctx["teasers"], "div", "promo")
    prev_, next_ = ctx["prevnext"]
    return """<!DOCTYPE html>
<html><head><meta charset="utf-8"><title>{title} - Quillstack Docs</title><script src="/assets/docs.js"></script>
<script>var DOCS_VERSION="v4";</script></head><body>
<div id="topbar"><span class="logo">Quillstack Docs</span><select><option>v4 (latest)</option><option>v3</option><option>v2 (unsupported)</option></select>
<span class="top-links"><a href="/docs">Docs</a> <a href="/api">API</a> <a href="/community">Community</a> <a href="/status">Status</a> <a href="/login">Log in</a></span>
<input type="search" placeholder="Search the docs (press / to focus)"></div>
<div id="sidebar"><div class="sb-title">Documentation</div><ul class="toc">{toc}</ul>
<div class="sb-foot">Docs for older versions are archived. Found a problem? Open an issue in the docs repository.</div></div>
<div id="rightrail"><div class="rr-h">On this page</div><ul>{onpage}</ul><div class="promos">{tz}</div></div>
<div id="content"><div class="crumb"><a href="/docs">Docs</a> &rsaquo; <a href="/docs/{section}">{section}</a></div>
<div class="doc">
{body}
</div>
<div class="doc-meta">Last updated {days} days ago &middot; <a href="/edit">Edit this page</a> &middot; Was this page helpful? Yes / No</div>
<div class="pager"><a class="prev" href="{ph}">Previous: {pt}</a> <a class="next" href="{nh}">Next: {nt}</a></div>
<div class="seealso"><h4>See also</h4>{rel}</div></div>
<div id="footer">Copyright 2026 Quillstack Labs. Documentation licensed under a permissive content licence; code samples are released into the public domain. Quillstack is an invented product used for testing. <a href="/privacy">Privacy</a> <a href="/terms">Terms</a> <a href="/security">Security</a></div>
</body></html>
""".format(title=E(pg["title"]), toc=toc, onpage=onpage, tz=tz, section=pg["section"],
           body=body_html(pg["blocks"], "semantic"), days=rng.randint(1, 400), ph=E(prev_[1]), pt=E(prev_[0]),
           nh=E(next_[1]), nt=E(next_[0]), rel=rel)


# ---------------------------------------------------------------------------
# Site 4: clinic information site (legacy table layout)
# ---------------------------------------------------------------------------
HV_NAV = ["Home", "About the clinic", "Our doctors and nurses", "Register as a patient", "Appointments",
          "Repeat prescriptions", "Test results", "Clinics and services", "Travel vaccinations", "Patient notices",
          "Patient participation group", "Comments and complaints", "Opening hours", "Find us"]
HV_TIPS = [
    ("Know your numbers", "A free blood pressure check takes five minutes and can be done by the health care assistant without an appointment on Tuesday mornings."),
    ("Stay well this winter", "Keep a small supply of paracetamol, rehydration sachets and a thermometer at home for minor winter illnesses."),
    ("Online services", "Register for online services to book appointments, order repeat prescriptions and see your test results from home."),
    ("Sun safety", "Use sunscreen with a high protection factor and cover up between 11:00 and 15:00 on bright days."),
    ("Missed appointments", "Last month 214 appointments were missed without notice. Please cancel if you cannot attend."),
    ("Carers' support", "If you look after a relative or friend, tell reception so that we can offer a carers' health check."),
    ("Quit smoking service", "Our trained advisers offer weekly support sessions and free nicotine replacement for twelve weeks."),
]
HV_LEGAL = ("The information on this website is for general information only and is not a substitute for medical "
            "advice. Harbourview Clinic Partnership is an invented organisation. We are not responsible for the content "
            "of external websites. This site uses cookies for statistics only.")


def render_harbourview(pg, ctx):
    nav = "<br>\n".join('<a href="/%s.htm"><font color="#004466">%s</font></a>' % (n.lower().replace(" ", "_"), E(n))
                        for n in HV_NAV)
    tips = "".join('<table width="100%%" bgcolor="#f4f0e0" cellpadding="6"><tr><td><b>%s</b><br><font size="2">%s</font></td></tr></table><br>' % (
        E(t), E(s)) for t, _, s in ctx["teasers"])
    notices = "".join('<li><a href="%s">%s</a> - <font size="2">%s</font></li>' % (E(h), E(t), E(s))
                      for t, h, s in ctx["related"])
    return """<html><head><title>Harbourview Clinic - {title}</title><meta http-equiv="Content-Type" content="text/html; charset=utf-8"></head>
<body bgcolor="#ffffff" leftmargin="0" topmargin="0">
<table width="100%" border="0" cellpadding="0" cellspacing="0">
<tr><td colspan="2" bgcolor="#004466"><font color="#ffffff" size="6" face="Georgia">Harbourview Clinic Partnership</font><br>
<font color="#ffffff" size="2">Harbourview Main Clinic &middot; Northgate &middot; Elm Street &middot; Quayside &middot; Fernhill &nbsp;|&nbsp; Appointments: 0100 555 0150</font></td></tr>
<tr><td colspan="2" bgcolor="#dde8ee"><font size="2"><a href="/">Home</a> | <a href="/notices.htm">Patient notices</a> | <a href="/contact.htm">Contact us</a> | <a href="/accessibility.htm">Accessibility</a> | Text size: A A A</font></td></tr>
<tr><td width="220" valign="top" bgcolor="#eef3f6"><font face="Verdana" size="2">{nav}</font><br><br>
<font face="Verdana" size="2"><b>Health tips</b></font><br>{tips}</td>
<td valign="top"><table width="100%" cellpadding="12"><tr><td><font face="Verdana" size="2">
<font size="1">You are here: Home &gt; Patient notices &gt; {title}</font><br><br>
{body}
</font>
<hr><font face="Verdana" size="2"><b>Other patient notices</b><ul>{notices}</ul></font></td></tr></table></td></tr>
<tr><td colspan="2" bgcolor="#dde8ee"><font size="1" face="Verdana">Harbourview Clinic Partnership, 3 Harbour Road, Marlow Bay. Telephone 0100 555 0150. In an emergency dial the emergency number. {legal} Page last reviewed by the practice manager.</font></td></tr>
</table></body></html>
""".format(title=E(pg["title"]), nav=nav, tips=tips, body=body_html(pg["blocks"], "legacy"), notices=notices,
           legal=E(HV_LEGAL))


# ---------------------------------------------------------------------------
# Site 5: forum-style knowledge base (div soup, user card, similar threads)
# ---------------------------------------------------------------------------
TB_USERS = [("quietsolder", "Community Expert", 4211, 2017), ("maple_and_bits", "Moderator", 9874, 2015),
            ("rivet_rhea", "Knowledge Base Author", 1530, 2020), ("owlbench", "Super User", 6120, 2016)]
TB_TREND = [
    ("Forum etiquette: please read before posting", "Search before you ask, give your thread a descriptive title and mark the answer that solved your problem."),
    ("Monthly build challenge: lamps", "Share a lamp you built or repaired this month; the community votes for a winner on the last Friday."),
    ("Known issue: notifications delayed", "Some members are seeing email notifications arrive hours late. The team is investigating."),
    ("New member introductions", "Say hello, tell us what you like to make and what tools are on your bench."),
    ("How to format code in posts", "Wrap code in triple backticks so that indentation is preserved and the post is easier to read."),
    ("Community meet-up in Marlow Bay", "Members are meeting at the maker space on the last Saturday of the month to swap tools and fix things."),
]


def render_tinkerbench(pg, ctx):
    rng = ctx["rng"]
    user, rank, posts, joined = rng.choice(TB_USERS)
    sim = "".join('<div class="sim-thread"><a href="%s" class="sim-t">%s</a><div class="sim-x">%s</div><div class="sim-m">%d replies</div></div>' % (
        E(h), E(t), E(s), rng.randint(0, 40)) for t, h, s in ctx["related"])
    trend = teaser_html(ctx["teasers"], "div", "trend")
    return """<!DOCTYPE html><html><head><meta charset="utf-8"><title>{title} - Tinkerbench Community</title>
<script type="application/json" id="cfg">{{"forum":"kb","threadId":"{tid}"}}</script></head><body>
<div class="tb-head"><div class="tb-logo">Tinkerbench Community</div><div class="tb-nav"><a href="/forums">Forums</a><a href="/kb">Knowledge base</a><a href="/events">Events</a><a href="/members">Members</a><a href="/help">Help</a></div>
<div class="tb-user"><a href="/login">Sign in</a> or <a href="/join">join the community</a></div></div>
<div class="tb-banner">Welcome to the Tinkerbench Community, where makers help each other fix, build and improve things. Sign in to ask a question, reply or give kudos.</div>
<div class="tb-crumbs"><a href="/">Community</a> &raquo; <a href="/kb">Knowledge base</a> &raquo; <a href="/kb/{section}">{section}</a></div>
<div class="thread"><div class="thread-head"><span class="badge">Solved</span><h1 class="thread-title">{title}</h1>
<div class="thread-stats">{views} views &middot; {kudos} kudos &middot; {replies} replies</div></div>
<div class="post first"><div class="author-card"><div class="uname">{user}</div><div class="rank">{rank}</div><div class="ustats">Posts: {posts} &middot; Joined {joined}</div></div>
<div class="post-content">
{body}
</div>
<div class="signature">-- {user} | Please mark the reply that solved your problem so others can find it.</div>
<div class="post-actions"><span>Kudos</span><span>Reply</span><span>Report</span><span>Share</span></div></div></div>
<div class="similar"><div class="sim-h">Similar threads</div>{sim}</div>
<div class="sidebar"><div class="sb-h">Trending in the community</div>{trend}</div>
<div class="tb-foot"><div>Community guidelines</div><div>Code of conduct</div><div>Privacy</div><div>Terms of use</div>
<div>Tinkerbench Community is run by volunteers. Posts are the opinions of their authors. Do not post personal information. Copyright 2026 Tinkerbench, an invented organisation.</div></div>
</body></html>
""".format(title=E(pg["title"]), tid=rng.randint(10000, 99999), section=pg["section"], views=rng.randint(50, 20000),
           kudos=rng.randint(0, 300), replies=rng.randint(1, 40), user=user, rank=rank, posts=posts, joined=joined,
           body=body_html(pg["blocks"], "forum"), sim=sim, trend=trend)


# ---------------------------------------------------------------------------
# Site 6: city tourism site (cookie banner, mega-menu, rotating carousel)
# ---------------------------------------------------------------------------
MB_MENU = [("Things to do", ["Beaches", "Museums and galleries", "Walks and trails", "Boat trips", "Family days out",
                             "Rainy day ideas"]),
           ("What's on", ["Events calendar", "Festivals", "Markets", "Live music", "Submit an event"]),
           ("Eat and drink", ["Seafood restaurants", "Cafes", "Pubs", "Local produce"]),
           ("Stay", ["Hotels", "Guest houses", "Self-catering", "Campsites"]),
           ("Plan your trip", ["Getting here", "Parking", "Maps and guides", "Accessible travel", "Visitor information centre"])]
MB_CAROUSEL = [
    ("Rock pooling at low tide", "Join a ranger on the south beach to find crabs, blennies and starfish; nets and buckets are provided."),
    ("Sunset from the north pier", "The pier faces west, making it the best place in town to watch the sun go down over the bay."),
    ("Fish and chips on the harbour wall", "Eat them from the paper while the boats come in, but keep an eye on the gulls."),
    ("A day on the heritage trail", "Follow twenty bronze plaques through the old town and learn about smugglers, shipwrights and poets."),
    ("Stay two nights, get the third free", "Selected guest houses are offering a free third night on stays between November and March."),
    ("Cycling the estuary path", "A flat, traffic-free route runs eleven kilometres along the estuary to the village of Saltby."),
    ("Wild swimming safely", "Swim at lifeguarded beaches in summer, check the tide times and never swim alone."),
    ("Shop local in the market hall", "Independent traders sell smoked fish, cheese, books and crafts six days a week."),
]


def render_marlowbay(pg, ctx):
    rng = ctx["rng"]
    menu = "".join('<div class="mm-col"><div class="mm-h">%s</div>%s</div>' % (E(g), ul_links(
        [(x, "/%s/%s" % (g.lower().replace(" ", "-").replace("'", ""), x.lower().replace(" ", "-"))) for x in xs]))
        for g, xs in MB_MENU)
    car = teaser_html(ctx["teasers"], "div", "slide")
    rel = teaser_html(ctx["related"], "div", "card")
    return """<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><title>{title} | Visit Marlow Bay</title></head><body>
<div id="cookie-consent" role="dialog"><p>Visit Marlow Bay uses cookies to remember your preferences, measure visits and support our partners. Choose Accept to allow all cookies or Settings to pick.</p><button>Accept</button><button>Settings</button></div>
<div id="page"><div class="masthead"><a class="logo" href="/">Visit Marlow Bay</a><span class="tagline">The official visitor guide to Marlow Bay and the Westmere coast</span>
<div class="mm">{menu}</div><a class="cta" href="/plan">Plan your visit</a></div>
<div class="crumbtrail"><a href="/">Home</a> / <a href="/{section}">{sectname}</a> / {title}</div>
<section class="content">
{body}
</section>
<div class="share">Share this page: email, message, print</div>
<div class="carousel"><div class="car-h">Inspiration for your stay</div>{car}</div>
<div class="more"><div class="more-h">More things to do</div>{rel}</div>
<div class="newsletter"><div class="nl-h">Sign up to our newsletter</div><p>Get the best events, offers and new places to eat sent to your inbox once a month. You can unsubscribe at any time.</p><input placeholder="Your email address"><button>Subscribe</button></div>
<div class="partners">Visit Marlow Bay is supported by local businesses, the harbour trust and the Westmere coast partnership.</div>
<footer><div>Visitor information centre, Harbour Street, Marlow Bay. Open daily 9:30 to 17:00 in summer.</div>
<div>About us | Contact | Press and media | Business membership | Accessibility | Privacy and cookies | Terms</div>
<div>Every effort is made to ensure that information on this site is accurate, but details of events and opening times may change. Please check with the organiser before travelling. Visit Marlow Bay is an invented destination organisation.</div></footer></div>
</body></html>
""".format(title=E(pg["title"]), menu=menu, section=pg["section"], sectname=E(pg["section"].replace("-", " ").title()),
           body=body_html(pg["blocks"], "semantic"), car=car, rel=rel)


# ---------------------------------------------------------------------------
# Site 7: light-template local notes site
# ---------------------------------------------------------------------------
def render_lantern(pg, ctx):
    syn = ""
    if pg.get("origin_url"):
        syn = '<p class="syndication">This post first appeared on <a href="%s">%s</a>.</p>' % (
            E(pg["origin_url"]), E(pg["origin_url"].split("/")[2]))
    return """<!DOCTYPE html>
<html><head><meta charset="utf-8"><title>{title} - Lantern Press Notes</title></head><body>
<header><a href="/">Lantern Press Notes</a> <nav><a href="/local">Local</a> <a href="/tech">Tech</a> <a href="/about">About</a></nav></header>
<article>
{body}
</article>
{syn}
<footer>Lantern Press Notes, a small invented community newsletter.</footer>
</body></html>
""".format(title=E(pg["title"]), body=body_html(pg["blocks"], "semantic"), syn=syn)


# ===========================================================================
# Plain-export renderings: .txt, .md, .pdf
# ===========================================================================
def render_txt(pg):
    out = ["Paperlane document export", "Source: %s" % pg["origin_url"], "Exported: %s" % pg["exported"], "", ""]
    for k, v in pg["blocks"]:
        if k == "h1":
            out += [v, "=" * min(len(v), 78), ""]
        elif k == "h2":
            out += [v, "-" * min(len(v), 78), ""]
        elif k == "p":
            out += textwrap.wrap(v, 78, break_on_hyphens=False, break_long_words=False) + [""]
        elif k in ("ul", "ol"):
            for it in v:
                w = textwrap.wrap(it, 74, break_on_hyphens=False, break_long_words=False)
                out.append("  - " + w[0])
                out += ["    " + x for x in w[1:]]
            out.append("")
        elif k == "table":
            widths = [max(len(r[c]) for r in v) for c in range(len(v[0]))]
            for ri, r in enumerate(v):
                out.append("  ".join(c.ljust(widths[i]) for i, c in enumerate(r)).rstrip())
                if ri == 0:
                    out.append("  ".join("-" * w for w in widths))
            out.append("")
    out += ["", "-- end of export --", ""]
    return "\n".join(out)


def render_md(pg):
    out = ["---", 'title: "%s"' % pg["title"].replace('"', "'"), "source: %s" % pg["origin_url"],
           "exported: %s" % pg["exported"], "---", ""]
    for k, v in pg["blocks"]:
        if k == "h1":
            out += ["# " + v, ""]
        elif k == "h2":
            out += ["## " + v, ""]
        elif k == "p":
            out += [v, ""]
        elif k == "ul":
            out += ["- " + it for it in v] + [""]
        elif k == "ol":
            out += ["%d. %s" % (i + 1, it) for i, it in enumerate(v)] + [""]
        elif k == "table":
            out.append("| " + " | ".join(v[0]) + " |")
            out.append("|" + "|".join("---" for _ in v[0]) + "|")
            out += ["| " + " | ".join(r) + " |" for r in v[1:]] + [""]
    return "\n".join(out)


def render_pdf(pg, path):
    from fpdf import FPDF

    class Doc(FPDF):
        def header(self):
            self.set_font("Helvetica", "I", 8)
            self.set_text_color(120, 120, 120)
            self.cell(0, 6, "Paperlane document export", new_x="LMARGIN", new_y="NEXT")
            self.set_text_color(0, 0, 0)
            self.ln(2)

        def footer(self):
            self.set_y(-14)
            self.set_font("Helvetica", "", 8)
            self.set_text_color(120, 120, 120)
            self.cell(0, 6, "Page %d of {nb}  |  %s" % (self.page_no(), pg["origin_url"]), align="C")

    pdf = Doc(format="A4")
    pdf.set_creation_date(datetime.datetime(2026, 3, 2, 9, 0, 0, tzinfo=datetime.timezone.utc))
    pdf.set_title(pg["title"])
    pdf.set_author("Paperlane export service")
    pdf.set_auto_page_break(True, margin=18)
    pdf.add_page()
    for k, v in pg["blocks"]:
        if k == "h1":
            pdf.set_font("Helvetica", "B", 16)
            pdf.multi_cell(0, 8, v, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k == "h2":
            pdf.ln(1)
            pdf.set_font("Helvetica", "B", 12)
            pdf.multi_cell(0, 7, v, new_x="LMARGIN", new_y="NEXT")
        elif k == "p":
            pdf.set_font("Helvetica", "", 10.5)
            pdf.multi_cell(0, 5.5, v, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k in ("ul", "ol"):
            pdf.set_font("Helvetica", "", 10.5)
            for it in v:
                pdf.set_x(pdf.l_margin + 4)
                pdf.multi_cell(0, 5.5, "- " + it, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k == "table":
            pdf.set_font("Helvetica", "", 9.5)
            with pdf.table(first_row_as_headings=True, line_height=5.5) as t:
                for r in v:
                    row = t.row()
                    for c in r:
                        row.cell(c)
            pdf.ln(3)
    pdf.output(path)


# ===========================================================================
# Sites and plan
# ===========================================================================
SITES = {
    "northvale-cs": dict(host="cs.northvale-university.example.org", render=render_northvale, heavy=True,
                         plan=[("course", 14), ("event", 8)], twins=13, ext=".html",
                         sections={"course": "courses", "event": "events"}, teasers=NV_NEWS),
    "shopvantage-help": dict(host="help.shopvantage.example.com", render=render_shopvantage, heavy=True,
                             plan=[("help", 12), ("faq", 16)], twins=12, ext="",
                             sections={"help": "orders-and-delivery", "faq": "product-help"}, teasers=SV_TRENDING),
    "quillstack-docs": dict(host="docs.quillstack.example.net", render=render_quillstack, heavy=True,
                            plan=[("release", 14), ("howto", 14)], twins=12, ext="",
                            sections={"release": "release-notes", "howto": "guides"}, teasers=QS_TEASE),
    "harbourview-clinic": dict(host="www.harbourview-clinic.example.org", render=render_harbourview, heavy=True,
                               plan=[("clinic", 24)], twins=14, ext=".htm", sections={"clinic": "notices"},
                               teasers=HV_TIPS),
    "tinkerbench-kb": dict(host="kb.tinkerbench.test", render=render_tinkerbench, heavy=True,
                           plan=[("faq", 10), ("howto", 8)], twins=8, ext="",
                           sections={"faq": "product-questions", "howto": "api-integrations", "help": "shopping-help",
                                     "release": "release-threads", "event": "meetups", "course": "learning",
                                     "clinic": "off-topic", "attraction": "off-topic"}, teasers=TB_TREND),
    "visit-marlowbay": dict(host="visit-marlowbay.example.com", render=render_marlowbay, heavy=True,
                            plan=[("event", 10), ("attraction", 10)], twins=12, ext="",
                            sections={"event": "whats-on", "attraction": "things-to-do", "course": "whats-on",
                                      "clinic": "plan-your-trip"}, teasers=MB_CAROUSEL),
    "lantern-notes": dict(host="notes.lanternpress.example.net", render=render_lantern, heavy=False,
                          plan=[("clinic", 5), ("release", 4)], twins=3, ext=".html",
                          sections={}, teasers=[]),
}
EXPORT_SITE = "paperlane-exports"
EXPORT_HOST = "exports.paperlane.test"
# where cross-site copies of each family may appear
COPY_TARGETS = {"course": ["lantern-notes", "tinkerbench-kb"], "event": ["lantern-notes", "visit-marlowbay"],
                "help": ["tinkerbench-kb", "lantern-notes"], "faq": ["tinkerbench-kb", "shopvantage-help"],
                "clinic": ["lantern-notes", "visit-marlowbay"], "release": ["tinkerbench-kb", "lantern-notes"],
                "howto": ["tinkerbench-kb", "quillstack-docs"], "attraction": ["lantern-notes", "visit-marlowbay"]}


def slugify(t):
    return re.sub(r"[^a-z0-9]+", "-", t.lower()).strip("-")[:60].strip("-")


class Corpus:
    def __init__(self):
        self.pages = []
        self.used_paths = set()
        self.ncl = 0

    def new_cluster(self):
        self.ncl += 1
        return "c%03d" % self.ncl

    def add(self, site, slug, ext, blocks, title, family, cluster, role, **kw):
        base = slug
        n = 2
        while "%s/%s%s" % (site, slug, ext) in self.used_paths:
            slug = "%s-%d" % (base, n)
            n += 1
        path = "%s/%s%s" % (site, slug, ext)
        self.used_paths.add(path)
        pg = dict(site=site, slug=slug, ext=ext, path=path, blocks=blocks, title=title, family=family,
                  cluster=cluster, role=role, text=body_text(blocks))
        pg.update(kw)
        pg["sh"] = shingles(pg["text"])
        self.pages.append(pg)
        return pg


def gen_sized(fam, item, rng, size):
    lo, hi = (80, 199) if size == "short" else (200, 450)
    best = None
    for _ in range(30):
        title, blocks = FAMILY_GEN[fam](rng, item, size)
        if size == "long":
            add_extra(rng, fam, blocks, rng.randint(1, 5))
        w = word_count(blocks)
        if lo <= w <= hi:
            return title, blocks
        if 80 <= w <= 450 and best is None:
            best = (title, blocks)
    return best if best else (None, None)


def item_key(fam, item):
    if fam in ("faq",):
        return (fam, item[0][0], item[1][0])
    if fam in ("clinic", "howto"):
        return (fam, item[0], item[1][0])
    if fam == "release":
        return (fam,) + tuple(item)
    return (fam, item[1] if fam == "event" else item[0])


def max_j(sh, pages, exclude=()):
    m = 0.0
    for p in pages:
        if p["cluster"] in exclude:
            continue
        if len(sh) and len(p["sh"]):
            j = jacc(sh, p["sh"])
            if j > m:
                m = j
    return m


# ===========================================================================
# Build
# ===========================================================================
def build(outdir):
    C = Corpus()
    used_items = set()
    BASE_MAX = 0.40
    # ---- 1. base pages ---------------------------------------------------
    for site, S in SITES.items():
        for fam, n in S["plan"]:
            items = family_items(fam)
            R("items/%s/%s" % (site, fam)).shuffle(items)
            got = 0
            for it in items:
                if got >= n:
                    break
                k = item_key(fam, it)
                if k in used_items:
                    continue
                rng = R("base/%s/%s" % (site, k))
                size = "short" if rng.random() < 0.45 else "long"
                title, blocks = gen_sized(fam, it, rng, size)
                if title is None:
                    continue
                sh = shingles(body_text(blocks))
                if max_j(sh, C.pages) >= BASE_MAX:
                    continue
                used_items.add(k)
                C.add(site, slugify(title), ".html", blocks, title, fam, C.new_cluster(), "singleton", item=it)
                got += 1
            assert got == n, (site, fam, got)
    bases = list(C.pages)
    # ---- 2. twins: same family/item, different facts (hard negatives) ----
    hard_pairs = []
    for site, S in SITES.items():
        rng = R("twins/" + site)
        cands = [p for p in bases if p["site"] == site]
        rng.shuffle(cands)
        made = 0
        for sib in cands:
            if made >= S["twins"]:
                break
            tsite = site
            if rng.random() < 0.2:
                opts = [s for s in COPY_TARGETS[sib["family"]] if s != site]
                tsite = rng.choice(opts) if opts else site
            target = rng.uniform(0.12, 0.42)
            best = None
            for attempt in range(24):
                r2 = R("twin/%s/%s/%d" % (site, sib["path"], attempt))
                size = "short" if r2.random() < 0.45 else "long"
                title, blocks = gen_sized(sib["family"], sib["item"], r2, size)
                if title is None:
                    continue
                sh = shingles(body_text(blocks))
                j = jacc(sh, sib["sh"])
                if not (0.12 <= j <= 0.42):
                    continue
                if best is not None and abs(j - target) >= abs(best[0] - target):
                    continue
                if max_j(sh, C.pages, exclude=(sib["cluster"],)) >= BASE_MAX:
                    continue
                best = (j, title, blocks)
            if best is not None:
                j, title, blocks = best
                tw = C.add(tsite, slugify(title), ".html", blocks, title, sib["family"], C.new_cluster(),
                           "twin", item=sib["item"])
                hard_pairs.append((sib, tw, "hard negative: same family and item, regenerated with different facts"
                                   + (", same title" if title == sib["title"] else "")
                                   + (", same site and template" if tsite == site else ", other site")))
                made += 1
    # ---- 3. choose originals for planted relations -----------------------
    rng = R("assign")
    pool = [p for p in bases if p["site"] != "lantern-notes"]
    rng.shuffle(pool)
    by_site = {}
    for p in pool:
        by_site.setdefault(p["site"], []).append(p)
    xf, nd, ex = [], [], []
    for site, lst in sorted(by_site.items()):
        xf += lst[:4]
        nd += lst[4:11]
        ex += lst[11:14]
    nd = nd[:40]
    ex = ex[:18]
    # ---- 4. near-duplicate republications --------------------------------
    for i, orig in enumerate(nd):
        r = R("nd/" + orig["path"])
        ncopies = 2 if i % 4 == 0 else 1
        orig["role"] = "original"
        members = [orig]
        for c in range(ncopies):
            blocks, ops = None, None
            for attempt in range(10):
                blocks, ops = republish(orig["blocks"], R("nd/%s/%d/%d" % (orig["path"], c, attempt)),
                                        [m["sh"] for m in members[1:]])
                if blocks and all(body_text(blocks) != m["text"] for m in members):
                    break
                blocks = None
            if not blocks:
                continue
            if r.random() < 0.5:
                tsite = orig["site"]
                slug = orig["slug"] + r.choice(["-updated", "-reprint", "-archive", "-copy"])
                how = "same-site republication"
            else:
                tsite = r.choice(COPY_TARGETS[orig["family"]])
                if tsite == orig["site"]:
                    tsite = "lantern-notes"
                slug = orig["slug"]
                how = "cross-site republication"
            title = blocks[0][1]
            cp = C.add(tsite, slug, ".html", blocks, title, orig["family"], orig["cluster"],
                       "near-duplicate", note="%s of %s with hand-written edits (%s)" % (how, orig["path"], ", ".join(ops)),
                       origin=orig["path"])
            members.append(cp)
    # ---- 5. exact-body syndication ---------------------------------------
    for orig in ex:
        r = R("ex/" + orig["path"])
        orig["role"] = "original"
        tsite = r.choice([s for s in COPY_TARGETS[orig["family"]] if s != orig["site"]] or ["lantern-notes"])
        C.add(tsite, orig["slug"], ".html", copy.deepcopy(orig["blocks"]), orig["title"], orig["family"],
              orig["cluster"], "exact-copy", note="syndicated to %s with identical body, different template" % tsite,
              origin=orig["path"])
    # ---- 6. cross-format exports -----------------------------------------
    for i, orig in enumerate(xf):
        orig["role"] = "original"
        fmts = [".txt", ".md", ".pdf"]
        if i % 6 == 5:
            fmts = [".txt", ".pdf"]
        elif i % 6 == 2:
            fmts = [".md", ".pdf"]
        words = word_count(orig["blocks"])
        n = max(1, int(round(words * 0.01)))
        chosen = None
        for attempt in range(30):
            nn = n if attempt < 10 else max(1, n - 1) if attempt < 20 else 1
            r = R("xf/%s/%d" % (orig["path"], attempt))
            vers = []
            for f in fmts:
                zero = attempt >= 25 and f != ".pdf"
                b, ops = (copy.deepcopy(orig["blocks"]), []) if zero else convert_noise(orig["blocks"], r, nn)
                vers.append((f, b, ops, shingles(body_text(b))))
            shs = [orig["sh"]] + [v[3] for v in vers]
            if all(jacc(a, b) >= 0.80 for ii, a in enumerate(shs) for b in shs[ii + 1:]):
                chosen = vers
                break
        assert chosen, orig["path"]
        oslug = "%s--%s" % (orig["site"].split("-")[0], orig["slug"])
        for f, b, ops, _ in chosen:
            url = "https://%s/%s/%s%s" % (EXPORT_HOST, orig["site"], orig["slug"], f)
            C.add(EXPORT_SITE, oslug, f, b, orig["title"], orig["family"], orig["cluster"], "format-copy",
                  note="%s rendering of %s with %d independent conversion edit(s) (%s)" % (
                      f[1:], orig["path"], len(ops), ", ".join(ops) or "none"),
                  origin=orig["path"], origin_url=None, exported="2026-03-%02d" % (1 + i % 27))
    # ---- 7. URLs ---------------------------------------------------------
    for p in C.pages:
        if p["site"] == EXPORT_SITE:
            continue
        S = SITES[p["site"]]
        sec = S["sections"].get(p["family"], "local" if p["family"] in ("clinic", "event", "attraction", "course") else "tech")
        p["section"] = sec
        p["url"] = "https://%s/%s/%s%s" % (S["host"], sec, p["slug"], S["ext"])
    url_of = {p["path"]: p["url"] for p in C.pages if "url" in p}
    for p in C.pages:
        if p["site"] == EXPORT_SITE:
            p["origin_url"] = url_of[p["origin"]]
            p["url"] = "https://%s/%s" % (EXPORT_HOST, p["path"].split("/", 1)[1])
        elif p.get("role") == "exact-copy" and p["site"] == "lantern-notes":
            p["origin_url"] = url_of[p["origin"]]
    return C, hard_pairs


def snippet(p, n=24):
    for k, v in p["blocks"]:
        if k == "p":
            w = v.split()
            return " ".join(w[:n]) + (" ..." if len(w) > n else "")
    return ""


def render_site_pages(C):
    stats = {}
    for site, S in SITES.items():
        sp = [p for p in C.pages if p["site"] == site]
        for idx, p in enumerate(sp):
            rng = R("tpl/" + p["path"])
            others = [q for q in sp if q["cluster"] != p["cluster"]]
            rng.shuffle(others)
            rel_all = [(q["title"], "/%s/%s" % (q["section"], q["slug"]), snippet(q)) for q in others]
            tz = list(S["teasers"])
            rng.shuffle(tz)
            tz_all = [(t, "/promo/%s" % slugify(t), s) for t, s in tz]
            ctx = dict(rng=rng, prevnext=((sp[idx - 1]["title"], "/docs/" + sp[idx - 1]["slug"]),
                                          (sp[(idx + 1) % len(sp)]["title"], "/docs/" + sp[(idx + 1) % len(sp)]["slug"])))
            bw = len(norm_tokens(p["text"]))
            target = rng.uniform(2.6, 5.5)
            kr, kt = min(4, len(rel_all)), min(2, len(tz_all))
            while True:
                ctx["related"], ctx["teasers"] = rel_all[:kr], tz_all[:kt]
                ctx["rng"] = R("tpl/" + p["path"])
                page = S["render"](p, ctx)
                tw = visible_words(page) - bw
                if not S["heavy"] or tw >= target * bw or (kr >= len(rel_all) and kt >= len(tz_all)):
                    break
                if kt < len(tz_all) and (kt <= kr // 3 or kr >= len(rel_all)):
                    kt += 1
                else:
                    kr += 1
            p["html"] = page
            p["template_ratio"] = tw / bw
            stats.setdefault(site, []).append(tw / bw)
    return stats


def write_all(C, hard_pairs, stats, outdir):
    if os.path.isdir(outdir):
        shutil.rmtree(outdir)
    os.makedirs(outdir)
    for p in C.pages:
        assert all(ord(ch) < 128 for ch in p["text"]), p["path"]
        fp = os.path.join(outdir, "inbox", p["path"])
        os.makedirs(os.path.dirname(fp), exist_ok=True)
        if p["ext"] == ".txt":
            open(fp, "w").write(render_txt(p))
        elif p["ext"] == ".md":
            open(fp, "w").write(render_md(p))
        elif p["ext"] == ".pdf":
            render_pdf(p, fp)
        else:
            open(fp, "w").write(p["html"])
        bp = os.path.join(outdir, "bodies", p["path"] + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        open(bp, "w").write(p["text"] + "\n")
    with open(os.path.join(outdir, "manifest.jsonl"), "w") as f:
        for p in C.pages:
            f.write(json.dumps({"path": p["path"], "source_url": p["url"]}) + "\n")
    with open(os.path.join(outdir, "clusters.jsonl"), "w") as f:
        for p in C.pages:
            f.write(json.dumps({"path": p["path"], "cluster": p["cluster"], "family": p["family"], "role": p["role"],
                                "site": p["site"], "body_words": len(norm_tokens(p["text"])),
                                "template_ratio": round(p.get("template_ratio", 0.0), 2) if "html" in p else None}) + "\n")
    # ---- labels ----------------------------------------------------------
    labels = {}
    by_cl = {}
    for p in C.pages:
        by_cl.setdefault(p["cluster"], []).append(p)

    def put(a, b, rel, note):
        key = tuple(sorted((a["path"], b["path"])))
        if key in labels:
            return False
        j = jacc(a["sh"], b["sh"])
        labels[key] = dict(a=key[0], b=key[1], relation=rel, body_jaccard=round(j, 4), note=note)
        return True

    for cl, ms in by_cl.items():
        for i in range(len(ms)):
            for k in range(i + 1, len(ms)):
                a, b = ms[i], ms[k]
                if a["text"] == b["text"]:
                    rel = "exact-body"
                else:
                    rel = "near-duplicate"
                    assert jacc(a["sh"], b["sh"]) >= 0.80, (a["path"], b["path"])
                note = b.get("note") if b["role"] != "original" else a.get("note")
                if a["role"] != "original" and b["role"] != "original":
                    note = "two copies of the same original: [%s] and [%s]" % (a.get("note"), b.get("note"))
                put(a, b, rel, note)
    nh = 0
    for a, b, note in hard_pairs:
        if put(a, b, "distinct", note):
            nh += 1
    # extra same-family hard negatives found by scanning (different items)
    rng = R("scan")
    pl = list(C.pages)
    extra = []
    for i in range(len(pl)):
        for k in range(i + 1, len(pl)):
            a, b = pl[i], pl[k]
            if a["cluster"] == b["cluster"] or a["family"] != b["family"]:
                continue
            j = jacc(a["sh"], b["sh"])
            if 0.10 <= j < 0.45:
                extra.append((a, b))
    rng.shuffle(extra)
    for a, b in extra[:40]:
        put(a, b, "distinct", "hard negative: same family (%s), different copy group and facts" % a["family"])
    # random same-site distinct pairs
    for site in list(SITES) + [EXPORT_SITE]:
        sp = [p for p in C.pages if p["site"] == site]
        r = R("rand/" + site)
        got, tries = 0, 0
        while got < 35 and tries < 5000:
            tries += 1
            a, b = r.sample(sp, 2)
            if a["cluster"] == b["cluster"]:
                continue
            if put(a, b, "distinct", "random same-site pair from different copy groups"):
                got += 1
    # global check of unlabelled pairs
    for i in range(len(pl)):
        for k in range(i + 1, len(pl)):
            a, b = pl[i], pl[k]
            key = tuple(sorted((a["path"], b["path"])))
            if key in labels:
                continue
            assert a["cluster"] != b["cluster"], key
            assert jacc(a["sh"], b["sh"]) < 0.45, (key, jacc(a["sh"], b["sh"]))
    with open(os.path.join(outdir, "pairs.jsonl"), "w") as f:
        for key in sorted(labels):
            f.write(json.dumps(labels[key]) + "\n")
    return labels


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(HERE, "out"))
    args = ap.parse_args()
    C, hard = build(args.out)
    stats = render_site_pages(C)
    labels = write_all(C, hard, stats, args.out)
    # summary
    from collections import Counter
    rels = Counter(l["relation"] for l in labels.values())
    print("documents", len(C.pages))
    print("by site", dict(Counter(p["site"] for p in C.pages)))
    print("by ext", dict(Counter(p["ext"] or "(none)" for p in C.pages)))
    print("pairs", dict(rels))
    wc = [len(norm_tokens(p["text"])) for p in C.pages]
    print("body words min %d max %d, under 200: %d" % (min(wc), max(wc), sum(w < 200 for w in wc)))
    for s, v in stats.items():
        v = sorted(v)
        print("template ratio %-20s min %.2f median %.2f max %.2f" % (s, v[0], v[len(v) // 2], v[-1]))


if __name__ == "__main__":
    main()
