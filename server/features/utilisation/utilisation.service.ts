import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { ON_TIME_MINUTES, type DeskUtilisation, type OwnerUtilisation, type UtilisationQuery } from '@shared/schemas/utilisation.schemas';
import type { Scenario } from '@shared/engine/engine';
import { todayIn } from '../bookings';
import { findSalon } from '../salon';
import { salonStaffNames } from '../setup';
import { cancelledAt, listPeriodSittings } from './utilisation-bookings.repository';
import { listPeriodPayments } from './utilisation-payments.repository';
import { bookingFigures } from './utilisation-figures';
import { measurePeriod, periodScenario } from './utilisation-occupancy';
import { timekeepingByStylist } from './utilisation-timekeeping.repository';
import { timekeepingFigures } from './utilisation-timekeeping';
import { chunksOf, resolvePeriod, type Period } from './utilisation-period';
import { instantAt } from '@shared/time/salon-time';

const ratio = (num: number, den: number): number | null => (den === 0 ? null : num / den);

/** The period a query names, in the salon's time zone. */
function periodFor(salon: Salon, query: UtilisationQuery, now: Date): Period {
  return resolvePeriod({ period: query.period ?? 'week', date: query.date, from: query.from, to: query.to }, todayIn(salon.timeZone, now));
}

/** The owner's figures for the period a query names. */
export async function ownerUtilisationFor(db: Db, salonId: string, query: UtilisationQuery, now: Date): Promise<OwnerUtilisation> {
  const salon = await findSalon(db, salonId);
  return ownerUtilisation(db, salon, periodFor(salon, query, now));
}

/** The desk's figures for the period a query names. */
export async function deskUtilisationFor(db: Db, salonId: string, query: UtilisationQuery, now: Date): Promise<DeskUtilisation> {
  return deskSubset(await ownerUtilisationFor(db, salonId, query, now));
}

/** The engine scenario behind the period's occupancy figures, with the period it covers (for the file's name). */
export async function utilisationScenarioFor(db: Db, salonId: string, query: UtilisationQuery, now: Date): Promise<{ period: Period; scenario: Scenario }> {
  const salon = await findSalon(db, salonId);
  const period = periodFor(salon, query, now);
  return { period, scenario: await periodScenario(db, salon.id, period) };
}

/** Every figure of the period, for the owner. One query per table; the engine measures the occupancy. */
async function ownerUtilisation(db: Db, salon: Salon, period: Period): Promise<OwnerUtilisation> {
  const instant = (date: string) => instantAt(date, salon.timeZone)!.getTime();
  const weekCuts = chunksOf(period).flatMap((c, i) => (i === 0 ? c.weekCuts : c.weekCuts.slice(1)));
  const from = instant(period.from);
  const to = instant(period.to);
  const [occupancy, sittings, payments, names, timed] = await Promise.all([
    measurePeriod(db, salon, period),
    listPeriodSittings(db, salon.id, new Date(from), new Date(to)),
    listPeriodPayments(db, salon.id, new Date(from), new Date(to)),
    salonStaffNames(db, salon.id),
    timekeepingByStylist(db, salon.id, new Date(from), new Date(to), ON_TIME_MINUTES),
  ]);
  const nameOf = (id: string) => names.get(id) ?? 'Former stylist';
  const cancelled = [...new Set(sittings.filter((s) => s.status === 'cancelled').map((s) => s.bookingId))];
  const figures = bookingFigures({
    sittings,
    payments,
    from,
    to,
    weekStarts: weekCuts.map(instant),
    cancelledAt: await cancelledAt(db, salon.id, cancelled),
    cancellationWindowHours: salon.cancellationWindowHours,
  });
  const { total } = occupancy;
  const chairHours = total.chairOpen / 60;
  const stylistHours = Object.values(total.stylists).reduce((t, s) => t + s.onClock, 0) / 60;
  const stylistIds = [...new Set([...Object.keys(occupancy.handsOnShare), ...figures.stylists.keys()])];
  const stylists = stylistIds
    .map((id) => {
      const minutes = total.stylists[id] ?? { handsOn: 0, onClock: 0 };
      const tally = figures.stylists.get(id) ?? { bookings: 0, noShows: 0, revenueCents: 0 };
      return {
        stylistId: id,
        name: nameOf(id),
        handsOnShare: occupancy.handsOnShare[id] ?? null,
        handsOnMinutes: minutes.handsOn,
        onClockMinutes: minutes.onClock,
        ...tally,
        revenuePerHourCents: ratio(tally.revenueCents, minutes.onClock / 60),
      };
    })
    .sort((a, b) => a.name.localeCompare(b.name));
  return {
    salon: { name: salon.name, timeZone: salon.timeZone, currency: salon.currency },
    period: { ...period, scenarios: occupancy.scenarios },
    chairOccupancy: occupancy.chairOccupancy,
    windowUse: occupancy.windowUse,
    handsOnShare: occupancy.handsOnShare,
    attendance: figures.attendance,
    heatMap: occupancy.cells.map((c) => ({
      weekday: c.weekday,
      hour: c.hour,
      chairOccupancy: ratio(c.chairHeld, c.chairOpen),
      chairHeldMinutes: c.chairHeld,
      chairOpenMinutes: c.chairOpen,
    })),
    // occupancy.weeks and figures.weeks hold one entry per pair of consecutive weekCuts.
    weeks: occupancy.weeks.map((w, i) => {
      const clock = Object.values(w.stylists).reduce((t, s) => t + s.onClock, 0);
      const hands = Object.values(w.stylists).reduce((t, s) => t + s.handsOn, 0);
      return {
        from: weekCuts[i]!,
        to: weekCuts[i + 1]!,
        bookings: figures.weeks[i]!.bookings,
        chairOccupancy: ratio(w.chairHeld, w.chairOpen),
        windowUse: ratio(w.windowUsed, w.windowUsed + w.windowFree),
        handsOnShare: ratio(hands, clock),
        revenueCents: figures.weeks[i]!.revenueCents,
      };
    }),
    topServices: figures.services,
    money: {
      revenueCents: figures.revenueCents,
      chairHours,
      stylistHours,
      revenuePerChairHourCents: ratio(figures.revenueCents, chairHours),
      revenuePerStylistHourCents: ratio(figures.revenueCents, stylistHours),
    },
    deposits: figures.deposits,
    corrections: figures.corrections,
    stylists,
    timekeeping: timekeepingFigures(timed, stylists, nameOf),
  };
}

const withoutStylists = ({ stylists: _stylists, ...salon }: OwnerUtilisation['timekeeping']) => salon;

/** The desk's subset: chair occupancy and window use, when chairs are full, attendance, the salon's timekeeping; no money, no per-person figures. */
function deskSubset(all: OwnerUtilisation): DeskUtilisation {
  return {
    salon: { name: all.salon.name, timeZone: all.salon.timeZone },
    period: all.period,
    chairOccupancy: all.chairOccupancy,
    windowUse: all.windowUse,
    attendance: all.attendance,
    heatMap: all.heatMap,
    weeks: all.weeks.map(({ from, to, bookings, chairOccupancy, windowUse }) => ({ from, to, bookings, chairOccupancy, windowUse })),
    topServices: all.topServices.map(({ serviceId, name, chairMinutes, sittings }) => ({ serviceId, name, chairMinutes, sittings })),
    // The salon's timekeeping only: per-stylist figures are the owner's.
    timekeeping: withoutStylists(all.timekeeping),
  };
}
