# -*- coding: utf-8 -*-
"""Hand-written site templates. Each site returns base parts (always present)
and extra parts (added one by one until the target template size is reached).
Nothing here is part of any document's own body."""
from html import escape as h

from bodygen import tokens

SITES = {
    "riverton": dict(host="www.riverton-council.example.org", name="Riverton Borough Council", heavy=True),
    "herald": dict(host="news.ashcombe-herald.example.com", name="The Ashcombe Herald", heavy=True),
    "quill": dict(host="docs.quillstack.example.net", name="Quillstack Documentation", heavy=True),
    "hollowmere": dict(host="earthsci.hollowmere-university.example.org", name="Hollowmere University - School of Earth Sciences", heavy=True),
    "bracken": dict(host="help.brackenshop.example.com", name="Bracken Home and Garden - Help Centre", heavy=True),
    "tinkerers": dict(host="forum.tinkerers.test", name="Tinkerers Q&A", heavy=True),
    "railclub": dict(host="www.oldtown-railclub.example.net", name="Oldtown Railway Club", heavy=True),
    "wire": dict(host="wire.example.com", name="Southvale Newswire", heavy=False),
    "mirelle": dict(host="mirelle-notes.test", name="Mirelle's Notes", heavy=False),
}


def wc(html_text):
    import re
    t = re.sub(r"<[^>]+>", " ", html_text)
    import html as _h
    return len(tokens(_h.unescape(t)))


def links(items, cls="links"):
    return '<ul class="%s">%s</ul>' % (cls, "".join('<li><a href="%s">%s</a></li>' % (h(u), h(t)) for t, u in items))


def slugish(t):
    import re
    return re.sub(r"[^a-z0-9]+", "-", t.lower()).strip("-")


# ---------------------------------------------------------------- riverton
RV_MENU = {
    "Bins and recycling": ["Collection days", "Garden waste subscription", "Bulky item collection", "Recycling centres", "Report a missed bin", "Clinical waste"],
    "Roads and travel": ["Roadworks and closures", "Report a pothole", "Parking permits", "Blue badges", "Gritting routes", "Bus passes"],
    "Council tax": ["Pay your council tax", "Discounts and exemptions", "Moving home", "Council tax bands", "Direct debit", "Arrears"],
    "Planning": ["Search applications", "Comment on an application", "Building control", "Tree preservation orders", "Local plan", "Conservation areas"],
    "Community": ["Libraries", "Leisure centres", "Parks and open spaces", "Grants for groups", "Volunteering", "Consultations"],
}
RV_ALERTS = [
    "Alert: the Quayside car park lifts are out of service until further notice.",
    "Alert: the contact centre closes early at 3pm on Wednesday for staff training.",
    "Alert: flood warnings are in place for the river path between Holt End and the quay.",
    "Alert: online payments will be unavailable overnight on Sunday for maintenance.",
]
RV_SERVICES = [
    ("Pay your council tax", "Set up a direct debit or make a one-off payment online in a few minutes."),
    ("Report a pothole", "Tell us about a defect on a road or pavement and follow its progress."),
    ("Garden waste", "Subscribe to the fortnightly garden waste service for the coming year."),
    ("Library catalogue", "Search and reserve books, films and audiobooks from any branch."),
    ("Planning search", "View plans, decisions and comments for applications in the borough."),
    ("Parking permits", "Apply for or renew a residents' parking permit for your street."),
    ("Housing advice", "Get help if you are worried about losing your home."),
    ("Register a birth", "Book an appointment with the registration service at the Town Hall."),
    ("Leisure centres", "Timetables, prices and online booking for swimming and the gym."),
    ("Jobs at the council", "Browse current vacancies and apprenticeships."),
    ("Pest control", "Book a visit for rats, mice, wasps or cockroaches."),
    ("Licensing", "Apply for taxi, alcohol and street trading licences."),
]
RV_FOOTER = ("Riverton Borough Council, Town Hall, Market Cross, Riverton. Telephone 01632 960100. "
             "The council is committed to making this website accessible in line with the public sector accessibility regulations. "
             "Personal information you give us is handled under our privacy notice, and you can ask to see the information we hold about you. "
             "We use cookies to remember your settings and to understand how the site is used; you can change your cookie settings at any time. "
             "Copyright Riverton Borough Council. Content is available under an open licence unless otherwise stated.")


