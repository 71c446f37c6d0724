import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { findSalon } from './salon.repository';

/** The salon a signed-in user belongs to. */
export function salonOf(db: Db, user: { salonId: string }): Promise<Salon> {
  return findSalon(db, user.salonId);
}
