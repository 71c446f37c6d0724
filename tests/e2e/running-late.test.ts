import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { middayZone } from '../factories/day-of-service';
import { ALL_DAY, atMinute, bookStepsAt, openAroundTheClock } from '../factories/replan-day';
import { insertSalon } from '../factories/salon';
import { insertPlannedService } from '../factories/service';
import { insertUser, TEST_PASSWORD } from '../factories/user';
import { baseUrl, connectBrowser, screenshot, signInThroughPage } from '../setup/browser';
import { noticeRaised, recordNotices } from '../setup/notices';

// Two browsers: the stylist starts a client's sitting late on My day, which pushes its developing time and rinse into
// the next client's cut; the desk's open day shows the conflict by itself within 2 s, raises a notification, and the
// desk hands the next client over to a free stylist with one click; the client's message is in the Outbox. A salon of
// its own (open around the clock, at about midday in its zone) keeps the demo salon as loaded for the other tests.

/** Apply 20 min, develop 20–40 min (booked at 40), rinse 10 min. */
const glossPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply gloss', product: 'none', minutes: 20 },
        { kind: 'developing', label: 'Gloss develops', product: 'none', minMinutes: 20, maxMinutes: 40 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
      ],
    },
  ],
};
const cutPlan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Cut', product: 'none', minutes: 30 }] }] };

const pool = createPool(inject('databaseUrl'));
const db = createDb(pool);
let browser: Browser;
const people = { desk: '', stylist: '' };
const LATER_PHONE = '+19705550188';

beforeAll(async () => {
  browser = await connectBrowser();
  const salon = await insertSalon(db, { timeZone: middayZone(), chairs: 2, basins: 1 });
  await openAroundTheClock(db, salon.salonId);
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const rowan = await insertUser(db, salon.salonId, 'stylist', { hours: ALL_DAY });
  await insertUser(db, salon.salonId, 'stylist', { hours: ALL_DAY }); // free to take a client over
  Object.assign(people, { desk: desk.email, stylist: rowan.email });
  const running = await insertUser(db, salon.salonId, 'client');
  const later = await insertUser(db, salon.salonId, 'client');
  await db.updateTable('clients').set({ name: 'Robin Vale' }).where('id', '=', running.clientId!).execute();
  await db.updateTable('clients').set({ name: 'Sasha Lind', phone: LATER_PHONE, message_channel: 'both' }).where('id', '=', later.clientId!).execute();
  const gloss = await insertPlannedService(db, salon.salonId, { plan: glossPlan, name: 'Gloss' });
  const cut = await insertPlannedService(db, salon.salonId, { plan: cutPlan, name: 'Cut' });
  const [chair1, chair2] = salon.chairs;
  // Robin's sitting was booked from 20 minutes ago; she arrived on time but nothing has been started yet.
  const robin = await bookStepsAt(db, {
    salonId: salon.salonId,
    serviceId: gloss,
    stylistId: rowan.staffId!,
    clientId: running.clientId!,
    chairId: chair1!,
    plan: glossPlan,
    steps: [
      { kind: 'hands_on', label: 'Apply gloss', from: -20, to: 0 },
      { kind: 'developing', label: 'Gloss develops', from: 0, to: 40 },
      { kind: 'basin', label: 'Rinse', from: 40, to: 50, basinId: salon.basins[0] },
    ],
  });
  await db
    .updateTable('sittings')
    .set({ status: 'arrived', arrived_at: atMinute(-25), late_minutes: 0 })
    .where('booking_id', '=', robin)
    .execute();
  await db.updateTable('bookings').set({ status: 'checked_in' }).where('id', '=', robin).execute();
  // Sasha's cut follows the rinse.
  await bookStepsAt(db, {
    salonId: salon.salonId,
    serviceId: cut,
    stylistId: rowan.staffId!,
    clientId: later.clientId!,
    chairId: chair2!,
    plan: cutPlan,
    steps: [{ kind: 'hands_on', label: 'Cut', from: 50, to: 80 }],
  });
});

afterAll(async () => {
  await browser.close();
  await db.destroy();
});

/** A signed-in page in a browser context of its own; the desk's may show notifications, and records each one raised. */
async function personAt(email: string, home: string, notifications = false): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  if (notifications) await recordNotices(context);
  const page = await context.newPage();
  await signInThroughPage(page, email, TEST_PASSWORD);
  await page.waitForURL(`${baseUrl()}${home}**`);
  return page;
}

/** An answer from the API to this page (a first write may be answered CSRF and sent again, as the api client does). */
const answer = (page: Page, path: string) =>
  page.waitForResponse(async (r) => r.url().includes(path) && r.request().method() === 'POST' && !(r.status() === 403 && (await r.text()).includes('"CSRF"')));

describe('running late', () => {
  it('a late start on My day reaches the desk’s open day within 2 s, with a notification; the desk hands the next client over', async () => {
    const desk = await personAt(people.desk, '/desk', true);
    const panel = desk.getByRole('region', { name: 'Running late' });
    await panel.getByText('Nothing is running late.').waitFor();

    const stylist = await personAt(people.stylist, '/stylist');
    const card = stylist.getByRole('article', { name: /Robin Vale/ });
    const start = card.getByRole('button', { name: 'Start step 1: Apply gloss' });
    const [started] = await Promise.all([answer(stylist, '/steps/1/start'), start.click()]);
    expect(started.status(), await started.text()).toBe(200);
    const tappedAt = Date.now();
    // The stylist is told what the late start means, and that the desk has the fixes.
    await card.getByText(/into Sasha Lind’s .*The front desk has the fixes\./).waitFor();

    const conflict = panel.getByRole('article', { name: 'Running late: Sasha Lind' });
    await conflict.waitFor({ timeout: 2_000 });
    const seenAfter = Date.now() - tappedAt;
    expect(seenAfter).toBeLessThanOrEqual(2_000);
    await conflict.getByText(/^Robin Vale’s sitting now runs \d+ min into Sasha Lind’s .*: both need .*’s hands\.$/).waitFor();
    const notice = await noticeRaised(desk, 'Running late: Sasha Lind');
    expect(notice.body).toMatch(/^Robin Vale’s sitting now runs/);
    await screenshot(desk, 'running-late-desk', true, false);

    const handOver = conflict.getByRole('button', { name: /^Hand Sasha Lind over to / });
    const [applied] = await Promise.all([answer(desk, '/replan-fix'), handOver.click()]);
    expect(applied.status(), await applied.text()).toBe(200);
    await panel.getByText(/^Hand Sasha Lind over to .*: done\.$/).waitFor();
    await panel.getByText('Nothing is running late.').waitFor();
    await stylist.context().close();

    await desk.goto(`${baseUrl()}/desk/outbox`);
    const log = desk.getByRole('region', { name: 'Sent messages' });
    await log
      .getByRole('row')
      .filter({ hasText: /970\D*555\D*0188/ }) // the number as the salon's country writes it
      .filter({ hasText: /Change notice \(SMS\)/ })
      .first()
      .waitFor();
    await desk.context().close();
  });
});
