/**
 * Random days for the re-planning properties: a busy small book (often on a daylight-saving change, IANA tz:
 * America/Denver 2027-03-14 and 2027-11-07, Europe/London 2027-03-28 and 2027-10-31), one stylist, a moment "now"
 * in their day, and actual step times that run early or late by up to 20 / 40 minutes, at any minute.
 */
import { DateTime } from 'luxon';
import { parseScenario, type ReplanAskInput, type Scenario } from '@shared/engine/engine';
import { localToUtc } from './reference/reference-time';
import { between, generateScenario, pick, seededRng } from './scenario-generator';

const PLACES: Array<[zone: string, from: string]> = [
  ['America/Denver', '2027-03-13'],
  ['America/Denver', '2027-11-06'],
  ['Europe/London', '2027-03-27'],
  ['Europe/London', '2027-10-30'],
  ['UTC', '2027-01-04'],
];

export interface ReplanCase {
  scenario: Scenario;
  ask: ReplanAskInput;
  /** UTC minutes of each given actual, by booking and step: what the answer must keep. */
  actuals: Map<string, Array<{ start?: number; end?: number }>>;
  now: number;
}

const wall = (utc: number, zone: string) => DateTime.fromMillis(utc * 60_000, { zone }).toFormat("yyyy-MM-dd'T'HH:mm");

export function replanCase(seed: number): ReplanCase | null {
  const rng = seededRng(seed);
  const [zone, from] = pick(rng, PLACES);
  const g = pick(rng, [5, 5, 10, 15]);
  const night = rng() < 0.2;
  const stylists = between(rng, 1, 3);
  const input = generateScenario(rng, {
    zone,
    from,
    days: 2,
    granularity: g,
    stylists,
    colourStylists: between(rng, 1, stylists),
    chairs: between(rng, 1, 4),
    basins: between(rng, 1, 2),
    bookings: between(rng, 6, 24),
    salonHours: night ? [pick(rng, [0, 60]), 1440] : [480, 1200],
    stylistStarts: night ? [0, 60, 90] : [480, 540],
    stylistEnds: night ? [1200, 1440] : [1020, 1200],
    timeOffChance: 0.2,
    maxClients: [1, 2, 2, 3],
  });
  const scenario = parseScenario(input);
  if (!scenario.bookings.length) return null;
  const running = pick(rng, scenario.bookings);
  const stylist = running.stylist;
  const utc = (text: string) => localToUtc(text, zone);
  const firstStart = utc(running.steps[0]!.start);
  // Now: somewhere in the sitting or up to an hour after it, on the same local date.
  const date = running.steps[0]!.start.slice(0, 10);
  let now = firstStart + between(rng, 0, utc(running.steps.at(-1)!.end) - firstStart + 60);
  while (wall(now, zone).slice(0, 10) !== date) now--;
  if (utc(wall(now, zone)) !== now) return null;

  const actuals = new Map<string, Array<{ start?: number; end?: number }>>();
  const sittings: NonNullable<ReplanAskInput['sittings']> = [];
  const mine = scenario.bookings.filter((b) => b.stylist === stylist && b.steps[0]!.start.startsWith(date));
  for (const b of mine) {
    const flex = b.steps.map((step, k) => {
      if (step.kind !== 'developing' || rng() < 0.3) return { step: k };
      const length = utc(step.end) - utc(step.start);
      return {
        step: k,
        minMinutes: Math.max(g, length - g * between(rng, 0, 3)),
        maxMinutes: length + g * between(rng, 0, 4),
        id: `${b.id}.${k}`,
        label: 'Developing',
      };
    });
    const times: Array<{ start?: number; end?: number }> = [];
    if (b === running || (utc(b.steps[0]!.start) <= now && rng() < 0.6)) {
      let t = utc(b.steps[0]!.start) + between(rng, -10, 20);
      for (const step of b.steps) {
        if (t > now) break;
        const end = t + Math.max(1, utc(step.end) - utc(step.start) + between(rng, -20, 40));
        times.push(end <= now ? { start: t, end } : { start: t });
        if (end > now) break;
        t = end + between(rng, 0, 5);
      }
    }
    // The scenario's local text names the first of two repeated wall times: skip a case whose actual is the second.
    if (times.some((x) => [x.start, x.end].some((m) => m !== undefined && utc(wall(m, zone)) !== m))) return null;
    if (times.length) actuals.set(b.id, times);
    sittings.push({
      booking: b.id,
      skill: 'colour',
      steps: flex.map((x, k) => ({
        ...x,
        ...(times[k]?.start !== undefined ? { actualStart: wall(times[k].start!, zone) } : {}),
        ...(times[k]?.end !== undefined ? { actualEnd: wall(times[k].end!, zone) } : {}),
      })),
    });
  }
  const ask: ReplanAskInput = { stylist, now: wall(now, zone), sittings, lateStartLimitMinutes: pick(rng, [0, 10, 15, 15, 30]) };
  return { scenario, ask, actuals, now };
}
