"""Office documents and e-books: DOCX, PPTX, XLSX (ECMA-376), ODT (OpenDocument), EPUB.

All five are ZIP archives of XML parts. They are read here with the standard library's
``zipfile`` behind :mod:`gate.extract.zipsafe` (entry count, inflated size and ratio bounded
before anything is read) and lxml with entity resolution, DTD loading and network access
off. The usual libraries (python-docx, python-pptx, openpyxl, odfpy, ebooklib) were not used:
each opens the archive itself with no bound on what it inflates, and their object models
drop exactly what this extractor must see: hidden and deleted runs, comments, the hidden
state of slides, sheets, rows and columns, alternative text. Elements are matched by local
name, so ECMA-376 Transitional and Strict namespaces both work.

The indexed text is what a reader of the document sees. Everything else found is returned
as hidden pieces (:mod:`gate.extract.hidden`) for the injection screen; white and tiny text
is both (a dark slide background or a shaded cell can show white text), the rest is only
screened:

* DOCX: runs hidden with ``w:vanish`` (directly or through a style), white runs
  (``w:color FFFFFF`` without a shaded background), runs under 2.5 pt (``w:sz`` < 5
  half-points), tracked deletions (``w:delText``), comments, field codes
  (``w:instrText``), image alt text (``wp:docPr``);
* PPTX: hidden slides (``show="0"``), hidden shapes, white or tiny runs, speaker notes,
  comments, alt text;
* XLSX: hidden and very hidden sheets, hidden rows and columns, cell comments, cells in a
  white font on no fill or under 2.5 pt, and cells whose number format ``;;;`` shows
  nothing;
* ODT: ``text:hidden-text``, hidden paragraphs and sections, styles with
  ``text:display="none"``, white or tiny text, annotations, tracked deletions,
  ``svg:title``/``svg:desc`` of frames;
* EPUB: per chapter, elements hidden by inline style or the ``hidden`` attribute,
  comments, ``alt`` and ``title`` attributes;
* all: descriptive metadata (subject, description, keywords, custom properties).

Dates: the core properties ``dcterms:created`` / ``dcterms:modified`` (OOXML, ISO/IEC
29500-2 section 11), ``meta:creation-date`` / ``dc:date`` (ODF), ``dc:date`` and
``dcterms:modified`` (EPUB package document) feed freshness.
"""

from __future__ import annotations

import io
import re
import zipfile
from typing import Any

import lxml.etree
import lxml.html

from gate.extract.hidden import Pieces, markup_pieces, visible_text
from gate.extract.model import DateClaim, Extracted, Extraction, Refused, failed
from gate.extract.text import clean_text
from gate.extract.zipsafe import SafeZip, resolve

TYPES = ("docx", "pptx", "xlsx", "odt", "epub")
MAX_TEXT = 5_000_000
MAX_PARTS = 2_000
MAX_CELLS = 2_000_000
TINY_HALF_POINTS = 5  # 2.5 pt, the PDF extractor's tiny-text size (gate.checks.injection)
TINY_HUNDREDTHS = 250  # DrawingML sizes are in hundredths of a point
_MIMETYPES = {"application/vnd.oasis.opendocument.text": "odt",
              "application/epub+zip": "epub"}
_WHITE = {"ffffff", "fff", "white"}
# White or tiny text stays in the indexed text as well: on a dark slide or shaded cell, or
# zoomed in, a reader may see it (pypdf likewise keeps such PDF text).
_SEEN_MAYBE = frozenset({"white-text", "tiny-text"})


def _local(tag: Any) -> str:
    return tag.rsplit("}", 1)[-1] if isinstance(tag, str) else ""


def _attr(node: Any, name: str) -> str | None:
    """An attribute by local name, whatever its namespace."""
    for key, value in node.attrib.items():
        if key == name or key.endswith("}" + name):
            return value
    return None


def kind_of(data: bytes) -> str | None:
    """docx, pptx, xlsx, odt or epub for a ZIP that is one, else None (cheap: names only)."""
    if data[30:38] == b"mimetype":
        for mime, kind in _MIMETYPES.items():
            if data[38:38 + len(mime)] == mime.encode("ascii"):
                return kind
    try:
        names = set(zipfile.ZipFile(io.BytesIO(data)).namelist())
    except Exception:  # noqa: BLE001 - any damage: fall back to the local headers' names
        # a truncated archive has no central directory; its local file headers still name
        # the parts, so it is reported as the damaged office document it is
        names = _local_names(data[:1 << 20])
    if "[Content_Types].xml" in names:
        for kind, marker in (("docx", "word/document.xml"), ("pptx", "ppt/presentation.xml"),
                             ("xlsx", "xl/workbook.xml")):
            if marker in names:
                return kind
    if "mimetype" in names and "META-INF/container.xml" in names:
        return "epub"
    return None


