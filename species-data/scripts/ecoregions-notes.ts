/** Reads the hand-curated ecoregion notes (parents, plant communities, descriptions) and checks them. */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { habitatSchema } from '@homeground/shared';
import { z } from 'zod';

const levelSchema = z.object({ code: z.string(), name: z.string().min(3) });

const notesSchema = z.object({
  /** Source key for every hand-written part of the notes. */
  source: z.string(),
  level1: z.array(levelSchema).min(1),
  level2: z.array(levelSchema).min(1),
  regions: z.array(
    z.object({
      code: z.string(),
      /** The EPA name, repeated so a curator sees which region a line is about; the build checks it. */
      name: z.string(),
      level2: z.string().regex(/^\d+\.\d+$/),
      plantCommunities: z.array(habitatSchema).min(1),
      description: z.string().min(20),
    }),
  ),
});
export type EcoregionNotes = z.infer<typeof notesSchema>;

export function readNotes(file: string): EcoregionNotes {
  const notes = notesSchema.parse(JSON.parse(readFileSync(file, 'utf8')));
  const l1 = new Set(notes.level1.map((l) => l.code));
  const l2 = new Set(notes.level2.map((l) => l.code));
  for (const l of notes.level2) {
    if (!l1.has(l.code.split('.')[0]))
      throw new Error(`${path.basename(file)}: Level II ${l.code} has no Level I parent`);
  }
  for (const r of notes.regions) {
    if (!l2.has(r.level2))
      throw new Error(`${path.basename(file)}: region ${r.code} names unknown Level II ${r.level2}`);
  }
  return notes;
}
