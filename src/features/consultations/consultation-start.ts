import type { ColourHistory, ConsultationInput } from '@shared/schemas/consultation.schemas';
import type { HairHistory } from '@shared/schemas/hair-history.schemas';
import type { ConsultationFormInput } from './consultation-form-schema';

/** Where a new consultation's answers came from, for the line above the form. */
export type ConsultationStart = { values: ConsultationFormInput; from: 'earlier' | 'hair_history' | 'nothing' };

// Lightening named in the services a client lists: a lightened length lifts differently from natural hair.
const LIGHTENING = /bleach|lighten|highlight|balayage|ombr|foil|blond/i;

/** The colour history a client's own hair history tells: what they said is on their hair, never a guess. */
export function historyFromHairHistory(h: HairHistory): ColourHistory {
  const yes = (a: { answer: string }) => a.answer === 'yes';
  const colouredAtSalon = h.currentColourMethod === 'salon' || h.currentColourMethod === 'mixed';
  const boxDye = yes(h.boxDye) || h.currentColourMethod === 'at_home';
  const history: ColourHistory = {
    natural: false,
    permanent: colouredAtSalon,
    directDye: yes(h.vividDyes),
    boxDye,
    henna: yes(h.plantDyes),
    previousLightening: h.pastServices.some((s) => LIGHTENING.test(s.service)),
  };
  history.natural = !Object.values(history).some(Boolean) && h.currentColourMethod === 'natural';
  return history;
}

/**
 * What a new consultation starts from: the client's latest consultation (the same head of hair; notes left blank for
 * today's), else what their hair history says is on the hair. The levels are never guessed: without an earlier
 * consultation they start empty and must be filled in.
 */
export function consultationStart(latest: ConsultationInput | undefined, hair: HairHistory | null): ConsultationStart {
  const blank = {
    length: 'medium',
    density: 'medium',
    elasticity: 'good',
    porosity: 'normal',
    conditionNotes: '',
    strandTest: 'none',
    wantsCut: false,
    vivid: false,
    notes: '',
  } as const;
  if (latest) return { from: 'earlier', values: { consultation: { ...latest, conditionNotes: '', notes: '' }, photoIds: [] } };
  const history = hair
    ? historyFromHairHistory(hair)
    : { natural: false, permanent: false, directDye: false, boxDye: false, henna: false, previousLightening: false };
  return {
    from: hair ? 'hair_history' : 'nothing',
    // Empty levels: the form refuses to propose a quote until the stylist has looked and typed them.
    values: { consultation: { ...blank, currentLevel: Number.NaN, targetLevel: Number.NaN, history }, photoIds: [] },
  };
}
