// `npm run load`: a throwaway PostgreSQL cluster with the busy salon's book, one or two app servers in
// their own processes, then autocannon over loopback at 50 connections: public free times, the desk's
// day and week, and many desks booking the same few slots at once. Prints throughput, p50/p95/p99 and
// 5xx per scenario, then checks the database for double bookings and half-written bookings.
// Bounded: each read scenario runs DWELL_LOAD_SECONDS (default 10 s), booking DWELL_LOAD_BOOKINGS attempts.
//   npm run load                 one app server
//   npm run load -- --servers 2  two app servers on the same database (sessions and jobs in PostgreSQL)
import { randomUUID } from 'node:crypto';
import { DateTime } from 'luxon';
import { createDb, createPool } from '@server/db/database';
import { loadBusySalon } from './busy-salon-db';
import { startAppProcess } from './load/app-process';
import { benchScratch } from './load/bench-scratch';
import { signIn } from './load/http-session';
import { drained, measure, printFigures, someAddress, type Figures, type LoadSpec } from './load/measure';
import { startSteadyWriter } from './load/steady-writer';
import { doubleBookings, duplicateMessages, halfWritten } from './load/integrity';

const servers = Number(process.argv[process.argv.indexOf('--servers') + 1]) || 1;
const seconds = Number(process.env.DWELL_LOAD_SECONDS ?? 10);
const bookingAttempts = Number(process.env.DWELL_LOAD_BOOKINGS ?? 500);
const CONNECTIONS = 50;
const READ_TARGET_P95_MS = 150;
const WARM_UP_SECONDS = 3;
/** The pace of changes in the mixed scenario: far busier than a real salon's desk (a change every few minutes). */
const WRITE_EVERY_MS = 2_000;

