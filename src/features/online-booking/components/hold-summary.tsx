import type { ReactNode } from 'react';
import type { Hold } from '@shared/schemas/online-booking.schemas';
import { formatDate, formatRange, formatZone } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { HoldCountdown } from './hold-countdown';
import { formatMoney } from '@shared/money/money';

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
        {formatDate(hold.start, formatFor(hold.timeZone), { width: 'short' })},{' '}
        <span className="tabular">{formatRange(hold.start, hold.end, formatFor(hold.timeZone))}</span>
      </p>
      <p className="text-sm text-ink/80">Salon time: {formatZone(formatFor(hold.timeZone), hold.start.slice(0, 10))}</p>
      {hold.depositCents > 0 && <p className="text-sm tabular">Deposit {formatMoney(hold.depositCents, hold.currency)}</p>}
      {hold.status === 'held' && hold.heldUntil && <HoldCountdown heldUntil={hold.heldUntil} onExpire={onExpire} />}
      {action}
    </section>
  );
}
