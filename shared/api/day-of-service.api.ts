import { FinishSittingSchema, SittingParamsSchema, SittingRunSchema, SteppedSittingRunSchema, StepParamsSchema } from '../schemas/day-of-service.schemas';
import { DESK, STAFF, endpoint } from './endpoint';

/**
 * Running the day: the desk marks a sitting's arrival or no-show; the stylist on the booking (or the desk) starts and
 * finishes each step with one tap and may undo the last tap for a minute. Each answers the sitting as it now runs; a tap that
 * sets an actual time also answers `replan`, the conflicts and freed time it makes in the stylist's day.
 */
export const dayOfServiceApi = {
  arrive: endpoint({
    method: 'post',
    path: '/api/bookings/:id/sittings/:n/arrive',
    access: DESK,
    summary: 'The client of one sitting has arrived (the skin-test rule is checked again; minutes late are kept)',
    params: SittingParamsSchema,
    response: SittingRunSchema,
  }),
  noShow: endpoint({
    method: 'post',
    path: '/api/bookings/:id/sittings/:n/no-show',
    access: DESK,
    summary: "A sitting's client did not come: after the salon's grace time; the deposit policy applies, the time is freed, the client is told",
    params: SittingParamsSchema,
    response: SittingRunSchema,
  }),
  startStep: endpoint({
    method: 'post',
    path: '/api/bookings/:id/sittings/:n/steps/:k/start',
    access: STAFF,
    summary: 'Start step k of sitting n now (the stylist on the booking, or the desk); the step before must be finished',
    params: StepParamsSchema,
    response: SteppedSittingRunSchema,
  }),
  finishStep: endpoint({
    method: 'post',
    path: '/api/bookings/:id/sittings/:n/steps/:k/finish',
    access: STAFF,
    summary: 'Finish step k of sitting n now; the last step finishes the sitting',
    params: StepParamsSchema,
    response: SteppedSittingRunSchema,
  }),
  finishSitting: endpoint({
    method: 'post',
    path: '/api/bookings/:id/sittings/:n/finish',
    access: STAFF,
    summary: 'Finish a sitting with steps left open (leaveOpen: true and a reason), e.g. when the client leaves early',
    params: SittingParamsSchema,
    body: FinishSittingSchema,
    response: SteppedSittingRunSchema,
  }),
  undo: endpoint({
    method: 'post',
    path: '/api/bookings/:id/sittings/:n/undo',
    access: STAFF,
    summary: 'Undo the last tap on the sitting, within a minute of it (a no-show is not undone)',
    params: SittingParamsSchema,
    response: SteppedSittingRunSchema,
  }),
};
