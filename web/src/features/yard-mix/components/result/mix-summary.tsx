import { makeStyles, tokens } from '@fluentui/react-components';
import { formatArea, formatHeightCm, type Site, STATE_NAMES, type StateCode, SUN_WORDS } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { ecoregionQueryOptions } from '../../../../api/ecoregions/ecoregions.queries.js';
import { GOAL_CHOICES, MOISTURE_CHOICES } from '../../utils/yard-form-choices.js';

const useStyles = makeStyles({
  line: { margin: 0, fontSize: tokens.fontSizeBase400, lineHeight: tokens.lineHeightBase400, maxWidth: '70ch' },
  reason: { margin: `${tokens.spacingVerticalXS} 0 0`, color: tokens.colorNeutralForeground2 },
});

/** The place's name in words: "the Driftless Area of Wisconsin", or just the state. */
export function usePlaceWords(state: StateCode, ecoregionCode: string | undefined): string {
  const eco = useQuery({ ...ecoregionQueryOptions(ecoregionCode ?? ''), enabled: ecoregionCode !== undefined });
  const stateName = STATE_NAMES[state] ?? state;
  if (!ecoregionCode) return stateName;
  return eco.data
    ? `the ${eco.data.name} (ecoregion ${ecoregionCode}) of ${stateName}`
    : `ecoregion ${ecoregionCode} of ${stateName}`;
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
  const moisture = MOISTURE_CHOICES.find((m) => m.value === site.moisture)?.label.toLowerCase() ?? site.moisture;
  const goals = site.goals.map((g) => GOAL_CHOICES.find((c) => c.value === g)?.label.toLowerCase() ?? g);
  const sunLabel = SUN_WORDS[site.sun];
  return (
    <div>
      <p className={styles.line}>
        {count} native species for {formatArea(site.areaSqFt)} of {sunLabel} and {moisture} soil in {place}
        {site.maxHeightCm ? `, none taller than ${formatHeightCm(site.maxHeightCm)}` : ''}
        {goals.length > 0 ? `, chosen for ${goals.join(', ')}` : ''}.
      </p>
      <p className={styles.reason}>{sizeReason}</p>
    </div>
  );
}
