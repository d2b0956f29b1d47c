import type { OutboxMessage as OutboxMessageView, Page } from '@loftwright/contract';
import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import nodemailer, { type Transporter } from 'nodemailer';
import { Repository } from 'typeorm';
import type { EnvironmentVariables } from '../config/env.validation';
import { WriteLock } from '../persistence/write-lock';
import { FakeSmtpServer } from './fake-smtp-server';
import type { MailMessage } from './mail-templates';
import { OutboxMessage } from './outbox-message.entity';

/**
 * Sends mail over SMTP with nodemailer: to SMTP_URL when set, otherwise to a fake server on
 * loopback that keeps every message in the outbox table. Sending never blocks or fails the
 * request that caused it; a failure is logged.
 */
@Injectable()
export class MailService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('MailService');
  private transporter?: Transporter;
  private fakeServer?: FakeSmtpServer;
  private readonly pending = new Set<Promise<void>>();
  private fakePort?: number;

  constructor(
    private readonly config: ConfigService<EnvironmentVariables, true>,
    @InjectRepository(OutboxMessage) private readonly outbox: Repository<OutboxMessage>,
    private readonly writeLock: WriteLock,
  ) {}

  async onModuleInit(): Promise<void> {
    const smtpUrl = this.config.get('SMTP_URL', { infer: true });
    if (smtpUrl) {
      this.transporter = nodemailer.createTransport(smtpUrl);
      this.logger.log('Mail goes to the SMTP server in SMTP_URL');
      return;
    }
    this.fakeServer = new FakeSmtpServer(async (mail) => {
      await this.writeLock.run(() => this.outbox.insert({ ...mail }));
    });
    const port = await this.fakeServer.listen();
    this.fakePort = port;
    this.transporter = nodemailer.createTransport({
      host: '127.0.0.1',
      port,
      secure: false,
      ignoreTLS: true,
      auth: { ...this.fakeServer.credential },
    });
    this.logger.log(
      `Mail is kept by the local mail server on port ${port} (GET /api/admin/outbox)`,
    );
  }

  async onModuleDestroy(): Promise<void> {
    await this.flush();
    this.transporter?.close();
    await this.fakeServer?.close();
  }

  /** Queues a message; the caller does not wait for the SMTP exchange. */
  send(message: MailMessage): void {
    if (message.to.length === 0) return;
    const transporter = this.transporter;
    if (!transporter) {
      this.logger.error(`Mail is not set up; dropped "${message.subject}"`);
      return;
    }
    const delivery = transporter
      .sendMail({ from: this.config.get('MAIL_FROM', { infer: true }), ...message })
      .then(() => undefined)
      .catch((error: unknown) =>
        this.logger.error(`Could not send "${message.subject}": ${String(error)}`),
      )
      .finally(() => this.pending.delete(delivery));
    this.pending.add(delivery);
  }

  /** Waits for every message queued so far (shutdown, tests). */
  async flush(): Promise<void> {
    await Promise.all([...this.pending]);
  }

  /** Where the local mail server listens (tests send to it directly); undefined with SMTP_URL. */
  get localServerPort(): number | undefined {
    return this.fakePort;
  }

  listOutbox(page: number, pageSize: number): Promise<Page<OutboxMessageView>> {
    return this.outbox
      .findAndCount({ order: { id: 'DESC' }, skip: (page - 1) * pageSize, take: pageSize })
      .then(([rows, total]) => ({
        items: rows.map((row): OutboxMessageView => ({
          id: row.id,
          from: row.from,
          to: row.to,
          subject: row.subject,
          text: row.text,
          attachments: row.attachments,
          receivedAt: new Date(row.receivedAt).toISOString(),
        })),
        total,
        page,
        pageSize,
      }));
  }
}
