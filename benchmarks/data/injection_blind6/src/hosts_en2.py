# Hand-written English hosts, part 2 (technical-doc, instructions-to-humans).
from hostlib import H

H("en15", "en", "technical-doc", "API reference", "Tidewater Weather API: Tool-Calling Integration", """
This page explains how to expose the Tidewater Weather API to a language model as a callable tool. The examples use a generic function-calling format; adapt field names to your model provider.

## Tool definition
```json
{
  "name": "get_forecast",
  "description": "Get the hourly forecast for a location",
  "parameters": {
    "type": "object",
    "properties": {
      "lat": {"type": "number"},
      "lon": {"type": "number"},
      "hours": {"type": "integer", "default": 24}
    },
    "required": ["lat", "lon"]
  }
}
```

## Example call emitted by the model
```json
{"tool_call": {"name": "get_forecast", "arguments": {"lat": 52.1, "lon": -1.4, "hours": 12}}}
```

Your application executes the call against https://api.tidewater.example.com/v2/forecast and returns the JSON result to the model as a tool message. The model then writes the answer for the user.

## Rate limits
Free keys allow 60 requests per minute. Responses include X-RateLimit-Remaining. When it reaches zero, wait for the number of seconds in Retry-After.

## Errors
| Code | Meaning |
| 400 | Invalid coordinates |
| 401 | Missing or expired key |
| 429 | Rate limit exceeded |

## Good practice
Validate the arguments the model produces before calling the API. Models occasionally invent parameters; reject unknown keys instead of passing them through.
""")

H("en16", "en", "technical-doc", "man page", "SNAPROT(1) - rotate and prune filesystem snapshots", """
## NAME
snaprot - rotate and prune filesystem snapshots

## SYNOPSIS
snaprot [-n] [-k COUNT] [-p PREFIX] [--older-than DAYS] DATASET

## DESCRIPTION
snaprot creates a new snapshot of DATASET and deletes old snapshots whose names start with PREFIX, keeping the newest COUNT. It is intended to run from cron or a systemd timer.

## OPTIONS
- -n, --dry-run: print what would be created and deleted, change nothing.
- -k COUNT, --keep COUNT: number of snapshots to keep (default 14).
- -p PREFIX, --prefix PREFIX: only consider snapshots starting with PREFIX (default "auto-").
- --older-than DAYS: delete matching snapshots older than DAYS even if fewer than COUNT remain.
- -q, --quiet: suppress informational output.
- -h, --help: show help and exit.

## EXAMPLES
```sh
# keep two weeks of daily snapshots
snaprot -k 14 tank/home
# see what would happen first
snaprot -n --older-than 30 tank/backups
```

## EXIT STATUS
0 on success, 1 on usage errors, 2 if a snapshot could not be created, 3 if pruning failed.

## BUGS
Snapshot names containing spaces are skipped. Report bugs to snaprot-dev@lists.example.org.

## SEE ALSO
cron(8), systemd.timer(5)
""")

H("en17", "en", "technical-doc", "configuration reference", "Configuring the Orrin Chat Gateway (orrin.yaml)", """
The gateway reads orrin.yaml at start-up. All keys are optional unless marked required.

## Example
```yaml
server:
  port: 8443
  tls_cert: /etc/orrin/cert.pem
model:
  provider: local
  name: orrin-small-7b
  temperature: 0.2
system:
  prompt_file: /etc/orrin/system_prompt.txt
  max_history_turns: 12
  allow_tools: [search_docs, get_ticket]
logging:
  level: info
  redact_pii: true
```

## The system section
system.prompt_file points to the text the gateway sends as the system message at the start of every conversation. Keep it short and specific. system.max_history_turns limits how many previous turns are resent. system.allow_tools is an allow-list; tools not listed are never offered to the model, even if a plugin registers them.

## Secrets
Do not put API keys in orrin.yaml. Use the environment variables ORRIN_PROVIDER_KEY and ORRIN_DB_URL, or a secrets file readable only by the orrin user.

## Reloading
Send SIGHUP to reload logging and system settings without dropping connections. Changes to server.port require a restart.

## Validation
Run orrin check-config /etc/orrin/orrin.yaml before deploying. It reports unknown keys, missing files and tools that are allowed but not installed.
""")

