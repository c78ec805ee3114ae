import { Button, MessageBar, MessageBarActions, MessageBarBody } from '@fluentui/react-components';
import { ArrowSync20Regular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import type { LogOutboxState } from '../offline/use-log-outbox.js';

/** Says how many log entries wait on the device, with a button to send them now. */
export function OutboxBar({ outbox }: { outbox: LogOutboxState }) {
  const { t } = useTranslation('batches');
  const waiting = outbox.entries.filter((e) => e.refused === undefined).length;
  if (waiting === 0) return null;
  return (
    <MessageBar intent="warning" aria-label={t('offline.waiting')}>
      <MessageBarBody>{t('offline.waitingCount', { count: waiting })}</MessageBarBody>
      <MessageBarActions>
        <Button
          icon={<ArrowSync20Regular />}
          disabled={outbox.sending}
          onClick={() => void outbox.send().catch(() => undefined)}
        >
          {outbox.sending ? t('offline.sending') : t('offline.sendNow')}
        </Button>
      </MessageBarActions>
    </MessageBar>
  );
}
