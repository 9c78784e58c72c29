"""Page families for the archives, orchestra, housing and market sites (hand-written text)."""
from corpus_facts import P, H2, UL, TABLE, fmt_date

# ---------------------------------------------------------------- county archives
ARCH_KINDS = ["estate papers", "parish vestry minutes", "tithe correspondence", "mill ledgers",
              "school log books", "turnpike trust accounts", "photograph albums", "solicitors' bundles",
              "chapel registers", "drainage board plans"]


def arch_accession(g, size):
    fam = g.uniq(["Penhallow", "Rookesby", "Vosper", "Tregarthen", "Winstanley", "Ashdown",
                  "Bellhanger", "Marchbank", "Hebblewhite", "Dunnock", "Coldwell", "Brackley"])
    kind = g.uniq(ARCH_KINDS)
    place = g.place()
    ref = f"D/{fam[:3].upper()}/{g.num(2, 97)}"
    y0 = g.num(1702, 1860)
    y1 = y0 + g.num(25, 110)
    donor = g.person()
    boxes = g.num(3, 41)
    title = g.s(f"New accession: {kind} of the {fam} family of {place}",
                f"Recently received: the {fam} {kind} from {place}")
    blocks = [P(g.s(f"The archives have taken in {boxes} boxes of {kind} kept by the {fam} family of {place} between {y0} and {y1}.",
                    f"Between {y0} and {y1} the {fam} family of {place} kept the {kind} that have now arrived here in {boxes} boxes."),
                g.s(f"The collection was deposited by {donor}, who found it in a loft above the old coach house.",
                    f"{donor} deposited the papers after finding them stored above a disused coach house.")),
              ]
    blocks.append(P(g.s(f"It has been given the reference {ref} and will be listed over the coming months.",
                        f"Its reference is {ref}, and a full list will be prepared over the coming months."),
                    g.s("Until the list is finished the papers cannot be produced in the searchroom.",
                        "The papers cannot be ordered in the searchroom until that list is complete.")))
    if size != "short":
        blocks.append(H2(g.ch(["What the papers contain", "Contents in brief", "What is in the boxes"])))
        items = g.sample([f"letters from tenants at {g.place()} asking for repairs",
                          f"a rent roll for {y0 + g.num(1, 20)} with marginal notes",
                          f"sale particulars for a farm near {g.place()}",
                          "household accounts kept in a cramped hand",
                          f"a survey map of the {fam} holdings drawn in {y0 + g.num(5, 30)}",
                          "bundles of receipts tied with faded tape",
                          f"correspondence with a land agent in {g.place()}",
                          "a commonplace book with recipes and cures",
                          f"plans for a new barn dated {y1 - g.num(1, 9)}"], g.num(3, 5))
        blocks.append(UL(items))
        blocks.append(P(g.s(f"Our conservator, {g.person()}, has checked every box for mould and pests before it entered the strongrooms.",
                            f"Before going into the strongrooms every box was checked for mould and pests by our conservator {g.person()}."),
                        g.s(f"A small number of items were cleaned and rehoused in acid-free folders.",
                            f"Some fragile items were surface cleaned and moved into acid-free folders.")))
    if size == "long":
        blocks.append(H2(g.ch(["Series in the collection", "Provisional arrangement"])))
        rows = [["Series", "Description", "Dates"]]
        for i in range(g.num(3, 5)):
            a = y0 + g.num(0, 40)
            rows.append([f"{ref}/{i + 1}", g.pick(["Title deeds", "Estate correspondence", "Rentals and accounts",
                                                  "Maps and plans", "Family letters", "Legal papers", "Photographs"]),
                         f"{a}-{a + g.num(4, 50)}"])
        blocks.append(TABLE(rows))
        blocks.append(P(g.s(f"Researchers interested in {place} may also find related material among the quarter sessions records and the enclosure awards.",
                            f"Anyone researching {place} should also look at the enclosure awards and quarter sessions records."),
                        g.s(f"Please quote {ref} when contacting us about this accession.",
                            f"When you write to us about this accession, quote {ref}."),
                        g.s("We are grateful to the depositor for keeping the papers together.",
                            "Our thanks go to the depositor for keeping the collection in one piece.")))
        blocks.append(P(g.s(f"Volunteers from the {g.place()} history group will help with the first listing on Wednesday afternoons.",
                            f"The first listing will be done with help from the {g.place()} history group on Wednesday afternoons."),
                        g.s(f"They expect to reach the correspondence series by {g.pick(['the spring', 'midsummer', 'the autumn'])}.",
                            f"By {g.pick(['the spring', 'midsummer', 'the autumn'])} they hope to have reached the correspondence.")))
    return title, blocks


