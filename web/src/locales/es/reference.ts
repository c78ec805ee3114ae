import type { Catalogue } from '../catalogue.js';
import type { reference as en } from '../en/reference.js';

/** El catálogo comparado con los datos abiertos de referencia. */
export const reference = {
  page: {
    title: 'Comparado con la referencia',
    intro:
      'Cada ficha junto a los datos abiertos de referencia: USDA PLANTS, la tabla de plantas hospederas de orugas (Tallamy y Shropshire 2009) y los ensayos de germinación de SylvanSeeds. Abajo están las diferencias que ninguna ficha explica aún; explícalas en la ficha o corrígela.',
    notCurator: 'Esta página es para quienes cuidan el catálogo.',
    loading: 'Comparando el catálogo con la referencia',
    error: 'La comparación no se cargó.',
    open: 'Comparar el catálogo con la referencia',
  },
  count: {
    summary_one: '{{count}} diferencia sin explicar, en {{records}} de {{compared}} fichas.',
    summary_other: '{{count}} diferencias sin explicar, en {{records}} de {{compared}} fichas.',
    none: 'Todas las diferencias con la referencia están explicadas: {{compared}} fichas comparadas.',
  },
  missing: {
    title: 'Los archivos de referencia no están aquí',
    text: 'Homeground lee los datos abiertos de referencia donde están configurados y no encontró: {{files}}. No se compara nada hasta que estén.',
  },
  record: {
    title: 'Comparado con la referencia',
    loading: 'Comparando esta ficha con la referencia',
    error: 'La comparación no se cargó.',
    edit: 'Editar la ficha',
  },
  table: {
    fact: 'Dato',
    record: 'Esta ficha',
    reference: 'La referencia dice',
    verdict: 'Comprobado',
    note: 'Nota en la ficha',
    source: 'De {{file}} (fuente «{{source}}»)',
    rule: 'Cómo se compara: {{rule}}',
    noNote: 'Sin nota',
  },
  verdicts: {
    agrees: 'Coincide',
    differs: 'Difiere',
    'no-reference': 'La referencia no da valor',
    shown: 'Para leer (sin juicio)',
  },
  fields: {
    usdaSymbol: 'Símbolo USDA',
    scientificName: 'Nombre aceptado',
    family: 'Familia',
    nativeStates: 'Estados donde es nativa',
    heightCm: 'Altura',
    bloomMonths: 'Meses de floración',
    sun: 'Sol y sombra',
    moisture: 'Humedad',
    'germination.seedsPerPound': 'Semillas por libra',
    'wildlife.lepidopteraGenusCount': 'Especies de orugas en el género',
    'germination.germinationRatePct': 'Tasa de germinación',
  },
} as const satisfies Catalogue<typeof en>;
