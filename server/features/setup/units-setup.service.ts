import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { AffectedBooking, OutOfServiceInput, Unit, UnitKind } from '@shared/schemas/setup.schemas';
import { notFound } from '@server/lib/app-error';
import { writeAudit } from '../audit';
import { findSalon } from '../salon';
import { withFreeStylists } from './free-stylists.service';
import { listFutureBookings } from './future-bookings.repository';
import { uniqueName } from '@server/lib/unique-name';
import { deleteOutOfService, insertOutOfService, insertUnit, listUnits, renameUnit, unitExists } from './units-setup.repository';

type Units = Record<UnitKind, Unit[]>;
const singular = (kind: UnitKind) => (kind === 'chairs' ? 'chair' : 'basin');

async function assertUnit(db: Db, salonId: string, kind: UnitKind, id: string): Promise<void> {
  if (!(await unitExists(db, salonId, kind, id))) throw notFound(`That ${singular(kind)}`);
}

/** Whole days in salon time: from 00:00 of the first to 00:00 after the last. */
async function period(db: Db, salonId: string, from: string, to: string) {
  const salon = await findSalon(db, salonId);
  return {
    salon,
    start: DateTime.fromISO(from, { zone: salon.timeZone }).toJSDate(),
    end: DateTime.fromISO(to, { zone: salon.timeZone }).plus({ days: 1 }).toJSDate(),
  };
}

async function affected(db: Db, salonId: string, kind: UnitKind, id: string, from: string, to: string): Promise<AffectedBooking[]> {
  const { salon, start, end } = await period(db, salonId, from, to);
  const filter = kind === 'chairs' ? { chairId: id, during: [start, end] as [Date, Date] } : { basinId: id, during: [start, end] as [Date, Date] };
  const now = new Date();
  return withFreeStylists(db, salonId, salon.timeZone, await listFutureBookings(db, salonId, filter, now), now);
}

export function unitsOf(db: Db, salonId: string, now: Date): Promise<Units> {
  return listUnits(db, salonId, now);
}

export async function addUnit(db: Db, user: SessionUser, kind: UnitKind, name: string): Promise<Units> {
  const id = await uniqueName(insertUnit(db, user.salonId, kind, name), singular(kind));
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: singular(kind), entityId: id, action: 'added', after: { name } });
  return listUnits(db, user.salonId, new Date());
}

export async function renameUnitOf(db: Db, user: SessionUser, kind: UnitKind, id: string, name: string): Promise<Units> {
  await assertUnit(db, user.salonId, kind, id);
  await uniqueName(renameUnit(db, user.salonId, kind, id, name), singular(kind));
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: singular(kind), entityId: id, action: 'renamed', after: { name } });
  return listUnits(db, user.salonId, new Date());
}

/** Future bookings that use the chair or basin during the days, each with the stylists free to take it. */
export async function unitAffected(
  db: Db,
  salonId: string,
  kind: UnitKind,
  id: string,
  days: { from: string; to: string },
): Promise<{ bookings: AffectedBooking[] }> {
  await assertUnit(db, salonId, kind, id);
  return { bookings: await affected(db, salonId, kind, id, days.from, days.to) };
}

/** Takes the unit out of service for whole days; answers the future bookings that still use it. */
export async function takeOutOfService(
  db: Db,
  user: SessionUser,
  kind: UnitKind,
  id: string,
  input: OutOfServiceInput,
): Promise<{ bookings: AffectedBooking[] }> {
  await assertUnit(db, user.salonId, kind, id);
  const { start, end } = await period(db, user.salonId, input.from, input.to);
  await insertOutOfService(db, user.salonId, kind, id, start, end, input.reason);
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: singular(kind), entityId: id, action: 'out of service', after: input });
  return { bookings: await affected(db, user.salonId, kind, id, input.from, input.to) };
}

export async function backInService(db: Db, salonId: string, kind: UnitKind, id: string, entryId: string): Promise<void> {
  if (!(await deleteOutOfService(db, salonId, kind, id, entryId))) throw notFound('That out-of-service period');
}
