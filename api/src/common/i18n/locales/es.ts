import type { ApiCatalogue } from './catalogue.js';
import type { en } from './en.js';

/** Las frases propias de la API en español, con el mismo tono sencillo y cálido (tú). */
export const es = {
  invitations: {
    notOurs: 'Este enlace de invitación no es uno que hayamos enviado, o lo reemplazó uno más nuevo.',
    used: 'Esta invitación ya se usó.',
    expired: 'Esta invitación caducó: pide a quien organiza el grupo que te envíe una nueva.',
    otherAddress: 'Esta invitación se envió a {{email}}: inicia sesión con esa dirección para aceptarla.',
    accountExists: 'Ya hay una cuenta con {{email}}: inicia sesión primero y luego abre el enlace otra vez.',
    needNameAndPassword: 'Para unirte, escribe tu nombre y elige una contraseña.',
    requiredForAccount: 'hace falta para crear tu cuenta',
  },
  validation: {
    pleaseCheck: 'Revisa esto: {{problems}}',
    notAField: 'no es un campo que esta petición acepte',
    utf16: 'es texto UTF-16: guárdalo como "CSV UTF-8" y súbelo otra vez',
    notUtf8: 'no es texto UTF-8 (otra codificación, o no es texto): guárdalo como "CSV UTF-8" y súbelo otra vez',
    fileRequired: 'es obligatorio',
    attachFile: 'Adjunta el archivo en el campo "{{field}}".',
    geojson: {
      notJson: 'no es JSON válido',
      notJsonSentence: 'El archivo no es JSON válido.',
      notCollection: 'debe ser una FeatureCollection de GeoJSON',
      notCollectionSentence: 'Se esperaba una FeatureCollection de GeoJSON con elementos (features).',
      notRegionCode: '"{{code}}" no es un código de nivel III de la EPA (1–85)',
      required: 'es obligatorio',
      twice: '{{code}} aparece dos veces',
      problems: 'El archivo tiene {{count}} problema(s); no se importó nada.',
      notPolygon: 'debe ser un Polygon o un MultiPolygon',
      emptyCoordinates: 'debe ser una lista que no esté vacía',
      notRings: 'debe ser un polígono: una lista de anillos que no esté vacía',
      shortRing: 'un anillo necesita al menos 4 posiciones',
      notPosition: 'debe ser [longitud, latitud] en grados (WGS84)',
      openRing: 'un anillo debe terminar donde empieza',
    },
  },
  places: {
    unknownZipField: '{{zip}} no es un código postal de EE. UU. que conozcamos',
    unknownZip:
      '{{zip}} no es un código postal de EE. UU. que conozcamos. Revisa los cinco dígitos o haz clic en el mapa donde está tu terreno.',
    outsideField: 'queda fuera de los 48 estados contiguos y DC',
    outsideNamed:
      '{{place}} queda fuera del área que cubre Homeground. Homeground cubre los 48 estados contiguos y el Distrito de Columbia, donde la EPA traza sus ecorregiones de nivel III.',
    outsideUnnamed:
      'Ese lugar queda fuera del área que cubre Homeground. Homeground cubre los 48 estados contiguos y el Distrito de Columbia, donde la EPA traza sus ecorregiones de nivel III.',
    notOnLandField: 'no está en tierra dentro de un condado de EE. UU.: en el mar, en un lago grande o fuera del país',
    notOnLandZip:
      'El centro de ese código postal ({{lat}}, {{lon}}) no está en tierra dentro de ningún condado de EE. UU.: está en el mar, en uno de los Grandes Lagos o fuera del país. Homeground cubre los 48 estados contiguos y el Distrito de Columbia, donde la EPA traza sus ecorregiones de nivel III.',
    notOnLandPoint:
      'Ese punto ({{lat}}, {{lon}}) no está en tierra dentro de ningún condado de EE. UU.: está en el mar, en uno de los Grandes Lagos o fuera del país. Homeground cubre los 48 estados contiguos y el Distrito de Columbia, donde la EPA traza sus ecorregiones de nivel III.',
    outside: {
      AK: 'Alaska',
      HI: 'Hawái',
      PR: 'Puerto Rico',
      VI: 'Las Islas Vírgenes de EE. UU.',
      GU: 'Guam',
      AS: 'Samoa Americana',
      MP: 'Las Islas Marianas del Norte',
    },
  },
  refusals: {
    savedMixes: {
      tooMany: 'Ya guardas {{max}} mezclas: borra una que ya no necesites y luego guarda esta.',
      noLink: 'No hay ninguna mezcla guardada con ese enlace: quizá se borró.',
      noId: 'No hay ninguna mezcla guardada con ese id.',
      notYours: 'Solo quien guardó una mezcla puede borrarla.',
    },
    catalogue: {
      ecoregionField: 'no está en el catálogo',
      ecoregion: 'region.ecoregionCode no está en el catálogo',
      slugField: '"{{slug}}" no está en el catálogo',
      slugs: 'No están en el catálogo: {{slugs}}',
    },
    groups: {
      noSlug: 'No hay ningún grupo llamado "{{slug}}".',
      noId: 'No existe ese grupo.',
      membersOnly: 'Solo quienes están en este grupo pueden ver quién lo forma.',
      organiserAdds: 'Solo quien organiza este grupo puede añadirle personas.',
      noAccount: 'Ninguna cuenta usa {{email}}: pídele a esa persona que se registre primero.',
      organiserRemoves: 'Solo quien organiza este grupo puede sacar a personas de él.',
      notInGroup: 'Esa persona no está en este grupo.',
      lastOrganiser: 'Es la única persona que organiza el grupo: nombra antes a otra persona para organizarlo.',
    },
    seasons: {
      noEcoregion: 'Este grupo aún no tiene ecorregión: indica primero su lugar.',
      seasonMembersOnly: 'Solo quienes están en este grupo pueden ver su temporada.',
      planMembersOnly: 'Solo quienes están en este grupo pueden ver su plan de temporada.',
      organiserChanges: 'Solo quien organiza este grupo puede cambiar su plan de temporada.',
      noPlan: '{{group}} aún no tiene plan de temporada: primero alguien que lo organiza fija sus fechas.',
    },
    batches: {
      formerGrower: 'Alguien que ya no cultiva con el grupo',
      ownMethods: 'Quien cultiva fija sus propios métodos y capacidad, no los de otra persona.',
      notAGrower: 'Esa persona no cultiva ni organiza en este grupo.',
      noBatch: 'No existe ese lote en esta temporada.',
      anotherGrower: 'Este lote es de otra persona que cultiva.',
      ownLog: 'Solo quien cultiva este lote lleva su registro.',
      organiserOnly: 'Solo quien organiza este grupo puede hacer esto.',
      growersOnly: 'Los lotes son para quienes cultivan y organizan en este grupo.',
      capacityBelowUsed: 'debe ser al menos {{taken}}: los lotes ya ocupan {{taken}} {{unit}}',
      keepMethod: 'debe conservar {{method}}: hay lotes que lo usan',
      notThisSeason: 'no es un lote de esta temporada',
      notOnTargets: '"{{slug}}" no está entre los objetivos de la temporada',
      notAGrowerField: 'no cultiva en este grupo',
      methodNotUsed: '{{name}} no usa este método',
      overCapacity: 'lleva a {{name}} a {{total}} {{unit}}, y solo puede cuidar {{capacity}}',
      keepLogged: 'debe conservar cada lote que tenga entradas en su registro (inclúyelo con su id)',
      units: { pot: 'macetas', container: 'recipientes cubiertos', block: 'bloques de tierra' },
    },
    invitations: {
      organiserInvites: 'Solo quien organiza este grupo puede invitar a personas.',
      alreadyIn: '{{email}} ya está en {{group}}: cambia su papel en la lista de miembros.',
      organiserSees: 'Solo quien organiza este grupo puede ver sus invitaciones.',
    },
    species: {
      noSpecies: 'No hay ninguna especie "{{slug}}" en el catálogo.',
      noPhoto: '"{{slug}}" aún no tiene foto.',
      photoType: 'Las fotos deben ser JPEG, PNG o WebP; este archivo es {{mime}}.',
      photoUnknownType: 'Las fotos deben ser JPEG, PNG o WebP; este archivo no es una imagen que reconozcamos.',
      photoUnreadable: 'No pudimos leer la foto: puede que el archivo esté dañado.',
      photoTooLarge:
        'La foto mide {{width}} × {{height}} píxeles; las fotos pueden tener como máximo {{megapixels}} megapíxeles. Hazla más pequeña y vuelve a intentarlo.',
      existsEdit: 'La especie "{{slug}}" ya existe: edítala en lugar de crearla.',
      exists: 'La especie "{{slug}}" ya existe.',
      noChange: 'No hay ningún cambio {{changeId}} en el historial de "{{slug}}".',
      firstVersion: 'Este cambio añadió la especie: no hay una versión anterior a la que volver.',
      clash: 'El símbolo USDA {{symbol}} o el nombre {{name}} ya los usa "{{slug}}".',
      unknownSource: '"{{source}}" no está en el registro de fuentes',
      seeRows: 'mira las filas',
      fileProblems: 'El archivo tiene {{count}} problema(s); no se importó nada.',
      csvUnreadable: 'esta fila no se puede leer como CSV ({{reason}})',
      columnMissing: 'falta esta columna en la cabecera',
      noRows: 'el archivo no tiene filas de especies',
      repeatsLine: 'repite la línea {{line}}',
      usedBy: 'ya lo usa "{{slug}}"',
    },
    ecoregions: {
      noRegion: 'No existe la ecorregión de nivel III de la EPA "{{code}}".',
    },
    people: {
      noUser: 'No existe esa cuenta.',
      emailTaken: 'Ya existe una cuenta con este correo: mejor entra con ella.',
      noPerson: 'No existe esa persona.',
      ownRole: 'No puedes cambiar tu propio papel: pídeselo a otra persona administradora.',
      ownAccess: 'No puedes desactivar tu propia cuenta.',
    },
    roles: {
      needs: 'Esto necesita el rol {{roles}}.',
      or: ' o ',
    },
    outbox: {
      readersOnly: 'Solo quienes organizan y administran pueden leer el buzón de salida.',
      noMessage: 'No hay ningún mensaje con ese id en el buzón de salida.',
      messageReaders: 'Solo quienes organizan su grupo y quienes administran pueden leer este mensaje.',
    },
  },
  auth: {
    wrongPassword: 'El correo o la contraseña no son correctos.',
    switchedOff: 'Esta cuenta está desactivada: pídele ayuda a una persona que administre Homeground.',
    tooManyAttempts: 'Demasiados intentos: espera un minuto y vuelve a probar.',
    tooManyWrong_one: 'Demasiadas contraseñas equivocadas para este correo: espera {{count}} minuto y vuelve a probar.',
    tooManyWrong_other:
      'Demasiadas contraseñas equivocadas para este correo: espera {{count}} minutos y vuelve a probar.',
    passwordPersonal: 'no debe contener el nombre de tu correo, tu nombre ni "Homeground"',
    passwordWeak:
      'es demasiado fácil de adivinar (una contraseña común o un patrón sencillo): prueba con tres o cuatro palabras sin relación entre sí',
    linkUnknown:
      'Este enlace de confirmación ya se usó o no lo enviamos nosotros: inicia sesión o vuelve a registrarte.',
    linkOld: 'Este enlace de confirmación tiene más de {{hours}} horas: vuelve a registrarte.',
    alreadyHasAccount: 'Esta dirección ya tiene una cuenta: mejor inicia sesión.',
    confirmMail: {
      thanks:
        'Gracias por unirte a Homeground. Abre el enlace de abajo para confirmar que esta es tu dirección, y tu cuenta quedará lista.',
      hours:
        'El enlace sirve durante {{hours}} horas. Si no te registraste, puedes ignorar este mensaje: no se crea ninguna cuenta.',
      action: 'Confirmar mi dirección',
      subject: 'Confirma tu dirección para Homeground',
    },
    alreadyMail: {
      someone:
        'Alguien pidió crear una cuenta de Homeground con esta dirección, pero ya tienes una, así que nada ha cambiado.',
      ifYou:
        'Si fuiste tú, inicia sesión con tu contraseña. Si no, puedes ignorar este mensaje: tu cuenta sigue como estaba.',
      action: 'Iniciar sesión',
      subject: 'Ya tienes una cuenta de Homeground',
    },
    mailFooter: 'Recibes este correo porque alguien escribió tu dirección en la página de registro de Homeground.',
  },
  share: {
    notes: {
      cautions:
        'Las precauciones aparecen con cada planta, como en su ficha: usa guantes con las plantas de savia irritante y lávate las manos después de tocarlas.',
      dig: 'Antes de cavar, llama al 811 para que marquen las líneas enterradas; las normas de tu pueblo para plantar junto a calles, aceras y desagües van primero.',
    },
  },
  mail: {
    openAddress: 'O abre esta dirección: {{url}}',
    greeting: 'Hola, {{name}}:',
    greetingNoName: 'Hola:',
    reservation: {
      reserved: 'Tus plantas del reparto de plantas de {{group}} están reservadas.',
      changed: 'Tu reserva en el reparto de plantas de {{group}} ha cambiado.',
      slot: 'Horario de recogida: {{when}}.',
      place: 'Lugar: {{place}}.',
      bring: 'Qué traer: {{what}}',
      plants: 'Tus plantas: {{plants}}.',
      care: 'Hoja de cuidados:',
      dig: 'Antes de cavar, llama al 811 para que marquen las líneas enterradas, y sigue las reglas de tu pueblo para plantar junto a calles y banquetas.',
      link: 'Para cambiar tu horario o tus plantas, o para cancelar y que se las lleve alguien de la lista de espera, usa tu enlace privado de abajo. No lo compartas: cualquiera que lo tenga puede cambiar tu reserva.',
      action: 'Cambiar o cancelar tu reserva',
      footer:
        'Recibes este correo porque reservaste plantas de {{group}} en Homeground. Tu nombre y tu correo solo los ven quienes organizan el grupo y se borran después del reparto.',
      subjectChanged: 'Tu reserva en el reparto de plantas de {{group}} ha cambiado',
      subjectReserved: 'Tus plantas están reservadas: reparto de plantas de {{group}}, {{when}}',
    },
    shareChanged: {
      intro: 'Quienes organizan el reparto de plantas de {{group}} han cambiado algo de tu recogida.',
      day: 'El reparto de plantas ahora es el {{now}} (antes era el {{before}}).',
      place: 'El lugar ahora es {{now}} (antes era {{before}}).',
      slot: 'Tu horario de recogida ahora es {{now}} (antes era {{before}}).',
      still: 'Tus plantas siguen reservadas: {{plants}}.',
      link: 'Si el nuevo horario o lugar no te viene bien, cambia tu horario o cancela con tu enlace privado de abajo, para que las plantas pasen a alguien de la lista de espera. Este enlace sustituye al de tus correos anteriores.',
      action: 'Cambiar o cancelar tu reserva',
      subject: 'Un cambio en tu recogida: reparto de plantas de {{group}}',
    },
    offer: {
      free_one:
        'Buenas noticias: se liberó {{count}} × {{plant}} en el reparto de plantas de {{group}} y te la guardamos porque te tocaba en la lista de espera.',
      free_other:
        'Buenas noticias: se liberaron {{count}} × {{plant}} en el reparto de plantas de {{group}} y te las guardamos porque te tocaba en la lista de espera.',
      choose:
        'Abre tu enlace privado para elegir un horario de recogida en {{place}}. Te las guardamos hasta el {{until}}; después pasan a la siguiente familia de la lista. Si ya no las quieres, simplemente ignora este correo.',
      action: 'Elegir tu horario de recogida',
      footer:
        'Recibes este correo porque te anotaste en la lista de espera del reparto de plantas de {{group}}. Tu nombre y tu correo se borran después del reparto.',
      subject: '{{plant}} está libre para ti: reparto de plantas de {{group}}',
    },
    invitation: {
      invited: '{{inviter}} te invitó a unirte a {{group}} en {{town}}, {{state}} en Homeground, como {{role}}.',
      role: { member: 'miembro', grower: 'cultivador/a', organiser: 'organizador/a' },
      what: {
        member: 'Los miembros se enteran cuando abre el reparto de plantas y pueden reservar plantas para su jardín.',
        grower:
          'Quienes cultivan crían una tanda de plantas nativas durante el invierno para el reparto. Homeground te da las fechas de cada paso y un lugar para anotar lo que brota; no hace falta experiencia.',
        organiser:
          'Quienes organizan eligen las especies de la temporada, reparten las tandas y organizan el reparto de plantas.',
      },
      days: 'El enlace de abajo sirve durante {{days}} días. Si no esperabas este mensaje, simplemente ignóralo.',
      action: 'Unirme a {{group}}',
      footer:
        'Recibes este correo porque alguien que organiza {{group}} escribió tu dirección. Homeground no te enviará nada más a menos que te unas.',
      subject: '{{inviter}} te invita a {{group}}',
    },
  },
} as const satisfies ApiCatalogue<typeof en>;
