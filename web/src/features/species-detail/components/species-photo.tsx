import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { PHOTO_LICENCE_WORDS, PHOTO_SIZES } from '@homeground/shared';
import { useState } from 'react';
import { speciesPhotoUrl, type SpeciesDetail } from '../../../api/species/species.api.js';
import { hgTokens } from '../../../theme/index.js';
import { PlantDrawing } from './plant-drawing.js';

const useStyles = makeStyles({
  figure: { margin: 0 },
  frame: {
    aspectRatio: '4 / 3',
    width: '100%',
    borderRadius: tokens.borderRadiusXLarge,
    overflow: 'hidden',
    backgroundColor: hgTokens.hgColorPaper,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  img: { display: 'block', width: '100%', height: '100%', objectFit: 'cover' },
  caption: {
    marginTop: tokens.spacingVerticalXS,
    fontSize: tokens.fontSizeBase200,
    color: tokens.colorNeutralForeground2,
  },
});

/** The species' photo at 800 px, or our drawing in its flower colour when there is none (or it fails). */
export function SpeciesPhoto({ species }: { species: SpeciesDetail }) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const words = useWords();
  const [hasFailed, setFailed] = useState(false);
  const name = species.commonNames[0] ?? species.scientificName;
  const showPhoto = species.hasPhoto && !hasFailed;
  const colours = words.join(species.flowerColours.map((c) => words.flowerColour[c]));
  return (
    <figure className={styles.figure}>
      <div className={styles.frame}>
        {showPhoto ? (
          <img
            className={styles.img}
            src={speciesPhotoUrl(species.slug, PHOTO_SIZES.detail)}
            alt={t('header.photoAlt', { name, scientific: species.scientificName })}
            onError={() => setFailed(true)}
          />
        ) : (
          <PlantDrawing
            flowerColours={species.flowerColours}
            label={colours ? t('header.drawingColours', { colours }) : t('header.drawing')}
          />
        )}
      </div>
      <figcaption className={styles.caption}>
        {showPhoto && species.photoCredit ? (
          <>
            {name}.{' '}
            {t('header.photoCredit', {
              photographer: species.photoCredit.photographer,
              licence: PHOTO_LICENCE_WORDS[species.photoCredit.licence],
            })}{' '}
            (
            <a
              href={species.photoCredit.sourceUrl}
              rel="noopener noreferrer"
              target="_blank"
              aria-label={t('header.photoSourceLabel')}
            >
              {t('header.photoSource')}
            </a>
            ).
          </>
        ) : showPhoto ? (
          t('header.photoFromCatalogue', { name })
        ) : (
          t('header.noPhoto', { count: species.flowerColours.length })
        )}
      </figcaption>
    </figure>
  );
}
