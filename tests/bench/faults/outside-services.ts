// Fault 3 of `npm run faults`: the e-mail, SMS and payments providers failing and slow, with two app servers
// sharing one fake of each (run here, in the script's process, and named to the servers by SMTP_URL,
// SMS_API_URL and PAYMENTS_API_URL). Desk bookings and online deposits go through both servers; afterwards
// every sent message must have reached its provider exactly once and every deposit been charged once.
import { randomUUID } from 'node:crypto';
import { createDb, createPool } from '@server/db/database';
import { DEMO_PASSWORD, demoSalon } from '@server/demo/demo-catalogue';
import { FAKE_CARDS, startPaymentsFake } from '@server/fakes/payments-fake';
import { FAKE_STRIPE } from '@server/services';
import { payOnHostedPage } from '../../setup/hosted-payment';
import { startSmsFake } from '@server/fakes/sms-fake';
import { startSmtpFake } from '@server/fakes/smtp-fake';
import { startAppProcess, type AppProcess } from '../load/app-process';
import { sendJson, signIn } from '../load/http-session';
import { percentile } from '../load/measure';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const SLOW_MS = 2_500;
const SETTLE_MINUTES = Number(process.env.DWELL_FAULT_SETTLE_MINUTES ?? 8);

export interface OutsideFaultResult {
  failures: string[];
  apps: AppProcess[];
  /** Stops the fakes; call after the app servers have stopped. */
  closeFakes(): Promise<void>;
}

