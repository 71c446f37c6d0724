import { sql, type SelectQueryBuilder } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { SittingStatus } from '@shared/schemas/day-of-service.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

/** One booked step as the day has run it, with what a re-plan may use of its plan (a developing step's range). */
export interface DayRunStep {
  id: string;
  seq: number;
  label: string;
  actualStart: Date | null;
  actualEnd: Date | null;
  /** A developing step's least and most minutes from the booking's step plan; null for other steps. */
  minMinutes: number | null;
  maxMinutes: number | null;
}

/** A live sitting of the day, as the re-plan asks about it. */
export interface DayRunSitting {
  id: string;
  bookingId: string;
  stylistId: string;
  status: SittingStatus;
  /** The service's skill: another stylist with it may take the sitting over. */
  skill: string;
  /** The booking's sittings: all of them stay with one stylist (`bookings.stylist_id`), so one of several is never handed over. */
  sittingsInBooking: number;
  steps: DayRunStep[];
}

/** A query over sittings joined to their bookings, as both statements below read the day. */
type SittingsQuery = SelectQueryBuilder<Database & { si: Database['sittings']; b: Database['bookings'] }, 'si' | 'b', object>;

/**
 * The salon's live sittings that touch [from, to), one stylist's or everyone's, with their steps' actual times and
 * developing ranges. Two statements sent together; the steps come in the book's order (seq).
 */
export async function readDayRuns(db: Db, salonId: string, from: Date, to: Date, stylistId?: string): Promise<DayRunSitting[]> {
  const onTheDay = <Q extends SittingsQuery>(q: Q): Q =>
    q
      .where('b.salon_id', '=', salonId)
      .where('si.live', '=', true)
      .$if(stylistId !== undefined, (w) => w.where('b.stylist_id', '=', stylistId!))
      .where(sql<boolean>`si.during && tstzrange(${from}, ${to}, '[)')`) as Q;
  const [sittings, steps] = await Promise.all([
    onTheDay(
      db
        .selectFrom('sittings as si')
        .innerJoin('bookings as b', 'b.id', 'si.booking_id')
        .innerJoin('services as sv', 'sv.id', 'b.service_id')
        .select([
          'si.id',
          'si.seq',
          'si.status',
          'b.id as bookingId',
          'b.stylist_id',
          'b.step_plan',
          'sv.skill',
          (eb) => eb.selectFrom('sittings as all').select(eb.fn.countAll<number>().as('n')).whereRef('all.booking_id', '=', 'b.id').as('sittingCount'),
        ]),
    ).execute(),
    onTheDay(
      db
        .selectFrom('booking_steps as st')
        .innerJoin('sittings as si', 'si.id', 'st.sitting_id')
        .innerJoin('bookings as b', 'b.id', 'si.booking_id')
        .select(['st.id', 'st.sitting_id', 'st.seq', 'st.label', 'st.actual_start', 'st.actual_end'])
        .where('st.live', '=', true)
        .orderBy('st.sitting_id')
        .orderBy('st.seq'),
    ).execute(),
  ]);
  return sittings.map((s) => {
    const planned = (s.step_plan as StepPlan).sittings[s.seq - 1]?.steps ?? [];
    return {
      id: s.id,
      bookingId: s.bookingId,
      stylistId: s.stylist_id,
      status: s.status,
      skill: s.skill,
      sittingsInBooking: Number(s.sittingCount),
      steps: steps
        .filter((st) => st.sitting_id === s.id)
        .map((st) => {
          const plan = planned[st.seq - 1];
          return {
            id: st.id,
            seq: st.seq,
            label: st.label,
            actualStart: st.actual_start,
            actualEnd: st.actual_end,
            minMinutes: plan?.kind === 'developing' ? plan.minMinutes : null,
            maxMinutes: plan?.kind === 'developing' ? plan.maxMinutes : null,
          };
        }),
    };
  });
}
