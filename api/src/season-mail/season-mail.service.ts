import { randomUUID } from 'node:crypto';
import {
  Inject,
  Injectable,
  Logger,
  NotFoundException,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  addDays,
  isoWeek,
  type Batch,
  type FrostWarningAnswer,
  type FrostWarningRequest,
  type WeeklySummaryAnswer,
  type WordLocale,
} from '@homeground/shared';
import { Repository } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user.js';
import { runSql } from '../common/database/dialect.js';
import { BatchesService } from '../batches/batches.service.js';
import { badRequestIn } from '../common/validation/bad-request.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { GroupsService } from '../groups/groups.service.js';
import { MailService } from '../mail/mail.service.js';
import { frostWarningEmail, weeklySummaryEmail } from './season-emails.js';
import type { MailLanguage } from './season-mail-words.js';
import { WeeklySummarySentRow } from './weekly-summary-sent.entity.js';

/** How far ahead an organiser may warn of a frost: about as far as a forecast is worth reading. */
export const FROST_WARNING_DAYS_AHEAD = 14;
/** The weekly job looks every hour; the first look of each ISO week sends that week's summaries. */
export const WEEKLY_CHECK_MS = 60 * 60 * 1000;

/** The scheduled job acts with an admin's reach (every group); it is never a signed-in person. */
const SCHEDULER: AuthenticatedUser = { id: 'weekly-summary-job', email: '', role: 'admin' };

/** Methods whose batches stand outdoors through the spring, whatever the step. */
const OUTDOOR_METHODS = new Set<Batch['method']>(['winter-sowing', 'outdoor-pot-winter']);

/**
 * Whether a batch has plants outdoors on a night: sown outdoor pots and covered containers, and
 * batches raised indoors once they are hardening off. Finished batches are left out.
 */
export function outdoorsOn(batch: Batch, night: string): boolean {
  if (batch.nextStep === null) return false;
  if (OUTDOOR_METHODS.has(batch.method)) return batch.totals.sown > 0;
  const hardenOff = batch.steps.find((s) => s.kind === 'harden-off');
  return hardenOff !== undefined && hardenOff.date <= night;
}

/**
 * Season e-mail to growers: the organiser's frost warning to everyone with batches outdoors, and a
 * weekly summary of each grower's next steps (sent by an hourly job, or now by an organiser). A
 * grower gets at most one summary per ISO week: the week is written to the database before the
 * message goes, under a unique key, so neither a restart nor a second instance sends it again.
 */