def arch_notice(g, size):
    d = g.wdate()
    reason = g.ch(["a fire alarm upgrade", "replacement of the searchroom lighting",
                   "the annual stocktake of the strongrooms", "staff training", "work on the lift",
                   "a move of the microfilm readers", "installation of new shelving", "repairs to the roof"])
    days = g.num(1, 6)
    title = g.s(f"Searchroom closed from {fmt_date(d, False)}", f"Searchroom closure: {fmt_date(d, False)}")
    blocks = [P(g.s(f"The searchroom will be closed for {days} working days from {fmt_date(d)} for {reason}.",
                    f"From {fmt_date(d)} the searchroom closes for {days} working days while we carry out {reason}."),
                g.s("Documents ordered in advance for those days will be held for you until the following week.",
                    "Any documents you ordered for those days will be kept aside until the week after.")),
              P(g.s(f"Enquiries sent to the {g.pick(['enquiries', 'searchroom', 'research'])} team will still be answered, though replies may take a little longer.",
                    "We will keep answering written enquiries, but replies may be slower than usual."),
                g.s(f"If you had booked a microfilm reader, {g.person()} will contact you to rearrange.",
                    f"Readers who booked a microfilm machine will hear from {g.person()} about a new date."))]
    if size != "short":
        blocks.append(TABLE([["Date", "Searchroom", "Phone line"]] +
                            [[fmt_date(d.fromordinal(d.toordinal() + i)), "Closed", g.pick(["Open", "Open 10am-1pm", "Closed"])]
                             for i in range(min(days, 4))]))
        blocks.append(P(g.s("We apologise for any inconvenience and thank you for your patience.",
                            "We are sorry for the disruption and grateful for your patience.")))
    return title, blocks


def arch_feature(g, size):
    item = g.ch(["a carrier's account book", "a petition about a footpath", "a sampler register",
                 "a valuation of a water mill", "an apprentice's indenture", "a poster for a ploughing match",
                 "a letter about a flooded chapel", "a map of a vanished hamlet"])
    place = g.place()
    y = g.num(1730, 1910)
    who = g.person()
    title = g.s(f"Document of the month: {item} from {place}", f"From the strongrooms: {item}, {place}, {y}")
    blocks = [P(g.s(f"This month we look at {item} from {place}, written in {y}.",
                    f"Our document this month is {item} produced at {place} in {y}."),
                g.s(f"It was chosen by {who}, one of our searchroom volunteers, who came across it while checking a box list.",
                    f"{who}, a searchroom volunteer, picked it out while checking a box list.")),
              P(g.s(f"The document tells us a good deal about daily life in {place} at a time when few ordinary people left records of their own.",
                    f"Few ordinary people in {place} left records of their own, which makes this survival unusually revealing."),
                g.s(f"Names of {g.num(6, 40)} local households appear in it, several of them otherwise unknown.",
                    f"It names {g.num(6, 40)} households from the area, some of which appear nowhere else.")),
              ]
    if size != "short":
        blocks.append(H2(g.ch(["Why it matters", "Reading the document", "A closer look"])))
        blocks.append(P(g.s(f"The hand is neat but the spelling is inventive, so {who} has prepared a transcript for visitors.",
                            f"Because the spelling is inventive, {who} has made a transcript to help visitors."),
                        g.s(f"You can see the original in the foyer case until the end of {g.pick(['March', 'June', 'September', 'November'])}.",
                            f"The original is on show in the foyer case until the end of {g.pick(['March', 'June', 'September', 'November'])}."),
                        g.s(f"It sits beside a map of {place} drawn about {y + g.num(3, 30)} so that you can follow the places it mentions.",
                            f"Next to it is a map of {place} from around {y + g.num(3, 30)}, so the places it names can be traced.")))
    if size == "long":
        blocks.append(UL([f"Reference: {g.pick(['P', 'Q', 'D', 'S'])}/{g.num(10, 900)}/{g.num(1, 40)}",
                          f"Date: {y}", f"Place: {place}", f"Chosen by: {who}"]))
        blocks.append(P(g.s(f"Transcripts of earlier documents of the month are kept in the folder at the searchroom desk.",
                            "Earlier transcripts are kept in a folder at the searchroom desk."),
                        g.s(f"If you know more about the families of {place}, {who} would be glad to hear from you.",
                            f"{who} would welcome anything more you know about the families of {place}."),
                        g.s("Suggestions for future months are always welcome.", "We are always glad to hear suggestions for future months.")))
        blocks.append(P(g.s(f"A talk on the document will be given in the lecture room on {fmt_date(g.date())} at 2pm.",
                            f"On {fmt_date(g.date())} at 2pm there will be a short talk about the document in the lecture room."),
                        g.s("Places are free but limited to thirty, so please book at the searchroom desk.",
                            "The talk is free, but only thirty places are available and booking is needed.")))
    return title, blocks


