import { useTranslation } from 'react-i18next';
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
  const { t } = useTranslation('species');
  const ecoregions = useQuery(ecoregionListQueryOptions(state));
  const list = [...(ecoregions.data ?? [])].sort((a, b) => Number(a.code) - Number(b.code));
  const isKnown = value === undefined || list.some((e) => e.code === value);

  let hint: string = state ? t('filters.ecoregionInState') : t('filters.ecoregionChooseState');
  if (ecoregions.isPending) hint = t('filters.ecoregionLoading');
  return (
    <Field
      label={t('filters.ecoregion')}
      hint={ecoregions.isError ? undefined : hint}
      validationState={ecoregions.isError ? 'error' : 'none'}
      validationMessage={
        ecoregions.isError ? t('filters.ecoregionError', { message: ecoregions.error.message }) : undefined
      }
    >
      <Select
        className={styles.root}
        select={{ className: styles.select }}
        value={value ?? ''}
        disabled={ecoregions.isPending}
        onChange={(_, d) => onChange(d.value || undefined)}
      >
        <option value="">{t('filters.anyEcoregion')}</option>
        {!isKnown ? <option value={value}>{t('filters.ecoregionCode', { code: value })}</option> : null}
        {list.map((e) => (
          <option key={e.code} value={e.code}>
            {e.code} · {e.name}
          </option>
        ))}
      </Select>
    </Field>
  );
}
