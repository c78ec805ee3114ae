import type { StateCode } from '@homeground/shared';
import { Field, Select } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { ecoregionListQueryOptions } from '../../../api/ecoregions/ecoregions.queries.js';
import { useSelectStyles } from './select-styles.js';

/** EPA Level III ecoregions: those reaching into the chosen state, or all of them before one is chosen. */
export function EcoregionSelect({
  state,
  value,
  onChange,
}: {
  state: StateCode | undefined;
  value: string | undefined;
  onChange: (code: string | undefined) => void;
}) {
  const styles = useSelectStyles();
  const ecoregions = useQuery(ecoregionListQueryOptions(state));
  const list = [...(ecoregions.data ?? [])].sort((a, b) => Number(a.code) - Number(b.code));
  const isKnown = value === undefined || list.some((e) => e.code === value);

  let hint: string | undefined = state
    ? 'Ecoregions that reach into this state.'
    : 'Choose a state first to see only its ecoregions.';
  if (ecoregions.isPending) hint = 'Loading the ecoregions…';
  return (
    <Field
      label="Ecoregion (EPA Level III)"
      hint={ecoregions.isError ? undefined : hint}
      validationState={ecoregions.isError ? 'error' : 'none'}
      validationMessage={ecoregions.isError ? `The ecoregions did not load: ${ecoregions.error.message}` : undefined}
    >
      <Select
        className={styles.root}
        select={{ className: styles.select }}
        value={value ?? ''}
        disabled={ecoregions.isPending}
        onChange={(_, d) => onChange(d.value || undefined)}
      >
        <option value="">Any ecoregion</option>
        {!isKnown ? <option value={value}>Ecoregion {value}</option> : null}
        {list.map((e) => (
          <option key={e.code} value={e.code}>
            {e.code} · {e.name}
          </option>
        ))}
      </Select>
    </Field>
  );
}
