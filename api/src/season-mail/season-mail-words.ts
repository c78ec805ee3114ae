import type { BatchStepKind, GrowerMethod } from '@homeground/shared';

/**
 * The languages season e-mails are written in. Each e-mail's words are one object keyed by the
 * recipient's language, self-contained here, so the API's language choice can be wired in later
 * without touching the texts.
 */
export const MAIL_LANGUAGES = ['en', 'es'] as const;
export type MailLanguage = (typeof MAIL_LANGUAGES)[number];

/** A calendar day in the reader's language: "Tuesday, April 27" / "martes, 27 de abril". */
export function mailDate(day: string, lang: MailLanguage): string {
  return new Intl.DateTimeFormat(lang === 'es' ? 'es-US' : 'en-US', {
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    timeZone: 'UTC',
  }).format(new Date(`${day}T00:00:00Z`));
}

/** What to do on a frosty night, by method (ordinary home-grower practice, from memory). */
const FROST_ACTIONS = {
  en: {
    'winter-sowing': 'close the container tops before evening',
    'outdoor-pot-winter': 'cover the pots with frost cloth or an old sheet, or move them against the house',
    'indoor-lights': 'bring seedlings that are hardening off indoors for the night',
    'soil-blocks': 'bring blocks that are hardening off indoors for the night',
  },
  es: {
    'winter-sowing': 'cierra las tapas de los contenedores antes del anochecer',
    'outdoor-pot-winter':
      'cubre las macetas con manta antiheladas o una sábana vieja, o acércalas a la pared de la casa',
    'indoor-lights': 'mete en casa por la noche las plántulas que se están endureciendo',
    'soil-blocks': 'mete en casa por la noche los bloques que se están endureciendo',
  },
} as const satisfies Record<MailLanguage, Record<GrowerMethod, string>>;

/** The frost warning an organiser sends to growers with batches outdoors. */
export const FROST_WARNING_WORDS = {
  en: {
    subject: (group: string, night: string) => `Frost tonight? Protect your seedlings: ${group}, ${night}`,
    greeting: (name: string) => `Hello ${name},`,
    lead: (organiser: string, night: string) =>
      `${organiser} sends a frost warning: frost is forecast for the night of ${night}. Your batches outdoors need a hand before dark.`,
    batchLine: (plant: string, method: GrowerMethod) => `${plant}: ${FROST_ACTIONS.en[method]}.`,
    note: (organiser: string, note: string) => `${organiser} adds: ${note}`,
    after: 'Uncover or open them again in the morning once the frost has lifted, so they do not overheat.',
    caution: 'Check your local forecast; frost settles first in low, open spots on clear, still nights.',
    action: 'Open my batches',
    footer: (group: string) =>
      `You got this e-mail because you grow batches for ${group} on Homeground. Your organiser sends frost warnings only when frost is forecast.`,
  },
  es: {
    subject: (group: string, night: string) => `¿Helada esta noche? Protege tus plántulas: ${group}, ${night}`,
    greeting: (name: string) => `Hola, ${name}:`,
    lead: (organiser: string, night: string) =>
      `${organiser} avisa de helada: se espera helada la noche del ${night}. Tus lotes al aire libre necesitan una mano antes de que oscurezca.`,
    batchLine: (plant: string, method: GrowerMethod) => `${plant}: ${FROST_ACTIONS.es[method]}.`,
    note: (organiser: string, note: string) => `${organiser} añade: ${note}`,
    after: 'Destápalos o ábrelos otra vez por la mañana, cuando pase la helada, para que no se recalienten.',
    caution:
      'Consulta el pronóstico de tu zona; la helada se asienta primero en sitios bajos y abiertos en noches claras y sin viento.',
    action: 'Abrir mis lotes',
    footer: (group: string) =>
      `Recibes este correo porque cultivas lotes para ${group} en Homeground. Tu organizadora solo envía avisos de helada cuando se pronostica.`,
  },
} as const satisfies Record<MailLanguage, unknown>;

/** Step names in the weekly summary (the same steps as the batch page). */
const STEP_NAMES = {
  en: {
    'start-warm': 'Start warm-moist stratifying',
    'start-stratifying': 'Start stratifying in the refrigerator',
    'check-sprouts': 'Check the seed for sprouts',
    sow: 'Sow',
    'vent-containers': 'Vent the containers on warm days, close them before a frost',
    'sprouts-expected': 'Sprouts expected',
    'pot-up': 'Pot up',
    'harden-off': 'Harden off',
    'frost-watch': 'Frost watch: protect from a late frost',
    ready: 'Ready to give',
  },
  es: {
    'start-warm': 'Empezar la estratificación cálida y húmeda',
    'start-stratifying': 'Empezar a estratificar en el refrigerador',
    'check-sprouts': 'Revisar si las semillas han brotado',
    sow: 'Sembrar',
    'vent-containers': 'Ventilar los contenedores en días templados y cerrarlos antes de una helada',
    'sprouts-expected': 'Se esperan los brotes',
    'pot-up': 'Trasplantar a maceta',
    'harden-off': 'Endurecer (aclimatar al exterior)',
    'frost-watch': 'Vigilancia de heladas: proteger de una helada tardía',
    ready: 'Listas para regalar',
  },
} as const satisfies Record<MailLanguage, Record<BatchStepKind, string>>;

/** The weekly summary of a grower's next steps. */
export const WEEKLY_SUMMARY_WORDS = {
  en: {
    subject: (group: string) => `Your batches this week: ${group}`,
    greeting: (name: string) => `Hello ${name},`,
    lead: 'Here is what is next for your batches.',
    step: (plant: string, kind: BatchStepKind, date: string) => `${plant}: ${STEP_NAMES.en[kind]}, ${date}.`,
    allDone: (plant: string) => `${plant}: every step is done. Thank you!`,
    behind: (plant: string, words: string) => `${plant}: ${words}`,
    logReminder:
      'When you sow, see sprouts, pot up or lose plants, add it to the batch log: it keeps the forecast true.',
    action: 'Open my batches',
    footer: (group: string) =>
      `You got this e-mail because you grow batches for ${group} on Homeground. It comes once a week while you have batches.`,
  },
  es: {
    subject: (group: string) => `Tus lotes esta semana: ${group}`,
    greeting: (name: string) => `Hola, ${name}:`,
    lead: 'Esto es lo que sigue para tus lotes.',
    step: (plant: string, kind: BatchStepKind, date: string) => `${plant}: ${STEP_NAMES.es[kind]}, ${date}.`,
    allDone: (plant: string) => `${plant}: todos los pasos están hechos. ¡Gracias!`,
    // The batch's own "behind" words, which the service asks for in Spanish for a Spanish reader.
    behind: (plant: string, words: string) => `${plant}: ${words}`,
    logReminder:
      'Cuando siembres, veas brotes, trasplantes o pierdas plantas, anótalo en el registro del lote: así el pronóstico sigue siendo fiel.',
    action: 'Abrir mis lotes',
    footer: (group: string) =>
      `Recibes este correo porque cultivas lotes para ${group} en Homeground. Llega una vez por semana mientras tengas lotes.`,
  },
} as const satisfies Record<MailLanguage, unknown>;
