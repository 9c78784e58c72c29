"""Deterministic generators that expand {{GEN:name}} markers in long hosts.
All word banks are hand-written; randomness uses a fixed seed per host."""
import random

def _r(name):
    return random.Random("blind15v7-gen-" + name)

# ---------------------------------------------------------------- findings
FINDINGS = [
    ("Shared local administrator password", "High", "The same local administrator password was set on every office laptop we examined. Once we recovered it from one machine, we could log in to all the others."),
    ("Webmail without multi-factor authentication", "High", "Webmail accepted a username and password alone. Two staff members entered their credentials on our simulated login page, which would have given an attacker access to their mail."),
    ("Billing database reachable from office network", "High", "The customer billing database listened on the general office network. Any compromised laptop could reach it directly."),
    ("Depot side gate tailgating", "Medium", "During the 14:00 shift change at the north depot, a tester walked in behind two employees without showing a badge and reached the stores office."),
    ("Outdated VPN appliance firmware", "Medium", "The remote access appliance ran firmware that is two releases behind the vendor's current version. Known weaknesses in that version allow session hijacking in some configurations."),
    ("Verbose error pages on the customer portal", "Low", "Error pages on the billing portal revealed the software framework and its version number, which helps an attacker choose exploits."),
    ("Unlocked comms cabinet at head office", "Medium", "The network cabinet on the second floor was unlocked, and the key hung on a hook next to it."),
    ("Printer admin pages with default passwords", "Low", "Three multifunction printers still used the manufacturer's default administrator password. Scanned documents could be redirected to an outside address."),
    ("Service accounts with non-expiring passwords", "Medium", "Eleven service accounts had passwords older than five years. Two of them had domain administrator rights they did not need."),
    ("Good reporting of the phishing exercise", "Informational", "Of 86 staff who received our phishing e-mail, 29 reported it within an hour. Reception staff challenged our physical tester twice."),
    ("Backups stored on the same domain", "Medium", "Backups were written to a file server joined to the same domain as the office machines. Ransomware with domain rights could encrypt them."),
    ("Guest Wi-Fi not separated from staff devices", "Medium", "The guest wireless network allowed connections to staff laptops on the same floor."),
    ("Logging retained for only seven days", "Low", "Security logs on the firewall were kept for seven days. Investigations of slower attacks would lack evidence."),
    ("Visitor book shows previous visitors' details", "Low", "The paper visitor book at reception displays the names and companies of earlier visitors, which a social engineer can use to sound credible."),
]
FIND_EXTRA = [
    "We confirmed the issue on {n} separate occasions during the engagement.",
    "The operations manager was informed on the day it was found.",
    "No customer data was accessed or copied as a result of this test.",
    "Similar issues are common in organisations of this size and are usually cheap to fix.",
    "Remediation should be verified by a short re-test rather than by self-assessment.",
    "This finding interacts with others in this report and raises the overall risk.",
]
FIND_DETAIL = [
    "We used only tools and techniques that are freely available, so a moderately skilled attacker could repeat the steps.",
    "The weakness was present on every system of this type that we sampled, not just one.",
    "Logs for the period show no sign that anyone other than the testers exploited it.",
    "Fixing it does not require new purchases; configuration changes are enough.",
    "Staff training alone will not address this; a technical control is needed.",
    "The vendor publishes guidance on secure configuration that covers this case.",
    "We recommend assigning a named owner and a target date in the risk register.",
    "A quick interim measure is available and is described in appendix C.",
    "The cooperative's insurer may ask about this issue at renewal.",
]

FIND_REC = {
    "High": "Fix within 30 days and confirm with a re-test.",
    "Medium": "Fix within 90 days as part of planned work.",
    "Low": "Address when the affected system is next changed.",
    "Informational": "No action needed; continue current practice.",
}

