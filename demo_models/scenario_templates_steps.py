"""Templates for help-centre instructions: one to three imperative steps, with the object and the button.

Instructions are usted imperatives ("Open the dashboard" -> "Abra el panel de control"); "click X" becomes
"haga clic en X", "to do X" becomes "para hacer X", and "then" between steps becomes "y, a continuación,".
"""

from __future__ import annotations

import random

import scenario_pick as pick
from scenario_grammar import Noun, Verb
from scenario_grammar import english_noun_phrase as en_np
from scenario_grammar import spanish_noun_phrase as es_np
from scenario_lexicon import (
    ADJECTIVE,
    CLIENT,
    COLOURS,
    CONTAINS,
    NOUN,
    SETTINGS_EN,
    SETTINGS_ES,
)
from scenario_ui_lexicon import (
    CHECK_BOXES,
    MENU_PATHS,
    SETTINGS_GOALS,
    SETTINGS_SECTIONS,
    VERB_KEYS,
)

Pair = tuple[str, str]
THEN = (", then ", " y, a continuación, ")
CONFIRM_BUTTONS = (
    ("Save", "Guardar"),
    ("Apply", "Aplicar"),
    ("Done", "Listo"),
    ("Continue", "Continuar"),
    ("Confirm", "Confirmar"),
)
VISUAL = ("button", "icon", "tab", "tag")  # things one clicks


def _open_step(rng: random.Random, verb: Verb, noun: Noun) -> Pair:
    """A step that opens a place where the object of ``verb`` can plausibly be found."""
    places = ["dashboard", "workspace"]
    if noun.category == "work":
        places.append("timeline_view")
    if verb.key == "restore":
        places += ["trash", "activity_log"]
    if verb.key in ("lock", "archive"):
        places.append("admin_console")
    place = NOUN[pick.choose(rng, places)]
    if place.key == "workspace":
        return "open your workspace", "abra su espacio de trabajo"
    if rng.random() < 0.5:
        return f"open {en_np(place, 'the')}", f"abra {es_np(place, 'the')}"
    return f"go to {en_np(place, 'the')}", f"vaya a {es_np(place, 'the')}"


def _object_step(rng: random.Random, verb: Verb, noun: Noun) -> Pair:
    """A step that picks out the object before the verb's button is clicked."""
    form = rng.randrange(3)
    if form == 0:
        return f"select {en_np(noun, 'the')}", f"seleccione {es_np(noun, 'the')}"
    if form == 1:
        return (f"right-click {en_np(noun, 'the')}", f"haga clic con el botón derecho en {es_np(noun, 'the')}")
    return (
        f"select the {noun.en_plural} you want to {verb.en}",
        f"seleccione {es_np(noun, 'the', True)} que desea {verb.es_infinitive}",
    )


def _click_step(rng: random.Random, button_en: str, button_es: str) -> Pair:
    if rng.random() < 0.25:
        return f"click <b>{button_en}</b>", f"haga clic en <b>{button_es}</b>"
    return f"click {button_en}", f"haga clic en {button_es}"


def _other_step(rng: random.Random) -> Pair:
    form = rng.randrange(5)
    if form == 0:
        noun = pick.noun_of(rng, ("folder", "project", "board", "list", "template", "smart_folder", "workspace", "tag"))
        return f"enter a name for {en_np(noun, 'the')}", f"escriba un nombre para {es_np(noun, 'the')}"
    if form == 1:
        path_en, path_es = pick.choose(rng, MENU_PATHS)
        return f"choose {path_en}", f"elija {path_es}"
    if form == 2:
        box_en, box_es = pick.choose(rng, CHECK_BOXES)
        return f"select the {box_en} check box", f"marque la casilla {box_es}"
    if form == 3:
        visual = pick.noun_of(rng, VISUAL)
        colour = ADJECTIVE[pick.choose(rng, COLOURS)]
        return (f"click {en_np(visual, 'the', False, colour)}", f"haga clic en {es_np(visual, 'the', False, colour)}")
    field_en, field_es = pick.choose(
        rng,
        (
            ("name", "el nombre"),
            ("new name", "el nuevo nombre"),
            ("e-mail address", "la dirección de correo electrónico"),
            ("due date", "la fecha de vencimiento"),
            ("description", "la descripción"),
        ),
    )
    return f"enter the {field_en}", f"escriba {field_es}"


