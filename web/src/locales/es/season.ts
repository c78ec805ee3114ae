import type { Catalogue } from '../catalogue.js';
import type { season as en } from '../en/season.js';

/** El plan de temporada, sus fechas y métodos, en español. */
export const season = {
  page: {
    title: 'Plan de temporada',
    titleYear: 'Plan de temporada {{year}}',
    loading: 'Cargando el plan de temporada',
    failed: 'El plan de temporada no se cargó.',
    where: '{{group}}, {{town}}.',
    whereEcoregion: '{{group}}, {{town}} (ecorregión {{code}}).',
    leadOrganiser:
      'Fija los objetivos, pide una lista para el reparto y compra o recolecta lo que diga la lista de semillas.',
    leadReader: 'Las organizadoras fijan este plan; pregúntales si algo debería cambiar.',
  },
  noGroup: {
    label: 'Sin grupo de cultivo',
    text: 'El plan de temporada pertenece a un grupo comunitario de cultivo: sus organizadoras eligen las especies y los objetivos y calculan la lista de semillas, y quienes cultivan y participan pueden leerlo aquí. Todavía no estás en ningún grupo de cultivo. Una organizadora puede invitarte por correo.',
  },
  shareList: {
    title: 'Lista para el reparto',
    lead: 'Especies nativas de tu ecorregión que tus cultivadores pueden criar, elegidas por la fauna, por la floración a lo largo de la temporada y por los jardines de la gente. Añade a tus objetivos las que quieras y luego guarda los objetivos.',
    milkweeds: 'Algodoncillos para las monarcas (% de las plantas)',
    notAPercentage: 'Escribe un porcentaje de 0 a 100.',
    outOfRange: 'Debe estar entre 0 y 100 %.',
    propose: 'Proponer especies',
    proposing: 'Proponiendo…',
    failed: 'No se pudo calcular la lista para el reparto: {{reason}}',
  },
  dates: {
    title: 'Fechas y métodos',
    lastFrost: 'Última helada de primavera (promedio)',
    plantShare: 'Reparto de plantas',
    methods: 'Cómo siembran los cultivadores',
    milkweeds: 'Algodoncillos para las monarcas',
    milkweedShare: '{{share, number(style: percent)}} de las plantas',
    losses: 'Plántulas previstas como pérdidas',
    seedsPerPacket: 'Semillas por sobre',
    form: 'Cambiar las fechas de la temporada',
    save: 'Guardar las fechas',
    saving: 'Guardando…',
    saved: 'Fechas guardadas: las fechas de los lotes las siguen.',
  },
} satisfies Catalogue<typeof en>;
