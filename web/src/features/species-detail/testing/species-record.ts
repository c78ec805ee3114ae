import type { SpeciesDetail } from '../../../api/species/species.api.js';

// The catalogue record species-data/species/asclepias-tuberosa.json as GET /api/species/:slug
// answers it (plus hasPhoto). Tests check the page shows these values and their sources.
export const butterflyMilkweedRecord: SpeciesDetail = {
  "slug": "asclepias-tuberosa",
  "scientificName": "Asclepias tuberosa",
  "usdaSymbol": "ASTU",
  "family": "Apocynaceae",
  "commonNames": [
    "butterfly milkweed",
    "butterfly weed",
    "orange milkweed"
  ],
  "synonyms": [
    "Asclepias decumbens"
  ],
  "growthForm": "forb",
  "lifespan": "perennial",
  "heightCm": {
    "min": 30,
    "max": 75
  },
  "spreadCm": {
    "min": 30,
    "max": 60
  },
  "bloomMonths": [
    6,
    7,
    8
  ],
  "flowerColours": [
    "orange"
  ],
  "sun": [
    "full",
    "part"
  ],
  "moisture": [
    "dry",
    "medium"
  ],
  "sunOptimum": [
    "full"
  ],
  "moistureOptimum": [
    "dry"
  ],
  "wetlandIndicator": null,
  "needsAcidSoil": false,
  "soilTextures": [
    "sand",
    "loam",
    "rocky"
  ],
  "nativeStates": [
    "AL",
    "AZ",
    "AR",
    "CA",
    "CO",
    "CT",
    "DE",
    "DC",
    "FL",
    "GA",
    "IL",
    "IN",
    "IA",
    "KS",
    "KY",
    "LA",
    "ME",
    "MD",
    "MA",
    "MI",
    "MN",
    "MS",
    "MO",
    "NE",
    "NH",
    "NJ",
    "NM",
    "NY",
    "NC",
    "OH",
    "OK",
    "PA",
    "RI",
    "SC",
    "SD",
    "TN",
    "TX",
    "UT",
    "VT",
    "VA",
    "WV",
    "WI"
  ],
  "ecoregions": [
    "23",
    "25",
    "27",
    "28",
    "29",
    "32",
    "33",
    "34",
    "35",
    "36",
    "37",
    "38",
    "39",
    "40",
    "44",
    "45",
    "46",
    "47",
    "48",
    "49",
    "50",
    "51",
    "52",
    "53",
    "54",
    "55",
    "56",
    "57",
    "58",
    "59",
    "60",
    "61",
    "62",
    "63",
    "64",
    "65",
    "66",
    "67",
    "68",
    "69",
    "70",
    "71",
    "72",
    "73",
    "74",
    "75",
    "79",
    "82",
    "83",
    "84"
  ],
  "habitats": [
    "prairie",
    "sand-prairie",
    "savanna",
    "glade",
    "old-field"
  ],
  "wildlife": {
    "lepidopteraGenusCount": 12,
    "monarchHost": true,
    "pollinators": "Nectar for butterflies, bumble bees and many native bees in early to mid summer.",
    "birds": "Hummingbirds visit the flowers.",
    "specialistBees": []
  },
  "spreadHabit": "clumping",
  "selfSows": false,
  "commercialAvailability": "routine",
  "protectedIn": [],
  "deerResistance": "high",
  "germination": {
    "treatments": [
      {
        "kind": "cold-moist",
        "days": 30,
        "note": "Chill damp, never dry: dry chilling gives far poorer germination."
      }
    ],
    "needsLight": false,
    "sowingDepthMm": 6,
    "seedsPerPound": 70000,
    "germinationRatePct": 60,
    "methods": [
      "winter-sowing",
      "outdoor-pot-winter",
      "indoor-lights",
      "direct-seed"
    ]
  },
  "cautions": [
    {
      "kind": "sap-irritant",
      "text": "Milky sap can injure the eye hours after contact: keep it off your face and wash hands after handling stems and pods.",
      "source": "uf-milkweed-toxicity-2019"
    },
    {
      "kind": "toxic-if-eaten",
      "text": "Contains cardiac glycosides and is listed in an extension poisonous-plant manual: poisonous to people, pets and livestock that eat it, especially dried in hay. Keep it out of pasture and hay fields.",
      "source": "auburn-poisonous-plants"
    },
    {
      "kind": "look-alike",
      "text": "Tropical milkweed (Asclepias curassavica), sold in garden centres, is not native here and is not allowed in federal monarch plantings: it keeps flowering into winter, which can disrupt migration and spread a monarch parasite. Check the label for this native species.",
      "source": "nrcs-e327136z2"
    }
  ],
  "tags": [
    "keystone"
  ],
  "sources": {
    "usdaSymbol": "usda-plants",
    "family": "apg-iv-2016",
    "nativeStates": "usda-plants",
    "ecoregions": "from-memory",
    "growthForm": "usda-plants",
    "lifespan": "usda-plants",
    "heightCm": "from-memory",
    "bloomMonths": "from-memory",
    "flowerColours": "usda-plants-characteristics",
    "sun": "from-memory",
    "moisture": "from-memory",
    "sunOptimum": "from-memory",
    "moistureOptimum": "from-memory",
    "wetlandIndicator": "from-memory",
    "soilTextures": "from-memory",
    "habitats": "from-memory",
    "wildlife.lepidopteraGenusCount": "tallamy-shropshire-2009",
    "wildlife.monarchHost": "xerces-milkweeds-2014",
    "spreadHabit": "from-memory",
    "commercialAvailability": "usda-plants-characteristics",
    "protectedIn": "from-memory",
    "deerResistance": "from-memory",
    "germination.treatments": "xerces-milkweeds-2014",
    "germination.seedsPerPound": "usda-plants-characteristics",
    "germination.germinationRatePct": "from-memory"
  },
  "reconciliations": [],
  "hasPhoto": false
};
