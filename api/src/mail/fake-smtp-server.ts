import { Logger } from '@nestjs/common';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

export interface ReceivedMail {
  from: string;
  to: string[];
  subject: string;
  text: string;
  messageId: string | null;
  /** What was attached: names, types and sizes (the bytes themselves are not kept). */
  attachments: { filename: string; contentType: string; sizeBytes: number }[];
}

/**
 * A mail server on loopback that accepts every message and hands it, parsed, to `store`. It
 * stands in for a real server when none is configured, so mail can be read inside the product.
 */
export class FakeSmtpServer {
  private readonly logger = new Logger('FakeSmtpServer');
  private readonly server: SMTPServer;

  constructor(store: (mail: ReceivedMail) => Promise<void>) {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      banner: 'Loftwright local mail',
      // Room for an archived sign-off PDF attached to an approval.
      size: 30 * 1024 * 1024,
      onData: (stream, session, callback) => {
        simpleParser(stream)
          .then((parsed) =>
            store({
              from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
              to: session.envelope.rcptTo.map((recipient) => recipient.address),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              messageId: parsed.messageId ?? null,
              attachments: parsed.attachments.map((attachment) => ({
                filename: attachment.filename ?? '',
                contentType: attachment.contentType,
                sizeBytes: attachment.size,
              })),
            }),
          )
          .then(() => callback())
          .catch((error: unknown) => {
            this.logger.error(`Could not keep a message: ${String(error)}`);
            callback(error instanceof Error ? error : new Error(String(error)));
          });
      },
    });
  }

  /** Listens on 127.0.0.1 at a free port and returns it. */
  listen(): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(0, '127.0.0.1', () => {
        resolve((this.server.server.address() as AddressInfo).port);
      });
    });
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
