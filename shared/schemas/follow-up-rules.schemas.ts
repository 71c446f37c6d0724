import { z } from 'zod';
import { IdSchema } from './common.schemas';
import { followUpRuleProblem } from '../messages/follow-up-times';

/** An RRULE (RFC 5545) a follow-up can use: it ends (COUNT or UNTIL) and has no DTSTART of its own. */
export const FollowUpRruleSchema = z
  .string()
  .trim()
  .min(1, 'Enter a rule, e.g. FREQ=WEEKLY;INTERVAL=6;COUNT=1')
  .max(200)
  .transform((s) => s.replace(/^RRULE:/i, '').toUpperCase())
  .superRefine((s, ctx) => {
    const problem = followUpRuleProblem(s);
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });

export const FollowUpRuleBodySchema = z
  .object({
    serviceId: IdSchema,
    title: z.string().trim().min(1, 'Enter a title').max(120),
    text: z.string().trim().min(1, 'Enter the message').max(600, 'Keep the message under 600 characters'),
    rrule: FollowUpRruleSchema,
  })
  .strict();
export type FollowUpRuleBody = z.input<typeof FollowUpRuleBodySchema>;

export const FollowUpRuleSchema = z.object({
  id: IdSchema,
  serviceId: IdSchema,
  serviceName: z.string(),
  title: z.string(),
  text: z.string(),
  rrule: z.string(),
  version: z.number().int(),
});
export type FollowUpRule = z.infer<typeof FollowUpRuleSchema>;
export const FollowUpRulesSchema = z.object({ rules: z.array(FollowUpRuleSchema) });
