# -*- coding: utf-8 -*-
"""Hand-written page-type families, part A (municipal portal, news, docs).

Notation: a string with " || " holds alternative hand-written sentences for
one slot; {name} placeholders are filled from per-item facts; {name_r} is a
fresh per-row draw inside a table; {i} is the row number.
"""


def P(*slots, opt=False):
    return ("p", list(slots))


def H(text):
    return ("h2", text)


def UL(items, k=(3, 5)):
    return ("ul", items, k)


def OL(items, k=(3, 5)):
    return ("ol", items, k)


def T(header, rows, k=(3, 5)):
    return ("table", header, rows, k)


def S(*blocks, opt=True):
    return {"opt": opt, "blocks": list(blocks)}


FAMILIES = {}

# ---------------------------------------------------------------- riverton
FAMILIES["rv_roadworks"] = dict(
    site="riverton", section="roads",
    vary=["date1", "date2", "time1", "time2", "n_small", "n_mid", "phone", "ref", "contractor", "junc3", "money", "person"],
    pools=dict(
        road=["Mill Lane", "Coopers Row", "Harrow Bank", "Kestrel Street", "Old Quay Road", "Tanners Hill", "Bellfield Avenue",
              "Orchard Walk", "Pump Street", "Saltings Way", "Beacon Rise", "Foundry Road", "Linnet Close", "Wharf Parade"],
        junc1=["the Market Cross roundabout", "Station Approach", "the Fleece Inn junction", "Ropery Lane", "Chapel Street", "the fire station"],
        junc2=["Hollins Bridge", "the Gasworks roundabout", "Vicarage Road", "the lower car park", "Albion Terrace", "Dyers Yard"],
        junc3=["Nettlebed Road", "Parkside", "Cooper Street", "Lambert Way", "the inner ring road", "Spinner Lane"],
        street2=["Riverside Drive", "Upper Holt Road", "Tenter Street", "Greenhill Road", "Crossways", "Weavers Bank"],
        contractor=["Halden Surfacing Ltd", "Corrick and Sons Civil Engineering", "Tarnside Utilities", "Brayford Highways Services", "Ledwell Drainage"],
        work=["carriageway resurfacing", "gas main replacement", "drainage repairs", "kerb and footway renewal", "water pipe renewal", "bridge joint replacement"],
        reason=["the road surface had broken up in several places", "surface water was pooling outside a number of homes",
                "the old cast iron main had reached the end of its life", "several kerbs had sunk and become a trip hazard",
                "the bridge expansion joints were letting water into the deck"],
        fund=["highways capital programme", "local transport plan grant", "ward improvement budget", "flood resilience fund"],
        bus=["4", "7A", "12", "21", "X3", "36"],
        ward=["Northgate", "Saltmarsh", "Holt End", "Kingsmead", "Abbeyfields", "Tannery"],
        phase=["Northern section", "Southern section", "Junction works", "Footway and kerbs", "Final surfacing", "Road markings"],
    ),
    title=["{road} closure for {work} || Temporary closure of {road} from {date1} || {road}: {work} and road closure"],
    sections=[
        S(P("{road} will be closed to through traffic between {junc1} and {junc2} from {date1} while {contractor} carries out {work} for the council. || "
            "Contractors from {contractor} will close {road} between {junc1} and {junc2} from {date1} so that {work} can be completed safely. || "
            "From {date1}, {road} will be shut between {junc1} and {junc2} to allow {contractor} to carry out {work}.",
            "The closure is expected to last {n_small} weeks, with work taking place between {time1} and {time2} on weekdays. || "
            "We expect the job to take about {n_small} weeks, and crews will be on site from {time1} until {time2}, Monday to Friday. || "
            "Work is planned for {n_small} weeks and will normally run from {time1} to {time2} on weekdays."), opt=False),
        S(H("Diversion route || Getting around the closure || Signed diversion"),
          P("A signed diversion will be in place via {junc3} and {street2}. || Drivers will be sent along {junc3} and {street2} while the road is closed. || "
            "Please follow the yellow diversion signs, which take traffic along {junc3} and then {street2}.",
            "Pedestrian access to homes and businesses on {road} will be kept open at all times. || People on foot will still be able to reach every property on {road}. || "
            "Footways stay open, so residents and customers can still reach properties on {road}."),
          UL(["Bus route {bus} will use temporary stops on {street2}. || Buses on route {bus} will call at temporary stops on {street2}.",
              "Blue badge parking on {road} is suspended for the length of the closure.",
              "Bin collections in {ward} will go ahead as normal on {wd1}.",
              "Emergency services have been told about the closure and will keep access.",
              "Shops can take deliveries before {time1} each morning.",
              "{n_mid} parking bays near {junc1} will be coned off.",
              "The cycle lane on {street2} stays open throughout."], k=(3, 5))),
        S(H("Why the work is needed || Background to the scheme"),
          P("The highway inspectors reported that {reason} during their last survey of the ward. || This scheme follows a survey of {ward} ward, which found that {reason}. || "
            "Residents in {ward} told us that {reason}, and an inspection confirmed it.",
            "The scheme costs {money} and is paid for from the {fund}. || Funding of {money} has been set aside from the {fund} for this work. || "
            "The {fund} is covering the cost of {money}.")),
        S(H("Planned phases || Schedule of work"),
          T("Phase|Start date|Area", ["{phase_r}|{date_r}|{junc1_r} to {junc2_r}"], k=(2, 4))),
        S(P("If you have a question about the closure, call the highways team on {phone} or email roads@riverton-council.example.org. || "
            "Questions about this closure can be sent to roads@riverton-council.example.org or raised by phoning {phone}. || "
            "For more information please contact the highways team on {phone}, quoting reference {ref}."), opt=False),
    ],
)

