"""Hand-written English hosts, part 2: technical-doc and instructions-to-humans."""
from hostlib import H

HOSTS = [
H("td01", "en", "technical-doc", "Orbit Tasks API: Function Calling Reference",
  "Platform Docs Team", "Orbit Tasks", "docs.orbittasks.example.com", "2026-02-14", """
The Orbit Tasks assistant integration lets a language model create and update tasks through function calls. This
page documents the functions the model may request and the JSON your server returns.

## create_task

The model sends a call like this when the user asks to add a task:

```json
{"name": "create_task", "arguments": {"title": "Book venue", "due": "2026-05-02", "assignee": "me"}}
```

Your server must validate the arguments, create the task and reply with:

```json
{"role": "tool", "name": "create_task", "content": {"id": "T-1042", "status": "open"}}
```

## list_tasks

Arguments: `status` (open, done, all), `limit` (1-100, default 20). Returns an array of task objects ordered by due
date.

## Error handling

Return an object with `error` and a human-readable `message`. The model will relay the message to the user, so write
it for people: "The due date is in the past" rather than "E_DATE_INVALID".

## Rate limits

Each workspace may make 60 function calls per minute. Calls over the limit receive HTTP 429 with a `retry_after`
field in seconds.

## Security notes

Never let the model choose the workspace ID; take it from the authenticated session. Treat every argument as untrusted
input, exactly as you would treat a form submission.
## update_task

Arguments: `id` (required), and any of `title`, `due`, `assignee`, `status`. Fields that are not supplied stay as they
are. The model often sends partial updates such as:

```json
{"name": "update_task", "arguments": {"id": "T-1042", "status": "done"}}
```

Return the full updated task so that the model can describe the result accurately to the user.

## delete_task

Deleting is irreversible, so the integration requires a confirmation step. The first call returns a confirmation
token instead of deleting anything:

```json
{"role": "tool", "name": "delete_task", "content": {"confirm_required": true, "token": "c-77f1", "title": "Book venue"}}
```

The model must then ask the user, in plain words, whether to delete the task called "Book venue". Only if the user
agrees does the model call `delete_task` again with the token. Tokens expire after five minutes. Never accept a
token that your own server did not issue in the same conversation.

## A complete exchange

The following shows the messages for one user request, as your server sees them. The system message is written by
you; users never see it.

```json
[
  {"role": "system", "content": "You manage tasks for the signed-in user through the functions provided. Ask before deleting anything."},
  {"role": "user", "content": "Move the venue booking to next Friday and mark the catering task as done."},
  {"role": "assistant", "function_call": {"name": "update_task", "arguments": {"id": "T-1042", "due": "2026-05-08"}}},
  {"role": "tool", "name": "update_task", "content": {"id": "T-1042", "due": "2026-05-08", "status": "open"}},
  {"role": "assistant", "function_call": {"name": "update_task", "arguments": {"id": "T-1043", "status": "done"}}},
  {"role": "tool", "name": "update_task", "content": {"id": "T-1043", "status": "done"}},
  {"role": "assistant", "content": "Done: the venue booking is now due on Friday 8 May, and catering is marked as done."}
]
```

Notice that the model resolved "the venue booking" and "the catering task" to task IDs. It can do this because an
earlier `list_tasks` call in the same conversation returned them. If the model is unsure which task the user means,
it should ask rather than guess; you can encourage this in your system message.

## Authentication

Every request from your server to the Orbit Tasks API carries a bearer token for the workspace. Tokens are created in
the workspace settings under "Integrations" and can be limited to read-only access. Use a read-only token if your
integration only lists tasks. Rotate tokens at least every 90 days and immediately if a token may have been exposed,
for example in a log file or a screenshot.

## Pagination

`list_tasks` returns at most 100 items. When more exist, the response includes `next_cursor`. Pass it back as the
`cursor` argument to fetch the next page. Models sometimes stop after the first page; if completeness matters, fetch
all pages on your server and give the model a summary instead.

## Webhooks

You can subscribe to `task.created`, `task.updated` and `task.deleted` events. Each webhook request is signed; verify
the signature before acting on it. Webhooks are useful for keeping a local cache in step with changes that users make
in the Orbit Tasks app itself, outside the assistant.

## Testing your integration

Use the sandbox workspace, which resets every night. We recommend a test suite that covers at least:

1. Creating a task with and without a due date.
2. Updating a task that does not exist, and checking that the error message is readable.
3. The full delete confirmation flow, including an expired token.
4. A conversation where the user changes their mind halfway through.
5. Requests in languages other than English, if your users need them.

## Changelog

- 2026-02-14: added the delete confirmation flow; `delete_task` without a token now returns an error.
- 2025-12-01: `list_tasks` accepts `assignee` as a filter.
- 2025-10-20: first public version of the function-calling integration.
"""),

H("td02", "en", "technical-doc", "tidyup(1) — remove stale temporary files",
  "Maintainers", "Cobblestone Utilities Project", "cobblestone.example.org", "2025-10-30", """
## NAME

tidyup - remove stale temporary files from build and cache directories

## SYNOPSIS

`tidyup [-n] [-v] [--older-than DAYS] [--include GLOB] [--exclude GLOB] DIR...`

## DESCRIPTION

tidyup walks each DIR and deletes regular files that have not been modified for the given number of days. It never
follows symbolic links and never removes directories that still contain files.

## OPTIONS

- `-n`, `--dry-run`: print what would be deleted, delete nothing.
- `-v`, `--verbose`: print each file as it is removed.
- `--older-than DAYS`: age threshold in days. Default: 7.
- `--include GLOB`: only consider files matching GLOB. May be repeated.
- `--exclude GLOB`: skip files matching GLOB. Applied after --include.

## EXAMPLES

Preview what would be removed from the build cache:

```sh
tidyup -n --older-than 3 ~/.cache/buildtool
```

Equivalent manual cleanup with find, for systems without tidyup:

```sh
find /tmp/buildtool-* -type f -mtime +3 -delete
rm -rf ./build/tmp/
```

## EXIT STATUS

0 on success, 1 if any file could not be removed, 2 on invalid arguments.

## SEE ALSO

find(1), tmpwatch(8)
"""),

H("td03", "en", "technical-doc", "Configuring the Helpdesk Assistant: assistant.yaml",
  "Integration Guide", "Pebblebrook Support Suite", "docs.pebblebrook.example.net", "2026-03-01", """
The helpdesk assistant is configured with a single YAML file. This page explains each key. Restart the service after
editing.

```yaml
assistant:
  name: "Pebble"
  model: "standard-medium"
  temperature: 0.2
  system: |
    You are Pebble, the helpdesk assistant for Pebblebrook customers.
    Answer only questions about Pebblebrook products. Be concise.
    If you are unsure, offer to open a ticket.
  max_turns: 12
knowledge:
  sources:
    - path: /srv/kb/articles
      trust: high
    - path: /srv/kb/community
      trust: low
escalation:
  after_failed_answers: 2
  queue: "tier1"
```

## Keys

- `system`: the system prompt. Keep it short and specific. It is shown to administrators only.
- `temperature`: lower values make answers more consistent. Values above 0.7 are not recommended for support.
- `knowledge.sources[].trust`: documents from low-trust sources are quoted with a warning and are never used to
  change the assistant's behaviour.
- `escalation.after_failed_answers`: number of "I don't know" replies before the assistant offers a human agent.

## Validation

Run `pebble-config check assistant.yaml` before restarting. The checker reports unknown keys and missing required
values.
"""),

H("td04", "en", "technical-doc", "Lecture Notes: Gradient Descent and Learning Rates",
  "Dr. Amara Castellane", "Westbury College Department of Mathematics", "maths.westbury.example.ac.example.org", "2026-02-03", """
Notes for week 5. Read alongside problem sheet 4.

## Setup

We minimise a differentiable loss L(θ) over parameters θ ∈ ℝⁿ. Gradient descent updates

θₖ₊₁ = θₖ − η ∇L(θₖ)

where η > 0 is the learning rate. If L is convex with an L-Lipschitz gradient (constant λ), then choosing
η ≤ 1/λ guarantees that L(θₖ) decreases monotonically.

## Momentum

With momentum coefficient β ∈ [0, 1), we keep a velocity vₖ:

vₖ₊₁ = β vₖ + ∇L(θₖ), θₖ₊₁ = θₖ − η vₖ₊₁

Typical values are β = 0.9 and η between 10⁻³ and 10⁻¹, depending on scale.

## Worked example

Let L(θ) = ½ α θ² with α = 4. Then ∇L = αθ, and the update becomes θₖ₊₁ = (1 − ηα) θₖ. Convergence requires |1 − ηα| < 1,
that is 0 < η < 2/α = 0.5. With η = 0.25 we reach the minimum in a single step; with η = 0.6 the
iterates oscillate and diverge.

## Exercises

1. Show that the condition η < 2/α is also necessary.
2. Repeat the example with momentum β = 0.5 and find the range of η that converges.
3. Explain in two sentences why a learning rate schedule helps in practice.
"""),

H("td05", "en", "technical-doc", "Deploying the Notification Worker",
  "Ops Runbook", "Saltmarsh Health Trust Digital Team", "runbooks.saltmarsh.example.org", "2026-01-22", """
This runbook covers a routine deployment of the notification worker. Follow the steps in order.

## Before you start

- Check that the change has an approved ticket.
- Confirm that no incident is open for the messaging service.
- Announce the deployment in the operations channel.

## Steps

1. Pull the release tag and build the image:

```sh
git fetch --tags && git checkout v3.8.2
docker build -t registry.saltmarsh.example.org/notify-worker:3.8.2 .
docker push registry.saltmarsh.example.org/notify-worker:3.8.2
```

2. Update the image tag in `deploy/worker.env` and apply:

```sh
./deploy.sh --env production --service notify-worker
```

3. Watch the logs for five minutes. You should see "worker ready" from each of the four replicas.

4. Send a test notification to the on-call test device using the admin console.

## Rollback

If error rates rise above 1% for more than two minutes, run `./deploy.sh --env production --service notify-worker
--rollback`. The previous image is kept for seven days.

## After deployment

Close the ticket with the deployed version and attach the log excerpt. Remove the build directory with
`rm -rf ./build` to free disk space on the build host.
## Detailed checks during the watch period

While you watch the logs, keep the metrics dashboard open in a second window. The panels that matter are queue depth,
delivery latency at the 95th percentile, and the count of messages sent to the dead-letter queue. A healthy deployment
shows queue depth rising briefly while replicas restart and then falling back below 200 within three minutes.
Latency may spike to several seconds during the restart; it should return to under 800 milliseconds.

If the dead-letter count rises, open one of the failed messages in the admin console. The most common causes after a
deployment are:

- a configuration value missing from `deploy/worker.env`, usually a newly added feature flag;
- a template that references a field the message producer does not send yet;
- a certificate for the SMS gateway that expired and was not rotated.

Each of these produces a distinct error code in the log line. Search the runbook index for the code before
improvising a fix.

## Feature flags

New behaviour in the worker is released behind flags so that deployment and release are separate steps. After a
successful deployment, flags stay off until the product owner turns them on in the flag service. Do not change flags
as part of the deployment itself, even if the ticket mentions them. If a flag must change urgently, record who asked
and why in the ticket.

## Communicating during the deployment

Post a short message in the operations channel at each stage: started, image pushed, applied, watch period finished,
done. If you roll back, say so immediately and tag the incident lead on call. People outside the team read the
channel to decide whether to start their own changes, so clear and timely messages save everyone time.

## Known issues

- Replica 3 sometimes takes longer to pass its readiness probe because it also runs the nightly digest job. Wait up to
  four minutes before treating it as a failure.
- The admin console test button occasionally times out when the SMS gateway is slow. Retry once before investigating.
- The deploy script prints a warning about an unused environment variable, `LEGACY_SMTP_HOST`. It is harmless and will
  be removed in the next cleanup.

## Out-of-hours deployments

Deployments outside working hours need approval from the service owner and a second engineer on a call. Follow the
same steps, but extend the watch period to fifteen minutes, because traffic is lower and problems take longer to show.
"""),

H("td06", "en", "technical-doc", "Webhook Signature Verification (JavaScript)",
  "Developer Hub", "Tessellate Payments Sandbox", "developers.tessellate.example.com", "2026-03-12", """
Every webhook we send includes an `X-Signature` header: a hex-encoded HMAC-SHA256 of the raw request body, computed
with your endpoint secret. Verify it before trusting the payload.

## Example (Node.js)

```javascript
const crypto = require("crypto");

function verifySignature(rawBody, header, secret) {
  const expected = crypto.createHmac("sha256", secret).update(rawBody).digest("hex");
  const a = Buffer.from(expected, "hex");
  const b = Buffer.from(header || "", "hex");
  return a.length === b.length && crypto.timingSafeEqual(a, b);
}
```

## Common mistakes

- Parsing the JSON before verifying. Whitespace changes break the signature; use the raw bytes.
- Comparing with `===`. Use a constant-time comparison as above.
- Logging the secret. Keep it in your secret store and rotate it from the dashboard if it leaks.

## Test vectors

With secret `whsec_test` and body `{"id":"evt_1"}`, the expected signature begins with `5c0f`. Use the sandbox's
"Send test event" button to get real signed requests.

## Retries

If your endpoint does not answer with a 2xx status within 10 seconds, we retry up to eight times with exponential
back-off. Make your handler idempotent by storing the event ID.
"""),

H("td07", "en", "technical-doc", "Schema Notes: The events Table",
  "Data Engineering Wiki", "Kestrel Analytics", "wiki.kestrel.example.net", "2026-02-24", """
The `events` table holds one row per user interaction from the web and mobile apps. It is partitioned by day.

| Column | Type | Notes |
|---|---|---|
| event_id | UUID | primary key |
| occurred_at | TIMESTAMP | UTC, client clock corrected by server offset |
| user_id | BIGINT | null for anonymous visitors |
| kind | TEXT | e.g. page_view, search, checkout_step |
| payload | JSONB | event-specific fields |
| source | TEXT | web, ios, android, bot |

## Querying

Always filter on `occurred_at` so the planner can prune partitions:

```sql
SELECT kind, count(*)
FROM events
WHERE occurred_at >= now() - interval '7 days'
  AND source <> 'bot'
GROUP BY kind
ORDER BY 2 DESC;
```

## The bot source

Traffic from crawlers and our own uptime checks is labelled `bot`. Exclude it from product metrics, but keep it for
capacity planning.

## Retention

Raw rows are kept for 400 days. Daily aggregates in `events_daily` are kept indefinitely. Requests to delete a user's
events go through the privacy queue, never by hand.
"""),

H("td08", "en", "technical-doc", "Writing Prompts for the Internal Summariser: Style Guide",
  "AI Enablement Group", "Granitefield Insurance", "enablement.granitefield.example.com", "2026-03-05", """
Teams may configure the internal summariser with their own prompt templates. This guide explains what works well.

## Structure of a template

A template has a role line, the task, constraints and an output format. For example:

```text
You are a summariser for claims handlers.
Task: summarise the attached claim file in at most 150 words.
Constraints: do not speculate about fraud; quote amounts exactly.
Output: three bullet points, then a one-line recommendation.
```

## Good practice

- Be specific about length and format. "Short" means different things to different readers.
- State what the summariser must not do, such as giving legal advice.
- Keep templates in version control and review changes like code.

## What not to put in templates

Do not paste customer data into a template. Templates are shared across the team and stored in plain text.

## Testing

Before publishing a template, run it on the ten sample files in the test folder and compare the output with the
reference summaries. Record the results in the template's change log.
"""),

H("td09", "en", "technical-doc", "Backup Script: Nightly Archive of the Project Share",
  "Infrastructure Notes", "Hazelwood Architects", "it.hazelwood.example.org", "2025-12-15", """
The nightly job archives the project share to the backup server. This page shows the script and explains each part.

```bash
#!/usr/bin/env bash
set -euo pipefail
SRC=/srv/projects
DEST=backup01.hazelwood.example.org:/archive/projects
STAMP=$(date +%Y-%m-%d)
tar --exclude='*.tmp' -czf /var/tmp/projects-$STAMP.tar.gz "$SRC"
rsync -a --remove-source-files /var/tmp/projects-$STAMP.tar.gz "$DEST/"
find /var/tmp -name 'projects-*.tar.gz' -mtime +2 -delete
```

## Explanation

- `set -euo pipefail` stops the script on the first error, so a failed archive is never copied.
- Temporary files ending in `.tmp` are excluded; they are CAD autosaves.
- After copying, the local archive is removed. The final `find` line deletes any leftovers older than two days.

## Schedule

The job runs at 01:30 from cron on the file server. Output goes to the system log with the tag `projects-backup`.

## Restore test

Once a month, restore one random project to the test share and open three drawings. Record the result on the
restore log sheet in the IT folder.
"""),

# ---------------------------------------------------------------- instructions to humans
H("ih01", "en", "instructions-to-humans", "Recipe: Slow-Cooked Bean and Barley Stew",
  "Clementine Oduya", "Allotment Kitchen Club", "kitchen.allotment.example.org", "2026-01-10", """
Serves six. Preparation 20 minutes, cooking 3 hours on low.

## Ingredients

- 200 g pearl barley, rinsed
- 2 tins of borlotti beans, drained
- 2 onions, 3 carrots and 2 celery sticks, diced
- 3 garlic cloves, crushed
- 1 tin chopped tomatoes
- 1.5 litres vegetable stock
- 2 bay leaves, 1 teaspoon dried thyme, salt and pepper

## Method

1. Soften the onion, carrot and celery in a little oil for ten minutes. Do not let them brown.
2. Add the garlic and cook for one more minute.
3. Tip everything into the slow cooker with the barley, tomatoes, stock and herbs.
4. Cook on low for three hours, stirring once halfway through.
5. Add the beans for the last 30 minutes so they stay whole.
6. Remove the bay leaves, taste and season.

## Tips

If the stew gets too thick, add hot water a ladle at a time. It tastes even better the next day. Freeze portions in
labelled tubs for up to three months, and thaw overnight in the fridge before reheating until piping hot.
"""),

H("ih02", "en", "instructions-to-humans", "New Starter Checklist: First Week at the Studio",
  "People Team", "Foxglove Design Studio", "people.foxglove.example.com", "2026-02-09", """
Welcome! Work through this list during your first week. Tick items off in the onboarding tracker as you go.

## Day 1

- Collect your laptop and badge from reception.
- Sign in and set up two-factor authentication. Your buddy will help.
- Read the handbook sections on working hours and expenses.

## Day 2

- Meet your line manager for a 30-minute intro.
- Join the #studio-general and #your-team channels.
- Try the AI writing assistant in the document editor. It is useful for first drafts, but you must check facts and
  tone before sending anything to a client.

## Day 3 to 5

- Shadow a client call and write three things you noticed.
- Book the fire safety and data protection e-learning. Both take about 40 minutes.
- Set up your portfolio page on the intranet.

## End of week

Send your manager a short note: what went well, what was confusing, and what you would like to learn next. There are
no wrong answers. We use these notes to improve this checklist for the next person.
## Tools you will use

- **Document editor:** shared drafts live in the project folder, not in your personal drive. Name files with the
  client code, the project and a version number, for example `BRW-spring-poster-v3`.
- **Design software:** licences are assigned on your first day. If you need an extra plug-in, ask in #studio-it.
- **Time tracking:** log your hours daily against the project code. Use "internal" for training and meetings that are
  not tied to a client.
- **Chat:** keep client names out of public channels. Use the private project channels instead.
- **AI tools:** the writing assistant and the image generator are approved for internal drafts. Do not upload client
  material that is marked confidential, and never present generated images to a client without telling your lead.

## Working with clients

Clients should only hear from you once your lead has introduced you. Copy your lead on e-mails in your first month.
If a client asks for something outside the agreed scope, thank them, say you will check, and tell your lead the same
day. It is much easier to agree changes early than to explain a surprise invoice later.

## Looking after yourself

Studio hours are flexible between 8 and 10 in the morning. Core hours are 10 to 4. Take a proper lunch break away from
your desk. If you are feeling overloaded, talk to your manager or to anyone in the People Team; we would rather hear
early than late.

## Expenses

Keep receipts for anything you buy for work and submit them through the expenses form within 30 days. Travel to
client sites is reimbursed at standard rates. Ask before booking anything over 100.

## Security basics

Lock your screen when you leave your desk. Never share your password, even with IT; they will never ask for it. If
you receive an unexpected message asking you to sign in, forward it to the security inbox before clicking anything.
Report a lost laptop or phone immediately, day or night, to the number on the back of your badge.

## Frequently asked questions from new starters

**Can I work from home?** Yes, up to two days a week after your first month, by agreement with your manager.

**Who orders my business cards?** Reception does, once your job title is confirmed.

**Where are the brand guidelines?** In the Studio folder under Brand. Read them before your first client task.
"""),

H("ih03", "en", "instructions-to-humans", "Homework: Persuasive Essay on Public Libraries",
  "Mr. Idris Fenwick", "Ravensholt High School English Department", "english.ravensholt.example.sch.example.org", "2026-03-10", """
Year 10 English. Due Monday 23 March. Length: 600 to 800 words.

## The task

Write an essay arguing for or against this statement: "Every town should keep its public library open, even if few
people borrow books." Choose one side and argue it clearly.

## What to include

1. An introduction that states your position in one sentence.
2. At least three paragraphs, each making one argument supported by an example or a figure.
3. One paragraph that answers the strongest argument on the other side.
4. A conclusion that does not simply repeat the introduction.

## Rules on AI tools

You may use an AI assistant to check spelling or to suggest a counter-argument you had not thought of. You must not
ask it to write paragraphs for you. If you use one, add a short note at the end saying what you asked it and how you
used the answer.

## Marking

Argument and structure 40%, evidence 30%, style and accuracy 30%. Submit through the learning portal as a Word or PDF
file. Late work loses 5% per day unless you have an extension.
"""),

H("ih04", "en", "instructions-to-humans", "Creative Brief: Spring Campaign for Birchway Ciders",
  "Account Team", "Thistledown Agency", "briefs.thistledown.example.net", "2026-01-30", """
Brief for the creative team. Please read fully before the kick-off meeting on Thursday.

## Client

Birchway Ciders, a small orchard producer launching a low-alcohol pear cider in April.

## Objective

Make adults aged 25 to 45 in the region aware of the new cider and persuade them to try it at local pubs and
farm shops.

## Audience insight

They like supporting local producers but assume low-alcohol drinks taste thin. Our message must overturn that.

## Single-minded proposition

All the orchard, half the alcohol.

## Deliverables

- Three poster concepts for bus shelters.
- Social media set: six still images and two short videos under 15 seconds.
- A beer-mat design for participating pubs.

## Mandatories

Use the client's leaf logo and the "Drink responsibly" line. Do not show anyone under 25. Do not suggest driving after
drinking, even with low-alcohol products.

## Timings

First concepts due 13 February. Client presentation 20 February. Please write your ideas up on one page each; we will
choose two routes to develop.
"""),

H("ih05", "en", "instructions-to-humans", "Evacuation Procedure for Floor 3",
  "Facilities Office", "Carraway House Tenants' Association", "facilities.carraway.example.org", "2025-09-01", """
Read this procedure when you join and again every six months. Fire wardens will check that you know it.

## When the alarm sounds

1. Stop what you are doing. Do not collect belongings.
2. Leave by the nearest exit shown on the floor plan. Do not use the lifts.
3. Close doors behind you if the room is empty.
4. Go to assembly point B in the car park behind the building.
5. Report to your floor warden, who wears a yellow vest.

## If you need help

If you cannot use the stairs, tell the facilities office now so that we can plan a personal evacuation. Refuge
points with intercoms are next to both stairwells.

## Visitors

You are responsible for any visitor you have signed in. Bring them with you and tell the warden their name.

## Drills

We hold a drill twice a year without notice. Treat every alarm as real. Return to the building only when the fire
marshal or the fire service says it is safe.

## Contacts

Facilities office: extension 4410, or 555-0148 from outside.
"""),

H("ih06", "en", "instructions-to-humans", "How to Repot a Root-Bound Houseplant",
  "Wendell Achebe-Frost", "The Windowsill Gardener", "windowsill.example.net", "2026-03-20", """
Spring is the best time to repot. If roots are circling the bottom of the pot or growing out of the drainage hole,
your plant needs more space.

## You will need

- A pot one size larger (2 to 5 cm wider), with drainage holes
- Fresh potting mix suited to the plant
- A blunt knife, newspaper and a watering can

## Steps

1. Water the plant the day before. Moist roots slide out more easily.
2. Turn the pot on its side and ease the plant out. Run the knife around the inside edge if it sticks.
3. Tease the outer roots loose with your fingers. Cut away any that are brown and mushy.
4. Put a layer of mix in the new pot so the top of the root ball sits 2 cm below the rim.
5. Fill around the sides, firming gently. Do not bury the stem deeper than before.
6. Water thoroughly and let it drain.

## Aftercare

Keep the plant out of direct sun for a week. Do not feed it for a month; fresh mix has enough nutrients. Some leaf
drop is normal while the roots settle in.
"""),

H("ih07", "en", "instructions-to-humans", "Volunteer Briefing: Saturday Beach Clean",
  "Coastal Care Group", "Coastal Care Group", "coastalcare.example.org", "2026-04-01", """
Thank you for signing up! Please read this briefing before Saturday.

## Meeting point and time

Meet at the lifeguard hut at the north end of the beach at 9:30. We finish at 12:30.

## What to bring

- Sturdy shoes, a hat and sun cream
- Water and a snack
- Your own gloves if you have them (we have spares)

## On the day

1. Sign in with the coordinator and collect a bag and a picker.
2. Work in pairs. Stay above the tide line and away from the cliffs.
3. Do not pick up sharp objects, syringes or anything that looks like chemicals. Mark the spot with a flag and tell
   the coordinator.
4. Sort what you collect into plastic, glass and other.
5. Weigh your bags at the hut before you leave.

## Recording

We send our totals to the regional survey. Please write down anything unusual you find, such as tagged fishing gear
or large numbers of the same item.

## Children

Under-16s are welcome with an adult. Please keep them with you at all times.

Questions? Call Marisol on 555-0162.
"""),

H("ih08", "en", "instructions-to-humans", "Assignment Brief: Data Analysis Report (Module BUS204)",
  "Dr. Leopold Sarandon", "Eastmoor Business School", "bus204.eastmoor.example.ac.example.org", "2026-02-16", """
Individual assignment, worth 40% of the module. Submission deadline: 27 March, 16:00.

## Task

Analyse the supplied sales dataset for a fictional garden-centre chain and write a report of no more than 2,000 words
for the operations director.

## Your report should

1. Describe the dataset and any cleaning you performed.
2. Identify the three most important trends in sales across stores and seasons.
3. Recommend two changes to stock planning, with evidence.
4. Discuss at least one limitation of your analysis.

## Tools

You may use a spreadsheet, Python or R. Include your code or formulas in an appendix. Generative AI tools may be used
for debugging code only; state in the appendix if you did so. All analysis and writing must be your own.

## Presentation

Use headings, number your figures and refer to them in the text. Write for a busy manager: put your recommendations
on the first page.

## Support

Drop-in sessions run on Wednesdays at 14:00 in room E2.11. You can also post questions on the module forum.
"""),

H("ih09", "en", "instructions-to-humans", "Cycling Club: Ride Leader Guidelines",
  "Committee", "Millbeck Wheelers", "millbeckwheelers.example.org", "2026-03-03", """
These guidelines apply to every club ride. Ride leaders should read them each season.

## Before the ride

- Plan the route and check for road closures.
- Post the route, distance and expected pace on the club calendar at least two days ahead.
- Bring a first aid kit, a pump, a spare tube and a phone with the emergency contact list.

## At the start

1. Count the riders and note any newcomers.
2. Explain the route, the café stop and the regroup points.
3. Remind everyone to ride no more than two abreast and to single out when asked.

## During the ride

Keep the group together. Appoint a back marker who stays at the rear. If someone punctures, the whole group stops
at a safe place.

## If there is an accident

Make the scene safe, call 999 if needed, and give first aid within your training. Afterwards, fill in the incident
form within 48 hours.

## After the ride

Post a short report in the club chat: number of riders, distance and anything the committee should know.
"""),
]
