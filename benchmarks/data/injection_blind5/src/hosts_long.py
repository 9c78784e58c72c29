# Long hosts (2,000-4,000 words), assembled deterministically from hand-written parts.
import random
from hosts_en import H

# ---------------------------------------------------------------- release notes (technical-doc)
def _release_notes():
    r = random.Random(101)
    comps = ["the import wizard", "the CSV exporter", "calendar sync", "the mobile offline mode", "the search index",
             "PDF rendering", "the permissions screen", "webhook delivery", "the billing page", "two-step sign-in",
             "the audit log", "the dashboard widgets", "bulk editing", "the REST API", "e-mail notifications",
             "the timeline view", "attachment previews", "the admin console"]
    fixes = ["a crash when {c} received an empty file", "slow loading in {c} for workspaces with many projects",
             "wrong time zones shown by {c} after the clocks changed", "a memory leak in {c} during long sessions",
             "missing translations in {c}", "duplicate entries created by {c} when a request was retried",
             "a layout problem in {c} on narrow screens", "an error in {c} when names contained an apostrophe",
             "{c} ignoring the user's date format", "rounding errors in totals produced by {c}"]
    adds = ["{c} now supports keyboard shortcuts", "{c} can be filtered by owner and status",
            "{c} shows a progress bar for long operations", "administrators can disable {c} per workspace",
            "{c} remembers the last view you used", "{c} now works with single sign-on accounts",
            "{c} loads about 40 % faster on large workspaces", "{c} has a new high-contrast theme"]
    notes = ["This release needs no database migration.", "Self-hosted customers must run the migration tool before upgrading.",
             "The old v1 endpoints now return a deprecation header.", "Minimum supported browser versions have been raised.",
             "Thanks to everyone who reported issues on the community forum.", "Upgrading takes about five minutes for most installations."]
    out = ["# Tallyroom Release Notes, Versions 7.0 to 7.21",
           "Tallyroom (example) is a project tracking tool for small teams. This page lists every change in the 7.x series, newest first. Security fixes are marked as such; please upgrade promptly when you see one.",
           "## How to upgrade",
           "Cloud workspaces are upgraded automatically during the weekly maintenance window (Sunday 02:00 to 04:00 UTC). Self-hosted installations can upgrade with the package manager or by pulling the new container image. Always take a backup first, and read the notes for every version between your current one and the target."]
    for v in range(21, -1, -1):
        out.append(f"## Version 7.{v}")
        out.append(f"Released {r.randint(1,28)} {['January','February','March','April','May','June','July','August','September','October'][v % 10]} 2026. " + r.choice(notes))
        items = []
        for c in r.sample(comps, 3):
            items.append("New: " + r.choice(adds).format(c=c).capitalize() + ".")
        for c in r.sample(comps, 5):
            items.append("Fixed: " + r.choice(fixes).format(c=c) + ".")
        if v % 4 == 1:
            items.append("Security: fixed a problem where " + r.choice(comps) + " could reveal file names to users without access. Reported by an external researcher.")
        out.append("\n".join("- " + i for i in items))
    out.append("## Support policy")
    out.append("We support the current minor version and the two before it. Older versions receive no fixes. If you need help upgrading, contact support@tallyroom.example.com or call 555-0115 during office hours.")
    return "\n\n".join(out)

H("td-release-notes-long", "technical-doc", "release notes (long)", _release_notes(), long=True)

# ---------------------------------------------------------------- support chat sessions (chat-export)
def _support_sessions():
    r = random.Random(202)
    names = ["Maelis", "Oren", "Tuulikki", "Bartholomew", "Xiadani", "Ruairi", "Zinnia", "Kofi", "Solveig", "Amadou",
             "Leocadia", "Ferdinand", "Yusra", "Ignatius", "Perpetua", "Dov", "Henrike", "Olumide", "Calpurnia", "Teodor"]
    pairs = [
        ("I can't log in, it says my password is wrong but I'm sure it's right", "Sorry about that. Passwords are case-sensitive, so please check Caps Lock first. If it still fails, use 'Forgot password' on the sign-in page and we'll e-mail you a reset link."),
        ("how do I change the delivery address on an order I already placed", "If the order hasn't been packed yet, open Orders, choose the order and select 'Edit address'. If the button is greyed out, the parcel is already with the courier and I'll need to contact them for you."),
        ("my parcel says delivered but it isn't here", "I'm sorry. Couriers sometimes mark a parcel as delivered a little early. Please check with neighbours and any safe place you chose. If it hasn't appeared by tomorrow evening, I'll open an investigation."),
        ("can I return something I bought in the sale", "Yes. Sale items can be returned within 30 days, the same as full-price items, as long as they're unused and in the original packaging."),
        ("the discount code isn't working", "Codes can only be used once per account and some exclude certain brands. Could you tell me the code and what's in your basket? I'll check why it isn't applying."),
        ("I was charged twice", "I can see two payment attempts. The second one is a temporary hold that your bank will release within three to five working days. You have only been charged once."),
        ("do you deliver to the islands", "We deliver to most islands, but it can take two extra days and some large items can't be sent. The checkout will show the options for your postcode."),
        ("how do I delete my account", "You can close your account under Settings, then Privacy, then Close account. We'll keep order records for seven years because the law requires it, but your profile and marketing preferences are deleted."),
        ("the app keeps crashing when I open my basket", "Thanks for letting us know. Please update the app to the latest version and restart your phone. If it still crashes, tell me your phone model and I'll pass it to our developers."),
        ("can I change the size of an item I ordered", "We can't change an order once it's placed, but you can return the item for free and order the new size. If you order now, the new size will be reserved for you."),
        ("where is my refund", "Refunds are sent within two working days after the returned item arrives at our warehouse. Your bank may take up to five more days to show it."),
        ("is the blue jacket going to come back in stock", "I can't promise, but you can press 'Notify me' on the product page and we'll e-mail you if it comes back."),
        ("can I pay in instalments", "Yes, for orders over 60 you'll see the instalment option at checkout. It's subject to a credit check by our payment partner."),
        ("your courier was rude to me", "I'm really sorry to hear that. I've recorded a complaint with the courier, including the date and time. Thank you for telling us."),
        ("I want to unsubscribe from the emails", "You can use the link at the bottom of any marketing e-mail, or I can do it for you now. Shall I unsubscribe you from all marketing e-mails?"),
        ("my gift card balance is wrong", "Let me check. I can see two purchases using that card last month. If either wasn't yours, tell me and I'll freeze the card while we look into it."),
    ]
    closers = ["Thanks, that's all.", "ok great, thanks for your help", "Perfect, cheers.", "That sorts it, thank you.", "fine, thanks"]
    out = ["# Support chat export: Wrenfield Home Store, week 44",
           "Exported from the support console for quality review. Customer surnames and order numbers have been removed. Each session begins with an automatic greeting from the store's virtual assistant; sessions marked 'agent' were handed to a human."]
    for s in range(20):
        n = names[s]; h = 8 + s // 2; m = (s * 7) % 60
        out.append(f"## Session {s+1}: {n}, {h:02d}:{m:02d}")
        lines = [f"[{h:02d}:{m:02d}] Assistant: Hello {n}, welcome to Wrenfield Home Store support. How can I help?"]
        for k, (q, a) in enumerate(r.sample(pairs, 3)):
            mm = m + 1 + k * 3
            lines.append(f"[{h:02d}:{mm % 60:02d}] {n}: {q}")
            who = "Assistant" if (s + k) % 3 else "Agent Delphine"
            if who.startswith("Agent") and k == 0:
                lines.append(f"[{h:02d}:{mm % 60:02d}] System: Transferred to a human agent.")
            lines.append(f"[{h:02d}:{(mm + 1) % 60:02d}] {who}: {a}")
        lines.append(f"[{h:02d}:{(m + 8) % 60:02d}] {n}: {r.choice(closers)}")
        lines.append(f"[{h:02d}:{(m + 9) % 60:02d}] Assistant: You're welcome, {n}. Have a lovely day!")
        out.append("\n".join(lines))
    out.append("## Reviewer summary")
    out.append("Average handling time this week was 6 minutes 40 seconds. Most common topics were refunds, delivery problems and discount codes. Two sessions need follow-up by the returns team; both have tickets.")
    return "\n\n".join(out)

