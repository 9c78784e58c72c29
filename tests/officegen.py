"""Builders of small office documents, e-books and mails for tests and the demo (invented data).

The files are the minimal valid packages the formats define: OOXML parts and relationships
as ECMA-376 Part 2 (OPC) lays them out, ODF with its uncompressed ``mimetype`` first
(OpenDocument 1.2 Part 3, section 3.3), EPUB with ``META-INF/container.xml`` and a package
document (EPUB 3.2 OCF). Written from the specifications' structure, from memory.
Every ZIP gets fixed timestamps so the bytes are reproducible.
"""

from __future__ import annotations

import io
import zipfile
from xml.sax.saxutils import escape

W = "http://schemas.openxmlformats.org/wordprocessingml/2006/main"
R = "http://schemas.openxmlformats.org/officeDocument/2006/relationships"
PKG = "http://schemas.openxmlformats.org/package/2006/relationships"
A = "http://schemas.openxmlformats.org/drawingml/2006/main"
P = "http://schemas.openxmlformats.org/presentationml/2006/main"
S = "http://schemas.openxmlformats.org/spreadsheetml/2006/main"
WP = "http://schemas.openxmlformats.org/drawingml/2006/wordprocessingDrawing"
REL = "http://schemas.openxmlformats.org/officeDocument/2006/relationships/"
STAMP = (2026, 11, 20, 9, 0, 0)


def zip_bytes(entries: list[tuple[str, bytes | str]], *, stored_first: bool = False) -> bytes:
    out = io.BytesIO()
    with zipfile.ZipFile(out, "w", zipfile.ZIP_DEFLATED) as zf:
        for n, (name, data) in enumerate(entries):
            info = zipfile.ZipInfo(name, STAMP)
            info.compress_type = zipfile.ZIP_STORED if (stored_first and n == 0) \
                else zipfile.ZIP_DEFLATED
            zf.writestr(info, data.encode("utf-8") if isinstance(data, str) else data)
    return out.getvalue()


def _rels(items: list[tuple[str, str, str]]) -> str:
    body = "".join(f'<Relationship Id="{i}" Type="{t}" Target="{escape(g)}"/>'
                   for i, t, g in items)
    return f'<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="{PKG}">{body}' \
           "</Relationships>"


def core(title: str = "", created: str = "", modified: str = "", description: str = "") -> str:
    parts = []
    if title:
        parts.append(f"<dc:title>{escape(title)}</dc:title>")
    if description:
        parts.append(f"<dc:description>{escape(description)}</dc:description>")
    if created:
        parts.append(f'<dcterms:created xsi:type="dcterms:W3CDTF">{created}</dcterms:created>')
    if modified:
        parts.append(f'<dcterms:modified xsi:type="dcterms:W3CDTF">{modified}'
                     "</dcterms:modified>")
    return ('<?xml version="1.0" encoding="UTF-8"?><cp:coreProperties xmlns:cp="http://schemas.'
            'openxmlformats.org/package/2006/metadata/core-properties" xmlns:dc="http://purl.'
            'org/dc/elements/1.1/" xmlns:dcterms="http://purl.org/dc/terms/" xmlns:xsi="http:'
            f'//www.w3.org/2001/XMLSchema-instance">{"".join(parts)}</cp:coreProperties>')


def _types(main: str, content_type: str) -> str:
    return ('<?xml version="1.0" encoding="UTF-8"?><Types xmlns="http://schemas.openxmlformats'
            '.org/package/2006/content-types"><Default Extension="rels" ContentType="applicati'
            'on/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" Content'
            f'Type="application/xml"/><Override PartName="/{main}" ContentType="{content_type}"/>'
            "</Types>")


def _package(main: str, content_type: str, xml: str, rels: list[tuple[str, str, str]],
             core_xml: str) -> list[tuple[str, bytes | str]]:
    """The main part, its relationships, the core properties and the package's own parts."""
    folder, _, name = main.rpartition("/")
    return [(main, xml), (f"{folder}/_rels/{name}.rels", _rels(rels)),
            ("docProps/core.xml", core_xml or core()),
            ("[Content_Types].xml", _types(main, "application/vnd.openxmlformats-"
                                                 "officedocument." + content_type)),
            ("_rels/.rels", _rels([("rId1", REL + "officeDocument", main),
                                   ("rId2", "http://schemas.openxmlformats.org/package/2006/"
                                            "relationships/metadata/core-properties",
                                    "docProps/core.xml")]))]


# -- DOCX -------------------------------------------------------------------------------------