ARCH_EXTRA = ["A catalogue entry will appear in the online catalogue once checking is finished.",
              "Photography for private research is allowed with a daily permit.",
              "Pencils only may be used in the searchroom."]
ARCH_APPEND = ["Update: the first part of the list is now available to consult in the searchroom on request.",
               "Correction: an earlier version of this page gave the wrong box count, which has now been amended."]

# ---------------------------------------------------------------- orchestra programme notes
COMPOSERS = ["Ottilie Brannagh", "Fenwick Aldous", "Maren Stolliday", "Isidor Quaile", "Lavinia Petherick",
             "Augustin Morrow-Hale", "Henrike Vasterling", "Teodor Kallaway", "Clemency Farrant", "Osric Delamain"]
FORMS = ["Symphony No. {n} in {k}", "Serenade for Strings in {k}", "Concerto for Viola in {k}",
         "Overture: The {w}", "Suite from The {w}", "Nocturnes for Orchestra", "Sinfonietta in {k}",
         "Piano Concerto No. {n} in {k}"]
KEYS = ["D minor", "E flat major", "A major", "F sharp minor", "C major", "G minor", "B flat major"]
WORDS = ["Salt Marsh", "Lantern Fair", "Winter Orchard", "Ferryman", "Glass Harbour", "Night Heron", "Iron Bridge"]


def orch_work(g):
    f = g.uniq(FORMS)
    return f.format(n=g.num(1, 5), k=g.pick(KEYS), w=g.uniq(WORDS))


