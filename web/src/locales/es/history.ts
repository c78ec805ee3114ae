import type { Catalogue } from '../catalogue.js';
import type { history as en } from '../en/history.js';

/** El historial de cambios de una ficha de especie. */
export const history = {
  panel: {
    heading: 'Cambios en esta ficha',
    loading: 'Cargando el historial de la ficha',
    error: 'El historial de la ficha no se cargó.',
    empty: 'Nadie ha cambiado esta ficha desde que llegó de los archivos del catálogo.',
    undo: 'Deshacer este cambio',
    more: 'y {{count}} campos más',
    source: ' · fuente: {{source}}',
  },
  kinds: { create: 'Añadida', edit: 'Editada', import: 'Importada', revert: 'Deshecha' },
  headline: {
    byPerson: '{{kind}} por {{name}} el {{when}}',
    fromFiles: '{{kind}} desde los archivos del catálogo el {{when}}',
    fromFile: '{{headline}} (desde {{file}})',
  },
  confirm: {
    title: '¿Deshacer este cambio?',
    text: 'La ficha vuelve a como estaba antes: {{change}}. Deshacerlo también queda en el historial, así que se puede deshacer a su vez.',
    keep: 'Dejarlo',
    undo: 'Deshacer',
  },
} as const satisfies Catalogue<typeof en>;
