/** The API's own sentences in English (the shared engine's reasons have their own twins in shared). */
export const en = {
  places: {
    unknownZipField: '{{zip}} is not a US ZIP code we know',
    unknownZip: '{{zip}} is not a US ZIP code we know. Check the five digits, or click the map where your ground is.',
    outsideField: 'is outside the 48 conterminous states and DC',
    outsideNamed:
      '{{place}} is outside the area Homeground covers. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.',
    outsideUnnamed:
      'That place is outside the area Homeground covers. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.',
    notOnLandField: 'is not on land in a US county: at sea, on a large lake or outside the United States',
    notOnLandZip:
      "That ZIP code's centre ({{lat}}, {{lon}}) is not on land in any US county: it is at sea, on one of the Great Lakes or outside the United States. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.",
    notOnLandPoint:
      'That point ({{lat}}, {{lon}}) is not on land in any US county: it is at sea, on one of the Great Lakes or outside the United States. Homeground covers the 48 conterminous states and the District of Columbia, where the EPA maps its Level III ecoregions.',
    outside: {
      AK: 'Alaska',
      HI: 'Hawaii',
      PR: 'Puerto Rico',
      VI: 'The US Virgin Islands',
      GU: 'Guam',
      AS: 'American Samoa',
      MP: 'The Northern Mariana Islands',
    },
  },
} as const;
