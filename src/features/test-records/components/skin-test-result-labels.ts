import type { SkinTest } from '@shared/schemas/skin-test.schemas';

/** Skin-test results as staff read them on the client card. */
export const skinTestResultLabels: Record<SkinTest['result'], string> = {
  pending: 'Applied, not read yet',
  negative: 'Negative (no reaction)',
  positive: 'Positive (reaction)',
  unclear: 'Unclear',
};
