import { useTranslation } from 'react-i18next';
import { Field, Input, makeStyles, tokens } from '@fluentui/react-components';
import { Search20Regular } from '@fluentui/react-icons';
import type { FormEvent } from 'react';
import { useDebouncedDraft } from '../hooks/use-debounced-draft.js';

const useStyles = makeStyles({
  form: { marginBottom: tokens.spacingVerticalL, maxWidth: '640px' },
  input: { width: '100%' },
});

const normalize = (text: string) => text.trim().slice(0, 100);

/**
 * Search as you type: the list follows 300 ms after the last key, and Enter searches at once.
 * The API forgives typos, so "buterfly weed" still finds butterfly milkweed.
 */
export function SearchField({
  value,
  onSearch,
}: {
  value: string;
  onSearch: (q: string, options: { replace: boolean }) => void;
}) {
  const { t } = useTranslation('species');
  const styles = useStyles();
  const { draft, setDraft, flush } = useDebouncedDraft(
    value,
    (text) => {
      const next = normalize(text);
      // Refining a search replaces the history entry; starting or clearing one adds an entry for Back.
      onSearch(next, { replace: value !== '' && next !== '' });
    },
    { normalize },
  );

  const submit = (event: FormEvent) => {
    event.preventDefault();
    flush();
  };

  return (
    <form role="search" aria-label={t('search.form')} className={styles.form} onSubmit={submit}>
      <Field label={t('search.label')} hint={t('search.hint')}>
        <Input
          className={styles.input}
          type="search"
          size="large"
          contentBefore={<Search20Regular aria-hidden />}
          placeholder={t('search.placeholder')}
          value={draft}
          maxLength={100}
          onChange={(_, data) => setDraft(data.value)}
        />
      </Field>
    </form>
  );
}
