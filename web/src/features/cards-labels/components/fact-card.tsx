import { useFormatters, useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { mergeClasses } from '@fluentui/react-components';
import {
  ArrowAutofitHeight20Regular,
  Drop16Regular,
  LeafTwo16Regular,
  Warning16Regular,
  WeatherSunny16Regular,
} from '@fluentui/react-icons';
import { capitalise, genusOf, PHOTO_SIZES, photoCreditLine } from '@homeground/shared';
import { useId, useRef } from 'react';
import { type SpeciesDetail, speciesPhotoUrl } from '../../../api/species/species.api.js';
import { flowerSwatch } from '../../../theme/flower-colours.js';
import { useFitLevel } from '../hooks/use-fit-level.js';
import type { QrEncoderState } from '../hooks/use-qr-encoder.js';
import { speciesPageUrl } from '../utils/species-url.js';
import { hostWords } from '../utils/card-words.js';
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
  const { t } = useTranslation('cards');
  const f = useFormatters();
  const words = useWords();
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
          {species.flowerColours.length === 0
            ? t('card.noColour')
            : t('card.flowers', { colours: words.join(species.flowerColours.map((c) => words.flowerColour[c])) })}
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
            <p className={styles.text}>{words.bloomWords(species.bloomMonths)}</p>
          </div>
        </div>
        {species.hasPhoto ? (
          // The print size (PHOTO_SIZES.print) is made at upload; the credit line below names who took it.
          <img className={styles.photo} src={speciesPhotoUrl(species.slug, PHOTO_SIZES.print)} alt="" />
        ) : null}
        <div className={styles.qr}>
          <QrCode url={url} encoder={qr} />
          {t('card.scan')}
        </div>
      </div>

      <dl className={styles.facts}>
        <div className={styles.fact}>
          <dt className={styles.term}>
            <WeatherSunny16Regular aria-hidden /> {t('card.light')}
          </dt>
          <dd className={styles.detail}>{words.sunPhrase(species.sun)}</dd>
        </div>
        <div className={styles.fact}>
          <dt className={styles.term}>
            <Drop16Regular aria-hidden /> {t('card.soil')}
          </dt>
          <dd className={styles.detail}>{words.moisturePhrase(species.moisture)}</dd>
        </div>
        <div className={styles.fact}>
          <dt className={styles.term}>
            <ArrowAutofitHeight20Regular aria-hidden /> {t('card.height')}
          </dt>
          <dd className={styles.detail}>{f.heightRange(species.heightCm.min, species.heightCm.max)}</dd>
        </div>
      </dl>

      <section className={styles.section}>
        <h4 className={styles.sectionTitle}>{t('card.wildlife')}</h4>
        {wildlife.monarchHost ? (
          <p className={styles.text}>
            <strong>{t('card.monarchLead')}</strong> {t('card.monarchText')}
          </p>
        ) : null}
        <p className={styles.text}>{hostWords(genusOf(species), wildlife.lepidopteraGenusCount, t)}</p>
        {/* The record's pollinator note is written in English. */}
        {words.locale === 'en' ? <p className={styles.text}>{wildlife.pollinators}</p> : null}
      </section>

      <section className={styles.section}>
        <h4 className={styles.sectionTitle}>
          <LeafTwo16Regular aria-hidden /> {t('card.grow')}
        </h4>
        <ol className={styles.steps}>
          {treatmentSentences(germination, words).map((sentence, i) => (
            <li key={i}>{sentence}</li>
          ))}
          <li>{words.sowingDepthSentence(germination)}</li>
        </ol>
        <p className={styles.text}>
          {t('card.worksWith', { methods: words.sowingMethodsPhrase(germination.methods) })}
        </p>
      </section>

      {species.cautions.length > 0 ? (
        <section className={styles.section}>
          <h4 className={styles.sectionTitle}>
            <Warning16Regular aria-hidden /> {t('card.cautions')}
          </h4>
          {species.cautions.map((c) => (
            <p key={c.kind} className={styles.caution}>
              <Warning16Regular className={styles.cautionIcon} aria-hidden />
              <span>
                <strong>{t('card.cautionLine', { title: words.caution[c.kind].title })}</strong>{' '}
                {/* The record's own sentence is English; a Spanish card prints the Spanish caution. */}
                {words.locale === 'en' ? c.text : words.caution[c.kind].sentence}
              </span>
            </p>
          ))}
        </section>
      ) : null}

      {species.hasPhoto && species.photoCredit ? (
        <p className={styles.credit}>{photoCreditLine(species.photoCredit)}</p>
      ) : null}
      <p className={styles.footer}>{t('card.footer')}</p>
    </article>
  );
}
