"""The per-run HTML report (gate/htmlreport.py) and ``gate report html``.

Unit tests render invented reports (shaped by ``gate.report.build``, as the pipeline does)
and parse the page with the standard library's HTML parser: every count is shown, planted
markup in document-controlled fields comes out as text and never as elements or
attributes, and the page references nothing outside itself. The browser test opens pages
in headless Chromium (Debian package ``chromium``): it skips when Chromium is not
installed, unless GATE_REQUIRE_BROWSER=1, which makes a missing browser a failure (CI).
Set GATE_REPORT_SCREENSHOT=FILE to keep the screenshot it takes.
"""

from __future__ import annotations

import copy
import json
import os
import re
import shutil
import signal
import struct
import subprocess
import sys
from html.parser import HTMLParser
from pathlib import Path

import pytest

from gate.htmlreport import CSP, Histogram, log_edges, render, text
from gate import __version__
from gate.report import CAUTIONS, Tally

ROOT = Path(__file__).resolve().parent.parent
GATE = [sys.executable, "-m", "gate"]


# --- invented reports ----------------------------------------------------------------------

def finding(check: str, slug: str, message: str, **details) -> dict:
    return {"check": check, "code": f"{check}.{slug}", "message": message,
            "details": details}


def doc(path: str, decision: str = "accepted", *, reasons=(), warnings=(), size=500,
        language=("en", 1.0), checks=None, **extra) -> dict:
    entry = {"path": path, "id": f"id{abs(hash(path)) % 10**8:08d}", "decision": decision,
             "reasons": list(reasons), "warnings": list(warnings),
             "checks": checks or {"format": "pass", "source": "pass"}, "sha256": "ab" * 32,
             "size": size, "type": "text",
             "location": f"{'accepted' if decision == 'accepted' else 'quarantine'}/x",
             "change": "add" if decision == "accepted" else "none"}
    if language is not None:
        entry["language"] = {"code": language[0], "probability": language[1]}
    entry.update(extra)
    return entry


RUN = {"id": "run-0007", "as_of": "2026-12-01T00:00:00Z", "mode": "full",
       "inbox": "/srv/inbox", "policy": {"name": "northwind-test", "path": "p.yaml",
                                         "sha256": "c0ffee" + "0" * 58}}


def summary(documents: list[dict], removed: list[dict]) -> dict:
    """The summary as a run counts it (report.Tally, one document at a time)."""
    tally = Tally()
    for entry in documents:
        tally.add(entry)
    return tally.summary(removed)


def report_of(documents: list[dict], removed=(), unmatched=()) -> dict:
    """An invented report with the keys a run writes (gate.commit)."""
    report = {"gate": {"version": __version__}, "run": RUN,
              "summary": summary(documents, list(removed)), "documents": documents,
              "removed": list(removed), "manifest_unmatched": list(unmatched),
              "cautions": list(CAUTIONS)}
    return json.loads(json.dumps(report))


def plain_report() -> dict:
    docs = [
        doc("a/ok.txt", size=1200, language=("en", 0.99)),
        doc("a/short.txt", size=40, language=("en", 0.62),
            warnings=[finding("language", "undetermined", "too little text", chars=38)],
            checks={"format": "pass", "language": "warn"}),
        doc("b/stale.txt", "quarantined", size=300, language=("de", 0.97),
            reasons=[finding("freshness", "stale", "dated 2024-05-01"),
                     finding("source", "unlisted", "matches no allow rule")],
            checks={"format": "pass", "freshness": "fail", "source": "fail"}),
        doc("b/denied.html", "quarantined", size=2500, language=("en", 0.88),
            reasons=[finding("source", "denied", "denied by sources.deny[0]")],
            checks={"format": "pass", "source": "fail"}),
        doc("c/empty.txt", "quarantined", size=0, language=None,
            reasons=[finding("format", "empty-file", "the file is empty (0 bytes)")],
            checks={"format": "fail", "source": "pass", "language": "n/a"}),
    ]
    removed = [{"id": "old1", "path": "gone/old.txt", "change": "remove",
                "why": "no longer in the inbox"}]
    return report_of(docs, removed, ["ghost/listed-only.pdf"])


