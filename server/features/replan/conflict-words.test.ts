import { describe, expect, it } from 'vitest';
import type { StylistReplan } from '../planning';
import type { ConflictSittingRow } from './conflict-sittings.repository';
import { describeReplans, type ReplanNames } from './conflict-words';

// America/Denver on 2027-06-09 is MDT, UTC−6 (IANA tz database).
const ZONE = 'America/Denver';
const row = (id: string, clientName: string, hhmm: string, more: Partial<ConflictSittingRow> = {}): ConflictSittingRow => ({
  sittingId: id,
  seq: 1,
  bookingId: `booking-${id}`,
  bookingStatus: 'booked',
  clientId: `client-${id}`,
  clientName,
  stylistId: 'ana',
  stylistName: 'Ana',
  chairId: 'c2',
  start: new Date(`2027-06-09T${hhmm}:00-06:00`),
  ...more,
});
const names: ReplanNames = {
  timeZone: ZONE,
  granularityMinutes: 5,
  sittings: new Map([
    ['r', row('r', 'Maya Ortiz', '12:00', { bookingStatus: 'checked_in' })],
    ['l', row('l', 'Jo Park', '15:00')],
  ]),
  chairs: new Map([
    ['c1', 'Chair 1'],
    ['c2', 'Chair 2'],
  ]),
  basins: new Map([['b2', 'Basin 2']]),
  stylists: new Map([
    ['ana', 'Ana'],
    ['bo', 'Bo'],
  ]),
  told: new Map([['l', [{ minutesLate: 15, at: new Date('2027-06-09T14:41:00-06:00') }]]]),
};
const replan = (conflicts: StylistReplan['conflicts']): StylistReplan => ({
  stylistId: 'ana',
  sittings: [
    {
      sittingId: 'r',
      chairId: 'c1',
      inProgress: true,
      moved: true,
      steps: [
        {
          stepId: 'dev',
          label: 'Lightener lifts',
          kind: 'developing',
          start: '2027-06-09T13:00-06:00',
          end: '2027-06-09T14:50-06:00',
          state: 'running',
          basinId: null,
        },
      ],
    },
  ],
  conflicts,
  freed: [{ start: '2027-06-09T16:00-06:00', end: '2027-06-09T16:40-06:00', minutes: 40 }],
});

describe('the re-plan in the desk’s words', () => {
  it('names the clients and times of a conflict, each fix in plain words, and the delay the later client would be told', () => {
    const summary = describeReplans(
      [
        replan([
          {
            kind: 'hands',
            sittingId: 'l',
            causeId: 'r',
            minutes: 20,
            start: '2027-06-09T15:00-06:00',
            end: '2027-06-09T15:20-06:00',
            fixes: [
              { fix: { kind: 'developing', sittingId: 'r', stepId: 'dev', minutes: 90 } },
              { fix: { kind: 'chair', sittingId: 'l', chairId: 'c1' } },
              { fix: { kind: 'basin', sittingId: 'l', stepId: 'rinse', basinId: 'b2' } },
              { fix: { kind: 'hand_over', sittingId: 'l', stylistId: 'bo' } },
              { fix: { kind: 'late_start', sittingId: 'l', minutesLate: 20, start: '2027-06-09T15:20-06:00' } },
              { fix: { kind: 'another_day', sittingId: 'l' } },
            ],
          },
        ]),
      ],
      names,
    );
    const [conflict] = summary.conflicts;
    expect(conflict).toMatchObject({
      kind: 'hands',
      stylistId: 'ana',
      sitting: { bookingId: 'booking-l', clientName: 'Jo Park', start: '2027-06-09T15:00:00-06:00' },
      cause: { bookingId: 'booking-r', clientName: 'Maya Ortiz' },
      words: 'Maya Ortiz’s sitting now runs 20 min into Jo Park’s 3:00 PM: both need Ana’s hands.',
      tellMinutes: 20,
      told: [{ minutesLate: 15, at: '2027-06-09T14:41:00-06:00' }],
    });
    expect(conflict!.fixes.map((f) => [f.bookingId, f.words])).toEqual([
      ['booking-r', 'Shorten “Lightener lifts” for Maya Ortiz to 90 min'],
      ['booking-l', 'Seat Jo Park in Chair 1'],
      ['booking-l', 'Use Basin 2 for Jo Park’s basin step'],
      ['booking-l', 'Hand Jo Park over to Bo at 3:00 PM'],
      ['booking-l', 'Start Jo Park 20 min late, at 3:20 PM, and tell them'],
      ['booking-l', 'Move Jo Park to another day'],
    ]);
    expect(summary.freed).toEqual([{ stylistId: 'ana', start: '2027-06-09T16:00-06:00', end: '2027-06-09T16:40-06:00', minutes: 40 }]);
  });

  it('without a late start that works, tells the wait until the earlier sitting is out of the way, rounded up to the grid; no one waits for closing time', () => {
    const summary = describeReplans(
      [
        replan([
          { kind: 'chair', sittingId: 'l', causeId: 'r', minutes: 12, start: '2027-06-09T15:10-06:00', end: '2027-06-09T15:22-06:00', fixes: [] },
          { kind: 'closing', sittingId: 'r', causeId: null, minutes: 10, start: '2027-06-09T19:00-06:00', end: '2027-06-09T19:10-06:00', fixes: [] },
        ]),
      ],
      names,
    );
    expect(summary.conflicts.map((c) => [c.words, c.tellMinutes])).toEqual([
      ['Maya Ortiz’s sitting now runs 12 min into Jo Park’s 3:00 PM: both need Chair 2.', 25],
      ['Maya Ortiz’s sitting now runs 10 min past closing time.', null],
    ]);
  });
});
