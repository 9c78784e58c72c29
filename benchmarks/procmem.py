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


def _descendants(root_pid: int) -> list[int]:
    children: dict[int, list[int]] = {}
    for entry in os.listdir("/proc"):
        if not entry.isdigit():
            continue
        try:
            with open(f"/proc/{entry}/stat", encoding="ascii", errors="replace") as fh:
                fields = fh.read().rsplit(")", 1)[1].split()
        except OSError:
            continue
        children.setdefault(int(fields[1]), []).append(int(entry))
    out, stack = [], [root_pid]
    while stack:
        pid = stack.pop()
        out.append(pid)
        stack.extend(children.get(pid, []))
    return out


def tree_pss(root_pid: int) -> int:
    """Proportional set size of a process and its descendants, bytes."""
    total = 0
    for pid in _descendants(root_pid):
        try:
            with open(f"/proc/{pid}/smaps_rollup", encoding="ascii") as fh:
                for line in fh:
                    if line.startswith("Pss:"):
                        total += int(line.split()[1]) * 1024
                        break
        except OSError:
            continue
    return total


def tree_rss(root_pid: int) -> int:
    """Resident memory of a process and all its descendants, bytes."""
    children: dict[int, list[int]] = {}
    rss: dict[int, int] = {}
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
        rss[pid] = int(fields[21]) * os.sysconf("SC_PAGE_SIZE")
    total, stack = 0, [root_pid]
    while stack:
        pid = stack.pop()
        total += rss.get(pid, 0)
        stack.extend(children.get(pid, []))
    return total


class Sampler(threading.Thread):
    """Samples the tree every 50 ms until stopped; ``peak`` is the highest RSS sum and
    ``peak_pss`` the highest PSS sum (see the module docstring)."""

    def __init__(self, pid: int):
        super().__init__(daemon=True)
        self.pid, self.peak, self.peak_pss, self.running = pid, 0, 0, True

    def run(self) -> None:
        while self.running:
            self.peak = max(self.peak, tree_rss(self.pid))
            self.peak_pss = max(self.peak_pss, tree_pss(self.pid))
            time.sleep(0.05)

    def stop(self) -> int:
        self.running = False
        self.join()
        return self.peak
