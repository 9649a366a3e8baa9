"""Templates for status messages: what just happened, what is in progress, counts, times and switches.

Participles agree with the noun in short messages ("Carpeta archivada.", "3 archivos eliminados") and stay
invariant in compound tenses ("se ha subido"); "Saved %d files" puts the verb first ("Se han guardado %d archivos").
"""

from __future__ import annotations

import random

import scenario_grammar as grammar
import scenario_pick as pick
from scenario_grammar import Verb
from scenario_grammar import english_noun_phrase as en_np
from scenario_grammar import spanish_noun_phrase as es_np
from scenario_lexicon import (
    CLIENT,
    NEW,
    SWITCHABLE,
)

Pair = tuple[str, str]


def _status_verbs(verb: Verb) -> bool:
    return verb.es_adjectival is not None


def status_participle(rng: random.Random) -> Pair:
    """ "Folder archived." -> "Carpeta archivada."; "3 files deleted" -> "3 archivos eliminados"."""
    verb, noun = pick.verb_and_noun(rng, _status_verbs)
    form = rng.randrange(4)
    if form == 0:
        return f"{noun.en} {verb.en_participle}.", f"{noun.es} {grammar.agree(verb.es_adjectival, noun, False)}."
    if form == 3:  # "Saved %d files" -> "Se han guardado %d archivos": the verb comes first, with "se han"
        if rng.random() < 0.5:
            return (f"{verb.en_participle} %d {noun.en_plural}", f"se han {verb.es_participle} %d {noun.es_plural}")
        number = pick.count(rng)
        english_number, spanish_number = pick.integer_pair(number)
        plural = number != 1
        return (
            f"{verb.en_participle} {english_number} {noun.en_plural if plural else noun.en}",
            f"se {'han' if plural else 'ha'} {verb.es_participle} {spanish_number} "
            f"{noun.es_plural if plural else noun.es}",
        )
    if form == 1:
        number = pick.count(rng)
        english_number, spanish_number = pick.integer_pair(number)
        plural = number != 1
        return (
            f"{english_number} {noun.en_plural if plural else noun.en} {verb.en_participle}",
            f"{spanish_number} {noun.es_plural if plural else noun.es} "
            f"{grammar.agree(verb.es_adjectival, noun, plural)}",
        )
    return (
        f"%d {noun.en_plural} {verb.en_participle}",
        f"%d {noun.es_plural} {grammar.agree(verb.es_adjectival, noun, True)}",
    )


def status_success(rng: random.Random) -> Pair:
    """ "The file was uploaded successfully." -> "El archivo se ha subido correctamente." (participle invariant)."""
    verb, noun = pick.verb_and_noun(rng, lambda verb: verb.es_participle is not None and verb.key != "open")
    plural = rng.random() < 0.35
    determiner = pick.choose(rng, ("the", "the", "your"))
    if plural:
        return (
            f"{en_np(noun, determiner, True)} were {verb.en_participle} successfully.",
            f"{es_np(noun, determiner, True)} se han {verb.es_participle} correctamente.",
        )
    return (
        f"{en_np(noun, determiner)} was {verb.en_participle} successfully.",
        f"{es_np(noun, determiner)} se ha {verb.es_participle} correctamente.",
    )


def status_progress(rng: random.Random) -> Pair:
    """ "Exporting invoices..." -> "Exportando facturas..."."""
    verb, noun = pick.verb_and_noun(
        rng,
        lambda verb: (
            verb.key
            in (
                "delete",
                "archive",
                "move",
                "copy",
                "restore",
                "export",
                "download",
                "upload",
                "print",
                "save",
                "share",
                "duplicate",
            )
        ),
    )
    form = rng.randrange(3)
    if form == 0:
        return f"{verb.en_gerund} {noun.en_plural}...", f"{verb.es_gerund} {noun.es_plural}..."
    if form == 1:
        return f"{verb.en_gerund} %s...", f"{verb.es_gerund} %s..."
    return (
        f"{verb.en_gerund} {{count}} of {{total}} {noun.en_plural}...",
        f"{verb.es_gerund} {{count}} de {{total}} {noun.es_plural}...",
    )


