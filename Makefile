# make demo  - set up .venv and run gate on the bundled sample_docs/inbox/
# make test  - set up .venv with the test tools and run the test suite
# make lint  - run the linter (ruff, configured in pyproject.toml)
# make bench - run the benchmark scripts (they print figures)

PYTHON ?= python3
VENV   ?= .venv
BIN    := $(VENV)/bin
STAMP  := $(VENV)/.installed

.PHONY: demo test lint bench docs clean

$(STAMP): pyproject.toml constraints.txt
	$(PYTHON) -m venv $(VENV)
	$(BIN)/python -m pip install --quiet --upgrade pip
	$(BIN)/python -m pip install --quiet -c constraints.txt -e '.[test]'
	touch $(STAMP)

demo: $(STAMP)
	rm -rf demo-out
	$(BIN)/gate run sample_docs/inbox --policy policies/demo.yaml --out demo-out \
		--as-of 2026-12-01T00:00:00Z

test: $(STAMP)
	$(BIN)/python -m pytest -q

lint: $(STAMP)
	$(BIN)/ruff check gate tests benchmarks

bench: $(STAMP)
	$(BIN)/python benchmarks/throughput.py

docs: $(STAMP)
	$(BIN)/python -m gate.docsgen

clean:
	rm -rf demo-out bench-out .pytest_cache
