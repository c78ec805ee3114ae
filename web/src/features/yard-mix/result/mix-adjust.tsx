import { Button, Combobox, Field, makeStyles, Option, SpinButton, tokens } from '@fluentui/react-components';
import { Add20Regular } from '@fluentui/react-icons';
import { MAX_MIX_SIZE, type StateCode } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { speciesListQueryOptions } from '../../../api/species/species.queries.js';

const useStyles = makeStyles({
  root: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalXL, alignItems: 'flex-end' },
  search: { display: 'flex', gap: tokens.spacingHorizontalS, alignItems: 'flex-end' },
});

export interface MixAdjustProps {
  size: number;
  state: StateCode;
  inMix: readonly string[];
  onSize: (size: number) => void;
  onAdd: (slug: string) => void;
  isBusy: boolean;
}

/**
 * How many species, and any species to add by name: the catalogue search (typo-tolerant) over
 * species native to the state, so a protected species can be kept by choice, as its notice says.
 */
export function MixAdjust({ size, state, inMix, onSize, onAdd, isBusy }: MixAdjustProps) {
  const styles = useStyles();
  const [count, setCount] = useState(size);
  const [text, setText] = useState('');
  const [picked, setPicked] = useState<string | null>(null);
  const search = useQuery({ ...speciesListQueryOptions({ q: text, state, pageSize: 8 }), enabled: text.trim().length >= 2 });
  const options = (search.data?.items ?? []).filter((s) => !inMix.includes(s.slug));
  return (
    <div className={styles.root} data-print="hide">
      <Field label="Number of species">
        <SpinButton value={count} min={1} max={MAX_MIX_SIZE} onChange={(_, d) => {
          const v = d.value ?? Number(d.displayValue);
          if (Number.isInteger(v) && v >= 1 && v <= MAX_MIX_SIZE) setCount(v);
        }} />
      </Field>
      <Button disabled={isBusy || count === size} onClick={() => onSize(count)}>Use {count} species</Button>
      <div className={styles.search}>
        <Field label="Add a species by name">
          <Combobox
            freeform
            placeholder="e.g. prairie smoke"
            value={text}
            onInput={(e) => { setText((e.target as HTMLInputElement).value); setPicked(null); }}
            onOptionSelect={(_, d) => { setPicked(d.optionValue ?? null); setText(d.optionText ?? ''); }}
          >
            {options.map((s) => (
              <Option key={s.slug} value={s.slug} text={s.commonName}>{`${s.commonName} (${s.scientificName})`}</Option>
            ))}
          </Combobox>
        </Field>
        <Button icon={<Add20Regular />} disabled={!picked || isBusy} onClick={() => { if (picked) onAdd(picked); setText(''); setPicked(null); }}>
          Add to mix
        </Button>
      </div>
    </div>
  );
}
