import type { DateTime } from 'luxon';
import { Link } from 'react-router-dom';
import type { BookingView, SittingView } from '@shared/schemas/booking-view.schemas';
import type { DayRunSittingView } from '@shared/schemas/replan.schemas';
import { BookingStatusBadge } from '@client/components/ui/booking-status-badge';
import { SittingStatusBadge } from '@client/components/ui/sitting-status-badge';
import { SkinTestFlag } from '@client/components/ui/skin-test-flag';
import { StepKindIcon } from '@client/components/ui/step-kind-icon';
import { StepStrip } from '@client/components/ui/step-strip';
import { sittingLabel, stepKindLabels } from '@client/lib/booking-labels';
import { formatRange, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { paths } from '@client/config/paths';
import { stepStartNow } from '../step-start';
import { developingTiming, sittingProgress } from '../timer-state';
import { DevelopingTimer } from './developing-timer';
import { SittingTaps } from './sitting-taps';

/** `run`: the sitting as the day now runs (re-planned from the actual times), for the times of the steps to come. */
type Props = { booking: BookingView; sitting: SittingView; run?: DayRunSittingView; timeZone: string; now: DateTime };

/** One client of the stylist's day: who, what, the step under way (with its timer while developing) and the taps. */
export function ClientDayCard({ booking, sitting, run, timeZone, now }: Props) {
  const progress = sittingProgress(sitting, now);
  const ofLabel = sittingLabel(sitting.seq, sitting.of);
  const zone = formatFor(timeZone);
  /** Step `index`'s start as the day now runs, with the planned time beside it when they differ. */
  const startOf = (planned: string, index: number) => {
    const when = stepStartNow(planned, run, index);
    return (
      <>
        <span className="tabular">{formatTime(when.at, zone)}</span>
        {when.planned && <span className="tabular text-ink/80"> (planned {formatTime(when.planned, zone)})</span>}
      </>
    );
  };
  return (
    <article
      aria-label={`${booking.client.name}, ${booking.service.name}`}
      className="flex flex-col gap-3 rounded-2xl bg-white p-4 shadow-sm ring-1 ring-ink/15"
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 className="text-lg font-bold">{booking.client.name}</h3>
          <p>
            {booking.service.name}
            {ofLabel && <span className="font-bold"> · {ofLabel}</span>}
          </p>
          <p className="text-sm text-ink/80 tabular">
            {formatRange(sitting.start, sitting.end, zone)} · {sitting.chairName}
          </p>
        </div>
        {sitting.status === 'booked' ? (
          <BookingStatusBadge status={booking.status} />
        ) : (
          <SittingStatusBadge status={sitting.status} lateMinutes={sitting.lateMinutes} />
        )}
        <SkinTestFlag skinTest={booking.skinTest} detailed />
      </div>
      <StepStrip steps={sitting.steps} timeZone={timeZone} />
      {progress.state === 'upcoming' && (
        <p>
          First step at {startOf(progress.next.start, 0)}: {progress.next.label}
        </p>
      )}
      {progress.state === 'finished' && <p className="text-ink/80">All steps done.</p>}
      {progress.state === 'ready' && (
        <p>
          <span className="font-bold">Next:</span> step {progress.index + 1}, {progress.next.label}
          {stepStartNow(progress.next.start, run, progress.index).planned ? (
            <> at {startOf(progress.next.start, progress.index)}</>
          ) : (
            <span className="tabular text-ink/80"> (planned {formatTime(progress.next.start, zone)})</span>
          )}
        </p>
      )}
      {progress.state === 'in_progress' && (
        <div className="flex flex-col gap-2">
          <p className="flex flex-wrap items-center gap-2">
            <span className="font-bold">Now:</span>
            <StepKindIcon kind={progress.step.kind} />
            <span className="font-bold">{stepKindLabels[progress.step.kind]}</span> — {progress.step.label}
            <span className="tabular text-ink/80">
              {progress.step.actualStart ? `since ${formatTime(progress.step.actualStart, zone)}` : `until ${formatTime(progress.step.end, zone)}`}
            </span>
          </p>
          {progress.step.kind === 'developing' && (
            <DevelopingTimer
              timing={developingTiming(sitting.steps, progress.index)}
              now={now}
              alert={{ key: `${booking.id}:${sitting.seq}:${progress.index + 1}`, label: `${booking.client.name}: ${progress.step.label}` }}
            />
          )}
          {progress.next && (
            <p className="text-sm text-ink/80">
              Next: {progress.next.label} at {startOf(progress.next.start, progress.index + 1)}
            </p>
          )}
        </div>
      )}
      <SittingTaps booking={booking} sitting={sitting} progress={progress} timeZone={timeZone} />
      <div className="flex flex-wrap gap-4">
        <Link to={paths.mixLog(booking.id, booking.client.id)} className="text-link">
          Mix log<span className="sr-only"> for {booking.client.name}</span>
        </Link>
        <Link to={paths.newConsultation(booking.client.id)} className="text-link">
          New consultation<span className="sr-only"> for {booking.client.name}</span>
        </Link>
      </div>
    </article>
  );
}