FAMILIES["rv_bins"] = dict(
    site="riverton", section="bins",
    vary=["date1", "date2", "wd1", "wd2", "n_small", "n_mid", "phone", "person", "depot"],
    pools=dict(
        area=["Holt End and Saltmarsh", "the Kingsmead estate", "Northgate village", "Abbeyfields and Tannery", "the Harbour ward", "Upper Wendle and Coldstream",
              "the Old Town conservation area", "Brookside and Fennick Green"],
        bin=["green garden waste bin", "blue recycling bin", "grey general waste bin", "brown food caddy", "glass box"],
        cause=["the Christmas and New Year bank holidays", "a change to crew rounds", "the closure of the Fenwick Road depot for repairs",
               "the new food waste service", "the Easter bank holiday weekend", "a shortage of collection vehicles"],
        depot=["Fenwick Road depot", "Coldstream transfer station", "Marsh Lane yard", "Ropewalk depot"],
        item=["flattened cardboard", "plastic bottles and pots", "food tins and drinks cans", "glass jars", "garden prunings", "paper and magazines",
              "aerosols with the cap removed", "cartons such as juice and milk cartons"],
        noitem=["nappies", "plastic film and bags", "garden soil", "polystyrene packaging", "textiles", "hot ashes"],
    ),
    title=["Changes to {bin} collections in {area} || {bin} collection days are changing in {area} || Bin collection changes for {area}"],
    sections=[
        S(P("From {date1}, the {bin} in {area} will be emptied on {wd2} instead of {wd1}. || Collections of the {bin} in {area} move from {wd1} to {wd2}, starting on {date1}. || "
            "Households in {area} will have their {bin} collected on {wd2} rather than {wd1} from {date1}.",
            "The change is needed because of {cause}. || We are making this change because of {cause}. || This follows {cause}."), opt=False),
        S(P("Please put your bin out by 7am on the day of collection and bring it back in the same evening. || Bins should be at the kerbside by 7am and taken back in by the end of the day. || "
            "Make sure your bin is out by 7am, with the lid closed, and return it to your property after collection.",
            "Crews will not return for bins that were put out late. || If your bin is out late, the crew will not be able to come back for it. || Late bins will be left until the next collection.")),
        S(H("What goes in the {bin} || What you can put in your bin"),
          UL(["{item_r}"], k=(3, 5)),
          P("Please do not include {noitem} or {noitem2}. || Items such as {noitem} and {noitem2} cannot be collected in this bin. || Keep {noitem} and {noitem2} out of the bin, as they spoil the load.")),
        S(H("Revised collection dates || New collection calendar"),
          T("Old day|New day|First collection", ["{wd_r}|{wd2_r}|{date_r}"], k=(2, 4))),
        S(H("Assisted collections"),
          P("If nobody in your home can move the bin, you can ask for an assisted collection. || Residents who cannot wheel a bin to the kerb may qualify for an assisted collection. || "
            "An assisted collection means the crew collects the bin from your property.",
            "Call {phone} and ask for the waste team, or speak to {person} at the {depot}. || To apply, phone {phone} or write to the waste team at the {depot}. || "
            "Applications are handled by {person} and can be made by phoning {phone}.")),
        S(P("Missed a collection? Report it online within {n_small} working days. || You can report a missed bin online up to {n_small} working days after your collection day. || "
            "Missed bins should be reported within {n_small} working days so the crew can return."), opt=False),
    ],
)