def to_do_steps(rng: random.Random) -> Pair:
    """ "To share a project folder, open the dashboard and click Share." (Spanish adds "haga clic en")."""
    verb, noun = pick.verb_and_noun(rng, lambda verb: verb.key not in ("select", "open"))
    adjective = pick.adjective_for_action(rng, verb, noun, 0.45)
    steps = [_open_step(rng, verb, noun), _object_step(rng, verb, noun)]
    if verb.key == "create":  # nothing to select before it exists
        steps = steps[:1]
    elif rng.random() < 0.5:
        steps = [steps[rng.randrange(2)]]
    steps.append(_click_step(rng, verb.button_en, verb.button_es))
    english = f"To {verb.en} {en_np(noun, 'a', False, adjective)}, "
    spanish = f"Para {verb.es_infinitive} {es_np(noun, 'a', False, adjective)}, "
    return (
        english + ", ".join(step[0] for step in steps[:-1]) + f" and {steps[-1][0]}.",
        spanish + ", ".join(step[1] for step in steps[:-1]) + f" y {steps[-1][1]}.",
    )


def step_sequence(rng: random.Random) -> Pair:
    """Two or three imperative steps: "Select the files you want to move, then click Move."."""
    verb, noun = pick.verb_and_noun(rng, lambda verb: verb.key not in ("select", "open", "create"))
    click = _click_step(rng, verb.button_en, verb.button_es)
    if rng.random() < 0.6:
        first, second = _open_step(rng, verb, noun), _object_step(rng, verb, noun)
        return f"{first[0]}, {second[0]} and {click[0]}.", f"{first[1]}, {second[1]} y {click[1]}."
    first = _object_step(rng, verb, noun)
    return f"{first[0]}{THEN[0]}{click[0]}.", f"{first[1]}{THEN[1]}{click[1]}."


def other_steps(rng: random.Random) -> Pair:
    """ "Enter the new name, then click Save." -> "Escriba el nuevo nombre y, a continuación, haga clic en Guardar"."""
    first = _other_step(rng)
    click = _click_step(rng, *pick.choose(rng, CONFIRM_BUTTONS))
    if rng.random() < 0.5:
        return f"{first[0]}{THEN[0]}{click[0]}.", f"{first[1]}{THEN[1]}{click[1]}."
    return f"{first[0]} and {click[0]}.", f"{first[1]} y {click[1]}."


def settings_help(rng: random.Random) -> Pair:
    """ "To change your password, go to Settings > Security." (the section fits the goal)."""
    goal_en, goal_es, section_index = pick.choose(rng, SETTINGS_GOALS)
    section_en, section_es = SETTINGS_SECTIONS[section_index]
    form = rng.randrange(3)
    if form == 0:
        return (
            f"To {goal_en}, go to {SETTINGS_EN} > {section_en}.",
            f"Para {goal_es}, vaya a {SETTINGS_ES} > {section_es}.",
        )
    if form == 1:
        return (
            f"Go to {SETTINGS_EN} > {section_en} to {goal_en}.",
            f"Vaya a {SETTINGS_ES} > {section_es} para {goal_es}.",
        )
    return (
        f"To {goal_en}, open {SETTINGS_EN}, click {section_en} and follow the instructions on the screen.",
        f"Para {goal_es}, abra {SETTINGS_ES}, haga clic en {section_es} y siga las instrucciones de la pantalla.",
    )


