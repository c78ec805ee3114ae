import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import {
  capitalise,
  capitaliseAll,
  GROWTH_FORMS,
  type GrowthForm,
  MOISTURE_LEVELS,
  type Moisture,
  MONTH_NUMBERS,
  byStateListName,
  stateListName,
  type StateCode,
  SUN_LEVELS,
  type Sun,
  US_STATE_CODES,
} from '@homeground/shared';
import { Button, Checkbox, Field, makeStyles, Select, tokens } from '@fluentui/react-components';
import { Dismiss16Regular } from '@fluentui/react-icons';
import { type BrowserState, countActiveFilters } from '../utils/browser-state.js';
import { EcoregionSelect } from './ecoregion-select.js';
import { HeightFilter } from './height-filter.js';
import { useSelectStyles } from './select-styles.js';

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(200px, 1fr))',
    gap: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
    alignItems: 'start',
    '& > *': { minWidth: 0 },
  },
  wide: { gridColumn: 'span 2', '@media (max-width: 480px)': { gridColumn: 'auto' } },
  footer: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    marginTop: tokens.spacingVerticalM,
  },
});

/** States sorted by name, as people look for them, not by postal code. */
/** States by the names shown in the list: "District of Columbia" under D. */
const STATES_BY_NAME = byStateListName(US_STATE_CODES);
const STATE_LIST_NAMES = Object.fromEntries(US_STATE_CODES.map((c) => [c, stateListName(c)])) as Record<
  StateCode,
  string
>;

function OptionSelect<T extends string>({
  label,
  anyLabel,
  value,
  options,
  labels,
  onChange,
}: {
  label: string;
  anyLabel: string;
  value: T | undefined;
  options: readonly T[];
  labels: Record<T, string>;
  onChange: (value: T | undefined) => void;
}) {
  const styles = useSelectStyles();
  return (
    <Field label={label}>
      <Select
        className={styles.root}
        select={{ className: styles.select }}
        value={value ?? ''}
        onChange={(_, d) => onChange((d.value || undefined) as T | undefined)}
      >
        <option value="">{anyLabel}</option>
        {options.map((o) => (
          <option key={o} value={o}>
            {labels[o]}
          </option>
        ))}
      </Select>
    </Field>
  );
}

const MONTH_VALUES = MONTH_NUMBERS.map(String);

/** Every catalogue field the API filters on, each written to the URL as it changes. */
export function FilterPanel({
  state,
  onChange,
  onClear,
}: {
  state: BrowserState;
  onChange: (change: Partial<BrowserState>) => void;
  onClear: () => void;
}) {
  const styles = useStyles();
  const { t } = useTranslation('species');
  const words = useWords();
  const monthLabels = Object.fromEntries(MONTH_NUMBERS.map((m) => [String(m), capitalise(words.month[m].long)]));
  const active = countActiveFilters(state);
  return (
    <>
      <div className={styles.grid}>
        <OptionSelect<StateCode>
          label={t('filters.nativeTo')}
          anyLabel={t('filters.anyState')}
          value={state.state}
          options={STATES_BY_NAME}
          labels={STATE_LIST_NAMES}
          onChange={(v) => onChange({ state: v })}
        />
        <EcoregionSelect state={state.state} value={state.ecoregion} onChange={(v) => onChange({ ecoregion: v })} />
        <OptionSelect<Sun>
          label={t('filters.sun')}
          anyLabel={t('filters.anySun')}
          value={state.sun}
          options={SUN_LEVELS}
          labels={capitaliseAll(words.sun)}
          onChange={(v) => onChange({ sun: v })}
        />
        <OptionSelect<Moisture>
          label={t('filters.moisture')}
          anyLabel={t('filters.anyMoisture')}
          value={state.moisture}
          options={MOISTURE_LEVELS}
          labels={capitaliseAll(words.moisture)}
          onChange={(v) => onChange({ moisture: v })}
        />
        <OptionSelect<string>
          label={t('filters.blooming')}
          anyLabel={t('filters.anyMonth')}
          value={state.bloomMonth === undefined ? undefined : String(state.bloomMonth)}
          options={MONTH_VALUES}
          labels={monthLabels}
          onChange={(v) => onChange({ bloomMonth: v === undefined ? undefined : Number(v) })}
        />
        <OptionSelect<GrowthForm>
          label={t('filters.growthForm')}
          anyLabel={t('filters.anyForm')}
          value={state.growthForm}
          options={GROWTH_FORMS}
          labels={capitaliseAll(words.growthForm)}
          onChange={(v) => onChange({ growthForm: v })}
        />
        <div className={styles.wide}>
          <HeightFilter minCm={state.minHeightCm} maxCm={state.maxHeightCm} onChange={onChange} />
        </div>
      </div>
      <div className={styles.footer}>
        <Checkbox
          label={t('filters.monarchOnly')}
          checked={state.monarchHost}
          onChange={(_, d) => onChange({ monarchHost: d.checked === true })}
        />
        <Button appearance="subtle" icon={<Dismiss16Regular />} disabled={active === 0} onClick={onClear}>
          {t('filters.clear')}
        </Button>
      </div>
    </>
  );
}
