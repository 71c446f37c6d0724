import type { AppDeps } from '@server/app-deps';
import { registerFollowUpRuleRoutes } from './follow-up-rules.routes';
import { registerInboundSmsRoutes } from './inbound-sms.routes';
import { registerPreferenceRoutes } from './preferences.routes';

/** Every messages route beyond the Outbox's send log (which lives with the mailbox routes). */
export function registerMessageRoutes(deps: AppDeps): void {
  registerPreferenceRoutes(deps);
  registerInboundSmsRoutes(deps);
  registerFollowUpRuleRoutes(deps);
}
