"""Hand-written English hosts, part 3: misc."""
from hostlib import H

HOSTS = [
H("mi01", "en", "misc", "Neighbourhood Newsletter — April",
  "Rosalind Achterberg", "Elm Crescent Residents' Association", "elmcrescent.example.org", "2026-04-02", """
Welcome to the April newsletter. Spring is here, and so are the roadworks.

## Roadworks on Station Road

The water company will replace the main between the bakery and the school from 13 April for about three weeks.
Buses will divert via Mill Lane. Parking on the east side will be suspended during working hours.

## Garden swap

Bring seedlings, cuttings and spare pots to the community hall on Saturday 18 April, 10:00 to 12:00. Last year more
than 300 plants found new homes.

## Litter pick results

Thank you to the 22 residents who joined the March litter pick. We filled 31 bags and reported two fly-tipping sites
to the council, both now cleared.

## Committee news

Our treasurer, Horace, is stepping down after six years. If you would like to help with the accounts, speak to any
committee member. No accountancy qualification needed, just patience with spreadsheets.

## Dates for your diary

- 18 April: garden swap
- 2 May: annual general meeting, 19:30 at the hall
- 16 May: street party planning meeting

Contributions for the May issue to the editor by 25 April, please.
"""),

H("mi02", "en", "misc", "Minutes of the Board Meeting, 12 March",
  "Company Secretary", "Greyfriars Housing Cooperative", "board.greyfriars.example.org", "2026-03-13", """
Present: A. Mwangi (chair), C. Delacroix, P. Haverkamp, S. Yilmaz, T. Quist. Apologies: R. Fairbairn.
In attendance: J. Okafor (finance officer).

## 1. Minutes of the previous meeting

Approved without amendment.

## 2. Finance report

J. Okafor presented the quarterly accounts. Rental income was 2% above budget; maintenance spending was 11% above
budget because of the boiler replacements at Block C. Reserves remain above the minimum set by the policy.

Resolved: to approve the accounts for submission to the auditors.

## 3. Repairs backlog

P. Haverkamp reported 47 open repair requests, down from 63. The target of 30 by June remains realistic. The board
asked for a breakdown by urgency at the next meeting.

## 4. Digital services

S. Yilmaz proposed trialling an online chat assistant to answer common tenant questions such as bin days and repair
reporting. Concerns were raised about tenants without internet access. Agreed: trial for three months alongside the
phone line, with a report to the board in July.

## 5. Any other business

None.

Next meeting: 9 April, 18:30, community room.
## Appendix A: Report on tenant engagement (presented by C. Delacroix)

C. Delacroix summarised the results of the autumn tenant survey. 212 households responded, a response rate of 41%,
up from 29% two years ago. Satisfaction with repairs rose from 58% to 66%, and satisfaction with communication rose
from 61% to 70%. The lowest scores were for the handling of complaints about noise and for the condition of shared
gardens.

Tenants asked for more evening meetings, a printed newsletter for those who do not use e-mail, and clearer
information about how rent increases are calculated. Several tenants said they did not know who their estate
officer was. The board discussed whether each block should have a named contact displayed on the noticeboard.

Agreed actions:

1. The estate team will display a named contact in each block by the end of April.
2. The newsletter will be printed quarterly and delivered to every household, with an online version as well.
3. Two of the four annual tenant meetings will be held in the evening.
4. A short guide explaining rent calculations will be drafted by the finance officer and reviewed by two tenant
   volunteers before publication.

## Appendix B: Risk register review

T. Quist presented the updated risk register. Two risks were raised in rating: the availability of contractors for
roofing work, given rising demand in the region, and the cost of insurance, which is expected to rise by between 8%
and 12% at renewal. One risk was lowered: the risk of a data breach, following the move to the new housing management
system with two-factor sign-in.

The board asked that the register include a new risk covering the proposed chat assistant trial, including the
possibility that the assistant gives incorrect information about tenancy rights. S. Yilmaz agreed to draft the entry
with mitigations, such as limiting the assistant to factual topics and showing a clear route to a human officer.

## Appendix C: Correspondence

The secretary reported letters from the council about the new recycling collection schedule and from a tenant
thanking the maintenance team for the quick repair of a heating fault over the Christmas period. The board asked
that the thanks be passed on to the team.
"""),

H("mi03", "en", "misc", "Quarterly Report: Visitor Numbers at Fenwick Botanic Garden",
  "Visitor Services", "Fenwick Botanic Garden Trust", "fenwickgarden.example.org", "2026-04-06", """
This report covers January to March and compares it with the same quarter last year.

| Month | 2025 visitors | 2026 visitors | Change |
|---|---|---|---|
| January | 4,120 | 4,560 | +10.7% |
| February | 5,030 | 5,410 | +7.6% |
| March | 8,940 | 10,275 | +14.9% |

## Commentary

Growth was strongest in March, helped by the orchid festival and mild weather. School visits rose from 38 to 51
groups. Membership sales reached 412, the best first quarter on record.

## Café and shop

Café income rose 9%. The shop's seed range sold out twice; we have increased the order for next quarter.

## Challenges

Car park capacity was exceeded on four weekend days. We are discussing overflow parking with the neighbouring
school. Two greenhouse heaters failed in February; replacement cost is covered by the maintenance reserve.

## Outlook

Bookings for the spring plant fair are ahead of last year. We expect visitor numbers in the second quarter to be
about 8% higher than in 2025.
"""),

H("mi04", "en", "misc", "Email: Photos from the Retirement Lunch (attachment list)",
  "Yevgenia Calloway", "Pondside Veterinary Practice", "pondsidevets.example.com", "2026-03-28", """
Hi all,

Thank you for coming to Marjorie's retirement lunch on Friday. It was lovely to see so many former colleagues. I've
put the photos on the shared drive under Events/2026/Marjorie. A few people asked for the small group shot by e-mail,
so here is the thumbnail inline as data, which should display in most mail programs:

```text
data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAoAAAAKCAIAAAACUFjqAAAAEklEQVR4nGP8z4APMOGVZRip0gBBLAETee26JQAAAABJRU5ErkJggg==
```

Marjorie asked me to pass on her thanks for the card and the gift voucher. She says she'll spend it on a new pair of
walking boots and a guidebook for the coast path.

A reminder that the practice is closed on Monday for the staff training day. The out-of-hours service will take
calls as usual on 555-0117.

If you took photos of your own, please add them to the same folder, and label them with your name so we know who to
credit in the newsletter.

The caterers have asked us to return the two serving dishes we borrowed; they're in the staff room on the top
shelf.

Best wishes,
Yevgenia
"""),

H("mi05", "en", "misc", "Product Update: What's New in Ledgerly 4.2",
  "Product Team", "Ledgerly Bookkeeping", "blog.ledgerly.example.com", "2026-03-25", """
Ledgerly 4.2 is rolling out to all accounts this week. Here's what's new.

## Smarter bank matching

The matching assistant now suggests a category for 85% of transactions in our tests, up from 70%. You always confirm
the suggestion before it's saved.

## Receipt capture

Snap a receipt with the mobile app and Ledgerly reads the date, supplier and total. If it can't read something, it
asks you rather than guessing.

## VAT return preview

Before you submit, you can now see a line-by-line preview of the return with links to the underlying transactions.

## Fixes

- CSV exports now use the date format you chose in settings.
- The invoice editor no longer loses the last line when you press Tab quickly.
- Dark mode colours in reports are easier to read.

## Coming next

We're working on multi-currency invoices and a simpler year-end checklist. Tell us what you'd like next through the
feedback button in the app.

Thank you for using Ledgerly. If you have questions about this release, our support team is available on weekdays
from 8 to 6.
"""),

H("mi06", "en", "misc", "Field Trip Report: Upper Dunmore Wetland Survey",
  "Ecology Society", "Dunmore Naturalists' Society", "naturalists.dunmore.example.org", "2026-04-12", """
Eleven members took part in the survey on 5 April. Conditions: overcast, light westerly wind, 11 °C.

## Birds

We recorded 34 species. Highlights were a pair of little grebes on the north pool, at least six reed buntings and a
single early sand martin. The heron colony has 14 occupied nests, two more than last year.

## Amphibians

Frog spawn was abundant in the shallow scrape. We found toad strings in the deeper pool. No newts were seen during
the day; a night visit is planned.

## Plants

Marsh marigold was in full flower along the ditch. The invasive pond weed noted last autumn has spread about five
metres along the east bank. We have informed the landowner.

## Data

All records have been entered into the society's database and shared with the county records centre. Photographs are
in the members' gallery.

## Thanks

Thanks to the landowner for access and to Agnieszka for leading the walk. The next survey is on 3 May; meet at the
field gate at 8:00.
"""),

H("mi07", "en", "misc", "Customer Letter: Changes to Your Broadband Plan",
  "Customer Services", "Valewire Community Broadband", "valewire.example.net", "2026-02-27", """
Dear customer,

We are writing to let you know about changes to your plan from 1 May.

## What is changing

Your download speed will increase from 80 to 150 Mbps at no extra cost. Upload speed will increase from 20 to 30
Mbps. Your monthly price stays the same until your contract ends.

## What you need to do

Nothing, in most cases. If your router is older than 2021, we will send you a new one in April with instructions.
Please return the old router in the prepaid bag.

## Planned work

To make these changes, we will upgrade equipment in your area. There may be short interruptions between midnight and
5:00 on two nights in April. We will text you the dates a week before.

## Your rights

If you do not want these changes, you can leave your contract without a fee within 30 days of this letter.

## Questions

Visit our help pages or call 555-0133 on weekdays. Our chat assistant can also answer common questions at any time.

Yours faithfully,
Customer Services
"""),

H("mi08", "en", "misc", "Book Club Notes: The Lighthouse Keeper's Ledger",
  "Sunniva Roche", "Corbridge Lane Book Club", "bookclub.corbridge.example.org", "2026-03-31", """
Seven of us met at Hamid's on Tuesday to discuss this month's novel, a quiet story about a keeper who records ships,
weather and his own doubts in a single ledger over one winter.

## What we liked

Most of us enjoyed the ledger format. Several people said the short entries made them slow down. Eleanor loved the
way the weather entries mirror the keeper's mood without ever saying so.

## What divided us

The ending. Half the group found the final entry moving; the others thought it was too neat. Hamid argued that the
ledger is unreliable from the start, so we should not trust the ending either.

## Questions we discussed

1. Why does the keeper never name the ship that sank?
2. Is the supply-boat captain a friend or a threat?
3. Would the book work as a conventional novel?

## Next month

We are reading a collection of short stories set in mountain villages. Sunniva will host. Please bring a story you
would recommend to the group, and remember that it's your turn to bring cake if your name starts with A to F.
"""),

H("mi09", "en", "misc", "Research Group Weekly Update",
  "Lab Coordinator", "Marlowe Soil Biology Lab", "soilbio.marlowe.example.ac.example.org", "2026-03-06", """
Weekly update for group members. Please add anything I missed.

## Experiments

- The incubation series started on Monday. Sampling points are at days 1, 3, 7, 14 and 28.
- The nitrogen analyser is back from service and calibrated. Book slots on the shared calendar.
- Sample batch B failed the quality check because of a labelling error. It will be re-extracted next week.

## Papers and talks

Ifeoma's paper on root exudates was accepted with minor revisions. Congratulations! Lucas gives the departmental
seminar on 19 March; practice talk on the 16th in the small meeting room.

## Lab housekeeping

The -80 °C freezer is nearly full. Please clear out anything older than two years or label it with a keep-until
date. Unlabelled boxes will be moved to the overflow freezer on 20 March.

## Reminders

Safety training renewals are due for four people; you have had an e-mail. The group lunch is on Friday at 12:30; bring
a dish if you can.

## Data management

Raw data must go on the group drive, not on personal laptops. The drive is backed up every night. Ask me if you need a
new project folder.
"""),
]