def _local_names(data: bytes) -> set[str]:
    """Entry names from ZIP local file headers (APPNOTE 4.3.7: the name at offset 30)."""
    names, at = set(), data.find(b"PK\x03\x04")
    while 0 <= at and len(names) < 1000 and at + 30 <= len(data):
        length = int.from_bytes(data[at + 26:at + 28], "little")
        names.add(data[at + 30:at + 30 + length].decode("latin-1"))
        at = data.find(b"PK\x03\x04", at + 30)
    return names


def ole_encrypted(data: bytes) -> bool:
    """An OLE2 file holding an ``EncryptedPackage`` stream: a password-protected OOXML file."""
    return "EncryptedPackage".encode("utf-16-le") in data[:1 << 20] or \
        "EncryptedPackage".encode("utf-16-le") in data[-(1 << 20):]


_PARSER = lxml.etree.XMLParser(resolve_entities=False, no_network=True, load_dtd=False,
                               huge_tree=False, remove_comments=False, remove_pis=True)


def _xml(archive: SafeZip, name: str) -> Any:
    data = archive.read(name)
    try:
        return lxml.etree.fromstring(data, _PARSER)
    except lxml.etree.XMLSyntaxError as err:
        message = str(err)
        if "depth" in message.lower():
            raise Refused("too-deep", f"the part {name!r} is nested too deeply to be read "
                                       f"({message[:200]})") from None
        raise Refused("broken", f"the part {name!r} is not well-formed XML "
                                 f"({message[:200]})") from None


def _maybe(archive: SafeZip, name: str | None) -> Any:
    return _xml(archive, name) if name and archive.has(name) else None


def _rels(archive: SafeZip, part: str) -> list[tuple[str, str, str]]:
    """(id, type, archive name) of a part's internal relationships (OPC, ECMA-376 Part 2)."""
    folder, _, base = part.rpartition("/")
    root = _maybe(archive, f"{folder}/_rels/{base}.rels" if folder else f"_rels/{base}.rels")
    if root is None:
        return []
    out = []
    for rel in root:
        if _local(rel.tag) != "Relationship" or rel.get("TargetMode") == "External":
            continue
        target = resolve(part, rel.get("Target") or "")
        if target is not None:
            out.append((rel.get("Id") or "", rel.get("Type") or "", target))
    return out


def _of_type(rels: list[tuple[str, str, str]], suffix: str) -> list[str]:
    return [target for _, kind, target in rels if kind.lower().endswith(suffix)]


class _Out:
    """The visible text (bounded), the hidden pieces, dates and metadata of one document."""

    def __init__(self, kind: str):
        self.kind = kind
        self.parts: list[str] = []
        self.size = 0
        self.pieces = Pieces()
        self.dates: list[DateClaim] = []
        self.meta: dict[str, str] = {}
        self.title: str | None = None
        self.pages: int | None = None

    def text(self, value: str) -> None:
        if value and self.size < MAX_TEXT:
            self.parts.append(value)
            self.size += len(value)

    def hide(self, text: str | None, where: str, technique: str) -> None:
        self.pieces.add(text, f"{where} of the {self.kind.upper()}", technique)


def _all_text(node: Any, names: tuple[str, ...] = ("t",)) -> str:
    parts = []
    for el in node.iter():
        tag = _local(el.tag)
        if tag in names and el.text:
            parts.append(el.text)
        elif tag == "p" and parts and not parts[-1].endswith("\n"):
            parts.append("\n")
    return "".join(parts).strip()


# -- core properties (OOXML) ----------------------------------------------------------------

def _core(archive: SafeZip, out: _Out) -> None:
    rels = _rels(archive, "")  # package relationships: _rels/.rels
    core = next(iter(_of_type(rels, "/core-properties")), "docProps/core.xml")
    root = _maybe(archive, core)
    if root is not None:
        for el in root:
            tag, value = _local(el.tag), (el.text or "").strip()
            if not value:
                continue
            if tag == "created":
                out.dates.append(DateClaim("published", f"{out.kind.upper()} dcterms:created",
                                           value[:200]))
            elif tag == "modified":
                out.dates.append(DateClaim("modified", f"{out.kind.upper()} dcterms:modified",
                                           value[:200]))
            elif tag in ("title", "creator", "lastModifiedBy"):
                out.meta[tag] = value[:1000]
                if tag == "title":
                    out.title = value[:1000]
            if tag in ("title", "subject", "description", "keywords", "category"):
                out.hide(value, f"the {tag} property", "metadata")
    custom = _maybe(archive, "docProps/custom.xml")
    if custom is not None:
        for prop in custom:
            out.hide(" ".join(prop.itertext()), f"custom property {prop.get('name', '')!r}",
                     "metadata")


