// `npm run faults`: what a failure does to requests in flight, on a throwaway cluster with the demo salon
// and one app server in its own process. Prints figures; exits non-zero when a property breaks.
//  1. PostgreSQL stopped for 30 s under load: answers are 503 DB_UNAVAILABLE (never another 5xx), nothing
//     is half-written, and the app serves again by itself once PostgreSQL is back.
//  2. The app server killed (SIGKILL) in the middle of a burst of bookings: each booking is whole or absent.
//  3. E-mail, SMS and payments refusing and answering late, with two app servers sharing them: bookings do
//     not wait for the providers, every message reaches its provider exactly once, every deposit is one charge.
//  4. The payment provider's webhook late, twice and out of order: each ends in the right state, no money moved twice.
// DWELL_FAULTS=4 (or 1,3 …) runs only those.
import { randomUUID } from 'node:crypto';
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createDb, createPool } from '@server/db/database';
import { loadDemoSalon } from '@server/demo/load-demo-salon';
import { DEMO_PASSWORD, demoSalon } from '@server/demo/demo-catalogue';
import { prepareLocalDatabase } from '@server/ops/local-database';
import { startCluster, stopCluster, type Cluster } from '@server/ops/postgres-cluster';
import { onShutdownSignal } from '@server/ops/shutdown';
import { startAppProcess, type AppProcess } from './load/app-process';
import { signIn, type HttpSession } from './load/http-session';
import { measure, printFigures } from './load/measure';
import { doubleBookings, halfWritten } from './load/integrity';
import { outsideServicesFault } from './faults/outside-services';
import { paymentWebhookFaults } from './faults/payment-webhooks';

const OUTAGE_SECONDS = Number(process.env.DWELL_FAULT_OUTAGE_SECONDS ?? 30);
const ONLY = process.env.DWELL_FAULTS?.split(',').map((n) => Number(n.trim()));
const runs = (fault: number) => !ONLY || ONLY.includes(fault);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function main(): Promise<number> {
  const scratch = mkdtempSync(join(tmpdir(), 'dwell-faults-'));
  chmodSync(scratch, 0o755);
  let cluster: Cluster | null = null;
  let app: AppProcess | null = null;
  let pair: AppProcess[] = [];
  let closeFakes = async () => {};
  const cleanUp = async () => {
    await app?.stop();
    await Promise.all(pair.map((a) => a.stop()));
    await closeFakes();
    if (cluster) stopCluster(cluster);
    rmSync(scratch, { recursive: true, force: true });
  };
  onShutdownSignal(cleanUp);
  const failures: string[] = [];
  try {
    const pgPort = Number(process.env.PGPORT ?? 56000 + Math.floor(Math.random() * 3000));
    const prepared = await prepareLocalDatabase({ dataRoot: scratch, port: pgPort, database: 'dwell_faults' });
    cluster = prepared.cluster;
    const setup = createDb(createPool(prepared.url));
    await loadDemoSalon(setup, new Date());
    const salon = await setup.selectFrom('salons').select('id').where('slug', '=', demoSalon.slug).executeTakeFirstOrThrow();
    const clients = (await setup.selectFrom('clients').select('id').where('salon_id', '=', salon.id).execute()).map((c) => c.id);
    await setup.destroy();
    const env = { DATABASE_URL: prepared.url, PORT: process.env.PORT ?? '3105', SESSION_SECRET: randomUUID() + randomUUID() };
    app = await startAppProcess(env);
    let desk = await signIn(app.url, 'desk@demo.test', DEMO_PASSWORD);

    // 1. PostgreSQL stops for OUTAGE_SECONDS while the desk reads its calendar.
    if (runs(1)) {
      console.log(`1. PostgreSQL stopped for ${OUTAGE_SECONDS} s during load`);
      const date = new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10);
      const timeline: { at: number; status: number }[] = [];
      const started = Date.now();
      const load = measure({
        name: '   desk day during the outage',
        urls: [app.url],
        connections: 10,
        duration: OUTAGE_SECONDS + 20,
        headers: { cookie: desk.cookie },
        next: () => ({ path: `/api/desk/day?date=${date}` }),
      });
      // A parallel probe records when answers change, for the recovery time.
      const probe = (async () => {
        while (Date.now() - started < (OUTAGE_SECONDS + 20) * 1000) {
          const res = await fetch(`${app!.url}/api/desk/day?date=${date}`, { headers: { cookie: desk.cookie } }).catch(() => null);
          timeline.push({ at: Date.now(), status: res?.status ?? 0 });
          await res?.arrayBuffer();
          await sleep(100);
        }
      })();
      await sleep(5000);
      const down = Date.now();
      stopCluster(cluster);
      await sleep(OUTAGE_SECONDS * 1000);
      startCluster(cluster);
      const up = Date.now();
      const [figures] = await Promise.all([load, probe]);
      printFigures(figures);
      const other5xx = Object.entries(figures.statuses)
        .filter(([s]) => Number(s) >= 500 && s !== '503')
        .reduce((n, [, c]) => n + c, 0);
      const firstOk = timeline.find((p) => p.at > up && p.status === 200);
      const during = timeline.filter((p) => p.at > down + 1000 && p.at < up);
      const duringStatuses = during.reduce<Record<number, number>>((m, p) => ({ ...m, [p.status]: (m[p.status] ?? 0) + 1 }), {});
      console.log(
        `   probes from 1 s after the stop until the restart, by status: ${JSON.stringify(duringStatuses)} (0 = no answer); other 5xx under load: ${other5xx}`,
      );
      console.log(`   recovered ${firstOk ? `${((firstOk.at - up) / 1000).toFixed(1)} s after PostgreSQL was back` : 'NOT within the run'}`);
      if (other5xx) failures.push(`${other5xx} answers other than 503 among the 5xx during the outage`);
      if (!during.length || during.some((p) => p.status !== 503))
        failures.push(`requests during the outage answered ${JSON.stringify(duringStatuses)}, not only 503`);
      if (!firstOk) failures.push('the app did not recover by itself');
    }

    // 2. A burst of bookings, and the app server killed in the middle of it.
    if (runs(2)) {
      console.log('\n2. App server killed (SIGKILL) mid-booking');
      desk = await signIn(app.url, 'desk@demo.test', DEMO_PASSWORD);
      const running = app;
      // Killed as soon as the first booking is answered, so the rest are mid-flight (some mid-transaction).
      const results = await bookingBurst(app, desk, clients, () => void running.stop('SIGKILL'));
      app = await startAppProcess(env);
      const db = createDb(createPool(prepared.url));
      const broken = await halfWritten(db);
      const overlaps = await doubleBookings(db);
      const keys = await db
        .selectFrom('idempotency_keys')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .executeTakeFirst();
      await db.destroy();
      console.log(
        `   ${results.sent} booking requests sent: ${results.created} answered 201, ${results.cut} cut off by the kill, ${results.refused} refused (4xx)`,
      );
      console.log(
        `   half-written bookings ${broken}; double bookings ${overlaps.chairs + overlaps.hands + overlaps.basins}; bookings committed (idempotency records, whole) ${keys?.n}`,
      );
      if (broken) failures.push(`${broken} half-written bookings after the kill`);
      if (overlaps.chairs + overlaps.hands + overlaps.basins) failures.push('double bookings after the kill');
      const health = await fetch(`${app.url}/api/health`);
      console.log(`   restarted server answers /api/health ${health.status}`);
    }

    // 3. The outside services failing and slow, two app servers.
    await app.stop();
    app = null;
    if (runs(3)) {
      console.log('\n3. E-mail, SMS and payments refusing, then slow; two app servers sharing one fake of each');
      const outside = await outsideServicesFault(prepared.url, env);
      pair = outside.apps;
      closeFakes = outside.closeFakes;
      failures.push(...outside.failures);
    }

    // 4. The payment provider's webhook late, twice and out of order, against one app server and its own fake.
    if (runs(4)) {
      console.log("\n4. The payment provider's webhook late, twice and out of order");
      const webhooks = await paymentWebhookFaults(prepared.url, env);
      pair = [...pair, webhooks.app];
      const fakesBefore = closeFakes;
      closeFakes = async () => void (await Promise.all([fakesBefore(), webhooks.closeFake()]));
      failures.push(...webhooks.failures);
    }

    console.log(`\ndwell faults: ${failures.length ? `FAIL — ${failures.join('; ')}` : 'PASS'}`);
    return failures.length ? 1 : 0;
  } catch (err) {
    console.error(`dwell faults: failed — ${(err as Error).stack ?? err}`);
    return 1;
  } finally {
    await cleanUp();
  }
}

