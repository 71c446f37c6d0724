import { DateTime } from 'luxon';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { baseUrl, connectBrowser, screenshot, signedInPage, signInThroughPage } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await connectBrowser();
});
afterAll(() => browser.close());

interface Figure {
  visits: number;
  medianMinutes: number | null;
  p80Minutes: number | null;
}

it('the owner sees how long a step really takes beside its planned minutes, and takes the suggestion only with "Use"', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await signInThroughPage(page, 'owner@demo.test', DEMO_PASSWORD);
  await page.waitForURL(`${baseUrl()}/owner**`);
  await page.goto(`${baseUrl()}/owner/setup/services`);
  const answer = page.waitForResponse((r) => /\/api\/services\/[^/]+\/typical-minutes/.test(r.url()) && r.status() === 200);
  await page.getByRole('link', { name: 'Full lightening' }).click();
  const typical = (await (await answer).json()) as { lastVisits: number; steps: Array<{ label: string; occurrence: number; salon: Figure }> };
  // The demo's past days were run with actual times: the last step, the blow-dry, has enough visits for a number.
  const blowDry = typical.steps.find((s) => s.label === 'Blow-dry' && s.occurrence === 1)!;
  expect(blowDry.salon.visits).toBeGreaterThanOrEqual(3);
  const median = Math.round(blowDry.salon.medianMinutes!);
  const note = page.getByRole('group', { name: 'How long step 10 really took' });
  await note.getByText(new RegExp(`Salon: typically ${median} min \\(80% within \\d+\\) over ${blowDry.salon.visits} visits`)).waitFor();
  await page.getByText(`over its last ${typical.lastVisits} finished visits`).waitFor();
  // Nothing changes by itself: the planned 45 minutes stay until "Use" is pressed.
  const minutes = page.getByLabel('Minutes of step 10');
  expect(await minutes.inputValue()).toBe('45');
  await note.getByRole('button', { name: `Use ${median} min for step 10, Salon` }).click();
  expect(await minutes.inputValue()).toBe(String(median));
  // Per stylist, in a small list that opens.
  await note.getByText(/By stylist/).click();
  await note.getByText(/Ana Moreno:/).waitFor();
  await note.scrollIntoViewIfNeeded();
  await screenshot(page, 'step-plan-typical-minutes', false, false);
  await context.close();
});

it('the owner reads the on-time rate, overruns and chair time planned against actual per stylist, with its CSV', async () => {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  const page = await context.newPage();
  await signInThroughPage(page, 'owner@demo.test', DEMO_PASSWORD);
  await page.waitForURL(`${baseUrl()}/owner**`);
  // The demo's last seven days, which ran with tapped times.
  const today = DateTime.now().setZone('America/Denver');
  const period = `period=custom&from=${today.minus({ days: 7 }).toISODate()}&to=${today.minus({ days: 1 }).toISODate()}`;
  const answer = page.waitForResponse((r) => r.url().includes('/api/owner/utilisation?') && r.status() === 200);
  await page.goto(`${baseUrl()}/owner/utilisation?${period}`);
  const api = (await (await answer).json()).timekeeping;
  expect(api.sittings).toBeGreaterThan(0);
  const section = page.getByRole('region', { name: 'On time and overruns per stylist' });
  for (const name of ['Ana Moreno', 'Marcus Bell', 'Lee Tanaka']) await section.getByText(name).waitFor();
  await page.getByText(`${api.onTime} of ${api.sittings} timed sittings`).waitFor();
  await section.scrollIntoViewIfNeeded();
  await screenshot(page, 'utilisation-on-time', false, false);
  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Download CSV: On time and overruns per stylist' }).click();
  const chunks: Buffer[] = [];
  for await (const chunk of await (await download).createReadStream()) chunks.push(chunk as Buffer);
  const lines = Buffer.concat(chunks).toString('utf8').split('\r\n');
  expect(lines[0]).toBe(
    'Stylist,Timed sittings,On time,On-time rate,Late starts after a late arrival,Overrun minutes,Overrun minutes per sitting,Planned chair hours,Actual chair hours',
  );
  expect(lines).toHaveLength(1 + api.stylists.length);
  await context.close();
});

it('a stylist sees her own typical minutes beside the quoted steps of a consultation', async () => {
  const page = await signedInPage(browser, 'ana@demo.test', '/stylist');
  const clients = await (await page.request.get(`${baseUrl()}/api/clients?q=Jordan`)).json();
  const jordan = clients.clients[0] as { id: string };
  const consultations = await (await page.request.get(`${baseUrl()}/api/clients/${jordan.id}/consultations`)).json();
  const consultation = consultations.consultations[0] as { id: string; quote: { stepPlan: { sittings: Array<{ steps: Array<{ label: string }> }> } } };
  await page.goto(`${baseUrl()}/consultations/${consultation.id}`);
  await page.getByRole('heading', { level: 1, name: 'Quote for Jordan Avery' }).waitFor();
  // Booked as a full lightening, the quote's steps that the demo's lightening visits timed show Ana's own figures.
  const answer = page.waitForResponse((r) => /\/api\/services\/[^/]+\/typical-minutes/.test(r.url()) && r.status() === 200);
  await page.getByLabel('Books as service').selectOption({ label: 'Full lightening' });
  const typical = (await (await answer).json()) as {
    forStylistId: string;
    steps: Array<{ sitting: number; label: string; occurrence: number; stylists: Array<{ name: string; visits: number; medianMinutes: number | null }> }>;
  };
  expect(typical.forStylistId).toBeTruthy();
  const quoted = consultation.quote.stepPlan.sittings.flatMap((s, i) =>
    s.steps.map((st, k) => ({ sitting: i + 1, label: st.label, occurrence: s.steps.slice(0, k + 1).filter((o) => o.label === st.label).length })),
  );
  const timed = typical.steps.filter(
    (t) => t.stylists[0]?.medianMinutes != null && quoted.some((q) => q.sitting === t.sitting && q.label === t.label && q.occurrence === t.occurrence),
  );
  expect(timed.length).toBeGreaterThan(0);
  const first = timed[0]!.stylists[0]!;
  expect(first.name).toBe('Ana Moreno');
  const shown = page.getByText(new RegExp(`Ana Moreno: typically ${Math.round(first.medianMinutes!)} min .* over ${first.visits} visits`)).first();
  await shown.waitFor();
  await shown.scrollIntoViewIfNeeded();
  await screenshot(page, 'quote-typical-minutes', false, false);
  await page.context().close();
});