def status_time(rng: random.Random) -> Pair:
    form = rng.randrange(6)
    if form == 0:
        minutes_en, minutes_es = pick.duration(rng, *pick.MINUTES_UNIT, (1, 2, 3, 5, 10, 15, 20, 30, 45))
        return f"Synced {minutes_en} ago", f"Sincronizado hace {minutes_es}"
    if form == 1:
        at_en, at_es = pick.at_time(rng)
        return f"Last synced {at_en}", f"Última sincronización {at_es}"
    if form == 2:
        hours_en, hours_es = pick.duration(rng, *pick.HOURS, (1, 2, 3, 4, 6, 8, 12, 24))
        return f"Edited by %s {hours_en} ago", f"Editado por %s hace {hours_es}"
    if form == 3:
        date_en, date_es = pick.date(rng)
        return f"Last backup: {date_en}", f"Última copia de seguridad: {date_es}"
    if form == 4:
        day_en, day_es, _ = pick.weekday(rng)
        at_en, at_es = pick.at_time(rng)
        return f"Next backup: {day_en} {at_en}", f"Próxima copia de seguridad: el {day_es} {at_es}"
    at_en, at_es = pick.at_time(rng)
    return f"Backup completed {at_en}.", f"Copia de seguridad completada {at_es}."


def status_counts(rng: random.Random) -> Pair:
    noun = pick.noun_of(
        rng,
        (
            "message",
            "comment",
            "notification",
            "task",
            "file",
            "invoice",
            "event",
            "subtask",
            "document",
            "backup",
            "milestone",
        ),
    )
    form = rng.randrange(5)
    if form == 0:
        return f"No {noun.en_plural} found.", f"No se han encontrado {noun.es_plural}."
    adjective = pick.adjective_for(rng, noun) or NEW
    if form == 1:
        return f"No {adjective.en} {noun.en_plural}", f"No hay {es_np(noun, 'bare', True, adjective)}"
    if form == 2:
        return f"You have %d {adjective.en} {noun.en_plural}.", f"Tiene %d {es_np(noun, 'bare', True, adjective)}."
    if form == 3:
        return (
            f"<b>{{count}}</b> {noun.en_plural} selected",
            f"<b>{{count}}</b> {noun.es_plural} {grammar.agree('seleccionado', noun, True)}",
        )
    return f"{{count}} new {noun.en_plural}", f"{{count}} {noun.es_plural} {grammar.agree('nuevo', noun, True)}"


def status_fixed(rng: random.Random) -> Pair:
    term = pick.noun_of(rng, SWITCHABLE)
    form = rng.randrange(5)
    if form == 0:
        return f"{en_np(term, 'the')} is on.", f"{es_np(term, 'the')} está {grammar.agree('activado', term, False)}."
    if form == 1:
        return (
            f"{en_np(term, 'the')} is off.",
            f"{es_np(term, 'the')} está {grammar.agree('desactivado', term, False)}.",
        )
    if form == 2:
        until_en, until_es = pick.until_time(rng)
        return f"Focus mode is on {until_en}.", f"El modo de concentración está activado {until_es}."
    if form == 3:
        percent_en, percent_es = pick.percent(rng)
        progress_en, progress_es = pick.choose(
            rng,
            (
                ("Upload", "la subida"),
                ("Sync", "la sincronización"),
                ("Export", "la exportación"),
                ("Backup", "la copia de seguridad"),
            ),
        )
        return f"{progress_en} progress: {percent_en}", f"Progreso de {progress_es}: {percent_es}"
    return pick.choose(
        rng,
        (
            ("All changes saved", "Todos los cambios guardados"),
            (
                "Offline. Changes will sync when you reconnect.",
                "Sin conexión. Los cambios se sincronizarán cuando vuelva a conectarse.",
            ),
            (f"{CLIENT} is up to date.", f"{CLIENT} está actualizado."),
            ("Backup in progress...", "Copia de seguridad en curso..."),
            ("Connected to the sync hub", "Conectado al centro de sincronización"),
            ("Copied to clipboard", "Copiado en el portapapeles"),
            ("Share link copied", "Enlace para compartir copiado"),
            ("The trash is empty.", "La papelera está vacía."),
        ),
    )


TEMPLATES = (
    ("status", 4, status_participle),
    ("status", 3, status_success),
    ("status", 2, status_progress),
    ("status", 2, status_time),
    ("status", 2, status_counts),
    ("status", 2, status_fixed),
)