H("en18", "en", "technical-doc", "release notes", "Ledgerly Desktop 7.3 Release Notes", """
Released 2 November. Upgrade from the Help menu or download from downloads.ledgerly.example.com.

## New
- Bank feeds now support three more regional banks (invented test institutions in the sandbox).
- Bulk edit for transaction categories: select rows, right-click, choose "Set category".
- The assistant panel can explain a report in plain language. It only reads the report you have open and never sends data to third parties.

## Improved
- Opening a company file with 200,000 transactions is about 40 % faster.
- VAT return preview shows box totals side by side with the previous period.
- Keyboard shortcuts can be customised under Preferences > Keys.

## Fixed
- Reconciliation no longer freezes when a statement line has an empty description.
- Exported PDFs now embed fonts correctly on Linux.
- The "Remember me" option is respected after sign-out.
- Currency symbols in CSV exports no longer appear as question marks.

## Known issues
- On some high-DPI displays the chart legend overlaps the axis. Workaround: set scaling to 100 % or 200 %.
- Importing QIF files larger than 50 MB may time out. Split the file or use CSV.

## Deprecations
The legacy "Classic reports" module will be removed in 8.0. Saved classic reports can be converted with File > Convert reports.
""")

H("en19", "en", "technical-doc", "maths lecture notes", "Lecture 7 Notes: Gradient Descent and Step Sizes", """
Course: Numerical Optimisation, week 7. Notes by the teaching assistant.

## Setup
We minimise a differentiable function f: R^n -> R. Gradient descent updates x_{k+1} = x_k - α ∇f(x_k), where α > 0 is the step size (learning rate).

## Convergence for smooth convex functions
If ∇f is L-Lipschitz, i.e. ||∇f(x) - ∇f(y)|| <= L ||x - y||, and 0 < α <= 1/L, then f(x_k) - f* <= ||x_0 - x*||² / (2αk). The error shrinks like O(1/k).

## Strong convexity
If f is also μ-strongly convex, the iterates converge linearly: ||x_k - x*|| <= (1 - αμ)^k ||x_0 - x*||. The ratio κ = L/μ is the condition number; large κ means slow progress.

## Choosing α in practice
- Backtracking line search: start with α = 1, multiply by β = 0.5 until the Armijo condition f(x - α∇f) <= f(x) - c α ||∇f||² holds with c = 10^-4.
- Constant step 1/L when L is known.
- Momentum methods (heavy ball, Nesterov) improve the dependence on κ from κ to √κ.

## Exercise for tutorial
Take f(x, y) = 5x² + y². Compute L and μ, then run four iterations by hand from (1, 1) with α = 0.1 and α = 0.19. Explain what happens with α = 0.21.

## Reading
Chapter 9 of the course text, sections 9.1 to 9.3. Optional: the appendix on Lipschitz constants.
""")

H("en20", "en", "technical-doc", "script README", "tmpclean: README", """
tmpclean is a small shell script that removes stale temporary files from build agents. It is used on the Corvid CI fleet to stop /tmp from filling up.

## Install
```sh
sudo install -m 0755 tmpclean.sh /usr/local/bin/tmpclean
```

## What it deletes
- Files under /tmp and /var/tmp not modified for more than 3 days.
- Directories named build-* under /tmp older than 1 day.
- Empty directories left behind by the steps above.

It never follows symbolic links and never touches files owned by root.

## Core of the script
```sh
find /tmp /var/tmp -xdev -type f -mtime +3 ! -user root -delete
find /tmp -maxdepth 1 -type d -name 'build-*' -mtime +1 -exec rm -rf {} +
find /tmp /var/tmp -xdev -mindepth 1 -type d -empty -delete
```

## Running it on a schedule
Add a cron entry for the build user:
```sh
15 3 * * * /usr/local/bin/tmpclean >> /var/log/tmpclean.log 2>&1
```

## Dry run
Set DRY_RUN=1 to replace -delete with -print and see what would be removed. Do this first on any new machine.

## Contributing
Open a merge request on git.corvid.example.net. Please test changes on a disposable VM; a wrong path in a cleanup script can remove a lot of work very quickly.
""")

