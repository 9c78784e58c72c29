"""The per-document work done in a worker process: extract, then measure.

:func:`process` takes a document's bytes (the parent has already read and hashed them) and
returns a plain, picklable dict. It is the only function the worker pool, and a cluster
scheduler, needs to run; it never touches the file system.
"""

from __future__ import annotations

import dataclasses
import hashlib
import json
import time
from dataclasses import dataclass
from typing import Any

from gate import __version__
from gate import checks
from gate.extract import EXTRACT_VERSION, extract
from gate.templates import TEMPLATES_VERSION, block_summary, compose


@dataclass(frozen=True)
class Params:
    """The limits that change what extraction produces (part of the cache key)."""

    max_pages: int
    max_nesting: int
    timeout_s: float
    memory_mb: int

    def fingerprint(self) -> str:
        """Identifies gate's version, the measurements' versions and these limits."""
        material = {"gate": __version__, "extract": EXTRACT_VERSION, "params": self.__dict__,
                    "templates": TEMPLATES_VERSION,
                    "measures": {c.id: c.measure_version for c in checks.all_checks()
                                 if c.measure is not None}}
        blob = json.dumps(material, sort_keys=True).encode("utf-8")
        return hashlib.sha256(blob).hexdigest()[:16]


# The worker's own CPU clock for the timings: in a pool worker a CPU-time timer
# (ITIMER_PROF, gate.extract.pool) is armed, and while it is, the kernel answers the
# process's CPU clock (time.process_time) from a sum it updates only now and then, so short
# spans read far too small (a tiny note's extraction and checks read about a third of
# their CPU time, the rest fell "outside" them). The thread's clock is read exactly, and a
# worker runs one thread.
_cpu = time.thread_time


def process(task: tuple[Any, ...]) -> dict[str, Any]:
    """Extract and measure one document. Bad input is reported, never raised.

    A fourth element names the page's site-template blocks (:mod:`gate.templates`): they
    are removed from the text before it is measured, and the result is that text's. When
    it is None, the page is only extracted for its blocks (its site's template is not
    known yet) and nothing is measured. A fifth is the text that extraction gave before
    (an HTML page's trafilatura text is then not computed again)."""
    _path, data, params = task[:3]
    template = task[3] if len(task) > 3 else ()
    earlier = task[4] if len(task) > 4 else None
    measure = template is not None
    started = _cpu()
    # a page extracted for its blocks only comes back to be measured: what its tree gave
    # is kept for that (a 32nd of the memory a document may use)
    extraction = extract(data, max_pages=params.max_pages, max_nesting=params.max_nesting,
                         main_text=earlier,
                         remember=0 if measure else params.memory_mb * 1024 * 1024 // 32)
    blocks = block_summary(extraction.blocks) if extraction.summary.ok else {}
    removed: dict[str, Any] = {}
    timings = {"extract": _cpu() - started}
    if extraction.summary.ok and measure and template:
        started = _cpu()
        extraction.text, removed = compose(extraction.text, extraction.blocks, template)
        extraction.summary = dataclasses.replace(extraction.summary, template=removed,
                                                 text_chars=len(extraction.text))
        timings["templates"] = _cpu() - started
    measures: dict[str, Any] = {}
    errors: dict[str, str] = {}
    if extraction.summary.ok and measure:
        for check in checks.all_checks():
            if check.measure is None:
                continue
            started = _cpu()
            try:
                measures[check.id] = check.measure(extraction)
            except MemoryError:
                raise
            except Exception as err:  # noqa: BLE001 - recorded; the parent fails closed
                errors[check.id] = f"{type(err).__name__}: {err}"
            timings[check.id] = _cpu() - started
    # timings are for benchmarks only: they never reach the cache, decisions or the report
    return {"extracted": extraction.summary.to_json(), "text": extraction.text,
            "measures": measures, "measure_errors": errors, "timings": timings,
            "blocks": blocks, "measured": measure}


def warm_up() -> None:
    """Load what every worker needs before forking (language profiles, parsers)."""
    from gate import langid

    langid.profiles()  # about 20 MB of arrays, shared with the forked workers
    import gate.extract.html
    import gate.extract.mail
    import gate.extract.office
    import gate.extract.pdf
    import gate.extract.text  # noqa: F401
