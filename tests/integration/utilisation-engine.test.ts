/**
 * The dashboard equals the engine: on the busy salon (the engine bench's generator, loaded into
 * PostgreSQL), the utilisation API's chair occupancy, hands-on share and window use are exactly what
 * `npm run plan -- occupancy` prints for the scenario the export route gives for the same period.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { loadBusySalon, type BusySalon } from '../bench/busy-salon-db';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
let busy: BusySalon;
let dir: string;

beforeAll(async () => {
  t = await startTestApp();
  busy = await loadBusySalon(t.testDb.db, { from: '2027-03-01', months: 1, now: new Date('2027-03-15T12:00:00Z') });
  dir = await mkdtemp(join(tmpdir(), 'dwell-scenario-'));
}, 120_000);
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
  await t.close();
});

it.each([
  ['a month across the spring-forward change', 'period=month&date=2027-03-14'],
  ['a custom stretch of 10 days', 'period=custom&from=2027-03-05&to=2027-03-14'],
])(
  '%s: API figures = `npm run plan -- occupancy` on the exported scenario',
  async (_name, query) => {
    const owner = await signedInAgent(t.app, busy.ownerEmail, busy.password);
    const api = await owner.get(`/api/owner/utilisation?${query}`);
    expect(api.status).toBe(200);
    const exported = await owner.get(`/api/owner/utilisation/scenario?${query}`);
    expect(exported.status).toBe(200);
    expect(exported.headers['content-disposition']).toMatch(/attachment; filename="dwell-scenario-/);
    expect(exported.body.bookings.length).toBeGreaterThan(100);
    const file = join(dir, 'exported.json');
    await writeFile(file, exported.text);
    // The same command a person runs: `npm run plan -- occupancy exported.json` is `tsx server/ops/plan-cli.ts`.
    const { stdout } = await promisify(execFile)(join(process.cwd(), 'node_modules', '.bin', 'tsx'), ['server/ops/plan-cli.ts', 'occupancy', file], {
      cwd: process.cwd(),
    });
    const cli = JSON.parse(stdout);
    expect(cli.chairOccupancy).toBeGreaterThan(0);
    expect(api.body.chairOccupancy).toBe(cli.chairOccupancy);
    expect(api.body.windowUse).toBe(cli.windowUse);
    expect(api.body.handsOnShare).toEqual(cli.handsOnShare);
    expect(Object.keys(cli.handsOnShare)).toHaveLength(12);
  },
  60_000,
);