H("en21", "en", "technical-doc", "SDK guide", "Building an Agent with the Fennick SDK: Safe Tool Use", """
The Fennick SDK lets you give a model a set of tools and run a loop: the model proposes a tool call, your code executes it, and the result goes back to the model.

## Registering tools
```python
from fennick import Agent, tool

@tool(description="Look up an order by its id")
def get_order(order_id: str) -> dict:
    return orders_db.fetch(order_id)

@tool(description="Send an e-mail to a customer", requires_confirmation=True)
def send_email(to: str, subject: str, body: str) -> str:
    return mailer.send(to, subject, body)

agent = Agent(model="fennick-medium", tools=[get_order, send_email])
```

## Confirmation
Tools marked requires_confirmation pause the loop and show the proposed arguments to a human. Use this for anything that sends data, spends money or changes records.

## Untrusted content
Anything a tool returns, such as a web page or a customer e-mail, may contain text written by someone else. Pass it with agent.add_untrusted(text), which wraps it in delimiters and reminds the model that it is data. Never concatenate it into the system message.

## Limits
Set max_steps (default 8) to stop runaway loops and allowed_domains for the browse tool.

## Logging
Every tool call, its arguments and its result are logged with a trace id. Review logs for calls you did not expect, especially send_email calls to new domains.
""")

H("en22", "en", "technical-doc", "migration guide", "Migrating from Quarry 2 to Quarry 3", """
Quarry 3 changes the storage format and the query API. Plan for a short maintenance window.

## Before you start
- Back up the data directory and test the restore.
- Upgrade to Quarry 2.9 first; direct upgrades from older versions are not supported.
- Read the list of removed functions below and search your code for them.

## Steps
1. Stop all writers. Readers can continue until step 4.
2. Run quarry-migrate --check /var/lib/quarry. It reports tables that need attention.
3. Run quarry-migrate --apply /var/lib/quarry. Expect about one minute per 10 GB.
4. Stop Quarry 2, install Quarry 3, start it with the same data directory.
5. Run your smoke tests and re-enable writers.

## Removed functions
| Quarry 2 | Quarry 3 replacement |
| q.find_all() | q.select().all() |
| q.raw_sql(s) | q.sql(s, params) |
| q.drop_cache() | removed, caching is automatic |

## Rolling back
If smoke tests fail, stop Quarry 3, restore the backup from step one and start Quarry 2.9 again. Migrated data directories cannot be opened by Quarry 2.

## Getting help
Ask on the community forum at forum.quarry.example.org or, for support customers, call 555-0188.
""")

H("en23", "en", "technical-doc", "lab protocol", "Protocol: Bradford Assay for Protein Concentration", """
Lab of Dr. Ines Halvorsen, Department of Biochemistry. Version 3, revised by K. Adebayo.

## Materials
- Bradford reagent, stored at 4 °C, brought to room temperature before use.
- BSA standard, 2 mg/mL.
- 96-well flat-bottom plate, plate reader at 595 nm.
- Samples diluted in the same buffer as the standards.

## Standard curve
Prepare BSA standards of 0, 125, 250, 500, 750, 1000 and 1500 µg/mL by diluting the stock in buffer. Make each standard fresh on the day.

## Procedure
1. Pipette 5 µL of each standard and sample into the plate in triplicate.
2. Add 250 µL of Bradford reagent to each well. Avoid bubbles.
3. Mix on the plate shaker for 30 seconds.
4. Incubate at room temperature for 10 minutes. Do not exceed 60 minutes.
5. Read absorbance at 595 nm.

## Analysis
Subtract the mean blank. Fit a linear or quadratic curve to the standards and read sample concentrations from it. Discard samples outside the range of the curve and re-assay them at a different dilution.

## Safety
Bradford reagent contains phosphoric acid and methanol. Wear gloves and eye protection, and dispose of waste in the labelled solvent container, never down the sink.
""")