# the planted values of the brief, and more of the same kind
SCRIPT_PATH = "<script>document.title='pwned'</script>.html"
IMG_TITLE = '"><img src=x onerror=alert(1)>'
TABLE_BREAK = "</td></tr></table><script>"
JS_CODE = "source.javascript:alert(1)"
JS_URL = "javascript:alert(document.domain)"
SVG_CODE = 'x.<svg onload="alert(3)">'
SURROGATE_PATH = "odd/name-\udcff\udcfe.txt"   # an undecodable file name, as Python holds it
BIDI_PATH = "inv/report\u202etxt.exe"           # right-to-left override: reads as ...exe.txt


def hostile_report() -> dict:
    docs = [
        doc(SCRIPT_PATH, "quarantined", title=IMG_TITLE,
            reasons=[finding("format", "broken", TABLE_BREAK, detail=TABLE_BREAK)],
            source={"url": JS_URL, "trust": 0, "allowed_by": None}),
        doc("plain/two.txt", "quarantined", title="<b>bold</b>",
            reasons=[{"check": "source", "code": JS_CODE, "message": "see " + JS_URL,
                      "details": {"url": JS_URL, "nested": {"href": JS_URL}}},
                     {"check": "x", "code": SVG_CODE, "message": "m\x1b[2Jcleared",
                      "details": {}}]),
        doc(SURROGATE_PATH, "quarantined",
            reasons=[finding("format", "unsupported", "name \udcff is not UTF-8")]),
        doc(BIDI_PATH, warnings=[finding("quality", "low", IMG_TITLE)],
            injection_score=0.4),
    ]
    return report_of(docs, unmatched=[SCRIPT_PATH])


class Page(HTMLParser):
    """Every element, attribute and text node of a page."""

    def __init__(self, source: str):
        super().__init__(convert_charrefs=True)
        self.tags: list[tuple[str, dict[str, str | None]]] = []
        self.texts: list[str] = []
        self.style = ""
        self._in_style = False
        self.feed(source)
        self.close()

    def handle_starttag(self, tag, attrs):
        self.tags.append((tag, dict(attrs)))
        self._in_style = tag == "style"

    def handle_startendtag(self, tag, attrs):
        self.tags.append((tag, dict(attrs)))

    def handle_endtag(self, tag):
        self._in_style = False

    def handle_data(self, data):
        if self._in_style:
            self.style += data
        else:
            self.texts.append(data)

    @property
    def text(self) -> str:
        return "".join(self.texts)

    def names(self) -> set[str]:
        return {tag for tag, _ in self.tags}


ALLOWED_TAGS = {"html", "head", "meta", "title", "style", "body", "header", "nav", "main",
                "section", "footer", "div", "span", "p", "h1", "h2", "h3", "dl", "dt", "dd",
                "ul", "li", "table", "colgroup", "col", "thead", "tbody", "tr", "th", "td",
                "details", "summary", "a", "svg", "g", "title", "text", "rect", "line"}


def assert_inert(page_html: str) -> Page:
    """No script, no handler, no element or attribute outside our own small vocabulary, and
    nothing that points outside the page."""
    page = Page(page_html)
    assert page.names() <= ALLOWED_TAGS, page.names() - ALLOWED_TAGS
    assert "<script" not in page_html.lower()
    for tag, attrs in page.tags:
        for name, value in attrs.items():
            assert not name.startswith("on"), (tag, name)
            assert name not in ("src", "srcset", "action", "formaction", "xlink:href",
                                "background", "poster", "data"), (tag, name)
            if tag == "meta" and name == "content":
                continue
            assert not re.search(r"(?i)(https?|ftp|file|javascript|data|vbscript):",
                                 value or ""), (tag, name, value)
        if tag == "a":
            assert set(attrs) == {"href"} and attrs["href"].startswith("#"), attrs
    assert "url(" not in page.style and "@import" not in page.style
    page_html.encode("utf-8")  # no lone surrogate survived
    return page


def tiles(page_html: str) -> dict[str, int]:
    return {label: int(n) for n, label in re.findall(
        r'<span class="n">(\d+)</span><span class="k">([^<]*)</span>', page_html)}


def chart(page_html: str, name: str) -> str:
    start = page_html.index(f'data-chart="{name}"')
    return page_html[start:page_html.index("</svg>", start)]


def bars(chart_html: str) -> dict[str, int]:
    """label -> count, from the tooltips of a bar chart."""
    return {label: int(n) for label, n in re.findall(r"<g><title>(.*?): (\d+)</title>",
                                                     chart_html)}


# --- unit tests ----------------------------------------------------------------------------

