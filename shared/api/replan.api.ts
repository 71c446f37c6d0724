import { IdParamsSchema } from '../schemas/common.schemas';
import { SittingParamsSchema } from '../schemas/day-of-service.schemas';
import {
  ApplyFixSchema,
  DayConflictsQuerySchema,
  DayConflictsSchema,
  FixAppliedSchema,
  RunningLateToldSchema,
  StylistDayRunSchema,
  TellRunningLateSchema,
} from '../schemas/replan.schemas';
import { DESK, endpoint } from './endpoint';

/**
 * Running late: the day re-planned from the actual step times. The desk reads every conflict an overrun makes with
 * its fixes (a stylist reads their own day's new times), applies one fix with one action (through the same services as any change), and tells a later client.
 */
export const replanApi = {
  dayConflicts: endpoint({
    method: 'get',
    path: '/api/desk/day/conflicts',
    access: DESK,
    summary: "The day's conflicts from overruns, each with fixes best first, and the time early finishes freed (today; other days have none)",
    query: DayConflictsQuerySchema,
    response: DayConflictsSchema,
  }),
  stylistDayRun: endpoint({
    method: 'get',
    path: '/api/stylist/day/run',
    access: ['stylist'],
    summary: "The signed-in stylist's day re-planned from the actual step times: when each sitting's steps now start (today; other days run as booked)",
    query: DayConflictsQuerySchema,
    response: StylistDayRunSchema,
  }),
  applyFix: endpoint({
    method: 'post',
    path: '/api/bookings/:id/replan-fix',
    access: DESK,
    summary:
      'Apply one fix the current re-plan offers for this booking (a stale or forged fix answers 409 and stores nothing); moves, hand-overs, chairs, basins and developing lengths go through the usual checks, audit and messages',
    params: IdParamsSchema,
    body: ApplyFixSchema,
    response: FixAppliedSchema,
  }),
  tellRunningLate: endpoint({
    method: 'post',
    path: '/api/bookings/:id/sittings/:n/running-late',
    access: DESK,
    summary: 'Tell a later client the day runs late ("running about 20 minutes late — see you at 3:20"): once per sitting and delay',
    params: SittingParamsSchema,
    body: TellRunningLateSchema,
    response: RunningLateToldSchema,
  }),
};
