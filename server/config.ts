import { randomBytes } from 'node:crypto';
import { isIP } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { z } from 'zod';

const ConfigSchema = z.object({
  DATABASE_URL: z.string().min(1),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  /** demo: the demo salon and fakes; dev: fakes; test: fakes, no request logging; production: real services. */
  DWELL_MODE: z.enum(['demo', 'dev', 'test', 'production']).default('dev'),
  SESSION_SECRET: z.string().min(32).optional(),
  PUBLIC_URL: z.string().url().optional(),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Dwell <no-reply@dwell.test>'),
  TWILIO_ACCOUNT_SID: z.string().startsWith('AC').optional(),
  TWILIO_AUTH_TOKEN: z.string().optional(),
  SMS_FROM: z.string().default('+19705550100'),
  /** Outside production: a Twilio-compatible API to send through instead of starting the in-process fake. */
  SMS_API_URL: z.string().url().optional(),
  /** Outside production: a payments API (the local fake) to pay through instead of starting the in-process one. */
  PAYMENTS_API_URL: z.string().url().optional(),
  /** A claim this old with no provider reference is taken for a dead worker's and queued again. */
  MESSAGE_CLAIM_TIMEOUT_SECONDS: z.coerce.number().int().min(1).max(3600).default(300),
  STRIPE_SECRET_KEY: z.string().startsWith('sk_').optional(),
  /** The signing secret of the payment provider's webhook endpoint (`POST /webhooks/payments`). */
  STRIPE_WEBHOOK_SECRET: z.string().startsWith('whsec_').optional(),
  /** Outside production: the port of the in-process payments fake and its hosted card page (0: any free port). */
  PAYMENTS_FAKE_PORT: z.coerce.number().int().min(0).max(65535).default(0),
  UPLOADS_DIR: z.string().min(1).optional(),
  /** A session ends after this many minutes without a request… */
  SESSION_IDLE_MINUTES: z.coerce
    .number()
    .int()
    .min(1)
    .max(7 * 24 * 60)
    .default(8 * 60),
  /** …and this many hours after sign-in, however active. */
  SESSION_ABSOLUTE_HOURS: z.coerce
    .number()
    .int()
    .min(1)
    .max(90 * 24)
    .default(7 * 24),
  /** Live update streams (GET /api/events) one app server holds open at most; more are answered 503 and retry. */
  LIVE_STREAMS_MAX: z.coerce.number().int().min(1).max(100_000).default(2_000),
  /** The proxies whose X-Forwarded-For/-Proto/-Host and X-Request-Id are believed: `none`, or a comma-separated list. */
  TRUST_PROXY: z.string().optional(),
  /** pino's level: fatal, error, warn, info, debug, trace or silent; by default info (warn in tests and the demo). */
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
});

export interface Config {
  databaseUrl: string;
  port: number;
  host: string;
  mode: 'demo' | 'dev' | 'test' | 'production';
  sessionSecret: string;
  /** Cookies carry Secure everywhere but local development over plain http. */
  secureCookies: boolean;
  /** Idle and absolute session timeouts (defaults 8 hours idle, 7 days absolute). */
  session: { idleMinutes: number; absoluteHours: number };
  publicUrl: string | null;
  smtpUrl: string | null;
  mailFrom: string;
  twilio: { accountSid: string; authToken: string; from: string } | null;
  stripeSecretKey: string | null;
  stripeWebhookSecret: string | null;
  paymentsFakePort: number;
  smsApiUrl: string | null;
  paymentsApiUrl: string | null;
  messageClaimTimeoutSeconds: number;
  /** Hosted services are replaced by in-process fakes. */
  useFakes: boolean;
  /** Where uploaded photos are kept: outside the web root, served only through the API. */
  uploadsDir: string;
  /** Live update streams one app server holds open at most. */
  maxLiveStreams: number;
  /** Express's `trust proxy`: false (believe no forwarding headers) or the peers to believe. */
  trustProxy: false | string[];
  logLevel: 'fatal' | 'error' | 'warn' | 'info' | 'debug' | 'trace' | 'silent';
}

