"""One run per output folder: an advisory lock that dies with its holder.

``flock`` locks are released by the kernel when the process holding them ends, however it
ends (SIGKILL, power loss aside, a crash), so a lock left by a killed run is never "stale":
the next run simply gets it. The file records who holds it, for the refusal message.
"""

from __future__ import annotations

import fcntl
import json
import os
import socket
import time
from pathlib import Path

from gate.errors import LockError


class RunLock:
    def __init__(self, path: Path):
        self.path = path
        self.fd: int | None = None

    def acquire(self) -> None:
        self.path.parent.mkdir(parents=True, exist_ok=True)
        fd = os.open(self.path, os.O_RDWR | os.O_CREAT, 0o644)
        try:
            fcntl.flock(fd, fcntl.LOCK_EX | fcntl.LOCK_NB)
        except BlockingIOError:
            try:
                holder = json.loads(os.pread(fd, 4096, 0) or b"{}")
            except ValueError:
                holder = {}
            os.close(fd)
            who = ""
            if holder:
                who = (f" (pid {holder.get('pid')} on {holder.get('host')}, started "
                       f"{holder.get('started')})")
            raise LockError(f"another gate run is using {self.path.parent.parent}{who}. "
                            "Wait for it to finish; only one run may write an output "
                            "folder at a time.") from None
        os.ftruncate(fd, 0)
        os.pwrite(fd, json.dumps({"pid": os.getpid(), "host": socket.gethostname(),
                                  "started": time.strftime("%Y-%m-%dT%H:%M:%SZ",
                                                           time.gmtime())}).encode(), 0)
        self.fd = fd

    def release(self) -> None:
        if self.fd is not None:
            fcntl.flock(self.fd, fcntl.LOCK_UN)
            os.close(self.fd)
            self.fd = None

    def __enter__(self) -> RunLock:
        self.acquire()
        return self

    def __exit__(self, *exc: object) -> None:
        self.release()
