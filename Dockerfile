# phrasework HTTP service with the demo model (invented English -> Spanish help-centre corpus).
#
#   docker build -t phrasework .
#   python -m service.keys --scope translate --scope glossaries      # prints a key and its hash line
#   docker run --rm -p 8080:8080 -e PHRASEWORK_API_KEYS='<hash line>' -v phrasework-data:/var/lib/phrasework phrasework
#   curl -H 'Authorization: Bearer <key>' -H 'Content-Type: application/json' \
#        -d '{"segments": ["Open the dashboard."]}' http://127.0.0.1:8080/v1/translations
#
# The container listens on 0.0.0.0, so it refuses to start without API keys (PHRASEWORK_API_KEYS, hash lines
# separated by ";" or newlines, or PHRASEWORK_API_KEYS_FILE pointing at a mounted file). Uploaded glossaries
# live in /var/lib/phrasework (mount a volume to keep them). PHRASEWORK_WORKERS sets the worker count (default 2,
# about one per core). No Docker engine runs on CI; this file is kept simple and is documented in service/README.md.
FROM python:3.11-slim

ENV PYTHONDONTWRITEBYTECODE=1 \
    PYTHONUNBUFFERED=1 \
    PIP_NO_CACHE_DIR=1 \
    PIP_DISABLE_PIP_VERSION_CHECK=1

RUN useradd --create-home --uid 10001 --shell /usr/sbin/nologin phrasework

WORKDIR /opt/phrasework
COPY pyproject.toml README.md ./
COPY decoder ./decoder
COPY service ./service
COPY glossaries ./glossaries
COPY demo_models/corpus ./demo_models/corpus

# Install, then build the demo model once at image build time (about a minute), so the container starts fast.
RUN pip install . \
    && phrasework train --source-file demo_models/corpus/train.en --target-file demo_models/corpus/train.es \
        --source-lang en --target-lang es --out /opt/phrasework/models/demo-en-es --workers 2 \
    && mkdir -p /var/lib/phrasework \
    && chown phrasework:phrasework /var/lib/phrasework

USER phrasework
VOLUME ["/var/lib/phrasework"]
EXPOSE 8080

# Python's standard library only: the slim image has no curl.
HEALTHCHECK --interval=30s --timeout=5s --start-period=60s --retries=3 \
    CMD ["python", "-c", "import sys, urllib.request; sys.exit(urllib.request.urlopen('http://127.0.0.1:8080/healthz', timeout=4).status != 200)"]

CMD ["phrasework", "serve", "--model", "/opt/phrasework/models/demo-en-es", \
     "--glossary-dir", "/opt/phrasework/glossaries", \
     "--database", "/var/lib/phrasework/glossaries.sqlite3", \
     "--bind", "0.0.0.0:8080"]
