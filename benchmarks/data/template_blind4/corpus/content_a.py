"""Hand-written page families, part A: hospital trust, library consortium, changelog, recipes, netball league."""
from .common import date_pair, person, date_str, time_str, money, TOWN, STREET, WEEKDAY, FIRST, SURNAME
from .engine import Family, Section, Opt, PARA


def cap(s):
    return s[0].upper() + s[1:]


# ====================================================================== ashgrove (hospital trust)
HOSPITALS = ["Kelderby General Hospital", "Fallowmere Community Hospital", "Saltreach Infirmary",
             "Netherwold Treatment Centre", "Hatherwick Memorial Hospital"]
CLINICS = ["dermatology outpatient clinic", "fracture clinic", "hearing assessment service", "blood test room",
           "antenatal day unit", "eye casualty desk", "physiotherapy gym", "diabetes foot clinic",
           "sleep studies unit", "pharmacy collection point", "wound care clinic", "anticoagulation clinic",
           "breast screening unit", "x-ray walk-in service", "podiatry room"]
BUILDINGS = ["Block C", "the Orchard Wing", "the Linden Building", "Level 2 of the East Tower", "the Quarry Wing",
             "the old outpatients hall", "the Birchwood Suite", "Corridor F", "the Meadow Pavilion"]
REASONS = ["essential electrical work", "flooring replacement", "a fire door upgrade", "new ventilation ducts",
           "a roof repair above the waiting area", "the installation of a new scanner", "asbestos removal",
           "water pipe replacement", "lift refurbishment"]
ENTRANCES = ["north", "south", "Chapel Road", "main", "maternity", "west"]
CARPARKS = ["visitor car park A", "multi-storey car park", "staff and patient car park 3", "lower car park",
            "Willow car park"]


def notice_facts(r):
    b1, b2 = r.sample(BUILDINGS, 2)
    return dict(clinic=r.choice(CLINICS), hosp=r.choice(HOSPITALS), date=date_str(r), weekday=r.choice(WEEKDAY[:5]),
                building=b1, newbuilding=b2, reason=r.choice(REASONS), weeks=str(r.randint(3, 14)),
                car_park=r.choice(CARPARKS), entrance=r.choice(ENTRANCES), manager=person(r),
                phone=f"01632 {r.randint(400000, 499999)}", t1=time_str(r, 8, 10), t2=time_str(r, 15, 17))


def notice_facts_c(r):
    f = notice_facts(r)
    f["Clinic"] = cap(f["clinic"])
    return f


ASH_NOTICE = Family(
    "ashgrove", "notice", "news/notices", notice_facts_c,
    ["{Clinic} at {hosp}: change from {date}", "Temporary move for the {clinic} at {hosp}",
     "{Clinic} relocating on {date}"],
    [Section(None, [
        ["From {weekday} {date} the {clinic} at {hosp} will run from {newbuilding} instead of {building}.",
         "The {clinic} at {hosp} moves from {building} to {newbuilding} on {weekday} {date}."],
        ["The change is needed because of {reason}, which is expected to last about {weeks} weeks.",
         "We are making this move to allow {reason}; the work should take around {weeks} weeks."],
        ["Appointment times are not affected, so please arrive at your usual time and follow the signs for {newbuilding}.",
         "Your appointment time stays the same, but please allow an extra ten minutes to find {newbuilding}."],
        Opt(["Patients using the {car_park} should use the {entrance} entrance, which is closest to the new room.",
             "The nearest entrance to the temporary room is the {entrance} entrance beside the {car_park}."]),
        PARA,
        ["If you have questions, call the clinic coordinator, {manager}, on {phone} between {t1} and {t2} on weekdays.",
         "Questions can go to {manager}, clinic coordinator, on {phone}, weekdays from {t1} to {t2}."],
        Opt(["Some letters already sent still show {building}; staff at the main reception will point you to {newbuilding}.",
             "Letters posted before the move may name {building}, and there is no need to ring us to confirm the new room."]),
    ])],
    extra=["Wheelchairs can be borrowed from the {entrance} entrance.",
           "The hospital shop near the {entrance} entrance stays open during the work."],
    size=(60, 115))

DEPTS = ["cardiac rehabilitation", "community stroke rehabilitation", "memory assessment", "chronic pain management",
         "lymphoedema", "speech and language therapy", "adult hearing", "falls prevention", "continence advice",
         "respiratory physiotherapy", "heart failure nursing", "bone health"]
ROOMS = ["Clinic Room 4", "the Rowan Suite", "the therapy hall", "Room 12B", "the day assessment lounge",
         "the Heron Room", "consulting suite 2"]
LEVELS = ["the ground floor", "level 1", "level 2", "level 3", "the lower ground floor"]


