import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { Button } from '@client/components/ui/button';
import { whoseSitting } from '@client/lib/booking-labels';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import type { WeekEventData } from '../week-events';

/** The last drag the server accepted: the sitting as it was, and the booking as it is now. */
export type LastMove = { was: WeekEventData; booking: BookingView };

type Props = {
  move: LastMove;
  timeZone: string;
  /** Set once an undo was tried: what became of it. */
  undone: { ok: true } | { ok: false; reason: string } | null;
  undoing: boolean;
  onUndo: () => void;
  onClose: () => void;
};

const when = (iso: string, zone: string) => `${formatDate(iso, formatFor(zone), { width: 'short' })}, ${formatTime(iso, formatFor(zone))}`;

/**
 * Says what a drag did (and, when the sitting could not keep its chair, which chair it is in now), with Undo to
 * put it back where it was. It stays until closed or the next move: a change to someone's appointment should not
 * vanish before the desk has read it.
 */
export function MovedToast({ move, timeZone, undone, undoing, onUndo, onClose }: Props) {
  const { was, booking } = move;
  const now = booking.sittings.find((s) => s.seq === was.seq);
  const whose = whoseSitting(was.clientName, was.seq, was.of);
  const chairChanged = now && now.chairId !== was.chairId;
  return (
    <div
      role="status"
      className="fixed inset-x-3 bottom-3 z-50 flex flex-col gap-2 rounded-xl border-l-8 border-sage bg-white px-4 py-3 text-ink shadow-lg ring-1 ring-ink/20 sm:bottom-6 sm:left-auto sm:right-6 sm:max-w-md"
    >
      {undone?.ok ? (
        <p className="font-bold">
          Moved back: {whose} is at {when(was.start, timeZone)} in {was.chairName} again.
        </p>
      ) : (
        <>
          <p className="font-bold">
            Moved {whose} to {now ? when(now.start, timeZone) : 'its new time'}.
          </p>
          {chairChanged && (
            <p>
              {was.chairName} is taken then, so the sitting is now in {now.chairName}.
            </p>
          )}
          {undone && !undone.ok && <p>It could not be moved back: {undone.reason}</p>}
        </>
      )}
      <div className="flex flex-wrap gap-2">
        {!undone?.ok && (
          <Button variant="secondary" busy={undoing} onClick={onUndo}>
            Undo
          </Button>
        )}
        <Button variant="quiet" onClick={onClose}>
          Close
        </Button>
      </div>
    </div>
  );
}
