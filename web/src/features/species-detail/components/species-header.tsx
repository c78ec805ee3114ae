import { capitalise, SPECIES_TAG_WORDS } from '@homeground/shared';
import { Badge, makeStyles, tokens } from '@fluentui/react-components';
import { DocumentText20Regular } from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { RouterButton } from '../../../components/links/router-link.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { paths } from '../../../config/paths.js';
import { hgTokens } from '../../../theme/index.js';
import { SECTION_FIELDS } from '../utils/source-labels.js';
import { FactList } from './fact-list.js';
import { SourceNote } from './source-note.js';
import { SpeciesPhoto } from './species-photo.js';

const useStyles = makeStyles({
  card: {
    display: 'grid',
    gridTemplateColumns: 'minmax(240px, 400px) 1fr',
    gap: tokens.spacingHorizontalXXL,
    alignItems: 'start',
    '@media (max-width: 720px)': { gridTemplateColumns: '1fr' },
  },
  title: { marginBottom: tokens.spacingVerticalXXS },
  scientific: {
    fontStyle: 'italic',
    fontSize: tokens.fontSizeBase500,
    margin: `0 0 ${tokens.spacingVerticalM}`,
    color: hgTokens.hgColorLoam,
  },
  tags: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS, marginBottom: tokens.spacingVerticalM },
  bloom: { margin: `${tokens.spacingVerticalL} 0` },
  bloomWords: { margin: `${tokens.spacingVerticalXS} 0 0` },
  action: { marginTop: tokens.spacingVerticalL },
});

/** Photo, names, bloom strip and the page's one primary action: making its fact card. */
export function SpeciesHeader({
  species,
  bloomStrip,
  bloomWords,
}: {
  species: SpeciesDetail;
  bloomStrip: ReactNode;
  bloomWords: string;
}) {
  const styles = useStyles();
  const [name, ...otherNames] = species.commonNames;
  const facts: [string, ReactNode][] = [];
  if (otherNames.length > 0) facts.push(['Also called', otherNames.join(', ')]);
  facts.push(['Family', species.family]);
  if (species.synonyms.length > 0) facts.push(['Synonyms', <i key="syn">{species.synonyms.join(', ')}</i>]);
  facts.push(['USDA symbol', species.usdaSymbol]);
  for (const r of species.reconciliations)
    facts.push([`Note on ${r.field === 'nativeStates' ? 'range' : r.field}`, r.note]);
  const colours = species.flowerColours.join(' and ');

  return (
    <ContentCard className={styles.card} aria-label={`${capitalise(name ?? species.scientificName)} at a glance`}>
      <SpeciesPhoto species={species} />
      <div>
        <Heading level="page" className={styles.title}>
          {capitalise(name ?? species.scientificName)}
        </Heading>
        <p className={styles.scientific} lang="la">
          {species.scientificName}
        </p>
        {species.tags.length > 0 ? (
          <div className={styles.tags}>
            {species.tags.map((t) => (
              <Badge key={t} appearance="tint" color="brand" shape="rounded">
                {SPECIES_TAG_WORDS[t]}
              </Badge>
            ))}
          </div>
        ) : null}
        <FactList facts={facts} />
        <SourceNote sources={species.sources} fields={SECTION_FIELDS.names} />
        <div className={styles.bloom}>
          {bloomStrip}
          <p className={styles.bloomWords}>
            {bloomWords}
            {colours ? `; ${colours} flowers` : ''}.
          </p>
          <SourceNote sources={species.sources} fields={SECTION_FIELDS.bloom} />
        </div>
        <RouterButton
          to={paths.cardsLabels.build({ species: [species.slug] })}
          appearance="primary"
          icon={<DocumentText20Regular />}
          className={styles.action}
        >
          Make fact card
        </RouterButton>
      </div>
    </ContentCard>
  );
}