def test_every_count_is_shown():
    report = plain_report()
    out = render(report)
    assert tiles(out) == {"documents": 5, "accepted": 2, "quarantined": 3,
                          "accepted with warnings": 1, "index change: add": 2,
                          "index change: remove": 1, "removed from the corpus": 1,
                          "manifest lines without a file": 1}
    assert bars(chart(out, "by-code")) == {"format.empty-file": 1, "freshness.stale": 1,
                                           "source.denied": 1, "source.unlisted": 1}
    assert bars(chart(out, "by-check")) == {"format": 1, "source": 2, "freshness": 1}
    assert bars(chart(out, "warnings-by-code")) == {"language.undetermined": 1}
    # check outcome table: format passes 4 and fails 1; source fails 2 of 4
    assert re.search(r'<td class="mono">format</td><td class="num ">4</td>'
                     r'<td class="num zero">0</td><td class="num hot">1</td>', out)
    assert re.search(r'<td class="mono">source</td><td class="num ">2</td>'
                     r'<td class="num zero">0</td><td class="num hot">2</td>', out)
    assert "Quarantined documents (3)" in out and "Accepted with warnings (1)" in out
    assert "Accepted documents (2)" in out and "Removed from the corpus (1)" in out
    for path in ("b/stale.txt", "b/denied.html", "c/empty.txt", "a/short.txt",
                 "gone/old.txt", "ghost/listed-only.pdf"):
        assert f">{path}<" in out, path
    for message in ("dated 2024-05-01", "matches no allow rule", "too little text"):
        assert message in out
    page = Page(out)
    for caution in report["cautions"]:
        assert caution in page.text
    for value in ("run-0007", "2026-12-01T00:00:00Z", "northwind-test", "c0ffee" + "0" * 58,
                  "/srv/inbox", "0.1.0"):
        assert value in page.text, value


def test_histograms_count_every_measured_document():
    out = render(plain_report())
    lang = chart(out, "language-probability")
    # 0.62 -> [0.6, 0.7); 0.88 -> [0.8, 0.9); 0.97, 0.99 -> [0.9, 1]; the empty file has none
    assert "0.6 to 0.7: 1 documents (1 accepted, 0 quarantined)" in lang
    assert "0.8 to 0.9: 1 documents (0 accepted, 1 quarantined)" in lang
    assert "0.9 to 1: 2 documents (1 accepted, 1 quarantined)" in lang
    assert "4 of 5 documents measured." in out
    size = chart(out, "document-size")
    totals = [int(n) for n in re.findall(r": (\d+) documents \(", size)]
    assert sum(totals) == 5
    assert "0 B to 20 B: 1 documents (0 accepted, 1 quarantined)" in size  # the empty file
    assert "20 B to 50 B: 1 documents (1 accepted, 0 quarantined)" in size
    # axes are labelled
    assert "probability of the detected language" in lang and ">documents</text>" in lang
    assert "size on disk" in size
    # no injection score and no text length in this report: said so, nothing drawn
    assert 'data-chart="injection-score"' not in out
    assert re.search(r'id="injection-score"><h3>Injection score</h3><p class="notmeasured">'
                     r'not measured', out)
    assert re.search(r'id="text-length"><h3>Extracted text length</h3><p class="notmeasured">'
                     r'not measured', out)


def test_injection_scores_and_text_lengths_are_drawn_when_present():
    docs = [doc(f"d{i}.txt", "quarantined" if s >= 0.5 else "accepted", injection_score=s,
                text_chars=c,
                reasons=[finding("injection", "planted", "x")] if s >= 0.5 else [])
            for i, (s, c) in enumerate([(0.0, 90), (0.05, 1500), (0.5, 1999), (0.95, 2000),
                                        (1.0, 48_000)])]
    docs.append(doc("nan.txt", injection_score=float("nan")))  # not a measurement
    out = render(report_of(docs))
    inj = chart(out, "injection-score")
    assert "0 to 0.1: 2 documents (2 accepted, 0 quarantined)" in inj
    assert "0.5 to 0.6: 1 documents (0 accepted, 1 quarantined)" in inj
    assert "0.9 to 1: 2 documents (0 accepted, 2 quarantined)" in inj
    assert "5 of 6 documents measured." in out
    length = chart(out, "text-length")
    assert "1k to 2k: 2 documents" in length and "2k to 5k: 1 documents" in length
    assert "20k to 50k: 1 documents" in length
    assert "injection score 0.95" in out  # shown beside the document too


