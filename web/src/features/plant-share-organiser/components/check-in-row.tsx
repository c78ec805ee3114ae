import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { CheckmarkRegular, DismissRegular } from '@fluentui/react-icons';
import type { CheckInRequest, ReservationStatus } from '@homeground/shared';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  row: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) auto',
    gap: tokens.spacingHorizontalL,
    alignItems: 'center',
    padding: `${tokens.spacingVerticalM} 0`,
    borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    '@media (max-width: 480px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  name: { fontWeight: tokens.fontWeightSemibold, fontSize: tokens.fontSizeBase400 },
  plants: { color: tokens.colorNeutralForeground2 },
  state: { fontSize: tokens.fontSizeBase200 },
  actions: { display: 'flex', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
  // Volunteers tap these outdoors, often with gloves on: well above the 44 px minimum (common practice).
  big: { minHeight: '56px', minWidth: '8.5rem', fontSize: tokens.fontSizeBase400 },
});

export interface CheckInRowProps {
  name: string;
  /** The plants as a line, e.g. "2 × Wild bergamot, 1 × Butterfly milkweed". */
  plantsLine: string;
  state: ReservationStatus;
  isPending: boolean;
  onMark: (outcome: CheckInRequest['outcome']) => void;
}

/** One household at check-in: who, what, and two big buttons (checked in / no-show) until one is tapped. */
export function CheckInRow({ name, plantsLine, state, isPending, onMark }: CheckInRowProps) {
  const { t } = useTranslation('organiser');
  const styles = useStyles();
  return (
    <li className={styles.row} aria-label={name}>
      <div>
        <div className={styles.name}>{name}</div>
        <div className={styles.plants}>{plantsLine}</div>
        <div className={styles.state} aria-live="polite">
          {t(`stateWords.${state}`)}
        </div>
      </div>
      <div className={styles.actions}>
        {state === 'confirmed' ? (
          <>
            <Button
              className={styles.big}
              appearance="primary"
              icon={<CheckmarkRegular />}
              aria-label={t('checkInFor', { name })}
              disabled={isPending}
              onClick={() => onMark('picked-up')}
            >
              {t('checkedIn')}
            </Button>
            <Button
              className={styles.big}
              icon={<DismissRegular />}
              aria-label={t('noShowFor', { name })}
              disabled={isPending}
              onClick={() => onMark('no-show')}
            >
              {t('noShow')}
            </Button>
          </>
        ) : null}
      </div>
    </li>
  );
}
