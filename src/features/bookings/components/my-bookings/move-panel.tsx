import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { ActionBar } from '@client/components/ui/action-bar';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { FreeTimePicker } from '@client/components/ui/free-time-picker';
import { LoadingState } from '@client/components/ui/loading-state';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { problemText } from '@client/lib/api-error';
import { dayAfterLast, freeTimeKey, freeTimeLabel, type FreeTime } from '@client/lib/free-times';
import { myBookingQueries } from '@client/features/bookings/api/my-booking-queries';
import { useMoveMyBooking } from '@client/features/bookings/api/my-booking-mutations';

type Props = { bookingId: string; onClose: () => void; onMoved: () => void };

/** Moving: the engine's free times for the same service and stylist, one picked, then confirmed. */
export function MovePanel({ bookingId, onClose, onMoved }: Props) {
  const [from, setFrom] = useState<string | undefined>(undefined);
  const [picked, setPicked] = useState<FreeTime | null>(null);
  const times = useQuery(myBookingQueries.moveTimes(bookingId, from));
  const move = useMoveMyBooking(bookingId);
  if (times.isPending) return <LoadingState label="Finding free times…" />;
  if (times.isError) return <FormAlert>{problemText(times.error)}</FormAlert>;
  const { timeZone } = times.data;
  const laterFrom = dayAfterLast(times.data.times, timeZone);
  return (
    <div className="flex flex-col gap-3">
      <TimeZoneNote timeZone={timeZone} />
      <FreeTimePicker
        key={from ?? ''}
        times={times.data.times}
        timeZone={timeZone}
        selectedKey={picked ? freeTimeKey(picked) : null}
        onSelect={setPicked}
        onLater={laterFrom ? () => setFrom(laterFrom) : undefined}
        showStylist={false}
      />
      {move.isError && <FormAlert>{problemText(move.error)}</FormAlert>}
      <ActionBar>
        <p aria-live="polite" className="text-sm">
          {picked ? (
            <>
              Move to: <strong>{freeTimeLabel(picked, timeZone)}</strong>
            </>
          ) : (
            'Pick a new time above.'
          )}
        </p>
        <div className="flex flex-wrap gap-2">
          <Button busy={move.isPending} disabled={!picked} onClick={() => picked && move.mutateAsync(picked.start).then(onMoved, () => undefined)}>
            {move.isPending ? 'Moving…' : 'Move to this time'}
          </Button>
          <Button variant="secondary" onClick={onClose}>
            Keep the current time
          </Button>
        </div>
      </ActionBar>
    </div>
  );
}