async function main(): Promise<number> {
  const { apps, cleanUp, database } = benchScratch('dwell-load-');
  try {
    // Durable settings (fsync on), unlike the test cluster: booking figures should include the commit cost.
    const prepared = await database('dwell_load', { port: process.env.PGPORT ? Number(process.env.PGPORT) : undefined });
    const db = createDb(createPool(prepared.url));
    const today = DateTime.now().setZone('America/Denver').toISODate()!;
    const t = Date.now();
    const busy = await loadBusySalon(db, { from: today, months: 2 });
    console.log(`dwell load: busy salon loaded in ${((Date.now() - t) / 1000).toFixed(1)} s — ${JSON.stringify(busy.counts)}`);

    // One plain service offered online, for free times and for the booking race.
    const service = await db
      .selectFrom('services')
      .select(['id', 'step_plan', 'skill'])
      .where('salon_id', '=', busy.salonId)
      .where('needs_skin_test', '=', false)
      .where('category', '!=', 'skin_test')
      .orderBy('price_cents')
      .executeTakeFirstOrThrow();
    await db.updateTable('services').set({ online_bookable: true }).where('id', '=', service.id).execute();
    const clients = (await db.selectFrom('clients').select('id').where('salon_id', '=', busy.salonId).limit(300).execute()).map((c) => c.id);

    const basePort = Number(process.env.PORT ?? 3105);
    const secret = randomUUID() + randomUUID(); // one secret: a session works on every server
    for (let i = 0; i < servers; i++) {
      apps.push(await startAppProcess({ DATABASE_URL: prepared.url, PORT: String(basePort + i * 10), SESSION_SECRET: secret }));
    }
    const urls = apps.map((a) => a.url);
    console.log(`dwell load: ${servers} app server(s) at ${urls.join(', ')}; ${CONNECTIONS} connections\n`);
    const desk = await signIn(urls[0]!, busy.deskEmail, busy.password);
    // Every browser asks for compressed answers; the app sends cached calendar reads gzip-compressed then.
    const browser = { 'accept-encoding': 'gzip, deflate, br' };
    const deskHeaders = { cookie: desk.cookie, ...browser };
    const stylists = (
      await db.selectFrom('staff').select('id').where('salon_id', '=', busy.salonId).where('active', '=', true).orderBy('display_name').execute()
    ).map((s) => s.id);
    const days = Array.from({ length: 20 }, (_, i) =>
      DateTime.fromISO(today)
        .plus({ days: i + 1 })
        .toISODate()!,
    );
    const figures: Figures[] = [];
    // A server that has just started compiles its hot paths and fills its cache on the first requests; the
    // concurrent read scenarios get a few unreported seconds first, as a server in service is warm.
    const warm = (spec: LoadSpec) => measure({ ...spec, duration: WARM_UP_SECONDS, amount: undefined }).then(() => drained(urls));
    const run = async (f: Promise<Figures>) => {
      const result = await f;
      printFigures(result);
      figures.push(result);
      const waited = await drained(urls);
      if (waited > 1) console.log(`${''.padEnd(34)} (the server(s) needed ${waited.toFixed(1)} s more to finish the queued requests)`);
      return result;
    };

    // One request at a time first: the latency without queueing, to tell the machine's speed from concurrency.
    await run(
      measure({
        name: 'one at a time: desk/day',
        urls: urls.slice(0, 1),
        connections: 1,
        amount: 10,
        headers: deskHeaders,
        next: (i) => ({ path: `/api/desk/day?date=${days[i % days.length]}` }),
      }),
    );
    await run(
      measure({
        name: 'one at a time: availability',
        urls: urls.slice(0, 1),
        connections: 1,
        amount: 5,
        next: (i) => ({
          path: `/api/public/salons/${busy.slug}/availability?serviceId=${service.id}&from=${days[i % days.length]}`,
          headers: { 'x-forwarded-for': someAddress(100_000 + i), ...browser },
        }),
      }),
    );
    const deskDay: LoadSpec = {
      name: 'desk calendar (GET desk/day)',
      urls,
      connections: CONNECTIONS,
      duration: seconds,
      headers: deskHeaders,
      next: (i) => ({ path: `/api/desk/day?date=${days[i % days.length]}` }),
    };
    // The week page with a stylist picked: one stylist's week.
    const deskWeek: LoadSpec = {
      name: 'desk calendar (GET desk/week)',
      urls,
      connections: CONNECTIONS,
      duration: seconds,
      headers: deskHeaders,
      next: (i) => ({ path: `/api/desk/week?date=${days[i % days.length]}&stylistId=${stylists[i % stylists.length]}` }),
    };
    // Every stylist's week in one answer (about 380 KB of JSON for the busy salon): what the week page opens on.
    const allStylists: LoadSpec = {
      name: 'all stylists (GET desk/week)',
      urls,
      connections: CONNECTIONS,
      duration: seconds,
      headers: deskHeaders,
      next: (i) => ({ path: `/api/desk/week?date=${days[i % days.length]}` }),
    };
    const freeTimes: LoadSpec = {
      name: 'public free times (GET availability)',
      urls,
      connections: CONNECTIONS,
      duration: seconds,
      next: (i) => ({
        path: `/api/public/salons/${busy.slug}/availability?serviceId=${service.id}&from=${days[i % days.length]}`,
        headers: { 'x-forwarded-for': someAddress(i), ...browser },
      }),
    };
    for (const spec of [deskDay, deskWeek, allStylists, freeTimes]) {
      await warm(spec);
      await run(measure(spec));
    }

    // The same reads while the desk books something every WRITE_EVERY_MS, on the days being read: each booking
    // moves the version of its dates, so the answers over those dates are recomputed as they are next asked for.
    const laterTimes = (await (
      await fetch(`${urls[0]}/api/public/salons/${busy.slug}/availability?serviceId=${service.id}&from=${days[0]}`, {
        headers: { 'x-forwarded-for': '10.255.0.2' },
      })
    ).json()) as { times: { start: string; stylistId: string }[] };
    const writes: Record<string, number>[] = [];
    for (const spec of [deskDay, freeTimes]) {
      const offset = writes.length * 200;
      const writer = startSteadyWriter({
        url: urls[0]!,
        session: desk,
        everyMs: WRITE_EVERY_MS,
        path: '/api/bookings',
        body: (i) => {
          const slot = laterTimes.times[(offset + i * 7) % laterTimes.times.length]!;
          return {
            clientId: clients[i % clients.length],
            serviceId: service.id,
            stepPlan: service.step_plan,
            stylistId: slot.stylistId,
            start: slot.start,
            idempotencyKey: randomUUID(),
          };
        },
      });
      await run(measure({ ...spec, name: `${spec.name.replace(/ \(.*/, '')} + a booking every ${WRITE_EVERY_MS / 1000} s` }));
      writes.push(await writer.stop());
    }
    console.log(`${''.padEnd(34)} (bookings made during those two: ${writes.map((w) => JSON.stringify(w)).join(', ')})`);

    // The race: free times after the book ends, a handful of them, each wanted by dozens of desks at once.
    const after = DateTime.fromISO(busy.to).plus({ days: 7 }).toISODate()!;
    const free = await fetch(`${urls[0]}/api/public/salons/${busy.slug}/availability?serviceId=${service.id}&from=${after}`, {
      headers: { 'x-forwarded-for': '10.255.0.1' },
    });
    const times = ((await free.json()) as { times: { start: string; stylistId: string }[] }).times;
    const slots = times.filter((s, i) => times.findIndex((o) => o.stylistId === s.stylistId) === i).slice(0, 8);
    if (!slots.length) throw new Error('no free times found for the booking race');
    const before = await db
      .selectFrom('bookings')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('salon_id', '=', busy.salonId)
      .executeTakeFirstOrThrow();
    const race = await run(
      measure({
        name: `booking race (${slots.length} slots, POST bookings)`,
        urls,
        connections: CONNECTIONS,
        amount: bookingAttempts,
        method: 'POST',
        headers: { cookie: desk.cookie, 'x-csrf-token': desk.csrf },
        next: (i) => {
          const slot = slots[i % slots.length]!;
          return {
            path: '/api/bookings',
            body: JSON.stringify({
              clientId: clients[i % clients.length],
              serviceId: service.id,
              stepPlan: service.step_plan,
              stylistId: slot.stylistId,
              start: slot.start,
              idempotencyKey: randomUUID(),
            }),
          };
        },
      }),
    );
    const afterCount = await db
      .selectFrom('bookings')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('salon_id', '=', busy.salonId)
      .executeTakeFirstOrThrow();
    const made = Number(afterCount.n) - Number(before.n);

    const overlaps = await doubleBookings(db);
    const broken = await halfWritten(db);
    const duplicates = await duplicateMessages(db);
    const reads = figures.filter((f) => f.name.startsWith('public') || f.name.startsWith('desk calendar'));
    const serverErrors = figures.reduce((n, f) => n + f.serverErrors, 0);
    console.log(`\nbooking race: ${race.statuses['201'] ?? 0} answered 201, ${made} bookings written for ${slots.length} slots (at most one each)`);
    console.log(
      `double bookings: chairs ${overlaps.chairs}, hands ${overlaps.hands}, basins ${overlaps.basins}; half-written bookings ${broken}; duplicate messages ${duplicates}`,
    );
    const readsOk = reads.every((f) => f.p95 <= READ_TARGET_P95_MS);
    const ok = serverErrors === 0 && overlaps.chairs + overlaps.hands + overlaps.basins === 0 && broken === 0 && duplicates === 0 && made <= slots.length;
    console.log(
      `\ndwell load: ${ok ? 'PASS' : 'FAIL'} — 5xx ${serverErrors}, double bookings ${overlaps.chairs + overlaps.hands + overlaps.basins}; ` +
        `read p95 ${reads.map((f) => `${f.p95} ms`).join(' / ')} (target ≤ ${READ_TARGET_P95_MS} ms: ${readsOk ? 'met' : 'NOT met'})`,
    );
    await db.destroy();
    return ok ? 0 : 1;
  } catch (err) {
    console.error(`dwell load: failed — ${(err as Error).stack ?? err}`);
    return 1;
  } finally {
    await cleanUp();
  }
}

process.exit(await main());
