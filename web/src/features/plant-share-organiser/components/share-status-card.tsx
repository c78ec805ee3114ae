import { Button, MessageBar, MessageBarBody } from '@fluentui/react-components';
import { PauseRegular, PlayRegular, StopRegular } from '@fluentui/react-icons';
import type { PlantShare, ShareStatus } from '@homeground/shared';
import { type ReactElement, useState } from 'react';
import { useShareStatusMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useTranslation } from 'react-i18next';
import { useOrganiserStyles } from './organiser.styles.js';

const ACTIONS: Record<ShareStatus, { to: ShareStatus; label: 'open' | 'pause' | 'close'; icon: ReactElement }[]> = {
  open: [
    { to: 'paused', label: 'pause', icon: <PauseRegular /> },
    { to: 'closed', label: 'close', icon: <StopRegular /> },
  ],
  paused: [
    { to: 'open', label: 'open', icon: <PlayRegular /> },
    { to: 'closed', label: 'close', icon: <StopRegular /> },
  ],
  closed: [],
};

/** Where the share stands (open, paused, closed), the households so far, and the moves from here. */
export function ShareStatusCard({ share }: { share: PlantShare }) {
  const { t } = useTranslation('organiser');
  const styles = useOrganiserStyles();
  const status = useShareStatusMutation(share.groupSlug);
  const [changed, setChanged] = useState(false);
  const h = share.households;
  return (
    <ContentCard aria-labelledby="share-status">
      <Heading level="section" id="share-status">
        {t('statusLine', { status: t(`status.${share.status}`) })}
      </Heading>
      <p className={styles.lead}>
        {t(`statusLead.${share.status}`)}{' '}
        {t('householdsLine', {
          confirmed: h.confirmed,
          pickedUp: h['picked-up'],
          noShow: h['no-show'],
          walkUps: share.walkUps,
        })}
      </p>
      {status.isError ? (
        <MessageBar intent="error">
          <MessageBarBody>{status.error.message}</MessageBarBody>
        </MessageBar>
      ) : null}
      {changed && !status.isError ? (
        <MessageBar intent="success">
          <MessageBarBody>{t('statusChanged')}</MessageBarBody>
        </MessageBar>
      ) : null}
      <div className={styles.actions}>
        {ACTIONS[share.status].map((a) => (
          <Button
            key={a.to}
            className={styles.big}
            icon={a.icon}
            disabled={status.isPending}
            onClick={() => status.mutate(a.to, { onSuccess: () => setChanged(true) })}
          >
            {t(a.label)}
          </Button>
        ))}
      </div>
    </ContentCard>
  );
}
