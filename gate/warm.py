"""Imported by the fork server of a cluster node's worker pool (:mod:`gate.cluster`): the
parsers and language profiles are loaded once there, and every worker forked from it
starts warm instead of importing them again."""

from gate.work import warm_up

warm_up()
