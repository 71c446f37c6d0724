import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { Button } from '@client/components/ui/button';
import { FreeTimePicker } from '@client/components/ui/free-time-picker';
import { LoadingState } from '@client/components/ui/loading-state';
import { Notice } from '@client/components/ui/notice';
import { SectionCard } from '@client/components/ui/section-card';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { problemText } from '@client/lib/api-error';
import { sittingLabel } from '@client/lib/booking-labels';
import { dayAfterLast, freeTimeKey, type FreeTime } from '@client/lib/free-times';
import { formatDate, formatRange, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { bookingQueries } from '@client/features/bookings/api/booking-queries';
import { useMoveSitting } from '@client/features/bookings/api/booking-mutations';

type Props = {
  booking: BookingView;
  timeZone: string;
  stylists: { id: string; name: string }[];
  /** Opened for one sitting, with free times from a date (the "another day" fix of a client kept waiting). */
  initial?: { sitting: number; from?: string };
};

const when = (iso: string, zone: string) => `${formatDate(iso, formatFor(zone), { width: 'short' })}, ${formatTime(iso, formatFor(zone))}`;

/**
 * Move one sitting: the engine's free times for it (with the same stylist, or another for a one-sitting booking),
 * picked and confirmed. The server checks again on the move and its reason for a refusal shows by the button.
 */
export function MoveSittingForm({ booking, timeZone, stylists, initial }: Props) {
  const move = useMoveSitting();
  const [seq, setSeq] = useState(initial?.sitting ?? 1);
  const [stylistId, setStylistId] = useState('');
  const [from, setFrom] = useState(initial?.from ?? '');
  const [picked, setPicked] = useState<FreeTime | null>(null);
  const [moved, setMoved] = useState<{ was: BookingView['sittings'][number]; now: BookingView['sittings'][number] } | null>(null);
  const ask = { sitting: seq, stylistId: stylistId || undefined, from: from || undefined };
  const times = useQuery(bookingQueries.moveTimes(booking.id, ask));
  const sitting = booking.sittings.find((s) => s.seq === seq) ?? booking.sittings[0];
  // A booking without sittings has nothing to move (every hook is above this line).
  if (!sitting) return null;
  const oneSitting = booking.sittings.length === 1;
  const others = stylists.filter((s) => s.id !== booking.stylist.id);
  // A new question starts a new pick: an old pick may not be free for the new sitting or stylist.
  const change = (apply: () => void) => {
    apply();
    setPicked(null);
    setMoved(null);
    move.reset();
  };
  const confirm = () => {
    if (!picked) return;
    const was = sitting;
    move.mutateAsync({ bookingId: booking.id, sitting: seq, start: picked.start, stylistId: stylistId || undefined }).then(
      (after) => {
        const now = after.sittings.find((s) => s.seq === seq);
        if (now) setMoved({ was, now });
        setPicked(null);
      },
      () => undefined,
    );
  };
  const laterFrom = times.data ? dayAfterLast(times.data.times, timeZone) : undefined;

  return (
    <SectionCard title="Move a sitting">
      <div className="flex flex-col gap-4">
        <div className="grid gap-4 sm:grid-cols-2">
          {!oneSitting && (
            <SelectField
              label="Sitting"
              value={String(seq)}
              options={booking.sittings.map((s) => ({ value: String(s.seq), label: sittingLabel(s.seq, s.of) ?? 'The sitting' }))}
              onChange={(event) => change(() => setSeq(Number(event.target.value)))}
            />
          )}
          {oneSitting && (
            <SelectField
              label="Stylist"
              value={stylistId}
              options={[{ value: '', label: `Same stylist (${booking.stylist.name})` }, ...others.map((s) => ({ value: s.id, label: s.name }))]}
              onChange={(event) => change(() => setStylistId(event.target.value))}
            />
          )}
          <TextField
            label="Show times from"
            type="date"
            value={from}
            hint="Leave empty for the first days the sitting may move to"
            onChange={(event) => change(() => setFrom(event.target.value))}
          />
        </div>
        <p className="text-sm">
          Now: {formatDate(sitting.start, formatFor(timeZone), { width: 'short' })},{' '}
          <span className="tabular">{formatRange(sitting.start, sitting.end, formatFor(timeZone))}</span> · {sitting.chairName}
          {!oneSitting && ' · all sittings stay with one stylist'}
        </p>
        {times.isPending && <LoadingState label="Finding free times…" />}
        {times.isError && (
          <Notice tone="danger" title="Free times could not be found">
            {problemText(times.error)}
          </Notice>
        )}
        {times.data && times.data.times.length === 0 && (
          <p>No free times in these three weeks for this sitting{from ? ' from that date' : ''}. Try a later date or another stylist.</p>
        )}
        {times.data && times.data.times.length > 0 && (
          <FreeTimePicker
            key={`${seq}|${stylistId}|${from}`}
            times={times.data.times}
            timeZone={timeZone}
            selectedKey={picked ? freeTimeKey(picked) : null}
            onSelect={(time) => {
              setPicked(time);
              setMoved(null);
              move.reset();
            }}
            onLater={laterFrom ? () => change(() => setFrom(laterFrom)) : undefined}
            showStylist={false}
          />
        )}
        <div className="flex flex-col gap-3" aria-live="polite">
          <Button className="self-start" busy={move.isPending} disabled={!picked} onClick={confirm}>
            {picked ? `Move to ${when(picked.start, timeZone)}` : 'Pick a free time to move to'}
          </Button>
          {move.isError && (
            <Notice tone="danger" title="This move is not possible">
              {problemText(move.error)}
            </Notice>
          )}
          {moved && (
            <Notice tone="info" title={`Moved to ${when(moved.now.start, timeZone)}.`}>
              {moved.now.chairId === moved.was.chairId
                ? `Still in ${moved.now.chairName}. The calendar and the history show the new time.`
                : `${moved.was.chairName} is taken then, so the sitting is now in ${moved.now.chairName}.`}
            </Notice>
          )}
        </div>
      </div>
    </SectionCard>
  );
}
