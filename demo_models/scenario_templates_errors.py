"""Templates for error and warning messages, with printf and brace placeholders, URLs, e-mail addresses and paths.

"Could not X" is always "No se pudo X"; "not found" is "No se ha encontrado". Placeholders are copied
unchanged to the Spanish side, sometimes at another position.
"""

from __future__ import annotations

import random

import scenario_grammar as grammar
import scenario_pick as pick
from scenario_grammar import english_noun_phrase as en_np
from scenario_grammar import spanish_noun_phrase as es_np
from scenario_lexicon import (
    CLIENT,
    CONTAINS,
    NOUN,
    PRODUCT,
    UPLOADABLE,
)
from scenario_ui_lexicon import (
    BRACE_NAMES,
    EMAILS,
    FILE_NAMES,
    FILE_TYPES,
    INPUT_FIELDS,
    PATHS,
    URLS,
)

Pair = tuple[str, str]
NAMEABLE = (
    "file",
    "folder",
    "project",
    "board",
    "list",
    "template",
    "workspace",
    "smart_folder",
    "tag",
    "milestone",
    "task_list",
    "project_template",
    "calendar",
    "report",
)
PLEASE_RETRY = (" Please try again.", " Inténtelo de nuevo.")


def could_not(rng: random.Random) -> Pair:
    """ "Could not archive the shared folder." -> "No se pudo archivar la carpeta compartida."."""
    verb, noun = pick.verb_and_noun(rng, lambda verb: verb.key not in ("select",))
    form = rng.randrange(3)
    if form == 0:
        adjective = pick.adjective_for_action(rng, verb, noun, 0.5)
        english = f"Could not {verb.en} {en_np(noun, 'the', False, adjective)}."
        spanish = f"No se pudo {verb.es_infinitive} {es_np(noun, 'the', False, adjective)}."
    elif form == 1:
        english, spanish = f"Could not {verb.en} %s.", f"No se pudo {verb.es_infinitive} %s."
    else:
        name = pick.choose(rng, BRACE_NAMES)
        english = f"Could not {verb.en} {en_np(noun, 'the')} {name}."
        spanish = f"No se pudo {verb.es_infinitive} {es_np(noun, 'the')} {name}."
    if rng.random() < 0.4:
        english, spanish = english + PLEASE_RETRY[0], spanish + PLEASE_RETRY[1]
    return english, spanish


def cannot_while_offline(rng: random.Random) -> Pair:
    verb, noun = pick.verb_and_noun(
        rng,
        lambda verb: (
            verb.key in ("upload", "download", "share", "move", "restore", "export", "delete", "archive", "copy")
        ),
    )
    return (
        f"{noun.en_plural} cannot be {verb.en_participle} while {CLIENT} is offline.",
        f"No se pueden {verb.es_infinitive} {noun.es_plural} mientras {CLIENT} está sin conexión.",
    )


def not_found(rng: random.Random) -> Pair:
    noun = pick.noun_of(
        rng,
        (
            "file",
            "folder",
            "project",
            "task",
            "report",
            "document",
            "template",
            "page",
            "note",
            "board",
            "invoice",
            "comment",
            "message",
            "workspace",
            "backup",
            "tag",
            "milestone",
            "smart_folder",
            "event",
            "calendar",
        ),
    )
    form = rng.randrange(4)
    if form == 0:
        return f"{noun.en} not found.", f"No se ha encontrado {es_np(noun, 'the')}."
    if form == 1:
        return (f"{en_np(noun, 'the')} %s could not be found.", f"No se pudo encontrar {es_np(noun, 'the')} %s.")
    if form == 2:
        noun = pick.noun_of(rng, NAMEABLE)
        name = pick.choose(rng, BRACE_NAMES)
        return (
            f"{en_np(noun, 'a')} named {name} already exists.",
            f"Ya existe {es_np(noun, 'a')} con el nombre {name}.",
        )
    return (
        f"{en_np(noun, 'the')} is locked by %s.",
        f"{es_np(noun, 'the')} está {grammar.agree('bloqueado', noun, False)} por %s.",
    )


