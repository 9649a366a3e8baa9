"""Templates for help-centre explanations (about 8 to 25 words): limits, features, links, billing, notifications.

Clitic pronouns agree with the noun they stand for ("Si elimina una carpeta, Brelqua la mueve a la papelera");
numbers, sizes, prices, dates and times use the Spanish formats of ``scenario_grammar``.
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
    CONTAINS,
    NOUN,
    PRODUCT,
    UPLOADABLE,
)
from scenario_ui_lexicon import (
    BACKUP_PATHS,
    EMAILS,
    EXPORT_PATHS,
    URLS,
)

Pair = tuple[str, str]
SYNCABLE = ("file", "folder", "document", "spreadsheet", "presentation", "image", "note")


def limits(rng: random.Random) -> Pair:
    """Limits with numbers: "You can upload up to 1,000 files at a time." -> "... hasta 1000 archivos ..."."""
    form = rng.randrange(5)
    number_en, number_es = pick.integer_pair(pick.choose(rng, pick.LARGE_COUNTS + (5, 10, 20)))
    if form == 0:
        verb, noun = pick.verb_and_noun(
            rng,
            lambda verb: verb.key in ("upload", "download", "move", "delete", "archive", "export", "share", "restore"),
        )
        return (
            f"You can {verb.en} up to {number_en} {noun.en_plural} at a time.",
            f"Puede {verb.es_infinitive} hasta {number_es} {noun.es_plural} a la vez.",
        )
    if form == 1:
        container_key = pick.choose(rng, tuple(CONTAINS))
        container, content = NOUN[container_key], pick.noun_of(rng, CONTAINS[container_key])
        return (
            f"Each {container.en} can contain up to {number_en} {content.en_plural}.",
            f"Cada {container.es} puede contener hasta {number_es} {content.es_plural}.",
        )
    if form == 2:
        noun = pick.noun_of(rng, UPLOADABLE)
        size_en, size_es = pick.size(rng)
        return (
            f"The maximum size of {en_np(noun, 'a')} is {size_en}.",
            f"El tamaño máximo de {es_np(noun, 'a')} es de {size_es}.",
        )
    if form == 3:
        size_en, size_es = pick.choose(
            rng,
            (("100 MB", "100 MB"), ("250 MB", "250 MB"), ("1 GB", "1 GB"), ("1.5 GB", "1,5 GB"), ("2.5 GB", "2,5 GB")),
        )
        part = pick.choose(rng, ("5 MB", "8 MB", "10 MB", "16 MB", "20 MB", "50 MB"))
        part_en, part_es = part, part
        return (
            f"Files larger than {size_en} are uploaded in parts of {part_en}.",
            f"Los archivos de más de {size_es} se suben en partes de {part_es}.",
        )
    noun = pick.noun_of(rng, ("file", "document", "spreadsheet", "presentation", "page", "template", "note"))
    versions_en, versions_es = pick.integer_pair(pick.choose(rng, (5, 10, 20, 25, 50, 100)))
    return (
        f"By default, {PRODUCT} keeps {versions_en} versions of each {noun.en}.",
        f"De forma predeterminada, {PRODUCT} conserva {versions_es} versiones de cada {noun.es}.",
    )


def trash_and_backups(rng: random.Random) -> Pair:
    days_en, days_es = pick.duration(rng, *pick.DAYS, (1, 7, 14, 30, 60, 90))
    noun = pick.noun_of(rng, ("file", "folder", "task", "document", "project", "note", "comment", "board", "invoice"))
    form = rng.randrange(6)
    if form == 0:
        return (
            f"{noun.en_plural} in the trash are deleted permanently after {days_en}.",
            f"{es_np(noun, 'the', True)} de la papelera se eliminan definitivamente después de {days_es}.",
        )
    if form == 1:
        return (
            f"Deleted {noun.en_plural} stay in the trash for {days_en} before they are removed permanently.",
            f"{es_np(noun, 'the', True, ADJECTIVE['deleted'])} permanecen en la papelera durante {days_es} "
            "antes de eliminarse definitivamente.",
        )
    if form == 2:
        pronoun = grammar.OBJECT_PRONOUN[(noun.gender, False)]
        return (
            f"If you delete {en_np(noun, 'a')}, {PRODUCT} moves it to the trash.",
            f"Si elimina {es_np(noun, 'a')}, {PRODUCT} {pronoun} mueve a la papelera.",
        )
    if form == 3:
        at_en, at_es = pick.at_time(rng)
        if rng.random() < 0.5:
            return f"Backups run every day {at_en}.", f"Las copias de seguridad se realizan todos los días {at_es}."
        day_en, _, days_plural_es = pick.weekday(rng)
        return (
            f"Backups run every {day_en} {at_en}.",
            f"Las copias de seguridad se realizan todos los {days_plural_es} {at_es}.",
        )
    if form == 4:
        path = pick.choose(rng, BACKUP_PATHS)
        return (
            f"Backups are stored in {path} and are kept for {days_en}.",
            f"Las copias de seguridad se guardan en {path} y se conservan durante {days_es}.",
        )
    return (
        "To restore a backup, open the admin console, select the backup and click Restore.",
        "Para restaurar una copia de seguridad, abra la consola de administración, seleccione la copia de "
        "seguridad y haga clic en Restaurar.",
    )


def feature_explanations(rng: random.Random) -> Pair:
    noun = pick.noun_of(
        rng,
        (
            "file",
            "task",
            "document",
            "note",
            "project",
            "image",
            "spreadsheet",
            "invoice",
            "event",
            "comment",
            "subtask",
        ),
    )
    adjective = pick.adjective_for(rng, noun, 0.5, exclude=("selected",))
    minutes_en, minutes_es = pick.duration(rng, *pick.MINUTES_UNIT, (1, 5, 10, 15, 30, 60))
    form = rng.randrange(10)
    if form == 0:
        return (
            f"The dashboard shows all {en_np(noun, 'bare', True, adjective)} in your workspace.",
            f"El panel de control muestra {es_np(noun, 'all', True, adjective)} de su espacio de trabajo.",
        )
    if form == 1:
        return (
            f"The activity log lists every change to your {noun.en_plural} with its date and author.",
            f"El registro de actividad recoge cada cambio de sus {noun.es_plural} con su fecha y su autor.",
        )
    if form in (2, 3):
        noun = pick.noun_of(rng, SYNCABLE)
    if form == 2:
        synced = grammar.agree("actualizado", noun, True)
        return (
            f"The sync hub keeps your {noun.en_plural} up to date on all your devices.",
            f"El centro de sincronización mantiene sus {noun.es_plural} {synced} en todos sus dispositivos.",
        )
    if form == 3:
        return (
            f"{CLIENT} syncs your {noun.en_plural} with the sync hub every {minutes_en}.",
            f"{CLIENT} sincroniza sus {noun.es_plural} con el centro de sincronización cada {minutes_es}.",
        )
    if form == 4:
        work = pick.noun_of(rng, ("task", "note", "event", "subtask", "comment", "milestone"))
        return (
            f"Use quick capture to add {en_np(work, 'a')} from any page.",
            f"Use la captura rápida para añadir {es_np(work, 'a')} desde cualquier página.",
        )
    if form == 5:
        return (
            f"Focus mode hides all notifications for {minutes_en}.",
            f"El modo de concentración oculta todas las notificaciones durante {minutes_es}.",
        )
    if form == 6:
        pronoun = grammar.OBJECT_PRONOUN[(noun.gender, False)]
        return (
            f"Add a tag to {en_np(noun, 'a')} to find it faster.",
            f"Añada una etiqueta a {es_np(noun, 'a')} para encontrar{pronoun} más rápido.",
        )
    if form == 7:
        content = pick.noun_of(rng, UPLOADABLE)
        return (
            f"A smart folder collects all {content.en_plural} with the same tag.",
            f"Una carpeta inteligente reúne {es_np(content, 'all', True)} con la misma etiqueta.",
        )
    if form == 8:
        work = pick.noun_of(rng, ("task", "subtask", "event", "milestone", "invoice"))
        return (
            f"In the timeline view, drag {en_np(work, 'a')} to change its due date.",
            f"En la vista de cronograma, arrastre {es_np(work, 'a')} para cambiar su fecha de vencimiento.",
        )
    pronoun = grammar.STRESSED_PRONOUN[noun.gender]
    return (
        f"When you share {en_np(noun, 'a')}, everyone who has access to it receives a notification.",
        f"Cuando comparte {es_np(noun, 'a')}, todas las personas que tienen acceso a {pronoun} reciben una "
        "notificación.",
    )


def contact_and_links(rng: random.Random) -> Pair:
    url, email = pick.choose(rng, URLS), pick.choose(rng, EMAILS)
    form = rng.randrange(7)
    if form == 0:
        return f"For more information, see {url}.", f"Para obtener más información, consulte {url}."
    if form == 1:
        return (
            f"If the problem persists, contact {email}.",
            f"Si el problema persiste, póngase en contacto con {email}.",
        )
    if form == 2:
        return (
            f"When {PRODUCT} finishes the export, you receive an e-mail at {email}.",
            f"Cuando {PRODUCT} termina la exportación, recibe un correo electrónico en {email}.",
        )
    if form == 5:
        noun = pick.noun_of(rng, ("file", "report", "invoice", "spreadsheet", "document", "backup", "board"))
        path = pick.choose(rng, EXPORT_PATHS)
        return (
            f"Exported {noun.en_plural} are saved to {path}.",
            f"{es_np(noun, 'the', True)} {grammar.agree('exportado', noun, True)} se guardan en {path}.",
        )
    if form == 3:
        return (
            f'<a href="{url}">Learn more</a> about the sync hub.',
            f'<a href="{url}">Más información</a> sobre el centro de sincronización.',
        )
    if form == 4:
        noun = pick.noun_of(rng, ("folder", "file", "project", "board", "document", "calendar", "report"))
        name = pick.choose(rng, ("{name}", "%s", "{0}"))
        return (
            f"The {noun.en} {name} was shared with {email}.",
            f"{es_np(noun, 'the')} {name} se ha compartido con {email}.",
        )
    return (
        f"To report a security problem, write to {email} or visit {url}.",
        f"Para informar de un problema de seguridad, escriba a {email} o visite {url}.",
    )


def notifications(rng: random.Random) -> Pair:
    """Notification strings with numbered placeholders that change places."""
    noun = pick.noun_of(
        rng,
        (
            "folder",
            "file",
            "project",
            "board",
            "document",
            "calendar",
            "report",
            "task",
            "invoice",
            "template",
            "backup",
        ),
    )
    form = rng.randrange(5)
    if form == 0:
        return (f"%1$s shared the {noun.en} %2$s with you.", f"%1$s ha compartido con usted {es_np(noun, 'the')} %2$s.")
    if form == 1:
        return "%1$s assigned you the task %2$s.", "%1$s le ha asignado la tarea %2$s."
    if form == 2:
        return (f"%1$s commented on the {noun.en} %2$s.", f"%1$s ha comentado en {es_np(noun, 'the')} %2$s.")
    if form == 3:
        due = pick.noun_of(rng, ("task", "invoice", "report", "milestone", "subtask", "expense_report"))
        days_en, days_es = pick.duration(rng, *pick.DAYS, (1, 2, 3, 5, 7))
        return (
            f"Reminder: the {due.en} {{name}} is due in {days_en}.",
            f"Recordatorio: {es_np(due, 'the')} {{name}} vence dentro de {days_es}.",
        )
    day_en, day_es, _ = pick.weekday(rng)
    at_en, at_es = pick.at_time(rng)
    return f"Due {day_en} {at_en}", f"Vence el {day_es} {at_es}"


def billing_and_dates(rng: random.Random) -> Pair:
    form = rng.randrange(5)
    if form == 0:
        price_en, price_es = pick.price(rng)
        return (f"Your plan costs {price_en} per user per month.", f"Su plan cuesta {price_es} por usuario al mes.")
    if form == 1:
        date_en, date_es = pick.date(rng)
        return f"Your trial ends on {date_en}.", f"Su periodo de prueba finaliza el {date_es}."
    if form == 2:
        size_en, size_es = pick.size(rng, gigabytes_only=True)
        return (
            f"Your plan includes {size_en} of storage per user.",
            f"Su plan incluye {size_es} de almacenamiento por usuario.",
        )
    if form == 3:
        quota_en, quota_es, used_en, used_es, percent_en, percent_es = pick.storage_usage(rng)
        return (
            f"Your storage quota is {quota_en}; you are using {used_en} ({percent_en}).",
            f"Su cuota de almacenamiento es de {quota_es}; está usando {used_es} ({percent_es}).",
        )
    percent_en, percent_es = pick.percent(rng)
    noun = pick.noun_of(rng, ("project", "task_list", "checklist", "board", "report", "task"))
    return (
        f"The {noun.en} is {percent_en} complete.",
        f"{es_np(noun, 'the')} está {grammar.agree('completado', noun, False)} al {percent_es}.",
    )


TEMPLATES = (
    ("help", 3, limits),
    ("help", 3, trash_and_backups),
    ("help", 4, feature_explanations),
    ("help", 2, contact_and_links),
    ("help", 2, notifications),
    ("help", 2, billing_and_dates),
)
