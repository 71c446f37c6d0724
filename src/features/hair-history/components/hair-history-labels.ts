import type { HairAnswer, HairHistory } from '@shared/schemas/hair-history.schemas';

export const answerLabels: Record<HairAnswer, string> = { no: 'No', yes: 'Yes', not_sure: 'Not sure' };

export const methodLabels: Record<HairHistory['currentColourMethod'], string> = {
  natural: 'My natural colour',
  salon: 'Coloured at a salon',
  at_home: 'Coloured at home',
  mixed: 'A mix of salon and home colour',
};

/** The yes/no questions with details, in the order the form and the summary show them. */
export const answerQuestions = [
  { name: 'boxDye', question: 'Have you used box dye (colour from a shop)?', details: 'Roughly when, and which colour' },
  { name: 'plantDyes', question: 'Have you used henna or another plant dye?', details: 'Which one, and when' },
  { name: 'vividDyes', question: 'Have you used vivid or direct dyes (bright pinks, blues, greens…)?', details: 'Which colours, and when' },
] as const;

export const structuralLabels = { relaxer: 'Relaxer', perm: 'Perm', keratin: 'Keratin or smoothing treatment' } as const;
