Arrastre los documentos a la carpeta privada.
El archivo invoice-0042.pdf ocupa más de 10 GB.
La imagen se ha editado correctamente.
Ya existe un tablero con el nombre {0}.
Para eliminar una plantilla de proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Eliminar.
Seleccione su hoja de cálculo y haga clic en Restaurar.
¿Seguro que desea compartir 2 calendarios del equipo?
¿Compartir este proyecto?
Para cambiar el idioma de la aplicación, vaya a Configuración > Idioma.
Haga clic con el botón derecho en la subtarea y, a continuación, haga clic en Duplicar.
Su archivo se ha restaurado correctamente.
Fijar las notas seleccionadas
Active el acceso de invitados para invitar a personas ajenas a su equipo a esta carpeta de proyecto.
Abra su espacio de trabajo, haga clic con el botón derecho en el calendario y haga clic en Mover.
Informe de gastos eliminado.
¿Seguro que desea bloquear 1 plantilla de informe?
Escriba la descripción y haga clic en Listo.
Para crear un documento temporal, abra el panel de control y haga clic en Crear.
Pulse <b>Cambiar nombre</b> para cambiar el nombre de su imagen.
Subir todas las imágenes
Mostrar archivos públicos
Cuando comparte un evento, todas las personas que tienen acceso a él reciben una notificación.
No se pudo encontrar la copia de seguridad %s.
Los tableros exportados se guardan en /var/lib/zintaroo/exports.
Próxima copia de seguridad: el martes a las 16:10
No se pudo crear la tarea. Inténtelo de nuevo.
No se pudo restaurar la plantilla de proyecto {0}. Inténtelo de nuevo.
No se pudo descargar %s. Inténtelo de nuevo.
Su cuota de almacenamiento es de 100 GB; está usando 10 GB (10 %).
Abrir carpeta de proyecto
Sus listas de tareas se han impreso correctamente.
Para elegir un tema oscuro, vaya a Configuración > Apariencia.
Las copias de seguridad se realizan todos los días a las 20:20.
Para guardar un documento, seleccione los documentos que desea guardar y haga clic en Guardar.
Pulse <b>Mover</b> para mover la subtarea.
Para asignar una subtarea, vaya a la vista de cronograma, seleccione la subtarea y haga clic en Asignar.
Pulse <b>Guardar</b> para guardar sus plantillas de informe.
Para restaurar una copia de seguridad, abra la consola de administración, seleccione la copia de seguridad y haga clic en Restaurar.
No se pudo mover %s. Inténtelo de nuevo.
Cuando comparte un proyecto, todas las personas que tienen acceso a él reciben una notificación.
Abra su espacio de trabajo, seleccione los tableros que desea guardar y haga clic en Guardar.
El archivo minutes_07.txt ocupa más de 5 MB.
Vaya al panel de control, haga clic con el botón derecho en el documento de diseño y haga clic en Imprimir.
Para duplicar un evento reciente, abra su espacio de trabajo y haga clic en <b>Duplicar</b>.
%d plantillas de informe creadas
No tiene permiso para editar este informe.
Su documento se ha movido correctamente.
Subir todas las presentaciones
Ya existe una lista de tareas con el nombre {0}.
Carpeta de {user}
No se pudo encontrar la página %s.
Solo el propietario puede compartir este calendario.
Haga clic en Abrir para abrir esta plantilla.
No tiene permiso para compartir esta nota.
Vence el jueves a las 9:00
Haga clic en Mover para mover sus informes.
Escriba un nombre para la carpeta inteligente y haga clic en Continuar.
Solo los administradores pueden compartir informes de estado ocultos desde la consola de administración.
No se pudo editar el documento de diseño {1}.
Hojas de cálculo de la carpeta {title}
Pulse <b>Compartir</b> para compartir esta factura.
Su cuota de almacenamiento está al 64 % de su capacidad.
El tablero {name} se ha compartido con helpdesk@example.org.
Para mover una página oculta, abra su espacio de trabajo, haga clic con el botón derecho en la página y haga clic en Mover.
Añada una etiqueta a una hoja de cálculo para encontrarla más rápido.
Vellorind Systems guarda sus copias de seguridad en dos centros de datos distintos.
Presentaciones de la carpeta de proyecto {0}
No se puede eliminar el tablero porque contiene 1500 tareas.
El archivo kickoff-notes.docx ocupa más de 100 MB.
Haga clic en Bloquear para bloquear su plantilla.
¿Seguro que desea mover 6 pestañas?
Pulse <b>Subir</b> para subir sus presentaciones.
Ocultar mensajes archivados
No se pudo crear la columna {0}.
Sus imágenes se han restaurado correctamente.
No se pudieron sincronizar %d de %d presentaciones.
Mover esta lista de tareas
Para guardar una presentación, seleccione las presentaciones que desea guardar y haga clic en Guardar.
Para editar una plantilla pública, abra el panel de control, seleccione las plantillas que desea editar y haga clic en <b>Editar</b>.
Haga clic en Restaurar para restaurar su imagen.
No se pueden mover hitos mientras Zintaroo está sin conexión.
Seleccione esta plantilla y haga clic en Bloquear.
El tablero está bloqueado por %s.
No se pueden mover documentos de diseño mientras Zintaroo está sin conexión.
Cambiar el nombre de este informe de estado
Para copiar una plantilla de proyecto privada, vaya al panel de control, haga clic con el botón derecho en la plantilla de proyecto y haga clic en Copiar.
No se pueden archivar eventos mientras Zintaroo está sin conexión.
Pulse <b>Descargar</b> para descargar esta plantilla de informe.
Error %d: no se pudo guardar la nota.
No tiene permiso para archivar este comentario.
No se pueden mover tareas mientras Zintaroo está sin conexión.
Para imprimir un calendario del equipo, abra su espacio de trabajo, haga clic con el botón derecho en el calendario del equipo y haga clic en Imprimir.
Para editar un informe de estado, abra su espacio de trabajo, seleccione los informes de estado que desea editar y haga clic en Editar.
El enlace para compartir de esta plantilla caduca dentro de 1 día.
Puede descargar hasta 40 archivos a la vez.
El modo de concentración está activado hasta las 4:30.
La ruta /opt/zintaroo/logs no existe.
Se han guardado 10 archivos
No se pudo restaurar la página privada.
Archivos de {0}
Seleccione estas plantillas y haga clic en Restaurar.
Tableros del espacio de trabajo {1}
No se pudo guardar el documento de diseño {name}.
Bloquear las carpetas seleccionadas
Próxima copia de seguridad: el lunes a las 19:00
También puede pulsar Ctrl+E para archivar la nota.
Archivar los mensajes seleccionados
Descargando {count} de {total} archivos...
No se pudo subir el documento {name}.
Solo el propietario puede ocultar esta pestaña.
Guardar todos los tableros
Su cuota de almacenamiento está al 65 % de su capacidad.
Solo los administradores pueden archivar subtareas vencidas desde el panel de control.
Plantilla de proyecto exportada.
1000 mensajes restaurados
Tarea asignada.
Para compartir una lista que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
No se pudo crear %s.
Para cambiar el nombre de una imagen, abra el panel de control, seleccione las imágenes que desea cambiar el nombre de y haga clic en Cambiar nombre.
Haga clic en Ocultar para ocultar la tarjeta.
Solo los administradores pueden archivar documentos temporales desde el panel de control.
Para asignar una tarea, abra su espacio de trabajo y haga clic en Asignar.
Eliminar los mensajes seleccionados
Para descargar un documento, abra el panel de control, seleccione los documentos que desea descargar y haga clic en Descargar.
Haga clic en el icono amarillo y haga clic en <b>Listo</b>.
Vence el domingo a las 20:15
Solo los administradores pueden archivar archivos recientes desde la vista de cronograma.
Mostrar tarjetas rojas
No se puede eliminar el calendario del equipo porque contiene 10 eventos.
Compartir las notas seleccionadas
Almacenamiento usado: 100 GB de 200 GB
El tamaño máximo de un documento es de 50 MB.
Copiado en el portapapeles
La copia de seguridad está bloqueada por %s.
Archivar este archivo
No se pudo crear la factura.
Escriba un nombre para la etiqueta y, a continuación, haga clic en Guardar.
Haga clic en la etiqueta roja y haga clic en Aplicar.
Sus facturas se han restaurado correctamente.
Su cuota de almacenamiento es de 20 GB; está usando 15 GB (75 %).
Para compartir una plantilla, vaya al panel de control, seleccione las plantillas que desea compartir y haga clic en <b>Compartir</b>.
No tiene permiso para mover este archivo.
Su periodo de prueba finaliza el 7 de agosto.
Haga clic con el botón derecho en el calendario del equipo y, a continuación, haga clic en Cambiar nombre.
Eliminar
Configuración > Idioma
Eliminar las listas de comprobación seleccionadas
Para archivar un calendario del equipo, abra el panel de control, seleccione el calendario del equipo y haga clic en <b>Archivar</b>.
Mostrar notificaciones eliminadas
Mostrar notificaciones no leídas
Los archivos de más de 1,5 GB se suben en partes de 16 MB.
Marque la casilla Enviarme una copia y, a continuación, haga clic en <b>Continuar</b>.
Para archivar un hito, abra el panel de control y haga clic en Archivar.
No se puede eliminar la carpeta inteligente porque contiene 9 archivos.
Cada carpeta inteligente puede contener hasta 25 imágenes.
El tamaño máximo de una hoja de cálculo es de 1 GB.
Error %d: no se pudo guardar el comentario.
Seleccione la carpeta y, a continuación, haga clic en Eliminar.
No se pudo duplicar %s. Inténtelo de nuevo.
Zintaroo no pudo conectar con el centro de sincronización en https://help.example.com/brelqua/storage.
Para copiar un tablero oculto, haga clic con el botón derecho en el tablero y haga clic en Copiar.
No se ha encontrado la nota.
Su cuota de almacenamiento es de 100 GB; está usando 20 GB (20 %).
No se pudo crear el evento {1}.
Su cuota de almacenamiento está llena. Elimine algunos archivos o póngase en contacto con support@example.com.
Tareas de la lista {title}
Vaya al panel de control, seleccione la nota y haga clic en Fijar.
Solo el propietario puede restaurar este tablero.
Para subir un archivo privado, abra su espacio de trabajo, seleccione el archivo y haga clic en <b>Subir</b>.
Vaya a Configuración > Seguridad para activar la verificación en dos pasos.
Documentos de la carpeta inteligente {0}
Elija Archivo > Nuevo proyecto y, a continuación, haga clic en Listo.
Haga clic en Eliminar para eliminar sus hitos.
1 página archivada
No se pudo copiar %1$s porque %2$s ya contiene una plantilla con ese nombre.
Abra la vista de cronograma, seleccione las tareas que desea asignar y haga clic en <b>Asignar</b>.
Última copia de seguridad: 21 de enero
No se pueden subir hojas de cálculo de más de 250 MB.
No se pueden exportar informes mientras Zintaroo está sin conexión.
Para compartir un documento con personas ajenas a su equipo, cree un enlace para compartir.
Si restaura una presentación mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Mostrar etiquetas seleccionadas
No se pudieron sincronizar %d de %d imágenes.
Marque la casilla Enviarme una copia y haga clic en Aplicar.
Su periodo de prueba finaliza el 2 de enero.
No se han encontrado documentos.
Para cambiar el nombre de una página, haga clic con el botón derecho en la página y haga clic en <b>Cambiar nombre</b>.
Eliminando {count} de {total} imágenes...
Su imagen se ha impreso correctamente.
Progreso de la copia de seguridad: 62,5 %
Solo los administradores pueden editar archivos públicos desde el registro de actividad.
Las copias de seguridad se realizan todos los martes a las 4:10.
Puede eliminar hasta 50 notificaciones a la vez.
%1$s ha compartido con usted la factura %2$s.
Añada una etiqueta a un comentario para encontrarlo más rápido.
1000 subtareas asignadas
No se pudo imprimir %s.
Ocultar las notificaciones seleccionadas
Ocultar tarjetas fijadas
Arrastre las presentaciones a la carpeta.
