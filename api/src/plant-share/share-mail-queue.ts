import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { MailService } from '../mail/mail.service.js';
import type { MailMessage } from '../mail/mail-message.js';

/** How long the queue waits for a quiet moment before it sends (a burst keeps pushing this back)… */
const QUIET_MS = 150;
/** …but never longer than this after the oldest message waiting. */
const MAX_WAIT_MS = 2000;

/**
 * Plant-share e-mails go out after the answer, one at a time: a burst of reservations the moment a
 * share opens must not wait on the mail server, nor compete with the reservations for the CPU and the
 * one database connection. So a message is queued as a recipe (`render`), rendered only when it is
 * sent, and sending starts once no new message has come for a short quiet moment (at most two seconds
 * after the oldest one waiting). A failed send is logged; the reservation stands and its page shows
 * the link.
 */
@Injectable()
export class ShareMailQueue implements OnModuleDestroy {
  private readonly logger = new Logger('PlantShareMail');
  private readonly waiting: (() => MailMessage)[] = [];
  private timer: NodeJS.Timeout | null = null;
  private oldestAt = 0;
  private draining: Promise<void> | null = null;

  constructor(private readonly mail: MailService) {}

  /** Queues a message; `render` runs when the message is sent, not in the request that queued it. */
  send(render: () => MailMessage): void {
    if (this.waiting.length === 0) this.oldestAt = Date.now();
    this.waiting.push(render);
    if (this.draining) return;
    if (this.timer) clearTimeout(this.timer);
    const wait = Math.max(0, Math.min(QUIET_MS, this.oldestAt + MAX_WAIT_MS - Date.now()));
    this.timer = setTimeout(() => void this.drain(), wait);
    this.timer.unref();
  }

  /** Sends everything queued now, without waiting for a quiet moment; resolves once all of it is handed over. */
  async idle(): Promise<void> {
    while (this.waiting.length > 0 || this.draining) await this.drain();
  }

  /** What is still queued goes out before the app stops (the local outbox may have closed: then it is logged). */
  onModuleDestroy(): Promise<void> {
    return this.idle();
  }

  private drain(): Promise<void> {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    this.draining ??= (async () => {
      for (let next = this.waiting.shift(); next; next = this.waiting.shift()) {
        let message: MailMessage | null = null;
        try {
          message = next();
          await this.mail.send(message);
        } catch (e: unknown) {
          this.logger.error(`A ${message?.kind ?? 'plant-share'} e-mail failed: ${String(e)}`);
        }
      }
    })().finally(() => {
      this.draining = null;
    });
    return this.draining;
  }
}
