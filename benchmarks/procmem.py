"""Peak resident memory of a process tree, sampled from /proc (Linux)."""

from __future__ import annotations

import os
import threading
import time


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
    """Samples tree_rss(pid) every 20 ms until stopped; ``peak`` holds the maximum.

    Pages shared copy-on-write between a parent and its forked workers are counted once
    per process, so the figure errs on the high side.
    """

    def __init__(self, pid: int):
        super().__init__(daemon=True)
        self.pid, self.peak, self.running = pid, 0, True

    def run(self) -> None:
        while self.running:
            self.peak = max(self.peak, tree_rss(self.pid))
            time.sleep(0.02)

    def stop(self) -> int:
        self.running = False
        self.join()
        return self.peak
