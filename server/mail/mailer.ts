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
  const transport = nodemailer.createTransport(smtpUrl.startsWith('smtp://127.0.0.1') ? { url: smtpUrl, ignoreTLS: true } as never : smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    close: () => transport.close(),
  };
}
