import { Button, makeStyles, tokens, ToggleButton } from '@fluentui/react-components';
import {
  ArrowSwap20Regular,
  LockClosed20Regular,
  LockOpen20Regular,
  SubtractCircle20Regular,
} from '@fluentui/react-icons';

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
  return (
    <div className={styles.row} role="group" aria-label={`Changes for ${name}`} data-print="hide">
      <ToggleButton
        size="small"
        checked={isLocked}
        icon={isLocked ? <LockClosed20Regular /> : <LockOpen20Regular />}
        onClick={onToggleLock}
        disabled={disabled}
        aria-label={`Keep ${name}`}
      >
        {isLocked ? 'Kept' : 'Keep'}
      </ToggleButton>
      <ToggleButton
        size="small"
        checked={isExcluded}
        icon={<SubtractCircle20Regular />}
        onClick={onToggleExclude}
        disabled={disabled}
        aria-label={`Leave out ${name}`}
      >
        {isExcluded ? 'Left out' : 'Leave out'}
      </ToggleButton>
      <Button
        size="small"
        icon={<ArrowSwap20Regular />}
        onClick={onSwap}
        disabled={disabled}
        aria-label={`Swap ${name}`}
      >
        Swap
      </Button>
    </div>
  );
}
