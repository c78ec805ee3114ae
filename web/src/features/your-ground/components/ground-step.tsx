import { useTranslation } from 'react-i18next';
import { Button, makeStyles, MessageBar, MessageBarBody, tokens } from '@fluentui/react-components';
import { ArrowRight20Regular, Location20Regular } from '@fluentui/react-icons';
import { type StateCode, STATE_NAMES } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { ecoregionOutlineQueryOptions } from '../../../api/ecoregions/ecoregions.queries.js';
import { placeLookupQueryOptions } from '../../../api/places/places.queries.js';
import type { PlaceQuery } from '../../../api/places/places.api.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { ErrorState, LoadingState } from '../../../components/states/index.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useGeolocation } from '../hooks/use-geolocation.js';
import { GroundResult } from './ground-result.js';
import { StatePicker } from './state-picker.js';
import { LazyUsMap } from './us-map-lazy.js';
import { ZipForm } from './zip-form.js';

const useStyles = makeStyles({
  layout: {
    display: 'grid',
    gap: tokens.spacingHorizontalXXL,
    gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1.3fr)',
    '@media (max-width: 860px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  finders: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  or: { margin: 0, color: tokens.colorNeutralForeground2 },
  mapHint: {
    margin: `${tokens.spacingVerticalS} 0 0`,
    color: tokens.colorNeutralForeground2,
    fontSize: tokens.fontSizeBase200,
  },
  result: { marginTop: tokens.spacingVerticalXL },
  next: {
    marginTop: tokens.spacingVerticalL,
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    alignItems: 'center',
    flexWrap: 'wrap',
  },
  nextError: { margin: 0, color: tokens.colorStatusDangerForeground1 },
});

/** Your ground as the next step needs it. */
export interface ChosenGround {
  state: StateCode;
  /** Absent when the person chose "not sure" for the ecoregion. */
  ecoregionCode?: string;
}

type Source = { kind: 'none' } | { kind: 'lookup'; query: PlaceQuery } | { kind: 'state'; state: StateCode };

