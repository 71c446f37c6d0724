/**
 * Seeded scenario generator for property tests and the bench. Bookings are placed so the book
 * itself obeys the contract (no double-booked chair, basin or hands; client cap kept), checked on
 * a per-minute local grid; times that fall in a spring-forward gap are skipped.
 */
import { DateTime } from 'luxon';
import type { ScenarioInput } from '@shared/engine/scenario.schemas';

export type Rng = () => number;

/** mulberry32: small, fast, good enough for test data. */
export function seededRng(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const pick = <T>(rng: Rng, items: readonly T[]): T => items[Math.floor(rng() * items.length)]!;
export const between = (rng: Rng, lo: number, hi: number): number => lo + Math.floor(rng() * (hi - lo + 1));

export interface GeneratorOptions {
  zone: string;
  from: string;
  days: number;
  granularity: number;
  stylists: number;
  colourStylists: number;
  chairs: number;
  basins: number;
  bookings: number;
  /** Hours as [start, end] choices in minutes after midnight. */
  salonHours: [number, number];
  stylistStarts: number[];
  stylistEnds: number[];
  timeOffChance: number;
  maxClients: number[];
}

const DAY_CODES = ['MO', 'TU', 'WE', 'TH', 'FR', 'SA', 'SU'];
const pad = (n: number): string => String(n).padStart(2, '0');
export const clockText = (m: number): string => `${pad(Math.floor(m / 60))}:${pad(m % 60)}`;
const dayNum = (date: string): number => Date.parse(`${date}T00:00:00Z`) / 86_400_000;
/** Floating local minute → "YYYY-MM-DDTHH:mm". */
export const localText = (m: number): string => new Date(m * 60_000).toISOString().slice(0, 16);

/** Whether a floating local minute is a real wall-clock time in the zone (not in a gap). */
export function exists(local: number, zone: string): boolean {
  const text = localText(local);
  const dt = DateTime.fromISO(text, { zone });
  return dt.toFormat("yyyy-MM-dd'T'HH:mm") === text;
}

function weekdays(rng: Rng, count: number): string {
  const chosen = DAY_CODES.filter(() => rng() < count / 7);
  return (chosen.length ? chosen : ['WE']).join(',');
}

export function generateScenario(rng: Rng, o: GeneratorOptions): ScenarioInput {
  const g = o.granularity;
  const from = dayNum(o.from);
  const snap = (m: number): number => Math.floor(m / g) * g;
  const stylists = Array.from({ length: o.stylists }, (_, i) => {
    const start = snap(pick(rng, o.stylistStarts));
    const end = Math.max(start + g, snap(pick(rng, o.stylistEnds)));
    const offStart = (from + between(rng, 0, o.days - 1)) * 1440 + between(rng, 0, 20) * 60 + between(rng, 0, 59);
    const offEnd = offStart + between(rng, 1, 30) * 60;
    const withOff = rng() < o.timeOffChance && exists(offStart, o.zone) && exists(offEnd, o.zone);
    return {
      id: `s${String(i).padStart(2, '0')}`,
      skills: i < o.colourStylists ? ['colour', 'cut'] : ['cut'],
      maxClientsAtOnce: pick(rng, o.maxClients),
      hours: [{ rrule: `FREQ=WEEKLY;BYDAY=${weekdays(rng, 5)}`, start: clockText(start), end: clockText(end) }],
      timeOff: withOff ? [{ start: localText(offStart), end: localText(offEnd) }] : [],
    };
  });
  const chairs = Array.from({ length: o.chairs }, (_, i) => ({ id: `c${String(i).padStart(2, '0')}` }));
  const basins = Array.from({ length: o.basins }, (_, i) => ({ id: `b${i}` }));
  return {
    timeZone: o.zone,
    granularityMinutes: g,
    horizon: { from: o.from, to: localText((from + o.days) * 1440).slice(0, 10) },
    salonHours: [{ rrule: 'FREQ=DAILY', start: clockText(snap(o.salonHours[0])), end: clockText(Math.max(snap(o.salonHours[0]) + g, snap(o.salonHours[1]))) }],
    stylists,
    chairs,
    basins,
    bookings: placeBookings(rng, o, stylists, chairs.length, basins.length),
    fits: [],
  };
}

type Kind = 'hands_on' | 'developing' | 'basin';
type GeneratedBooking = NonNullable<ScenarioInput['bookings']>[number];

/** Random bookings that keep the book valid, in floating local minutes. */
function placeBookings(rng: Rng, o: GeneratorOptions, stylists: Array<{ id: string; maxClientsAtOnce: number }>, chairs: number, basins: number) {
  const g = o.granularity;
  const from = dayNum(o.from) * 1440;
  const size = o.days * 1440;
  const hands = stylists.map(() => new Uint8Array(size));
  const clients = stylists.map(() => new Uint8Array(size));
  const chairUse = Array.from({ length: chairs }, () => new Uint8Array(size));
  const basinUse = Array.from({ length: basins }, () => new Uint8Array(size));
  const free = (arr: Uint8Array, a: number, b: number, cap = 1) => {
    for (let i = a; i < b; i++) if (arr[i]! >= cap) return false;
    return true;
  };
  const out: GeneratedBooking[] = [];
  for (let n = 0, tries = 0; n < o.bookings && tries < o.bookings * 20; tries++) {
    const si = Math.floor(rng() * stylists.length);
    const open = Math.floor(o.salonHours[0] / g) * g;
    const start = between(rng, 0, o.days - 1) * 1440 + open + Math.floor((rng() * (o.salonHours[1] - open)) / g) * g;
    const kinds: Kind[] =
      rng() < 0.6 ? ['hands_on', 'developing', 'basin'] : pick(rng, [['hands_on'], ['hands_on', 'developing', 'hands_on'], ['basin', 'hands_on']] as Kind[][]);
    const steps: Array<{ kind: Kind; a: number; b: number; basin?: number }> = [];
    let t = start;
    for (const kind of kinds) {
      const len = g * between(rng, 1, Math.max(1, Math.floor(45 / g)));
      steps.push({ kind, a: t, b: t + len });
      t += len;
    }
    const ci = Math.floor(rng() * chairs);
    if (t > size || t > Math.floor(start / 1440) * 1440 + o.salonHours[1]) continue;
    if (!free(chairUse[ci]!, start, t) || !free(clients[si]!, start, t, stylists[si]!.maxClientsAtOnce)) continue;
    if (!steps.every((s) => s.kind === 'developing' || free(hands[si]!, s.a, s.b))) continue;
    let ok = true;
    for (const s of steps)
      if (s.kind === 'basin') {
        const bi = basinUse.findIndex((u) => free(u, s.a, s.b));
        if (bi < 0) ok = false;
        else s.basin = bi;
      }
    if (!ok || !steps.every((s) => exists(from + s.a, o.zone) && exists(from + s.b, o.zone))) continue;
    for (let i = start; i < t; i++) {
      chairUse[ci]![i] = 1;
      clients[si]![i]!++;
    }
    for (const s of steps) {
      if (s.kind !== 'developing') hands[si]!.fill(1, s.a, s.b);
      if (s.basin !== undefined) basinUse[s.basin]!.fill(1, s.a, s.b);
    }
    out.push({
      id: `k${n++}`,
      stylist: stylists[si]!.id,
      chair: `c${String(ci).padStart(2, '0')}`,
      steps: steps.map(
        (s) =>
          ({
            kind: s.kind,
            start: localText(from + s.a),
            end: localText(from + s.b),
            ...(s.basin !== undefined ? { basin: `b${s.basin}` } : {}),
          }) as GeneratedBooking['steps'][number],
      ),
    });
  }
  return out;
}
