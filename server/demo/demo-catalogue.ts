// The demo salon: an invented scenario. Every name, address and phone number here is made up.
import type { ProductFamily, StepPlan } from '@shared/schemas/step-plan.schemas';
import { DAYS_BETWEEN_SITTINGS } from '@shared/quotes/propose-quote';

export const DEMO_PASSWORD = 'dwell-demo-2027';

export const demoSalon = {
  slug: 'kestrel-and-pine',
  name: 'Kestrel & Pine Hair Studio',
  timeZone: 'America/Denver',
  currency: 'USD',
  address: '214 Linden Row, Fort Collins, CO 80524',
  phone: '+1 970 555 0148',
  hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' }],
  chairs: ['Chair 1', 'Chair 2', 'Chair 3', 'Chair 4'],
  basins: ['Basin 1', 'Basin 2'],
};

export type StylistKey = 'ana' | 'marcus' | 'lee';

export const demoStaff = {
  owner: { email: 'owner@demo.test', name: 'Rosa Lindqvist', role: 'owner' as const },
  desk: { email: 'desk@demo.test', name: 'Sam Okafor', role: 'front_desk' as const },
  stylists: {
    ana: {
      email: 'ana@demo.test',
      name: 'Ana Moreno',
      skills: ['colour', 'finish'],
      maxClientsAtOnce: 2,
      hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:30' },
    },
    marcus: {
      email: 'marcus@demo.test',
      name: 'Marcus Bell',
      skills: ['colour', 'cut', 'finish'],
      maxClientsAtOnce: 2,
      hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '11:00', end: '20:00' },
    },
    lee: {
      email: 'lee@demo.test',
      name: 'Lee Tanaka',
      skills: ['cut', 'finish'],
      maxClientsAtOnce: 1,
      hours: { rrule: 'FREQ=WEEKLY;BYDAY=WE,TH,FR,SA', start: '10:00', end: '19:00' },
    },
  } satisfies Record<StylistKey, unknown>,
};

export type ServiceKey =
  'consultation' | 'skinTest' | 'rootTouchUp' | 'fullLightening' | 'tonerRefresh' | 'vividColour' | 'correction' | 'cutFinish' | 'blowDry' | 'fringeTrim';

interface DemoService {
  name: string;
  description: string;
  category: 'consultation' | 'skin_test' | 'colour' | 'cut' | 'treatment';
  skill: string;
  priceCents: number;
  priceIsFrom?: boolean;
  depositCents?: number;
  onlineBookable?: boolean;
  needsSkinTest?: boolean;
  plan: StepPlan;
}

// Each step says what it puts on the hair (nothing, by default: cutting, drying, rinsing, talking).
const h = (label: string, minutes: number, product: ProductFamily = 'none') => ({ kind: 'hands_on' as const, label, product, minutes });
const b = (label: string, minutes: number, product: ProductFamily = 'none') => ({ kind: 'basin' as const, label, product, minutes });
const d = (label: string, minMinutes: number, maxMinutes: number, product: ProductFamily, heat = false) => ({
  kind: 'developing' as const,
  label,
  product,
  minMinutes,
  maxMinutes,
  ...(heat && { heat }),
});

