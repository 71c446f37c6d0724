import type { Db } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { middayZone } from './day-of-service';
import { ALL_DAY, atMinute, bookStepsAt, openAroundTheClock } from './replan-day';
import { insertSalon } from './salon';
import { insertPlannedService } from './service';
import { insertUser } from './user';

/** Apply 20 min, develop 20–40 min (booked at 40), rinse 10 min. */
const glossPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply gloss', product: 'none', minutes: 20 },
        { kind: 'developing', label: 'Gloss develops', product: 'none', minMinutes: 20, maxMinutes: 40 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
      ],
    },
  ],
};
const cutPlan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Cut', product: 'none', minutes: 30 }] }] };

export type RunningLateDay = { deskEmail: string; stylistEmail: string; laterPhone: string };

/**
 * A salon of its own (open around the clock, at about midday in its zone, so the demo salon stays as loaded) where
 * a start on My day runs late: Robin Vale's gloss was booked from 20 minutes ago and she arrived on time, but nothing
 * has been started; Sasha Lind's cut with the same stylist follows the rinse. Starting Robin's first step now pushes
 * her developing time and rinse into Sasha's cut. A second stylist is free to take a client over.
 */
export async function insertRunningLateDay(db: Db, laterPhone = '+19705550188'): Promise<RunningLateDay> {
  const salon = await insertSalon(db, { timeZone: middayZone(), chairs: 2, basins: 1 });
  await openAroundTheClock(db, salon.salonId);
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const rowan = await insertUser(db, salon.salonId, 'stylist', { hours: ALL_DAY });
  await insertUser(db, salon.salonId, 'stylist', { hours: ALL_DAY }); // free to take a client over
  const running = await insertUser(db, salon.salonId, 'client');
  const later = await insertUser(db, salon.salonId, 'client');
  await db.updateTable('clients').set({ name: 'Robin Vale' }).where('id', '=', running.clientId!).execute();
  await db.updateTable('clients').set({ name: 'Sasha Lind', phone: laterPhone, message_channel: 'both' }).where('id', '=', later.clientId!).execute();
  const gloss = await insertPlannedService(db, salon.salonId, { plan: glossPlan, name: 'Gloss' });
  const cut = await insertPlannedService(db, salon.salonId, { plan: cutPlan, name: 'Cut' });
  const [chair1, chair2] = salon.chairs;
  const robin = await bookStepsAt(db, {
    salonId: salon.salonId,
    serviceId: gloss,
    stylistId: rowan.staffId!,
    clientId: running.clientId!,
    chairId: chair1!,
    plan: glossPlan,
    steps: [
      { kind: 'hands_on', label: 'Apply gloss', from: -20, to: 0 },
      { kind: 'developing', label: 'Gloss develops', from: 0, to: 40 },
      { kind: 'basin', label: 'Rinse', from: 40, to: 50, basinId: salon.basins[0] },
    ],
  });
  await db
    .updateTable('sittings')
    .set({ status: 'arrived', arrived_at: atMinute(-25), late_minutes: 0 })
    .where('booking_id', '=', robin)
    .execute();
  await db.updateTable('bookings').set({ status: 'checked_in' }).where('id', '=', robin).execute();
  await bookStepsAt(db, {
    salonId: salon.salonId,
    serviceId: cut,
    stylistId: rowan.staffId!,
    clientId: later.clientId!,
    chairId: chair2!,
    plan: cutPlan,
    steps: [{ kind: 'hands_on', label: 'Cut', from: 50, to: 80 }],
  });
  return { deskEmail: desk.email, stylistEmail: rowan.email, laterPhone };
}
