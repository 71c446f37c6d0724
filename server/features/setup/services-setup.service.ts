import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { ServiceInput, SetupService } from '@shared/schemas/setup.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { writeAudit } from '../audit';
import { findSalon } from '../salon';
import { assertWithinProcessingLimits } from '../planning';
import { affectedMessage } from './affected-message';
import { uniqueName } from '@server/lib/unique-name';
import { listFutureBookings } from './future-bookings.repository';
import { insertService, listSetupServices, listSkills, retireService, updateService } from './services-setup.repository';

async function one(db: Db, salonId: string, id: string): Promise<SetupService> {
  const found = (await listSetupServices(db, salonId, new Date())).find((s) => s.id === id);
  if (!found) throw notFound('That service');
  return found;
}

/** Every service, retired ones too, and the skills stylists have (what a service can ask for). */
export async function setupServices(db: Db, salonId: string, now: Date): Promise<{ services: SetupService[]; skills: string[] }> {
  const [services, skills] = await Promise.all([listSetupServices(db, salonId, now), listSkills(db, salonId)]);
  return { services, skills };
}

export async function addService(db: Db, user: SessionUser, input: ServiceInput): Promise<SetupService> {
  assertWithinProcessingLimits(input.stepPlan, (await findSalon(db, user.salonId)).processingLimits);
  const id = await uniqueName(insertService(db, user.salonId, input), 'service');
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'service', entityId: id, action: 'added', after: input });
  return one(db, user.salonId, id);
}

/** Changes a service; bookings already made keep their own copy of its plan. */
export async function changeService(db: Db, user: SessionUser, id: string, input: ServiceInput): Promise<SetupService> {
  const before = await one(db, user.salonId, id);
  assertWithinProcessingLimits(input.stepPlan, (await findSalon(db, user.salonId)).processingLimits);
  await uniqueName(updateService(db, user.salonId, id, input), 'service');
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'service', entityId: id, action: 'changed', before, after: input });
  return one(db, user.salonId, id);
}

/** Takes a service off the menu; refused while it has future bookings. */
export async function takeServiceOffMenu(db: Db, user: SessionUser, id: string): Promise<void> {
  const service = await one(db, user.salonId, id);
  const salon = await findSalon(db, user.salonId);
  const future = await listFutureBookings(db, user.salonId, { serviceId: id }, new Date());
  if (future.length > 0) {
    throw new AppError('CONFLICT', 409, affectedMessage(`${service.name} still has`, future, salon.timeZone) + ' Move or cancel them first.');
  }
  await retireService(db, user.salonId, id);
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'service', entityId: id, action: 'taken off the menu', before: service });
}
