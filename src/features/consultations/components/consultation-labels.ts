import type { ColourHistory } from '@shared/schemas/consultation.schemas';

export const historyLabels: Record<keyof ColourHistory, string> = {
  natural: 'Natural (never coloured)',
  permanent: 'Permanent colour',
  directDye: 'Vivid or direct dye',
  boxDye: 'Box dye (home colour)',
  henna: 'Henna or plant dye',
  previousLightening: 'Previously lightened',
};
export const lengthOptions = [
  { value: 'short', label: 'Short' },
  { value: 'medium', label: 'Medium' },
  { value: 'long', label: 'Long' },
  { value: 'extra_long', label: 'Extra long' },
];
export const densityOptions = [
  { value: 'fine', label: 'Fine' },
  { value: 'medium', label: 'Medium' },
  { value: 'thick', label: 'Thick' },
];
export const elasticityOptions = [
  { value: 'good', label: 'Good (stretches and returns)' },
  { value: 'reduced', label: 'Reduced' },
  { value: 'poor', label: 'Poor (stretches and snaps or stays)' },
];
export const porosityOptions = [
  { value: 'low', label: 'Low' },
  { value: 'normal', label: 'Normal' },
  { value: 'high', label: 'High (soaks up water, tangles)' },
];
export const strandOptions = [
  { value: 'none', label: 'No strand test yet' },
  { value: 'passed', label: 'Passed' },
  { value: 'fragile', label: 'Lifted, but the strand felt fragile' },
  { value: 'failed', label: 'Failed (broke or gummy)' },
];
export const quoteStatusLabels = { draft: 'Draft', sent: 'Sent to the client', accepted: 'Accepted by the client' } as const;
