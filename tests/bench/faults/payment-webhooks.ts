// Fault 4 of `npm run faults`: the payment provider's webhook arriving late (after the hold lapsed, and late but in
// time), twice at once, and out of order (a refund made at the provider before the payment it refunds), against one
// app server in its own process and a payments fake in the script's process; then the same for a checkout's card
// part (checkout-webhooks.ts). Each case must end in the right state:
// booked or not, the deposit paid or refunded, and no money moved twice (counted in the fake).
import { createDb, createPool } from '@server/db/database';
import { DEMO_PASSWORD, demoSalon } from '@server/demo/demo-catalogue';
import { FAKE_CARDS, startPaymentsFake, type PaymentsFake } from '@server/fakes/payments-fake';
import { lapseHolds } from '@server/features/online-booking/holds.repository';
import { FAKE_STRIPE } from '@server/services';
import { payOnHostedPage } from '../../setup/hosted-payment';
import { checkoutWebhookFaults } from './checkout-webhooks';
import { startAppProcess, type AppProcess } from '../load/app-process';
import { sendJson, signIn, type HttpSession } from '../load/http-session';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export interface WebhookFaultResult {
  failures: string[];
  app: AppProcess;
  /** Stops the fake; call after the app server has stopped. */
  closeFake(): Promise<void>;
}

export async function paymentWebhookFaults(databaseUrl: string, env: Record<string, string>): Promise<WebhookFaultResult> {
  const failures: string[] = [];
  const payments = await startPaymentsFake({ webhookSecret: FAKE_STRIPE.webhookSecret });
  const app = await startAppProcess({ ...env, PORT: String(Number(env.PORT ?? 3105) + 20), PAYMENTS_API_URL: `http://127.0.0.1:${payments.url.port}` });
  payments.setWebhook(`${app.url}/webhooks/payments`);
  const db = createDb(createPool(databaseUrl));
  const check = (ok: boolean, what: string) => void (ok || failures.push(what));
  try {
    const client = await signIn(app.url, 'client@demo.test', DEMO_PASSWORD);
    const open = await holdOpener(app, client, payments);
    const state = async (holdId: string) => {
      const booking = await db.selectFrom('bookings').select('status').where('id', '=', holdId).executeTakeFirst();
      const money = await db.selectFrom('payments').select(['kind', 'status']).where('booking_id', '=', holdId).orderBy('created_at').execute();
      const charges = payments.charges().filter((p) => p.metadata.booking === holdId);
      const refunds = payments.refunds.filter((r) => charges.some((c) => c.id === r.payment_intent));
      return {
        booking: booking?.status ?? 'gone',
        money: money.map((m) => `${m.kind} ${m.status}`).join(', '),
        charges: charges.length,
        refunds: refunds.length,
      };
    };
    const report = (name: string, s: Awaited<ReturnType<typeof state>>, want: typeof s) => {
      console.log(`   ${name}: booking ${s.booking}; payments recorded [${s.money}]; charges ${s.charges}, refunds ${s.refunds} in the provider`);
      check(JSON.stringify(s) === JSON.stringify(want), `${name}: ended ${JSON.stringify(s)}, not ${JSON.stringify(want)}`);
    };
    const lapse = async (holdId: string) => {
      await db
        .updateTable('bookings')
        .set({ held_until: new Date(Date.now() - 1000) })
        .where('id', '=', holdId)
        .execute();
      await lapseHolds(db, new Date(), holdId);
    };
    // A refund Dwell decides on is made after its transaction; the event of that refund follows it.
    const settled = async (holdId: string, refunds: number) => {
      for (let i = 0; i < 40 && (await state(holdId)).refunds < refunds; i++) await sleep(250);
      await sleep(500);
    };

    /** A hold paid on its page while the provider holds its webhooks back (the provider is late). */
    const paidUnheard = async (n: number) => {
      const hold = await open(n);
      payments.holdWebhooks();
      check((await payOnHostedPage(hold.url, FAKE_CARDS.succeeds)).status === 303, `payment ${n} was not taken`);
      return hold;
    };
    /** A refund made at the provider itself (its dashboard), of the hold's whole payment. */
    const refundThere = (holdId: string) => payments.refundAtProvider(payments.charges().find((p) => p.metadata.booking === holdId)!.id);
    const bookedPaid = { booking: 'booked', money: 'deposit succeeded', charges: 1, refunds: 0 };
    const refundedOnce = { money: 'deposit succeeded, refund succeeded', charges: 1, refunds: 1 };

    // Late, after the hold lapsed: the payment is recorded, refunded once, and the client told.
    let hold = await paidUnheard(0);
    await lapse(hold.holdId);
    await payments.releaseHeld();
    await settled(hold.holdId, 1);
    report('late, after the hold lapsed', await state(hold.holdId), { booking: 'gone', ...refundedOnce });
    const told = await db.selectFrom('messages').select('id').where('kind', '=', 'payment_refunded').execute();
    check(told.length > 0, 'the client of the late payment was not told');

    // Late but in time: 3 s after the client paid, the hold still within its minutes: booked.
    hold = await paidUnheard(1);
    await sleep(3_000);
    await payments.releaseHeld();
    report('late, in time', await state(hold.holdId), bookedPaid);

    // Twice: the completed event delivered again, twice at once.
    hold = await open(2);
    await payOnHostedPage(hold.url, FAKE_CARDS.succeeds);
    for (let i = 0; i < 40 && (await state(hold.holdId)).booking !== 'booked'; i++) await sleep(250);
    const completed = payments.events.find(
      (e) => e.type === 'checkout.session.completed' && (e.data.object as { metadata: { booking: string } }).metadata.booking === hold.holdId,
    );
    const again = completed ? await Promise.all([payments.resend(completed.id), payments.resend(completed.id)]) : [];
    check(again.length === 2 && again.every((s) => s === 200), `a repeated delivery answered ${JSON.stringify(again)}`);
    report('twice (and twice again at once)', await state(hold.holdId), bookedPaid);

    // Out of order: a refund made at the provider reaches Dwell before the payment it refunds.
    hold = await paidUnheard(3);
    refundThere(hold.holdId);
    await payments.releaseHeld('reverse');
    report('out of order (refund before payment)', await state(hold.holdId), { booking: 'booked', ...refundedOnce });

    // Out of order and late: the provider's refund first, the payment after the hold lapsed: not refunded again.
    hold = await paidUnheard(4);
    refundThere(hold.holdId);
    await lapse(hold.holdId);
    await payments.releaseHeld('reverse');
    await settled(hold.holdId, 2);
    report('out of order and late', await state(hold.holdId), { booking: 'gone', ...refundedOnce });
    // The same faults for a checkout's card part at the desk.
    failures.push(...(await checkoutWebhookFaults(app, payments, db)));
    const refused = payments.deliveries.filter((d) => d.status !== 200);
    console.log(`   webhook deliveries ${payments.deliveries.length}, answered other than 200: ${refused.length}`);
    check(refused.length === 0, `${refused.length} webhook deliveries were not accepted`);
    return { failures, app, closeFake: () => payments.close() };
  } catch (err) {
    await app.stop();
    await payments.close();
    throw err;
  } finally {
    await db.destroy();
  }
}

