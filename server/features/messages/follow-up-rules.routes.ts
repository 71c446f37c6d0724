import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { FollowUpRuleBodySchema, FollowUpRuleSchema, FollowUpRulesSchema, followUpRulesPath } from '../../../shared/schemas/follow-up-rules.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';
import { findFollowUpRule, listFollowUpRules } from './follow-up-rules.repository';
import { createFollowUpRule, editFollowUpRule, removeFollowUpRule } from './follow-up-rules.service';

/** The owner's follow-up rules: marketing suggestions per service, sent only to clients who opted in. */
export function registerFollowUpRuleRoutes({ table, db }: AppDeps): void {
  const one = async (salonId: string, id: string) => (await findFollowUpRule(db, salonId, id)) ?? Promise.reject(notFound('That follow-up rule'));
  apiRoute(
    table,
    { method: 'get', path: followUpRulesPath, access: ['owner'], summary: 'Follow-up rules per service', response: FollowUpRulesSchema },
    async ({ user }) => ({ rules: await listFollowUpRules(db, user.salonId) }),
  );
  apiRoute(
    table,
    { method: 'post', path: followUpRulesPath, access: ['owner'], summary: 'Add a follow-up rule (RRULE anchored on the end of the last sitting)', body: FollowUpRuleBodySchema, response: FollowUpRuleSchema, status: 201 },
    async ({ user, body }) => one(user.salonId, await createFollowUpRule(db, user.salonId, body, new Date())),
  );
  apiRoute(
    table,
    { method: 'put', path: `${followUpRulesPath}/:id`, access: ['owner'], summary: 'Change a follow-up rule; what it had queued is planned again', params: IdParamsSchema, body: FollowUpRuleBodySchema, response: FollowUpRuleSchema },
    async ({ user, params, body }) => {
      await editFollowUpRule(db, user.salonId, params.id, body, new Date());
      return one(user.salonId, params.id);
    },
  );
  apiRoute(
    table,
    { method: 'delete', path: `${followUpRulesPath}/:id`, access: ['owner'], summary: 'Remove a follow-up rule and what it had queued', params: IdParamsSchema, status: 204 },
    async ({ user, params }) => void (await removeFollowUpRule(db, user.salonId, params.id)),
  );
}
