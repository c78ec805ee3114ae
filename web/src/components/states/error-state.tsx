import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { ArrowClockwise20Regular, ErrorCircle24Regular } from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-start',
    padding: tokens.spacingVerticalL,
    borderRadius: tokens.borderRadiusXLarge,
    backgroundColor: tokens.colorStatusDangerBackground1,
    border: `1px solid ${tokens.colorStatusDangerBorder1}`,
  },
  icon: { color: tokens.colorStatusDangerForeground1, flexShrink: 0 },
  title: { margin: 0, fontWeight: tokens.fontWeightSemibold },
  message: { margin: `${tokens.spacingVerticalXS} 0 0` },
  retry: { marginTop: tokens.spacingVerticalS },
});

/** Says what failed and why in words, with a retry when one can help. */
export function ErrorState({ title, message, onRetry }: { title: string; message?: ReactNode; onRetry?: () => void }) {
  const styles = useStyles();
  const { t } = useTranslation();
  return (
    <div role="alert" className={styles.root}>
      <ErrorCircle24Regular className={styles.icon} aria-hidden />
      <div>
        <p className={styles.title}>{title}</p>
        {message ? <p className={styles.message}>{message}</p> : null}
        {onRetry ? (
          <Button className={styles.retry} icon={<ArrowClockwise20Regular />} onClick={onRetry}>
            {t('states.tryAgain')}
          </Button>
        ) : null}
      </div>
    </div>
  );
}
