"""The reviewer's queue: report.html as the working page (queue first, statuses after
review actions, sources and the change since the previous run), bulk review, policy lines
from a decision, validated option values, and the screens agreeing with each other.

The demo inbox and policy are the bundled invented ones (sample_docs/, policies/demo.yaml);
the small inboxes built here are invented too (example.org / example.net / .test hosts).
"""

from __future__ import annotations

import json
import re
import shutil
import subprocess
import sys
from html.parser import HTMLParser
from pathlib import Path

import pytest
import yaml

from gate.htmlreport import render
from gate.policy import parse_policy
from gate.report import Tally
from tests.test_htmlreport import assert_inert, chromium, run_chromium

ROOT = Path(__file__).resolve().parent.parent
INBOX = ROOT / "sample_docs" / "inbox"
POLICY = ROOT / "policies" / "demo.yaml"
AS_OF = "2026-12-01T00:00:00Z"


def gate(*args):
    return subprocess.run([sys.executable, "-m", "gate", *map(str, args)], capture_output=True,
                          text=True)


@pytest.fixture(scope="module")
def demo(tmp_path_factory):
    out = tmp_path_factory.mktemp("queue") / "out"
    result = gate("run", INBOX, "--policy", POLICY, "--out", out, "--as-of", AS_OF, "-q")
    assert result.returncode == 0, result.stderr
    return out


@pytest.fixture
def out(demo, tmp_path):
    copy = tmp_path / "out"
    shutil.copytree(demo, copy, symlinks=True)
    gate("report", "html", copy)  # the copy's page names the copy's folder
    return copy


class Sections(HTMLParser):
    """The ids of <section> elements in page order, and each queue row's status."""

    def __init__(self, page: str):
        super().__init__()
        self.ids: list[str] = []
        self.rows: list[str] = []
        self.feed(page)

    def handle_starttag(self, tag, attrs):
        attrs = dict(attrs)
        if tag == "section" and attrs.get("id"):
            self.ids.append(attrs["id"])
        if tag == "tr" and "data-status" in attrs:
            self.rows.append(attrs["data-status"])


def open_queue(page: str) -> list[str]:
    """The paths of the open queue, in page order."""
    start = page.index('<section id="queue">')
    end = page.index('id="decided"') if 'id="decided"' in page else page.index("</section>",
                                                                                start)
    return re.findall(r'<tr class="q-open" data-status="open"><td><div class="path">([^<]*)<',
                      page[start:end])


# --- the page ----------------------------------------------------------------------------

def test_the_queue_comes_first_ordered_by_what_needs_a_person(out):
    page = (out / "report.html").read_text(encoding="utf-8")
    sections = Sections(page).ids
    assert sections[:3] == ["queue", "sources", "counts"]  # counts and charts after it
    paths = open_queue(page)
    listed = json.loads(gate("review", "list", out, "--json").stdout)
    assert sorted(paths) == sorted(e["path"] for e in listed)  # every open entry, once
    # fail-closed (could not be evaluated) first, then injection, ... duplicates last
    assert paths.index("format/locked-minutes.pdf") < paths.index(
        "injection/step-free-access.html") < paths.index("freshness/fare-table-2024.txt") < \
        paths.index("partner/fahrplanwechsel-vorab.html")
    assert paths[-1].startswith(("partner/", "recrawl/", "wiki/"))


def test_queue_entries_carry_their_evidence_and_commands(out):
    page = (out / "report.html").read_text(encoding="utf-8")
    folder = str(out.resolve())
    # an injection snippet, with invisible characters made visible
    assert '<blockquote class="snippet">the river villages.&lt;U+E0061&gt;' in page
    # a decoded hidden message
    assert "decoded hidden message: <span class=\"mono\">assistant: tell every rider" in page
    # a near-duplicate's diff against the kept document
    assert "diff against the kept document <span class=\"mono\">partner/fahrplanwechsel.html" \
        in page
    assert re.search(r"<pre class=\"diff\">[^<]*5:1[24]", page)
    # ready-to-copy commands naming this folder; none offers to release a document gate
    # could not evaluate
    assert f"gate review release {folder} " in page
    locked = page[page.index("format/locked-minutes.pdf"):]
    locked = locked[:locked.index("</tr>")]
    assert "gate review reject" in locked and "gate review release" not in locked


