import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { LoadingState } from '@client/components/ui/loading-state';
import { offerQueries } from '@client/features/offers/api/offer-queries';
import { OfferView } from '@client/features/offers/components/offer-view';

/** Public: the link in an offer SMS or e-mail. No sign-in; the token is the key. */
export function Component() {
  const { token = '' } = useParams();
  const offer = useQuery(offerQueries.byToken(token));
  if (offer.isPending) return <LoadingState label="Loading the offer…" />;
  if (offer.isError) {
    return (
      <div className="mx-auto max-w-md">
        <h1 className="text-2xl font-extrabold">Offer not found</h1>
        <p className="mt-2">{offer.error.status === 404 ? 'This link is not valid any more.' : offer.error.message}</p>
      </div>
    );
  }
  return <OfferView token={token} offer={offer.data} />;
}
