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
        self.walls: dict[str, float] = {}  # elapsed time per stage, beside the CPU time
        self.wall_since = time.perf_counter()

    def stage(self, name: str, total: int | None) -> None:
        now, wall = time.process_time(), time.perf_counter()
        if self.current is not None:
            self.stages[self.current] = self.stages.get(self.current, 0.0) + now - self.since
            self.walls[self.current] = self.walls.get(self.current, 0.0) + wall - self.wall_since
        self.current, self.since, self.wall_since = name, now, wall

    def advance(self, path: str | None = None) -> None:
        pass

    def note(self, message: str) -> None:
        pass

    def per_document(self, docs: int) -> str:
        """``stage x.xx ms, ...`` per document."""
        return ", ".join(f"{name} {spent / docs * 1000:.2f} ms"
                         for name, spent in self.stages.items())

    def wall_per_document(self, docs: int) -> str:
        """``stage x.xx ms, ...`` of elapsed time per document."""
        return ", ".join(f"{name} {spent / docs * 1000:.2f} ms"
                         for name, spent in self.walls.items())
