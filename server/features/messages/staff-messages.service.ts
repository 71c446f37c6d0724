import type { Db } from '@server/db/database';
import { deskEmails, salonsForStaffMessages, sittingsBetween, type DaySitting } from './staff-messages.repository';
import { insertPlanned, type NewMessage, type PlannedMessage } from './messages.repository';
import { formatMoney } from '@shared/money/money';
import { localClockOf, localDateOf, shiftLocalDate } from '@shared/time/salon-time';
import { formatDate, formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { localDayBounds } from '../bookings';

/** Salon wall-clock time the next day's lists go out (common practice: after the last client leaves). */
export const STAFF_LISTS_AT = '18:00';

/**
 * Each evening, in each salon's own zone: every stylist gets tomorrow's list, the desk gets tomorrow's
 * bookings whose deposit is not paid. Run every few minutes; the dedupe key (salon day + person) makes each
 * list go once, and a server that was down at 18:00 sends it when it is back (until midnight).
 */
export async function planStaffMessages(db: Db, now: Date): Promise<PlannedMessage[]> {
  const planned: PlannedMessage[] = [];
  for (const salon of await salonsForStaffMessages(db)) {
    if (localClockOf(now, salon.timeZone) < STAFF_LISTS_AT) continue;
    const date = shiftLocalDate(localDateOf(now, salon.timeZone), 1);
    const { from, to } = localDayBounds(date, salon.timeZone);
    const sittings = await sittingsBetween(db, salon.id, from, to);
    const rows: NewMessage[] = [];
    const dayName = formatDate(date, formatFor(salon.timeZone), { year: false });
    const byStylist = new Map<string, DaySitting[]>();
    for (const s of sittings) byStylist.set(s.staffId, [...(byStylist.get(s.staffId) ?? []), s]);
    for (const [staffId, list] of byStylist) {
      const [first] = list; // each list starts with the sitting that created it
      const email = first?.stylistEmail;
      if (!first || !email) continue;
      rows.push({
        salonId: salon.id,
        kind: 'stylist_day_list',
        channel: 'email',
        toAddress: email,
        sendAt: now,
        dedupeKey: `staff:${staffId}:${date}:day_list`,
        subject: `Your day, ${dayName}: ${list.length} sitting${list.length === 1 ? '' : 's'}`,
        body: `Hello ${first.stylistName.split(' ')[0]},\n\nTomorrow at ${salon.name} (${salon.timeZone} time):\n\n${list.map((s) => line(s, salon.timeZone)).join('\n')}\n`,
      });
    }
    const unpaid = sittings.filter((s) => s.depositDue > 0 && !s.depositPaid && s.seq === 1);
    const body =
      unpaid.length === 0
        ? 'Every booking tomorrow that needs a deposit has paid it.'
        : unpaid.map((s) => `${line(s, salon.timeZone)} — deposit ${formatMoney(s.depositDue, salon.currency)} not paid`).join('\n');
    for (const email of await deskEmails(db, salon.id)) {
      rows.push({
        salonId: salon.id,
        kind: 'desk_no_deposit_list',
        channel: 'email',
        toAddress: email,
        sendAt: now,
        dedupeKey: `desk:${salon.id}:${email}:${date}:no_deposit`,
        subject: `No deposit yet, ${dayName}: ${unpaid.length}`,
        body: `Bookings at ${salon.name} tomorrow (${salon.timeZone} time) with a deposit still to pay:\n\n${body}\n`,
      });
    }
    planned.push(...(await insertPlanned(db, rows)));
  }
  return planned;
}

function line(s: DaySitting, zone: string): string {
  const part = s.sittingCount > 1 ? ` (sitting ${s.seq} of ${s.sittingCount})` : '';
  return `${formatRange(s.start, s.end, formatFor(zone))}  ${s.clientName}: ${s.serviceName}${part}`;
}
