/**
 * The minutes behind the occupancy answer: summed and divided once they give `measureOccupancy`'s
 * figures exactly; weekly parts and weekday × hour cells add up to the whole.
 */
import { describe, expect, it } from 'vitest';
import { breakDownOccupancy, measureOccupancy, parseScenario, type OccupancyMinutes } from '@shared/engine/engine';
import { generateScenario, seededRng } from './scenario-generator';

const ratio = (n: number, d: number) => (d === 0 ? null : n / d);
const ratios = (m: OccupancyMinutes) => ({
  chairOccupancy: ratio(m.chairHeld, m.chairOpen),
  handsOnShare: Object.fromEntries(Object.entries(m.stylists).map(([id, s]) => [id, ratio(s.handsOn, s.onClock)])),
  windowUse: ratio(m.windowUsed, m.windowUsed + m.windowFree),
});

describe('occupancy breakdown', () => {
  it('adds up to the occupancy answer on generated salons (weeks across the Denver spring-forward)', () => {
    for (const seed of [1, 2, 3]) {
      const s = parseScenario(
        generateScenario(seededRng(seed), {
          zone: 'America/Denver',
          from: '2027-03-01',
          days: 28,
          granularity: 5,
          stylists: 5,
          colourStylists: 3,
          chairs: 4,
          basins: 2,
          bookings: 300,
          salonHours: [540, 1260],
          stylistStarts: [540, 600],
          stylistEnds: [1080, 1200],
          timeOffChance: 0.5,
          maxClients: [1, 2, 3],
        }),
      );
      const cuts = ['2027-03-01', '2027-03-08', '2027-03-15', '2027-03-22', '2027-03-29'];
      const b = breakDownOccupancy(s, cuts);
      expect(ratios(b.total)).toEqual(measureOccupancy(s));
      expect(b.answer).toEqual(measureOccupancy(s));
      const sum = (f: (m: OccupancyMinutes) => number) => b.parts.reduce((t, p) => t + f(p), 0);
      expect(sum((p) => p.chairHeld)).toBe(b.total.chairHeld);
      expect(sum((p) => p.chairOpen)).toBe(b.total.chairOpen);
      expect(sum((p) => p.windowUsed)).toBe(b.total.windowUsed);
      expect(sum((p) => p.windowFree)).toBe(b.total.windowFree);
      for (const id of Object.keys(b.total.stylists)) expect(sum((p) => p.stylists[id]!.handsOn)).toBe(b.total.stylists[id]!.handsOn);
      expect(b.cells.reduce((t, c) => t + c.chairHeld, 0)).toBe(b.total.chairHeld);
      expect(b.cells.reduce((t, c) => t + c.chairOpen, 0)).toBe(b.total.chairOpen);
    }
  });

  it('puts minutes into local weekday × hour cells', () => {
    // 2027-03-02 is a Tuesday (ISO weekday 2). Salon 09:00-11:00, one chair held 09:30-10:15.
    const s = parseScenario({
      timeZone: 'America/Denver',
      granularityMinutes: 15,
      horizon: { from: '2027-03-02', to: '2027-03-03' },
      salonHours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '11:00' }],
      stylists: [{ id: 'ana', hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '11:00' }] }],
      chairs: [{ id: 'c1' }, { id: 'c2' }],
      bookings: [{ id: 'b', stylist: 'ana', chair: 'c1', steps: [{ kind: 'hands_on', start: '2027-03-02T09:30', end: '2027-03-02T10:15' }] }],
    });
    const { cells } = breakDownOccupancy(s, []);
    // 09:00 hour: 30 of 2 × 60 chair-minutes; 10:00 hour: 15 of 120.
    expect(cells).toEqual([
      { weekday: 2, hour: 9, chairHeld: 30, chairOpen: 120 },
      { weekday: 2, hour: 10, chairHeld: 15, chairOpen: 120 },
    ]);
  });

  it('refuses cut dates outside the horizon, naming them', () => {
    const s = parseScenario({
      timeZone: 'UTC',
      granularityMinutes: 15,
      horizon: { from: '2027-03-02', to: '2027-03-03' },
      salonHours: [],
      stylists: [],
      chairs: [],
    });
    expect(() => breakDownOccupancy(s, ['2027-03-05'])).toThrow(/cuts\[0\]/);
  });
});