def rv_parts(doc, ctx, rng):
    site = SITES["riverton"]
    menu = "".join('<div class="mega-col"><h3>%s</h3>%s</div>' % (h(k), links([(x, "/" + slugish(x)) for x in v]))
                   for k, v in RV_MENU.items())
    crumbs = '<nav class="breadcrumbs"><a href="/">Home</a> &gt; <a href="/%s">%s</a> &gt; <span>%s</span></nav>' % (
        doc["section"], h(doc["section"].capitalize()), h(doc["title"]))
    base = {
        "top": '<div class="alert">%s</div><header><a class="logo" href="/">%s</a><form class="search"><label>Search the site</label></form>'
               '<nav class="mega">%s</nav></header>%s' % (h(rng.choice(RV_ALERTS)), h(site["name"]), menu, crumbs),
        "meta": '<p class="page-meta">Last reviewed %s</p>' % h(doc["date"]),
        "foot": '<footer><p>%s</p>%s</footer>' % (h(RV_FOOTER), links([(x, "/" + slugish(x)) for x in
                                                   ["Accessibility", "Privacy", "Cookies", "Contact us", "Complaints", "Freedom of information"]])),
    }
    if doc.get("variant") == "notices":
        # identical teaser aside on every page of the notices section
        aside = "".join('<div class="teaser"><h4>%s</h4><p>%s</p></div>' % (h(t), h(s)) for t, s in RV_SERVICES + ctx["rv_fixed_teasers"])
        base["aside"] = '<aside class="teasers"><h3>Popular and latest</h3>%s</aside>' % aside
        return base, []
    others = ctx["others"](doc, "riverton", 14, rng)
    extras = [
        ("aside", ['<div class="teaser"><h4>%s</h4><p>%s</p></div>' % (h(t), h(s)) for t, s in rng.sample(RV_SERVICES, 12)]),
        ("related", ['<li><a href="%s">%s</a> %s</li>' % (h(o["url"]), h(o["title"]), h(o["first"])) for o in others]),
        ("after", ['<div class="feedback"><p>Was this page helpful? Yes or No. Tell us how we could make this page better; '
                   'we cannot reply to comments left here.</p></div>',
                   '<div class="contact-box"><h3>Contact the council</h3><p>Our contact centre is open Monday to Friday, 9am to 5pm. '
                   'You can also visit the customer service desk at the Town Hall.</p></div>',
                   '<div class="social"><p>Follow Riverton Council for service updates and news from around the borough.</p></div>']),
    ]
    if doc.get("variant") == "landing":
        base["top"] += '<div class="hero"><h2>Welcome to Riverton</h2><p>Find services, news and information about your borough.</p></div>'
    return base, extras


def rv_layout(doc, parts, body_html):
    rel = '<section class="related"><h3>Related pages</h3><ul>%s</ul></section>' % parts["related"] if parts.get("related") else ""
    aside = parts.get("aside", "")
    if aside and not aside.startswith("<aside"):
        aside = '<aside class="teasers"><h3>Popular services</h3>%s</aside>' % aside
    cls = "landing" if doc.get("variant") == "landing" else "content"
    return ('%s<div class="page %s"><main id="content">%s%s</main>%s%s%s</div>%s' %
            (parts["top"], cls, body_html, parts["meta"], aside, rel, parts.get("after", ""), parts["foot"]))


