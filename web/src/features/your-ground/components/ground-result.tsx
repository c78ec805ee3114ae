import { useWords } from '../../../lib/i18n/index.js';
import { Trans, useTranslation } from 'react-i18next';
import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { type PlaceLookup, type StateCode, STATE_NAMES } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ecoregionListQueryOptions } from '../../../api/ecoregions/ecoregions.queries.js';
import { QueryState } from '../../../components/states/index.js';
import { EcoregionChoice, type EcoregionOption } from './ecoregion-choice.js';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  place: { margin: 0, fontSize: tokens.fontSizeBase400, lineHeight: tokens.lineHeightBase400 },
  eco: {
    borderLeft: `4px solid ${tokens.colorBrandStroke1}`,
    paddingLeft: tokens.spacingHorizontalM,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
  },
  ecoName: { margin: 0, fontWeight: tokens.fontWeightSemibold },
  muted: { margin: 0, color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200 },
  text: { margin: 0, maxWidth: '68ch' },
});

export interface GroundResultProps {
  state: StateCode;
  lookup?: PlaceLookup;
  ecoregionCode: string;
  onEcoregionChange: (code: string) => void;
}

/** Your ground in words: state, county and ecoregion with its description, and the choice when there is one. */
export function GroundResult({ state, lookup, ecoregionCode, onEcoregionChange }: GroundResultProps) {
  const styles = useStyles();
  const { t } = useTranslation('ground');
  const words = useWords();
  const stateName = STATE_NAMES[state];
  const [showAll, setShowAll] = useState(!lookup);
  const list = useQuery({ ...ecoregionListQueryOptions(state), enabled: showAll });

  const lookupOptions: EcoregionOption[] = lookup ? [lookup.ecoregion, ...lookup.otherEcoregions] : [];
  const stateOptions: EcoregionOption[] = (list.data ?? []).map((e) => ({
    code: e.code,
    name: e.name,
    description: e.description,
  }));
  const selected = [...lookupOptions, ...stateOptions].find((o) => o.code === ecoregionCode);
  const isSplit = lookup !== undefined && lookup.otherEcoregions.length > 0;

  return (
    <div className={styles.root}>
      {lookup ? (
        <p className={styles.place} role="status">
          {lookup.zip ? (
            <Trans
              t={t}
              i18nKey="result.inCountyZip"
              values={{ county: lookup.county.name, state: stateName, zip: lookup.zip.code, city: lookup.zip.city }}
              components={{ strong: <strong /> }}
            />
          ) : (
            <Trans
              t={t}
              i18nKey="result.inCounty"
              values={{ county: lookup.county.name, state: stateName }}
              components={{ strong: <strong /> }}
            />
          )}
        </p>
      ) : (
        <p className={styles.place}>
          <Trans t={t} i18nKey="result.inState" values={{ state: stateName }} components={{ strong: <strong /> }} />
        </p>
      )}

      {selected ? (
        <div className={styles.eco}>
          <p className={styles.ecoName}>{t('result.ecoregion', { name: selected.name, code: selected.code })}</p>
          <p className={styles.text}>{selected.description}</p>
          {lookup && selected.code === lookup.ecoregion.code ? (
            <p className={styles.muted}>
              {lookup.ecoregion.level2} · {lookup.ecoregion.level1}. {words.ecoregionFoundWords(lookup)}
            </p>
          ) : null}
        </div>
      ) : null}

      {isSplit && !showAll ? (
        <EcoregionChoice
          question={t('result.splitQuestion')}
          options={lookupOptions}
          value={ecoregionCode}
          onChange={onEcoregionChange}
        />
      ) : null}

      {showAll ? (
        <QueryState
          query={list}
          loading={t('result.loadingState', { state: stateName })}
          error={t('result.errorState', { state: stateName })}
        >
          {() => (
            <EcoregionChoice
              question={t('result.stateQuestion', { state: stateName })}
              options={stateOptions}
              value={ecoregionCode}
              onChange={onEcoregionChange}
              stateName={stateName}
            />
          )}
        </QueryState>
      ) : (
        <div>
          <Button appearance="subtle" onClick={() => setShowAll(true)}>
            {t('result.another', { state: stateName })}
          </Button>
        </div>
      )}
    </div>
  );
}