def permission_denied(rng: random.Random) -> Pair:
    verb, noun = pick.verb_and_noun(rng, lambda verb: verb.key not in ("select", "save", "open", "create"))
    if rng.random() < 0.7:
        return (
            f"You do not have permission to {verb.en} {en_np(noun, 'this')}.",
            f"No tiene permiso para {verb.es_infinitive} {es_np(noun, 'this')}.",
        )
    return (
        f"Only the owner can {verb.en} {en_np(noun, 'this')}.",
        f"Solo el propietario puede {verb.es_infinitive} {es_np(noun, 'this')}.",
    )


def size_limit(rng: random.Random) -> Pair:
    noun = pick.noun_of(rng, UPLOADABLE)
    size_en, size_es = pick.size(rng)
    form = rng.randrange(4)
    if form == 0:
        return (
            f"{noun.en_plural} larger than {size_en} cannot be uploaded.",
            f"No se pueden subir {noun.es_plural} de más de {size_es}.",
        )
    if form == 1:
        file_name = pick.choose(rng, FILE_NAMES + ("{file}", "%s"))
        return f"The file {file_name} is larger than {size_en}.", f"El archivo {file_name} ocupa más de {size_es}."
    if form == 2:
        return (
            f"{en_np(noun, 'this')} is too large to preview.",
            f"{es_np(noun, 'this')} es demasiado grande para mostrar una vista previa.",
        )
    file_type = pick.choose(rng, FILE_TYPES)
    return (
        f"Upload failed: files of type {file_type} are not supported.",
        f"Error al subir: no se admiten archivos de tipo {file_type}.",
    )


def quota_warning(rng: random.Random) -> Pair:
    percent_en, percent_es = pick.percent(rng)
    noun = pick.noun_of(rng, ("file", "image", "backup", "document", "presentation", "spreadsheet"))
    some = grammar.agree("alguno", noun, True)
    form = rng.randrange(3)
    if form == 0:
        return (
            f"Your storage quota is {percent_en} full.",
            f"Su cuota de almacenamiento está al {percent_es} de su capacidad.",
        )
    if form == 1:
        email = pick.choose(rng, EMAILS)
        return (
            f"Your storage quota is full. Delete some {noun.en_plural} or contact {email}.",
            f"Su cuota de almacenamiento está llena. Elimine {some} {noun.es_plural} o póngase en contacto "
            f"con {email}.",
        )
    return (
        f"You have used {percent_en} of your storage quota.",
        f"Ha utilizado el {percent_es} de su cuota de almacenamiento.",
    )


def connection_error(rng: random.Random) -> Pair:
    form = rng.randrange(6)
    if form == 0:
        service_en, service_es = pick.choose(
            rng, (("sync hub", "el centro de sincronización"), ("server", "el servidor"))
        )
        seconds_en, seconds_es = pick.duration(rng, *pick.SECONDS, (1, 5, 10, 15, 30, 60))
        return (
            f"The connection to the {service_en} was lost. Trying again in {seconds_en}.",
            f"Se ha perdido la conexión con {service_es}. Se volverá a intentar dentro de {seconds_es}.",
        )
    url = pick.choose(rng, URLS)
    if form == 1:
        return f"Could not connect to {url}.", f"No se pudo conectar con {url}."
    if form == 2:
        return (
            f"{CLIENT} could not reach the sync hub at {url}.",
            f"{CLIENT} no pudo conectar con el centro de sincronización en {url}.",
        )
    path = pick.choose(rng, PATHS)
    if form == 3:
        return f"The path {path} does not exist.", f"La ruta {path} no existe."
    if form == 4:
        return f"Could not write to {path}.", f"No se pudo escribir en {path}."
    noun = pick.noun_of(rng, UPLOADABLE + ("backup", "folder"))
    return (f"Failed to sync %d of %d {noun.en_plural}.", f"No se pudieron sincronizar %d de %d {noun.es_plural}.")