FAMILIES["rv_consult"] = dict(
    site="riverton", section="consultations",
    vary=["date1", "date2", "date3", "n_mid", "n_big", "person", "person2", "venue", "time1", "time2", "money"],
    pools=dict(
        topic=["a new play area at Linden Park", "parking controls around Saltings Way", "the future of the Ropewalk community hall",
               "a cycle route between the station and Kingsmead", "extending opening hours at the Quayside library", "tree planting along the river path",
               "a twenty mile an hour limit in Holt End", "changes to market day trading"],
        venue=["the Corn Exchange", "Quayside Library", "Holt End Community Centre", "St Brannock's church hall", "the Town Hall foyer", "Kingsmead Primary School"],
        option=["keep the current arrangement", "make a small change during a trial period", "adopt the full proposal from next year",
                "phase the changes in over two years", "ask the ward forum to draw up a local plan"],
        group=["local schools", "the chamber of trade", "the river trust", "residents' associations", "bus operators", "disability groups"],
    ),
    title=["Have your say on {topic} || Consultation: {topic} || Public consultation on {topic}"],
    sections=[
        S(P("We want to hear what you think about {topic}. || The council is asking residents for views on {topic}. || Residents and businesses are invited to comment on {topic}.",
            "The consultation opens on {date1} and closes at midnight on {date2}. || You can respond between {date1} and {date2}. || Comments can be sent in from {date1} until {date2}."), opt=False),
        S(H("What we are proposing || The proposal"),
          P("The proposal was drawn up after {n_mid} people contacted their ward councillors about {topic}. || "
            "Councillor {person} asked officers to prepare the proposal after a petition signed by {n_big} people. || "
            "Officers have worked with {group} to shape the proposal over the last {n_small} months.",
            "The estimated cost is {money}, which would come from existing budgets. || It would cost around {money}, met from existing budgets. || "
            "Officers estimate a cost of {money}.")),
        S(H("Options || The choices we are asking about"),
          OL(["{option_r}"], k=(3, 4))),
        S(H("Drop-in sessions || Meet the team"),
          P("Officers will be available to answer questions at {venue} on {date3} from {time1} to {time2}. || "
            "You can talk to the project team at {venue} on {date3} between {time1} and {time2}. || "
            "A drop-in session will be held at {venue} on {date3}, {time1} to {time2}."),
          T("Venue|Date|Time", ["{venue_r}|{date_r}|{time1_r} to {time2_r}"], k=(2, 3))),
        S(H("What happens next"),
          P("A report on the results will go to the cabinet meeting in {month3}. || The responses will be summarised in a report to cabinet in {month3}. || "
            "Cabinet will consider the results in {month3} and make a decision.",
            "{person2} from the policy team will publish the summary on this page. || The summary of responses will be published here by {person2}. || "
            "We will publish every comment we receive, with personal details removed.")),
        S(P("Paper copies of the questionnaire are available at {venue} or by calling {phone}. || If you need the questionnaire in another format, call {phone}. || "
            "To ask for a printed copy, phone {phone} or visit {venue}."), opt=False),
    ],
)

