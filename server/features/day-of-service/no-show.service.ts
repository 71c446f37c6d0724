import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SittingRun } from '@shared/schemas/day-of-service.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { formatDateTime, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';
import { bookingStatusFor, noShowFrom } from '@shared/rules/sitting-status';
import { AppError } from '@server/lib/app-error';
import { depositOutcome } from '../bookings';
import { planClientMessage, replanBookingMessages } from '../messages';
import { settleDepositOutcome } from '../payments';
import { assertStillBooked } from './arrival.service';
import { releaseSitting, setDepositOutcome, setSittingState, type SittingForTap } from './sitting-run.repository';
import { runTap } from './sitting-tap.service';

/**
 * The client did not come. Only once the salon's grace time past the sitting's planned start has gone by; then the
 * sitting stops holding its chair, basin and the stylist's hands (the time shows as free), the deposit policy of a
 * cancellation applies as if cancelled now (inside any window, so the deposit is kept unless the salon keeps nothing),
 * and the client gets one message. Not undone with Undo: the message is on its way.
 */
export function markNoShow(db: Kysely<Database>, user: SessionUser, bookingId: string, seq: number, now: Date): Promise<SittingRun> {
  return runTap(db, { user, bookingId, seq, door: 'desk' }, now, async (trx: Db, salon, found) => {
    assertStillBooked(salon, found, 'marked a no-show');
    const from = noShowFrom(found.sitting.start, salon.noShowGraceMinutes);
    if (now < from) {
      throw new AppError(
        'CONFLICT',
        409,
        `A no-show can be marked from ${formatTime(from, formatFor(salon.timeZone))}, ${salon.noShowGraceMinutes} minutes after the planned start (the salon's grace time).`,
      );
    }
    await setSittingState(trx, found.sitting.id, { status: 'no_show', arrivedAt: null, lateMinutes: null, leftOpenReason: null });
    await releaseSitting(trx, found.sitting.id);
    const { booking } = found;
    const outcome =
      booking.depositOutcome ?? depositOutcome(booking.depositCents, found.sitting.start, now, salon.cancellationWindowHours, salon.cancellationKeeps);
    if (outcome && !booking.depositOutcome) {
      await setDepositOutcome(trx, booking.id, outcome);
      await settleDepositOutcome(trx, { bookingId: booking.id, outcome, actorUserId: user.id, why: `no-show at sitting ${seq}` });
    }
    if (booking.clientId) await planClientMessage(trx, noShowMessage(salon, found, outcome), now);
    // Nothing more is planned for a booking with no sitting left to come (its aftercare is dropped with the rest).
    const statuses = found.sittingStatuses.map((s, i) => (i === seq - 1 ? 'no_show' : s));
    if (bookingStatusFor(statuses) === 'no_show') await replanBookingMessages(trx, booking.id, now, 'moved');
    return { action: 'no_show', stepSeq: null, audit: `no-show: sitting ${seq}${outcome ? `, deposit ${outcome}` : ''}` };
  });
}

/** The one message a no-show sends: the missed time, what happens to the deposit, how to book again. */
function noShowMessage(salon: Salon, found: SittingForTap, outcome: 'kept' | 'refunded' | null) {
  const { booking, sitting } = found;
  const when = formatDateTime(sitting.start, formatFor(salon.timeZone), { zoneName: true });
  const amount = formatMoney(booking.depositCents, salon.currency);
  const deposit =
    outcome === 'kept' ? ` As our deposit policy says, the ${amount} deposit is kept.` : outcome === 'refunded' ? ` Your ${amount} deposit is refunded.` : '';
  const text = `${salon.name}: we missed you for your ${booking.serviceName} on ${when}.${deposit} To book again, open Dwell or call the salon.`;
  const name = booking.clientName.trim().split(/\s+/)[0] || 'there';
  return {
    salonId: salon.id,
    clientId: booking.clientId!,
    kind: 'no_show',
    key: `no_show:${booking.id}:${sitting.seq}`,
    subject: `We missed you: ${booking.serviceName}, ${when}`,
    email: `Hello ${name},\n\n${text}\n`,
    sms: text,
  };
}
