/**
 * Small random scenarios for property tests: a few stylists, chairs and days, often on a
 * daylight-saving change (IANA tz: America/Denver 2027-03-14 and 2027-11-07, Europe/London
 * 2027-03-28 and 2027-10-31), with a random multi-step, sometimes multi-sitting request.
 */
import { parseScenario, type Scenario } from '@shared/engine/engine';
import type { ScenarioInput } from '@shared/engine/scenario.schemas';
import { between, exists, generateScenario, localText, pick, seededRng, type Rng } from './scenario-generator';

const PLACES: Array<[zone: string, from: string]> = [
  ['America/Denver', '2027-03-13'],
  ['America/Denver', '2027-11-06'],
  ['Europe/London', '2027-03-27'],
  ['Europe/London', '2027-10-30'],
  ['Asia/Kathmandu', '2027-05-03'],
  ['UTC', '2027-01-04'],
];

type RequestInput = NonNullable<ScenarioInput['request']>;

function randomSteps(rng: Rng, g: number): RequestInput['sittings'][number]['steps'] {
  const count = between(rng, 1, 3);
  return Array.from({ length: count }, () => {
    const kind = pick(rng, ['hands_on', 'hands_on', 'developing', 'basin'] as const);
    const minutes = g * between(rng, 1, Math.max(1, Math.floor(60 / g)));
    if (kind !== 'developing') return { kind, minutes };
    return { kind, minMinutes: minutes, maxMinutes: minutes + g * between(rng, 0, 3) };
  });
}

export function smallScenario(seed: number): Scenario {
  const rng = seededRng(seed);
  const [zone, from] = pick(rng, PLACES);
  const g = pick(rng, [5, 10, 15, 15, 20, 30, 60]);
  const night = rng() < 0.3;
  const stylists = between(rng, 1, 3);
  // Now and then a longer horizon, so later sittings have several dates to choose from.
  const days = rng() < 0.12 ? between(rng, 4, 6) : between(rng, 2, 3);
  const input = generateScenario(rng, {
    zone,
    from,
    days,
    granularity: g,
    stylists,
    colourStylists: between(rng, 1, stylists),
    chairs: between(rng, 1, 3),
    basins: between(rng, 0, 2),
    bookings: between(rng, 0, 12),
    // Night hours put the clock change inside working time, so sittings cross it.
    salonHours: night ? [pick(rng, [0, 60, 90]), pick(rng, [300, 1440])] : [480, 1200],
    stylistStarts: night ? [0, 60, 90, 150] : [480, 540, 600],
    stylistEnds: night ? [240, 360, 1440] : [900, 1080, 1200],
    timeOffChance: 0.3,
    maxClients: [1, 1, 2, 3],
  });
  const fromMinute = (Date.parse(`${from}T00:00:00Z`) / 60_000) | 0;
  const sittings: RequestInput['sittings'] = [{ steps: randomSteps(rng, g) }];
  const extra = rng() < 0.35 ? 1 : rng() < 0.1 ? 2 : 0;
  for (let i = 0; i < extra; i++) {
    const min = between(rng, 1, 2);
    sittings.push({ daysAfterPrevious: { min, max: min + between(rng, 0, 2) }, steps: randomSteps(rng, g) });
  }
  let earliest = fromMinute + between(rng, 0, days * 720);
  while (!exists(earliest, zone)) earliest += 1;
  input.request = {
    skill: pick(rng, ['colour', 'colour', 'cut']),
    stylist: rng() < 0.25 ? pick(rng, input.stylists).id : null,
    earliest: localText(earliest),
    sittings,
    limit: between(rng, 1, 8),
    spread: pick(rng, ['day', 'none'] as const),
  };
  input.fits = [
    { service: 'toner-refresh', skill: 'colour', minutes: g * between(rng, 1, 3) },
    { service: 'fringe-trim', skill: 'cut', minutes: g },
  ];
  return parseScenario(input);
}
