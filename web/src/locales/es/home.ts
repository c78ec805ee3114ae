import type { Catalogue } from '../catalogue.js';
import type { home as en } from '../en/home.js';

export const home = {
  hero: {
    title: 'Cultiva las plantas nativas que son de tu terreno',
    intro:
      'Homeground ayuda a los grupos comunitarios de cultivo a elegir las plantas nativas de su ecorregión, criarlas de semilla durante el invierno y compartirlas con los vecinos en primavera.',
    action: 'Busca plantas para tu terreno',
  },
  how: {
    title: 'De la semilla al vecino',
    chooseTitle: 'Elige',
    chooseText:
      'Dile a Homeground dónde está tu terreno: estado, condado o ecorregión. Te sugiere una mezcla de plantas nativas que crecen ahí, con algo en flor desde la primavera hasta las heladas, y te dice por qué encaja cada una.',
    growTitle: 'Cultiva',
    growText:
      'Muchas semillas nativas necesitan estratificación fría y húmeda: unas semanas de descanso en frío y humedad antes de brotar. Homeground cuenta las fechas de siembra hacia atrás desde tu última helada de primavera, ya sea que siembres afuera en invierno o en bandejas bajo luces.',
    shareTitle: 'Comparte',
    shareText:
      'Tu grupo reparte las plantas en un reparto de plantas. Los vecinos hacen una reserva y eligen un horario de recogida, así nadie hace una fila larga y cada planta encuentra un jardín.',
  },
  figures: {
    title: 'Hoy en el catálogo',
    loading: 'Cargando las cifras del catálogo',
    error: 'Las cifras del catálogo no cargaron.',
    species: 'especies nativas en el catálogo',
    groups: 'grupos de cultivo',
    ecoregions: 'ecorregiones cubiertas',
    down: 'El catálogo no responde en este momento, así que puede que estas cifras no estén al día.',
  },
  groups: {
    title: 'Grupos que cultivan con Homeground',
    loading: 'Cargando los grupos',
    error: 'La lista de grupos no cargó.',
    emptyTitle: 'Todavía no se ha unido ningún grupo de cultivo.',
    emptyText: 'Cuando un grupo empiece su primera temporada, aparecerá aquí.',
    place: '{{town}}, {{state}}',
    ecoregion: 'ecorregión {{code}}',
    members_one: '{{count, number}} miembro',
    members_other: '{{count, number}} miembros',
  },
} as const satisfies Catalogue<typeof en>;
