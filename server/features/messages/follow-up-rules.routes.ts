import { followUpRulesApi } from '@shared/api/follow-up-rules.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { createFollowUpRule, editFollowUpRule, followUpRules, removeFollowUpRule } from './follow-up-rules.service';

/** The owner's follow-up rules: marketing suggestions per service, sent only to clients who opted in. */
export function registerFollowUpRuleRoutes({ table, db }: AppDeps): void {
  apiRoute(table, followUpRulesApi.list, async ({ user }) => followUpRules(db, user.salonId));
  apiRoute(table, followUpRulesApi.add, async ({ user, body }) => createFollowUpRule(db, user.salonId, body, new Date()));
  apiRoute(table, followUpRulesApi.change, async ({ user, params, body }) => editFollowUpRule(db, user.salonId, params.id, body, new Date()));
  apiRoute(table, followUpRulesApi.remove, async ({ user, params }) => removeFollowUpRule(db, user.salonId, params.id));
}
