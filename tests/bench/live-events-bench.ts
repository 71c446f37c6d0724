// `npm run bench:events`: how long a change of the book takes to reach another signed-in screen through another
// app server. A throwaway PostgreSQL cluster with a month of the busy salon, two app servers in their own processes
// on that database (as `npm run load -- --servers 2`), a desk session's event stream open on server B, and
// DWELL_EVENTS_CHANGES (default 40) bookings made and cancelled one after another through server A. Each figure is
// from sending the write to A until its `book` event arrives on B's stream. Target: p95 ≤ 2 s.
import { randomUUID } from 'node:crypto';
import { DateTime } from 'luxon';
import { createDb, createPool } from '@server/db/database';
import { loadBusySalon } from './busy-salon-db';
import { startAppProcess } from './load/app-process';
import { benchScratch } from './load/bench-scratch';
import { sendJson, signIn } from './load/http-session';
import { openStream } from '../setup/event-stream';

const CHANGES = Number(process.env.DWELL_EVENTS_CHANGES ?? 40);
const TARGET_P95_MS = 2_000;

async function main(): Promise<number> {
  const { apps, cleanUp, database } = benchScratch('dwell-events-');
  try {
    const prepared = await database('dwell_events');
    const db = createDb(createPool(prepared.url));
    const today = DateTime.now().setZone('America/Denver').toISODate()!;
    const busy = await loadBusySalon(db, { from: today, months: 1 });
    const service = await db
      .selectFrom('services')
      .select(['id', 'step_plan'])
      .where('salon_id', '=', busy.salonId)
      .where('needs_skin_test', '=', false)
      .where('category', '!=', 'skin_test')
      .orderBy('price_cents')
      .executeTakeFirstOrThrow();
    const clients = (await db.selectFrom('clients').select('id').where('salon_id', '=', busy.salonId).limit(50).execute()).map((c) => c.id);

    const secret = randomUUID() + randomUUID(); // one secret: a session works on both servers
    const basePort = Number(process.env.PORT ?? 3205);
    for (let i = 0; i < 2; i++) apps.push(await startAppProcess({ DATABASE_URL: prepared.url, PORT: String(basePort + i * 10), SESSION_SECRET: secret }));
    const a = apps[0]!.url;
    const b = apps[1]!.url;
    const desk = await signIn(a, busy.deskEmail, busy.password);
    const screen = await openStream(`${b}/api/events`, (await signIn(b, busy.deskEmail, busy.password)).cookie);
    if (screen.status !== 200) throw new Error(`the stream on server B answered ${screen.status}`);
    console.log(`dwell events: busy salon (${busy.counts.bookings} bookings); changes through ${a}, stream on ${b}`);

    // One free time after the busy book ends: booked, cancelled, booked again…
    const after = DateTime.fromISO(busy.to).plus({ days: 7 }).toISODate()!;
    const options = await sendJson(a, desk, 'POST', '/api/booking-options', {
      clientId: clients[0]!,
      serviceId: service.id,
      stepPlan: service.step_plan,
      stylistId: null,
      earliestDate: after,
    });
    const slot = options.body.options[0] as { stylistId: string; sittings: { start: string }[] };

    const samples: number[] = [];
    const timed = async (what: string, write: () => Promise<{ status: number; body: { id?: string } }>, expected: number) => {
      const started = performance.now();
      const [answer, event] = await Promise.all([write(), screen.next('book', 10_000)]);
      samples.push(performance.now() - started);
      if (answer.status !== expected) throw new Error(`${what} answered ${answer.status}: ${JSON.stringify(answer.body)}`);
      const told = JSON.parse(event.data) as { bookingIds: string[] };
      if (!told.bookingIds.includes(answer.body.id!)) throw new Error(`${what}: the event named ${told.bookingIds.join(', ')}, not ${answer.body.id}`);
      return answer.body.id!;
    };
    for (let i = 0; i < CHANGES; i++) {
      const id = await timed(
        'booking',
        () =>
          sendJson(a, desk, 'POST', '/api/bookings', {
            clientId: clients[i % clients.length]!,
            serviceId: service.id,
            stepPlan: service.step_plan,
            stylistId: slot.stylistId,
            start: slot.sittings[0]!.start,
            idempotencyKey: randomUUID(),
          }),
        201,
      );
      await timed('cancel', () => sendJson(a, desk, 'POST', `/api/bookings/${id}/cancel`, { reason: 'Bench' }), 200);
    }
    screen.close();

    samples.sort((x, y) => x - y);
    const at = (q: number) => samples[Math.min(samples.length - 1, Math.ceil(q * samples.length) - 1)]!;
    const [p50, p95, max] = [at(0.5), at(0.95), samples[samples.length - 1]!].map((ms) => Math.round(ms)) as [number, number, number];
    const ok = p95 <= TARGET_P95_MS;
    console.log(
      `\ndwell events: ${ok ? 'PASS' : 'FAIL'} — ${samples.length} changes via server A seen on server B's stream: p50 ${p50} ms, p95 ${p95} ms, max ${max} ms (target p95 ≤ ${TARGET_P95_MS} ms)`,
    );
    await db.destroy();
    return ok ? 0 : 1;
  } catch (err) {
    console.error(`dwell events: failed — ${(err as Error).stack ?? err}`);
    return 1;
  } finally {
    await cleanUp();
  }
}

process.exit(await main());
