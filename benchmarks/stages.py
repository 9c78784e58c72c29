"""Shared by the benchmarks: the coordinating process's CPU time per stage of a run."""

from __future__ import annotations

import time


class StageClock:
    """A reporter that notes the calling process's CPU time (all its threads) per stage
    of the run: what the coordinator spends, whatever the workers do meanwhile."""

    def __init__(self) -> None:
        self.stages: dict[str, float] = {}
        self.current: str | None = "starting"  # discovery, warming the parsers up
        self.since = time.process_time()

    def stage(self, name: str, total: int | None) -> None:
        now = time.process_time()
        if self.current is not None:
            self.stages[self.current] = self.stages.get(self.current, 0.0) + now - self.since
        self.current, self.since = name, now

    def advance(self, path: str | None = None) -> None:
        pass

    def note(self, message: str) -> None:
        pass

    def per_document(self, docs: int) -> str:
        """``stage x.xx ms, ...`` per document."""
        return ", ".join(f"{name} {spent / docs * 1000:.2f} ms"
                         for name, spent in self.stages.items())
