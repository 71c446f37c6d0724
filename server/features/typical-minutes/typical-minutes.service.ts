import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { TYPICAL_LAST_VISITS, TYPICAL_MIN_VISITS, type TypicalFigure, type TypicalMinutes, type TypicalStep } from '@shared/schemas/typical-minutes.schemas';
import { forbidden, notFound } from '@server/lib/app-error';
import { findStaffIdForUser } from '../bookings';
import { serviceInSalon, typicalStepMinutes, type TypicalRow } from './typical-minutes.repository';

/** Too few visits give no number: one odd visit is not "typical". */
const figure = (row: TypicalRow): TypicalFigure =>
  row.visits < TYPICAL_MIN_VISITS
    ? { visits: row.visits, medianMinutes: null, p80Minutes: null }
    : { visits: row.visits, medianMinutes: row.median, p80Minutes: row.p80 };

/**
 * The typical actual minutes of a service's steps. The owner may ask about any stylist (or all); a stylist reads the
 * salon's figures and their own, never a colleague's.
 */
export async function typicalMinutesFor(db: Db, user: SessionUser, serviceId: string, asked: string | undefined): Promise<TypicalMinutes> {
  if (!(await serviceInSalon(db, user.salonId, serviceId))) throw notFound('That service');
  let stylistId = asked ?? null;
  if (user.role === 'stylist') {
    const own = (await findStaffIdForUser(db, user.id)) ?? null;
    if (asked && asked !== own) throw forbidden();
    stylistId = own;
  }
  const rows = await typicalStepMinutes(db, { salonId: user.salonId, serviceId, lastVisits: TYPICAL_LAST_VISITS, stylistId });
  const steps = new Map<string, TypicalStep>();
  for (const row of rows) {
    const key = JSON.stringify([row.sitting, row.label, row.occurrence]);
    const step = steps.get(key) ?? {
      sitting: row.sitting,
      label: row.label,
      occurrence: row.occurrence,
      salon: { visits: 0, medianMinutes: null, p80Minutes: null },
      stylists: [],
    };
    if (row.stylistId === null) step.salon = figure(row);
    else step.stylists.push({ stylistId: row.stylistId, name: row.stylistName ?? 'Former stylist', ...figure(row) });
    steps.set(key, step);
  }
  return { serviceId, lastVisits: TYPICAL_LAST_VISITS, minVisits: TYPICAL_MIN_VISITS, forStylistId: stylistId, steps: [...steps.values()] };
}
