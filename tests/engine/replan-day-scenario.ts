/**
 * A worked day for the re-planning tests: Ava's lightening client (booking "lightening", chair-1) from 12:00 and her
 * 15:00 client ("three-pm", chair-2), Ben free all afternoon, on an ordinary day in Europe/London.
 */
import { parseScenario, type Scenario } from '@shared/engine/engine';
import type { ScenarioInput } from '@shared/engine/scenario.schemas';

const at = (time: string) => `2027-06-09T${time}`;

export function overrunDay(extra: Partial<ScenarioInput> = {}): Scenario {
  return parseScenario({
    timeZone: 'Europe/London',
    granularityMinutes: 5,
    horizon: { from: '2027-06-07', to: '2027-06-14' },
    salonHours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '19:00' }],
    stylists: [
      { id: 'ava', skills: ['colour'], maxClientsAtOnce: 2, hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }] },
      { id: 'ben', skills: ['colour'], maxClientsAtOnce: 1, hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }] },
      { id: 'cy', skills: ['cut'], maxClientsAtOnce: 1, hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }] },
    ],
    chairs: [{ id: 'chair-1' }, { id: 'chair-2' }, { id: 'chair-3' }],
    basins: [{ id: 'basin-1' }, { id: 'basin-2' }],
    bookings: [
      {
        id: 'lightening',
        stylist: 'ava',
        chair: 'chair-1',
        steps: [
          { kind: 'hands_on', start: at('12:00'), end: at('13:00') },
          { kind: 'developing', start: at('13:00'), end: at('14:00') },
          { kind: 'basin', start: at('14:00'), end: at('14:15'), basin: 'basin-1' },
          { kind: 'hands_on', start: at('14:15'), end: at('14:45') },
        ],
      },
      {
        id: 'three-pm',
        stylist: 'ava',
        chair: 'chair-2',
        steps: [
          { kind: 'hands_on', start: at('15:00'), end: at('15:45') },
          { kind: 'developing', start: at('15:45'), end: at('16:15') },
          { kind: 'basin', start: at('16:15'), end: at('16:30'), basin: 'basin-1' },
          { kind: 'hands_on', start: at('16:30'), end: at('17:00') },
        ],
      },
    ],
    ...extra,
  });
}

export { at };
