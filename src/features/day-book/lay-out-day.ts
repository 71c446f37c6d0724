import type { BookingView, DayView, SittingView } from '@shared/schemas/booking-view.schemas';
import { localDateOf, localToInstant, minutesIntoDay } from '@shared/time/salon-time';

/** One sitting placed on the day's timeline: minutes from midnight, and its lane when sittings overlap. */
export type PlacedSitting = {
  booking: BookingView;
  sitting: SittingView;
  startMin: number;
  endMin: number;
  lane: number;
  lanes: number;
};

export type DayLayout = {
  firstHour: number;
  lastHour: number;
  columns: { id: string; name: string; sittings: PlacedSitting[] }[];
  hiddenCancelled: number;
  /** The salon does not open this date (a closed weekday or closed date). */
  closed: boolean;
  /** Stretches between firstHour and lastHour when the salon is closed, in minutes from midnight: drawn grey. */
  closedSpans: { fromMin: number; toMin: number }[];
};

/** What a day shows when the salon is closed and nothing is booked (an empty sheet of a working day). */
const CLOSED_DAY_HOURS = { first: 9, last: 17 };

/** The salon's opening hours of the date as minutes from local midnight (the sittings' own measure). */
function openMinutes(day: DayView): { fromMin: number; toMin: number }[] {
  const at = (hhmm: string) => {
    const iso = localToInstant(day.date, hhmm, day.timeZone);
    return iso ? minutesIntoDay(iso, day.date, day.timeZone) : 0;
  };
  return day.hours.map((h) => ({ fromMin: at(h.start), toMin: h.end === '24:00' ? 24 * 60 : at(h.end) }));
}

/** The parts of [first, last) hours outside the open stretches. */
function closedBetween(open: { fromMin: number; toMin: number }[], firstHour: number, lastHour: number) {
  const spans: { fromMin: number; toMin: number }[] = [];
  let cursor = firstHour * 60;
  for (const o of [...open].sort((a, b) => a.fromMin - b.fromMin)) {
    if (o.fromMin > cursor) spans.push({ fromMin: cursor, toMin: o.fromMin });
    cursor = Math.max(cursor, o.toMin);
  }
  if (cursor < lastHour * 60) spans.push({ fromMin: cursor, toMin: lastHour * 60 });
  return spans;
}

/** Side-by-side lanes for overlapping sittings (a window fit during someone's developing time). */
function assignLanes(sittings: PlacedSitting[]): PlacedSitting[] {
  const sorted = [...sittings].sort((a, b) => a.startMin - b.startMin || b.endMin - a.endMin);
  let cluster: PlacedSitting[] = [];
  let clusterEnd = -1;
  const closeCluster = () => {
    const lanes = Math.max(0, ...cluster.map((s) => s.lane)) + 1;
    for (const s of cluster) s.lanes = lanes;
    cluster = [];
  };
  for (const placed of sorted) {
    if (placed.startMin >= clusterEnd) closeCluster();
    const laneEnds = new Map<number, number>();
    for (const other of cluster) laneEnds.set(other.lane, Math.max(laneEnds.get(other.lane) ?? -1, other.endMin));
    let lane = 0;
    while ((laneEnds.get(lane) ?? -1) > placed.startMin) lane += 1;
    placed.lane = lane;
    cluster.push(placed);
    clusterEnd = Math.max(clusterEnd, placed.endMin);
  }
  closeCluster();
  return sorted;
}

/** What the columns are: the stylists' hands, or the chairs (which client holds which chair when). */
export type ColumnsBy = 'stylist' | 'chair';

/** Turns the API's day into columns per stylist (or chair), keeping only sittings that start on that date. */
export function layOutDay(day: DayView, by: ColumnsBy = 'stylist'): DayLayout {
  const active = day.bookings.filter((b) => b.status !== 'cancelled');
  const placed: PlacedSitting[] = active.flatMap((booking) =>
    booking.sittings
      .filter((sitting) => localDateOf(sitting.start, day.timeZone) === day.date)
      .map((sitting) => ({
        booking,
        sitting,
        startMin: minutesIntoDay(sitting.start, day.date, day.timeZone),
        endMin: minutesIntoDay(sitting.end, day.date, day.timeZone),
        lane: 0,
        lanes: 1,
      })),
  );
  // The timeline covers the salon's opening hours and every sitting of the date, whichever reaches further.
  const open = openMinutes(day);
  const starts = [...open.map((o) => o.fromMin), ...placed.map((p) => p.startMin)];
  const ends = [...open.map((o) => o.toMin), ...placed.map((p) => p.endMin)];
  const firstHour = starts.length ? Math.max(0, Math.floor(Math.min(...starts) / 60)) : CLOSED_DAY_HOURS.first;
  const lastHour = ends.length ? Math.min(24, Math.max(Math.ceil(Math.max(...ends) / 60), firstHour + 1)) : CLOSED_DAY_HOURS.last;
  return {
    firstHour,
    lastHour,
    closed: open.length === 0,
    closedSpans: closedBetween(open, firstHour, lastHour),
    columns: (by === 'stylist' ? day.stylists : day.chairs).map(({ id, name }) => ({
      id,
      name,
      sittings: assignLanes(placed.filter((p) => (by === 'stylist' ? p.booking.stylist.id : p.sitting.chairId) === id)),
    })),
    hiddenCancelled: day.bookings.length - active.length,
  };
}
