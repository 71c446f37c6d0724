import { z } from 'zod';
import { InstantSchema } from './common.schemas';

const text = (max: number) => z.string().trim().max(max, `Use at most ${max} characters`);

/** "Not sure" is a real answer: a client who does not know about henna or box dye needs a strand test. */
export const HairAnswerSchema = z.enum(['no', 'yes', 'not_sure'], { error: 'Choose an answer' });
export type HairAnswer = z.infer<typeof HairAnswerSchema>;

export const ColourMethodSchema = z.enum(['natural', 'salon', 'at_home', 'mixed']);

export const PastServiceSchema = z
  .object({
    service: z.string().trim().min(1, 'Say which service').max(120, 'Use at most 120 characters'),
    /** A month in words ("March 2026") or a date: people rarely remember the day. */
    when: text(40),
  })
  .strict();

const answerWith = (detailsMax: number) => z.object({ answer: HairAnswerSchema, details: text(detailsMax) }).strict();

/** The hair-history form: the same schema checks the client's form and the server's PUT body. */
export const HairHistorySchema = z
  .object({
    currentColour: text(300),
    currentColourMethod: ColourMethodSchema,
    pastServices: z.array(PastServiceSchema).max(20, 'List at most 20 services'),
    /** Box dye: yes/no and roughly when. */
    boxDye: answerWith(200),
    /** Henna and other plant dyes can react with lightener, so which one and when. */
    plantDyes: answerWith(300),
    structural: z.object({ relaxer: z.boolean(), perm: z.boolean(), keratin: z.boolean(), details: text(300) }).strict(),
    vividDyes: answerWith(300),
    previousReaction: answerWith(1000),
    scalpConditions: text(500),
    /** Private: only the client and the salon's team can read the hair history. */
    medicalNotes: text(1000),
  })
  .strict()
  .superRefine((h, ctx) => {
    if (h.previousReaction.answer === 'yes' && h.previousReaction.details.length === 0) {
      ctx.addIssue({ code: 'custom', path: ['previousReaction', 'details'], message: 'Tell us what happened and when' });
    }
  });
export type HairHistory = z.infer<typeof HairHistorySchema>;

/**
 * What a blank form starts from. The reaction question starts unanswered, so nobody says "no" by leaving it be:
 * the form requires an answer before it saves.
 */
export function emptyHairHistory(): HairHistory {
  const none = { answer: 'no' as const, details: '' };
  const unanswered = { answer: undefined as unknown as HairAnswer, details: '' };
  return {
    currentColour: '',
    currentColourMethod: 'natural',
    pastServices: [],
    boxDye: { ...none },
    plantDyes: { ...none },
    structural: { relaxer: false, perm: false, keratin: false, details: '' },
    vividDyes: { ...none },
    previousReaction: unanswered,
    scalpConditions: '',
    medicalNotes: '',
  };
}

/** The saved answers, or null before the client fills the form in. */
export const HairHistoryResponseSchema = z.object({
  answers: HairHistorySchema.nullable(),
  updatedAt: InstantSchema.nullable(),
});
export type HairHistoryResponse = z.infer<typeof HairHistoryResponseSchema>;

/** Shown wherever a previous reaction is asked about or recorded. */
export const REACTION_CAUTION =
  'A previous reaction to hair colour means no colour service until the salon and a doctor have advised on it. ' +
  'A skin test is not a guarantee; local regulations and the colourist’s professional judgement come first.';
