// The demo salon: an invented scenario. Every name, address and phone number here is made up.
import type { ProductFamily, StepPlan } from '../../shared/schemas/step-plan.schemas';

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
    ana: { email: 'ana@demo.test', name: 'Ana Moreno', skills: ['colour', 'finish'], maxClientsAtOnce: 2, hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:30' } },
    marcus: { email: 'marcus@demo.test', name: 'Marcus Bell', skills: ['colour', 'cut', 'finish'], maxClientsAtOnce: 2, hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '11:00', end: '20:00' } },
    lee: { email: 'lee@demo.test', name: 'Lee Tanaka', skills: ['cut', 'finish'], maxClientsAtOnce: 1, hours: { rrule: 'FREQ=WEEKLY;BYDAY=WE,TH,FR,SA', start: '10:00', end: '19:00' } },
  } satisfies Record<StylistKey, unknown>,
};

export type ServiceKey = 'consultation' | 'skinTest' | 'rootTouchUp' | 'fullLightening' | 'tonerRefresh' | 'vividColour' | 'correction' | 'cutFinish' | 'blowDry' | 'fringeTrim';

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
const d = (label: string, minMinutes: number, maxMinutes: number, product: ProductFamily) => ({ kind: 'developing' as const, label, product, minMinutes, maxMinutes });

// Minutes follow common practice (processing 30–45 min for permanent colour, lightener checked and off
// within about 50 min, toner 10–20 min); the salon edits them per service.
export const demoServices: Record<ServiceKey, DemoService> = {
  consultation: { name: 'Colour consultation', description: 'Hair history, photos, strand check and a written quote for colour or correction work.', category: 'consultation', skill: 'colour', priceCents: 2500, depositCents: 2500, onlineBookable: true, plan: { sittings: [{ steps: [h('Consultation', 30)] }] } },
  skinTest: { name: 'Skin test', description: 'Allergy alert test for oxidative colour: a small patch of the mixed colour behind the ear or on the inner arm, read before your colour appointment.', category: 'skin_test', skill: 'colour', priceCents: 0, onlineBookable: true, plan: { sittings: [{ steps: [h('Apply skin test', 15)] }] } },
  rootTouchUp: { name: 'Root touch-up', description: 'Permanent colour on regrowth, processed, rinsed and blow-dried.', category: 'colour', skill: 'colour', priceCents: 9500, needsSkinTest: true, plan: { sittings: [{ steps: [h('Apply colour to regrowth', 30, 'oxidative_colour'), d('Colour develops', 30, 45, 'oxidative_colour'), b('Rinse and condition', 15), h('Blow-dry', 30)] }] } },
  fullLightening: { name: 'Full lightening', description: 'Lightener through the whole head, toned and finished.', category: 'colour', skill: 'colour', priceCents: 26000, priceIsFrom: true, depositCents: 6500, needsSkinTest: true, plan: { sittings: [{ steps: [h('Apply lightener', 60, 'lightener'), d('Lightener lifts', 30, 50, 'lightener'), b('Rinse lightener', 15), h('Apply toner', 15, 'toner_oxidative'), d('Toner develops', 10, 20, 'toner_oxidative'), b('Rinse toner', 10), h('Blow-dry', 45)] }] } },
  tonerRefresh: { name: 'Toner refresh', description: 'A gloss or toner between colour visits.', category: 'colour', skill: 'colour', priceCents: 4500, needsSkinTest: true, plan: { sittings: [{ steps: [h('Apply toner', 10, 'toner_oxidative'), d('Toner develops', 10, 20, 'toner_oxidative'), b('Rinse', 10)] }] } },
  vividColour: { name: 'Vivid colour', description: 'Pre-lightening and a direct vivid shade, finished.', category: 'colour', skill: 'colour', priceCents: 22000, priceIsFrom: true, depositCents: 5500, needsSkinTest: true, plan: { sittings: [{ steps: [h('Apply pre-lightener', 45, 'lightener'), d('Pre-lightener lifts', 30, 45, 'lightener'), b('Rinse', 15), h('Apply vivid colour', 40, 'direct_dye'), d('Vivid colour develops', 25, 35, 'direct_dye'), b('Cool rinse', 15), h('Finish', 30)] }] } },
  correction: {
    name: 'Colour correction (two sittings)',
    description: 'Removal of old colour, lightening and toning in a first sitting; refining, colour and cut in a second sitting a few days later.',
    category: 'colour', skill: 'colour', priceCents: 68000, priceIsFrom: true, depositCents: 17000, needsSkinTest: true,
    plan: {
      sittings: [
        { steps: [h('Check-in and strand check', 30), h('Apply colour remover', 30, 'colour_remover'), d('Remover processes', 20, 40, 'colour_remover'), b('Rinse remover', 20), h('Apply lightener', 45, 'lightener'), d('Lightener lifts', 30, 50, 'lightener'), b('Rinse and bond treatment', 15, 'bond_care'), h('Apply toner', 30, 'toner_oxidative'), d('Toner develops', 15, 20, 'toner_oxidative'), b('Rinse toner', 10), h('Blow-dry', 45)] },
        { daysAfterPrevious: { min: 1, max: 14 }, steps: [h('Refine lightener on mid-lengths', 60, 'lightener'), d('Lightener lifts', 30, 45, 'lightener'), b('Rinse', 15), h('Apply colour', 30, 'oxidative_colour'), d('Colour develops', 30, 40, 'oxidative_colour'), b('Rinse and condition', 15), h('Cut and finish', 60)] },
      ],
    },
  },
  cutFinish: { name: 'Cut & finish', description: 'Shampoo, cut and blow-dry.', category: 'cut', skill: 'cut', priceCents: 7500, onlineBookable: true, plan: { sittings: [{ steps: [b('Shampoo', 10), h('Cut and blow-dry', 45)] }] } },
  blowDry: { name: 'Blow-dry', description: 'Blow-dry and style.', category: 'treatment', skill: 'finish', priceCents: 4000, onlineBookable: true, plan: { sittings: [{ steps: [h('Blow-dry', 30)] }] } },
  fringeTrim: { name: 'Fringe trim', description: 'A quick fringe tidy.', category: 'cut', skill: 'cut', priceCents: 1500, plan: { sittings: [{ steps: [h('Fringe trim', 15)] }] } },
};

export const demoClientNames = [
  'Jordan Avery', 'Priya Raman', 'Hollis Grant', 'Mei Lin Cho', 'Dakota Reyes', 'Oona Fairweather', 'Tobias Wren',
  'Greta Nilsen', 'Amara Osei', 'Felix Duarte', 'Juniper Hale', 'Ravi Castellano', 'Sofia Brandt', 'Keanu Alvarado',
  'Wren Matsuda', 'Isla Petrov', 'Cyrus Beaumont', 'Noor Haddad', 'Elodie Marsh', 'Tariq Lindgren', 'Bea Okonkwo',
  'Lars Whitfield', 'Marisol Quint', 'Ezra Kowalski', 'Ingrid Solberg', 'Theo Nakamura', 'Clementine Ross', 'Arjun Mehta',
  'Vesna Horvat', 'Quinn Delacroix',
];