def test_binning():
    hist = Histogram.of([(0.0, "accepted"), (0.1, "accepted"), (1.0, "quarantined"),
                         (-0.1, "accepted"), (1.5, "accepted")], [i / 10 for i in range(11)])
    assert hist.accepted == [1, 1, 0, 0, 0, 0, 0, 0, 0, 0]
    assert hist.quarantined == [0, 0, 0, 0, 0, 0, 0, 0, 0, 1]
    assert hist.left_out == 2
    assert log_edges([0, 39, 17920]) == [0, 20, 50, 100, 200, 500, 1000, 2000, 5000, 10000,
                                         20000]
    # seven decades: too many 1-2-5 bins, so decades
    assert log_edges([1, 20_000_000]) == [10.0 ** k for k in range(9)]
    assert log_edges([0, 0]) == [0.0, 1.0]


def test_planted_markup_is_text_not_markup():
    out = render(hostile_report())
    page = assert_inert(out)
    # the raw forms never reach the page ...
    for raw in (SCRIPT_PATH, IMG_TITLE, TABLE_BREAK, SVG_CODE, "<b>bold</b>", "<img",
                "<svg onload"):
        assert raw not in out, raw
    # ... their escaped forms do, in element text and SVG labels alike
    assert "&lt;script&gt;document.title=&#x27;pwned&#x27;&lt;/script&gt;.html" in out
    assert "&quot;&gt;&lt;img src=x onerror=alert(1)&gt;" in out
    assert "&lt;/td&gt;&lt;/tr&gt;&lt;/table&gt;&lt;script&gt;" in out
    assert "x.&lt;svg onload=&quot;alert(3)&quot;&gt;" in chart(out, "by-code")
    # and read back, the page says exactly what the document said
    for value in (SCRIPT_PATH, IMG_TITLE, TABLE_BREAK, JS_CODE, JS_URL, SVG_CODE):
        assert value in page.text, value
    # URLs are text only: no link anywhere but the in-page navigation
    assert [a["href"] for t, a in page.tags if t == "a"] == [
        "#counts", "#reasons", "#scores", "#checks", "#quarantined", "#warnings", "#accepted"]
    assert f'<span class="mono">{JS_URL}</span>' in out
    # undecodable names and control/bidi characters become visible escapes
    assert "odd/name-<U+DCFF><U+DCFE>.txt" in page.text
    assert "name <U+DCFF> is not UTF-8" in page.text
    assert "inv/report<U+202E>txt.exe" in page.text and "\u202e" not in out
    assert "m<U+001B>[2Jcleared" in page.text and "\x1b" not in out


def test_content_security_policy_and_no_outside_references():
    out = render(hostile_report())
    page = assert_inert(out)
    metas = [a for t, a in page.tags if t == "meta" and
             (a.get("http-equiv") or "").lower() == "content-security-policy"]
    assert [m["content"] for m in metas] == [CSP]
    policy = {d.strip().split()[0]: d.strip().split()[1:] for d in CSP.split(";")}
    assert policy["default-src"] == ["'none'"] and policy["style-src"] == ["'unsafe-inline'"]
    assert policy["img-src"] == ["data:"] and "script-src" not in policy
    # the policy comes before anything it governs
    assert out.index("Content-Security-Policy") < out.index("<style>") < out.index("<body>")
    assert not re.search(r"(?i)(src|href)\s*=\s*[\"']?\s*(https?:)?//", out)
    assert "http://" not in out and "https://" not in out  # no document here has one
    # a real report carries https source URLs: as text only
    real = render(report_of([doc("x.html", "quarantined", reasons=[finding("source", "denied",
                                                                           "denied")],
                                 source={"url": "https://docs.example.org/a"})]))
    assert_inert(real)
    assert ">https://docs.example.org/a<" in real


def test_text_escapes_for_attributes_and_content():
    assert text('a"b\'c<d>&e') == "a&quot;b&#x27;c&lt;d&gt;&amp;e"
    assert text("\udcff") == "&lt;U+DCFF&gt;"
    assert text(None) == "" and text(3) == "3"


def test_render_is_deterministic_and_tolerates_odd_reports():
    report = plain_report()
    assert render(report) == render(copy.deepcopy(report))
    for odd in ({}, {"documents": "junk", "summary": 3, "run": [], "cautions": None},
                {"documents": [None, 1, {"decision": "accepted", "size": "big",
                                         "language": {"probability": True}}]}):
        out = render(odd)
        assert_inert(out)
        assert "Content-Security-Policy" in out
    out = render({})
    assert "no document was quarantined" in out and "(no run id)" in out


