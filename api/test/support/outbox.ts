import type { NestExpressApplication } from '@nestjs/platform-express';
import { MailService } from '../../src/mail/mail.service';

export interface OutboxItem {
  to: string[];
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; sizeBytes: number }[];
}

/**
 * Mail the local fake server received, after every queued message has finished its SMTP exchange.
 * Reads the outbox as the admin page does, through the service that the route uses.
 */
export async function readOutbox(app: NestExpressApplication): Promise<OutboxItem[]> {
  const mail = app.get(MailService);
  await mail.flush();
  const { items } = await mail.listOutbox(1, 100);
  return items;
}
