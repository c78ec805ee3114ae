import { Button, makeStyles, tokens, ToggleButton } from '@fluentui/react-components';
import {
  ArrowSwap20Regular,
  LockClosed20Regular,
  LockOpen20Regular,
  SubtractCircle20Regular,
} from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  row: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalXS },
});

export interface SpeciesActionsProps {
  name: string;
  isLocked: boolean;
  isExcluded: boolean;
  onToggleLock: () => void;
  onToggleExclude: () => void;
  onSwap: () => void;
  disabled?: boolean;
}

/** Keep, leave out or swap one species; the pressed state is spoken and shown in words, not only in colour. */
export function SpeciesActions({
  name,
  isLocked,
  isExcluded,
  onToggleLock,
  onToggleExclude,
  onSwap,
  disabled,
}: SpeciesActionsProps) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  return (
    <div className={styles.row} role="group" aria-label={t('actions.group', { name })} data-print="hide">
      <ToggleButton
        size="small"
        checked={isLocked}
        icon={isLocked ? <LockClosed20Regular /> : <LockOpen20Regular />}
        onClick={onToggleLock}
        disabled={disabled}
        aria-label={t('actions.keepName', { name })}
      >
        {isLocked ? t('actions.kept') : t('actions.keep')}
      </ToggleButton>
      <ToggleButton
        size="small"
        checked={isExcluded}
        icon={<SubtractCircle20Regular />}
        onClick={onToggleExclude}
        disabled={disabled}
        aria-label={t('actions.leaveOutName', { name })}
      >
        {isExcluded ? t('actions.leftOut') : t('actions.leaveOut')}
      </ToggleButton>
      <Button
        size="small"
        icon={<ArrowSwap20Regular />}
        onClick={onSwap}
        disabled={disabled}
        aria-label={t('actions.swapName', { name })}
      >
        {t('actions.swap')}
      </Button>
    </div>
  );
}