/** Desk bookings for different clients on the demo stylists' free times, sent all at once. */
async function bookingBurst(app: AppProcess, desk: HttpSession, clients: string[], onFirstAnswer: () => void) {
  const services = (await (await fetch(`${app.url}/api/services`, { headers: { cookie: desk.cookie } })).json()) as {
    services: { id: string; stepPlan: unknown; onlineBookable?: boolean }[];
  };
  const service = services.services[0]!;
  const date = new Date(Date.now() + 60 * 86_400_000).toISOString().slice(0, 10);
  const options = await fetch(`${app.url}/api/booking-options`, {
    method: 'POST',
    headers: { cookie: desk.cookie, 'x-csrf-token': desk.csrf, 'content-type': 'application/json' },
    body: JSON.stringify({ clientId: clients[0], serviceId: service.id, stepPlan: service.stepPlan, stylistId: null, earliestDate: date, limit: 20 }),
  });
  const found = (await options.json()) as { options?: { stylistId: string; sittings: { start: string }[] }[] };
  const picks = found.options ?? [];
  let created = 0;
  let cut = 0;
  let refused = 0;
  const sent = Math.max(picks.length, 1) * 6;
  let answered = false;
  const all = Array.from({ length: sent }, async (_, i) => {
    const pick = picks[i % Math.max(picks.length, 1)];
    if (!pick) return;
    const res = await fetch(`${app.url}/api/bookings`, {
      method: 'POST',
      headers: { cookie: desk.cookie, 'x-csrf-token': desk.csrf, 'content-type': 'application/json' },
      body: JSON.stringify({
        clientId: clients[(i + 1) % clients.length],
        serviceId: service.id,
        stepPlan: service.stepPlan,
        stylistId: pick.stylistId,
        start: pick.sittings[0]!.start,
        idempotencyKey: randomUUID(),
      }),
    }).catch(() => null);
    if (res && !answered) {
      answered = true;
      onFirstAnswer();
    }
    if (!res) cut++;
    else if (res.status === 201) created++;
    else refused++;
  });
  return Promise.all(all).then(() => ({ sent, created, cut, refused }));
}

process.exit(await main());
