import type { PhotoKind } from '@shared/schemas/photo.schemas';

export const kindLabels: Record<PhotoKind, string> = { hair_now: 'Your hair now', wanted: 'What you would like' };
/** The same kinds as the salon's team reads them. */
export const kindLabelsForStaff: Record<PhotoKind, string> = { hair_now: 'Hair now', wanted: 'What they would like' };