# -- DOCX -----------------------------------------------------------------------------------

def _on(node: Any) -> bool:
    value = (_attr(node, "val") or "true").lower()
    return value not in ("0", "false", "off")


def _props(rpr: Any) -> dict[str, Any]:
    """Run properties that can hide text: vanish, colour, size (None: not set here)."""
    found: dict[str, Any] = {}
    if rpr is None:
        return found
    for el in rpr:
        tag = _local(el.tag)
        if tag in ("vanish", "specVanish", "webHidden"):
            found["hidden"] = _on(el)
        elif tag == "color":
            found["color"] = (_attr(el, "val") or "").lower()
        elif tag == "sz":
            try:
                found["size"] = int(_attr(el, "val") or "")
            except ValueError:
                pass
        elif tag in ("shd", "highlight"):  # a filled background: white text may show
            fill = (_attr(el, "fill") or _attr(el, "val") or "").lower()
            found["background"] = fill not in ("", "auto", "none", "ffffff", "white")
    return found


def _styles(archive: SafeZip) -> tuple[dict[str, dict[str, Any]], dict[str, Any]]:
    root = _maybe(archive, "word/styles.xml")
    if root is None:
        return {}, {}
    own: dict[str, tuple[str | None, dict[str, Any]]] = {}
    defaults: dict[str, Any] = {}
    for el in root:
        tag = _local(el.tag)
        if tag == "docDefaults":
            rpr = next((n for n in el.iter() if _local(n.tag) == "rPr"), None)
            defaults = _props(rpr)
        elif tag == "style":
            style_id = _attr(el, "styleId") or ""
            based = next((_attr(n, "val") for n in el if _local(n.tag) == "basedOn"), None)
            rpr = next((n for n in el if _local(n.tag) == "rPr"), None)
            own[style_id] = (based, _props(rpr))
    resolved: dict[str, dict[str, Any]] = {}
    for style_id in own:
        chain, seen, current = [], set(), style_id
        while current in own and current not in seen and len(chain) < 20:
            seen.add(current)
            chain.append(own[current][1])
            current = own[current][0]
        merged: dict[str, Any] = {}
        for props in reversed(chain):
            merged.update(props)
        resolved[style_id] = merged
    return resolved, defaults


def _technique(props: dict[str, Any]) -> str | None:
    if props.get("hidden"):
        return "hidden-run"
    if props.get("color") in _WHITE and not props.get("background"):
        return "white-text"
    size = props.get("size")
    if size is not None and size < TINY_HALF_POINTS:
        return "tiny-text"
    return None