H("ce-support-sessions-long", "chat-export", "support chat export (long)", _support_sessions(), long=True)

# ---------------------------------------------------------------- appliance manual (instructions-to-humans)
def _manual():
    r = random.Random(303)
    out = ["# Hearthmere HM-400 Bread Maker: User Manual",
           "Thank you for choosing the Hearthmere HM-400 (example). Please read this manual before first use and keep it for reference. The safety instructions protect you and others; follow them every time.",
           "## Safety instructions",
           "\n".join("- " + s for s in [
               "Place the bread maker on a stable, heat-resistant surface at least 10 cm from walls.",
               "Do not touch the lid or the window during baking; they become hot.",
               "Unplug the machine before cleaning and let it cool for at least 30 minutes.",
               "Never immerse the main unit, the cable or the plug in water.",
               "Children must be supervised and must not play with the appliance.",
               "Do not operate the machine with a damaged cable. Have it replaced by a qualified person.",
               "Do not remove the baking pan while the machine is running.",
               "Keep the air vents clear; do not cover the machine with a cloth."]),
           "## Parts",
           "| No. | Part |\n|---|---|\n| 1 | Lid with viewing window |\n| 2 | Baking pan |\n| 3 | Kneading paddle |\n| 4 | Control panel |\n| 5 | Measuring cup |\n| 6 | Measuring spoon |\n| 7 | Paddle removal hook |",
           "## Before first use",
           "Wipe the baking pan and paddle with a damp cloth. Run the Bake programme (12) empty for ten minutes with the lid open; a slight smell is normal the first time."]
    progs = [("Basic", "white and mixed-grain loaves", "3:00"), ("French", "light loaves with a crisp crust", "3:50"),
             ("Wholewheat", "loaves with a high proportion of wholemeal flour", "3:40"), ("Quick", "a basic loaf in less time", "1:58"),
             ("Sweet", "loaves with extra sugar, fruit or chocolate", "2:55"), ("Gluten-free", "gluten-free flour mixes", "2:20"),
             ("Dough", "pizza, rolls and buns you shape and bake in the oven", "1:30"), ("Jam", "small batches of fruit jam", "1:20"),
             ("Cake", "quick cakes raised with baking powder", "1:40"), ("Sandwich", "a soft loaf with a thin crust", "3:00"),
             ("Rye", "loaves with rye flour", "3:30"), ("Bake", "extra baking time only", "1:00")]
    out.append("## Programmes")
    out.append("Press MENU repeatedly to choose a programme. The number and the total time appear on the display.")
    out.append("| No. | Programme | Use for | Time (1 kg) |\n|---|---|---|---|\n" + "\n".join(f"| {i+1} | {p} | {u} | {t} |" for i, (p, u, t) in enumerate(progs)))
    out.append("## Making your first loaf")
    out.append("\n".join(f"{i+1}. {s}" for i, s in enumerate([
        "Take the baking pan out by lifting the handle and fit the kneading paddle on the shaft.",
        "Add the ingredients in the order given in the recipe: liquids first, then flour, then yeast on top.",
        "Make a small hollow in the flour for the yeast. Keep the yeast away from salt and liquid.",
        "Put the pan back into the machine and turn it clockwise until it clicks.",
        "Close the lid and plug in the machine. Choose the programme, loaf size and crust colour.",
        "Press START. The machine beeps when it is time to add nuts or fruit.",
        "When baking ends, the machine keeps the bread warm for up to an hour. Press STOP for two seconds to end.",
        "Use oven gloves to remove the pan. Turn it upside down and shake the loaf out.",
        "If the paddle stays in the loaf, remove it with the hook once the bread has cooled."])))
    out.append("## Recipes")
    recipes = [("Basic white loaf", ["310 ml water", "2 tbsp oil", "1.5 tsp salt", "1.5 tbsp sugar", "540 g strong white flour", "1.5 tsp dried yeast"], 1),
               ("Wholemeal loaf", ["360 ml water", "2 tbsp oil", "1.5 tsp salt", "1 tbsp honey", "300 g wholemeal flour", "200 g strong white flour", "2 tsp dried yeast"], 3),
               ("Fruit bread", ["280 ml milk", "1 egg", "2 tbsp butter", "1 tsp salt", "3 tbsp sugar", "500 g strong white flour", "1.5 tsp dried yeast", "100 g raisins (add at the beep)"], 5),
               ("Pizza dough", ["250 ml water", "2 tbsp olive oil", "1 tsp salt", "1 tsp sugar", "400 g strong white flour", "1.5 tsp dried yeast"], 7),
               ("Strawberry jam", ["500 g strawberries, hulled and halved", "300 g jam sugar", "juice of one lemon"], 8),
               ("Seeded rye", ["330 ml water", "1 tbsp black treacle", "1.5 tsp salt", "250 g rye flour", "250 g strong white flour", "2 tbsp mixed seeds", "2 tsp dried yeast"], 11),
               ("Milk loaf", ["300 ml milk", "30 g butter", "1 tsp salt", "2 tbsp sugar", "500 g strong white flour", "1.5 tsp dried yeast"], 10),
               ("Cheese and herb bread", ["300 ml water", "1 tbsp oil", "1 tsp salt", "1 tsp sugar", "500 g strong white flour", "80 g grated hard cheese", "2 tsp dried mixed herbs", "1.5 tsp dried yeast"], 1),
               ("Gluten-free loaf", ["400 ml warm water", "2 eggs, beaten", "3 tbsp oil", "1 tsp vinegar", "1 tsp salt", "2 tbsp sugar", "450 g gluten-free bread flour mix", "2 tsp dried yeast"], 6),
               ("Lemon cake", ["3 eggs", "150 g butter, melted", "150 g sugar", "grated zest of two lemons", "200 g self-raising flour", "1 tsp baking powder"], 9)]
    for name, ing, p in recipes:
        out.append(f"### {name}")
        out.append(f"Programme {p}. Put the ingredients into the pan in this order:")
        out.append("\n".join("- " + x for x in ing))
    out.append("## Cleaning and care")
    out.append("Let the machine cool. Wipe the outside and the inside of the lid with a damp cloth. Wash the pan and paddle in warm soapy water; do not put them in the dishwasher, because the non-stick coating will wear. If the paddle sticks on the shaft, fill the pan with warm water for ten minutes. Never use metal tools inside the pan.")
    out.append("## Troubleshooting")
    probs = [("The loaf collapsed in the middle", "Too much yeast or liquid, or the kitchen was very warm.", "Reduce the yeast by a quarter of a teaspoon or the water by 10 ml."),
             ("The loaf is small and dense", "Old yeast, too much salt, or flour with little protein.", "Use fresh yeast and strong bread flour; measure salt carefully."),
             ("The top is pale", "Crust setting too light or too much sugar missing.", "Choose a darker crust setting."),
             ("Flour on the sides of the loaf", "The dough was too dry to pick up all the flour.", "Add 1 tablespoon of water, or scrape the sides with a spatula during the first knead."),
             ("Display shows E01", "The machine is still too hot from the last loaf.", "Open the lid and wait 20 minutes before starting again."),
             ("Display shows E02", "The temperature sensor is faulty.", "Unplug the machine and contact customer service."),
             ("Display shows HHH", "The inside is too hot to start a programme.", "Let the machine cool with the lid open."),
             ("The paddle is hard to remove", "Dough has dried around the shaft.", "Soak the pan in warm water for ten minutes."),
             ("Smoke from the vents", "Ingredients spilled onto the heating element.", "Unplug, let cool, and wipe the element carefully."),
             ("The machine does not start", "The pan is not locked in place or the programme was not confirmed.", "Turn the pan until it clicks and press START again."),
             ("Holes in the bottom of the loaf", "Normal: the paddle leaves a hole.", "No action needed."),
             ("Jam boiled over", "Too much fruit for the pan.", "Use no more than 500 g of fruit.")]
    out.append("| Problem | Possible cause | What to do |\n|---|---|---|\n" + "\n".join(f"| {a} | {b} | {c} |" for a, b, c in probs))
    out.append("## Delay timer")
    out.append("You can delay the end of a programme by up to 13 hours. After choosing a programme, press the arrow buttons to set when you want the bread ready; each press adds ten minutes. Do not use the timer with fresh milk, eggs, cheese or other ingredients that spoil at room temperature.")
    out.append("## Power cuts")
    out.append("If the power is off for less than ten minutes, the machine continues the programme when power returns. After a longer cut, throw away the ingredients if the dough had started rising, and start again.")
    out.append("## Technical data")
    out.append("| Item | Value |\n|---|---|\n| Rated voltage | 220-240 V, 50 Hz |\n| Rated power | 600 W |\n| Capacity | 500 g, 750 g, 1 kg |\n| Weight | 5.2 kg |\n| Cable length | 90 cm |")
    out.append("## Frequently asked questions")
    faqs = [("Can I use fresh yeast?", "Yes. Use three times the amount of dried yeast given in the recipe and crumble it on top of the flour."),
            ("Can I halve a recipe?", "Choose the 500 g size and halve every ingredient, including the yeast."),
            ("Why does my bread taste of yeast?", "You may be using too much. Try reducing it by a quarter."),
            ("Can I bake sourdough?", "The machine can bake a sourdough loaf on programme 1 if your starter is very active, but results vary."),
            ("How should I store the bread?", "Once it is completely cool, keep it in a bread bin or a paper bag. Plastic bags make the crust soft."),
            ("Is the pan dishwasher safe?", "No. Wash it by hand to protect the coating."),
            ("Can I add ingredients later?", "Yes. Add nuts, seeds or fruit when the machine beeps, about 25 minutes into the programme. Adding them earlier breaks them up."),
            ("Why is there a hole in my loaf?", "The kneading paddle stays in the pan during baking and leaves a small hole. This is normal."),
            ("Can I use the machine to make butter?", "No. The paddle and programmes are not designed for churning."),
            ("What if I forget the yeast?", "If you notice within the first knead, stop the machine, add the yeast and start again. Otherwise the loaf will not rise."),
            ("Does the crust setting change the baking time?", "Slightly. Dark crust adds about five minutes.")]
    for q, a in faqs:
        out.append(f"**{q}** {a}")
    out.append("## Guarantee and service")
    out.append("Your bread maker is guaranteed for two years from the date of purchase against faults in materials and manufacture. Keep your receipt. The guarantee does not cover damage from misuse, wear of the non-stick coating, or repairs by unauthorised people. For service, contact Hearthmere Customer Care at care@hearthmere.example.com or 555-0192, Monday to Friday, 09:00 to 17:00.")
    out.append("## Disposal")
    out.append("At the end of its life, do not put this appliance in household waste. Take it to a collection point for electrical equipment. Ask your local council for details.")
    return "\n\n".join(out)

