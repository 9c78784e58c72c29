"""Site definitions: families, sections and hand-written template text for each invented site."""
import content_a as A
import content_b as B

SITES = []


def site(**kw):
    kw.setdefault("heavy", True)
    kw.setdefault("comments", [])
    kw.setdefault("data_table", None)
    kw.setdefault("footer_old", None)
    SITES.append(kw)


site(key="westmere-archives", name="Westmere County Archives", host="archives.westmere.example.org",
     tagline="Records of the county from the twelfth century to yesterday",
     sections={"collections": ("Collections", ["Online catalogue", "New accessions", "Parish registers", "Maps and plans",
                                               "Estate and family papers", "Photographs", "Depositing records"]),
               "visit": ("Visit us", ["Opening times", "Searchroom rules", "Booking a seat", "Getting here",
                                      "Accessibility", "Copying and photography"]),
               "learning": ("Learning", ["Document of the month", "Research guides", "Talks and tours",
                                         "Schools service", "Volunteering"]),
               "news": ("News", ["Latest news", "Closures", "Press enquiries"])},
     families=[("accession", A.arch_accession, "collections"), ("closure-notice", A.arch_notice, "visit"),
               ("document-of-month", A.arch_feature, "learning")],
     localised="You are browsing the {section} pages of Westmere County Archives. Information in {section} was checked by the {section} team on {date}.",
     promos=["Become a Friend of the Archives and receive our twice-yearly magazine, early booking for talks and a ten per cent discount on copies.",
             "Looking for a house history? Our research service will search the records for you at an hourly rate.",
             "Volunteer with us: we need help with listing, indexing and cleaning documents on weekday afternoons.",
             "Our shop sells facsimile maps of every parish in the county, printed on heavy paper.",
             "Book a behind-the-scenes tour of the strongrooms, held on the first Tuesday of each month."],
     newsletter="Sign up for the archives e-newsletter: one email a month with new accessions, talks and closures. We never share your address.",
     footer_new="Westmere County Archives is a service of Westmere County Council. Registered office: County Hall, Kelsworth. "
                "Copyright in digitised images belongs to the archives or to the depositors of the original records; images may be used for private research only. "
                "Our privacy notice explains how we use information about visitors and enquirers. Accessibility statement. Freedom of information. "
                "Terms of use. Contact us. Follow us on social media for daily finds from the strongrooms.",
     footer_old="Westmere Record Office, County Hall, Kelsworth. Telephone the searchroom during opening hours. "
                "All material on this site is the copyright of the county council unless otherwise stated. Site map. Disclaimer. Webmaster.",
     cookie="We use cookies to remember your catalogue searches and to count visits. Accept all cookies, reject non-essential cookies or manage your preferences.",
     data_table=None, extra=A.ARCH_EXTRA, append=A.ARCH_APPEND, tags=["maps", "parishes", "estates", "mills", "schools", "chapels", "family history", "conservation"],
     comments=[])

site(key="harwick-sinfonia", name="Harwick Sinfonia", host="www.harwick-sinfonia.example.net",
     tagline="A community orchestra playing across the Vale since 1952",
     sections={"concerts": ("Concerts", ["This season", "Past concerts", "Tickets", "Venues"]),
               "notes": ("Programme notes", ["By composer", "By season", "Writing a note for us"]),
               "players": ("Players", ["Meet the players", "Join the orchestra", "Rehearsals", "Sectionals"]),
               "support": ("Support us", ["Friends scheme", "Sponsor a chair", "Gift Aid", "Legacies"])},
     families=[("programme-note", A.orch_note, "notes"), ("concert", A.orch_concert, "concerts"),
               ("player-profile", A.orch_player, "players")],
     localised="{section} - Harwick Sinfonia. Season information in {section} correct as of {date}; programmes may change for reasons beyond our control.",
     promos=["Sponsor a chair for a season and see your name in every programme.",
             "Friends of the Sinfonia get priority booking and a seat at the open rehearsal.",
             "Our family concert returns at half term, with instruments to try in the foyer.",
             "Gift Aid your donation and we receive an extra twenty-five pence for every pound.",
             "Rehearsals are on Tuesday evenings; string players are especially welcome to audition.",
             "Buy a season ticket and save a third on single ticket prices."],
     newsletter="Join our mailing list for concert news, programme notes and occasional appeals.",
     footer_new="Harwick Sinfonia is a registered charity run entirely by volunteers. Programme notes are the copyright of their authors and may not be reproduced without permission. "
                "We are grateful to the Vale Arts Fund and to our Friends for their support. Privacy policy. Cookie policy. Safeguarding policy. Contact the secretary.",
     cookie="This site uses cookies for ticket sales and anonymous statistics. Choose Accept or Decline below.",
     extra=A.ORCH_EXTRA, append=A.ORCH_APPEND, tags=["strings", "season", "concerto", "symphony", "family concert", "soloist"],
     comments=["What a lovely evening - the slow movement had the whole hall holding its breath.",
               "Really useful note, I wish every orchestra explained the music this clearly.",
               "The horn section deserves a special mention after Saturday.",
               "Will there be a recording of this? I missed the concert because of the roadworks.",
               "My daughter came to her first concert and now wants to learn the cello.",
               "Could the bar open a little earlier before the next concert please?",
               "Lovely to see so many young players in the orchestra this season.",
               "The hearing loop worked perfectly, thank you for sorting it out."])

