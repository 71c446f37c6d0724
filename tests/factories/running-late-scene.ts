import type { Db } from '@server/db/database';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { middayZone } from './day-of-service';
import { ALL_DAY, atMinute, bookStepsAt, gridBase, openAroundTheClock } from './replan-day';
import { insertSalon } from './salon';
import { insertPlannedService } from './service';
import { insertUser } from './user';

/** Apply 20 min, develop 20–40 min (booked at 40), rinse 10 min. */
export const glossPlan: StepPlan = {
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
export const cutPlan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Cut', product: 'none', minutes: 30 }] }] };

export interface RunningLateScene {
  deskEmail: string;
  stylistEmail: string;
  runningBooking: string;
  laterBooking: string;
}

/**
 * A salon of its own (open around the clock, at about midday in its zone, so the demo salon stays as loaded): a desk,
 * a stylist with a gloss booked from minute `glossFrom` (apply 20, develop 40, rinse 10) whose client arrived five
 * minutes before it, the later client's 30-minute cut right after the rinse, and a second stylist free to take a
 * client over. Minutes count from `base` (the current 5-minute mark unless given); the later client takes texts and e-mail.
 */
export async function runningLateScene(
  db: Db,
  input: { runningName: string; laterName: string; laterPhone: string; glossFrom: number; base?: number },
): Promise<RunningLateScene> {
  const base = input.base ?? gridBase();
  const from = input.glossFrom;
  const salon = await insertSalon(db, { timeZone: middayZone(), chairs: 2, basins: 1 });
  await openAroundTheClock(db, salon.salonId);
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const stylist = await insertUser(db, salon.salonId, 'stylist', { hours: ALL_DAY });
  await insertUser(db, salon.salonId, 'stylist', { hours: ALL_DAY }); // free to take a client over
  const running = await insertUser(db, salon.salonId, 'client');
  const later = await insertUser(db, salon.salonId, 'client');
  await db.updateTable('clients').set({ name: input.runningName }).where('id', '=', running.clientId!).execute();
  await db.updateTable('clients').set({ name: input.laterName, phone: input.laterPhone, message_channel: 'both' }).where('id', '=', later.clientId!).execute();
  const gloss = await insertPlannedService(db, salon.salonId, { plan: glossPlan, name: 'Gloss' });
  const cut = await insertPlannedService(db, salon.salonId, { plan: cutPlan, name: 'Cut' });
  const [chair1, chair2] = salon.chairs;
  const runningBooking = await bookStepsAt(db, {
    salonId: salon.salonId,
    serviceId: gloss,
    stylistId: stylist.staffId!,
    clientId: running.clientId!,
    chairId: chair1!,
    plan: glossPlan,
    base,
    steps: [
      { kind: 'hands_on', label: 'Apply gloss', from, to: from + 20 },
      { kind: 'developing', label: 'Gloss develops', from: from + 20, to: from + 60 },
      { kind: 'basin', label: 'Rinse', from: from + 60, to: from + 70, basinId: salon.basins[0] },
    ],
  });
  // The desk's arrival tap, written here.
  await db
    .updateTable('sittings')
    .set({ status: 'arrived', arrived_at: atMinute(from - 5, base), late_minutes: 0 })
    .where('booking_id', '=', runningBooking)
    .execute();
  await db.updateTable('bookings').set({ status: 'checked_in' }).where('id', '=', runningBooking).execute();
  const laterBooking = await bookStepsAt(db, {
    salonId: salon.salonId,
    serviceId: cut,
    stylistId: stylist.staffId!,
    clientId: later.clientId!,
    chairId: chair2!,
    plan: cutPlan,
    base,
    steps: [{ kind: 'hands_on', label: 'Cut', from: from + 70, to: from + 100 }],
  });
  return { deskEmail: desk.email, stylistEmail: stylist.email, runningBooking, laterBooking };
}
