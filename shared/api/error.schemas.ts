import { z } from 'zod';
import { ERROR_CODES } from './error-codes';

/** The one error shape of the API: `{ error: { code, message, fields? } }`. */
export const ApiErrorBodySchema = z.object({
  error: z.object({
    code: z.enum(ERROR_CODES),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    /** The request's id, as in the `X-Request-Id` header and the server's log line for it. */
    requestId: z.string().optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof ApiErrorBodySchema>;