@Injectable()
export class SeasonMailService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('SeasonMail');
  private timer: NodeJS.Timeout | null = null;

  constructor(
    @InjectRepository(WeeklySummarySentRow) private readonly sentRows: Repository<WeeklySummarySentRow>,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly batches: BatchesService,
    private readonly groups: GroupsService,
    private readonly mail: MailService,
  ) {}

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => {
      void this.runWeekly(new Date().toISOString().slice(0, 10)).catch((e: unknown) =>
        this.logger.error(`Weekly summaries failed: ${e instanceof Error ? e.message : String(e)}`),
      );
    }, WEEKLY_CHECK_MS);
    // The job never keeps the process alive on its own (tests, shutdown).
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
  }

  /** The organiser's frost warning: one e-mail per grower with batches outdoors that night. */
  async frostWarning(
    slug: string,
    user: AuthenticatedUser,
    req: FrostWarningRequest,
    today: string,
    locale: WordLocale = 'en',
  ): Promise<FrostWarningAnswer> {
    // The locale words refusals only: each e-mail goes in its own words (see the mail builders).
    const c = await this.batches.organiser(slug, user, locale);
    const latest = addDays(today, FROST_WARNING_DAYS_AHEAD);
    if (req.night < today || req.night > latest)
      throw badRequestIn(locale, [{ field: 'night', message: `must be from ${today} to ${latest}` }]);
    const all = await this.batches.batchesOf(slug, user, c, today);
    const people = await this.groups.members(slug, user);
    const organiser = people.find((p) => p.userId === user.id)?.displayName ?? c.group.name;
    const byGrower = groupBy(
      all.filter((b) => outdoorsOn(b, req.night)),
      (b) => b.growerId,
    );
    const growers: FrostWarningAnswer['growers'] = [];
    for (const [growerId, list] of byGrower) {
      const person = people.find((p) => p.userId === growerId);
      if (!person?.email) continue;
      const lang = await this.languageOf(person.email);
      const message = frostWarningEmail(
        {
          name: person.displayName,
          organiser,
          groupName: c.group.name,
          night: req.night,
          ...(req.note && { note: req.note }),
          batches: list,
          link: `${this.config.publicUrl}/my-batches`,
        },
        lang,
      );
      await this.mail.send({ to: person.email, ...message, kind: 'frost-warning', groupId: c.group.id });
      growers.push({ userId: growerId, displayName: person.displayName, batches: list.length });
    }
    return { night: req.night, growers };
  }

  /** An organiser's "send now": this week's summary to each grower of the group who has not had it. */
  async sendWeeklyNow(
    slug: string,
    user: AuthenticatedUser,
    today: string,
    locale: WordLocale = 'en',
  ): Promise<WeeklySummaryAnswer> {
    await this.batches.organiser(slug, user, locale);
    return this.sendWeekly(slug, user, today);
  }

  /** The scheduled run: every group with a season. Returns what each group sent. */
  async runWeekly(today: string): Promise<Record<string, WeeklySummaryAnswer>> {
    const out: Record<string, WeeklySummaryAnswer> = {};
    for (const group of await this.groups.list()) {
      try {
        out[group.slug] = await this.sendWeekly(group.slug, SCHEDULER, today);
      } catch (e) {
        if (e instanceof NotFoundException) continue; // a group with no season yet
        throw e;
      }
    }
    return out;
  }

  private async sendWeekly(slug: string, actor: AuthenticatedUser, today: string): Promise<WeeklySummaryAnswer> {
    const c = await this.batches.organiser(slug, actor);
    const week = isoWeek(today);
    const all = await this.batches.batchesOf(slug, actor, c, today);
    const people = await this.groups.members(slug, actor);
    // A grower who reads Spanish gets the batches' own words (a batch behind its dates) in Spanish too.
    let spanish: Map<string, Batch[]> | undefined;
    const batchesIn = async (lang: MailLanguage, growerId: string, english: Batch[]): Promise<Batch[]> => {
      if (lang === 'en') return english;
      spanish ??= groupBy(
        await this.batches.batchesOf(slug, actor, c, today, undefined, undefined, 'es'),
        (b) => b.growerId,
      );
      return spanish.get(growerId) ?? english;
    };
    let sent = 0;
    let alreadySent = 0;
    for (const [growerId, english] of groupBy(all, (b) => b.growerId)) {
      const person = people.find((p) => p.userId === growerId);
      if (!person?.email) continue;
      const lang = await this.languageOf(person.email);
      const list = await batchesIn(lang, growerId, english);
      // Claim the week first: the unique key lets only one claim through, ever.
      if (!(await this.claim(c.group.id, growerId, week))) {
        alreadySent++;
        continue;
      }
      const message = weeklySummaryEmail(
        {
          name: person.displayName,
          groupName: c.group.name,
          batches: list,
          link: `${this.config.publicUrl}/my-batches`,
        },
        lang,
      );
      try {
        await this.mail.send({ to: person.email, ...message, kind: 'weekly-summary', groupId: c.group.id });
      } catch (e) {
        // Not sent, so not claimed: the next run tries this grower again.
        await this.sentRows.delete({ groupId: c.group.id, userId: growerId, week });
        throw e;
      }
      sent++;
    }
    return { week, sent, alreadySent };
  }

  /** Writes "this grower has this week's summary"; false when it was already written. */
  private async claim(groupId: string, userId: string, week: string): Promise<boolean> {
    // One statement, so two runs at once cannot both pass a check and both send.
    const rows = await runSql(
      this.sentRows.manager,
      `INSERT INTO "weekly_summaries_sent" ("id", "group_id", "user_id", "week") VALUES (?, ?, ?, ?)
       ON CONFLICT ("group_id", "user_id", "week") DO NOTHING RETURNING "id"`,
      [randomUUID(), groupId, userId, week],
    );
    return rows.length === 1;
  }

  /**
   * The language a grower reads e-mail in, from what the database already knows: the language of
   * their latest plant-share reservation or waitlist place made with the same address (kept until
   * the share's retention clears the address); English otherwise.
   * TODO(users.locale): a per-person language column, set from the sign-up and settings pages, would
   * be the better source; it waits for the migration rework.
   */
  private async languageOf(email: string): Promise<MailLanguage> {
    const rows = await runSql<{ locale: string }>(
      this.sentRows.manager,
      `SELECT locale FROM (
         SELECT locale, created_at AS at FROM share_reservations WHERE lower(email) = lower(?)
         UNION ALL
         SELECT locale, created_at AS at FROM share_waitlist WHERE lower(email) = lower(?)
       ) AS latest ORDER BY at DESC LIMIT 1`,
      [email, email],
    );
    return rows[0]?.locale === 'es' ? 'es' : 'en';
  }
}

function groupBy<T>(items: T[], key: (t: T) => string): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const item of items) out.set(key(item), [...(out.get(key(item)) ?? []), item]);
  return out;
}
