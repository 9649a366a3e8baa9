"""Lexicon of the demo scenario: Vellorind Systems' collaboration app Brelqua and its desktop client Zintaroo.

All names here are invented for the demo. The Spanish is European Spanish (es-ES) addressing the reader as
*usted*, as a software help centre in Spain would. Product terms (``TERMS``) are the ones listed in
``glossaries/demo.tsv``; every template renders them with the glossary's preferred Spanish term.
"""

from __future__ import annotations

from scenario_grammar import FEMININE as F
from scenario_grammar import MASCULINE as M
from scenario_grammar import Adjective, Noun, Verb, inflect

COMPANY = "Vellorind Systems"
PRODUCT = "Brelqua"  # the web and mobile app
CLIENT = "Zintaroo"  # the desktop sync client
PRODUCT_NAMES = (PRODUCT, CLIENT)


def _noun(
    key: str,
    en: str,
    es: str,
    gender: str,
    category: str,
    en_plural: str = "",
    es_plural: str = "",
    english_article: bool = True,
) -> Noun:
    return Noun(key, en, en_plural or en + "s", es, es_plural or es + "s", gender, category, english_article)


NOUNS = (
    _noun("file", "file", "archivo", M, "content"),
    _noun("folder", "folder", "carpeta", F, "content"),
    _noun("project", "project", "proyecto", M, "content"),
    _noun("report", "report", "informe", M, "content"),
    _noun("document", "document", "documento", M, "content"),
    _noun("template", "template", "plantilla", F, "content"),
    _noun("spreadsheet", "spreadsheet", "hoja de cálculo", F, "content", es_plural="hojas de cálculo"),
    _noun("presentation", "presentation", "presentación", F, "content", es_plural="presentaciones"),
    _noun("image", "image", "imagen", F, "content", es_plural="imágenes"),
    _noun("page", "page", "página", F, "content"),
    _noun("note", "note", "nota", F, "content"),
    _noun("board", "board", "tablero", M, "content"),
    _noun("list", "list", "lista", F, "content"),
    _noun("calendar", "calendar", "calendario", M, "content"),
    _noun("project_folder", "project folder", "carpeta de proyecto", F, "content", es_plural="carpetas de proyecto"),
    _noun("task_list", "task list", "lista de tareas", F, "content", es_plural="listas de tareas"),
    _noun(
        "report_template", "report template", "plantilla de informe", F, "content", es_plural="plantillas de informe"
    ),
    _noun(
        "project_template",
        "project template",
        "plantilla de proyecto",
        F,
        "content",
        es_plural="plantillas de proyecto",
    ),
    _noun("design_document", "design document", "documento de diseño", M, "content", es_plural="documentos de diseño"),
    _noun("team_calendar", "team calendar", "calendario del equipo", M, "content", es_plural="calendarios del equipo"),
    _noun("status_report", "status report", "informe de estado", M, "content", es_plural="informes de estado"),
    _noun("expense_report", "expense report", "informe de gastos", M, "finance", es_plural="informes de gastos"),
    _noun("invoice", "invoice", "factura", F, "finance"),
    _noun("task", "task", "tarea", F, "work"),
    _noun("subtask", "subtask", "subtarea", F, "work"),
    _noun("event", "event", "evento", M, "work"),
    _noun("checklist", "checklist", "lista de comprobación", F, "work", es_plural="listas de comprobación"),
    _noun("message", "message", "mensaje", M, "message"),
    _noun("comment", "comment", "comentario", M, "message"),
    _noun("notification", "notification", "notificación", F, "message", es_plural="notificaciones"),
    _noun("button", "button", "botón", M, "visual", es_plural="botones"),
    _noun("icon", "icon", "icono", M, "visual"),
    _noun("tab", "tab", "pestaña", F, "visual"),
    _noun("card", "card", "tarjeta", F, "visual"),
    _noun("column", "column", "columna", F, "visual"),
)

# Product terms: each is in glossaries/demo.tsv with this Spanish as the preferred target.
TERMS = (
    _noun("sync_hub", "sync hub", "centro de sincronización", M, "feature", es_plural="centros de sincronización"),
    _noun("dashboard", "dashboard", "panel de control", M, "feature", es_plural="paneles de control"),
    _noun("timeline_view", "timeline view", "vista de cronograma", F, "feature"),
    _noun("quick_capture", "quick capture", "captura rápida", F, "feature", english_article=False),
    _noun("focus_mode", "focus mode", "modo de concentración", M, "feature", english_article=False),
    _noun("activity_log", "activity log", "registro de actividad", M, "feature"),
    _noun("smart_folder", "smart folder", "carpeta inteligente", F, "container", es_plural="carpetas inteligentes"),
    _noun("share_link", "share link", "enlace para compartir", M, "link", es_plural="enlaces para compartir"),
    _noun("trash", "trash", "papelera", F, "feature"),
    _noun("backup", "backup", "copia de seguridad", F, "backup", es_plural="copias de seguridad"),
    _noun("guest_access", "guest access", "acceso de invitados", M, "feature", english_article=False),
    _noun("admin_console", "admin console", "consola de administración", F, "feature"),
    _noun("storage_quota", "storage quota", "cuota de almacenamiento", F, "feature"),
    _noun("two_step", "two-step verification", "verificación en dos pasos", F, "feature", english_article=False),
    _noun("tag", "tag", "etiqueta", F, "visual"),
    _noun("milestone", "milestone", "hito", M, "work"),
    _noun("workspace", "workspace", "espacio de trabajo", M, "container", es_plural="espacios de trabajo"),
)
SETTINGS_EN, SETTINGS_ES = "Settings", "Configuración"  # also a glossary term (a menu name, no article)

