import type { z } from 'zod';
import type { OfferViewSchema } from '@shared/schemas/window.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LinkCard } from '@client/components/ui/link-card';
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
  return (
    <LinkCard
      salonName={offer.salonName}
      title={offer.clientName ? `${offer.clientName}, a time opened up` : 'A time opened up'}
      visit={offer}
      facts={
        <>
          <dt className="font-bold">Status</dt>
          <dd className="font-bold">{statusWords[offer.status]}</dd>
        </>
      }
    >
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
    </LinkCard>
  );
}
