import {
  Inject,
  Injectable,
  Logger,
  OnApplicationBootstrap,
  OnModuleDestroy,
} from '@nestjs/common';
import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/core';
import { AsyncLocalStorage } from 'node:async_hooks';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import type { Role } from '../auth/roles';
import { isoDate } from '../common/calendar';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { MailService } from '../mail/mail.service';
import { User } from '../users/entities/user.entity';
import { UpdateNoticeSettingsDto } from './dto/update-notice-settings.dto';
import { Notice, type NoticeKind } from './entities/notice.entity';
import { NoticeSettings } from './entities/notice-settings.entity';
import {
  AUDIENCE,
  defaultChoices,
  NOTICE_SWITCHES,
  offeredTo,
  SWITCH_OF,
  type NoticeChoices,
} from './notice-settings';
import { clock } from '../common/clock';

/** An event worth a notice; `key` names it once and for all (see Notice). */
export interface NoticeEvent {
  kind: NoticeKind;
  key: string;
  subject: string;
  /** The text; a line naming the switch and the profile page is added. */
  body: string;
  /** Whether a user's choices want it (default: the kind's own switch). */
  wants?: (c: NoticeChoices) => boolean;
  /** Users it is never for (the requester of a concession, who may not approve it). */
  exceptUserIds?: readonly number[];
}

/** The states `scan` looks for, in this order. */
export const WATCHED_STATES = ['lot awaiting a decision', 'corrective action overdue'] as const;
export type WatchedState = (typeof WATCHED_STATES)[number];

/** What a watch gets in one round of the scan. */
export interface WatchRound {
  em: EntityManager;
  now: Date;
  /** Whether a notice with this key was stored already (each event is noticed once). */
  noticed(key: string): Promise<boolean>;
  /** Raises the event in a transaction of its own; returns how many notices were stored. */
  raise(event: NoticeEvent): Promise<number>;
}

/** Finds a state's events and raises them; returns how many notices were stored. */
export type StateWatch = (round: WatchRound) => Promise<number>;

const RELATED = 'notice';

/** Set inside `withheld`: events of that work tell nobody. */
const withholding = new AsyncLocalStorage<true>();
const LABELS: Record<NoticeKind, string> = {
  lot_awaits_decision: 'A lot awaits a decision',
  lot_reject_number: 'A lot reaches its reject number',
  lot_rejected: 'A lot is rejected',
  scar_overdue: 'A corrective action falls overdue',
  scar_answered: 'A supplier answers a corrective action',
  concession_awaits_approval: 'A concession awaits my approval',
};

/**
 * E-mail notices to staff (issue 14 §6), each switchable per user, as single e-mails or one
 * daily digest. Everything goes through the durable mail queue (outbound_messages).
 *
 * Events raised inside a unit of work (a rejection, a supplier's answer) are stored with
 * it. Events that are states rather than actions (a lot awaiting a decision, a SCAR past
 * its date) are found by a scan every NOTICE_POLL_MS on every server; the unique
 * (user, key) of a notice makes each one once. The daily digest is driven by
 * `notice_settings.digest_sent_on`: one transaction claims the day, takes the waiting
 * notices and queues the e-mail, so a restart or a second server neither repeats nor
 * loses a digest, and a day missed while the server was down is sent when it comes back.
 */