# ---------------------------------------------------------------- herald (news)
FAMILIES["hd_council"] = dict(
    site="herald", section="local",
    vary=["date1", "n_mid", "n_big", "person2", "person3", "money", "pct", "quote_b"],
    pools=dict(
        town=["Ashcombe", "Riverton", "Fennick Green", "Coldstream", "Upper Wendle", "Brayford"],
        decision=["approved plans for a new swimming pool", "voted to close two public toilets", "agreed to raise parking charges", "backed a bid for a new railway halt",
                  "rejected plans for a retail park", "approved a budget for pothole repairs", "agreed to buy the old cinema building", "voted to scrap the Sunday market"],
        committee=["planning committee", "full council", "cabinet", "finance and resources committee", "scrutiny panel"],
        quote_a=["This is a good day for the town and for the families who have waited years for it", "We listened carefully to the people who wrote to us",
                 "Nobody takes a decision like this lightly", "The numbers simply did not add up any other way", "I hope people will judge us on what happens next"],
        quote_b=["It has been rushed through without a proper conversation with residents", "We will be watching closely to see that the promises are kept",
                 "People are already asking who will pay for this in five years", "The traders on the high street feel ignored", "It is the right result but it took far too long"],
        role=["council leader", "cabinet member for finance", "chair of the committee", "opposition spokesperson", "ward councillor"],
        group=["the Ashcombe Civic Society", "the chamber of trade", "the Friends of Linden Park", "a residents' campaign group", "the local swimming club"],
    ),
    title=["{town} council {decision} || Councillors in {town} {decision} || {town}: councillors {decision} after long debate"],
    sections=[
        S(P("Councillors in {town} {decision} at a meeting of the {committee} on {date1}. || The {committee} in {town} {decision} on {date1} after a debate lasting {n_small} hours. || "
            "On {date1} the {committee} {decision}, ending months of argument in {town}.",
            "The vote was {n_mid} to {n_small}. || The decision was carried by {n_mid} votes to {n_small}. || The motion passed with {n_mid} in favour and {n_small} against."), opt=False),
        S(P("{person}, the {role}, said: \"{quote_a}.\" || Speaking after the vote, {role} {person} said: \"{quote_a}.\" || \"{quote_a},\" said {person}, the {role}."),
          P("But {person2} of {group} said: \"{quote_b}.\" || Not everyone was convinced. {person2}, speaking for {group}, said: \"{quote_b}.\" || "
            "{group} was critical, and its spokesperson {person2} said: \"{quote_b}.\""), opt=False),
        S(H("The cost || How it will be paid for"),
          P("The scheme is expected to cost {money}, with about {pct} per cent coming from government grants. || Officers put the cost at {money}, of which {pct} per cent would be grant funded. || "
            "A report to councillors estimated the cost at {money}.",
            "The rest will be borrowed over {n_mid} years. || The council plans to borrow the balance over {n_mid} years. || The remainder will come from reserves.")),
        S(H("Background || How we got here"),
          P("The issue was first raised in {year_prev}, when {n_big} people signed a petition. || A petition with {n_big} signatures was handed to the council in {year_prev}. || "
            "Campaigners first took the issue to the council in {year_prev}."),
          P("An earlier plan was dropped after a consultation found strong opposition. || The council shelved a similar plan after a public consultation. || "
            "Previous proposals were withdrawn after officers found problems with the site.")),
        S(H("Reaction || What people said"),
          UL(["{person3}, who runs a shop in {town}, said the decision was overdue.", "The {group2} welcomed the vote in a short statement.",
              "A petition against the plan has gathered {n_big} signatures online.", "Opposition councillors said they would ask for the decision to be called in.",
              "Several residents spoke in the public gallery before the vote.", "The local MP said she would ask ministers for extra funding."], k=(2, 4))),
        S(P("The decision will be reviewed by the {committee} in {month3}. || A further report is due in {month3}. || Work is expected to start in {month3} if no challenge is made.")),
    ],
)

