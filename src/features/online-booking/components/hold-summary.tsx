import type { ReactNode } from 'react';
import type { Hold } from '../../../../shared/schemas/online-booking.schemas';
import { formatMoney } from '../../../lib/booking-labels';
import { formatDay, formatTimeRange, zoneLabel } from '../../../lib/time';
import { HoldCountdown } from './hold-countdown';

/** `action`: what may be done with the held time from here (a signed-in client may release it). */
type Props = { hold: Hold; onExpire: () => void; action?: ReactNode };

/** What is held, and for how much longer: shown above every step after the time is picked. */
export function HoldSummary({ hold, onExpire, action }: Props) {
  return (
    <section aria-label="Your held time" className="flex flex-col gap-1 rounded-2xl border-l-8 border-sage bg-white p-4 ring-1 ring-ink/10">
      <p className="font-bold">
        {hold.serviceName} with {hold.stylistName}
      </p>
      <p>
        {formatDay(hold.start, hold.timeZone)}, <span className="tabular">{formatTimeRange(hold.start, hold.end, hold.timeZone)}</span>
      </p>
      <p className="text-sm text-ink/80">Salon time: {zoneLabel(hold.timeZone, hold.start.slice(0, 10))}</p>
      {hold.depositCents > 0 && <p className="text-sm tabular">Deposit {formatMoney(hold.depositCents, hold.currency)}</p>}
      {hold.status === 'held' && hold.heldUntil && <HoldCountdown heldUntil={hold.heldUntil} onExpire={onExpire} />}
      {action}
    </section>
  );
}