def orch_note(g, size):
    comp = g.uniq(COMPOSERS)
    work = orch_work(g)
    y = g.num(1871, 1968)
    place = g.place()
    title = g.s(f"Programme note: {comp}, {work}", f"{comp}: {work} - programme note")
    blocks = [P(g.s(f"{comp} wrote the {work} in {y}, during a long summer spent at {place}.",
                    f"The {work} dates from {y}, when {comp} spent a long summer at {place}."),
                g.s(f"It was first played by an amateur orchestra in the town hall, with the composer conducting from the viola desk.",
                    f"The first performance was given by amateurs in the town hall, with {comp.split()[0]} directing from the viola desk.")),
              P(g.s("The opening is quiet, almost hesitant, with a single line passed between the violas and clarinets.",
                    "Everything begins quietly, a single hesitant line handed back and forth between clarinets and violas."),
                g.s(f"Listen for the horn call about {g.num(2, 6)} minutes in, which returns in altered form at the very end.",
                    f"Roughly {g.num(2, 6)} minutes in, a horn call sounds that comes back, changed, at the close."))]
    if size != "short":
        blocks.append(H2(g.ch(["The movements", "Movements", "How the piece unfolds"])))
        mv = g.sample(["Andante tranquillo", "Allegro con brio", "Scherzo: Vivace", "Lento e mesto",
                       "Intermezzo: Allegretto", "Finale: Presto", "Adagio", "Tempo di valse"], g.num(3, 4))
        blocks.append(UL([f"{['I', 'II', 'III', 'IV'][i]}. {m}" for i, m in enumerate(mv)]))
        blocks.append(P(g.s(f"The {mv[1].split(':')[0].lower()} is the heart of the work, and {comp.split()[1]} marked it to be played without pause into what follows.",
                            f"At the centre stands the {mv[1].split(':')[0].lower()}, which runs straight into the next movement without a break."),
                        g.s(f"Critics at the time found the ending abrupt; today it sounds bracing and entirely deliberate.",
                            f"Early listeners called the ending abrupt, though now it seems bracing and wholly intended.")))
    if size == "long":
        blocks.append(H2(g.ch(["Scoring", "Instrumentation"])))
        blocks.append(TABLE([["Section", "Players"],
                             ["Woodwind", f"{g.num(2, 3)} flutes, {g.num(2, 3)} oboes, 2 clarinets, 2 bassoons"],
                             ["Brass", f"{g.num(2, 4)} horns, 2 trumpets, {g.num(1, 3)} trombones"],
                             ["Percussion", g.pick(["timpani", "timpani and triangle", "timpani, side drum and cymbals"])],
                             ["Strings", "first and second violins, violas, cellos, double basses"]]))
        blocks.append(P(g.s(f"Our last performance of the piece was in {g.num(1994, 2019)}, conducted by {g.person()}.",
                            f"We last played it in {g.num(1994, 2019)} under {g.person()}."),
                        g.s(f"This note was written by {g.person()}, who plays in the second violins.",
                            f"The note is by {g.person()} of the second violins."),
                        g.s(f"The score is published in a modern edition prepared from the composer's manuscript held at {g.place()}.",
                            f"We play from a modern edition based on the manuscript now kept at {g.place()}.")))
        blocks.append(P(g.s("Timings are approximate and depend on the conductor's tempi on the night.",
                            "All timings given are approximate and vary with the tempi on the night."),
                        g.s(f"The work lasts about {g.num(18, 42)} minutes.", f"Expect the piece to last around {g.num(18, 42)} minutes.")))
    return title, blocks


def orch_concert(g, size):
    d = g.date()
    venue = g.pick(["St Aidan's Hall", "the Corn Exchange", "Priory Church", "the Assembly Rooms", "Riverside Hall"])
    place = g.place()
    cond = g.person()
    sol = g.person()
    w1, w2 = orch_work(g), orch_work(g)
    c1, c2 = g.uniq(COMPOSERS), g.uniq(COMPOSERS)
    title = g.s(f"Concert: {fmt_date(d, False)} at {venue}, {place}", f"{place} concert, {fmt_date(d, False)}")
    blocks = [P(g.s(f"The Sinfonia returns to {venue} in {place} on {fmt_date(d)} at 7.30pm.",
                    f"On {fmt_date(d)} at 7.30pm the Sinfonia plays at {venue}, {place}."),
                g.s(f"{cond} conducts, and {sol} joins us as soloist.", f"The conductor is {cond}, with {sol} as soloist.")),
              TABLE([["Composer", "Work"], [c1, w1], [c2, w2]]),
              P(g.s(f"Tickets cost {g.num(8, 22)} pounds, with free entry for under-18s and carers.",
                    f"Tickets are {g.num(8, 22)} pounds; under-18s and carers come free."),
                g.s(f"Doors open at 6.45pm and the bar serves drinks in the interval.",
                    "Doors open at 6.45pm, and drinks are served in the interval."))]
    if size != "short":
        blocks.append(P(g.s(f"There is level access from {g.street()}, and a hearing loop covers the front rows.",
                            f"Step-free access is from {g.street()}; the front rows have a hearing loop."),
                        g.s(f"A pre-concert talk with {cond} begins at 6.50pm in the side room.",
                            f"At 6.50pm {cond} gives a short talk in the side room.")))
    return title, blocks


