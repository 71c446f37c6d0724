import type { Express, Request } from 'express';

/**
 * A browser test's clock: in test mode only, a request that carries this header (whole milliseconds, maybe negative)
 * is served as if the clock were that far ahead, time flowing on as usual. A test can then tap through a sitting at
 * earlier minutes of the day and let a developing step run over its time without waiting those minutes; the browser's
 * own clock is moved alike (Playwright's clock). Every other mode ignores the header.
 */
export const TEST_CLOCK_HEADER = 'x-dwell-test-clock-offset';

/** A month either way is more than any test needs. */
const MAX_OFFSET_MS = 31 * 86_400_000;

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express's own way to add to its Request
  namespace Express {
    interface Request {
      /** How far a test moved this request's clock (test mode only). */
      testClockOffset?: number;
    }
  }
}

export function installTestClock(app: Express, mode: string): void {
  if (mode !== 'test') return;
  app.use((req, _res, next) => {
    const text = req.get(TEST_CLOCK_HEADER) ?? '';
    const offset = /^-?\d{1,13}$/.test(text) ? Number(text) : NaN;
    if (Math.abs(offset) <= MAX_OFFSET_MS) req.testClockOffset = offset;
    next();
  });
}

/** The moment a request is served at: now, or now on the test's clock. Routes whose answer follows the clock read it here. */
export const nowOf = (req: Request): Date => new Date(Date.now() + (req.testClockOffset ?? 0));