def test_long_tables_are_cut_with_a_note():
    docs = [doc(f"q/{i:03}.txt", "quarantined", reasons=[finding("format", "broken", "x")])
            for i in range(7)]
    out = render(report_of(docs), max_rows=3)
    assert ">q/002.txt<" in out and ">q/003.txt<" not in out
    assert "4 more not shown here; report.json lists them all." in out
    assert tiles(out)["quarantined"] == 7


# --- the command ---------------------------------------------------------------------------

def gate(*args):
    return subprocess.run([*GATE, *map(str, args)], capture_output=True, text=True,
                          timeout=120)


@pytest.fixture(scope="module")
def demo_out(tmp_path_factory) -> Path:
    out = tmp_path_factory.mktemp("demo") / "out"
    result = gate("run", ROOT / "sample_docs" / "inbox", "--policy",
                  ROOT / "policies" / "demo.yaml", "--out", out, "--as-of",
                  "2026-12-01T00:00:00Z", "--workers", "2", "--quiet")
    assert result.returncode == 0, result.stderr
    return out


def test_report_html_of_a_real_run(demo_out, tmp_path):
    result = gate("report", "html", demo_out)
    target = demo_out / "report.html"
    assert result.returncode == 0, result.stderr
    assert result.stdout == f"wrote {target}\n"
    page_html = target.read_text(encoding="utf-8")
    assert not [p for p in os.listdir(demo_out) if ".tmp-" in p]  # written atomically
    report = json.loads((demo_out / "report.json").read_text(encoding="utf-8"))
    assert page_html == render(report)
    assert_inert(page_html)
    counts = tiles(page_html)
    assert counts["documents"] == len(report["documents"]) == report["summary"]["documents"]
    assert counts["quarantined"] == report["summary"]["quarantined"]
    assert bars(chart(page_html, "by-code")) == report["summary"]["quarantined_by_code"]
    for entry in report["documents"]:
        assert text(entry["path"]) in page_html
    elsewhere = tmp_path / "r.html"
    result = gate("report", "html", demo_out, "--output", elsewhere)
    assert result.returncode == 0 and elsewhere.read_text(encoding="utf-8") == page_html


def test_report_html_errors_are_one_paragraph(tmp_path, demo_out):
    missing = tmp_path / "nothing"
    result = gate("report", "html", missing)
    assert result.returncode == 2
    assert result.stderr == (f"error: there is no report {missing / 'report.json'}: DIR must "
                             "be the output folder of a completed run (gate run ... --out "
                             "DIR).\n")
    broken = tmp_path / "broken"
    broken.mkdir()
    (broken / "report.json").write_text('{"documents": [', encoding="utf-8")
    result = gate("report", "html", broken)
    assert result.returncode == 2
    assert result.stderr.startswith(f"error: the report {broken / 'report.json'} is not "
                                    "valid JSON (")
    (broken / "report.json").write_bytes(b'{"documents": ["\xff"]}')
    result = gate("report", "html", broken)
    assert result.returncode == 2 and "is not valid JSON" in result.stderr
    (broken / "report.json").write_text("[1, 2]", encoding="utf-8")
    result = gate("report", "html", broken)
    assert result.returncode == 2
    assert result.stderr == (f"error: {broken / 'report.json'} is not a gate report "
                             "(expected a JSON object with a \"documents\" list). DIR must "
                             "be the output folder of a completed run (gate run ... --out "
                             "DIR).\n")
    before = (demo_out / "report.json").read_bytes()
    result = gate("report", "html", demo_out, "--output", demo_out / "report.json")
    assert result.returncode == 2 and "would overwrite the report" in result.stderr
    assert (demo_out / "report.json").read_bytes() == before
    result = gate("report", "html", demo_out, "--output", tmp_path / "no" / "such" / "x.html")
    assert result.returncode == 2
    assert result.stderr.startswith(f"error: cannot write {tmp_path / 'no' / 'such'}")
    for stderr in (result.stderr,):
        assert stderr.count("\n") == 1 and "Traceback" not in stderr


# --- a real browser ------------------------------------------------------------------------

CHROMIUM_FLAGS = ("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic",
                  "--no-first-run", "--disable-background-networking",
                  "--disable-component-update", "--disable-sync")
BROWSER_TIMEOUT = 60