def orch_player(g, size):
    who = g.person()
    inst = g.pick(["principal cello", "second oboe", "sub-principal viola", "timpani", "first horn",
                   "leader", "bass clarinet", "co-principal double bass"])
    place = g.place()
    yrs = g.num(3, 31)
    title = g.s(f"Meet the players: {who}, {inst}", f"Player profile: {who} ({inst})")
    blocks = [P(g.s(f"{who} has played {inst} with the Sinfonia for {yrs} years.",
                    f"For {yrs} years {who} has been our {inst}."),
                g.s(f"By day {who.split()[0]} works as a {g.pick(['surveyor', 'pharmacist', 'school librarian', 'bus driver', 'farrier', 'tax adviser'])} in {place}.",
                    f"Away from the orchestra {who.split()[0]} is a {g.pick(['surveyor', 'pharmacist', 'school librarian', 'bus driver', 'farrier', 'tax adviser'])} based in {place}.")),
              P(g.s(f"Asked for a favourite concert, {who.split()[0]} picks a winter performance in {g.num(2001, 2024)} when the heating failed and everyone played in coats.",
                    f"{who.split()[0]}'s favourite concert was a winter one in {g.num(2001, 2024)}, played in coats after the heating broke down."),
                g.s(f"Outside music the interests are {g.pick(['bell ringing', 'allotment growing', 'fell running', 'restoring clocks', 'sea swimming'])} and long walks.",
                    f"Other passions include {g.pick(['bell ringing', 'allotment growing', 'fell running', 'restoring clocks', 'sea swimming'])} and walking."))]
    if size != "short":
        blocks.append(UL([f"First concert with us: {g.num(1990, 2023)}", f"Instrument made in: {g.place()}",
                          f"Dream piece to play: {orch_work(g)}"]))
    return title, blocks


ORCH_EXTRA = ["Please switch off mobile phones before the music begins.",
              "Large-print programmes are available from the front of house team."]
ORCH_APPEND = ["Update: the soloist has confirmed an encore, to be announced from the stage.",
               "A recording of the first half will be broadcast on community radio later in the season."]

# ---------------------------------------------------------------- housing association tenant notices
BLOCKS_H = ["Kestrel House", "Linden Court", "Foundry Row", "Heron Walk", "Mariner's Close", "Ropery Flats",
            "Sorrel Gardens", "Tanyard Court", "Weir View", "Osier Terrace", "Beacon Rise", "Chandlers Yard"]


