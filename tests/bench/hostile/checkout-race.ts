import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { demoSalon } from '@server/demo/demo-catalogue';
import { insertSittingAround } from '../../factories/day-of-service';
import { insertDemoStylist } from '../../factories/demo-visit';
import { sendJson, type HttpSession } from '../load/http-session';
import type { RaceFigure } from './races';

/**
 * One checkout's unpaid card part taken in cash from five desk tabs at once: one 200, four 409, and the cash and tip
 * recorded once (a visit of a stylist made for the race, just ended, checked out all by card with a tip).
 */
export async function cashInsteadRace(url: string, db: Kysely<Database>, desk: HttpSession): Promise<RaceFigure> {
  const name = 'one card part taken in cash from 5 desk tabs at once';
  const salon = await db.selectFrom('salons').select('id').where('slug', '=', demoSalon.slug).executeTakeFirstOrThrow();
  const stylist = await insertDemoStylist(db, salon.id, { name: 'Ines Harte', displayName: 'Ines', email: `ines.${Date.now()}@demo.test` });
  const client = await db.selectFrom('clients').select('id').where('salon_id', '=', salon.id).orderBy('name').executeTakeFirstOrThrow();
  const service = await db.selectFrom('services').select('id').where('salon_id', '=', salon.id).where('price_is_from', '=', false).executeTakeFirstOrThrow();
  const id = await insertSittingAround(db, { salonId: salon.id, serviceId: service.id, stylistId: stylist.staffId, clientId: client.id, minutesAgo: 120 });
  await db.updateTable('sittings').set({ status: 'finished', arrived_at: new Date(), late_minutes: 0 }).where('booking_id', '=', id).execute();
  await db.updateTable('bookings').set({ status: 'finished' }).where('id', '=', id).execute();
  const made = await sendJson(url, desk, 'POST', `/api/bookings/${id}/checkout`, {
    services: [{}],
    retail: [],
    discount: null,
    tipCents: 500,
    pay: { method: 'card' },
  });
  if (made.status !== 201) return { name, answers: { [made.status]: 1 }, figure: 'no checkout', broken: [`${name}: checkout refused ${made.status}`] };

  const tabs = await Promise.all(Array.from({ length: 5 }, () => sendJson(url, desk, 'POST', `/api/bookings/${id}/checkout/cash`, {})));
  const answers = tabs.reduce<Record<number, number>>((m, t) => ({ ...m, [t.status]: (m[t.status] ?? 0) + 1 }), {});
  const cash = await db.selectFrom('payments').select(['kind']).where('booking_id', '=', id).where('method', '=', 'cash').execute();
  const rows = `${cash.filter((c) => c.kind === 'balance').length} balance and ${cash.filter((c) => c.kind === 'tip').length} tip row(s) in cash`;
  const ok = answers[200] === 1 && answers[409] === 4 && cash.length === 2;
  return { name, answers, figure: rows, broken: ok ? [] : [`${name}: ${JSON.stringify(answers)}, ${rows}`] };
}
