import { Button, MessageBar, MessageBarBody } from '@fluentui/react-components';
import { PauseRegular, PlayRegular, StopRegular } from '@fluentui/react-icons';
import type { PlantShare, ShareStatus } from '@homeground/shared';
import { type ReactElement, useState } from 'react';
import { useShareStatusMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { ORGANISER_WORDS as W } from '../utils/organiser-words.js';
import { useOrganiserStyles } from './organiser.styles.js';

const ACTIONS: Record<ShareStatus, { to: ShareStatus; label: string; icon: ReactElement }[]> = {
  open: [
    { to: 'paused', label: W.pause, icon: <PauseRegular /> },
    { to: 'closed', label: W.close, icon: <StopRegular /> },
  ],
  paused: [
    { to: 'open', label: W.open, icon: <PlayRegular /> },
    { to: 'closed', label: W.close, icon: <StopRegular /> },
  ],
  closed: [],
};

/** Where the share stands (open, paused, closed), the households so far, and the moves from here. */
export function ShareStatusCard({ share }: { share: PlantShare }) {
  const styles = useOrganiserStyles();
  const status = useShareStatusMutation(share.groupSlug);
  const [changed, setChanged] = useState(false);
  const h = share.households;
  return (
    <ContentCard aria-labelledby="share-status">
      <Heading level="section" id="share-status">
        {W.statusHeading}: {W.status[share.status]}
      </Heading>
      <p className={styles.lead}>
        {W.statusLead[share.status]} {W.householdsLine(h.confirmed, h['picked-up'], h['no-show'], share.walkUps)}
      </p>
      {status.isError ? (
        <MessageBar intent="error">
          <MessageBarBody>{status.error.message}</MessageBarBody>
        </MessageBar>
      ) : null}
      {changed && !status.isError ? (
        <MessageBar intent="success">
          <MessageBarBody>{W.statusChanged}</MessageBarBody>
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
            {a.label}
          </Button>
        ))}
      </div>
    </ContentCard>
  );
}
