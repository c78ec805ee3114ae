import type { ApiCatalogue } from './catalogue.js';
import type { en } from './en.js';

/** Las frases propias de la API en español, con el mismo tono sencillo y cálido (tú). */
export const es = {
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
} as const satisfies ApiCatalogue<typeof en>;
