import { MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { useEffect, useRef } from 'react';
import type { ReservationCreated } from '@homeground/shared';
import { matchPath } from 'react-router-dom';
import { RouterLink } from '../../../components/links/router-link.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { paths } from '../../../config/paths.js';
import { ReservationSummary } from './reservation-summary.js';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({ note: { marginBottom: tokens.spacingVerticalXL } });

/** The page a taker sees right after reserving: pickup details, the care sheet and the e-mail note. */
export function Confirmation({ reservation }: { reservation: ReservationCreated }) {
  const { t } = useTranslation('taker');
  const styles = useStyles();
  const ref = useRef<HTMLDivElement>(null);
  const manageHref = manageHrefOf(reservation.manageUrl);
  // Focus moves to the new heading so screen-reader users hear that the reservation went through.
  useEffect(() => {
    const heading = ref.current?.querySelector('h1');
    if (!heading) return;
    heading.tabIndex = -1;
    heading.focus();
  }, []);
  return (
    <div ref={ref}>
      <PageIntro title={t('confirmedTitle')} />
      <MessageBar intent="success" className={styles.note} layout="multiline">
        <MessageBarBody>
          {t('confirmedEmail', { email: reservation.email })}{' '}
          {manageHref ? <RouterLink to={manageHref}>{t('manageLink')}</RouterLink> : null}
        </MessageBarBody>
      </MessageBar>
      <ReservationSummary reservation={reservation} />
    </div>
  );
}

/** The private link the API wrote, as this app's own path (it carries the secret that opens the reservation). */
function manageHrefOf(manageUrl: string): string | null {
  let pathname: string;
  try {
    pathname = new URL(manageUrl, window.location.origin).pathname;
  } catch {
    return null;
  }
  const token = matchPath(paths.reservation.path, pathname)?.params.token;
  return token ? paths.reservation.build(token) : null;
}