def service_facts(r):
    name = person(r)
    return dict(dept=r.choice(DEPTS), hosp=r.choice(HOSPITALS), lead=name, lead_last=name.split()[1],
                nurse=person(r), n_staff=str(r.randint(6, 31)), wait=str(r.randint(3, 18)),
                mins=str(r.choice([30, 45, 60, 75, 90])), room=r.choice(ROOMS), level=r.choice(LEVELS),
                notice_days=str(r.randint(2, 7)), freq=r.choice(["week", "fortnight", "three weeks", "month"]),
                sess_lo=str(r.randint(2, 4)), sess_hi=str(r.randint(6, 12)), town=r.choice(TOWN),
                entrance=r.choice(ENTRANCES), bus=str(r.randint(3, 96)), bus_mins=str(r.choice([10, 12, 15, 20, 30])),
                car_park=r.choice(CARPARKS), free_mins=str(r.choice([20, 30, 45, 60])),
                phone=f"01632 {r.randint(500000, 599999)}", t1=time_str(r, 8, 9), t2=time_str(r, 16, 17),
                email=r.choice(["referrals", "rehab.team", "clinic.admin", "service.desk", "outpatients"]),
                cancel_hours=str(r.choice([24, 48, 72])))


def service_items(r, f):
    pool = ["a list of the medicines you take, including creams and inhalers",
            "your appointment letter or the text message we sent you",
            "glasses, hearing aids or walking aids if you use them",
            "a note of any questions you would like to ask {lead}",
            "comfortable clothes and flat shoes for the movement assessment",
            "details of your GP practice in {town} or elsewhere",
            "a drink and a snack, because some visits run past {mins} minutes",
            "any diary you have kept of symptoms since your referral"]
    k = r.randint(4, len(pool))
    return [p.format(**f) for p in r.sample(pool, k)]


def service_table(r, f):
    rows = [["Day", "Time", "Location", "Session"]]
    days = sorted(r.sample(range(5), r.randint(3, 5)))
    for d in days:
        rows.append([WEEKDAY[d], f"{time_str(r, 8, 11)} to {time_str(r, 12, 18)}",
                     r.choice([f["hosp"], f"{f['town']} health centre", f["room"]]),
                     r.choice(["New patients", "Follow-up", "Group session", "Nurse-led review", "Evening clinic"])])
    return rows


ASH_SERVICE = Family(
    "ashgrove", "service", "services", service_facts,
    ["{dept} service", "{dept} at {hosp}", "Our {dept} team"],
    [Section(None, [
        ["Our {dept} team at {hosp} works with people referred by their family doctor, a community nurse or a hospital consultant.",
         "The {dept} service is based at {hosp} and accepts referrals from family doctors, community nurses and hospital consultants."],
        ["The team is led by {lead} and includes {n_staff} clinicians, therapists and administrative staff.",
         "{lead} leads a team of {n_staff} clinicians, therapists and administrators."],
        Opt(["Most people are seen within {wait} weeks of the referral reaching us.",
             "The current waiting time from referral to first appointment is about {wait} weeks."]),
    ]),
     Section(["Your first appointment", "What to expect at your first visit"], [
         ["Your first appointment lasts about {mins} minutes and takes place in {room}.",
          "Plan for a first visit of around {mins} minutes in {room}."],
         ["A member of the team will ask about your symptoms, your medicines and how your routine has changed since the referral from {town}.",
          "We will talk through your symptoms, the medicines you take and what has become harder in everyday life, with notes sent back to {town}."],
         Opt(["You are welcome to bring a relative or friend, and we can arrange an interpreter if you ask at least {notice_days} days ahead.",
              "Bring someone with you if that helps; interpreters can be booked with {notice_days} days of notice."]),
         PARA,
         ["After the assessment, {nurse} or another specialist nurse will agree a care plan with you and send a copy to your GP.",
          "Following the assessment, a care plan is written with you by {nurse} or a colleague and shared with your GP."],
         Opt(["Follow-up sessions are held every {freq} and most people attend between {sess_lo} and {sess_hi} sessions.",
              "Expect follow-up sessions every {freq}, usually {sess_lo} to {sess_hi} in total."]),
     ]),
     Section(["Clinic times", "When clinics run"], [
         ["Clinics run at {hosp} and at outreach rooms in {town}; evening slots are kept for people who work.",
          "Sessions take place at {hosp} and in outreach rooms at {town}, with late slots for working patients."],
     ], table=service_table),
     Section(["What to bring", "Before you come"], [
         Opt(["It helps us if you bring the following to {room}.",
              "Please bring these with you on the day, even if you have been to {hosp} before."]),
     ], items=service_items, opt=True, min_items=3),
     Section(["Getting here", "Finding us"], [
         ["{room} is on {level}, a short walk from the {entrance} entrance.",
          "You will find {room} on {level}; use the {entrance} entrance."],
         Opt(["The number {bus} bus stops outside the hospital every {bus_mins} minutes during the day.",
              "Bus route {bus} stops at the hospital gates roughly every {bus_mins} minutes."]),
         Opt(["Blue badge bays are in the {car_park}, and the first {free_mins} minutes of parking are free for patients.",
              "Patients get {free_mins} minutes of free parking in the {car_park}, where blue badge bays are also marked."]),
     ], opt=True),
     Section(["Contact the team", "Contact us"], [
         ["Call the {dept} office on {phone}, {t1} to {t2}, Monday to Friday.",
          "The office line, {phone}, is staffed from {t1} to {t2} on weekdays."],
         Opt(["You can also write to {email}@ashgrove-health.example.org, but please do not send urgent questions by email.",
              "Non-urgent questions can be sent to {email}@ashgrove-health.example.org and are answered within two working days."]),
         Opt(["If you cannot attend, tell us at least {cancel_hours} hours before so that another patient can take the slot.",
              "Please give {cancel_hours} hours of notice if you cannot come, so we can offer the time to someone else."]),
     ])],
    extra=["A hearing loop is fitted at the {dept} reception desk in {room}.",
           "Refreshments are sold at the volunteer cafe near the {entrance} entrance.",
           "Parking charges at {hosp} are reviewed every April."],
    size=(120, 470))