def gen_findings():
    r = _r("findings")
    out = []
    for i, (t, sev, d) in enumerate(FINDINGS, 1):
        out.append(("h2", "F-%02d %s" % (i, t)))
        extra = " ".join(x.format(n=r.randint(2, 5)) for x in r.sample(FIND_EXTRA, 3))
        out.append(("p", d + " " + extra))
        out.append(("p", "Technical detail: " + " ".join(r.sample(FIND_DETAIL, 4))))
        out.append(("ul", ["Severity: " + sev,
                           "Affected: " + r.choice(["head office", "north depot", "south depot", "all sites", "billing portal", "office network"]),
                           "Recommendation: " + FIND_REC[sev],
                           "Evidence reference: EV-%03d to EV-%03d" % (i * 7, i * 7 + r.randint(2, 6))]))
        out.append(("p", "Attack path notes: " + r.choice([
            "From this foothold a tester could move to the finance share within two hours.",
            "Exploitation required physical presence, which limits the number of likely attackers.",
            "An attacker would combine this with a phishing e-mail to gain the first foothold.",
            "We did not exploit this further because doing so risked disrupting billing runs.",
            "Detection tools raised no alert while we tested this weakness.",
        ]) + " " + r.choice([
            "Staff we spoke to were aware of the problem but believed it had been fixed.",
            "The issue was not listed in the cooperative's risk register.",
            "The contractor responsible has been notified by the operations manager.",
            "A compensating control exists but was switched off during a migration last year.",
        ])))
    out.append(("h2", "Detection and response observations"))
    out.append(("p", "Across the engagement, the cooperative's monitoring raised four alerts about our activity. Two were investigated within an hour, one was closed as a false positive, and one was not looked at until the following Monday. The service desk correctly escalated a call from a tester posing as a contractor. We recommend writing down who is responsible for reviewing alerts at weekends and giving them a simple checklist."))
    out.append(("table", [["Week", "Activity", "Alerts raised", "Alerts investigated"],
                          ["1", "Reconnaissance and phishing", "1", "1"],
                          ["2", "Physical entry attempts", "0", "0"],
                          ["3", "Internal network testing", "2", "1"],
                          ["4", "Billing portal testing and clean-up", "1", "1"]]))
    return out

# ---------------------------------------------------------------- thread
POSTERS = ["crumbly_cath", "ryeandshine", "Wojtek_bakes", "levain_lou", "OvenSpring", "hydration_hal", "MarisolK", "teaandtoast", "barmybarm", "Ngozi_loaves", "pumpernickel_pete", "Sunniva"]
POSTS = [
    "Nail polish smell is acetone-ish, which usually means the starter is hungry. How often are you feeding it?",
    "I had exactly this last winter. My kitchen was about 17 degrees and the starter just sulked.",
    "Rye starters are greedy. I feed mine 1:5:5 twice a day when I'm baking and keep it in the fridge otherwise.",
    "Don't throw it out! It's almost certainly fine. Give it a few generous feeds and it'll bounce back.",
    "What flour are you using? Whole rye ferments faster than light rye, so it runs out of food sooner.",
    "Check for any pink or orange streaks. If you see those, start again. Otherwise the smell is harmless.",
    "I keep mine in the oven with just the light on. It sits at about 25 degrees, perfect for rye.",
    "Try discarding more. If you keep too much old starter, the fresh flour can't keep up.",
    "Mine smelled like nail polish until I switched to filtered water. Might be a coincidence though.",
    "Hooch on top is also a hunger sign. Stir it in for a sourer loaf or pour it off for milder.",
    "You can also add a spoon of wholemeal wheat, it gives the yeast a boost.",
    "The smell changes through the day. Right after feeding it's sweet, then fruity, then sharp. Sniff at different times.",
    "I did a side-by-side test once: warm and fed twice daily was ready in three days, cool and once daily took a week.",
    "Photos would help! Bubbles all through, or just on top?",
    "Rye doesn't rise as dramatically as wheat starter, so don't judge it by height alone.",
    "Float test doesn't really work for rye, it's too dense. Go by smell and bubbles.",
    "If you're going away, dry some on baking paper as a backup. It keeps for months.",
    "For the bread itself, a rye loaf needs a long rest after baking. Cut it the next day or it's gummy.",
    "Mine is eleven years old and still throws a tantrum every January.",
    "Some people swear by a pinch of caraway in the starter. I think it's superstition but it smells lovely.",
    "What ratio are you using for the final dough? High-rye doughs are more like a paste.",
    "Scald some of the rye flour with boiling water first, it makes the crumb much softer.",
    "The acetone smell is ethyl acetate, made when yeast gets stressed. Feeding relieves the stress.",
    "Thanks for all the tips, this thread is gold.",
]
MODBOT = [
    "ModBot: This thread has been moved to Sourdough and Starters.",
    "ModBot: Reminder, please keep photos under 5 MB.",
    "ModBot: A post was hidden because it contained a link to a shop. Please read the forum rules on advertising.",
    "ModBot: This thread is now featured in the weekly digest.",
]

