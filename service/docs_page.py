"""GET /docs: the OpenAPI document rendered as one self-contained HTML page.

No scripts, fonts or stylesheets from elsewhere (machines running the service may be offline, and a page
that loads nothing cannot leak what is typed into it); the only link is to /openapi.json on the same host.
Every text taken from the document is HTML-escaped.
"""

from __future__ import annotations

from html import escape
from typing import Any

STYLE = """
body { font: 15px/1.45 system-ui, sans-serif; max-width: 60rem; margin: 2rem auto; padding: 0 1rem; color: #1b1b1b; }
.notice { border: 2px solid #a33; background: #fff4f4; padding: .8rem 1rem; font-weight: 600; }
.operation { border-top: 1px solid #ccc; padding: .6rem 0; }
.method { font: 700 .85rem monospace; padding: .1rem .4rem; border-radius: 3px; background: #e8eef8; }
code, .path { font-family: ui-monospace, monospace; }
table { border-collapse: collapse; margin: .4rem 0 1rem; }
td, th { border: 1px solid #ddd; padding: .2rem .5rem; text-align: left; vertical-align: top; font-size: .9rem; }
"""


def _reference_name(schema: dict[str, Any]) -> str:
    if "$ref" in schema:
        return schema["$ref"].rsplit("/", 1)[-1]
    if schema.get("type") == "array":
        return _reference_name(schema.get("items", {})) + "[]"
    return schema.get("type", "object")


def _constraints(schema: dict[str, Any]) -> str:
    keys = ("enum", "minimum", "maximum", "minLength", "maxLength", "minItems", "maxItems", "pattern", "default")
    parts = [f"{key}: {schema[key]}" for key in keys if key in schema]
    items = schema.get("items", {})
    parts += [f"items {key}: {items[key]}" for key in keys if isinstance(items, dict) and key in items]
    return "; ".join(parts)


def _schema_table(name: str, schema: dict[str, Any]) -> str:
    required = set(schema.get("required", []))
    rows = []
    for field, definition in schema.get("properties", {}).items():
        rows.append(
            f"<tr><td><code>{escape(field)}</code>{' *' if field in required else ''}</td>"
            f"<td>{escape(_reference_name(definition))}</td><td>{escape(_constraints(definition))}</td>"
            f"<td>{escape(str(definition.get('description', '')))}</td></tr>"
        )
    closed = " Unknown fields are rejected." if schema.get("additionalProperties") is False else ""
    return (
        f'<h3 id="schema-{escape(name)}">{escape(name)}</h3><p>{escape(str(schema.get("description", "")))}'
        f"{closed}</p><table><tr><th>field (* required)</th><th>type</th><th>limits</th><th>meaning</th></tr>"
        + "".join(rows)
        + "</table>"
    )


def _operation(path: str, method: str, operation: dict[str, Any]) -> str:
    parts = [
        f'<div class="operation"><span class="method">{escape(method.upper())}</span> '
        f'<span class="path">{escape(path)}</span> {escape(operation.get("summary", ""))}'
    ]
    if operation.get("security"):
        parts.append(" <em>(API key)</em>")
    if operation.get("description"):
        parts.append(f"<p>{escape(operation['description'])}</p>")
    parameters = operation.get("parameters", [])
    if parameters:
        parts.append(
            "<p>Parameters: "
            + ", ".join(f"<code>{escape(item['name'])}</code> ({escape(item['in'])})" for item in parameters)
            + "</p>"
        )
    body = operation.get("requestBody", {}).get("content", {})
    if body:
        parts.append(
            "<p>Body: "
            + ", ".join(
                f"<code>{escape(media)}</code> {escape(_reference_name(content.get('schema', {})))}"
                for media, content in body.items()
            )
            + "</p>"
        )
    responses = operation.get("responses", {})
    parts.append(
        "<p>Responses: "
        + ", ".join(
            f"<b>{escape(status)}</b> {escape(response.get('description', ''))}"
            for status, response in responses.items()
        )
        + "</p></div>"
    )
    return "".join(parts)


def render_docs(document: dict[str, Any], notice: str) -> str:
    """The page for ``document`` (an OpenAPI 3 dict) with ``notice`` shown prominently at the top."""
    info = document.get("info", {})
    operations = [
        _operation(path, method, operation)
        for path, methods in document.get("paths", {}).items()
        for method, operation in methods.items()
    ]
    components = document.get("components", {}).get("schemas", {})
    schema_tables = [_schema_table(name, schema) for name, schema in components.items()]
    description = escape(info.get("description", "")).replace("\n\n", "</p><p>")
    return (
        '<!DOCTYPE html><html lang="en"><head><meta charset="utf-8">'
        f"<title>{escape(info.get('title', 'API'))} API</title><style>{STYLE}</style></head><body>"
        f"<h1>{escape(info.get('title', 'API'))} API {escape(info.get('version', ''))}</h1>"
        f'<p class="notice">{escape(notice)}</p><p>{description}</p>'
        '<p>The machine-readable document is <a href="/openapi.json">/openapi.json</a> (OpenAPI '
        f"{escape(document.get('openapi', ''))}).</p><h2>Operations</h2>"
        + "".join(operations)
        + "<h2>Schemas</h2>"
        + "".join(schema_tables)
        + "</body></html>"
    )
