import { mergeClasses } from '@fluentui/react-components';
import {
  ArrowAutofitHeight20Regular,
  Drop16Regular,
  LeafTwo16Regular,
  Warning16Regular,
  WeatherSunny16Regular,
} from '@fluentui/react-icons';
import {
  bloomWords,
  capitalise,
  CAUTION_WORDS,
  formatHeightRangeCm,
  genusOf,
  moisturePhrase,
  sowingDepthSentence,
  sowingMethodsPhrase,
  sunPhrase,
} from '@homeground/shared';
import { useId, useRef } from 'react';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { flowerSwatch } from '../../../theme/flower-colours.js';
import { useFitLevel } from '../hooks/use-fit-level.js';
import type { QrEncoderState } from '../hooks/use-qr-encoder.js';
import { flowerColourWords, hostWords } from '../utils/card-words.js';
import { speciesPageUrl } from '../utils/species-url.js';
import { treatmentSentences } from '../utils/treatment-words.js';
import { BloomStrip } from './bloom-strip.js';
import { useFactCardStyles } from './fact-card.styles.js';
import { QrCode } from './qr-code.js';

const FIT_CLASSES = ['fit0', 'fit1', 'fit2', 'fit3', 'fit4'] as const;

/** One species on a quarter page: what it is, where it grows, what it feeds, how to sow it, what to mind. */
export function FactCard({
  species,
  qr,
  layoutKey,
  origin,
}: {
  species: SpeciesDetail;
  qr: QrEncoderState;
  layoutKey: string;
  /** The site's public address the QR code points at (not necessarily where this page is served). */
  origin: string;
}) {
  const styles = useFactCardStyles();
  const ref = useRef<HTMLElement>(null);
  const titleId = useId();
  const fit = useFitLevel(ref, FIT_CLASSES.length - 1, `${layoutKey}:${qr.status}`);
  const swatches =
    species.flowerColours.length > 0 ? species.flowerColours.map(flowerSwatch) : [flowerSwatch(undefined)];
  const url = speciesPageUrl(species.slug, origin);
  const { germination, wildlife } = species;

  return (
    <article
      ref={ref}
      className={mergeClasses(styles.card, styles[FIT_CLASSES[fit]])}
      aria-labelledby={titleId}
      data-fit={fit}
    >
      <div className={styles.band}>
        {swatches.map((s) => (
          <span key={s.name} className={styles.bandSwatch} style={{ backgroundColor: s.fill }} />
        ))}
        <span className={styles.bandLabel}>
          {flowerColourWords(species.flowerColours.map((c) => flowerSwatch(c).name))}
        </span>
      </div>

      <div className={styles.header}>
        <div className={styles.names}>
          <h3 id={titleId} className={styles.commonName}>
            {capitalise(species.commonNames[0])}
          </h3>
          <p className={styles.scientific}>{species.scientificName}</p>
          <p className={styles.family}>{species.family}</p>
          <div className={styles.bloom}>
            <BloomStrip months={species.bloomMonths} swatch={swatches[0]} />
            <p className={styles.text}>{bloomWords(species.bloomMonths)}</p>
          </div>
        </div>
        <div className={styles.qr}>
          <QrCode url={url} encoder={qr} />
          Scan for more
        </div>
      </div>

      <dl className={styles.facts}>
        <div className={styles.fact}>
          <dt className={styles.term}>
            <WeatherSunny16Regular aria-hidden /> Light
          </dt>
          <dd className={styles.detail}>{sunPhrase(species.sun)}</dd>
        </div>
        <div className={styles.fact}>
          <dt className={styles.term}>
            <Drop16Regular aria-hidden /> Soil
          </dt>
          <dd className={styles.detail}>{moisturePhrase(species.moisture)}</dd>
        </div>
        <div className={styles.fact}>
          <dt className={styles.term}>
            <ArrowAutofitHeight20Regular aria-hidden /> Height
          </dt>
          <dd className={styles.detail}>{formatHeightRangeCm(species.heightCm.min, species.heightCm.max)}</dd>
        </div>
      </dl>

      <section className={styles.section}>
        <h4 className={styles.sectionTitle}>Wildlife</h4>
        {wildlife.monarchHost ? (
          <p className={styles.text}>
            <strong>Monarch host plant:</strong> monarch caterpillars feed on its leaves.
          </p>
        ) : null}
        <p className={styles.text}>{hostWords(genusOf(species), wildlife.lepidopteraGenusCount)}</p>
        <p className={styles.text}>{wildlife.pollinators}</p>
      </section>

      <section className={styles.section}>
        <h4 className={styles.sectionTitle}>
          <LeafTwo16Regular aria-hidden /> Grow from seed
        </h4>
        <ol className={styles.steps}>
          {treatmentSentences(germination).map((sentence, i) => (
            <li key={i}>{sentence}</li>
          ))}
          <li>{sowingDepthSentence(germination)}</li>
        </ol>
        <p className={styles.text}>Works with {sowingMethodsPhrase(germination.methods)}.</p>
      </section>

      {species.cautions.length > 0 ? (
        <section className={styles.section}>
          <h4 className={styles.sectionTitle}>
            <Warning16Regular aria-hidden /> Cautions
          </h4>
          {species.cautions.map((c) => (
            <p key={c.kind} className={styles.caution}>
              <Warning16Regular className={styles.cautionIcon} aria-hidden />
              <span>
                <strong>{CAUTION_WORDS[c.kind].title}:</strong> {c.text}
              </span>
            </p>
          ))}
        </section>
      ) : null}

      <p className={styles.footer}>Check your state&apos;s noxious-weed list and local rules before planting out.</p>
    </article>
  );
}
