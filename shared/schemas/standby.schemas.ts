import { z } from 'zod';
import { IdSchema } from './common.schemas';

const clock = z.string().regex(/^\d{2}:\d{2}$/, 'Use a time like 09:30');

/** When a standby client can come at short notice: weekdays (1 = Monday … 7 = Sunday) and a time range. */
export const AvailabilitySchema = z
  .object({ weekdays: z.array(z.number().int().min(1).max(7)).min(1, 'Pick at least one day'), from: clock, to: clock })
  .strict()
  .refine((a) => a.from < a.to, { message: 'The end must be after the start', path: ['to'] });

export const CreateStandbySchema = z
  .object({
    clientId: IdSchema,
    serviceIds: z.array(IdSchema).min(1, 'Pick at least one service').max(10),
    stylistId: IdSchema.nullable(),
    availability: z.array(AvailabilitySchema).min(1).max(7),
    notes: z.string().max(1000).default(''),
  })
  .strict();
export type CreateStandby = z.input<typeof CreateStandbySchema>;

export const StandbyEntrySchema = z.object({
  id: IdSchema,
  client: z.object({ id: IdSchema, name: z.string(), phone: z.string().nullable(), email: z.string().nullable() }),
  services: z.array(z.object({ id: IdSchema, name: z.string() })),
  stylist: z.object({ id: IdSchema, name: z.string() }).nullable(),
  availability: z.array(AvailabilitySchema),
  notes: z.string(),
  createdAt: z.string(),
});
export type StandbyEntry = z.infer<typeof StandbyEntrySchema>;
export const StandbyListSchema = z.object({ entries: z.array(StandbyEntrySchema) });