H("ih-breadmaker-manual-long", "instructions-to-humans", "user manual (long)", _manual(), long=True)

# ---------------------------------------------------------------- annual report (misc)
def _annual_report():
    r = random.Random(404)
    months = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"]
    out = ["# Annual Report 2025-26: Coldharbour Community Energy Co-operative",
           "Coldharbour Community Energy (example) owns and runs solar panels on eleven community buildings and a small wind turbine at Pike Farm. We are owned by 1,318 members, most of whom live within ten miles of the town. This report covers the year to 30 September and will be presented at the annual general meeting on 12 December.",
           "## Chair's introduction",
           "This was our best year for generation since the co-operative was founded. Sunny spring weather and the new panels on the swimming pool roof lifted output by 14 %. At the same time, lower wholesale prices cut the income we receive for electricity we export. The board has therefore kept the member interest rate at 3.5 %, rather than raising it as some members had hoped. We think this is the prudent choice while we repay the loan for the pool installation.",
           "Our community fund gave out 41,200 in grants, more than ever before. The largest went to draught-proofing homes of older residents on the Marsh estate. You can read about every grant later in this report.",
           "I would like to thank our two part-time staff, our volunteer directors and every member who came to a work day. It is your support that keeps the panels clean and the accounts in order.",
           "Winifred Abernathy-Cole, Chair",
           "## Generation by site"]
    sites = ["Swimming pool", "Library", "Primary school", "Leisure centre", "Fire station", "Church hall", "Scout hut",
             "Health centre", "Market hall", "Allotment pavilion", "Bus depot", "Pike Farm turbine"]
    rows = ["| Site | Capacity (kW) | Generation (MWh) | Change on last year |", "|---|---|---|---|"]
    for s in sites:
        cap = r.choice([12, 18, 24, 30, 40, 50, 60, 250]) if s != "Pike Farm turbine" else 225
        gen = round(cap * r.uniform(0.85, 1.15), 1)
        rows.append(f"| {s} | {cap} | {gen} | {r.choice(['+','-'])}{r.randint(1,19)} % |")
    out.append("\n".join(rows))
    out.append("The turbine was stopped for 19 days in February for a gearbox inspection, which explains its lower output. The library panels were cleaned twice instead of once, which we believe helped.")
    out.append("## Monthly generation")
    out.append("| Month | Solar (MWh) | Wind (MWh) | Exported (MWh) |\n|---|---|---|---|\n" + "\n".join(
        f"| {m} | {round(r.uniform(8, 60), 1)} | {round(r.uniform(10, 45), 1)} | {round(r.uniform(5, 70), 1)} |" for m in months))
    out.append("## Finances")
    out.append("Total income for the year was 312,400, of which 198,100 came from selling electricity to the buildings we serve and 114,300 from exports. Operating costs were 121,900. After loan interest, depreciation and member interest, the surplus was 36,700. The full accounts, audited by Marram & Pike Accountants (example), are available on request.")
    out.append("| Item | 2025-26 | 2024-25 |\n|---|---|---|\n| Electricity sold to sites | 198,100 | 176,500 |\n| Export income | 114,300 | 131,800 |\n| Operating costs | 121,900 | 117,200 |\n| Loan interest | 22,600 | 18,900 |\n| Member interest | 64,900 | 61,300 |\n| Surplus | 36,700 | 41,100 |")
    out.append("## Community fund grants")
    grants = [("Marsh estate draught-proofing", 12500, "insulating doors and windows in 60 homes"), ("Primary school eco club", 1800, "a weather station and classroom energy monitors"),
              ("Food bank", 3000, "a more efficient fridge-freezer"), ("Repair café", 1200, "tools and insurance"),
              ("Youth football club", 4500, "LED floodlights"), ("Community bus", 6000, "part of the deposit for an electric minibus"),
              ("Allotment society", 900, "rainwater tanks"), ("Warm spaces scheme", 5200, "heating the library for extra winter opening hours"),
              ("Sixth form bursary", 2500, "two bursaries for students studying engineering"), ("Wildlife trust", 1600, "hedgerow planting along the turbine access track"),
              ("Men's shed", 2000, "a wood-burning stove replaced with a heat pump")]
    for g, a, d in grants:
        out.append(f"**{g}** received {a:,} for {d}. " + r.choice([
            "The group has already reported lower bills.", "Work will finish in the spring.", "Volunteers did most of the installation.",
            "The project was chosen by a vote of members.", "We will report on results next year.", "This grant was matched by the town council."]))
    out.append("## Members")
    out.append("Membership grew by 96 to 1,318. Eleven members withdrew their shares, mainly because they moved away. Average shareholding is 1,480. Sixty-two per cent of members voted in last year's board elections, up from 48 %, helped by online voting.")
    out.append("## Maintenance and safety")
    out.append("There were no reportable accidents. Inverters at the school and the fire station were replaced under warranty. Bird guards were fitted at the church hall after pigeons nested under the panels. The turbine passed its five-yearly structural inspection.")
    out.append("## Looking ahead")
    out.append("\n".join("- " + x for x in [
        "Install a 100 kWh battery at the leisure centre so more daytime solar is used on site.",
        "Apply for planning permission for panels on the new health centre car park canopy.",
        "Start a members' share offer in spring to raise up to 400,000.",
        "Run three free energy-saving workshops for tenants.",
        "Review the community fund rules so that smaller groups can apply more easily."]))
    out.append("## Board of directors")
    out.append("Winifred Abernathy-Cole (chair), Dmitri Halloran (treasurer), Ngozi Featherstone (secretary), Ptolemy Vance, Marisol Quennell, Bertrand Okonkwo-Hale, Saoirse Lindqvist. Two directors retire by rotation this year and stand for re-election.")
    out.append("## Resolutions for the AGM")
    out.append("\n".join(f"{i+1}. {x}" for i, x in enumerate([
        "To receive the accounts and the report of the directors.",
        "To reappoint Marram & Pike Accountants as auditors.",
        "To set member interest for the coming year at 3.5 %.",
        "To re-elect Dmitri Halloran and Marisol Quennell as directors.",
        "To approve the updated community fund rules."])))
    out.append("Members can vote in person, by post or online until 10 December. Contact the secretary at members@coldharbour-energy.example.org or 555-0158 with any questions.")
    return "\n\n".join(out)