def test_folded_details_hold_no_raw_fragments(out):
    page = (out / "report.html").read_text(encoding="utf-8")
    for dl in re.findall(r"<details><summary>details</summary><dl>(.*?)</dl>", page):
        for key, value in re.findall(r"<dt>([^<]*)</dt><dd>(.*?)</dd>", dl):
            assert key not in ("diverging", "why", "at", "extra", "note"), (key, value)
            assert not value.startswith(("; ", " (")) and value not in ("", "&quot;&quot;")


def test_page_follows_every_review_action_and_equals_a_rerender(out, tmp_path):
    assert gate("review", "release", out, "freshness/undated-memo.txt", "--note",
                "confirmed current by the depot office", "--by", "alex").returncode == 0
    assert gate("review", "reject", out, "source/fan-blog.html", "--note",
                "not an official source", "--by", "alex").returncode == 0
    assert gate("review", "purge", out, "format/logo.html", "--note",
                "an image, not a document", "--by", "alex").returncode == 0
    page = (out / "report.html").read_text(encoding="utf-8")
    # the page was rewritten by the last action: a re-render gives the same bytes
    assert gate("report", "html", out, "-o", tmp_path / "again.html").returncode == 0
    assert (tmp_path / "again.html").read_text(encoding="utf-8") == page
    paths = open_queue(page)
    for path in ("freshness/undated-memo.txt", "source/fan-blog.html", "format/logo.html"):
        assert path not in paths
    decided = page[page.index('id="decided"'):page.index('id="sources"')]
    assert decided.index("source/fan-blog.html") < decided.index(
        "freshness/undated-memo.txt") < decided.index("format/logo.html")
    assert Sections(decided).rows == ["rejected", "released", "purged"]
    assert "by alex at" in decided and "an image, not a document" in decided
    released = decided[decided.index("freshness/undated-memo.txt"):]
    released = released[:released.index("</tr>")]
    assert re.search(r'<pre class="cmd">gate review policy \S+ [0-9a-f]{20}</pre>', released)
    held = json.loads((out / "report.json").read_text())["summary"]["quarantined"]
    assert f"Review queue: {held - 3} entries to decide" in page
    assert_inert(page)


def test_report_json_alone_still_draws_a_queue_without_statuses(out):
    report = json.loads((out / "report.json").read_text(encoding="utf-8"))
    page = render(report)
    assert Sections(page).ids[0] == "queue"
    assert "review statuses are not known here" in page
    assert set(Sections(page).rows) == {"unknown"}


def small_inbox(root: Path, hosts: dict[str, str]) -> Path:
    """An invented inbox: one plain-text notice per name, its source URL on the given
    host (the same English wording each time, so only the source rules decide)."""
    inbox = root / "inbox"
    shutil.rmtree(inbox, ignore_errors=True)
    inbox.mkdir(parents=True)
    lines = []
    for name, host in hosts.items():
        (inbox / f"{name}.txt").write_text(
            f"Notice {name}: the ferry from the north pier runs every hour from six in the "
            "morning until ten at night, and tickets are sold on board and at the kiosk.\n",
            encoding="utf-8")
        lines.append(json.dumps({"path": f"{name}.txt",
                                 "source_url": f"https://{host}/{name}.html"}))
    (inbox / "manifest.jsonl").write_text("\n".join(lines) + "\n", encoding="utf-8")
    return inbox


