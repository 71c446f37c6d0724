import type { CancelTerms } from '@shared/schemas/online-booking.schemas';
import { Notice } from '@client/components/ui/notice';

/** What cancelling now does to the deposit and why, read before confirming (a kept deposit as a caution). */
export function CancelTermsNotice({ terms }: { terms: CancelTerms }) {
  return (
    <Notice tone={terms.depositOutcome === 'kept' ? 'caution' : 'info'} title="If you cancel now">
      <p>{terms.message}</p>
    </Notice>
  );
}