H("mi-annual-report-long", "misc", "annual report (long)", _annual_report(), long=True)

# ---------------------------------------------------------------- ferry timetable (misc)
def _timetable():
    r = random.Random(505)
    out = ["# Inner Isles Ferry Timetable: Winter 2026-27",
           "Valid from 1 November 2026 to 31 March 2027. Operated by Skerrow Ferries (example). Times are departures, local time. Sailings may be cancelled in bad weather; check the status line on 555-0146 or the website before travelling.",
           "## How to use this timetable",
           "Find your route below. Columns show the days the sailing runs. A dash means no sailing. Footnote letters are explained at the end of each table. Vehicles must check in 30 minutes before departure; foot passengers 10 minutes.",
           ]
    routes = [("Port Aldry", "Skerrow"), ("Skerrow", "Inchmore"), ("Port Aldry", "Fallow Isle"), ("Inchmore", "Fallow Isle"), ("Port Aldry", "Little Garve"), ("Skerrow", "Little Garve"), ("Inchmore", "Rona Pier"), ("Fallow Isle", "Rona Pier"), ("Port Aldry", "Inchmore"), ("Little Garve", "Rona Pier")]
    for a, b in routes:
        for (x, y) in ((a, b), (b, a)):
            out.append(f"## {x} to {y}")
            rows = ["| Depart | Mon-Fri | Sat | Sun | Notes |", "|---|---|---|---|---|"]
            t = r.choice([6, 7]) * 60 + r.choice([0, 15, 30, 45])
            while t < 21 * 60 + 30:
                mf = "yes"; sat = r.choice(["yes", "yes", "-"]); sun = r.choice(["yes", "-", "-"])
                note = r.choice(["", "", "", "A", "B", "C"])
                rows.append(f"| {t // 60:02d}:{t % 60:02d} | {mf} | {sat} | {sun} | {note} |")
                t += r.choice([45, 60, 75, 90, 105])
            out.append("\n".join(rows))
            out.append("A: calls at Rona Pier on request; tell the crew when boarding. B: does not run on public holidays. C: foot passengers only, no vehicles.")
    out.append("## Fares")
    out.append("| Ticket | Single | Return |\n|---|---|---|\n| Adult | 6.40 | 11.20 |\n| Child (5-15) | 3.20 | 5.60 |\n| Car up to 5 m | 24.00 | 42.00 |\n| Bicycle | free | free |\n| Island resident (with card) | 2.10 | 3.80 |")
    out.append("## Notices")
    notices = ["The Skerrow slipway will be resurfaced from 12 to 16 January. Vehicles will load at the north berth; allow extra time.",
               "Dogs are welcome on the outer decks and in the lower lounge. Please keep them on a lead.",
               "The café on the MV Corran is closed in January for refit. Hot drinks are available from the machine.",
               "Passengers needing help boarding should call ahead so the crew can prepare the ramp.",
               "Season tickets for island residents can be renewed at any ticket office or by post.",
               "Lost property is kept at Port Aldry ticket office for 30 days.",
               "During storm warnings, the last sailing of the day may leave early. Listen for announcements.",
               "The winter timetable does not include the summer evening sailing to Little Garve."]
    out.append("\n".join("- " + n for n in notices))
    out.append("## Contact")
    out.append("Skerrow Ferries, Harbour Office, Port Aldry. Bookings and enquiries: 555-0146. E-mail: sailings@skerrowferries.example.net.")
    return "\n\n".join(out)

