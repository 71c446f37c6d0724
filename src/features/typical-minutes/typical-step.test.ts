import { describe, expect, it } from 'vitest';
import type { TypicalMinutes } from '@shared/schemas/typical-minutes.schemas';
import { typicalStepFor } from './typical-step';

const figure = (visits: number) => ({ visits, medianMinutes: 10, p80Minutes: 12 });
const answer: TypicalMinutes = {
  serviceId: '00000000-0000-4000-8000-000000000001',
  lastVisits: 20,
  minVisits: 3,
  forStylistId: null,
  steps: [
    { sitting: 1, label: 'Rinse', occurrence: 1, salon: figure(4), stylists: [] },
    { sitting: 1, label: 'Rinse', occurrence: 2, salon: figure(5), stylists: [] },
    { sitting: 2, label: 'Rinse', occurrence: 1, salon: figure(6), stylists: [] },
  ],
};

describe('typicalStepFor', () => {
  it('tells a second "Rinse" and another sitting\'s "Rinse" apart', () => {
    expect(typicalStepFor(answer, { sitting: 1, label: 'Rinse', occurrence: 2 })?.salon.visits).toBe(5);
    expect(typicalStepFor(answer, { sitting: 2, label: 'Rinse', occurrence: 1 })?.salon.visits).toBe(6);
  });
  it('finds nothing for a step never timed', () => {
    expect(typicalStepFor(answer, { sitting: 1, label: 'Rinse', occurrence: 3 })).toBeUndefined();
    expect(typicalStepFor(answer, { sitting: 1, label: 'rinse', occurrence: 1 })).toBeUndefined();
  });
});
