"""Templates about the product's features, written to attest every glossary term in varied contexts.

``SHOWCASE`` holds the hand-written pairs every corpus contains (always in train): the examples the README cites.
"""

from __future__ import annotations

import random

import scenario_pick as pick
from scenario_grammar import english_noun_phrase as en_np
from scenario_grammar import spanish_noun_phrase as es_np
from scenario_lexicon import (
    CLIENT,
    COMPANY,
    PRODUCT,
)

Pair = tuple[str, str]


def feature_facts(rng: random.Random) -> Pair:
    days_en, days_es = pick.duration(rng, *pick.DAYS, (1, 3, 7, 14, 30))
    return pick.choose(
        rng,
        (
            (f"Share links expire after {days_en}.", f"Los enlaces para compartir caducan después de {days_es}."),
            ("Copy the share link and send it to your team.", "Copie el enlace para compartir y envíelo a su equipo."),
            (
                "Anyone with the share link can view the file, but only members can edit it.",
                "Cualquier persona con el enlace para compartir puede ver el archivo, pero solo los miembros pueden "
                "editarlo.",
            ),
            (
                "Guest access lets people outside your team view shared folders.",
                "El acceso de invitados permite que personas ajenas a su equipo vean carpetas compartidas.",
            ),
            (
                f"Two-step verification adds a second step when you sign in to {PRODUCT}.",
                f"La verificación en dos pasos añade un segundo paso al iniciar sesión en {PRODUCT}.",
            ),
            (
                "Administrators can turn on two-step verification for all users in the admin console.",
                "Los administradores pueden activar la verificación en dos pasos para todos los usuarios en la "
                "consola de administración.",
            ),
            (
                "Milestones mark important dates in the timeline view.",
                "Los hitos marcan fechas importantes en la vista de cronograma.",
            ),
            ("Drag a milestone to change its due date.", "Arrastre un hito para cambiar su fecha de vencimiento."),
            (
                "Turn on focus mode to hide notifications while you work.",
                "Active el modo de concentración para ocultar las notificaciones mientras trabaja.",
            ),
            (
                f"Install {CLIENT} to sync folders from your computer with {PRODUCT}.",
                f"Instale {CLIENT} para sincronizar carpetas de su ordenador con {PRODUCT}.",
            ),
            (
                f"{CLIENT} shows a green icon when all your files are synced.",
                f"{CLIENT} muestra un icono verde cuando todos sus archivos están sincronizados.",
            ),
            (
                "Create a smart folder to group files by tag.",
                "Cree una carpeta inteligente para agrupar archivos por etiqueta.",
            ),
            (
                "Only administrators can change the storage quota of a workspace.",
                "Solo los administradores pueden cambiar la cuota de almacenamiento de un espacio de trabajo.",
            ),
            ("The trash is emptied automatically every night.", "La papelera se vacía automáticamente cada noche."),
            (
                f"Guest access is not available in the free plan of {PRODUCT}.",
                f"El acceso de invitados no está disponible en el plan gratuito de {PRODUCT}.",
            ),
            (
                "Press Ctrl+K to open quick capture from anywhere.",
                "Pulse Ctrl+K para abrir la captura rápida desde cualquier lugar.",
            ),
        ),
    )


def feature_terms(rng: random.Random) -> Pair:
    """The less frequent product terms in varied contexts, so that every glossary term is well attested."""
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
            "presentation",
            "project_folder",
            "spreadsheet",
            "template",
            "task_list",
        ),
    )
    days_en, days_es = pick.duration(rng, *pick.DAYS, (1, 2, 7, 14, 30))
    form = rng.randrange(10)
    if form == 0:
        return (
            f"To share {en_np(noun, 'a')} with people outside your team, create a share link.",
            f"Para compartir {es_np(noun, 'a')} con personas ajenas a su equipo, cree un enlace para compartir.",
        )
    if form == 1:
        return (
            f"The share link for {en_np(noun, 'this')} expires in {days_en}.",
            f"El enlace para compartir de {es_np(noun, 'this')} caduca dentro de {days_es}.",
        )
    if form == 2:
        return (
            f"Anyone with the share link can view {en_np(noun, 'this')}.",
            f"Cualquier persona con el enlace para compartir puede ver {es_np(noun, 'this')}.",
        )
    if form == 3:
        adjective = pick.adjective_for(rng, noun, 0.5, exclude=("selected", "deleted", "hidden", "private"))
        return (
            f"Guest access lets people outside your team view {en_np(noun, 'bare', True, adjective)}.",
            f"El acceso de invitados permite que personas ajenas a su equipo vean "
            f"{es_np(noun, 'bare', True, adjective)}.",
        )
    if form == 4:
        container = pick.noun_of(rng, ("workspace", "project", "board", "folder", "project_folder"))
        return (
            f"Turn on guest access to invite people outside your team to {en_np(container, 'this')}.",
            f"Active el acceso de invitados para invitar a personas ajenas a su equipo a {es_np(container, 'this')}.",
        )
    if form == 5:
        location = pick.noun_of(rng, ("dashboard", "timeline_view", "workspace"))
        determiner = "your" if location.key == "workspace" else "the"
        return (
            f"Items added with quick capture appear in {en_np(location, determiner)}.",
            f"Los elementos añadidos con la captura rápida aparecen en {es_np(location, determiner)}.",
        )
    if form == 6:
        return (
            f"Turn on two-step verification to protect your {PRODUCT} account.",
            f"Active la verificación en dos pasos para proteger su cuenta de {PRODUCT}.",
        )
    if form == 7:
        return (
            "With two-step verification, you enter a code from your phone each time you sign in.",
            "Con la verificación en dos pasos, debe escribir un código de su teléfono cada vez que inicie sesión.",
        )
    if form == 8:
        container = pick.noun_of(rng, ("workspace", "project", "board"))
        return (
            f"Administrators can require two-step verification for all members of {en_np(container, 'the')}.",
            f"Los administradores pueden exigir la verificación en dos pasos a todos los miembros de "
            f"{es_np(container, 'the')}.",
        )
    return pick.choose(
        rng,
        (
            (f"{PRODUCT} and {CLIENT} are products of {COMPANY}.", f"{PRODUCT} y {CLIENT} son productos de {COMPANY}."),
            (
                f"{COMPANY} will never ask for your password by e-mail.",
                f"{COMPANY} nunca le pedirá su contraseña por correo electrónico.",
            ),
            (
                f"{COMPANY} stores your backups in two separate data centres.",
                f"{COMPANY} guarda sus copias de seguridad en dos centros de datos distintos.",
            ),
            (
                "Use quick capture to save an idea before you forget it.",
                "Use la captura rápida para guardar una idea antes de olvidarla.",
            ),
        ),
    )


# Hand-written pairs that every demo corpus contains (always in train): the examples the README promises.
SHOWCASE = (
    ("Open the shared project folder.", "Abra la carpeta de proyecto compartida."),
    ("Move the files to the shared project folder.", "Mueva los archivos a la carpeta de proyecto compartida."),
    ("Click the blue button.", "Haga clic en el botón azul."),
    ("Click the blue button to save your changes.", "Haga clic en el botón azul para guardar los cambios."),
    ("Click Save.", "Haga clic en Guardar."),
    ("Open the dashboard.", "Abra el panel de control."),
    (
        "Open the sync hub to see which files are synced.",
        "Abra el centro de sincronización para ver qué archivos están sincronizados.",
    ),
    ("Saved %d files", "Se han guardado %d archivos"),
)


TEMPLATES = (
    ("help", 1, feature_facts),
    ("help", 2, feature_terms),
)
