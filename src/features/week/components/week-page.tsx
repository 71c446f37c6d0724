import { ClosedKey } from '@client/components/ui/closed-key';
import { lazy, Suspense, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { WeekView } from '@shared/schemas/booking-view.schemas';
import { buttonClasses } from '@client/components/ui/button';
import { LoadingState } from '@client/components/ui/loading-state';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { SelectField } from '@client/components/ui/select-field';
import { StepKindLegend } from '@client/components/ui/step-kind-legend';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { paths } from '@client/config/paths';
import { problemText } from '@client/lib/api-error';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import { shiftLocalDate } from '@shared/time/salon-time';
import { useMoveSitting } from '@client/features/bookings';
import type { WeekDrop } from './week-calendar';
import { MovedToast, type LastMove } from './moved-toast';

// The calendar library is large: load it only on this page, after the frame.
const WeekCalendar = lazy(() => import('./week-calendar'));

/** `stylistId`: one stylist's week, or null for all stylists together. */
type Props = { week: WeekView; stylistId: string | null; stylists: { id: string; name: string }[] };

/** The week of one stylist or all: pick them and the week, drag a sitting to move it, undo a move. */
export function WeekPage({ week, stylistId, stylists }: Props) {
  const navigate = useNavigate();
  const move = useMoveSitting();
  const undo = useMoveSitting();
  const [last, setLast] = useState<LastMove | null>(null);
  const [undone, setUndone] = useState<{ ok: true } | { ok: false; reason: string } | null>(null);
  const stylistName = stylists.find((s) => s.id === stylistId)?.name;

  const onMove = async ({ bookingId, sitting, start, was }: WeekDrop) => {
    setLast(null);
    setUndone(null);
    const booking = await move.mutateAsync({ bookingId, sitting, start });
    setLast({ was, booking });
  };
  // Back to the old start, the old chair named so it is taken again when still free.
  const onUndo = () => {
    if (!last) return;
    const { was } = last;
    undo.mutateAsync({ bookingId: was.bookingId, sitting: was.seq, start: was.start, chairId: was.chairId }).then(
      () => setUndone({ ok: true }),
      (error) => setUndone({ ok: false, reason: problemText(error) }),
    );
  };

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title={stylistName ? `Week of ${stylistName}` : 'Week of all stylists'}
        subtitle={
          <>
            <p className="text-lg font-bold text-ink">
              {formatDate(week.from, zonelessFormat)} – {formatDate(shiftLocalDate(week.from, 6), zonelessFormat)}
            </p>
            <TimeZoneNote timeZone={week.timeZone} date={week.from} />
          </>
        }
      />
      <div className="flex flex-wrap items-end gap-3">
        <SelectField
          label="Stylist"
          value={stylistId ?? ''}
          options={[{ value: '', label: 'All stylists' }, ...stylists.map((s) => ({ value: s.id, label: s.name }))]}
          onChange={(event) => navigate(paths.deskWeek(week.from, event.target.value || undefined))}
        />
        <nav aria-label="Choose a week" className="flex flex-wrap gap-2">
          <Link to={paths.deskWeek(shiftLocalDate(week.from, -7), stylistId ?? undefined)} className={buttonClasses('secondary')}>
            <span aria-hidden="true">←</span> Previous week
          </Link>
          <Link to={paths.deskWeek(shiftLocalDate(week.from, 7), stylistId ?? undefined)} className={buttonClasses('secondary')}>
            Next week <span aria-hidden="true">→</span>
          </Link>
        </nav>
      </div>
      <div className="flex flex-wrap items-center gap-x-6 gap-y-2">
        <StepKindLegend />
        <ClosedKey />
      </div>
      <p className="text-sm text-ink/80">
        Drag a sitting to a new time to move it; Dwell checks the move before keeping it, keeps its chair when that chair is free, and offers Undo. Or open the
        booking and use Move a sitting to choose from the free times.
      </p>
      {move.isError && (
        <Notice tone="danger" title="The sitting was not moved">
          {problemText(move.error)}
        </Notice>
      )}
      <Suspense fallback={<LoadingState label="Loading the week…" />}>
        <WeekCalendar week={week} stylistId={stylistId} onMove={onMove} />
      </Suspense>
      {last && (
        <MovedToast
          move={last}
          timeZone={week.timeZone}
          undone={undone}
          undoing={undo.isPending}
          onUndo={onUndo}
          onClose={() => {
            setLast(null);
            setUndone(null);
          }}
        />
      )}
    </div>
  );
}
