import { useQuery } from '@tanstack/react-query';
import { useParams, useSearchParams } from 'react-router-dom';
import { LoadingState } from '@client/components/ui/loading-state';
import { depositQueries } from '@client/features/deposits/api/deposit-queries';
import { DepositRequestView } from '@client/features/deposits/components/deposit-request-view';

/** How often the page asks, back from paying, whether the payment service's confirmation has come in. */
const POLL_MS = 1_500;

/** Public: the link in a deposit request SMS or e-mail. No sign-in; the token is the key. */
export function Component() {
  const { token = '' } = useParams();
  const [params] = useSearchParams();
  const returned = params.get('payment') === 'done' ? 'done' : params.get('payment') === 'cancelled' ? 'cancelled' : null;
  const request = useQuery({
    ...depositQueries.byToken(token),
    // Back from paying: the deposit counts once the payment service's confirmation arrives; ask until it has.
    refetchInterval: (query) => (returned === 'done' && query.state.data?.open && query.state.data.deposit.dueCents > 0 ? POLL_MS : false),
  });
  if (request.isPending) return <LoadingState label="Loading the deposit request…" />;
  if (request.isError) {
    return (
      <div className="mx-auto max-w-md">
        <h1 className="text-2xl font-extrabold">Deposit request not found</h1>
        <p className="mt-2">{request.error.status === 404 ? 'This link is not valid.' : request.error.message}</p>
      </div>
    );
  }
  return <DepositRequestView token={token} request={request.data} returned={returned} />;
}
