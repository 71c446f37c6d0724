// The bookings feature's public module: other features import it only from here.
export { useMoveSitting } from './api/booking-mutations';
export { StepPlanEditor } from './components/step-plan/step-plan-editor';
export type { StepMinutes, StepNote, StepNoteInput } from './components/step-plan/sitting-editor';