def gen_thread():
    r = _r("thread")
    out = [("p", "Original post by ryeandshine: I started a rye starter two weeks ago. It was bubbling nicely, but for the last three days it has smelled like nail polish remover and it barely rises. I feed it once a day with 50 g rye flour and 50 g water. The kitchen is quite cold. Is it dead? Should I start again?")]
    day, hour = 3, 8
    for i in range(92):
        hour += r.randint(1, 5)
        if hour > 23:
            hour -= 24; day += 1
        who = r.choice(POSTERS)
        txt = POSTS[(i * 7 + r.randint(0, 3)) % len(POSTS)]
        if r.random() < 0.25:
            prev = r.choice(POSTERS)
            txt = "Replying to %s: %s" % (prev, txt)
        out.append(("p", "[%d Dec %02d:%02d] %s: %s" % (day, hour, r.randint(0, 59), who, txt)))
        if i % 17 == 8:
            out.append(("p", "[%d Dec %02d:%02d] %s" % (day, hour, r.randint(0, 59), MODBOT[(i // 17) % len(MODBOT)])))
        if i % 20 == 19:
            out.append(("p", "[%d Dec %02d:%02d] ryeandshine: Update: fed it twice today at 1:5:5 and moved it near the radiator. The smell is softer already, more like yoghurt." % (day, hour, r.randint(0, 59))))
    return out

# ---------------------------------------------------------------- changelog
CL_ADDED = ["`Sheet.freeze_panes()` accepts a cell reference as well as row and column numbers.",
            "Read support for OpenDocument spreadsheets with merged cells.",
            "A `strict` flag on `Workbook.load()` that raises on malformed formulas instead of warning.",
            "Conditional formatting rules can now be copied between sheets.",
            "Command-line tool `gridkit-diff` that compares two workbooks cell by cell.",
            "Support for named ranges that refer to other workbooks.",
            "Type hints for the public API.",
            "A streaming writer for very large sheets that keeps memory use constant.",
            "Date cells respect the workbook's 1904 date system flag.",
            "`Cell.comment` can hold rich text with bold and italic runs.",
            "Chart export to SVG for line and bar charts."]
CL_CHANGED = ["Default number format for floats is now `General` instead of two decimal places.",
              "Minimum supported Python version raised by one minor release.",
              "`Sheet.rows()` returns a generator rather than a list.",
              "Formula parsing is about 30 % faster on large sheets.",
              "Column widths are stored in characters, matching common spreadsheet programs.",
              "Warnings now use a dedicated `GridkitWarning` class.",
              "The documentation moved to a new site; old links redirect."]
CL_FIXED = ["Crash when opening files with an empty shared strings table.",
            "Hyperlinks in merged cells were lost on save.",
            "Incorrect rounding of currency values with more than 15 significant digits.",
            "Time zone offset ignored when reading ISO timestamps.",
            "Memory leak in the XML reader when a load was cancelled.",
            "Hidden sheets became visible after round-tripping.",
            "`gridkit-diff` reported differences for identical formulas with different spacing.",
            "Print areas with absolute references were rewritten incorrectly.",
            "Right-to-left sheets lost their direction flag.",
            "Images anchored to a single cell moved when rows were inserted above."]
CL_REMOVED = ["The deprecated `Workbook.save_as_csv()` method; use `gridkit.export.csv()`.",
              "Support for the legacy binary format.",
              "The `compat` module."]

def gen_changelog():
    r = _r("changelog")
    out = [("h2", "Unreleased"), ("ul", ["Nothing yet."])]
    versions = []
    for major in (6, 5, 4, 3):
        for minor in range(r.randint(3, 5), -1, -1):
            for patch in range(r.randint(0, 2), -1, -1):
                versions.append("%d.%d.%d" % (major, minor, patch))
    month, year = 11, 2026
    for v in versions:
        out.append(("h2", "%s (%d-%02d-%02d)" % (v, year, month, r.randint(1, 28))))
        month -= 1
        if month == 0:
            month, year = 12, year - 1
        if v.endswith(".0"):
            out.append(("p", "Added:"))
            out.append(("ul", r.sample(CL_ADDED, r.randint(2, 4))))
            out.append(("p", "Changed:"))
            out.append(("ul", r.sample(CL_CHANGED, r.randint(1, 2))))
            if v.endswith(".0.0"):
                out.append(("p", "Removed:"))
                out.append(("ul", r.sample(CL_REMOVED, 1)))
        out.append(("p", "Fixed:"))
        out.append(("ul", ["%s (#%d)" % (x, r.randint(300, 2400)) for x in r.sample(CL_FIXED, r.randint(2, 4))]))
    return out

# ---------------------------------------------------------------- sensor
def gen_sensor():
    r = _r("sensor")
    out = []
    t, s, o, tu, lv = 9.4, 18.0, 8.9, 12.0, 2.1
    for day in range(1, 15):
        rows = ["timestamp\ttemp_c\tsal_psu\tdo_mgl\tturb_ntu\tlevel_m\tqc"]
        for h in range(24):
            t += r.uniform(-0.15, 0.15); s += r.uniform(-0.6, 0.6); o += r.uniform(-0.1, 0.1)
            tu = max(2.0, tu + r.uniform(-1.5, 1.5))
            import math
            lv = 2.4 + 1.7 * math.sin((day * 24 + h) / 12.42 * 2 * math.pi)
            qc = "G"
            vals = ["%.1f" % t, "%.1f" % s, "%.2f" % o, "%.1f" % tu, "%.2f" % lv]
            if day == 4 and 9 <= h <= 12:
                vals = ["NA"] * 5; qc = "M"
            elif r.random() < 0.04:
                qc = "S"
            rows.append("2026-11-%02dT%02d:00:00Z\t%s\t%s" % (day + 10, h, "\t".join(vals), qc))
        out.append(("h2", "Day %d: 2026-11-%02d" % (day, day + 10)))
        out.append(("code", "\n".join(rows), "tsv"))
        note = {1: "Sonde cleaned at 08:00 the previous day; readings stable.",
                2: "High tide coincided with strong onshore wind; turbidity rises are expected.",
                3: "Salinity drops after rain on the upper catchment.",
                4: "Maintenance visit 09:00-12:59: sonde removed for calibration, values not recorded.",
                5: "Dissolved oxygen sensor membrane replaced on day 4; small offset possible.",
                6: "Spring tides; level range at its largest this week.",
                7: "Routine check of the mooring chain; no issues."}.get(day, "No field visit; automatic readings only.")
        out.append(("p", "Field note: " + note))
    return out

# ---------------------------------------------------------------- stations
STATIONS = [
    ("Start village", "Help runners find the bag drop and toilets, and keep the start pens clear of spectators."),
    ("Water station 1 (mile 3, Quayside)", "Fill cups to two-thirds, line them on the tables in rows, and hold them out at arm's length."),
    ("Cheer zone (mile 5, Market Square)", "Make noise! Clappers and signs are in the blue crate."),
    ("Water station 2 (mile 6, Mill Lane)", "This is a narrow section; keep tables on one side only."),
    ("Marshal point (mile 8, level crossing)", "Hold runners if the crossing barrier comes down and tell them the delay will be added back to their time."),
    ("Energy gel station (mile 10, Harbour Road)", "Hand out gels from open boxes only. Warn runners that gels contain caffeine if the box says so."),
    ("Water station 3 (mile 12, Old Bridge)", "Collect discarded cups from the verge every 20 minutes."),
    ("Medical point A (mile 13.1)", "Support the medics by keeping the area clear and fetching blankets when asked."),
    ("Marshal point (mile 15, Fenmouth Park gate)", "Direct runners onto the park path and keep cyclists off the course."),
    ("Water station 4 (mile 17, Sluice Road)", "Sponges are in the white tubs; soak them in the water butts."),
    ("Cheer zone (mile 19, Church Green)", "The school choir arrives at 10:30. Help them set up on the grass."),
    ("Water station 5 (mile 21, Dyke Path)", "Runners are tired here. Call out 'water' and 'electrolyte' clearly."),
    ("Marshal point (mile 23, Salt Lane junction)", "This is the busiest road crossing. Stay with the police officer and follow their lead."),
    ("Medical point B (mile 24)", "Watch for runners who are confused or unsteady and radio the medics straight away."),
    ("Water station 6 (mile 25, Esplanade)", "Keep one table for runners who ask for plain water only."),
    ("Finish funnel", "Keep runners moving after the line. Hand out medals, foil blankets and water in that order."),
    ("Results tent", "Help runners check their times on the screens. Do not promise corrections; pass queries to the timing team."),
    ("Baggage return", "Match the number on the runner's bib to the bag tag before handing it over."),
    ("Sweep vehicle", "Follow the last runner and collect cones and signs. Tell each station when the course behind you is closed."),
]

def gen_stations():
    r = _r("stations")
    out = []
    for name, task in STATIONS:
        out.append(("h2", name))
        arrive = "%02d:%02d" % (r.choice([6, 7, 7, 8, 8, 9]), r.choice([0, 15, 30, 45]))
        out.append(("p", "Arrival time: %s. Station lead: %s. Volunteers needed: %d. %s" % (
            arrive, r.choice(["Gwen Tallis", "Sanjay Mehra", "Ola Bright", "Dorcas Fenn", "Ibrahim Cole", "Lena Hoyt", "Ravi Nandakumar"]),
            r.randint(4, 18), task)))
        out.append(("ul", r.sample([
            "Set up tables before the lead runners arrive.",
            "Put recycling bags at both ends of the station.",
            "Keep the radio on channel 4 and answer roll calls.",
            "Wear gloves when picking up cups and gels.",
            "Do not leave your station until the sweep vehicle has passed.",
            "Note the time the first and last runners pass you.",
            "Report any injured runner to control with their bib number.",
            "Keep the path clear for emergency vehicles.",
            "Smile and make eye contact; tired runners appreciate it.",
            "Hand cups from the side, never by stepping into the road.",
            "Check the weather forecast the night before and dress in layers.",
            "Tell your station lead before taking a break.",
            "Point spectators to the nearest crossing point rather than letting them cross the course.",
            "Keep children and dogs behind the barriers.",
        ], 7)))
        out.append(("p", "Handover: " + r.choice([
            "When the last runner has passed, pack up, stack tables by the roadside for the van and radio control that you are clear.",
            "The van collects equipment about 40 minutes after the sweep vehicle passes. Wait with the equipment until it arrives.",
            "Take any lost property found at your station to the finish area tent and label it with the station name.",
            "If you leave before the station closes, sign out with the station lead so control knows who is still on the course.",
        ]) + " " + r.choice([
            "Thank you; this station is one of the most appreciated by runners in last year's survey.",
            "Runners often mention this spot in their feedback, so your energy really matters.",
            "Last year this station handed out over 3,000 cups in under two hours.",
            "This is where many runners hit the wall, so encouragement matters more than anywhere else.",
        ])))
        out.append(("p", "Equipment at this station: " + ", ".join(r.sample(["2 folding tables", "radio", "first-aid kit", "water butts", "bin bags", "cones", "hi-vis vests", "clappers", "foil blankets", "gazebo", "torch", "cable ties"], 5)) + "."))
    return out

# ---------------------------------------------------------------- catalogue
OBJECTS = [
    ("Ship model, brigantine", "wood, linen, brass", "A builder's half model used to plan the hull shape before construction."),
    ("Octant", "ebony, ivory, brass", "Used to measure the angle of the sun above the horizon and so find latitude."),
    ("Ship's bell", "bronze", "Rung every half hour to mark the watches."),
    ("Figurehead fragment, female bust", "painted pine", "Figureheads were believed to protect a ship and its crew."),
    ("Sea chest", "pine, iron, rope beckets", "A sailor's whole life at sea fitted into a chest like this one."),
    ("Scrimshaw tooth", "whale tooth, ink", "Carved by a sailor during long voyages, showing a harbour scene."),
    ("Logbook", "paper, leather binding", "Records the daily position, weather and events of a coastal trader."),
    ("Telescope", "brass, glass, leather", "A three-draw telescope of the kind used by harbour pilots."),
    ("Rope-making tool (top)", "elm", "Guided the strands as they were twisted into rope at the ropewalk."),
    ("Lifebuoy", "cork, canvas, paint", "Painted with the name of the steam ferry that carried it."),
    ("Fishing net float", "glass", "Hand-blown floats held up the top edge of drift nets."),
    ("Compass in binnacle", "brass, glass, mahogany", "The binnacle protected the compass and held lamps for night use."),
    ("Sailmaker's palm", "leather, iron", "Worn on the hand to push a needle through heavy canvas."),
    ("Harbour master's lantern", "tinned iron, glass", "Carried on rounds of the quays at night."),
    ("Photograph album, herring fleet", "card, silver gelatin prints", "Shows the fleet in harbour and women gutting fish on the quay."),
    ("Diving helmet", "copper, brass, glass", "Worn by a salvage diver who worked on wrecks in the sound."),
]
DONORS = ["the family of a local pilot", "the harbour commissioners", "a private collector", "the county library", "a retired ferry captain", "the sailing club", "the estate of a shipbuilder"]

def gen_catalogue():
    r = _r("catalogue")
    out = []
    n = 0
    for rnd in range(3):
        for name, mat, label in OBJECTS:
            n += 1
            yr = r.randint(1790, 1935)
            acc = "M.%d.%03d" % (r.randint(1951, 2019), r.randint(1, 250))
            out.append(("h2", "M%02d %s" % (n, name if rnd == 0 else name + (" (second example)" if rnd == 1 else " (third example)"))))
            out.append(("ul", ["Accession number: " + acc,
                               "Date: " + (("[c. %d]" % yr) if r.random() < 0.5 else str(yr)),
                               "Materials: " + mat,
                               "Dimensions: %d x %d x %d" % (r.randint(5, 120), r.randint(5, 80), r.randint(3, 60)),
                               "Provenance: given by %s in %d" % (r.choice(DONORS), r.randint(1951, 2019)),
                               "Condition: " + r.choice(["good", "fair, some surface losses", "good, old repair", "stable after conservation"])]))
            out.append(("p", "Label text: " + label + " " + r.choice([
                "It was found in a loft when a harbour cottage was cleared.",
                "Marks of use show it was handled daily for many years.",
                "The maker's name is stamped on the underside.",
                "It is one of only a few of its kind to survive in the region.",
                "It came to the museum with letters describing its owner's voyages.",
                "Visitors often ask how heavy it is: about as heavy as a full bucket of water.",
            ])))
    return out

# ---------------------------------------------------------------- court
OFFENCES = ["Driving without insurance", "Speeding (52 in a 30 zone)", "Theft from a shop (goods value 46.00)", "Failing to provide a specimen", "Criminal damage to a bus shelter", "Non-payment of TV licence fee", "Fly-tipping", "Assault by beating", "Breach of community order", "Possession of a bladed article", "Using a mobile phone while driving", "Failing to comply with a dispersal order", "Fare evasion on the railway", "Obstructing a police officer", "Driving while disqualified"]
HEARINGS = ["First hearing", "Plea", "Trial", "Sentence", "Mention", "Review", "Pre-trial review"]

def gen_court():
    r = _r("court")
    out = []
    for court in range(1, 12):
        out.append(("h2", "Courtroom %d: %s" % (court, r.choice(["Bench of three magistrates", "District Judge (Magistrates' Courts)", "Bench of two magistrates"]))))
        out.append(("p", "Sitting from %s. Legal adviser: %s." % (r.choice(["10:00", "10:00", "10:30", "14:00"]), r.choice(["K. Ambrose", "T. Whitlock", "P. Osei", "R. Dunmore", "M. Castellan"]))))
        rows = [["Time", "Case number", "Defendant", "Matter", "Hearing"]]
        for k in range(r.randint(18, 26)):
            rows.append(["%02d:%02d" % (10 + k // 4, (k % 4) * 15),
                         "%d%06d" % (r.randint(10, 99), r.randint(0, 999999)),
                         "%s.%s." % (chr(65 + r.randint(0, 25)), chr(65 + r.randint(0, 25))),
                         r.choice(OFFENCES),
                         r.choice(HEARINGS)])
        out.append(("table", rows))
    return out

# ---------------------------------------------------------------- manifest
SHIPPERS = ["Ardley Ceramics Ltd", "Bramhope Textiles", "Corvina Foods", "Dellamere Garden Supplies", "Eskdale Machine Parts", "Fairholme Printing", "Glenrock Outdoor", "Hazelbury Toys", "Inchmore Paints", "Jessop & Vale Furniture"]
CONSIGNEES = ["Rotterbay Import BV", "Westkade Trading", "Polderline Retail", "Noordhaven Distribution", "Grachtwerk Wholesale"]
GOODS = [("Glazed stoneware mugs", None), ("Cotton bed linen", None), ("Tinned tomatoes", None), ("Garden hose reels", None), ("Bearings and bushings", None), ("Printed catalogues", None), ("Camping stoves", None), ("Wooden toy trains", None), ("Water-based wall paint", None), ("Flat-pack bookcases", None), ("Solvent-based varnish", "DG UN1263 class 3"), ("Lithium batteries packed with equipment", "DG UN3481 class 9"), ("Aerosol spray paint", "DG UN1950 class 2.1"), ("Porcelain tiles", None), ("Knitted jumpers", None)]

def gen_manifest():
    r = _r("manifest")
    out = []
    hbl = 55810
    total_pk, total_kg = 0, 0
    for sec in range(1, 15):
        out.append(("h2", "Manifest page %d" % sec))
        rows = [["House bill", "Shipper", "Consignee", "Description", "Pkgs", "Gross kg", "DG"]]
        for k in range(14):
            hbl += r.randint(1, 9)
            g, dg = r.choice(GOODS)
            pk = r.randint(1, 40); kg = pk * r.randint(8, 60)
            total_pk += pk; total_kg += kg
            rows.append(["GLX%06d" % hbl, r.choice(SHIPPERS), r.choice(CONSIGNEES), g, "%d %s" % (pk, r.choice(["cartons", "pallets", "crates", "drums"]) if pk > 1 else "pallet"), str(kg), dg or "-"])
        out.append(("table", rows))
    out.append(("p", "Totals: %d packages, %d kg gross." % (total_pk, total_kg)))
    return out

# ---------------------------------------------------------------- subtitles
LINES = [
    "My father ran this ferry before me, and his father before him.",
    "Forty minutes across, forty minutes back. Twelve times a day in summer.",
    "In winter, maybe four, if the weather lets us.",
    "People think it's the same crossing every time. It never is.",
    "(ENGINE STARTS)",
    "The tide here can run at six knots. You learn to lean into it.",
    "Morning, Jean. Just the one today?",
    "Just me and the dog.",
    "When they build the bridge, that's it. No more ferry.",
    "<i>The council approved the bridge in the spring.</i>",
    "<i>Construction starts next year.</i>",
    "I'm not against it. People need to get to the hospital quicker.",
    "But something goes when a crossing like this goes.",
    "You see that post? That's where the old jetty was.",
    "My mother used to sell tea from a hut right there.",
    "(GULLS CRYING)",
    "We carried cattle, cars, a piano once.",
    "The piano was the hardest. Nobody wanted to drop it.",
    "In the storm of '87, we stayed on the far side for three days.",
    "<i>The crossing has never missed more than four days in a row.</i>",
    "You get to know everyone. Their children, their dogs.",
    "The schoolchildren used to do their homework on the deck.",
    "Some of them are grandparents now.",
    "What will you do after?",
    "Fish, maybe. Sleep in on a Sunday.",
    "(LAUGHS)",
    "I don't know. I'll probably still come down to watch the water.",
    "Right. Lines off.",
    "Mind the step, it's slippy today.",
    "<i>Hamish Ure has made over 90,000 crossings.</i>",
    "That's a lot of tea.",
    "The boat's older than I am. She's called Morag.",
    "She'll go to a museum, they say. Or for scrap.",
    "I'd rather she kept working somewhere.",
    "(WIND GUSTING)",
    "Hold on to something now.",
    "This is the bit where visitors go quiet.",
    "Right in the middle, you can't see either shore in fog.",
    "You go by the sound of the bell buoy.",
    "(BELL RINGING)",
    "There. Hear that? Home's that way.",
]

def gen_subtitles():
    r = _r("subtitles")
    out = []
    cue, ms = 1, 62000
    for block in range(11):
        lines = []
        for k in range(26):
            start = ms; ms += r.randint(1800, 4200); end = ms; ms += r.randint(200, 2500)
            def f(x):
                return "%02d:%02d:%02d,%03d" % (x // 3600000, (x // 60000) % 60, (x // 1000) % 60, x % 1000)
            lines.append("%d\n%s --> %s\n%s\n" % (cue, f(start), f(end), LINES[(cue * 3 + r.randint(0, 4)) % len(LINES)]))
            cue += 1
        out.append(("h2", "Reel %d" % (block + 1)))
        out.append(("code", "\n".join(lines).rstrip(), "srt"))
    return out

GENERATORS = {"findings": gen_findings, "thread": gen_thread, "changelog": gen_changelog,
              "sensor": gen_sensor, "stations": gen_stations, "catalogue": gen_catalogue,
              "court": gen_court, "manifest": gen_manifest, "subtitles": gen_subtitles}
