import { DateTime } from 'luxon';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, connectBrowser, expectAccessible, screenshot, signedInPage } from '../setup/browser';

// The desk moving and cancelling in the demo salon: open Tuesday to Saturday 09:00–21:00 (server/demo/demo-catalogue.ts),
// Ana works 09:00–18:30. The demo book runs from a week ago to a week ahead.

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

const ZONE = 'America/Denver';
type Sitting = { seq: number; start: string; end: string; chairName: string };
type Booking = {
  id: string;
  status: string;
  depositCents: number;
  client: { id: string; name: string };
  service: { id: string; name: string };
  stylist: { id: string; name: string };
  sittings: Sitting[];
};
type FreeTime = { start: string };

const apiAnswer = (page: Page, method: string, path: RegExp) =>
  page.waitForResponse((r) => r.request().method() === method && path.test(new URL(r.url()).pathname));
const day = (offset: number) => DateTime.now().setZone(ZONE).plus({ days: offset }).toISODate()!;
const getJson = async (page: Page, path: string) => (await page.request.get(`${baseUrl()}${path}`)).json();

/**
 * A booked one-sitting booking from `fromDay` days ahead on (asked the way the pages ask), for which `accept` says
 * yes; with the free times the desk is offered for it that same date.
 */
async function findBooking(page: Page, fromDay: number, accept: (b: Booking, times: FreeTime[]) => boolean): Promise<{ booking: Booking; times: FreeTime[] }> {
  for (let d = fromDay; d <= 7; d++) {
    const date = day(d);
    const { bookings } = (await getJson(page, `/api/desk/day?date=${date}`)) as { bookings: Booking[] };
    for (const booking of bookings.filter((b) => b.status === 'booked' && b.sittings.length === 1)) {
      const { times } = (await getJson(page, `/api/bookings/${booking.id}/move-times?from=${date}`)) as { times: FreeTime[] };
      const sameDay = times.filter((t) => DateTime.fromISO(t.start, { zone: ZONE }).toISODate() === date);
      if (accept(booking, sameDay)) return { booking, times: sameDay };
    }
  }
  throw new Error('no demo booking fits this journey');
}

/** Drags a week-calendar event by whole half hours (the grid's 30-minute rows), holding it by its step strip. */
async function dragBy(page: Page, event: ReturnType<Page['locator']>, halfHours: number) {
  const box = (await event.boundingBox())!;
  const row = (await page.locator('td.fc-timegrid-slot-lane').first().boundingBox())!;
  const x = box.x + 5;
  const y = box.y + Math.min(box.height / 2, row.height);
  await page.mouse.move(x, y);
  await page.mouse.down();
  for (let i = 1; i <= 10; i++) await page.mouse.move(x, y + (row.height * halfHours * i) / 10);
  await page.mouse.up();
}