NOUN = {noun.key: noun for noun in NOUNS + TERMS}
UPLOADABLE = ("file", "document", "spreadsheet", "presentation", "image")
# What each container holds, for "the folder contains 3 files" and "drag the file to the folder".
CONTAINS = {
    "folder": UPLOADABLE,
    "project_folder": UPLOADABLE,
    "smart_folder": UPLOADABLE,
    "project": ("task", "milestone", "document", "file"),
    "board": ("card", "column", "task"),
    "list": ("task",),
    "task_list": ("task",),
    "workspace": ("project", "board", "folder"),
    "calendar": ("event",),
    "team_calendar": ("event",),
}
# Places a help article tells the reader to open.
LOCATIONS = ("dashboard", "timeline_view", "activity_log", "trash", "admin_console", "sync_hub")
SWITCHABLE = ("focus_mode", "guest_access", "two_step", "quick_capture")  # features with an on/off switch


def _adjective(key: str, en: str, es: str, categories: tuple[str, ...], only: tuple[str, ...] = ()) -> Adjective:
    return Adjective(key, en, inflect(es), categories, only)


CONTENT, WORK, MESSAGE, VISUAL, FINANCE = "content", "work", "message", "visual", "finance"
ADJECTIVES = (
    _adjective("shared", "shared", "compartido", (CONTENT, FINANCE)),
    _adjective("archived", "archived", "archivado", (CONTENT, WORK, MESSAGE, FINANCE)),
    _adjective("private", "private", "privado", (CONTENT, WORK)),
    _adjective("public", "public", "público", (CONTENT,)),
    _adjective("selected", "selected", "seleccionado", (CONTENT, WORK, MESSAGE, VISUAL, FINANCE)),
    _adjective("hidden", "hidden", "oculto", (CONTENT, VISUAL, MESSAGE)),
    _adjective("recent", "recent", "reciente", (CONTENT, WORK, MESSAGE, FINANCE)),
    _adjective("locked", "locked", "bloqueado", (CONTENT,)),
    _adjective("deleted", "deleted", "eliminado", (CONTENT, WORK, MESSAGE, FINANCE)),
    _adjective("duplicate", "duplicate", "duplicado", (CONTENT, WORK, FINANCE)),
    _adjective(
        "empty",
        "empty",
        "vacío",
        (),
        ("folder", "project_folder", "list", "task_list", "board", "page", "column", "smart_folder"),
    ),
    _adjective("large", "large", "grande", (), UPLOADABLE),
    _adjective("temporary", "temporary", "temporal", (), ("file", "folder", "document")),
    _adjective("completed", "completed", "completado", (WORK,)),
    _adjective("overdue", "overdue", "vencido", (), ("task", "subtask", "invoice")),
    _adjective("unread", "unread", "no leído", (), ("message", "comment", "notification")),
    _adjective("pinned", "pinned", "fijado", (), ("message", "comment", "note", "tab", "card")),
    _adjective("main", "main", "principal", (), ("folder", "board", "tab", "calendar", "page", "project")),
    _adjective("current", "current", "actual", (), ("project", "page", "tab", "board", "list")),
    _adjective("blue", "blue", "azul", (VISUAL,)),
    _adjective("red", "red", "rojo", (VISUAL,)),
    _adjective("green", "green", "verde", (VISUAL,)),
    _adjective("yellow", "yellow", "amarillo", (VISUAL,)),
    _adjective("grey", "grey", "gris", (VISUAL,)),
)
ADJECTIVE = {adjective.key: adjective for adjective in ADJECTIVES}
NEW = _adjective("new", "new", "nuevo", ())  # only where a template asks for it: it fits every noun
COLOURS = ("blue", "red", "green", "yellow", "grey")