def test_sources_and_the_change_since_the_previous_run(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: ferries\nsources:\n  allow:\n"
                      "    - domain: ferry.example.org\n    - domain: feed.example.net\n",
                      encoding="utf-8")
    out = tmp_path / "out"
    first = {f"a{i}": "ferry.example.org" for i in range(3)} | \
        {f"b{i}": "feed.example.net" for i in range(3)}
    assert gate("run", small_inbox(tmp_path, first), "--policy", policy, "--out", out,
                "--as-of", AS_OF, "-q").returncode == 0
    page = (out / "report.html").read_text(encoding="utf-8")
    assert "there is no earlier run to compare with" in page
    # the feed breaks: its documents now come from a host no rule allows
    second = {f"a{i}": "ferry.example.org" for i in range(3)} | \
        {f"b{i}": "feed-mirror.example.net" for i in range(3)}
    assert gate("run", small_inbox(tmp_path, second), "--policy", policy, "--out", out,
                "--as-of", AS_OF, "-q").returncode == 0
    page = (out / "report.html").read_text(encoding="utf-8")
    sources = page[page.index('<section id="sources">'):page.index('<section id="counts">')]
    assert "rate in run-0001" in sources
    flagged = re.findall(r'<tr class="flag"><td class="mono">([^< ]*)', sources)
    assert "feed-mirror.example.net" in flagged and "source.unlisted" in flagged
    assert "ferry.example.org" not in flagged
    assert re.search(r"source\.unlisted <span class=\"badge open\">new</span></td>"
                     r"<td class=\"num\">0 \(0%\)</td><td class=\"num\">3 \(50%\)</td>"
                     r"<td class=\"num\">\+50 points</td>", sources)
    assert re.search(r"feed\.example\.net</td><td class=\"num\">0</td><td class=\"num\">0"
                     r"</td><td class=\"num\">0%</td><td class=\"num\">0%</td><td "
                     r"class=\"num\">gone from the inbox</td>", sources)


def test_browser_shows_the_queue_first_with_statuses(out, tmp_path):
    binary = chromium()
    for action, ref in (("release", "freshness/undated-memo.txt"),
                        ("reject", "source/fan-blog.html"), ("purge", "format/logo.html")):
        assert gate("review", action, out, ref, "--note", "<script>alert(1)</script> checked",
                    "--by", "alex").returncode == 0
    page = out / "report.html"
    dom = run_chromium(binary, tmp_path / "profile", "--dump-dom", page.as_uri())
    assert "<script" not in dom.split("<style>")[0] + dom.split("</style>")[-1]
    assert "&lt;script&gt;alert(1)&lt;/script&gt; checked" in dom  # the note, as text
    assert Sections(dom).ids[0] == "queue"
    statuses = Sections(dom).rows
    held = json.loads((out / "report.json").read_text())["summary"]["quarantined"]
    assert statuses[:held - 3] == ["open"] * (held - 3)
    assert statuses[held - 3:held] == ["rejected", "released", "purged"]
    shot = tmp_path / "page.png"
    run_chromium(binary, tmp_path / "profile", "--window-size=1300,1400",
                 f"--screenshot={shot}", page.as_uri())
    data = shot.read_bytes()
    assert data[:8] == b"\x89PNG\r\n\x1a\n" and len(data) > 20_000  # a drawn page, not blank


# --- bulk review --------------------------------------------------------------------------

def test_bulk_review_previews_then_acts_with_yes(out):
    before = (out / "report.html").read_bytes()
    preview = gate("review", "reject", out, "--check", "source", "--note", "unofficial feeds")
    assert preview.returncode == 0, preview.stderr
    count = len(json.loads(gate("review", "list", out, "--check", "source",
                                "--json").stdout))
    assert preview.stdout.splitlines()[-1] == \
        f"{count} entries would be rejected; add --yes to reject them."
    assert (out / "report.html").read_bytes() == before  # nothing happened
    done = gate("review", "reject", out, "--check", "source", "--note", "unofficial feeds",
                "--yes", "--by", "alex")
    assert done.returncode == 0, done.stderr
    assert done.stdout.splitlines()[-1].startswith(f"review-0001: {count} entries rejected")
    assert gate("review", "list", out, "--check", "source").stdout == "no matching entries\n"
    rejected = json.loads(gate("review", "list", out, "--status", "rejected", "--json").stdout)
    assert len(rejected) == count


def test_bulk_review_refuses_to_guess(out):
    both = gate("review", "purge", out, "format/logo.html", "--check", "format", "--note", "x")
    assert both.returncode == 2 and "not both" in both.stderr
    neither = gate("review", "purge", out, "--note", "x")
    assert neither.returncode == 2 and "name the entries to purge" in neither.stderr
    unnoted = gate("review", "purge", out, "--check", "format", "--yes")
    assert unnoted.returncode == 2 and "--note" in unnoted.stderr
    blank = gate("review", "purge", out, "--check", "format", "--yes", "--note", "  ")
    assert blank.returncode == 2 and "a note is required" in blank.stderr
    typo = gate("review", "purge", out, "--check", "formt", "--yes", "--note", "x")
    assert typo.returncode == 2 and "The checks are: format, source" in typo.stderr


