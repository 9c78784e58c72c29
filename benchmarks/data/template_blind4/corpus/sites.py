"""Hand-written site chrome data: menus, footers, cookie notices, comments, bios, tags."""

SITES = {}


def site(slug, **kw):
    kw["slug"] = slug
    SITES[slug] = kw


site("ashgrove", name="Ashgrove Valley Hospitals Trust", host="www.ashgrove-health.example.org", heavy=True,
     tagline="Caring for Kelderby, Fallowmere and Saltreach",
     nav=["Find a service", "Visiting", "Careers", "Contact"],
     menu=[("Patients and visitors", ["Coming to hospital", "Visiting times", "Car parking and travel", "Patient transport",
                                      "Interpreting services", "Chaplaincy and spiritual care", "Food and drink", "Lost property"]),
           ("Our services", ["Outpatient clinics", "Maternity", "Children and young people", "Emergency department",
                             "Therapies", "Mental health liaison", "Diagnostics and imaging", "Community nursing"]),
           ("Our hospitals", ["Kelderby General Hospital", "Fallowmere Community Hospital", "Saltreach Infirmary",
                              "Netherwold Treatment Centre", "Hatherwick Memorial Hospital"]),
           ("Get involved", ["Volunteering", "Become a member", "Charity and fundraising", "Patient panels",
                             "Research studies", "Give feedback"]),
           ("About the Trust", ["Board meetings", "Annual report", "Freedom of information", "Equality and diversity",
                                "Our strategy", "Governors"])],
     cookie="We use cookies that are needed for this website to work and, if you agree, analytics cookies that help us "
            "understand which pages are useful. You can change your choice at any time from the link at the bottom of every page.",
     legal=["Ashgrove Valley Hospitals Trust is a public body providing hospital and community health services across the "
            "valley. The information on this website is for general guidance and does not replace advice from your own "
            "doctor, nurse or pharmacist. In an emergency always dial 999.",
            "We try to keep every page accurate and up to date, but services can change at short notice. If you are "
            "unsure whether a clinic is running, please ring the number on your appointment letter before you travel.",
            "This website follows the accessibility standard for public sector bodies. If you find a page you cannot use, "
            "tell the web team and we will try to provide the information in another format within ten working days.",
            "Registered office: Trust Headquarters, Kelderby General Hospital, Beacon Road, Kelderby. Switchboard open "
            "day and night."],
     tags=["outpatients", "clinic changes", "parking", "visiting", "therapies", "community", "appointments", "travel",
           "accessibility", "volunteers", "estates work", "patient letters"],
     comments=[], bio_role="communications team",
     related=["How to change or cancel an appointment", "Patient transport eligibility", "Hospital maps and floor plans",
              "Interpreting and translation", "Your rights as a patient", "Raising a concern with PALS"],
     asides=["If you need urgent help that is not an emergency, call the out-of-hours advice line at any time of day.",
             "Flu and winter vaccinations are available at all Trust outpatient sites on weekday mornings."])

