"""language: is the text in a language the index serves?

The whole text is read. It is cut into chunks at paragraph breaks (about 600 characters),
every chunk is identified with langdetect's own language profiles, and the document's
*share* of each language is the chunks' verdicts weighted by the letters they hold
(``gate/langid.py`` says exactly how; Latin letters and other scripts in one chunk are
judged apart, so identifiers in a Japanese page do not outvote it). A page that is mostly
Spanish with untranslated English option lists is therefore judged Spanish, and a page that
switches language part-way shows both languages with their shares.

The most likely language is the one with the largest share. A document is held when that
language is not in ``allowed``, when its share is below ``min_confidence`` (the text is too
mixed or too unclear to say), or, if ``min_allowed_share`` is set, when the allowed
languages together make up less than that share of the text. Text shorter than
``min_chars`` is *undetermined*; ``undetermined`` says what that means (``quarantine``,
``warn`` or ``allow``; left out, the section's ``action`` decides). Text with no letters at
all is undetermined too.

Codes are langdetect's: ISO 639-1 (``en``, ``de``, ``fr`` ...) plus ``zh-cn`` and ``zh-tw``.

Example::

    language:
      allowed: [en, de]
      min_confidence: 0.80
      min_allowed_share: 0.90
      min_chars: 200
      undetermined: warn
"""

from __future__ import annotations

import os
from typing import Any, Literal

import langdetect
from pydantic import Field, field_validator

from gate.checks.base import Document, DocumentCheck, RunContext
from gate.extract.model import Extraction
from gate.findings import Finding, define
from gate.langid import identify
from gate.settings import Section

NOT_ALLOWED = define("language.not-allowed", "the text is in a language not allowed",
                     "the text is mostly {language} ({probability:.0%} of it); the policy "
                     "allows {allowed}")
LOW_CONFIDENCE = define("language.low-confidence", "the language is uncertain",
                        "the most likely language is {language}, but only {probability:.0%} "
                        "of the text is in it, below min_confidence {min_confidence:.2f} "
                        "(shares: {candidates})")
MIXED = define("language.mixed", "too much of the text is in other languages",
               "only {allowed_share:.0%} of the text is in allowed languages ({allowed}), "
               "below min_allowed_share {min_allowed_share:.2f} (shares: {candidates})")
UNDETERMINED = define("language.undetermined", "too little text to tell the language",
                      "the language cannot be determined: {why}")

_PROFILES = os.path.join(os.path.dirname(langdetect.__file__), "profiles")
KNOWN = frozenset(os.listdir(_PROFILES)) if os.path.isdir(_PROFILES) else frozenset()


class LanguageSettings(Section):
    """Allowed languages."""

    allowed: tuple[str, ...] = Field(min_length=1, description="langdetect language codes.",
                                     examples=[["en", "de"]])
    min_confidence: float = Field(0.80, ge=0.0, le=1.0, description="Hold documents whose "
                                  "most likely language makes up a smaller share of the "
                                  "text than this.")
    min_allowed_share: float | None = Field(
        None, ge=0.0, le=1.0, description="Hold documents in which the allowed languages "
        "together make up a smaller share of the text than this; left out, only the most "
        "likely language is judged.", examples=[0.9])
    min_chars: int = Field(200, ge=1, le=100_000_000, description="Below this many "
                           "characters of text the language is undetermined.")
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


def measure(extraction: Extraction) -> dict[str, Any]:
    """The share of each language in the whole text (runs in the worker)."""
    text = extraction.text
    found = identify(text)
    return {"chars": len(text), "letters": found.letters, "chunks": found.chunks,
            "languages": [[lang, share] for lang, share in found.shares]}


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
    allowed = ", ".join(settings.allowed)
    findings = []
    if language not in settings.allowed:
        findings.append(NOT_ALLOWED(language=language, probability=probability,
                                    allowed=allowed, candidates=candidates))
    elif probability < settings.min_confidence:
        findings.append(LOW_CONFIDENCE(language=language, probability=probability,
                                       min_confidence=settings.min_confidence,
                                       candidates=candidates))
    share = round(sum(p for lang, p in languages if lang in settings.allowed), 4)
    if language in settings.allowed and settings.min_allowed_share is not None and \
            share < settings.min_allowed_share:
        findings.append(MIXED(allowed_share=share, allowed=allowed, candidates=candidates,
                              min_allowed_share=settings.min_allowed_share))
    return findings


CHECK = DocumentCheck(id="language", section="language", evaluate=evaluate,
                      settings=LanguageSettings, measure=measure, measure_version=3,
                      doc=__doc__ or "")
