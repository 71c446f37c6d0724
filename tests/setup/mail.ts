import type { SmtpFake } from '@server/fakes/smtp-fake';

/** The first e-mail the local SMTP fake received for `to`, waiting up to 2.5 s for it to arrive. */
export async function waitForMail(smtp: SmtpFake, to: string) {
  for (let i = 0; i < 50; i++) {
    const mail = smtp.messages.find((m) => m.to === to);
    if (mail) return mail;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no e-mail to ${to}`);
}
