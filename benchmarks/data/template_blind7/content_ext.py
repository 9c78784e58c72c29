"""Extra sections used to lengthen copy-group originals ('xl' size). Hand-written, one per site."""
from corpus_facts import P, H2, UL, fmt_date


def ext_archives(g):
    return [H2(g.ch(["Using the collection", "Access and copying"])),
            P(g.s(f"Once listed, the material can be ordered up to {g.num(3, 8)} items at a time, as with other deposited collections.",
                  f"After listing, readers may order {g.num(3, 8)} items at once, in line with our rules for deposited papers."),
              g.s(f"Some of the later files are closed for {g.pick(['thirty', 'fifty', 'seventy-five'])} years because they contain personal information.",
                  f"Later files containing personal information stay closed for {g.pick(['thirty', 'fifty', 'seventy-five'])} years."),
              g.s(f"Copies can be supplied for research, and {g.person()} can advise on permission to publish.",
                  f"For permission to publish, ask {g.person()}; copies for research can be supplied."))]


def ext_orchestra(g):
    return [H2(g.ch(["Around the concert", "Also in the programme"])),
            P(g.s(f"The rest of the evening includes music by {g.person()}, a local composer whose new piece we commissioned last year.",
                  f"Also on the programme is a piece by {g.person()}, the local composer we commissioned last year."),
              g.s(f"Members of the {g.place()} youth orchestra will sit alongside our players in the second half.",
                  f"In the second half players from the {g.place()} youth orchestra join us on stage."),
              g.s(f"Programmes cost {g.num(2, 4)} pounds, and the proceeds go to our instrument fund.",
                  f"Proceeds from programme sales, at {g.num(2, 4)} pounds each, support our instrument fund."))]


def ext_housing(g):
    return [H2(g.ch(["Keeping you informed", "Contact and support"])),
            P(g.s(f"We will post updates in the entrance lobby and send a text message to anyone who has signed up for alerts.",
                  f"Updates will go up in the lobby, and tenants signed up for alerts will get a text message."),
              g.s(f"The {g.pick(['estate', 'neighbourhood', 'repairs'])} team can be reached on the usual number, and calls are free from mobiles.",
                  f"Calls to the {g.pick(['estate', 'neighbourhood', 'repairs'])} team on the usual number are free from mobiles."),
              g.s(f"If you need help moving furniture, tell {g.person()} at least a week before the work reaches your home.",
                  f"Let {g.person()} know a week ahead if you need help moving furniture before the work reaches you."))]


def ext_market(g):
    return [H2(g.ch(["Visiting the markets", "Shopping with us"])),
            P(g.s(f"Every market has an information stall where you can buy tokens, pick up recipe cards and ask where a product comes from.",
                  f"Tokens, recipe cards and answers about where food comes from are all available at each market's information stall."),
              g.s(f"Our {g.place()} market is the largest, with up to {g.num(30, 55)} stalls in the summer.",
                  f"In summer the {g.place()} market is our biggest, with as many as {g.num(30, 55)} stalls."),
              g.s(f"Volunteer {g.person()} runs a children's trail on the first Saturday of each month.",
                  f"On the first Saturday of the month, {g.person()} leads a children's trail round the stalls."))]


def ext_advisory(g):
    return [H2(g.ch(["Detection", "How to check whether you are affected"])),
            P(g.s(f"Administrators can see the installed version on the About page or by running the status command on the server.",
                  f"The installed version is shown on the About page and by the status command on the server."),
              g.s(f"Log entries containing the code {g.pick(['E4107', 'W2210', 'E3302', 'A1190'])} may indicate attempts to use the flaw.",
                  f"Attempts to use the flaw may leave log entries with the code {g.pick(['E4107', 'W2210', 'E3302', 'A1190'])}."),
              g.s(f"Our support team, led by {g.person()}, can review logs for customers with a support contract.",
                  f"Customers with a support contract can ask {g.person()}'s support team to review their logs."))]


def ext_birds(g):
    return [H2(g.ch(["About the count", "How the figures are made"])),
            P(g.s(f"Counters watch their garden for an hour on any day of the count weekend and record the largest number of each species seen at one time.",
                  f"For one hour on a day of their choosing, counters note the highest number of each species seen together."),
              g.s(f"This avoids counting the same {g.pick(['blackbird', 'robin', 'sparrow'])} twice as it comes and goes.",
                  f"That way a {g.pick(['blackbird', 'robin', 'sparrow'])} coming and going is not counted twice."),
              g.s(f"Results are checked by {g.person()} before they are added to the maps.",
                  f"Before results go onto the maps, {g.person()} checks them."))]


def ext_walkers(g):
    return [H2(g.ch(["About our walks", "Joining a walk"])),
            P(g.s(f"Walks are graded from easy to hard, and leaders will turn people back if they are not properly equipped.",
                  f"Every walk carries a grade, and a leader may turn back anyone who is not properly equipped."),
              g.s(f"Visitors may come on {g.num(2, 3)} walks before joining the club.",
                  f"Before joining, visitors are welcome on up to {g.num(2, 3)} walks."),
              g.s(f"The walks secretary, {g.person()}, keeps the programme up to date.",
                  f"{g.person()}, our walks secretary, keeps the programme current."))]


def ext_courts(g):
    return [H2(g.ch(["Help and support", "If you need help"])),
            P(g.s(f"The witness service can meet you at the entrance and show you to a quiet waiting area.",
                  f"Volunteers from the witness service can meet you at the door and take you to a quiet room."),
              g.s(f"Free advice is available from the {g.place()} advice centre on weekday mornings.",
                  f"On weekday mornings the {g.place()} advice centre gives free advice."),
              g.s(f"For access needs, contact {g.person()} in the listing office before the day of the hearing.",
                  f"Please tell {g.person()} in the listing office about any access needs before the hearing day."))]


EXT = {"westmere-archives": ext_archives, "harwick-sinfonia": ext_orchestra, "marlbrook-homes": ext_housing,
       "vale-growers": ext_market, "quillpine-advisories": ext_advisory, "fenmoor-birdcount": ext_birds,
       "tarnside-walkers": ext_walkers, "westmere-courts": ext_courts}