site("fenwick", name="Fenwick Libraries Consortium", host="libraries.fenwick.example.net", heavy=True,
     tagline="Eight libraries, one card",
     nav=["Catalogue", "My account", "Branches", "Help"],
     menu=[("Borrow", ["Search the catalogue", "Reserve a book", "eBooks and eAudio", "Renew your loans",
                       "Home delivery service", "Borrowing rules and charges", "Inter-library loans"]),
           ("Visit", ["Opening hours", "Branch finder", "Mobile library routes", "Accessibility", "Room hire",
                      "Public computers and printing"]),
           ("What's on", ["Children's events", "Reading groups", "Talks and author visits", "Digital help",
                          "Craft and making", "Local history"]),
           ("Research", ["Local studies", "Family history", "Newspaper archive", "Online reference", "Maps and plans"]),
           ("About us", ["Consortium board", "Policies", "Volunteer with us", "Jobs", "Annual review", "Contact us"])],
     cookie="This site stores small files on your device to remember your login and your search settings. With your "
            "permission we also count visits anonymously to improve the catalogue.",
     legal=["The Fenwick Libraries Consortium is a partnership of eight public libraries funded by the member councils. "
            "Library membership is free to anyone who lives, works or studies in the consortium area.",
            "Catalogue records are provided by member libraries and may contain errors. Availability shown online is "
            "updated every fifteen minutes and may not reflect items returned in the last hour.",
            "Personal data held on your library account is used only to run the service and is never sold or shared "
            "for marketing. You may ask to see the data we hold about you at any branch.",
            "Images of branch buildings are used with the permission of the photographers credited on the about page."],
     tags=["events", "children", "local history", "branches", "closures", "reading groups", "digital help",
           "families", "volunteering", "new stock", "talks", "crafts", "accessibility"],
     comments=["Thanks for the notice, I will swap my reservations to the other branch.",
               "Will the study tables be bookable online once the work is finished?",
               "The staff at this branch have been wonderful to my children for years.",
               "Please keep the large print section where it is, it is easy to reach now.",
               "Is there step-free access to the upstairs room for events?",
               "Great to see the consortium investing in the smaller branches for once.",
               "Our reading group would like to know if we can keep our usual Tuesday slot.",
               "Can returns still be made through the letterbox during the closure?"],
     bio_role="outreach librarian",
     related=["Library opening hours this week", "Reserve items for collection", "Join the library online",
              "Volunteer opportunities", "Accessible formats", "Book a public computer"],
     asides=["Your library card also gives free access to newspapers and magazines online.",
             "Overdue charges have been removed for children's and young people's accounts."])

site("tallowby", name="Tallowby Sync", host="changelog.tallowby.example.com", heavy=False,
     tagline="Release notes and advisories",
     nav=["Releases", "Security", "Docs", "Status"],
     menu=[], cookie="", legal=["Tallowby Sync is developed by the Tallowby team. Release notes are published for every stable build."],
     tags=["release", "desktop", "cli", "security", "sync", "admin"], comments=[], bio_role="release manager",
     related=["Download page", "Upgrade guide", "Supported platforms"], asides=[])

site("copperpot", name="Copperpot Kitchen", host="www.copperpot-kitchen.example.com", heavy=True,
     tagline="Home cooking from the valley",
     nav=["Recipes", "Techniques", "Seasonal", "Newsletter"],
     menu=[("Recipes", ["Soups", "Main dishes", "Bakes and cakes", "Puddings", "Vegetarian", "Quick weeknight meals",
                        "Cooking for a crowd", "Preserves and pickles"]),
           ("By season", ["Spring greens", "Summer fruit", "Autumn harvest", "Winter warmers", "Festive baking"]),
           ("Techniques", ["Pastry", "Bread", "Sauces", "Knife skills", "Eggs", "Spices", "Freezing and storing"]),
           ("Community", ["Readers' recipes", "Cook-along evenings", "Ask a cook", "Competitions", "Write for us"])],
     cookie="We use cookies to remember your saved recipes and shopping lists, and to measure which recipes are most "
            "popular. Accepting all cookies also lets us show you recipes from our partner kitchens.",
     legal=["All recipes on Copperpot Kitchen are tested at least twice in a domestic kitchen before publication. Oven "
            "temperatures are for conventional ovens; reduce by twenty degrees for fan ovens.",
            "Nutritional information, where shown, is an estimate per serving and should not be relied on for medical "
            "diets. Always check labels if you are cooking for someone with an allergy.",
            "Recipes and photographs are the copyright of their authors and may not be reproduced without permission, "
            "although you are very welcome to print a copy for your own kitchen.",
            "Copperpot Kitchen is an independent cooking website run by a small team of cooks and editors in the valley."],
     tags=["vegetarian", "baking", "soup", "weeknight", "freezer friendly", "autumn", "winter", "budget", "family",
           "pastry", "gluten free swaps", "one pot", "make ahead"],
     comments=["Made this last night and it disappeared in minutes. I added a little more salt.",
               "Can I use a fan oven for this, and if so what temperature would you suggest?",
               "My grandmother made something very similar, it brought back lovely memories.",
               "I halved the sugar and it was still plenty sweet for us.",
               "Worked perfectly with the swap you suggested, thank you for including it.",
               "Took a bit longer than the recipe said in my old oven, but worth the wait.",
               "Do you think this would freeze before baking, or only afterwards?",
               "Lovely recipe, clear instructions, and it used up the vegetables in my fridge.",
               "We doubled it for a birthday lunch and there was nothing left."],
     bio_role="recipe tester",
     related=["Our guide to oven temperatures", "How to line a cake tin", "Storing leftovers safely",
              "Seasonal vegetable calendar", "Measuring without scales", "Cooking with children"],
     asides=["Sign up for the weekly newsletter and get five seasonal recipes every Friday morning.",
             "Our new cook-along evenings run online every other Wednesday at seven."])

