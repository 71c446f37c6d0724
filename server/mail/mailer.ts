import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  /** A simple HTML part beside the text (already escaped by its builder). */
  html?: string;
  attachments?: { filename: string; content: string; contentType: string }[];
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** nodemailer over SMTP; in demo/dev/test the URL points at the in-process fake (plain, no TLS). */
export function createMailer(smtpUrl: string, from: string): Mailer {
  // nodemailer waits up to 10 minutes on a silent socket by default; a send job must give up sooner and retry.
  const timeouts = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 };
  const transport = nodemailer.createTransport({ url: smtpUrl, ...timeouts, ...(smtpUrl.startsWith('smtp://127.0.0.1') ? { ignoreTLS: true } : {}) } as never);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    close: () => transport.close(),
  };
}