def numbered_error(rng: random.Random) -> Pair:
    noun = pick.noun_of(
        rng,
        (
            "file",
            "task",
            "document",
            "comment",
            "note",
            "invoice",
            "template",
            "milestone",
            "event",
            "report",
            "tag",
            "page",
        ),
    )
    form = rng.randrange(3)
    if form == 0:
        return (f"Error %d: the {noun.en} could not be saved.", f"Error %d: no se pudo guardar {es_np(noun, 'the')}.")
    if form == 1:
        return "Error: %1$s could not be moved to %2$s.", "Error: no se pudo mover %1$s a %2$s."
    return (
        f"%1$s could not be copied because %2$s already contains {en_np(noun, 'a')} with that name.",
        f"No se pudo copiar %1$s porque %2$s ya contiene {es_np(noun, 'a')} con ese nombre.",
    )


def invalid_input(rng: random.Random) -> Pair:
    """ "Invalid date: %s" -> "Fecha no válida: %s": the adjective agrees with the field."""
    field_en, field_es, gender = pick.choose(rng, INPUT_FIELDS)
    field = grammar.Noun("field", field_en, field_en, field_es, field_es, gender, "field")
    form = rng.randrange(3)
    if form == 0:
        return f"Invalid {field_en}: %s", f"{field_es} {grammar.agree('no válido', field, False)}: %s"
    if form == 1:
        return (
            f"Please enter a valid {field_en}.",
            f"Escriba {es_np(field, 'a')} {grammar.agree('válido', field, False)}.",
        )
    number = pick.choose(rng, (8, 10, 12, 14, 16))
    return (
        f"The password must contain at least {number} characters.",
        f"La contraseña debe tener al menos {number} caracteres.",
    )


def container_not_empty(rng: random.Random) -> Pair:
    container_key = pick.choose(rng, tuple(CONTAINS))
    container, content = NOUN[container_key], pick.noun_of(rng, CONTAINS[container_key])
    number = pick.count(rng, 0.2)
    return (
        f"The {container.en} cannot be deleted because it contains {grammar.count_phrase_en(number, content)}.",
        f"No se puede eliminar {es_np(container, 'the')} porque contiene {grammar.count_phrase_es(number, content)}.",
    )


def account_error(rng: random.Random) -> Pair:
    return pick.choose(
        rng,
        (
            ("Your session has expired. Please sign in again.", "Su sesión ha caducado. Vuelva a iniciar sesión."),
            (
                "Two-step verification failed. Check the code and try again.",
                "Error en la verificación en dos pasos. Compruebe el código y vuelva a intentarlo.",
            ),
            ("The verification code has expired.", "El código de verificación ha caducado."),
            (
                f"Two-step verification is required for all {PRODUCT} accounts.",
                f"La verificación en dos pasos es obligatoria para todas las cuentas de {PRODUCT}.",
            ),
            ("The share link for %s has expired.", "El enlace para compartir de %s ha caducado."),
            ("This share link is no longer valid.", "Este enlace para compartir ya no es válido."),
            (
                "Guest access is turned off for this workspace.",
                "El acceso de invitados está desactivado para este espacio de trabajo.",
            ),
            (
                "The admin console is available to administrators only.",
                "La consola de administración solo está disponible para los administradores.",
            ),
            ("Wrong password. You have %d attempts left.", "Contraseña incorrecta. Le quedan %d intentos."),
            (
                "Your account has been locked. Contact {email} to unlock it.",
                "Su cuenta se ha bloqueado. Póngase en contacto con {email} para desbloquearla.",
            ),
            (
                "The backup could not be restored because it is damaged.",
                "No se pudo restaurar la copia de seguridad porque está dañada.",
            ),
            ("You cannot undo this action.", "Esta acción no se puede deshacer."),
        ),
    )


TEMPLATES = (
    ("error", 5, could_not),
    ("error", 2, cannot_while_offline),
    ("error", 3, not_found),
    ("error", 3, permission_denied),
    ("error", 2, size_limit),
    ("error", 2, quota_warning),
    ("error", 3, connection_error),
    ("error", 2, numbered_error),
    ("error", 2, invalid_input),
    ("error", 2, container_not_empty),
    ("error", 1, account_error),
)
