"""Hand-written page bodies, part A: car club, airport, planning register, dental group.

Every page is built from hand-written sentence frames and hand-written fact tables.
A page is a dict: site, family, slug, title, section, date, blocks (list of (kind, text|rows)).
"""


def P(i, seq):
    return seq[i % len(seq)]


def page(site, family, slug, title, section, date, blocks, **extra):
    d = dict(site=site, family=family, slug=slug, title=title, section=section, date=date,
             blocks=[("h1", title)] + blocks)
    d.update(extra)
    return d


# ---------------------------------------------------------------- car club
BAYS = [
    ("Quayside North", "Mariner Street", "Old Harbour", "resurfacing of the loading area", "9 March", "27 March", "Quayside South", "Ropewalk Lane", 4, "two small electric hatchbacks"),
    ("Fenton Square", "Fenton Road", "Fenton", "gas main replacement by the network operator", "16 March", "10 April", "Tanner Yard", "Tanner Street", 6, "one estate car and one electric hatchback"),
    ("Chapel Rise", "Chapel Rise", "Upper Town", "the new cycle lane being marked out", "23 March", "3 April", "Bellfield Car Park", "Bellfield Way", 5, "a single seven-seat van"),
    ("Station Forecourt", "Platform Approach", "Harbour Station", "station canopy repairs", "30 March", "24 April", "Goods Yard Lane", "Goods Yard Lane", 3, "three electric hatchbacks"),
    ("Linnet Gardens", "Linnet Avenue", "Westbrook", "tree surgery on the avenue", "6 April", "8 April", "Westbrook Library", "Orchard Row", 7, "one small hatchback"),
    ("Ironworks Yard", "Foundry Lane", "Eastmoor", "the yard being sold to a new owner", "13 April", "the end of June", "Eastmoor Leisure Centre", "Kiln Road", 8, "two estate cars"),
    ("Saltpan Road", "Saltpan Road", "Saltings", "a water leak under the bay surface", "20 April", "1 May", "Saltings Parade", "Heron Walk", 4, "one electric van"),
    ("Market Hall", "Corn Street", "Town Centre", "the spring market taking over the car park", "27 April", "9 May", "Guildhall Mews", "Guild Street", 3, "two small hatchbacks and one estate car"),
    ("Beacon Hill", "Beacon Crescent", "Beacon", "a charging post being replaced", "4 May", "15 May", "Beacon Primary School gates", "Lark Lane", 6, "one electric hatchback"),
    ("Netherby Road", "Netherby Road", "Netherby", "resident permit changes agreed by the council", "11 May", "31 May", "Netherby Surgery", "Clover Street", 5, "one estate car"),
    ("Canal Basin", "Towpath Road", "Lockside", "lock gate works closing the basin access road", "18 May", "12 June", "Lockside Flats", "Wharf Close", 9, "two electric hatchbacks"),
    ("Priory Close", "Priory Close", "Abbeyfield", "a building site crane being lifted into place", "25 May", "27 May", "Abbeyfield Green", "Cloister Way", 4, "one seven-seat van"),
]

BAY_INTRO = [
    "The {bay} bay on {street} in {district} will be out of use from {start} to {end} because of {reason}.",
    "From {start} until {end} members will not be able to collect or return cars at the {bay} bay in {district}, owing to {reason}.",
    "We have been told that {reason} will close our {bay} bay on {street} between {start} and {end}.",
]
BAY_MOVE = [
    "While the bay is closed, {cars} will be parked at {alt} on {alt_street}, about {mins} minutes on foot from the usual spot.",
    "The cars normally kept there, {cars}, are moving to {alt} on {alt_street}. It is roughly a {mins} minute walk.",
    "For the duration of the works you will find {cars} at {alt}, {alt_street}, which is a {mins} minute walk away.",
]
BAY_BOOK = [
    "Bookings already made for {bay} have been moved across automatically, and the app will show the temporary address on your booking card.",
    "If you already hold a booking, you do not need to do anything: the booking now points to {alt} and the key fob works as normal.",
    "Existing bookings have been transferred to {alt}. Please check the pick-up address in the app before you set off.",
]
BAY_CLOSE = ("Please do not leave a club car on {street} during the closure, even for a few minutes, "
             "as the contractor may need the space without notice and any towing charge would be passed to the member.")


