/**
 * Property tests: on random small scenarios the engine agrees with the brute-force reference
 * (options for both spreads, windows, occupancy), every option passes the separate validator,
 * adding a booking never adds an option, and a booked option is not offered again.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { findWindows, measureOccupancy, parseScenario, planOptions, type Scenario } from '@shared/engine/engine';
import { validateOption } from './plan-validator';
import { buildCalendar } from './reference/reference-calendar';
import { referencePairs } from './reference/reference-options';
import { isoToUtc, localToUtc } from './reference/reference-time';
import { referenceOccupancy, referenceWindows } from './reference/reference-windows';
import { exists, localText, seededRng } from './scenario-generator';
import { smallScenario } from './small-scenarios';

const seeds = fc.integer({ min: 1, max: 2 ** 31 - 1 });
const enginePairs = (s: Scenario) => planOptions(s).options.map((o) => ({ stylist: o.stylist, start: isoToUtc(o.sittings[0]!.steps[0]!.start) }));

function expectedPairs(all: ReturnType<typeof referencePairs>, spread: 'day' | 'none', limit: number) {
  const seen = new Set<string>();
  return all
    .filter((p) => spread === 'none' || (!seen.has(`${p.stylist}:${p.day}`) && seen.add(`${p.stylist}:${p.day}`)))
    .slice(0, limit)
    .map(({ stylist, start }) => ({ stylist, start }));
}

describe('booking engine against the brute-force reference', () => {
  it('options are exactly the K earliest pairs (both spreads) and obey every rule', () => {
    let withOptions = 0;
    fc.assert(
      fc.property(seeds, (seed) => {
        const s = smallScenario(seed);
        const all = referencePairs(s);
        for (const spread of ['day', 'none'] as const) {
          const scenario = { ...s, request: { ...s.request!, spread } };
          const answer = planOptions(scenario);
          if (answer.options.length) withOptions++;
          for (const option of answer.options) expect(validateOption(scenario, option)).toEqual([]);
          expect(enginePairs(scenario)).toEqual(expectedPairs(all, spread, s.request!.limit));
        }
        const cal = buildCalendar(s);
        const windows = findWindows(s).windows.map((w) => ({ ...w, start: isoToUtc(w.start), end: isoToUtc(w.end) }));
        expect(windows).toEqual(referenceWindows(s, cal));
        expect(measureOccupancy(s)).toEqual(referenceOccupancy(s, cal));
      }),
      { numRuns: Number(process.env.ENGINE_RUNS ?? 500) },
    );
    // Guard against a generator that only makes empty answers.
    expect(withOptions).toBeGreaterThan(300);
  }, 120_000);
});

/** Random allowed starts for some sittings (0–2 stretches of up to two days, any minute), from their own seed. */
function withAllowedStarts(s: Scenario, seed: number): Scenario {
  const rng = seededRng(seed);
  const from = Date.parse(`${s.horizon.from}T00:00:00Z`) / 60_000;
  const days = (Date.parse(`${s.horizon.to}T00:00:00Z`) / 60_000 - from) / 1440;
  const existing = (m: number) => {
    while (!exists(m, s.timeZone)) m += 1;
    return m;
  };
  const sittings = s.request!.sittings.map((sitting) => {
    if (rng() < 0.3) return sitting;
    const allowedStarts = Array.from({ length: Math.floor(rng() * 3) }, () => {
      const start = existing(from + Math.floor(rng() * days * 1440));
      return { from: localText(start), to: localText(existing(start + Math.floor(rng() * 2 * 1440))) };
    });
    return { ...sitting, allowedStarts };
  });
  return parseScenario({ ...s, request: { ...s.request!, sittings } });
}

