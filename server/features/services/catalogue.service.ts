import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { z } from 'zod';
import type { ServiceSummary, StylistListSchema } from '@shared/schemas/service.schemas';
import type { Db } from '@server/db/database';
import { listServices, listStylistDetails } from './services.repository';

/** The salon's active services with their step plans, by name. */
export async function salonServices(db: Db, user: SessionUser): Promise<{ services: ServiceSummary[] }> {
  return { services: await listServices(db, user.salonId) };
}

/** The salon's active stylists with their skills, by name. */
export async function salonStylists(db: Db, user: SessionUser): Promise<z.output<typeof StylistListSchema>> {
  return { stylists: await listStylistDetails(db, user.salonId) };
}
