# fitcheck: two entry points do all set-up on a fresh machine (python3 + make).
#   make app   -> virtual environment, then the app on http://127.0.0.1:8501 with the demo case
#   make test  -> virtual environment, then the whole test suite
PY      ?= python3
VENV    := .venv
BIN     := $(VENV)/bin
STAMP   := $(VENV)/.installed
PORT    ?= 8501

.PHONY: app test bench lint wheel clean

# The package is compiled to bytecode too: pip compiles only what it copies (not an editable
# install), and with PYTHONDONTWRITEBYTECODE set every app start would compile it again.
$(STAMP): pyproject.toml
	test -x $(BIN)/python || $(PY) -m venv $(VENV)
	$(BIN)/python -m pip install --quiet --upgrade pip
	$(BIN)/python -m pip install --quiet -e ".[test]"
	$(BIN)/python -m compileall -q fitcheck
	touch $(STAMP)

app: $(STAMP)
	$(BIN)/python -m streamlit run streamlit_app.py --server.address 127.0.0.1 --server.port $(PORT)

test: $(STAMP)
	$(BIN)/python -m pytest

bench: $(STAMP)
	$(BIN)/python bench/run_all.py

lint: $(STAMP)
	$(BIN)/python -m ruff check fitcheck tests bench streamlit_app.py

wheel: $(STAMP)
	$(BIN)/python -m build --wheel --outdir dist .

clean:
	rm -rf $(VENV) dist build .pytest_cache .hypothesis
