"""Peak memory of a process tree, sampled from /proc (Linux).

Two figures: the sum of RSS (pages shared copy-on-write between a parent and its forked
workers count once per process, so it overstates), and the sum of PSS from
/proc/PID/smaps_rollup (each shared page is split between the processes sharing it, so
the sum is the memory the tree really occupies).
"""

from __future__ import annotations

import os
import threading
import time


def _scan() -> tuple[dict[int, list[int]], dict[int, int]]:
    """One pass over /proc: parent pid -> child pids, and pid -> RSS in bytes."""
    children: dict[int, list[int]] = {}
    rss: dict[int, int] = {}
    page = os.sysconf("SC_PAGE_SIZE")
    for entry in os.listdir("/proc"):
        if not entry.isdigit():
            continue
        try:
            with open(f"/proc/{entry}/stat", encoding="ascii", errors="replace") as fh:
                fields = fh.read().rsplit(")", 1)[1].split()
        except OSError:
            continue
        pid, ppid = int(entry), int(fields[1])
        children.setdefault(ppid, []).append(pid)
        rss[pid] = int(fields[21]) * page
    return children, rss


def _tree(root_pid: int, children: dict[int, list[int]]) -> list[int]:
    out, stack = [], [root_pid]
    while stack:
        pid = stack.pop()
        out.append(pid)
        stack.extend(children.get(pid, []))
    return out


def _pss(pid: int) -> int:
    try:
        with open(f"/proc/{pid}/smaps_rollup", encoding="ascii") as fh:
            for line in fh:
                if line.startswith("Pss:"):
                    return int(line.split()[1]) * 1024
    except OSError:
        pass
    return 0


def tree_memory(root_pid: int) -> tuple[int, int]:
    """(RSS sum, PSS sum) of a process and all its descendants, bytes."""
    children, rss = _scan()
    pids = _tree(root_pid, children)
    return sum(rss.get(pid, 0) for pid in pids), sum(_pss(pid) for pid in pids)


class Sampler(threading.Thread):
    """Samples the tree every 50 ms until stopped; ``peak`` is the highest RSS sum and
    ``peak_pss`` the highest PSS sum (see the module docstring)."""

    def __init__(self, pid: int):
        super().__init__(daemon=True)
        self.pid, self.peak, self.peak_pss, self.running = pid, 0, 0, True

    def run(self) -> None:
        while self.running:
            rss, pss = tree_memory(self.pid)
            self.peak, self.peak_pss = max(self.peak, rss), max(self.peak_pss, pss)
            time.sleep(0.05)

    def stop(self) -> int:
        self.running = False
        self.join()
        return self.peak