def run(text: str, **props: str | bool) -> str:
    """A w:r; props: vanish=True, color="FFFFFF", sz="2", style="Name", shade="1F3864"."""
    rpr = []
    if props.get("style"):
        rpr.append(f'<w:rStyle w:val="{props["style"]}"/>')
    if props.get("vanish"):
        rpr.append("<w:vanish/>")
    if props.get("color"):
        rpr.append(f'<w:color w:val="{props["color"]}"/>')
    if props.get("sz"):
        rpr.append(f'<w:sz w:val="{props["sz"]}"/>')
    if props.get("shade"):
        rpr.append(f'<w:shd w:val="clear" w:color="auto" w:fill="{props["shade"]}"/>')
    pr = f"<w:rPr>{''.join(rpr)}</w:rPr>" if rpr else ""
    return f'<w:r>{pr}<w:t xml:space="preserve">{escape(text)}</w:t></w:r>'


def para(*runs: str) -> str:
    return f"<w:p>{''.join(runs)}</w:p>"


def deletion(text: str) -> str:
    return (f'<w:del w:id="9" w:author="Editor" w:date="2026-11-01T00:00:00Z"><w:r><w:delText>'
            f"{escape(text)}</w:delText></w:r></w:del>")


def image_alt(text: str) -> str:
    return (f'<w:r><w:drawing><wp:inline><wp:docPr id="1" name="Picture 1" descr="'
            f'{escape(text, {chr(34): "&quot;"})}"/></wp:inline></w:drawing></w:r>')


def docx(*paragraphs: str, comments: list[str] = (), styles: str = "",
         core_xml: str = "", body_raw: str | None = None) -> bytes:
    body = body_raw if body_raw is not None else "".join(paragraphs)
    document = (f'<?xml version="1.0" encoding="UTF-8"?><w:document xmlns:w="{W}" '
                f'xmlns:r="{R}" xmlns:wp="{WP}"><w:body>{body}</w:body></w:document>')
    doc_rels: list[tuple[str, str, str]] = []
    extra: list[tuple[str, bytes | str]] = []
    if comments:
        items = "".join(f'<w:comment w:id="{n}" w:author="Reviewer"><w:p><w:r><w:t>'
                        f"{escape(c)}</w:t></w:r></w:p></w:comment>"
                        for n, c in enumerate(comments))
        extra.append(("word/comments.xml", f'<?xml version="1.0" encoding="UTF-8"?>'
                                           f'<w:comments xmlns:w="{W}">{items}</w:comments>'))
        doc_rels.append(("rId5", REL + "comments", "comments.xml"))
    if styles:
        extra.append(("word/styles.xml", f'<?xml version="1.0" encoding="UTF-8"?>'
                                         f'<w:styles xmlns:w="{W}">{styles}</w:styles>'))
        doc_rels.append(("rId6", REL + "styles", "styles.xml"))
    entries = _package("word/document.xml", "wordprocessingml.document.main+xml", document,
                       doc_rels, core_xml) + extra
    return zip_bytes(entries)


# -- PPTX -------------------------------------------------------------------------------------

def slide_xml(texts: list[str], *, show: bool = True, white: str = "", tiny: str = "",
              alt: str = "") -> str:
    runs = "".join(f"<a:p><a:r><a:t>{escape(t)}</a:t></a:r></a:p>" for t in texts)
    if white:
        runs += (f'<a:p><a:r><a:rPr><a:solidFill><a:srgbClr val="FFFFFF"/></a:solidFill>'
                 f"</a:rPr><a:t>{escape(white)}</a:t></a:r></a:p>")
    if tiny:
        runs += f'<a:p><a:r><a:rPr sz="100"/><a:t>{escape(tiny)}</a:t></a:r></a:p>'
    descr = f' descr="{escape(alt)}"' if alt else ""
    return (f'<?xml version="1.0" encoding="UTF-8"?><p:sld xmlns:p="{P}" xmlns:a="{A}" '
            f'xmlns:r="{R}"{"" if show else " show=" + chr(34) + "0" + chr(34)}><p:cSld>'
            f'<p:spTree><p:sp><p:nvSpPr><p:cNvPr id="2" name="Text"{descr}/></p:nvSpPr>'
            f"<p:txBody>{runs}</p:txBody></p:sp></p:spTree></p:cSld></p:sld>")


