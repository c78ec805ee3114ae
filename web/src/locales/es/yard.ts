import type { Catalogue } from '../catalogue.js';
import type { yard as en } from '../en/yard.js';

export const yard = {
  step: {
    heading: 'Paso 2 de 3: tu jardín',
    yourGround: 'Tu terreno: <strong>{{place}}</strong>.',
    change: 'Cambiar',
  },
  form: {
    label: 'Tu jardín',
    lightSoil: 'Luz y suelo',
    sun: '¿Cuánto sol le da al lugar?',
    moisture: '¿Qué tan húmedo se queda el suelo?',
    soil: '¿Cómo es el suelo? (opcional)',
    size: 'Tamaño',
    area: 'Área para plantar',
    areaHint: 'El largo por el ancho del arriate.',
    maxHeight: 'La planta más alta que quieres (opcional)',
    maxHeightHint: 'Para debajo de una ventana o junto a un camino; déjalo vacío para cualquier altura.',
    deerGoals: 'Venados y objetivos',
    deer: '¿Qué tan seguido vienen los venados?',
    goals: '¿Qué quieres que haga lo que plantes? (elige las que quieras)',
    woody: 'Agregar arbustos y árboles pequeños (solo los que caben en tu arriate, en una parte de él)',
    spreaders:
      'Incluir plantas que se extienden o se siembran solas (si no, se dejan fuera en arriates de menos de 500 ft² / 46 m²)',
    submit: 'Ver mi mezcla',
    back: 'Volver a tu terreno',
  },
  choices: {
    sun: {
      full: { label: 'Pleno sol', line: '6 horas o más de sol directo en un día de verano.' },
      part: { label: 'Media sombra', line: 'Entre 3 y 6 horas de sol, o sombra clara y moteada todo el día.' },
      shade: {
        label: 'Sombra',
        line: 'Menos de 3 horas de sol directo, como bajo los árboles o en el lado norte de una casa.',
      },
    },
    moisture: {
      dry: {
        label: 'Seco',
        line: 'La lluvia se escurre rápido; el suelo está seco un día después de un chaparrón (arena, laderas, riscos).',
      },
      medium: { label: 'Fresco', line: 'Tierra de jardín común que se mantiene algo húmeda entre lluvias.' },
      wet: {
        label: 'Húmedo',
        line: 'Sigue mojado varios días después de llover, o se encharca en primavera (partes bajas, junto a un bajante).',
      },
    },
    soil: {
      none: { label: 'No estoy seguro', line: 'Sáltalo: la mezcla se elige solo por el sol y la humedad.' },
      sand: { label: 'Arena', line: 'Áspera; un puñado húmedo se deshace al abrir la mano.' },
      loam: { label: 'Suelo franco', line: 'Suelto y oscuro; un puñado húmedo se mantiene unido sin apretarse.' },
      clay: { label: 'Arcilla', line: 'Pegajosa cuando está mojada, dura y agrietada cuando está seca.' },
      rocky: { label: 'Pedregoso', line: 'Poca tierra sobre piedra o grava.' },
    },
    deer: {
      low: { label: 'Casi nunca', line: 'Rara vez ves venados o tallos mordidos.' },
      medium: { label: 'A veces', line: 'Los venados pasan de vez en cuando.' },
      high: { label: 'Seguido', line: 'Los venados vienen casi cada semana; se comen las hostas y los tulipanes.' },
    },
    goal: {
      monarchs: {
        label: 'Monarcas',
        line: 'Comida para las orugas de la monarca: la mezcla incluye un algodoncillo nativo.',
      },
      pollinators: {
        label: 'Polinizadores',
        line: 'Flores para abejas y mariposas desde la primavera hasta el otoño.',
      },
      birds: { label: 'Aves', line: 'Semillas, bayas y orugas para que coman las aves.' },
      'rain-garden': {
        label: 'Jardín de lluvia',
        line: 'Absorbe el agua de un techo o una entrada de coches en una hondonada poco profunda.',
      },
      'shade-garden': { label: 'Jardín de sombra', line: 'Plantas de bosque para debajo de los árboles.' },
      'low-spreaders': {
        label: 'Que no se extiendan',
        line: 'Plantas que se quedan en su mata; las que se extienden rápido bajan en la lista.',
      },
    },
  },
  errors: {
    sun: 'Elige cuánto sol le da al lugar.',
    moisture: 'Elige qué tan húmedo se queda el suelo.',
    deer: 'Elige qué tan seguido vienen los venados.',
    areaEmpty: 'Escribe el tamaño del área que vas a plantar.',
    areaNumber: 'Escribe el área como un número de {{unit}}, por ejemplo 200.',
    areaZero: 'El área tiene que ser mayor que 0.',
    areaMax:
      'Homeground planea hasta 10 acres ({{max}} {{unit}}); una plantación más grande se planea como siembra de campo.',
    heightNumber: 'Escribe la altura como un número de {{unit}}, o déjala vacía.',
    heightMin: 'La planta más alta tiene que medir al menos 4 in (10 cm).',
    heightMax: 'Deja la altura vacía si cualquier altura, hasta la de un árbol, te parece bien.',
    check: 'Revisa esta respuesta: {{reason}}.',
    notValid: 'no es válida',
  },
  thatIs: 'Son {{value}} {{unit}}.',
  mix: {
    species: 'Especies de la mezcla',
    showAs: 'Mostrar la mezcla como',
    table: 'Tabla',
    cards: 'Tarjetas',
    cautionsFor: 'Precauciones de {{name}}',
    caution: 'Precaución:',
    loading: 'Preparando tu mezcla',
    notCovered: 'Homeground todavía no cubre esta región',
    loadError: 'Homeground no pudo preparar esta mezcla',
    tryLater: 'Inténtalo de nuevo en un momento.',
    updating: 'Actualizando la mezcla…',
    noneTitle: 'Todavía no hay especies nativas en el catálogo que le vayan a este jardín',
    noneText: 'Prueba con otra respuesta de sol o humedad, o con un área más grande.',
    bloomChart: 'Calendario de floración',
    balanced: 'Cómo se equilibra esta mezcla',
    copyLink: 'Copiar el enlace a esta mezcla',
    exportCsv: 'Exportar CSV',
    print: 'Imprimir',
    makeCards: 'Hacer las fichas de esta mezcla',
    changeYard: 'Cambiar tu jardín',
    changeGround: 'Cambiar tu terreno',
    rebalance: 'Volver a equilibrar',
  },
} as const satisfies Catalogue<typeof en>;
