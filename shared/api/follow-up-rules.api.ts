import { IdParamsSchema } from '../schemas/common.schemas';
import { FollowUpRuleBodySchema, FollowUpRuleSchema, FollowUpRulesSchema } from '../schemas/follow-up-rules.schemas';
import { endpoint } from './endpoint';

/** The owner's follow-up rules: marketing suggestions per service, sent only to clients who opted in. */
export const followUpRulesApi = {
  list: endpoint({
    method: 'get',
    path: '/api/owner/follow-up-rules',
    access: ['owner'],
    summary: 'Follow-up rules per service',
    response: FollowUpRulesSchema,
  }),
  add: endpoint({
    method: 'post',
    path: '/api/owner/follow-up-rules',
    access: ['owner'],
    summary: 'Add a follow-up rule (RRULE anchored on the end of the last sitting)',
    body: FollowUpRuleBodySchema,
    response: FollowUpRuleSchema,
    status: 201,
  }),
  change: endpoint({
    method: 'put',
    path: '/api/owner/follow-up-rules/:id',
    access: ['owner'],
    summary: 'Change a follow-up rule; what it had queued is planned again',
    params: IdParamsSchema,
    body: FollowUpRuleBodySchema,
    response: FollowUpRuleSchema,
  }),
  remove: endpoint({
    method: 'delete',
    path: '/api/owner/follow-up-rules/:id',
    access: ['owner'],
    summary: 'Remove a follow-up rule and what it had queued',
    params: IdParamsSchema,
    status: 204,
  }),
};