def pptx(slides: list[str], notes: dict[int, str] | None = None,
         core_xml: str = "") -> bytes:
    notes = notes or {}
    ids = "".join(f'<p:sldId id="{256 + n}" r:id="rId{n + 10}"/>' for n in range(len(slides)))
    pres = (f'<?xml version="1.0" encoding="UTF-8"?><p:presentation xmlns:p="{P}" '
            f'xmlns:r="{R}"><p:sldIdLst>{ids}</p:sldIdLst></p:presentation>')
    entries = _package("ppt/presentation.xml", "presentationml.presentation.main+xml", pres,
                       [(f"rId{n + 10}", REL + "slide", f"slides/slide{n + 1}.xml")
                        for n in range(len(slides))], core_xml)
    for n, xml in enumerate(slides, 1):
        entries.append((f"ppt/slides/slide{n}.xml", xml))
        if n in notes:
            entries.append((f"ppt/notesSlides/notesSlide{n}.xml",
                            f'<?xml version="1.0" encoding="UTF-8"?><p:notes xmlns:p="{P}" '
                            f'xmlns:a="{A}"><p:cSld><p:spTree><p:sp><p:txBody><a:p><a:r><a:t>'
                            f"{escape(notes[n])}</a:t></a:r></a:p></p:txBody></p:sp></p:spTree>"
                            "</p:cSld></p:notes>"))
            entries.append((f"ppt/slides/_rels/slide{n}.xml.rels",
                            _rels([("rId1", REL + "notesSlide",
                                    f"../notesSlides/notesSlide{n}.xml")])))
    return zip_bytes(entries)


# -- XLSX -------------------------------------------------------------------------------------

def sheet_xml(rows: list[list[str]], *, hidden_rows: tuple[int, ...] = (),
              hidden_cols: tuple[int, ...] = (),
              styled: dict[tuple[int, int], int] | None = None) -> str:
    """styled: (row, column) from 1 -> cell style index (the ``s`` attribute)."""
    styled = styled or {}
    cols = "".join(f'<col min="{c}" max="{c}" hidden="1"/>' for c in hidden_cols)
    body = []
    for r, row in enumerate(rows, 1):
        cells = "".join(f'<c r="{chr(64 + c)}{r}"'
                        + (f' s="{styled[(r, c)]}"' if (r, c) in styled else "")
                        + f' t="inlineStr"><is><t>{escape(v)}</t></is></c>'
                        for c, v in enumerate(row, 1))
        flag = ' hidden="1"' if r in hidden_rows else ""
        body.append(f'<row r="{r}"{flag}>{cells}</row>')
    return (f'<?xml version="1.0" encoding="UTF-8"?><worksheet xmlns="{S}">'
            f'{"<cols>" + cols + "</cols>" if cols else ""}<sheetData>{"".join(body)}'
            "</sheetData></worksheet>")


# A stylesheet with cell styles 0 plain, 1 white font, 2 number format ";;;", 3 white font
# on a solid fill (SpreadsheetML, ECMA-376 Part 1 section 18.8; from memory).
STYLES = (f'<?xml version="1.0" encoding="UTF-8"?><styleSheet xmlns="{S}"><numFmts count="1">'
          '<numFmt numFmtId="164" formatCode=";;;"/></numFmts><fonts count="2"><font><sz '
          'val="11"/></font><font><sz val="11"/><color rgb="FFFFFFFF"/></font></fonts><fills '
          'count="3"><fill><patternFill patternType="none"/></fill><fill><patternFill '
          'patternType="gray125"/></fill><fill><patternFill patternType="solid"><fgColor '
          'rgb="FF1F3864"/></patternFill></fill></fills><cellXfs count="4"><xf fontId="0" '
          'fillId="0" numFmtId="0"/><xf fontId="1" fillId="0" numFmtId="0"/><xf fontId="0" '
          'fillId="0" numFmtId="164"/><xf fontId="1" fillId="2" numFmtId="0"/></cellXfs>'
          "</styleSheet>")


def xlsx(sheets: list[tuple[str, str, str]], core_xml: str = "", styles: str = "") -> bytes:
    """sheets: (name, state, worksheet xml); state visible | hidden | veryHidden."""
    listed = "".join(f'<sheet name="{escape(name)}" sheetId="{n}" state="{state}" '
                     f'r:id="rId{n}"/>' for n, (name, state, _) in enumerate(sheets, 1))
    book = (f'<?xml version="1.0" encoding="UTF-8"?><workbook xmlns="{S}" xmlns:r="{R}">'
            f"<sheets>{listed}</sheets></workbook>")
    rels = [(f"rId{n}", REL + "worksheet", f"worksheets/sheet{n}.xml")
            for n in range(1, len(sheets) + 1)]
    if styles:
        rels.append(("rIdS", REL + "styles", "styles.xml"))
    entries = _package("xl/workbook.xml", "spreadsheetml.sheet.main+xml", book, rels, core_xml)
    if styles:
        entries.append(("xl/styles.xml", styles))
    for n, (_, _, xml) in enumerate(sheets, 1):
        entries.append((f"xl/worksheets/sheet{n}.xml", xml))
    return zip_bytes(entries)


# -- ODT --------------------------------------------------------------------------------------

