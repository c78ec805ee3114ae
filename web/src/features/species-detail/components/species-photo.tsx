import { makeStyles, tokens } from '@fluentui/react-components';
import { photoCreditLine } from '@homeground/shared';
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
  const [hasFailed, setFailed] = useState(false);
  const name = species.commonNames[0] ?? species.scientificName;
  const showPhoto = species.hasPhoto && !hasFailed;
  const colours = species.flowerColours.join(' and ');
  return (
    <figure className={styles.figure}>
      <div className={styles.frame}>
        {showPhoto ? (
          <img
            className={styles.img}
            src={speciesPhotoUrl(species.slug, 800)}
            alt={`${name} (${species.scientificName})`}
            onError={() => setFailed(true)}
          />
        ) : (
          <PlantDrawing
            flowerColours={species.flowerColours}
            label={`Drawing of a flowering plant${colours ? ` with ${colours} flowers` : ''}`}
          />
        )}
      </div>
      <figcaption className={styles.caption}>
        {showPhoto && species.photoCredit ? (
          <>
            {name}. {photoCreditLine(species.photoCredit)} (
            <a
              href={species.photoCredit.sourceUrl}
              rel="noopener noreferrer"
              target="_blank"
              aria-label="source of the photo (opens in a new tab)"
            >
              source
            </a>
            ).
          </>
        ) : showPhoto ? (
          `${name}, photo from the catalogue.`
        ) : (
          `No photo yet: a drawing in its flower colour${species.flowerColours.length > 1 ? 's' : ''}.`
        )}
      </figcaption>
    </figure>
  );
}
