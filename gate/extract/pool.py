"""Worker processes with a CPU-time limit, a wall-clock backstop and a memory cap per task.

Parsers of untrusted bytes can loop forever or balloon (neither trafilatura nor pypdf can
interrupt itself), so each task runs in a long-lived worker process forked from the parent
after the heavy imports.

The limit that decides is **CPU time**, not elapsed time, so a decision does not depend on
how busy the machine is: the same document uses the same CPU time on an idle and on a
saturated machine, while its elapsed time can grow many times over. Before each task the
worker arms a CPU-time timer (``ITIMER_PROF``, the process's user + system time) for
``timeout_s``; when it fires, the task is abandoned with a ``timeout`` result. In case the
worker is stuck where the timer cannot interrupt it (inside one long C call), ``RLIMIT_CPU``
is set a little above the task's allowance, so the kernel ends the worker. The parent keeps
a generous wall-clock backstop (:data:`WALL_FACTOR` times the CPU allowance plus
:data:`WALL_SLACK_S`) for a worker that sleeps or hangs without using CPU. When it passes,
the parent reads the worker's CPU time (``/proc/PID/stat``): a worker still making progress
within its CPU allowance (a starved one on a saturated machine) gets another period; one
that used next to no CPU in the period is killed with SIGKILL and replaced. Either way its
task comes back as a :class:`Failure` instead of a result. Each worker caps its own address space
(``RLIMIT_AS``) so a decompression bomb ends in a ``MemoryError`` inside the worker rather
than in the machine's OOM killer. Workers are recycled after a number of messages (a task,
or a batch of small ones: a batch of tiny documents exercises a parser less than one large
document) so slow leaks in a parser cannot accumulate.

The parent must not hold threads when it forks (a forked child inherits locks held by
threads that do not exist in it), so callers refresh progress displays themselves instead
of using background refresh threads.
"""

from __future__ import annotations

import multiprocessing
import os
import resource
import signal
import time
from collections import deque
from collections.abc import Callable, Iterable, Iterator
from dataclasses import dataclass
from multiprocessing.connection import Connection, wait
from typing import Any

WALL_FACTOR = 4  # the wall-clock backstop, in multiples of the CPU-time allowance
WALL_SLACK_S = 5.0  # plus this, for start-up and a busy machine
RLIMIT_GRACE_S = 2  # RLIMIT_CPU above the task's allowance, for the timer to act first


class CpuTimeExceeded(BaseException):
    """Raised in a worker by the CPU-time timer. A BaseException, so that a parser's
    ``except Exception`` cannot swallow it."""


def _on_cpu_timer(_signum: int, _frame: Any) -> None:
    raise CpuTimeExceeded


def _cpu_seconds() -> float:
    usage = resource.getrusage(resource.RUSAGE_SELF)
    return usage.ru_utime + usage.ru_stime


def _arm(cpu_s: float) -> None:
    """Allow the coming task ``cpu_s`` seconds of CPU time (see the module docstring)."""
    signal.setitimer(signal.ITIMER_PROF, cpu_s)
    hard = resource.getrlimit(resource.RLIMIT_CPU)[1]
    soft = int(_cpu_seconds() + cpu_s) + RLIMIT_GRACE_S
    if hard != resource.RLIM_INFINITY:
        soft = min(soft, hard)
    resource.setrlimit(resource.RLIMIT_CPU, (soft, hard))


def _disarm() -> None:
    signal.setitimer(signal.ITIMER_PROF, 0)


_TICK = os.sysconf("SC_CLK_TCK")
MIN_PROGRESS = 0.02  # share of a core a worker must have used in a backstop period


def _process_cpu(pid: int | None) -> float | None:
    """CPU seconds (user + system) a process has used, from /proc; None if unknown."""
    if pid is None:
        return None
    try:
        with open(f"/proc/{pid}/stat", encoding="ascii") as fh:
            fields = fh.read().rsplit(")", 1)[1].split()
        return (int(fields[11]) + int(fields[12])) / _TICK  # utime, stime (man 5 proc)
    except (OSError, ValueError, IndexError):
        return None