// Express's names for address ranges (proxy-addr): 127.0.0.0/8 and ::1; 169.254.0.0/16 and fe80::/10; private networks.
const PROXY_PRESETS = ['loopback', 'linklocal', 'uniquelocal'];

/**
 * Whom to believe about the client's address and scheme. Believing every peer would let any caller forge
 * X-Forwarded-For and escape the per-address limits, so production trusts none unless told (a load balancer's
 * address or network); local development trusts loopback (Vite's dev server forwards /api).
 */
function trustProxy(value: string | undefined, mode: Config['mode']): false | string[] {
  if (value === undefined) return mode === 'production' ? false : ['loopback'];
  const list = value
    .split(',')
    .map((v) => v.trim())
    .filter(Boolean);
  if (list.length === 0 || (list.length === 1 && list[0] === 'none')) return false;
  for (const entry of list) {
    const [address = '', bits] = entry.split('/');
    const ok = PROXY_PRESETS.includes(entry) || (isIP(address) !== 0 && (bits === undefined || /^\d{1,3}$/.test(bits)));
    if (!ok) throw new Error(`TRUST_PROXY: "${entry}" is not none, ${PROXY_PRESETS.join(', ')}, an IP address or a network like 10.0.0.0/8`);
  }
  return list;
}

/** Parsed once at boot, so a bad environment fails at start-up, not at the first request. */
export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const parsed = ConfigSchema.parse(env);
  if (parsed.DWELL_MODE === 'production' && !parsed.SESSION_SECRET) {
    throw new Error('SESSION_SECRET (32+ characters) is required in production');
  }
  return {
    databaseUrl: parsed.DATABASE_URL,
    port: parsed.PORT,
    host: parsed.HOST,
    mode: parsed.DWELL_MODE,
    // Outside production a fresh secret per process is fine: sessions of a restarted dev server just end.
    sessionSecret: parsed.SESSION_SECRET ?? randomBytes(32).toString('hex'),
    secureCookies: parsed.DWELL_MODE === 'production',
    session: { idleMinutes: parsed.SESSION_IDLE_MINUTES, absoluteHours: parsed.SESSION_ABSOLUTE_HOURS },
    publicUrl: parsed.PUBLIC_URL ?? null,
    smtpUrl: parsed.SMTP_URL ?? null,
    mailFrom: parsed.MAIL_FROM,
    stripeSecretKey: parsed.STRIPE_SECRET_KEY ?? null,
    stripeWebhookSecret: parsed.STRIPE_WEBHOOK_SECRET ?? null,
    paymentsFakePort: parsed.PAYMENTS_FAKE_PORT,
    smsApiUrl: parsed.DWELL_MODE === 'production' ? null : (parsed.SMS_API_URL ?? null),
    paymentsApiUrl: parsed.DWELL_MODE === 'production' ? null : (parsed.PAYMENTS_API_URL ?? null),
    messageClaimTimeoutSeconds: parsed.MESSAGE_CLAIM_TIMEOUT_SECONDS,
    twilio:
      parsed.TWILIO_ACCOUNT_SID && parsed.TWILIO_AUTH_TOKEN
        ? { accountSid: parsed.TWILIO_ACCOUNT_SID, authToken: parsed.TWILIO_AUTH_TOKEN, from: parsed.SMS_FROM }
        : null,
    useFakes: parsed.DWELL_MODE !== 'production',
    // Test runs never write into the checkout's .data/, even when a suite forgets to pass a folder.
    uploadsDir: path.resolve(parsed.UPLOADS_DIR ?? (parsed.DWELL_MODE === 'test' ? path.join(tmpdir(), 'dwell-test-uploads') : '.data/uploads')),
    maxLiveStreams: parsed.LIVE_STREAMS_MAX,
    trustProxy: trustProxy(parsed.TRUST_PROXY, parsed.DWELL_MODE),
    // Every request in development and production; only problems in tests and in the demo's terminal.
    logLevel: parsed.LOG_LEVEL ?? (parsed.DWELL_MODE === 'test' || parsed.DWELL_MODE === 'demo' ? 'warn' : 'info'),
  };
}