# ---------------------------------------------------------------- herald
HD_SECTIONS = ["News", "Local", "Business", "Sport", "What's on", "Opinion", "Property", "Jobs", "Obituaries", "Puzzles"]
HD_COMMENTS = [
    "About time too. We have been asking for this for years.", "Who is actually going to pay for all this?",
    "Great news for the town, well done to everyone involved.", "I went last year and it was packed, get there early.",
    "The parking situation is going to be a nightmare again.", "Can anyone tell me if dogs are allowed?",
    "Same old story, decided behind closed doors.", "My grandparents used to talk about this place, lovely to see it mentioned.",
    "Good luck to them, we need more independent shops.", "The article does not say what happens to the staff.",
    "This was discussed at our residents meeting last month and nobody was told.", "Brilliant, my kids will love it.",
    "Typical, announced the week after the school holidays.", "Has anyone asked the people who actually live there?",
    "Proper journalism, thank you Herald.", "I will believe it when I see it.",
]
HD_TAGS = ["council", "planning", "transport", "schools", "business", "events", "weather", "health", "crime", "sport", "housing", "environment", "arts", "history"]
HD_BIOS = ["has reported on Ashcombe and the surrounding villages for more than a decade.",
           "covers local politics and the council for the Herald.", "writes about business, shops and jobs in the district.",
           "is the Herald's community and events reporter."]


def hd_parts(doc, ctx, rng):
    nav = links([(s, "/" + slugish(s)) for s in HD_SECTIONS], "sections")
    base = {
        "top": '<header class="masthead"><a href="/">The Ashcombe Herald</a><p class="dateline">Your local paper since 1871</p>%s</header>' % nav,
        "byline": '<p class="byline">By %s, %s</p>' % (h(doc["author"]), h(doc["date"])),
        "foot": '<footer><p>The Ashcombe Herald is published by Ashcombe Media Ltd. We follow the editors code of practice; '
                'to make a complaint about an article, contact the editor. Copyright Ashcombe Media Ltd. All rights reserved.</p>%s</footer>' %
                links([(x, "/" + slugish(x)) for x in ["About us", "Contact", "Advertise", "Complaints", "Privacy", "Terms"]]),
    }
    others = ctx["others"](doc, "herald", 12, rng)
    names = ctx["names"](rng, 12)
    comments = ['<li class="comment"><b>%s</b> %s</li>' % (h(n), h(c)) for n, c in zip(names, rng.sample(HD_COMMENTS, 12))]
    extras = [
        ("side", ['<div class="trending"><h3>Trending</h3><ol>%s</ol></div>' % "".join('<li>%s</li>' % h(o["title"]) for o in others[:5])]),
        ("after", ['<div class="author-bio"><h3>About the author</h3><p>%s %s</p></div>' % (h(doc["author"]), h(rng.choice(HD_BIOS)))]),
        ("comments", comments),
        ("side", ['<div class="newsletter"><h3>Get the Herald in your inbox</h3><p>Sign up for our free morning briefing with the top stories '
                  'from Ashcombe and the valley, delivered before breakfast every weekday.</p></div>']),
        ("related", ['<li><a href="%s">%s</a> <span>%s</span></li>' % (h(o["url"]), h(o["title"]), h(o["first"])) for o in others[5:]]),
        ("side", ['<div class="tags"><h3>Tags</h3><p>%s</p></div>' % " ".join(h(t) for t in rng.sample(HD_TAGS, 8)),
                  '<div class="ad"><p>Advertisement</p><p>Ashdown Motors: family run since 1962. Servicing, MOTs and repairs.</p></div>']),
    ]
    return base, extras


def hd_layout(doc, parts, body_html):
    com = '<section class="comments"><h3>Comments</h3><ol>%s</ol></section>' % parts["comments"] if parts.get("comments") else ""
    rel = '<section class="more"><h3>More from the Herald</h3><ul>%s</ul></section>' % parts["related"] if parts.get("related") else ""
    art = body_html.replace("</h1>", "</h1>" + parts["byline"], 1)
    return '%s<div class="wrap"><article>%s</article><aside>%s</aside>%s%s%s</div>%s' % (
        parts["top"], art, parts.get("side", ""), parts.get("after", ""), com, rel, parts["foot"])


