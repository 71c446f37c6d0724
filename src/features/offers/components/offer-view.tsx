import type { z } from 'zod';
import type { OfferViewSchema } from '@shared/schemas/window.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { formatDate, formatTime, formatZone } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { useAcceptOffer } from '../api/offer-mutations';

type Offer = z.output<typeof OfferViewSchema>;
type Props = { token: string; offer: Offer };

const statusWords: Record<Offer['status'], string> = {
  offered: 'Still free',
  taken: 'Booked for you',
  gone: 'Taken by someone else',
  expired: 'No longer available',
};

/** A time offered to a standby client by SMS or e-mail: what, when, with whom, and one button to take it. */
export function OfferView({ token, offer }: Props) {
  const accept = useAcceptOffer(token);
  const when = formatDate(offer.start, formatFor(offer.timeZone), { width: 'short' });
  return (
    <article aria-labelledby="offer-heading" className="mx-auto flex w-full max-w-md flex-col gap-4 rounded-2xl bg-white p-5 shadow-sm ring-1 ring-ink/10">
      <p className="text-sm font-bold text-ink/80">{offer.salonName}</p>
      <h1 id="offer-heading" className="text-2xl font-extrabold tracking-tight">
        {offer.clientName ? `${offer.clientName}, a time opened up` : 'A time opened up'}
      </h1>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2">
        <dt className="font-bold">Service</dt>
        <dd>{offer.serviceName}</dd>
        <dt className="font-bold">With</dt>
        <dd>{offer.stylistName}</dd>
        <dt className="font-bold">When</dt>
        <dd>
          {when}, <span className="tabular">{formatTime(offer.start, formatFor(offer.timeZone))}</span>
          <span className="block text-sm text-ink/80">Salon time: {formatZone(formatFor(offer.timeZone), offer.start.slice(0, 10))}</span>
        </dd>
        <dt className="font-bold">Status</dt>
        <dd className="font-bold">{statusWords[offer.status]}</dd>
      </dl>
      {accept.isError && <FormAlert>{accept.error.message}</FormAlert>}
      {offer.status === 'taken' && <FormAlert tone="success">You have this time. The salon will send you a confirmation.</FormAlert>}
      {offer.status === 'offered' && (
        <>
          <p className="text-sm">The first person to take it gets it.</p>
          <Button busy={accept.isPending} onClick={() => accept.mutate()} className="w-full">
            Take this time
          </Button>
        </>
      )}
      {(offer.status === 'gone' || offer.status === 'expired') && <p>Sorry — this time is no longer free. You stay on the standby list.</p>}
    </article>
  );
}
