import { DateTime } from 'luxon';
import type { ReactNode } from 'react';
import type { BookingView, SittingView } from '@shared/schemas/booking-view.schemas';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SittingStatusBadge } from '@client/components/ui/sitting-status-badge';
import { UndoTapButton, useSittingTap } from '@client/features/day-of-service';
import { DevelopingTimer, developingTiming, sittingProgress } from '@client/features/my-day';

type Props = { booking: BookingView; sitting: SittingView; timeZone: string; now: DateTime; today: boolean; children: ReactNode };

/**
 * One sitting on the desk's list: its status (and minutes late), Arrived while it is booked, No-show once the salon's
 * grace time has passed, Undo for a minute after the arrival, a refusal (such as the skin-test rule's) in words, and
 * the developing timer of a sitting under way.
 */
export function ArrivalRow({ booking, sitting, timeZone, now, today, children }: Props) {
  const tap = useSittingTap();
  const base = { bookingId: booking.id, seq: sitting.seq };
  const progress = sittingProgress(sitting, now);
  const noShowFrom = DateTime.fromISO(sitting.noShowFrom);
  const undo = tap.data?.undo ?? null;
  const who = `${booking.client.name}`;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-2">
        <p className="min-w-60 flex-1">{children}</p>
        <SittingStatusBadge status={sitting.status} lateMinutes={sitting.lateMinutes} />
        {today && sitting.status === 'booked' && (
          <>
            <Button className="min-h-12" busy={tap.isPending} onClick={() => tap.mutate({ ...base, action: 'arrive' })}>
              Arrived<span className="sr-only">: {who}</span>
            </Button>
            <Button
              variant="secondary"
              className="min-h-12"
              disabled={now < noShowFrom}
              busy={tap.isPending}
              onClick={() => tap.mutate({ ...base, action: 'no_show' })}
            >
              No-show<span className="sr-only">: {who}</span>
              {now < noShowFrom && <span className="text-sm font-normal"> from {formatTime(sitting.noShowFrom, formatFor(timeZone))}</span>}
            </Button>
          </>
        )}
        {undo && (
          <UndoTapButton until={undo.until} what={`the arrival of ${who}`} busy={tap.isPending} onUndo={() => tap.mutate({ ...base, action: 'undo' })} />
        )}
      </div>
      {tap.error && <FormAlert>{tap.error.message}</FormAlert>}
      {progress.state === 'in_progress' && progress.step.kind === 'developing' && sitting.status !== 'booked' && (
        <DevelopingTimer
          timing={developingTiming(sitting.steps, progress.index)}
          now={now}
          alert={{ key: `${booking.id}:${sitting.seq}:${progress.index + 1}`, label: `${who}: ${progress.step.label}` }}
        />
      )}
    </div>
  );
}
