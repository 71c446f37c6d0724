import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import { runningLateScene } from '../factories/running-late-scene';
import { connectBrowser, screenshot } from '../setup/browser';
import { noticeRaised } from '../setup/notices';
import { changeNoticeInOutbox, postAnswer as answer, staffPage } from '../setup/staff-pages';

// Two browsers: the stylist starts a client's sitting late on My day, which pushes its developing time and rinse into
// the next client's cut; the desk's open day shows the conflict by itself within 2 s, raises a notification, and the
// desk hands the next client over to a free stylist with one click; the client's message is in the Outbox. A salon of
// its own (open around the clock, at about midday in its zone) keeps the demo salon as loaded for the other tests.

const pool = createPool(inject('databaseUrl'));
const db = createDb(pool);
let browser: Browser;
const people = { desk: '', stylist: '' };

beforeAll(async () => {
  browser = await connectBrowser();
  // Robin's gloss was booked from 20 minutes ago; she arrived on time but nothing has been started yet. Sasha's cut follows the rinse.
  const scene = await runningLateScene(db, { runningName: 'Robin Vale', laterName: 'Sasha Lind', laterPhone: '+19705550188', glossFrom: -20 });
  Object.assign(people, { desk: scene.deskEmail, stylist: scene.stylistEmail });
});

afterAll(async () => {
  await browser.close();
  await db.destroy();
});

const personAt = (email: string, home: string, notices = false) => staffPage(browser, email, home, { notices });

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

    await changeNoticeInOutbox(desk, /970\D*555\D*0188/);
    await desk.context().close();
  });
});