# ---------------------------------------------------------------- quill docs
QS_VERSIONS = ["v4.2 (latest)", "v4.1", "v4.0", "v3.5", "v3.4", "v3.2"]
QS_SECTIONS = ["Getting started", "Installation", "Concepts", "Guides", "Reference", "Release notes", "Operations", "Security", "API", "FAQ"]


def qs_parts(doc, ctx, rng):
    base = {
        "top": '<header><a href="/">Quillstack Docs</a><div class="version-switcher"><label>Version</label>%s</div>'
               '<form class="search"><label>Search the docs</label></form></header>' %
               "".join('<option>%s</option>' % v for v in QS_VERSIONS),
        "foot": '<footer><p>Quillstack is an open source project. Documentation licensed under a Creative Commons licence. '
                'Found a problem? Open an issue in the tracker.</p></footer>',
        "meta": '<p class="edit">Edit this page. Last updated on %s by %s.</p>' % (h(doc["date"]), h(doc["author"])),
    }
    same = ctx["others"](doc, "quill", 30, rng, same_section=True)
    extras = [
        ("toc", ['<li class="toc-section">%s</li>' % h(s) for s in QS_SECTIONS[:5]]),
        ("toc", ['<li><a href="%s">%s</a></li>' % (h(o["url"]), h(o["title"])) for o in same]),
        ("after", ['<div class="feedback"><p>Was this page helpful? Let us know how we can improve the documentation.</p></div>',
                   '<nav class="prevnext"><a href="#">Previous: %s</a> <a href="#">Next: %s</a></nav>' % (
                       h(same[0]["title"]) if same else "Overview", h(same[1]["title"]) if len(same) > 1 else "Concepts"),
                   '<div class="community"><p>Join the community forum or the chat to ask questions and share what you have built.</p></div>']),
        ("toc", ['<li class="toc-section">%s</li>' % h(s) for s in QS_SECTIONS[5:]]),
        ("toc", ['<li><a href="%s">%s</a></li>' % (h(o["url"]), h(o["title"])) for o in ctx["others"](doc, "quill", 30, rng)]),
        ("onpage", ['<li>%s</li>' % h(x) for x in doc["headings"]] or ['<li>Overview</li>']),
    ]
    return base, extras


def qs_layout(doc, parts, body_html):
    toc = '<nav class="sidebar"><h3>Documentation</h3><ul>%s</ul></nav>' % parts.get("toc", "")
    onp = '<nav class="on-this-page"><h3>On this page</h3><ul>%s</ul></nav>' % parts["onpage"] if parts.get("onpage") else ""
    return '%s<div class="layout">%s<main><article class="doc">%s</article>%s%s</main>%s</div>%s' % (
        parts["top"], toc, body_html, parts["meta"], parts.get("after", ""), onp, parts["foot"])


# ---------------------------------------------------------------- hollowmere
HM_SIDEBARS = {
    "seminars": ["Seminar series", "Past seminars", "Visiting speakers", "Research groups", "Research facilities"],
    "study": ["Undergraduate study", "Postgraduate research", "Funded studentships", "Fees and funding", "How to apply", "Open days"],
}
HM_NEWS = ["Fieldwork team returns from the northern fells", "New flume laboratory opens in the Garrow Building",
           "Student wins poster prize at the national conference", "School welcomes three new lecturers", "Outreach week brings 400 pupils to campus"]


