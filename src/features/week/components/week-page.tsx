import { lazy, Suspense, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { WeekView } from '../../../../shared/schemas/booking-view.schemas';
import { buttonClasses } from '../../../components/ui/button';
import { LoadingState } from '../../../components/ui/loading-state';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { SelectField } from '../../../components/ui/select-field';
import { StepKindLegend } from '../../../components/ui/step-kind-legend';
import { TimeZoneNote } from '../../../components/ui/time-zone-note';
import { paths } from '../../../config/paths';
import { formatLocalDate, shiftLocalDate } from '../../../lib/time';
import { useMoveSitting } from '../../bookings/api/booking-mutations';

// The calendar library is large: load it only on this page, after the frame.
const WeekCalendar = lazy(() => import('./week-calendar'));

type Props = { week: WeekView; stylistId: string; stylists: { id: string; name: string }[] };

/** One stylist's week: pick the stylist and week, drag a sitting to move it. */
export function WeekPage({ week, stylistId, stylists }: Props) {
  const navigate = useNavigate();
  const move = useMoveSitting();
  const [moved, setMoved] = useState<string | null>(null);
  const stylistName = stylists.find((s) => s.id === stylistId)?.name ?? '';
  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title={`Week of ${stylistName}`}
        subtitle={
          <>
            <p className="text-lg font-bold text-ink">
              {formatLocalDate(week.from)} – {formatLocalDate(shiftLocalDate(week.from, 6))}
            </p>
            <TimeZoneNote timeZone={week.timeZone} date={week.from} />
          </>
        }
      />
      <div className="flex flex-wrap items-end gap-3">
        <SelectField
          label="Stylist"
          value={stylistId}
          options={stylists.map((s) => ({ value: s.id, label: s.name }))}
          onChange={(event) => navigate(paths.deskWeek(week.from, event.target.value))}
        />
        <nav aria-label="Choose a week" className="flex flex-wrap gap-2">
          <Link to={paths.deskWeek(shiftLocalDate(week.from, -7), stylistId)} className={buttonClasses('secondary')}>
            <span aria-hidden="true">←</span> Previous week
          </Link>
          <Link to={paths.deskWeek(shiftLocalDate(week.from, 7), stylistId)} className={buttonClasses('secondary')}>
            Next week <span aria-hidden="true">→</span>
          </Link>
        </nav>
      </div>
      <StepKindLegend />
      <p className="text-sm text-ink/80">Drag a sitting to a new time to move it; Dwell checks the move before keeping it. Or open the booking and use Move.</p>
      {move.isError && (
        <Notice tone="danger" title="The sitting was not moved">
          {move.error.message}
        </Notice>
      )}
      {moved && !move.isError && <Notice tone="info" title={moved} />}
      <Suspense fallback={<LoadingState label="Loading the week…" />}>
        <WeekCalendar
          week={week}
          stylistId={stylistId}
          onMove={(body) => {
            setMoved(null);
            return move.mutateAsync(body).then((b) => setMoved(`Moved ${b.client.name}'s sitting ${body.sitting}.`));
          }}
        />
      </Suspense>
    </div>
  );
}
