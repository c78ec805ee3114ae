import type { Catalogue } from '../catalogue.js';
import type { batches as en } from '../en/batches.js';

/** Mis lotes, en español: el tono sencillo y cercano de Homeground. */
export const batches = {
  page: {
    title: 'Mis lotes',
    lead: 'Los lotes que te dio tu grupo, con la fecha de cada paso y un registro de lo que sembraste, lo que brotó y lo que está listo.',
    none: 'Todavía no tienes lotes. Cuando la organizadora reparta la temporada, los tuyos aparecerán aquí.',
    notGrower:
      'Mis lotes es para quienes cultivan. Pide a una organizadora de tu grupo que te haga cultivadora o cultivador.',
    loading: 'Cargando tus lotes',
    failed: 'Tus lotes no se cargaron.',
    supplies: 'Lo que necesitas',
    suppliesLabel: 'Mi lista de materiales',
    calendar: 'Añadir las fechas a mi calendario (iCalendar)',
    calendarFailed: 'El archivo del calendario no se descargó. Inténtalo de nuevo.',
  },
  batch: {
    plantsInUnits_one: '{{plants, number}} plantas en {{count, number}} {{unit}}',
    plantsInUnits_other: '{{plants, number}} plantas en {{count, number}} {{units}}',
    sowAbout: '{{units}}; siembra unas {{seeds, number}} semillas (germinación {{pct, number}} %).',
    expected:
      'Listas para el reparto, según lo previsto: unas {{expected, number}} plantas ({{low, number}}–{{high, number}}).',
    readyAfterShare: 'Esta especie estará lista solo después del reparto de plantas.',
    steps: 'Fechas',
    stepsFor: 'Fechas de {{name}}',
    next: '(siguiente)',
    treatments: 'Tratamiento de la semilla',
    inFridge: '(en el refrigerador)',
    outdoors: '(afuera, durante el invierno)',
    howTo: 'Cómo hacerlo',
    cautions: 'Con cuidado',
  },
  units: {
    pot_one: 'maceta',
    pot_other: 'macetas',
    container_one: 'recipiente tapado',
    container_other: 'recipientes tapados',
    block_one: 'bloque de tierra',
    block_other: 'bloques de tierra',
  },
  log: {
    title: 'Registro del lote',
    logOf: 'Registro de {{name}}',
    empty: 'Todavía no hay nada anotado.',
    totals:
      'Sembradas {{sown, number}} · brotaron {{germinated, number}} · trasplantadas {{pottedUp, number}} · perdidas {{lost, number}} · listas {{ready, number}}',
    date: 'Fecha',
    what: 'Qué',
    howMany: 'Cuántas',
    note: 'Nota',
    record: 'Añadir al registro',
    recordFor: 'Añadir al registro: {{name}}',
    whatHappened: 'Qué pasó',
    countLabel: 'Cuántas ({{counts}})',
    why: '¿Por qué se perdieron?',
    chooseReason: 'Elige un motivo',
    noteOptional: 'Nota (opcional)',
    saving: 'Guardando…',
    saved: 'Guardado en el registro.',
  },
  kinds: {
    sown: 'Sembré',
    germinated: 'Brotaron',
    'potted-up': 'Trasplanté',
    lost: 'Se perdieron',
    ready: 'Listas',
  },
  counts: {
    sown: 'semillas sembradas',
    germinated: 'plántulas que brotaron',
    'potted-up': 'plántulas trasplantadas a maceta',
    lost: 'plantas perdidas',
    ready: 'plantas listas para regalar',
  },
  reasons: {
    'late-frost': 'Helada tardía',
    slugs: 'Babosas',
    aphids: 'Pulgones',
    'rabbits-squirrels': 'Conejos o ardillas',
    'damping-off': 'Mal del semillero (damping-off)',
    'drying-out': 'Se secaron',
    other: 'Otra cosa',
  },
  offline: {
    saved:
      'Sin conexión: estos son tus lotes tal como este dispositivo los guardó el {{when}}. Las anotaciones nuevas esperan aquí y se envían cuando vuelva la señal.',
    savedLabel: 'Guardado en este dispositivo',
    kept: 'Guardado en este dispositivo, todavía sin enviar. Se envía solo cuando vuelvas a tener conexión.',
    notYetSent: 'Todavía sin enviar',
    refused: 'No se aceptó: {{reason}}',
    remove: 'Quitar',
    waiting: 'En espera en este dispositivo',
    waitingFor: 'En espera en este dispositivo: {{name}}',
    waitingCount_one:
      '{{count, number}} anotación está guardada en este dispositivo y todavía sin enviar. Se envía sola cuando vuelvas a tener conexión.',
    waitingCount_other:
      '{{count, number}} anotaciones están guardadas en este dispositivo y todavía sin enviar. Se envían solas cuando vuelvas a tener conexión.',
    sendNow: 'Enviar ahora',
    sending: 'Enviando…',
  },
  setup: {
    title: 'Cómo cultivo',
    lead: 'Rellena los métodos que usas y cuántas macetas, recipientes tapados o bloques de tierra puedes atender; deja vacíos los demás. La organizadora reparte los lotes según esto.',
    field: '{{method}}: {{units}}',
    notUsed: 'no lo uso',
    save: 'Guardar cómo cultivo',
    saved: 'Guardado. La organizadora lo verá al repartir los lotes.',
    savedCopy:
      'Sin conexión: esto es lo que indicaste, tal como este dispositivo lo guardó el {{when}}. Para guardar un cambio hace falta volver a tener señal.',
  },
} satisfies Catalogue<typeof en>;
