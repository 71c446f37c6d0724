import { Link } from 'react-router-dom';
import type { DeskCheckout } from '@shared/schemas/desk-checkout.schemas';
import { formatMoney } from '@shared/money/money';
import { buttonClasses } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SectionCard } from '@client/components/ui/section-card';
import { paths } from '@client/config/paths';
import { ReceiptTable } from './receipt-table';
import { RestInCash } from './rest-in-cash';

type Props = { visit: DeskCheckout; checkout: NonNullable<DeskCheckout['checkout']>; returned: string | null };

/** How each part was paid, in words: "Balance, cash", "Tip for Ana, card". */
const paymentWords = (p: NonNullable<DeskCheckout['checkout']>['payments'][number]) =>
  `${p.kind === 'tip' ? `Tip for ${p.stylistName ?? 'a stylist'}` : 'Balance'}, ${p.method === 'cash' ? 'cash' : 'card'}`;

/**
 * A checkout once made: while its card part is unpaid, the hosted payment page to open for the client (a new tab on
 * the salon's tablet) and a wait for the payment service's confirmation; once paid, the receipt and how it was paid.
 */
export function CheckoutStatus({ visit, checkout, returned }: Props) {
  const money = (cents: number) => formatMoney(cents, visit.currency);
  const paid = checkout.status === 'paid';
  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[3fr_2fr]">
      <SectionCard title="Receipt">
        <ReceiptTable receipt={checkout.receipt} stylists={visit.stylists} caption="What was charged, line by line" />
      </SectionCard>
      <SectionCard title="Payment">
        <div className="flex flex-col gap-3" aria-live="polite">
          {paid ? (
            <Notice tone="info" title={`Paid: ${money(checkout.receipt.toPayCents)}. The visit is checked out.`}>
              {visit.clientEmail ? `The receipt was e-mailed to ${visit.clientEmail}.` : 'The client has no e-mail address: print the receipt.'}
            </Notice>
          ) : (
            <>
              {checkout.cashCents > 0 && <p>Cash taken: {money(checkout.cashCents)}.</p>}
              <p>
                Card part: <strong className="tabular">{money(checkout.cardCents)}</strong>. Open the payment page for the client on the salon&apos;s tablet;
                the card is typed there, never into Dwell.
              </p>
              {checkout.checkoutUrl && (
                <a className={buttonClasses('primary')} href={checkout.checkoutUrl} target="_blank" rel="noreferrer">
                  Open the payment page
                </a>
              )}
              <p className="text-sm">
                {returned === 'cancelled'
                  ? 'The payment page was left without paying; open it again when the client is ready.'
                  : 'Waiting for the payment service to confirm the card payment…'}
              </p>
              <RestInCash bookingId={visit.bookingId} amount={money(checkout.cardCents)} />
            </>
          )}
          {checkout.payments.length > 0 && (
            <ul aria-label="Payments at this checkout" className="flex flex-col gap-1">
              {checkout.payments.map((p, i) => (
                <li key={`${p.kind}-${p.method}-${i}`} className="flex justify-between rounded-lg bg-linen px-3 py-1">
                  <span>{paymentWords(p)}</span>
                  <span className="tabular">{money(p.amountCents)}</span>
                </li>
              ))}
            </ul>
          )}
          {paid && (
            <Link className={buttonClasses('secondary')} to={paths.deskReceipt(visit.bookingId)}>
              Printable receipt
            </Link>
          )}
        </div>
      </SectionCard>
    </div>
  );
}
