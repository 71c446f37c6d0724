import type { SentOffer } from '@shared/schemas/window.schemas';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

/** What became of an offer, in the staff's words (the client's offer page has its own). */
export const offerOutcome: Record<SentOffer['status'], string> = {
  offered: 'out, no answer yet',
  taken: 'taken and booked',
  gone: 'withdrawn: the time was filled',
  expired: 'ran out unanswered',
};

type Props = { offers: SentOffer[]; timeZone: string; label: string };

/** The offers sent for a window's times, each with its client, fit, time and outcome. */
export function SentOffers({ offers, timeZone, label }: Props) {
  if (offers.length === 0) return null;
  return (
    <ul aria-label={label} className="flex flex-col gap-1 text-sm">
      {offers.map((o) => (
        <li key={`${o.stylistId}-${o.start}-${o.clientName}`}>
          <span className="font-bold">{o.clientName}</span> · {o.serviceName} at <span className="tabular">{formatTime(o.start, formatFor(timeZone))}</span>:{' '}
          <span className={o.status === 'offered' ? 'font-bold' : undefined}>{offerOutcome[o.status]}</span>
        </li>
      ))}
    </ul>
  );
}