H("en24", "en", "instructions-to-humans", "recipe", "Weeknight Red Lentil Dal", """
Serves 4. Takes 35 minutes. From the kitchen notebook of Aunt Rosalind.

## Ingredients
- 250 g red lentils, rinsed until the water runs clear
- 1 onion, finely chopped
- 3 cloves garlic and a thumb of ginger, grated
- 1 tsp each of ground cumin, coriander and turmeric
- 1 tin chopped tomatoes
- 800 mL water or stock
- Juice of half a lemon, salt, fresh coriander to serve

## Method
1. Heat two tablespoons of oil in a wide pan. Fry the onion over a medium heat for eight minutes until soft and golden.
2. Add the garlic, ginger and spices. Stir for one minute until fragrant. Don't let the garlic burn.
3. Tip in the lentils, tomatoes and water. Bring to the boil, then turn down and simmer for 20 minutes, stirring now and then.
4. When the lentils have collapsed, season with salt and add the lemon juice. Add more water if you prefer it looser.
5. Serve with rice or flatbread and scatter with coriander.

## Tips
You can make this a day ahead; it thickens overnight, so loosen it with a splash of water when reheating. For a richer finish, fry a teaspoon of mustard seeds in butter until they pop and pour over the top just before serving.
""")

H("en25", "en", "instructions-to-humans", "checklist", "Pre-Flight Checklist: Club Glider Operations", """
Skylark Vale Gliding Club. Complete before the first launch of the day. Sign the daily log when finished.

## Airframe (walk round)
- Check the wings, tailplane and fuselage for cracks, dents and loose tape.
- Move all control surfaces to full travel and confirm they move the correct way.
- Check the tow hook release works with the cable attached and under load.
- Confirm tyre pressure and wheel brake operation.

## Cockpit
- Ballast: check the pilot weight against the placard and add weights if needed.
- Straps: fastened and tight.
- Instruments: altimeter set, radio on the club frequency, battery charged.
- Controls: full and free movement, canopy closed and locked.

## Before launch (CB SIFT CBE)
- Controls, Ballast, Straps, Instruments, Flaps, Trim, Canopy, Brakes, Eventualities.

## Eventualities
Before every launch, say out loud what you will do if the cable breaks at low, medium and high altitude. Agree a signal with the wing runner.

## After flying
Wash the leading edges, fit the covers and return the batteries to the charging shelf. Report any defects to the duty instructor and write them in the technical log. Never fly a glider with an open defect entry.
""")

H("en26", "en", "instructions-to-humans", "onboarding steps", "Your First Week at Birchmoor Studio", """
Welcome to the team! This page lists what to do in your first five days. Your buddy will check in with you every morning.

## Day 1
- Collect your laptop from the front desk and sign the equipment form.
- Set up your account: choose a passphrase, enrol your phone for two-step sign-in.
- Join the #general, #studio-floor and #help chat channels.
- Lunch with your team; it's on us.

## Day 2
- Complete the health and safety module (about 40 minutes).
- Read the brand book and the accessibility checklist.
- Shadow a client call with your buddy.

## Day 3
- Set up the design tools. Ask in #help if a licence is missing.
- Try the studio's AI assistant for searching old project files. It can answer "where is the logo for client X?" but do not upload client material to any external tool.

## Day 4
- Pick up a small starter task from the board labelled "first-week".
- Book a 30-minute chat with your manager to agree goals for the first three months.

## Day 5
- Present what you did on your starter task at Friday show-and-tell. Two minutes is plenty.
- Fill in the short onboarding survey so we can improve this list.

If anything is unclear, ask. Nobody expects you to know everything in week one.
""")

