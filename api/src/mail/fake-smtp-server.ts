import { Logger } from '@nestjs/common';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { randomBytes, timingSafeEqual } from 'node:crypto';
import { SMTPServer } from 'smtp-server';

/** Compares two secrets in time that does not depend on where they differ. */
function sameText(given: string, expected: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

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
 * A mail server on loopback that hands every message, parsed, to `store`. It stands in for a real
 * server when none is configured, so mail can be read inside the product. It takes mail only
 * from the product itself: a sender must sign in with a random credential made at each start and
 * never written anywhere, so another process on the machine cannot plant a message (a forged
 * reset mail) in the outbox.
 */
export class FakeSmtpServer {
  private readonly logger = new Logger('FakeSmtpServer');
  private readonly server: SMTPServer;
  /** The only user and password the server accepts, for this process's lifetime. */
  readonly credential = {
    user: `loftwright-${randomBytes(6).toString('hex')}`,
    pass: randomBytes(32).toString('base64url'),
  };

  constructor(store: (mail: ReceivedMail) => Promise<void>) {
    this.server = new SMTPServer({
      authOptional: false,
      authMethods: ['PLAIN'],
      // Loopback only, so the credential never crosses a network; there is no TLS to offer.
      allowInsecureAuth: true,
      disabledCommands: ['STARTTLS'],
      onAuth: (auth, _session, callback) => {
        const accepted =
          auth.method === 'PLAIN' &&
          sameText(auth.username ?? '', this.credential.user) &&
          sameText(auth.password ?? '', this.credential.pass);
        if (accepted) callback(null, { user: auth.username });
        else callback(new Error('Authentication refused'));
      },
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
