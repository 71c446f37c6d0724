import { useId } from 'react';
import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';
import type { PlacedSitting } from '../lay-out-day';
import { SittingBlock } from './sitting-block';
import { WindowBand } from './window-band';
import { COLUMN_HEADER_CLASS, PX_PER_MIN } from './timeline-scale';

type Props = {
  name: string;
  sittings: PlacedSitting[];
  firstHour: number;
  lastHour: number;
  date: string;
  timeZone: string;
  currency: string;
  roomy: boolean;
  /** Hands-free windows of this column's stylist (none in the chair view). */
  windows: HandsFreeWindowView[];
  /** When the salon is closed between firstHour and lastHour (minutes from midnight): drawn grey behind the sittings. */
  closedSpans: { fromMin: number; toMin: number }[];
  bookingHref?: (bookingId: string) => string;
};

const HOUR_PX = 60 * PX_PER_MIN;

/** One stylist's (or chair's) day; faint hour lines behind the sittings, hands-free windows in a gutter. */
export function StylistColumn({ name, sittings, firstHour, lastHour, date, timeZone, currency, roomy, windows, closedSpans, bookingHref }: Props) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className={`${roomy ? 'flex-1' : 'w-60 shrink-0 sm:flex-1'} min-w-60 border-r border-ink/10 last:border-r-0`}>
      <h2 id={headingId} className={`${COLUMN_HEADER_CLASS} flex items-center border-b border-ink/15 px-3 font-bold`}>
        {name}
      </h2>
      <div
        className="relative"
        style={{
          height: (lastHour - firstHour) * HOUR_PX,
          backgroundImage: `repeating-linear-gradient(to bottom, rgb(30 42 54 / 0.1) 0 1px, transparent 1px ${HOUR_PX}px)`,
        }}
      >
        {closedSpans.map((span) => (
          <div
            key={span.fromMin}
            aria-hidden="true"
            className="salon-closed absolute inset-x-0"
            style={{ top: (span.fromMin - firstHour * 60) * PX_PER_MIN, height: (span.toMin - span.fromMin) * PX_PER_MIN }}
          />
        ))}
        <div className="absolute inset-y-0 left-0" style={{ right: windows.length ? '4.5rem' : 0 }}>
          {sittings.map((placed) => (
            <SittingBlock
              key={`${placed.booking.id}-${placed.sitting.seq}`}
              placed={placed}
              firstHour={firstHour}
              timeZone={timeZone}
              currency={currency}
              roomy={roomy}
              href={bookingHref?.(placed.booking.id)}
            />
          ))}
        </div>
        {windows.length > 0 && (
          <ul aria-label={`Hands-free windows of ${name}`} className="absolute inset-y-0 right-0 w-[4.5rem]">
            {windows.map((win) => (
              <WindowBand key={win.start} window={win} date={date} firstHour={firstHour} timeZone={timeZone} />
            ))}
          </ul>
        )}
        {sittings.length === 0 && <p className="p-3 text-sm text-ink/80">No bookings.</p>}
      </div>
    </section>
  );
}
