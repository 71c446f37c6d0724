import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import type { CapturedMail } from '@shared/schemas/mailbox.schemas';
import { FaultPlan, pause, type FaultControls } from './fault-plan';

export interface SmtpFake extends FaultControls {
  url: string;
  /** Newest last. Kept in memory: the fake is for demo, development and tests only. */
  messages: CapturedMail[];
  close(): Promise<void>;
}

/** A local SMTP server that accepts every message and keeps it, so nothing leaves the machine. */
export async function startSmtpFake(port = 0): Promise<SmtpFake> {
  const messages: CapturedMail[] = [];
  const faults = new FaultPlan();
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    logger: false,
    onData(stream, session, callback) {
      const fault = faults.take();
      simpleParser(stream)
        .then(async (mail) => {
          // 451: a temporary refusal (RFC 5321 §4.2.1), the message is not kept and the sender should retry.
          if (fault?.kind === 'fail') return callback(Object.assign(new Error('Try again later (fake)'), { responseCode: 451 }));
          if (fault?.kind === 'slow') await pause(fault.ms);
          const to = session.envelope.rcptTo.map((r) => r.address).join(', ');
          const attachments = mail.attachments.map((a) => ({ filename: a.filename ?? '', contentType: a.contentType, content: a.content.toString('utf8') }));
          messages.push({
            id: messages.length + 1,
            to,
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : null,
            receivedAt: new Date().toISOString(),
            attachments,
          });
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
    failNext: (n) => faults.failNext(n),
    slowNext: (n, ms) => faults.slowNext(n, ms),
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