ODF_NS = ('xmlns:office="urn:oasis:names:tc:opendocument:xmlns:office:1.0" '
          'xmlns:text="urn:oasis:names:tc:opendocument:xmlns:text:1.0" '
          'xmlns:style="urn:oasis:names:tc:opendocument:xmlns:style:1.0" '
          'xmlns:fo="urn:oasis:names:tc:opendocument:xmlns:xsl-fo-compatible:1.0" '
          'xmlns:dc="http://purl.org/dc/elements/1.1/" '
          'xmlns:meta="urn:oasis:names:tc:opendocument:xmlns:meta:1.0"')


def odt(body: str, *, styles: str = "", created: str = "", modified: str = "") -> bytes:
    content = (f'<?xml version="1.0" encoding="UTF-8"?><office:document-content {ODF_NS}>'
               f"<office:automatic-styles>{styles}</office:automatic-styles><office:body>"
               f"<office:text>{body}</office:text></office:body></office:document-content>")
    meta = (f'<?xml version="1.0" encoding="UTF-8"?><office:document-meta {ODF_NS}><office:meta>'
            + (f"<meta:creation-date>{created}</meta:creation-date>" if created else "")
            + (f"<dc:date>{modified}</dc:date>" if modified else "")
            + "</office:meta></office:document-meta>")
    return zip_bytes([("mimetype", "application/vnd.oasis.opendocument.text"),
                      ("content.xml", content), ("meta.xml", meta),
                      ("META-INF/manifest.xml", '<?xml version="1.0" encoding="UTF-8"?>'
                       '<manifest:manifest xmlns:manifest="urn:oasis:names:tc:opendocument:'
                       'xmlns:manifest:1.0"/>')], stored_first=True)


# -- EPUB -------------------------------------------------------------------------------------

def epub(chapters: list[str], *, title: str = "Untitled", date: str = "",
         encrypted: bool = False) -> bytes:
    items = "".join(f'<item id="c{n}" href="c{n}.xhtml" media-type="application/xhtml+xml"/>'
                    for n in range(len(chapters)))
    spine = "".join(f'<itemref idref="c{n}"/>' for n in range(len(chapters)))
    opf = ('<?xml version="1.0" encoding="UTF-8"?><package xmlns="http://www.idpf.org/2007/opf"'
           ' version="3.0"><metadata xmlns:dc="http://purl.org/dc/elements/1.1/">'
           f"<dc:title>{escape(title)}</dc:title>"
           + (f"<dc:date>{date}</dc:date>" if date else "")
           + f"</metadata><manifest>{items}</manifest><spine>{spine}</spine></package>")
    entries: list[tuple[str, bytes | str]] = [
        ("mimetype", "application/epub+zip"),
        ("META-INF/container.xml", '<?xml version="1.0"?><container version="1.0" xmlns="urn:'
         'oasis:names:tc:opendocument:xmlns:container"><rootfiles><rootfile full-path="OEBPS/'
         'content.opf" media-type="application/oebps-package+xml"/></rootfiles></container>'),
        ("OEBPS/content.opf", opf)]
    if encrypted:
        entries.append(("META-INF/encryption.xml", '<encryption xmlns="urn:oasis:names:tc:'
                        'opendocument:xmlns:container" xmlns:enc="http://www.w3.org/2001/04/'
                        'xmlenc#"><enc:EncryptedData><enc:CipherData><enc:CipherReference '
                        'URI="OEBPS/c0.xhtml"/></enc:CipherData></enc:EncryptedData>'
                        "</encryption>"))
    for n, body in enumerate(chapters):
        entries.append((f"OEBPS/c{n}.xhtml", '<?xml version="1.0" encoding="UTF-8"?><html xmlns'
                        f'="http://www.w3.org/1999/xhtml"><head><title>c{n}</title></head><body>'
                        f"{body}</body></html>"))
    return zip_bytes(entries, stored_first=True)


# -- mail -------------------------------------------------------------------------------------

def eml(subject: str, plain: str | None, html: str | None = None, *,
        date: str = "Mon, 23 Nov 2026 10:00:00 +0100", sender: str = "desk@example.org",
        attachment: tuple[str, str] | None = None) -> bytes:
    """A message with a plain part, an HTML alternative or both, optionally an attachment."""
    from email.message import EmailMessage
    from email.policy import SMTP

    msg = EmailMessage()
    msg["From"] = sender
    msg["To"] = "archive@example.org"
    msg["Subject"] = subject
    msg["Date"] = date
    msg["Message-ID"] = "<m1@example.org>"
    if plain is not None:
        msg.set_content(plain)
        if html is not None:
            msg.add_alternative(html, subtype="html")
    elif html is not None:
        msg.set_content(html, subtype="html")
    if attachment is not None:
        msg.add_attachment(attachment[1], filename=attachment[0])
    for n, part in enumerate(p for p in msg.walk() if p.is_multipart()):
        part.set_boundary(f"==gate-test-boundary-{n}==")  # fixed, so the bytes are stable
    return msg.as_bytes(policy=SMTP)
