import type { Catalogue } from '../catalogue.js';
import type { people as en } from '../en/people.js';

/** La página de personas de quien administra. */
export const people = {
  page: {
    title: 'Personas',
    intro: 'Cuentas, funciones y actividad de inicio de sesión en todo Homeground.',
    notAdmin: 'Esta página es para quienes administran Homeground.',
    loading: 'Comprobando tu sesión',
  },
  list: {
    heading: 'Todas las personas con cuenta',
    switchHint:
      'Desactivar una cuenta cierra la sesión de esa persona al momento; sus grupos y su historial se quedan.',
    roleLine: '{{title}}: {{does}}',
    loading: 'Cargando personas',
    error: 'La lista de personas no se cargó.',
    scrollRegion: 'Personas; en el teléfono se desplaza de lado',
  },
  columns: {
    name: 'Nombre',
    email: 'Correo',
    role: 'Función',
    groups: 'Grupos',
    lastSignIn: 'Último inicio de sesión',
    account: 'Cuenta',
  },
  row: {
    you: '{{name}} (tú)',
    roleOf: 'Función de {{name}}',
    groupRole: '{{group}} ({{role}})',
    noGroups: 'Ninguno',
    never: 'Nunca',
    held: '{{last}} · en pausa tras demasiadas contraseñas equivocadas',
    off: 'Desactivada',
    switchOn: 'Activar',
    switchOff: 'Desactivar',
    switchOnLabel: 'Activar la cuenta de {{name}}',
    switchOffLabel: 'Desactivar la cuenta de {{name}}',
  },
} as const satisfies Catalogue<typeof en>;
