import { z } from 'zod';
import { LocalDateSchema } from './common.schemas';
import { SalonSchema } from './salon.schemas';

/** The owner's first look at the salon: what exists and how the current week is used. */
export const OwnerOverviewSchema = z.object({
  salon: SalonSchema,
  counts: z.object({ stylists: z.number(), chairs: z.number(), basins: z.number(), services: z.number(), clients: z.number() }),
  week: z.object({
    from: LocalDateSchema,
    to: LocalDateSchema,
    bookings: z.number(),
    chairOccupancy: z.number().nullable(),
    windowUse: z.number().nullable(),
    handsOnShare: z.array(z.object({ stylist: z.string(), share: z.number().nullable() })),
  }),
});
export type OwnerOverview = z.infer<typeof OwnerOverviewSchema>;