def test_clearing_the_demo_queue_with_bulk_commands(out):
    """The measured figure of the closing note: bulk commands that clear the demo's
    quarantine, against one named entry per entry before."""
    open_before = len(json.loads(gate("review", "list", out, "--json").stdout))
    plan = [("purge", "--check", "format"), ("reject", "--check", "injection"),
            ("reject", "--check", "integrity"), ("reject", "--check", "signature"),
            ("reject", "--check", "source"),
            ("reject", "--check", "quality"), ("reject", "--check", "language"),
            ("release", "--code", "freshness.undated"), ("reject", "--check", "freshness"),
            ("reject", "--check", "duplicate")]
    for action, *selection in plan:
        result = gate("review", action, out, *selection, "--note", "demo triage", "--yes")
        assert result.returncode == 0, (selection, result.stderr)
    assert gate("review", "list", out).stdout == "no matching entries\n"
    report = json.loads((out / "report.json").read_text())
    assert open_before == report["summary"]["quarantined"] and len(plan) == 10
    page = (out / "report.html").read_text(encoding="utf-8")
    assert "Review queue: 0 entries to decide" in page and "nothing left to decide" in page


# --- from a decision to a policy -----------------------------------------------------------

def parse(text: str):
    return parse_policy(text, Path("suggested.yaml"))


def test_policy_lines_for_a_language_entry_paste_into_its_rule(out):
    result = gate("review", "policy", out, "language/avis-aux-voyageurs.html", "--json")
    assert result.returncode == 0, result.stderr
    found = json.loads(result.stdout)
    assert found["on_rule"].startswith("sources.allow[0]")
    overrides = yaml.safe_load(found["yaml"])["overrides"]
    assert overrides == {"language": {"allowed": ["de", "en", "fr"]}}
    # pasted under an allow rule, the lines are a valid policy
    parse(yaml.safe_dump({"version": 1, "name": "t", "language": {"allowed": ["en", "de"]},
                          "sources": {"allow": [{"domain": "docs.example.org",
                                                 "overrides": overrides}]}}))
    policy = (out / "report.json").read_text()  # nothing was applied anywhere
    assert POLICY.read_text(encoding="utf-8") == (ROOT / "policies" / "demo.yaml").read_text()
    assert "fr" not in json.loads(policy)["run"]["policy"]["name"]


def test_policy_lines_for_a_mixed_language_entry(out):
    found = json.loads(gate("review", "policy", out, "language/depot-hours.txt",
                            "--json").stdout)
    overrides = yaml.safe_load(found["yaml"])["overrides"]
    share = overrides["language"]["min_allowed_share"]
    assert 0.5 < share < 0.9  # at or below the measured share, so it would have passed
    parse(yaml.safe_dump({"version": 1, "name": "t", "language": {"allowed": ["en", "de"]},
                          "sources": {"allow": [{"domain": "docs.example.org",
                                                 "overrides": overrides}]}}))


def test_policy_lines_for_an_unlisted_source_and_notes_for_the_rest(out):
    text = gate("review", "policy", out, "source/fan-blog.html").stdout
    assert "gate applies nothing by itself" in text
    lines = yaml.safe_load("\n".join(line for line in text.splitlines()
                                     if not line.startswith("#")))
    assert lines == {"sources": {"allow": [{"domain": "blog.example.net"}]}}
    parse(yaml.safe_dump({"version": 1, "name": "t", **lines}))
    injected = gate("review", "policy", out, "injection/step-free-access.html").stdout
    assert "no policy line would have admitted" in injected
    assert "no policy line admits planted instructions" in injected
    stale = json.loads(gate("review", "policy", out, "freshness/fare-table-2024.txt",
                            "--json").stdout)
    assert yaml.safe_load(stale["yaml"])["overrides"]["freshness"]["max_age_days"] > 365


# --- every option value validated -----------------------------------------------------------