def hm_parts(doc, ctx, rng):
    base = {
        "top": '<header class="uni"><a href="/">Hollowmere University</a>%s</header><p class="dept">School of Earth Sciences</p>'
               '<nav class="breadcrumbs">Home &gt; Earth Sciences &gt; %s &gt; %s</nav>' % (
                   links([(x, "/" + slugish(x)) for x in ["Study", "Research", "About", "Alumni", "Library", "Staff intranet"]]),
                   h(doc["section"].capitalize()), h(doc["title"])),
        "foot": '<footer><p>Hollowmere University, Garrow Building, College Road, Hollowmere. '
                'The University is a registered charity. Accessibility, privacy and cookies information is available on the main website.</p></footer>',
    }
    ev = ctx["others"](doc, "hollowmere", 8, rng)
    extras = [
        ("side", ['<nav class="section-nav"><h3>%s</h3>%s</nav>' % (h(doc["section"].capitalize()),
                                                                    links([(x, "#") for x in HM_SIDEBARS.get(doc["section"], HM_SIDEBARS["study"])]))]),
        ("side", ['<div class="events"><h3>Upcoming events</h3><ul>%s</ul></div>' % "".join(
            '<li>%s <span>%s</span></li>' % (h(o["title"]), h(o["date"])) for o in ev[:4])]),
        ("after", ['<div class="news"><h3>School news</h3><ul>%s</ul></div>' % "".join('<li>%s</li>' % h(x) for x in rng.sample(HM_NEWS, 4))]),
        ("after", ['<div class="promo"><h3>Study with us</h3><p>Find out about our degrees in geology, environmental science and physical geography, '
                   'and book a place at the next open day.</p></div>',
                   '<div class="contact"><h3>Contact the School</h3><p>School office, Garrow Building, telephone 01632 960550. '
                   'The office is open from 9am to 4pm during term.</p></div>']),
        ("side", ['<div class="events"><h3>More events</h3><ul>%s</ul></div>' % "".join(
            '<li>%s <span>%s</span></li>' % (h(o["title"]), h(o["first"])) for o in ev[4:])]),
    ]
    return base, extras


def hm_layout(doc, parts, body_html):
    return '%s<div class="cols"><div class="sidebar">%s</div><div class="content">%s</div>%s</div>%s' % (
        parts["top"], parts.get("side", ""), body_html, parts.get("after", ""), parts["foot"])


# ---------------------------------------------------------------- bracken help
BK_CATS = [("Orders", "Track, change or cancel an order."), ("Delivery", "Delivery options, times and charges."),
           ("Returns", "Send something back and get a refund."), ("Payments", "Cards, vouchers and instalments."),
           ("Your account", "Passwords, addresses and preferences."), ("Products", "Care guides and product safety."),
           ("Assembly", "Instructions and assembly service."), ("Gift cards", "Buy, redeem and check balances.")]
BK_CHAT = ["Chat with us. Our team is online now and usually replies in under two minutes.",
           "Hi there! I am Bramble, the Bracken assistant. Ask me about orders, deliveries or returns.",
           "Need a hand? Start a chat and we will connect you with an adviser."]


def bk_parts(doc, ctx, rng):
    base = {
        "top": '<header><a href="/">Bracken Home and Garden</a> <span>Help Centre</span><form><label>How can we help?</label></form>%s</header>'
               '<nav class="crumbs">Help Centre &gt; %s</nav>' % (
                   links([(x, "#") for x in ["Shop", "Garden", "Home", "Sale", "Stores", "Sign in", "Basket"]]), h(doc["section"].capitalize())),
        "foot": '<footer><p>Bracken Home and Garden Ltd. Registered office: Unit 4, Fennick Business Park. '
                'Prices and offers are subject to availability. Terms and conditions apply.</p></footer>',
    }
    pop = ctx["others"](doc, "bracken", 10, rng)
    extras = [
        ("tiles", ['<div class="tile"><h3>%s</h3><p>%s</p></div>' % (h(a), h(b)) for a, b in BK_CATS]),
        ("side", ['<div class="popular"><h3>Popular articles</h3><ul>%s</ul></div>' % "".join('<li>%s</li>' % h(o["title"]) for o in pop[:5])]),
        ("after", ['<div class="chat-widget"><p>%s</p></div>' % h(rng.choice(BK_CHAT)),
                   '<div class="helpful"><p>Was this article helpful? Yes or No. 1,204 out of 1,390 found this helpful.</p></div>',
                   '<div class="promo"><p>Free delivery on orders over fifty pounds. Join Bracken Rewards and get ten per cent off your first order.</p></div>']),
        ("side", ['<div class="related"><h3>Related articles</h3><ul>%s</ul></div>' % "".join(
            '<li>%s <span>%s</span></li>' % (h(o["title"]), h(o["first"])) for o in pop[5:])]),
    ]
    return base, extras


