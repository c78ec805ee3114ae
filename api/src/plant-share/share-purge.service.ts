import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { MailService } from '../mail/mail.service.js';
import { Clock } from './clock.js';
import { ShareLedger } from './share-ledger.js';
import { TokenSupply } from './share-tokens.js';
import { ShareTxRunner, tx } from './share-tx.js';
import { addDays, ShareViews } from './share-views.js';

/** How often the purge runs after the one at start: hourly is well inside a retention counted in days. */
export const PURGE_INTERVAL_MS = 60 * 60 * 1000;

/**
 * Keeps takers' names and e-mails no longer than the share's retention: once `retention_days` have
 * passed after the share date, reservations and waitlist entries lose their name and e-mail, their
 * ZIP is cut to its 3-digit area and their private links stop working; the share's e-mails leave the
 * local outbox. Counts for the report stay. Runs at start and then every hour, together with moving
 * on waitlist offers nobody took up in time.
 */
@Injectable()
export class SharePurgeService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('PlantSharePurge');
  private timer: NodeJS.Timeout | null = null;

  constructor(
    private readonly runner: ShareTxRunner,
    private readonly mail: MailService,
    private readonly clock: Clock,
    private readonly ledger: ShareLedger,
    private readonly views: ShareViews,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.run();
    this.timer = setInterval(() => {
      this.run().catch((e: unknown) => this.logger.error(`Purge failed: ${String(e)}`));
    }, PURGE_INTERVAL_MS);
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
  }

  private async run(): Promise<void> {
    await this.expireOffers();
    await this.purge();
  }

  /** Waitlist offers not taken up in time move on to the next household, or back on offer. */
  async expireOffers(): Promise<number> {
    const nowMs = this.clock.now().getTime();
    const tokens = new TokenSupply();
    const moved = await this.runner.atomically(() => this.ledger.expireOffers(nowMs, tokens.rewind()));
    for (const m of moved) {
      if (m.offers.length === 0) continue;
      const share = await this.runner.read(() => this.views.shareById(m.shareId));
      await this.views.sendOffers(await this.views.groupById(share.group_id), share, m.offers);
    }
    return moved.length;
  }

  /** Purges every share whose retention has run out by now; answers how many shares were purged. */
  async purge(): Promise<number> {
    const now = this.clock.now();
    const today = now.toISOString().slice(0, 10);
    const due = (
      await this.runner.read(() =>
        tx.all<{ id: string; group_id: string; share_date: string; retention_days: number }>(
          'SELECT id, group_id, share_date, retention_days FROM plant_shares WHERE personal_data_purged_at IS NULL',
        ),
      )
    ).filter((s) => addDays(s.share_date, s.retention_days) < today);
    for (const s of due) {
      await this.runner.atomically(function* () {
        yield* tx.lockShare(s.id);
        yield* tx.run(
          `UPDATE share_reservations SET name = NULL, email = NULL, zip = substr(zip, 1, 3),
             token_hash = 'purged:' || id WHERE share_id = ?`,
          s.id,
        );
        yield* tx.run(
          `UPDATE share_waitlist SET name = NULL, email = NULL, zip = substr(zip, 1, 3), token_hash = NULL WHERE share_id = ?`,
          s.id,
        );
        yield* tx.run(`UPDATE plant_shares SET personal_data_purged_at = ? WHERE id = ?`, now.toISOString(), s.id);
      });
      await this.mail.forgetOutbox(s.group_id, 'plant-share-');
    }
    if (due.length) this.logger.log(`Deleted takers' names and e-mails of ${due.length} plant share(s)`);
    return due.length;
  }
}