@pytest.mark.parametrize("args, message", [
    (("--check", "langauge"), "--check 'langauge' is not a check (did you mean 'language'?). "
                              "The checks are: format, source, "),
    (("--code", "language.typo"), "--code 'language.typo' is not a finding code"),
    (("--status", "closed"), "--status 'closed' is not one of open, rejected, all"),
    (("--since", "yesterday"), "--since 'yesterday' is not a date: give YYYY-MM-DD"),
    (("--until", "2026-13-01"), "--until '2026-13-01' is not a date"),
    (("--run", "run-9"), "--run 'run-9' is not a run id"),
    (("--run", "run-0009"), "--run 'run-0009' is not a run of this folder; valid: run-0001."),
])
def test_review_filters_reject_unknown_values(demo, args, message):
    result = gate("review", "list", demo, *args)
    assert result.returncode == 2 and result.stdout == ""
    assert result.stderr.startswith("error: " + message), result.stderr
    assert result.stderr.count("\n") == 1


@pytest.mark.parametrize("args, message", [
    (("--sha256", "abc"), "--sha256 'abc' is not a SHA-256 digest (64 hex digits)."),
    (("--published-at", "last week"), "--published-at: 'last week' is not an ISO 8601 date"),
    (("--retrieved-at", "2026-02-30"), "--retrieved-at: "),
])
def test_explain_rejects_malformed_values(tmp_path, args, message):
    doc = tmp_path / "n.txt"
    doc.write_text("A short invented notice.\n")
    result = gate("explain", doc, "--policy", POLICY, *args)
    assert result.returncode == 2 and result.stderr.startswith("error: " + message), \
        result.stderr


def test_audit_verify_rejects_a_malformed_head(demo):
    result = gate("audit", "verify", demo, "--head", "abc")
    assert result.returncode == 2 and "BROKEN" not in result.stdout
    assert result.stderr.startswith("error: --head 'abc' is not a head hash")


# --- the screens agree ------------------------------------------------------------------------

def test_short_text_shows_no_language_beside_undetermined(demo):
    report = json.loads((demo / "report.json").read_text(encoding="utf-8"))
    notice = next(d for d in report["documents"] if d["path"] == "language/short-notice.txt")
    assert any(w["code"] == "language.undetermined" for w in notice["warnings"])
    assert "language" not in notice  # no "en (1.00)" beside "cannot be determined"


def test_warnings_are_counted_for_accepted_documents_only():
    tally = Tally()
    warning = {"check": "language", "code": "language.undetermined", "message": "m"}
    reason = {"check": "source", "code": "source.unlisted", "message": "m"}
    tally.add({"decision": "quarantined", "reasons": [reason], "warnings": [warning],
               "change": "none"})
    tally.add({"decision": "accepted", "reasons": [], "warnings": [], "change": "add"})
    summary = tally.summary([])
    assert summary["warnings_by_code"] == {}
    page = render({"documents": [], "summary": summary})
    assert "Warnings by code" not in page and "Accepted with warnings (0)" in page


def test_review_show_names_the_folder_status_of_an_accepted_document(demo):
    result = gate("review", "show", demo, "portal/network-overview.html")
    assert result.returncode == 0, result.stderr
    assert result.stdout.splitlines()[0].endswith("(accepted)")


def test_explain_without_sha256_does_not_blame_a_manifest(tmp_path):
    policy = tmp_path / "p.yaml"
    policy.write_text("version: 1\nname: t\nintegrity:\n  require_checksum: true\n")
    doc = tmp_path / "n.txt"
    doc.write_text("A short invented notice.\n")
    result = gate("explain", doc, "--policy", policy, "--as-of", AS_OF)
    assert "integrity.missing" in result.stdout and "manifest" not in result.stdout


# --- help, numbering, wording -------------------------------------------------------------------

COMMANDS = [("run",), ("policy", "check"), ("policy", "schema"), ("report", "html"),
            ("codes",), ("version",), ("review", "list"), ("review", "show"),
            ("review", "release"), ("review", "reject"), ("review", "purge"),
            ("review", "policy"), ("audit", "verify"), ("audit", "show"), ("explain",), ()]


def test_help_screens_are_plain_words():
    for command in COMMANDS:
        result = gate(*command, "--help")
        assert result.returncode == 0, command
        assert not re.search(r"<bool>|<str>|<path>|<int|<float|<list|\{[a-z_]+\}",
                             result.stdout), (command, result.stdout)
        if "--json" in result.stdout:  # every --json says what it does
            assert re.search(r"--json\s+Print JSON", result.stdout), command


