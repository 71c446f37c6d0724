import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import { TEST_CLOCK_HEADER } from '@server/lib/request-clock';
import { atMinute, gridBase } from '../factories/replan-day';
import { runningLateScene } from '../factories/running-late-scene';
import { connectBrowser, screenshot } from '../setup/browser';
import { noticeRaised } from '../setup/notices';
import { changeNoticeInOutbox, postAnswer as answer, staffPage } from '../setup/staff-pages';

// Two browsers run a sitting the way the day goes: the stylist taps through a gloss on My day, on time, and then lets
// its developing step run past its most time while nobody taps. The desk's open day shows the conflict this makes for
// the next client within 2 s of the overrun, by itself, with a notification; the desk hands that client to a free
// stylist, and the client's message is in the Outbox. The clock is the test's: both browsers (Playwright's clock) and
// their requests (the server's test clock header) stand at the minutes of the day the test picks, and time flows on
// from there. A salon of its own, open around the clock at about midday in its zone, keeps the demo salon as loaded.

const pool = createPool(inject('databaseUrl'));
const db = createDb(pool);
let browser: Browser;
const people = { desk: '', stylist: '' };
/** Minute 0: the later client's cut. The gloss was booked from minute −70: apply −70..−50, develop −50..−10, rinse −10..0. */
const base = gridBase();
let laterBooking = '';

beforeAll(async () => {
  browser = await connectBrowser();
  const scene = await runningLateScene(db, { runningName: 'Noor Haddad', laterName: 'Ilse Brandt', laterPhone: '+19705550177', glossFrom: -70, base });
  Object.assign(people, { desk: scene.deskEmail, stylist: scene.stylistEmail });
  laterBooking = scene.laterBooking;
});

afterAll(async () => {
  await browser.close();
  await db.destroy();
});

/** A time of day as the pages write it, 12- or 24-hour. */
const TIME = String.raw`\d{1,2}[:.]\d{2}(?:\s?[AP]M)?`;

/** The moment `seconds` into minute `minute` of the day as the test runs it. */
const moment = (minute: number, seconds = 0) => atMinute(minute, base).getTime() + seconds * 1000;

/** The person's requests are served at `at` on the server's test clock, time flowing on from there. */
const serveAt = (context: BrowserContext, at: number) => context.setExtraHTTPHeaders({ [TEST_CLOCK_HEADER]: String(at - Date.now()) });

/** Requests each person's browser has sent and not yet had answered (the live stream, never answered in full, aside). */
const inFlight = new WeakMap<BrowserContext, Set<unknown>>();
function countRequests(context: BrowserContext): void {
  const open = new Set<unknown>();
  inFlight.set(context, open);
  context.on('request', (r) => {
    if (new URL(r.url()).pathname !== '/api/events') open.add(r);
  });
  context.on('requestfinished', (r) => open.delete(r));
  context.on('requestfailed', (r) => open.delete(r));
}

/**
 * Waits until nothing is in flight for a moment. A clock that jumps while a read is on its way would date the answer
 * (read at the old time) as new, so a screen would wait a minute for a re-read it needs in seconds: a real device's
 * clock does not jump mid-request, so the test lets its reads land first.
 */
async function settled(context: BrowserContext): Promise<void> {
  const open = inFlight.get(context)!;
  for (let quietSince = Date.now(); Date.now() - quietSince < 300; await new Promise((r) => setTimeout(r, 50))) {
    if (open.size) quietSince = Date.now();
  }
}

/** Both people at `at`: their requests, and their browsers' clocks with the timers due meanwhile run. */
async function both(contexts: BrowserContext[], at: number): Promise<void> {
  await Promise.all(contexts.map(settled));
  for (const context of contexts) {
    const page = context.pages()[0]!;
    const was = await page.evaluate(() => Date.now());
    await serveAt(context, at);
    await context.clock.fastForward(Math.max(0, at - was));
  }
}

/** A signed-in page in a browser context of its own, its clock (browser and requests) at `at`; the desk's records each notification raised. */
const personAt = (email: string, home: string, at: number, notices = false): Promise<Page> =>
  staffPage(browser, email, home, {
    notices,
    prepare: async (context) => {
      countRequests(context);
      await context.clock.install({ time: at });
      await serveAt(context, at);
    },
  });