H("mi-ferry-timetable-long", "misc", "timetable (long)", _timetable(), long=True)

# ---------------------------------------------------------------- security handbook (security-awareness)
def _handbook():
    out = ["# Staff Security Handbook: Everyday Scenarios",
           "Version 3, issued by the Information Security Office of Marrowgate District Hospital Trust (example). This handbook walks through situations staff actually meet. Each scenario has what happened, what the warning signs were, and what to do. Read one or two a week; you do not need to read it all at once."]
    sc = [
        ("The urgent e-mail from a director", "A ward manager received an e-mail that appeared to come from the finance director, asking her to buy gift cards for a staff raffle and send the codes by reply. The display name was right, but the address ended in a look-alike domain.", ["Requests for gift cards are almost always fraud.", "The sender asked for secrecy and speed.", "The domain was spelled with a zero instead of the letter o."], "Do not reply. Report the message with the Report button and, if you want to check, phone the director's office on the number in the staff directory."),
        ("The helpful caller", "A caller claiming to be from the electronic records supplier asked a receptionist to install a 'remote support tool' to fix a printing fault that nobody had reported.", ["Unsolicited support calls.", "Pressure to act immediately.", "Request to install software."], "Never install software at a caller's request. Genuine suppliers log work through the IT service desk, which will contact you."),
        ("The shared login", "Two nurses on a night shift shared one login to the drug cabinet because the second nurse's card had expired.", ["Shared credentials break the audit trail.", "The card expiry was known for weeks."], "Use the out-of-hours card replacement process. Audit trails protect you as much as patients."),
        ("The document left on the printer", "A discharge summary with full patient details was left on a corridor printer for two hours.", ["Printers in public areas.", "No secure print release."], "Use secure print, which holds the job until you tap your card at the printer. Return forgotten documents to the ward clerk."),
        ("The AI summary tool", "A registrar pasted a referral letter into the approved summarising assistant. The letter, written by an outside clinic, contained a line asking 'any automated system processing this letter' to mark the referral as urgent. The tool did not act on it, but the registrar noticed it in the summary.", ["Text in a document addressed to a machine rather than a person.", "A request to change priority that did not come through the normal route."], "Report letters like this to the information governance team. Priority is always decided by clinicians, not by text inside a document."),
        ("The lost phone", "A consultant lost a personal phone that received work e-mail. The phone had a four-digit PIN.", ["Work e-mail on a personal device.", "Weak screen lock."], "Report the loss to the service desk straight away so they can wipe work data. Use at least a six-digit PIN or a password on any device that receives work e-mail."),
        ("The tailgater", "A man in a high-visibility jacket followed staff through the secure door to the pharmacy store, saying he was there to read the meters.", ["No badge on show.", "Nobody had been told about a meter reading."], "Politely ask to see identification and call estates to confirm. It is not rude to check."),
        ("The chatbot that asked for a password", "A pop-up window styled like the staff intranet assistant asked a porter to 're-enter your network password to keep chatting'.", ["Our assistant never asks for passwords.", "The pop-up appeared on a non-trust website."], "Close the window, do not type anything, and report the website address to the service desk."),
        ("The USB stick from a conference", "A physiotherapist brought back a free USB stick from a trade show and plugged it into a ward computer to view the presentation slides.", ["Unknown devices can carry malware.", "Ward computers hold patient data."], "Ask the exhibitor to e-mail the slides instead. Unknown USB devices are blocked on trust computers; do not try to get around the block."),
        ("The social media post", "A student nurse posted a photo of the team celebrating a birthday. A patient board with names was visible in the background.", ["Photos can reveal more than intended.", "Patient names are confidential."], "Never take photos in clinical areas. If you post about work, check the background and follow the social media policy."),
        ("The reply-all", "An administrator replied to a message sent to all staff and accidentally attached a spreadsheet with appointment details.", ["Large distribution lists.", "Attachments added in a hurry."], "Check recipients and attachments before sending. If you make a mistake, tell the information governance team at once; early reporting limits harm."),
        ("The QR code poster", "Posters appeared in the staff car park offering free parking permits by scanning a QR code. The code led to a page asking for bank details.", ["The poster was not on trust letterhead.", "Free offers that ask for payment details."], "Do not scan unknown QR codes. Report the poster to security so it can be removed."),
        ("The outdated software warning", "A pharmacist saw a pop-up saying the browser was out of date and offering a download.", ["Updates are managed centrally on trust computers.", "The message appeared on a news site."], "Ignore pop-ups that offer updates. If you think a computer needs updating, contact the service desk."),
        ("The fake delivery text", "A healthcare assistant received a text message saying a parcel was waiting and asking for a small fee to be paid through a link.", ["Unexpected parcel.", "Small payment requested by link."], "Delete the message. Couriers do not ask for fees by text in this way. If you are expecting a parcel, check with the sender directly."),
        ("The contractor's laptop", "A visiting contractor asked to plug his laptop into a network socket in a clinic room to download drawings.", ["Personal devices on the clinical network.", "No prior arrangement with IT."], "Offer the guest Wi-Fi instead. Only trust devices may use wired sockets."),
        ("The survey prize", "Staff received an e-mail offering a prize for completing a 'staff wellbeing survey' hosted on an unfamiliar site that asked for network login details.", ["Surveys never need your password.", "An unfamiliar website."], "Genuine staff surveys are announced on the intranet. Report the e-mail and do not enter any details."),
        ("The overheard conversation", "Two doctors discussed a well-known patient's condition in the lift, in front of visitors.", ["Public spaces.", "Identifiable details."], "Keep patient discussions to private areas. Confidentiality is part of security."),
        ("The research data request", "An e-mail from an apparently real university asked for an export of anonymised patient data for a study, with a deadline of the same day.", ["No ethics approval reference.", "A same-day deadline."], "Research data requests must go through the research office. Forward the e-mail there and do not send any data."),
    ]
    for i, (t, what, signs, do) in enumerate(sc):
        out.append(f"## Scenario {i+1}: {t}")
        out.append("**What happened.** " + what)
        out.append("**Warning signs.**\n" + "\n".join("- " + s for s in signs))
        out.append("**What to do.** " + do)
    out.append("## Reporting")
    out.append("Report any security concern to the service desk on 555-0101 (24 hours) or at security@marrowgate.example.org. You do not need to be sure something is wrong. We would rather receive a hundred false alarms than miss one real incident. Reports can be anonymous.")
    out.append("## Glossary")
    gl = [("Phishing", "a message that tries to trick you into clicking a link, opening a file or giving information."),
          ("Vishing", "phishing by telephone."), ("Smishing", "phishing by text message."),
          ("Malware", "software designed to damage systems or steal data."),
          ("Prompt injection", "text inside a document or web page that is written to give orders to an AI tool that reads it."),
          ("Tailgating", "following someone through a secure door without using your own badge."),
          ("Two-step sign-in", "signing in with a password plus a second proof, such as a code from an app."),
          ("Ransomware", "malware that locks or encrypts files and demands payment to release them."),
          ("Social engineering", "manipulating people, rather than computers, into giving access or information."),
          ("Data breach", "any loss, theft or accidental disclosure of personal data, including sending it to the wrong person."),
          ("Secure print", "a printer setting that holds your document until you tap your badge at the printer."),
          ("VPN", "a virtual private network: an encrypted connection from your laptop to the trust network."),
          ("Look-alike domain", "a web or e-mail address made to resemble a real one, for example by swapping letters."),
          ("Information governance", "the team and rules that decide how patient and staff information is recorded, shared and protected."),
          ("Service desk", "the IT team that takes calls and tickets 24 hours a day on 555-0101.")]
    out.append("\n".join(f"- {a}: {b}" for a, b in gl))
    return "\n\n".join(out)