export async function outsideServicesFault(databaseUrl: string, env: Record<string, string>): Promise<OutsideFaultResult> {
  const failures: string[] = [];
  const [smtp, sms, payments] = await Promise.all([startSmtpFake(), startSmsFake(), startPaymentsFake({ webhookSecret: FAKE_STRIPE.webhookSecret })]);
  const shared = { ...env, SMTP_URL: smtp.url, SMS_API_URL: sms.url, PAYMENTS_API_URL: `http://${payments.url.host}:${payments.url.port}` };
  const port = Number(env.PORT ?? 3105);
  const apps = [await startAppProcess({ ...shared, PORT: String(port) }), await startAppProcess({ ...shared, PORT: String(port + 10) })];
  const closeFakes = async () => void (await Promise.all([smtp.close(), sms.close(), payments.close()]));
  const db = createDb(createPool(databaseUrl));
  try {
    // Texts must go at once at whatever hour the script runs, not wait for the end of quiet hours.
    await db.updateTable('salons').set({ quiet_from: '00:00', quiet_to: '00:00' }).where('slug', '=', demoSalon.slug).execute();
    const salon = await db.selectFrom('salons').select('id').where('slug', '=', demoSalon.slug).executeTakeFirstOrThrow();
    const clients = (await db.selectFrom('clients').select('id').where('salon_id', '=', salon.id).where('user_id', 'is', null).execute()).map((c) => c.id);

    // Both providers refuse their first two requests, then answer the next ten SLOW_MS late. A refused message
    // is retried after 1, then 2 minutes, and the messages due after it on its channel wait behind it (they go
    // out in the order they were due), so the send log settles about four minutes later.
    for (const fake of [smtp, sms]) {
      fake.failNext(2);
      fake.slowNext(10, SLOW_MS);
    }
    const desks = await Promise.all(apps.map((a) => signIn(a.url, 'desk@demo.test', DEMO_PASSWORD)));
    const services = (await sendJson(apps[0]!.url, desks[0]!, 'GET', '/api/services')).body.services as {
      id: string;
      name: string;
      stepPlan: unknown;
      needsSkinTest: boolean;
    }[];
    const cut = services.find((s) => !s.needsSkinTest && s.name === 'Cut & finish') ?? services.find((s) => !s.needsSkinTest)!;
    const earliestDate = new Date(Date.now() + 75 * 86_400_000).toISOString().slice(0, 10);
    const asked = await sendJson(apps[0]!.url, desks[0]!, 'POST', '/api/booking-options', {
      clientId: clients[0],
      serviceId: cut.id,
      stepPlan: cut.stepPlan,
      stylistId: null,
      earliestDate,
      limit: 20,
    });
    if (asked.status !== 200) throw new Error(`booking options answered ${asked.status}: ${JSON.stringify(asked.body)}`);
    const options = asked.body.options as { stylistId: string; sittings: { start: string }[] }[];
    const bookingIds: string[] = [];
    const deskTimes: number[] = [];
    for (let i = 0; i < 12 && i < options.length; i++) {
      const n = i % apps.length;
      const started = Date.now();
      const res = await sendJson(apps[n]!.url, desks[n]!, 'POST', '/api/bookings', {
        clientId: clients[(i + 1) % clients.length],
        serviceId: cut.id,
        stepPlan: cut.stepPlan,
        stylistId: options[i]!.stylistId,
        start: options[i]!.sittings[0]!.start,
        idempotencyKey: randomUUID(),
      });
      deskTimes.push(Date.now() - started);
      if (res.status === 201) bookingIds.push(res.body.id);
    }
    deskTimes.sort((a, b) => a - b);
    console.log(
      `   desk bookings through both servers while e-mail and SMS refuse, then answer ${SLOW_MS / 1000} s late: ${bookingIds.length} booked; answer p50 ${percentile(deskTimes, 50)} ms, p95 ${percentile(deskTimes, 95)} ms`,
    );

    // Online deposits by the demo client, alternating servers: the payments API fails once, then answers late. The
    // provider's webhook reaches one server (as it reaches one endpoint behind a load balancer).
    payments.setWebhook(`${apps[0]!.url}/webhooks/payments`);
    payments.failNext(1);
    payments.slowNext(4, SLOW_MS);
    const consultation = services.find((s) => s.name === 'Colour consultation')!;
    const clientSessions = await Promise.all(apps.map((a) => signIn(a.url, 'client@demo.test', DEMO_PASSWORD)));
    const free = (await (
      await fetch(`${apps[0]!.url}/api/public/salons/${demoSalon.slug}/availability?serviceId=${consultation.id}&from=${earliestDate}`, {
        headers: { 'x-forwarded-for': '10.9.0.1' },
      })
    ).json()) as { times: { start: string; stylistId: string }[] };
    const payTimes: number[] = [];
    const paid: string[] = [];
    for (let i = 0; i < 4; i++) {
      const n = i % apps.length;
      const slot = free.times[i * 9]!;
      const held = await sendJson(apps[n]!.url, clientSessions[n]!, 'POST', '/api/public/holds', {
        salonSlug: demoSalon.slug,
        serviceId: consultation.id,
        stylistId: slot.stylistId,
        start: slot.start,
      });
      if (held.status !== 201) {
        failures.push(`an online hold was refused (${held.status})`);
        continue;
      }
      const { holdId, holdSecret } = held.body;
      const claim = await sendJson(apps[n]!.url, clientSessions[n]!, 'POST', `/api/me/holds/${holdId}/claim`, { secret: holdSecret });
      await sendJson(apps[n]!.url, clientSessions[n]!, 'POST', `/api/me/holds/${holdId}/cautions`, {
        version: claim.body.cautions.version,
        secret: holdSecret,
      });
      const started = Date.now();
      const res = await sendJson(apps[n]!.url, clientSessions[n]!, 'POST', `/api/me/holds/${holdId}/pay`, { secret: holdSecret });
      payTimes.push(Date.now() - started);
      // The browser repeats the same request when an answer is slow, here on the other server: the same page.
      const again = await sendJson(apps[1 - n]!.url, clientSessions[1 - n]!, 'POST', `/api/me/holds/${holdId}/pay`, { secret: holdSecret });
      if (res.status !== 200) {
        failures.push(`a deposit's payment page answered ${res.status}`);
        continue;
      }
      if (again.status >= 500) failures.push(`a repeated pay request answered ${again.status}`);
      else if (again.body.checkoutUrl !== res.body.checkoutUrl) failures.push('a repeated pay request got another payment page');
      // The client pays once on the hosted page; a second try (another tab) finds it paid.
      const [first, second] = await Promise.all([0, 1].map(() => payOnHostedPage(res.body.checkoutUrl, FAKE_CARDS.succeeds)));
      if ([first!.status, second!.status].filter((x) => x === 303).length !== 1) failures.push('two tabs paying one page both went through');
      paid.push(holdId);
      // The webhook books it; only then may the client hold another time (one unpaid hold per client).
      const bookedBy = Date.now() + 30_000;
      while (Date.now() < bookedBy && (await db.selectFrom('bookings').select('status').where('id', '=', holdId).executeTakeFirst())?.status !== 'booked') {
        await sleep(250);
      }
    }
    payTimes.sort((a, b) => a - b);
    const charges = paid.map((id) => payments.charges().filter((x) => x.metadata.booking === id).length);
    const pages = paid.map((id) => [...payments.sessions.values()].filter((x) => x.metadata.booking === id).length);
    const booked = paid.length ? (await db.selectFrom('bookings').select('id').where('id', 'in', paid).where('status', '=', 'booked').execute()).length : 0;
    console.log(
      `   online deposits while payments fail once, then answer ${SLOW_MS / 1000} s late: ${paid.length} paid, ${booked} booked by the webhook; payment page answer p50 ${percentile(payTimes, 50)} ms, max ${payTimes.at(-1)} ms; pages per deposit ${JSON.stringify(pages)}, charges per deposit ${JSON.stringify(charges)} (each asked for twice, both servers, and paid from two tabs)`,
    );
    if (charges.some((c) => c !== 1)) failures.push(`deposits charged ${JSON.stringify(charges)} times`);
    if (pages.some((c) => c !== 1)) failures.push(`deposits opened ${JSON.stringify(pages)} payment pages`);
    if (booked !== paid.length) failures.push(`${paid.length - booked} paid holds not booked by the webhook`);

    // Wait for the send log to settle: retries back off 1, 2, 4 … minutes and go out from the per-minute pass.
    const ids = [...bookingIds, ...paid];
    const started = Date.now();
    let pending = Infinity;
    while (Date.now() - started < SETTLE_MINUTES * 60_000) {
      pending = Number(
        (
          await db
            .selectFrom('messages')
            .select((eb) => eb.fn.countAll<string>().as('n'))
            .where('booking_id', 'in', ids)
            .where('status', 'in', ['queued', 'sending'])
            .where('send_at', '<=', new Date(Date.now() + 10 * 60_000))
            .executeTakeFirstOrThrow()
        ).n,
      );
      if (pending === 0) break;
      await sleep(2_000);
    }
    const rows = await db
      .selectFrom('messages')
      .select(['channel', 'to_address', 'subject', 'body', 'status', 'attempts'])
      .where('booking_id', 'in', ids)
      .where('status', 'in', ['sent', 'failed'])
      .execute();
    const norm = (s: string) => s.replace(/\r\n/g, '\n').trim();
    const deliveries = rows.map((r) =>
      r.channel === 'sms'
        ? sms.messages.filter((m) => m.to === r.to_address && m.body === r.body).length
        : smtp.messages.filter((m) => m.to === r.to_address && m.subject === r.subject && norm(m.text) === norm(r.body)).length,
    );
    const sent = rows.filter((r) => r.status === 'sent').length;
    const once = rows.filter((r, i) => r.status === 'sent' && deliveries[i] === 1).length;
    const duplicates = deliveries.reduce((n, d) => n + Math.max(0, d - 1), 0);
    const retried = rows.filter((r) => r.attempts > 1).length;
    console.log(
      `   send log after ${((Date.now() - started) / 1000).toFixed(0)} s: ${sent} sent (${retried} after a retry), ${rows.length - sent} failed, ${pending} still pending; delivered exactly once ${once} of ${sent}; duplicate deliveries ${duplicates}`,
    );
    console.log(`   the fakes kept e-mail ${smtp.messages.length}, SMS ${sms.messages.length} (with messages of other bookings and staff lists due meanwhile)`);
    if (duplicates) failures.push(`${duplicates} duplicate deliveries`);
    if (once !== sent) failures.push(`${sent - once} sent messages not delivered exactly once`);
    if (pending) {
      failures.push(`${pending} messages still waiting after ${SETTLE_MINUTES} minutes`);
      const waiting = await db
        .selectFrom('messages')
        .select(['channel', 'kind', 'status', 'attempts', 'send_at', 'claimed_at', 'last_error'])
        .where('booking_id', 'in', ids)
        .where('status', 'in', ['queued', 'sending'])
        .where('send_at', '<=', new Date(Date.now() + 10 * 60_000))
        .execute();
      for (const w of waiting) console.log(`     waiting: ${JSON.stringify(w)}`);
    }
    if (!sent) failures.push('no message was sent');
    return { failures, apps, closeFakes };
  } catch (err) {
    await Promise.all(apps.map((a) => a.stop()));
    await closeFakes();
    throw err;
  } finally {
    await db.destroy();
  }
}