async function tap(page: Page, button: string, path: string): Promise<void> {
  const card = page.getByRole('article', { name: /Noor Haddad/ });
  const [res] = await Promise.all([answer(page, path), card.getByRole('button', { name: button }).click()]);
  expect(res.status(), await res.text()).toBe(200);
}

describe('a developing step that runs over', () => {
  it('reaches the desk’s open day within 2 s of the overrun, with a notification; a hand-over tells the later client once', async () => {
    const start = moment(-70, 20);
    const desk = await personAt(people.desk, '/desk', start, true);
    const stylist = await personAt(people.stylist, '/stylist', start);
    const contexts = [desk.context(), stylist.context()];
    const panel = desk.getByRole('region', { name: 'Running late' });
    await panel.getByText('Nothing is running late.').waitFor();

    // On time: the application from −70 to −50, then the gloss develops from −50 (booked to −10 at most).
    await tap(stylist, 'Start step 1: Apply gloss', '/steps/1/start');
    await both(contexts, moment(-50, 20));
    await tap(stylist, 'Finish step 1: Apply gloss', '/steps/1/finish');
    await tap(stylist, 'Start step 2: Gloss develops', '/steps/2/start');
    const card = stylist.getByRole('article', { name: /Noor Haddad/ });
    await card.getByText(new RegExp(`^Next: Rinse at ${TIME}$`)).waitFor();
    await panel.getByText('Nothing is running late.').waitFor();

    // Nobody taps. Three seconds before the overrun shows (the engine reads now to the minute: from minute −9 the
    // developing step, still on, pushes the rinse into the cut at minute 0), both clocks jump ahead.
    await both(contexts, moment(-10, 57));
    const overrunAt = Date.now() + 3_000;
    await panel.getByText('Nothing is running late.').waitFor();
    const conflict = panel.getByRole('article', { name: 'Running late: Ilse Brandt' });
    await conflict.waitFor({ timeout: 8_000 });
    const seenAfter = Date.now() - overrunAt;
    expect(seenAfter, 'the desk sees the overrun within 2 s, without a reload').toBeLessThanOrEqual(2_000);
    await conflict.getByText(/^Noor Haddad’s sitting now runs 5 min into Ilse Brandt’s .*: both need .*’s hands\.$/).waitFor();
    const notice = await noticeRaised(desk, 'Running late: Ilse Brandt');
    expect(notice.body).toMatch(/^Noor Haddad’s sitting now runs 5 min into/);

    // My day shows when the rinse now starts, beside the planned time (no time limit in the rule: generous for a busy machine).
    await card.getByText(new RegExp(`^Next: Rinse at ${TIME} \\(planned ${TIME}\\)$`)).waitFor({ timeout: 20_000 });

    const handOver = conflict.getByRole('button', { name: /^Hand Ilse Brandt over to / });
    const [applied] = await Promise.all([answer(desk, '/replan-fix'), handOver.click()]);
    expect(applied.status(), await applied.text()).toBe(200);
    await panel.getByText(/^Hand Ilse Brandt over to .*: done\.$/).waitFor();
    await panel.getByText('Nothing is running late.').waitFor();

    // The stylist finishes the sitting: the gloss comes off, the rinse.
    await tap(stylist, 'Finish step 2: Gloss develops', '/steps/2/finish');
    await tap(stylist, 'Start step 3: Rinse', '/steps/3/start');
    await tap(stylist, 'Finish step 3: Rinse', '/steps/3/finish');
    await card.getByText('All steps done.').waitFor();
    await stylist.context().close();

    // The later client is told once per channel they take, through the message pipeline; the text is in the Outbox.
    const change = await db.selectFrom('messages').select('channel').where('booking_id', '=', laterBooking).where('kind', '=', 'change').execute();
    expect(change.map((m) => m.channel).sort()).toEqual(['email', 'sms']);
    await changeNoticeInOutbox(desk, /970\D*555\D*0177/);
    await screenshot(desk, 'developing-overrun-outbox');
    await desk.context().close();
  });
});
