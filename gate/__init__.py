"""gate: a provenance-checking ingestion gate for retrieval corpora."""

__version__ = "0.1.0"