class _Word:
    """One walk over a WordprocessingML part."""

    def __init__(self, out: _Out, styles: dict[str, dict[str, Any]], defaults: dict[str, Any],
                 part: str, visible: bool = True):
        self.out, self.styles, self.defaults = out, styles, defaults
        self.part = part
        self.visible = visible  # False for comments: all their text is one hidden piece
        self.lines: list[str] = []
        self.line: list[str] = []
        self.hidden: dict[str, list[str]] = {}
        self.para_style: dict[str, Any] = {}
        self.paragraphs = 0

    def walk(self, node: Any) -> None:
        for child in node:
            tag = _local(child.tag)
            if tag == "p":
                self._paragraph(child)
            elif tag in ("del", "moveFrom"):
                text = "".join(t.text or "" for t in child.iter()
                               if _local(t.tag) in ("delText", "t"))
                self.out.hide(text, f"a tracked deletion in {self.part}", "tracked-deletion")
            elif tag == "r":
                self._run(child)
            elif tag == "docPr" or tag == "cNvPr":
                self._alt(child)
                self.walk(child)
            elif tag in ("rPr", "pPr", "sectPr", "tblPr", "trPr", "tcPr"):
                continue
            else:
                self.walk(child)

    def _alt(self, node: Any) -> None:
        for name in ("descr", "title"):
            value = node.get(name)
            if value:
                self.out.hide(value, f"the alt text of an image in {self.part}", "alt-text")

    def _paragraph(self, p: Any) -> None:
        self.paragraphs += 1
        saved = self.para_style
        ppr = next((n for n in p if _local(n.tag) == "pPr"), None)
        style = None
        if ppr is not None:
            style = next((_attr(n, "val") for n in ppr if _local(n.tag) == "pStyle"), None)
        self.para_style = dict(self.styles.get(style or "", {}))
        self.walk(p)
        self.para_style = saved
        self._flush()

    def _flush(self) -> None:
        line = "".join(self.line)
        self.line = []
        if self.visible:
            self.lines.append(line)
        elif line.strip():
            self.hidden.setdefault("comment", []).append(line)
        for technique, texts in self.hidden.items():
            if technique == "comment":
                continue
            self.out.hide("".join(texts), f"{self.part}, paragraph {self.paragraphs}",
                          technique)
        self.hidden = {k: v for k, v in self.hidden.items() if k == "comment"}

    def _run(self, run: Any) -> None:
        rpr = next((n for n in run if _local(n.tag) == "rPr"), None)
        props = dict(self.defaults)
        props.update(self.para_style)
        if rpr is not None:
            style = next((_attr(n, "val") for n in rpr if _local(n.tag) == "rStyle"), None)
            props.update(self.styles.get(style or "", {}))
        props.update(_props(rpr))
        technique = _technique(props)
        for child in run:
            tag = _local(child.tag)
            if tag == "t":
                text = child.text or ""
            elif tag == "tab":
                text = "\t"
            elif tag in ("br", "cr"):
                text = "\n"
            elif tag == "noBreakHyphen":
                text = "-"
            elif tag == "delText":
                self.out.hide(child.text, f"a tracked deletion in {self.part}",
                              "tracked-deletion")
                continue
            elif tag == "instrText":
                self.out.hide(child.text, f"a field code in {self.part}", "field-code")
                continue
            elif tag == "rPr":
                continue
            else:
                self.walk(child)  # drawings: alt text, text boxes
                continue
            if technique is None or not self.visible:
                self.line.append(text)
                continue
            self.hidden.setdefault(technique, []).append(text)
            if technique in _SEEN_MAYBE:
                self.line.append(text)

    def text(self) -> str:
        return "\n".join(self.lines)


def _docx(archive: SafeZip, out: _Out) -> None:
    main = next(iter(_of_type(_rels(archive, ""), "/officedocument")), "word/document.xml")
    root = _maybe(archive, main)
    if root is None:
        raise Refused("broken", f"the DOCX has no main document part ({main!r})")
    styles, defaults = _styles(archive)
    rels = _rels(archive, main)
    order = [("header", "a header"), ("footnotes", "the footnotes"),
             ("endnotes", "the endnotes"), ("footer", "a footer")]
    body = _Word(out, styles, defaults, "the body")
    body.walk(root)
    out.text(body.text())
    for suffix, words in order:
        for target in _of_type(rels, "/" + suffix)[:MAX_PARTS]:
            walker = _Word(out, styles, defaults, words)
            walker.walk(_maybe(archive, target) if archive.has(target) else [])
            out.text(walker.text())
    for target in _of_type(rels, "/comments")[:MAX_PARTS]:
        comments = _maybe(archive, target)
        if comments is None:
            continue
        for number, comment in enumerate((c for c in comments if _local(c.tag) == "comment"),
                                         1):
            walker = _Word(out, styles, defaults, f"comment {number}", visible=False)
            walker.walk(comment)
            out.hide("\n".join(walker.hidden.get("comment", [])), f"comment {number}",
                     "comment")


# -- PPTX -----------------------------------------------------------------------------------

