"""UI vocabulary of the demo scenario: button labels, Settings sections, menus, fields, keys and calendar words,
plus the URLs, e-mail addresses, paths and file names that messages mention (reserved example domains only).

Each entry is already an (English, Spanish) pair as the Spanish interface of Brelqua shows it.
"""

from __future__ import annotations

from scenario_grammar import FEMININE as F
from scenario_grammar import MASCULINE as M
from scenario_lexicon import CLIENT

# Button labels that are not tied to one verb.
BUTTONS = (
    ("Cancel", "Cancelar"),
    ("Apply", "Aplicar"),
    ("Close", "Cerrar"),
    ("Next", "Siguiente"),
    ("Back", "Atrás"),
    ("Done", "Listo"),
    ("Sign in", "Iniciar sesión"),
    ("Sign out", "Cerrar sesión"),
    ("Retry", "Reintentar"),
    ("Continue", "Continuar"),
    ("Confirm", "Confirmar"),
    ("Invite", "Invitar"),
    ("Send", "Enviar"),
    ("Undo", "Deshacer"),
    ("Accept", "Aceptar"),
    ("Decline", "Rechazar"),
    ("Search", "Buscar"),
    ("Filter", "Filtrar"),
    ("Preview", "Vista previa"),
    ("Finish", "Finalizar"),
    ("Skip", "Omitir"),
    ("Copy link", "Copiar enlace"),
    ("Select all", "Seleccionar todo"),
    ("Clear filters", "Borrar filtros"),
    ("Mark all as read", "Marcar todo como leído"),
    ("Empty trash", "Vaciar la papelera"),
    ("Show more", "Mostrar más"),
    ("Show less", "Mostrar menos"),
    ("Learn more", "Más información"),
    ("Try again", "Volver a intentarlo"),
    ("Discard changes", "Descartar cambios"),
    ("Keep editing", "Seguir editando"),
    ("Add comment", "Añadir comentario"),
    ("Add tag", "Añadir etiqueta"),
    ("Back up now", "Hacer una copia de seguridad ahora"),
    ("Restore backup", "Restaurar copia de seguridad"),
    ("Open dashboard", "Abrir el panel de control"),
    ("Open Settings", "Abrir Configuración"),
    ("Turn on focus mode", "Activar el modo de concentración"),
    ("Turn off focus mode", "Desactivar el modo de concentración"),
    ("Create share link", "Crear enlace para compartir"),
    ("Go to trash", "Ir a la papelera"),
)
# Sections of the Settings page: "Go to Settings > Storage" -> "Vaya a Configuración > Almacenamiento".
SETTINGS_SECTIONS = (
    ("Notifications", "Notificaciones"),
    ("Account", "Cuenta"),
    ("Security", "Seguridad"),
    ("Storage", "Almacenamiento"),
    ("Language", "Idioma"),
    ("Privacy", "Privacidad"),
    ("Integrations", "Integraciones"),
    ("Billing", "Facturación"),
    ("Appearance", "Apariencia"),
)
# Things to do on a Settings section: (goal en, goal es, section index in SETTINGS_SECTIONS).
SETTINGS_GOALS = (
    ("change the language of the app", "cambiar el idioma de la aplicación", 4),
    ("turn off e-mail notifications", "desactivar las notificaciones por correo electrónico", 0),
    ("choose which notifications you receive", "elegir qué notificaciones recibe", 0),
    ("turn on two-step verification", "activar la verificación en dos pasos", 2),
    ("change your password", "cambiar su contraseña", 2),
    ("see how much of your storage quota you are using", "ver qué parte de su cuota de almacenamiento está usando", 3),
    ("update your payment details", "actualizar sus datos de pago", 7),
    ("download your invoices", "descargar sus facturas", 7),
    ("choose a dark theme", "elegir un tema oscuro", 8),
    ("change who can see your profile", "cambiar quién puede ver su perfil", 5),
    (f"connect {CLIENT} to your account", f"conectar {CLIENT} con su cuenta", 6),
    ("change your display name", "cambiar su nombre visible", 1),
    ("delete your account", "eliminar su cuenta", 1),
)
# Keyboard shortcuts of the verbs that have one.
VERB_KEYS = {
    "rename": ("F2", "F2"),
    "delete": ("the Delete key", "la tecla Supr"),
    "save": ("Ctrl+S", "Ctrl+S"),
    "copy": ("Ctrl+C", "Ctrl+C"),
    "print": ("Ctrl+P", "Ctrl+P"),
    "open": ("Enter", "Intro"),
    "share": ("Ctrl+Shift+S", "Ctrl+Mayús+S"),
    "archive": ("Ctrl+E", "Ctrl+E"),
}
# Menu paths, already in the product's UI language on each side.
MENU_PATHS = (
    ("File > Export as PDF", "Archivo > Exportar como PDF"),
    ("Edit > Select all", "Edición > Seleccionar todo"),
    ("View > Show hidden files", "Ver > Mostrar archivos ocultos"),
    ("View > Timeline view", "Ver > Vista de cronograma"),
    ("Tools > Quick capture", "Herramientas > Captura rápida"),
    ("View > Focus mode", "Ver > Modo de concentración"),
    ("File > New project", "Archivo > Nuevo proyecto"),
    ("File > Print", "Archivo > Imprimir"),
    ("Edit > Find and replace", "Edición > Buscar y reemplazar"),
    ("Help > Keyboard shortcuts", "Ayuda > Métodos abreviados de teclado"),
)
# Sort and filter fields: (en, es, gender) so that "Invalid date" -> "Fecha no válida".
FIELDS = (
    ("name", "nombre", M),
    ("date", "fecha", F),
    ("size", "tamaño", M),
    ("owner", "propietario", M),
    ("due date", "fecha de vencimiento", F),
    ("priority", "prioridad", F),
    ("status", "estado", M),
    ("file name", "nombre de archivo", M),
    ("description", "descripción", F),
    ("title", "título", M),
)
INPUT_FIELDS = (
    ("e-mail address", "dirección de correo electrónico", F),
    ("password", "contraseña", F),
    ("file name", "nombre de archivo", M),
    ("date", "fecha", F),
    ("URL", "URL", F),
    ("phone number", "número de teléfono", M),
    ("user name", "nombre de usuario", M),
    ("time", "hora", F),
)
KEYS = (
    ("Ctrl+S", "Ctrl+S"),
    ("Ctrl+Shift+F", "Ctrl+Mayús+F"),
    ("Enter", "Intro"),
    ("Esc", "Esc"),
    ("Ctrl+Z", "Ctrl+Z"),
    ("Shift+Tab", "Mayús+Tab"),
    ("the Delete key", "la tecla Supr"),
    ("the space bar", "la barra espaciadora"),
    ("Ctrl+K", "Ctrl+K"),
    ("F2", "F2"),
)
CHECK_BOXES = (
    ("Notify me", "Notificarme"),
    ("Remember me", "Recordarme"),
    ("Include comments", "Incluir comentarios"),
    ("Include archived items", "Incluir elementos archivados"),
    ("Send a copy to me", "Enviarme una copia"),
)
WEEKDAYS = (
    ("Monday", "lunes", "lunes"),
    ("Tuesday", "martes", "martes"),
    ("Wednesday", "miércoles", "miércoles"),
    ("Thursday", "jueves", "jueves"),
    ("Friday", "viernes", "viernes"),
    ("Saturday", "sábado", "sábados"),
    ("Sunday", "domingo", "domingos"),
)
MONTHS = (
    ("January", "enero"),
    ("February", "febrero"),
    ("March", "marzo"),
    ("April", "abril"),
    ("May", "mayo"),
    ("June", "junio"),
    ("July", "julio"),
    ("August", "agosto"),
    ("September", "septiembre"),
    ("October", "octubre"),
    ("November", "noviembre"),
    ("December", "diciembre"),
)
# Reserved example domains only (RFC 2606 / RFC 6761).
URLS = (
    "https://help.example.com/brelqua/sync",
    "https://help.example.com/brelqua/storage",
    "https://status.example.org",
    "https://example.com/zintaroo/download",
    "https://docs.example.org/brelqua/api",
    "https://help.example.com/brelqua/guests",
    "https://example.org/brelqua/privacy",
    "https://help.example.com/brelqua/shortcuts",
)
EMAILS = (
    "support@example.com",
    "billing@example.com",
    "admin@example.org",
    "security@example.org",
    "no-reply@example.com",
    "helpdesk@example.org",
)
EXPORT_PATHS = ("~/Brelqua/Exports", "C:\\Users\\Public\\Brelqua\\Exports", "/var/lib/zintaroo/exports")
BACKUP_PATHS = ("/srv/brelqua/archive", "/mnt/vault/brelqua", "E:\\Archive\\Brelqua")
PATHS = EXPORT_PATHS + BACKUP_PATHS + ("~/Library/Zintaroo/cache", "D:\\Zintaroo\\Sync", "/opt/zintaroo/logs")
FILE_NAMES = (
    "roadmap-v2.pdf",
    "q3-budget.xlsx",
    "kickoff-notes.docx",
    "logo_final.png",
    "export_2031-05-14.csv",
    "team-photo.jpg",
    "release-plan.pptx",
    "invoice-0042.pdf",
    "brand-guide.pdf",
    "minutes_07.txt",
)
FILE_TYPES = (".exe", ".bat", ".iso", ".dmg", ".msi", ".tmp")
BRACE_NAMES = ("{name}", "{0}", "{1}", "{title}")  # the name of the object a message is about