/** Step 1: where the ground is, by ZIP, by a click on the map, by the device's location, or by state. */
export function GroundStep({ onConfirm }: { onConfirm: (ground: ChosenGround) => void }) {
  const styles = useStyles();
  const { t } = useTranslation('ground');
  const [source, setSource] = useState<Source>({ kind: 'none' });
  const [ecoregionCode, setEcoregionCode] = useState<string | null>(null);
  const geo = useGeolocation();
  const lookup = useQuery({
    ...placeLookupQueryOptions(source.kind === 'lookup' ? source.query : { zip: '' }),
    enabled: source.kind === 'lookup',
  });

  // A found place starts on its main ecoregion; the person may pick another below.
  useEffect(() => {
    if (source.kind === 'lookup' && lookup.data) setEcoregionCode(lookup.data.ecoregion.code);
  }, [source.kind, lookup.data]);

  useEffect(() => {
    if (geo.state.status === 'found') look({ lat: geo.state.lat, lon: geo.state.lon });
  }, [geo.state]);

  function look(query: PlaceQuery) {
    setEcoregionCode(null);
    setSource({ kind: 'lookup', query });
  }

  const isLookup = source.kind === 'lookup';
  const lookupError = isLookup && lookup.isError ? lookup.error : null;
  const isBadInput = lookupError !== null && isApiRequestError(lookupError) && lookupError.statusCode === 400;
  const isZipQuery = isLookup && 'zip' in source.query;
  // The API says every place it cannot use in a whole sentence (an unknown ZIP, Alaska, a point at sea):
  // a ZIP's beside the ZIP field, a point's below the map. The ZIP form checks the format itself first.
  const zipError = isBadInput && isZipQuery ? lookupError.message : undefined;
  const pointError = isBadInput && !isZipQuery ? t('step.pointHint', { message: lookupError.message }) : undefined;
  const state: StateCode | null =
    source.kind === 'state' ? source.state : isLookup && lookup.data ? lookup.data.state : null;
  const [nextError, setNextError] = useState<string | null>(null);
  // The map shows the chosen ecoregion's EPA outline when the boundaries are loaded, else the state.
  const chosenCode = ecoregionCode && ecoregionCode !== '-' ? ecoregionCode : '';
  const outline = useQuery({ ...ecoregionOutlineQueryOptions(chosenCode), enabled: chosenCode !== '' });
  const outlineGeometry = chosenCode && outline.data?.code === chosenCode ? outline.data.outline : null;
  const chosenName =
    (lookup.data ? [lookup.data.ecoregion, ...lookup.data.otherEcoregions] : []).find((e) => e.code === chosenCode)
      ?.name ?? t('step.ecoregionFallback', { code: chosenCode });

  const confirm = () => {
    if (!state) return;
    if (ecoregionCode === null) {
      setNextError(t('step.chooseEcoregion'));
      return;
    }
    onConfirm({ state, ...(ecoregionCode ? { ecoregionCode } : {}) });
  };

  return (
    <ContentCard aria-labelledby="ground-heading">
      <Heading level="section" id="ground-heading">
        {t('step.heading')}
      </Heading>
      <div className={styles.layout}>
        <div className={styles.finders}>
          <ZipForm
            onSubmit={(zip) => look({ zip })}
            serverError={zipError}
            isPending={isLookup && lookup.isFetching}
            isPrimary={!state}
          />
          <div>
            <Button icon={<Location20Regular />} onClick={geo.locate} disabled={geo.state.status === 'locating'}>
              {geo.state.status === 'locating' ? t('step.locating') : t('step.useLocation')}
            </Button>
            {geo.state.status === 'failed' ? (
              <MessageBar intent="warning" layout="multiline" role="alert">
                <MessageBarBody>{t(`geo.${geo.state.reason}`)}</MessageBarBody>
              </MessageBar>
            ) : null}
          </div>
          <StatePicker
            value={source.kind === 'state' ? source.state : ''}
            onChange={(s) => {
              setEcoregionCode(null);
              setSource({ kind: 'state', state: s });
            }}
          />
        </div>
        <div>
          <LazyUsMap
            onPick={look}
            point={lookup.data?.point ?? (isLookup && 'lat' in source.query ? source.query : null)}
            state={state ? STATE_NAMES[state] : null}
            outline={outlineGeometry ? { name: chosenName, geometry: outlineGeometry } : null}
            label={t('step.mapLabel')}
          />
          <p className={styles.mapHint}>{t('step.mapHint')}</p>
        </div>
      </div>

      <div className={styles.result}>
        {isLookup && lookup.isFetching && !lookup.data ? <LoadingState label={t('step.finding')} /> : null}
        {pointError ? <ErrorState title={t('step.notFound')} message={pointError} /> : null}
        {lookupError && !isBadInput ? (
          <ErrorState title={t('step.notFound')} message={lookupError.message} onRetry={() => void lookup.refetch()} />
        ) : null}
        {state ? (
          <>
            <GroundResult
              key={source.kind === 'lookup' ? JSON.stringify(source.query) : state}
              state={state}
              lookup={isLookup ? lookup.data : undefined}
              ecoregionCode={ecoregionCode ?? '-'}
              onEcoregionChange={(code) => {
                setEcoregionCode(code);
                setNextError(null);
              }}
            />
            <div className={styles.next}>
              <Button
                appearance="primary"
                size="large"
                icon={<ArrowRight20Regular />}
                iconPosition="after"
                onClick={confirm}
              >
                {t('step.next')}
              </Button>
              {nextError ? (
                <p className={styles.nextError} role="alert">
                  {nextError}
                </p>
              ) : null}
            </div>
          </>
        ) : null}
      </div>
    </ContentCard>
  );
}