def _dept_title(f):
    f["dept"] = f["dept"]
    return f


# Titles need a capitalised department; wrap the fact function.
def service_facts_c(r):
    f = service_facts(r)
    f["Dept"] = cap(f["dept"])
    return f


ASH_SERVICE.facts = service_facts_c
ASH_SERVICE.titles = ["{Dept} service", "{Dept} at {hosp}", "Our {dept} team at {hosp}"]


# ====================================================================== fenwick (library consortium)
BRANCHES = ["Brindlecombe Library", "Elvenstead Reading Rooms", "Gorsethwaite Library", "Marrowby Community Library",
            "Pellowick Library and Archive", "Quarnby Wells Library", "Tollbridge Library", "Wickhollow Library"]
EVENTS = [("family history drop-in", "tracing relatives through parish registers and census returns"),
          ("code club for young people", "building small games and animations"),
          ("knit and natter group", "knitting, crochet and mending"),
          ("poetry reading evening", "new poems written by local authors"),
          ("digital help session", "setting up email, video calls and online forms"),
          ("local history talk", "the mills and quarries that once employed half the district"),
          ("rhyme time for babies", "songs, rhymes and board books for children under two"),
          ("repair cafe", "fixing lamps, toasters, clothes and bicycles"),
          ("book club", "a monthly novel chosen by the members"),
          ("seed swap", "saving and sharing vegetable and flower seeds")]


def event_facts(r):
    ev, about = r.choice(EVENTS)
    return dict(event=ev, Event=cap(ev), about=about, branch=r.choice(BRANCHES), date=date_str(r),
                weekday=r.choice(WEEKDAY), t1=time_str(r, 9, 17), host=person(r), places=str(r.randint(8, 40)),
                room=r.choice(["the reading room", "the upstairs meeting room", "the children's corner",
                               "the local studies room", "the garden room", "the computer suite"]),
                mins=str(r.choice([45, 60, 90, 120])), age=str(r.choice([8, 11, 14, 16, 18])),
                phone=f"01632 {r.randint(600000, 649999)}", cost=r.choice(["free", "two pounds", "three pounds"]))


FEN_EVENT = Family(
    "fenwick", "event", "whats-on", event_facts,
    ["{Event} at {branch}", "{Event}: {weekday} {date}", "{branch} hosts a {event}"],
    [Section(None, [
        ["Join us on {weekday} {date} at {t1} for a {event} in {room} at {branch}.",
         "{branch} is holding a {event} in {room} on {weekday} {date}, starting at {t1}."],
        ["The session is about {about} and runs for {mins} minutes.",
         "Expect {mins} minutes of {about}."],
        ["It is led by {host}, who has run similar sessions across the consortium.",
         "Our guest host is {host}, a regular volunteer at several consortium libraries."],
        PARA,
        Opt(["There are {places} places and booking is recommended, either at the counter or by phone on {phone}.",
             "Places are limited to {places}; book at the counter or call {phone}."]),
        Opt(["Entry is {cost}, and tea is served afterwards.",
             "The session costs {cost}, with tea and biscuits at the end."]),
        Opt(["Young people under {age} should come with an adult.",
             "Anyone under {age} needs to be accompanied by an adult."]),
    ])],
    extra=["The lift to {room} is available throughout the session.",
           "Bring your library card if you want to borrow books on the day."],
    size=(60, 140))

COLLECTIONS = ["large print crime novels", "graphic novels for teenagers", "Polish language fiction",
               "local walking guides", "board games", "dyslexia-friendly readers", "audiobooks on card players",
               "sewing machines and craft kits", "telescopes for loan", "seed library packets"]


def branch_facts(r):
    b1, b2 = r.sample(BRANCHES, 2)
    d1, d2 = date_pair(r, min_gap=30, max_gap=140)
    return dict(branch=b1, manager=person(r), date=d1, date2=d2,
                weeks=str(r.randint(2, 16)), weekday=r.choice(WEEKDAY[:6]),
                work=r.choice(["a new roof", "new heating and lighting", "a rebuilt entrance ramp",
                               "new shelving and a larger children's area", "a refit of the ground floor",
                               "replacement windows and insulation"]),
                cost=money(r, 40000, 390000, 1000), fund=r.choice(["the county levelling fund", "a heritage grant",
                                                                   "the consortium building reserve",
                                                                   "a community lottery award"]),
                alt_branch=b2, bus=str(r.randint(2, 88)), pcs=str(r.randint(4, 24)),
                visits=money(r, 12000, 96000, 100), loans=money(r, 20000, 140000, 100),
                collection=r.choice(COLLECTIONS), town=r.choice(TOWN), volunteers=str(r.randint(5, 40)),
                phone=f"01632 {r.randint(650000, 699999)}")