describe('the desk week', () => {
  it('shows every stylist over the opening hours with closed days left out, explains a refused drag, and undoes a move', async () => {
    const page = await signedInPage(browser, 'desk@demo.test', '/desk');
    await page.setViewportSize({ width: 1280, height: 1700 }); // the whole day's grid on screen, to drag across it
    // A sitting that starts on the hour or half hour with a free start 30 minutes later that same day.
    const { booking } = await findBooking(page, 2, (b, times) => {
      const start = DateTime.fromISO(b.sittings[0]!.start, { zone: ZONE });
      return start.minute % 30 === 0 && start.hour <= 15 && times.some((t) => DateTime.fromISO(t.start).toMillis() === start.plus({ minutes: 30 }).toMillis());
    });
    const was = booking.sittings[0]!;
    const date = DateTime.fromISO(was.start, { zone: ZONE }).toISODate()!;
    const monday = DateTime.fromISO(date).startOf('week');

    await page.goto(`${baseUrl()}/desk/week?date=${date}`);
    await page.getByRole('heading', { level: 1, name: 'Week of all stylists' }).waitFor();
    expect(await page.getByLabel('Stylist').inputValue()).toBe('');
    const event = page.locator('.fc-timegrid-event', { has: page.locator(`a[href="/desk/bookings/${booking.id}"]`) });
    await event.waitFor();
    await expect(event.textContent()).resolves.toContain(booking.stylist.name); // each sitting names its stylist
    // The grid runs to the salon's 9 PM close: its last half hour starts at 20:30.
    expect(await page.locator('td.fc-timegrid-slot-lane[data-time="20:30:00"]').count()).toBe(1);
    expect(await page.locator('td.fc-timegrid-slot-lane[data-time="21:00:00"]').count()).toBe(0);
    // Monday and Sunday are closed: left out of the grid and named above it.
    await page.getByText(/^Closed, not shown: /).waitFor();
    expect(await page.locator(`th[data-date="${monday.toISODate()}"]`).count()).toBe(0);
    expect(await page.locator(`th[data-date="${monday.plus({ days: 6 }).toISODate()}"]`).count()).toBe(0);
    expect(await page.locator(`th[data-date="${date}"]`).count()).toBe(1);

    // Dragged to the evening, past the stylist's hours: refused, with the engine's reason, and the sitting stays.
    const late = Math.round(
      DateTime.fromISO(was.start, { zone: ZONE })
        .set({ hour: 20, minute: 0 })
        .diff(DateTime.fromISO(was.start, { zone: ZONE }), 'minutes').minutes / 30,
    );
    const refused = apiAnswer(page, 'POST', /\/move$/);
    await dragBy(page, event, late);
    expect((await refused).status()).toBe(409);
    const notice = page.getByRole('alert').filter({ hasText: 'The sitting was not moved' });
    await notice.getByText(/outside the salon's opening hours, the stylist's working hours/).waitFor();

    // Half an hour later, where the desk's free times say it fits: moved, and the toast offers Undo.
    const moved = apiAnswer(page, 'POST', /\/move$/);
    await dragBy(page, event, 1);
    const answer = await moved;
    expect(answer.status()).toBe(200);
    // The toast names the time the server placed the sitting at (a drag on a busy machine may land a slot off).
    const placed = ((await answer.json()) as Booking).sittings[0]!.start;
    expect(Date.parse(placed)).toBeGreaterThan(Date.parse(was.start));
    const toast = page.getByRole('status').filter({ hasText: 'Moved ' });
    await toast.getByText(`Moved ${booking.client.name}'s sitting to`).waitFor();
    await toast.getByText(DateTime.fromISO(placed, { zone: ZONE }).toFormat('h:mm a')).waitFor();
    await screenshot(page, 'desk-week-all-stylists', true, false);
    await expectAccessible(page);

    const undone = apiAnswer(page, 'POST', /\/move$/);
    await toast.getByRole('button', { name: 'Undo' }).click();
    expect((await undone).status()).toBe(200);
    await toast.getByText(`Moved back: ${booking.client.name}'s sitting is at`).waitFor();
    const after = (await getJson(page, `/api/bookings/${booking.id}`)) as Booking;
    expect(Date.parse(after.sittings[0]!.start)).toBe(Date.parse(was.start));
    expect(after.sittings[0]!.chairName).toBe(was.chairName);

    // One stylist at a time is still there.
    await page.getByLabel('Stylist').selectOption({ label: booking.stylist.name });
    await page.getByRole('heading', { level: 1, name: `Week of ${booking.stylist.name}` }).waitFor();
    await page.context().close();
  });

  it('the day book covers the opening hours to 9 PM, and a closed day says so', async () => {
    const page = await signedInPage(browser, 'desk@demo.test', '/desk');
    const open = [1, 2, 3, 4, 5, 6, 7].map(day).find((d) => DateTime.fromISO(d).weekday >= 2 && DateTime.fromISO(d).weekday <= 6)!;
    const closed = [1, 2, 3, 4, 5, 6, 7].map(day).find((d) => DateTime.fromISO(d).weekday === 1)!;
    await page.goto(`${baseUrl()}/desk?date=${open}`);
    await page.getByRole('region', { name: 'Day timeline' }).getByText('9 PM', { exact: true }).waitFor();
    await page.goto(`${baseUrl()}/desk?date=${closed}`);
    await page.getByText('The salon is closed on this date.').waitFor();
    await page.context().close();
  });
});

