"""Hand-written site templates (all organisations invented, hosts under example.* / .test)."""

COMMON_COMMENTS = [
    ("Marjorie from Hobbesdale", "Thanks for putting this online, much easier than ringing up and waiting in a queue."),
    ("pennywhistle62", "Is there any chance of a text message service for updates like this? Not everyone checks the website."),
    ("Colm T.", "Shared this with our residents' group, hope that is all right."),
    ("A. Varleigh", "The link in last week's email went to the wrong page, just so you know."),
    ("Ruth in Keldwick", "Very clear, thank you. More of this please."),
    ("notsosure", "I still think the old arrangement was better but I appreciate the explanation."),
    ("Dev M.", "Printed this off for my mum who does not use the internet."),
    ("Lottie", "Could you add a map next time? I was not sure which end of the road you meant."),
    ("Harold Bexwell", "Been a customer for thirty years and this is the first time I have had to comment. Well done."),
    ("Jo and the kids", "We read this together at breakfast, the children had lots of questions!"),
    ("quietneighbour", "Any update on the noise from last month? Nobody replied to my email."),
    ("Ffion R.", "Good to see the dates listed properly this time."),
    ("tom_at_no_14", "Does this apply to the houses at the bottom of the hill as well?"),
    ("Beryl Hennage", "My late husband would have loved reading this. Thank you for keeping people informed."),
]

LEGAL_BASE = ("All content on this website is provided for general information only and does not form part of any "
              "contract. We make every effort to keep pages accurate but cannot accept liability for errors or "
              "omissions. Links to other websites are provided for convenience and we are not responsible for their "
              "content. Personal information you give us is handled in line with our privacy notice, which explains "
              "your rights and how to contact our data protection officer.")

COOKIE_VARIANTS = [
    "We use cookies to make this site work and, with your consent, to understand how it is used. You can change your "
    "choices at any time from the cookie settings link in the footer. Accept all. Reject optional. Manage settings.",
    "This website stores small files called cookies on your device. Some are essential, others help us improve the "
    "service. Read our cookie policy to find out more. Allow all cookies. Essential only.",
    "Cookie consent: we and our partners use cookies for site functions and anonymous statistics. Continuing to browse "
    "means you accept essential cookies. Choose preferences. Accept. Decline.",
]

