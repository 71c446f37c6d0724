import type { Config } from './config';
import { startSmtpFake, type SmtpFake } from './fakes/smtp-fake';
import { startSmsFake, type SmsFake } from './fakes/sms-fake';
import { createMailer, type Mailer } from './mail/mailer';
import { createSmsSender, type SmsSender } from './sms/sms-sender';

export interface OutsideServices {
  mailer: Mailer;
  sms: SmsSender;
  smtpFake: SmtpFake | null;
  smsFake: SmsFake | null;
  close(): Promise<void>;
}

// A made-up account for the fake: the SDK only insists that the account id starts with "AC".
const FAKE_TWILIO = { accountSid: `AC${'0'.repeat(32)}`, authToken: 'local-fake', from: '+19705550100' };

/** E-mail and SMS senders: real services in production, in-process fakes everywhere else. */
export async function startOutsideServices(config: Config): Promise<OutsideServices> {
  const smtpFake = config.useFakes ? await startSmtpFake() : null;
  const smsFake = config.useFakes ? await startSmsFake() : null;
  const smtpUrl = smtpFake?.url ?? config.smtpUrl;
  if (!smtpUrl) throw new Error('SMTP_URL is required in production');
  const twilioConfig = smsFake ? { ...FAKE_TWILIO, baseUrl: smsFake.url } : config.twilio;
  if (!twilioConfig) throw new Error('TWILIO_ACCOUNT_SID and TWILIO_AUTH_TOKEN are required in production');
  const mailer = createMailer(smtpUrl, config.mailFrom);
  return {
    mailer,
    sms: createSmsSender(twilioConfig),
    smtpFake,
    smsFake,
    async close() {
      mailer.close();
      await smtpFake?.close();
      await smsFake?.close();
    },
  };
}
