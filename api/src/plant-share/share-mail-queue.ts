import { Injectable, Logger } from '@nestjs/common';
import { MailService } from '../mail/mail.service.js';
import type { MailMessage } from '../mail/mail-message.js';

/**
 * Plant-share e-mails go out after the answer, one at a time: a burst of reservations the moment a
 * share opens must not wait on the mail server, nor compete with the reservations for the one
 * database connection. A failed send is logged; the reservation stands and its page shows the link.
 */
@Injectable()
export class ShareMailQueue {
  private readonly logger = new Logger('PlantShareMail');
  private tail: Promise<void> = Promise.resolve();

  constructor(private readonly mail: MailService) {}

  send(message: MailMessage): void {
    this.tail = this.tail.then(() =>
      this.mail.send(message).then(
        () => undefined,
        (e: unknown) => this.logger.error(`A ${message.kind} e-mail failed: ${String(e)}`),
      ),
    );
  }

  /** Resolves once every e-mail queued so far has been handed to the mail server (tests wait on it). */
  idle(): Promise<void> {
    return this.tail;
  }
}
