import type { Catalogue } from '../catalogue.js';
import type { groups as en } from '../en/groups.js';

/** La página de un grupo de cultivo y la que abre el enlace de una invitación. */
export const groups = {
  page: {
    loading: 'Cargando el grupo',
    error: 'El grupo no se cargó.',
    intro_one: 'Un grupo comunitario de cultivo en {{town}}, {{state}}{{ecoregion}}: {{count}} persona.',
    intro_other: 'Un grupo comunitario de cultivo en {{town}}, {{state}}{{ecoregion}}: {{count}} personas.',
    ecoregion: ', ecorregión {{code}}',
    invite: 'Invitar a alguien',
    people: 'Personas',
    peopleLoading: 'Cargando a las personas',
    peopleError: 'La lista de miembros no se cargó.',
  },
  members: {
    label: 'Personas del grupo',
    name: 'Nombre',
    role: 'Papel',
    email: 'Correo',
    takeOut: 'Sacar',
    removeName: 'Sacar a {{name}} del grupo',
    remove: 'Sacar',
    confirmTitle: '¿Sacar a {{name}}?',
    confirmText: 'Deja el grupo y su temporada; su cuenta se queda. Puedes volver a invitarle más adelante.',
    keep: 'Dejarle en el grupo',
  },
  invite: {
    label: 'Invitar a alguien a {{group}}',
    email: 'Su correo',
    role: 'Papel en el grupo',
    sending: 'Enviando…',
    send: 'Enviar la invitación',
    sent: 'Enviada. {{email}} tiene {{days}} días para abrir el enlace.',
  },
  invitation: {
    loading: 'Abriendo tu invitación',
    cannotUse: 'Esta invitación no se puede usar.',
    title: 'Únete a {{group}}',
    invited: 'Te invitan a unirte a {{group}} en {{town}}, {{state}} como {{role}}. Lo que hace: {{does}}',
    roleWithArticle: { member: 'miembro', grower: 'cultivador/a', organiser: 'organizador/a' },
    accept: 'Aceptar la invitación',
    signedInAs: 'Iniciaste sesión como {{email}}.',
    join: 'Unirme a {{group}}',
    otherAccount:
      'Esta invitación se envió a {{invited}}, pero iniciaste sesión como {{email}}. Cierra la sesión, abre el enlace otra vez e inicia sesión con {{invited}}.',
    hasAccount: 'Ya tienes una cuenta con {{email}}. Inicia sesión y volverás directo aquí.',
    signInToJoin: 'Inicia sesión para unirte',
    makeAccountLabel: 'Crea tu cuenta y únete a {{group}}',
    accountUses: 'Tu cuenta usará {{email}}. Elige el nombre que verá tu grupo y una contraseña.',
    yourName: 'Tu nombre',
    password: 'Contraseña',
    joining: 'Uniéndote…',
    makeAndJoin: 'Crear mi cuenta y unirme',
  },
} as const satisfies Catalogue<typeof en>;
