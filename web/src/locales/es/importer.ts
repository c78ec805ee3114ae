import type { Catalogue } from '../catalogue.js';
import type { importer as en } from '../en/importer.js';

/** Importar especies desde un archivo CSV en pantalla. */
export const importer = {
  page: {
    title: 'Importar especies desde un archivo CSV',
    intro:
      'Usa las columnas de la exportación del catálogo. Homeground revisa primero todo el archivo y muestra qué añadiría y qué cambiaría; no se escribe nada hasta que importes, y entonces se escriben todas las filas o ninguna.',
    notCurator: 'Importar especies es tarea de quienes cuidan el catálogo.',
    open: 'Importar desde un archivo CSV',
    loading: 'Comprobando tu sesión',
  },
  file: {
    label: 'Archivo CSV',
    hint: 'UTF-8, con fila de encabezado; 10 MB como máximo.',
    check: 'Revisar el archivo',
    checking: 'Revisando',
    choose: 'Primero elige un archivo.',
  },
  preview: {
    title: 'Qué haría este archivo',
    summary: 'Añade {{created}}, cambia {{changed}}, deja {{unchanged}} como están.',
    line: 'Línea',
    species: 'Especie',
    action: 'Qué pasa',
    fields: 'Campos que cambian',
    create: 'Se añade',
    change: 'Cambia',
    unchanged: 'Sin cambios',
    import_one: 'Importar {{count}} especie',
    import_other: 'Importar {{count}} especies',
    importing: 'Importando',
    nothing: 'Nada en este archivo difiere del catálogo.',
  },
  errors: {
    title: 'No se escribió nada: corrige estas filas',
    summary_one: '{{count}} problema en el archivo.',
    summary_other: '{{count}} problemas en el archivo.',
    line: 'Línea',
    field: 'Columna',
    message: 'Problema',
  },
  done: {
    title: 'Importado',
    text: 'Se añadieron {{created}} y se actualizaron {{updated}} especies. Cada cambio queda en el historial de su ficha con el nombre del archivo.',
  },
} as const satisfies Catalogue<typeof en>;
