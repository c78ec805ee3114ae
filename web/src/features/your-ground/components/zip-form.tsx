import { useTranslation } from 'react-i18next';
import { Button, Field, Input, makeStyles, tokens } from '@fluentui/react-components';
import { Search20Regular } from '@fluentui/react-icons';
import { useState, type FormEvent } from 'react';

const useStyles = makeStyles({
  form: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'flex-start', flexWrap: 'wrap' },
  field: { width: '12rem', maxWidth: '100%' },
  button: { marginTop: '26px' },
});

const ZIP_SHAPE = /^\d{5}$/;

/** A 5-digit ZIP checked before it is sent; the server's answer for an unknown ZIP shows in the same place. */
export function ZipForm({
  onSubmit,
  serverError,
  isPending,
  isPrimary = true,
}: {
  onSubmit: (zip: string) => void;
  serverError?: string;
  isPending: boolean;
  /** Primary until a place is found; then "Next" is the screen's one primary action. */
  isPrimary?: boolean;
}) {
  const styles = useStyles();
  const { t } = useTranslation('ground');
  const [zip, setZip] = useState('');
  const [error, setError] = useState<string | undefined>();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const value = zip.trim();
    if (!ZIP_SHAPE.test(value)) {
      setError(t('zip.shape'));
      return;
    }
    setError(undefined);
    onSubmit(value);
  };

  const message = error ?? serverError;
  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label={t('zip.form')}>
      <Field
        className={styles.field}
        label={t('zip.label')}
        validationMessage={message}
        validationState={message ? 'error' : 'none'}
      >
        <Input
          name="zip"
          inputMode="numeric"
          autoComplete="postal-code"
          maxLength={5}
          value={zip}
          onChange={(_, d) => {
            setZip(d.value);
            setError(undefined);
          }}
        />
      </Field>
      <Button
        className={styles.button}
        type="submit"
        appearance={isPrimary ? 'primary' : 'secondary'}
        icon={<Search20Regular />}
        disabled={isPending}
      >
        {isPending ? t('zip.pending') : t('zip.submit')}
      </Button>
    </form>
  );
}