site("marram", name="Marram Valley Netball League", host="www.marramleague.example.org", heavy=True,
     tagline="Community netball since the old courts opened",
     nav=["Fixtures", "Results", "Tables", "Clubs"],
     menu=[("Competitions", ["Premier Division", "Division One", "Division Two", "Junior league", "Walking netball",
                             "Summer mixed league", "Cup competition"]),
           ("Clubs", ["Find a club", "Club contacts", "Registering players", "Club development", "Safeguarding"]),
           ("Officials", ["Become an umpire", "Umpire appointments", "Rules and regulations", "Scorers and timekeepers"]),
           ("League", ["Committee", "Annual meeting", "Awards night", "Sponsors", "Contact the league", "Documents"])],
     cookie="This website uses cookies so that fixture filters and your favourite teams are remembered between visits. "
            "We do not use advertising cookies.",
     legal=["The Marram Valley Netball League is a volunteer-run league affiliated to the regional netball association. "
            "All players must be registered before taking part in league matches.",
            "Results are published as submitted by clubs and may be corrected by the results secretary within seven days. "
            "League tables are not final until confirmed at the end of each season.",
            "Photographs of junior players are only published with written permission from a parent or guardian. "
            "Please contact the safeguarding officer if you have concerns about any image on this site.",
            "The league thanks its sponsors and the staff of every venue who make the weekly fixtures possible."],
     tags=["Premier Division", "Division One", "Division Two", "juniors", "umpiring", "fixtures", "results",
           "awards", "postponements", "venues", "cup"],
     comments=["Brilliant game to watch, the atmosphere in the hall was fantastic.",
               "Well played both teams, a really sporting match from start to finish.",
               "Our juniors loved watching this one, thanks for letting them run the scoreboard.",
               "Great report, nice to see the defenders getting the credit for once.",
               "Tough result for us but we will be back stronger next round.",
               "Does anyone know if the car park will be open for the rearranged game?",
               "Congratulations to the player of the match, thoroughly deserved.",
               "Can the league post the umpire appointments a little earlier next week?"],
     bio_role="results secretary",
     related=["How to register a player", "League rules", "Umpire assessment dates", "Venue directions",
              "Junior league information", "Awards night tickets"],
     asides=["Umpiring courses for beginners run every month at the Marram Valley Sports Hall.",
             "Walking netball sessions welcome players of every age and fitness level."])

site("tenders", name="Harlow Cross Procurement Portal", host="tenders.harlowcross.test", heavy=True,
     tagline="Public contract opportunities in the Harlow Cross area",
     nav=["Opportunities", "Awards", "Supplier guidance", "Register"],
     menu=[("Opportunities", ["Current tenders", "Quick quotes under the threshold", "Framework agreements",
                              "Future pipeline", "Closed opportunities", "Contract awards"]),
           ("Suppliers", ["Register as a supplier", "How to bid", "Selection questionnaire guidance",
                          "Social value guidance", "Supplier events", "Prompt payment"]),
           ("Buyers", ["Participating organisations", "Publishing a notice", "Evaluation guidance", "Templates"]),
           ("About", ["Procurement strategy", "Spend data", "Modern slavery statement", "Contact the procurement team"])],
     cookie="Essential cookies keep you signed in while you prepare a bid. Optional cookies help us understand how "
            "suppliers use the portal so we can make it easier to find opportunities.",
     legal=["Notices on this portal are published by the participating public bodies named in each notice. The portal "
            "operator is not responsible for the content of notices or tender documents.",
            "Suppliers must register and accept the terms of use before downloading tender documents or submitting a bid. "
            "All communication about a live tender must take place through the portal messaging system.",
            "Information submitted in tenders may be disclosed under freedom of information law, subject to the usual "
            "exemptions for commercially sensitive material. Mark any such material clearly.",
            "Deadlines are shown in local time. The portal cannot accept uploads after the stated deadline, so allow "
            "enough time for large files to transfer.",
            "Technical support for the portal is available on weekdays from nine until five."],
     tags=["services", "works", "supplies", "framework", "lots", "social value", "small business", "highways",
           "education", "housing", "harbour", "cleaning"],
     comments=[], bio_role="procurement officer",
     related=["How to register as a supplier", "Writing a good quality answer", "Understanding lots",
              "Selection questionnaire help", "Standstill and award explained", "Supplier feedback form"],
     asides=["Supplier briefing sessions are held online on the first Tuesday of every month.",
             "Quick quotes under the threshold are now advertised here as well as full tenders."])