def house_works(g, size):
    blk = g.uniq(BLOCKS_H)
    place = g.place()
    work = g.ch(["replacement of the communal heating pipes", "renewal of the roof coverings",
                 "fire door upgrades on every landing", "new entry phone system", "repainting of the stairwells",
                 "replacement of the lift", "damp proofing of the ground floor flats", "window replacement"])
    d = g.wdate()
    con = g.pick(["Hollowbrook Building Services", "Penmarric Contractors", "Dales Fabric Repairs",
                  "Ironwell Maintenance", "Kiln Lane Builders"])
    wk = g.num(2, 14)
    title = g.s(f"Planned works at {blk}, {place}", f"{blk}, {place}: {work}")
    blocks = [P(g.s(f"We will begin {work} at {blk} on {fmt_date(d)}.",
                    f"Work on the {work} at {blk} starts on {fmt_date(d)}."),
                g.s(f"The work is expected to take about {wk} weeks, weather permitting.",
                    f"Allow roughly {wk} weeks for the job, depending on the weather."),
                g.s(f"It will be carried out by {con} on our behalf.", f"{con} will do the work for us.")),
              P(g.s("Working hours will be 8am to 5pm, Monday to Friday, with no noisy work before 9am.",
                    "The team will work from 8am to 5pm on weekdays and will avoid noisy tasks before 9am."),
                g.s(f"Your housing officer, {g.person()}, will call on each household before work begins.",
                    f"Before anything starts, housing officer {g.person()} will visit every household."))]
    if size != "short":
        blocks.append(H2(g.ch(["What to expect", "How this affects you", "During the works"])))
        blocks.append(UL(g.sample(["scaffolding on the front and rear elevations",
                                   "a site cabin in the visitor parking bays",
                                   "short water shut-offs with a day's notice",
                                   "some noise and dust during the day",
                                   "the bin store moved to the side path for a few weeks",
                                   "access to your flat for one visit of about two hours",
                                   "the drying area closed while the work is under way"], g.num(3, 5))))
        blocks.append(P(g.s("If anyone in your home has a health condition that makes this difficult, please tell us so we can plan around it.",
                            "Tell us if a health condition in your household would make the works hard to live with, and we will plan around it."),
                        g.s("There is no charge to tenants for this work.", "Tenants will not be charged for this work.")))
    if size == "long":
        blocks.append(TABLE([["Stage", "Start", "Length"],
                             ["Set up site", fmt_date(d, False), "1 week"],
                             ["Main works", fmt_date(d.fromordinal(d.toordinal() + 7), False), f"{max(1, wk - 2)} weeks"],
                             ["Snagging and clear up", fmt_date(d.fromordinal(d.toordinal() + 7 * (wk - 1)), False), "1 week"]]))
        blocks.append(P(g.s(f"Leaseholders at {blk} will receive a separate letter about any charges.",
                            f"Any charges for leaseholders at {blk} will be set out in a separate letter."),
                        g.s(f"A drop-in session will be held in the {g.pick(['community room', 'site cabin', 'ground floor lobby'])} on {fmt_date(g.date())} from 4pm to 6pm.",
                            f"Come to the drop-in in the {g.pick(['community room', 'site cabin', 'ground floor lobby'])} on {fmt_date(g.date())}, 4pm to 6pm.")))
        blocks.append(P(g.s(f"Photographs of the finished work at {g.pick(BLOCKS_H)} are on the noticeboard if you would like to see what to expect.",
                            f"To see what the finished job looks like, look at the photographs from {g.pick(BLOCKS_H)} on the noticeboard."),
                        g.s("Thank you for your patience while we improve your home.",
                            "We appreciate your patience while these improvements are made.")))
    return title, blocks


def house_rent(g, size):
    yr = g.pick(["2026/27", "2027/28"])
    pct = g.pick(["2.7", "3.1", "3.4", "4.0", "4.2"])
    area = g.place()
    title = g.s(f"Rent and service charges for {yr}: {area} homes", f"{yr} rent notice for homes in {area}")
    blocks = [P(g.s(f"From the first Monday in April, rents for general needs homes in {area} will rise by {pct} per cent.",
                    f"Rents for general needs homes in {area} go up by {pct} per cent from the first Monday in April."),
                g.s(f"This follows the limit set for the year and was agreed by our board in {g.pick(['January', 'February'])}.",
                    f"Our board agreed the figure in {g.pick(['January', 'February'])}, within the limit set for the year.")),
              TABLE([["Charge", "Weekly now", "Weekly from April"]] +
                    [[c, f"{a}.{g.num(10, 99)}", f"{a + g.num(0, 2)}.{g.num(10, 99)}"]
                     for c, a in [("Caretaking", g.num(2, 6)), ("Communal cleaning", g.num(1, 5)),
                                  ("Grounds maintenance", g.num(1, 4)), ("Communal electricity", g.num(0, 3))][:g.num(2, 4)]]),
              P(g.s("Your individual letter shows the exact amount you will pay.", "The exact figure for your home is in your personal letter."),
                g.s(f"If you pay by standing order you will need to change it yourself; direct debits update automatically.",
                    "Direct debits change automatically, but standing orders must be updated by you."))]
    if size != "short":
        blocks.append(P(g.s(f"If you are worried about paying, our money advice worker {g.person()} can help you check your entitlement to support.",
                            f"Worried about paying? {g.person()}, our money advice worker, can check what support you may be entitled to."),
                        g.s("Talking to us early is always better than falling behind.", "It is always better to talk to us early than to fall behind.")))
    return title, blocks


