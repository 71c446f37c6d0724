import { ON_TIME_MINUTES, type Timekeeping } from '@shared/schemas/utilisation.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { formatDuration } from '@shared/format/date-time';
import { StatTile } from '@client/features/owner';
import { hoursText, percentText } from './chart-labels';
import type { ReactNode } from 'react';

type Props = { timekeeping: Timekeeping; children?: ReactNode };

/** Plan against actual for the salon (the owner's per-stylist chart and table go below it as `children`). */
export function TimekeepingSummary({ timekeeping: t, children }: Props) {
  return (
    <SectionCard title="On time and overruns">
      <div className="flex flex-col gap-4">
        <p className="text-sm text-ink/80">
          Finished sittings with tapped step times only. On time: the first step started no later than {ON_TIME_MINUTES} minutes after its planned start.
          Overrun: how much longer a sitting ran, from its first step’s start to its last step’s end, than its planned length (shorter ones count 0).
        </p>
        <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          <StatTile label="On-time rate" value={percentText(t.onTimeRate)} note={`${t.onTime} of ${t.sittings} timed sittings`} />
          <StatTile
            label="Overrun"
            value={formatDuration(Math.round(t.overrunMinutes))}
            note={t.overrunPerSitting === null ? 'no timed sittings' : `${Math.round(t.overrunPerSitting)} min a sitting on average`}
          />
          <StatTile label="Chair time, actual" value={hoursText(t.actualChairHours)} note={`planned ${hoursText(t.plannedChairHours)} for the same sittings`} />
          <StatTile label="Late starts after a late arrival" value={String(t.lateArrivals)} note={`the client came more than ${ON_TIME_MINUTES} min late`} />
        </dl>
        {children}
      </div>
    </SectionCard>
  );
}