@dataclass(frozen=True)
class Failure:
    """A task that produced no result: ``kind`` is timeout, crashed or memory."""

    kind: str
    detail: str


def _address_space() -> int:
    with open("/proc/self/statm", encoding="ascii") as fh:
        pages = int(fh.read().split()[0])
    return pages * os.sysconf("SC_PAGE_SIZE")


def _one(fn: Callable[[Any], Any], payload: Any, cpu_s: float) -> tuple[str, Any]:
    """Run one task under its CPU-time allowance; (status, value)."""
    try:
        try:
            _arm(cpu_s)
            return "ok", fn(payload)
        finally:
            _disarm()
    except CpuTimeExceeded:
        return "timeout", f"used more than {cpu_s:g} s of CPU time"
    except MemoryError:
        return "memory", "the task ran out of its memory allowance"
    except BaseException as err:  # noqa: BLE001 - reported to the parent, which fails closed
        return "error", f"{type(err).__name__}: {err}"


def _serve(conn: Connection, fn: Callable[[Any], Any], memory_bytes: int | None,
           cpu_s: float) -> None:
    signal.signal(signal.SIGINT, signal.SIG_IGN)  # the parent decides about interrupts
    signal.signal(signal.SIGPROF, _on_cpu_timer)
    if memory_bytes:
        _, hard = resource.getrlimit(resource.RLIMIT_AS)
        limit = _address_space() + memory_bytes
        if hard != resource.RLIM_INFINITY:
            limit = min(limit, hard)  # never more than the process may have anyway
        resource.setrlimit(resource.RLIMIT_AS, (limit, hard))
    resource.setrlimit(resource.RLIMIT_CORE, (0, 0))
    while True:
        try:
            message = conn.recv()
        except (EOFError, OSError):
            break
        if message is None:
            break
        results: list[tuple[int, tuple[str, Any]]] = []
        fresh = False
        for task_id, payload in message:
            if fresh:  # after a time-out or MemoryError the rest run in a fresh worker
                results.append((task_id, ("retry", None)))
                continue
            result = _one(fn, payload, cpu_s)
            results.append((task_id, result))
            fresh = result[0] in ("memory", "timeout")
        try:
            conn.send(results)
        except MemoryError:
            conn.send([(task_id, ("memory", "the result was too large to return"))
                       for task_id, _result in results])
        if fresh:
            break  # the heap may be fragmented or half-built: start afresh
    conn.close()
    os._exit(0)


class _Worker:
    def __init__(self, ctx: Any, fn: Callable, memory_bytes: int | None, cpu_s: float):
        self.conn, child = ctx.Pipe(duplex=True)
        self.process = ctx.Process(target=_serve, args=(child, fn, memory_bytes, cpu_s),
                                   daemon=True)
        self.process.start()
        child.close()
        self.task: Any = None
        self.deadline = 0.0
        self.done = 0
        self.cpu_start = 0.0  # the worker's CPU time when its task was sent
        self.cpu_mark = 0.0  # ... at the last backstop check

    def started(self, wall_s: float) -> None:
        self.deadline = time.monotonic() + wall_s
        self.cpu_start = self.cpu_mark = _process_cpu(self.process.pid) or 0.0

    def progressing(self, cpu_s: float, wall_s: float) -> bool:
        """At the backstop: is the task still using CPU within its allowance? If so the
        deadline moves on by another period."""
        cpu = _process_cpu(self.process.pid)
        if cpu is None:
            return False
        progress, self.cpu_mark = cpu - self.cpu_mark, cpu
        if cpu - self.cpu_start < cpu_s and progress >= MIN_PROGRESS * wall_s:
            self.deadline = time.monotonic() + wall_s
            return True
        return False

    def kill(self) -> None:
        try:
            self.process.kill()
        except (OSError, AttributeError):
            pass
        self.process.join(5)
        self.conn.close()

    def stop(self) -> None:
        try:
            self.conn.send(None)
        except OSError:
            pass
        self.process.join(2)
        if self.process.is_alive():
            self.kill()
        else:
            self.conn.close()


