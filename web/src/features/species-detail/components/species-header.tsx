import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { capitalise, type SourcedField } from '@homeground/shared';
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
  const { t } = useTranslation('detail');
  const words = useWords();
  const [name, ...otherNames] = species.commonNames;
  const facts: [string, ReactNode][] = [];
  if (otherNames.length > 0) facts.push([t('header.alsoCalled'), otherNames.join(', ')]);
  facts.push([t('header.family'), species.family]);
  if (species.synonyms.length > 0) facts.push([t('header.synonyms'), <i key="syn">{species.synonyms.join(', ')}</i>]);
  facts.push([t('header.usdaSymbol'), species.usdaSymbol]);
  for (const r of species.reconciliations)
    facts.push([t('header.noteOn', { field: words.sourcedField[r.field as SourcedField] ?? r.field }), r.note]);
  const colours = words.join(species.flowerColours.map((c) => words.flowerColour[c]));

  return (
    <ContentCard
      className={styles.card}
      aria-label={t('header.atAGlance', { name: capitalise(name ?? species.scientificName) })}
    >
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
            {species.tags.map((tag) => (
              <Badge key={tag} appearance="tint" color="brand" shape="rounded">
                {words.speciesTag[tag]}
              </Badge>
            ))}
          </div>
        ) : null}
        <FactList facts={facts} />
        <SourceNote sources={species.sources} fields={SECTION_FIELDS.names} />
        <div className={styles.bloom}>
          {bloomStrip}
          <p className={styles.bloomWords}>
            {colours
              ? t('header.bloomWithColours', { bloom: bloomWords, colours })
              : t('header.bloomOnly', { bloom: bloomWords })}
          </p>
          <SourceNote sources={species.sources} fields={SECTION_FIELDS.bloom} />
        </div>
        <RouterButton
          to={paths.cardsLabels.build({ species: [species.slug] })}
          appearance="primary"
          icon={<DocumentText20Regular />}
          className={styles.action}
        >
          {t('header.makeCard')}
        </RouterButton>
      </div>
    </ContentCard>
  );
}
