"""injection: does the document carry instructions planted to steer the model that reads it?

Whatever is indexed is later pasted into a language model's context as trusted material,
so a document can attack the model indirectly (OWASP Top 10 for LLM Applications 2025,
LLM01:2025 Prompt Injection: "Indirect prompt injections occur when an LLM accepts input
from external sources, such as websites or files"). The screen looks for:

* **sentences that instruct the model reading them**, read for what they do rather than
  their wording, in 24 languages (en, de, fr, es, it, pt, nl, pl, sv, ru, uk, cs, ro, hu,
  el, tr, ar, fa, hi, ja, zh, ko, vi, id): a sentence that names an AI reader or the
  reader's answer, summary or conversation, in the directive mood (``model-address``,
  ``answer-steering``, ``override``, ``prompt-leak``), and a bare request for work that
  has nothing to do with the document (``task-hijack``);
* **a learnt instruction model** (``instruction``): a logistic regression over hashed
  words, word prefixes and word pairs of every sentence and every two or three consecutive
  sentences, trained on hand-written attack and benign text in 28 languages and on real
  Debian documentation (``benchmarks/train_injection_model.py``), scored with numpy from
  the shipped ``data/instruction_model.npz``;
* **requests to act**: harmful code to include or run (``harmful-code``: uploads, sockets,
  key logging, screen capture, deletion, encryption, floods), calls of the reader's tools
  and forged tool calls (``tool-call``), and claims of authority over automated readers
  or over every other source (``authority-claim``);
* **phrase rules** in English, German, French and Spanish: telling it to
  ignore its instructions (``override``), to reveal them (``prompt-leak``), to take a new
  role (``role-change``), addressing "the AI reading this" (``model-address``), fake
  system or developer notices and context boundaries (``fake-notice``), chat-template
  tokens and role markers (``chat-markup``), dictating what to tell the user
  (``answer-steering``), asking for data to be sent out (``exfil-request``);
* **exfiltration addresses**: links and images with a slot for conversation data or
  secrets (``exfil-url``);
* **concealment**: text hidden by CSS, attributes, comments and metadata in HTML
  (``html-hidden``); white, tiny, off-page or invisible text, metadata and annotations in
  PDFs (``pdf-hidden``); base64, hex, URL-encoding, HTML character references,
  quoted-printable, escapes and ROT13 (``encoded-payload``); wording
  disguised with look-alike letters, zero-width characters, digits for letters or spaced
  letters (``obfuscated``);
* **Unicode tricks**: zero-width characters splitting words (``zero-width``), messages in
  invisible tag characters (``tag-characters``), bidirectional overrides
  (``bidi-control``), words mixing look-alike scripts (``mixed-script``).

Matching runs on a normalised view (NFKC-style folding, invisible characters removed,
UTS #39 look-alikes folded, digit-for-letter substitutions undone). Each hit has a weight;
the weights combine into a score in [0, 1] (see docs/injection.md), and a document scoring
at or above ``threshold`` is held, with one finding per hit: the signal, where it was
found, its span in the indexed text when it is there, a snippet with invisible characters
shown as ``<U+200B>``, and any decoded payload. Words that are quoted or given as an
example, and documents that discuss prompt injection itself, weigh less; hidden or encoded
words never do.

These are heuristics: they lower the risk of planted instructions reaching the model, they
do not remove it. Keep defence in depth (treat retrieved text as untrusted in the
prompt, limit what the model may do) and follow your organisation's security practice.

Example::

    injection:
      threshold: 0.50            # score at or above: quarantined
      warn_at: 0.30              # optional: list the signals as warnings from this score
      ignore_signals: [mixed-script]
"""

from __future__ import annotations

from typing import Any

from pydantic import Field, field_validator

from gate.checks.base import Document, DocumentCheck, RunContext
from gate.checks.injection import score
from gate.checks.injection.screen import MEASURE_VERSION, measure
from gate.findings import Finding
from gate.settings import Section

