import type { ReactNode } from 'react';
import type { StepNote } from '@client/features/bookings';
import type { TypicalMinutes } from '@shared/schemas/typical-minutes.schemas';
import { TypicalMinutesKey } from './typical-minutes-key';
import { TypicalMinutesNote } from './typical-minutes-note';

/** The step plan editor's `note` and `stepNote` for a service's typical minutes (none while there is no answer). */
export function typicalMinutesNotes(answer: TypicalMinutes | undefined): { note?: ReactNode; stepNote?: StepNote } {
  if (!answer) return {};
  return {
    note: <TypicalMinutesKey answer={answer} />,
    stepNote: (step) => <TypicalMinutesNote answer={answer} step={step} />,
  };
}
