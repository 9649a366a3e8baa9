Cuando Brelqua termina la exportación, recibe un correo electrónico en no-reply@example.com.
Escriba el nombre y, a continuación, haga clic en Continuar.
Solo los administradores pueden archivar presentaciones duplicadas desde la vista de cronograma.
Para ocultar una pestaña verde, abra su espacio de trabajo, haga clic con el botón derecho en la pestaña y haga clic en Ocultar.
También puede pulsar Ctrl+Mayús+S para compartir la lista.
Abra su espacio de trabajo, haga clic con el botón derecho en el proyecto y haga clic en <b>Duplicar</b>.
Elija Archivo > Nuevo proyecto y haga clic en Listo.
Pulse <b>Exportar</b> para exportar los informes.
El acceso de invitados está activado.
Pulse <b>Guardar</b> para guardar la plantilla de proyecto.
El tamaño máximo de una hoja de cálculo es de 4,5 GB.
Ha utilizado el 80 % de su cuota de almacenamiento.
Para informar de un problema de seguridad, escriba a no-reply@example.com o visite https://help.example.com/brelqua/storage.
Para editar una carpeta, abra su espacio de trabajo, seleccione las carpetas que desea editar y haga clic en <b>Editar</b>.
Para restaurar un archivo, seleccione los archivos que desea restaurar y haga clic en Restaurar.
Seleccione los proyectos que desea guardar y, a continuación, haga clic en <b>Guardar</b>.
Haga clic en el botón azul para cambiar el nombre de la imagen.
Plantilla de informe compartida.
Arrastre las tarjetas al tablero.
Abrir este tablero
Configuración > Integraciones
Abra el panel de control, seleccione los documentos de diseño que desea editar y haga clic en <b>Editar</b>.
Ocultar subtareas vencidas
Si elimina una tarea, Brelqua la mueve a la papelera.
Solo los administradores pueden eliminar listas privadas desde el panel de control.
Tiene %d mensajes no leídos.
El acceso de invitados permite que personas ajenas a su equipo vean documentos.
Active el acceso de invitados para invitar a personas ajenas a su equipo a este espacio de trabajo.
Para subir una imagen pública, vaya al panel de control y haga clic en Subir.
Vaya al panel de control, seleccione el archivo y haga clic en Bloquear.
Abra su espacio de trabajo, seleccione la presentación y haga clic en <b>Subir</b>.
Próxima copia de seguridad: el viernes a la 1:00
Para duplicar una lista de tareas, abra su espacio de trabajo, haga clic con el botón derecho en la lista de tareas y haga clic en Duplicar.
Su plan incluye 4 GB de almacenamiento por usuario.
Ya existe una carpeta inteligente con el nombre {name}.
Para cambiar el nombre de una presentación oculta, vaya al panel de control, seleccione las presentaciones que desea cambiar el nombre de y haga clic en <b>Cambiar nombre</b>.
Para cambiar el nombre de un archivo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Cambiar nombre</b>.
Su plan cuesta 49,50 € por usuario al mes.
No se pueden restaurar calendarios mientras Zintaroo está sin conexión.
Su cuota de almacenamiento está llena. Elimine algunas copias de seguridad o póngase en contacto con admin@example.org.
Sus columnas se han ocultado correctamente.
Arrastre las tareas a la lista de tareas privada.
Su informe se ha eliminado correctamente.
Para fijar un comentario, abra su espacio de trabajo, haga clic con el botón derecho en el comentario y haga clic en <b>Fijar</b>.
Restaure la carpeta de proyecto privada.
Restaurar este mensaje
Para eliminar una carpeta, haga clic con el botón derecho en la carpeta y haga clic en Eliminar.
Copie la lista bloqueada.
Seleccionar todo
Para fijar un comentario, vaya al panel de control, seleccione el comentario y haga clic en <b>Fijar</b>.
Para editar una lista de tareas duplicada, seleccione las listas de tareas que desea editar y haga clic en <b>Editar</b>.
Se han archivado %d archivos
7 notas duplicadas
Última copia de seguridad: 19 de abril
Pulse <b>Cambiar nombre</b> para cambiar el nombre de sus listas.
Duplicar imagen
¿Desea mover la carpeta de proyecto duplicada?
No se pudo restaurar el calendario del equipo.
Volver a intentarlo
También puede pulsar Ctrl+E para archivar sus documentos de diseño.
No se puede eliminar el espacio de trabajo porque contiene 15 proyectos.
De forma predeterminada, Brelqua conserva 20 versiones de cada nota.
Tiene %d comentarios ocultos.
Pestaña fijada.
Mover las presentaciones seleccionadas
Para fijar una nota, abra el panel de control, seleccione la nota y haga clic en Fijar.
No se puede eliminar la lista porque contiene 8 tareas.
La lista se ha copiado correctamente.
Su mensaje se ha fijado correctamente.
El documento se ha bloqueado correctamente.
Escriba un nombre para el espacio de trabajo y haga clic en Aplicar.
Solo los administradores pueden eliminar imágenes privadas desde la consola de administración.
Proyecto duplicado.
Duplicando %s...
No se puede eliminar el proyecto porque contiene 6 archivos.
Mostrar proyectos principales
Almacenamiento usado: 2,5 GB de 5 GB
2 carpetas de proyecto bloqueadas
Paso {0} de {1}
Seleccione la plantilla y, a continuación, haga clic en Guardar.
Progreso de la copia de seguridad: 3 %
Pulse <b>Exportar</b> para exportar el informe de gastos.
Progreso de la copia de seguridad: 12,5 %
Filtrar por propietario
Para compartir un informe con personas ajenas a su equipo, cree un enlace para compartir.
No se pudo asignar la tarea privada. Inténtelo de nuevo.
No se pueden subir documentos de más de 750 KB.
Panel de control de {0}
Progreso de la exportación: 90 %
Para editar una lista de comprobación, vaya a la vista de cronograma, haga clic con el botón derecho en la lista de comprobación y haga clic en Editar.
No se pudo subir la imagen {0}. Inténtelo de nuevo.
Los archivos de más de 250 MB se suben en partes de 20 MB.
Nombre de usuario no válido: %s
Para fijar una tarjeta roja, abra su espacio de trabajo, haga clic con el botón derecho en la tarjeta y haga clic en Fijar.
Para restaurar un documento archivado, abra la papelera, seleccione los documentos que desea restaurar y haga clic en Restaurar.
Mostrar carpetas ocultas
No se pudo guardar la página {1}.
Marque la casilla Notificarme y, a continuación, haga clic en Confirmar.
Solo el propietario puede exportar este calendario.
Ya existe una plantilla de proyecto con el nombre {0}.
Su evento se ha movido correctamente.
¿Desea eliminar el mensaje no leído?
Zintaroo sincroniza sus hojas de cálculo con el centro de sincronización cada 60 minutos.
Ocultar archivos bloqueados
Tiene %d hitos seleccionados.
Ya existe un calendario con el nombre {0}.
Para cambiar el nombre de una presentación que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
Haga clic en el botón gris para imprimir el informe de estado.
Eliminar comentario
Última copia de seguridad: 5 de marzo
Active la verificación en dos pasos para proteger su cuenta de Brelqua.
Agrupar por propietario
Si el problema persiste, póngase en contacto con billing@example.com.
Seleccione la imagen y haga clic en Bloquear.
Las carpetas de proyecto se han exportado correctamente.
Compartir los calendarios del equipo seleccionados
3 comentarios fijados
El tamaño máximo de un archivo es de 3,5 GB.
Vaya al panel de control, seleccione la lista de tareas y haga clic en Copiar.
No se pudo abrir la nota {title}. Inténtelo de nuevo.
Zintaroo muestra un icono verde cuando todos sus archivos están sincronizados.
Para informar de un problema de seguridad, escriba a billing@example.com o visite https://example.org/brelqua/privacy.
Última copia de seguridad: 5 de septiembre
Mostrar archivos temporales
Subir esta presentación
Haga clic en Eliminar para eliminar las plantillas.
Para mover un documento de diseño que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Mover.
Elimine el calendario del equipo duplicado.
Mostrando {start}-{end} de {total} proyectos
Restaurando {count} de {total} listas de tareas...
Crear documento
Marcar todo como leído
{count} eventos nuevos
No se pudo asignar la subtarea.
No se pudo escribir en /srv/brelqua/archive.
Restaurando {count} de {total} subtareas...
Para copiar una carpeta privada, seleccione las carpetas que desea copiar y haga clic en Copiar.
Progreso de la exportación: 42 %
Para duplicar una lista de tareas reciente, abra su espacio de trabajo, seleccione las listas de tareas que desea duplicar y haga clic en Duplicar.
No se pudo abrir %s. Inténtelo de nuevo.
Las copias de seguridad se realizan todos los sábados a las 20:05.
Descargar las facturas seleccionadas
Ocultar columnas amarillas
Seleccione los hitos que desea archivar y, a continuación, haga clic en <b>Archivar</b>.
Seleccione la tarea y, a continuación, haga clic en <b>Asignar</b>.
La ruta /mnt/vault/brelqua no existe.
Para restaurar un documento, abra el panel de control, seleccione el documento y haga clic en <b>Restaurar</b>.
Para guardar un informe, abra su espacio de trabajo, seleccione los informes que desea guardar y haga clic en <b>Guardar</b>.
Haga clic en el botón gris para compartir la página.
Vaya a Configuración > Facturación para descargar sus facturas.
Solo los administradores pueden bloquear documentos privados desde la consola de administración.
Seleccione la presentación y, a continuación, haga clic en Duplicar.
No se puede eliminar el calendario del equipo porque contiene 5000 eventos.
Para fijar una tarjeta, abra su espacio de trabajo y haga clic en <b>Fijar</b>.
No se pudo conectar con https://help.example.com/brelqua/guests.
Para eliminar una lista, abra su espacio de trabajo, seleccione las listas que desea eliminar y haga clic en Eliminar.
Cada lista puede contener hasta 20 tareas.
Arrastre los eventos al calendario bloqueado.
El registro de actividad recoge cada cambio de sus archivos con su fecha y su autor.
Los documentos se han descargado correctamente.
Mostrar proyectos eliminados
El modo de concentración oculta todas las notificaciones durante 1 minuto.
Para bloquear una lista, vaya al panel de control, seleccione las listas que desea bloquear y haga clic en Bloquear.
Informe de {name}
Para ocultar una columna azul, abra el panel de control, seleccione las columnas que desea ocultar y haga clic en Ocultar.
No se puede eliminar el tablero porque contiene 3 tarjetas.
Para copiar un archivo duplicado, abra el panel de control y haga clic en Copiar.
Su cuota de almacenamiento está llena. Elimine algunas copias de seguridad o póngase en contacto con no-reply@example.com.
La factura se ha descargado correctamente.
Ya existe una plantilla de proyecto con el nombre {title}.
Haga clic con el botón derecho en el evento y, a continuación, haga clic en Duplicar.
Ocultar esta notificación
Si edita una presentación mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se pueden copiar proyectos mientras Zintaroo está sin conexión.
Para subir una presentación, vaya al panel de control, seleccione las presentaciones que desea subir y haga clic en Subir.
Para mover una carpeta archivada, seleccione la carpeta y haga clic en Mover.
No se pudo asignar la subtarea reciente. Inténtelo de nuevo.
Para subir una hoja de cálculo grande, abra su espacio de trabajo y haga clic en Subir.
Copia de seguridad completada a las 9:10.
No se puede eliminar el espacio de trabajo porque contiene 2 proyectos.
No se pueden exportar plantillas mientras Zintaroo está sin conexión.
Mover imagen
Tareas de la lista de tareas {title}
No se pudo copiar la lista de tareas duplicada. Inténtelo de nuevo.
No se han encontrado comentarios.
Para duplicar una subtarea, abra la vista de cronograma, seleccione la subtarea y haga clic en Duplicar.
Seleccione las facturas que desea descargar y, a continuación, haga clic en Descargar.
No se pueden eliminar carpetas mientras Zintaroo está sin conexión.
Abra su espacio de trabajo, haga clic con el botón derecho en la lista y haga clic en Copiar.
Su cuota de almacenamiento está llena. Elimine algunos archivos o póngase en contacto con helpdesk@example.org.
Su plan incluye 5 GB de almacenamiento por usuario.
Duplicar esta hoja de cálculo
<b>{count}</b> notificaciones seleccionadas
Carpetas del espacio de trabajo {title}
No se pueden subir documentos de más de 50 MB.
Se han fijado 3 comentarios
Vaya al panel de control, haga clic con el botón derecho en la plantilla de proyecto y haga clic en Editar.
Próxima copia de seguridad: el sábado a las 11:05
Para descargar una plantilla bloqueada, abra su espacio de trabajo, seleccione las plantillas que desea descargar y haga clic en Descargar.
No se puede eliminar el espacio de trabajo porque contiene 2 carpetas.
