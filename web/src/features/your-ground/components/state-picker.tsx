import { useTranslation } from 'react-i18next';
import { Field, Select } from '@fluentui/react-components';
import { byStateListName, stateListName, type StateCode, US_STATE_CODES } from '@homeground/shared';

/** In alphabetical order of the names shown: "District of Columbia" under D. */
const BY_NAME = byStateListName(US_STATE_CODES);

/** The keyboard-friendly way to say where you are without a ZIP code or the map. */
export function StatePicker({ value, onChange }: { value: StateCode | ''; onChange: (state: StateCode) => void }) {
  const { t } = useTranslation('ground');
  return (
    <Field label={t('state.label')} hint={t('state.hint')}>
      <Select value={value} onChange={(_, d) => d.value && onChange(d.value as StateCode)}>
        <option value="">{t('state.placeholder')}</option>
        {BY_NAME.map((code) => (
          <option key={code} value={code}>
            {stateListName(code)}
          </option>
        ))}
      </Select>
    </Field>
  );
}