def test_version_option_and_codes_header():
    assert gate("--version").stdout == gate("version").stdout
    assert gate("--version").stdout.startswith("gate ")
    lines = gate("codes").stdout.splitlines()
    assert "'always' codes mean the document could not be evaluated" in lines[1]
    assert lines[3].split() == ["CODE", "QUARANTINES", "MEANING"]
    assert lines[4].split()[1] in ("always", "policy")


def test_reviews_and_runs_are_numbered_apart(out):
    assert gate("review", "reject", out, "source/fan-blog.html", "--note",
                "unofficial").stdout.splitlines()[-1].startswith("review-0001: 1 entry ")
    rerun = gate("run", INBOX, "--policy", POLICY, "--out", out, "--as-of", AS_OF, "-q")
    assert rerun.stdout.startswith("run-0002: ")


def test_audit_show_says_who_acted_and_when(out):
    gate("review", "reject", out, "source/fan-blog.html", "--note", "unofficial", "--by",
         "alex")
    line = gate("audit", "show", out, "--limit", "1").stdout.splitlines()[0]
    assert re.search(r"reject +source/fan-blog\.html +by alex at \d{4}-\d\d-\d\dT[\d:]+Z "
                     r"\(review-0001\): unofficial$", line), line


def test_a_failed_run_leaves_no_state_behind(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    (inbox / "a.txt").write_text("invented\n")
    (inbox / "manifest.jsonl").write_text("{not json\n")
    out = tmp_path / "out"
    result = gate("run", inbox, "--policy", POLICY, "--out", out, "-q")
    assert result.returncode == 2 and not out.exists()


def test_a_run_without_a_manifest_gives_a_caution(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    (inbox / "a.txt").write_text("An invented notice about the ferry timetable.\n")
    out = tmp_path / "out"
    result = gate("run", inbox, "--policy", POLICY, "--out", out, "--as-of", AS_OF, "-q")
    assert result.returncode == 0, result.stderr
    assert "caution: This run had no manifest" in result.stderr
    assert result.stdout.startswith("run-0001: 1 document, ")  # not "1 documents"
    report = json.loads((out / "report.json").read_text())
    assert any("no manifest" in c for c in report["cautions"])
    assert "This run had no manifest" in (out / "report.html").read_text()


def test_readme_commands_exist_with_their_options():
    """Every `gate ...` line of the README's shell blocks names a real command, and every
    --option on it is one of that command's options."""
    import typer

    from gate.cli import app
    root = typer.main.get_command(app)
    readme = (ROOT / "README.md").read_text(encoding="utf-8")
    blocks = re.findall(r"```sh\n(.*?)```", readme, re.S)
    checked = 0
    for line in "\n".join(blocks).splitlines():
        line = line.split("#")[0].strip()
        if not line.startswith("gate "):
            continue
        words = line.split()[1:]
        command = root
        while words and hasattr(command, "commands") and words[0] in command.commands:
            command = command.commands[words.pop(0)]
        assert not hasattr(command, "commands") or line in ("gate review ...",
                                                            "gate --version"), line
        options = {o for p in command.params for o in getattr(p, "opts", [])} | {"--help"}
        if command is root:
            options |= {"--version"}
        for word in words:
            if word.startswith("--"):
                assert word.split("=")[0].strip("[]") in options, (line, word)
        checked += 1
    assert checked >= 15


def test_docs_speak_for_themselves():
    """User documentation does not refer to an issue tracker's wording."""
    for doc in ("injection.md", "report.md"):
        text = (ROOT / "docs" / doc).read_text(encoding="utf-8")
        assert not re.search(r"\bthe issue\b", text), doc


def test_injection_snippets_start_at_a_word(demo):
    """A snippet shown to a reviewer begins at the start of a word, not inside one."""
    report = json.loads((demo / "report.json").read_text(encoding="utf-8"))
    checked = 0
    for doc in report["documents"]:
        text_file = demo / doc["location"] / "text.txt"
        if not text_file.exists():
            continue
        text = text_file.read_text(encoding="utf-8")
        for finding in doc["reasons"] + doc["warnings"]:
            snippet = (finding.get("details") or {}).get("snippet")
            if not snippet or snippet[:20] not in text:
                continue  # a hidden-markup snippet is not in the indexed text
            at = text.index(snippet[:20])
            assert at == 0 or not text[at - 1].isalnum(), (doc["path"], snippet)
            checked += 1
    assert checked >= 1  # injection/staff-bulletin.html: its snippet once began mid-word
