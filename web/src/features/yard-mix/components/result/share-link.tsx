import { Button, Field, Input, makeStyles, tokens } from '@fluentui/react-components';
import { Link20Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, minWidth: 0 },
  status: { margin: 0, fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
});

/** Copies a link to the clipboard; where the browser refuses, shows the link to copy by hand. */
export function CopyLinkButton({
  url,
  label,
  appearance = 'secondary',
}: {
  url: string;
  label?: string;
  appearance?: 'secondary' | 'primary' | 'subtle';
}) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  const [state, setState] = useState<'idle' | 'copied' | 'manual'>('idle');

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setState('copied');
    } catch {
      setState('manual');
    }
  };

  return (
    <div className={styles.root}>
      <div>
        <Button appearance={appearance} icon={<Link20Regular />} onClick={() => void copy()}>
          {label ?? t('share.copy')}
        </Button>
      </div>
      <p role="status" className={styles.status}>
        {state === 'copied' ? t('share.copied') : ''}
        {state === 'manual' ? t('share.manual') : ''}
      </p>
      {state === 'manual' ? (
        <Field label={t('share.link')}>
          <Input readOnly value={url} onFocus={(e) => e.currentTarget.select()} />
        </Field>
      ) : null}
    </div>
  );
}