def imperative_with_adjective(rng: random.Random) -> Pair:
    """One step naming an object with an adjective: "Open the shared project folder." -> "Abra la carpeta de
    proyecto compartida." (the adjective moves behind the whole compound and agrees with its head)."""
    form = rng.randrange(3)
    if form == 0:
        verb, noun = pick.verb_and_noun(
            rng,
            lambda verb: (
                verb.key in ("open", "select", "delete", "archive", "share", "restore", "lock", "move", "copy")
            ),
        )
        adjective = pick.adjective_for_action(rng, verb, noun, 1.0)
        return (
            f"{verb.en} {en_np(noun, 'the', False, adjective)}.",
            f"{verb.es_imperative} {es_np(noun, 'the', False, adjective)}.",
        )
    visual = pick.noun_of(rng, ("button", "icon"))
    colour = ADJECTIVE[pick.choose(rng, COLOURS)]
    if form == 1:
        verb, noun = pick.verb_and_noun(rng, lambda verb: verb.key not in ("select", "create"))
        return (
            f"click {en_np(visual, 'the', False, colour)} to {verb.en} {en_np(noun, 'the')}.",
            f"haga clic en {es_np(visual, 'the', False, colour)} para {verb.es_infinitive} {es_np(noun, 'the')}.",
        )
    container_key = pick.choose(rng, tuple(CONTAINS))
    container, content = NOUN[container_key], pick.noun_of(rng, CONTAINS[container_key])
    adjective = pick.adjective_for(rng, container, 0.7, exclude=("selected", "deleted", "empty"))
    return (
        f"drag {en_np(content, 'the', True)} to {en_np(container, 'the', False, adjective)}.",
        f"arrastre {es_np(content, 'the', True)} a {es_np(container, 'the', False, adjective)}.",
    )


def press_to(rng: random.Random) -> Pair:
    verb, noun = pick.verb_and_noun(rng, lambda verb: verb.key not in ("select", "create"))
    determiner = pick.choose(rng, ("the", "this", "your"))
    plural = rng.random() < 0.3
    english_object, spanish_object = en_np(noun, determiner, plural), es_np(noun, determiner, plural)
    form = rng.randrange(3)
    if form == 0:
        return (
            f"press <b>{verb.button_en}</b> to {verb.en} {english_object}.",
            f"pulse <b>{verb.button_es}</b> para {verb.es_infinitive} {spanish_object}.",
        )
    if form == 1:
        return (
            f"click {verb.button_en} to {verb.en} {english_object}.",
            f"haga clic en {verb.button_es} para {verb.es_infinitive} {spanish_object}.",
        )
    if verb.key not in VERB_KEYS:
        return (
            f"select {english_object} and click {verb.button_en}.",
            f"seleccione {spanish_object} y haga clic en {verb.button_es}.",
        )
    key_en, key_es = VERB_KEYS[verb.key]
    return (
        f"you can also press {key_en} to {verb.en} {english_object}.",
        f"también puede pulsar {key_es} para {verb.es_infinitive} {spanish_object}.",
    )


def long_instructions(rng: random.Random) -> Pair:
    """Longer sentences (15-25 words) with a subordinate clause."""
    verb, noun = pick.verb_and_noun(
        rng, lambda verb: verb.key in ("edit", "move", "delete", "rename", "archive", "share", "restore", "lock")
    )
    form = rng.randrange(3)
    if form == 0:
        click = _click_step(rng, verb.button_en, verb.button_es)
        return (
            f"To {verb.en} {en_np(noun, 'a')} that belongs to another workspace, ask the owner to give you "
            f"edit access and then {click[0]}.",
            f"Para {verb.es_infinitive} {es_np(noun, 'a')} que pertenece a otro espacio de trabajo, pida al "
            f"propietario que le dé acceso de edición y, a continuación, {click[1]}.",
        )
    if form == 1:
        adjective = pick.adjective_for_action(rng, verb, noun, 1.0)
        location = pick.noun_of(rng, ("dashboard", "timeline_view", "activity_log", "admin_console"))
        return (
            f"Only administrators can {verb.en} {en_np(noun, 'bare', True, adjective)} from {en_np(location, 'the')}.",
            f"Solo los administradores pueden {verb.es_infinitive} {es_np(noun, 'bare', True, adjective)} desde "
            f"{es_np(location, 'the')}.",
        )
    present = verb.es_present
    return (
        f"If you {verb.en} {en_np(noun, 'a')} while {CLIENT} is offline, the change is sent to the sync hub "
        "as soon as you reconnect.",
        f"Si {present} {es_np(noun, 'a')} mientras {CLIENT} está sin conexión, el cambio se envía al centro de "
        "sincronización en cuanto vuelva a conectarse.",
    )


TEMPLATES = (
    ("help", 8, to_do_steps),
    ("help", 3, imperative_with_adjective),
    ("help", 4, step_sequence),
    ("help", 2, other_steps),
    ("help", 1, settings_help),
    ("help", 3, press_to),
    ("help", 3, long_instructions),
)