def bk_layout(doc, parts, body_html):
    tiles = '<section class="tiles">%s</section>' % parts["tiles"] if parts.get("tiles") else ""
    return '%s%s<div class="article-wrap"><section class="article-body">%s</section><aside>%s</aside></div>%s%s' % (
        parts["top"], tiles, body_html, parts.get("side", ""), parts.get("after", ""), parts["foot"])


# ---------------------------------------------------------------- tinkerers forum
TK_OTHER_ANSWERS = [
    "I had something similar and it turned out to be a loose connector. Worth wiggling every cable while it runs.",
    "Have you tried a completely fresh profile? Old settings have a habit of surviving firmware updates.",
    "Not an answer, but I would love to know what you find. Same problem here since the spring.",
    "Check the official wiki, there is a long page about this with photos.",
    "Before anything else, post a photo. It is much easier to diagnose with a picture.",
    "For what it is worth, mine only did this in winter when the garage was cold.",
    "Replace the cheap part with a branded one. It costs a little more but it saves hours.",
    "I disagree with the accepted answer; in my case it was the power supply all along.",
]
TK_QCOMMENTS = ["Which firmware version are you on?", "Can you post a photo?", "Does it happen every time or only sometimes?",
                "What slicer or library are you using?", "Did this start after an update?", "Have you measured it with a meter?"]


def tk_parts(doc, ctx, rng):
    base = {
        "top": '<header><a href="/">Tinkerers Q&amp;A</a>%s</header>' % links([(x, "#") for x in ["Questions", "Tags", "Users", "Unanswered", "Ask a question"]]),
        "qmeta": '<div class="q-meta">Asked %s by %s. Viewed %s times.</div>' % (h(doc["date"]), h(doc["author"]), doc["views"]),
        "amark": '<div class="a-meta">Accepted answer. %s votes. Answered by %s.</div>' % (doc["votes"], h(doc["author2"])),
        "foot": '<footer><p>Site design and logo are trademarks of Tinkerers Q&amp;A. User contributions licensed under a Creative Commons licence.</p></footer>',
    }
    rel = ctx["others"](doc, "tinkerers", 10, rng)
    names = ctx["names"](rng, 8)
    extras = [
        ("qcomments", ['<li>%s - %s</li>' % (h(c), h(n)) for c, n in zip(rng.sample(TK_QCOMMENTS, 3), names)]),
        ("answers", ['<div class="answer"><p>%s</p><p class="sig">answered by %s</p></div>' % (h(a), h(n)) for a, n in zip(rng.sample(TK_OTHER_ANSWERS, 5), names[3:])]),
        ("side", ['<div class="related-q"><h3>Related questions</h3><ul>%s</ul></div>' % "".join('<li>%s</li>' % h(o["title"]) for o in rel[:6])]),
        ("side", ['<div class="welcome"><p>Welcome to Tinkerers Q&amp;A. Ask practical questions about making, fixing and building things. '
                  'Please search before asking and be kind to beginners.</p></div>',
                  '<div class="hot"><h3>Hot questions</h3><ul>%s</ul></div>' % "".join('<li>%s</li>' % h(o["title"]) for o in rel[6:])]),
    ]
    return base, extras


def tk_layout(doc, parts, body_html, q_html, a_html):
    qc = '<ul class="comments">%s</ul>' % parts["qcomments"] if parts.get("qcomments") else ""
    oth = '<section class="other-answers"><h3>Other answers</h3>%s</section>' % parts["answers"] if parts.get("answers") else ""
    return '%s<div class="main"><div class="question">%s%s%s</div><div class="answer accepted">%s%s</div>%s</div><aside>%s</aside>%s' % (
        parts["top"], q_html, parts["qmeta"], qc, parts["amark"], a_html, oth, parts.get("side", ""), parts["foot"])