site("museum", name="Saltmarsh Museum of Working Life", host="www.saltmarsh-museum.example.org", heavy=True,
     tagline="Stories of work, home and harbour",
     nav=["Visit", "Exhibitions", "Collections", "Support us"],
     menu=[("Visit", ["Opening times", "Tickets and prices", "Getting here", "Accessibility", "Cafe and shop",
                      "Group visits"]),
           ("Exhibitions", ["Current exhibitions", "Coming soon", "Past exhibitions", "Touring displays"]),
           ("Collections", ["Search the collection", "Object of the month", "Oral history archive", "Photographs",
                            "Research enquiries", "Donating objects"]),
           ("Learning", ["School visits", "Handling boxes", "Family trails", "Adult courses"]),
           ("Support us", ["Become a Friend", "Volunteer", "Donate", "Leave a gift in your will", "Corporate support"])],
     cookie="The museum website uses cookies to make ticket booking work and, with your consent, to count visits so we "
            "can show funders how many people use our online collection.",
     legal=["The Saltmarsh Museum of Working Life is a registered charity run by a small staff and more than a hundred "
            "volunteers. Admission to the permanent galleries is free.",
            "Images of objects in the collection may be used for private study. For publication or commercial use, "
            "please contact the collections team for permission and high resolution files.",
            "Some objects and records in the collection reflect attitudes of their time that visitors may find upsetting. "
            "We describe them honestly and welcome feedback on the language we use.",
            "The museum is supported by the county council, grant-giving trusts and the generosity of visitors."],
     tags=["exhibitions", "harbour", "mills", "oral history", "families", "photography", "textiles", "railways",
           "childhood", "food", "objects", "volunteers"],
     comments=["My great-grandfather worked on the quay, I cannot wait to see this.",
               "Visited on Saturday with the children, the hands-on table was a real hit.",
               "Will the recorded memories be available online as well?",
               "A beautiful and moving exhibition, well worth the trip.",
               "I have some old photographs from that time, who should I contact?",
               "The gallery talk was fascinating, thank you to the curator for her time."],
     bio_role="curator",
     related=["Plan your visit", "Family trail sheets", "Search our oral history archive", "Donate an object",
              "Become a Friend of the museum", "School visit booking"],
     asides=["Free family trails are available at the front desk every weekend and school holiday.",
             "The museum cafe now serves lunches made with produce from local farms."])