describe('moving and cancelling on the booking page, on a phone', () => {
  it('picks a free time, shows why a move is refused beside the button, confirms the deposit before cancelling, and lists the booking as cancelled', async () => {
    const page = await signedInPage(browser, 'desk@demo.test', '/desk');
    await page.setViewportSize({ width: 375, height: 812 });
    // A booking of Ana's with a deposit, more than 48 hours ahead (the demo's cancellation window), with a free time
    // clear of its own sitting (where a blow-dry can take Ana's hands) and another free time 90 minutes from that one.
    const clear = (b: Booking, t: FreeTime) =>
      Date.parse(t.start) >= Date.parse(b.sittings[0]!.end) || Date.parse(t.start) + 90 * 60_000 <= Date.parse(b.sittings[0]!.start);
    const apart = (a: FreeTime, b: FreeTime) => Math.abs(Date.parse(a.start) - Date.parse(b.start)) >= 90 * 60_000;
    const { booking, times } = await findBooking(
      page,
      4,
      (b, free) => b.depositCents > 0 && b.stylist.name === 'Ana Moreno' && free.some((t) => clear(b, t) && free.some((u) => apart(t, u))),
    );
    const target = times.find((t) => clear(booking, t) && times.some((u) => apart(t, u)))!;
    const other = times.find((u) => apart(target, u))!;
    expect(times.map((t) => Date.parse(t.start))).not.toContain(Date.parse(booking.sittings[0]!.start)); // its own time is no move
    await page.goto(`${baseUrl()}/desk/bookings/${booking.id}`);
    await page.getByRole('heading', { level: 1, name: `${booking.client.name} · ${booking.service.name}` }).waitFor();
    const move = page.locator('section', { has: page.getByRole('heading', { name: 'Move a sitting' }) });
    const date = DateTime.fromISO(booking.sittings[0]!.start, { zone: ZONE }).toISODate()!;
    await move.getByLabel('Show times from').fill(date);
    await move.getByRole('list', { name: 'Days with free times' }).getByRole('button').first().click();

    // Someone takes the picked time before the desk presses Move (a blow-dry with Ana, made through the same API).
    const label = DateTime.fromISO(target.start, { zone: ZONE }).toFormat('h:mm a');
    await move.getByRole('button', { name: new RegExp(`, ${label} with `) }).click();
    const { services } = (await getJson(page, '/api/services')) as { services: { id: string; name: string; stepPlan: unknown }[] };
    const blowDry = services.find((s) => s.name === 'Blow-dry')!;
    const { clients } = (await getJson(page, '/api/clients?q=Vesna')) as { clients: { id: string }[] };
    const { token } = await getJson(page, '/api/csrf');
    const taken = await page.request.post(`${baseUrl()}/api/bookings`, {
      headers: { 'X-CSRF-Token': token },
      data: {
        clientId: clients[0]!.id,
        serviceId: blowDry.id,
        stepPlan: blowDry.stepPlan,
        stylistId: booking.stylist.id,
        start: target.start,
        idempotencyKey: `desk-moves-e2e-${Date.now()}`,
      },
    });
    expect(taken.status(), await taken.text()).toBe(201);
    const refused = apiAnswer(page, 'POST', /\/move$/);
    await move.getByRole('button', { name: /^Move to / }).click();
    expect((await refused).status()).toBe(409);
    const reason = move.getByRole('alert').filter({ hasText: 'This move is not possible' });
    await reason.getByText(/stylist is busy then|No chair|Someone took that time/).waitFor();

    // Another free time, well away from the blow-dry, is moved to.
    const otherLabel = DateTime.fromISO(other.start, { zone: ZONE }).toFormat('h:mm a');
    await move.getByRole('button', { name: new RegExp(`, ${otherLabel} with `) }).click();
    const moved = apiAnswer(page, 'POST', /\/move$/);
    await move.getByRole('button', { name: /^Move to / }).click();
    expect((await moved).status()).toBe(200);
    await move.getByText(new RegExp(`Moved to .+ ${otherLabel}\\.`)).waitFor();
    await screenshot(page, 'desk-booking-move-phone');

    // Cancelling: a reason, then the deposit outcome and why, then the confirmation.
    const cancelCard = page.locator('section', { has: page.getByRole('heading', { name: 'Cancel', exact: true }) });
    await cancelCard.getByLabel('Reason').fill('Client is travelling that week');
    await cancelCard.getByRole('button', { name: 'Cancel booking…' }).click();
    const terms = cancelCard.getByRole('status').filter({ hasText: 'If you cancel now' });
    await terms.getByText(/deposit is refunded: the first sitting is more than 48 hours away, outside the salon's 48-hour cancellation window\./).waitFor();
    expect((await getJson(page, `/api/bookings/${booking.id}`)).status).toBe('booked'); // nothing changed yet
    await expectAccessible(page);
    await screenshot(page, 'desk-booking-move-and-cancel', true);
    const cancelled = apiAnswer(page, 'POST', /\/cancel$/);
    await cancelCard.getByRole('button', { name: 'Confirm cancellation' }).click();
    expect((await cancelled).status()).toBe(200);
    await cancelCard.getByText(/This booking is cancelled\. The \$[\d.,]+ deposit is refunded/).waitFor();

    // The history in the app's words: the move as "Moved" with the sitting's day, times and chair; the deposit outcome.
    const history = page.locator('section', { has: page.getByRole('heading', { name: 'History' }) });
    await history.getByText('Cancelled: Client is travelling that week').waitFor();
    await history.getByText('Refunded to the client').waitFor();
    await history.getByText('Moved', { exact: true }).first().waitFor();
    expect(await history.getByText(/sitting 1 sitting|→ 1$/i).count()).toBe(0);

    // On the client's page the booking is under Cancelled (not Past), with what became of its deposit.
    await page.goto(`${baseUrl()}/desk/clients/${booking.client.id}`);
    const list = page.getByRole('region', { name: 'Cancelled' });
    await list.getByText(booking.service.name).first().waitFor();
    await list
      .getByText(/deposit .+, refunded/)
      .first()
      .waitFor();
    await page.context().close();
  });
});