def chromium() -> str:
    """The browser binary; skips the test when there is none, fails it under
    GATE_REQUIRE_BROWSER=1."""
    binary = shutil.which("chromium") or (
        "/usr/bin/chromium" if os.access("/usr/bin/chromium", os.X_OK) else None)
    if binary is None:
        if os.environ.get("GATE_REQUIRE_BROWSER") == "1":
            pytest.fail("GATE_REQUIRE_BROWSER=1 but chromium is not installed "
                        "(apt-get install -y chromium)")
        pytest.skip("chromium is not installed (apt-get install -y chromium); set "
                    "GATE_REQUIRE_BROWSER=1 to make this a failure")
    return binary


def run_chromium(binary: str, profile: Path, *args: str) -> str:
    """Run headless Chromium in its own process group, bounded by BROWSER_TIMEOUT; the
    group is killed afterwards so no helper process outlives the test."""
    proc = subprocess.Popen([binary, *CHROMIUM_FLAGS, f"--user-data-dir={profile}", *args],
                            stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True,
                            start_new_session=True)
    try:
        out, err = proc.communicate(timeout=BROWSER_TIMEOUT)
    except subprocess.TimeoutExpired:
        os.killpg(proc.pid, signal.SIGKILL)
        proc.communicate()
        pytest.fail(f"chromium did not finish within {BROWSER_TIMEOUT} s: {args}")
    finally:
        try:
            os.killpg(proc.pid, signal.SIGKILL)
        except ProcessLookupError:
            pass
    assert proc.returncode == 0, err[-2000:]
    return out


MARK = "document.body.setAttribute('data-pwned','{}')"


def planted_report(demo_out: Path) -> dict:
    """The demo run's report with documents whose names, titles and messages would change
    the DOM if they ran."""
    report = json.loads((demo_out / "report.json").read_text(encoding="utf-8"))
    planted = [
        doc(f"<script>{MARK.format(1)}</script>.html", "quarantined",
            title=f'"><img src=x onerror="{MARK.format(2)}">',
            reasons=[finding("format", "broken",
                             f"</td></tr></table><script>{MARK.format(3)}</script>",
                             detail=f"<img src=x onerror={MARK.format(4)}>")],
            source={"url": f"javascript:{MARK.format(5)}", "trust": 0, "allowed_by": None}),
        doc("planted/svg.txt", "quarantined", reasons=[
            {"check": "format", "code": f'x.<svg onload="{MARK.format(6)}">',
             "message": f"<iframe srcdoc=\"<script>parent.{MARK.format(7)}</script>\">",
             "details": {}}]),
    ]
    report["documents"].extend(planted)
    report["summary"] = summary(report["documents"], report["removed"])
    return report


def test_browser_runs_nothing_from_the_report(demo_out, tmp_path):
    binary = chromium()
    # control: this browser invocation does run scripts, so their absence below means
    # something
    control = tmp_path / "control.html"
    control.write_text("<!DOCTYPE html><html><body><p>x</p><script>"
                       "document.body.setAttribute('data-control','ran')</script></body>"
                       "</html>", encoding="utf-8")
    dom = run_chromium(binary, tmp_path / "profile", "--dump-dom", control.as_uri())
    assert 'data-control="ran"' in dom

    page_html = render(planted_report(demo_out))
    page = tmp_path / "report.html"
    page.write_text(page_html, encoding="utf-8")
    dom = run_chromium(binary, tmp_path / "profile", "--dump-dom", page.as_uri())
    assert "</html>" in dom
    assert "data-pwned=" not in dom and 'data-pwned","' not in dom
    assert not re.search(r"<body[^>]*data-", dom)
    for tag in ("<script", "<img", "<iframe", "<svg onload"):
        assert tag not in dom, tag
    assert (f"&lt;script&gt;{MARK.format(1)}&lt;/script&gt;.html") in dom  # shown as text
    assert f"x.&lt;svg onload=\"{MARK.format(6)}\"&gt;" in dom
    assert dom.count("<svg") == page_html.count("<svg") >= 5  # the charts are real SVG
    assert dom.count("<rect") == page_html.count("<rect") > 0

    shot = tmp_path / "report.png"
    run_chromium(binary, tmp_path / "profile", f"--screenshot={shot}",
                 "--window-size=1280,2000", page.as_uri())
    data = shot.read_bytes()
    assert data[:8] == b"\x89PNG\r\n\x1a\n"
    assert struct.unpack(">II", data[16:24]) == (1280, 2000)
    keep = os.environ.get("GATE_REPORT_SCREENSHOT")
    if keep:
        shutil.copyfile(shot, keep)
