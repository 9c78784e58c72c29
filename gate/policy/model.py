"""The policy model, assembled from the settings model each check declares.

A section left out of the file switches its check off; ``limits`` always applies with its
defaults, and so does the format check.
"""

from __future__ import annotations

from typing import Any, Literal, Optional

from pydantic import Field, create_model, model_validator

from gate import checks
from gate.checks.format import LimitsSettings
from gate.settings import Strict


class PolicyBase(Strict):
    version: Literal[1] = Field(description="Policy format version; must be 1.")
    extends: str | None = Field(None, description="A base policy file this one builds on "
                                "(relative path); mappings merge, lists and values replace, "
                                "null removes.", examples=["base.yaml"])
    name: str = Field(min_length=1, max_length=200, description="Name recorded in every "
                      "provenance record.", examples=["example-policy"])
    description: str | None = Field(None, description="Free text for people.")
    limits: LimitsSettings = Field(default_factory=LimitsSettings,
                                   description="Resource limits; always apply.")

    @model_validator(mode="after")
    def _contradictions(self) -> PolicyBase:
        sources = getattr(self, "sources", None)
        if sources is None:
            return self
        denied = {getattr(r, "domain", None) for r in sources.deny} - {None}
        for index, rule in enumerate(sources.allow):
            domain = getattr(rule, "domain", None)
            if domain is None:
                continue
            parts = domain.split(".")
            for cut in range(len(parts)):
                if ".".join(parts[cut:]) in denied:
                    raise ValueError(
                        f"sources.allow[{index}] admits {domain}, but a deny rule covers "
                        f"{'.'.join(parts[cut:])} (deny beats allow, so the allow rule "
                        "could never match); remove one of them")
        return self


def _section_fields() -> dict[str, Any]:
    fields: dict[str, Any] = {}
    for check in checks.all_checks():
        if check.section is None or check.settings is None:
            continue
        summary = (check.doc.strip().splitlines() or [""])[0]
        fields[check.section] = (Optional[check.settings],  # noqa: UP045 - create_model
                                 Field(None, description=summary))
    return fields


Policy = create_model("Policy", __base__=PolicyBase, **_section_fields())
Policy.__doc__ = "A gate policy file."