site(key="marlbrook-homes", name="Marlbrook Homes", host="tenants.marlbrook.example.com",
     tagline="Tenant notices and news",
     sections={"repairs": ("Repairs and works", ["Report a repair", "Planned works", "Gas safety", "Damp and mould"]),
               "rent": ("Rent and charges", ["Pay your rent", "Service charges", "Money advice", "Direct debits"]),
               "community": ("Your community", ["Residents' meetings", "Estate inspections", "Grants for groups"]),
               "account": ("My account", ["Sign in", "Update your details", "Contact us"])},
     families=[("planned-works", A.house_works, "repairs"), ("rent-notice", A.house_rent, "rent"),
               ("residents-meeting", A.house_meeting, "community")],
     localised="Notice from the {section} team. Issued {date}. If you need this notice in another language or format, ask the {section} team.",
     promos=["Report repairs 24 hours a day in your online account.",
             "Free energy advice: book a home visit to cut your heating bills.",
             "Join the tenants' panel and help shape our services.",
             "Swap your home: the mutual exchange scheme can help you move.",
             "Contents insurance for tenants from a few pounds a week."],
     newsletter="Get tenant notices by email or text instead of by post. Sign up in your account.",
     footer_new="Marlbrook Homes is a registered society and a registered provider of social housing. Registered office: 4 Foundry Row, Kelsworth. "
                "Calls may be recorded for training and quality purposes. Our complaints policy explains how to complain and how we will respond. "
                "If you are not satisfied with our response you may refer your complaint to the housing ombudsman. Privacy. Accessibility. Modern slavery statement.",
     cookie="Cookies help us understand how tenants use this site. You can accept or reject optional cookies.",
     data_table=[["Office", "Monday to Thursday", "Friday", "Saturday"],
                 ["Kelsworth customer centre", "8.30am to 5pm", "8.30am to 4.30pm", "Closed"],
                 ["Fallowby estate office", "9am to 1pm", "Closed", "Closed"],
                 ["Emergency repairs line", "24 hours", "24 hours", "24 hours"]],
     data_caption="Opening hours",
     extra=A.HOUSE_EXTRA, append=A.HOUSE_APPEND, tags=["repairs", "rent", "estates", "meetings", "safety"], comments=[])

site(key="vale-growers", name="Vale Growers' Markets Association", host="www.valegrowers.example.org",
     tagline="Farmers' markets across the Vale, run by the people who grow the food",
     sections={"markets": ("Our markets", ["Market dates", "Find a market", "Market rules", "Parking"]),
               "stallholders": ("Stallholders", ["Meet the stallholders", "Become a stallholder", "Pitch fees", "Insurance"]),
               "seasonal": ("What's in season", ["This month", "Recipes", "Preserving"]),
               "about": ("About", ["Our association", "Annual meeting", "Contact"])},
     families=[("stallholder-profile", A.mkt_profile, "stallholders"), ("market-change", A.mkt_notice, "markets"),
               ("in-season", A.mkt_season, "seasonal")],
     localised="More from {section}. This page is part of {section}, updated {date}.",
     promos=["Market tokens make a great present and can be spent at any stall.",
             "Bring a friend to the market and enter our monthly hamper draw.",
             "Stallholder places are available at the new Deepford market.",
             "Follow our seasonal recipe cards, free at every information stall.",
             "Love your local market: tell us what you would like to see on the stalls."],
     newsletter="The Vale Growers newsletter arrives on the first Friday of the month with dates, recipes and stall news.",
     footer_new="Vale Growers' Markets Association is a not-for-profit company owned by its members. All stallholders are certified producers. "
                "Market dates may change because of weather or events; check this site before travelling. Privacy. Terms. Contact the market office.",
     cookie="We use a few cookies to run this website. Accept or decline optional cookies.",
     data_table=[["Market", "When", "Where"], ["Ambersett", "1st Saturday, 9am to 1pm", "Market Square"],
                 ["Fallowby", "2nd Saturday, 9am to 1pm", "Church green"], ["Kelsworth", "3rd Saturday, 8am to 1pm", "High Street"],
                 ["Wrayfield", "4th Sunday, 10am to 2pm", "Station yard"], ["Saltreach", "Every Friday, 9am to 12 noon", "Quayside"]],
     data_caption="Market calendar",
     extra=A.MKT_EXTRA, append=A.MKT_APPEND, tags=["vegetables", "cheese", "bread", "meat", "flowers", "recipes", "apples"],
     comments=["The cider from this stall is the best in the Vale.", "Great to read about the people behind the stalls.",
               "Is there disabled parking at the new site?", "Bought the rhubarb last week and it was wonderful.",
               "Please keep the market in the square, it is so much nicer than the car park.",
               "Are dogs allowed in the covered hall?", "Lovely article, we will visit on the open day.",
               "The market is the highlight of our month."])