def branch_items(r, f):
    pool = ["returns can be made at {alt_branch} or any other consortium library",
            "reservations will be sent to {alt_branch} until the work is finished",
            "the mobile library will stop outside the building every {weekday} morning",
            "public computers are available at {alt_branch}, which has {pcs} machines",
            "home delivery continues as normal for registered readers in {town}",
            "fines will not be charged on items due back while the branch is shut",
            "the {collection} will move temporarily to {alt_branch}",
            "the book drop by the front door will stay locked"]
    k = r.randint(3, 6)
    return [cap(p.format(**f)) for p in r.sample(pool, k)]


def branch_table(r, f):
    rows = [["Year", "Visits", "Loans", "Computer sessions"]]
    v, l, c = r.randint(12000, 60000), r.randint(20000, 90000), r.randint(1500, 6000)
    for y in (2023, 2024, 2025):
        rows.append([str(y), f"{v:,}", f"{l:,}", f"{c:,}"])
        v, l, c = v + r.randint(300, 6000), l + r.randint(500, 9000), c + r.randint(50, 900)
    return rows


FEN_BRANCH = Family(
    "fenwick", "branch-news", "news", branch_facts,
    ["{branch} to close for improvement works", "Improvements coming to {branch}", "{branch}: closure from {date}"],
    [Section(None, [
        ["{branch} will close on {date} so that {work} can be fitted.",
         "From {date}, {branch} is closed while {work} is installed."],
        ["The work costs {cost} pounds and is paid for by {fund}.",
         "Funding of {cost} pounds has come from {fund}."],
        ["We expect to reopen after about {weeks} weeks, and we will confirm the date once the builders have finished.",
         "The closure should last around {weeks} weeks; a reopening date will follow when the contractor hands the building back."],
    ]),
     Section(["While the library is closed", "During the closure"], [
         ["Branch manager {manager} said the team will keep services going from {alt_branch} during the work.",
          "According to branch manager {manager}, staff will work from {alt_branch} until the building reopens."],
         Opt(["Bus {bus} runs between the two libraries every half hour.",
              "The two buildings are linked by the number {bus} bus, every thirty minutes."]),
     ], items=branch_items, min_items=3),
     Section(["Why the work is needed", "Why now"], [
         ["The building last had major work more than thirty years ago, and the heating failed twice last winter.",
          "Readers in {town} have told us that the building is cold, dark and hard to reach with a pushchair."],
         Opt(["{volunteers} volunteers who help at the branch were asked what they wanted from the refit.",
              "We asked {volunteers} regular volunteers and several reading groups what should change."]),
         Opt(["Their top requests were more seating, better lighting and a quiet room for study.",
              "Seating, lighting and a quiet study room came top of their list."]),
     ], opt=True),
     Section(["How the branch is used", "Recent figures"], [
         ["The figures below show how busy {branch} has been in recent years.",
          "Use of {branch} has grown steadily, as the table shows."],
     ], table=branch_table, opt=True),
     Section(["What the new building will offer", "After the work"], [
         ["When {branch} reopens there will be {pcs} public computers, a bookable study room and a larger space for {collection}.",
          "The reopened {branch} will have {pcs} public computers, a study room that can be booked and more room for {collection}."],
         ["The entrance will be level with the pavement on {weekday} market days as well as the rest of the week, ending years of complaints from readers with pushchairs.",
          "A level entrance replaces the old steps, something readers with pushchairs and wheelchairs in {town} have asked about for years."],
         Opt(["Opening hours will be reviewed after six months, once we know how the new spaces are being used.",
              "We will look again at the opening hours after six months, when we can see how the rooms are used."]),
         Opt(["Local groups who met at the branch before the closure will be offered their old slots first.",
              "Groups that met at {branch} before the work will get first choice of the meeting room."]),
     ], opt=True),
     Section(["Questions", "Keeping in touch"], [
         ["Questions about the closure can be directed to {manager} on {phone}.",
          "Please ring {phone} if you have questions, and ask for {manager}."],
         Opt(["We will post progress photographs on the branch noticeboard at {alt_branch} every {weekday}.",
              "Progress updates will be pinned on the noticeboard at {alt_branch} each {weekday}."]),
         Opt(["A reopening celebration is planned for {date2}, subject to the builders finishing on time.",
              "If the work keeps to schedule we will hold a reopening party on {date2}."]),
     ])],
    extra=["The branch's {collection} will come back with new display shelving.",
           "Toilets at {alt_branch} have been upgraded ahead of the extra visitors."],
    size=(150, 470))


# ====================================================================== tallowby (software changelog)
COMPONENTS = ["sync engine", "conflict resolver", "desktop client", "command-line tool", "web dashboard",
              "mobile uploader", "share links", "folder watcher", "backup scheduler", "admin console"]
PLATFORMS = ["Linux", "the desktop builds", "ARM boards", "older laptops", "network drives", "shared folders"]


def release_facts(r):
    major, minor = r.randint(3, 7), r.randint(0, 19)
    comps = r.sample(COMPONENTS, 6)
    return dict(ver=f"{major}.{minor}.{r.randint(0, 9)}", prev=f"{major}.{max(0, minor - 1)}.{r.randint(0, 9)}",
                date=date_str(r), c1=comps[0], c2=comps[1], c3=comps[2], c4=comps[3], c5=comps[4], c6=comps[5],
                pct=str(r.randint(12, 64)), mb=str(r.randint(40, 900)), files=money(r, 5000, 200000, 500),
                plat=r.choice(PLATFORMS), maint=person(r), issue=str(r.randint(1200, 9800)),
                issue2=str(r.randint(1200, 9800)), secs=str(r.randint(3, 90)), days=str(r.randint(7, 60)),
                limit=str(r.choice([2, 4, 8, 16, 32])), timeout=str(r.choice([15, 30, 45, 60, 120])))


