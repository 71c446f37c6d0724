import { z } from 'zod';
import { ruleProblem } from '../engine/weekly-rule';

export const ClockTimeSchema = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Use a time like 09:30');

/** Opening or working hours: an RFC 5545 rule (or DTSTART/RRULE/EXDATE text) with a start and end time. */
export const HoursRuleInputSchema = z
  .object({
    rrule: z
      .string()
      .trim()
      .min(1, 'Say which days')
      .max(2000)
      .superRefine((text, ctx) => {
        const problem = ruleProblem(text);
        if (problem) ctx.addIssue({ code: 'custom', message: `This rule does not work: ${problem}` });
      }),
    start: ClockTimeSchema,
    end: ClockTimeSchema,
  })
  .strict()
  .refine((h) => h.end > h.start, { message: 'The hours must end after they start', path: ['end'] });
export type HoursRuleInput = z.infer<typeof HoursRuleInputSchema>;

export const HoursListSchema = z.array(HoursRuleInputSchema).min(1, 'Add at least one line of hours').max(14);