/** Holds the n-th free time for the demo client (as the online flow does) and opens its payment page. */
async function holdOpener(app: AppProcess, client: HttpSession, payments: PaymentsFake) {
  const services = await (await fetch(`${app.url}/api/public/salons/${demoSalon.slug}`)).json();
  const consultation = (services as { services: { id: string; name: string }[] }).services.find((s) => s.name === 'Colour consultation')!;
  const from = new Date(Date.now() + 90 * 86_400_000).toISOString().slice(0, 10);
  const free = (await (
    await fetch(`${app.url}/api/public/salons/${demoSalon.slug}/availability?serviceId=${consultation.id}&from=${from}`, {
      headers: { 'x-forwarded-for': '10.9.1.1' },
    })
  ).json()) as { times: { start: string; stylistId: string }[] };
  // Times an hour or more apart for each stylist, so no two holds meet.
  const apart: typeof free.times = [];
  for (const t of free.times) {
    if (!apart.some((a) => a.stylistId === t.stylistId && Math.abs(Date.parse(a.start) - Date.parse(t.start)) < 3_600_000)) apart.push(t);
  }
  return async (n: number) => {
    const slot = apart[n]!;
    const held = await sendJson(app.url, client, 'POST', '/api/public/holds', {
      salonSlug: demoSalon.slug,
      serviceId: consultation.id,
      stylistId: slot.stylistId,
      start: slot.start,
    });
    if (held.status !== 201) throw new Error(`hold refused: ${held.status} ${JSON.stringify(held.body)}`);
    const { holdId, holdSecret } = held.body;
    const claim = await sendJson(app.url, client, 'POST', `/api/me/holds/${holdId}/claim`, { secret: holdSecret });
    await sendJson(app.url, client, 'POST', `/api/me/holds/${holdId}/cautions`, { version: claim.body.cautions.version, secret: holdSecret });
    const pay = await sendJson(app.url, client, 'POST', `/api/me/holds/${holdId}/pay`, { secret: holdSecret });
    if (!pay.body?.checkoutUrl?.startsWith(`http://127.0.0.1:${payments.url.port}/pay/`)) throw new Error(`no payment page: ${JSON.stringify(pay.body)}`);
    return { holdId: holdId as string, url: pay.body.checkoutUrl as string };
  };
}