SITES = {
    "water": dict(
        name="Marrowby Water", host="marrowby-water.example.org", heavy=True, style="utility",
        families={"outage_notice": 13, "planned_works": 5, "vacancy": 3},
        section={"outage_notice": "Incidents", "planned_works": "Planned work", "vacancy": "Careers"},
        url={"outage_notice": "incidents/{slug}", "planned_works": "works/{slug}", "vacancy": "careers/{slug}"},
        topnav=["Home", "Your account", "Pay a bill", "Moving home", "Incidents", "Planned work", "Water quality",
                "Help and contact", "Careers", "About us"],
        mega={"Incidents": ["Live incident map", "Report a leak", "No water", "Low pressure", "Discoloured water",
                            "Sewer flooding", "Priority services register"],
              "Planned work": ["Works near you", "Lead pipe replacement", "Roadworks permits", "Compensation scheme",
                               "Our five-year plan", "Reservoir projects"],
              "Careers": ["Current vacancies", "Apprenticeships", "Graduate scheme", "Life at Marrowby Water",
                          "Benefits and pay", "Diversity data"]},
        legal="Marrowby Water Services Limited is registered in an invented registry under number 4471209. Registered "
              "office: Pumping Station House, Weir Lane, Marrowby. Calls may be recorded for training purposes. "
              "We are regulated for drinking water quality and customer service standards.",
        footer_links=["Accessibility", "Privacy notice", "Cookie settings", "Complaints", "Codes of practice",
                      "Modern slavery statement", "Sitemap", "Welsh language version"],
        tags=["leak", "burst main", "pressure", "bottled water", "roadworks", "lead pipes", "sewer", "reservoir",
              "priority services", "compensation"],
        bios=[],
    ),
    "vets": dict(
        name="Quillmere Veterinary Group", host="quillmere-vets.example.com", heavy=True, style="magazine",
        families={"vet_notice": 9, "vet_advice": 7, "vacancy": 4},
        section={"vet_notice": "Practice news", "vet_advice": "Pet advice", "vacancy": "Careers"},
        url={"vet_notice": "news/{slug}", "vet_advice": "advice/{slug}", "vacancy": "careers/{slug}"},
        topnav=["Find a surgery", "Book online", "Pet advice", "Practice news", "Health plans", "Emergencies",
                "Careers", "Contact"],
        mega={"Pet advice": ["Dogs", "Cats", "Rabbits", "Small pets", "Older pets", "Puppies and kittens",
                             "Vaccinations", "Flea and worming", "Dental care", "Nutrition"],
              "Practice news": ["All news", "Opening hours", "New team members", "Events", "Community work"],
              "Careers": ["Vacancies", "Student placements", "Nurse training", "Why work with us"]},
        legal="Quillmere Veterinary Group is a trading name of an invented partnership of veterinary surgeons. "
              "Fees quoted are a guide only and may change without notice. Health plan terms apply. "
              "Emergency services outside normal hours are provided from our hospital site.",
        footer_links=["Terms of business", "Privacy", "Cookies", "Complaints procedure", "Fees guide", "Accessibility"],
        tags=["dogs", "cats", "rabbits", "vaccines", "dental", "senior pets", "nutrition", "fleas", "surgery news",
              "nurse clinics", "insurance"],
        bios=["{author} has worked with Quillmere Veterinary Group since qualifying and has a particular interest in "
              "older animals. Outside work {author_first} walks two elderly lurchers on the Oxlade Green marshes.",
              "{author} is a registered veterinary nurse and runs our weight clinics. {author_first} writes regularly "
              "for the advice pages and answers readers' questions on the monthly live chat."],
    ),
    "theatre": dict(
        name="The Lampwick Playhouse", host="lampwick-playhouse.example.net", heavy=True, style="venue",
        families={"production": 8, "venue_notice": 5, "vacancy": 3},
        section={"production": "What's on", "venue_notice": "Visit", "vacancy": "Get involved"},
        url={"production": "whats-on/{slug}", "venue_notice": "visit/{slug}", "vacancy": "jobs/{slug}"},
        topnav=["What's on", "Visit", "Access", "Get involved", "Youth company", "Hire the building", "Support us",
                "Basket"],
        mega={"What's on": ["Drama", "Comedy", "Music", "Family shows", "Studio", "Festivals", "Gift vouchers",
                            "Seating plans", "Members' priority booking"],
              "Visit": ["Getting here", "Parking", "Food and drink", "Access information", "Groups",
                        "Lost property", "Frequently asked questions"],
              "Get involved": ["Jobs", "Volunteering", "Auditions", "Classes", "Writers' room"]},
        legal="The Lampwick Playhouse Trust is an invented registered charity. Ticket sales are subject to our "
              "terms and conditions. Performances, casting and timings may change. Booking fees are included "
              "in the prices shown. We reserve the right to refuse admission.",
        footer_links=["Terms and conditions", "Privacy", "Cookies", "Annual report", "Press", "Accessibility",
                      "Safeguarding"],
        tags=["drama", "comedy", "family", "studio", "captioned", "relaxed", "youth company", "new writing",
              "musicals", "access"],
        bios=["Review by {author}, who has reviewed for the Playhouse members' magazine for several seasons and "
              "once, memorably, appeared on stage as a tree."],
    ),
    "lettings": dict(
        name="Oxlade Lettings", host="oxlade-lettings.example.com", heavy=True, style="portal",
        families={"listing": 10, "landlord_guide": 6},
        section={"listing": "To let", "landlord_guide": "Landlords"},
        url={"listing": "to-let/{slug}", "landlord_guide": "landlords/guides/{slug}"},
        topnav=["To let", "Landlords", "Tenants", "Valuation", "Our branches", "Area guides", "Contact"],
        mega={"To let": ["Houses", "Flats", "Student lets", "Pet friendly", "Just reduced", "Let agreed",
                         "Saved searches", "Draw a map search"],
              "Landlords": ["Fees", "Fully managed", "Rent collection", "Landlord guides", "Compliance calendar",
                            "Free rental valuation", "Landlord newsletter"]},
        legal="Oxlade Lettings is an invented business and a member of an invented client money protection scheme "
              "and redress scheme. Particulars are provided as a guide and do not form part of any contract. "
              "Measurements are approximate. Tenant fees are limited by law; see our fees page.",
        footer_links=["Tenant fees", "Landlord fees", "Client money protection", "Complaints", "Privacy", "Cookies",
                      "Accessibility"],
        tags=["one bedroom", "two bedroom", "garden", "parking", "pets", "bills included", "student", "new build",
              "compliance", "deposits"],
        bios=["Written by {author}, lettings manager. {author_first} has let homes in the valley for many years and "
              "chairs the local landlords' forum."],
    ),
    "jobs": dict(
        name="Tallyrow Jobs", host="tallyrow-jobs.example.net", heavy=True, style="board",
        families={"vacancy": 10},
        section={"vacancy": "Jobs"},
        url={"vacancy": "job/{slug}"},
        topnav=["Find jobs", "Post a job", "Career advice", "Salary checker", "Employers", "Sign in"],
        mega={"Jobs": ["Care and health", "Hospitality", "Transport and logistics", "Education", "Arts and culture",
                       "Utilities", "Office and admin", "Retail", "Part time", "Apprenticeships", "Remote"]},
        legal="Tallyrow Jobs is an invented job board. Advertisers are responsible for the accuracy of their "
              "adverts. We never ask candidates for money. Report a suspicious advert using the link on each page. "
              "Jobs are shown in order of relevance unless you choose another order.",
        footer_links=["About", "Privacy", "Cookies", "Terms", "Report an advert", "Recruiter terms", "Help"],
        tags=["part time", "full time", "temporary", "graduate", "driving", "weekends", "evening", "training given"],
        bios=[],
    ),
    "schools": dict(
        name="Fennick Valley School District", host="fennick-schools.test", heavy=True, style="newsletter",
        families={"newsletter_item": 11, "term_notice": 3, "vacancy": 3},
        section={"newsletter_item": "Newsletter", "term_notice": "Parents", "vacancy": "Work for us"},
        url={"newsletter_item": "newsletter/{slug}", "term_notice": "parents/{slug}", "vacancy": "vacancies/{slug}"},
        topnav=["Our schools", "Parents", "Admissions", "Newsletter", "Governors", "Work for us", "Contact"],
        mega={"Newsletter": ["This week", "Archive", "Photo galleries", "Sports results", "Music news", "Subscribe"],
              "Parents": ["Term dates", "School meals", "Transport", "Uniform", "Attendance", "Special educational needs",
                          "Online safety"],
              "Work for us": ["Teaching posts", "Support staff", "Supply register", "Safer recruitment"]},
        legal="Fennick Valley School District is an invented grouping of schools. Photographs of pupils are published "
              "only with written parental consent. To request removal of an image contact the district office. "
              "Newsletter items are written by school staff and pupils.",
        footer_links=["Privacy notice for parents", "Safeguarding", "Complaints policy", "Freedom of information",
                      "Cookies", "Accessibility"],
        tags=["primary", "secondary", "sport", "music", "trips", "fundraising", "eco", "reading", "clubs"],
        bios=["This item was written by {author}, parent volunteer and newsletter editor for the district."],
    ),
    "podcasts": dict(
        name="Pipistrelle Audio", host="pipistrelle-audio.example.org", heavy=True, style="media",
        families={"episode_notes": 13},
        section={"episode_notes": "Episodes"},
        url={"episode_notes": "shows/episodes/{slug}"},
        topnav=["Shows", "Episodes", "Transcripts", "Live events", "Supporters", "Shop", "About"],
        mega={"Episodes": ["Latest", "Slow Water", "The Night Desk", "Bread and Circuits", "Field Notes from Nowhere",
                           "Second Act", "Rust and Rivets", "Bonus episodes", "Listen on your app"]},
        legal="Pipistrelle Audio is an invented listener-supported network. Views expressed by guests are their own. "
              "Episodes may contain strong language where marked. Transcripts are produced by volunteers and may "
              "contain errors.",
        footer_links=["Privacy", "Cookies", "RSS feeds", "Accessibility", "Press kit", "Contact"],
        tags=["rivers", "history", "food", "repair", "nature", "careers", "radio", "craft", "local news"],
        bios=["Notes written by {author}, producer at Pipistrelle Audio, who edits most of our episodes on a "
              "very old laptop."],
    ),
    "ferry": dict(
        name="Skerrin Sound Ferries", host="skerrin-ferries.example.com", heavy=True, style="transport",
        families={"service_update": 9, "route_guide": 4, "vacancy": 3},
        section={"service_update": "Service status", "route_guide": "Routes", "vacancy": "Careers"},
        url={"service_update": "status/{slug}", "route_guide": "routes/{slug}", "vacancy": "careers/{slug}"},
        topnav=["Book", "Timetables", "Service status", "Routes", "Fares", "Island guides", "Freight", "Careers"],
        mega={"Service status": ["All routes", "Text alerts", "Weather policy", "Refunds", "Accessibility at ports"],
              "Routes": ["Skerrin Quay", "Larkspur Bay", "Inchmurr", "Holm of Tarran", "Cobbold End",
                         "Route map", "Timetable downloads"],
              "Careers": ["Sea staff", "Shore staff", "Cadetships", "Pay and conditions"]},
        legal="Skerrin Sound Ferries is an invented operator. All sailings are subject to weather and tide. Conditions "
              "of carriage apply to every ticket. Vehicles must arrive at least thirty minutes before departure.",
        footer_links=["Conditions of carriage", "Privacy", "Cookies", "Passenger rights", "Lost property", "Contact"],
        tags=["weather", "cancellations", "timetable", "islands", "vehicles", "foot passengers", "freight"],
        bios=[],
    ),
    "garden": dict(
        name="Keldwick Horticultural Society", host="keldwick-hort.example.org", heavy=False, style="light",
        families={"growing_notes": 10, "show_schedule": 5},
        section={"growing_notes": "Notes", "show_schedule": "Shows"},
        url={"growing_notes": "notes/{slug}", "show_schedule": "shows/{slug}"},
        topnav=["Home", "Notes", "Shows", "Join"],
        mega={},
        legal="Keldwick Horticultural Society is run by volunteers.",
        footer_links=["Contact", "Privacy"],
        tags=[], bios=[],
    ),
    "wiki": dict(
        name="Quernstone project wiki", host="wiki.quernstone.test", heavy=False, style="wiki",
        families={"howto": 10, "meeting_notes": 6},
        section={"howto": "Guides", "meeting_notes": "Meetings"},
        url={"howto": "wiki/Guides/{slug}", "meeting_notes": "wiki/Meetings/{slug}"},
        topnav=["Main page", "Guides", "Meetings", "Recent changes"],
        mega={},
        legal="Content is available under an invented free documentation licence unless otherwise noted.",
        footer_links=["Privacy", "About the wiki"],
        tags=[], bios=[],
    ),
}

# length bounds per family (body words)
LENGTH = {"outage_notice": (96, 150), "planned_works": (150, 430), "vacancy": (120, 260),
          "vet_notice": (110, 230), "vet_advice": (200, 460), "production": (110, 260), "venue_notice": (90, 200),
          "listing": (95, 220), "landlord_guide": (160, 420), "newsletter_item": (90, 230), "term_notice": (90, 190),
          "episode_notes": (100, 380), "growing_notes": (110, 400), "show_schedule": (90, 220),
          "service_update": (90, 230), "route_guide": (100, 330), "howto": (90, 320), "meeting_notes": (70, 200)}

# families that also get "long" pages (all sections, fuller paragraphs)
LONG = {"vet_advice": (330, 470), "planned_works": (290, 450), "landlord_guide": (260, 440),
        "growing_notes": (255, 440), "episode_notes": (235, 420), "howto": (190, 380), "route_guide": (165, 380)}
