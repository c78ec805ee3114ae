import { Button, Field, Input, makeStyles, tokens } from '@fluentui/react-components';
import { Link20Regular } from '@fluentui/react-icons';
import { useState } from 'react';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, minWidth: 0 },
  status: { margin: 0, fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
});

/** Copies a link to the clipboard; where the browser refuses, shows the link to copy by hand. */
export function CopyLinkButton({
  url,
  label = 'Copy link',
  appearance = 'secondary',
}: {
  url: string;
  label?: string;
  appearance?: 'secondary' | 'primary' | 'subtle';
}) {
  const styles = useStyles();
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
          {label}
        </Button>
      </div>
      <p role="status" className={styles.status}>
        {state === 'copied' ? 'Link copied. Anyone who opens it sees this mix.' : ''}
        {state === 'manual' ? 'Your browser did not allow copying; select the link below and copy it.' : ''}
      </p>
      {state === 'manual' ? (
        <Field label="Link to this mix">
          <Input readOnly value={url} onFocus={(e) => e.currentTarget.select()} />
        </Field>
      ) : null}
    </div>
  );
}
