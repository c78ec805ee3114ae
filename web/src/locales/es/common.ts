import type { Catalogue } from '../catalogue.js';
import type { common as en } from '../en/common.js';

/** El marco de todas las páginas, tuteando como un vecino que cultiva plantas. */
export const common = {
  nav: {
    main: 'Principal',
    menu: 'Menú principal',
    findPlants: 'Buscar plantas',
    species: 'Especies',
    cardsLabels: 'Fichas y etiquetas',
    season: 'Temporada',
    myBatches: 'Mis tandas',
    plantShare: 'Reparto de plantas',
  },
  language: {
    label: 'Idioma',
  },
  account: {
    signIn: 'Entrar',
    checking: 'Revisando tu sesión',
    yourAccount: 'Tu cuenta',
    menuLabel: 'Tu cuenta: {{name}}',
    signOut: 'Salir',
  },
  shell: {
    skip: 'Saltar al contenido',
    loadingPage: 'Cargando la página',
    footer: 'Homeground: plantas nativas para tu terreno, cultivadas y compartidas entre vecinos.',
    titleSuffix: '{{title}} · Homeground',
  },
  supplies: {
    none: 'Aún no hay nada que conseguir: no hay tandas.',
    what: 'Qué',
    howMuch: 'Cuánto',
    for: 'Para qué',
    cautions: 'Precauciones',
  },
  states: {
    tryAgain: 'Intentar de nuevo',
  },
  routeError: {
    title: 'Esta página no cargó',
    somethingWrong: 'Algo salió mal.',
    updated:
      'Homeground se actualizó desde que abriste esta pestaña. Vuelve a cargar la página para ver la versión nueva.',
    unexpected: 'Pasó algo inesperado.',
    reload: 'Volver a cargar la página',
  },
  notFound: {
    title: 'No encontramos la página',
    body: 'No hay ninguna página en esta dirección. Puede que se haya movido o que el enlace tenga un error.',
    home: 'Ir a la página de inicio',
  },
  placeholder: {
    notYet: 'Todavía no está disponible.',
    backHome: 'Volver a la página de inicio',
    myBatches:
      'Aquí quienes cultivan verán las tandas que les tocaron y llevarán el registro de lo que sembraron, lo que brotó y lo que ya está listo.',
    plantShare:
      'Aquí tu grupo organizará su reparto de plantas: los vecinos reservan plantas y eligen un horario de recogida, y quienes organizan ven quién se lleva qué.',
  },
  units: {
    tableScrolls: 'En una pantalla estrecha esta tabla se desliza de lado; la primera columna se queda fija.',
  },
} as const satisfies Catalogue<typeof en>;
