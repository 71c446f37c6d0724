import { z } from 'zod';
import { IdSchema, RoleSchema } from './common.schemas';
import { EmailSchema, PhoneSchema } from './contact.schemas';

export const PASSWORD_MIN_LENGTH = 10;

const PasswordSchema = z.string().min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`).max(200, 'Use at most 200 characters');

export const SignInBodySchema = z.object({ email: EmailSchema, password: z.string().min(1).max(200) }).strict();
export type SignInBody = z.infer<typeof SignInBodySchema>;

export const SignUpBodySchema = z
  .object({
    name: z.string().trim().min(1, 'Enter your name').max(120),
    email: EmailSchema,
    // Stored in E.164: what SMS reminders and an inbound STOP are matched on.
    phone: PhoneSchema,
    password: PasswordSchema,
    salonSlug: z.string().max(80).optional(),
  })
  .strict();
export type SignUpBody = z.infer<typeof SignUpBodySchema>;

export const PasswordResetRequestSchema = z.object({ email: EmailSchema }).strict();
export const PasswordResetConfirmSchema = z.object({ token: z.string().min(20).max(200), password: PasswordSchema }).strict();

export const SessionUserSchema = z.object({
  id: IdSchema,
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  salonId: IdSchema,
});
export type SessionUser = z.infer<typeof SessionUserSchema>;
export const SessionResponseSchema = z.object({ user: SessionUserSchema });
export const CsrfResponseSchema = z.object({ token: z.string() });
