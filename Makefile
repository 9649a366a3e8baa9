# Everything runs inside a project-local virtual environment, created on first use.
PYTHON ?= python3
VENV := .venv
BIN := $(VENV)/bin
STAMP := $(VENV)/.installed
DEMO_OUT := demo_models/build

.PHONY: demo test test-all lint format bench-align clean

$(STAMP): pyproject.toml
	$(PYTHON) -m venv $(VENV)
	$(BIN)/pip install --quiet --upgrade pip
	$(BIN)/pip install --quiet -e '.[dev]'
	touch $(STAMP)

## demo: set up, align the demo corpus and show a few aligned pairs
demo: $(STAMP)
	mkdir -p $(DEMO_OUT)
	$(BIN)/phrasework align --source-file demo_models/corpus/train.en --target-file demo_models/corpus/train.es \
		--source-lang en --target-lang es --out $(DEMO_OUT)/train.align --show 5

## test: the default test suite (what CI runs)
test: $(STAMP)
	$(BIN)/ruff check .
	$(BIN)/python -m pytest

## test-all: also the slow tests
test-all: $(STAMP)
	$(BIN)/python -m pytest -m "slow or not slow"

lint: $(STAMP)
	$(BIN)/ruff check .

format: $(STAMP)
	$(BIN)/ruff format decoder service tests bench

## bench-align: the alignment benchmark on the real UI-string corpus (see bench/README.md)
bench-align: $(STAMP)
	$(BIN)/python bench/bench_align.py

clean:
	rm -rf $(VENV) $(DEMO_OUT) bench/work