FAMILIES["hd_event"] = dict(
    site="herald", section="whats-on",
    vary=["date1", "date2", "n_mid", "n_big", "person", "person2", "price", "time1", "time2", "act"],
    pools=dict(
        event=["Ashcombe Lantern Parade", "Coldstream Food Festival", "Riverton Regatta", "Fennick Green Vintage Rally", "Upper Wendle Folk Weekend",
               "Brayford Book Fair", "Harbour Lights Festival", "Ashcombe Open Studios"],
        place=["the Market Square", "Linden Park", "the Quayside", "the showground at Holt End", "the Corn Exchange", "the abbey grounds"],
        act=["the Saltmarsh Silver Band", "a ceilidh band called The Drovers", "the Kingsmead school choir", "a stilt-walking troupe from Brayford",
             "local poet Wren Castellane", "the Tannery Street drummers", "a puppet theatre company"],
        charity=["the hospice", "the lifeboat station", "the food bank", "the air ambulance", "the youth club"],
        highlight=["a torchlit procession along the river", "a tasting tent with thirty local producers", "a race between homemade rafts",
                   "more than two hundred classic vehicles", "workshops for children", "a late night market"],
    ),
    title=["{event} returns to {place} || Everything you need to know about the {event} || {event}: dates, times and what's on"],
    sections=[
        S(P("The {event} returns to {place} on {date1}, with organisers expecting {n_big} visitors. || Organisers of the {event} say {n_big} people could visit {place} on {date1}. || "
            "More than {n_big} people are expected at {place} when the {event} comes back on {date1}.",
            "This year's programme includes {highlight} and a performance by {act}. || Highlights include {highlight}, with music from {act}. || "
            "{highlight} will open the day, followed by {act}."), opt=False),
        S(H("Times and tickets || Getting in"),
          P("Gates open at {time1} and the last event finishes at {time2}. || The event runs from {time1} until {time2}. || Things get going at {time1} and carry on until {time2}.",
            "Adult tickets cost {price} and children under {n_small} go free. || Entry is {price} for adults, with free entry for children under {n_small}. || "
            "Tickets are {price} on the gate; under {n_small}s are free.")),
        S(H("Programme || What's on"),
          T("Time|Event|Where", ["{time1_r}|{act_r}|{place_r}"], k=(3, 5))),
        S(H("Travel and parking || Getting there"),
          P("Parking at {place} will be limited and visitors are asked to use the park and ride from {place2}. || Visitors are urged to use the park and ride at {place2} because parking is limited. || "
            "There will be no parking on site, but a free shuttle will run from {place2}."),
          UL(["Extra trains will run on the Brayford line during the afternoon.", "Roads around {place} will close from {time1}.", "A drop-off point for blue badge holders will be signposted.",
              "Cycle parking will be provided near the main gate.", "Buses will be diverted away from the town centre."], k=(2, 4))),
        S(P("{person}, who chairs the organising committee, said: \"We have had a record number of stallholders asking to take part.\" || "
            "Committee chair {person} said the team had been planning since {month_prev}. || \"It takes {n_mid} volunteers to put this on,\" said {person}, who chairs the committee.",
            "Money raised will go to {charity}. || Profits will be shared with {charity}. || Last year the event raised {money} for {charity}.")),
    ],
)

FAMILIES["hd_business"] = dict(
    site="herald", section="business",
    vary=["date1", "n_small", "n_mid", "money", "person", "person2", "street"],
    pools=dict(
        biz=["Kettle and Crumb bakery", "Driftwood Cycles", "the Lantern Bookshop", "Harbour Fish Bar", "Pennick's Hardware", "Thimble and Thread haberdashery",
             "the Copper Pot deli", "Fennick Green Brewing Company"],
        street=["Fore Street", "Market Hill", "Quay Street", "Church Walk", "Bridge Street", "the Shambles"],
        news=["opened a second shop", "announced it will close after forty years", "won a regional award", "moved to larger premises",
              "taken on its first apprentices", "been sold to a new owner"],
        detail=["sourdough made with flour from a mill in Upper Wendle", "secondhand bicycles restored by volunteers", "signed first editions and a children's corner",
                "fish landed at Riverton quay that morning", "tools sold by weight from wooden drawers", "fabric from small mills in the north"],
    ),
    title=["{biz} has {news} || Why {biz} has {news} || {biz} on {street} has {news}"],
    sections=[
        S(P("{biz} on {street} has {news}. || Owners of {biz} in {street} have {news}. || The family behind {biz} says the business has {news}.",
            "The business, known for {detail}, was started by {person} {n_mid} years ago. || {person} started the business {n_mid} years ago and built it around {detail}. || "
            "Customers know it for {detail}."), opt=False),
        S(P("\"We could not have done this without our regulars,\" said {person}. || {person} said the decision had been made over {n_small} months of talks. || "
            "\"It has been a hard year but a good one,\" {person} told the Herald."),
          P("The shop employs {n_small} people and opens {n_small2} days a week. || It now has {n_small} staff. || There are {n_small} people on the payroll, most of them part time.")),
        S(H("Trading on {street} || The wider picture"),
          P("{street} has seen {n_small2} shops close in the last year, according to the chamber of trade. || Traders on {street} say footfall has fallen since the car park charges rose. || "
            "The chamber of trade says {n_mid} per cent of units on {street} are now occupied."),
          P("{person2}, who chairs the chamber, said independent shops were the reason people came into town. || Chamber chair {person2} called for lower business rates. || "
            "{person2} of the chamber said more events would help bring visitors back.")),
        S(H("Opening hours || Visit"),
          T("Day|Open|Close", ["{wd_r}|{time1_r}|{time2_r}"], k=(2, 4))),
    ],
)

