"""Building blocks for policy sections: strict models and the per-section action.

A leaf module (it imports nothing from gate), so the checks can declare their settings
without importing the policy package that is assembled from them."""

from __future__ import annotations

from typing import Literal

from pydantic import BaseModel, ConfigDict, Field

Action = Literal["quarantine", "warn"]


class Strict(BaseModel):
    """A policy model: unknown keys are errors, values are immutable after loading, and
    infinities and NaN are refused (every number has a finite range)."""

    model_config = ConfigDict(extra="forbid", frozen=True, allow_inf_nan=False)


class Section(Strict):
    """A policy section that switches one check on.

    ``action`` says what the check's findings do: ``quarantine`` holds the document,
    ``warn`` lets it through and lists the finding under ``warnings`` in the report, so a
    new rule can be rolled out and watched before it starts holding documents. Findings
    that mean a document could not be evaluated at all always quarantine.
    """

    action: Action = Field(
        "quarantine",
        description="What this check's findings do: quarantine the document, or only warn.",
        examples=["warn"])