class WorkerPool:
    """Run ``fn(task)`` for each task in worker processes; see the module docstring.
    ``timeout_s`` is the CPU time a task may use; the wall-clock backstop derives from it."""

    def __init__(self, fn: Callable[[Any], Any], *, workers: int, timeout_s: float,
                 memory_bytes: int | None, recycle_after: int = 250,
                 start_method: str = "fork",
                 batch_weight: Callable[[Any], int] | None = None,
                 batch_bytes: int = 64 << 10, batch_max: int = 32):
        self.fn = fn
        self.batch_weight = batch_weight  # payload -> bytes; None: one task a message
        self.batch_bytes = batch_bytes
        self.batch_max = batch_max
        self.size = max(1, workers)
        self.timeout_s = timeout_s
        self.wall_s = WALL_FACTOR * timeout_s + WALL_SLACK_S
        self.memory_bytes = memory_bytes
        self.recycle_after = recycle_after
        # fork after the heavy imports is fastest; a multi-threaded host (a Dask worker)
        # must use "spawn" instead
        self._ctx = multiprocessing.get_context(start_method)
        self._workers: list[_Worker] = []
        # workers waiting for a message: kept from one run() to the next, so a run's
        # several passes (extraction, templates, placement batches) fork them once
        self._idle: deque[_Worker] = deque()

    def __enter__(self) -> WorkerPool:
        return self

    def __exit__(self, *exc: object) -> None:
        self.close()

    def close(self) -> None:
        for worker in self._workers:
            if worker.task is not None:
                worker.kill()
            else:
                worker.stop()
        self._workers = []
        self._idle.clear()

    def _spawn(self) -> _Worker:
        worker = _Worker(self._ctx, self.fn, self.memory_bytes, self.timeout_s)
        self._workers.append(worker)
        return worker

    def _retire(self, worker: _Worker, kill: bool) -> None:
        self._workers.remove(worker)
        if worker in self._idle:
            self._idle.remove(worker)
        if kill:
            worker.kill()
        else:
            worker.stop()

    def run(self, tasks: Iterable[tuple[Any, Any]]) -> Iterator[tuple[Any, Any]]:
        """Run ``fn(payload)`` for each ``(tag, payload)``; yield ``(tag, result)`` in
        completion order. Only the payload crosses to the worker; ``result`` may be a
        :class:`Failure`.

        Small payloads (by ``batch_weight``) travel to a worker in batches of up to
        ``batch_max`` tasks and ``batch_bytes`` bytes, to save a pipe round trip per tiny
        document. Each task of a batch still gets its own CPU-time allowance. Should a
        batch's worker die or hang, its tasks are run again one by one, so the task
        responsible gets the failure and the others their normal result."""
        pending = iter(tasks)
        queue: deque[tuple[Any, Any, bool]] = deque()  # (tag, payload, alone)
        idle = self._idle
        busy: dict[Connection, _Worker] = {}
        state = {"exhausted": False, "next_id": 0}

        def pull() -> tuple[Any, Any, bool] | None:
            if queue:
                return queue.popleft()
            if state["exhausted"]:
                return None
            try:
                tag, payload = next(pending)
            except StopIteration:
                state["exhausted"] = True
                return None
            return tag, payload, False

        def small(item: tuple[Any, Any, bool]) -> int | None:
            if item[2] or self.batch_weight is None:
                return None
            size = self.batch_weight(item[1])
            return size if size <= self.batch_bytes else None

        def next_batch() -> list[tuple[Any, Any, int]]:
            first = pull()
            if first is None:
                return []
            batch = [first]
            total = small(first)
            while total is not None and len(batch) < self.batch_max:
                item = pull()
                if item is None:
                    break
                size = small(item)
                if size is None or total + size > self.batch_bytes:
                    queue.appendleft(item)  # it goes alone or starts the next batch
                    break
                batch.append(item)
                total += size
            out = []
            for tag, payload, _alone in batch:
                out.append((tag, payload, state["next_id"]))
                state["next_id"] += 1
            return out

        def fill() -> None:
            """Send each idle worker its next batch."""
            while len(busy) < self.size:
                batch = next_batch()
                if not batch:
                    break
                worker = idle.popleft() if idle else self._spawn()
                message = [(task_id, payload) for _tag, payload, task_id in batch]
                try:
                    worker.conn.send(message)
                except (OSError, ValueError):
                    # the worker died between tasks; replace it and retry once
                    self._retire(worker, kill=True)
                    worker = self._spawn()
                    worker.conn.send(message)
                worker.task = batch
                worker.started(self.wall_s)
                busy[worker.conn] = worker

        while True:
            fill()
            if not busy:
                return
            now = time.monotonic()
            soonest = min(w.deadline for w in busy.values())
            ready = wait(list(busy), timeout=max(0.0, soonest - now))
            done: list[tuple[Any, Any]] = []  # handed on once the workers have work again
            for conn in ready:
                worker = busy.pop(conn)
                batch, worker.task = worker.task, None
                try:
                    replies = dict(conn.recv())
                except (EOFError, OSError, ConnectionError):
                    code = worker.process.exitcode
                    worker.process.join(1)
                    code = worker.process.exitcode if code is None else code
                    self._retire(worker, kill=True)
                    if len(batch) > 1:  # find the culprit: run them again one by one
                        queue.extendleft((tag, payload, True)
                                         for tag, payload, _id in reversed(batch))
                    elif code == -signal.SIGXCPU:  # RLIMIT_CPU: the timer could not act
                        done.append((batch[0][0], Failure(
                            "timeout", f"used more than {self.timeout_s:g} s of CPU time")))
                    else:
                        done.append((batch[0][0], Failure("crashed", _death(code))))
                    continue
                worker.done += 1  # messages: a batch of small tasks counts once
                statuses = {status for status, _value in replies.values()}
                if statuses & {"memory", "timeout"} or worker.done >= self.recycle_after:
                    self._retire(worker, kill=bool(statuses & {"memory", "timeout"}))
                else:
                    idle.append(worker)
                for tag, payload, task_id in batch:
                    status, value = replies[task_id]
                    if status == "retry":
                        queue.append((tag, payload, True))
                    elif status == "ok":
                        done.append((tag, value))
                    elif status in ("memory", "timeout"):
                        done.append((tag, Failure(status, value)))
                    else:
                        done.append((tag, Failure("error", value)))
            # a worker that answered gets its next batch before the answers are handed on,
            # so it works while the caller digests them instead of waiting for the caller
            fill()
            yield from done
            now = time.monotonic()
            for conn, worker in list(busy.items()):
                if worker.deadline <= now and conn not in ready and \
                        not worker.progressing(self.timeout_s * len(worker.task), self.wall_s):
                    busy.pop(conn)
                    batch, worker.task = worker.task, None
                    self._retire(worker, kill=True)
                    if len(batch) > 1:
                        queue.extendleft((tag, payload, True)
                                         for tag, payload, _id in reversed(batch))
                        continue
                    yield batch[0][0], Failure("timeout", f"no result within {self.wall_s:g} "
                                                          "s of elapsed time (the wall-clock "
                                                          "backstop)")


def _death(code: int | None) -> str:
    if code is None:
        return "the worker process stopped answering"
    if code < 0:
        try:
            name = signal.Signals(-code).name
        except ValueError:
            name = f"signal {-code}"
        return f"the worker process was killed by {name}"
    return f"the worker process exited with status {code}"