// Minutes follow common practice and fit the salon's default processing limits, counted from when the first
// section gets product (lightener 50 min, permanent colour 45, toner 30, remover 60 and half that with heat):
// a full head of lightener goes on in two sections, each rinsed before the next. The salon edits them per service.
export const demoServices: Record<ServiceKey, DemoService> = {
  consultation: {
    name: 'Colour consultation',
    description: 'Hair history, photos, strand check and a written quote for colour or correction work.',
    category: 'consultation',
    skill: 'colour',
    priceCents: 2500,
    depositCents: 2500,
    onlineBookable: true,
    plan: { sittings: [{ steps: [h('Consultation', 30)] }] },
  },
  skinTest: {
    name: 'Skin test',
    description:
      'Allergy alert test for oxidative colour: a small patch of the mixed colour behind the ear or on the inner arm, read before your colour appointment.',
    category: 'skin_test',
    skill: 'colour',
    priceCents: 0,
    onlineBookable: true,
    plan: { sittings: [{ steps: [h('Apply skin test', 15)] }] },
  },
  rootTouchUp: {
    name: 'Root touch-up',
    description: 'Permanent colour on regrowth, processed, rinsed and blow-dried.',
    category: 'colour',
    skill: 'colour',
    priceCents: 9500,
    needsSkinTest: true,
    plan: {
      sittings: [
        {
          steps: [
            h('Apply colour to regrowth', 10, 'oxidative_colour'),
            d('Colour develops', 30, 35, 'oxidative_colour'),
            b('Rinse and condition', 15),
            h('Blow-dry', 30),
          ],
        },
      ],
    },
  },
  fullLightening: {
    name: 'Full lightening',
    description: 'Lightener through the whole head in two sections, toned and finished.',
    category: 'colour',
    skill: 'colour',
    priceCents: 26000,
    priceIsFrom: true,
    depositCents: 6500,
    needsSkinTest: true,
    plan: {
      sittings: [
        {
          steps: [
            h('Apply lightener, section 1 of 2', 20, 'lightener'),
            d('Lightener lifts, section 1 of 2', 20, 30, 'lightener'),
            b('Rinse section 1 of 2', 10),
            h('Apply lightener, section 2 of 2', 20, 'lightener'),
            d('Lightener lifts, section 2 of 2', 20, 30, 'lightener'),
            b('Rinse lightener', 10),
            h('Apply toner', 15, 'toner_oxidative'),
            d('Toner develops', 10, 15, 'toner_oxidative'),
            b('Rinse toner', 10),
            h('Blow-dry', 45),
          ],
        },
      ],
    },
  },
  tonerRefresh: {
    name: 'Toner refresh',
    description: 'A gloss or toner between colour visits.',
    category: 'colour',
    skill: 'colour',
    priceCents: 4500,
    needsSkinTest: true,
    plan: { sittings: [{ steps: [h('Apply toner', 10, 'toner_oxidative'), d('Toner develops', 10, 20, 'toner_oxidative'), b('Rinse', 10)] }] },
  },
  vividColour: {
    name: 'Vivid colour',
    description: 'Pre-lightening and a direct vivid shade placed in sections, finished.',
    category: 'colour',
    skill: 'colour',
    priceCents: 22000,
    priceIsFrom: true,
    depositCents: 5500,
    needsSkinTest: true,
    plan: {
      sittings: [
        {
          steps: [
            h('Apply pre-lightener', 25, 'lightener'),
            d('Pre-lightener lifts', 20, 25, 'lightener'),
            b('Rinse', 15),
            h('Apply vivid colour, section 1 of 2', 20, 'direct_dye'),
            h('Apply vivid colour, section 2 of 2', 20, 'direct_dye'),
            d('Vivid colour develops', 25, 35, 'direct_dye'),
            b('Cool rinse', 15),
            h('Finish', 30),
          ],
        },
      ],
    },
  },
  // The real job: about ten hours over two sittings a few days apart. Two remover cycles under heat (each 20 min on
  // and 10 under heat: the 60 min remover limit halved), lightener in two sections, toner, then the vivid shade in
  // three sections and the cut at the second sitting.
  correction: {
    name: 'Colour correction (two sittings)',
    description:
      'Strand check, colour remover twice with heat, lightener in sections and toner in a first sitting; a vivid shade placed in sections, cut and finish in a second sitting a few days later.',
    category: 'colour',
    skill: 'colour',
    priceCents: 98000,
    priceIsFrom: true,
    depositCents: 24500,
    needsSkinTest: true,
    plan: {
      sittings: [
        {
          steps: [
            h('Check-in and strand check', 30),
            h('Apply colour remover, round 1 of 2', 20, 'colour_remover'),
            d('Remover processes under heat, round 1 of 2', 10, 10, 'colour_remover', true),
            b('Rinse remover thoroughly, round 1 of 2', 20),
            h('Apply colour remover, round 2 of 2', 20, 'colour_remover'),
            d('Remover processes under heat, round 2 of 2', 10, 10, 'colour_remover', true),
            b('Rinse remover thoroughly, round 2 of 2', 20),
            h('Dry and check the lift', 20),
            h('Apply lightener, section 1 of 2', 25, 'lightener'),
            d('Lightener lifts, section 1 of 2', 20, 25, 'lightener'),
            b('Rinse section 1 of 2', 10),
            h('Apply lightener, section 2 of 2', 25, 'lightener'),
            d('Lightener lifts, section 2 of 2', 20, 25, 'lightener'),
            b('Rinse and bond treatment', 20, 'bond_care'),
            h('Apply toner', 20, 'toner_oxidative'),
            d('Toner develops', 10, 10, 'toner_oxidative'),
            b('Rinse toner', 10),
            h('Blow-dry', 45),
          ],
        },
        {
          daysAfterPrevious: { ...DAYS_BETWEEN_SITTINGS },
          steps: [
            h('Check the lift and plan the placement', 15),
            h('Apply vivid colour, section 1 of 3', 25, 'direct_dye'),
            h('Apply vivid colour, section 2 of 3', 25, 'direct_dye'),
            h('Apply vivid colour, section 3 of 3', 25, 'direct_dye'),
            d('Vivid colour develops', 25, 35, 'direct_dye'),
            b('Cool rinse', 15),
            h('Cut and finish', 75),
          ],
        },
      ],
    },
  },
  cutFinish: {
    name: 'Cut & finish',
    description: 'Shampoo, cut and blow-dry.',
    category: 'cut',
    skill: 'cut',
    priceCents: 7500,
    onlineBookable: true,
    plan: { sittings: [{ steps: [b('Shampoo', 10), h('Cut and blow-dry', 45)] }] },
  },
  blowDry: {
    name: 'Blow-dry',
    description: 'Blow-dry and style.',
    category: 'treatment',
    skill: 'finish',
    priceCents: 4000,
    onlineBookable: true,
    plan: { sittings: [{ steps: [h('Blow-dry', 30)] }] },
  },
  fringeTrim: {
    name: 'Fringe trim',
    description: 'A quick fringe tidy.',
    category: 'cut',
    skill: 'cut',
    priceCents: 1500,
    plan: { sittings: [{ steps: [h('Fringe trim', 15)] }] },
  },
};

export const demoClientNames = [
  'Jordan Avery',
  'Priya Raman',
  'Hollis Grant',
  'Mei Lin Cho',
  'Dakota Reyes',
  'Oona Fairweather',
  'Tobias Wren',
  'Greta Nilsen',
  'Amara Osei',
  'Felix Duarte',
  'Juniper Hale',
  'Ravi Castellano',
  'Sofia Brandt',
  'Keanu Alvarado',
  'Wren Matsuda',
  'Isla Petrov',
  'Cyrus Beaumont',
  'Noor Haddad',
  'Elodie Marsh',
  'Tariq Lindgren',
  'Bea Okonkwo',
  'Lars Whitfield',
  'Marisol Quint',
  'Ezra Kowalski',
  'Ingrid Solberg',
  'Theo Nakamura',
  'Clementine Ross',
  'Arjun Mehta',
  'Vesna Horvat',
  'Quinn Delacroix',
];