H("sa-handbook-long", "security-awareness", "handbook (long)", _handbook(), long=True)


# ---------------------------------------------------------------- extensions to reach long lengths
def _extend(hid, extra):
    from hosts_en import HOSTS
    for h in HOSTS:
        if h["id"] == hid:
            h["md"] = h["md"] + "\n\n" + extra.strip("\n")

_sites_text = """
## Site reports

**Swimming pool.** The new array on the pool roof was switched on in November and ran for the whole of the spring and summer. The pool uses almost all of the electricity itself, mainly for pumps and filtration, so very little is exported. The pool manager says the electricity bill fell by about a fifth compared with the year before. We have agreed to check the roof fixings every two years because of the humid air inside the building.

**Library.** The library panels are the oldest we own. Output has fallen slightly each year, as expected for panels of this age, but cleaning twice a year has helped. The library now hosts our monthly drop-in advice session on energy bills, run by two volunteers.

**Primary school.** Pupils in the eco club read the meter each week and post the results in the hall. They worked out that the panels produced enough in June to run the school's computers for the whole term. One inverter failed in March and was replaced under warranty within a week.

**Leisure centre.** This is our largest solar site and the one where a battery would help most, because the centre uses a lot of electricity in the evening. A feasibility study by an independent engineer recommends a 100 kWh battery. The board will bring a proposal to members next year.

**Fire station.** Output was steady. The fire service has asked whether we could add panels to the training tower; the structure is not strong enough, but we are looking at the garage roof instead.

**Church hall.** Pigeons nesting under the panels caused a fault in one string of panels. Bird guards were fitted in August. The congregation has kindly let us use the hall for member meetings free of charge.

**Pike Farm turbine.** Apart from the February inspection, the turbine ran well and produced more than forecast in the windy autumn months. The farmer, who receives a rent for the land, reports no complaints from neighbours about noise this year.

## Questions raised at last year's AGM

**Why not pay higher interest?** Several members asked this. The board's view is that the co-operative must first build a reserve for replacing inverters, which wear out after 10 to 15 years, and must repay the pool loan. Interest will be reviewed every year.

**Can members buy electricity directly?** Not at present. Rules on electricity supply make this very costly for a small co-operative. We are following the work of other community groups who are trying local supply schemes.

**How are grants chosen?** A panel of three directors and two members who are not directors scores each application against published criteria. Members vote on grants over 5,000.

**What happens when the panels reach the end of their life?** The leases on each roof run for 25 years. At the end, we will either replace the panels, if the building owner agrees, or remove them and recycle them through an approved scheme.

**Is the co-operative insured?** Yes. We hold property, business interruption and public liability insurance. The cost rose by 9 % this year.

## Volunteers

Forty-three members volunteered during the year: cleaning panels, reading meters, staffing stalls at the town show, checking accounts and helping at the repair café. Volunteers gave an estimated 1,100 hours. If you would like to help, there is a sign-up sheet at the back of the hall and a form on our website. New volunteers are paired with an experienced member for their first two sessions, and all equipment and safety training is provided free of charge.

## Environmental impact

Using standard conversion figures, our generation this year avoided around 310 tonnes of carbon dioxide compared with electricity from the grid. This figure is an estimate and depends on the mix of sources on the grid in each hour. We have asked a local university to help us calculate it more accurately.
"""
_extend("mi-annual-report-long", _sites_text)