def house_meeting(g, size):
    est = g.uniq(BLOCKS_H)
    d = g.wdate()
    place = g.place()
    title = g.s(f"Residents' meeting for {est} on {fmt_date(d, False)}", f"{est} residents' meeting, {place}")
    blocks = [P(g.s(f"All residents of {est} are invited to a meeting on {fmt_date(d)} at {g.pick(['6pm', '6.30pm', '7pm'])}.",
                    f"There is a meeting for everyone living at {est} on {fmt_date(d)}, starting {g.pick(['6pm', '6.30pm', '7pm'])}."),
                g.s(f"It will be held at the {g.pick(['community centre', 'church hall', 'library meeting room'])} on {g.street()}.",
                    f"The venue is the {g.pick(['community centre', 'church hall', 'library meeting room'])} on {g.street()}.")),
              UL(g.sample(["parking on the estate", "the new cleaning rota", "play area repairs",
                           "anti-social behaviour near the garages", "bin collections", "a tenants' garden scheme",
                           "lighting on the footpaths"], g.num(3, 4))),
              P(g.s(f"{g.person()} from our neighbourhood team will chair, and tea will be provided.",
                    f"Tea will be served, and the meeting is chaired by {g.person()} from the neighbourhood team."))]
    if size != "short":
        blocks.append(P(g.s("If you cannot attend, send your questions in advance and we will include the answers in the notes.",
                            "Send questions beforehand if you can't come, and the answers will go into the notes.")))
    return title, blocks


HOUSE_EXTRA = ["You can also report repairs through your online account at any time.",
               "Please keep communal areas clear of bikes and prams for fire safety."]
HOUSE_APPEND = ["Update: following feedback from residents the start date has been confirmed with the contractor.",
                "Notes from the last residents' meeting are available from the estate office."]

# ---------------------------------------------------------------- farmers' market association
TOWNS_M = ["Ambersett", "Fallowby", "Kelsworth", "Wrayfield", "Saltreach", "Yarrowby", "Deepford", "Harrowgill"]
PRODUCE = ["purple sprouting broccoli", "forced rhubarb", "wild garlic", "new potatoes", "broad beans",
           "heritage tomatoes", "runner beans", "plums", "cobnuts", "squash", "russet apples", "leeks",
           "blackcurrants", "kale", "celeriac", "asparagus"]
STALLS = ["smokehouse", "cider press", "bakery", "goat dairy", "market garden", "flower farm",
          "beekeeper", "charcuterie", "mushroom grower", "preserves kitchen"]


def mkt_profile(g, size):
    who = g.person()
    stall = g.uniq(STALLS)
    place = g.place()
    y = g.num(1998, 2024)
    prod = g.sample(PRODUCE, 3)
    title = g.s(f"Stallholder profile: {who} of {place} {stall}", f"Meet the stallholder: {who}, {stall}")
    blocks = [P(g.s(f"{who} started the {stall} at {place} in {y} with a borrowed van and a single trestle table.",
                    f"In {y}, with one trestle table and a borrowed van, {who} set up the {stall} at {place}."),
                g.s(f"You will find the stall at our {g.pick(TOWNS_M)} and {g.pick(TOWNS_M)} markets most months.",
                    f"Most months the stall trades at our {g.pick(TOWNS_M)} and {g.pick(TOWNS_M)} markets.")),
              P(g.s(f"Everything sold is grown or made within {g.num(4, 28)} miles of the stall, in line with our association rules.",
                    f"In keeping with association rules, all of it comes from within {g.num(4, 28)} miles."),
                g.s(f"This season look out for {prod[0]} and {prod[1]}.", f"Seasonal highlights include {prod[0]} and {prod[1]}."))]
    if size != "short":
        blocks.append(H2(g.ch(["In their own words", "Why the market matters"])))
        blocks.append(P(g.s(f"\"Selling face to face means we hear straight away what people think,\" says {who.split()[0]}.",
                            f"According to {who.split()[0]}, \"selling face to face tells us straight away what people think\"."),
                        g.s(f"The busiest morning so far was the {g.pick(['Christmas', 'Easter', 'harvest'])} market, when the stall sold out before ten.",
                            f"The stall's record morning came at the {g.pick(['Christmas', 'Easter', 'harvest'])} market, sold out before ten o'clock."),
                        g.s(f"Next year the plan is to add {prod[2]} to the range.", f"There are plans to sell {prod[2]} next year.")))
    if size == "long":
        blocks.append(UL([f"Founded: {y}", f"Based at: {place}", f"Markets attended: {g.num(2, 8)} a month",
                          f"Payment: {g.pick(['cash and card', 'card only', 'cash, card and market tokens'])}"]))
        blocks.append(P(g.s(f"Visitors are welcome at {place} on open farm days, which are announced in our newsletter.",
                            f"Open farm days at {place} are announced in the newsletter, and visitors are welcome."),
                        g.s(f"{who.split()[0]} also runs a small apprenticeship for young growers from the district.",
                            f"A small apprenticeship for young growers in the district is run by {who.split()[0]} too.")))
    return title, blocks