@Injectable()
export class NoticesService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('Notices');
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;

  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    const every = this.config.notices.pollMs;
    if (every <= 0) return;
    this.timer = setInterval(() => void this.tick(), every);
    this.timer.unref();
  }

  async onModuleDestroy(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running;
  }

  /** One round of the job: scan for state events, then send the digests that are due. */
  tick(now = clock.now()): Promise<void> {
    if (this.running) return this.running;
    this.running = (async () => {
      try {
        await this.scan(now);
        await this.sendDigests(now);
      } catch (e) {
        this.logger.error(`The notice job stopped for now: ${(e as Error).message}`);
      } finally {
        this.running = null;
      }
    })();
    return this.running;
  }

  // ---- the user's choices ------------------------------------------------------------

  async choicesOf(em: EntityManager, user: User): Promise<NoticeChoices> {
    const row = await em.findOne(NoticeSettings, { user: user.id });
    return row ? pick(row) : defaultChoices(user.role);
  }

  async mine(actor: RequestUser) {
    const em = this.em.fork();
    const user = await em.findOneOrFail(User, actor.id);
    return {
      choices: await this.choicesOf(em, user),
      offered: offeredTo(user.role),
      digestHourUtc: this.config.notices.digestHourUtc,
    };
  }

  async update(actor: RequestUser, dto: UpdateNoticeSettingsDto) {
    const em = this.em.fork();
    const user = await em.findOneOrFail(User, actor.id);
    const before = await this.choicesOf(em, user);
    const after: NoticeChoices = { ...before };
    for (const s of [...NOTICE_SWITCHES, 'digest'] as const) {
      if (dto[s] !== undefined) after[s] = dto[s];
    }
    let row = await em.findOne(NoticeSettings, { user: user.id });
    if (!row) row = em.create(NoticeSettings, { user, ...after });
    else Object.assign(row, after);
    this.audit.record(em, actor, {
      action: 'notice_settings.update',
      entityType: 'user',
      entityId: user.id,
      before: { ...before },
      after: { ...after },
    });
    await em.flush();
    return this.mine(actor);
  }

  // ---- raising notices -----------------------------------------------------------------

  /**
   * Stores the event's notice for every active user whose choices want it, inside the
   * caller's unit of work: a single e-mail is queued with it, a digest one waits. Returns
   * how many were stored. Call `deliver()` once the unit of work is committed.
   */
  async raise(em: EntityManager, event: NoticeEvent): Promise<number> {
    if (withholding.getStore()) return 0;
    const sw = SWITCH_OF[event.kind];
    const roles: Role[] = [...AUDIENCE[sw], 'admin'];
    if (event.wants) roles.push(...(['qa_lead', 'purchasing'] as const));
    const users = await em.find(User, { active: true, role: { $in: [...new Set(roles)] } });
    if (!users.length) return 0;
    const rows = await em.find(NoticeSettings, { user: { $in: users.map((u) => u.id) } });
    const byUser = new Map(rows.map((r) => [r.user.id, pick(r)]));
    const known = new Set(
      (await em.find(Notice, { key: event.key }, { fields: ['user'] })).map((n) => n.user.id),
    );
    let stored = 0;
    const except = new Set(event.exceptUserIds ?? []);
    for (const user of users) {
      if (known.has(user.id) || except.has(user.id)) continue;
      const choices = byUser.get(user.id) ?? defaultChoices(user.role);
      const wants = event.wants ? event.wants(choices) : choices[sw];
      if (!wants) continue;
      const body = `${event.body}\n\n${this.footer(event.kind)}`;
      const notice = em.create(Notice, {
        user,
        kind: event.kind,
        key: event.key,
        subject: event.subject,
        body,
        delivery: choices.digest ? 'digest' : 'single',
      });
      if (!choices.digest) {
        const message = this.mail.enqueue(em, {
          to: user.email,
          subject: event.subject,
          body,
          relatedType: RELATED,
          relatedId: null,
        });
        await em.flush();
        notice.messageId = message.id;
      }
      stored++;
    }
    await em.flush();
    return stored;
  }

  /** An address in the app, for an e-mail. */
  link(path: string): string {
    return `${this.config.publicUrl}${path}`;
  }

  /** Sends what `raise` queued (the mail queue's poller would, a little later). */
  deliver(): void {
    if (withholding.getStore()) return;
    void this.mail.drain();
  }

  /**
   * Runs `fn` raising no notice and sending nothing for what it does: the demo seed tells
   * months of invented history through the real services, and none of its old events is
   * news to anyone. The state scan still finds what the history leaves open.
   */
  withheld<T>(fn: () => T): T {
    return withholding.run(true, fn);
  }

  private footer(kind: NoticeKind): string {
    return `You get this e-mail because "${LABELS[kind]}" is switched on in your profile: ${this.config.publicUrl}/profile`;
  }

  /** Raises an event in a transaction of its own; a twin raised elsewhere first is no error. */
  private async raiseAlone(event: NoticeEvent): Promise<number> {
    try {
      return await this.em.fork().transactional((tx) => this.raise(tx, event));
    } catch (e) {
      if (e instanceof UniqueConstraintViolationException) return 0;
      throw e;
    }
  }

  // ---- the scan: events that are states ----------------------------------------------

  private readonly watches = new Map<WatchedState, StateWatch>();

  /**
   * The domain that knows a state registers how to find it (the decisions module its lots
   * awaiting a decision, the corrective actions module its SCARs past their date), so the
   * notices sit below the domains that raise them.
   */
  watch(state: WatchedState, watch: StateWatch): void {
    this.watches.set(state, watch);
  }

  /** Lots awaiting a decision (or at their reject number) and SCARs past their date. */
  async scan(now = clock.now()): Promise<number> {
    const em = this.em.fork();
    const round: WatchRound = {
      em,
      now,
      noticed: async (key) => (await em.count(Notice, { key })) > 0,
      raise: (event) => this.raiseAlone(event),
    };
    let stored = 0;
    for (const state of WATCHED_STATES) {
      const watch = this.watches.get(state);
      if (watch) stored += await watch(round);
    }
    if (stored) this.deliver();
    return stored;
  }

  // ---- the daily digest ------------------------------------------------------------------

  /**
   * Sends each waiting user's digest once a day, from the digest hour (UTC) on. Returns the
   * number of digests queued.
   */
  async sendDigests(now = clock.now()): Promise<number> {
    if (now.getUTCHours() < this.config.notices.digestHourUtc) return 0;
    const today = isoDate(now);
    const waiting = await this.em
      .fork()
      .find(Notice, { delivery: 'digest', messageId: null }, { fields: ['user'] });
    const userIds = [...new Set(waiting.map((n) => n.user.id))].sort((a, b) => a - b);
    let sent = 0;
    for (const userId of userIds) {
      const queued = await this.em.fork().transactional(async (tx) => {
        // Claim today's digest of this user: only one transaction, on one server, gets it.
        const claimed = await tx.nativeUpdate(
          NoticeSettings,
          { user: userId, $or: [{ digestSentOn: null }, { digestSentOn: { $lt: today } }] },
          { digestSentOn: today },
        );
        if (!claimed) return false;
        const notices = await tx.find(
          Notice,
          { user: userId, delivery: 'digest', messageId: null },
          { orderBy: { id: 'asc' }, populate: ['user'] },
        );
        if (!notices.length) return false;
        const user = notices[0].user;
        const message = this.mail.enqueue(tx, {
          to: user.email,
          subject: `Gaugeproof daily digest, ${today}: ${notices.length} notice${notices.length === 1 ? '' : 's'}`,
          body: [
            `Good morning, ${user.name}. What happened since your last digest:`,
            ...notices.map(
              (n, i) => `${i + 1}. ${n.subject}\n\n${n.body.split('\n\nYou get this e-mail')[0]}`,
            ),
            `You get one digest a day because "Daily digest" is switched on in your profile: ${this.config.publicUrl}/profile`,
          ].join('\n\n—\n\n'),
          relatedType: RELATED,
          relatedId: null,
        });
        await tx.flush();
        for (const n of notices) n.messageId = message.id;
        await tx.flush();
        return true;
      });
      if (queued) sent++;
    }
    if (sent) this.deliver();
    return sent;
  }
}

function pick(row: NoticeSettings): NoticeChoices {
  return {
    lotAwaitsDecision: row.lotAwaitsDecision,
    lotRejectNumber: row.lotRejectNumber,
    lotRejected: row.lotRejected,
    scarOverdue: row.scarOverdue,
    scarAnswered: row.scarAnswered,
    concessionAwaitsApproval: row.concessionAwaitsApproval,
    digest: row.digest,
  };
}
