import { describe, expect, it } from 'vitest';
import { emptyHairHistory, type HairHistory } from '@shared/schemas/hair-history.schemas';
import type { ConsultationInput } from '@shared/schemas/consultation.schemas';
import { ConsultationFormSchema } from './consultation-form-schema';
import { consultationStart, historyFromHairHistory } from './consultation-start';

const hair = (change: Partial<HairHistory>): HairHistory => ({ ...emptyHairHistory(), previousReaction: { answer: 'no', details: '' }, ...change });

describe('a new consultation starts from what is known about the hair', () => {
  it('from the latest consultation, with today’s notes left blank', () => {
    const earlier: ConsultationInput = {
      currentLevel: 4,
      targetLevel: 8,
      history: { natural: false, permanent: true, directDye: false, boxDye: true, henna: false, previousLightening: false },
      length: 'long',
      density: 'thick',
      elasticity: 'reduced',
      porosity: 'high',
      conditionNotes: 'Breakage at the ends',
      strandTest: 'fragile',
      wantsCut: true,
      vivid: false,
      notes: 'Wants copper',
    };
    const start = consultationStart(earlier, hair({ currentColourMethod: 'natural' }));
    expect(start.from).toBe('earlier');
    expect(start.values.consultation).toEqual({ ...earlier, conditionNotes: '', notes: '' });
  });

  it('else from the hair history: box dye at home, henna and listed highlights are ticked, never "natural"', () => {
    const h = hair({
      currentColourMethod: 'at_home',
      plantDyes: { answer: 'yes', details: 'Henna last spring' },
      pastServices: [{ service: 'Balayage', when: '2025' }],
    });
    expect(historyFromHairHistory(h)).toEqual({ natural: false, permanent: false, directDye: false, boxDye: true, henna: true, previousLightening: true });
    const start = consultationStart(undefined, h);
    expect(start.from).toBe('hair_history');
  });

  it('says natural only when the client said so and named nothing else', () => {
    expect(historyFromHairHistory(hair({ currentColourMethod: 'natural' })).natural).toBe(true);
    expect(historyFromHairHistory(hair({ currentColourMethod: 'natural', vividDyes: { answer: 'yes', details: 'Pink tips' } })).natural).toBe(false);
  });

  it('leaves the levels for the stylist to fill in: the form refuses to propose without them', () => {
    const start = consultationStart(undefined, null);
    expect(start.from).toBe('nothing');
    const checked = ConsultationFormSchema.safeParse(start.values);
    expect(checked.success).toBe(false);
    expect(checked.error?.issues.map((i) => i.path.join('.'))).toEqual(expect.arrayContaining(['consultation.currentLevel', 'consultation.targetLevel']));
  });
});
