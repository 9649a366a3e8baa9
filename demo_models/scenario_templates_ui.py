"""Templates for short UI strings: button labels, menu items, tooltips, headings and confirmation questions.

Each template draws its slots from the lexicon and returns an (English, Spanish) pair; the generator
capitalises the first letter and applies the Spanish contractions (a + el, de + el) afterwards. UI labels
are infinitives in Spanish ("Delete task" -> "Eliminar tarea"); messages to the user address them as usted.
"""

from __future__ import annotations

import random

import scenario_grammar as grammar
import scenario_pick as pick
from scenario_grammar import english_noun_phrase as en_np
from scenario_grammar import spanish_noun_phrase as es_np
from scenario_lexicon import (
    ADJECTIVE,
    CLIENT,
    COMPANY,
    CONTAINS,
    LOCATIONS,
    NOUN,
    PRODUCT,
    SETTINGS_EN,
    SETTINGS_ES,
    SWITCHABLE,
    VERBS,
)
from scenario_ui_lexicon import (
    BRACE_NAMES,
    BUTTONS,
    FIELDS,
    MENU_PATHS,
    SETTINGS_SECTIONS,
)

Pair = tuple[str, str]
NEW_ABLE = (
    "file",
    "folder",
    "project",
    "report",
    "document",
    "template",
    "spreadsheet",
    "presentation",
    "page",
    "note",
    "board",
    "list",
    "task",
    "subtask",
    "event",
    "checklist",
    "invoice",
    "expense_report",
    "tag",
    "smart_folder",
    "workspace",
    "milestone",
    "column",
    "card",
    "project_folder",
    "task_list",
    "message",
    "comment",
)


def _infinitive_object(verb_infinitive: str, noun_phrase_es: str, bare_es: str) -> str:
    """ "Eliminar tarea" but "Cambiar el nombre de la tarea": a verb ending in a preposition needs the article."""
    if verb_infinitive.endswith(" de"):
        return f"{verb_infinitive} {noun_phrase_es}"
    return f"{verb_infinitive} {bare_es}"


def button_label(rng: random.Random) -> Pair:
    if rng.random() < 0.4:
        verb = pick.choose(rng, VERBS)
        return verb.button_en, verb.button_es
    return pick.choose(rng, BUTTONS)


def new_item(rng: random.Random) -> Pair:
    """ "New task" -> "Nueva tarea": in menus Spanish puts *nuevo* first, agreeing with the noun."""
    noun = pick.noun_of(rng, NEW_ABLE)
    return f"New {noun.en}", f"{grammar.agree('nuevo', noun, False)} {noun.es}"


def verb_object_label(rng: random.Random) -> Pair:
    verb, noun = pick.verb_and_noun(rng)
    form = 0 if verb.key == "create" else rng.randrange(4)  # "Create task", never "Create this task"
    if form == 0:
        return (f"{verb.en} {noun.en}", _infinitive_object(verb.es_infinitive, es_np(noun, "the"), noun.es))
    if form == 1:
        return f"{verb.en} {en_np(noun, 'this')}", f"{verb.es_infinitive} {es_np(noun, 'this')}"
    if form == 2:
        selected = ADJECTIVE["selected"]
        return (f"{verb.en} selected {noun.en_plural}", f"{verb.es_infinitive} {es_np(noun, 'the', True, selected)}")
    return f"{verb.en} all {noun.en_plural}", f"{verb.es_infinitive} {es_np(noun, 'all', True)}"


def show_hide_label(rng: random.Random) -> Pair:
    """ "Show hidden files" -> "Mostrar archivos ocultos": the adjective moves behind the noun."""
    noun = pick.noun_of(
        rng,
        (
            "file",
            "folder",
            "task",
            "comment",
            "message",
            "column",
            "tab",
            "card",
            "event",
            "notification",
            "project",
            "note",
            "subtask",
            "invoice",
            "tag",
            "milestone",
        ),
    )
    if rng.random() < 0.5:
        adjective = pick.adjective_for(rng, noun)
        return f"Show {adjective.en} {noun.en_plural}", f"Mostrar {es_np(noun, 'bare', True, adjective)}"
    adjective = pick.adjective_for(rng, noun, exclude=("hidden",))
    return f"Hide {adjective.en} {noun.en_plural}", f"Ocultar {es_np(noun, 'bare', True, adjective)}"


def sort_filter_label(rng: random.Random) -> Pair:
    field_en, field_es, _ = pick.choose(rng, FIELDS)
    action_en, action_es = pick.choose(rng, (("Sort", "Ordenar"), ("Filter", "Filtrar"), ("Group", "Agrupar")))
    return f"{action_en} by {field_en}", f"{action_es} por {field_es}"