/** A random valid booking for one of the scenario's stylists, on the grid, inside the horizon. */
function extraBooking(s: Scenario, seed: number): Scenario['bookings'][number] | null {
  const rng = seededRng(seed);
  const g = s.granularityMinutes;
  const from = Date.parse(`${s.horizon.from}T00:00:00Z`) / 60_000;
  const start = from + Math.floor((rng() * 2 * 1440) / g) * g;
  const kinds = ['hands_on', 'developing', 'basin'] as const;
  const steps = [];
  let t = start;
  for (let i = 0; i < 1 + Math.floor(rng() * 3); i++) {
    const kind = kinds[Math.floor(rng() * (s.basins.length ? 3 : 2))];
    const end = t + g * (1 + Math.floor(rng() * 6));
    if (!exists(t, s.timeZone) || !exists(end, s.timeZone)) return null;
    steps.push({ kind, start: localText(t), end: localText(end), ...(kind === 'basin' ? { basin: s.basins[0]!.id } : {}) });
    t = end;
  }
  return {
    id: 'extra',
    stylist: s.stylists[Math.floor(rng() * s.stylists.length)]!.id,
    chair: s.chairs[Math.floor(rng() * s.chairs.length)]!.id,
    steps: steps as Scenario['bookings'][number]['steps'],
  };
}

const allPairs = (s: Scenario) => enginePairs({ ...s, request: { ...s.request!, spread: 'none', limit: 1000 } });

describe('allowed starts against the brute-force reference', () => {
  it('options are exactly the K earliest pairs that start inside them (both spreads)', () => {
    let limited = 0;
    fc.assert(
      fc.property(seeds, seeds, (seed, allowSeed) => {
        const s = withAllowedStarts(smallScenario(seed), allowSeed);
        const all = referencePairs(s);
        for (const spread of ['day', 'none'] as const) {
          const scenario = { ...s, request: { ...s.request!, spread } };
          for (const option of planOptions(scenario).options) expect(validateOption(scenario, option)).toEqual([]);
          expect(enginePairs(scenario)).toEqual(expectedPairs(all, spread, s.request!.limit));
        }
        if (all.length && s.request!.sittings.some((x) => x.allowedStarts)) limited++;
      }),
      { numRuns: Number(process.env.ENGINE_RUNS ?? 300) },
    );
    // Guard against a generator whose limits always leave nothing. About one run in eight is limited and has
    // pairs; the bar sits well below that, so a fair random draw never trips it.
    expect(limited).toBeGreaterThan(10);
  }, 120_000);
});

describe('booking engine properties', () => {
  it('adding a booking never adds an option (monotonicity)', () => {
    let checked = 0;
    fc.assert(
      fc.property(seeds, seeds, (seed, extraSeed) => {
        const s = smallScenario(seed);
        const extra = extraBooking(s, extraSeed);
        if (!extra) return;
        const before = new Set(allPairs(s).map((p) => `${p.stylist}@${p.start}`));
        const after = allPairs(parseScenario({ ...s, bookings: [...s.bookings, extra] }));
        for (const p of after) expect(before.has(`${p.stylist}@${p.start}`)).toBe(true);
        checked++;
      }),
      { numRuns: 150 },
    );
    expect(checked).toBeGreaterThan(100);
  }, 60_000);

  it('booking the first option and asking again never returns it (round trip)', () => {
    let checked = 0;
    fc.assert(
      fc.property(seeds, (seed) => {
        const s = smallScenario(seed);
        // A first step that needs the stylist's hands guarantees the same start is taken.
        if (s.request!.sittings[0]!.steps[0]!.kind === 'developing') return;
        const [first] = planOptions(s).options;
        if (!first) return;
        const booked = first.sittings.map((sitting, k) => ({
          id: `new-${k}`,
          stylist: first.stylist,
          chair: sitting.chair,
          steps: sitting.steps.map((step) => ({ ...step, start: wall(step.start), end: wall(step.end) })),
        })) as Scenario['bookings'];
        // The scenario's local-time format cannot name the second of two ambiguous wall times.
        const printed = first.sittings.flatMap((x) => x.steps.flatMap((step) => [step.start, step.end]));
        if (printed.some((iso) => localToUtc(wall(iso), s.timeZone) !== isoToUtc(iso))) return;
        const again = planOptions(parseScenario({ ...s, bookings: [...s.bookings, ...booked] })).options;
        const firstStart = isoToUtc(first.sittings[0]!.steps[0]!.start);
        expect(again.some((o) => o.stylist === first.stylist && isoToUtc(o.sittings[0]!.steps[0]!.start) === firstStart)).toBe(false);
        checked++;
      }),
      { numRuns: 200 },
    );
    expect(checked).toBeGreaterThan(50);
  }, 60_000);
});

const wall = (iso: string): string => DateTime.fromISO(iso, { setZone: true }).toFormat("yyyy-MM-dd'T'HH:mm");
