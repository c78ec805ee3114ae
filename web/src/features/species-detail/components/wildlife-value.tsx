import { makeStyles, tokens } from '@fluentui/react-components';
import { LeafOne20Regular } from '@fluentui/react-icons';
import { beeWords, caterpillarWords } from '@homeground/shared';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { SECTION_FIELDS, shortCitation } from '../utils/source-labels.js';
import { FactSection } from './fact-section.js';
import { SourceNote } from './source-note.js';

const useStyles = makeStyles({
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalS },
});

/**
 * The caterpillar-host sentence in words, judged within the plant's layer (wildflowers or shrubs
 * and trees), with its citation: never the raw genus count (shared wildlife-value.ts).
 */
export function hostSentence(species: SpeciesDetail, sourceKey: string | undefined): string {
  const cite = sourceKey ? ` — ${shortCitation(sourceKey)}` : '';
  if (species.wildlife.lepidopteraGenusCount === null)
    return `Its genus is not listed in the caterpillar-host lists${cite}.`;
  const words = caterpillarWords(species);
  if (words === null) return `No moth or butterfly caterpillars are recorded on its genus${cite}.`;
  return `${words.replace(/\.$/, '')}${cite}.`;
}

/** What the plant feeds: caterpillars, monarchs, pollinators, birds and specialist bees. */
export function WildlifeValue({ species }: { species: SpeciesDetail }) {
  const styles = useStyles();
  const w = species.wildlife;
  return (
    <FactSection title="Wildlife value" icon={<LeafOne20Regular />}>
      <ul className={styles.list}>
        <li>{hostSentence(species, species.sources['wildlife.lepidopteraGenusCount'])}</li>
        {beeWords(species) ? <li>Bees: {beeWords(species)}</li> : null}
        <li>
          {w.monarchHost ? 'Monarch host plant: monarch caterpillars feed on its leaves.' : 'Not a monarch host plant.'}
        </li>
        {w.pollinators ? <li>{w.pollinators}</li> : null}
        {w.birds ? <li>{w.birds}</li> : null}
        {w.specialistBees.length > 0 ? (
          <li>
            Specialist bees that gather pollen only from this plant group:{' '}
            {w.specialistBees.map((bee, i) => (
              <span key={bee}>
                {i > 0 ? (i === w.specialistBees.length - 1 ? ' and ' : ', ') : ''}
                <i>{bee}</i>
              </span>
            ))}
            .
          </li>
        ) : null}
      </ul>
      <SourceNote sources={species.sources} fields={SECTION_FIELDS.wildlife} />
    </FactSection>
  );
}