# ---------------------------------------------------------------- railclub (legacy table layout)
RC_NEWS = ["The layout will be on show at the Brayford exhibition in the spring.", "Subscriptions are now due - please see the treasurer.",
           "Thanks to everyone who helped at the open day.", "The club library is open on Tuesday evenings.",
           "New members are always welcome, no experience needed.", "Photographs from the summer outing are in the gallery."]


def rc_parts(doc, ctx, rng):
    base = {
        "top": '<table width="100%%" border="0"><tr><td colspan="2" bgcolor="#003366"><font color="white" size="+2">Welcome to the Oldtown Railway Club</font>'
               '<br><font size="-1">Founded 1958 - model and full size railway enthusiasts</font></td></tr><tr><td width="160" valign="top" bgcolor="#ccccff">'
               '%s</td><td valign="top">' % links([(x, x.lower().replace(" ", "") + ".htm") for x in ["Home", "News", "Excursions", "Minutes", "Gallery", "Links", "Guestbook", "Contact"]]),
        "foot": '</td></tr><tr><td colspan="2" align="center"><font size="-2">Page last updated %s. Best viewed at 800 x 600. '
                'Webmaster: webmaster at oldtown-railclub.example.net. You are visitor number %d.</font></td></tr></table>' % (h(doc["date"]), doc["views"]),
    }
    extras = [
        ("news", ['<li>%s</li>' % h(x) for x in rng.sample(RC_NEWS, 5)]),
        ("links", ['<li>%s</li>' % h(x) for x in ["Wendle Valley Railway", "Saltmarsh Narrow Gauge Society", "Coldstream Signal Box Museum",
                                                  "Brayford Model Engineers", "Northfell Tramway Trust"]]),
        ("news", ['<li>Next club night: Tuesday at 7:30pm in the club room.</li>', '<li>Committee meets on the first Monday of the month.</li>']),
        ("links", ['<li>This site is a member of the Heritage Railways Webring. Previous site - Random site - Next site.</li>']),
    ]
    return base, extras


def rc_layout(doc, parts, body_html):
    side = ""
    if parts.get("news"):
        side += '<p><b>Club news</b></p><ul>%s</ul>' % parts["news"]
    if parts.get("links"):
        side += '<p><b>Other railways</b></p><ul>%s</ul>' % parts["links"]
    return '%s<table width="100%%"><tr><td valign="top">%s</td><td width="200" valign="top" bgcolor="#eeeeee">%s</td></tr></table>%s' % (
        parts["top"], body_html, side, parts["foot"])


# ---------------------------------------------------------------- light sites
def wire_parts(doc, ctx, rng):
    return {"top": '<header><a href="/">Southvale Newswire</a> <nav><a href="/">Latest</a> <a href="/regional">Regional</a></nav></header>'
                   '<p class="dateline">Filed %s</p>' % h(doc["date"]),
            "foot": '<footer><p>Southvale Newswire. Syndicated content.</p></footer>'}, []


def wire_layout(doc, parts, body_html):
    return '%s<article class="story">%s</article>%s' % (parts["top"], body_html, parts["foot"])


def mn_parts(doc, ctx, rng):
    return {"top": '<header><a href="/">Mirelle\'s Notes</a></header><p class="posted">Posted on %s</p>' % h(doc["date"]),
            "foot": '<footer><p>Written by Mirelle. <a href="/posts/">All posts</a></p></footer>'}, []


def mn_layout(doc, parts, body_html):
    return '%s<div class="post">%s</div>%s' % (parts["top"], body_html, parts["foot"])


PARTS = dict(riverton=rv_parts, herald=hd_parts, quill=qs_parts, hollowmere=hm_parts, bracken=bk_parts, tinkerers=tk_parts,
             railclub=rc_parts, wire=wire_parts, mirelle=mn_parts)
LAYOUT = dict(riverton=rv_layout, herald=hd_layout, quill=qs_layout, hollowmere=hm_layout, bracken=bk_layout,
              railclub=rc_layout, wire=wire_layout, mirelle=mn_layout)