def _drawing_text(out: _Out, root: Any, where: str) -> str:
    """Visible text of a slide's shapes; hidden shapes, white and tiny runs set apart."""
    lines: list[str] = []
    hidden_shapes = set()
    for node in root.iter():
        tag = _local(node.tag)
        if tag == "cNvPr":
            for name in ("descr", "title"):
                if node.get(name):
                    out.hide(node.get(name), f"the alt text of a shape on {where}", "alt-text")
            if node.get("hidden") in ("1", "true"):
                shape = node.getparent().getparent() if node.getparent() is not None else None
                if shape is not None:
                    hidden_shapes.add(shape)
                    out.hide(_all_text(shape), f"a hidden shape on {where}", "hidden-shape")
    for p in root.iter():
        if _local(p.tag) != "p" or any(a in hidden_shapes for a in p.iterancestors()):
            continue
        line: list[str] = []
        hidden: dict[str, list[str]] = {}
        for run in p:
            tag = _local(run.tag)
            if tag == "br":
                line.append("\n")
                continue
            if tag not in ("r", "fld"):
                continue
            props: dict[str, Any] = {}
            for el in run:
                if _local(el.tag) == "rPr":
                    size = el.get("sz")
                    if size and size.isdigit() and int(size) < TINY_HUNDREDTHS:
                        props["size"] = 0
                    fill = next((c for c in el if _local(c.tag) == "solidFill"), None)
                    if fill is not None:
                        colour = next((c for c in fill if _local(c.tag) in ("srgbClr",
                                                                           "prstClr")), None)
                        if colour is not None:
                            props["color"] = (colour.get("val") or "").lower()
            technique = _technique(props)
            text = "".join(t.text or "" for t in run if _local(t.tag) == "t")
            if technique:
                hidden.setdefault(technique, []).append(text)
            if technique is None or technique in _SEEN_MAYBE:
                line.append(text)
        for technique, texts in hidden.items():
            out.hide("".join(texts), f"a run on {where}", technique)
        lines.append("".join(line))
    return "\n".join(lines)


def _pptx(archive: SafeZip, out: _Out) -> None:
    main = next(iter(_of_type(_rels(archive, ""), "/officedocument")), "ppt/presentation.xml")
    root = _maybe(archive, main)
    if root is None:
        raise Refused("broken", f"the PPTX has no presentation part ({main!r})")
    targets = {rid: target for rid, _, target in _rels(archive, main)}
    slides = []
    for node in root.iter():
        if _local(node.tag) == "sldId":
            target = targets.get(next((v for k, v in node.attrib.items()
                                       if k.endswith("}id")), ""))
            if target:
                slides.append(target)
    out.pages = len(slides)
    for number, slide in enumerate(slides[:MAX_PARTS], 1):
        where = f"slide {number}"
        tree = _maybe(archive, slide)
        if tree is None:
            continue
        text = _drawing_text(out, tree, where)
        if tree.get("show") in ("0", "false"):
            out.hide(text, f"hidden {where}", "hidden-slide")
        else:
            out.text(text + "\n\n")
        rels = _rels(archive, slide)
        for notes in _of_type(rels, "/notesslide"):
            tree_n = _maybe(archive, notes)
            if tree_n is not None:
                out.hide(_all_text(tree_n), f"the speaker notes of {where}", "speaker-notes")
        for comments in _of_type(rels, "comments"):
            tree_c = _maybe(archive, comments)
            if tree_c is not None:
                out.hide(_all_text(tree_c, ("text", "t")), f"a comment on {where}", "comment")


# -- XLSX -----------------------------------------------------------------------------------

_CELL = re.compile(r"([A-Z]{1,3})(\d+)$")


def _column(ref: str | None) -> int | None:
    m = _CELL.match(ref or "")
    if not m:
        return None
    value = 0
    for ch in m.group(1):
        value = value * 26 + ord(ch) - 64
    return value


def _shared(archive: SafeZip, rels: list[tuple[str, str, str]]) -> list[str]:
    name = next(iter(_of_type(rels, "/sharedstrings")), None)
    root = _maybe(archive, name)
    if root is None:
        return []
    return ["".join(t.text or "" for t in si.iter() if _local(t.tag) == "t")
            for si in root if _local(si.tag) == "si"]


