import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import type { CapturedMail } from '../../shared/schemas/mailbox.schemas';

export interface SmtpFake {
  url: string;
  /** Newest last. Kept in memory: the fake is for demo, development and tests only. */
  messages: CapturedMail[];
  close(): Promise<void>;
}

/** A local SMTP server that accepts every message and keeps it, so nothing leaves the machine. */
export async function startSmtpFake(port = 0): Promise<SmtpFake> {
  const messages: CapturedMail[] = [];
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const to = session.envelope.rcptTo.map((r) => r.address).join(', ');
          const attachments = mail.attachments.map((a) => ({ filename: a.filename ?? '', contentType: a.contentType, content: a.content.toString('utf8') }));
          messages.push({ id: messages.length + 1, to, subject: mail.subject ?? '', text: mail.text ?? '', html: typeof mail.html === 'string' ? mail.html : null, receivedAt: new Date().toISOString(), attachments });
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${address.port}`,
    messages,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
