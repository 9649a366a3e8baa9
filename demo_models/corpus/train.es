¿Seguro que desea restaurar 9 calendarios del equipo?
Para mover una tarjeta, haga clic con el botón derecho en la tarjeta y haga clic en Mover.
El acceso de invitados permite que personas ajenas a su equipo vean proyectos.
Mostrar menos
1000 presentaciones exportadas
No tiene permiso para mover esta pestaña.
Última copia de seguridad: 6 de febrero
Haga clic en el botón azul para subir el documento.
Arrastre las tareas a la lista de tareas.
Para ocultar una tarjeta amarilla, haga clic con el botón derecho en la tarjeta y haga clic en Ocultar.
¿Compartir esta presentación?
Para guardar un calendario privado, vaya al panel de control, seleccione el calendario y haga clic en <b>Guardar</b>.
Marque la casilla Enviarme una copia y, a continuación, haga clic en <b>Guardar</b>.
La carpeta {0} se ha compartido con billing@example.com.
El panel de control muestra todas las tareas vencidas de su espacio de trabajo.
Abra su espacio de trabajo, haga clic con el botón derecho en la nota y haga clic en <b>Eliminar</b>.
No se puede eliminar la carpeta de proyecto porque contiene 2 presentaciones.
De forma predeterminada, Brelqua conserva 100 versiones de cada plantilla.
Se han guardado %d calendarios
Eliminar esta nota
Haga clic con el botón derecho en la imagen y, a continuación, haga clic en Descargar.
Las facturas eliminadas permanecen en la papelera durante 7 días antes de eliminarse definitivamente.
El proyecto está completado al 75 %.
El tamaño máximo de un archivo es de 10 MB.
Próxima copia de seguridad: el domingo a las 16:45
Última sincronización a la 1:45
Ir al panel de control
Los proyectos eliminados permanecen en la papelera durante 60 días antes de eliminarse definitivamente.
Los archivos de más de 1 GB se suben en partes de 20 MB.
El archivo brand-guide.pdf ocupa más de 1,5 GB.
Ocultar pestañas seleccionadas
El calendario se ha guardado correctamente.
Duplicar todas las plantillas de proyecto
El modo de concentración está activado hasta las 16:30.
La factura se ha compartido correctamente.
10 hojas de cálculo editadas
No se pueden mover imágenes mientras Zintaroo está sin conexión.
Para subir un documento público, abra su espacio de trabajo, seleccione el documento y haga clic en Subir.
Solo los administradores pueden cambiar el nombre de imágenes ocultas desde el registro de actividad.
Para ocultar un comentario, vaya al panel de control y haga clic en <b>Ocultar</b>.
Para compartir una presentación con personas ajenas a su equipo, cree un enlace para compartir.
Esta acción no se puede deshacer.
Cuando Brelqua termina la exportación, recibe un correo electrónico en helpdesk@example.org.
Almacenamiento usado: 9 GB de 10 GB
Ocultar
Seguir editando
Recordatorio: el informe de gastos {name} vence dentro de 5 días.
Su cuota de almacenamiento está al 20 % de su capacidad.
Crear
Para subir una imagen grande, seleccione la imagen y haga clic en Subir.
Carpetas de {0}
Para restaurar un hito que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
No se puede eliminar la lista porque contiene 12 tareas.
Copia de seguridad completada a las 7:10.
Para eliminar su cuenta, vaya a Configuración > Cuenta.
Para bloquear un calendario oculto, seleccione el calendario y haga clic en <b>Bloquear</b>.
Restaurar las imágenes seleccionadas
Use la captura rápida para añadir una nota desde cualquier página.
Su periodo de prueba finaliza el 10 de abril.
Para imprimir un informe de gastos reciente, abra su espacio de trabajo y haga clic en <b>Imprimir</b>.
Los archivos de más de 1,5 GB se suben en partes de 10 MB.
Seleccione la plantilla y haga clic en Descargar.
No se pudo copiar %1$s porque %2$s ya contiene un hito con ese nombre.
De forma predeterminada, Brelqua conserva 5 versiones de cada archivo.
Solo los administradores pueden cambiar el nombre de listas de tareas vacías desde la consola de administración.
%d plantillas de informe guardadas
Puede exportar hasta 5 archivos a la vez.
Solo los administradores pueden mover subtareas vencidas desde el panel de control.
Arrastre los eventos al calendario del equipo.
Para restaurar una subtarea privada, abra la vista de cronograma y haga clic en Restaurar.
Progreso de la exportación: 8 %
Para guardar un archivo temporal, abra el panel de control y haga clic en <b>Guardar</b>.
El modo de concentración está activado hasta las 2:20.
Pulse <b>Descargar</b> para descargar esta presentación.
Archivar todos los informes
Carpeta archivada.
Su periodo de prueba finaliza el 15 de diciembre.
Tarea de {0}
Subiendo documentos...
Para copiar una plantilla, vaya al panel de control y haga clic en <b>Copiar</b>.
Para bloquear una imagen que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Bloquear</b>.
Escriba un nombre para la plantilla y, a continuación, haga clic en Continuar.
No se puede eliminar la carpeta porque contiene 75 documentos.
Para crear un informe de gastos, abra su espacio de trabajo y haga clic en Crear.
Para cambiar el nombre de una lista de tareas, seleccione las listas de tareas que desea cambiar el nombre de y haga clic en Cambiar nombre.
Seleccione la lista de tareas y haga clic en Bloquear.
Para imprimir una factura reciente, abra su espacio de trabajo y haga clic en Imprimir.
No se pudo mover el informe de estado {0}.
Los archivos eliminados permanecen en la papelera durante 90 días antes de eliminarse definitivamente.
El acceso de invitados permite que personas ajenas a su equipo vean archivos.
Cambiar el nombre de las imágenes seleccionadas
Bloquear este documento
Abra su espacio de trabajo, seleccione el informe de gastos y haga clic en Imprimir.
No se puede eliminar la carpeta de proyecto porque contiene 150 imágenes.
Compartir
Nueva lista de comprobación
Solo los administradores pueden cambiar el nombre de tableros bloqueados desde el registro de actividad.
Proyectos de {0}
Para cambiar el nombre de una etiqueta, abra el panel de control, haga clic con el botón derecho en la etiqueta y haga clic en <b>Cambiar nombre</b>.
Para exportar un calendario, seleccione el calendario y haga clic en Exportar.
Solo el propietario puede copiar este calendario del equipo.
Las copias de seguridad se realizan todos los días a las 9:00.
No se pudo descargar la presentación archivada.
Documentos del proyecto {1}
Informe de {0}
Su plan cuesta 8,90 € por usuario al mes.
Cada calendario puede contener hasta 50 eventos.
<a href="https://status.example.org">Más información</a> sobre el centro de sincronización.
¿Seguro que desea compartir 6 presentaciones?
Mostrar archivos grandes
No se puede eliminar el espacio de trabajo porque contiene 200 carpetas.
También puede pulsar F2 para cambiar el nombre de sus documentos.
Para fijar un mensaje reciente, abra su espacio de trabajo, haga clic con el botón derecho en el mensaje y haga clic en <b>Fijar</b>.
El panel de control muestra todos los comentarios no leídos de su espacio de trabajo.
Abra la vista de cronograma, haga clic con el botón derecho en la lista de comprobación y haga clic en Eliminar.
Filtrar por tamaño
Para informar de un problema de seguridad, escriba a admin@example.org o visite https://help.example.com/brelqua/storage.
Ocultar carpetas bloqueadas
Las facturas exportadas se guardan en ~/Brelqua/Exports.
Seleccione estas plantillas de informe y haga clic en Descargar.
Las facturas de la papelera se eliminan definitivamente después de 7 días.
Copia de seguridad completada a las 5:30.
Comparta la hoja de cálculo bloqueada.
%1$s ha compartido con usted la copia de seguridad %2$s.
El enlace para compartir de esta lista de tareas caduca dentro de 7 días.
Su cuota de almacenamiento está al 35 % de su capacidad.
Seleccione su mensaje y haga clic en Fijar.
Agrupar por estado
Seleccione estos comentarios y haga clic en Fijar.
No se pueden eliminar tableros mientras Zintaroo está sin conexión.
Su calendario del equipo se ha duplicado correctamente.
No se puede eliminar la carpeta inteligente porque contiene 15 documentos.
Su periodo de prueba finaliza el 8 de diciembre.
Para compartir un calendario del equipo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
Seleccione los mensajes que desea fijar y, a continuación, haga clic en Fijar.
Para eliminar una carpeta de proyecto bloqueada, vaya al panel de control y haga clic en Eliminar.
Si comparte una lista de tareas mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Zintaroo no pudo conectar con el centro de sincronización en https://help.example.com/brelqua/shortcuts.
Descargando {count} de {total} presentaciones...
No se pueden copiar documentos mientras Zintaroo está sin conexión.
No se pudo archivar %s.
Nuevo evento
¿Seguro que desea mover 7 tableros?
Abra su espacio de trabajo, haga clic con el botón derecho en la carpeta de proyecto y haga clic en Eliminar.
No se pudo escribir en D:\Zintaroo\Sync.
Seleccione las hojas de cálculo que desea subir y, a continuación, haga clic en Subir.
Archivo > Imprimir
Para imprimir una hoja de cálculo, seleccione las hojas de cálculo que desea imprimir y haga clic en Imprimir.
Las copias de seguridad se realizan todos los martes a las 4:30.
Haga clic en Mover para mover la imagen.
Para fijar una nota, seleccione las notas que desea fijar y haga clic en Fijar.
Para archivar una presentación que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Archivar</b>.
Las facturas exportadas se guardan en /var/lib/zintaroo/exports.
Una carpeta inteligente reúne todas las presentaciones con la misma etiqueta.
Escriba un nombre para el proyecto y, a continuación, haga clic en Guardar.
No se han encontrado mensajes.
No se pudo exportar el archivo {1}.
No hay archivos recientes
No se puede eliminar la carpeta inteligente porque contiene 2 imágenes.
No se pudo bloquear la nota. Inténtelo de nuevo.
Abra el centro de sincronización para ver qué archivos están sincronizados.
Cada lista puede contener hasta 100 tareas.
¿Seguro que desea eliminar 2000 pestañas?
No tiene permiso para mover este informe.
No se pudo encontrar la etiqueta %s.
Recordatorio: la subtarea {name} vence dentro de 2 días.
Haga clic en Guardar para guardar el informe de estado.
Abra el panel de control, seleccione la plantilla de informe y haga clic en Descargar.
El panel de control muestra todas las facturas de su espacio de trabajo.
No se pueden subir hojas de cálculo de más de 25 MB.
No se pudo bloquear la nota.
Las copias de seguridad se realizan todos los días a las 12:30.
Para bloquear un calendario, abra su espacio de trabajo, haga clic con el botón derecho en el calendario y haga clic en Bloquear.
¿Seguro que desea duplicar 3 páginas?
Imágenes de la carpeta {1}
El archivo está bloqueado por %s.
Ha utilizado el 97 % de su cuota de almacenamiento.
Haga clic en Compartir para compartir su plantilla.
Informe de %s
Solo los administradores pueden archivar mensajes no leídos desde la consola de administración.
Restaurar las listas seleccionadas
Para ocultar una pestaña roja, seleccione la pestaña y haga clic en <b>Ocultar</b>.
Las plantillas de informe se han restaurado correctamente.
Escriba el nombre y haga clic en Aplicar.
No se ha encontrado el evento.
Se ha perdido la conexión con el servidor. Se volverá a intentar dentro de 30 segundos.
No se pudo bloquear el informe reciente.
Elimine el documento privado.
No hay documentos grandes
No se pudo bloquear el documento. Inténtelo de nuevo.
Si restaura una factura mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Informe de estado movido.
Para subir un archivo, abra el panel de control y haga clic en Subir.
Subiendo {count} de {total} hojas de cálculo...
Para guardar una hoja de cálculo grande, seleccione las hojas de cálculo que desea guardar y haga clic en <b>Guardar</b>.
Para archivar una nota que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
Los documentos de la papelera se eliminan definitivamente después de 14 días.
Duplicar las páginas seleccionadas
Recordatorio: la subtarea {name} vence dentro de 3 días.
Hora no válida: %s
No tiene permiso para imprimir esta presentación.
Ya existe una lista con el nombre {1}.
¿Seguro que desea eliminar 3 plantillas de proyecto?
Haga clic en el botón azul para eliminar la columna.
No tiene permiso para exportar este calendario.
No se puede eliminar el calendario porque contiene 1500 eventos.
No tiene permiso para editar esta subtarea.
Haga clic en Mover para mover estas notas.
Restaure el documento de diseño oculto.
Carpeta copiada.
Seleccione las plantillas que desea copiar y, a continuación, haga clic en Copiar.
Para compartir un archivo, haga clic con el botón derecho en el archivo y haga clic en Compartir.
Solo el propietario puede cambiar el nombre de esta lista de tareas.
Recordatorio: la tarea {name} vence dentro de 1 día.
Para bloquear una lista, haga clic con el botón derecho en la lista y haga clic en Bloquear.
Haga clic en el botón amarillo para imprimir la factura.
Omitir
Solo el propietario puede bloquear este calendario.
El centro de sincronización mantiene sus hojas de cálculo actualizadas en todos sus dispositivos.
Eliminar plantilla de informe
¿Seguro que desea duplicar 20 plantillas de proyecto?
Los enlaces para compartir caducan después de 14 días.
Seleccione la subtarea y, a continuación, haga clic en <b>Asignar</b>.
¿Desea cambiar el nombre de la plantilla?
Moviendo documentos...
Editar todas las hojas de cálculo
Cualquier persona con el enlace para compartir puede ver esta presentación.
De forma predeterminada, Brelqua conserva 25 versiones de cada archivo.
Abra su espacio de trabajo, seleccione los archivos que desea descargar y haga clic en <b>Descargar</b>.
La pestaña se ha eliminado correctamente.
Escriba la descripción y haga clic en <b>Confirmar</b>.
Para archivar una plantilla oculta, abra su espacio de trabajo, seleccione las plantillas que desea archivar y haga clic en <b>Archivar</b>.
Copia de seguridad completada a las 19:45.
Haga clic con el botón derecho en el archivo y, a continuación, haga clic en <b>Duplicar</b>.
Seleccione los informes de gastos que desea eliminar y, a continuación, haga clic en Eliminar.
No se pudo descargar el archivo {title}. Inténtelo de nuevo.
La papelera se vacía automáticamente cada noche.
El tamaño máximo de una imagen es de 1,5 GB.
Para crear una lista de comprobación privada, vaya al panel de control y haga clic en <b>Crear</b>.
Para crear una columna, abra el panel de control y haga clic en <b>Crear</b>.
Se ha perdido la conexión con el centro de sincronización. Se volverá a intentar dentro de 1 segundo.
Arrastre los documentos a la carpeta de proyecto duplicada.
Copia de seguridad completada a la 1:30.
Para descargar una imagen compartida, seleccione las imágenes que desea descargar y haga clic en <b>Descargar</b>.
Sus carpetas se han editado correctamente.
Para compartir una carpeta duplicada, abra el panel de control, seleccione la carpeta y haga clic en Compartir.
{count} comentarios nuevos
Si bloquea un proyecto mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic en el icono verde para copiar la carpeta de proyecto.
Para compartir una carpeta de proyecto, abra el panel de control, seleccione las carpetas de proyecto que desea compartir y haga clic en Compartir.
Restaurar esta lista de tareas
Arrastre las tareas a la lista de tareas oculta.
¿Desea duplicar la lista de comprobación completada?
No se pudo eliminar %s. Inténtelo de nuevo.
Almacenamiento usado: 1,25 GB de 5 GB
Para subir un archivo, abra su espacio de trabajo, seleccione el archivo y haga clic en <b>Subir</b>.
Escriba una fecha válida.
¿Desea duplicar la carpeta?
Para cambiar el nombre de una hoja de cálculo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
Para obtener más información, consulte https://example.com/zintaroo/download.
Para informar de un problema de seguridad, escriba a billing@example.com o visite https://help.example.com/brelqua/storage.
Puede restaurar hasta 25 hojas de cálculo a la vez.
¿Restaurar esta notificación?
Haga clic en el icono verde para asignar la tarea.
Se ha perdido la conexión con el servidor. Se volverá a intentar dentro de 5 segundos.
Para copiar un tablero actual, abra su espacio de trabajo y haga clic en Copiar.
Copie la imagen archivada.
¿Seguro que desea compartir 3 listas de tareas?
Las plantillas de informe se han movido correctamente.
No se puede eliminar la carpeta de proyecto porque contiene 20 archivos.
Haga clic en Eliminar para eliminar su evento.
Solo el propietario puede archivar esta plantilla.
Si elimina una pestaña mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para editar un hito que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Editar.
Para duplicar una carpeta reciente, abra su espacio de trabajo, seleccione las carpetas que desea duplicar y haga clic en Duplicar.
Seleccione las listas que desea restaurar y, a continuación, haga clic en Restaurar.
Su cuota de almacenamiento está llena. Elimine algunas presentaciones o póngase en contacto con security@example.org.
Tareas de la lista {1}
Editar este mensaje
Para cambiar el nombre de una presentación oculta, seleccione las presentaciones que desea cambiar el nombre de y haga clic en <b>Cambiar nombre</b>.
Para desactivar las notificaciones por correo electrónico, vaya a Configuración > Notificaciones.
No tiene permiso para imprimir este calendario del equipo.
No se ha encontrado la tarea.
Para restaurar un tablero compartido, haga clic con el botón derecho en el tablero y haga clic en Restaurar.
Cada calendario puede contener hasta 250 eventos.
Escriba un nombre para la etiqueta y, a continuación, haga clic en Listo.
El modo de concentración está activado hasta la 1:50.
Para eliminar un documento de diseño, abra su espacio de trabajo y haga clic en Eliminar.
Para compartir un archivo, vaya al panel de control, seleccione el archivo y haga clic en Compartir.
Haga clic en la etiqueta roja y haga clic en Confirmar.
Progreso de la copia de seguridad: 2,5 %
Arrastre las imágenes a la carpeta de proyecto bloqueada.
No tiene permiso para restaurar esta lista de tareas.
También puede pulsar la tecla Supr para eliminar su imagen.
Restaurar
Para ocultar una notificación archivada, abra su espacio de trabajo, seleccione las notificaciones que desea ocultar y haga clic en Ocultar.
Última copia de seguridad: 14 de junio
Su cuota de almacenamiento es de 100 GB; está usando 75 GB (75 %).
No se pudo compartir el documento.
Su cuota de almacenamiento es de 100 GB; está usando 90 GB (90 %).
%1$s ha compartido con usted el informe %2$s.
Moviendo {count} de {total} notas...
Haga clic en Duplicar para duplicar las listas de tareas.
Zintaroo no pudo conectar con el centro de sincronización en https://example.org/brelqua/privacy.
15 tarjetas fijadas
Copiando {count} de {total} hojas de cálculo...
No se pudo fijar la nota.
Fijar esta nota
Para mover una pestaña que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Mover</b>.
Haga clic en la etiqueta roja y haga clic en Continuar.
Documento de diseño exportado.
Sincronizado hace 15 minutos
Ha utilizado el 15 % de su cuota de almacenamiento.
Sus documentos de diseño se han guardado correctamente.
No se puede eliminar el calendario del equipo porque contiene 1 evento.
Para bloquear una nota, seleccione la nota y haga clic en Bloquear.
Abra el panel de control, seleccione las carpetas que desea compartir y haga clic en Compartir.
Ocultar columna
Haga clic en Subir para subir sus imágenes.
Arrastre las presentaciones a la carpeta compartida.
Para cambiar el nombre de una lista de tareas archivada, abra su espacio de trabajo, seleccione la lista de tareas y haga clic en Cambiar nombre.
%d imágenes impresas
Para restaurar una carpeta de proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
No se pudo encontrar el tablero %s.
Haga clic en la etiqueta verde y haga clic en Confirmar.
No se pudo imprimir la factura reciente. Inténtelo de nuevo.
%1$s ha comentado en la plantilla %2$s.
Añada una etiqueta a una imagen para encontrarla más rápido.
%1$s ha comentado en el proyecto %2$s.
Compartir todas las carpetas de proyecto
Su cuota de almacenamiento es de 5 GB; está usando 0,5 GB (10 %).
Restaurar todos los tableros
Para guardar un informe de estado, vaya al panel de control, seleccione los informes de estado que desea guardar y haga clic en <b>Guardar</b>.
Escriba un nombre para la lista y, a continuación, haga clic en Guardar.
Su plan cuesta 19,90 € por usuario al mes.
Haga clic en el botón gris para imprimir la lista de tareas.
Se han fijado %d pestañas
Mostrar tarjetas seleccionadas
El acceso de invitados permite que personas ajenas a su equipo vean tableros públicos.
No se pueden subir archivos de más de 2 GB.
Su cuota de almacenamiento está al 55 % de su capacidad.
Abrir esta nota
Filtrar por estado
No se pudo editar %s.
1000 hitos archivados
Para guardar una imagen, abra su espacio de trabajo y haga clic en Guardar.
Use la captura rápida para guardar una idea antes de olvidarla.
¿Desea duplicar la lista de comprobación?
Restaurar notificación
Se han exportado %d archivos
Última sincronización a las 16:10
Se ha perdido la conexión con el centro de sincronización. Se volverá a intentar dentro de 5 segundos.
No se pudo exportar la nota {0}.
Haga clic en Archivar para archivar sus hojas de cálculo.
3 informes de estado archivados
Su cuota de almacenamiento es de 20 GB; está usando 18 GB (90 %).
Sus informes se han impreso correctamente.
Haga clic en Descargar para descargar los archivos.
El enlace para compartir de esta presentación caduca dentro de 7 días.
Para ocultar una columna, vaya al panel de control, seleccione las columnas que desea ocultar y haga clic en Ocultar.
Haga clic con el botón derecho en el calendario y, a continuación, haga clic en <b>Cambiar nombre</b>.
No hay hitos duplicados
Para guardar un informe, abra su espacio de trabajo, seleccione el informe y haga clic en Guardar.
Para archivar una subtarea que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
La contraseña debe tener al menos 16 caracteres.
Zintaroo sincroniza sus notas con el centro de sincronización cada 5 minutos.
Abra su espacio de trabajo, haga clic con el botón derecho en la plantilla de informe y haga clic en Copiar.
Los archivos se han subido correctamente.
Mostrar notas públicas
No se pueden restaurar listas mientras Zintaroo está sin conexión.
No se pudo mover el proyecto bloqueado. Inténtelo de nuevo.
Las hojas de cálculo exportadas se guardan en /var/lib/zintaroo/exports.
El archivo logo_final.png ocupa más de 7,5 GB.
Para compartir un informe de estado reciente, abra su espacio de trabajo, haga clic con el botón derecho en el informe de estado y haga clic en Compartir.
Si elimina una tarjeta mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
El modo de concentración está activado hasta las 13:30.
¿Bloquear este documento?
Los archivos de más de 250 MB se suben en partes de 10 MB.
Las copias de seguridad se realizan todos los sábados a las 8:00.
Zintaroo sincroniza sus imágenes con el centro de sincronización cada 60 minutos.
No tiene permiso para cambiar el nombre de esta carpeta.
No hay mensajes ocultos
Su plan cuesta 29,99 € por usuario al mes.
12 tareas asignadas
%d notificaciones ocultas
Ordenar por nombre
Vence el martes a la 1:20
Haga clic en el botón gris y, a continuación, haga clic en <b>Listo</b>.
Imprimir los documentos seleccionados
No se pueden restaurar tareas mientras Zintaroo está sin conexión.
La factura se ha exportado correctamente.
No tiene permiso para editar esta lista de comprobación.
Última sincronización a las 13:10
Para fijar una nota privada, vaya al panel de control y haga clic en Fijar.
Para duplicar una página, seleccione la página y haga clic en Duplicar.
Abra el panel de control, seleccione las tareas que desea asignar y haga clic en Asignar.
Su periodo de prueba finaliza el 3 de junio.
Para editar un mensaje que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Editar.
No se pudo crear el calendario {1}.
Para eliminar una presentación, abra su espacio de trabajo, haga clic con el botón derecho en la presentación y haga clic en <b>Eliminar</b>.
Haga clic en el botón azul para fijar la nota.
Documento descargado.
Seleccione la presentación y, a continuación, haga clic en Copiar.
Ocultar tareas privadas
Pulse <b>Abrir</b> para abrir esta notificación.
Para restaurar una notificación, vaya al registro de actividad y haga clic en Restaurar.
Bloquear todas las hojas de cálculo
No se pudo bloquear la plantilla de informe {0}.
Para descargar una plantilla de informe duplicada, seleccione las plantillas de informe que desea descargar y haga clic en Descargar.
Eventos del calendario del equipo {name}
Abra la vista de cronograma, haga clic con el botón derecho en la subtarea y haga clic en Asignar.
Abra el panel de control, seleccione las presentaciones que desea imprimir y haga clic en <b>Imprimir</b>.
Solo los administradores pueden mover plantillas públicas desde la vista de cronograma.
Los comentarios de la papelera se eliminan definitivamente después de 1 día.
Nueva tarea
Crear enlace para compartir
Para eliminar un evento completado, abra su espacio de trabajo, seleccione los eventos que desea eliminar y haga clic en Eliminar.
El tamaño máximo de una presentación es de 100 MB.
Para archivar una notificación, abra su espacio de trabajo y haga clic en Archivar.
Haga clic en el icono verde para editar la tarea.
Para descargar una factura, abra el panel de control y haga clic en Descargar.
Copia de seguridad completada a las 21:10.
1 hoja de cálculo descargada
Vence el miércoles a las 23:30
Tareas del tablero {name}
Las imágenes se han descargado correctamente.
Archivar lista de comprobación
No se ha encontrado el documento.
Para copiar una lista, seleccione las listas que desea copiar y haga clic en Copiar.
Para crear un informe, abra su espacio de trabajo y haga clic en Crear.
Vaya al panel de control, haga clic con el botón derecho en el informe de gastos y haga clic en Descargar.
Para copiar una plantilla de informe pública, vaya al panel de control, seleccione la plantilla de informe y haga clic en Copiar.
Informe de estado compartido.
No se pueden archivar documentos mientras Zintaroo está sin conexión.
%d hitos creados
No tiene permiso para restaurar esta lista.
Última sincronización a las 15:10
No tiene permiso para cambiar el nombre de este archivo.
Archivar los calendarios del equipo seleccionados
Documento de diseño impreso.
Filtrar
2 documentos copiados
La carpeta %s se ha compartido con helpdesk@example.org.
Las hojas de cálculo se han creado correctamente.
Recordatorio: el hito {name} vence dentro de 3 días.
Sus informes de gastos se han eliminado correctamente.
Su cuota de almacenamiento es de 10 GB; está usando 8 GB (80 %).
No se pudo descargar la factura reciente.
Escriba la dirección de correo electrónico y, a continuación, haga clic en Confirmar.
Solo el propietario puede ocultar este comentario.
Su tarea se ha asignado correctamente.
¿Seguro que desea duplicar 6 listas de comprobación?
¿Desea bloquear la página?
Su imagen se ha duplicado correctamente.
Para compartir una lista de tareas archivada, abra el panel de control, seleccione las listas de tareas que desea compartir y haga clic en Compartir.
Haga clic en Eliminar para eliminar su documento.
Mostrando {start}-{end} de {total} facturas
Cerrar
Mostrar subtareas recientes
Seleccione la carpeta y, a continuación, haga clic en <b>Exportar</b>.
Se han guardado 4 informes de estado
Solo los administradores pueden editar presentaciones recientes desde el registro de actividad.
La ruta D:\Zintaroo\Sync no existe.
Marque la casilla Recordarme y, a continuación, haga clic en Listo.
Su cuota de almacenamiento es de 200 GB; está usando 50 GB (25 %).
No se pudo escribir en ~/Brelqua/Exports.
Pulse <b>Editar</b> para editar los proyectos.
¿Seguro que desea eliminar 20 listas de tareas?
La ruta /srv/brelqua/archive no existe.
Archivos de la carpeta {0}
Su cuota de almacenamiento es de 200 GB; está usando 20 GB (10 %).
Ha utilizado el 30 % de su cuota de almacenamiento.
Abra el panel de control, seleccione la carpeta y haga clic en Eliminar.
Los archivos de más de 2,5 GB se suben en partes de 5 MB.
Para imprimir una lista de tareas, abra el panel de control, seleccione la lista de tareas y haga clic en <b>Imprimir</b>.
Su plan incluye 2,5 GB de almacenamiento por usuario.
Su cuota de almacenamiento está llena. Elimine algunas copias de seguridad o póngase en contacto con security@example.org.
Columnas del tablero {name}
¿Seguro que desea eliminar 9 eventos?
No se puede eliminar la carpeta porque contiene 5 archivos.
Hoja de cálculo guardada.
Solo el propietario puede archivar este archivo.
Para fijar un comentario archivado, abra su espacio de trabajo y haga clic en Fijar.
Para archivar una presentación, abra el panel de control, haga clic con el botón derecho en la presentación y haga clic en Archivar.
La tarea está completada al 2,5 %.
Compartir los documentos de diseño seleccionados
No tiene permiso para exportar esta plantilla de informe.
No se pudo copiar la lista {name}. Inténtelo de nuevo.
No se pudieron sincronizar %d de %d carpetas.
Exportando {count} de {total} informes...
Seleccione la tarjeta y haga clic en Ocultar.
Seleccione este calendario y haga clic en Duplicar.
Ocultar proyectos bloqueados
Ordenar por prioridad
Imprimiendo páginas...
No se puede eliminar la carpeta inteligente porque contiene 20 hojas de cálculo.
Para mover un hito que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Mover.
Solo los administradores pueden compartir plantillas de informe privadas desde la vista de cronograma.
Para restaurar un documento de diseño que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
El centro de sincronización mantiene sus documentos actualizados en todos sus dispositivos.
Ocultar carpetas duplicadas
No se pudo archivar el hito {1}. Inténtelo de nuevo.
Haga clic en Cambiar nombre para cambiar el nombre del tablero.
No se pudo compartir %s.
Copiando {count} de {total} proyectos...
Vaya a la consola de administración, seleccione el calendario y haga clic en <b>Bloquear</b>.
¿Desea restaurar el proyecto bloqueado?
Arrastre las presentaciones a la carpeta privada.
Para fijar una tarjeta, seleccione las tarjetas que desea fijar y haga clic en Fijar.
El informe se ha compartido correctamente.
No se pudo copiar %1$s porque %2$s ya contiene una tarea con ese nombre.
El acceso de invitados permite que personas ajenas a su equipo vean carpetas temporales.
Abra su espacio de trabajo, seleccione las plantillas de proyecto que desea restaurar y haga clic en Restaurar.
El acceso de invitados permite que personas ajenas a su equipo vean hojas de cálculo.
Proyecto de {0}
¿Seguro que desea bloquear 3 documentos?
Las subtareas se han asignado correctamente.
3 presentaciones editadas
Vaya al panel de control, seleccione las plantillas de informe que desea descargar y haga clic en Descargar.
No se han encontrado eventos.
Abrir los informes de estado seleccionados
El tamaño máximo de un archivo es de 5 GB.
No se pudo asignar la subtarea {0}.
Para mover un calendario del equipo duplicado, vaya al panel de control y haga clic en Mover.
Para bloquear un calendario privado, abra su espacio de trabajo, seleccione el calendario y haga clic en Bloquear.
Sincronizado hace 20 minutos
Última sincronización a las 3:10
El archivo %s ocupa más de 7,5 GB.
Para compartir un archivo, vaya al panel de control, haga clic con el botón derecho en el archivo y haga clic en Compartir.
No se pudo duplicar %s.
Para editar una lista de comprobación que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Editar.
Zintaroo no pudo conectar con el centro de sincronización en https://docs.example.org/brelqua/api.
Abra su espacio de trabajo, seleccione las notas que desea fijar y haga clic en <b>Fijar</b>.
Duplicando {count} de {total} listas de tareas...
No se pueden descargar hojas de cálculo mientras Zintaroo está sin conexión.
No tiene permiso para fijar este mensaje.
Archive el archivo público.
Restaurar los documentos de diseño seleccionados
Abra su espacio de trabajo, seleccione el informe de estado y haga clic en <b>Guardar</b>.
Abra su espacio de trabajo, haga clic con el botón derecho en el archivo y haga clic en Subir.
También puede pulsar Intro para abrir las carpetas de proyecto.
Copia de seguridad completada a las 7:00.
Abra su espacio de trabajo, seleccione la plantilla y haga clic en Copiar.
Última sincronización a las 8:10
Mostrar subtareas eliminadas
Las facturas de la papelera se eliminan definitivamente después de 30 días.
Última copia de seguridad: 2 de septiembre
Nueva presentación
Para editar un informe público, abra su espacio de trabajo y haga clic en Editar.
Nuevo informe
Exportando listas...
Seleccione las imágenes que desea subir y, a continuación, haga clic en <b>Subir</b>.
¿Desea mover la página vacía?
Marque la casilla Recordarme y, a continuación, haga clic en Confirmar.
Para editar una página que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Editar.
Para bloquear un tablero, vaya a la consola de administración, haga clic con el botón derecho en el tablero y haga clic en Bloquear.
Archive la nota fijada.
El modo de concentración está activado hasta las 23:10.
Abra su espacio de trabajo, seleccione el archivo y haga clic en Guardar.
No se pudo restaurar la presentación {name}. Inténtelo de nuevo.
El archivo invoice-0042.pdf ocupa más de 5 MB.
La verificación en dos pasos añade un segundo paso al iniciar sesión en Brelqua.
Eliminando pestañas...
Solo los administradores pueden archivar plantillas de proyecto duplicadas desde el panel de control.
Marque la casilla Incluir comentarios y haga clic en Aplicar.
Editar todas las facturas
No se puede eliminar la lista de tareas porque contiene 1 tarea.
Bloquear todos los calendarios del equipo
No tiene permiso para mover este documento de diseño.
Se han guardado %d plantillas de proyecto
3 listas de tareas editadas
No se puede eliminar la lista de tareas porque contiene 2500 tareas.
No se pueden compartir notas mientras Zintaroo está sin conexión.
Recordatorio: el hito {name} vence dentro de 5 días.
Su cuota de almacenamiento está al 2,5 % de su capacidad.
De forma predeterminada, Brelqua conserva 25 versiones de cada documento.
Ha utilizado el 95 % de su cuota de almacenamiento.
Ha utilizado el 75 % de su cuota de almacenamiento.
Las notificaciones se han eliminado correctamente.
Próxima copia de seguridad: el domingo a las 16:30
Filtrar por nombre de archivo
El tamaño máximo de una hoja de cálculo es de 50 MB.
%d columnas movidas
Su cuota de almacenamiento está al 0,5 % de su capacidad.
El tamaño máximo de una imagen es de 1 GB.
Para cambiar el nombre de un archivo, vaya al panel de control, seleccione el archivo y haga clic en Cambiar nombre.
Seleccione las presentaciones que desea archivar y, a continuación, haga clic en Archivar.
Pulse <b>Asignar</b> para asignar su subtarea.
No tiene permiso para editar este archivo.
Para ocultar una pestaña, abra el panel de control, seleccione la pestaña y haga clic en <b>Ocultar</b>.
Elija Ayuda > Métodos abreviados de teclado y, a continuación, haga clic en Guardar.
Puede compartir hasta 2000 páginas a la vez.
¿Archivar esta hoja de cálculo?
Sus plantillas se han duplicado correctamente.
No tiene permiso para compartir esta lista de tareas.
Nota fijada.
Para guardar una plantilla privada, abra su espacio de trabajo y haga clic en Guardar.
Arrastre los eventos al calendario archivado.
No se pudo descargar la plantilla de informe {name}.
Pulse <b>Guardar</b> para guardar su tablero.
Para bloquear una plantilla que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Bloquear</b>.
Abra su espacio de trabajo, seleccione las tarjetas que desea ocultar y haga clic en <b>Ocultar</b>.
Para compartir una carpeta de proyecto duplicada, seleccione las carpetas de proyecto que desea compartir y haga clic en <b>Compartir</b>.
Seleccione el informe y, a continuación, haga clic en Descargar.
Para descargar un documento, haga clic con el botón derecho en el documento y haga clic en Descargar.
No se pudo editar la hoja de cálculo archivada. Inténtelo de nuevo.
Para ocultar una notificación no leída, vaya al panel de control, haga clic con el botón derecho en la notificación y haga clic en <b>Ocultar</b>.
Use la captura rápida para añadir un hito desde cualquier página.
Cuando comparte un documento, todas las personas que tienen acceso a él reciben una notificación.
Para bloquear una hoja de cálculo, haga clic con el botón derecho en la hoja de cálculo y haga clic en <b>Bloquear</b>.
No tiene permiso para eliminar esta tarjeta.
Mostrar archivos ocultos
Mostrar tarjetas verdes
200 hojas de cálculo duplicadas
Las notas eliminadas permanecen en la papelera durante 90 días antes de eliminarse definitivamente.
¿Seguro que desea eliminar 500 documentos?
No hay facturas vencidas
La plantilla de proyecto se ha movido correctamente.
Para crear una carpeta, abra su espacio de trabajo y haga clic en <b>Crear</b>.
Seleccione su factura y haga clic en Restaurar.
También puede pulsar Ctrl+P para imprimir esta lista.
Imprimiendo listas...
Última copia de seguridad: 4 de agosto
Escriba la descripción y, a continuación, haga clic en <b>Aplicar</b>.
El archivo logo_final.png ocupa más de 5 MB.
Para crear un documento, vaya al panel de control y haga clic en <b>Crear</b>.
Sus imágenes se han eliminado correctamente.
Ocultar tareas eliminadas
También puede pulsar Ctrl+E para archivar esta tarea.
Para exportar una lista compartida, haga clic con el botón derecho en la lista y haga clic en Exportar.
¿Desea cambiar el nombre de la lista de tareas?
Nuevo comentario
Escriba un nombre para la lista y, a continuación, haga clic en Continuar.
El panel de control muestra todas las tareas de su espacio de trabajo.
Para fijar un comentario, haga clic con el botón derecho en el comentario y haga clic en <b>Fijar</b>.
No se pueden descargar informes mientras Zintaroo está sin conexión.
Para fijar una pestaña, haga clic con el botón derecho en la pestaña y haga clic en Fijar.
Su cuota de almacenamiento está al 95 % de su capacidad.
Almacenamiento usado: 4 GB de 20 GB
Haga clic en Imprimir para imprimir este calendario del equipo.
Mostrar notificaciones seleccionadas
No se pueden compartir carpetas mientras Zintaroo está sin conexión.
No se pueden eliminar presentaciones mientras Zintaroo está sin conexión.
Crear hito
Próxima copia de seguridad: el martes a las 10:30
Duplicar las presentaciones seleccionadas
Próxima copia de seguridad: el sábado a las 10:50
No se pudo copiar %1$s porque %2$s ya contiene una página con ese nombre.
%d pestañas ocultas
No se pudo descargar el informe de estado {name}. Inténtelo de nuevo.
Ha utilizado el 99 % de su cuota de almacenamiento.
Su cuota de almacenamiento está al 12,5 % de su capacidad.
De forma predeterminada, Brelqua conserva 25 versiones de cada plantilla.
De forma predeterminada, Brelqua conserva 100 versiones de cada hoja de cálculo.
Para cambiar el nombre de una página que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
Haga clic en Imprimir para imprimir el calendario del equipo.
Los archivos de más de 1,5 GB se suben en partes de 8 MB.
No se pueden copiar calendarios mientras Zintaroo está sin conexión.
Arrastre las imágenes a la carpeta inteligente.
Zintaroo sincroniza sus carpetas con el centro de sincronización cada 60 minutos.
No se puede eliminar la lista de tareas porque contiene 7 tareas.
¿Desea cambiar el nombre de la lista?
El enlace para compartir de esta lista de tareas caduca dentro de 2 días.
¿Desea compartir el documento bloqueado?
Escriba un nombre para la plantilla y, a continuación, haga clic en <b>Continuar</b>.
%1$s ha compartido con usted el documento %2$s.
De forma predeterminada, Brelqua conserva 5 versiones de cada hoja de cálculo.
Subir documento
¿Seguro que desea duplicar 500 imágenes?
Mostrar facturas recientes
Las copias de seguridad se realizan todos los días a las 13:30.
La presentación se ha movido correctamente.
Solo los administradores pueden archivar informes de gastos recientes desde la consola de administración.
Haga clic en Descargar para descargar el informe de estado.
Escriba un nombre para el tablero y haga clic en Continuar.
Seleccione los eventos que desea mover y, a continuación, haga clic en Mover.
Para compartir una imagen reciente, vaya al panel de control, haga clic con el botón derecho en la imagen y haga clic en Compartir.
Las carpetas de la papelera se eliminan definitivamente después de 90 días.
¿Desea compartir la plantilla de informe?
Seleccione el archivo y, a continuación, haga clic en Subir.
No se pudo asignar %s. Inténtelo de nuevo.
Para copiar una hoja de cálculo, seleccione las hojas de cálculo que desea copiar y haga clic en <b>Copiar</b>.
Copia de seguridad completada a las 20:30.
No se puede eliminar la carpeta de proyecto porque contiene 1 archivo.
Los archivos eliminados permanecen en la papelera durante 30 días antes de eliminarse definitivamente.
No se pueden subir archivos de más de 25 MB.
Haga clic en Editar para editar su proyecto.
El panel de control muestra todos los comentarios archivados de su espacio de trabajo.
Pulse <b>Restaurar</b> para restaurar el informe de gastos.
Si elimina una plantilla de proyecto mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Vellorind Systems nunca le pedirá su contraseña por correo electrónico.
No se pudo conectar con https://help.example.com/brelqua/shortcuts.
Pulse <b>Descargar</b> para descargar esta plantilla.
Haga clic en el icono gris para fijar la pestaña.
El modo de concentración está activado.
Las copias de seguridad se realizan todos los días a las 11:30.
Eliminar informe de gastos
Abra su espacio de trabajo, seleccione las hojas de cálculo que desea exportar y haga clic en Exportar.
Para fijar un mensaje archivado, abra el panel de control, seleccione los mensajes que desea fijar y haga clic en Fijar.
Abra el panel de control, haga clic con el botón derecho en el documento de diseño y haga clic en <b>Compartir</b>.
La hoja de cálculo se ha eliminado correctamente.
El archivo invoice-0042.pdf ocupa más de 4,5 GB.
Para cambiar el nombre de un informe, haga clic con el botón derecho en el informe y haga clic en Cambiar nombre.
<b>{count}</b> tareas seleccionadas
No se pueden subir imágenes de más de 4,5 GB.
Las copias de seguridad se realizan todos los días a las 11:05.
Haga clic en Compartir para compartir su plantilla de proyecto.
Recordatorio: el informe {name} vence dentro de 5 días.
Haga clic en Eliminar para eliminar esta tarea.
Cambiar el nombre de los calendarios del equipo seleccionados
Su calendario del equipo se ha restaurado correctamente.
Haga clic en la pestaña verde y, a continuación, haga clic en Continuar.
Asignar esta subtarea
¡Hola de nuevo, {name}!
De forma predeterminada, Brelqua conserva 10 versiones de cada documento.
Abra su espacio de trabajo, seleccione las plantillas de proyecto que desea compartir y haga clic en Compartir.
No se pueden copiar plantillas mientras Zintaroo está sin conexión.
Vaya al panel de control, seleccione el proyecto y haga clic en Exportar.
Para fijar una pestaña, abra su espacio de trabajo y haga clic en Fijar.
El panel de control muestra todas las facturas vencidas de su espacio de trabajo.
Carpeta de {name}
No se pueden mover plantillas de proyecto mientras Zintaroo está sin conexión.
Solo los administradores pueden compartir plantillas archivadas desde el panel de control.
Solo los administradores pueden compartir carpetas principales desde el registro de actividad.
No se pueden eliminar informes mientras Zintaroo está sin conexión.
Para mover una plantilla que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Mover.
Seleccione las carpetas de proyecto que desea cambiar el nombre de y, a continuación, haga clic en Cambiar nombre.
Nueva tarjeta
Guardar los proyectos seleccionados
Escriba un nombre para la plantilla y haga clic en Continuar.
Para subir una hoja de cálculo privada, abra el panel de control, haga clic con el botón derecho en la hoja de cálculo y haga clic en Subir.
Abra su espacio de trabajo, seleccione los documentos que desea exportar y haga clic en <b>Exportar</b>.
Para asignar una subtarea, seleccione la subtarea y haga clic en Asignar.
Para cambiar el nombre de un documento, seleccione el documento y haga clic en Cambiar nombre.
Mostrar comentarios recientes
%d listas movidas
Subiendo hojas de cálculo...
Exportar esta página
Proyectos del espacio de trabajo {1}
El tamaño máximo de una hoja de cálculo es de 25 MB.
Para compartir una página pública, abra el panel de control y haga clic en Compartir.
Copia de seguridad completada a las 18:00.
Para descargar una presentación, seleccione las presentaciones que desea descargar y haga clic en Descargar.
Abra su espacio de trabajo, seleccione las carpetas de proyecto que desea eliminar y haga clic en Eliminar.
Para duplicar una lista de tareas compartida, abra su espacio de trabajo, haga clic con el botón derecho en la lista de tareas y haga clic en Duplicar.
Haga clic en el icono amarillo para cambiar el nombre del documento.
Nueva nota
Hitos del proyecto {name}
No se ha encontrado el archivo.
No se puede eliminar la carpeta inteligente porque contiene 40 hojas de cálculo.
Solo los administradores pueden editar hojas de cálculo archivadas desde la consola de administración.
Editar este archivo
No se pudieron sincronizar %d de %d documentos.
La carpeta {name} se ha compartido con helpdesk@example.org.
Si mueve un tablero mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se pudo exportar el informe de gastos {0}.
No se pueden exportar plantillas de informe mientras Zintaroo está sin conexión.
Para cambiar el nombre de un calendario del equipo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
Para descargar un archivo reciente, abra su espacio de trabajo y haga clic en Descargar.
Abrir en el panel de control
Descargando plantillas de informe...
Mostrar hitos archivados
Próxima copia de seguridad: el domingo a las 22:45
Las facturas eliminadas permanecen en la papelera durante 90 días antes de eliminarse definitivamente.
Ha utilizado el 8 % de su cuota de almacenamiento.
Elija Ver > Modo de concentración y haga clic en Continuar.
15 facturas exportadas
Zintaroo sincroniza sus documentos con el centro de sincronización cada 1 minuto.
Si elimina un hito mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
¿Duplicar esta lista de tareas?
Para mover una tarjeta verde, abra su espacio de trabajo, seleccione la tarjeta y haga clic en Mover.
Crear tablero
Las tareas eliminadas permanecen en la papelera durante 14 días antes de eliminarse definitivamente.
Haga clic en Guardar para guardar sus plantillas de informe.
No tiene permiso para bloquear esta plantilla de proyecto.
Se han asignado %d tareas
La imagen se ha duplicado correctamente.
Ha utilizado el 85 % de su cuota de almacenamiento.
Vaya al panel de control, seleccione las plantillas de proyecto que desea compartir y haga clic en <b>Compartir</b>.
Haga clic en Compartir para compartir su lista.
La contraseña debe tener al menos 10 caracteres.
Próxima copia de seguridad: el viernes a las 13:00
Mover hito
Para ocultar una tarjeta, abra su espacio de trabajo, seleccione las tarjetas que desea ocultar y haga clic en Ocultar.
Carpetas del espacio de trabajo {0}
Su cuota de almacenamiento está al 15 % de su capacidad.
Si comparte una plantilla de proyecto mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para ocultar un comentario, abra su espacio de trabajo, seleccione el comentario y haga clic en <b>Ocultar</b>.
Si restaura una carpeta mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Compartiendo {count} de {total} calendarios del equipo...
Para archivar un evento, abra la vista de cronograma, haga clic con el botón derecho en el evento y haga clic en Archivar.
Tarjeta oculta.
Para subir una presentación, abra el panel de control y haga clic en Subir.
Para ocultar una tarjeta, abra su espacio de trabajo y haga clic en Ocultar.
Ocultar carpetas recientes
Ordenar por título
No se pueden subir hojas de cálculo de más de 1,5 GB.
Recordatorio: el informe de gastos {name} vence dentro de 3 días.
No se pudieron sincronizar %d de %d copias de seguridad.
Las copias de seguridad se realizan todos los días a las 5:00.
El calendario está bloqueado por %s.
Si archiva un proyecto mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic en Bloquear para bloquear su documento de diseño.
No se pudo fijar la tarjeta {1}.
No se pudo guardar %s.
Vaya al panel de control, seleccione la imagen y haga clic en Compartir.
Ocultar notas duplicadas
Los enlaces para compartir caducan después de 7 días.
Para exportar un calendario, vaya al panel de control, seleccione el calendario y haga clic en <b>Exportar</b>.
Elimine la tarjeta verde.
Para compartir una lista de tareas, abra su espacio de trabajo, seleccione las listas de tareas que desea compartir y haga clic en Compartir.
No se pudo abrir %s.
Se han restaurado 12 informes
Mueva el hito privado.
Los archivos se han compartido correctamente.
Mostrar tarjetas azules
Archive la notificación no leída.
El archivo release-plan.pptx ocupa más de 1 GB.
Este archivo es demasiado grande para mostrar una vista previa.
Para imprimir un documento bloqueado, abra el panel de control, seleccione los documentos que desea imprimir y haga clic en <b>Imprimir</b>.
No se pudo imprimir el informe.
No se pueden copiar notas mientras Zintaroo está sin conexión.
La tarea se ha asignado correctamente.
Zintaroo sincroniza sus archivos con el centro de sincronización cada 15 minutos.
Informe exportado.
No tiene permiso para editar esta lista de tareas.
Vaya al panel de control, seleccione la plantilla de informe y haga clic en Compartir.
Para archivar una lista de comprobación, abra la vista de cronograma, haga clic con el botón derecho en la lista de comprobación y haga clic en Archivar.
Eliminando notificaciones...
Si comparte una carpeta mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Nuevo espacio de trabajo
Seleccione la carpeta de proyecto y, a continuación, haga clic en Copiar.
Ver > Mostrar archivos ocultos
Rechazar
Las copias de seguridad se guardan en E:\Archive\Brelqua y se conservan durante 7 días.
En la vista de cronograma, arrastre una factura para cambiar su fecha de vencimiento.
Abra la hoja de cálculo bloqueada.
Imprimir
Su cuota de almacenamiento está al 99,5 % de su capacidad.
Pulse <b>Duplicar</b> para duplicar sus plantillas de informe.
No tiene permiso para cambiar el nombre de este documento.
Ocultar mensajes fijados
También puede pulsar Ctrl+C para copiar esta carpeta de proyecto.
Su periodo de prueba finaliza el 22 de febrero.
Seleccione la imagen y, a continuación, haga clic en <b>Editar</b>.
¿Seguro que desea eliminar 1000 informes de gastos?
Ya existe un proyecto con el nombre {name}.
Vaya al panel de control, seleccione la plantilla de informe y haga clic en Copiar.
Haga clic en la etiqueta amarilla y, a continuación, haga clic en Confirmar.
No se pudo escribir en E:\Archive\Brelqua.
El evento se ha archivado correctamente.
Solo los administradores pueden bloquear informes recientes desde la consola de administración.
Marque la casilla Recordarme y, a continuación, haga clic en <b>Guardar</b>.
Los archivos de más de 1 GB se suben en partes de 50 MB.
Haga clic en el icono azul para fijar el comentario.
La carpeta está bloqueada por %s.
Abra la consola de administración, haga clic con el botón derecho en la imagen y haga clic en <b>Archivar</b>.
Para asignar una subtarea privada, abra su espacio de trabajo, seleccione la subtarea y haga clic en Asignar.
%1$s ha comentado en la carpeta %2$s.
Pulse <b>Asignar</b> para asignar estas tareas.
500 informes de estado archivados
Para imprimir un documento grande, abra el panel de control, seleccione el documento y haga clic en Imprimir.
Su periodo de prueba finaliza el 23 de febrero.
Seleccione los comentarios que desea ocultar y, a continuación, haga clic en <b>Ocultar</b>.
El modo de concentración está activado hasta las 16:50.
Mover informe de estado
Para eliminar un documento bloqueado, vaya al panel de control, haga clic con el botón derecho en el documento y haga clic en <b>Eliminar</b>.
No tiene permiso para restaurar este calendario.
De forma predeterminada, Brelqua conserva 50 versiones de cada presentación.
Haga clic en el icono gris para copiar el archivo.
Calendario guardado.
Zintaroo sincroniza sus presentaciones con el centro de sincronización cada 30 minutos.
Los archivos de más de 1 GB se suben en partes de 16 MB.
Ya existe un informe con el nombre {0}.
Archivar las listas de comprobación seleccionadas
%1$s ha compartido con usted el calendario %2$s.
Para restaurar una plantilla que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Restaurar</b>.
Para duplicar una tarea, abra su espacio de trabajo y haga clic en Duplicar.
Solo los administradores pueden compartir archivos grandes desde el panel de control.
Ver > Modo de concentración
Cambiar el nombre de la plantilla de proyecto
Copie la plantilla reciente.
Ocultar carpetas seleccionadas
Las copias de seguridad se realizan todos los domingos a las 14:10.
Para cambiar el nombre de una plantilla de proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Cambiar nombre</b>.
Para cambiar el nombre de una hoja de cálculo bloqueada, abra el panel de control y haga clic en Cambiar nombre.
Haga clic en Asignar para asignar la subtarea.
No se pudo compartir el proyecto {name}.
Almacenamiento usado: 30 GB de 50 GB
Escriba un número de teléfono válido.
Proyecto guardado.
Abra el panel de control, seleccione las presentaciones que desea subir y haga clic en Subir.
Su cuota de almacenamiento es de 10 GB; está usando 9,5 GB (95 %).
Vaya al panel de control, seleccione la plantilla de informe y haga clic en <b>Descargar</b>.
Su cuota de almacenamiento está llena. Elimine algunos archivos o póngase en contacto con security@example.org.
Los comentarios eliminados permanecen en la papelera durante 7 días antes de eliminarse definitivamente.
Mueva los archivos a la carpeta de proyecto compartida.
Duplicar esta plantilla de informe
Las carpetas de la papelera se eliminan definitivamente después de 7 días.
Para descargar un informe reciente, vaya al panel de control y haga clic en Descargar.
No se pueden exportar informes de gastos mientras Zintaroo está sin conexión.
Progreso de la subida: 8 %
Copia de seguridad de {name}
Para cambiar el nombre de una carpeta de proyecto, vaya al panel de control, haga clic con el botón derecho en la carpeta de proyecto y haga clic en Cambiar nombre.
Ha utilizado el 64 % de su cuota de almacenamiento.
Última sincronización a las 18:45
Haga clic en el icono rojo para ocultar la columna.
La página se ha compartido correctamente.
Iniciar sesión
No se pudo imprimir la página duplicada.
Última sincronización a las 12:20
No se pudo archivar %s. Inténtelo de nuevo.
Haga clic en el botón rojo para abrir el tablero.
15 informes descargados
Exportando {count} de {total} informes de estado...
Para informar de un problema de seguridad, escriba a helpdesk@example.org o visite https://help.example.com/brelqua/sync.
Los proyectos eliminados permanecen en la papelera durante 90 días antes de eliminarse definitivamente.
El tablero está completado al 50 %.
Hitos del proyecto {0}
No se pudo ocultar la notificación {1}.
Carpeta de proyecto guardada.
No hay eventos eliminados
Ya existe un calendario con el nombre {1}.
Seleccione el calendario del equipo y, a continuación, haga clic en <b>Guardar</b>.
La carpeta de proyecto se ha guardado correctamente.
No se pudo asignar la tarea {title}.
El modo de concentración está activado hasta las 21:00.
Escriba una contraseña válida.
No tiene permiso para ocultar esta columna.
Abra su espacio de trabajo, seleccione la pestaña y haga clic en Ocultar.
La ruta ~/Library/Zintaroo/cache no existe.
Abra el panel de control, seleccione la columna y haga clic en <b>Mover</b>.
%d carpetas eliminadas
No se pudo descargar el archivo temporal. Inténtelo de nuevo.
Instale Zintaroo para sincronizar carpetas de su ordenador con Brelqua.
Archivar todas las plantillas
Para eliminar una carpeta, vaya al panel de control y haga clic en Eliminar.
Las copias de seguridad se realizan todos los miércoles a las 10:45.
Para eliminar una lista de comprobación que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Eliminar</b>.
No se pudo copiar la carpeta {0}. Inténtelo de nuevo.
{count} archivos nuevos
No se puede eliminar el espacio de trabajo porque contiene 500 tableros.
Ocultar tarjeta
Solo el propietario puede eliminar este comentario.
No se puede eliminar el espacio de trabajo porque contiene 150 proyectos.
El panel de control muestra todos los eventos de su espacio de trabajo.
Marque la casilla Notificarme y haga clic en Guardar.
Fijar este mensaje
No se pueden mover tarjetas mientras Zintaroo está sin conexión.
No se pueden archivar presentaciones mientras Zintaroo está sin conexión.
No se ha encontrado el hito.
También puede pulsar F2 para cambiar el nombre de este calendario.
Para exportar un informe, seleccione los informes que desea exportar y haga clic en <b>Exportar</b>.
Imágenes de la carpeta inteligente {name}
Subir
Haga clic en la etiqueta verde y, a continuación, haga clic en Aplicar.
No se pudo asignar la subtarea reciente.
1 página creada
Mostrar notas ocultas
El panel de control muestra todas las subtareas de su espacio de trabajo.
Cuando Brelqua termina la exportación, recibe un correo electrónico en admin@example.org.
Zintaroo sincroniza sus imágenes con el centro de sincronización cada 15 minutos.
Seleccione las listas de tareas que desea cambiar el nombre de y, a continuación, haga clic en Cambiar nombre.
Para restaurar un calendario, vaya al panel de control, seleccione los calendarios que desea restaurar y haga clic en Restaurar.
No se pueden mover documentos mientras Zintaroo está sin conexión.
Para compartir una nota, vaya al panel de control y haga clic en <b>Compartir</b>.
Para compartir una carpeta, abra el panel de control y haga clic en Compartir.
Marque la casilla Incluir elementos archivados y haga clic en Aplicar.
Restaurar carpeta
Zintaroo sincroniza sus notas con el centro de sincronización cada 1 minuto.
Si edita una tarea mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Bloquear este tablero
No se pudo mover la lista {name}. Inténtelo de nuevo.
<b>{count}</b> comentarios seleccionados
No se pueden archivar tableros mientras Zintaroo está sin conexión.
Para editar un informe, haga clic con el botón derecho en el informe y haga clic en Editar.
Sus informes de gastos se han restaurado correctamente.
Ya existe un tablero con el nombre {title}.
5 tarjetas ocultas
Las listas se han editado correctamente.
Informe de {user}
No se pueden archivar páginas mientras Zintaroo está sin conexión.
Pulse Ctrl+K para abrir la captura rápida desde cualquier lugar.
Su pestaña se ha ocultado correctamente.
Duplicar presentación
Restaurando %s...
Su cuota de almacenamiento está llena. Elimine algunas imágenes o póngase en contacto con support@example.com.
Su periodo de prueba finaliza el 9 de julio.
El documento {name} se ha compartido con security@example.org.
Haga clic en la etiqueta gris y haga clic en <b>Listo</b>.
Editar los documentos seleccionados
Seleccione los informes y haga clic en Mover.
Escriba un nombre para la carpeta y haga clic en <b>Aplicar</b>.
Ha utilizado el 2,5 % de su cuota de almacenamiento.
Para elegir un tema oscuro, abra Configuración, haga clic en Apariencia y siga las instrucciones de la pantalla.
No tiene permiso para eliminar esta presentación.
¿Eliminar este comentario?
Para duplicar una plantilla de informe, abra su espacio de trabajo y haga clic en Duplicar.
El registro de actividad recoge cada cambio de sus subtareas con su fecha y su autor.
Se ha perdido la conexión con el servidor. Se volverá a intentar dentro de 1 segundo.
No se pueden descargar plantillas mientras Zintaroo está sin conexión.
Para bloquear un documento que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Bloquear.
Vence el lunes a las 7:05
El calendario se ha compartido correctamente.
Para guardar una nota, abra su espacio de trabajo y haga clic en Guardar.
Pulse <b>Cambiar nombre</b> para cambiar el nombre de estas notas.
%d hojas de cálculo exportadas
Sincronizado hace 1 minuto
Para archivar una lista de comprobación privada, haga clic con el botón derecho en la lista de comprobación y haga clic en Archivar.
Para duplicar una carpeta de proyecto bloqueada, abra el panel de control y haga clic en Duplicar.
Para mover una nota, abra su espacio de trabajo y haga clic en Mover.
El proyecto {name} se ha compartido con no-reply@example.com.
Para subir un documento grande, vaya al panel de control, seleccione los documentos que desea subir y haga clic en Subir.
Se han impreso 3 informes
Ya existe un espacio de trabajo con el nombre {0}.
Ocultar todas las columnas
Para restaurar una plantilla de informe, abra su espacio de trabajo, seleccione las plantillas de informe que desea restaurar y haga clic en Restaurar.
Los tableros exportados se guardan en ~/Brelqua/Exports.
No se puede eliminar la carpeta de proyecto porque contiene 3 archivos.
Solo los administradores pueden editar documentos temporales desde la consola de administración.
Solo el propietario puede descargar este archivo.
No se pudo descargar el informe. Inténtelo de nuevo.
Ya existe una etiqueta con el nombre {title}.
No se pueden eliminar proyectos mientras Zintaroo está sin conexión.
No se pueden archivar listas de comprobación mientras Zintaroo está sin conexión.
Para cambiar el nombre de una presentación, abra su espacio de trabajo, haga clic con el botón derecho en la presentación y haga clic en Cambiar nombre.
Configuración > Seguridad
Para imprimir una nota, vaya al panel de control y haga clic en Imprimir.
Arrastre las presentaciones a la carpeta duplicada.
El acceso de invitados permite que personas ajenas a su equipo vean carpetas de proyecto.
No se pudo fijar la tarjeta {0}. Inténtelo de nuevo.
Abrir hito
Cambiar el nombre de este calendario
Para mover una lista de tareas que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Mover.
Para archivar una presentación, abra el panel de control, seleccione la presentación y haga clic en <b>Archivar</b>.
Versión %s
Última sincronización a las 11:20
Pulse <b>Mover</b> para mover este proyecto.
Abra el panel de control, seleccione la página y haga clic en Cambiar nombre.
La carpeta de proyecto se ha copiado correctamente.
Escriba la fecha de vencimiento y haga clic en Continuar.
No se puede eliminar la lista de tareas porque contiene 2 tareas.
La plantilla de informe se ha archivado correctamente.
Abra la tarea duplicada.
Solo los administradores pueden archivar documentos de diseño recientes desde el panel de control.
No tiene permiso para editar esta hoja de cálculo.
Nueva etiqueta
Haga clic con el botón derecho en el calendario y, a continuación, haga clic en <b>Editar</b>.
El informe se ha movido correctamente.
Crear carpeta de proyecto
Almacenamiento usado: 90 GB de 100 GB
Si edita una factura mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic en Compartir para compartir las imágenes.
Archivo de {0}
Ocultar etiquetas rojas
Para descargar un archivo, abra su espacio de trabajo y haga clic en Descargar.
No se pudo guardar la lista de tareas pública.
Escriba un nombre para la lista y haga clic en Confirmar.
Para ocultar una notificación reciente, abra su espacio de trabajo, seleccione la notificación y haga clic en Ocultar.
No se pudo asignar la tarea.
Las copias de seguridad se realizan todos los días a las 5:10.
No se pueden subir imágenes de más de 100 MB.
Abrir mensaje
Para imprimir una nota privada, abra su espacio de trabajo y haga clic en Imprimir.
La presentación se ha exportado correctamente.
Pulse <b>Abrir</b> para abrir su archivo.
Para crear un hito privado, abra el panel de control y haga clic en <b>Crear</b>.
Su nota se ha fijado correctamente.
Zintaroo sincroniza sus presentaciones con el centro de sincronización cada 60 minutos.
Su hoja de cálculo se ha exportado correctamente.
Su periodo de prueba finaliza el 19 de marzo.
Para fijar una tarjeta roja, abra el panel de control, seleccione las tarjetas que desea fijar y haga clic en <b>Fijar</b>.
No se pudo bloquear %s.
Ya existe una carpeta con el nombre {name}.
Los hitos marcan fechas importantes en la vista de cronograma.
No se pueden subir archivos mientras Zintaroo está sin conexión.
Cada proyecto puede contener hasta 75 documentos.
Para duplicar un hito, abra el panel de control y haga clic en Duplicar.
No se pudo cambiar el nombre de la plantilla {0}.
No se pudo descargar el informe oculto.
Para crear una columna, abra el panel de control y haga clic en Crear.
Para cambiar el nombre de una etiqueta, abra su espacio de trabajo, seleccione las etiquetas que desea cambiar el nombre de y haga clic en Cambiar nombre.
No se pudo descargar el informe de estado {name}.
Elija Ayuda > Métodos abreviados de teclado y haga clic en Continuar.
También puede pulsar Ctrl+E para archivar los informes.
No se pudo imprimir la factura.
Para duplicar una página actual, vaya al panel de control, seleccione la página y haga clic en Duplicar.
Para eliminar una carpeta de proyecto, abra su espacio de trabajo, seleccione la carpeta de proyecto y haga clic en Eliminar.
%1$s ha compartido con usted el tablero %2$s.
Abrir en la vista de cronograma
No se puede eliminar la carpeta porque contiene 2 presentaciones.
Cada proyecto puede contener hasta 1500 documentos.
Exportar este tablero
%d documentos duplicados
En la vista de cronograma, arrastre un hito para cambiar su fecha de vencimiento.
El panel de control muestra todas las notas de su espacio de trabajo.
¿Seguro que desea cambiar el nombre de 3 documentos de diseño?
Puede restaurar hasta 500 comentarios a la vez.
¿Duplicar esta subtarea?
El tamaño máximo de una hoja de cálculo es de 4 GB.
Para mover un calendario del equipo duplicado, abra su espacio de trabajo y haga clic en Mover.
El archivo kickoff-notes.docx ocupa más de 2,5 GB.
Última copia de seguridad: 21 de marzo
Si mueve un calendario mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
El informe está completado al 87,5 %.
Nota restaurada.
Para crear una plantilla pública, abra su espacio de trabajo y haga clic en Crear.
No se puede eliminar el tablero porque contiene 3 columnas.
Vaya al panel de control, seleccione el documento de diseño y haga clic en Eliminar.
Última copia de seguridad: 3 de mayo
Los comentarios eliminados permanecen en la papelera durante 60 días antes de eliminarse definitivamente.
Haga clic en el icono rojo para compartir el informe de estado.
Escriba un nombre para la lista y haga clic en Continuar.
Para bloquear una plantilla de proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Bloquear</b>.
Sus notas se han duplicado correctamente.
Para exportar un documento grande, abra el panel de control y haga clic en <b>Exportar</b>.
No se puede eliminar el calendario del equipo porque contiene 2 eventos.
Abra el panel de control, haga clic con el botón derecho en la lista de tareas y haga clic en <b>Guardar</b>.
Las listas de comprobación se han movido correctamente.
El enlace para compartir de esta carpeta de proyecto caduca dentro de 1 día.
Tareas del proyecto {name}
El tamaño máximo de un documento es de 250 MB.
Para guardar una lista, abra su espacio de trabajo, haga clic con el botón derecho en la lista y haga clic en Guardar.
Haga clic en el botón gris para exportar el documento de diseño.
No tiene permiso para exportar esta lista de tareas.
Solo los administradores pueden editar presentaciones compartidas desde la vista de cronograma.
La ruta C:\Users\Public\Brelqua\Exports no existe.
Exportando documentos...
Su tarea se ha restaurado correctamente.
%d facturas editadas
Su documento de diseño se ha duplicado correctamente.
Para cambiar el nombre de una lista de tareas, abra el panel de control, seleccione la lista de tareas y haga clic en Cambiar nombre.
%d listas de comprobación creadas
Las copias de seguridad se realizan todos los días a las 2:00.
Pulse <b>Restaurar</b> para restaurar su imagen.
Solo los administradores pueden mover eventos completados desde la consola de administración.
No tiene permiso para bloquear este archivo.
Su plan incluye 3,5 GB de almacenamiento por usuario.
Ocultar proyectos actuales
Desactivar la captura rápida
Solo el propietario puede cambiar el nombre de esta plantilla de informe.
Escriba un nombre para el espacio de trabajo y haga clic en Continuar.
Sus plantillas de informe se han descargado correctamente.
No se pudo mover el calendario archivado.
Abra el panel de control, seleccione la plantilla y haga clic en Cambiar nombre.
No se puede eliminar la carpeta inteligente porque contiene 3 imágenes.
El hito está bloqueado por %s.
Su cuota de almacenamiento está al 62,5 % de su capacidad.
Para cambiar el nombre de un informe de estado duplicado, abra su espacio de trabajo y haga clic en Cambiar nombre.
El modo de concentración oculta todas las notificaciones durante 30 minutos.
Para bloquear un informe, haga clic con el botón derecho en el informe y haga clic en Bloquear.
Para bloquear un calendario del equipo, abra la consola de administración y haga clic en <b>Bloquear</b>.
Activar el modo de concentración
Copie la presentación pública.
Progreso de la subida: 25 %
Para asignar una tarea, seleccione las tareas que desea asignar y haga clic en <b>Asignar</b>.
Abra el panel de control, haga clic con el botón derecho en la plantilla de proyecto y haga clic en Restaurar.
Para fijar un mensaje, seleccione los mensajes que desea fijar y haga clic en Fijar.
No se pudo copiar la imagen.
Editar esta tarea
Descargando presentaciones...
No se pudo compartir la carpeta de proyecto {title}.
Cada carpeta de proyecto puede contener hasta 150 archivos.
Asignar esta tarea
Eliminar todas las imágenes
Vaya a Configuración > Cuenta para eliminar su cuenta.
La carpeta de proyecto se ha editado correctamente.
No se pudo editar el tablero. Inténtelo de nuevo.
Las copias de seguridad se realizan todos los días a las 9:50.
Para ocultar una notificación no leída, abra el panel de control y haga clic en Ocultar.
Su periodo de prueba finaliza el 6 de noviembre.
La plantilla de proyecto se ha duplicado correctamente.
Haga clic en Guardar.
%d tarjetas fijadas
2 archivos movidos
No tiene permiso para ocultar este comentario.
Para mover una tarjeta roja, abra el panel de control, seleccione las tarjetas que desea mover y haga clic en Mover.
Se han subido %d documentos
No se pueden subir presentaciones de más de 10 MB.
Editar este documento
Haga clic en Eliminar para eliminar el documento.
Marque la casilla Recordarme y, a continuación, haga clic en Continuar.
Vaya a Configuración > Notificaciones para desactivar las notificaciones por correo electrónico.
El espacio de trabajo está bloqueado por %s.
No se pudo exportar %s. Inténtelo de nuevo.
Para guardar una plantilla de informe, haga clic con el botón derecho en la plantilla de informe y haga clic en Guardar.
Vence el jueves a las 10:05
Cada calendario del equipo puede contener hasta 1000 eventos.
No tiene permiso para copiar este informe de estado.
El comentario está bloqueado por %s.
No se puede eliminar el proyecto porque contiene 2 tareas.
Su cuota de almacenamiento está al 3 % de su capacidad.
No se pueden subir imágenes de más de 1 GB.
Mover esta plantilla de informe
Cambiar el nombre del informe
Las carpetas eliminadas permanecen en la papelera durante 90 días antes de eliminarse definitivamente.
Editado por %s hace 1 hora
La lista de comprobación se ha restaurado correctamente.
5 informes bloqueados
Eliminar informe de estado
Vaya a la vista de cronograma, haga clic con el botón derecho en la tarea y haga clic en <b>Asignar</b>.
Bloquear documento de diseño
La plantilla se ha creado correctamente.
Para exportar una página duplicada, abra el panel de control, seleccione la página y haga clic en <b>Exportar</b>.
Haga clic con el botón derecho en la hoja de cálculo y, a continuación, haga clic en Exportar.
El informe de estado se ha editado correctamente.
Última copia de seguridad: 6 de junio
Abrir Configuración
Ocultar todos los comentarios
No se pudo copiar el documento público.
Cada calendario del equipo puede contener hasta 250 eventos.
Su archivo se ha editado correctamente.
El tamaño máximo de un archivo es de 7,5 GB.
Arrastre las tarjetas al tablero duplicado.
Mostrar archivos privados
Carpeta de %s
Vaya al panel de control, seleccione la presentación y haga clic en Compartir.
No se puede eliminar la lista de tareas porque contiene 3 tareas.
%1$s ha comentado en la factura %2$s.
No se pudo eliminar el documento {title}.
Abra el panel de control, seleccione el calendario del equipo y haga clic en <b>Mover</b>.
Para asignar una subtarea, abra su espacio de trabajo y haga clic en <b>Asignar</b>.
Mostrar columnas verdes
Restaure la lista de comprobación privada.
El modo de concentración está activado hasta las 22:00.
Asignar las subtareas seleccionadas
Vence el sábado a las 12:30
Solo los administradores pueden restaurar proyectos privados desde la consola de administración.
Finalizar
Si archiva una plantilla de proyecto mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic en la pestaña roja y, a continuación, haga clic en <b>Confirmar</b>.
Para duplicar un proyecto reciente, vaya al panel de control y haga clic en Duplicar.
No hay hitos privados
Su cuota de almacenamiento está llena. Elimine algunas presentaciones o póngase en contacto con admin@example.org.
Si cambia el nombre de una plantilla de informe mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Zintaroo sincroniza sus presentaciones con el centro de sincronización cada 15 minutos.
No tiene permiso para descargar este documento.
Para mover un evento, seleccione los eventos que desea mover y haga clic en Mover.
No se pueden subir presentaciones de más de 250 MB.
Para archivar una plantilla de proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
El modo de concentración oculta todas las notificaciones durante 60 minutos.
Para descargar una presentación, abra su espacio de trabajo, seleccione las presentaciones que desea descargar y haga clic en Descargar.
Mover pestaña
¿Desea bloquear la página duplicada?
Las hojas de cálculo se han subido correctamente.
4 listas movidas
Para descargar un archivo, abra su espacio de trabajo, seleccione el archivo y haga clic en Descargar.
De forma predeterminada, Brelqua conserva 50 versiones de cada documento.
Archivo copiado.
Solo el propietario puede fijar esta pestaña.
Pulse <b>Abrir</b> para abrir esta carpeta.
2 eventos archivados
Se han copiado 15 páginas
Fijar esta tarjeta
Elija Ver > Modo de concentración y, a continuación, haga clic en Listo.
Progreso de la copia de seguridad: 40 %
Escriba un nombre para la carpeta y haga clic en Guardar.
Escriba el nombre y, a continuación, haga clic en Confirmar.
El acceso de invitados permite que personas ajenas a su equipo vean presentaciones.
Para cambiar el nombre de una imagen, haga clic con el botón derecho en la imagen y haga clic en Cambiar nombre.
No se pudo encontrar el archivo %s.
Marque la casilla Notificarme y, a continuación, haga clic en <b>Listo</b>.
Para ocultar una pestaña principal, abra el panel de control, seleccione las pestañas que desea ocultar y haga clic en Ocultar.
Vaya al panel de control, haga clic con el botón derecho en el documento y haga clic en Copiar.
Ya existe un proyecto con el nombre {0}.
No se pudo eliminar el mensaje {title}.
Abra su espacio de trabajo, haga clic con el botón derecho en la lista de tareas y haga clic en Guardar.
Para editar un archivo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Editar</b>.
No se pudo copiar la página.
Ha utilizado el 20 % de su cuota de almacenamiento.
Archivo subido.
No tiene permiso para bloquear este calendario del equipo.
Comentarios de %s
Puede descargar hasta 100 informes a la vez.
Elimine la página principal.
Para compartir una lista de tareas con personas ajenas a su equipo, cree un enlace para compartir.
Las copias de seguridad se guardan en /srv/brelqua/archive y se conservan durante 60 días.
Copiar los informes de estado seleccionados
No se pudo bloquear la carpeta de proyecto {0}.
Mostrar comentarios eliminados
Restaurar todos los documentos
No se puede eliminar el tablero porque contiene 1 columna.
Error %d: no se pudo guardar el informe.
Para restaurar un tablero que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Restaurar</b>.
No se pudo encontrar el hito %s.
Archivo de {user}
Error %d: no se pudo guardar la tarea.
Vence el lunes a las 8:00
Haga clic en Copiar para copiar los calendarios.
%d páginas exportadas
Se han eliminado %d carpetas
No se ha encontrado el informe.
No se pudo copiar el documento de diseño {0}.
No tiene permiso para bloquear este tablero.
Su cuota de almacenamiento está llena. Elimine algunos documentos o póngase en contacto con admin@example.org.
Ocultar facturas seleccionadas
4 mensajes eliminados
Para ocultar una columna, seleccione la columna y haga clic en Ocultar.
Recordatorio: la tarea {name} vence dentro de 7 días.
4 informes impresos
No tiene permiso para bloquear esta presentación.
Restaurar subtarea
No se pudo encontrar la plantilla %s.
Para imprimir un informe público, abra el panel de control, seleccione el informe y haga clic en Imprimir.
Todos los cambios guardados
No se pudo imprimir %s. Inténtelo de nuevo.
Vaya al panel de control, seleccione el archivo y haga clic en Subir.
¿Desea archivar la lista?
El documento se ha compartido correctamente.
La lista de tareas está completada al 37,5 %.
Haga clic con el botón derecho en la página y, a continuación, haga clic en Exportar.
No se puede eliminar la carpeta inteligente porque contiene 3 documentos.
Para guardar un informe privado, abra su espacio de trabajo y haga clic en Guardar.
¿Mover esta pestaña?
Haga clic en la pestaña verde y haga clic en Listo.
¿Desea bloquear la nota compartida?
Copia de seguridad completada a las 10:20.
Para ocultar una columna, abra su espacio de trabajo y haga clic en <b>Ocultar</b>.
No se pudo restaurar la imagen {0}. Inténtelo de nuevo.
Escriba una hora válida.
No se pudo crear %s. Inténtelo de nuevo.
Para guardar una plantilla de informe, vaya al panel de control, haga clic con el botón derecho en la plantilla de informe y haga clic en Guardar.
Próxima copia de seguridad: el jueves a las 9:50
Escriba la fecha de vencimiento y, a continuación, haga clic en <b>Guardar</b>.
Para crear una plantilla de informe, vaya al panel de control y haga clic en <b>Crear</b>.
El informe está completado al 5 %.
No tiene permiso para ocultar esta pestaña.
Pulse <b>Archivar</b> para archivar los documentos de diseño.
No se pudo ocultar la columna.
Error %d: no se pudo guardar la etiqueta.
Copiando informes...
Elija Archivo > Exportar como PDF y, a continuación, haga clic en <b>Continuar</b>.
Para obtener más información, consulte https://help.example.com/brelqua/shortcuts.
Filtrar por título
Haga clic en Archivar para archivar la lista de tareas.
No se pudo cambiar el nombre del archivo reciente.
No se pudo copiar el documento de diseño {title}.
Haga clic en el icono verde para cambiar el nombre del calendario del equipo.
Escriba la dirección de correo electrónico y haga clic en <b>Aplicar</b>.
Para restaurar un proyecto, haga clic con el botón derecho en el proyecto y haga clic en Restaurar.
Abra su espacio de trabajo, seleccione las notas que desea imprimir y haga clic en Imprimir.
Haga clic en el icono rojo para duplicar el documento de diseño.
No se pudo descargar el archivo {title}.
Para exportar una página, abra su espacio de trabajo y haga clic en Exportar.
Abra la plantilla de proyecto reciente.
Informe de gastos restaurado.
El registro de actividad recoge cada cambio de sus tareas con su fecha y su autor.
Haga clic con el botón derecho en la presentación y, a continuación, haga clic en Restaurar.
Haga clic en Imprimir para imprimir el informe.
Duplicar nota
Ordenar por fecha de vencimiento
Elija Edición > Seleccionar todo y haga clic en <b>Guardar</b>.
Los mensajes se han fijado correctamente.
Documento de diseño creado.
La verificación en dos pasos está activada.
Ya existe un espacio de trabajo con el nombre {name}.
No se pudo conectar con https://example.org/brelqua/privacy.
Para archivar un informe de gastos compartido, vaya a la consola de administración, seleccione el informe de gastos y haga clic en <b>Archivar</b>.
Para guardar una plantilla, vaya al panel de control, seleccione las plantillas que desea guardar y haga clic en Guardar.
Una carpeta inteligente reúne todas las hojas de cálculo con la misma etiqueta.
Nuevo hito
Haga clic en el icono rojo para bloquear el proyecto.
No se pudo subir la hoja de cálculo. Inténtelo de nuevo.
Duplicar las tareas seleccionadas
Para ocultar una tarjeta, abra el panel de control, seleccione las tarjetas que desea ocultar y haga clic en <b>Ocultar</b>.
%d informes descargados
Para eliminar una lista de tareas, abra el panel de control y haga clic en Eliminar.
Haga clic en el botón gris para descargar el informe.
Subir hoja de cálculo
Para duplicar un documento, abra su espacio de trabajo y haga clic en <b>Duplicar</b>.
No se pueden exportar archivos mientras Zintaroo está sin conexión.
El mensaje se ha fijado correctamente.
No se puede eliminar el proyecto porque contiene 12 tareas.
No se pudo editar la factura reciente.
No se puede eliminar el calendario porque contiene 12 eventos.
Archivo editado.
%d facturas eliminadas
Para compartir una lista, abra su espacio de trabajo y haga clic en Compartir.
Su archivo se ha subido correctamente.
Fijar este comentario
No se han encontrado copias de seguridad.
Mover documento de diseño
Su plan cuesta 12,00 € por usuario al mes.
Seleccione las listas de comprobación que desea archivar y, a continuación, haga clic en Archivar.
Fijar todas las tarjetas
Eliminando carpetas de proyecto...
Para crear un archivo público, abra su espacio de trabajo y haga clic en <b>Crear</b>.
Mostrar carpetas bloqueadas
Copie la hoja de cálculo grande.
Para descargar un informe de estado, abra su espacio de trabajo, seleccione el informe de estado y haga clic en Descargar.
No tiene permiso para compartir esta imagen.
Se han descargado 3 informes de gastos
No se pudo escribir en /var/lib/zintaroo/exports.
¿Seguro que desea eliminar 1 tarea?
Cuando comparte un comentario, todas las personas que tienen acceso a él reciben una notificación.
<b>{count}</b> subtareas seleccionadas
Para cambiar el nombre de una carpeta principal, abra el panel de control, seleccione la carpeta y haga clic en Cambiar nombre.
Haga clic en el botón gris y haga clic en Listo.
Abra la consola de administración, seleccione las presentaciones que desea bloquear y haga clic en Bloquear.
Para asignar una subtarea, vaya a la vista de cronograma, haga clic con el botón derecho en la subtarea y haga clic en Asignar.
Para copiar un documento temporal, abra su espacio de trabajo, seleccione el documento y haga clic en Copiar.
Puede archivar hasta 1000 calendarios a la vez.
Se han guardado %d calendarios del equipo
Ocultar etiquetas azules
Eliminando %s...
No se pueden restaurar carpetas mientras Zintaroo está sin conexión.
Crear archivo
No hay copias de seguridad nuevas
Las carpetas de proyecto se han duplicado correctamente.
El archivo kickoff-notes.docx ocupa más de 1 GB.
Las pestañas se han ocultado correctamente.
Puede archivar hasta 75 notas a la vez.
Su informe de gastos se ha exportado correctamente.
%d documentos descargados
Abra el panel de control, seleccione las hojas de cálculo que desea guardar y haga clic en Guardar.
{count} tareas nuevas
Para archivar un calendario del equipo duplicado, seleccione el calendario del equipo y haga clic en Archivar.
Escriba un nombre para la lista y haga clic en <b>Aplicar</b>.
Ocultar facturas duplicadas
Almacenamiento usado: 10 GB de 20 GB
Los proyectos de la papelera se eliminan definitivamente después de 30 días.
Duplicar todas las carpetas
Los administradores pueden exigir la verificación en dos pasos a todos los miembros del tablero.
Su plan incluye 7,5 GB de almacenamiento por usuario.
Eliminando mensajes...
Ayuda > Métodos abreviados de teclado
No se pueden subir imágenes de más de 5 GB.
El enlace para compartir de esta lista de tareas caduca dentro de 14 días.
¿Bloquear esta lista de tareas?
Para informar de un problema de seguridad, escriba a billing@example.com o visite https://help.example.com/brelqua/shortcuts.
Para editar un hito reciente, haga clic con el botón derecho en el hito y haga clic en <b>Editar</b>.
Seleccione la plantilla de proyecto y, a continuación, haga clic en Eliminar.
Para compartir una carpeta de proyecto, abra el panel de control y haga clic en Compartir.
Abra su espacio de trabajo, haga clic con el botón derecho en la tarea y haga clic en <b>Mover</b>.
Para mover un calendario del equipo bloqueado, haga clic con el botón derecho en el calendario del equipo y haga clic en Mover.
No se puede eliminar el calendario del equipo porque contiene 6 eventos.
Para asignar una tarea, vaya al panel de control, seleccione la tarea y haga clic en Asignar.
No tiene permiso para archivar este informe.
Para cambiar el nombre de una plantilla de proyecto compartida, abra el panel de control, seleccione las plantillas de proyecto que desea cambiar el nombre de y haga clic en Cambiar nombre.
El acceso de invitados permite que personas ajenas a su equipo vean tableros compartidos.
Editar los proyectos seleccionados
No se pudo guardar la plantilla de proyecto {title}.
Informe de gastos descargado.
Tiene %d eventos eliminados.
%1$s ha comentado en el informe %2$s.
Para informar de un problema de seguridad, escriba a admin@example.org o visite https://docs.example.org/brelqua/api.
Cada espacio de trabajo puede contener hasta 5 carpetas.
Haga clic en el botón azul para editar la plantilla de informe.
Comentario fijado.
5 notas fijadas
Duplicando listas de tareas...
Hoja de cálculo eliminada.
El modo de concentración está activado hasta las 11:15.
Para editar una plantilla de informe que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Editar.
No tiene permiso para mover esta tarjeta.
Las notas se han creado correctamente.
Abra su espacio de trabajo, seleccione las subtareas que desea mover y haga clic en Mover.
Escriba la descripción y haga clic en Aplicar.
Las copias de seguridad se guardan en /srv/brelqua/archive y se conservan durante 14 días.
Ha utilizado el 0,5 % de su cuota de almacenamiento.
No se pudo imprimir el documento {title}.
Las copias de seguridad se guardan en /mnt/vault/brelqua y se conservan durante 7 días.
No tiene permiso para duplicar esta plantilla.
Zintaroo sincroniza sus carpetas con el centro de sincronización cada 10 minutos.
Seleccione el calendario y, a continuación, haga clic en Bloquear.
Vence el jueves a las 11:05
No se han encontrado notificaciones.
Haga clic en el icono verde y haga clic en <b>Confirmar</b>.
Guardar
Próxima copia de seguridad: el miércoles a las 19:30
No se pudo editar el documento de diseño {name}.
No tiene permiso para copiar esta lista.
Haga clic en el icono verde para guardar el informe de estado.
Error %d: no se pudo guardar la factura.
Vaya al panel de control, seleccione las columnas que desea cambiar el nombre de y haga clic en Cambiar nombre.
Solo el propietario puede cambiar el nombre de esta lista.
Progreso de la sincronización: 3 %
Copias de seguridad de {0}
Abrir todas las listas de comprobación
No se pueden eliminar páginas mientras Zintaroo está sin conexión.
No se pudo descargar el informe de gastos {1}.
No tiene permiso para archivar esta imagen.
Los archivos de más de 2,5 GB se suben en partes de 10 MB.
El tablero se ha archivado correctamente.
El informe {name} se ha compartido con security@example.org.
No se pudo abrir el informe de estado {name}. Inténtelo de nuevo.
La nota se ha exportado correctamente.
¿Seguro que desea archivar 3 calendarios?
Para compartir un proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
Pulse <b>Cambiar nombre</b> para cambiar el nombre de su archivo.
El archivo team-photo.jpg ocupa más de 50 MB.
No se pueden archivar proyectos mientras Zintaroo está sin conexión.
Ha utilizado el 10 % de su cuota de almacenamiento.
Haga clic en Abrir para abrir su carpeta.
Su archivo se ha exportado correctamente.
Se han editado %d mensajes
Sus tableros se han duplicado correctamente.
Para editar una imagen que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Editar.
Puede archivar hasta 500 tableros a la vez.
Para crear un tablero privado, abra su espacio de trabajo y haga clic en Crear.
Duplicar informe
Si bloquea un tablero mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Su plan cuesta 4,00 € por usuario al mes.
Las hojas de cálculo exportadas se guardan en ~/Brelqua/Exports.
Vaya al panel de control, seleccione las presentaciones que desea editar y haga clic en Editar.
Tiene %d notificaciones eliminadas.
Para compartir un tablero con personas ajenas a su equipo, cree un enlace para compartir.
Si elimina una nota, Brelqua la mueve a la papelera.
Progreso de la subida: 2,5 %
Vaya al panel de control, seleccione los tableros que desea compartir y haga clic en Compartir.
Almacenamiento usado: 47,5 GB de 50 GB
No se pudo fijar la tarjeta {0}.
Solo el propietario puede cambiar el nombre de esta página.
Use la captura rápida para añadir un comentario desde cualquier página.
No se han encontrado tareas.
Si comparte una factura mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Se han subido 6 hojas de cálculo
%d presentaciones impresas
Compartir las facturas seleccionadas
¿Desea eliminar el documento?
Ocultar las columnas seleccionadas
%d imágenes compartidas
¿Desea compartir la plantilla de proyecto privada?
Su cuota de almacenamiento está llena. Elimine algunas hojas de cálculo o póngase en contacto con admin@example.org.
Para mover un calendario que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Mover</b>.
Active el acceso de invitados para invitar a personas ajenas a su equipo a esta carpeta.
Seleccione la subtarea y, a continuación, haga clic en Asignar.
Plantilla de informe restaurada.
Ya existe una carpeta inteligente con el nombre {0}.
Haga clic con el botón derecho en la tarea y, a continuación, haga clic en Archivar.
5 archivos movidos
Mostrar carpetas compartidas
Para compartir una hoja de cálculo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
Haga clic en el botón rojo para imprimir el documento.
Abra su espacio de trabajo, haga clic con el botón derecho en la pestaña y haga clic en <b>Ocultar</b>.
Para bloquear un documento, abra su espacio de trabajo, seleccione el documento y haga clic en <b>Bloquear</b>.
Recordatorio: el hito {name} vence dentro de 2 días.
Mostrar tareas privadas
Mostrar comentarios ocultos
La lista de tareas se ha exportado correctamente.
Su cuota de almacenamiento está llena. Elimine algunos documentos o póngase en contacto con security@example.org.
Cada calendario puede contener hasta 25 eventos.
Su tarjeta se ha movido correctamente.
Tareas de la lista {0}
Los administradores pueden activar la verificación en dos pasos para todos los usuarios en la consola de administración.
Si elimina un documento, Brelqua lo mueve a la papelera.
<a href="https://example.org/brelqua/privacy">Más información</a> sobre el centro de sincronización.
No tiene permiso para copiar este documento de diseño.
Solo los administradores pueden editar informes bloqueados desde la consola de administración.
Si elimina una plantilla de informe mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Tarjetas del tablero {title}
Seleccione el informe de estado y, a continuación, haga clic en Cambiar nombre.
No se pudo imprimir el calendario del equipo.
Use la captura rápida para añadir un evento desde cualquier página.
Exportar archivo
1 plantilla de proyecto archivada
¿Seguro que desea duplicar 8 presentaciones?
Abra su espacio de trabajo, haga clic con el botón derecho en el calendario del equipo y haga clic en Exportar.
Si el problema persiste, póngase en contacto con security@example.org.
Para asignar una subtarea duplicada, abra su espacio de trabajo, haga clic con el botón derecho en la subtarea y haga clic en Asignar.
Vence el viernes a las 15:15
Archivando hitos...
Haga clic con el botón derecho en el calendario del equipo y, a continuación, haga clic en Mover.
Abrir las subtareas seleccionadas
Para copiar una nota reciente, abra su espacio de trabajo, haga clic con el botón derecho en la nota y haga clic en <b>Copiar</b>.
Solo los administradores pueden eliminar páginas recientes desde la consola de administración.
Para duplicar una hoja de cálculo reciente, seleccione la hoja de cálculo y haga clic en Duplicar.
Bloquee el calendario del equipo compartido.
La captura rápida está desactivada.
Los hitos se han creado correctamente.
Para bloquear una plantilla de informe archivada, vaya a la consola de administración, seleccione la plantilla de informe y haga clic en <b>Bloquear</b>.
Próxima copia de seguridad: el lunes a las 13:30
Su plan cuesta 6,50 € por usuario al mes.
Cada carpeta inteligente puede contener hasta 75 imágenes.
¿Seguro que desea archivar 3 proyectos?
Nuevo mensaje
Para restaurar un informe público, abra el panel de control, haga clic con el botón derecho en el informe y haga clic en Restaurar.
Configuración > Cuenta
Ocultar proyectos principales
%1$s ha comentado en la copia de seguridad %2$s.
9 pestañas fijadas
Vaya a la papelera, seleccione el calendario del equipo y haga clic en Restaurar.
No se pudo compartir %s. Inténtelo de nuevo.
Copiando imágenes...
Imprimir todos los calendarios del equipo
Haga clic en Archivar para archivar el documento de diseño.
Copia de seguridad completada a las 9:00.
Para imprimir un informe de estado, abra su espacio de trabajo y haga clic en Imprimir.
Haga clic en el icono verde para fijar el mensaje.
El modo de concentración está activado hasta las 7:05.
Ocultar tareas seleccionadas
Hojas de cálculo de la carpeta {1}
Solo el propietario puede restaurar este documento.
Cada carpeta inteligente puede contener hasta 10 hojas de cálculo.
Se han editado 15 documentos de diseño
%d plantillas de informe bloqueadas
No se pudo imprimir el informe de gastos {0}. Inténtelo de nuevo.
Pulse <b>Archivar</b> para archivar esta plantilla de informe.
Solo los administradores pueden archivar listas de comprobación completadas desde la vista de cronograma.
Arrastre las tareas a la lista de tareas duplicada.
Cada carpeta puede contener hasta 2000 hojas de cálculo.
200 informes de gastos creados
Para asignar una tarea completada, haga clic con el botón derecho en la tarea y haga clic en Asignar.
Ordenar por estado
Su pestaña se ha fijado correctamente.
El archivo brand-guide.pdf ocupa más de 10 MB.
Seleccione su documento y haga clic en Duplicar.
No tiene permiso para eliminar esta lista de comprobación.
Se han guardado 2000 calendarios del equipo
Descargar presentación
Progreso de la subida: 97 %
Su plantilla de proyecto se ha creado correctamente.
Zintaroo sincroniza sus hojas de cálculo con el centro de sincronización cada 10 minutos.
No se pudo imprimir la factura {name}.
Mostrar pestañas principales
Asignar todas las subtareas
Mostrar notas privadas
Su plan cuesta 49,00 € por usuario al mes.
Solo los administradores pueden eliminar imágenes duplicadas desde el panel de control.
Última sincronización a las 4:20
Seleccione los informes de estado que desea compartir y, a continuación, haga clic en Compartir.
No tiene permiso para restaurar esta notificación.
Haga clic con el botón derecho en la hoja de cálculo y, a continuación, haga clic en <b>Editar</b>.
Para copiar una plantilla de informe oculta, haga clic con el botón derecho en la plantilla de informe y haga clic en Copiar.
¿Seguro que desea restaurar 1 carpeta de proyecto?
No se puede eliminar el calendario del equipo porque contiene 200 eventos.
Filtrar por fecha
Esta imagen es demasiado grande para mostrar una vista previa.
Vaya al panel de control, haga clic con el botón derecho en la carpeta de proyecto y haga clic en Duplicar.
Si elimina un comentario, Brelqua lo mueve a la papelera.
Escriba una dirección de correo electrónico válida.
El modo de concentración está activado hasta las 22:30.
Para exportar una lista, vaya al panel de control, seleccione las listas que desea exportar y haga clic en Exportar.
Abrir todos los hitos
¿Desea archivar el comentario?
Copie la carpeta principal.
Abra su espacio de trabajo, seleccione el comentario y haga clic en Fijar.
El archivo team-photo.jpg ocupa más de 750 MB.
Bloquee el informe de estado oculto.
Sus informes de gastos se han descargado correctamente.
La lista se ha creado correctamente.
Se han archivado 7 listas de tareas
No se puede eliminar la carpeta porque contiene 15 imágenes.
150 presentaciones subidas
Haga clic con el botón derecho en la imagen y, a continuación, haga clic en <b>Subir</b>.
Abra el panel de control.
Arrastre un hito para cambiar su fecha de vencimiento.
Los calendarios del equipo se han editado correctamente.
Seleccione su lista de comprobación y haga clic en Mover.
El modo de concentración está activado hasta las 17:00.
Se han ocultado 2 notificaciones
Mostrar etiquetas grises
Abra el panel de control, haga clic con el botón derecho en la subtarea y haga clic en <b>Asignar</b>.
Para bloquear un proyecto principal, haga clic con el botón derecho en el proyecto y haga clic en <b>Bloquear</b>.
Añada una etiqueta a una subtarea para encontrarla más rápido.
Copiar esta plantilla de proyecto
La nota se ha duplicado correctamente.
En la vista de cronograma, arrastre una tarea para cambiar su fecha de vencimiento.
Mostrando {start}-{end} de {total} comentarios
No tiene permiso para mover esta carpeta de proyecto.
Cancelar
Añada una etiqueta a una factura para encontrarla más rápido.
No se pueden subir presentaciones de más de 2,5 GB.
Ya existe una plantilla con el nombre {title}.
Las facturas eliminadas permanecen en la papelera durante 30 días antes de eliminarse definitivamente.
No se puede eliminar la carpeta inteligente porque contiene 2 presentaciones.
Si restaura una plantilla mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para descargar un informe público, abra el panel de control, seleccione el informe y haga clic en Descargar.
Para imprimir una página pública, seleccione las páginas que desea imprimir y haga clic en Imprimir.
{count} facturas nuevas
Abra su espacio de trabajo, seleccione la pestaña y haga clic en <b>Fijar</b>.
Eliminar las tarjetas seleccionadas
El modo de concentración está activado hasta las 7:20.
Su cuota de almacenamiento está llena. Elimine algunos archivos o póngase en contacto con billing@example.com.
Para descargar un documento, abra su espacio de trabajo y haga clic en <b>Descargar</b>.
Para informar de un problema de seguridad, escriba a admin@example.org o visite https://example.com/zintaroo/download.
¿Desea bloquear la hoja de cálculo privada?
Para eliminar una pestaña que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Eliminar.
Para editar una lista bloqueada, abra el panel de control, seleccione las listas que desea editar y haga clic en Editar.
Sus archivos se han creado correctamente.
Para crear una subtarea, vaya a la vista de cronograma y haga clic en Crear.
Seleccione sus facturas y haga clic en Restaurar.
Solo los administradores pueden mover carpetas ocultas desde el registro de actividad.
No se pueden subir hojas de cálculo de más de 2 GB.
Asignar
Abrir en una ventana nueva
Su cuota de almacenamiento es de 20 GB; está usando 2 GB (10 %).
Las copias de seguridad se realizan todos los sábados a las 13:45.
Duplicar todas las listas
Ocultar hitos completados
Tareas de la lista {name}
No se pudo escribir en C:\Users\Public\Brelqua\Exports.
No tiene permiso para asignar esta tarea.
Arrastre los archivos a la carpeta.
No hay eventos completados
Marque la casilla Incluir elementos archivados y, a continuación, haga clic en Continuar.
%d tarjetas ocultas
Compartiendo {count} de {total} presentaciones...
No tiene permiso para archivar este calendario.
No se pudo editar el archivo.
Restaurar las carpetas seleccionadas
Su cuota de almacenamiento está al 37,5 % de su capacidad.
No se pueden mover proyectos mientras Zintaroo está sin conexión.
Filtrar por descripción
Su plan cuesta 6,00 € por usuario al mes.
Para imprimir un calendario, abra su espacio de trabajo y haga clic en <b>Imprimir</b>.
9 hitos movidos
Los informes de gastos se han restaurado correctamente.
No se pudo copiar la plantilla de informe.
¿Seguro que desea compartir 1000 carpetas de proyecto?
Para copiar una lista duplicada, haga clic con el botón derecho en la lista y haga clic en <b>Copiar</b>.
Seleccione los informes de estado que desea guardar y, a continuación, haga clic en <b>Guardar</b>.
Pulse <b>Editar</b> para editar el tablero.
Abra su espacio de trabajo, haga clic con el botón derecho en la columna y haga clic en Ocultar.
Los proyectos de la papelera se eliminan definitivamente después de 90 días.
Haga clic en Subir para subir sus documentos.
Vaya a Configuración > Apariencia para elegir un tema oscuro.
En la vista de cronograma, arrastre un evento para cambiar su fecha de vencimiento.
La nota se ha fijado correctamente.
Cada tablero puede contener hasta 5000 tareas.
Lista de tareas impresa.
Para editar un archivo, abra su espacio de trabajo y haga clic en Editar.
8 notificaciones restauradas
De forma predeterminada, Brelqua conserva 50 versiones de cada página.
Ha utilizado el 25 % de su cuota de almacenamiento.
No tiene permiso para bloquear este calendario.
Crear etiqueta
Haga clic con el botón derecho en el archivo y, a continuación, haga clic en Archivar.
Su periodo de prueba finaliza el 24 de septiembre.
Abra su espacio de trabajo, seleccione la presentación y haga clic en <b>Editar</b>.
Solo los administradores pueden compartir informes archivados desde la consola de administración.
Seleccione la subtarea y haga clic en Asignar.
Tiene %d copias de seguridad nuevas.
Para imprimir una página, seleccione la página y haga clic en Imprimir.
Abra el panel de control, seleccione las presentaciones que desea duplicar y haga clic en <b>Duplicar</b>.
El archivo invoice-0042.pdf ocupa más de 100 MB.
Solo los administradores pueden mover plantillas de proyecto bloqueadas desde la consola de administración.
Active el modo de concentración para ocultar las notificaciones mientras trabaja.
¿Desea restaurar el informe de gastos duplicado?
No se pudo descargar el informe de estado {1}.
Las copias de seguridad se realizan todos los sábados a las 17:00.
El acceso de invitados no está disponible en el plan gratuito de Brelqua.
Escriba una URL válida.
Los comentarios eliminados permanecen en la papelera durante 1 día antes de eliminarse definitivamente.
¿Seguro que desea bloquear 5 proyectos?
Aplicar
Para eliminar una etiqueta que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Eliminar</b>.
Activar la captura rápida
Documentos de la carpeta de proyecto {0}
Arrastre los archivos a la carpeta principal.
No se pueden subir presentaciones de más de 3,5 GB.
No se puede eliminar el calendario porque contiene 20 eventos.
No se pueden exportar notas mientras Zintaroo está sin conexión.
Duplicando {count} de {total} listas...
%d proyectos editados
Vence el domingo a las 8:20
{count} hitos nuevos
Pulse <b>Ocultar</b> para ocultar esta tarjeta.
Abrir las listas seleccionadas
Haga clic en el botón rojo para mover la plantilla de proyecto.
Abra el panel de control, seleccione los informes que desea copiar y haga clic en Copiar.
Vence el sábado a las 3:00
No se pueden restaurar documentos de diseño mientras Zintaroo está sin conexión.
Haga clic con el botón derecho en el documento de diseño y, a continuación, haga clic en Bloquear.
Para compartir una carpeta que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
Abra el panel de control, seleccione el calendario del equipo y haga clic en Eliminar.
No se pudo descargar la factura {1}.
Error %d: no se pudo guardar el hito.
Ocultar comentarios archivados
No se pueden restaurar notas mientras Zintaroo está sin conexión.
Escriba la fecha de vencimiento y haga clic en <b>Listo</b>.
Su cuota de almacenamiento está al 42 % de su capacidad.
El modo de concentración está activado hasta las 5:20.
Eliminar los eventos seleccionados
%d hitos eliminados
Imprimir este informe de gastos
Imprimir factura
Pulse <b>Abrir</b> para abrir la lista de tareas.
Haga clic en el icono rojo para fijar la nota.
Recordatorio: la factura {name} vence dentro de 5 días.
El archivo {0} se ha compartido con billing@example.com.
No se pudo subir la presentación. Inténtelo de nuevo.
No tiene permiso para exportar este archivo.
El archivo logo_final.png ocupa más de 2,5 GB.
Solo los administradores pueden editar listas ocultas desde la vista de cronograma.
Pulse <b>Asignar</b> para asignar la tarea.
Pestaña oculta.
No tiene permiso para copiar esta imagen.
Próxima copia de seguridad: el lunes a las 8:30
El enlace para compartir de este informe caduca dentro de 14 días.
Vaya al panel de control, seleccione los informes de gastos que desea archivar y haga clic en Archivar.
No se pudo subir %s. Inténtelo de nuevo.
Su notificación se ha ocultado correctamente.
No se pudo restaurar el documento de diseño.
No se puede eliminar la lista porque contiene 2000 tareas.
No tiene permiso para ocultar esta notificación.
Eliminar todas las notificaciones
No se puede eliminar la carpeta porque contiene 2000 hojas de cálculo.
Si edita un calendario mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se pudo encontrar el informe %s.
Ya existe una lista con el nombre {name}.
Seleccione los informes de estado que desea editar y, a continuación, haga clic en Editar.
No se pudieron sincronizar %d de %d hojas de cálculo.
Cada lista de tareas puede contener hasta 30 tareas.
Seleccione la lista de tareas y, a continuación, haga clic en Archivar.
Para cambiar su contraseña, vaya a Configuración > Seguridad.
Para eliminar una página que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Eliminar</b>.
Haga clic en la pestaña verde y, a continuación, haga clic en Listo.
¿Bloquear este documento de diseño?
Nota bloqueada.
Compartir las plantillas de proyecto seleccionadas
Imprimiendo {count} de {total} facturas...
Duplicar tarea
%d tarjetas movidas
Su periodo de prueba finaliza el 8 de mayo.
Haga clic en el icono gris para duplicar la lista.
Elimine la tarjeta azul.
Próxima copia de seguridad: el martes a las 23:10
Haga clic en Guardar para guardar las listas de tareas.
No se pudo encontrar el proyecto %s.
Para imprimir un documento, abra el panel de control, seleccione los documentos que desea imprimir y haga clic en <b>Imprimir</b>.
No se ha encontrado la factura.
No se pudo crear la plantilla de informe {0}.
No se puede eliminar la lista de tareas porque contiene 5 tareas.
No se pueden subir hojas de cálculo de más de 10 MB.
Archive la lista de comprobación privada.
No se pudo abrir la página {0}.
Abra el panel de control, seleccione las carpetas que desea duplicar y haga clic en Duplicar.
12 listas eliminadas
Haga clic con el botón derecho en la nota y, a continuación, haga clic en Copiar.
Copia de seguridad completada a las 21:05.
Para cambiar el nombre de un calendario archivado, vaya al panel de control, seleccione los calendarios que desea cambiar el nombre de y haga clic en <b>Cambiar nombre</b>.
No se pudo editar %s. Inténtelo de nuevo.
Elimine la subtarea reciente.
No se pudo exportar la presentación {title}.
Los tableros eliminados permanecen en la papelera durante 60 días antes de eliminarse definitivamente.
Mostrar notificaciones ocultas
También puede pulsar Ctrl+E para archivar esta carpeta.
Notificación oculta.
No tiene permiso para imprimir esta imagen.
Haga clic en el botón azul para descargar la hoja de cálculo.
Su cuota de almacenamiento está llena. Elimine algunas hojas de cálculo o póngase en contacto con support@example.com.
No se pudo fijar %s. Inténtelo de nuevo.
No se puede eliminar la lista porque contiene 20 tareas.
Su tablero se ha exportado correctamente.
No se pudo imprimir la imagen.
Vence el sábado a las 4:00
Guardando carpetas de proyecto...
El modo de concentración oculta todas las notificaciones durante 15 minutos.
Las etiquetas se han eliminado correctamente.
Recordatorio: el informe {name} vence dentro de 1 día.
Vaya al panel de control, seleccione las tarjetas que desea fijar y haga clic en <b>Fijar</b>.
20 proyectos bloqueados
Tiene %d facturas vencidas.
Ocultar facturas archivadas
Mover los tableros seleccionados
Sus mensajes se han editado correctamente.
Para informar de un problema de seguridad, escriba a security@example.org o visite https://help.example.com/brelqua/guests.
Copiar carpeta
Solo el propietario puede bloquear este archivo.
También puede pulsar Intro para abrir el comentario.
El tamaño máximo de una presentación es de 25 MB.
7 plantillas de proyecto copiadas
El panel de control muestra todos los proyectos de su espacio de trabajo.
Configuración > Almacenamiento
¿Cambiar el nombre de esta carpeta?
También puede pulsar Intro para abrir estas tareas.
Restaure la lista bloqueada.
Abra su espacio de trabajo, seleccione la notificación y haga clic en Ocultar.
Su periodo de prueba finaliza el 13 de abril.
También puede pulsar la tecla Supr para eliminar sus columnas.
Abra el panel de control, haga clic con el botón derecho en la notificación y haga clic en Archivar.
Si elimina un tablero, Brelqua lo mueve a la papelera.
Su cuota de almacenamiento está llena. Elimine algunos documentos o póngase en contacto con helpdesk@example.org.
El archivo release-plan.pptx ocupa más de 5 GB.
Seleccione las tareas que desea asignar y, a continuación, haga clic en Asignar.
Elimine el archivo archivado.
Su cuota de almacenamiento está llena. Elimine algunas copias de seguridad o póngase en contacto con billing@example.com.
Elija Herramientas > Captura rápida y haga clic en Confirmar.
No se pueden copiar informes mientras Zintaroo está sin conexión.
Para archivar una notificación que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
Para copiar un archivo, abra su espacio de trabajo, seleccione el archivo y haga clic en Copiar.
Crear lista de comprobación
Para exportar un informe de estado, haga clic con el botón derecho en el informe de estado y haga clic en Exportar.
Tarjetas del tablero {name}
Seleccione los comentarios que desea eliminar y, a continuación, haga clic en Eliminar.
Para duplicar un informe, vaya al panel de control y haga clic en Duplicar.
Restaure el documento de diseño duplicado.
Nueva subtarea
Mostrar pestañas fijadas
Para cambiar el nombre de una carpeta de proyecto pública, abra su espacio de trabajo, seleccione las carpetas de proyecto que desea cambiar el nombre de y haga clic en Cambiar nombre.
Crear lista de tareas
Para activar la verificación en dos pasos, vaya a Configuración > Seguridad.
Última copia de seguridad: 28 de julio
Haga clic en el botón verde para duplicar el tablero.
También puede pulsar Ctrl+P para imprimir el documento de diseño.
Cuando comparte una tarea, todas las personas que tienen acceso a ella reciben una notificación.
Se han impreso 50 documentos de diseño
No se pudo copiar la plantilla de proyecto.
Pulse <b>Subir</b> para subir su hoja de cálculo.
Abra su espacio de trabajo, haga clic con el botón derecho en el informe de estado y haga clic en Copiar.
Abra su espacio de trabajo, seleccione los hitos que desea editar y haga clic en <b>Editar</b>.
No se pueden restaurar calendarios del equipo mientras Zintaroo está sin conexión.
Para mover una imagen, seleccione la imagen y haga clic en Mover.
Mover las listas de tareas seleccionadas
Nuevo documento
Error: no se pudo mover %1$s a %2$s.
No se pueden subir documentos de más de 5 GB.
Para crear un calendario privado, abra su espacio de trabajo y haga clic en Crear.
Si archiva una plantilla mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se pudo restaurar la tarea {0}.
Vaya al panel de control, haga clic con el botón derecho en el documento y haga clic en Guardar.
Exportar
Para archivar un informe de estado, abra su espacio de trabajo, haga clic con el botón derecho en el informe de estado y haga clic en Archivar.
Última copia de seguridad: 10 de agosto
Eliminar este evento
Subtarea restaurada.
Solo los administradores pueden restaurar calendarios recientes desde el registro de actividad.
Se han asignado 2 tareas
Si comparte un documento de diseño mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para archivar un archivo, abra la consola de administración y haga clic en Archivar.
No se pudo eliminar la plantilla de informe {name}. Inténtelo de nuevo.
El archivo q3-budget.xlsx ocupa más de 3,5 GB.
Editado por %s hace 24 horas
Para imprimir un calendario oculto, abra su espacio de trabajo, seleccione el calendario y haga clic en Imprimir.
Ya existe una lista con el nombre {title}.
Para mover un calendario que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Mover.
Crear columna
Compartiendo {count} de {total} plantillas...
Cada carpeta inteligente puede contener hasta 5000 presentaciones.
Haga clic con el botón derecho en la imagen y, a continuación, haga clic en Bloquear.
No se pudo exportar la carpeta de proyecto duplicada.
Abra el archivo duplicado.
Para cambiar el nombre de una carpeta de proyecto, abra su espacio de trabajo, seleccione las carpetas de proyecto que desea cambiar el nombre de y haga clic en Cambiar nombre.
%d notas restauradas
Las copias de seguridad se realizan todos los días a las 10:05.
Para restaurar una plantilla de informe compartida, vaya al registro de actividad y haga clic en <b>Restaurar</b>.
Subiendo {count} de {total} documentos...
Elija Archivo > Nuevo proyecto y haga clic en Confirmar.
De forma predeterminada, Brelqua conserva 20 versiones de cada archivo.
No se pudo crear la presentación {0}. Inténtelo de nuevo.
Vaya al panel de control, seleccione la carpeta de proyecto y haga clic en <b>Mover</b>.
Copia de seguridad completada a las 9:30.
Próxima copia de seguridad: el martes a las 21:15
Seleccione la plantilla y, a continuación, haga clic en Bloquear.
Las copias de seguridad se realizan todos los jueves a las 7:05.
Editar todas las listas
No se pueden exportar calendarios del equipo mientras Zintaroo está sin conexión.
¿Desea compartir la factura archivada?
Haga clic en Descargar para descargar su informe de estado.
Su cuota de almacenamiento está al 45 % de su capacidad.
Haga clic en la etiqueta azul y haga clic en Listo.
Duplicar todas las listas de comprobación
Ya existe un proyecto con el nombre {title}.
Si elimina una lista de comprobación mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic en el icono verde para cambiar el nombre de la plantilla.
Arrastre los archivos a la carpeta de proyecto duplicada.
Vaya a Configuración > Idioma para cambiar el idioma de la aplicación.
No se puede eliminar la carpeta porque contiene 200 hojas de cálculo.
El panel de control muestra todas las hojas de cálculo recientes de su espacio de trabajo.
No se puede eliminar el calendario porque contiene 5 eventos.
10 eventos restaurados
La contraseña debe tener al menos 14 caracteres.
El archivo %s ocupa más de 1 GB.
No se ha encontrado el espacio de trabajo.
Para copiar un archivo oculto, seleccione los archivos que desea copiar y haga clic en Copiar.
Su cuota de almacenamiento está al 85 % de su capacidad.
No se pueden exportar listas mientras Zintaroo está sin conexión.
Tableros del espacio de trabajo {name}
Solo el propietario puede duplicar este calendario.
Solo los administradores pueden compartir listas vacías desde la consola de administración.
Tarea de {name}
Para subir una imagen, abra su espacio de trabajo, haga clic con el botón derecho en la imagen y haga clic en Subir.
Ir a la vista de cronograma
Archivar este calendario
Mostrar subtareas seleccionadas
Carpetas de {name}
También puede pulsar F2 para cambiar el nombre de su lista de tareas.
Restaure el proyecto reciente.
¿Desea cambiar el nombre de la imagen?
Editar nota
Progreso de la exportación: 3 %
%d subtareas creadas
La ruta E:\Archive\Brelqua no existe.
No se pueden archivar facturas mientras Zintaroo está sin conexión.
Exportar carpeta de proyecto
Haga clic con el botón derecho en la tarjeta y, a continuación, haga clic en Ocultar.
Si mueve una lista mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Solo el propietario puede eliminar esta factura.
Para restaurar un informe privado, abra su espacio de trabajo, haga clic con el botón derecho en el informe y haga clic en Restaurar.
Próxima copia de seguridad: el jueves a las 4:50
%d columnas ocultas
%d pestañas fijadas
No hay eventos duplicados
No se puede eliminar el tablero porque contiene 2 columnas.
Restaure el evento completado.
No se pudo guardar la carpeta {name}. Inténtelo de nuevo.
Ocultar notificaciones archivadas
Moviendo listas de tareas...
Escriba la descripción y, a continuación, haga clic en Listo.
Seleccione la lista de tareas y haga clic en Restaurar.
Cada calendario del equipo puede contener hasta 150 eventos.
No se pudo duplicar el calendario del equipo.
Para cambiar el nombre de una carpeta de proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
Para mover una plantilla de proyecto, haga clic con el botón derecho en la plantilla de proyecto y haga clic en Mover.
Última copia de seguridad: 6 de marzo
Nuevo tablero
%1$s ha compartido con usted el proyecto %2$s.
Para compartir una lista reciente, vaya al panel de control, haga clic con el botón derecho en la lista y haga clic en Compartir.
Para restaurar un comentario, seleccione los comentarios que desea restaurar y haga clic en Restaurar.
Progreso de la sincronización: 0,5 %
Solo los administradores pueden editar tareas duplicadas desde el panel de control.
%d imágenes subidas
Bloquear calendario
No se pueden eliminar plantillas de proyecto mientras Zintaroo está sin conexión.
El comentario se ha fijado correctamente.
Página copiada.
Espacio de trabajo de {user}
Para exportar una lista de tareas, haga clic con el botón derecho en la lista de tareas y haga clic en <b>Exportar</b>.
Bloquee la carpeta de proyecto compartida.
No se pudo restaurar la nota {title}.
Restaurar las plantillas seleccionadas
Sus pestañas se han ocultado correctamente.
No se pudo descargar %s.
Para imprimir una presentación bloqueada, abra el panel de control y haga clic en Imprimir.
No se pudo conectar con https://status.example.org.
Haga clic en el icono azul para bloquear el archivo.
Para editar una tarea, abra su espacio de trabajo, seleccione las tareas que desea editar y haga clic en Editar.
Seleccione el informe de estado y, a continuación, haga clic en Archivar.
Abra su espacio de trabajo, haga clic con el botón derecho en la página y haga clic en <b>Exportar</b>.
El tamaño máximo de una imagen es de 5 MB.
Las carpetas de la papelera se eliminan definitivamente después de 30 días.
Mostrar columnas amarillas
El calendario del equipo se ha bloqueado correctamente.
Para compartir una nota, vaya al panel de control, seleccione la nota y haga clic en Compartir.
Ocultar las tarjetas seleccionadas
Las copias de seguridad exportadas se guardan en C:\Users\Public\Brelqua\Exports.
No se pueden archivar listas de tareas mientras Zintaroo está sin conexión.
Pulse <b>Cambiar nombre</b> para cambiar el nombre de su calendario del equipo.
El panel de control muestra todas las imágenes de su espacio de trabajo.
Para eliminar un calendario del equipo, abra el panel de control y haga clic en Eliminar.
Columnas del tablero {title}
Solo los administradores pueden bloquear documentos de diseño recientes desde el registro de actividad.
Nueva plantilla
Para eliminar una tarjeta que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Eliminar.
Cambiar el nombre de todas las carpetas
No se pudo crear el archivo temporal.
No se puede eliminar el calendario porque contiene 10 eventos.
Si restaura una notificación mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Cualquier persona con el enlace para compartir puede ver esta carpeta.
El tablero %s se ha compartido con billing@example.com.
No se puede eliminar el calendario del equipo porque contiene 100 eventos.
No se pudo editar la lista de comprobación.
Seleccione los documentos que desea compartir y, a continuación, haga clic en Compartir.
Su plan cuesta 9,50 € por usuario al mes.
Los archivos de más de 100 MB se suben en partes de 20 MB.
Su calendario del equipo se ha exportado correctamente.
El tablero se ha copiado correctamente.
Arrastre los hitos al proyecto público.
Error al subir: no se admiten archivos de tipo .exe.
Su nota se ha copiado correctamente.
Su cuota de almacenamiento está llena. Elimine algunas presentaciones o póngase en contacto con no-reply@example.com.
No se pudo abrir la lista.
Solo el propietario puede fijar este mensaje.
Se han exportado 15 carpetas
El documento se ha movido correctamente.
No se puede eliminar el proyecto porque contiene 8 archivos.
Abra su espacio de trabajo, seleccione el mensaje y haga clic en Fijar.
Su cuota de almacenamiento está al 75 % de su capacidad.
Archive la notificación reciente.
No tiene permiso para subir esta hoja de cálculo.
No tiene permiso para compartir esta factura.
Zintaroo no pudo conectar con el centro de sincronización en https://help.example.com/brelqua/guests.
Solo el propietario puede restaurar este proyecto.
No se pudo compartir el documento. Inténtelo de nuevo.
Nuevo archivo
No se pudo copiar el tablero {1}. Inténtelo de nuevo.
La carpeta {name} se ha compartido con support@example.com.
Para descargar sus facturas, vaya a Configuración > Facturación.
Use la captura rápida para añadir una tarea desde cualquier página.
No se pudo abrir el mensaje.
Lista eliminada.
El tamaño máximo de una imagen es de 2,5 GB.
Elimine la imagen bloqueada.
Para fijar un mensaje, vaya al panel de control, seleccione el mensaje y haga clic en Fijar.
Bloquear esta carpeta de proyecto
Su periodo de prueba finaliza el 22 de junio.
No se pudo eliminar la plantilla de informe reciente.
No se pudo ocultar la pestaña {1}.
No se pudo guardar el documento privado. Inténtelo de nuevo.
Solo los administradores pueden eliminar archivos privados desde el panel de control.
Haga clic en el botón azul y, a continuación, haga clic en Listo.
No se pudo imprimir la presentación oculta.
Pulse <b>Copiar</b> para copiar este informe.
No se pudo compartir el calendario {0}.
Editar
Pulse <b>Guardar</b> para guardar sus documentos.
Documento movido.
La página se ha copiado correctamente.
Sus comentarios se han fijado correctamente.
Puede archivar hasta 1000 eventos a la vez.
No se puede eliminar el proyecto porque contiene 12 documentos.
No se puede eliminar la lista de tareas porque contiene 4 tareas.
Arrastre las hojas de cálculo a la carpeta de proyecto compartida.
Proyecto copiado.
Para editar un calendario del equipo, abra su espacio de trabajo y haga clic en Editar.
Exportando calendarios del equipo...
Arrastre los tableros al espacio de trabajo.
No tiene permiso para compartir esta carpeta de proyecto.
Haga clic en el botón azul y haga clic en Aplicar.
No se pudo copiar el tablero {title}.
Para editar un proyecto duplicado, abra su espacio de trabajo, haga clic con el botón derecho en el proyecto y haga clic en Editar.
El código de verificación ha caducado.
Se ha perdido la conexión con el centro de sincronización. Se volverá a intentar dentro de 30 segundos.
Ya existe una lista con el nombre {0}.
Puede exportar hasta 2000 documentos a la vez.
Elija Archivo > Nuevo proyecto y haga clic en Continuar.
No tiene permiso para subir esta presentación.
Haga clic con el botón derecho en la nota y, a continuación, haga clic en Fijar.
Ocultar carpetas eliminadas
Solo los administradores pueden compartir informes de gastos archivados desde el panel de control.
Escriba la descripción y, a continuación, haga clic en Confirmar.
Haga clic en el botón verde para fijar la nota.
El acceso de invitados permite que personas ajenas a su equipo vean documentos compartidos.
No se pudo eliminar la plantilla de informe {0}.
No se pueden archivar documentos de diseño mientras Zintaroo está sin conexión.
No se pudieron sincronizar %d de %d archivos.
Lista exportada.
Vaya al panel de control, seleccione los documentos que desea subir y haga clic en Subir.
Abra su espacio de trabajo, seleccione las hojas de cálculo que desea subir y haga clic en Subir.
{count} subtareas nuevas
Haga clic en el icono gris para exportar la carpeta de proyecto.
Haga clic en el icono rojo para mover la tarjeta.
Cuando Brelqua termina la exportación, recibe un correo electrónico en billing@example.com.
Las copias de seguridad se realizan todos los lunes a las 3:30.
Vaya al panel de control, seleccione los proyectos que desea restaurar y haga clic en Restaurar.
Número de teléfono no válido: %s
Haga clic en Duplicar para duplicar estas presentaciones.
No se ha encontrado el calendario.
Solo los administradores pueden restaurar mensajes eliminados desde la consola de administración.
Imprimir presentación
Para cambiar el nombre de una lista de tareas privada, seleccione la lista de tareas y haga clic en <b>Cambiar nombre</b>.
Para archivar un informe de gastos, seleccione el informe de gastos y haga clic en Archivar.
Los archivos de más de 2,5 GB se suben en partes de 20 MB.
No se pudo exportar la lista de tareas {name}.
Haga clic en el icono amarillo para eliminar la tarea.
Copiar las notas seleccionadas
Haga clic en Compartir para compartir este calendario del equipo.
Copia de seguridad completada a las 18:05.
Haga clic en el icono amarillo para archivar el documento de diseño.
Contraseña no válida: %s
Descargar las plantillas seleccionadas
Para descargar un documento grande, seleccione el documento y haga clic en Descargar.
No tiene permiso para archivar esta lista.
Para imprimir una hoja de cálculo, abra su espacio de trabajo, haga clic con el botón derecho en la hoja de cálculo y haga clic en Imprimir.
Error %d: no se pudo guardar el archivo.
No se ha encontrado el tablero.
Ha utilizado el 12,5 % de su cuota de almacenamiento.
El archivo release-plan.pptx ocupa más de 500 MB.
Para compartir un proyecto, vaya al panel de control, seleccione el proyecto y haga clic en Compartir.
Evento restaurado.
¿Seguro que desea mover 8 tarjetas?
Las facturas de la papelera se eliminan definitivamente después de 60 días.
Aceptar
Desactivar el acceso de invitados
El panel de control muestra todas las facturas compartidas de su espacio de trabajo.
Elija Ver > Mostrar archivos ocultos y, a continuación, haga clic en <b>Continuar</b>.
No tiene permiso para restaurar esta carpeta.
Los archivos de más de 250 MB se suben en partes de 5 MB.
No se pudo abrir la notificación {name}. Inténtelo de nuevo.
Para editar una hoja de cálculo, abra su espacio de trabajo y haga clic en Editar.
¿Eliminar este mensaje?
Plantilla de informe editada.
Editar todos los documentos de diseño
No se pueden subir documentos de más de 5 MB.
Para imprimir un informe de gastos, abra su espacio de trabajo y haga clic en <b>Imprimir</b>.
¿Seguro que desea restaurar 3 hitos?
Mostrar comentarios no leídos
Seleccione su documento de diseño y haga clic en Restaurar.
Solo los administradores pueden mover eventos completados desde el panel de control.
Si restaura una nota mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Su plan cuesta 4,90 € por usuario al mes.
Presentaciones de la carpeta {title}
Solo los administradores pueden restaurar plantillas recientes desde el registro de actividad.
Activar la verificación en dos pasos
Pulse <b>Abrir</b> para abrir este calendario del equipo.
Compartiendo documentos...
No se pudo fijar el mensaje oculto.
250 presentaciones subidas
Si elimina una carpeta, Brelqua la mueve a la papelera.
Los informes de gastos se han exportado correctamente.
Su cuota de almacenamiento está al 5 % de su capacidad.
Imprimiendo {count} de {total} imágenes...
La página se ha movido correctamente.
Abra la plantilla de proyecto bloqueada.
No se pudo eliminar %s.
Abra el panel de control, haga clic con el botón derecho en el informe de estado y haga clic en Imprimir.
Su cuota de almacenamiento está llena. Elimine algunas imágenes o póngase en contacto con admin@example.org.
No se pudo subir el archivo.
Configuración > Privacidad
Para eliminar un documento, abra su espacio de trabajo, haga clic con el botón derecho en el documento y haga clic en Eliminar.
Arrastre los hitos al proyecto duplicado.
El tamaño máximo de una imagen es de 50 MB.
Haga clic con el botón derecho en la presentación y, a continuación, haga clic en Duplicar.
No se han encontrado hitos.
No tiene permiso para compartir este tablero.
Para mover una lista que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Mover</b>.
Para asignar una tarea vencida, vaya a la vista de cronograma, haga clic con el botón derecho en la tarea y haga clic en Asignar.
Seleccione la hoja de cálculo y, a continuación, haga clic en Imprimir.
Su periodo de prueba finaliza el 27 de febrero.
Informe editado.
Solo los administradores pueden compartir informes de estado privados desde el registro de actividad.
3 archivos subidos
Eliminar etiqueta
¿Desea eliminar la subtarea vencida?
Última copia de seguridad: 16 de abril
Se han compartido 10 archivos
Duplicando {count} de {total} proyectos...
Haga clic en Exportar para exportar su tablero.
Para mover un calendario del equipo bloqueado, abra su espacio de trabajo, haga clic con el botón derecho en el calendario del equipo y haga clic en <b>Mover</b>.
También puede pulsar Ctrl+E para archivar esta plantilla de proyecto.
Notas de {0}
El tamaño máximo de una hoja de cálculo es de 3,5 GB.
Las copias de seguridad se realizan todos los lunes a las 11:50.
Plantilla de proyecto movida.
Abra su espacio de trabajo, seleccione las tarjetas que desea ocultar y haga clic en Ocultar.
Archivar este mensaje
No se pudo duplicar el hito {0}. Inténtelo de nuevo.
El enlace para compartir de este documento caduca dentro de 7 días.
Haga clic en el botón rojo para asignar la subtarea.
Para descargar un informe, abra su espacio de trabajo, seleccione los informes que desea descargar y haga clic en Descargar.
Desactivar la verificación en dos pasos
Abra su espacio de trabajo, seleccione las imágenes que desea subir y haga clic en Subir.
Si mueve una nota mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Ocultar proyectos recientes
La carpeta %s se ha compartido con admin@example.org.
Se han copiado %d presentaciones
6 documentos de diseño exportados
El documento está bloqueado por %s.
Seleccione la lista de tareas y, a continuación, haga clic en Guardar.
%d documentos subidos
Cambiar el nombre del archivo
Próxima copia de seguridad: el jueves a las 22:20
Bloquear archivo
%d calendarios eliminados
Tareas del proyecto {title}
Copiar los documentos seleccionados
Para descargar un informe de estado, seleccione los informes de estado que desea descargar y haga clic en <b>Descargar</b>.
Comparta el calendario reciente.
Puede restaurar hasta 250 imágenes a la vez.
Para copiar una plantilla, abra su espacio de trabajo, seleccione las plantillas que desea copiar y haga clic en Copiar.
Para compartir una carpeta de proyecto archivada, vaya al panel de control, seleccione la carpeta de proyecto y haga clic en Compartir.
¿Cambiar el nombre de esta lista?
Vaya a la consola de administración, seleccione los eventos que desea archivar y haga clic en <b>Archivar</b>.
Abra el panel de control, seleccione las carpetas de proyecto que desea editar y haga clic en Editar.
Si el problema persiste, póngase en contacto con support@example.com.
No se pueden descargar archivos mientras Zintaroo está sin conexión.
Error en la verificación en dos pasos. Compruebe el código y vuelva a intentarlo.
Para cambiar el nombre de un calendario principal, abra su espacio de trabajo, seleccione el calendario y haga clic en <b>Cambiar nombre</b>.
No se puede eliminar el calendario del equipo porque contiene 12 eventos.
Copia de seguridad completada a las 18:10.
De forma predeterminada, Brelqua conserva 20 versiones de cada plantilla.
Arrastre las tareas a la lista privada.
Eventos del calendario del equipo {0}
Pulse <b>Eliminar</b> para eliminar esta nota.
Duplicar todos los calendarios del equipo
© 2031 Vellorind Systems. Todos los derechos reservados.
Ha utilizado el 60 % de su cuota de almacenamiento.
No se puede eliminar la carpeta porque contiene 4 archivos.
Guardar las páginas seleccionadas
Para mover una plantilla de informe bloqueada, abra su espacio de trabajo, haga clic con el botón derecho en la plantilla de informe y haga clic en Mover.
No se pudo restaurar la lista {0}. Inténtelo de nuevo.
No se puede eliminar el calendario del equipo porque contiene 9 eventos.
Una carpeta inteligente reúne todas las imágenes con la misma etiqueta.
Las copias de seguridad se guardan en /srv/brelqua/archive y se conservan durante 7 días.
Se han fijado %d notas
%d listas de comprobación duplicadas
Su cuota de almacenamiento es de 10 GB; está usando 9 GB (90 %).
Para duplicar una hoja de cálculo, abra su espacio de trabajo, seleccione la hoja de cálculo y haga clic en Duplicar.
El tamaño máximo de una hoja de cálculo es de 10 GB.
¿Seguro que desea mover 250 listas?
Su calendario se ha impreso correctamente.
Para duplicar un archivo, abra su espacio de trabajo, seleccione los archivos que desea duplicar y haga clic en Duplicar.
Haga clic en el icono rojo para copiar la lista de tareas.
Las plantillas de proyecto se han compartido correctamente.
No se pudo exportar la presentación grande. Inténtelo de nuevo.
El registro de actividad recoge cada cambio de sus imágenes con su fecha y su autor.
Para archivar un informe de gastos, haga clic con el botón derecho en el informe de gastos y haga clic en Archivar.
Archive la subtarea privada.
Restaurando facturas...
Si cambia el nombre de una pestaña mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
La presentación se ha eliminado correctamente.
Para imprimir una lista de tareas, abra su espacio de trabajo y haga clic en <b>Imprimir</b>.
Mostrar tareas archivadas
Su cuota de almacenamiento está llena. Elimine algunas presentaciones o póngase en contacto con support@example.com.
La nota se ha impreso correctamente.
Pulse <b>Archivar</b> para archivar su plantilla.
Para restaurar un comentario que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
¿Eliminar este documento de diseño?
Filtrar por prioridad
Abra su espacio de trabajo, seleccione la factura y haga clic en Imprimir.
Los informes exportados se guardan en ~/Brelqua/Exports.
No se pueden eliminar etiquetas mientras Zintaroo está sin conexión.
Bloquear los calendarios seleccionados
Seleccione este archivo y haga clic en Descargar.
Se ha guardado 1 lista
Haga clic en Ocultar para ocultar sus columnas.
El comentario se ha restaurado correctamente.
Ir a la consola de administración
Zintaroo sincroniza sus archivos con el centro de sincronización cada 60 minutos.
Elija Edición > Seleccionar todo y, a continuación, haga clic en Aplicar.
Para cambiar el nombre de una carpeta, abra el panel de control y haga clic en <b>Cambiar nombre</b>.
Abra el panel de control, haga clic con el botón derecho en el evento y haga clic en Mover.
Vence el sábado a las 14:00
20 informes guardados
Escriba un nombre para el espacio de trabajo y haga clic en <b>Confirmar</b>.
Desactivar el modo de concentración
Las copias de seguridad se realizan todos los viernes a las 18:50.
No se puede eliminar el espacio de trabajo porque contiene 5 carpetas.
Puede restaurar hasta 500 presentaciones a la vez.
¿Desea bloquear la hoja de cálculo?
Solo los administradores pueden bloquear tableros recientes desde el panel de control.
%d plantillas de informe exportadas
Puede archivar hasta 1000 mensajes a la vez.
Solo los administradores pueden cambiar el nombre de hojas de cálculo compartidas desde la vista de cronograma.
También puede pulsar Ctrl+S para guardar este calendario del equipo.
Solo los administradores pueden eliminar calendarios del equipo archivados desde la consola de administración.
El tablero se ha compartido correctamente.
Escriba el nuevo nombre y haga clic en Aplicar.
Factura creada.
Mostrar carpetas duplicadas
Haga clic en Exportar para exportar este proyecto.
Seleccione la plantilla de proyecto y, a continuación, haga clic en <b>Guardar</b>.
Tiene %d hitos completados.
Seleccione la factura y, a continuación, haga clic en Editar.
Para bloquear una presentación que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Bloquear.
Puede descargar hasta 250 imágenes a la vez.
Ya existe un archivo con el nombre {title}.
Abra el registro de actividad, haga clic con el botón derecho en la imagen y haga clic en Restaurar.
El centro de sincronización mantiene sus archivos actualizados en todos sus dispositivos.
Haga clic con el botón derecho en la columna y, a continuación, haga clic en Ocultar.
Comparta el informe reciente.
Dirección de correo electrónico no válida: %s
Ya existe un hito con el nombre {name}.
Para duplicar un archivo público, abra su espacio de trabajo, seleccione el archivo y haga clic en Duplicar.
Para cambiar el nombre de una carpeta duplicada, seleccione las carpetas que desea cambiar el nombre de y haga clic en Cambiar nombre.
Calendario del equipo movido.
Para archivar una plantilla, vaya a la consola de administración y haga clic en Archivar.
Los documentos exportados se guardan en C:\Users\Public\Brelqua\Exports.
Para editar una factura archivada, abra su espacio de trabajo, seleccione las facturas que desea editar y haga clic en Editar.
<b>{count}</b> facturas seleccionadas
Seleccione sus páginas y haga clic en Restaurar.
Pulse <b>Mover</b> para mover su imagen.
No se pudo copiar la página {0}.
La lista de tareas está completada al 64 %.
Haga clic en la etiqueta roja y, a continuación, haga clic en <b>Listo</b>.
También puede pulsar Ctrl+P para imprimir este informe.
No se pudo copiar la plantilla reciente. Inténtelo de nuevo.
La carpeta %s se ha compartido con security@example.org.
Progreso de la exportación: 62,5 %
No se pudo copiar %1$s porque %2$s ya contiene un evento con ese nombre.
Si bloquea una plantilla de informe mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para cambiar el nombre de un informe, abra su espacio de trabajo, seleccione el informe y haga clic en Cambiar nombre.
Las copias de seguridad se realizan todos los jueves a las 16:10.
No se ha encontrado la carpeta inteligente.
Las plantillas se han exportado correctamente.
Fijar las pestañas seleccionadas
Mueva el calendario del equipo archivado.
Ocultar tareas duplicadas
No se pudo compartir la página {title}. Inténtelo de nuevo.
Archive la carpeta de proyecto duplicada.
Puede exportar hasta 2500 informes a la vez.
Seleccione las tareas que desea duplicar y, a continuación, haga clic en <b>Duplicar</b>.
Para descargar un informe, vaya al panel de control, seleccione el informe y haga clic en <b>Descargar</b>.
Para asignar una subtarea reciente, seleccione la subtarea y haga clic en Asignar.
Escriba un nombre para la lista y, a continuación, haga clic en <b>Aplicar</b>.
Su cuota de almacenamiento está llena. Elimine algunos documentos o póngase en contacto con support@example.com.
Pulse <b>Ocultar</b> para ocultar sus notificaciones.
No tiene permiso para cambiar el nombre de este informe de estado.
El proyecto se ha duplicado correctamente.
Almacenamiento usado: 12 GB de 20 GB
No se pudo subir la presentación {title}.
Para guardar una lista de tareas, abra su espacio de trabajo y haga clic en Guardar.
Si restaura un comentario mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se pudo cambiar el nombre de %s.
No se pudo fijar %s.
No se pudo ocultar %s.
No se pudo mover la plantilla de proyecto compartida. Inténtelo de nuevo.
Copia de seguridad de {user}
Ha utilizado el 99,5 % de su cuota de almacenamiento.
La imagen se ha subido correctamente.
El archivo kickoff-notes.docx ocupa más de 500 MB.
No se pueden compartir archivos mientras Zintaroo está sin conexión.
No se han encontrado subtareas.
Su nota se ha eliminado correctamente.
No se pueden mover listas de tareas mientras Zintaroo está sin conexión.
No se pueden restaurar comentarios mientras Zintaroo está sin conexión.
Copia de seguridad completada a las 17:15.
Nueva carpeta de proyecto
¿Duplicar este proyecto?
¿Desea compartir la hoja de cálculo privada?
Abra la consola de administración, haga clic con el botón derecho en la notificación y haga clic en Archivar.
Archive la plantilla bloqueada.
Las copias de seguridad se realizan todos los lunes a las 9:45.
¿Bloquear esta lista?
Para archivar una imagen bloqueada, seleccione las imágenes que desea archivar y haga clic en Archivar.
No se pudo archivar la subtarea. Inténtelo de nuevo.
Guardando carpetas...
Se han impreso 1000 documentos
Eliminar todos los informes de gastos
No se pueden descargar imágenes mientras Zintaroo está sin conexión.
Las copias de seguridad se guardan en E:\Archive\Brelqua y se conservan durante 60 días.
%d calendarios compartidos
Para mover un hito, vaya al panel de control, haga clic con el botón derecho en el hito y haga clic en Mover.
Arrastre las tareas a la lista.
Bloquear todas las carpetas de proyecto
Si edita un comentario mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
El registro de actividad recoge cada cambio de sus documentos con su fecha y su autor.
No tiene permiso para copiar esta lista de tareas.
Agrupar por descripción
Ordenar por propietario
Próxima copia de seguridad: el viernes a las 8:00
Haga clic con el botón derecho en la lista de tareas y, a continuación, haga clic en Copiar.
10 plantillas de informe descargadas
Su cuota de almacenamiento está al 100 % de su capacidad.
Para mover una carpeta de proyecto, seleccione la carpeta de proyecto y haga clic en <b>Mover</b>.
No se pudo conectar con https://docs.example.org/brelqua/api.
Las notas se han compartido correctamente.
Solo el propietario puede restaurar este informe.
Para bloquear un informe que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Bloquear</b>.
Para fijar un mensaje reciente, abra el panel de control y haga clic en Fijar.
Cada lista puede contener hasta 1500 tareas.
Para ocultar una pestaña, abra el panel de control y haga clic en <b>Ocultar</b>.
No hay tareas archivadas
Ya existe un informe con el nombre {name}.
No se pudo bloquear la lista {title}.
Solo los administradores pueden bloquear documentos ocultos desde la vista de cronograma.
Su plan cuesta 8,00 € por usuario al mes.
Se han copiado %d plantillas
El panel de control muestra todos los comentarios de su espacio de trabajo.
El modo de concentración está activado hasta las 3:00.
Haga clic en el botón verde para mover el calendario del equipo.
Haga clic en el icono amarillo para imprimir el calendario del equipo.
El enlace para compartir de este tablero caduca dentro de 2 días.
¿Desea eliminar la lista oculta?
Panel de control de %s
No se puede eliminar la carpeta inteligente porque contiene 3 presentaciones.
No se pudo compartir la presentación {1}.
Para imprimir un informe de gastos, vaya al panel de control, seleccione el informe de gastos y haga clic en Imprimir.
No se pudo copiar la plantilla de proyecto {name}.
Si mueve un hito mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic con el botón derecho en el archivo y, a continuación, haga clic en Restaurar.
Última copia de seguridad: 13 de enero
Fijar los comentarios seleccionados
Sus páginas se han bloqueado correctamente.
No tiene permiso para exportar esta plantilla.
Mueva el archivo oculto.
Para archivar una subtarea, seleccione las subtareas que desea archivar y haga clic en Archivar.
Última sincronización a las 21:00
Ha utilizado el 55 % de su cuota de almacenamiento.
Vence el miércoles a la 1:05
Para eliminar una lista de tareas, abra el panel de control, haga clic con el botón derecho en la lista de tareas y haga clic en Eliminar.
Vaya al panel de control, haga clic con el botón derecho en la carpeta y haga clic en Compartir.
Su cuota de almacenamiento está al 10 % de su capacidad.
Imprimir las listas de tareas seleccionadas
Abra su espacio de trabajo, seleccione los informes de estado que desea compartir y haga clic en Compartir.
Seleccione las notificaciones que desea ocultar y, a continuación, haga clic en <b>Ocultar</b>.
Ir al espacio de trabajo
Imprimiendo {count} de {total} informes de gastos...
El tamaño máximo de una presentación es de 4,5 GB.
Para mover un informe, abra el panel de control, haga clic con el botón derecho en el informe y haga clic en Mover.
No se puede eliminar la lista porque contiene 6 tareas.
Para exportar una carpeta pública, abra su espacio de trabajo, seleccione la carpeta y haga clic en Exportar.
También puede pulsar Ctrl+P para imprimir su lista.
Para asignar una tarea, abra la vista de cronograma, seleccione las tareas que desea asignar y haga clic en <b>Asignar</b>.
Arrastre las presentaciones a la carpeta de proyecto pública.
%d tareas creadas
Para editar un archivo privado, vaya al panel de control, seleccione los archivos que desea editar y haga clic en Editar.
7 facturas archivadas
Solo los administradores pueden compartir listas de tareas recientes desde el registro de actividad.
Última sincronización a las 5:15
Para informar de un problema de seguridad, escriba a support@example.com o visite https://status.example.org.
No se pueden subir documentos de más de 250 MB.
Su cuota de almacenamiento está llena. Elimine algunas presentaciones o póngase en contacto con billing@example.com.
Abrir esta página
Su periodo de prueba finaliza el 17 de enero.
Los tableros se han guardado correctamente.
Cada lista de tareas puede contener hasta 50 tareas.
Espacio de trabajo de %s
No se pudo cambiar el nombre del informe.
Para imprimir una hoja de cálculo reciente, abra su espacio de trabajo, seleccione las hojas de cálculo que desea imprimir y haga clic en <b>Imprimir</b>.
Vence el viernes a las 14:50
La lista de tareas se ha copiado correctamente.
Su cuota de almacenamiento está al 60 % de su capacidad.
Abra su espacio de trabajo, seleccione el calendario del equipo y haga clic en Cambiar nombre.
Configuración > Notificaciones
El tamaño máximo de un documento es de 500 MB.
Pulse <b>Editar</b> para editar este informe.
Mostrar notificaciones recientes
Para subir una imagen, haga clic con el botón derecho en la imagen y haga clic en <b>Subir</b>.
URL no válida: %s
Para asignar una tarea, vaya a la vista de cronograma y haga clic en <b>Asignar</b>.
El archivo roadmap-v2.pdf ocupa más de 750 MB.
Proyectos de {user}
Las copias de seguridad se realizan todos los días a las 7:10.
Elimine la carpeta de proyecto privada.
Se han copiado 2 carpetas
Eliminar evento
Vence el sábado a las 18:15
Seleccione esta lista de tareas y haga clic en Bloquear.
Solo el propietario puede asignar esta subtarea.
Para exportar un archivo, vaya al panel de control, seleccione el archivo y haga clic en Exportar.
Abrir en una pestaña nueva
Solo los administradores pueden cambiar la cuota de almacenamiento de un espacio de trabajo.
Asignar subtarea
Mostrando {start}-{end} de {total} archivos
No se pudo mover la página {1}.
Haga clic con el botón derecho en la hoja de cálculo y, a continuación, haga clic en Compartir.
Haga clic con el botón derecho en la página y, a continuación, haga clic en Bloquear.
Escriba un nombre para el proyecto y, a continuación, haga clic en <b>Guardar</b>.
%d carpetas copiadas
Haga clic con el botón derecho en la plantilla de proyecto y, a continuación, haga clic en Mover.
El tamaño máximo de un documento es de 3,5 GB.
Arrastre los eventos al calendario privado.
Seleccione la página y, a continuación, haga clic en Copiar.
Para eliminar una hoja de cálculo, abra su espacio de trabajo, seleccione las hojas de cálculo que desea eliminar y haga clic en Eliminar.
Para obtener más información, consulte https://status.example.org.
También puede pulsar Ctrl+C para copiar el informe.
Sus hitos se han movido correctamente.
Escriba un nombre para la carpeta inteligente y haga clic en <b>Guardar</b>.
Ir al registro de actividad
Para compartir un tablero privado, vaya al panel de control, haga clic con el botón derecho en el tablero y haga clic en <b>Compartir</b>.
Bloquear lista
Para imprimir un documento, vaya al panel de control, seleccione el documento y haga clic en Imprimir.
Arrastre los eventos al calendario oculto.
Mostrar tareas completadas
Ocultar tareas completadas
No se pudo restaurar la tarea {name}.
Tiene %d archivos ocultos.
El calendario se ha bloqueado correctamente.
Las hojas de cálculo se han guardado correctamente.
Vaya al panel de control, seleccione la factura y haga clic en Imprimir.
No se puede eliminar la carpeta inteligente porque contiene 12 presentaciones.
No hay archivos bloqueados
Para imprimir una nota, abra el panel de control, haga clic con el botón derecho en la nota y haga clic en Imprimir.
Seleccione las listas de tareas que desea editar y, a continuación, haga clic en Editar.
No se puede eliminar la carpeta de proyecto porque contiene 250 presentaciones.
Ya existe una etiqueta con el nombre {1}.
Si cambia el nombre de una carpeta mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Vence el miércoles a las 4:20
12 calendarios exportados
No se ha encontrado la plantilla.
Haga clic en el icono verde y haga clic en Guardar.
Descargando {count} de {total} imágenes...
Imprimir esta página
No se pudo restaurar %s.
El informe está bloqueado por %s.
Para exportar una lista, abra el panel de control y haga clic en <b>Exportar</b>.
Ocultar etiquetas amarillas
Los archivos de más de 250 MB se suben en partes de 8 MB.
Para exportar una carpeta de proyecto, abra su espacio de trabajo, haga clic con el botón derecho en la carpeta de proyecto y haga clic en Exportar.
Su plan incluye 1,5 GB de almacenamiento por usuario.
Continuar
Descargar
El enlace para compartir de esta plantilla caduca dentro de 14 días.
Para restaurar una imagen que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
Crear calendario
Para fijar una nota, abra el panel de control, haga clic con el botón derecho en la nota y haga clic en Fijar.
Arrastre las hojas de cálculo a la carpeta inteligente.
No se pudo encontrar la nota %s.
Solo los administradores pueden mover listas de comprobación privadas desde el panel de control.
Solo el propietario puede cambiar el nombre de este informe.
{count} notificaciones nuevas
Para duplicar una subtarea archivada, vaya a la vista de cronograma, seleccione la subtarea y haga clic en Duplicar.
Eliminar los informes de gastos seleccionados
Cambiar el nombre de esta lista de tareas
El modo de concentración está activado hasta las 19:05.
Abra su espacio de trabajo, haga clic con el botón derecho en la factura y haga clic en Imprimir.
Si mueve un documento de diseño mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Imprimir todas las notas
5 calendarios restaurados
Ha utilizado el 70 % de su cuota de almacenamiento.
Para fijar una tarjeta roja, abra el panel de control, seleccione las tarjetas que desea fijar y haga clic en Fijar.
Su plan cuesta 24,99 € por usuario al mes.
El archivo kickoff-notes.docx ocupa más de 2 GB.
Error %d: no se pudo guardar la página.
%d subtareas archivadas
Los elementos añadidos con la captura rápida aparecen en su espacio de trabajo.
Mostrar hitos eliminados
Para fijar un mensaje, vaya al panel de control, seleccione los mensajes que desea fijar y haga clic en Fijar.
Su documento de diseño se ha eliminado correctamente.
Descargar todos los informes de gastos
No se puede eliminar el calendario porque contiene 15 eventos.
El modo de concentración está activado hasta las 5:45.
Abra su espacio de trabajo, haga clic con el botón derecho en la página y haga clic en <b>Compartir</b>.
Mostrar mensajes recientes
500 listas de comprobación eliminadas
¿Cambiar el nombre de esta pestaña?
Las copias de seguridad se realizan todos los días a las 11:20.
Si mueve un proyecto mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Crear documento de diseño
Nuevo proyecto
Sin conexión. Los cambios se sincronizarán cuando vuelva a conectarse.
Duplicar
Las copias de seguridad se realizan todos los días a las 12:05.
Los comentarios eliminados permanecen en la papelera durante 30 días antes de eliminarse definitivamente.
Última copia de seguridad: 2 de julio
Su cuota de almacenamiento está llena. Elimine algunas copias de seguridad o póngase en contacto con support@example.com.
Arrastre las tarjetas al tablero archivado.
Para cambiar el nombre de un informe de estado reciente, seleccione el informe de estado y haga clic en Cambiar nombre.
No se pudo mover el archivo.
Las copias de seguridad se realizan todos los jueves a las 23:00.
Para restaurar una hoja de cálculo, abra su espacio de trabajo y haga clic en Restaurar.
No tiene permiso para cambiar el nombre de esta plantilla de proyecto.
Para duplicar una plantilla archivada, seleccione las plantillas que desea duplicar y haga clic en Duplicar.
Pulse <b>Copiar</b> para copiar la nota.
No se pudo abrir el documento.
No hay documentos recientes
Ocultar tarjetas grises
Eliminando plantillas...
Abrir en el espacio de trabajo
El panel de control muestra todos los archivos de su espacio de trabajo.
Abra el registro de actividad, seleccione el calendario del equipo y haga clic en Restaurar.
Abra su espacio de trabajo, haga clic con el botón derecho en el informe de gastos y haga clic en <b>Exportar</b>.
¿Seguro que desea restaurar 2 eventos?
Seleccione los informes que desea exportar y, a continuación, haga clic en Exportar.
Para fijar una tarjeta oculta, seleccione la tarjeta y haga clic en <b>Fijar</b>.
Si archiva un hito mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
El archivo {file} ocupa más de 1,5 GB.
Para exportar una plantilla de informe, haga clic con el botón derecho en la plantilla de informe y haga clic en Exportar.
Se han movido %d tarjetas
No se pudo archivar el documento reciente. Inténtelo de nuevo.
Se han exportado %d notas
Para editar un calendario del equipo oculto, abra el panel de control, seleccione los calendarios del equipo que desea editar y haga clic en Editar.
Ordenar por descripción
Ha utilizado el 40 % de su cuota de almacenamiento.
Para imprimir una factura, seleccione las facturas que desea imprimir y haga clic en Imprimir.
Restaurando {count} de {total} tareas...
Para compartir un informe de estado reciente, vaya al panel de control y haga clic en Compartir.
Arrastre las carpetas al espacio de trabajo.
¿Seguro que desea restaurar 9 facturas?
Subir presentación
Se han ocultado %d notificaciones
2 pestañas ocultas
Para ocultar una notificación no leída, abra el panel de control, seleccione las notificaciones que desea ocultar y haga clic en Ocultar.
La columna se ha ocultado correctamente.
Se han descargado %d plantillas
Panel de control de {name}
Las copias de seguridad se guardan en /mnt/vault/brelqua y se conservan durante 14 días.
Las copias de seguridad se realizan todos los días a la 1:05.
No se puede eliminar el tablero porque contiene 2 tarjetas.
Seleccione la lista de tareas y, a continuación, haga clic en Eliminar.
Haga clic con el botón derecho en el informe y, a continuación, haga clic en Archivar.
No se puede eliminar el espacio de trabajo porque contiene 15 carpetas.
La subtarea se ha asignado correctamente.
Imprimir todas las hojas de cálculo
No se pueden subir presentaciones de más de 50 MB.
Este documento es demasiado grande para mostrar una vista previa.
No tiene permiso para imprimir este informe de gastos.
Abra el panel de control, seleccione las páginas que desea exportar y haga clic en Exportar.
Solo los administradores pueden editar listas de comprobación privadas desde la consola de administración.
Vaya a la consola de administración, seleccione los proyectos que desea bloquear y haga clic en <b>Bloquear</b>.
Los elementos añadidos con la captura rápida aparecen en el panel de control.
Para compartir un tablero, abra el panel de control, haga clic con el botón derecho en el tablero y haga clic en Compartir.
Haga clic en el icono verde para copiar la plantilla de proyecto.
Los archivos de más de 2,5 GB se suben en partes de 50 MB.
Última copia de seguridad: 20 de diciembre
Para ocultar un comentario, vaya al panel de control, haga clic con el botón derecho en el comentario y haga clic en Ocultar.
No tiene permiso para cambiar el nombre de este documento de diseño.
No se pueden subir presentaciones mientras Zintaroo está sin conexión.
Haga clic en el icono verde y, a continuación, haga clic en Continuar.
No se puede eliminar la carpeta inteligente porque contiene 7 presentaciones.
Las copias de seguridad se guardan en /mnt/vault/brelqua y se conservan durante 60 días.
Seleccione el hito y, a continuación, haga clic en <b>Editar</b>.
No se pueden eliminar tarjetas mientras Zintaroo está sin conexión.
¿Seguro que desea archivar 12 informes?
¿Seguro que desea restaurar 20 eventos?
Para fijar una nota, vaya al panel de control, seleccione las notas que desea fijar y haga clic en Fijar.
Ha utilizado el 100 % de su cuota de almacenamiento.
Tareas del proyecto {0}
Sus informes se han guardado correctamente.
Mostrar subtareas vencidas
Para bloquear una lista que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Bloquear.
Para editar una tarea completada, seleccione las tareas que desea editar y haga clic en Editar.
El archivo kickoff-notes.docx ocupa más de 750 MB.
Los archivos de más de 1,5 GB se suben en partes de 20 MB.
Mostrar archivos duplicados
Elija Archivo > Nuevo proyecto y haga clic en <b>Guardar</b>.
El archivo export_2031-05-14.csv ocupa más de 4 GB.
El calendario {0} se ha compartido con support@example.com.
Haga clic en el botón gris y, a continuación, haga clic en Listo.
No se pudo cambiar el nombre del proyecto.
Zintaroo sincroniza sus carpetas con el centro de sincronización cada 15 minutos.
No tiene permiso para eliminar este mensaje.
Para restaurar un mensaje, abra su espacio de trabajo, seleccione los mensajes que desea restaurar y haga clic en Restaurar.
El tamaño máximo de un documento es de 2,5 GB.
Para cambiar el nombre de una lista de tareas privada, vaya al panel de control, haga clic con el botón derecho en la lista de tareas y haga clic en Cambiar nombre.
Para archivar una factura, seleccione las facturas que desea archivar y haga clic en Archivar.
De forma predeterminada, Brelqua conserva 100 versiones de cada nota.
El registro de actividad recoge cada cambio de sus notas con su fecha y su autor.
Para subir una presentación pública, abra el panel de control y haga clic en Subir.
Pulse <b>Exportar</b> para exportar su informe.
Ocultar notas eliminadas
Para descargar una hoja de cálculo oculta, abra su espacio de trabajo, seleccione la hoja de cálculo y haga clic en Descargar.
El proyecto {0} se ha compartido con no-reply@example.com.
Para bloquear una nota oculta, vaya al panel de control, seleccione la nota y haga clic en Bloquear.
Seleccione la lista de comprobación y, a continuación, haga clic en Duplicar.
Para archivar una imagen pública, seleccione las imágenes que desea archivar y haga clic en Archivar.
Para copiar una imagen, haga clic con el botón derecho en la imagen y haga clic en Copiar.
No se pueden mover informes mientras Zintaroo está sin conexión.
12 notificaciones ocultas
Copiando listas de tareas...
Para guardar un calendario, seleccione los calendarios que desea guardar y haga clic en Guardar.
10 hitos eliminados
Mostrar comentarios fijados
Copiando calendarios del equipo...
Solo los administradores pueden restaurar plantillas de proyecto archivadas desde la vista de cronograma.
Haga clic en Imprimir para imprimir esta nota.
Compartiendo archivos...
Escriba un nombre de archivo válido.
Descargar esta factura
Para cambiar el nombre de una presentación, abra su espacio de trabajo y haga clic en Cambiar nombre.
Cada espacio de trabajo puede contener hasta 10 carpetas.
No se pudo descargar la imagen. Inténtelo de nuevo.
El registro de actividad recoge cada cambio de sus eventos con su fecha y su autor.
No se pudo bloquear el informe de estado {name}.
¿Seguro que desea cambiar el nombre de 8 informes?
Si elimina una factura mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Archivando {count} de {total} facturas...
Última sincronización a las 11:30
Elija Ver > Modo de concentración y, a continuación, haga clic en Confirmar.
Copiar las presentaciones seleccionadas
Agrupar por título
La notificación se ha restaurado correctamente.
%d subtareas asignadas
No se puede eliminar la lista porque contiene 3 tareas.
Para eliminar una columna, seleccione la columna y haga clic en Eliminar.
El proyecto está bloqueado por %s.
De forma predeterminada, Brelqua conserva 5 versiones de cada plantilla.
Solo el propietario puede descargar este informe de estado.
Copiando {count} de {total} imágenes...
Para exportar una nota privada, abra su espacio de trabajo, seleccione la nota y haga clic en Exportar.
Abrir en la consola de administración
Para compartir un documento de diseño duplicado, abra su espacio de trabajo, seleccione los documentos de diseño que desea compartir y haga clic en Compartir.
Para descargar una hoja de cálculo duplicada, vaya al panel de control, seleccione la hoja de cálculo y haga clic en Descargar.
Para mover una plantilla de informe que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Mover.
El archivo %s ocupa más de 500 MB.
Comparta la lista vacía.
Se han guardado 200 carpetas de proyecto
Solo el propietario puede archivar esta lista de comprobación.
El modo de concentración está activado hasta las 4:20.
Para archivar una lista de comprobación duplicada, haga clic con el botón derecho en la lista de comprobación y haga clic en <b>Archivar</b>.
Documento subido.
Para descargar un informe, vaya al panel de control, seleccione los informes que desea descargar y haga clic en <b>Descargar</b>.
Seleccione la pestaña y, a continuación, haga clic en Fijar.
No se pudo bloquear el tablero público.
Archive el hito duplicado.
Se han guardado 9 imágenes
Solo los administradores pueden eliminar calendarios del equipo recientes desde la consola de administración.
Solo el propietario puede subir este archivo.
El acceso de invitados está desactivado para este espacio de trabajo.
Haga clic en Subir para subir su imagen.
Solo el propietario puede ocultar esta notificación.
Seleccione las presentaciones que desea subir y, a continuación, haga clic en <b>Subir</b>.
Nueva página
Borrar filtros
El centro de sincronización mantiene sus imágenes actualizadas en todos sus dispositivos.
Para bloquear una nota, haga clic con el botón derecho en la nota y haga clic en <b>Bloquear</b>.
Su cuota de almacenamiento está al 87,5 % de su capacidad.
%d facturas exportadas
Vaya al panel de control, haga clic con el botón derecho en la subtarea y haga clic en <b>Archivar</b>.
El tamaño máximo de una imagen es de 10 MB.
No se pudo copiar la plantilla de informe oculta. Inténtelo de nuevo.
Error al subir: no se admiten archivos de tipo .dmg.
No se pudo fijar el comentario.
No se puede eliminar la lista porque contiene 4 tareas.
El panel de control muestra todas las subtareas duplicadas de su espacio de trabajo.
Nueva factura
Solo el propietario puede restaurar este calendario del equipo.
Plantilla exportada.
Haga clic en el botón amarillo para subir la imagen.
El archivo %s se ha compartido con no-reply@example.com.
Las copias de seguridad se realizan todos los miércoles a las 16:30.
Puede exportar hasta 75 informes de gastos a la vez.
Restaure la lista de comprobación reciente.
El tablero {0} se ha compartido con helpdesk@example.org.
Pulse <b>Ocultar</b> para ocultar la columna.
Si comparte una página mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Compartiendo %s...
No tiene permiso para fijar esta nota.
¿Eliminar esta carpeta de proyecto?
Pulse <b>Editar</b> para editar la tarea.
El tablero está completado al 12,5 %.
Las notas eliminadas permanecen en la papelera durante 14 días antes de eliminarse definitivamente.
No se pueden mover columnas mientras Zintaroo está sin conexión.
Para mover una plantilla de proyecto archivada, abra el panel de control, seleccione la plantilla de proyecto y haga clic en Mover.
No se pudo compartir la plantilla de informe duplicada. Inténtelo de nuevo.
No hay notificaciones no leídas
¿Seguro que desea eliminar 5000 hojas de cálculo?
El tamaño máximo de un documento es de 750 KB.
Las copias de seguridad se guardan en /srv/brelqua/archive y se conservan durante 1 día.
Crear nota
<b>{count}</b> mensajes seleccionados
Cada espacio de trabajo puede contener hasta 250 carpetas.
Zintaroo sincroniza sus carpetas con el centro de sincronización cada 30 minutos.
No tiene permiso para editar este informe de gastos.
Para cambiar el nombre de una etiqueta, abra su espacio de trabajo y haga clic en Cambiar nombre.
Escriba el nuevo nombre y haga clic en Listo.
Solo los administradores pueden bloquear documentos de diseño archivados desde la consola de administración.
¿Mover esta plantilla?
El modo de concentración está activado hasta las 6:00.
Abrir evento
La pestaña se ha fijado correctamente.
No se pudo imprimir la presentación archivada. Inténtelo de nuevo.
Su plan cuesta 8,99 € por usuario al mes.
La nota está bloqueada por %s.
Abra su espacio de trabajo, seleccione las presentaciones que desea exportar y haga clic en <b>Exportar</b>.
Mover esta presentación
Escriba un nombre para el espacio de trabajo y, a continuación, haga clic en Confirmar.
Haga clic en Ocultar para ocultar las tarjetas.
Para mover una subtarea vencida, seleccione las subtareas que desea mover y haga clic en Mover.
Compartir informe
Mover las páginas seleccionadas
Ya existe un espacio de trabajo con el nombre {1}.
Para guardar un calendario del equipo privado, haga clic con el botón derecho en el calendario del equipo y haga clic en Guardar.
No se pudo subir el documento {1}.
Para cambiar el nombre de una plantilla que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
Haga clic en Compartir para compartir la presentación.
Para compartir un proyecto oculto, vaya al panel de control, seleccione los proyectos que desea compartir y haga clic en Compartir.
El acceso de invitados está desactivado.
Se han guardado %d notas
Descargar esta plantilla
Filtrar por fecha de vencimiento
Para compartir una lista de tareas que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
Pulse <b>Eliminar</b> para eliminar su lista.
La lista de tareas está completada al 87,5 %.
Compartiendo {count} de {total} imágenes...
Para archivar una plantilla de proyecto, haga clic con el botón derecho en la plantilla de proyecto y haga clic en Archivar.
Haga clic en Eliminar para eliminar la columna.
Descargando imágenes...
Recordatorio: la tarea {name} vence dentro de 3 días.
Las facturas de la papelera se eliminan definitivamente después de 14 días.
Compartir los informes de gastos seleccionados
Agrupar por tamaño
Carpeta creada.
No tiene permiso para eliminar este calendario del equipo.
Vence el miércoles a las 5:00
No se pueden subir presentaciones de más de 100 MB.
Editar todos los comentarios
Seleccione el comentario y, a continuación, haga clic en <b>Ocultar</b>.
Recordatorio: el hito {name} vence dentro de 7 días.
Haga clic con el botón derecho en la carpeta y, a continuación, haga clic en Guardar.
Su cuota de almacenamiento está llena. Elimine algunos documentos o póngase en contacto con billing@example.com.
No se pueden subir imágenes de más de 25 MB.
%d notas fijadas
Para crear un archivo, abra su espacio de trabajo y haga clic en Crear.
Los tableros exportados se guardan en C:\Users\Public\Brelqua\Exports.
Vence el martes a las 8:10
Para imprimir una presentación grande, abra el panel de control y haga clic en Imprimir.
Abra su espacio de trabajo, seleccione los archivos que desea editar y haga clic en <b>Editar</b>.
Cada espacio de trabajo puede contener hasta 40 tableros.
Editar tablero
No se pudo mover la presentación.
Duplicar todas las carpetas de proyecto
Restaurar esta plantilla de informe
Haga clic en el icono rojo y haga clic en <b>Listo</b>.
No tiene permiso para bloquear esta lista de tareas.
Almacenamiento usado: 15 GB de 20 GB
Para bloquear un informe, seleccione el informe y haga clic en <b>Bloquear</b>.
Si elimina un proyecto, Brelqua lo mueve a la papelera.
No se pudo escribir en ~/Library/Zintaroo/cache.
No se ha encontrado el comentario.
Abra su espacio de trabajo, haga clic con el botón derecho en el documento y haga clic en Editar.
Última copia de seguridad: 22 de enero
Copiando %s...
Solo los administradores pueden restaurar comentarios ocultos desde el registro de actividad.
Para compartir un calendario con personas ajenas a su equipo, cree un enlace para compartir.
La ruta /var/lib/zintaroo/exports no existe.
Para restaurar un calendario del equipo, vaya al registro de actividad, seleccione los calendarios del equipo que desea restaurar y haga clic en Restaurar.
Mostrar mensajes fijados
Para mover una columna, abra el panel de control, haga clic con el botón derecho en la columna y haga clic en <b>Mover</b>.
La página está bloqueada por %s.
Escriba un nombre de usuario válido.
Progreso de la subida: 100 %
Guardando {count} de {total} imágenes...
Última copia de seguridad: 9 de noviembre
No se pudo bloquear la hoja de cálculo {name}.
Archivo de {name}
Solo los administradores pueden cambiar el nombre de plantillas de informe archivadas desde la consola de administración.
No se pudo cambiar el nombre de la columna verde.
Las copias de seguridad se realizan todos los sábados a las 4:50.
Marque la casilla Recordarme y haga clic en Continuar.
Arrastre las tarjetas al tablero reciente.
12 subtareas asignadas
Calendario de {name}
Mover evento
Imprimiendo %s...
Haga clic en la pestaña verde y haga clic en Guardar.
Nueva carpeta inteligente
Para ocultar una pestaña roja, vaya al panel de control, seleccione la pestaña y haga clic en <b>Ocultar</b>.
Deshacer
No se pueden eliminar comentarios mientras Zintaroo está sin conexión.
Seleccione la imagen y, a continuación, haga clic en Imprimir.
La lista de comprobación está completada al 70 %.
¿Desea archivar el informe?
No tiene permiso para cambiar el nombre de esta nota.
Descartar cambios
Buscar
Pulse <b>Exportar</b> para exportar sus informes de gastos.
No se pueden subir imágenes de más de 7,5 GB.
No se puede eliminar la lista de tareas porque contiene 12 tareas.
Pulse <b>Mover</b> para mover los archivos.
Para archivar una tarea que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
Haga clic en el icono verde para descargar la presentación.
El modo de concentración está desactivado.
Compartir plantilla de proyecto
Abra su espacio de trabajo, seleccione el mensaje y haga clic en <b>Restaurar</b>.
Su tablero se ha copiado correctamente.
Seleccione los informes que desea exportar y, a continuación, haga clic en <b>Exportar</b>.
Proyecto de {user}
%d informes de gastos compartidos
Para subir una imagen, abra su espacio de trabajo y haga clic en Subir.
Solo el propietario puede restaurar esta carpeta de proyecto.
Para mover una plantilla de proyecto, abra el panel de control y haga clic en Mover.
El acceso de invitados permite que personas ajenas a su equipo vean proyectos archivados.
¿Desea restaurar el hito eliminado?
Ocultar carpetas privadas
No se pueden descargar informes de estado mientras Zintaroo está sin conexión.
Imagen descargada.
20 plantillas guardadas
Las notas eliminadas permanecen en la papelera durante 30 días antes de eliminarse definitivamente.
%d informes de estado restaurados
Zintaroo no pudo conectar con el centro de sincronización en https://status.example.org.
No se puede eliminar el calendario porque contiene 200 eventos.
Cada carpeta de proyecto puede contener hasta 1500 imágenes.
Si cambia el nombre de un calendario del equipo mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
%d carpetas de proyecto guardadas
Crear presentación
El modo de concentración está activado hasta las 17:15.
Eliminando hitos...
Para exportar un calendario del equipo, abra su espacio de trabajo, haga clic con el botón derecho en el calendario del equipo y haga clic en <b>Exportar</b>.
También puede pulsar Ctrl+S para guardar sus notas.
Seleccione la presentación y, a continuación, haga clic en Restaurar.
Haga clic en Ocultar para ocultar las columnas.
Archive la plantilla reciente.
Tareas del proyecto {1}
No se han encontrado facturas.
Su cuota de almacenamiento es de 5 GB; está usando 1,25 GB (25 %).
Haga clic en Duplicar para duplicar este evento.
Abra el panel de control, seleccione la página y haga clic en Copiar.
Arrastre las tareas a la lista archivada.
No se pudo eliminar la página vacía.
Última sincronización a las 18:10
%d listas compartidas
Sincronizado hace 5 minutos
Última sincronización a las 16:45
Mostrar facturas duplicadas
Exportar esta carpeta
Si elimina una factura, Brelqua la mueve a la papelera.
Para archivar una imagen que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
Solo los administradores pueden restaurar proyectos compartidos desde la vista de cronograma.
1 proyecto compartido
Su cuota de almacenamiento está llena. Elimine algunas imágenes o póngase en contacto con security@example.org.
Para ver qué parte de su cuota de almacenamiento está usando, vaya a Configuración > Almacenamiento.
De forma predeterminada, Brelqua conserva 10 versiones de cada nota.
Bloquear todos los proyectos
Los tableros eliminados permanecen en la papelera durante 1 día antes de eliminarse definitivamente.
Haga clic con el botón derecho en el documento y, a continuación, haga clic en Subir.
Eventos del calendario {0}
Agrupar por fecha de vencimiento
Abrir
Para informar de un problema de seguridad, escriba a support@example.com o visite https://help.example.com/brelqua/guests.
Para exportar una factura archivada, abra el panel de control y haga clic en Exportar.
El enlace para compartir de esta carpeta caduca dentro de 2 días.
{count} copias de seguridad nuevas
Para elegir qué notificaciones recibe, vaya a Configuración > Notificaciones.
Los proyectos de la papelera se eliminan definitivamente después de 7 días.
El tamaño máximo de un archivo es de 1 GB.
El acceso de invitados permite que personas ajenas a su equipo vean plantillas archivadas.
Los documentos eliminados permanecen en la papelera durante 30 días antes de eliminarse definitivamente.
Pulse <b>Editar</b> para editar sus listas de tareas.
Si el problema persiste, póngase en contacto con no-reply@example.com.
No se puede eliminar el tablero porque contiene 1500 tarjetas.
Para restaurar una hoja de cálculo, abra el panel de control y haga clic en Restaurar.
No tiene permiso para exportar este documento.
No se pudo cambiar el nombre del documento.
Para bloquear un informe de estado duplicado, abra la consola de administración, seleccione el informe de estado y haga clic en Bloquear.
Las facturas eliminadas permanecen en la papelera durante 1 día antes de eliminarse definitivamente.
Imprimir este informe de estado
Copiar enlace
Bloquear este archivo
Ocultar columnas verdes
Última sincronización a las 10:30
Progreso de la exportación: 50 %
Esta hoja de cálculo es demasiado grande para mostrar una vista previa.
Recordatorio: la tarea {name} vence dentro de 5 días.
No tiene permiso para editar este calendario del equipo.
¿Desea archivar el calendario compartido?
Para compartir un informe de gastos duplicado, abra su espacio de trabajo, haga clic con el botón derecho en el informe de gastos y haga clic en Compartir.
Una carpeta inteligente reúne todos los archivos con la misma etiqueta.
Haga clic con el botón derecho en el informe de gastos y, a continuación, haga clic en Archivar.
Archivar todas las notas
Para subir un archivo público, abra el panel de control, seleccione el archivo y haga clic en Subir.
Recordatorio: el informe de gastos {name} vence dentro de 7 días.
Para compartir una hoja de cálculo con personas ajenas a su equipo, cree un enlace para compartir.
Su comentario se ha ocultado correctamente.
Ha utilizado el 87,5 % de su cuota de almacenamiento.
Progreso de la copia de seguridad: 55 %
El archivo logo_final.png ocupa más de 10 GB.
Conectado al centro de sincronización
No se pudo bloquear la plantilla duplicada. Inténtelo de nuevo.
Solo el propietario puede fijar esta tarjeta.
No se pudo restaurar el informe {0}. Inténtelo de nuevo.
Su cuota de almacenamiento está llena. Elimine algunas hojas de cálculo o póngase en contacto con security@example.org.
No tiene permiso para mover esta plantilla.
No se pudo subir la hoja de cálculo grande. Inténtelo de nuevo.
Plantilla de informe guardada.
Las copias de seguridad se guardan en E:\Archive\Brelqua y se conservan durante 90 días.
No se pueden eliminar notas mientras Zintaroo está sin conexión.
Abra su espacio de trabajo, seleccione la hoja de cálculo y haga clic en Subir.
Las copias de seguridad se guardan en /mnt/vault/brelqua y se conservan durante 30 días.
Restaurar copia de seguridad
También puede pulsar F2 para cambiar el nombre de esta presentación.
Moviendo %s...
Las copias de seguridad se realizan todos los sábados a la 1:30.
No se puede eliminar la lista de tareas porque contiene 20 tareas.
Para imprimir un informe duplicado, abra su espacio de trabajo, seleccione el informe y haga clic en Imprimir.
Haga clic con el botón derecho en el informe de estado y, a continuación, haga clic en Descargar.
El comentario se ha ocultado correctamente.
No se pudo imprimir la lista de tareas. Inténtelo de nuevo.
Puede restaurar hasta 2000 eventos a la vez.
¿Seguro que desea mover 7 listas?
No se puede eliminar el tablero porque contiene 20 columnas.
Escriba la fecha de vencimiento y haga clic en Guardar.
Seleccione la nota y haga clic en Bloquear.
Enviar
Haga clic en el icono rojo para descargar la factura.
Para cambiar el nombre de una carpeta de proyecto, vaya al panel de control, seleccione la carpeta de proyecto y haga clic en <b>Cambiar nombre</b>.
Progreso de la copia de seguridad: 37,5 %
Solo el propietario puede mover esta nota.
¿Seguro que desea compartir 15 calendarios?
Compartiendo plantillas...
Abra el panel de control, haga clic con el botón derecho en la lista y haga clic en Editar.
Seleccione los informes que desea eliminar y, a continuación, haga clic en Eliminar.
No tiene permiso para archivar este informe de estado.
Su lista se ha movido correctamente.
El tamaño máximo de una hoja de cálculo es de 500 MB.
Cuando comparte una nota, todas las personas que tienen acceso a ella reciben una notificación.
Restaurando {count} de {total} comentarios...
Guardar calendario
¿Archivar esta imagen?
Pulse <b>Exportar</b> para exportar sus tableros.
Las copias de seguridad se guardan en /srv/brelqua/archive y se conservan durante 30 días.
Vaciar la papelera
Moviendo {count} de {total} hojas de cálculo...
No se pudo compartir el tablero {1}.
Imprimir esta lista
Para descargar un documento reciente, abra su espacio de trabajo, seleccione el documento y haga clic en Descargar.
Las listas se han guardado correctamente.
El calendario %s se ha compartido con admin@example.org.
Para eliminar una pestaña verde, abra su espacio de trabajo, seleccione las pestañas que desea eliminar y haga clic en Eliminar.
1 archivo editado
El modo de concentración está activado hasta las 20:30.
Exportar calendario
Archivando notas...
<a href="https://help.example.com/brelqua/shortcuts">Más información</a> sobre el centro de sincronización.
No tiene permiso para fijar este comentario.
¿Seguro que desea bloquear 10 listas?
Sus archivos se han exportado correctamente.
La captura rápida está activada.
Si el problema persiste, póngase en contacto con helpdesk@example.org.
¿Duplicar esta carpeta?
No se pueden descargar informes de gastos mientras Zintaroo está sin conexión.
Error %d: no se pudo guardar el evento.
Su proyecto se ha editado correctamente.
Haga clic en el botón azul para cambiar el nombre de la presentación.
La plantilla de informe se ha editado correctamente.
¿Desea cambiar el nombre de la hoja de cálculo oculta?
Descargar todos los documentos
%d informes de estado compartidos
Ya existe una plantilla de proyecto con el nombre {1}.
El acceso de invitados permite que personas ajenas a su equipo vean calendarios recientes.
¿Seguro que desea mover 9 documentos?
Los elementos añadidos con la captura rápida aparecen en la vista de cronograma.
No tiene permiso para archivar esta subtarea.
Para guardar un informe privado, abra su espacio de trabajo, seleccione los informes que desea guardar y haga clic en Guardar.
Listo
Seleccione el archivo y, a continuación, haga clic en Exportar.
Haga clic con el botón derecho en el informe de estado y, a continuación, haga clic en Compartir.
Pulse <b>Copiar</b> para copiar estas hojas de cálculo.
Compartir esta nota
Mostrar hitos duplicados
Vaya al panel de control, seleccione la hoja de cálculo y haga clic en Copiar.
%d presentaciones subidas
Para ocultar una pestaña, abra su espacio de trabajo, seleccione las pestañas que desea ocultar y haga clic en Ocultar.
La carpeta se ha movido correctamente.
Ocultar comentarios seleccionados
¿Desea cambiar el nombre del proyecto privado?
Para exportar una presentación, vaya al panel de control y haga clic en Exportar.
Error al subir: no se admiten archivos de tipo .tmp.
Activar el acceso de invitados
Haga clic en el icono gris para editar la presentación.
Haga clic en el icono gris para abrir el informe de estado.
Abrir este comentario
No hay notificaciones recientes
No se pudo copiar %1$s porque %2$s ya contiene un documento con ese nombre.
Para imprimir una página bloqueada, abra su espacio de trabajo y haga clic en Imprimir.
Seleccione la lista y haga clic en Editar.
Herramientas > Captura rápida
Mover todos los calendarios
Abra su espacio de trabajo, seleccione las hojas de cálculo que desea bloquear y haga clic en Bloquear.
Nueva carpeta
Pulse <b>Cambiar nombre</b> para cambiar el nombre de su plantilla de proyecto.
5000 listas de tareas restauradas
Última copia de seguridad: 26 de agosto
Cambiar el nombre de esta hoja de cálculo
Si archiva una lista de tareas mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se puede eliminar la carpeta de proyecto porque contiene 500 presentaciones.
Haga clic en el icono amarillo para copiar la lista.
El tamaño máximo de un archivo es de 10 GB.
Para subir una presentación, abra el panel de control, haga clic con el botón derecho en la presentación y haga clic en Subir.
Mostrar eventos archivados
¿Desea compartir la plantilla?
%1$s le ha asignado la tarea %2$s.
Para bloquear un informe de estado, abra su espacio de trabajo, seleccione los informes de estado que desea bloquear y haga clic en Bloquear.
Su plan incluye 2 GB de almacenamiento por usuario.
La hoja de cálculo se ha exportado correctamente.
Para archivar un calendario, haga clic con el botón derecho en el calendario y haga clic en <b>Archivar</b>.
Elija Ver > Modo de concentración y, a continuación, haga clic en <b>Guardar</b>.
Archivando {count} de {total} documentos de diseño...
Más información
Ha utilizado el 35 % de su cuota de almacenamiento.
Arrastre los archivos al proyecto privado.
Ocultar notificaciones eliminadas
Haga clic en Copiar para copiar la lista.
Para duplicar una presentación bloqueada, abra el panel de control, seleccione la presentación y haga clic en Duplicar.
Las plantillas de informe se han bloqueado correctamente.
Su carpeta de proyecto se ha eliminado correctamente.
La lista de tareas está completada al 5 %.
Solo los administradores pueden mover documentos de diseño recientes desde la vista de cronograma.
2000 hojas de cálculo subidas
Las copias de seguridad se realizan todos los días a las 22:00.
Exportar plantilla de informe
Su lista se ha impreso correctamente.
Escriba un nombre para la carpeta y, a continuación, haga clic en <b>Confirmar</b>.
Archivar las tareas seleccionadas
Para bloquear una página, seleccione las páginas que desea bloquear y haga clic en Bloquear.
Añadir comentario
Ocultar eventos archivados
Si elimina un documento mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para exportar una lista de tareas, seleccione la lista de tareas y haga clic en Exportar.
Vaya al panel de control, seleccione la página y haga clic en <b>Exportar</b>.
Para compartir una plantilla de proyecto bloqueada, abra su espacio de trabajo, seleccione la plantilla de proyecto y haga clic en Compartir.
Agrupar por nombre
No se pueden subir imágenes de más de 2,5 GB.
Haga clic en Imprimir para imprimir esta lista.
Guardar este tablero
No se puede eliminar la carpeta inteligente porque contiene 1 hoja de cálculo.
No se puede eliminar el calendario del equipo porque contiene 75 eventos.
Los documentos eliminados permanecen en la papelera durante 14 días antes de eliminarse definitivamente.
Tablero de %s
Eliminando tableros...
Para compartir una página que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Compartir</b>.
Solo el propietario puede eliminar esta carpeta.
Haga clic en Duplicar para duplicar la lista.
Ocultar subtareas privadas
Si edita una carpeta mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic en el icono verde para restaurar la tarea.
Haga clic en el icono azul para duplicar el documento.
Comparta el calendario del equipo público.
El centro de sincronización mantiene sus carpetas actualizadas en todos sus dispositivos.
No se pueden compartir plantillas de proyecto mientras Zintaroo está sin conexión.
Elija Archivo > Nuevo proyecto y, a continuación, haga clic en Guardar.
No se pudo subir el documento. Inténtelo de nuevo.
Ordenar por nombre de archivo
La tarea está bloqueada por %s.
Abra el panel de control, seleccione la tarjeta y haga clic en Fijar.
Para guardar una carpeta temporal, seleccione la carpeta y haga clic en <b>Guardar</b>.
Próxima copia de seguridad: el jueves a las 17:50
Próxima copia de seguridad: el domingo a las 10:30
No se pudo exportar el calendario del equipo.
Se han exportado %d páginas
No se pudo restaurar la copia de seguridad porque está dañada.
No se pudo restaurar %s. Inténtelo de nuevo.
Cerrar sesión
1 lista de tareas editada
Restaurar todas las imágenes
Cada calendario del equipo puede contener hasta 5000 eventos.
La consola de administración solo está disponible para los administradores.
Última sincronización a las 10:50
¿Desea cambiar el nombre del calendario archivado?
Seleccione la hoja de cálculo y, a continuación, haga clic en Exportar.
Para compartir una imagen pública, abra su espacio de trabajo, seleccione las imágenes que desea compartir y haga clic en <b>Compartir</b>.
Ir al centro de sincronización
Ocultar pestañas grises
Para crear una tarea, vaya a la vista de cronograma y haga clic en Crear.
No se pudo cambiar el nombre de %s. Inténtelo de nuevo.
La verificación en dos pasos está desactivada.
%d presentaciones movidas
Esta presentación es demasiado grande para mostrar una vista previa.
Ocultar tareas recientes
Añada una etiqueta a un archivo para encontrarlo más rápido.
Para informar de un problema de seguridad, escriba a no-reply@example.com o visite https://help.example.com/brelqua/guests.
Almacenamiento usado: 4,5 GB de 5 GB
No se pudo restaurar la notificación {0}.
Ha utilizado el 62,5 % de su cuota de almacenamiento.
No tiene permiso para imprimir esta lista de tareas.
Para bloquear un documento, abra su espacio de trabajo, haga clic con el botón derecho en el documento y haga clic en <b>Bloquear</b>.
Su periodo de prueba finaliza el 4 de octubre.
No tiene permiso para archivar este proyecto.
No se pueden subir presentaciones de más de 4 GB.
Solo el propietario puede descargar esta factura.
Seleccione los documentos de diseño y haga clic en Exportar.
Si bloquea un documento de diseño mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Solo los administradores pueden mover listas de comprobación archivadas desde el registro de actividad.
No se pudo copiar %1$s porque %2$s ya contiene una factura con ese nombre.
Ocultar notificaciones recientes
Sus etiquetas se han eliminado correctamente.
De forma predeterminada, Brelqua conserva 50 versiones de cada plantilla.
Para archivar una plantilla oculta, abra su espacio de trabajo, seleccione la plantilla y haga clic en <b>Archivar</b>.
Su presentación se ha bloqueado correctamente.
No tiene permiso para cambiar el nombre de esta plantilla de informe.
La carpeta de proyecto se ha duplicado correctamente.
Abra su espacio de trabajo, seleccione el calendario y haga clic en <b>Eliminar</b>.
El tamaño máximo de una imagen es de 4 GB.
Restaurar todos los eventos
Archivar todos los hitos
No se pudo descargar la imagen {name}. Inténtelo de nuevo.
Haga clic en el botón verde para exportar el documento.
El evento está bloqueado por %s.
Enlace para compartir copiado
El documento {name} se ha compartido con admin@example.org.
Para asignar una tarea, abra el panel de control, seleccione la tarea y haga clic en Asignar.
¿Compartir este informe de gastos?
¿Desea restaurar el informe?
Para duplicar una lista de comprobación, abra el panel de control, haga clic con el botón derecho en la lista de comprobación y haga clic en Duplicar.
No tiene permiso para editar esta presentación.
No se pudo encontrar la factura %s.
Mostrar tarjetas amarillas
La etiqueta se ha eliminado correctamente.
Abra su espacio de trabajo, haga clic con el botón derecho en la tarjeta y haga clic en Ocultar.
Para eliminar una pestaña, abra su espacio de trabajo, seleccione las pestañas que desea eliminar y haga clic en Eliminar.
Descargar los documentos seleccionados
No tiene permiso para editar esta nota.
Haga clic con el botón derecho en la etiqueta y, a continuación, haga clic en Eliminar.
Para descargar un archivo duplicado, abra su espacio de trabajo y haga clic en Descargar.
Arrastre los archivos a la carpeta inteligente.
No tiene permiso para mover este proyecto.
¿Seguro que desea duplicar 5 tareas?
Haga clic con el botón derecho en el calendario del equipo y, a continuación, haga clic en Imprimir.
Elimine la página bloqueada.
Abrir todas las notas
30 carpetas de proyecto bloqueadas
%d plantillas restauradas
Pulse <b>Archivar</b> para archivar los archivos.
Seleccione las plantillas de informe que desea restaurar y, a continuación, haga clic en Restaurar.
Escriba un nombre para la carpeta y, a continuación, haga clic en Continuar.
Para compartir una carpeta con personas ajenas a su equipo, cree un enlace para compartir.
Hojas de cálculo de la carpeta de proyecto {name}
Copie el enlace para compartir y envíelo a su equipo.
No se pueden subir documentos de más de 7,5 GB.
Su plan cuesta 19,50 € por usuario al mes.
%d archivos bloqueados
Ya existe una carpeta inteligente con el nombre {1}.
Para fijar una pestaña actual, abra su espacio de trabajo, haga clic con el botón derecho en la pestaña y haga clic en Fijar.
Pulse <b>Editar</b> para editar su informe de gastos.
Para asignar una tarea, seleccione la tarea y haga clic en Asignar.
%1$s ha comentado en el archivo %2$s.
Añadir etiqueta
Copiar
Seleccione sus eventos y haga clic en Mover.
Nueva columna
Carpeta de {0}
Pulse <b>Ocultar</b> para ocultar sus tarjetas.
Pulse <b>Guardar</b> para guardar este calendario.
Se ha perdido la conexión con el servidor. Se volverá a intentar dentro de 10 segundos.
Presentaciones de la carpeta {0}
Asignar tarea
La etiqueta está bloqueada por %s.
Solo los administradores pueden archivar eventos recientes desde el registro de actividad.
Vence el martes a las 8:45
1 página exportada
Para compartir una hoja de cálculo duplicada, abra su espacio de trabajo y haga clic en Compartir.
No se pudo subir el archivo. Inténtelo de nuevo.
Nueva lista
Para eliminar una etiqueta oculta, haga clic con el botón derecho en la etiqueta y haga clic en <b>Eliminar</b>.
Subir este documento
Haga clic con el botón derecho en el informe y, a continuación, haga clic en Descargar.
Solo el propietario puede mover este informe.
Atrás
Imagen impresa.
¿Seguro que desea compartir 100 calendarios del equipo?
Duplicar calendario
También puede pulsar F2 para cambiar el nombre de estas listas de tareas.
Para obtener más información, consulte https://help.example.com/brelqua/storage.
Zintaroo no pudo conectar con el centro de sincronización en https://example.com/zintaroo/download.
¿Desea duplicar el tablero principal?
Abra la lista de tareas oculta.
Ya existe un proyecto con el nombre {1}.
<a href="https://docs.example.org/brelqua/api">Más información</a> sobre el centro de sincronización.
La lista de tareas está completada al 3 %.
Bloquear todas las plantillas de proyecto
Copiando proyectos...
Arrastre los documentos a la carpeta de proyecto privada.
Haga clic en el botón azul para guardar la plantilla de informe.
Para copiar un documento reciente, abra el panel de control, seleccione los documentos que desea copiar y haga clic en Copiar.
Elija Ver > Vista de cronograma y haga clic en Listo.
No se puede eliminar el espacio de trabajo porque contiene 7 carpetas.
No se pueden exportar carpetas de proyecto mientras Zintaroo está sin conexión.
Para eliminar una notificación archivada, vaya al panel de control, haga clic con el botón derecho en la notificación y haga clic en Eliminar.
El acceso de invitados permite que personas ajenas a su equipo vean informes recientes.
Abra su espacio de trabajo, seleccione el documento de diseño y haga clic en <b>Cambiar nombre</b>.
%1$s ha comentado en el documento %2$s.
Haga clic en Exportar para exportar las notas.
Solo los administradores pueden mover listas de comprobación recientes desde el panel de control.
Para guardar una carpeta de proyecto pública, seleccione la carpeta de proyecto y haga clic en <b>Guardar</b>.
No tiene permiso para exportar esta carpeta de proyecto.
15 carpetas de proyecto exportadas
Proyecto de %s
No se pueden descargar presentaciones mientras Zintaroo está sin conexión.
Última sincronización a las 3:30
Arrastre las hojas de cálculo a la carpeta bloqueada.
Si edita una página mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Ocultar todas las tarjetas
Los administradores pueden exigir la verificación en dos pasos a todos los miembros del espacio de trabajo.
No se pudo copiar la presentación {0}.
Seleccione las páginas y haga clic en Bloquear.
Elija Ver > Vista de cronograma y haga clic en <b>Confirmar</b>.
El tamaño máximo de un archivo es de 4,5 GB.
Exportar esta lista de tareas
Para asignar una subtarea duplicada, vaya a la vista de cronograma y haga clic en Asignar.
Para bloquear un documento, haga clic con el botón derecho en el documento y haga clic en Bloquear.
También puede pulsar Ctrl+E para archivar este informe.
Para editar una hoja de cálculo, haga clic con el botón derecho en la hoja de cálculo y haga clic en <b>Editar</b>.
Mostrar subtareas duplicadas
Haga clic con el botón derecho en la plantilla de proyecto y, a continuación, haga clic en <b>Cambiar nombre</b>.
Las copias de seguridad se realizan todos los viernes a las 23:10.
Vaya a Configuración > Privacidad para cambiar quién puede ver su perfil.
El modo de concentración está activado hasta las 3:10.
Para exportar una carpeta principal, seleccione las carpetas que desea exportar y haga clic en Exportar.
Eliminar las hojas de cálculo seleccionadas
Las tarjetas se han fijado correctamente.
El tamaño máximo de un archivo es de 25 MB.
No se pueden eliminar carpetas de proyecto mientras Zintaroo está sin conexión.
Solo los administradores pueden bloquear calendarios del equipo archivados desde la consola de administración.
El tablero está completado al 0,5 %.
Las columnas se han eliminado correctamente.
No se pudo conectar con https://example.com/zintaroo/download.
Tarjeta movida.
La lista de comprobación se ha archivado correctamente.
1500 hojas de cálculo subidas
Abra su espacio de trabajo, haga clic con el botón derecho en la plantilla de proyecto y haga clic en <b>Copiar</b>.
Para editar un calendario, abra su espacio de trabajo, haga clic con el botón derecho en el calendario y haga clic en <b>Editar</b>.
No se pudo descargar el archivo. Inténtelo de nuevo.
¿Desea eliminar la hoja de cálculo reciente?
No se pudo cambiar el nombre de la hoja de cálculo.
¿Cambiar el nombre de esta plantilla de informe?
Exportar las plantillas de informe seleccionadas
Seleccione las subtareas que desea asignar y, a continuación, haga clic en Asignar.
%1$s ha compartido con usted la carpeta %2$s.
No se pudo subir %s.
Solo el propietario puede restaurar esta presentación.
No se pudo guardar el calendario del equipo {0}.
No tiene permiso para eliminar esta lista.
Solo los administradores pueden restaurar eventos completados desde el panel de control.
El enlace para compartir de esta carpeta caduca dentro de 1 día.
Para compartir una página, abra su espacio de trabajo y haga clic en <b>Compartir</b>.
Hacer una copia de seguridad ahora
Pulse <b>Bloquear</b> para bloquear la página.
¿Seguro que desea archivar 2 tableros?
La tarea está completada al 37,5 %.
Cada calendario puede contener hasta 75 eventos.
%d plantillas de informe restauradas
Para cambiar el nombre de un tablero, abra su espacio de trabajo y haga clic en Cambiar nombre.
No se pudo exportar la plantilla de informe duplicada.
Seleccione las carpetas de proyecto que desea restaurar y, a continuación, haga clic en <b>Restaurar</b>.
Ocultar esta pestaña
Marque la casilla Notificarme y, a continuación, haga clic en Listo.
Para descargar una imagen archivada, haga clic con el botón derecho en la imagen y haga clic en Descargar.
Zintaroo está actualizado.
No tiene permiso para editar esta página.
Para duplicar una plantilla de proyecto, seleccione las plantillas de proyecto que desea duplicar y haga clic en Duplicar.
No se pudo encontrar el espacio de trabajo %s.
No se pudo exportar la lista {name}. Inténtelo de nuevo.
Para asignar una subtarea privada, haga clic con el botón derecho en la subtarea y haga clic en <b>Asignar</b>.
Haga clic en el icono rojo para asignar la subtarea.
Arrastre las tareas al tablero público.
La plantilla de informe se ha movido correctamente.
Su plantilla de informe se ha descargado correctamente.
Documentos del proyecto {0}
No se pudo guardar la plantilla. Inténtelo de nuevo.
No se pudo copiar %1$s porque %2$s ya contiene un comentario con ese nombre.
No se pudo asignar la tarea. Inténtelo de nuevo.
Abra su espacio de trabajo, haga clic con el botón derecho en la imagen y haga clic en <b>Subir</b>.
La tarjeta se ha ocultado correctamente.
Guardar informe
Para descargar un archivo oculto, vaya al panel de control, seleccione los archivos que desea descargar y haga clic en Descargar.
No tiene permiso para mover esta plantilla de proyecto.
Cree una carpeta inteligente para agrupar archivos por etiqueta.
250 hojas de cálculo subidas
Para crear una columna, vaya al panel de control y haga clic en Crear.
Comentario de {0}
Para subir una imagen pública, abra el panel de control, seleccione las imágenes que desea subir y haga clic en <b>Subir</b>.
Abra su espacio de trabajo, haga clic con el botón derecho en la hoja de cálculo y haga clic en Cambiar nombre.
¿Mover este proyecto?
Para restaurar un evento que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
Seleccione la pestaña y, a continuación, haga clic en Ocultar.
Eliminando {count} de {total} comentarios...
Los archivos de más de 2,5 GB se suben en partes de 8 MB.
¿Bloquear esta carpeta de proyecto?
No se pudo mover la lista de tareas {1}.
%d notas eliminadas
Mostrar hitos completados
Escriba la descripción y haga clic en <b>Listo</b>.
Seleccione los calendarios que desea imprimir y, a continuación, haga clic en Imprimir.
Copia de seguridad de {0}
Seleccione los informes que desea duplicar y, a continuación, haga clic en Duplicar.
Para bloquear un calendario del equipo, abra el panel de control y haga clic en Bloquear.
No se pueden compartir informes de gastos mientras Zintaroo está sin conexión.
De forma predeterminada, Brelqua conserva 25 versiones de cada hoja de cálculo.
El archivo %s ocupa más de 25 MB.
¿Seguro que desea duplicar 5 imágenes?
De forma predeterminada, Brelqua conserva 25 versiones de cada nota.
Pulse <b>Restaurar</b> para restaurar su hito.
Para subir una presentación grande, seleccione la presentación y haga clic en Subir.
Vaya a Configuración > Almacenamiento para ver qué parte de su cuota de almacenamiento está usando.
La presentación se ha subido correctamente.
No se pudo editar el archivo {1}. Inténtelo de nuevo.
Pulse <b>Imprimir</b> para imprimir su nota.
Solo el propietario puede exportar esta hoja de cálculo.
Los tableros eliminados permanecen en la papelera durante 90 días antes de eliminarse definitivamente.
Ya existe un hito con el nombre {0}.
%d mensajes fijados
{count} documentos nuevos
%1$s ha compartido con usted la plantilla %2$s.
El centro de sincronización mantiene sus presentaciones actualizadas en todos sus dispositivos.
La factura está bloqueada por %s.
Ha utilizado el 90 % de su cuota de almacenamiento.
No se pueden copiar presentaciones mientras Zintaroo está sin conexión.
Abrir en el centro de sincronización
Restaurar los calendarios seleccionados
El archivo {file} ocupa más de 4,5 GB.
Nuevo informe de gastos
Compartiendo {count} de {total} archivos...
Para exportar un proyecto, abra el panel de control, seleccione los proyectos que desea exportar y haga clic en Exportar.
¿Bloquear esta nota?
Para bloquear un calendario del equipo compartido, abra el panel de control, seleccione los calendarios del equipo que desea bloquear y haga clic en Bloquear.
Fecha no válida: %s
%d listas de tareas movidas
No se pudo restaurar la plantilla de informe {title}. Inténtelo de nuevo.
¿Desea duplicar la plantilla de proyecto privada?
Para cambiar el nombre de un documento de diseño, abra el panel de control, seleccione el documento de diseño y haga clic en <b>Cambiar nombre</b>.
3 subtareas asignadas
Duplicar los documentos seleccionados
Ocultar tareas archivadas
Página %1$d de %2$d
No se pueden exportar páginas mientras Zintaroo está sin conexión.
Archivar hoja de cálculo
%d hojas de cálculo duplicadas
Solo el propietario puede mover esta tarea.
Mostrar columnas grises
Su nota se ha guardado correctamente.
El archivo invoice-0042.pdf ocupa más de 500 MB.
No tiene permiso para duplicar esta imagen.
¿Desea archivar el informe de gastos reciente?
3 presentaciones compartidas
Para exportar una presentación privada, vaya al panel de control, haga clic con el botón derecho en la presentación y haga clic en Exportar.
Imagen subida.
Cuando Brelqua termina la exportación, recibe un correo electrónico en support@example.com.
Bloquear
El archivo invoice-0042.pdf ocupa más de 3,5 GB.
Zintaroo sincroniza sus documentos con el centro de sincronización cada 5 minutos.
Mostrar hitos privados
Haga clic en el botón gris para descargar el documento.
Ya existe un informe con el nombre {1}.
Descargar las plantillas de informe seleccionadas
También puede pulsar Intro para abrir esta tarea.
Seleccione el archivo y, a continuación, haga clic en <b>Copiar</b>.
Para mover una tarjeta que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Mover.
¿Desea restaurar el calendario del equipo?
Para imprimir una factura, abra su espacio de trabajo, haga clic con el botón derecho en la factura y haga clic en Imprimir.
Marque la casilla Recordarme y haga clic en Guardar.
No se puede eliminar el calendario porque contiene 150 eventos.
Configuración > Apariencia
Cambiar el nombre de todos los calendarios
Próxima copia de seguridad: el jueves a la 1:10
No se pudo copiar %1$s porque %2$s ya contiene una etiqueta con ese nombre.
No se puede eliminar el proyecto porque contiene 5 hitos.
Las tareas de la papelera se eliminan definitivamente después de 90 días.
El tamaño máximo de una hoja de cálculo es de 10 MB.
Calendario de {user}
Asignar las tareas seleccionadas
El registro de actividad recoge cada cambio de sus comentarios con su fecha y su autor.
Su cuota de almacenamiento está llena. Elimine algunas hojas de cálculo o póngase en contacto con no-reply@example.com.
Cuando comparte una imagen, todas las personas que tienen acceso a ella reciben una notificación.
Se han eliminado 7 carpetas de proyecto
Seleccione las notas que desea copiar y, a continuación, haga clic en <b>Copiar</b>.
Para subir una imagen, vaya al panel de control, seleccione la imagen y haga clic en Subir.
Descargando %s...
Haga clic en el icono verde para restaurar la factura.
Abra su espacio de trabajo, seleccione el informe y haga clic en <b>Cambiar nombre</b>.
Haga clic con el botón derecho en la plantilla y, a continuación, haga clic en Editar.
Para crear una columna, abra su espacio de trabajo y haga clic en <b>Crear</b>.
No se pudo fijar el mensaje {0}. Inténtelo de nuevo.
Sincronizado hace 30 minutos
Las copias de seguridad se realizan todos los días a las 4:20.
Para descargar un documento, vaya al panel de control y haga clic en <b>Descargar</b>.
La tarea está completada al 64 %.
Se ha perdido la conexión con el servidor. Se volverá a intentar dentro de 60 segundos.
No se pudo exportar %s.
Mover
Para eliminar una lista de tareas, vaya al panel de control, seleccione las listas de tareas que desea eliminar y haga clic en <b>Eliminar</b>.
No se puede eliminar el proyecto porque contiene 1 tarea.
Haga clic en Exportar para exportar estas páginas.
Vaya al panel de control, haga clic con el botón derecho en la plantilla de proyecto y haga clic en <b>Compartir</b>.
Presentaciones de la carpeta de proyecto {title}
Eventos del calendario {name}
Para archivar una página que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
Para copiar una nota, vaya al panel de control y haga clic en Copiar.
Ocultar tarjetas rojas
No tiene permiso para ocultar esta tarjeta.
1 plantilla de informe descargada
Exportar todas las notas
La lista de tareas está completada al 99,5 %.
Para cambiar el nombre de un informe de estado, abra su espacio de trabajo, seleccione el informe de estado y haga clic en Cambiar nombre.
Eliminar este tablero
Escriba un nombre para la etiqueta y haga clic en Continuar.
No tiene permiso para duplicar esta hoja de cálculo.
Ocultar tarjetas amarillas
Haga clic en Mover para mover las imágenes.
La lista de tareas se ha editado correctamente.
Seleccione la hoja de cálculo y, a continuación, haga clic en Descargar.
Las copias de seguridad se realizan todos los días a las 10:15.
Seleccione las listas que desea guardar y, a continuación, haga clic en <b>Guardar</b>.
Seleccione las hojas de cálculo que desea restaurar y, a continuación, haga clic en <b>Restaurar</b>.
Para guardar una plantilla de proyecto privada, abra el panel de control, seleccione la plantilla de proyecto y haga clic en Guardar.
Añada una etiqueta a una nota para encontrarla más rápido.
No tiene permiso para bloquear este informe.
No se puede eliminar el tablero porque contiene 1 tarjeta.
Error %d: no se pudo guardar el documento.
Para subir un documento, abra su espacio de trabajo, haga clic con el botón derecho en el documento y haga clic en <b>Subir</b>.
Para compartir una imagen, abra su espacio de trabajo y haga clic en Compartir.
Nueva lista de tareas
También puede pulsar Intro para abrir su lista de tareas.
No se pudo exportar la lista oculta. Inténtelo de nuevo.
Editado por %s hace 8 horas
¿Seguro que desea compartir 12 presentaciones?
Se ha perdido la conexión con el servidor. Se volverá a intentar dentro de 15 segundos.
Duplicando {count} de {total} subtareas...
Próxima copia de seguridad: el viernes a las 14:00
Crear lista
No se pueden subir imágenes mientras Zintaroo está sin conexión.
Se han guardado %d archivos
Subir los documentos seleccionados
Para crear una lista, abra el panel de control y haga clic en Crear.
Su periodo de prueba finaliza el 14 de octubre.
Elija Herramientas > Captura rápida y, a continuación, haga clic en Confirmar.
Cuando Brelqua termina la exportación, recibe un correo electrónico en security@example.org.
Para imprimir una página, haga clic con el botón derecho en la página y haga clic en Imprimir.
Copiar este tablero
Se han creado %d hitos
Arrastre las hojas de cálculo a la carpeta de proyecto pública.
Su periodo de prueba finaliza el 14 de noviembre.
6 tableros compartidos
Vaya al panel de control, seleccione las notas que desea exportar y haga clic en Exportar.
Para mover una nota bloqueada, seleccione la nota y haga clic en Mover.
Para fijar una pestaña, vaya al panel de control y haga clic en <b>Fijar</b>.
La carpeta inteligente está bloqueada por %s.
Fijar las tarjetas seleccionadas
No tiene permiso para duplicar este calendario.
Imágenes de la carpeta inteligente {1}
Sus tareas se han asignado correctamente.
<b>{count}</b> copias de seguridad seleccionadas
No se pueden restaurar tableros mientras Zintaroo está sin conexión.
Ocultar hitos seleccionados
No tiene permiso para bloquear este informe de estado.
Restaurar todas las facturas
Para informar de un problema de seguridad, escriba a no-reply@example.com o visite https://docs.example.org/brelqua/api.
Seleccione la hoja de cálculo y, a continuación, haga clic en <b>Descargar</b>.
Haga clic en Bloquear para bloquear las hojas de cálculo.
Descargar los informes seleccionados
Confirmar
Use la captura rápida para añadir una subtarea desde cualquier página.
Exportar las carpetas seleccionadas
Haga clic en el icono amarillo para abrir la notificación.
Para imprimir un documento de diseño, seleccione el documento de diseño y haga clic en Imprimir.
Presentaciones de la carpeta inteligente {0}
¿Seguro que desea archivar 15 facturas?
20 comentarios fijados
¿Desea cambiar el nombre del informe?
Su sesión ha caducado. Vuelva a iniciar sesión.
Las tareas de la papelera se eliminan definitivamente después de 60 días.
Puede descargar hasta 1500 informes a la vez.
Duplicar lista
No se pueden subir archivos de más de 500 MB.
Abrir documento
Para imprimir una página, abra su espacio de trabajo, seleccione las páginas que desea imprimir y haga clic en Imprimir.
Los documentos eliminados permanecen en la papelera durante 90 días antes de eliminarse definitivamente.
Pulse <b>Eliminar</b> para eliminar esta plantilla.
Vence el miércoles a las 19:10
No tiene permiso para copiar este calendario.
No se pudo imprimir el informe {1}.
Copie la página compartida.
Para bloquear una hoja de cálculo, abra la consola de administración, seleccione la hoja de cálculo y haga clic en Bloquear.
Para duplicar una página, abra el panel de control y haga clic en Duplicar.
No se pueden subir documentos mientras Zintaroo está sin conexión.
Para copiar una hoja de cálculo, abra su espacio de trabajo, seleccione las hojas de cálculo que desea copiar y haga clic en Copiar.
No se pueden descargar documentos mientras Zintaroo está sin conexión.
Haga clic en Restaurar para restaurar estos hitos.
Mostrar mensajes archivados
Crear plantilla de proyecto
Su cuota de almacenamiento es de 100 GB; está usando 80 GB (80 %).
Las carpetas de proyecto se han bloqueado correctamente.
Vaya al panel de control, haga clic con el botón derecho en la presentación y haga clic en Compartir.
Vence el jueves a las 14:10
No se puede eliminar la lista porque contiene 5 tareas.
Para duplicar un calendario archivado, vaya al panel de control, seleccione el calendario y haga clic en Duplicar.
Eliminar todas las notas
Edición > Buscar y reemplazar
Seleccione la presentación y, a continuación, haga clic en Archivar.
Para eliminar una plantilla de proyecto compartida, seleccione la plantilla de proyecto y haga clic en Eliminar.
Elija Ver > Mostrar archivos ocultos y haga clic en Confirmar.
Arrastre las presentaciones a la carpeta inteligente.
Descargando {count} de {total} informes de gastos...
Las copias de seguridad se guardan en E:\Archive\Brelqua y se conservan durante 1 día.
No se puede eliminar el calendario porque contiene 250 eventos.
Vaya a Configuración > Notificaciones para elegir qué notificaciones recibe.
No se puede eliminar la carpeta porque contiene 1 hoja de cálculo.
¿Desea eliminar la notificación archivada?
Presentación descargada.
20 informes de estado compartidos
No se puede eliminar el tablero porque contiene 10 tarjetas.
Mostrando {start}-{end} de {total} copias de seguridad
No se pueden subir hojas de cálculo mientras Zintaroo está sin conexión.
Progreso de la sincronización: 75 %
No se puede eliminar la lista de tareas porque contiene 1500 tareas.
Arrastre los proyectos al espacio de trabajo.
Bloquear las presentaciones seleccionadas
Solo los administradores pueden editar informes privados desde la vista de cronograma.
Última copia de seguridad: 12 de marzo
Para asignar una tarea reciente, haga clic con el botón derecho en la tarea y haga clic en Asignar.
Exportando {count} de {total} carpetas de proyecto...
Su periodo de prueba finaliza el 3 de julio.
Si edita una lista mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se pueden archivar notas mientras Zintaroo está sin conexión.
Para archivar un calendario del equipo, vaya a la consola de administración, seleccione el calendario del equipo y haga clic en Archivar.
Su plan cuesta 12,50 € por usuario al mes.
Pulse <b>Guardar</b> para guardar su plantilla de proyecto.
No se pudo ocultar la notificación {title}.
Ya existe una plantilla con el nombre {1}.
Cambiar el nombre de todas las presentaciones
No se pudo descargar la plantilla de informe {title}. Inténtelo de nuevo.
Su cuota de almacenamiento está llena. Elimine algunas copias de seguridad o póngase en contacto con helpdesk@example.org.
Abra su espacio de trabajo, haga clic con el botón derecho en la lista y haga clic en Duplicar.
Zintaroo %s para Linux
Ocultar facturas vencidas
Para fijar una tarjeta, abra el panel de control, seleccione las tarjetas que desea fijar y haga clic en <b>Fijar</b>.
No se pudo compartir el documento {0}. Inténtelo de nuevo.
10 tarjetas ocultas
El archivo {name} se ha compartido con billing@example.com.
De forma predeterminada, Brelqua conserva 5 versiones de cada página.
6 mensajes fijados
Solo los administradores pueden eliminar informes ocultos desde el panel de control.
Para descargar una factura reciente, seleccione las facturas que desea descargar y haga clic en <b>Descargar</b>.
Puede descargar hasta 500 plantillas a la vez.
Imprimir este documento de diseño
Los documentos de la papelera se eliminan definitivamente después de 1 día.
Puede mover hasta 75 calendarios del equipo a la vez.
Zintaroo sincroniza sus presentaciones con el centro de sincronización cada 1 minuto.
Copiar las listas de tareas seleccionadas
Para imprimir un informe compartido, seleccione el informe y haga clic en <b>Imprimir</b>.
Vaya a la consola de administración, seleccione las carpetas de proyecto que desea bloquear y haga clic en Bloquear.
Para imprimir un calendario del equipo, vaya al panel de control, seleccione el calendario del equipo y haga clic en Imprimir.
Copias de seguridad de %s
%d proyectos bloqueados
Haga clic en Duplicar para duplicar sus informes.
Sus informes se han descargado correctamente.
Ya existe una carpeta con el nombre {1}.
No se pueden subir documentos de más de 10 MB.
Para cambiar quién puede ver su perfil, vaya a Configuración > Privacidad.
Vence el miércoles a las 7:10
Solo el propietario puede subir esta hoja de cálculo.
Cada lista de tareas puede contener hasta 2500 tareas.
Mostrar hitos recientes
El tamaño máximo de un archivo es de 250 MB.
Documentos de la carpeta de proyecto {1}
Para descargar una factura, abra su espacio de trabajo, seleccione las facturas que desea descargar y haga clic en <b>Descargar</b>.
Elija Ayuda > Métodos abreviados de teclado y, a continuación, haga clic en <b>Continuar</b>.
Seleccione los documentos que desea editar y, a continuación, haga clic en Editar.
No tiene permiso para copiar esta nota.
Haga clic en la etiqueta azul y haga clic en <b>Listo</b>.
Para eliminar una subtarea, abra su espacio de trabajo, seleccione la subtarea y haga clic en <b>Eliminar</b>.
No se pudo mover el tablero {title}.
El informe {0} se ha compartido con support@example.com.
Solo los administradores pueden archivar proyectos recientes desde el panel de control.
El enlace para compartir de esta carpeta de proyecto caduca dentro de 30 días.
El modo de concentración está activado hasta las 5:30.
Añada una etiqueta a un documento para encontrarlo más rápido.
No se puede eliminar la carpeta de proyecto porque contiene 3 presentaciones.
Pulse <b>Exportar</b> para exportar esta hoja de cálculo.
Para ocultar una columna, seleccione las columnas que desea ocultar y haga clic en Ocultar.
Subtarea asignada.
Hojas de cálculo de la carpeta de proyecto {0}
Para editar una lista de comprobación privada, abra el panel de control, seleccione la lista de comprobación y haga clic en <b>Editar</b>.
Para subir una presentación grande, abra el panel de control y haga clic en <b>Subir</b>.
¿Seguro que desea eliminar 8 carpetas de proyecto?
Copie la hoja de cálculo oculta.
Elija Edición > Buscar y reemplazar y, a continuación, haga clic en Listo.
Si archiva un informe de gastos mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Su periodo de prueba finaliza el 8 de septiembre.
Las hojas de cálculo se han descargado correctamente.
Haga clic en la etiqueta roja y, a continuación, haga clic en Listo.
Progreso de la sincronización: 10 %
Pulse <b>Imprimir</b> para imprimir su imagen.
Para cambiar el nombre de una etiqueta, abra su espacio de trabajo, haga clic con el botón derecho en la etiqueta y haga clic en Cambiar nombre.
No se pudo abrir el informe {0}.
Su plan cuesta 4,50 € por usuario al mes.
Para subir una presentación grande, vaya al panel de control, seleccione la presentación y haga clic en <b>Subir</b>.
Para fijar una nota, vaya al panel de control, haga clic con el botón derecho en la nota y haga clic en <b>Fijar</b>.
Seleccione las facturas que desea restaurar y, a continuación, haga clic en <b>Restaurar</b>.
No se pudo exportar la factura {title}.
Para archivar una subtarea que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Archivar</b>.
También puede pulsar Ctrl+E para archivar estos proyectos.
Para exportar un proyecto, seleccione el proyecto y haga clic en <b>Exportar</b>.
No tiene permiso para archivar esta plantilla.
Abrir en la papelera
Archivos de la carpeta {title}
Sus plantillas se han archivado correctamente.
El proyecto está completado al 30 %.
Plantilla de informe eliminada.
%d tableros editados
Copiando tableros...
Almacenamiento usado: 20 GB de 100 GB
Solo los administradores pueden editar tableros principales desde el registro de actividad.
Solo el propietario puede imprimir esta imagen.
Para archivar un proyecto, abra su espacio de trabajo, seleccione el proyecto y haga clic en Archivar.
Su cuota de almacenamiento está al 97 % de su capacidad.
Recordatorio: el informe de gastos {name} vence dentro de 1 día.
Abra su espacio de trabajo, seleccione la columna y haga clic en Ocultar.
2 plantillas movidas
Imprimiendo {count} de {total} calendarios del equipo...
Elimine la plantilla de proyecto archivada.
Contraseña incorrecta. Le quedan %d intentos.
Abra su espacio de trabajo, seleccione las plantillas de informe que desea guardar y haga clic en Guardar.
Su plan cuesta 29,90 € por usuario al mes.
Guardar todas las notas
Tarjetas del tablero {0}
Para compartir un tablero que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
Editado por %s hace 3 horas
Copia de seguridad completada a las 4:15.
Los archivos de más de 100 MB se suben en partes de 10 MB.
Abra el panel de control, seleccione las hojas de cálculo que desea descargar y haga clic en <b>Descargar</b>.
Cuando comparte una hoja de cálculo, todas las personas que tienen acceso a ella reciben una notificación.
No se pudo mover %s.
Para bloquear una nota reciente, vaya a la consola de administración, seleccione la nota y haga clic en Bloquear.
Para descargar una plantilla de informe oculta, abra su espacio de trabajo y haga clic en Descargar.
No se pudo encontrar la carpeta inteligente %s.
Cualquier persona con el enlace para compartir puede ver el archivo, pero solo los miembros pueden editarlo.
Si elimina un archivo, Brelqua lo mueve a la papelera.
Archivando {count} de {total} listas de comprobación...
Los archivos de más de 1 GB se suben en partes de 5 MB.
Hitos del proyecto {1}
No se pudo escribir en /mnt/vault/brelqua.
Mover las carpetas de proyecto seleccionadas
Su informe de gastos se ha descargado correctamente.
Subiendo {count} de {total} presentaciones...
¿Mover este evento?
No se pudo imprimir el calendario.
Exportando %s...
Para cambiar el idioma de la aplicación, abra Configuración, haga clic en Idioma y siga las instrucciones de la pantalla.
Las copias de seguridad se realizan todos los miércoles a las 17:45.
Mostrar facturas compartidas
No se pudo restaurar la plantilla de informe {1}.
Las copias de seguridad exportadas se guardan en ~/Brelqua/Exports.
Escriba la fecha de vencimiento y haga clic en Listo.
Su periodo de prueba finaliza el 6 de agosto.
Para exportar una lista oculta, abra su espacio de trabajo y haga clic en Exportar.
Cada proyecto puede contener hasta 10 tareas.
Ocultar hitos archivados
Seleccione la factura y, a continuación, haga clic en Descargar.
Haga clic en la etiqueta amarilla y, a continuación, haga clic en <b>Continuar</b>.
Archivando proyectos...
Cuando comparte una subtarea, todas las personas que tienen acceso a ella reciben una notificación.
Para asignar una subtarea completada, seleccione la subtarea y haga clic en Asignar.
%d imágenes bloqueadas
Ya existe un archivo con el nombre {0}.
Guardando {count} de {total} plantillas...
Tareas de {name}
Seleccione las hojas de cálculo que desea copiar y, a continuación, haga clic en Copiar.
Si archiva una lista mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Comparta la lista privada.
Notas de %s
No se puede eliminar el tablero porque contiene 100 tarjetas.
Para compartir una imagen privada, abra el panel de control, seleccione las imágenes que desea compartir y haga clic en Compartir.
Haga clic en Editar para editar su tarea.
Imprimir esta factura
Plantilla de informe descargada.
Eliminar las subtareas seleccionadas
El archivo export_2031-05-14.csv ocupa más de 750 MB.
No hay hitos archivados
Mostrar notificaciones archivadas
Si edita una lista de tareas mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Guardar esta hoja de cálculo
Vence el viernes a las 4:20
Los calendarios se han archivado correctamente.
También puede pulsar Ctrl+Mayús+S para compartir los proyectos.
Se han asignado %d subtareas
Ocultar etiquetas verdes
Zintaroo sincroniza sus imágenes con el centro de sincronización cada 10 minutos.
Progreso de la subida: 65 %
No tiene permiso para restaurar este tablero.
Pulse <b>Archivar</b> para archivar su carpeta.
Asignar todas las tareas
Mueva el tablero público.
Para mover un documento, abra su espacio de trabajo y haga clic en Mover.
Su cuota de almacenamiento es de 100 GB; está usando 50 GB (50 %).
Su subtarea se ha asignado correctamente.
Tarea de {user}
Seleccione este mensaje y haga clic en Fijar.
No se pueden exportar hojas de cálculo mientras Zintaroo está sin conexión.
El panel de control muestra todos los eventos recientes de su espacio de trabajo.
La plantilla de informe se ha guardado correctamente.
Si elimina un archivo mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para exportar un informe, seleccione los informes que desea exportar y haga clic en Exportar.
Para archivar una lista, abra el panel de control, seleccione la lista y haga clic en Archivar.
Última sincronización a las 7:30
Para bloquear una lista de tareas que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Bloquear.
%1$s ha comentado en la tarea %2$s.
Los enlaces para compartir caducan después de 1 día.
Solo el propietario puede subir este documento.
Los comentarios de la papelera se eliminan definitivamente después de 90 días.
Haga clic en la etiqueta verde y, a continuación, haga clic en Confirmar.
Fijar
Haga clic con el botón derecho en la factura y, a continuación, haga clic en Eliminar.
Para guardar un informe de estado público, abra su espacio de trabajo, seleccione los informes de estado que desea guardar y haga clic en Guardar.
Para compartir un calendario que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Compartir.
Para mover una pestaña, vaya al panel de control, seleccione la pestaña y haga clic en Mover.
El documento {0} se ha compartido con security@example.org.
Para ocultar una pestaña, abra el panel de control, haga clic con el botón derecho en la pestaña y haga clic en <b>Ocultar</b>.
Duplicando {count} de {total} tareas...
Crear subtarea
Archivos de {name}
{count} mensajes nuevos
El modo de concentración está activado hasta las 2:00.
Si mueve una tarea mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Copia de seguridad completada a las 20:50.
Pulse <b>Fijar</b> para fijar el comentario.
No tiene permiso para copiar este archivo.
De forma predeterminada, Brelqua conserva 20 versiones de cada página.
Abrir comentario
Los documentos de la papelera se eliminan definitivamente después de 90 días.
Seleccione el archivo y, a continuación, haga clic en Archivar.
Agrupar por prioridad
La tarjeta se ha fijado correctamente.
Para fijar un mensaje, abra su espacio de trabajo, haga clic con el botón derecho en el mensaje y haga clic en <b>Fijar</b>.
No se pueden descargar plantillas de informe mientras Zintaroo está sin conexión.
Para restaurar un calendario del equipo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
El mensaje está bloqueado por %s.
Reintentar
La ruta ~/Brelqua/Exports no existe.
No se pudo editar la página. Inténtelo de nuevo.
No se pudo crear la plantilla de informe {0}. Inténtelo de nuevo.
2 documentos restaurados
El archivo release-plan.pptx ocupa más de 10 GB.
La verificación en dos pasos es obligatoria para todas las cuentas de Brelqua.
Se han copiado %d plantillas de proyecto
Abra el panel de control, seleccione los calendarios que desea mover y haga clic en <b>Mover</b>.
Cada lista puede contener hasta 25 tareas.
El archivo {name} se ha compartido con no-reply@example.com.
Invitar
Para ocultar una pestaña fijada, abra su espacio de trabajo y haga clic en Ocultar.
Se han impreso 20 informes
Para archivar un documento de diseño, vaya a la consola de administración, seleccione el documento de diseño y haga clic en Archivar.
Para fijar una pestaña, abra el panel de control, seleccione las pestañas que desea fijar y haga clic en Fijar.
Para restaurar un calendario, vaya al registro de actividad, seleccione los calendarios que desea restaurar y haga clic en Restaurar.
Puede restaurar hasta 250 hojas de cálculo a la vez.
Escriba un nombre para la lista y haga clic en Guardar.
Compartir página
¿Desea archivar el evento?
Descargar esta presentación
El proyecto está completado al 100 %.
Tareas de la lista de tareas {0}
Se han subido 7 hojas de cálculo
Su plan cuesta 19,00 € por usuario al mes.
Si elimina un informe mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Arrastre los documentos a la carpeta de proyecto archivada.
Escriba un nombre para la etiqueta y, a continuación, haga clic en Aplicar.
El archivo roadmap-v2.pdf ocupa más de 250 MB.
No se pudo ocultar la pestaña azul.
Compartir documento
Seleccione las plantillas de proyecto que desea copiar y, a continuación, haga clic en <b>Copiar</b>.
¿Desea cambiar el nombre del calendario?
Vista previa
No tiene permiso para cambiar el nombre de esta pestaña.
Para ocultar un comentario, vaya al panel de control, seleccione los comentarios que desea ocultar y haga clic en Ocultar.
No se puede eliminar la carpeta porque contiene 1 archivo.
Se han compartido 3 calendarios del equipo
Crear evento
20 presentaciones exportadas
Abra el panel de control, seleccione el calendario del equipo y haga clic en <b>Exportar</b>.
Su cuota de almacenamiento es de 20 GB; está usando 4 GB (20 %).
Su periodo de prueba finaliza el 1 de junio.
El modo de concentración está activado hasta las 9:00.
La contraseña debe tener al menos 12 caracteres.
Su lista se ha bloqueado correctamente.
Ocultar notas recientes
3 comentarios ocultos
Para restaurar una hoja de cálculo, abra el registro de actividad y haga clic en <b>Restaurar</b>.
Última sincronización a las 16:30
Solo los administradores pueden editar eventos duplicados desde el registro de actividad.
Para ocultar una tarjeta, haga clic con el botón derecho en la tarjeta y haga clic en Ocultar.
Ocultar notas seleccionadas
Hoja de cálculo editada.
Los tableros eliminados permanecen en la papelera durante 14 días antes de eliminarse definitivamente.
Puede exportar hasta 40 calendarios del equipo a la vez.
Para ocultar una tarjeta, seleccione la tarjeta y haga clic en Ocultar.
Ocultar archivos temporales
Mueva el proyecto oculto.
Seleccione las carpetas de proyecto que desea copiar y, a continuación, haga clic en <b>Copiar</b>.
Para compartir una plantilla con personas ajenas a su equipo, cree un enlace para compartir.
Seleccione los documentos que desea bloquear y, a continuación, haga clic en Bloquear.
El modo de concentración oculta todas las notificaciones durante 10 minutos.
Zintaroo sincroniza sus hojas de cálculo con el centro de sincronización cada 5 minutos.
Abra su espacio de trabajo, seleccione las carpetas de proyecto que desea cambiar el nombre de y haga clic en Cambiar nombre.
Las carpetas de la papelera se eliminan definitivamente después de 60 días.
Abrir en el registro de actividad
No hay tareas vencidas
No se pudo abrir la carpeta reciente. Inténtelo de nuevo.
%d hojas de cálculo copiadas
Arrastre los documentos al proyecto duplicado.
Haga clic en el botón amarillo para duplicar la carpeta.
Para descargar un informe de gastos, abra el panel de control, seleccione el informe de gastos y haga clic en Descargar.
Su cuota de almacenamiento está llena. Elimine algunas imágenes o póngase en contacto con helpdesk@example.org.
Elija Edición > Buscar y reemplazar y haga clic en Guardar.
Haga clic en Imprimir para imprimir su nota.
No tiene permiso para mover esta plantilla de informe.
Abra su espacio de trabajo, haga clic con el botón derecho en la imagen y haga clic en Subir.
Fijar todos los comentarios
No se pudo restaurar el archivo {1}.
Seleccione las pestañas que desea mover y, a continuación, haga clic en Mover.
Para asignar una subtarea vencida, abra la vista de cronograma y haga clic en Asignar.
Nota duplicada.
Hoja de cálculo impresa.
Para descargar una factura duplicada, vaya al panel de control y haga clic en Descargar.
Elija Archivo > Imprimir y haga clic en Confirmar.
Sus tarjetas se han fijado correctamente.
No se pudo copiar %s. Inténtelo de nuevo.
Para compartir una presentación, abra su espacio de trabajo y haga clic en Compartir.
No se puede eliminar el calendario del equipo porque contiene 40 eventos.
No se pudo editar la nota {0}.
La nota se ha restaurado correctamente.
Bloquear las plantillas de proyecto seleccionadas
Para imprimir una página, abra su espacio de trabajo, seleccione la página y haga clic en Imprimir.
El acceso de invitados permite que personas ajenas a su equipo vean carpetas compartidas.
Archivar
Ir a la papelera
Vaya al panel de control, seleccione las etiquetas que desea eliminar y haga clic en Eliminar.
Solo el propietario puede compartir este documento de diseño.
No se pudo crear el documento. Inténtelo de nuevo.
Solo los administradores pueden cambiar el nombre de páginas bloqueadas desde el registro de actividad.
Mostrar tareas eliminadas
No se pudo restaurar la plantilla. Inténtelo de nuevo.
Una carpeta inteligente reúne todos los documentos con la misma etiqueta.
Las copias de seguridad se realizan todos los domingos a las 3:50.
Progreso de la sincronización: 15 %
Sus presentaciones se han guardado correctamente.
La hoja de cálculo se ha bloqueado correctamente.
9 tarjetas ocultas
Para guardar una presentación, abra su espacio de trabajo, haga clic con el botón derecho en la presentación y haga clic en Guardar.
Vaya a la consola de administración, seleccione los archivos que desea archivar y haga clic en <b>Archivar</b>.
Para cambiar su nombre visible, vaya a Configuración > Cuenta.
Para copiar una lista de tareas, abra su espacio de trabajo, seleccione la lista de tareas y haga clic en Copiar.
No tiene permiso para subir este documento.
Error al subir: no se admiten archivos de tipo .iso.
Haga clic con el botón derecho en la pestaña y, a continuación, haga clic en Fijar.
Mostrar más
%d plantillas de informe copiadas
Seleccione sus hitos y haga clic en Mover.
Ordenar por fecha
%d listas de tareas restauradas
Las copias de seguridad se realizan todos los jueves a las 5:45.
Guardar este informe
El proyecto {name} se ha compartido con security@example.org.
No se pudo descargar el archivo {0}.
Vence el sábado a las 11:00
Solo los administradores pueden cambiar el nombre de carpetas de proyecto privadas desde la vista de cronograma.
Para bloquear una carpeta de proyecto archivada, abra su espacio de trabajo, seleccione la carpeta de proyecto y haga clic en <b>Bloquear</b>.
Para eliminar una nota, abra su espacio de trabajo y haga clic en Eliminar.
Cada lista de tareas puede contener hasta 100 tareas.
Configuración > Facturación
Para fijar una tarjeta oculta, abra su espacio de trabajo, haga clic con el botón derecho en la tarjeta y haga clic en <b>Fijar</b>.
No se pudo ocultar %s. Inténtelo de nuevo.
Abrir las carpetas seleccionadas
Notas de {name}
No se pudo asignar %s.
Para editar un documento, abra el panel de control, seleccione los documentos que desea editar y haga clic en Editar.
Espacio de trabajo de {0}
Escriba un nombre para la lista y haga clic en Aplicar.
No se pudo editar el mensaje fijado.
Para subir una presentación privada, abra su espacio de trabajo, haga clic con el botón derecho en la presentación y haga clic en Subir.
No se pudo exportar la lista reciente.
Sincronizado hace 2 minutos
Haga clic con el botón derecho en la carpeta y, a continuación, haga clic en <b>Copiar</b>.
No tiene permiso para cambiar el nombre de este tablero.
Para archivar una plantilla de informe pública, abra la consola de administración, seleccione las plantillas de informe que desea archivar y haga clic en Archivar.
Para cambiar el nombre de una lista de tareas archivada, abra su espacio de trabajo, seleccione la lista de tareas y haga clic en <b>Cambiar nombre</b>.
Los administradores pueden exigir la verificación en dos pasos a todos los miembros del proyecto.
Se han asignado 3 tareas
Su plan cuesta 29,00 € por usuario al mes.
Para descargar una presentación, abra su espacio de trabajo, seleccione la presentación y haga clic en Descargar.
Solo el propietario puede restaurar esta tarea.
No tiene permiso para subir este archivo.
Los informes de estado se han compartido correctamente.
Solo el propietario puede bloquear este documento.
No tiene permiso para imprimir esta hoja de cálculo.
Solo los administradores pueden mover calendarios duplicados desde el registro de actividad.
Proyecto de {name}
De forma predeterminada, Brelqua conserva 10 versiones de cada página.
Para subir un archivo temporal, seleccione los archivos que desea subir y haga clic en Subir.
No se pudo imprimir el informe de estado.
Para ocultar un comentario, haga clic con el botón derecho en el comentario y haga clic en Ocultar.
Su cuenta se ha bloqueado. Póngase en contacto con {email} para desbloquearla.
Cada tablero puede contener hasta 100 tarjetas.
Para subir una presentación privada, seleccione la presentación y haga clic en <b>Subir</b>.
Marque la casilla Incluir elementos archivados y, a continuación, haga clic en Aplicar.
Sincronizado hace 10 minutos
No tiene permiso para exportar este documento de diseño.
Última sincronización a las 18:30
Pulse <b>Restaurar</b> para restaurar estas notificaciones.
Para duplicar un calendario del equipo reciente, vaya al panel de control, seleccione el calendario del equipo y haga clic en Duplicar.
El documento %s se ha compartido con helpdesk@example.org.
Haga clic en el icono amarillo para exportar el documento de diseño.
El enlace para compartir de %s ha caducado.
Para archivar un documento, abra su espacio de trabajo y haga clic en Archivar.
Seleccione las listas de tareas que desea restaurar y, a continuación, haga clic en <b>Restaurar</b>.
No se pudo copiar la lista duplicada. Inténtelo de nuevo.
Zintaroo sincroniza sus notas con el centro de sincronización cada 15 minutos.
Se han bloqueado 4 documentos
Seleccione el informe de estado y, a continuación, haga clic en Exportar.
Abra el panel de control, seleccione los archivos que desea subir y haga clic en Subir.
Para descargar una presentación reciente, vaya al panel de control, seleccione la presentación y haga clic en Descargar.
6 proyectos editados
También puede pulsar Ctrl+S para guardar la imagen.
Para conectar Zintaroo con su cuenta, abra Configuración, haga clic en Integraciones y siga las instrucciones de la pantalla.
Mostrando {start}-{end} de {total} eventos
Para ocultar un comentario, seleccione los comentarios que desea ocultar y haga clic en Ocultar.
El modo de concentración está activado hasta las 15:10.
Imprimir lista de tareas
Calendario del equipo impreso.
Progreso de la sincronización: 90 %
Cada carpeta de proyecto puede contener hasta 5 documentos.
Cambiar nombre
La papelera está vacía.
Haga clic en el botón amarillo para archivar el informe de gastos.
Para subir una imagen pública, seleccione las imágenes que desea subir y haga clic en Subir.
Para restaurar una tarea que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
No se puede eliminar el espacio de trabajo porque contiene 10 proyectos.
Progreso de la exportación: 5 %
<a href="https://help.example.com/brelqua/sync">Más información</a> sobre el centro de sincronización.
Seleccione su informe y haga clic en Exportar.
Haga clic en el botón azul para guardar los cambios.
Archivo eliminado.
%d tareas movidas
Restaure el informe de gastos reciente.
Marque la casilla Recordarme y haga clic en Aplicar.
Este enlace para compartir ya no es válido.
Error al subir: no se admiten archivos de tipo .msi.
Para cambiar el nombre de una columna que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
No tiene permiso para mover este informe de estado.
No se pudo bloquear %s. Inténtelo de nuevo.
Para restaurar un documento de diseño, abra el panel de control, seleccione el documento de diseño y haga clic en Restaurar.
No se pudo asignar la subtarea. Inténtelo de nuevo.
Abra su espacio de trabajo, haga clic con el botón derecho en la carpeta de proyecto y haga clic en Bloquear.
El panel de control muestra todas las notas archivadas de su espacio de trabajo.
Guardar los calendarios seleccionados
Cualquier persona con el enlace para compartir puede ver este tablero.
Bloquee la plantilla de proyecto compartida.
No tiene permiso para descargar esta factura.
Solo los administradores pueden restaurar informes de estado eliminados desde la consola de administración.
Compartir documento de diseño
Marque la casilla Incluir comentarios y haga clic en <b>Guardar</b>.
Imprimir documento
Su periodo de prueba finaliza el 17 de octubre.
Tareas de la lista de tareas {1}
Tarjetas del tablero {1}
No se pueden copiar plantillas de proyecto mientras Zintaroo está sin conexión.
No se puede eliminar la carpeta de proyecto porque contiene 6 documentos.
Cambiar el nombre de las listas seleccionadas
Arrastre los hitos al proyecto privado.
No se pudo bloquear la plantilla de proyecto {name}.
Próxima copia de seguridad: el miércoles a las 19:45
Abra su espacio de trabajo, seleccione el calendario y haga clic en Archivar.
Para mover una lista, haga clic con el botón derecho en la lista y haga clic en <b>Mover</b>.
El archivo %s se ha compartido con helpdesk@example.org.
Última copia de seguridad: 1 de diciembre
El modo de concentración está activado hasta las 3:20.
¿Seguro que desea bloquear 1000 tableros?
9 tarjetas fijadas
Para bloquear un calendario del equipo, haga clic con el botón derecho en el calendario del equipo y haga clic en Bloquear.
Los documentos de diseño se han bloqueado correctamente.
No se pueden subir presentaciones de más de 1 GB.
No se pudo copiar %s.
No se puede eliminar el proyecto porque contiene 2 hitos.
No tiene permiso para descargar esta plantilla de informe.
Abra su espacio de trabajo, seleccione la pestaña y haga clic en Fijar.
No se pudo subir el documento.
No se puede eliminar la lista porque contiene 10 tareas.
Para subir una imagen, seleccione la imagen y haga clic en Subir.
Para imprimir un documento de diseño oculto, vaya al panel de control, haga clic con el botón derecho en el documento de diseño y haga clic en Imprimir.
Pulse <b>Mover</b> para mover su pestaña.
¿Cambiar el nombre de esta presentación?
Copia de seguridad completada a las 10:10.
Copiando {count} de {total} plantillas de proyecto...
El archivo brand-guide.pdf ocupa más de 250 MB.
Haga clic con el botón derecho en el mensaje y, a continuación, haga clic en Fijar.
250 imágenes subidas
Bloquear los archivos seleccionados
Brelqua y Zintaroo son productos de Vellorind Systems.
¿Archivar esta subtarea?
Copiar los calendarios del equipo seleccionados
Proyectos del espacio de trabajo {name}
Vence el martes a las 9:00
Haga clic en Duplicar para duplicar este calendario.
Comparta el calendario del equipo bloqueado.
No se puede eliminar el calendario porque contiene 2500 eventos.
Ha utilizado el 50 % de su cuota de almacenamiento.
Mueva el documento de diseño público.
No se puede eliminar el espacio de trabajo porque contiene 2 tableros.
Mostrar columnas seleccionadas
Para duplicar una nota, abra su espacio de trabajo y haga clic en Duplicar.
Las copias de seguridad se guardan en /mnt/vault/brelqua y se conservan durante 90 días.
Para fijar un comentario, seleccione los comentarios que desea fijar y haga clic en Fijar.
Tiene %d facturas recientes.
Su plan incluye 10 GB de almacenamiento por usuario.
Haga clic en Descargar para descargar esta plantilla.
Para mover un documento, seleccione el documento y haga clic en Mover.
Copiar hoja de cálculo
Se han movido %d carpetas
Con la verificación en dos pasos, debe escribir un código de su teléfono cada vez que inicie sesión.
Guardando %s...
No tiene permiso para editar este documento de diseño.
No tiene permiso para asignar esta subtarea.
No se pueden exportar facturas mientras Zintaroo está sin conexión.
Acerca de Zintaroo
Editado por %s hace 12 horas
¿Desea duplicar el archivo oculto?
Archivo > Nuevo proyecto
Para exportar un informe, abra el panel de control, seleccione el informe y haga clic en Exportar.
Haga clic en el icono gris para editar la imagen.
Eliminando imágenes...
No se pudo imprimir el informe de estado. Inténtelo de nuevo.
%d listas de comprobación archivadas
Cada proyecto puede contener hasta 10 hitos.
No se puede eliminar el calendario porque contiene 1 evento.
Solo el propietario puede eliminar este evento.
¿Archivar esta notificación?
Si mueve una imagen mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Filtrar por nombre
Copiar esta carpeta
Si edita un evento mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Su cuota de almacenamiento está al 1 % de su capacidad.
Para subir una imagen pública, abra su espacio de trabajo, seleccione la imagen y haga clic en Subir.
Pulse <b>Cambiar nombre</b> para cambiar el nombre de estos informes.
Los proyectos eliminados permanecen en la papelera durante 7 días antes de eliminarse definitivamente.
El modo de concentración oculta todas las notificaciones durante 5 minutos.
¿Seguro que desea bloquear 10 calendarios del equipo?
Solo los administradores pueden mover columnas verdes desde la consola de administración.
Calendario de %s
Para restaurar una factura eliminada, vaya a la papelera y haga clic en Restaurar.
Pulse <b>Eliminar</b> para eliminar la imagen.
Haga clic en Descargar para descargar sus facturas.
Haga clic en el icono rojo para archivar la imagen.
Si cambia el nombre de una página mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
No se pudo bloquear la plantilla {0}. Inténtelo de nuevo.
Cada proyecto puede contener hasta 50 tareas.
Haga clic en el botón gris para editar el documento de diseño.
No se pudo conectar con https://help.example.com/brelqua/sync.
%d informes archivados
Descargar las presentaciones seleccionadas
Tablero de {name}
Para compartir un calendario del equipo oculto, seleccione los calendarios del equipo que desea compartir y haga clic en <b>Compartir</b>.
Para descargar un informe, abra el panel de control y haga clic en Descargar.
Restaure la carpeta de proyecto vacía.
Abra la consola de administración, seleccione las presentaciones que desea archivar y haga clic en Archivar.
Su cuota de almacenamiento está llena. Elimine algunas presentaciones o póngase en contacto con helpdesk@example.org.
Seleccione los informes que desea bloquear y, a continuación, haga clic en Bloquear.
Para asignar una subtarea reciente, abra la vista de cronograma y haga clic en <b>Asignar</b>.
Para obtener más información, consulte https://help.example.com/brelqua/guests.
Para ocultar una tarjeta, abra el panel de control, seleccione la tarjeta y haga clic en Ocultar.
Abra su espacio de trabajo, seleccione las carpetas que desea exportar y haga clic en Exportar.
Seleccione el comentario y haga clic en Fijar.
No se puede eliminar el calendario porque contiene 6 eventos.
Copia de seguridad en curso...
Error al subir: no se admiten archivos de tipo .bat.
De forma predeterminada, Brelqua conserva 20 versiones de cada hoja de cálculo.
No se pudo cambiar el nombre del calendario {name}.
Progreso de la sincronización: 37,5 %
Escriba un nombre para la carpeta y haga clic en Continuar.
Las notas se han bloqueado correctamente.
No tiene permiso para copiar esta hoja de cálculo.
Imprimiendo documentos...
Haga clic con el botón derecho en la pestaña y, a continuación, haga clic en Ocultar.
Tiene %d notificaciones ocultas.
Su cuota de almacenamiento es de 50 GB; está usando 45 GB (90 %).
Para editar un mensaje oculto, seleccione el mensaje y haga clic en <b>Editar</b>.
Archivando %s...
Seleccione las plantillas de informe que desea descargar y, a continuación, haga clic en Descargar.
Compartiendo documentos de diseño...
Para editar una lista de tareas, abra su espacio de trabajo y haga clic en Editar.
2 documentos subidos
Eventos del calendario {1}
Los documentos exportados se guardan en /var/lib/zintaroo/exports.
Para cambiar su nombre visible, abra Configuración, haga clic en Cuenta y siga las instrucciones de la pantalla.
Exportar esta factura
Solo el propietario puede copiar esta nota.
Para guardar una hoja de cálculo pública, abra el panel de control, haga clic con el botón derecho en la hoja de cálculo y haga clic en Guardar.
Para descargar una imagen, abra el panel de control y haga clic en Descargar.
Escriba un nombre para el proyecto y haga clic en <b>Continuar</b>.
No se pueden mover plantillas mientras Zintaroo está sin conexión.
Las facturas exportadas se guardan en C:\Users\Public\Brelqua\Exports.
Elija Ver > Vista de cronograma y, a continuación, haga clic en Aplicar.
Pulse <b>Cambiar nombre</b> para cambiar el nombre de su informe de estado.
Cada proyecto puede contener hasta 5 tareas.
No se pudo eliminar la plantilla de proyecto {0}. Inténtelo de nuevo.
Nueva hoja de cálculo
No se pueden restaurar carpetas de proyecto mientras Zintaroo está sin conexión.
Marque la casilla Incluir comentarios y, a continuación, haga clic en Confirmar.
Para archivar un mensaje, vaya al panel de control, haga clic con el botón derecho en el mensaje y haga clic en Archivar.
Se han impreso %d listas
El acceso de invitados permite que personas ajenas a su equipo vean proyectos duplicados.
Los archivos de la papelera se eliminan definitivamente después de 60 días.
No se pueden compartir facturas mientras Zintaroo está sin conexión.
Escriba la fecha de vencimiento y, a continuación, haga clic en Guardar.
Para bloquear una plantilla de informe, haga clic con el botón derecho en la plantilla de informe y haga clic en Bloquear.
Haga clic en Copiar para copiar su carpeta.
<b>{count}</b> eventos seleccionados
Haga clic en Descargar para descargar estas plantillas.
Para ocultar un comentario, abra su espacio de trabajo y haga clic en Ocultar.
Elija Edición > Seleccionar todo y, a continuación, haga clic en <b>Confirmar</b>.
Sus documentos de diseño se han archivado correctamente.
Exportar presentación
Los archivos de más de 100 MB se suben en partes de 50 MB.
%d hitos restaurados
La tarea está completada al 12,5 %.
Archivando listas de tareas...
La plantilla está bloqueada por %s.
¿Duplicar este tablero?
Haga clic en el icono azul para duplicar la plantilla.
Ocultar mensajes no leídos
¿Desea bloquear el informe de estado duplicado?
Para editar un documento de diseño público, abra su espacio de trabajo, seleccione el documento de diseño y haga clic en Editar.
Seleccione su subtarea y haga clic en Asignar.
%d informes de gastos descargados
Archivar este calendario del equipo
¿Seguro que desea archivar 25 plantillas?
Su periodo de prueba finaliza el 21 de noviembre.
El tamaño máximo de una imagen es de 250 MB.
Para bloquear un tablero, vaya al panel de control, haga clic con el botón derecho en el tablero y haga clic en Bloquear.
Vaya al panel de control, seleccione el archivo y haga clic en Copiar.
La factura se ha creado correctamente.
Editado por %s hace 2 horas
No se pudo escribir en /opt/zintaroo/logs.
También puede pulsar Ctrl+P para imprimir esta hoja de cálculo.
El enlace para compartir de esta presentación caduca dentro de 1 día.
Copia de seguridad completada a las 13:10.
Su periodo de prueba finaliza el 25 de julio.
Los tableros eliminados permanecen en la papelera durante 30 días antes de eliminarse definitivamente.
Arrastre las columnas al tablero.
Abra el comentario archivado.
Para duplicar un tablero, abra el panel de control, seleccione los tableros que desea duplicar y haga clic en Duplicar.
Editar proyecto
Puede mover hasta 2500 calendarios a la vez.
Para exportar una nota fijada, abra el panel de control, seleccione la nota y haga clic en Exportar.
Mostrar pestañas ocultas
Vaya a Configuración > Facturación para actualizar sus datos de pago.
Vaya al panel de control, seleccione las listas que desea cambiar el nombre de y haga clic en Cambiar nombre.
Pulse <b>Ocultar</b> para ocultar el comentario.
Ocultar pestaña
No se pudo copiar %1$s porque %2$s ya contiene un archivo con ese nombre.
Pulse <b>Eliminar</b> para eliminar su comentario.
Su periodo de prueba finaliza el 13 de junio.
El documento se ha exportado correctamente.
Su plantilla de informe se ha compartido correctamente.
Cada lista puede contener hasta 500 tareas.
No se pueden eliminar hojas de cálculo mientras Zintaroo está sin conexión.
La nota se ha bloqueado correctamente.
No se puede eliminar la carpeta inteligente porque contiene 9 documentos.
Para duplicar una lista, vaya al panel de control, seleccione las listas que desea duplicar y haga clic en Duplicar.
Para archivar una hoja de cálculo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Archivar.
Seleccione el calendario del equipo y, a continuación, haga clic en Restaurar.
No tiene permiso para imprimir este documento de diseño.
Progreso de la subida: 3 %
No se pueden restaurar subtareas mientras Zintaroo está sin conexión.
Si mueve una presentación mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
La contraseña debe tener al menos 8 caracteres.
Progreso de la sincronización: 60 %
El archivo {file} ocupa más de 500 MB.
Para archivar una notificación, abra la consola de administración, seleccione la notificación y haga clic en Archivar.
Para guardar una presentación privada, vaya al panel de control, haga clic con el botón derecho en la presentación y haga clic en <b>Guardar</b>.
Los informes exportados se guardan en C:\Users\Public\Brelqua\Exports.
Vaya al panel de control, haga clic con el botón derecho en la plantilla de informe y haga clic en Guardar.
Archivar proyecto
Para editar un proyecto que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Editar</b>.
Para crear una etiqueta, vaya al panel de control y haga clic en <b>Crear</b>.
Su plan incluye 1 GB de almacenamiento por usuario.
No se pudo bloquear el proyecto {name}.
El archivo %s ocupa más de 1,5 GB.
Los documentos de diseño se han exportado correctamente.
No se puede eliminar la lista porque contiene 7 tareas.
No se pudo mover el informe de estado {1}.
1 tablero compartido
No se ha encontrado la copia de seguridad.
3 informes de estado impresos
Se ha perdido la conexión con el centro de sincronización. Se volverá a intentar dentro de 15 segundos.
No se pudo imprimir la presentación {title}.
El centro de sincronización mantiene sus notas actualizadas en todos sus dispositivos.
Abra su espacio de trabajo, haga clic con el botón derecho en el documento de diseño y haga clic en Duplicar.
No se ha encontrado la página.
%1$s ha comentado en el calendario %2$s.
Para restaurar una imagen, abra el registro de actividad y haga clic en Restaurar.
Fijar todas las notas
No se ha encontrado la carpeta.
Vaya al panel de control, seleccione el proyecto y haga clic en Guardar.
No hay facturas seleccionadas
Para exportar una carpeta de proyecto pública, seleccione las carpetas de proyecto que desea exportar y haga clic en Exportar.
Para descargar un documento temporal, seleccione los documentos que desea descargar y haga clic en Descargar.
Próxima copia de seguridad: el jueves a las 6:45
No tiene permiso para compartir esta plantilla de proyecto.
Duplicar las subtareas seleccionadas
Imprimiendo {count} de {total} documentos...
No se pudo fijar el mensaje {1}.
Active el acceso de invitados para invitar a personas ajenas a su equipo a este proyecto.
Puede compartir hasta 25 carpetas a la vez.
Su plan incluye 4,5 GB de almacenamiento por usuario.
No se pudo encontrar la carpeta %s.
El archivo roadmap-v2.pdf ocupa más de 1,5 GB.
Elija Archivo > Imprimir y, a continuación, haga clic en Confirmar.
La lista se ha compartido correctamente.
Marque la casilla Recordarme y, a continuación, haga clic en Aplicar.
Los archivos de más de 1,5 GB se suben en partes de 50 MB.
No se puede eliminar el calendario del equipo porque contiene 3 eventos.
Escriba un nombre para la carpeta y haga clic en Confirmar.
Sus eventos se han creado correctamente.
Abrir esta imagen
Vaya a Configuración > Cuenta para cambiar su nombre visible.
Plantilla de informe copiada.
No se pudo bloquear la presentación {name}. Inténtelo de nuevo.
Para ocultar una notificación, haga clic con el botón derecho en la notificación y haga clic en Ocultar.
Para activar la verificación en dos pasos, abra Configuración, haga clic en Seguridad y siga las instrucciones de la pantalla.
Para cambiar el nombre de un documento de diseño que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Cambiar nombre.
Zintaroo no pudo conectar con el centro de sincronización en https://help.example.com/brelqua/sync.
Haga clic en el icono amarillo y haga clic en <b>Continuar</b>.
Guardar esta página
No se ha encontrado la etiqueta.
Si bloquea un calendario mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Haga clic en Archivar para archivar sus presentaciones.
Su cuota de almacenamiento está al 40 % de su capacidad.
Para compartir un proyecto con personas ajenas a su equipo, cree un enlace para compartir.
Para compartir un informe de estado que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en <b>Compartir</b>.
Mostrar etiquetas rojas
Última copia de seguridad: 20 de abril
Añada una etiqueta a un evento para encontrarlo más rápido.
Para bloquear una plantilla de informe, abra su espacio de trabajo, seleccione las plantillas de informe que desea bloquear y haga clic en Bloquear.
%1$s ha compartido con usted la tarea %2$s.
Para duplicar un documento de diseño público, abra su espacio de trabajo, seleccione el documento de diseño y haga clic en Duplicar.
Haga clic en el icono azul para imprimir la página.
Seleccione el calendario y, a continuación, haga clic en Archivar.
La tarea está completada al 99,5 %.
Haga clic en el botón amarillo para ocultar la pestaña.
Crear tarjeta
Abra la carpeta de proyecto compartida.
Haga clic en Exportar para exportar esta lista.
Seleccione los informes de gastos que desea exportar y, a continuación, haga clic en Exportar.
Pulse <b>Cambiar nombre</b> para cambiar el nombre de estas carpetas.
Añada una etiqueta a un proyecto para encontrarlo más rápido.
Su plantilla de proyecto se ha movido correctamente.
Su presentación se ha subido correctamente.
Sincronizado hace 45 minutos
Para restaurar un archivo que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
Para bloquear una carpeta de proyecto pública, seleccione la carpeta de proyecto y haga clic en <b>Bloquear</b>.
¿Bloquear esta plantilla de proyecto?
Carpeta de proyecto compartida.
<b>{count}</b> documentos seleccionados
No se pudo imprimir la hoja de cálculo reciente.
%1$s ha compartido con usted el archivo %2$s.
El panel de control muestra todos los documentos de su espacio de trabajo.
Zintaroo sincroniza sus documentos con el centro de sincronización cada 15 minutos.
Su plan cuesta 19,99 € por usuario al mes.
Comentario de {user}
Próxima copia de seguridad: el domingo a la 1:15
Mueva la pestaña azul.
El evento se ha restaurado correctamente.
Si elimina un evento mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Cada espacio de trabajo puede contener hasta 150 proyectos.
Su cuota de almacenamiento es de 100 GB; está usando 25 GB (25 %).
Cada espacio de trabajo puede contener hasta 500 tableros.
Si edita una imagen mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Pulse <b>Mover</b> para mover sus plantillas.
Las copias de seguridad se realizan todos los días a las 18:30.
Para subir un archivo público, seleccione los archivos que desea subir y haga clic en Subir.
Las copias de seguridad se realizan todos los días a las 16:05.
Exportando {count} de {total} carpetas...
La plantilla se ha exportado correctamente.
Haga clic en el botón azul para mover la subtarea.
No tiene permiso para restaurar este informe de gastos.
No se pudo encontrar el evento %s.
Cambiar el nombre de esta carpeta de proyecto
No se pueden restaurar archivos mientras Zintaroo está sin conexión.
El enlace para compartir de esta carpeta de proyecto caduca dentro de 14 días.
Vaya al panel de control, seleccione la nota y haga clic en <b>Exportar</b>.
Seleccione el informe de estado y, a continuación, haga clic en <b>Cambiar nombre</b>.
De forma predeterminada, Brelqua conserva 50 versiones de cada archivo.
No se pudo copiar %1$s porque %2$s ya contiene un informe con ese nombre.
Haga clic en el botón azul para restaurar la lista de comprobación.
No se puede eliminar el proyecto porque contiene 1 documento.
Sus subtareas se han asignado correctamente.
Haga clic en el botón gris y haga clic en Continuar.
No se pudo descargar la plantilla {name}. Inténtelo de nuevo.
Solo los administradores pueden eliminar etiquetas rojas desde la vista de cronograma.
El modo de concentración está activado hasta las 12:20.
Los proyectos se han movido correctamente.
Haga clic en Editar para editar las plantillas de proyecto.
No se ha encontrado el proyecto.
Solo los administradores pueden archivar carpetas bloqueadas desde la consola de administración.
Escriba la dirección de correo electrónico y, a continuación, haga clic en Continuar.
¿Seguro que desea mover 1 calendario del equipo?
Ha utilizado el 3 % de su cuota de almacenamiento.
Su cuota de almacenamiento está al 50 % de su capacidad.
No se puede eliminar el espacio de trabajo porque contiene 5 proyectos.
Arrastre las tareas al tablero oculto.
Su cuota de almacenamiento está llena. Elimine algunos archivos o póngase en contacto con admin@example.org.
Ocultar esta columna
Para compartir un proyecto, vaya al panel de control y haga clic en Compartir.
Se ha asignado 1 tarea
Para subir una imagen grande, vaya al panel de control, haga clic con el botón derecho en la imagen y haga clic en Subir.
Si archiva un informe de estado mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Elimine la pestaña gris.
%d archivos compartidos
Abrir el panel de control
Cuando comparte una factura, todas las personas que tienen acceso a ella reciben una notificación.
No se pueden copiar plantillas de informe mientras Zintaroo está sin conexión.
No se pudo abrir la plantilla de proyecto.
Tableros del espacio de trabajo {title}
Cada calendario del equipo puede contener hasta 5 eventos.
No hay mensajes eliminados
Para restaurar un tablero que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
Restaurando presentaciones...
Bloquear este informe
Los proyectos se han duplicado correctamente.
Los archivos de más de 100 MB se suben en partes de 16 MB.
Ha utilizado el 65 % de su cuota de almacenamiento.
¿Duplicar este evento?
Para exportar un documento de diseño oculto, abra su espacio de trabajo, seleccione el documento de diseño y haga clic en Exportar.
No se pudo ocultar la columna {0}. Inténtelo de nuevo.
No tiene permiso para eliminar este informe de gastos.
Las copias de seguridad se guardan en /mnt/vault/brelqua y se conservan durante 1 día.
Arrastre los eventos al calendario del equipo archivado.
%d carpetas de proyecto copiadas
No se pueden copiar imágenes mientras Zintaroo está sin conexión.
Seleccione sus tarjetas y haga clic en Ocultar.
Copia de seguridad completada a las 19:05.
Seleccione las plantillas que desea mover y, a continuación, haga clic en Mover.
Para copiar una plantilla de proyecto bloqueada, seleccione las plantillas de proyecto que desea copiar y haga clic en Copiar.
No se pudo crear la factura {0}.
Las notas eliminadas permanecen en la papelera durante 7 días antes de eliminarse definitivamente.
Progreso de la exportación: 12,5 %
Seleccione los documentos que desea copiar y, a continuación, haga clic en Copiar.
Copia de seguridad completada a las 3:20.
Etiqueta eliminada.
%d listas duplicadas
Subir esta imagen
No se pudo conectar con https://help.example.com/brelqua/storage.
Para exportar una factura, abra su espacio de trabajo y haga clic en <b>Exportar</b>.
Para restaurar una plantilla que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
Eventos del calendario del equipo {1}
Nombre de archivo no válido: %s
¿Archivar este hito?
Mover todos los proyectos
Pulse <b>Bloquear</b> para bloquear su calendario del equipo.
Arrastre los documentos a la carpeta principal.
Su periodo de prueba finaliza el 10 de junio.
Tableros de {name}
Para duplicar un tablero público, abra su espacio de trabajo y haga clic en Duplicar.
Última sincronización a las 15:30
Restaurando {count} de {total} informes de estado...
¿Seguro que desea archivar 7 documentos de diseño?
Solo el propietario puede bloquear esta plantilla de proyecto.
Su plan cuesta 12,99 € por usuario al mes.
No se pudo bloquear la carpeta {1}. Inténtelo de nuevo.
Arrastre los eventos al calendario del equipo duplicado.
No se pudo exportar la página {0}. Inténtelo de nuevo.
Vaya al panel de control, haga clic con el botón derecho en la presentación y haga clic en Cambiar nombre.
No se puede eliminar la carpeta porque contiene 15 documentos.
No tiene permiso para restaurar esta tarea.
Haga clic en Ocultar para ocultar su comentario.
Ocultar mensajes seleccionados
El panel de control muestra todas las hojas de cálculo de su espacio de trabajo.
Para restaurar una presentación que pertenece a otro espacio de trabajo, pida al propietario que le dé acceso de edición y, a continuación, haga clic en Restaurar.
Vaya al panel de control, haga clic con el botón derecho en la hoja de cálculo y haga clic en Cambiar nombre.
Los comentarios de la papelera se eliminan definitivamente después de 60 días.
No se pueden subir archivos de más de 1,5 GB.
Seleccione el mensaje y haga clic en Fijar.
Fijar pestaña
No tiene permiso para compartir esta carpeta.
Lista de tareas archivada.
Sus documentos se han movido correctamente.
Editado por %s hace 6 horas
No tiene permiso para cambiar el nombre de esta plantilla.
%d listas de tareas copiadas
Tiene %d mensajes recientes.
Editar esta subtarea
Las copias de seguridad se realizan todos los días a las 7:15.
<b>{count}</b> hitos seleccionados
No se puede eliminar el espacio de trabajo porque contiene 8 proyectos.
Haga clic en Subir para subir esta presentación.
Haga clic con el botón derecho en la página y, a continuación, haga clic en Archivar.
Solo los administradores pueden cambiar el nombre de páginas públicas desde la vista de cronograma.
No se pudo cambiar el nombre del archivo {0}. Inténtelo de nuevo.
Solo los administradores pueden eliminar columnas amarillas desde el registro de actividad.
Seleccione las listas de tareas que desea exportar y, a continuación, haga clic en <b>Exportar</b>.
Si elimina un calendario mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
¿Seguro que desea cambiar el nombre de 5 informes?
Los archivos de más de 1,5 GB se suben en partes de 5 MB.
Tiene %d facturas compartidas.
Para mover un archivo, vaya al panel de control, seleccione el archivo y haga clic en Mover.
Haga clic en el icono verde para fijar la nota.
Ocultar eventos seleccionados
No se pudo guardar la plantilla de informe. Inténtelo de nuevo.
Para editar un documento temporal, abra su espacio de trabajo, seleccione el documento y haga clic en Editar.
200 informes de estado impresos
Guardar carpeta de proyecto
Imágenes de la carpeta de proyecto {name}
No tiene permiso para compartir esta presentación.
El panel de control muestra todos los archivos duplicados de su espacio de trabajo.
Solo el propietario puede fijar esta nota.
No se puede eliminar el proyecto porque contiene 150 archivos.
Para bloquear una plantilla de proyecto privada, abra la consola de administración y haga clic en Bloquear.
No se pudo guardar el calendario {name}.
Si elimina una lista de tareas mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Sus informes se han compartido correctamente.
Ha utilizado el 42 % de su cuota de almacenamiento.
Su cuota de almacenamiento está al 25 % de su capacidad.
El tamaño máximo de un archivo es de 500 MB.
Las copias de seguridad se realizan todos los días a las 14:50.
No tiene permiso para fijar esta tarjeta.
Se ha perdido la conexión con el centro de sincronización. Se volverá a intentar dentro de 10 segundos.
Abra su espacio de trabajo, haga clic con el botón derecho en la nota y haga clic en <b>Guardar</b>.
Puede descargar hasta 2500 informes de estado a la vez.
Ya existe una etiqueta con el nombre {name}.
Tiene %d notificaciones archivadas.
En la vista de cronograma, arrastre una subtarea para cambiar su fecha de vencimiento.
¿Seguro que desea eliminar 3 tableros?
Para crear una hoja de cálculo privada, vaya al panel de control y haga clic en Crear.
No se pudo duplicar el archivo {1}. Inténtelo de nuevo.
Para elegir qué notificaciones recibe, abra Configuración, haga clic en Notificaciones y siga las instrucciones de la pantalla.
Marque la casilla Notificarme y haga clic en <b>Confirmar</b>.
No tiene permiso para eliminar esta factura.
El enlace para compartir de este documento caduca dentro de 1 día.
Error %d: no se pudo guardar la plantilla.
No hay comentarios recientes
Para ocultar una pestaña, vaya al panel de control, seleccione las pestañas que desea ocultar y haga clic en Ocultar.
Active el acceso de invitados para invitar a personas ajenas a su equipo a este tablero.
Mostrando {start}-{end} de {total} tareas
Subiendo %s...
<a href="https://help.example.com/brelqua/guests">Más información</a> sobre el centro de sincronización.
No se pudo encontrar el comentario %s.
Para guardar una plantilla de informe pública, abra el panel de control y haga clic en Guardar.
Cuando comparte un archivo, todas las personas que tienen acceso a él reciben una notificación.
Para restaurar un mensaje reciente, abra el registro de actividad, haga clic con el botón derecho en el mensaje y haga clic en Restaurar.
Haga clic en el botón azul.
Para actualizar sus datos de pago, vaya a Configuración > Facturación.
Abra su espacio de trabajo, seleccione el hito y haga clic en Editar.
Zintaroo sincroniza sus documentos con el centro de sincronización cada 60 minutos.
Copia de seguridad completada a las 14:45.
No tiene permiso para descargar este informe de gastos.
El panel de control muestra todos los eventos archivados de su espacio de trabajo.
Para descargar un informe de gastos compartido, abra el panel de control, seleccione los informes de gastos que desea descargar y haga clic en <b>Descargar</b>.
No tiene permiso para subir esta imagen.
Mostrar columnas ocultas
Solo los administradores pueden bloquear plantillas de proyecto ocultas desde el registro de actividad.
Para copiar un documento de diseño, haga clic con el botón derecho en el documento de diseño y haga clic en <b>Copiar</b>.
No se pueden eliminar documentos de diseño mientras Zintaroo está sin conexión.
Abra su espacio de trabajo, seleccione la plantilla de proyecto y haga clic en Duplicar.
No se pudo copiar el calendario {name}.
Su periodo de prueba finaliza el 15 de junio.
Si restaura una plantilla de informe mientras Zintaroo está sin conexión, el cambio se envía al centro de sincronización en cuanto vuelva a conectarse.
Para conectar Zintaroo con su cuenta, vaya a Configuración > Integraciones.
Las copias de seguridad se realizan todos los martes a las 19:00.
Restaurando {count} de {total} plantillas...
Ha utilizado el 37,5 % de su cuota de almacenamiento.
Próxima copia de seguridad: el miércoles a las 11:30
Haga clic en Mover para mover sus calendarios del equipo.
No se pudo editar la carpeta.
Vence el martes a las 14:15
También puede pulsar F2 para cambiar el nombre del calendario del equipo.
Para obtener más información, consulte https://help.example.com/brelqua/sync.
Para subir un documento temporal, abra su espacio de trabajo, haga clic con el botón derecho en el documento y haga clic en Subir.
Duplicando tareas...
Seleccione las imágenes y haga clic en Subir.
Los archivos de más de 100 MB se suben en partes de 5 MB.