# ---------------------------------------------------------------- quillstack docs
FAMILIES["qs_config"] = dict(
    site="quill", section="reference",
    vary=["n_small", "n_mid", "n_big", "version", "default2", "env"],
    pools=dict(
        comp=["ingest worker", "scheduler", "storage gateway", "metrics exporter", "webhook relay", "search indexer", "auth proxy", "queue broker"],
        key=["batch_size", "poll_interval", "max_retries", "flush_timeout", "shard_count", "cache_ttl", "worker_threads", "queue_depth", "spill_path", "lease_seconds"],
        unit=["seconds", "milliseconds", "entries", "megabytes", "connections"],
        env=["QS_STRICT_MODE", "QS_DATA_DIR", "QS_LOG_FORMAT", "QS_BIND_ADDR", "QS_TLS_BUNDLE", "QS_PROFILE"],
        default2=["true", "false", "json", "auto", "none"],
        effect=["how many records are grouped before a write", "how often the component checks for new work", "how many times a failed call is repeated",
                "how long buffered data is held before it is written", "how many partitions the data is split into", "how long entries stay in the cache"],
    ),
    title=["Configuring the {comp} || {comp} configuration reference || Settings for the {comp}"],
    sections=[
        S(P("The {comp} reads its settings from the [{comp_key}] section of quillstack.toml. || Settings for the {comp} live in the [{comp_key}] table of quillstack.toml. || "
            "You configure the {comp} in quillstack.toml, under the [{comp_key}] heading.",
            "Changes take effect after a restart unless noted otherwise. || Restart the {comp} after editing the file. || Most settings are reloaded on SIGHUP since version {version}."), opt=False),
        S(H("Options || Available settings"),
          T("Option|Default|Description", ["{key_r}|{n_mid_r}|Controls {effect_r}, in {unit_r}."], k=(3, 6))),
        S(H("Environment variables"),
          P("The variable {env} overrides the file setting and defaults to {default2}. || Set {env} to override the value in the file; the default is {default2}. || "
            "If {env} is set, it wins over quillstack.toml. Its default is {default2}.")),
        S(H("Example || Sample configuration"),
          P("A small deployment with {n_small} nodes usually works well with {key} set to {n_mid}. || For a {n_small} node cluster, start with {key} at {n_mid} and adjust from there. || "
            "Most teams running {n_small} nodes leave {key} at {n_mid}."),
          UL(["Keep {key} below {n_big} unless you have measured the effect.", "Use the same value on every node in a cluster.",
              "Values in {unit} are rounded down to whole numbers.", "Invalid values are logged and replaced by the default.",
              "The setting was added in version {version}."], k=(2, 4))),
        S(H("Troubleshooting"),
          P("If the {comp} fails to start, run quill check-config to see which setting was rejected. || A startup error that mentions [{comp_key}] usually means a value has the wrong type. || "
            "When the {comp} logs a warning about {key}, compare the value with the table above.")),
    ],
)

