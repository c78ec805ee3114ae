import { makeStyles, tokens } from '@fluentui/react-components';
import { type Site, STATE_NAMES, type StateCode } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { ecoregionQueryOptions } from '../../../../api/ecoregions/ecoregions.queries.js';
import { useFormatters, useWords } from '../../../../lib/i18n/index.js';

const useStyles = makeStyles({
  line: { margin: 0, fontSize: tokens.fontSizeBase400, lineHeight: tokens.lineHeightBase400, maxWidth: '70ch' },
  reason: { margin: `${tokens.spacingVerticalXS} 0 0`, color: tokens.colorNeutralForeground2 },
});

/** The place's name in words: "the Driftless Area of Wisconsin", or just the state. */
export function usePlaceWords(state: StateCode, ecoregionCode: string | undefined): string {
  const eco = useQuery({ ...ecoregionQueryOptions(ecoregionCode ?? ''), enabled: ecoregionCode !== undefined });
  const { t } = useTranslation('mix');
  const stateName = STATE_NAMES[state] ?? state;
  if (!ecoregionCode) return stateName;
  // Ecoregion names stay as the EPA publishes them, in English: we know of no published Spanish list.
  return eco.data
    ? t('place.withName', { name: eco.data.name, code: ecoregionCode, state: stateName })
    : t('place.codeOnly', { code: ecoregionCode, state: stateName });
}

/** One sentence naming the yard the mix is for, and why it has as many species as it has. */
export function MixSummary({
  site,
  state,
  ecoregionCode,
  count,
  sizeReason,
}: {
  site: Site;
  state: StateCode;
  ecoregionCode?: string;
  count: number;
  sizeReason: string;
}) {
  const styles = useStyles();
  const place = usePlaceWords(state, ecoregionCode);
  const { t } = useTranslation('mix');
  const { t: ty } = useTranslation('yard');
  const words = useWords();
  const f = useFormatters();
  const goals = site.goals.map((g) => ty(`choices.goal.${g}.label`).toLowerCase());
  // Optional clauses of the one sentence, each a whole phrase in the catalogue.
  const extra =
    (site.maxHeightCm ? t('summary.maxHeight', { height: f.height(site.maxHeightCm) }) : '') +
    (goals.length > 0 ? t('summary.goals', { goals: words.join(goals) }) : '');
  return (
    <div>
      <p className={styles.line}>
        {t('summary.line', {
          count,
          area: f.area(site.areaSqFt),
          sun: words.sun[site.sun],
          moisture: words.moisture[site.moisture],
          place,
          extra,
        })}
      </p>
      <p className={styles.reason}>{sizeReason}</p>
    </div>
  );
}
