import { pino } from 'pino';
import type { Config } from '../config';

/**
 * What never reaches a log, wherever it sits in a logged object: passwords, card data, session ids and cookies,
 * CSRF tokens, one-time secrets and tokens, and message bodies (what a client was told is theirs, not ours to keep
 * in logs). Request logs carry only the method, the path (secrets masked: requestLine) and the status anyway.
 */
export const REDACTED_PATHS = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  ...['password', 'card', 'cvc', 'cookie', 'sid', 'sessionId', 'secret', 'holdSecret', 'token', 'csrf', 'body', 'text', 'html'].flatMap((key) => [
    key,
    `*.${key}`,
    `*.*.${key}`,
  ]),
];

const listeners = new Set<(line: string) => void>();

/**
 * The server's one logger: JSON lines on standard output (pino). Silent until configureLogger sets the level from
 * the configuration (startServer and createApp do, first thing), so a script that only imports server code stays
 * quiet. Request logs (request-log.ts) and job logs are its children, each carrying its id.
 */
export const logger = pino(
  {
    level: 'silent',
    base: { service: 'dwell' },
    timestamp: pino.stdTimeFunctions.isoTime,
    redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
  },
  pino.multistream([
    { level: 'trace', stream: pino.destination(1) },
    { level: 'trace', stream: { write: (line: string) => listeners.forEach((listen) => listen(line)) } },
  ]),
);

export type Logger = typeof logger;

export function configureLogger(config: Pick<Config, 'logLevel'>): void {
  logger.level = config.logLevel;
}

/** Hands every log line written from now on to `listen` as well (the tests read what the server logs); stop with the answer. */
export function onLogLine(listen: (line: string) => void): () => void {
  listeners.add(listen);
  return () => listeners.delete(listen);
}
