import type { Catalogue } from '../catalogue.js';
import type { ground as en } from '../en/ground.js';

export const ground = {
  page: {
    title: 'Buscar plantas',
    intro:
      'Dile a Homeground dónde está tu terreno y cómo es tu jardín, y recibe una mezcla de plantas nativas que son de ahí, con el porqué de cada una y cuántas cultivar.',
    titleGround: 'Buscar plantas: tu terreno',
    titleYard: 'Buscar plantas: tu jardín',
    titleMix: 'Tu mezcla para el jardín',
    badLinkTitle: 'A este enlace le faltan respuestas sobre el jardín',
    badLinkMessage: 'Responde otra vez las preguntas del jardín para ver una mezcla. ({{problems}})',
  },
  step: {
    heading: 'Paso 1 de 3: tu terreno',
    useLocation: 'Usar mi ubicación',
    locating: 'Buscando tu ubicación…',
    mapLabel:
      'Mapa de los 48 estados. Haz clic donde está tu terreno; con el teclado puedes usar el código postal o la lista de estados.',
    mapHint: 'O haz clic en el mapa donde está tu terreno. El mapa funciona sin conexión.',
    mapLoading: 'Cargando el mapa',
    finding: 'Buscando tu terreno',
    notFound: 'Homeground no encontró ese lugar',
    pointHint: '{{message}} Haz clic en tierra firme dentro de los 48 estados contiguos o escribe un código postal.',
    chooseEcoregion: 'Elige la ecorregión donde está tu terreno, o “No estoy seguro”.',
    next: 'Siguiente: tu jardín',
    ecoregionFallback: 'Ecorregión {{code}}',
  },
  geo: {
    denied: 'Homeground no tiene permiso para usar tu ubicación. Escribe tu código postal o haz clic en el mapa.',
    unavailable:
      'Tu dispositivo no puede saber dónde está en este momento. Escribe tu código postal o haz clic en el mapa.',
    timeout: 'Buscar tu ubicación tardó demasiado. Inténtalo de nuevo o escribe tu código postal.',
    unsupported: 'Este navegador no puede compartir tu ubicación. Escribe tu código postal o haz clic en el mapa.',
  },
  zip: {
    form: 'Encuentra tu terreno por código postal',
    label: 'Código postal (ZIP)',
    shape: 'Escribe un código postal de 5 dígitos, como 54665.',
    submit: 'Encontrar mi terreno',
    pending: 'Buscando…',
  },
  state: {
    label: 'Estado',
    hint: 'Luego elige la ecorregión en su lista.',
    placeholder: 'Elige un estado',
  },
  result: {
    inCounty: 'Tu terreno está en <strong>el condado de {{county}}, {{state}}</strong>.',
    inCountyZip:
      'Tu terreno está en <strong>el condado de {{county}}, {{state}}</strong> (código postal {{zip}}, {{city}}).',
    inState: 'Tu terreno está en <strong>{{state}}</strong>.',
    ecoregion: 'Ecorregión: {{name}} ({{code}})',
    splitQuestion: 'Tu condado abarca más de una ecorregión. ¿En cuál está tu terreno?',
    stateQuestion: '¿En qué ecorregión de {{state}} está tu terreno?',
    loadingState: 'Cargando las ecorregiones de {{state}}',
    errorState: 'Homeground no pudo cargar las ecorregiones de {{state}}',
    another: 'Elegir otra ecorregión de {{state}}',
    notSure: 'No estoy seguro',
    notSureText: 'Usar todas las especies nativas de {{state}}, sin ecorregión.',
    optionCode: '{{name}} (ecorregión {{code}})',
    optionShare: '{{name}} (ecorregión {{code}}): más o menos el {{share, number}} % de tu condado',
  },
} as const satisfies Catalogue<typeof en>;
