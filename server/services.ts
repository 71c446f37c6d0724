import type { Config } from './config';
import { startSmtpFake, type SmtpFake } from './fakes/smtp-fake';
import { startSmsFake, type SmsFake } from './fakes/sms-fake';
import { createMailer, type Mailer } from './mail/mailer';
import { createSmsSender, type SmsSender } from './sms/sms-sender';
import { startPaymentsFake, type PaymentsFake } from './fakes/payments-fake';
import { createPayments, type Payments } from './payments/payments';

export interface OutsideServices {
  mailer: Mailer;
  sms: SmsSender;
  smtpFake: SmtpFake | null;
  smsFake: SmsFake | null;
  payments: Payments;
  paymentsFake: PaymentsFake | null;
  close(): Promise<void>;
}

// A made-up account for the fake: the SDK only insists that the account id starts with "AC".
export const FAKE_TWILIO = { accountSid: `AC${'0'.repeat(32)}`, authToken: 'local-fake', from: '+19705550100' };
// The payments fake's made-up keys: the API key the SDK sends, and the secret its webhooks are signed with.
export const FAKE_STRIPE = { secretKey: 'sk_test_local_fake', webhookSecret: 'whsec_local_fake' };

/** E-mail, SMS and payments: real services in production, in-process fakes everywhere else. */
export async function startOutsideServices(config: Config): Promise<OutsideServices> {
  // A given SMTP_URL / SMS_API_URL / PAYMENTS_API_URL (fakes shared by several app processes, as `npm run faults`
  // runs them) replaces the in-process fake.
  const smtpFake = config.useFakes && !config.smtpUrl ? await startSmtpFake() : null;
  const smsFake = config.useFakes && !config.smsApiUrl ? await startSmsFake() : null;
  const paymentsFake =
    config.useFakes && !config.paymentsApiUrl ? await startPaymentsFake({ port: config.paymentsFakePort, webhookSecret: FAKE_STRIPE.webhookSecret }) : null;
  const fakePayments =
    paymentsFake?.url ?? (config.paymentsApiUrl ? { host: new URL(config.paymentsApiUrl).hostname, port: Number(new URL(config.paymentsApiUrl).port) } : null);
  if (!fakePayments && !(config.stripeSecretKey && config.stripeWebhookSecret)) {
    throw new Error('STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET are required in production');
  }
  const payments = fakePayments
    ? createPayments({ ...FAKE_STRIPE, ...fakePayments })
    : createPayments({ secretKey: config.stripeSecretKey!, webhookSecret: config.stripeWebhookSecret! });
  const smtpUrl = smtpFake?.url ?? config.smtpUrl;
  if (!smtpUrl) throw new Error('SMTP_URL is required in production');
  const fakeSmsUrl = smsFake?.url ?? config.smsApiUrl;
  const twilioConfig = fakeSmsUrl ? { ...FAKE_TWILIO, baseUrl: fakeSmsUrl } : config.twilio;
  if (!twilioConfig) throw new Error('TWILIO_ACCOUNT_SID and TWILIO_AUTH_TOKEN are required in production');
  const mailer = createMailer(smtpUrl, config.mailFrom);
  return {
    mailer,
    sms: createSmsSender(twilioConfig),
    smtpFake,
    smsFake,
    payments,
    paymentsFake,
    async close() {
      mailer.close();
      await smtpFake?.close();
      await smsFake?.close();
      await paymentsFake?.close();
    },
  };
}