def release_items_new(r, f):
    pool = ["The {c1} can now pause uploads when the machine is on battery power",
            "Share links accept an expiry date of up to {days} days",
            "The {c2} shows a progress bar for folders larger than {mb} MB",
            "A new --dry-run option for the {c3} lists what would change without touching files",
            "The {c4} remembers the last {limit} accounts used on the device",
            "Selective sync can exclude folders by pattern as well as by name",
            "The {c5} can export its activity log as CSV",
            "Administrators can set a default retention period of {days} days for deleted files"]
    return [p.format(**f) for p in r.sample(pool, r.randint(3, 6))]


def release_items_fix(r, f):
    pool = ["Fixed a crash in the {c2} when a file name contained a trailing space (issue {issue})",
            "The {c3} no longer uploads the same file twice after waking from sleep",
            "Fixed timestamps shown one hour out in the {c5} after the clocks changed",
            "Large folders on {plat} no longer stall at 99 percent (issue {issue2})",
            "The {c1} now retries after a network timeout of {timeout} seconds instead of giving up",
            "Renaming a folder while it was syncing could leave an empty copy behind; this is fixed",
            "Corrected the file count shown in the {c4} when more than {files} files were queued"]
    return [p.format(**f) for p in r.sample(pool, r.randint(3, 6))]


TAL_RELEASE = Family(
    "tallowby", "release", "releases", release_facts,
    ["Tallowby Sync {ver} release notes", "What's new in Tallowby Sync {ver}", "Release {ver}"],
    [Section(None, [
        ["Tallowby Sync {ver} was released on {date} and replaces {prev} for all users.",
         "Version {ver} of Tallowby Sync is out as of {date}, superseding {prev}."],
        ["This release focuses on the {c1} and the {c2}, with smaller fixes elsewhere.",
         "Most of the work in this release went into the {c1} and the {c2}."],
        Opt(["Initial scans of large libraries are about {pct} percent faster than in {prev}.",
             "In our tests a first scan of {files} files finished {pct} percent sooner than before."]),
    ]),
     Section(["New features", "Added"], [], items=release_items_new, min_items=2),
     Section(["Fixes", "Fixed"], [], items=release_items_fix, min_items=2),
     Section(["Changes in behaviour", "Behaviour changes"], [
         ["The {c3} now waits {secs} seconds after the last change before it starts an upload.",
          "Uploads from the {c3} start {secs} seconds after the final change to a file, not immediately."],
         Opt(["The limit on parallel transfers has been raised to {limit} per account.",
              "Each account may now run up to {limit} transfers at once."]),
         Opt(["Settings files written by {ver} cannot be read by versions older than {prev}.",
              "Older releases, before {prev}, will not read settings saved by {ver}."]),
     ], opt=True),
     Section(["Known issues", "Known problems"], [
         ["On {plat}, the {c4} may show an empty window for a few seconds after start-up; it recovers on its own.",
          "Some users on {plat} see a blank {c4} window briefly at start-up, which clears without action."],
         Opt(["Very long paths, beyond about {limit} folder levels deep, are still skipped by the {c5} and reported in the log.",
              "The {c5} still skips paths nested more than about {limit} folders deep, and records each one in the log."]),
         Opt(["A fix for issue {issue2} did not make this release and is planned for the next one.",
              "Issue {issue2} remains open and should be resolved in the following release."]),
     ], opt=True),
     Section(["Upgrading", "How to upgrade"], [
         ["Desktop clients update themselves within {days} days; administrators can push the update sooner from the {c6}.",
          "Automatic updates reach desktop clients over {days} days, or sooner if pushed from the {c6}."],
         Opt(["Thanks to {maint} for coordinating this release and to everyone who reported issues.",
              "{maint} coordinated this release; thank you to all who filed reports."]),
     ], opt=True)],
    extra=["Checksums for every download are listed on the downloads page.",
           "The next release is planned for about {days} days from now."],
    size=(80, 420))


def advisory_facts(r):
    major, minor, patch = r.randint(3, 7), r.randint(0, 19), r.randint(0, 8)
    return dict(ver=f"{major}.{minor}.{patch}", fixed=f"{major}.{minor}.{patch + 1}",
                comp=r.choice(COMPONENTS), date=date_str(r), ident=f"TSA-2026-{r.randint(10, 99)}",
                reporter=person(r), sev=r.choice(["low", "moderate", "high"]),
                flaw=r.choice(["a share link could be reused after it had been revoked",
                               "temporary files were readable by other local users",
                               "a crafted file name could write outside the sync folder",
                               "session tokens were written to the debug log",
                               "the password reset page did not limit repeated attempts"]),
                days=str(r.randint(2, 30)))


