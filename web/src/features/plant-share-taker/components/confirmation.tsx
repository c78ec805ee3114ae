import { MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { useEffect, useRef } from 'react';
import type { ReservationCreated } from '@homeground/shared';
import { PageIntro } from '../../../components/page/page-intro.js';
import { TAKER_WORDS as W } from '../utils/taker-words.js';
import { ReservationSummary } from './reservation-summary.js';

const useStyles = makeStyles({ note: { marginBottom: tokens.spacingVerticalXL } });

/** The page a taker sees right after reserving: pickup details, the care sheet and the e-mail note. */
export function Confirmation({ reservation }: { reservation: ReservationCreated }) {
  const styles = useStyles();
  const ref = useRef<HTMLDivElement>(null);
  // Focus moves to the new heading so screen-reader users hear that the reservation went through.
  useEffect(() => {
    const heading = ref.current?.querySelector('h1');
    if (!heading) return;
    heading.tabIndex = -1;
    heading.focus();
  }, []);
  return (
    <div ref={ref}>
      <PageIntro title={W.confirmedTitle} />
      <MessageBar intent="success" className={styles.note} layout="multiline">
        <MessageBarBody>{W.confirmedEmail(reservation.email)}</MessageBarBody>
      </MessageBar>
      <ReservationSummary reservation={reservation} />
    </div>
  );
}