def _xlsx(archive: SafeZip, out: _Out) -> None:
    main = next(iter(_of_type(_rels(archive, ""), "/officedocument")), "xl/workbook.xml")
    root = _maybe(archive, main)
    if root is None:
        raise Refused("broken", f"the XLSX has no workbook part ({main!r})")
    rels = _rels(archive, main)
    targets = {rid: target for rid, _, target in rels}
    strings = _shared(archive, rels)
    styles = _cell_styles(_maybe(archive, next(iter(_of_type(rels, "/styles")), None)))
    sheets = [(s.get("name") or "", s.get("state") or "visible",
               targets.get(next((v for k, v in s.attrib.items() if k.endswith("}id")), "")))
              for s in root.iter() if _local(s.tag) == "sheet"]
    out.pages = len(sheets)
    cells = 0
    for name, state, target in sheets[:MAX_PARTS]:
        tree = _maybe(archive, target)
        if tree is None:
            continue
        hidden_cols: set[int] = set()
        for col in tree.iter():
            if _local(col.tag) == "col" and col.get("hidden") in ("1", "true"):
                try:
                    lo, hi = int(col.get("min") or 0), int(col.get("max") or 0)
                except ValueError:
                    continue
                hidden_cols.update(range(lo, min(hi, lo + 16384) + 1))
        visible_rows, hidden_rows, hidden_col_text = [], [], []
        styled: dict[str, list[str]] = {}
        for row in tree.iter():
            if _local(row.tag) != "row":
                continue
            values, in_hidden_cols = [], []
            for c in row:
                if _local(c.tag) != "c":
                    continue
                cells += 1
                if cells > MAX_CELLS:
                    break
                value = _cell(c, strings)
                if not value:
                    continue
                technique = styles.get(c.get("s") or "0")
                if technique is not None:
                    styled.setdefault(technique, []).append(value)
                    if technique not in _SEEN_MAYBE:  # ';;;' shows nothing at all
                        continue
                if _column(c.get("r")) in hidden_cols:
                    in_hidden_cols.append(value)
                else:
                    values.append(value)
            line = "\t".join(values)
            if row.get("hidden") in ("1", "true"):
                hidden_rows.append("\t".join(values + in_hidden_cols))
            else:
                visible_rows.append(line)
                hidden_col_text.extend(in_hidden_cols)
        where = f"sheet {name!r}"
        sheet_text = "\n".join(r for r in visible_rows if r)
        if state in ("hidden", "veryHidden"):
            out.hide(sheet_text, f"{state} {where}", "hidden-sheet")
        else:
            out.text(f"{name}\n{sheet_text}\n\n")
        out.hide("\n".join(hidden_rows), f"hidden rows of {where}", "hidden-row")
        out.hide("\n".join(hidden_col_text), f"hidden columns of {where}", "hidden-column")
        for technique, texts in styled.items():
            out.hide("\n".join(texts), f"cells of {where} styled to hide", technique)
        for comments in _of_type(_rels(archive, target or ""), "comments"):
            tree_c = _maybe(archive, comments)
            if tree_c is not None:
                out.hide(_all_text(tree_c, ("t", "text")), f"a cell comment on {where}",
                         "comment")


def _cell_styles(root: Any) -> dict[str, str]:
    """Cell style index (the ``s`` attribute) -> technique, for styles that hide a value:
    a white font on no fill (white-text), a font under 2.5 pt (tiny-text), or the number
    format ``;;;`` that displays nothing (hidden-format; ECMA-376 Part 1, 18.8.31)."""
    if root is None:
        return {}
    part = {_local(el.tag): el for el in root}
    fonts, fills, formats = [], [], {}
    for font in part.get("fonts", []):
        white = any(_local(c.tag) == "color" and (c.get("rgb") or "").upper().endswith("FFFFFF")
                    for c in font)
        size = next((c.get("val") for c in font if _local(c.tag) == "sz"), None)
        try:
            tiny = size is not None and float(size) < TINY_HALF_POINTS / 2
        except ValueError:
            tiny = False
        fonts.append("white-text" if white else "tiny-text" if tiny else None)
    for fill in part.get("fills", []):
        pattern = next((c for c in fill if _local(c.tag) == "patternFill"), None)
        fills.append(pattern is not None and pattern.get("patternType") not in (None, "none"))
    for fmt in part.get("numFmts", []):
        code = (fmt.get("formatCode") or "").replace(" ", "")
        if code and code.strip(";") == "":
            formats[fmt.get("numFmtId") or ""] = "hidden-format"
    out: dict[str, str] = {}
    for index, xf in enumerate(x for x in part.get("cellXfs", []) if _local(x.tag) == "xf"):
        technique = formats.get(xf.get("numFmtId") or "")
        if technique is None:
            try:
                font, fill = int(xf.get("fontId") or 0), int(xf.get("fillId") or 0)
            except ValueError:
                continue
            technique = fonts[font] if font < len(fonts) else None
            if technique == "white-text" and fill < len(fills) and fills[fill]:
                technique = None  # white on a filled cell can be read
        if technique is not None:
            out[str(index)] = technique
    return out


def _cell(c: Any, strings: list[str]) -> str:
    kind = c.get("t")
    if kind == "inlineStr":
        return "".join(t.text or "" for t in c.iter() if _local(t.tag) == "t")
    value = next((v.text for v in c if _local(v.tag) == "v"), None) or ""
    if kind == "s":
        try:
            return strings[int(value)]
        except (ValueError, IndexError):
            return ""
    return value