FAMILIES["qs_howto"] = dict(
    site="quill", section="guides",
    vary=["n_small", "n_mid", "version", "person", "port"],
    pools=dict(
        task=["rotate TLS certificates", "migrate a cluster to a new region", "back up the metadata store", "enable audit logging", "add a read replica",
              "upgrade from the previous major version", "limit memory per tenant", "run the scheduler behind a load balancer"],
        tool=["quill admin", "quill ctl", "the web console", "quill migrate"],
        pre=["admin rights on every node", "a recent backup of the metadata store", "network access to port {port}", "the cluster running version {version} or later",
             "a maintenance window of at least an hour", "the new certificates in PEM format"],
        step=["Stop new writes with {tool} pause", "Check the cluster health page", "Copy the files to each node", "Run {tool} apply with the new settings",
              "Restart the nodes one at a time", "Watch the logs for errors for {n_mid} minutes", "Resume writes with {tool} resume", "Confirm the change on the status page"],
    ),
    title=["How to {task} || Guide: {task} || {task}: step by step"],
    sections=[
        S(P("This guide explains how to {task} without taking the cluster offline. || Follow these steps to {task} on a running cluster. || "
            "You can {task} with {tool} in about {n_mid} minutes.",
            "It applies to version {version} and later. || The steps were tested on version {version}. || Older releases need a full restart instead."), opt=False),
        S(H("Before you start || Prerequisites"),
          UL(["{pre_r}"], k=(2, 4))),
        S(H("Steps"),
          OL(["{step_r}"], k=(4, 6))),
        S(H("Checking the result || Verify"),
          P("Run {tool} status and confirm that all {n_small} nodes report the same configuration hash. || The status command should list every node as healthy within a minute. || "
            "If a node stays amber for more than {n_mid} minutes, check its log file.")),
        S(H("Rolling back"),
          P("To undo the change, restore the previous settings and repeat the restart step. || If something goes wrong, {tool} rollback returns the cluster to its earlier state. || "
            "Keep the old files until you are sure the change worked.")),
    ],
)

FAMILIES["qs_release"] = dict(
    site="quill", section="releases",
    vary=["date1", "n_small", "n_mid", "person", "person2", "comp", "comp2"],
    pools=dict(
        version=["3.2.0", "3.2.1", "3.3.0", "3.4.0", "3.4.2", "3.5.0", "4.0.0", "4.0.1", "4.1.0", "4.2.0"],
        comp=["ingest worker", "scheduler", "storage gateway", "metrics exporter", "webhook relay", "search indexer"],
        feat=["a dry run mode for migrations", "per tenant rate limits", "faster startup on large clusters", "a new JSON log format",
              "compressed snapshots", "retry budgets for webhooks", "an audit trail for admin actions", "partial index rebuilds"],
        fix=["a crash when the queue was empty", "wrong totals on the metrics page", "a memory leak in long running workers", "slow shutdown when a node was unreachable",
             "duplicate webhook deliveries after a restart", "a timezone error in scheduled jobs", "a race between compaction and backups"],
    ),
    title=["Quillstack {version} release notes || What's new in Quillstack {version} || Release {version}"],
    sections=[
        S(P("Quillstack {version} was released on {date1}. || Version {version} is available from {date1}. || We shipped {version} on {date1}.",
            "The main addition is {feat}. || Its headline feature is {feat}. || This release focuses on {feat}."), opt=False),
        S(H("New features || Highlights"),
          UL(["{feat_r} in the {comp_r}"], k=(2, 4))),
        S(H("Bug fixes || Fixed"),
          UL(["Fixed {fix_r} (issue {n_big_r})."], k=(2, 5))),
        S(H("Upgrade notes || Upgrading"),
          P("Upgrade the {comp} before the {comp2}. || The {comp} and {comp2} can be upgraded in any order. || Read the migration guide before upgrading the {comp}.",
            "No configuration changes are required. || One setting was renamed; the old name still works until the next major release. || "
            "Clusters with more than {n_mid} nodes should upgrade in batches of {n_small}.")),
        S(H("Contributors || Thanks"),
          P("Thanks to {person}, {person2} and {n_mid} other contributors. || This release includes work by {person} and {person2}. || "
            "{n_mid} people contributed to this release, including {person}.")),
    ],
)
