import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { ApplicableFix, FixApplied, ReplanFix } from '@shared/schemas/replan.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { bookingSnapshot, changeSittingChair, changeStepBasin, moveSittingIn, setDevelopingLength } from '../bookings';
import { sendDueMessages, tellRunningLate, type Senders } from '../messages';
import { bookableSteps, lockStylists, replanDayFor, replanDaysUnderWay, type OfferedFix, type StylistReplan } from '../planning';
import { findSalon } from '../salon';
import { readConflictSittings, type ConflictSittingRow } from './conflict-sittings.repository';
import { salonDayNow, summarise } from './replan-summary.service';

const stale = (why: string) => new AppError('STALE_FIX', 409, `${why} Nothing was changed; the list shows the day as it runs now.`);

/** The same fix: kind, sitting and what it changes (a late start's new start as an instant, whatever its offset text). */
function sameFix(a: ReplanFix, b: ReplanFix): boolean {
  if (a.kind !== b.kind || a.sittingId !== b.sittingId) return false;
  switch (a.kind) {
    case 'late_start':
      return b.kind === 'late_start' && a.minutesLate === b.minutesLate && Date.parse(a.start) === Date.parse(b.start);
    default:
      return JSON.stringify(Object.entries(a).sort()) === JSON.stringify(Object.entries(b).sort());
  }
}

/** The re-plan and conflict that offer this fix now, if any does. */
function offering(replans: StylistReplan[], fix: ReplanFix): { replan: StylistReplan; offered: OfferedFix } | null {
  for (const replan of replans) {
    for (const conflict of replan.conflicts) {
      const offered = conflict.fixes.find((f) => sameFix(f.fix, fix));
      if (offered) return { replan, offered };
    }
  }
  return null;
}

const RUNNING_LATE = 'running late';

/** Makes the fix through the service any other such change goes through; answers what was done, in words. */
async function make(trx: Db, salon: Salon, user: SessionUser, target: ConflictSittingRow, offered: OfferedFix, now: Date): Promise<string | null> {
  const fix = offered.fix as ApplicableFix;
  const base = { bookingId: target.bookingId, sittingId: target.sittingId, auditNote: RUNNING_LATE };
  switch (fix.kind) {
    case 'developing': {
      const steps = bookableSteps(offered.steps ?? [], salon.timeZone, salon.granularityMinutes);
      await setDevelopingLength(trx, salon, user.id, { ...base, stepId: fix.stepId, minutes: fix.minutes, steps });
      return null;
    }
    case 'chair':
      await changeSittingChair(trx, salon, user.id, { ...base, chairId: fix.chairId });
      return null;
    case 'basin':
      await changeStepBasin(trx, salon, user.id, { ...base, stepId: fix.stepId, basinId: fix.basinId });
      return null;
    case 'hand_over':
      // The desk's move with another stylist, at the sitting's own time and chair (a one-sitting booking: only those are offered).
      await moveSittingIn(
        trx,
        salon,
        user.id,
        { ...base, sitting: target.seq, start: target.start, stylistId: fix.stylistId, chairId: target.chairId, allowWaitingOnTest: true },
        now,
      );
      return null;
    case 'late_start': {
      const start = new Date(fix.start);
      const move = { ...base, sitting: target.seq, start, chairId: target.chairId, allowWaitingOnTest: true, notice: 'running_late' as const };
      await moveSittingIn(trx, salon, user.id, move, now);
      const told = await tellRunningLate(
        trx,
        {
          salon,
          bookingId: target.bookingId,
          sittingId: target.sittingId,
          clientId: target.clientId,
          clientName: target.clientName,
          minutesLate: fix.minutesLate,
          newStart: start,
          byUserId: user.id,
        },
        now,
      );
      if (told.sent) return null;
      return told.why === 'already_told' ? 'They had already been told of this delay.' : 'They could not be told now (no text or e-mail allowed): call them.';
    }
  }
}

/**
 * Applies one fix the re-plan offers for this booking, checked against the day as it runs now: the fix must be on
 * offer when it is made (a stale or forged one answers 409 and stores nothing). The stylists it touches are locked
 * and the day re-planned again under the locks before the change goes through the usual service, in one transaction.
 * What the client is told (a late start's notice, a hand-over's change notice) goes out at once after the commit; the
 * sweep would send it within the minute anyway.
 */
export async function applyReplanFix(
  db: Kysely<Database>,
  senders: Senders,
  user: SessionUser,
  bookingId: string,
  fix: ApplicableFix,
  now: Date,
): Promise<FixApplied> {
  const salon = await findSalon(db, user.salonId);
  const done = await db.transaction().execute(async (trx) => {
    const booking = await bookingSnapshot(trx, bookingId);
    if (!booking || booking.booking.salonId !== salon.id) throw notFound('That booking');
    const target = (await readConflictSittings(trx, salon.id, [fix.sittingId])).get(fix.sittingId);
    if (!target || target.bookingId !== bookingId) throw stale('That fix is not for a sitting of this booking.');
    const seen = offering(await replanDaysUnderWay(trx, salon, now), fix);
    if (!seen) throw stale(`That fix is no longer offered for ${target.clientName || 'this booking'}: the day has changed since it was shown.`);
    await lockStylists(trx, [seen.replan.stylistId, target.stylistId, ...(fix.kind === 'hand_over' ? [fix.stylistId] : [])]);
    const replan = await replanDayFor(trx, salon, seen.replan.stylistId, now);
    const sure = replan && offering([replan], fix);
    if (!sure) throw stale('The day changed a moment ago.');
    const summary = await summarise(trx, salon, [sure.replan]);
    const words = summary.conflicts.flatMap((c) => c.fixes).find((f) => sameFix(f.fix, fix))?.words ?? 'Fix applied';
    const note = await make(trx, salon, user, target, sure.offered, now);
    return note ? `${words}. ${note}` : `${words}: done.`;
  });
  void sendDueMessages(db, senders, now, bookingId).catch(() => undefined);
  return { done, day: await salonDayNow(db, salon, now) };
}