def carshare_bay(i):
    b = BAYS[i]
    f = dict(bay=b[0], street=b[1], district=b[2], reason=b[3], start=b[4], end=b[5], alt=b[6], alt_street=b[7], mins=b[8], cars=b[9])
    blocks = [("p", P(i, BAY_INTRO).format(**f) + " " + P(i + 1, BAY_MOVE).format(**f)),
              ("h2", "What this means for your bookings"),
              ("p", P(i + 2, BAY_BOOK).format(**f))]
    if i % 3 == 0:
        blocks += [("h2", "Key dates"),
                   ("li", "Last return to {bay}: the evening before {start}".format(**f)),
                   ("li", "Cars available at {alt}: from 7am on {start}".format(**f)),
                   ("li", "Expected return to {bay}: {end}, subject to the works finishing".format(**f))]
    if i % 4 == 1:
        blocks.append(("p", "The {district} area has limited on-street parking, so if you are driving a private car to collect a club car, "
                            "the nearest pay and display spaces are on the far side of {alt_street}.".format(**f)))
    blocks.append(("p", BAY_CLOSE.format(**f)))
    blocks.append(("p", P(i, ["Questions about this change can go to the member desk by phone or through the app.",
                               "Thank you for bearing with us while the work is done.",
                               "We will post an update here if the end date moves."])))
    slug = "bay-" + b[0].lower().replace(" ", "-") + "-closure"
    return page("carshare", "bay-notice", slug, "{} bay closed from {}".format(b[0], b[4]), "cars-and-bays",
                "2026-{:02d}-{:02d}".format(3 + i // 4, 2 + (i * 5) % 25), blocks)


GUIDES = [
    ("first-booking", "Making your first booking",
     "Your first booking is the moment most new members find out how the club really works, so it is worth doing it calmly a day or two ahead.",
     ["Open the app and choose the bay nearest to you from the map.",
      "Pick a start time and an end time, leaving a little slack for traffic on the way back.",
      "Check the car type, because vans and estate cars are charged at a higher hourly rate.",
      "Confirm the booking and wait for the message that says the key fob has been activated."],
     "If the car you wanted is taken, the app suggests the next nearest one. Most members in the Old Harbour area find a car within a ten minute walk."),
    ("damage-check", "Checking a car for damage before you drive",
     "Every member is asked to walk round the car before unlocking it, and to report anything new before the engine is started.",
     ["Look at each corner of the bumper and at both door mirrors.",
      "Check the windscreen for chips in the driver's line of sight.",
      "Open the boot and make sure the charging cable or warning triangle is there.",
      "Report anything you find through the app, adding a photo where you can."],
     "Reports made before the trip starts protect you: we will not charge the damage excess for anything logged at the start of a booking."),
    ("charging-mid-trip", "Charging an electric car during a trip",
     "Longer trips in our electric hatchbacks sometimes need a top-up, and the club covers the cost of charging on the public network.",
     ["Use the charging card kept in the sun visor, not your own account.",
      "Choose a rapid charger if you only have half an hour to spare.",
      "Stay with the car or nearby, as some sites fine cars left after charging ends.",
      "Put the card back in the visor before you lock the car."],
     "Please return electric cars with at least a third of the battery left. If that is not possible, leave a note in the app so the next member is not caught out."),
    ("second-driver", "Adding a second driver to your account",
     "Households that share the membership can add a second driver, who then books and drives under the same account.",
     ["Ask the second driver to create a login with their own email address.",
      "Upload a photo of both sides of their driving licence.",
      "Wait for the licence check, which normally takes one working day.",
      "Once approved, either driver can book, and each booking shows who made it."],
     "The main member remains responsible for charges and fines, so it is worth agreeing between you who pays for what."),
    ("late-return", "What happens if you return a car late",
     "Traffic and delays happen, and the club would rather you drove safely than rushed back to the bay.",
     ["Extend the booking in the app as soon as you know you will be late.",
      "If the app will not extend because another member is waiting, call the member desk.",
      "Leave the car at its home bay, not in a nearby street.",
      "Note the time you returned in the end-of-trip screen."],
     "A late return without warning costs the next member their trip, so we charge a flat late fee of fifteen pounds on top of the extra time."),
    ("fuel-card", "Using the fuel card in petrol and diesel cars",
     "Our few remaining petrol and diesel cars carry a fuel card, so members never pay for fuel out of their own pocket.",
     ["Fill up only when the gauge shows a quarter of a tank or less.",
      "Use the card at any forecourt that accepts the major fuel cards.",
      "Enter the mileage shown on the dashboard when the till asks for it.",
      "Keep the receipt in the glovebox folder."],
     "Fuel bought on the card for anything other than the club car, even a bottle of water, is treated as misuse of the card."),
    ("clean-car", "Keeping the cars clean",
     "Most complaints we receive from members are about cars left untidy, not about breakdowns or delays.",
     ["Take all rubbish with you at the end of the trip.",
      "Shake out the mats if you have been walking on a beach or in a muddy field.",
      "Use the seat covers in the boot when carrying a dog.",
      "Report spills or smells so the valeting team can visit."],
     "If a car has to be taken off the road for cleaning after your trip, a cleaning charge of up to forty pounds may be added."),
    ("weekend-booking", "Booking a car for a whole weekend",
     "Weekend trips are the most popular bookings we have, and the daily cap makes them cheaper than many members expect.",
     ["Book early, as Friday evening slots at busy bays go a week or more ahead.",
      "Choose the weekend rate, which caps the hourly charge at two days.",
      "Check whether the mileage allowance covers your route.",
      "Return the car by Sunday evening, as Monday morning bookings start early."],
     "Weekend bookings that run into Monday are charged at the normal hourly rate for the extra hours."),
    ("fines", "Parking fines and penalty notices",
     "When a penalty notice arrives for a club car, we match it to the booking that was running at the time.",
     ["We write to the member named on the booking within five working days.",
      "The member can pay the fine directly or ask us to pass on their details.",
      "An admin charge of ten pounds applies when we have to transfer the notice.",
      "Members can appeal, and we will provide trip records to support the appeal."],
     "Fines incurred because a bay was wrongly signed are not the member's fault, and we will deal with those ourselves."),
    ("child-seats", "Travelling with children",
     "None of our cars carry child seats as standard, because seats need to fit the child as well as the car.",
     ["Bring your own seat and fit it before setting off.",
      "Use the seat fixing points marked on the rear seats of the hatchbacks.",
      "Turn off the front passenger airbag if you fit a rear-facing seat in the front.",
      "Take the seat with you at the end of the trip."],
     "Members who need a seat often can ask about the loan scheme run with the Fenton family centre."),
]
GUIDE_CLOSE = [
    "The member desk is open from 8am to 8pm every day and can talk you through any of these steps.",
    "You can also find short videos on each of these steps in the help area of the app.",
]


def carshare_guide(i):
    slug, title, intro, steps, note = GUIDES[i]
    blocks = [("p", intro), ("h2", "Step by step")] + [("li", s) for s in steps] + [("p", note), ("p", P(i, GUIDE_CLOSE))]
    return page("carshare", "member-guide", "guide-" + slug, title, "members",
                "2026-0{}-{:02d}".format(2 + i % 5, 4 + i * 2), blocks)


# ---------------------------------------------------------------- airport
NOTICES = [
    ("gate-4-resurfacing", "Gate 4 closed for resurfacing", "Gate 4 will be closed", "11 May", "Gates 5 and 6", "Walking time from security to the remaining gates is about six minutes."),
    ("security-lane-2", "Security lane 2 reopens", "Security lane 2 reopens", "14 May", "all three security lanes", "Passengers with reduced mobility can still ask for the assisted lane at the far end."),
    ("drop-off-zone", "Drop-off zone moves to level 0", "The drop-off zone moves to level 0", "19 May", "the new level 0 lay-by", "The first ten minutes in the drop-off zone remain free of charge."),
    ("baggage-belt-3", "Baggage belt 3 out of service", "Baggage belt 3 is out of service", "21 May", "belts 1 and 2", "Oversized items will be delivered to the service desk next to belt 1."),
    ("cafe-closure", "Departure lounge cafe closed for refit", "The departure lounge cafe is closed for a refit", "26 May", "the kiosk by gate 2", "Drinking water refill points by the toilets are not affected."),
    ("lift-b", "Lift B under repair", "Lift B between arrivals and the car park bridge is under repair", "2 June", "lift A beside the information desk", "Staff at the information desk can help anyone who cannot use the stairs."),
    ("liquids-rule", "Change to liquids screening", "The screening rule for liquids in hand baggage changes", "8 June", "the new scanners in both lanes", "Containers over 100ml must still go in hold baggage until further notice."),
    ("taxi-rank", "Taxi rank relocated", "The taxi rank has been relocated", "12 June", "the rank opposite the bus shelter", "Pre-booked private hire cars still meet passengers in the short-stay car park."),
    ("prayer-room", "Prayer room temporarily moved", "The prayer and quiet room has temporarily moved", "15 June", "room 14 on the mezzanine", "The room is open from the first departure until the last arrival each day."),
    ("car-park-c", "Car park C closed at night", "Car park C will be closed at night", "19 June", "car parks A and B", "Pre-booked spaces in car park C have been moved to car park B at no extra cost."),
    ("fast-track", "Fast track desk hours reduced", "Opening hours at the fast track desk are reduced", "23 June", "the main security lanes outside those hours", "Fast track passes bought online will be refunded for any hour the desk is closed."),
    ("arrivals-door", "Arrivals hall east door closed", "The east door of the arrivals hall is closed", "29 June", "the west door next to the car hire desks", "Step-free access is available through the west door."),
    ("trolleys", "New luggage trolley deposit", "Luggage trolleys now need a one pound coin deposit", "3 July", "trolley bays on both levels", "The coin is returned when the trolley is pushed back into any bay."),
    ("wifi", "Terminal wifi upgrade overnight", "The terminal wifi will be switched off overnight for an upgrade", "7 July", "mobile data", "Flight information screens and boarding announcements are not affected."),
]
NOTICE_P1 = [
    "{what} from {date}. During this period please use {alt}.",
    "{what} from {date}, and passengers should use {alt} instead.",
    "Please note: {what_l} from {date}. In the meantime {alt} will be in use.",
]
NOTICE_P2 = [
    "Signs in the terminal will direct you, and staff in yellow jackets are on hand if you are unsure where to go.",
    "Follow the temporary signs, and ask any member of staff in a yellow jacket if you need directions.",
    "Temporary signs have been put up, and our customer service team can point you the right way.",
]
NOTICE_P3 = [
    "We expect normal service to resume within a few weeks and will update this notice when it does.",
    "This notice will be updated as soon as a date for the return to normal has been agreed.",
    "We apologise for any inconvenience and thank passengers for their patience.",
]


def airport_notice(i):
    n = NOTICES[i]
    f = dict(what=n[2], what_l=n[2][0].lower() + n[2][1:], date=n[3], alt=n[4])
    blocks = [("p", P(i, NOTICE_P1).format(**f)), ("p", n[5] + " " + P(i + 1, NOTICE_P2)), ("p", P(i + 2, NOTICE_P3))]
    if i % 2 == 0:
        blocks.insert(2, ("p", "Airlines operating from Kestrel Vale have been told about the change and will mention it in their pre-departure emails."))
    return page("airport", "passenger-notice", "notice-" + n[0], n[1], "at-the-airport",
                "2026-05-{:02d}".format(1 + i * 2), blocks, hardcase=True)


WORKS = [
    ("runway-lighting", "Runway edge lighting replacement", "the runway edge lights", "the old lamps have reached the end of their working life",
     [("Mon 1 Jun", "23:00", "05:30"), ("Tue 2 Jun", "23:00", "05:30"), ("Wed 3 Jun", "23:30", "05:30")]),
    ("taxiway-b", "Taxiway B resurfacing", "taxiway B", "the surface is wearing faster than expected",
     [("Sun 7 Jun", "22:30", "06:00"), ("Mon 8 Jun", "22:30", "06:00")]),
    ("apron-drainage", "Apron drainage works", "the drainage under stands 3 to 5", "the stands flooded twice during the winter storms",
     [("Tue 16 Jun", "23:00", "05:00"), ("Wed 17 Jun", "23:00", "05:00"), ("Thu 18 Jun", "23:00", "05:00"), ("Fri 19 Jun", "23:00", "05:00")]),
    ("terminal-roof", "Terminal roof repairs", "the terminal roof above check-in", "a survey found loose panels after the February gales",
     [("Mon 22 Jun", "21:00", "04:30"), ("Tue 23 Jun", "21:00", "04:30")]),
    ("fuel-farm", "Fuel farm pipework", "the pipework at the aircraft fuel farm", "new safety rules require double-skinned pipes",
     [("Sat 27 Jun", "22:00", "06:00"), ("Sun 28 Jun", "22:00", "06:00"), ("Sat 4 Jul", "22:00", "06:00")]),
    ("ils-calibration", "Landing system calibration flights", "the instrument landing system", "the system must be checked from the air every year",
     [("Wed 1 Jul", "10:00", "13:00"), ("Thu 2 Jul", "10:00", "13:00")]),
    ("car-park-bridge", "Car park footbridge painting", "the footbridge between car park A and the terminal", "the steelwork needs a new protective coat",
     [("Mon 6 Jul", "20:00", "02:00"), ("Tue 7 Jul", "20:00", "02:00"), ("Wed 8 Jul", "20:00", "02:00")]),
    ("fire-station", "Airport fire station extension", "the airport fire station", "a third fire tender is being added to the fleet",
     [("Mon 13 Jul", "07:30", "17:00"), ("Tue 14 Jul", "07:30", "17:00")]),
    ("perimeter-fence", "Perimeter fence renewal", "the northern perimeter fence", "the fence no longer meets current security standards",
     [("Mon 20 Jul", "08:00", "16:00"), ("Tue 21 Jul", "08:00", "16:00"), ("Wed 22 Jul", "08:00", "16:00")]),
]
WORKS_DETAIL = {'runway-lighting': 'The new fittings use LED lamps, which last about five times longer and use a fraction of the power.', 'taxiway-b': 'Taxiway B links the main apron with the western end of the runway and is used by almost every departing aircraft.', 'apron-drainage': 'New channels and a larger storage tank will hold storm water until it can be released slowly into the brook.', 'terminal-roof': 'Check-in desks 1 to 6 will be screened off overnight, but the terminal itself stays open for the early shift.', 'fuel-farm': 'Fuel deliveries by road tanker will be rescheduled to daytime while the pipework is replaced.', 'ils-calibration': 'A small twin-engined survey aircraft will fly repeated low approaches to both ends of the runway.', 'car-park-bridge': 'Passengers walking from car park A will be directed along a covered route at ground level.', 'fire-station': 'The extension adds a third bay to the station, along with a new training room and drying area for kit.', 'perimeter-fence': 'The new fence is taller and carries detection cables, and the public footpath alongside it stays open.'}
WORKS_INTRO = [
    "Work on {what} starts this month because {why}. Most of the work takes place at night, when the airport is closed to scheduled flights.",
    "We are carrying out work on {what}, as {why}. To keep disruption low, the noisiest tasks have been planned for the hours when no scheduled flights operate.",
    "Engineers will be working on {what} over the coming weeks. The work is needed because {why}, and it has been timed to avoid the busiest flying hours.",
]
WORKS_NEIGH = [
    "Neighbours in Kestrel Vale and Hollins End may hear plant machinery and see floodlights on the airfield during the hours listed below.",
    "Residents living close to the airfield boundary may notice lighting and some noise from vehicles during the hours shown in the table.",
]
WORKS_BACKGROUND = [
    "The airfield was last given a full survey three years ago, when inspectors listed a number of items that would need attention before the end of the decade. "
    "This work is the third of those items to be carried out. The airport has set aside money for the programme from parking income, so none of the cost falls on airlines or passengers. "
    "Contractors were chosen after a tender that asked bidders to show how they would keep noise down after midnight, and the winning firm will use electric lighting towers and low-noise generators. "
    "Progress will be reported to the consultative committee at its next meeting, and the minutes are published on this website.",
    "Work of this kind can only be done when the airfield is quiet, which is why it is split across several nights rather than completed in one long closure. "
    "The airport looked at a daytime closure, but it would have meant cancelling flights on the busiest days of the week. "
    "Our engineering team will be on site throughout, and a manager is on call each night to deal with any complaints straight away. "
    "Once the work is finished, an independent inspector will sign it off before normal operations resume.",
    "The project has been discussed with the parish councils in Kestrel Vale, Hollins End and Saltcote, and their comments shaped the working hours. "
    "In particular, no deliveries will use Hollins Lane before seven in the morning, and the site compound has been placed on the far side of the airfield from the nearest houses. "
    "If the weather turns bad, some nights may be cancelled and added to the end of the programme, and this page will be updated when that happens.",
]
WORKS_CLOSE = ("Our community relations team can be reached on the noise line, which is staffed every day from 7am to 11pm, "
               "and all calls about the works are logged and reported to the airport consultative committee.")


def airport_works(i):
    w = WORKS[i]
    f = dict(what=w[2], why=w[3])
    rows = [["Date", "Start", "Finish"]] + [list(r) for r in w[4]]
    blocks = [("p", P(i, WORKS_INTRO).format(**f) + " " + WORKS_DETAIL[w[0]]), ("p", P(i // 2, WORKS_NEIGH)), ("h2", "Working hours"), ("table", rows),
              ("h2", "Effect on flights")]
    blocks.append(("p", P(i, ["No scheduled flights are affected, and airlines have confirmed their timetables.",
                              "Early morning departures may be held for up to ten minutes while the last vehicles leave the airfield.",
                              "A small number of late arrivals may use the shorter landing distance, which the airlines have planned for."])))
    if i % 3 == 0:
        blocks += [("h2", "Background"), ("p", WORKS_BACKGROUND[i // 3])]
    if i % 2 == 1:
        blocks += [("h2", "Contacting us"), ("p", WORKS_CLOSE)]
    else:
        blocks.append(("p", WORKS_CLOSE))
    return page("airport", "works-update", "works-" + w[0], w[1], "community",
                "2026-{:02d}-{:02d}".format(5 + i // 4, 3 + i * 3), blocks)


# ---------------------------------------------------------------- planning register
APPS = [
    ("AL/26/0412/FUL", "14 Weaver's Row, Aldermere", "Single storey rear extension with roof lantern", "Mr and Mrs Okonkwo-Hale", "3 March", "31 March", "Ruth Penberthy",
     "The extension would project four metres from the rear wall and replace an existing timber conservatory.", "householder"),
    ("AL/26/0418/FUL", "Land east of Moorcroft Farm, Lowther Lane", "Erection of an agricultural storage barn", "Moorcroft Partners", "5 March", "2 April", "Daniel Ashworth",
     "The barn would store hay and machinery and would be clad in dark green profiled steel.", "rural"),
    ("AL/26/0425/LBC", "The Old Toll House, Bridge End", "Replacement of rear sash windows in a listed building", "Bridge End Heritage Trust", "9 March", "6 April", "Priya Lindqvist",
     "The three windows at the back of the building would be replaced like for like in painted softwood.", "heritage"),
    ("AL/26/0431/ADV", "Unit 3, Tannery Retail Park", "Two illuminated fascia signs", "Northgate Flooring Ltd", "11 March", "8 April", "Daniel Ashworth",
     "The signs would be lit from inside and would switch off at 10pm each night.", "advert"),
    ("AL/26/0440/FUL", "22 Sorrel Close, Pennick", "Change of use from dwelling to children's nursery", "Little Acorns Day Care", "16 March", "13 April", "Ruth Penberthy",
     "The nursery would care for up to twenty four children between 7.30am and 6pm on weekdays.", "change-of-use"),
    ("AL/26/0447/OUT", "Former Gasworks Site, Canal Street", "Outline application for up to 48 homes", "Canal Street Regeneration LLP", "18 March", "22 April", "Marcus Feld",
     "Only the access point from Canal Street is to be decided now, with layout and design to follow later.", "major"),
    ("AL/26/0453/FUL", "Pennick Village Hall, Church Lane", "Installation of solar panels on south roof", "Pennick Village Hall Committee", "23 March", "20 April", "Priya Lindqvist",
     "Twenty panels would be fixed to the south-facing roof slope, which is not visible from Church Lane.", "community"),
    ("AL/26/0460/TPO", "Rear garden of 5 Hazel Drive, Aldermere", "Reduction of an oak tree protected by order", "Ms Delphine Carrow", "25 March", "15 April", "Tom Urquhart",
     "The crown of the oak would be reduced by about two metres to clear the neighbouring roof.", "trees"),
    ("AL/26/0466/FUL", "Ashby Motors, Station Road", "Car wash canopy and water recycling tank", "Ashby Motors Ltd", "30 March", "27 April", "Marcus Feld",
     "The canopy would cover two wash bays and the tank would sit below ground next to the workshop.", "commercial"),
    ("AL/26/0472/FUL", "Flat 2, 9 Market Place, Aldermere", "Rooftop terrace with glass balustrade", "Mr Jonah Whitcombe", "1 April", "29 April", "Ruth Penberthy",
     "The terrace would sit behind the front parapet and would be reached through a new roof hatch.", "householder"),
    ("AL/26/0479/FUL", "Larkfield Primary School, Larkfield Road", "Two classroom modular building", "Aldermere Schools Trust", "7 April", "5 May", "Tom Urquhart",
     "The building would stand on the hard play area for up to five years while the main school is rebuilt.", "education"),
    ("AL/26/0484/COU", "The Drovers Inn, High Street, Pennick", "Conversion of former pub to three flats", "Harrowgate Homes", "9 April", "7 May", "Priya Lindqvist",
     "The ground floor bar would become one flat and the upper floors would be split into two more.", "change-of-use"),
    ("AL/26/0491/FUL", "Kingsmead Allotments, Ferry Lane", "Communal tool store and composting toilet", "Kingsmead Allotment Society", "14 April", "12 May", "Daniel Ashworth",
     "The timber store would replace two old sheds near the gate and the toilet would need no mains drainage.", "community"),
]
APP_INTRO = [
    "An application has been received for {prop_l} at {addr}. {detail}",
    "We have received a planning application for {prop_l} at {addr}. {detail}",
    "The council is consulting on an application at {addr} for {prop_l}. {detail}",
]
APP_MID = {
    "householder": "Neighbours on either side have been sent letters, and a site notice has been put up on the nearest lamp post.",
    "rural": "The parish council and the highways team have been asked for their views on the use of the lane by farm vehicles.",
    "heritage": "Because the building is listed, the conservation officer will visit before any recommendation is made.",
    "advert": "Only the size, position and lighting of the signs can be taken into account, not the business itself.",
    "change-of-use": "The main issues are likely to be parking, noise and the effect on people living nearby.",
    "major": "A transport assessment, a flood risk report and a land contamination survey have been submitted with the application.",
    "community": "No objections were raised at the pre-application stage, but comments from the public are still welcome.",
    "trees": "The tree officer will inspect the oak and report on whether the work is needed and would harm its health.",
    "commercial": "The environmental health team has been asked to comment on noise from the jet wash equipment.",
    "education": "The application is temporary, and the council can set conditions on how long the building may stay.",
}
APP_CLOSE = ("Comments must be made in writing by the consultation end date and should relate to planning matters only. "
             "All comments, including your name and address, will be published on this register.")


def planning_app(i):
    a = APPS[i]
    rows = [["Field", "Detail"], ["Reference", a[0]], ["Site address", a[1]], ["Proposal", a[2]], ["Applicant", a[3]],
            ["Received", a[4]], ["Consultation ends", a[5]], ["Case officer", a[6]]]
    f = dict(prop_l=a[2][0].lower() + a[2][1:], addr=a[1], detail=a[7])
    blocks = [("table", rows), ("h2", "About the proposal"), ("p", P(i, APP_INTRO).format(**f)), ("p", APP_MID[a[8]])]
    if i % 3 == 2:
        blocks += [("h2", "Documents submitted"), ("li", "Application form"), ("li", "Site location plan"),
                   ("li", P(i, ["Existing and proposed elevations", "Design and access statement", "Heritage statement"])),
                   ("li", P(i + 1, ["Ecology survey", "Floor plans", "Photographs of the site"]))]
    blocks += [("h2", "How to comment"), ("p", APP_CLOSE)]
    slug = a[0].lower().replace("/", "-")
    return page("planning", "application", slug, "{}: {}".format(a[0], a[2]), "applications",
                "2026-{:02d}-{:02d}".format(3 + i // 5, 2 + (i * 4) % 26), blocks)


DECISIONS = [
    ("AL/25/1107/FUL", "Two storey side extension, 31 Orchard Way", "approved", ["Materials to match the existing house.", "No windows in the side wall facing number 29.", "Work to start within three years."],
     "The extension is set back from the front wall and would not harm the character of the street."),
    ("AL/25/1122/FUL", "Detached garage, Rose Cottage, Lowther Lane", "refused", [],
     "The garage would stand forward of the cottage and would block the view of the listed barn from the lane."),
    ("AL/25/1139/OUT", "Up to 12 homes, land at Ferry Lane", "approved", ["Details of layout and design to be submitted.", "A footpath link to Ferry Lane to be provided.", "Two of the homes to be affordable.", "A bat survey before any demolition."],
     "The site is inside the village boundary and the highway authority raised no objection to the access."),
    ("AL/25/1145/ADV", "Free-standing sign, Pennick Garden Centre", "approved", ["The sign is not to be lit between 9pm and 7am."],
     "The sign is modest in size and is set well back from the road."),
    ("AL/25/1160/FUL", "Change of use to hot food takeaway, 4 Bridge Street", "refused", [],
     "A further takeaway would leave the parade with fewer shops than the local plan requires, and the extraction flue would affect flats above."),
    ("AL/26/0012/FUL", "Stable block and manege, Highfield Farm", "approved", ["No commercial riding lessons.", "Manure to be stored at least thirty metres from the brook.", "No floodlighting of the manege."],
     "The stables are for private use and are grouped with existing farm buildings."),
    ("AL/26/0031/LBC", "Internal alterations, 2 Abbey Walk", "approved", ["Original fireplaces to be kept in place.", "New partitions to be fixed without cutting into the cornice."],
     "The changes are reversible and keep the original plan form of the rooms."),
    ("AL/26/0048/FUL", "Telecoms mast, Hollins Quarry", "refused", [],
     "The mast would be visible on the skyline from the Hollins ridge path and no other sites were properly assessed."),
    ("AL/26/0063/FUL", "Replacement dwelling, Wren House, Ferry Lane", "approved", ["Existing house to be demolished before the new one is occupied.", "Removal of permitted development rights for extensions.", "Hedge along Ferry Lane to be kept.", "Sustainable drainage scheme to be agreed.", "Construction hours limited to 8am to 6pm on weekdays."],
     "The new house is of similar size to the one it replaces and would improve energy performance considerably."),
]
DEC_INTRO = {
    "approved": ["Permission has been granted, subject to the conditions listed below.",
                 "The council has approved this application with conditions.",
                 "This application was approved under delegated powers, with the conditions set out below."],
    "refused": ["Permission has been refused.", "The council has refused this application.",
                "This application was refused under delegated powers."],
}
DEC_ASSESS = [
    ["The house sits in a row of similar semi-detached properties, several of which have already been extended to the side. The proposed extension follows the pattern set by those earlier schemes, with a lower ridge and a set-back front wall, so that the original pair of houses can still be read as a pair from the street.",
     "The neighbour at number 29 raised concerns about overlooking. The plans were amended during the application to remove a first-floor window, and the remaining windows face the front and rear gardens only. With that change, officers do not consider that the extension would cause unacceptable harm to the living conditions of neighbours.",
     "Parking for two cars remains on the drive, which meets the council's standard for a house of this size."],
    ["The site lies at the edge of Highfield Farm, in open countryside where new buildings are normally resisted. However, national and local policy both support equestrian uses in the countryside where buildings are modest and grouped with existing development.",
     "The stable block would be built in timber on a low brick plinth, next to the existing hay barn, and the manege would be surfaced in sand with a post and rail fence. Officers consider that the scheme would sit comfortably in the landscape when seen from the public footpath to the east.",
     "The brook that runs along the southern boundary is a local wildlife site, and conditions are needed to keep manure and run-off away from it. Subject to those conditions, the proposal is acceptable."],
    ["Wren House is a modest post-war bungalow in a large plot on Ferry Lane. The replacement house would be taller, at one and a half storeys, but its footprint would be only slightly larger, and the upper floor would be contained within the roof.",
     "Several neighbours were concerned that the new house would be used as a precedent for more intensive development along the lane. Each application is considered on its own merits, and a condition removing permitted development rights would give the council control over any future extensions.",
     "The hedge along the frontage is an important feature of the lane and would be protected during construction. The new house would be built to a high standard of insulation and would be heated by an air source heat pump."],
]
DEC_APPEAL = ("The applicant may appeal against this decision to the planning inspectorate. Third parties cannot appeal, "
              "but anyone who commented on the application will be told if an appeal is lodged.")


def planning_decision(i):
    d = DECISIONS[i]
    blocks = [("table", [["Reference", "Decision", "Decision date"], [d[0], d[2].capitalize(), "{} April 2026".format(6 + i * 2)]]),
              ("p", P(i, DEC_INTRO[d[2]])), ("h2", "Reasons"), ("p", d[4])]
    if i % 2 == 0:
        blocks.append(("p", P(i, ["Eleven comments were received, most of them about traffic on the lane.",
                                  "The parish council supported the application.",
                                  "Three neighbours objected, mainly about loss of light and privacy.",
                                  "No comments were received from the public."])))
    if i % 3 == 0:
        blocks += [("h2", "Officer's assessment")] + [("p", t) for t in DEC_ASSESS[i // 3]]
    if d[3]:
        blocks.append(("h2", "Conditions"))
        blocks += [("li", c) for c in d[3]]
    blocks += [("h2", "Right of appeal"), ("p", DEC_APPEAL)]
    slug = "decision-" + d[0].lower().replace("/", "-")
    return page("planning", "decision", slug, "Decision: {}".format(d[1]), "decisions",
                "2026-04-{:02d}".format(6 + i * 2), blocks)


# ---------------------------------------------------------------- dental group
TREATMENTS = [
    ("scale-and-polish", "Scale and polish", "A scale and polish removes hardened plaque, called tartar, that brushing alone cannot shift.",
     "The hygienist uses a small ultrasonic tool and then a hand scaler, followed by a gritty paste on a rotating cup.",
     "Gums may bleed a little for a day or two, which usually settles once you keep brushing gently.", "Band 1"),
    ("white-fillings", "White fillings", "White fillings are made from a tooth-coloured resin that is bonded to the tooth in thin layers.",
     "After the decay is removed, each layer is set hard with a blue curing light before the filling is shaped and polished.",
     "You can eat as soon as the numbness wears off, but avoid very hot drinks until then.", "Band 2"),
    ("root-canal", "Root canal treatment", "Root canal treatment saves a tooth whose nerve has become infected or has died.",
     "The inside of the tooth is cleaned and shaped over one or two visits, then sealed and covered with a filling or crown.",
     "The tooth may feel tender when biting for a few days, and simple painkillers are normally enough.", "Band 2"),
    ("crowns", "Crowns", "A crown is a cap that covers a weakened tooth to protect it and restore its shape.",
     "The tooth is prepared at the first visit, a scan or impression is taken, and the finished crown is fitted about two weeks later.",
     "A temporary crown is fitted in between, and you should avoid sticky food on that side.", "Band 3"),
    ("extractions", "Tooth extractions", "We only remove a tooth when it cannot be saved or when removal is the better option for your health.",
     "The area is numbed first, and most extractions take less than half an hour from start to finish.",
     "Bite on the gauze for twenty minutes, do not rinse for a day, and avoid smoking while the socket heals.", "Band 2"),
    ("childrens-checkups", "Check-ups for children", "We like to see children from the time their first teeth appear, so that visits become routine and relaxed.",
     "A check-up for a young child often takes place on a parent's lap, and we count teeth, look at the gums and talk about brushing.",
     "Children aged three and over can have fluoride varnish painted on their teeth twice a year.", "Free"),
    ("night-guards", "Night guards for grinding", "A night guard is a thin plastic shield worn over the teeth while you sleep to protect them from grinding.",
     "We take a scan of your teeth and the guard is made in a lab to fit your bite exactly.",
     "Clean the guard each morning with a soft brush and cold water, and bring it to every check-up.", "Private"),
    ("whitening", "Tooth whitening", "Whitening lightens the natural colour of teeth but does not change the colour of fillings or crowns.",
     "Custom trays are made for you, and you wear them at home with a mild gel for two weeks.",
     "Teeth may feel sensitive during the course, and a sensitive toothpaste helps.", "Private"),
    ("dentures", "Dentures", "Dentures replace missing teeth and can be full, covering a whole arch, or partial.",
     "Making a denture takes four or five short visits for impressions, bite records and a try-in.",
     "Take dentures out at night, clean them over a bowl of water, and keep them moist.", "Band 3"),
    ("emergency", "Dental emergencies", "If you are in severe pain or have swelling, call your practice as early in the morning as you can.",
     "Each practice keeps emergency slots every day, and we see registered patients on the same day whenever possible.",
     "If your face is swelling towards your eye or you have difficulty swallowing, go to the hospital emergency department.", "Band 1"),
]
TREAT_COST = [
    "Treatment is charged at {band} for patients treated under the health service, and the current charges are shown at reception.",
    "Under the health service this treatment falls in {band}. Ask reception for the current charge.",
]


def dental_treatment(i):
    t = TREATMENTS[i]
    blocks = [("p", t[2]), ("h2", "What happens"), ("p", t[3]), ("h2", "Afterwards"), ("p", t[4]), ("h2", "Cost")]
    if t[5] == "Private":
        blocks.append(("p", "This treatment is only available privately. Your dentist will give you a written estimate before you agree to go ahead."))
    elif t[5] == "Free":
        blocks.append(("p", "Dental care for children under eighteen is free at all Brightwater practices."))
    else:
        blocks.append(("p", P(i, TREAT_COST).format(band=t[5])))
    blocks.append(("p", P(i, ["If you have questions before your appointment, our reception teams are happy to pass them to your dentist.",
                              "Please tell us about any change in your medical history or medicines before treatment."])))
    return page("dental", "treatment", "treatments-" + t[0], t[1], "treatments",
                "2026-0{}-{:02d}".format(1 + i % 6, 5 + i * 2), blocks)


NEWS = [
    ("Harbour Street", "new-hygienist", "New hygienist joins Harbour Street", "Our Harbour Street practice has welcomed a new hygienist, Aisling Moreau, who joins us after six years in a practice in the north.",
     "Aisling works Tuesday to Friday and is taking on new patients straight away."),
    ("Kingsbridge", "refurbishment", "Kingsbridge surgery refurbishment", "The Kingsbridge practice will have its two surgeries refurbished over the summer.",
     "While the work is done, appointments will run from the upstairs surgery and the hours will be slightly shorter."),
    ("Millbrook", "parking", "Parking changes at Millbrook", "The car park behind our Millbrook practice is being resurfaced and will be closed for a week.",
     "Patients can park in the leisure centre car park across the road, and we will refund the parking fee at reception."),
    ("Harbour Street", "saturday-clinic", "Saturday clinic at Harbour Street", "From next month Harbour Street will open on Saturday mornings for check-ups and hygiene appointments.",
     "The Saturday clinic is aimed at patients who struggle to take time off work during the week."),
    ("Kingsbridge", "new-scanner", "Digital scanner at Kingsbridge", "Kingsbridge now has a digital scanner that takes a 3D picture of your teeth in place of messy impression putty.",
     "The scanner is used for crowns, night guards and whitening trays, and most patients say it is far more comfortable."),
    ("Millbrook", "accessible-entrance", "Step-free entrance at Millbrook", "Millbrook practice now has a step-free entrance from the side path, with a wider door and a ramp.",
     "The ground floor surgery has also been fitted with a chair that lowers further for patients transferring from a wheelchair."),
    ("Harbour Street", "school-visits", "School visits this term", "Our Harbour Street team has been visiting reception classes at four local primary schools to talk about brushing.",
     "Each child took home a timer and a chart, and the schools have asked us to come back in the spring."),
    ("Kingsbridge", "phone-lines", "New phone system", "We have moved to a new phone system across all three practices, so calls are now answered by whichever reception team is free.",
     "The practice phone numbers have not changed, and you can still ask to be put through to your own practice."),
    ("Millbrook", "dentist-retiring", "Mr Halloran retires", "After twenty seven years at Millbrook, our senior dentist Declan Halloran is retiring at the end of the month.",
     "His patients will be looked after by Dr Sunita Rao, who has worked alongside him for the past four years."),
    ("Harbour Street", "recall-texts", "Reminder texts for check-ups", "We now send a text reminder two weeks before your check-up is due, with a link to choose a time.",
     "If you would rather have a letter, just tell reception and we will update your record."),
]
NEWS_EXTRA = [
    "She has a particular interest in helping nervous patients and in gum care for people with diabetes.",
    "The new surgeries will have better ventilation and brighter lighting, and the waiting room will get new seating.",
    "The work has been booked for the quietest week of the summer, when fewer patients are on holiday rota.",
    "Saturday appointments can be booked online or by phone in the usual way, and emergency slots will be kept free.",
    "Scans are stored on your record, so if a crown ever needs replacing we can make a new one from the same scan.",
    "The changes were suggested by members of our patient group, who tested the new entrance before it opened.",
    "Teachers told us the children were still talking about the giant toothbrush a week later.",
    "During the first few weeks waiting times on the phone may be a little longer while staff get used to the system.",
    "A farewell afternoon tea will be held in the practice garden on his last Friday, and patients are welcome to drop in.",
    "Reminder texts never ask for payment or bank details, so please tell us if you receive a message that does.",
]
NEWS_CLOSE = [
    "Thank you to all our patients for your patience and support.",
    "As always, you can contact any of our practices if you have questions.",
    "We look forward to seeing you at your next visit.",
]


def dental_news(i):
    n = NEWS[i]
    blocks = [("p", n[3] + " " + n[4]), ("p", NEWS_EXTRA[i]),
              ("p", P(i, ["{} is one of three Brightwater practices, and patients can be seen at any of them if that suits better.",
                          "Patients registered at {} do not need to do anything differently.",
                          "Staff at {} will be happy to answer any questions when you next visit."]).format(n[0])),
              ("p", P(i, NEWS_CLOSE))]
    return page("dental", "practice-news", "news-" + n[1], n[2], "news",
                "2026-0{}-{:02d}".format(3 + i % 6, 2 + i * 2), blocks, practice=n[0])


def pages_a():
    out = []
    out += [carshare_bay(i) for i in range(len(BAYS))]
    out += [carshare_guide(i) for i in range(len(GUIDES))]
    out += [airport_notice(i) for i in range(len(NOTICES))]
    out += [airport_works(i) for i in range(len(WORKS))]
    out += [planning_app(i) for i in range(len(APPS))]
    out += [planning_decision(i) for i in range(len(DECISIONS))]
    out += [dental_treatment(i) for i in range(len(TREATMENTS))]
    out += [dental_news(i) for i in range(len(NEWS))]
    return out
