import { lazy, Suspense, type ReactNode } from 'react';
import { useNavigate } from 'react-router-dom';
import type { DayView } from '@shared/schemas/booking-view.schemas';
import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';
import { DateStepper } from '@client/components/ui/date-stepper';
import { LoadingState } from '@client/components/ui/loading-state';
import { PageHeader } from '@client/components/ui/page-header';
import { StepKindLegend } from '@client/components/ui/step-kind-legend';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { todayIn } from '@client/lib/time';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import type { ColumnsBy } from '../lay-out-day';
import { ColumnsToggle } from './columns-toggle';

// The timeline is the heaviest part of the page; load it after the page frame.
const DayTimeline = lazy(() => import('./day-timeline'));

type Props = {
  day: DayView;
  title: (isToday: boolean) => string;
  hrefFor: (date: string) => string;
  /** Shown before the timeline (a stylist's client cards). */
  lead?: ReactNode;
  children?: ReactNode;
  windows?: HandsFreeWindowView[];
  bookingHref?: (bookingId: string) => string;
  /** Stylist or chair columns; the switch shows only when `onColumnsChange` is given. */
  columns?: ColumnsBy;
  onColumnsChange?: (by: ColumnsBy) => void;
};

/** One day of the book: choose the day, read the key, see the timeline. */
export function DayBookView({ day, title, hrefFor, lead, children, windows, bookingHref, columns = 'stylist', onColumnsChange }: Props) {
  const navigate = useNavigate();
  const today = todayIn(day.timeZone);
  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title={title(day.date === today)}
        subtitle={
          <>
            <p className="text-lg font-bold text-ink">{formatDate(day.date, zonelessFormat)}</p>
            <TimeZoneNote timeZone={day.timeZone} date={day.date} />
          </>
        }
      />
      <DateStepper date={day.date} today={today} hrefFor={hrefFor} onPick={(date) => navigate(hrefFor(date))} />
      {lead}
      <div className="flex flex-wrap items-center justify-between gap-3">
        <StepKindLegend />
        {onColumnsChange && <ColumnsToggle value={columns} onChange={onColumnsChange} />}
      </div>
      <Suspense fallback={<LoadingState label="Loading the timeline…" />}>
        <DayTimeline day={day} by={columns} windows={windows} bookingHref={bookingHref} />
      </Suspense>
      {children}
    </div>
  );
}