def mkt_notice(g, size):
    town = g.pick(TOWNS_M)
    d = g.date()
    change = g.ch(["will move to the car park behind the library", "will finish an hour early",
                   "will be held in the covered hall because of road works", "is cancelled because of the town fun run",
                   "will open at 8am instead of 9am", "will extend into Bridge Street for the summer"])
    title = g.s(f"{town} market {fmt_date(d, False)}: change of arrangements", f"Change to the {town} market on {fmt_date(d, False)}")
    blocks = [P(g.s(f"The {town} market on {fmt_date(d)} {change}.", f"On {fmt_date(d)}, the {town} market {change}."),
                g.s(f"The market manager, {g.person()}, has written to all booked stallholders.",
                    f"All booked stallholders have had a letter from market manager {g.person()}.")),
              P(g.s(f"Parking will be available at the {g.pick(['leisure centre', 'station', 'school field', 'rugby club'])}.",
                    f"Shoppers can park at the {g.pick(['leisure centre', 'station', 'school field', 'rugby club'])}."),
                g.s("All other market dates are unchanged.", "There is no change to any other market date."))]
    if size != "short":
        blocks.append(P(g.s(f"We expect around {g.num(18, 45)} stalls, including several first-time traders.",
                            f"Around {g.num(18, 45)} stalls should be there, some trading with us for the first time.")))
    return title, blocks


def mkt_season(g, size):
    month = g.pick(["March", "May", "June", "August", "September", "October", "November"])
    prod = g.sample(PRODUCE, 5)
    grower = g.person()
    title = g.s(f"What is in season at the market in {month}", f"Market produce guide for {month}")
    blocks = [P(g.s(f"{month} brings {prod[0]} and {prod[1]} to the stalls, along with the last of the {prod[2]}.",
                    f"Expect {prod[0]} and {prod[1]} on the stalls in {month}, plus the tail end of the {prod[2]}."),
                g.s(f"{grower} says the crop has been {g.pick(['early', 'late', 'generous', 'patchy'])} this year after a {g.pick(['wet', 'dry', 'cold', 'mild'])} spring.",
                    f"After a {g.pick(['wet', 'dry', 'cold', 'mild'])} spring, {grower} reports a {g.pick(['early', 'late', 'generous', 'patchy'])} crop.")),
              H2(g.ch(["Best buys this month", "Look out for", "On the stalls"])),
              UL([f"{p} from {g.place()}" for p in prod[:g.num(3, 5)]]),
              P(g.s(f"Our recipe card this month pairs {prod[0]} with {prod[3]}; pick one up at the information stall.",
                    f"Pick up this month's recipe card, which pairs {prod[3]} with {prod[0]}, at the information stall."))]
    if size == "long":
        blocks.append(P(g.s(f"Growers ask customers to bring their own bags, and several stalls now offer refills of oil and vinegar.",
                            "Please bring your own bags; several stalls now refill oil and vinegar bottles."),
                        g.s(f"Prices for {prod[1]} should settle by the middle of the month as more growers harvest.",
                            f"As more growers harvest, {prod[1]} prices ought to settle by mid-month.")))
    return title, blocks


MKT_EXTRA = ["Dogs on leads are welcome at all our markets.", "Most stalls now take card payments."]
MKT_APPEND = ["Update: the association has confirmed the arrangements with the town council.",
              "Stallholders can still book a pitch for later dates through the market office."]
