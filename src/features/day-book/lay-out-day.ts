import type { BookingView, DayView, SittingView } from '../../../shared/schemas/booking-view.schemas';
import { localDateOf, minutesIntoDay } from '../../lib/time';

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
};

const DEFAULT_HOURS = { first: 9, last: 17 };

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
  const firstHour = placed.length ? Math.floor(Math.min(...placed.map((p) => p.startMin)) / 60) : DEFAULT_HOURS.first;
  const lastHour = placed.length ? Math.ceil(Math.max(...placed.map((p) => p.endMin)) / 60) : DEFAULT_HOURS.last;
  return {
    firstHour: Math.min(firstHour, DEFAULT_HOURS.first),
    lastHour: Math.max(lastHour, DEFAULT_HOURS.last, firstHour + 1),
    columns: (by === 'stylist' ? day.stylists : day.chairs).map(({ id, name }) => ({
      id,
      name,
      sittings: assignLanes(placed.filter((p) => (by === 'stylist' ? p.booking.stylist.id : p.sitting.chairId) === id)),
    })),
    hiddenCancelled: day.bookings.length - active.length,
  };
}
