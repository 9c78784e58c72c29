"""language: is the text in a language the index serves?

Detection uses langdetect with its seed fixed (``DetectorFactory.seed = 0``, as the
library's README prescribes for reproducible results) on a bounded sample: three windows of
400 characters from the start, middle and end of the text, so a long document costs the
same as a short one and a document that switches language part-way lowers the confidence
instead of going unnoticed. langdetect is confidently wrong on short strings, so text
shorter than ``min_chars`` is *undetermined*; ``undetermined`` says what that means
(``quarantine``, ``warn`` or ``allow``; left out, the section's ``action`` decides). Text
with no letters at all is undetermined too.

Codes are langdetect's: ISO 639-1 (``en``, ``de``, ``fr`` ...) plus ``zh-cn`` and ``zh-tw``.

Example::

    language:
      allowed: [en, de]
      min_confidence: 0.80
      min_chars: 200
      undetermined: warn
"""

from __future__ import annotations

import os
from typing import Any, Literal

import langdetect
from langdetect import DetectorFactory
from langdetect.lang_detect_exception import LangDetectException
from pydantic import Field, field_validator

from gate.checks.base import Document, DocumentCheck, RunContext
from gate.extract.model import Extraction
from gate.findings import Finding, define
from gate.settings import Section

DetectorFactory.seed = 0

WINDOW = 400
WINDOWS = 3

NOT_ALLOWED = define("language.not-allowed", "the text is in a language not allowed",
                     "the text is in {language} (probability {probability:.2f}); the policy "
                     "allows {allowed}")
LOW_CONFIDENCE = define("language.low-confidence", "the language is uncertain",
                        "the most likely language is {language} at probability "
                        "{probability:.2f}, below min_confidence {min_confidence:.2f} "
                        "(candidates: {candidates})")
UNDETERMINED = define("language.undetermined", "too little text to tell the language",
                      "the language cannot be determined: {why}")

_PROFILES = os.path.join(os.path.dirname(langdetect.__file__), "profiles")
KNOWN = frozenset(os.listdir(_PROFILES)) if os.path.isdir(_PROFILES) else frozenset()


class LanguageSettings(Section):
    """Allowed languages."""

    allowed: tuple[str, ...] = Field(min_length=1, description="langdetect language codes.",
                                     examples=[["en", "de"]])
    min_confidence: float = Field(0.80, ge=0.0, le=1.0, description="Hold documents whose "
                                  "most likely language is less probable than this.")
    min_chars: int = Field(200, ge=1, description="Below this many characters of text the "
                           "language is undetermined.")
    undetermined: Literal["quarantine", "warn", "allow"] | None = Field(
        None, description="What to do when the language cannot be determined; default: the "
        "section's action.", examples=["warn"])

    @field_validator("allowed")
    @classmethod
    def _known(cls, value: tuple[str, ...]) -> tuple[str, ...]:
        out = []
        for code in value:
            if not isinstance(code, str):
                raise ValueError(f"{code!r} is not a language code (quote it)")
            if KNOWN and code.lower() not in KNOWN:
                raise ValueError(f"unknown language code {code!r}; langdetect knows "
                                 f"{', '.join(sorted(KNOWN))}")
            out.append(code.lower())
        return tuple(out)


def sample(text: str) -> str:
    """Up to three 400-character windows (start, middle, end), cut at white space."""
    if len(text) <= WINDOW * WINDOWS:
        return text
    starts = [0, (len(text) - WINDOW) // 2, len(text) - WINDOW]
    parts = []
    for start in starts:
        chunk = text[start:start + WINDOW]
        if start:
            space = chunk.find(" ")
            chunk = chunk[space + 1:] if 0 <= space < 50 else chunk
        parts.append(chunk)
    return "\n".join(parts)


def measure(extraction: Extraction) -> dict[str, Any]:
    """Detect the language of a bounded sample (runs in the worker)."""
    text = extraction.text
    piece = sample(text)
    try:
        found = langdetect.detect_langs(piece)
    except LangDetectException:
        return {"chars": len(text), "languages": []}
    return {"chars": len(text),
            "languages": [[str(lang.lang), round(float(lang.prob), 4)] for lang in found]}


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding] | None:
    settings: LanguageSettings = policy.language
    measured = document.measures.get("language")
    if not document.has_text or measured is None:
        return None
    languages = measured["languages"]
    why = None
    if measured["chars"] < settings.min_chars:
        why = (f"the text has {measured['chars']} characters, fewer than "
               f"language.min_chars {settings.min_chars}")
    elif not languages:
        why = "the text has no letters that identify a language"
    if why is not None:
        if settings.undetermined == "allow":
            return []
        return [UNDETERMINED(why=why, chars=measured["chars"], action=settings.undetermined)]
    language, probability = languages[0]
    candidates = ", ".join(f"{lang} {prob:.2f}" for lang, prob in languages)
    findings = []
    if language not in settings.allowed:
        findings.append(NOT_ALLOWED(language=language, probability=probability,
                                    allowed=", ".join(settings.allowed)))
    elif probability < settings.min_confidence:
        findings.append(LOW_CONFIDENCE(language=language, probability=probability,
                                       min_confidence=settings.min_confidence,
                                       candidates=candidates))
    return findings


CHECK = DocumentCheck(id="language", section="language", evaluate=evaluate,
                      settings=LanguageSettings, measure=measure, measure_version=2,
                      doc=__doc__ or "")
