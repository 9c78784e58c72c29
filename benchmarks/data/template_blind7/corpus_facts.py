"""Invented fact pools and the small machinery used by the page families.
Every name, place and organisation here is made up for this corpus."""
import datetime

FIRST = ["Aldith", "Bryony", "Cedric", "Dorcas", "Eamon", "Fenella", "Gideon", "Hester", "Ivo",
         "Jocasta", "Kester", "Linnet", "Morwenna", "Nye", "Oriel", "Piran", "Quentin", "Rosamund",
         "Silas", "Tamsin", "Ulric", "Verity", "Wilf", "Xanthe", "Yestin", "Zillah", "Anselm",
         "Caspar", "Delphine", "Elowen", "Fitz", "Greer", "Halcyon", "Isaura", "Jory", "Keturah"]
SUR = ["Achard", "Barrowclift", "Cattermole", "Dimmock", "Etheridge", "Fairbrass", "Gathercole",
       "Hollings", "Ingledew", "Jessamy", "Kettlewell", "Lowthorpe", "Mallinder", "Northam",
       "Osgood", "Pilbeam", "Quarrell", "Redfern", "Sowerbutts", "Thwaite", "Umbleby", "Varley",
       "Whitlock", "Yallop", "Brackley", "Coldwell", "Dunnock", "Hebblewhite", "Marchbank",
       "Penhallow", "Rookesby", "Tregarthen", "Vosper", "Winstanley", "Ashdown", "Bellhanger"]
PLACES = ["Ambersett", "Brackenwick", "Carrowfold", "Dunmerrow", "Elsworth Fen", "Fallowby",
          "Garthmoss", "Hethervale", "Ickledown", "Kelsworth", "Lowick Bridge", "Marsden Hythe",
          "Nettlecombe Parva", "Orchard Hey", "Pellingham", "Quernmoor", "Rushwater", "Saltreach",
          "Thornwick Fold", "Upwell Marish", "Wrayfield", "Yarrowby", "Cobble Ashton", "Deepford",
          "Harrowgill", "Mossby Cross", "Pendle Wray", "Stanegate Row"]
STREETS = ["Tanner's Row", "Mill Lane", "Coopers Yard", "Ferry Road", "Quarry Bank", "Chapel Walk",
           "Orchard Close", "Weavers Court", "Salt Street", "Lantern Hill", "Goose Green",
           "Pinfold Lane", "Bridge End", "Rope Walk", "Kiln Street", "Dyers Lane"]
MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August",
          "September", "October", "November", "December"]
WEEKDAYS = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"]


def fmt_date(d, weekday=True):
    s = f"{d.day} {MONTHS[d.month - 1]} {d.year}"
    return f"{WEEKDAYS[d.weekday()]} {s}" if weekday else s


class Sent:
    """One sentence with hand-written alternatives; idx is the one used."""
    def __init__(self, alts, idx):
        self.alts = list(alts)
        self.idx = idx

    @property
    def text(self):
        return self.alts[self.idx]

    def copy(self):
        return Sent(self.alts, self.idx)


class G:
    """Generation context: f = facts rng, c = choice source (sentence variants, structure)."""
    def __init__(self, frng, choice):
        self.f, self.c = frng, choice
        self._used = set()

    def s(self, *alts):
        return Sent(alts, self.c.randrange(len(alts)))

    def ch(self, seq):
        return seq[self.c.randrange(len(seq))]

    def coin(self, num=1, den=2):
        return self.c.randrange(den) < num

    def pick(self, seq):
        return seq[self.f.randrange(len(seq))]

    def uniq(self, seq):
        for _ in range(50):
            v = self.pick(seq)
            if v not in self._used:
                self._used.add(v)
                return v
        return self.pick(seq)

    def person(self):
        return f"{self.uniq(FIRST)} {self.uniq(SUR)}"

    def place(self):
        return self.uniq(PLACES)

    def street(self):
        return self.uniq(STREETS)

    def num(self, a, b):
        return self.f.randint(a, b)

    def date(self, start=(2026, 1, 5), span=330):
        d0 = datetime.date(*start)
        return d0 + datetime.timedelta(days=self.f.randrange(span))

    def wdate(self, start=(2026, 1, 5), span=330):
        """A working day (Saturday and Sunday move to the next Monday)."""
        d = self.date(start, span)
        return d + datetime.timedelta(days=(7 - d.weekday()) % 7 if d.weekday() >= 5 else 0)

    def sample(self, seq, k):
        return self.f.sample(list(seq), k)


def P(*sents):
    return {"t": "p", "sents": [s for s in sents if s is not None]}


def H2(text):
    return {"t": "h2", "text": text}


def UL(items):
    return {"t": "ul", "items": list(items)}


def TABLE(rows):
    return {"t": "table", "rows": [list(r) for r in rows]}
