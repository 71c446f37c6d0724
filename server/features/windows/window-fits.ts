import { DateTime } from 'luxon';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import type { StandbyEntry } from '@shared/schemas/standby.schemas';
import { localClockOf } from '@shared/time/salon-time';

/** Longest service offered as a window fit: a short one-sitting service (common practice: under about 90 minutes). */
export const MAX_FIT_MINUTES = 90;

/** One-sitting services short enough to go into a hands-free window, with their shortest length. */
export function windowFitServices(services: ServiceSummary[]) {
  return services
    .filter((s) => s.stepPlan.sittings.length === 1 && s.category !== 'consultation' && s.category !== 'skin_test')
    .map((s) => ({ service: s, minutes: s.stepPlan.sittings[0]!.steps.reduce((t, st) => t + (st.kind === 'developing' ? st.minMinutes : st.minutes), 0) }))
    .filter((f) => f.minutes <= MAX_FIT_MINUTES);
}

/** Standby entries that want one of the fits, with this stylist or any, and can come during the window. */
export function standbyForWindow(entries: StandbyEntry[], window: { stylistId: string; start: string; end: string; fitIds: string[] }, zone: string) {
  const start = DateTime.fromISO(window.start, { zone });
  const from = localClockOf(window.start, zone);
  const to = localClockOf(window.end, zone);
  return entries.filter(
    (e) =>
      (!e.stylist || e.stylist.id === window.stylistId) &&
      e.services.some((s) => window.fitIds.includes(s.id)) &&
      e.availability.some((a) => a.weekdays.includes(start.weekday) && a.from < to && from < a.to),
  );
}