ALL_CATEGORIES = (CONTENT, WORK, MESSAGE, VISUAL, FINANCE)
# One verb per line: English base, participle, gerund | Spanish infinitive, usted imperative, usted present,
# gerund, compound-tense participle, agreeing participle ("-" where there is none) | button label en, es.
# A backslash at the end of a line continues it (Python drops the backslash and the newline).
_VERB_TABLE = """
open, opened, opening | abrir, abra, abre, abriendo, abierto, - | Open, Abrir
delete, deleted, deleting | eliminar, elimine, elimina, eliminando, eliminado, eliminado | Delete, Eliminar
archive, archived, archiving | archivar, archive, archiva, archivando, archivado, archivado | Archive, Archivar
share, shared, sharing | compartir, comparta, comparte, compartiendo, compartido, compartido | Share, Compartir
rename, renamed, renaming | cambiar el nombre de, cambie el nombre de, cambia el nombre de, \
    cambiando el nombre de, -, - | Rename, Cambiar nombre
move, moved, moving | mover, mueva, mueve, moviendo, movido, movido | Move, Mover
copy, copied, copying | copiar, copie, copia, copiando, copiado, copiado | Copy, Copiar
duplicate, duplicated, duplicating | duplicar, duplique, duplica, duplicando, duplicado, duplicado | Duplicate, Duplicar
restore, restored, restoring | restaurar, restaure, restaura, restaurando, restaurado, restaurado | Restore, Restaurar
export, exported, exporting | exportar, exporte, exporta, exportando, exportado, exportado | Export, Exportar
download, downloaded, downloading | descargar, descargue, descarga, descargando, descargado, descargado \
    | Download, Descargar
upload, uploaded, uploading | subir, suba, sube, subiendo, subido, subido | Upload, Subir
print, printed, printing | imprimir, imprima, imprime, imprimiendo, impreso, impreso | Print, Imprimir
lock, locked, locking | bloquear, bloquee, bloquea, bloqueando, bloqueado, bloqueado | Lock, Bloquear
edit, edited, editing | editar, edite, edita, editando, editado, editado | Edit, Editar
assign, assigned, assigning | asignar, asigne, asigna, asignando, asignado, asignado | Assign, Asignar
pin, pinned, pinning | fijar, fije, fija, fijando, fijado, fijado | Pin, Fijar
hide, hidden, hiding | ocultar, oculte, oculta, ocultando, ocultado, oculto | Hide, Ocultar
save, saved, saving | guardar, guarde, guarda, guardando, guardado, guardado | Save, Guardar
create, created, creating | crear, cree, crea, creando, creado, creado | Create, Crear
"""
PRINTABLE = (
    "document",
    "report",
    "spreadsheet",
    "presentation",
    "image",
    "page",
    "note",
    "list",
    "calendar",
    "task_list",
    "status_report",
    "design_document",
    "team_calendar",
)
# Which nouns each verb takes as object: (categories, extra noun keys, excluded noun keys).
VERB_OBJECTS = {
    "open": ((CONTENT, WORK, MESSAGE, FINANCE), (), ()),
    "delete": (ALL_CATEGORIES, (), ("button", "icon")),
    "archive": ((CONTENT, WORK, MESSAGE, FINANCE), (), ()),
    "share": ((CONTENT, FINANCE), (), ()),
    "rename": ((CONTENT,), ("column", "tab", "tag"), ()),
    "move": ((CONTENT, WORK), ("card", "column", "tab"), ()),
    "copy": ((CONTENT,), (), ()),
    "duplicate": ((CONTENT, WORK), (), ()),
    "restore": ((CONTENT, WORK, MESSAGE, FINANCE), (), ()),
    "export": ((CONTENT, FINANCE), (), ("image",)),
    "download": ((FINANCE,), UPLOADABLE + ("report", "template", "status_report", "report_template"), ()),
    "upload": ((), UPLOADABLE, ()),
    "print": ((FINANCE,), PRINTABLE, ()),
    "lock": ((CONTENT,), (), ()),
    "edit": ((CONTENT, WORK, FINANCE), ("comment", "message"), ()),
    "assign": ((), ("task", "subtask"), ()),
    "pin": ((), ("message", "comment", "note", "tab", "card"), ()),
    "hide": ((), ("column", "tab", "card", "comment", "notification"), ()),
    "save": ((CONTENT,), (), ()),
    "create": ((CONTENT, WORK, FINANCE), ("tag", "column", "card"), ("image",)),
}


def _verbs(table: str) -> tuple[Verb, ...]:
    verbs = []
    for line in table.strip().splitlines():
        english, spanish, button = ([item.strip() for item in part.split(",")] for part in line.split("|"))
        spanish = [None if item == "-" else item for item in spanish]
        categories, only, exclude = VERB_OBJECTS[english[0]]
        verbs.append(Verb(english[0], *english, *spanish, *button, categories, only, exclude))
    return tuple(verbs)


VERBS = _verbs(_VERB_TABLE)
VERB = {verb.key: verb for verb in VERBS}
