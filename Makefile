# Everything runs inside a project-local virtual environment, created on first use.
SHELL := /bin/bash
PYTHON ?= python3
VENV := .venv
BIN := $(VENV)/bin
STAMP := $(VENV)/.installed
DEMO_OUT := demo_models/build

.PHONY: demo serve test test-all lint format bench-align bench-train bench-decode bench-terms bench-tune bench-service clean

$(STAMP): pyproject.toml
	$(PYTHON) -m venv $(VENV)
	$(BIN)/pip install --quiet --upgrade pip
	$(BIN)/pip install --quiet -e '.[dev]'
	touch $(STAMP)

DEMO_MODEL := $(DEMO_OUT)/demo-en-es

## demo: set up, train the demo model on first use (under a minute), show what it learned and translate samples
demo: $(STAMP) $(DEMO_MODEL)/manifest.json
	$(BIN)/phrasework phrases $(DEMO_MODEL) --source "sync hub" --limit 3
	$(BIN)/phrasework phrases $(DEMO_MODEL) --source "workspace" --limit 3
	head -n 8 demo_models/corpus/test.en | $(BIN)/phrasework translate --model $(DEMO_MODEL) | paste -d '\n' <(head -n 8 demo_models/corpus/test.en | sed 's/^/  en: /') <(cat | sed 's/^/  es: /')

$(DEMO_MODEL)/manifest.json: $(STAMP) demo_models/corpus/train.en demo_models/corpus/train.es
	$(BIN)/phrasework train --source-file demo_models/corpus/train.en --target-file demo_models/corpus/train.es \
		--source-lang en --target-lang es --out $(DEMO_MODEL) --force

## serve: set up, train the demo model on first use, and serve it on http://127.0.0.1:8080 (Ctrl+C stops)
serve: $(STAMP) $(DEMO_MODEL)/manifest.json
	$(BIN)/phrasework serve --model $(DEMO_MODEL) --glossary-dir glossaries \
		--database $(DEMO_OUT)/glossaries.sqlite3 --bind 127.0.0.1:8080 --workers 2

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

## bench-*: benchmarks on the real UI-string corpus (results go to bench/RESULTS.md and the README)
bench-align: $(STAMP)
	$(BIN)/python bench/bench_align.py

bench-train: $(STAMP)
	$(BIN)/python bench/bench_train.py

bench-decode: $(STAMP)
	$(BIN)/python bench/bench_decode.py

bench-terms: $(STAMP)
	$(BIN)/python bench/bench_terms.py

bench-tune: $(STAMP)
	$(BIN)/python bench/bench_tune.py

bench-service: $(STAMP)
	$(BIN)/python bench/bench_service.py

clean:
	rm -rf $(VENV) $(DEMO_OUT) bench/work