MAX_FINDINGS = 20


class InjectionSettings(Section):
    """Planted-instruction screening."""

    threshold: float = Field(0.50, ge=0.0, le=1.0, description="Documents whose injection "
                             "score is at or above this are held.", examples=[0.5])
    warn_at: float | None = Field(None, ge=0.0, le=1.0, description="When set, a document "
                                  "scoring at or above this but below threshold is accepted "
                                  "with its signals listed as warnings.", examples=[0.3])
    ignore_signals: tuple[str, ...] = Field((), description="Signals left out of the score "
                                            "(names as in docs/injection.md, e.g. "
                                            "mixed-script).", examples=[["mixed-script"]])

    @field_validator("ignore_signals")
    @classmethod
    def _known(cls, value: tuple[str, ...]) -> tuple[str, ...]:
        for name in value:
            if name not in score.SIGNALS:
                raise ValueError(f"unknown signal {name!r}; known signals: "
                                 f"{', '.join(sorted(score.SIGNALS))}")
        return value


def _at(hit: dict[str, Any]) -> str:
    parts = []
    where = hit.get("where") or "the document"
    technique = hit.get("technique")
    if hit.get("signal") == "obfuscated":
        parts.append(f" ({technique})" if technique else "")
        technique = None
    if where != "the indexed text":
        parts.append(f" in {where}")
        if technique and technique not in where:
            parts.append(f" ({technique})")
    span = hit.get("span")
    if span:
        if where == "the indexed text":
            parts.append(f" in the indexed text at characters {span[0]}-{span[1]}")
        else:
            parts.append(f", which reaches the indexed text at characters {span[0]}-{span[1]}")
    elif where != "the indexed text":
        parts.append(", not in the indexed text")
    return "".join(parts)


def _extra(hit: dict[str, Any]) -> str:
    parts = []
    if hit.get("decoded") and hit.get("signal") not in ("tag-characters",):
        parts.append(f"decoded: \"{hit['decoded']}\"")
    elif hit.get("signal") == "tag-characters" and hit.get("decoded"):
        parts.append(f"hidden message: \"{hit['decoded']}\"")
    detail = hit.get("detail") or {}
    if hit.get("signal") == "bidi-control" and detail.get("displayed_as"):
        parts.append(f"displayed as \"{detail['displayed_as']}\"")
    if hit.get("signal") in ("zero-width", "mixed-script") and detail.get("words"):
        parts.append(f"{detail['words']} word(s)")
    if hit.get("note"):
        parts.append(hit["note"])
    return "; " + "; ".join(parts) if parts else ""


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding] | None:
    settings: InjectionSettings = policy.injection
    measured = document.measures.get("injection")
    if measured is None:
        return None
    ignored = set(settings.ignore_signals)
    hits = [h for h in measured.get("signals", []) if h.get("signal") not in ignored
            and h.get("signal") in score.CODES]
    value = score.combine(hits)
    if value >= settings.threshold:
        action = None
    elif settings.warn_at is not None and value >= settings.warn_at:
        action = "warn"
    else:
        return []
    findings = []
    said: set[tuple[str, str]] = set()
    for hit in sorted(hits, key=lambda h: -h["weight"]):
        details = {k: v for k, v in hit.items() if v is not None}
        details.update(what=score.SIGNALS[hit["signal"]][1], at=_at(hit), extra=_extra(hit),
                       snippet=hit.get("snippet") or "", score=value,
                       threshold=settings.threshold)
        finding = score.CODES[hit["signal"]](action=action, **details)
        if (finding.code, finding.message) in said:  # several rules matched the same words
            continue
        said.add((finding.code, finding.message))
        findings.append(finding)
        if len(findings) >= MAX_FINDINGS:
            break
    return findings


CHECK = DocumentCheck(id="injection", section="injection", evaluate=evaluate,
                      settings=InjectionSettings, measure=measure,
                      measure_version=MEASURE_VERSION, doc=__doc__ or "")