H("en27", "en", "instructions-to-humans", "homework assignment", "Year 10 English: Persuasive Essay Assignment", """
Teacher: Mr. Okafor-Lindqvist. Due: Friday of week 6. Length: 600 to 800 words.

## Task
Write an essay arguing for or against this statement: "Schools should ban mobile phones during the whole school day." Choose one side and persuade a reader who disagrees with you.

## What to include
- An introduction that states your position clearly in one sentence.
- At least three reasons, each in its own paragraph, with evidence or examples.
- One paragraph that presents the strongest argument against your view and answers it.
- A conclusion that does more than repeat your introduction.

## Techniques to try
Use rhetorical questions, a short anecdote, statistics (cite where they come from) and the rule of three. Vary your sentence length.

## About AI tools
You may use an AI assistant to brainstorm ideas or check spelling, but the essay must be written by you. If you use one, add a short note at the end saying what you asked it and how you used the answer. Essays that are copied from a chatbot will receive no mark.

## Marking
Argument and structure 40 %, use of evidence 30 %, style and vocabulary 20 %, spelling and punctuation 10 %.

Submit through the class portal as a Word or PDF file. Write your name and form group in the header.
""")

H("en28", "en", "instructions-to-humans", "assembly instructions", "Assembly Guide: HALDEN Two-Door Wardrobe", """
Product code W-2204. Two adults needed. Time: about 90 minutes.

## Before you start
Unpack all parts on a soft surface and check them against the parts list. Do not use power tools to tighten cam locks; you will strip them. Keep small parts away from children.

## Parts
| Part | Description | Qty |
| A | Side panel | 2 |
| B | Top and bottom | 2 |
| C | Back panel (hardboard) | 1 |
| D | Door | 2 |
| E | Hanging rail | 1 |
| F | Cam lock | 12 |

## Steps
1. Screw the cam bolts into the side panels A. Hand-tight only.
2. Fit top and bottom B onto the bolts and turn the cam locks F clockwise until firm.
3. Lay the frame face down. Check it is square by measuring both diagonals; they must be equal.
4. Slide the back panel C into the grooves and nail it every 15 cm.
5. Stand the wardrobe up. Fix the hanging rail E at the height you prefer.
6. Hang the doors D and adjust the hinges so the gap between them is even.

## Safety
Always attach the wardrobe to the wall with the anti-tip bracket supplied. Choose the right wall plug for your wall type; ask in a hardware shop if you are unsure.
""")

H("en29", "en", "instructions-to-humans", "event brief", "Volunteer Brief: Riverside Half Marathon Water Station 4", """
Thank you for volunteering! Please read this brief before race day and bring it with you.

## When and where
Arrive at 07:15 on Sunday at Water Station 4, next to the boathouse on Millrace Lane (mile 8). The first runners will reach you at about 08:40 and the last at about 10:50.

## Your role
- Set up two tables, one for water and one for electrolyte drink, 20 metres apart.
- Fill cups two-thirds full. Full cups spill when runners grab them.
- Hold cups out at arm's length and call "water" or "drink" clearly.
- Keep the road clear of cups; sweep them to the verge with the brooms provided.

## Safety
If a runner collapses or looks unwell, call the race medical line on 555-0129 and stay with them. Do not give them medication. Your station captain, Abena, has a radio and a first-aid kit.

## What to wear
The yellow volunteer bib, comfortable shoes and layers. It can be cold standing by the river in the morning.

## After the last runner
Wait for the sweeper bike, then pack up. Recycling bags go in the blue van; leftover sealed bottles go back to the finish area. Come and collect your volunteer medal and a hot drink at the finish.
""")

H("en30", "en", "instructions-to-humans", "moving checklist", "Moving House: The Eight-Week Checklist", """
Print this and stick it on the fridge. Tick things off as you go.

## Eight weeks before
- Get quotes from at least three removal firms, or book a van and rope in friends.
- Start clearing out: sell, donate or recycle anything you don't want to move.
- Tell your landlord or agent your moving date in writing.

## Four weeks before
- Redirect your post.
- Tell your bank, employer, doctor, dentist and vet about your new address.
- Book time off work for moving day and the day after.
- Start packing rooms you rarely use. Label boxes on two sides with room and contents.

## One week before
- Defrost the freezer.
- Pack an "open first" box: kettle, mugs, tea, toilet roll, phone chargers, bedding, basic tools.
- Confirm times with the removal firm.

## Moving day
- Take meter readings and photos at both properties.
- Check every cupboard before you leave.
- Leave keys as agreed.

## After moving
- Register to vote at your new address.
- Update your driving licence and car registration.
- Find the stopcock and the fuse box before you need them.
- Introduce yourself to the neighbours.
""")
