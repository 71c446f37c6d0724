import { useId } from 'react';
import type { PlacedSitting } from '../lay-out-day';
import { SittingBlock } from './sitting-block';
import { COLUMN_HEADER_CLASS, PX_PER_MIN } from './timeline-scale';

type Props = {
  name: string;
  sittings: PlacedSitting[];
  firstHour: number;
  lastHour: number;
  timeZone: string;
  roomy: boolean;
};

const HOUR_PX = 60 * PX_PER_MIN;

/** One stylist's day; faint hour lines behind the sittings. */
export function StylistColumn({ name, sittings, firstHour, lastHour, timeZone, roomy }: Props) {
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
        {sittings.map((placed) => (
          <SittingBlock
            key={`${placed.booking.id}-${placed.sitting.seq}`}
            placed={placed}
            firstHour={firstHour}
            timeZone={timeZone}
            roomy={roomy}
          />
        ))}
        {sittings.length === 0 && <p className="p-3 text-sm text-ink/80">No bookings.</p>}
      </div>
    </section>
  );
}
