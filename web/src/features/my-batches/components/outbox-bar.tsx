import { Button, MessageBar, MessageBarActions, MessageBarBody } from '@fluentui/react-components';
import { ArrowSync20Regular } from '@fluentui/react-icons';
import type { LogOutboxState } from '../offline/use-log-outbox.js';
import { MY_BATCHES_WORDS, waitingText } from '../utils/my-batches-words.js';

/** Says how many log entries wait on the device, with a button to send them now. */
export function OutboxBar({ outbox }: { outbox: LogOutboxState }) {
  const waiting = outbox.entries.filter((e) => e.refused === undefined).length;
  if (waiting === 0) return null;
  return (
    <MessageBar intent="warning" aria-label={MY_BATCHES_WORDS.waiting}>
      <MessageBarBody>{waitingText(waiting)}</MessageBarBody>
      <MessageBarActions>
        <Button
          icon={<ArrowSync20Regular />}
          disabled={outbox.sending}
          onClick={() => void outbox.send().catch(() => undefined)}
        >
          {outbox.sending ? MY_BATCHES_WORDS.sendingNow : MY_BATCHES_WORDS.sendNow}
        </Button>
      </MessageBarActions>
    </MessageBar>
  );
}