site(key="quillpine-advisories", name="Quillpine Software Security Advisories", host="security.quillpine.example.com",
     tagline="Security advisories and release notes",
     sections={"advisories": ("Advisories", ["All advisories", "By product", "By severity", "Subscribe"]),
               "releases": ("Releases", ["Security releases", "Support lifecycle", "Download portal"]),
               "report": ("Report a vulnerability", ["Disclosure policy", "Encryption key", "Hall of thanks"])},
     families=[("advisory", B.adv_advisory, "advisories"), ("security-release", B.adv_release, "releases")],
     localised="{section}: Quillpine Security. Feed generated {date}. Times are shown in UTC.",
     promos=["Subscribe to advisory emails for the products you use.", "Quillpine Cloud customers are patched automatically.",
             "Our disclosure policy promises a reply to every report within two working days.",
             "Extended support is available for versions older than two years.",
             "Training: secure configuration of Quillpine Forms Server, half-day online course."],
     newsletter="Get new advisories by email. Choose products and minimum severity in your account settings.",
     footer_new="Quillpine Software Ltd, Unit 3 Kiln Street Studios, Saltreach. All product names are trademarks of Quillpine Software Ltd. "
                "Information on this site is provided without warranty of any kind. Severity ratings use our internal scale and may differ from ratings published elsewhere. "
                "Privacy notice. Cookie settings. Responsible disclosure. Status page. Careers.",
     cookie="We use essential cookies only, plus optional analytics if you agree. Accept analytics. Reject analytics.",
     extra=B.ADV_EXTRA, append=B.ADV_APPEND, tags=["upload", "xss", "authorisation", "denial of service", "logging", "sign-in"],
     comments=[])

site(key="fenmoor-birdcount", name="Fenmoor Garden Bird Count", host="birdcount.example.net",
     tagline="A citizen-science survey of birds in gardens across the fens",
     sections={"results": ("Results", ["Results by square", "Maps", "Annual reports", "Download data"]),
               "species": ("Species", ["Species spotlights", "Identification help", "Sound library"]),
               "volunteers": ("Volunteers", ["How to count", "Volunteer news", "Square organisers", "Forms"])},
     families=[("square-results", B.bird_square, "results"), ("species-spotlight", B.bird_species, "species"),
               ("volunteer-update", B.bird_update, "volunteers")],
     localised="Fenmoor Garden Bird Count / {section}. Figures in {section} include returns received up to {date}.",
     promos=["Download the counting form and a picture guide to the twenty commonest garden birds.",
             "Sponsor a square and help us print forms for new volunteers.",
             "Our sound library helps you tell a dunnock from a robin by song.",
             "Order a winter feeder pack and support the survey."],
     newsletter="Counters' bulletin: get results and reminders by email three times a year.",
     footer_new="The Fenmoor Garden Bird Count is run by volunteers with support from the Fen Edge Natural History Trust. "
                "Survey data are shared with the county records centre under an open licence. Records of sensitive species are withheld at fine resolution. "
                "Privacy notice. Data licence. Contact the survey coordinator.",
     cookie="Cookies are used to keep you signed in when you submit counts. Accept or refuse optional cookies.",
     extra=B.BIRD_EXTRA, append=B.BIRD_APPEND, tags=["finches", "tits", "thrushes", "feeders", "winter", "results", "fens"],
     comments=["We had a flock of long-tailed tits on Sunday, eleven of them at once!", "Thank you for the clear results tables.",
               "Our sparrows seem fewer this year, sad to see it confirmed.", "How do I add a second garden to my account?",
               "Saw a bullfinch for the first time in twenty years.", "The identification guide is brilliant for the children.",
               "Is it worth counting if nothing comes to the feeder?", "Great work by all the volunteers."])

