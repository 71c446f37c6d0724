import { useEffect, useId, useRef, useState } from 'react';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { Button } from '@client/components/ui/button';
import { isPast } from '@client/lib/time';
import { CancelPanel } from './cancel-panel';
import { MovePanel } from './move-panel';

type Props = { booking: BookingView };

/**
 * What a client can do with their own upcoming booking: move it or cancel it. Each
 * opens below the card, one at a time, so there is one thing to confirm. When done,
 * focus goes to the outcome (the panel and its buttons are gone).
 */
export function MyBookingActions({ booking }: Props) {
  const [open, setOpen] = useState<'move' | 'cancel' | null>(null);
  const [outcome, setOutcome] = useState<string | null>(null);
  const outcomeRef = useRef<HTMLParagraphElement>(null);
  const panelId = useId();
  useEffect(() => {
    if (outcome) outcomeRef.current?.focus();
  }, [outcome]);

  const first = booking.sittings[0];
  const actionable = booking.status === 'booked' && first !== undefined && !isPast(first.start);
  const toggle = (which: 'move' | 'cancel') => {
    setOutcome(null);
    setOpen(open === which ? null : which);
  };
  const done = (message: string) => {
    setOpen(null);
    setOutcome(message);
  };
  return (
    <div className="mt-3 flex flex-col gap-3 empty:hidden">
      {outcome && (
        <p ref={outcomeRef} tabIndex={-1} role="status" className="rounded-lg border-l-4 border-sage bg-linen px-3 py-2 font-bold">
          {outcome}
        </p>
      )}
      {actionable && (
        <div className="flex flex-wrap gap-2 border-t border-ink/10 pt-3">
          <Button variant="secondary" aria-expanded={open === 'move'} aria-controls={panelId} onClick={() => toggle('move')}>
            Move booking
          </Button>
          <Button variant="secondary" aria-expanded={open === 'cancel'} aria-controls={panelId} onClick={() => toggle('cancel')}>
            Cancel booking
          </Button>
        </div>
      )}
      {actionable && (
        <div id={panelId}>
          {open === 'move' && <MovePanel bookingId={booking.id} onClose={() => setOpen(null)} onMoved={() => done('Your booking was moved.')} />}
          {open === 'cancel' && <CancelPanel bookingId={booking.id} onClose={() => setOpen(null)} onCancelled={() => done('Your booking was cancelled.')} />}
        </div>
      )}
    </div>
  );
}