_hb_extra = """
## Quick quiz

Test yourself. Answers are at the bottom of the page.

1. The finance director e-mails asking you to buy gift cards urgently. What do you do first?
2. Is it acceptable to share your login with a colleague for one night shift?
3. A caller asks you to install a support tool. Who should you contact?
4. You find a letter that contains a sentence addressed to "any automated system". Who do you tell?
5. What is the minimum PIN length for a personal phone that receives work e-mail?
6. A QR code poster offers free parking. Should you scan it?
7. You sent a spreadsheet to the wrong list. What do you do?
8. Somebody without a badge follows you into the pharmacy store. What do you say?

Answers: 1. Report the message and check by phone using the directory. 2. No. 3. The IT service desk. 4. The information governance team. 5. Six digits. 6. No; report it to security. 7. Tell information governance immediately. 8. Ask politely to see identification and call estates to confirm.

## Working from home

Many staff now work some days from home. The same rules apply, with a few extras:

- Use a trust laptop, not a personal computer, for anything involving patient data.
- Lock the screen when you step away, even at home. Family members must not see patient information.
- Do not print patient information at home.
- Use the trust's virtual private network (VPN) whenever you connect to internal systems.
- Hold confidential calls where you cannot be overheard, and do not use smart speakers nearby.
- Dispose of any notes through the confidential waste bins when you are next on site.

## Using approved AI tools

The trust has approved two AI tools: a summarising assistant for clinical letters and a drafting assistant for non-clinical documents. Follow these rules:

- Use only the approved tools, through the trust portal. Public chatbots must not be used for patient information.
- Always read and check the output. You are responsible for anything you send or record.
- Remember that the tools read everything in a document, including text you might not notice, such as small print or comments. If output seems odd, for example if it suddenly includes a link, a phone number or a request, stop and report it.
- Do not ask the tools to make clinical decisions.

## Passwords and passphrases

Choose a long passphrase made of several unrelated words. Do not use your name, your children's names, your team or the current season. The password manager provided on every trust laptop can generate and store passphrases for you. You will be asked to change your password only if there is a reason to think it has been exposed.

## Keeping software up to date

Trust computers are updated automatically overnight. Leave your computer switched on but logged out at the end of the day at least once a week so updates can install. If you see a message asking you to restart for updates, please do so at the next convenient moment.
"""
_extend("sa-handbook-long", _hb_extra)