site(key="tarnside-walkers", name="Tarnside Fell Walkers", host="tarnside-walkers.example.org",
     tagline="Walking the fells together since 1961",
     sections={"walks": ("Walks", ["Programme", "Walk reports", "Grading", "Car sharing"]),
               "safety": ("Safety", ["Safety notes", "Kit list", "Emergency procedures"]),
               "club": ("The club", ["Join", "Committee", "Members' album", "Constitution"])},
     families=[("walk-report", B.walk_report, "walks"), ("upcoming-walk", B.walk_upcoming, "walks"),
               ("safety-note", B.walk_safety, "safety")],
     localised="Tarnside Fell Walkers - {section}. Programme page printed from the {section} section on {date}.",
     promos=["Club fleeces and buffs are on sale at every social evening.", "Join the club: annual membership covers insurance on all walks.",
             "Next social: slide show and pie supper at the Drovers Arms.", "Navigation course for new members, two evenings and a day on the hill.",
             "Volunteer to lead a walk - support and a recce buddy provided.", "Car sharing saves money and parking spaces; ask a leader."],
     newsletter="The club newsletter goes out monthly with the walks programme and trip reports.",
     footer_new="Tarnside Fell Walkers is affiliated to the national walking body. Members walk at their own risk and are responsible for their own equipment. "
                "Walk leaders are volunteers and not professional guides. Photographs are posted with the consent of those shown. Privacy. Contact the secretary.",
     cookie="This site sets a cookie when you sign in to the members' area. That is all.",
     extra=B.WALK_EXTRA, append=B.WALK_APPEND, tags=["fells", "tarns", "navigation", "winter", "reports", "programme"],
     comments=["Cracking day out, thanks for leading!", "The bog below the tarn claimed one of my boots.",
               "Lovely photos, the light on the ridge was something else.", "Can non-members come on the easy walks?",
               "Great report, felt like I was there.", "The pub at the end was the right choice.",
               "I have a spare map of this area if anyone needs one.", "Looking forward to the repeat in the spring."])

site(key="westmere-courts", name="Westmere Courts Listings Service", host="listings.westmere-courts.example.org",
     tagline="Daily list notices for courts and tribunals in the county",
     sections={"notices": ("Listing notices", ["Today's notices", "Closures", "Changes to lists", "Archive"]),
               "guides": ("Guides", ["Attending a hearing", "Support for witnesses", "Interpreters", "Accessibility"]),
               "courts": ("Courts", ["Find a court", "Opening times", "Contact a listing office"])},
     families=[("listing-notice", B.court_notice, "notices"), ("court-closure", B.court_closure, "notices"),
               ("hearing-guide", B.court_guide, "guides")],
     localised="Westmere Courts Listings Service: {section}. Information correct at {date}; check the daily list before travelling.",
     promos=["Witness service volunteers can show you a courtroom before the hearing.",
             "Free legal advice clinic every Wednesday at Kelsworth County Court.",
             "Pay fines online at any time using your reference number.",
             "Need an interpreter? Tell the listing office at least five days before your hearing."],
     newsletter="Subscribe to daily list alerts for a court of your choice.",
     footer_new="This service publishes notices about listings in the courts and tribunals of Westmere. It does not give legal advice. "
                "Daily lists are published under open justice principles and must not be republished with personal details removed from context. "
                "Reporting restrictions may apply to some cases. Privacy notice. Accessibility statement. Contact a listing office. Complaints.",
     cookie="Essential cookies only are used on this service. No tracking cookies are set.",
     extra=B.COURT_EXTRA, append=B.COURT_APPEND, tags=["magistrates", "county court", "family", "tribunal", "closures", "lists"],
     comments=[])

site(key="corrie-ridge-ski", name="Corrie Ridge Ski School", host="corrieridge-ski.test", heavy=False,
     tagline="Small groups, big hills",
     sections={"lessons": ("Lessons", ["Lessons", "Prices"]), "info": ("Info", ["Getting here", "Snow line"])},
     families=[("ski-page", B.ski_page, "lessons")],
     localised="Corrie Ridge Ski School - {section} - {date}", promos=[], newsletter=None,
     footer_new="Corrie Ridge Ski School, base hut, Corrie Ridge road. Instructors hold current qualifications.",
     cookie=None, extra=["Lift passes are sold separately at the tow hut."], append=["Update: the tows are now open daily."],
     tags=[], comments=[])

site(key="hollin-hill-observatory", name="Hollin Hill Observatory", host="hollinhill-observatory.example.com", heavy=False,
     tagline="Astronomical society public nights",
     sections={"nights": ("Public nights", ["Dates", "What to expect"]), "society": ("Society", ["Join", "Contact"])},
     families=[("public-night", B.obs_page, "nights")],
     localised="Hollin Hill Observatory: {section}, {date}", promos=[], newsletter=None,
     footer_new="Hollin Hill Astronomical Society. Public nights depend on the weather and volunteers.",
     cookie=None, extra=["Children must be accompanied by an adult."], append=["Update: the talk will also be streamed for members."],
     tags=[], comments=[])

SITE_BY_KEY = {s["key"]: s for s in SITES}