# -- ODT ------------------------------------------------------------------------------------

def _odf_styles(*roots: Any) -> dict[str, str]:
    """ODF style name -> technique, for styles that hide text."""
    hiding: dict[str, str] = {}
    for root in roots:
        if root is None:
            continue
        for style in root.iter():
            if _local(style.tag) != "style":
                continue
            name = _attr(style, "name") or ""
            for props in style:
                if _local(props.tag) != "text-properties":
                    continue
                if (_attr(props, "display") or "") == "none":
                    hiding[name] = "hidden-run"
                elif (_attr(props, "color") or "").lower().lstrip("#") in _WHITE:
                    hiding[name] = "white-text"
                else:
                    size = _attr(props, "font-size") or ""
                    m = re.match(r"([\d.]+)pt$", size)
                    if m and float(m.group(1)) < TINY_HALF_POINTS / 2:
                        hiding[name] = "tiny-text"
    return hiding


class _Odf:
    def __init__(self, out: _Out, hiding: dict[str, str]):
        self.out, self.hiding = out, hiding
        self.lines: list[str] = []
        self.buffer: list[str] = []
        self.hidden: dict[str, list[str]] = {}
        self.paragraphs = 0

    def walk(self, node: Any, technique: str | None = None) -> None:
        if node.text:
            self._emit(node.text, technique)
        for child in node:
            tag = _local(child.tag)
            own = self.hiding.get(_attr(child, "style-name") or "") or technique
            if tag == "annotation":
                self.out.hide(_all_text(child, ("p", "span", "h")) or
                              " ".join(t for t in child.itertext()),
                              "an annotation", "comment")
            elif tag == "tracked-changes":
                for deletion in child.iter():
                    if _local(deletion.tag) == "deletion":
                        self.out.hide(" ".join(deletion.itertext()), "a tracked deletion",
                                      "tracked-deletion")
            elif tag in ("hidden-text", "hidden-paragraph"):
                self.out.hide(_attr(child, "string-value"), "hidden text", "hidden-run")
                if tag == "hidden-paragraph" and (_attr(child, "is-hidden") or "true") != \
                        "false":
                    self.hidden.setdefault("hidden-paragraph", [])
            elif tag == "section" and ((_attr(child, "display") or "") in ("none", "false")):
                self.out.hide(" ".join(child.itertext()), "a hidden section", "hidden-section")
            elif tag in ("title", "desc") and child.getparent() is not None and \
                    _local(child.getparent().tag) == "frame":
                self.out.hide(child.text, "the alt text of a frame", "alt-text")
            elif tag in ("p", "h"):
                self.paragraphs += 1
                self.walk(child, own)
                self._flush()
            elif tag == "s":
                count = _attr(child, "c") or "1"
                self._emit(" " * min(int(count) if count.isdigit() else 1, 1000), technique)
            elif tag == "tab":
                self._emit("\t", technique)
            elif tag == "line-break":
                self._emit("\n", technique)
            elif tag in ("bookmark", "reference-mark", "creator", "date"):
                pass
            else:
                self.walk(child, own)
            if child.tail:
                self._emit(child.tail, technique)

    def _emit(self, text: str, technique: str | None) -> None:
        if technique:
            self.hidden.setdefault(technique, []).append(text)
        if technique is None or technique in _SEEN_MAYBE:
            self.buffer.append(text)

    def _flush(self) -> None:
        line = "".join(self.buffer)
        self.buffer = []
        if "hidden-paragraph" in self.hidden:
            self.out.hide(line, f"hidden paragraph {self.paragraphs}", "hidden-paragraph")
            line = ""
        for technique, texts in self.hidden.items():
            self.out.hide("".join(texts), f"paragraph {self.paragraphs}", technique)
        self.hidden = {}
        self.lines.append(line)


def _odt(archive: SafeZip, out: _Out) -> None:
    content = _maybe(archive, "content.xml")
    if content is None:
        raise Refused("broken", "the ODT has no content.xml")
    hiding = _odf_styles(content, _maybe(archive, "styles.xml"))
    body = next((n for n in content.iter() if _local(n.tag) == "text" and
                 n.getparent() is not None and _local(n.getparent().tag) == "body"), content)
    walker = _Odf(out, hiding)
    walker.walk(body)
    walker._flush()
    out.text("\n".join(walker.lines))
    meta = _maybe(archive, "meta.xml")
    if meta is None:
        return
    for el in meta.iter():
        tag, value = _local(el.tag), (el.text or "").strip()
        if not value:
            continue
        if tag == "creation-date":
            out.dates.append(DateClaim("published", "ODT meta:creation-date", value[:200]))
        elif tag == "date":
            out.dates.append(DateClaim("modified", "ODT dc:date", value[:200]))
        elif tag == "title":
            out.title = value[:1000]
        if tag in ("title", "subject", "description", "keyword"):
            out.hide(value, f"the {tag} property", "metadata")


