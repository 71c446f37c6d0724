import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SalonSettings } from '@shared/schemas/salon-settings.schemas';
import { writeAudit } from '../audit';
import { assertServicesWithinNewLimits } from './processing-limits-change';
import { readSalonSettings, writeSalonSettings } from './salon-settings.repository';

export function salonSettings(db: Db, salonId: string): Promise<SalonSettings> {
  return readSalonSettings(db, salonId);
}

/** Changes the settings and opening hours in one transaction; a processing limit the menu breaks is refused. */
export async function saveSalonSettings(db: Db, user: SessionUser, settings: SalonSettings): Promise<SalonSettings> {
  return db.transaction().execute(async (trx) => {
    const before = await readSalonSettings(trx, user.salonId);
    await assertServicesWithinNewLimits(trx, user.salonId, before.processingLimits, settings.processingLimits);
    await writeSalonSettings(trx, user.salonId, settings);
    const after = await readSalonSettings(trx, user.salonId);
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'salon', entityId: user.salonId, action: 'settings changed', before, after });
    return after;
  });
}