TAL_ADVISORY = Family(
    "tallowby", "advisory", "security", advisory_facts,
    ["Security advisory {ident}", "{ident}: issue in the {comp}"],
    [Section(None, [
        ["Advisory {ident} describes a {sev} severity issue in the {comp} of Tallowby Sync {ver} and earlier.",
         "A {sev} severity flaw affects the {comp} in Tallowby Sync {ver} and older releases ({ident})."],
        ["In affected versions, {flaw}.",
         "The problem is that {flaw}."],
        ["Version {fixed} corrects the issue and was published on {date}.",
         "The fix ships in {fixed}, available since {date}."],
        PARA,
        Opt(["We thank {reporter} for reporting the issue privately and giving us {days} days to prepare a fix.",
             "{reporter} reported this to us privately; we had {days} days to prepare the fix."]),
        Opt(["We have no evidence that the flaw has been used against any customer.",
             "There is no sign that the issue was exploited before the fix."]),
    ])],
    extra=["Customers on long-term support builds receive the same fix."],
    size=(60, 130))


# ====================================================================== copperpot (recipes)
DISHES = [("leek and barley broth", "soup"), ("smoked haddock pie", "main"), ("rhubarb crumble cake", "bake"),
          ("spiced red lentil dal", "main"), ("sourdough oat crackers", "bake"), ("roast squash and sage risotto", "main"),
          ("brown butter pear tart", "bake"), ("chickpea and spinach stew", "main"), ("sticky ginger parkin", "bake"),
          ("mushroom and chestnut pasties", "bake"), ("crab and sweetcorn chowder", "soup"),
          ("blackcurrant fool", "pudding"), ("cauliflower cheese bake", "main"), ("plum and almond traybake", "bake")]
VEG = ["leeks", "carrots", "celery sticks", "onions", "garlic cloves", "parsnips", "shallots", "red peppers"]


def recipe_facts(r):
    dish, kind = r.choice(DISHES)
    veg = r.sample(VEG, 3)
    return dict(dish=dish, Dish=cap(dish), kind=kind, cook=person(r), serves=str(r.randint(2, 8)),
                prep=str(r.choice([10, 15, 20, 25, 30])), cook_mins=str(r.choice([20, 25, 35, 40, 50, 70, 90])),
                temp=str(r.choice([160, 170, 180, 190, 200, 220])), g1=str(r.choice([50, 75, 100, 125, 150, 200, 250])),
                g2=str(r.choice([200, 250, 300, 350, 400, 500])), ml=str(r.choice([150, 200, 300, 500, 750, 1000])),
                v1=veg[0], v2=veg[1], v3=veg[2], tin=str(r.choice([18, 20, 23, 25])), days=str(r.randint(2, 5)),
                town=r.choice(TOWN), season=r.choice(["late autumn", "early spring", "midwinter", "high summer"]),
                swap=r.choice(["oat milk", "vegetable stock", "spelt flour", "olive oil", "maple syrup", "brown rice"]))


def recipe_ingredients(r, f):
    pool = ["{g2}g plain flour", "{g1}g unsalted butter, cubed", "2 medium eggs", "{ml}ml whole milk",
            "3 {v1}, finely sliced", "2 {v2}, chopped", "1 tbsp olive oil", "a pinch of sea salt",
            "{g1}g soft brown sugar", "1 tsp ground ginger", "{ml}ml hot stock", "a small bunch of parsley",
            "{g2}g pearl barley, rinsed", "1 lemon, zested and juiced", "4 {v3}, diced"]
    return [p.format(**f) for p in r.sample(pool, r.randint(5, 10))]


def recipe_method(r, f):
    steps = ["Heat the oven to {temp}C and line a {tin}cm tin with baking paper",
             "Warm the oil in a wide pan and soften the {v1} for about eight minutes",
             "Stir in the {v2} and cook until the edges begin to colour",
             "Add the liquid a ladle at a time, stirring between each addition",
             "Rub the butter into the flour until it looks like coarse breadcrumbs",
             "Spoon the mixture into the tin and level the top with a palette knife",
             "Bake for {cook_mins} minutes, until golden and firm in the middle",
             "Rest for ten minutes before serving with the chopped parsley",
             "Season to taste and finish with the lemon juice just before serving"]
    k = r.randint(4, 7)
    idx = sorted(r.sample(range(len(steps)), k))
    return [steps[i].format(**f) for i in idx]


