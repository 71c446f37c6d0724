// Fault 4 of `npm run faults`, the checkout's part: the webhook of a checkout's card part late (the desk tries to take
// the rest in cash meanwhile), twice at once, and out of order (a refund made at the provider before the payment it
// refunds). Against the same app server and payments fake as the deposit cases; each case must end in the right
// state (the checkout paid once, by the right method) with no money moved twice (counted in the fake).
import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { DEMO_PASSWORD, demoSalon } from '@server/demo/demo-catalogue';
import { FAKE_CARDS, type PaymentsFake } from '@server/fakes/payments-fake';
import { insertSittingAround } from '../../factories/day-of-service';
import { insertDemoStylist, removeDemoVisit } from '../../factories/demo-visit';
import { payOnHostedPage } from '../../setup/hosted-payment';
import type { AppProcess } from '../load/app-process';
import { sendJson, signIn } from '../load/http-session';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Runs the checkout cases; answers what went wrong, in words (nothing: all ended right). */
export async function checkoutWebhookFaults(app: AppProcess, payments: PaymentsFake, db: Kysely<Database>): Promise<string[]> {
  const failures: string[] = [];
  const salon = await db.selectFrom('salons').select('id').where('slug', '=', demoSalon.slug).executeTakeFirstOrThrow();
  const stylist = await insertDemoStylist(db, salon.id, { name: 'Faye Orr', displayName: 'Faye', email: `faye.${Date.now()}@demo.test` });
  const client = await db.selectFrom('clients').select('id').where('salon_id', '=', salon.id).orderBy('name').executeTakeFirstOrThrow();
  const service = await db.selectFrom('services').select('id').where('salon_id', '=', salon.id).where('price_is_from', '=', false).executeTakeFirstOrThrow();
  const desk = await signIn(app.url, 'desk@demo.test', DEMO_PASSWORD);
  const visits: string[] = [];

  /** A visit of the made stylist that has just ended, checked out with a $5.00 tip, all by card: its payment page. */
  const cardCheckout = async (n: number) => {
    const id = await insertSittingAround(db, {
      salonId: salon.id,
      serviceId: service.id,
      stylistId: stylist.staffId,
      clientId: client.id,
      minutesAgo: 120 + 60 * n,
    });
    visits.push(id);
    await db.updateTable('sittings').set({ status: 'finished', arrived_at: new Date(), late_minutes: 0 }).where('booking_id', '=', id).execute();
    await db.updateTable('bookings').set({ status: 'finished' }).where('id', '=', id).execute();
    const made = await sendJson(app.url, desk, 'POST', `/api/bookings/${id}/checkout`, {
      services: [{}],
      retail: [],
      discount: null,
      tipCents: 500,
      pay: { method: 'card' },
    });
    if (made.status !== 201) throw new Error(`checkout refused: ${made.status} ${JSON.stringify(made.body)}`);
    return { id, url: made.body.checkout.checkoutUrl as string };
  };
  const state = async (id: string) => {
    const checkout = await db.selectFrom('checkouts').select(['id', 'status']).where('booking_id', '=', id).executeTakeFirstOrThrow();
    const money = await db.selectFrom('payments').select(['kind', 'method']).where('booking_id', '=', id).orderBy('kind').orderBy('method').execute();
    const charges = payments.charges().filter((p) => p.metadata.booking === id);
    const refunds = payments.refunds.filter((r) => charges.some((c) => c.id === r.payment_intent));
    return { checkout: checkout.status, money: money.map((m) => `${m.kind} ${m.method}`).join(', '), charges: charges.length, refunds: refunds.length };
  };
  const report = (name: string, s: Awaited<ReturnType<typeof state>>, want: typeof s) => {
    console.log(`   ${name}: checkout ${s.checkout}; payments recorded [${s.money}]; charges ${s.charges}, refunds ${s.refunds} in the provider`);
    if (JSON.stringify(s) !== JSON.stringify(want)) failures.push(`${name}: ended ${JSON.stringify(s)}, not ${JSON.stringify(want)}`);
  };
  const paidSettles = async (id: string) => {
    for (let i = 0; i < 40 && (await state(id)).checkout !== 'paid'; i++) await sleep(250);
  };
  const paidByCard = { checkout: 'paid' as const, money: 'balance card, tip card', charges: 1, refunds: 0 };

  try {
    // Late: the client paid, the provider holds its webhook back; the desk, seeing no confirmation, tries to take the
    // rest in cash and is refused (the provider has the payment); the late webhook then completes it by card.
    let visit = await cardCheckout(0);
    payments.holdWebhooks();
    if ((await payOnHostedPage(visit.url, FAKE_CARDS.succeeds)).status !== 303) failures.push('late: the card payment was not taken');
    const cash = await sendJson(app.url, desk, 'POST', `/api/bookings/${visit.id}/checkout/cash`, {});
    if (cash.status !== 409) failures.push(`late: taking cash after the card paid answered ${cash.status}, not 409`);
    await payments.releaseHeld();
    await paidSettles(visit.id);
    report('checkout, late (cash tried meanwhile)', await state(visit.id), paidByCard);

    // Twice: the completed event delivered again, twice at once.
    visit = await cardCheckout(1);
    await payOnHostedPage(visit.url, FAKE_CARDS.succeeds);
    await paidSettles(visit.id);
    const completed = payments.events.find(
      (e) => e.type === 'checkout.session.completed' && (e.data.object as { metadata: { booking: string } }).metadata.booking === visit.id,
    );
    const again = completed ? await Promise.all([payments.resend(completed.id), payments.resend(completed.id)]) : [];
    if (again.length !== 2 || again.some((s) => s !== 200)) failures.push(`checkout twice: a repeated delivery answered ${JSON.stringify(again)}`);
    report('checkout, twice (and twice again at once)', await state(visit.id), paidByCard);

    // Out of order: a refund made at the provider reaches Dwell before the payment it refunds.
    visit = await cardCheckout(2);
    payments.holdWebhooks();
    await payOnHostedPage(visit.url, FAKE_CARDS.succeeds);
    payments.refundAtProvider(payments.charges().find((p) => p.metadata.booking === visit.id)!.id);
    await payments.releaseHeld('reverse');
    await paidSettles(visit.id);
    await sleep(500);
    report('checkout, out of order (refund before payment)', await state(visit.id), {
      checkout: 'paid',
      money: 'balance card, refund card, tip card',
      charges: 1,
      refunds: 1,
    });
  } finally {
    for (const id of visits) await removeDemoVisit(db, id, {});
    await removeDemoVisit(db, undefined, stylist);
  }
  return failures;
}
