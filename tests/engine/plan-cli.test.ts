/** The `npm run plan` entry, run as a real process on the example scenarios in docs/examples. */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(__dirname, '..', '..');
const run = (...args: string[]) => spawnSync('npx', ['tsx', 'server/ops/plan-cli.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });

describe('plan CLI', () => {
  it('prints the options of the two-sitting Denver correction as one JSON object', () => {
    const result = run('options', 'docs/examples/two-sitting-correction-denver.json');
    expect(result.status).toBe(0);
    const answer = JSON.parse(result.stdout);
    expect(answer.options[0].stylist).toBe('ana');
    expect(answer.options[0].sittings).toHaveLength(2);
    // Starts right after the booked client's hands_on step, inside her developing time.
    expect(answer.options[0].sittings[0].steps[0].start).toBe('2027-03-03T10:45-07:00');
  }, 60_000);

  it('prints windows and occupancy', () => {
    const windows = JSON.parse(run('windows', 'docs/examples/hands-free-windows-london.json').stdout);
    expect(windows.windows.map((w: { start: string; fits: string[] }) => [w.start, w.fits])).toEqual([
      ['2027-10-31T10:00+00:00', ['fringe-trim']],
      ['2027-10-31T10:30+00:00', ['toner-refresh', 'fringe-trim']],
    ]);
    const occupancy = JSON.parse(run('occupancy', 'docs/examples/hands-free-windows-london.json').stdout);
    expect(occupancy.handsOnShare.dev).toBe(0);
  }, 60_000);

  it('exits 2 with the field on stderr and nothing on stdout for a bad scenario', () => {
    const good = JSON.parse(readFileSync(join(root, 'docs/examples/two-sitting-correction-denver.json'), 'utf8'));
    const file = join(mkdtempSync(join(tmpdir(), 'dwell-')), 'bad.json');
    writeFileSync(file, JSON.stringify({ ...good, bookings: [{ ...good.bookings[0], stylist: 'nobody' }] }));
    const result = run('options', file);
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr).toContain('bookings[0].stylist');
  }, 60_000);
});
