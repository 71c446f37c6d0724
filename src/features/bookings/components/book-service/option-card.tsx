import type { BookingOption } from '@shared/schemas/booking.schemas';
import { Button } from '@client/components/ui/button';
import { StepStrip } from '@client/components/ui/step-strip';
import { sittingLabel } from '@client/lib/booking-labels';
import { formatDate, formatRange, formatDuration } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = { option: BookingOption; timeZone: string; busy: boolean; disabled: boolean; onBook: () => void };

/** One way to book the service: who, each sitting's day and times, and what it costs in chair and hands-free time. */
export function OptionCard({ option, timeZone, busy, disabled, onBook }: Props) {
  const first = option.sittings[0];
  const summary = first
    ? `${formatDate(first.start, formatFor(timeZone), { width: 'short' })}, ${formatRange(first.start, first.end, formatFor(timeZone))}`
    : '';
  return (
    <article aria-label={`${option.stylistName}, from ${summary}`} className="flex flex-col gap-3 rounded-2xl bg-white p-4 shadow-sm ring-1 ring-ink/15">
      <h3 className="text-lg font-bold">{option.stylistName}</h3>
      <ol className="flex flex-col gap-3">
        {option.sittings.map((sitting, i) => (
          <li key={sitting.start} className="flex flex-col gap-1">
            {option.sittings.length > 1 && <span className="text-sm font-bold">{sittingLabel(i + 1, option.sittings.length)}</span>}
            <span>{formatDate(sitting.start, formatFor(timeZone), { width: 'short' })}</span>
            <span className="tabular">
              {formatRange(sitting.start, sitting.end, formatFor(timeZone))} · {sitting.chairName}
            </span>
            <StepStrip steps={sitting.steps} timeZone={timeZone} />
          </li>
        ))}
      </ol>
      <dl className="grid grid-cols-[1fr_auto] gap-x-3 text-sm tabular">
        <dt>Chair time</dt>
        <dd className="font-bold">{formatDuration(option.chairMinutes)}</dd>
        <dt>Hands-free for others</dt>
        <dd className="font-bold">{formatDuration(option.handsFreeMinutes)}</dd>
      </dl>
      <Button className="mt-auto" busy={busy} disabled={disabled} onClick={onBook}>
        Book this
      </Button>
    </article>
  );
}