# -- EPUB -----------------------------------------------------------------------------------

def _epub(archive: SafeZip, out: _Out) -> None:
    container = _maybe(archive, "META-INF/container.xml")
    rootfile = None
    if container is not None:
        rootfile = next((_attr(n, "full-path") for n in container.iter()
                         if _local(n.tag) == "rootfile"), None)
    opf_name = resolve("", rootfile or "")
    opf = _maybe(archive, opf_name)
    if opf is None or opf_name is None:
        raise Refused("broken", "the EPUB names no package document in "
                                 "META-INF/container.xml")
    encrypted = set()
    enc = _maybe(archive, "META-INF/encryption.xml")
    if enc is not None:
        for ref in enc.iter():
            if _local(ref.tag) == "CipherReference":
                uri = resolve("", ref.get("URI") or "")
                if uri:
                    encrypted.add(uri)
    items: dict[str, tuple[str, str]] = {}
    spine: list[str] = []
    for node in opf.iter():
        tag = _local(node.tag)
        if tag == "item":
            href = resolve(opf_name, node.get("href") or "")
            if href:
                items[node.get("id") or ""] = (href, node.get("media-type") or "")
        elif tag == "itemref":
            spine.append(node.get("idref") or "")
        elif tag == "title" and out.title is None and node.text:
            out.title = node.text.strip()[:1000]
        elif tag == "date" and node.text:
            out.dates.append(DateClaim("published", "EPUB dc:date", node.text.strip()[:200]))
        elif tag == "meta" and node.get("property") == "dcterms:modified" and node.text:
            out.dates.append(DateClaim("modified", "EPUB dcterms:modified",
                                       node.text.strip()[:200]))
        elif tag in ("description", "subject") and node.text:
            out.hide(node.text, f"the {tag} of the package", "metadata")
    chapters = [items[i][0] for i in spine if i in items]
    if any(ch in encrypted for ch in chapters):
        raise Refused("encrypted", "the EPUB's chapters are encrypted "
                                    "(META-INF/encryption.xml), so their text cannot be read")
    out.pages = len(chapters)
    for number, name in enumerate(chapters[:MAX_PARTS], 1):
        if not archive.has(name):
            continue
        data = archive.read(name)
        try:
            tree = lxml.etree.fromstring(data, _PARSER)
        except lxml.etree.XMLSyntaxError as err:
            if "depth" in str(err).lower():
                raise Refused("too-deep", f"chapter {name!r} is nested too deeply") from None
            try:
                tree = lxml.html.document_fromstring(data)
            except (lxml.etree.ParserError, ValueError):
                continue
        markup_pieces(tree, out.pieces, f"chapter {number} of the EPUB")
        out.text(visible_text(tree) + "\n\n")


_READERS = {"docx": _docx, "pptx": _pptx, "xlsx": _xlsx, "odt": _odt, "epub": _epub}


def extract_office(data: bytes, kind: str, max_pages: int) -> Extraction:
    """Extract one office document or e-book; ``kind`` is what sniffing found."""
    out = _Out(kind)
    try:
        archive = SafeZip(data)
        if kind in ("docx", "pptx", "xlsx"):
            _core(archive, out)
        _READERS[kind](archive, out)
    except Refused as err:
        return failed(kind, err.problem, err.detail, encrypted=err.problem == "encrypted")
    except RecursionError:
        return failed(kind, "too-deep", f"the {kind.upper()} is nested too deeply to be read")
    if out.pages is not None and kind == "pptx" and out.pages > max_pages:
        return failed(kind, "too-many-pages", f"the PPTX has {out.pages} slides "
                                              f"(limit {max_pages})", pages=out.pages)
    text = clean_text("".join(p if p.endswith("\n") else p + "\n" for p in out.parts))
    summary = Extracted(type=kind, text_chars=len(text), title=out.title, pages=out.pages,
                        dates=tuple(out.dates), metadata=out.meta)
    extraction = Extraction(summary=summary, text=text, raw=data)
    extraction.extras["hidden"] = out.pieces.items
    return extraction
