import { useState } from 'react';
import type { BookingView, SittingView } from '@shared/schemas/booking-view.schemas';
import type { TapAction } from '@shared/schemas/day-of-service.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { unlockChime, UndoTapButton, useSittingTap, type SittingTap } from '@client/features/day-of-service';
import { TapReplanNote } from '@client/features/replan';
import type { SittingProgress } from '../timer-state';

type Props = { booking: BookingView; sitting: SittingView; progress: SittingProgress; timeZone: string };

const undoWords: Record<TapAction, string> = {
  arrive: 'the arrival',
  no_show: 'the no-show',
  start: 'the start',
  finish: 'the finish',
  finish_sitting: 'finishing the sitting',
};

/**
 * The stylist's one-tap buttons for a sitting: start or finish the step at hand (large targets for a tablet at the
 * station or a phone), Undo for a minute after each tap, and finishing early with a reason.
 */
export function SittingTaps({ booking, sitting, progress, timeZone }: Props) {
  const tap = useSittingTap();
  const [early, setEarly] = useState(false);
  const [reason, setReason] = useState('');
  const base = { bookingId: booking.id, seq: sitting.seq };
  const send = (t: SittingTap) => {
    unlockChime(); // a tap is the click browsers want before a page may chime
    tap.mutate(t);
  };
  const undo = tap.data?.undo ?? null;

  if (sitting.status === 'booked') return <p className="text-ink/80">Waiting for the front desk to mark the arrival.</p>;
  return (
    <div className="flex flex-col gap-3">
      {tap.error && <FormAlert>{tap.error.message}</FormAlert>}
      {tap.data && 'replan' in tap.data && <TapReplanNote replan={tap.data.replan} bookingId={booking.id} timeZone={timeZone} />}
      <div className="flex flex-wrap items-center gap-3">
        {progress.state === 'ready' && (
          <Button className="min-h-14 flex-1 text-lg" busy={tap.isPending} onClick={() => send({ ...base, action: 'start', step: progress.index + 1 })}>
            Start step {progress.index + 1}: {progress.next.label}
          </Button>
        )}
        {progress.state === 'in_progress' && (
          <Button className="min-h-14 flex-1 text-lg" busy={tap.isPending} onClick={() => send({ ...base, action: 'finish', step: progress.index + 1 })}>
            Finish step {progress.index + 1}: {progress.step.label}
          </Button>
        )}
        {undo && <UndoTapButton until={undo.until} what={undoWords[undo.action]} busy={tap.isPending} onUndo={() => send({ ...base, action: 'undo' })} />}
      </div>
      {(progress.state === 'ready' || progress.state === 'in_progress') &&
        (early ? (
          <form
            className="flex flex-col gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              send({ ...base, action: 'finish_sitting', reason });
            }}
          >
            <TextAreaField label="Why does the sitting end with steps left open?" value={reason} onChange={(e) => setReason(e.target.value)} rows={2} />
            <div className="flex flex-wrap gap-3">
              <Button type="submit" variant="secondary" className="min-h-12" busy={tap.isPending}>
                Finish with steps left open
              </Button>
              <Button variant="quiet" className="min-h-12" onClick={() => setEarly(false)}>
                Keep going
              </Button>
            </div>
          </form>
        ) : (
          <Button variant="quiet" className="min-h-12 self-start" onClick={() => setEarly(true)}>
            Finish the sitting early…
          </Button>
        ))}
    </div>
  );
}
