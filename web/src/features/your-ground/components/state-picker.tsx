import { Field, Select } from '@fluentui/react-components';
import { STATE_NAMES, type StateCode, US_STATE_CODES } from '@homeground/shared';

const BY_NAME = [...US_STATE_CODES].sort((a, b) => stateLabel(a).localeCompare(stateLabel(b)));

/** "the District of Columbia" reads well in a sentence; in a list it starts with its own name. */
function stateLabel(code: StateCode): string {
  return STATE_NAMES[code].replace(/^the /, '').replace(/^./, (c) => c.toUpperCase());
}

/** The keyboard-friendly way to say where you are without a ZIP code or the map. */
export function StatePicker({ value, onChange }: { value: StateCode | ''; onChange: (state: StateCode) => void }) {
  return (
    <Field label="State" hint="Then choose the ecoregion from its list.">
      <Select value={value} onChange={(_, d) => d.value && onChange(d.value as StateCode)}>
        <option value="">Choose a state</option>
        {BY_NAME.map((code) => (
          <option key={code} value={code}>
            {stateLabel(code)}
          </option>
        ))}
      </Select>
    </Field>
  );
}