COP_RECIPE = Family(
    "copperpot", "recipe", "recipes", recipe_facts,
    ["{Dish}", "{Dish} for {serves}", "{cook}'s {dish}"],
    [Section(None, [
        ["This recipe for {dish} serves {serves} and takes about {prep} minutes to prepare and {cook_mins} minutes to cook.",
         "Allow {prep} minutes of preparation and {cook_mins} minutes in the oven or on the hob; the recipe feeds {serves}."],
        ["{cook} first made it for a village supper in {town} and it has been a favourite in {season} ever since.",
         "The recipe comes from {cook}, who cooked it for a harvest supper in {town} one {season}."],
        Opt(["It keeps for {days} days in the fridge and reheats well.",
             "Leftovers keep for up to {days} days, covered, in the fridge."]),
    ]),
     Section(["Ingredients", "You will need"], [], items=recipe_ingredients, min_items=4),
     Section(["Method", "How to make it"], [], items=recipe_method, min_items=3),
     Section(["Serving suggestions", "To serve"], [
         ["Serve the {dish} warm with a green salad dressed with lemon, or with buttered greens in colder weather.",
          "We like the {dish} with a sharp lemon-dressed salad in summer and buttered greens in {season}."],
         Opt(["For a crowd, double everything and use two tins rather than one deep one.",
              "Cooking for more than {serves}? Double the quantities and split the mixture between two tins."]),
         Opt(["Any leftover {v2} can go into a quick soup the next day.",
              "Spare {v2} will not go to waste: stir them into a soup the following day."]),
     ], opt=True),
     Section(["Tips and swaps", "Cook's notes"], [
         ["If you do not have {swap}, use what you have; this recipe for {dish} is forgiving.",
          "You can replace the {swap} with something similar without spoiling the {dish}."],
         Opt(["For a deeper flavour, cook the {v1} more slowly and for longer.",
              "Slower cooking of the {v1} gives a sweeter, deeper result."]),
         Opt(["A {tin}cm tin gives a thicker result; a wider one will need five minutes less.",
              "In a tin wider than {tin}cm, take five minutes off the cooking time."]),
     ], opt=True)],
    extra=["Readers in {town} tell us it also freezes well.",
           "A spoonful of plain yoghurt on top works well with the {dish}."],
    size=(100, 400))

TECHNIQUES = [("blind baking a pastry case", "pastry"), ("making a roux", "sauce"), ("proving dough in a cold kitchen", "bread"),
              ("toasting whole spices", "spice"), ("poaching eggs for a crowd", "eggs"), ("rescuing a split custard", "custard"),
              ("sharpening a kitchen knife", "knives"), ("keeping herbs fresh", "herbs")]


def technique_facts(r):
    t, topic = r.choice(TECHNIQUES)
    return dict(tech=t, Tech=cap(t), topic=topic, cook=person(r), mins=str(r.randint(3, 25)),
                temp=str(r.choice([60, 75, 90, 180, 190, 200])), town=r.choice(TOWN),
                mistake=r.choice(["rushing the first stage", "using a pan that is too thin", "adding everything at once",
                                  "skipping the resting time", "working straight from the fridge"]),
                tool=r.choice(["a heavy saucepan", "a balloon whisk", "a digital thermometer", "baking beans",
                               "a wooden spoon", "a shallow tray"]))


COP_TECH = Family(
    "copperpot", "technique", "techniques", technique_facts,
    ["{Tech}: getting it right", "{Tech}, step by step", "A guide to {tech}"],
    [Section(None, [
        ["{Tech} takes about {mins} minutes once you have done it a few times.",
         "Give yourself {mins} minutes for {tech} until it becomes routine."],
        ["The most common mistake is {mistake}, which {cook} sees every week at the cookery school in {town}.",
         "{cook}, who teaches at a cookery school in {town}, says most problems come from {mistake}."],
        ["All you really need is {tool} and a little patience.",
         "The only special equipment is {tool}."],
        PARA,
        Opt(["If a recipe gives a temperature, check it: {temp} degrees is the figure to aim for.",
             "Aim for {temp} degrees where a temperature matters."]),
        Opt(["Practise once on a quiet afternoon before you try it for guests.",
             "Try it on an ordinary weekday before cooking for visitors."]),
    ])],
    extra=["Our {topic} recipes all link back to this guide."],
    size=(60, 140))


# ====================================================================== marram (netball league)
TEAMS = ["Kelderby Kestrels", "Saltreach Swifts", "Dunmerrow Dynamos", "Pellowick Phoenix", "Gorsethwaite Gales",
         "Marrowby Mariners", "Elvenstead Eagles", "Tollbridge Tigers", "Brackwater Blaze", "Emberley Otters"]
VENUES = ["Marram Valley Sports Hall", "Kelderby Leisure Centre", "Saltreach Academy courts", "Netherwold Arena",
          "Oxcombe Vale outdoor courts"]