def open_go_label(rng: random.Random) -> Pair:
    location = pick.noun_of(rng, LOCATIONS + ("workspace",))
    form = rng.randrange(4)
    if form == 0:
        return f"Open in {location.en}", f"Abrir en {es_np(location, 'the')}"
    if form == 1:
        return f"Go to {location.en}", f"Ir a {es_np(location, 'the')}"
    if form == 2:
        section_en, section_es = pick.choose(rng, SETTINGS_SECTIONS)
        return f"{SETTINGS_EN} > {section_en}", f"{SETTINGS_ES} > {section_es}"
    return pick.choose(
        rng,
        (
            ("Open in new window", "Abrir en una ventana nueva"),
            ("Open in new tab", "Abrir en una pestaña nueva"),
            pick.choose(rng, MENU_PATHS),
        ),
    )


def owner_label(rng: random.Random) -> Pair:
    """ "{user}'s workspace" -> "Espacio de trabajo de {user}": the owner moves behind the thing owned."""
    name = pick.choose(rng, ("{name}", "{user}", "%s", "{0}"))
    noun = pick.noun_of(
        rng,
        (
            "workspace",
            "task",
            "board",
            "calendar",
            "note",
            "project",
            "dashboard",
            "comment",
            "folder",
            "file",
            "backup",
            "report",
        ),
    )
    plural = rng.random() < 0.4 and noun.key not in ("dashboard", "workspace", "calendar")
    return f"{name}'s {noun.en_plural if plural else noun.en}", f"{noun.es_plural if plural else noun.es} de {name}"


def paging_label(rng: random.Random) -> Pair:
    form = rng.randrange(5)
    if form == 0:
        return "Page %1$d of %2$d", "Página %1$d de %2$d"
    if form == 1:
        return "Step {0} of {1}", "Paso {0} de {1}"
    if form == 2:
        noun = pick.noun_of(rng, ("file", "task", "comment", "event", "invoice", "project", "message", "backup"))
        return (
            f"Showing {{start}}-{{end}} of {{total}} {noun.en_plural}",
            f"Mostrando {{start}}-{{end}} de {{total}} {noun.es_plural}",
        )
    if form == 3:
        total_en, total_es, used_en, used_es, _, _ = pick.storage_usage(rng)
        return f"Storage used: {used_en} of {total_en}", f"Almacenamiento usado: {used_es} de {total_es}"
    return pick.choose(
        rng,
        (
            ("Version %s", "Versión %s"),
            (f"{CLIENT} %s for Linux", f"{CLIENT} %s para Linux"),
            (f"© 2031 {COMPANY}. All rights reserved.", f"© 2031 {COMPANY}. Todos los derechos reservados."),
            (f"Welcome to {PRODUCT}!", f"¡Le damos la bienvenida a {PRODUCT}!"),
            ("Welcome back, {name}!", "¡Hola de nuevo, {name}!"),
            (f"Search in {PRODUCT}", f"Buscar en {PRODUCT}"),
            (f"About {CLIENT}", f"Acerca de {CLIENT}"),
        ),
    )


def switch_label(rng: random.Random) -> Pair:
    term = pick.noun_of(rng, SWITCHABLE)
    if rng.random() < 0.5:
        return f"Turn on {term.en}", f"Activar {es_np(term, 'the')}"
    return f"Turn off {term.en}", f"Desactivar {es_np(term, 'the')}"


def confirm_question(rng: random.Random) -> Pair:
    """Spanish questions open with ¿, which English lacks."""
    verb, noun = pick.verb_and_noun(
        rng, lambda verb: verb.key in ("delete", "archive", "restore", "move", "share", "lock", "duplicate", "rename")
    )
    form = rng.randrange(3)
    if form == 0:
        return f"{verb.en} {en_np(noun, 'this')}?", f"¿{verb.es_infinitive} {es_np(noun, 'this')}?"
    if form == 1:
        number = pick.count(rng, 0.2)
        english_count, spanish_count = grammar.count_phrase_en(number, noun), grammar.count_phrase_es(number, noun)
        return (
            f"Are you sure you want to {verb.en} {english_count}?",
            f"¿Seguro que desea {verb.es_infinitive} {spanish_count}?",
        )
    adjective = pick.adjective_for_action(rng, verb, noun, 0.6)
    return (
        f"Do you want to {verb.en} {en_np(noun, 'the', False, adjective)}?",
        f"¿Desea {verb.es_infinitive} {es_np(noun, 'the', False, adjective)}?",
    )


def location_name_label(rng: random.Random) -> Pair:
    """Headings that name a location with a brace placeholder: "Files in {name}" -> "Archivos de {name}"."""
    container_key = pick.choose(rng, tuple(CONTAINS))
    container, noun = NOUN[container_key], pick.noun_of(rng, CONTAINS[container_key])
    name = pick.choose(rng, BRACE_NAMES)
    return (
        f"{noun.en_plural} in {en_np(container, 'the')} {name}",
        f"{noun.es_plural} de {es_np(container, 'the')} {name}",
    )


TEMPLATES = (
    ("ui", 3, button_label),
    ("ui", 2, new_item),
    ("ui", 5, verb_object_label),
    ("ui", 2, show_hide_label),
    ("ui", 1, sort_filter_label),
    ("ui", 2, open_go_label),
    ("ui", 1, owner_label),
    ("ui", 1, paging_label),
    ("ui", 1, switch_label),
    ("ui", 2, confirm_question),
    ("ui", 1, location_name_label),
)