site("insurance", name="Brightwell Mutual Help Centre", host="help.brightwell-mutual.example.com", heavy=True,
     tagline="Answers about your home, motor and travel policies",
     nav=["Help topics", "Make a claim", "My policies", "Contact"],
     menu=[("Home insurance", ["Buildings cover", "Contents cover", "Accidental damage", "Escape of water",
                               "Personal possessions", "Home emergency"]),
           ("Motor insurance", ["Named drivers", "Windscreen claims", "Driving abroad", "Courtesy cars", "No claims discount"]),
           ("Travel insurance", ["Cancellation", "Medical emergencies abroad", "Lost luggage", "Winter sports",
                                 "Pre-existing conditions"]),
           ("Your account", ["Update your details", "Payments and refunds", "Documents", "Renewals", "Complaints"])],
     cookie="We use cookies to keep you signed in to your account, to remember your help searches and, if you agree, to "
            "measure which answers help customers most.",
     legal=["Brightwell Mutual is a mutual insurer owned by its members. The answers in this help centre are general "
            "guidance; your policy wording and schedule set out exactly what you are covered for.",
            "If you are unhappy with our service you can make a complaint at any time. If we cannot resolve it, you may "
            "be able to refer it to the independent ombudsman service free of charge.",
            "Calls to our claims and customer lines are free from landlines and mobiles. Calls may be recorded and "
            "monitored for training and to check the accuracy of our records.",
            "Policies are underwritten by Brightwell Mutual Insurance Society, registered office Market Steps, Quarnby Wells."],
     tags=["claims", "home", "motor", "travel", "payments", "renewal", "cancellation", "documents", "excess",
           "named drivers", "luggage"],
     comments=[], bio_role="customer support writer",
     related=["Track an existing claim", "Download your policy documents", "Change your payment date",
              "Understanding your excess", "How renewal works", "Making a complaint"],
     asides=["Our claims line is open around the clock for emergencies such as flooding or break-ins.",
             "Members receive a share of any surplus as a discount at renewal."])

site("travel", name="Lanternfield Journeys", host="www.lanternfield-journeys.example.net", heavy=True,
     tagline="Self-guided walking and cycling holidays",
     nav=["Holidays", "Destinations", "Travel updates", "Brochure"],
     menu=[("Walking holidays", ["Coast paths", "Fells and moors", "Inn to inn", "Short breaks", "Family walking",
                                 "Challenging routes"]),
           ("Cycling holidays", ["Canal towpaths", "Lakes and valleys", "Electric bike trips", "Gentle rides"]),
           ("Sailing and islands", ["Island hopping", "Skippered days", "Ferry routes"]),
           ("Plan your trip", ["How self-guided works", "Grading explained", "Luggage transfer", "Travel insurance",
                               "Booking conditions", "Frequently asked questions"]),
           ("About us", ["Our team", "Responsible travel", "Reviews", "Contact us", "Jobs"])],
     cookie="Cookies help us remember the holidays you have looked at and keep your booking safe. With your permission "
            "we also measure visits to improve our route pages.",
     legal=["Lanternfield Journeys arranges self-guided holidays in partnership with independent inns and guesthouses. "
            "All holidays are sold subject to our booking conditions, which you should read before booking.",
            "Route grades are a guide only. You are responsible for judging whether a route suits your fitness and "
            "experience, and for checking weather forecasts each morning.",
            "Prices are per person sharing a twin or double room unless stated. Supplements apply for single rooms and "
            "for travel during public holidays.",
            "Your money is protected: payments for package holidays are held in a trust account until you travel.",
            "Registered office: The Old Granary, Lantern Hill, Lanternfield."],
     tags=["walking", "cycling", "sailing", "coast", "fells", "lakes", "inns", "short breaks", "family", "updates",
           "electric bikes", "islands"],
     comments=["We did this trip last September and loved every day of it.",
               "The luggage transfer was faultless and the inns were friendly.",
               "Is the longest day suitable for someone who walks about fifteen kilometres at home?",
               "Thank you for the quick update, our coordinator rang us the same day.",
               "Highly recommend the second inn, the breakfast was superb.",
               "Could you add a dog-friendly version of this route?",
               "Route notes were clear enough that we never needed the map app."],
     bio_role="route planner",
     related=["How self-guided holidays work", "What to pack for walking", "Booking conditions", "Grading explained",
              "Getting there by train", "Gift vouchers"],
     asides=["Our new brochure is out now, with twelve new routes for next season.",
             "Book before the end of January and luggage transfer is included free on all walking trips."])

site("stats", name="Cardale Office for Regional Statistics", host="www.stats.cardale.test", heavy=False,
     tagline="Official statistics for the Cardale region",
     nav=["Bulletins", "Data tables", "Revisions", "About"],
     menu=[], cookie="",
     legal=["Official statistics are produced impartially and free from political influence, in line with the code of practice."],
     tags=["economy", "population", "housing", "transport", "revisions"], comments=[], bio_role="statistician",
     related=["Release calendar", "Data tables", "Methodology"], asides=[])