def match_facts(r):
    home, away = r.sample(TEAMS, 2)
    hs, as_ = r.randint(28, 64), r.randint(22, 60)
    if hs == as_:
        hs += 1
    win, lose = (home, away) if hs > as_ else (away, home)

    def split(total):
        parts = [total // 4 + (1 if i < total % 4 else 0) for i in range(4)]
        parts = [p + d for p, d in zip(parts, r.choice([(0, 0, 0, 0), (2, -1, 0, -1), (1, 0, -1, 0), (-1, 1, 1, -1)]))]
        return parts
    hq, aq = split(hs), split(as_)
    wq, lq = (hq, aq) if hs > as_ else (aq, hq)
    wq.sort(reverse=True)
    lq.sort()
    if wq[0] <= lq[0]:
        wq[0], wq[3] = lq[0] + 1, wq[3] - (lq[0] + 1 - wq[0])
    return dict(home=home, away=away, hs=str(hs), as_=str(as_), win=win, lose=lose, venue=r.choice(VENUES),
                hq=",".join(map(str, hq)), aq=",".join(map(str, aq)),
                date=date_str(r, months=MONTHS_SEASON), div=r.choice(["Premier Division", "First Division", "Second Division"]),
                pom=person(r), gs=person(r), gk=person(r), coach=person(r), q1=str(wq[0]),
                q2=str(lq[0]), shots=str(r.randint(70, 96)), pos=str(r.randint(1, 9)),
                pts=str(r.randint(4, 40)), crowd=str(r.randint(60, 450)), nextteam=r.choice(TEAMS),
                round=str(r.randint(2, 18)))


MONTHS_SEASON = ["January", "February", "March", "April", "September", "October", "November"]


def match_table(r, f):
    rows = [["Quarter", f["home"], f["away"]]]
    hsplit = f["hq"].split(",")
    asplit = f["aq"].split(",")
    for i in range(4):
        rows.append([f"Q{i + 1}", str(hsplit[i]), str(asplit[i])])
    return rows


MAR_MATCH = Family(
    "marram", "match-report", "reports", match_facts,
    ["{home} {hs}-{as_} {away}", "{win} beat {lose} in round {round}", "Round {round} report: {home} v {away}"],
    [Section(None, [
        ["{home} and {away} met at {venue} on {date} in round {round} of the {div}.",
         "Round {round} of the {div} brought {away} to {venue} to face {home} on {date}."],
        ["The final score was {hs} to {as_}, watched by a crowd of about {crowd}.",
         "About {crowd} spectators saw the match finish {hs} to {as_}."],
    ]),
     Section(["How the match unfolded", "The match"], [
         ["{win} took control early and led by {q1} goals to {q2} at the end of the first quarter.",
          "A fast start gave {win} a first-quarter lead of {q1} to {q2}."],
         ["{lose} closed the gap in the second quarter with patient play through the centre third.",
          "In the second quarter {lose} fought back, moving the ball patiently through court."],
         Opt(["Goal shooter {gs} finished with a shooting accuracy of {shots} percent.",
              "{gs}, at goal shooter, converted {shots} percent of attempts on goal."]),
         PARA,
         ["Goalkeeper {gk} made a string of interceptions in the final quarter that kept {win} ahead.",
          "In the last quarter, {gk} at goalkeeper intercepted again and again to protect the lead for {win}."],
         Opt(["Player of the match went to {pom}, who was everywhere in midcourt.",
              "{pom} was named player of the match for a tireless game in midcourt."]),
     ]),
     Section(["Score by quarter", "Quarter scores"], [], table=match_table, opt=True),
     Section(["From the sidelines", "Reaction"], [
         ["{coach} said afterwards that the first quarter had decided the game and praised the calm of the young defenders.",
          "Speaking after the final whistle, {coach} singled out the first quarter and the composure of her young defence."],
         Opt(["The {lose} captain admitted that too many passes had gone astray under pressure in the circle.",
              "For {lose}, the captain felt that loose passing into the circle had cost them dearly."]),
         Opt(["Several juniors from the {home} under-sixteen squad watched from the balcony and helped with the scoreboard.",
              "Members of the {home} under-sixteen squad ran the scoreboard and cheered from the balcony."]),
     ], opt=True),
     Section(["What it means", "Table and next fixture"], [
         ["The result leaves {win} in position {pos} of the {div} with {pts} points.",
          "{win} now sit in position {pos} in the {div}, on {pts} points."],
         Opt(["Coach {coach} said the team had worked hard on defensive footwork since the last round.",
              "{coach}, the winning coach, credited weeks of training on defensive footwork."]),
         Opt(["Next up for {win} is a trip to play {nextteam}.",
              "{win} play {nextteam} away in the next round."]),
     ], opt=True)],
    extra=["The match was umpired by two newly qualified officials from the league's own course.",
           "Tea and cakes were served by the {home} junior section."],
    size=(100, 400))


def fixture_facts(r):
    a, b = r.sample(TEAMS, 2)
    d1, d2 = date_pair(r, min_gap=7, max_gap=40)
    return dict(home=a, away=b, venue=r.choice(VENUES), venue2=r.choice(VENUES), date=d1,
                date2=d2, t1=time_str(r, 10, 19),
                reason=r.choice(["a burst pipe in the sports hall", "a court resurfacing delay", "a clash with county trials",
                                 "an icy car park", "a power cut at the venue", "a booking error by the venue"]),
                sec=person(r), div=r.choice(["Premier Division", "First Division", "Second Division"]))


MAR_FIXTURE = Family(
    "marram", "fixture-notice", "fixtures", fixture_facts,
    ["Fixture change: {home} v {away}", "{home} v {away} moved to {date2}", "Rearranged {div} fixture"],
    [Section(None, [
        ["The {div} match between {home} and {away}, due on {date} at {venue}, has been postponed because of {reason}.",
         "Because of {reason}, the {div} game on {date} between {home} and {away} at {venue} will not go ahead."],
        ["It will now be played on {date2} at {venue2}, with the first centre pass at {t1}.",
         "The rearranged match takes place at {venue2} on {date2}, first centre pass {t1}."],
        Opt(["Both clubs have agreed the new date and umpires have been reappointed.",
             "The new date has been accepted by both clubs, and the umpire appointments stand."]),
        Opt(["Questions should go to the league fixtures secretary, {sec}.",
             "Please contact {sec}, fixtures secretary, with any questions."]),
    ])],
    extra=["Spectators are asked to use the overflow car park at {venue2}."],
    size=(60, 110))


FAMILIES_A = [ASH_NOTICE, ASH_SERVICE, FEN_EVENT, FEN_BRANCH, TAL_RELEASE, TAL_ADVISORY, COP_RECIPE, COP_TECH,
              MAR_MATCH, MAR_FIXTURE]
