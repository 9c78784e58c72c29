"""The signals, their finding codes, and how their weights combine into one score.

Every detector reports *hits*, each with a signal name and a weight in [0, 1]. Hits of one
signal combine with diminishing returns (the i-th strongest counts ``0.5**i`` of its
weight), so twenty weak hits of one kind do not add up to a strong one; the signals then
combine as independent evidence (noisy-OR):

    signal = 1 - prod_i (1 - w_i * 0.5**i)        document = 1 - prod_s (1 - signal_s)

A hidden or encoded instruction shows up twice, once as its wording and once as the
concealment that carries it, which is what lifts it over the threshold where the same
words in plain sight, quoted in an article, would not be.
"""

from __future__ import annotations

from collections.abc import Iterable, Mapping
from typing import Any

from gate.findings import Code, define

# signal -> (title, what the finding says before "{at}")
SIGNALS: dict[str, tuple[str, str]] = {
    "override": ("wording that tells the model to ignore its instructions",
                 "text tells the model to ignore or override its instructions"),
    "prompt-leak": ("wording that asks the model to reveal its instructions",
                    "text asks the model to reveal its system prompt or instructions"),
    "role-change": ("wording that gives the model a new role or mode",
                    "text tries to give the model a new role, persona or mode"),
    "model-address": ("text addressed to an AI model reading the document",
                      "text speaks to the AI model that reads the document"),
    "fake-notice": ("a counterfeit system or developer notice, or a fake context boundary",
                    "text poses as a system or developer notice or a context boundary"),
    "chat-markup": ("chat-template tokens or role markers",
                    "text carries chat-template tokens or role markers"),
    "answer-steering": ("wording that dictates what the model tells the user",
                        "text dictates what the model should tell or hide from the user"),
    "exfil-request": ("wording that asks for conversation data or secrets to be sent out",
                      "text asks for conversation data or secrets to be put into an address"),
    "exfil-url": ("a link or image address built to carry data out",
                  "a link or image address has a slot for conversation data or secrets"),
    "task-hijack": ("a bare request for work that has nothing to do with the document",
                    "a sentence asks the reader for work unrelated to the document"),
    "harmful-code": ("code to include or run that exfiltrates, spies or destroys",
                     "the text asks for harmful code to be included or run"),
    "tool-call": ("a request to call one of the reader's tools, or a forged tool call",
                  "the text asks the model to call a tool or forges a tool call"),
    "authority-claim": ("a claim of authority over automated readers or other sources",
                        "the text claims authority over automated readers or other sources"),
    "instruction": ("a sentence that reads as an instruction to the AI reader (learnt model)",
                    "a sentence reads as an instruction to the AI model that reads it"),
    "html-hidden": ("model-directed text concealed in the page markup",
                    "model-directed text is hidden from readers"),
    "pdf-hidden": ("model-directed text concealed in the PDF",
                   "model-directed text is hidden from readers of the PDF"),
    "encoded-payload": ("model-directed text hidden in an encoding (base64, hex ...)",
                        "an encoded payload decodes to model-directed text"),
    "obfuscated": ("model-directed wording disguised with character tricks",
                   "model-directed wording is disguised"),
    "zero-width": ("zero-width characters inside words",
                   "zero-width characters split words"),
    "tag-characters": ("text hidden in invisible Unicode tag characters",
                       "invisible Unicode tag characters carry a hidden message"),
    "bidi-control": ("bidirectional controls that reorder the displayed text",
                     "bidirectional control characters make the text display in another "
                     "order than it is read"),
    "mixed-script": ("words mixing look-alike letters from different scripts",
                     "words mix look-alike letters from different scripts"),
}
CONTENT = frozenset({"override", "prompt-leak", "role-change", "model-address", "fake-notice",
                     "chat-markup", "answer-steering", "exfil-request", "exfil-url",
                     "task-hijack", "harmful-code", "tool-call", "authority-claim",
                     "instruction"})
CONCEALMENT = frozenset({"html-hidden", "pdf-hidden", "encoded-payload", "obfuscated"})
CONCEAL_WEIGHT = 0.4
OBFUSCATION_WEIGHT = 0.35
REPEAT_DECAY = 0.5
MAX_PER_SIGNAL = 20

TEMPLATE = ("{what}{at}: \"{snippet}\"{extra}; injection score {score:.2f} "
            "(threshold {threshold:.2f})")

CODES: dict[str, Code] = {
    signal: define(f"injection.{signal}", title, TEMPLATE,
                   doc=f"{title}; see docs/injection.md")
    for signal, (title, _) in SIGNALS.items()
}


def concealment_weight(content_weight: float, base: float = CONCEAL_WEIGHT) -> float:
    """The weight of a concealment hit carrying content of ``content_weight``."""
    return round(base * min(1.0, content_weight / 0.3), 4)


def signal_scores(hits: Iterable[Mapping[str, Any]]) -> dict[str, float]:
    """Per-signal strength: the signal's hits combined with diminishing returns."""
    by_signal: dict[str, list[float]] = {}
    for hit in hits:
        by_signal.setdefault(hit["signal"], []).append(float(hit["weight"]))
    out = {}
    for signal, weights in by_signal.items():
        remaining = 1.0
        for i, w in enumerate(sorted(weights, reverse=True)[:MAX_PER_SIGNAL]):
            remaining *= 1.0 - max(0.0, min(1.0, w)) * REPEAT_DECAY ** i
        out[signal] = round(1.0 - remaining, 4)
    return out


def combine(hits: Iterable[Mapping[str, Any]]) -> float:
    """The document score in [0, 1] from its hits."""
    remaining = 1.0
    for strength in signal_scores(hits).values():
        remaining *= 1.0 - strength
    return round(1.0 - remaining, 4)
