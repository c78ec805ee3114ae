import { z } from 'zod';

/**
 * A species record set beside the open reference data (USDA PLANTS, Tallamy & Shropshire 2009,
 * SylvanSeeds). Each check says what the record holds, what the reference says, whether they agree,
 * and the record's own note where it knowingly differs.
 */
export const REFERENCE_CHECK_FIELDS = [
  'usdaSymbol',
  'scientificName',
  'family',
  'nativeStates',
  'heightCm',
  'bloomMonths',
  'sun',
  'moisture',
  'germination.seedsPerPound',
  'wildlife.lepidopteraGenusCount',
  'germination.germinationRatePct',
] as const;
export type ReferenceCheckField = (typeof REFERENCE_CHECK_FIELDS)[number];

/** agrees / differs by the rule named in `rule`; `shown` is set beside the record for reading, never judged. */
export const REFERENCE_VERDICTS = ['agrees', 'differs', 'no-reference', 'shown'] as const;
export type ReferenceVerdict = (typeof REFERENCE_VERDICTS)[number];

export const referenceCheckSchema = z.object({
  field: z.enum(REFERENCE_CHECK_FIELDS),
  /** The reference file the value was read from, e.g. `usda_plants_characteristics.csv`. */
  file: z.string(),
  /** The sources registry key for that publication. */
  source: z.string(),
  record: z.string(),
  reference: z.string(),
  verdict: z.enum(REFERENCE_VERDICTS),
  /** How the two are compared, in words (e.g. "USDA's height within the record's range widened by a fifth"). */
  rule: z.string(),
  /** The record's note on this field where it knowingly differs, else null. */
  reconciliation: z.string().nullable(),
});
export type ReferenceCheck = z.infer<typeof referenceCheckSchema>;

export const referenceComparisonSchema = z.object({
  slug: z.string(),
  scientificName: z.string(),
  commonName: z.string(),
  checks: z.array(referenceCheckSchema),
});
export type ReferenceComparison = z.infer<typeof referenceComparisonSchema>;

/** A difference the record does not explain: the curator's work list. */
export const isUnexplained = (c: ReferenceCheck): boolean => c.verdict === 'differs' && c.reconciliation === null;

export const referenceStatusSchema = z.object({
  /** False when reference files are missing where they are configured; `missingFiles` names them. */
  available: z.boolean(),
  missingFiles: z.array(z.string()),
});

export const recordReferenceAnswerSchema = referenceStatusSchema.extend({
  comparison: referenceComparisonSchema.nullable(),
});
export type RecordReferenceAnswer = z.infer<typeof recordReferenceAnswerSchema>;

export const unexplainedDisagreementsSchema = referenceStatusSchema.extend({
  /** Records compared, and how many differences none of them explains yet. */
  compared: z.number().int(),
  count: z.number().int(),
  /** Each record with at least one unexplained difference, with only those checks. */
  records: z.array(referenceComparisonSchema),
});
export type UnexplainedDisagreements = z.infer<typeof unexplainedDisagreementsSchema>;
