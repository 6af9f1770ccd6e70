import { randomUUID } from 'node:crypto';
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
  type OnModuleInit,
} from '@nestjs/common';
import { simpleParser } from 'mailparser';
import nodemailer, { type Transporter } from 'nodemailer';
import { DataSource, IsNull, LessThan, MoreThanOrEqual, Not, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { CONFIG, type Config } from '../config.js';
import { Transactions } from '../database/transactions.js';
import { User } from '../users/entities/user.entity.js';
import { OutgoingMail } from './entities/outgoing-mail.entity.js';
import { FakeSmtp } from './fake-smtp.js';

const FROM = 'Gumshoe <gumshoe@localhost>';
const MAX_ATTEMPTS = 5;

export interface KeptMessage {
  id: string;
  date: string | null;
  from: string;
  to: string;
  subject: string;
  text: string;
}

/** Where mail goes and how it is doing, for the administrator; no credentials ever shown. */
export interface MailSettings {
  transport: 'local' | 'smtp';
  /** The SMTP server, without user or password. */
  server: string;
  from: string;
  /** Who is mailed when the server flags a lot: the active supervisors. */
  flaggedLotRecipients: string[];
  queue: { sent: number; waiting: number; failed: number };
}

export function mailFolder(dataDir: string): string {
  return join(dataDir, 'mail');
}

@Injectable()
export class MailService implements OnModuleInit, OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private fake: FakeSmtp | undefined;
  private fakePort: number | undefined;
  private transport: Transporter | undefined;
  private sending: Promise<void> = Promise.resolve();
  /** Something may be waiting: mail was queued, or a send failed, since the queue was last read. */
  private unsent = true;

  constructor(
    @Inject(CONFIG) private readonly config: Config,
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    private readonly dataSource: DataSource,
  ) {}

  async onModuleInit(): Promise<void> {
    if (this.config.smtpUrl) {
      this.transport = nodemailer.createTransport(this.config.smtpUrl);
      return;
    }
    this.fake = new FakeSmtp(mailFolder(this.config.dataDir));
    const port = await this.fake.listen();
    this.fakePort = port;
    this.transport = nodemailer.createTransport({
      host: '127.0.0.1',
      port,
      secure: false,
      ignoreTLS: true,
    });
  }

  /** Mail that was queued before a restart goes out now. */
  onApplicationBootstrap(): void {
    void this.flush();
  }

  async onModuleDestroy(): Promise<void> {
    await this.sending;
    this.transport?.close();
    await this.fake?.close();
  }

  /**
   * Queues a message inside the caller's transaction. A second message with the same key is
   * dropped: that is what makes "lot flagged" mail go out once, however often the lot is pushed.
   */
  async enqueue(manager: EntityManager, key: string, to: string[], subject: string, text: string) {
    this.unsent = true;
    await manager
      .createQueryBuilder()
      .insert()
      .into(OutgoingMail)
      .values({
        id: randomUUID(),
        dedupeKey: key,
        to,
        subject,
        text,
        createdAt: new Date(),
        attempts: 0,
      })
      .orIgnore()
      .execute();
  }

  /** Sends what is queued; call after the queuing transaction committed. One run at a time. */
  flush(): Promise<void> {
    this.sending = this.sending.then(() => this.sendPending());
    return this.sending;
  }

  private async sendPending(): Promise<void> {
    // Every sync push calls flush; most queue nothing, and then there is nothing to read.
    if (!this.unsent) return;
    this.unsent = false;
    // Read and marked in the writers' queue: on the shared connection a plain read could see the
    // mail of a transaction that has not committed (and may yet roll back).
    const pending = await this.transactions.run((manager) =>
      manager.find(OutgoingMail, {
        where: { sentAt: IsNull(), attempts: LessThan(MAX_ATTEMPTS) },
        order: { createdAt: 'ASC' },
      }),
    );
    for (const mail of pending) {
      try {
        await this.transport?.sendMail({
          from: FROM,
          to: mail.to,
          subject: mail.subject,
          text: mail.text,
        });
        const sent = { sentAt: new Date(), attempts: mail.attempts + 1 };
        await this.transactions.run((manager) =>
          manager.update(OutgoingMail, { id: mail.id }, sent),
        );
      } catch (error) {
        const lastError = String((error as Error).message).slice(0, 500);
        this.logger.warn(`Could not send "${mail.subject}": ${lastError}`);
        this.unsent = true;
        const failed = { attempts: mail.attempts + 1, lastError };
        await this.transactions.run((manager) =>
          manager.update(OutgoingMail, { id: mail.id }, failed),
        );
      }
    }
  }

  async settings(): Promise<MailSettings> {
    const { manager } = this.dataSource;
    const [supervisors, sent, waiting, failed] = await Promise.all([
      manager.find(User, {
        select: { email: true },
        where: { role: 'supervisor', active: true },
        order: { email: 'ASC' },
      }),
      manager.countBy(OutgoingMail, { sentAt: Not(IsNull()) }),
      manager.countBy(OutgoingMail, { sentAt: IsNull(), attempts: LessThan(MAX_ATTEMPTS) }),
      manager.countBy(OutgoingMail, { sentAt: IsNull(), attempts: MoreThanOrEqual(MAX_ATTEMPTS) }),
    ]);
    return {
      transport: this.fake ? 'local' : 'smtp',
      server: this.fake
        ? `smtp://127.0.0.1:${this.fakePort}`
        : withoutCredentials(this.config.smtpUrl!),
      from: FROM,
      flaggedLotRecipients: supervisors.map((s) => s.email),
      queue: { sent, waiting, failed },
    };
  }

  /** A message that only proves delivery works; each one is new, so none is held back as a repeat. */
  async sendTest(actorId: string, to: string): Promise<void> {
    const key = `test:${randomUUID()}`;
    await this.transactions.run(async (manager) => {
      await this.enqueue(
        manager,
        key,
        [to],
        'Gumshoe test message',
        'This message was sent from the plant server to check that its mail reaches you. No action is needed.',
      );
      await this.audit.record(manager, actorId, 'mail.test', 'mail', key, null, { to });
    });
    await this.flush();
  }

  /** The messages the local mail server kept, newest first. */
  async kept(): Promise<KeptMessage[]> {
    const folder = mailFolder(this.config.dataDir);
    const names = (await readdir(folder))
      .filter((name) => name.endsWith('.eml'))
      .sort()
      .reverse();
    return Promise.all(
      names.map(async (name) => {
        const parsed = await simpleParser(await readFile(join(folder, name)));
        const to = Array.isArray(parsed.to)
          ? parsed.to.map((a) => a.text).join(', ')
          : parsed.to?.text;
        return {
          id: name.replace(/\.eml$/, ''),
          date: parsed.date?.toISOString() ?? null,
          from: parsed.from?.text ?? '',
          to: to ?? '',
          subject: parsed.subject ?? '',
          text: parsed.text ?? '',
        };
      }),
    );
  }
}

function withoutCredentials(url: string): string {
  try {
    const parsed = new URL(url);
    parsed.username = '';
    parsed.password = '';
    return parsed.toString();
  } catch {
    return 'the server in SMTP_URL (not a URL that can be shown)';
  }
}
