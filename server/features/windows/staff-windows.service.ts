import type { z } from 'zod';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { WindowListSchema, WindowsQuerySchema } from '@shared/schemas/window.schemas';
import { findSalon } from '../salon';
import { findStaffIdForUser } from '../bookings';
import { todayIn } from '../bookings';
import { listWindowViews } from './windows.service';

/**
 * The windows a team member asks for (today unless a date is given): a stylist sees their own, the desk and
 * owner any stylist's, or all. Kept apart from windows.service.ts, which holds the engine call.
 */
export async function windowsForStaff(
  db: Db,
  user: SessionUser,
  query: z.infer<typeof WindowsQuerySchema>,
  now: Date,
): Promise<z.infer<typeof WindowListSchema>> {
  const salon = await findSalon(db, user.salonId);
  const stylistId = user.role === 'stylist' ? ((await findStaffIdForUser(db, user.id)) ?? 'none') : query.stylistId;
  return { timeZone: salon.timeZone, ...(await listWindowViews(db, salon, query.date ?? todayIn(salon.timeZone), stylistId, now)) };
}
