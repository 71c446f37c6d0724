import { CloseDayBodySchema, ReopenDayBodySchema, TakingsQuerySchema, TakingsSchema } from '../schemas/takings.schemas';
import { DESK, endpoint } from './endpoint';

/** The day's takings and its close at the desk (docs/money.md, "Takings"). */
export const takingsApi = {
  day: endpoint({
    method: 'get',
    path: '/api/desk/takings',
    access: DESK,
    summary: "A salon day's takings: by method, deposits, balances, refunds, tips per stylist, cash expected and the close",
    query: TakingsQuerySchema,
    response: TakingsSchema,
  }),
  close: endpoint({
    method: 'post',
    path: '/api/desk/takings/close',
    access: DESK,
    summary: 'Close the day: the cash counted in the drawer, the difference from the cash expected recorded (once per day)',
    body: CloseDayBodySchema,
    response: TakingsSchema,
    status: 201,
  }),
  reopen: endpoint({
    method: 'post',
    path: '/api/desk/takings/reopen',
    access: ['owner'],
    summary: "Reopen a closed day so the desk can close it again (the owner's; the earlier close is kept)",
    body: ReopenDayBodySchema,
    response: TakingsSchema,
  }),
};