# ---------------------------------------------------------------- fat footers (site maps), hand-written labels
SITEMAP = {
    "riverton": ["Adult social care", "Births, deaths and marriages", "Business rates", "Children and families", "Community safety", "Councillors and committees",
                 "Elections and voting", "Emergency planning", "Environmental health", "Food safety", "Housing benefit", "Libraries and archives",
                 "Markets", "Noise complaints", "Open data", "Parks and allotments", "Public toilets", "Schools and admissions", "Street cleaning",
                 "Tourism", "Trading standards", "Transparency", "Volunteering", "Youth services"],
    "herald": ["Breaking news", "Council", "Courts", "Education", "Health", "Environment", "Transport", "Business news", "Property", "Motoring",
               "Football", "Cricket", "Rugby", "Letters", "Columnists", "Nostalgia", "Weddings", "Family notices", "Puzzles", "Travel",
               "Food and drink", "Reader offers", "Subscribe", "Digital edition"],
    "quill": ["Quickstart", "Install on Linux", "Install with containers", "Architecture overview", "Tenants", "Storage engines", "Replication",
              "Backups", "Monitoring", "Alerting", "Upgrades", "Capacity planning", "TLS and certificates", "Access control", "Audit logging",
              "REST API", "Client libraries", "CLI reference", "Plugins", "Glossary", "Support policy", "Security advisories", "Contributing", "Code of conduct"],
    "hollowmere": ["Undergraduate courses", "Masters courses", "Research degrees", "International students", "Scholarships", "Accommodation",
                   "Student support", "Careers service", "Research themes", "Research centres", "Publications", "Impact case studies",
                   "Laboratories", "Field stations", "Rock and fossil collection", "Staff directory", "Vacancies", "Visiting us",
                   "Maps and directions", "Alumni network", "Giving to Hollowmere", "Schools outreach", "Public lectures", "Equality and diversity"],
    "bracken": ["Track my order", "Delivery charges", "Click and collect", "Assembly service", "Price promise", "Product recalls", "Care guides",
                "Garden furniture covers", "Bedding size guide", "Rug size guide", "Paint calculator", "Gift cards", "Bracken Rewards",
                "Student discount", "Store finder", "Store opening times", "Careers", "Modern slavery statement", "Sustainability",
                "Terms of sale", "Cookie settings", "Accessibility", "Contact us", "Feedback"],
    "tinkerers": ["3d-printing", "electronics", "woodworking", "metalwork", "repair", "sewing", "cnc", "laser-cutting", "raspberry-pi",
                  "microcontrollers", "soldering", "power-supplies", "tools", "materials", "safety", "beginners", "Tour", "Help centre",
                  "Meta", "Moderators", "Badges", "Privileges", "Blog", "Contact"],
    "railclub": ["History of the club", "Layout photos", "Members area", "Meetings list", "Committee", "Model locomotives", "Rolling stock",
                 "Signalling", "Track plans", "Old newsletters", "Club library list", "For sale and wanted", "How to find us", "Join the club",
                 "Open day", "Exhibition", "Junior section", "Garden railway", "Photo competition", "Guestbook archive", "Webring", "Email us",
                 "Links page", "Site map"],
}


def fat_footer(site, doc, ctx, rng):
    """Extra template fragments shared by all heavy sites: site map chunks and
    'you may also like' teasers quoting other pages' first sentences."""
    if site not in SITEMAP:
        return []
    labels = list(SITEMAP[site])
    rng.shuffle(labels)
    frags = ['<ul class="sitemap">%s</ul>' % "".join('<li><a href="/%s">%s</a></li>' % (slugish(x), h(x)) for x in labels[i:i + 6])
             for i in range(0, len(labels), 6)]
    more = ctx["others"](doc, site, 16, rng)
    teas = ['<div class="also"><a href="%s">%s</a><p>%s</p></div>' % (h(o["url"]), h(o["title"]), h(o["first"])) for o in more]
    out = []
    for i in range(max(len(frags), len(teas))):
        if i < len(teas):
            out.append(teas[i])
        if i < len(frags):
            out.append(frags[i])
    return out
