import { Button, Field, Input, makeStyles, SpinButton, tokens } from '@fluentui/react-components';
import { Add20Regular } from '@fluentui/react-icons';
import { MAX_MIX_SIZE, type StateCode } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import { speciesListQueryOptions } from '../../../../api/species/species.queries.js';

const useStyles = makeStyles({
  root: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalXL, alignItems: 'flex-end' },
  search: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  matches: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalS,
  },
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
  const { t } = useTranslation('mix');
  const [count, setCount] = useState(size);
  const [text, setText] = useState('');
  const search = useQuery({
    ...speciesListQueryOptions({ q: text.trim(), state, pageSize: 8 }),
    enabled: text.trim().length >= 2,
  });
  const matches = (search.data?.items ?? []).filter((s) => !inMix.includes(s.slug));
  return (
    <div className={styles.root} data-print="hide">
      <Field label={t('adjust.count')}>
        <SpinButton
          value={count}
          min={1}
          max={MAX_MIX_SIZE}
          onChange={(_, d) => {
            const v = d.value ?? Number(d.displayValue);
            if (Number.isInteger(v) && v >= 1 && v <= MAX_MIX_SIZE) setCount(v);
          }}
        />
      </Field>
      <Button disabled={isBusy || count === size} onClick={() => onSize(count)}>
        {t('adjust.use', { count })}
      </Button>
      <div className={styles.search}>
        <Field label={t('adjust.addByName')}>
          <Input value={text} placeholder={t('adjust.placeholder')} onChange={(_, d) => setText(d.value)} />
        </Field>
        {matches.length > 0 ? (
          <ul className={styles.matches} aria-label={t('adjust.toAdd')}>
            {matches.map((s) => (
              <li key={s.slug}>
                <Button
                  size="small"
                  icon={<Add20Regular />}
                  disabled={isBusy}
                  onClick={() => {
                    onAdd(s.slug);
                    setText('');
                  }}
                >
                  {t('adjust.add', { name: s.commonName })}
                </Button>
              </li>
            ))}
          </ul>
        ) : null}
      </div>
    </div>
  );
}
