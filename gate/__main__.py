"""Allow ``python -m gate``."""

from gate.cli import main

main()