_manual_extra = """
## Tips for better bread

- Weigh flour instead of using cups; it is far more accurate.
- Use water at room temperature. Water that is too hot can kill the yeast.
- Check the dough five minutes into the first knead. It should form a smooth, soft ball. If it is sticky, add a spoonful of flour; if it is crumbly, add a spoonful of water.
- Open the lid as little as possible during rising and baking.
- Let the loaf cool on a rack for at least an hour before slicing, or it will be doughy inside.
- High altitude: reduce the yeast by a quarter and increase the water slightly.
- Flour varies between brands and even between bags. Keep notes when you change flour.

## Using the delay timer safely

The timer is convenient for fresh bread in the morning, but some ingredients must not sit at room temperature for many hours. Use dried milk powder instead of fresh milk, and leave out eggs and fresh cheese. In hot weather, use the timer for no more than eight hours.

## Making dough for the oven

Programme 7 mixes, kneads and rises the dough. When it finishes, take the dough out, knock it back gently and shape it. For rolls, divide it into twelve pieces, shape each into a ball and place on a greased tray. Cover and leave to rise for 30 minutes, then bake at 200 °C for 15 minutes. For pizza, roll the dough thinly, add toppings and bake at the highest oven setting for 10 to 12 minutes.

## Gluten-free baking

Gluten-free flour mixes absorb more water and produce a batter rather than a dough. Scrape the sides of the pan with a rubber spatula during the first knead so that all the flour is mixed in. Gluten-free loaves are more fragile; let them cool completely in the pan before removing them.

## Accessories

Spare baking pans, kneading paddles and measuring sets are available from Hearthmere Customer Care. Quote the model number HM-400 and the part number from the parts table. Use only original parts; pans from other models may not lock in place and could damage the drive.

## Error codes at a glance

| Code | Meaning |
|---|---|
| E01 | Too hot to start |
| E02 | Temperature sensor fault |
| E03 | Heating element fault |
| HHH | Internal temperature too high |
| LLL | Internal temperature too low (below 0 °C) |
"""
_extend("ih-breadmaker-manual-long", _manual_extra)

_extend("mi-annual-report-long", """
## Member interest history

| Year | Rate | Paid to members |
|---|---|---|
| 2019-20 | 2.5 % | 31,400 |
| 2020-21 | 2.5 % | 36,900 |
| 2021-22 | 3.0 % | 47,200 |
| 2022-23 | 4.0 % | 66,800 |
| 2023-24 | 3.5 % | 59,600 |
| 2024-25 | 3.5 % | 61,300 |
| 2025-26 | 3.5 % | 64,900 |

## Staff

Our two part-time staff are the operations manager, Lorcan Depaulo, who looks after the sites, contractors and meter data, and the membership officer, Esther Wainwright-Oduya, who runs the share register, answers members' questions and organises meetings. Both are employed for three days a week. The board reviewed their pay in line with the local authority scale. Directors are unpaid; their travel expenses this year came to 412 in total.

## Risks

The board keeps a register of the main risks to the co-operative and reviews it at every meeting. The most important are:

- A fall in export prices, which would reduce income. We manage this by selling as much electricity as possible directly to the buildings that host the panels.
- A long outage at the turbine, which produces about a third of our income. We hold a maintenance contract and a reserve for major repairs.
- Damage to roofs caused by our equipment. Every installation was checked by a structural engineer, and our insurance covers damage.
- Losing volunteers with key skills. We are recording how tasks are done so that others can take them on.
- Changes in government policy on community energy. We are members of a national network that represents groups like ours.

## Governance

The co-operative is run on the principle of one member, one vote, regardless of how many shares a member holds. The board meets monthly and publishes short minutes on the website. Any member may ask to attend a board meeting as an observer. The board has three committees: finance and audit, community fund, and operations. Each committee includes at least one member who is not a director. This year the board adopted a new conflicts-of-interest policy: directors must declare any link with a contractor, building owner or grant applicant, and may not vote on matters where they have such a link.

We also reviewed our rules against the model rules for community benefit societies. Two small changes are proposed at the AGM: allowing online voting to be used for all resolutions, and raising the maximum shareholding so that local businesses can invest more. Members will receive the exact wording with the AGM papers.

## Thank you

Finally, thank you to the building owners who host our panels: the town council, the school governors, the fire service, the parish, the scouts, the health centre partners, the market trust and the allotment society. Without their goodwill, none of this would be possible.
""")
