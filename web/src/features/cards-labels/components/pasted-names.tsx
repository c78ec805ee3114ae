import { useTranslation } from 'react-i18next';
import { Button, Field, makeStyles, Textarea, tokens } from '@fluentui/react-components';
import { useState } from 'react';
import { ErrorState } from '../../../components/states/index.js';
import { MAX_PASTED_NAMES, pastedNames, useNameResolver } from '../hooks/use-name-resolver.js';

const useStyles = makeStyles({
  actions: {
    marginTop: tokens.spacingVerticalS,
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    alignItems: 'center',
    flexWrap: 'wrap',
  },
  result: { margin: `${tokens.spacingVerticalS} 0 0`, paddingLeft: tokens.spacingHorizontalXL },
  scientific: { fontStyle: 'italic' },
  missing: { margin: `${tokens.spacingVerticalS} 0 0` },
});

/** A list typed or pasted, one name per line; each line is found by search and added. */
export function PastedNames({ onAdd }: { onAdd: (slugs: string[]) => void }) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const [text, setText] = useState('');
  const { state, resolve } = useNameResolver();
  const names = pastedNames(text);

  const submit = async () => {
    const results = await resolve(names);
    if (!results) return;
    onAdd(results.flatMap((r) => (r.match ? [r.match.slug] : [])));
  };

  const found = state.status === 'done' ? state.results.filter((r) => r.match) : [];
  const notFound = state.status === 'done' ? state.results.filter((r) => !r.match) : [];

  return (
    <div>
      <Field label={t('choose.pasteLabel')} hint={t('choose.pasteHint', { count: MAX_PASTED_NAMES })}>
        <Textarea
          value={text}
          onChange={(_, d) => setText(d.value)}
          rows={4}
          resize="vertical"
          placeholder={'wild bergamot\nbuterfly weed\nZizia aurea'}
        />
      </Field>
      <div className={styles.actions}>
        <Button disabled={names.length === 0 || state.status === 'working'} onClick={() => void submit()}>
          {state.status === 'working' ? t('choose.pasteFinding', { count: state.total }) : t('choose.pasteAdd')}
        </Button>
      </div>
      <div aria-live="polite">
        {state.status === 'failed' ? <ErrorState title={t('choose.pasteError')} message={state.message} /> : null}
        {found.length > 0 ? (
          <ul className={styles.result} aria-label={t('choose.found')}>
            {found.map((r) => (
              <li key={r.typed}>
                {t('choose.foundLine', { typed: r.typed, name: r.match!.commonName })} (
                <span className={styles.scientific}>{r.match!.scientificName}</span>)
              </li>
            ))}
          </ul>
        ) : null}
        {notFound.length > 0 ? (
          <p className={styles.missing} role="status">
            {t('choose.notFound', { list: notFound.map((r) => `“${r.typed}”`).join(', ') })}
          </p>
        ) : null}
      </div>
    </div>
  );
}
