import { useState, type FormEvent } from 'react';
import type { DeskCheckout } from '@shared/schemas/desk-checkout.schemas';
import { formatMoney, moneyInputText, parseMoney } from '@shared/money/money';
import { parsePercent } from '@shared/money/percent';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SectionCard } from '@client/components/ui/section-card';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { ApiError } from '@client/lib/api-error';
import { useCheckOut } from '../api/desk-checkout-mutations';
import { draftBody, emptyDraft, previewOf, type CheckoutDraft } from '../checkout-draft';
import { AmountInput } from './amount-input';
import { ReceiptTable } from './receipt-table';

type Props = { visit: DeskCheckout };

const payChoices = [
  { value: 'card', label: 'Card, on the payment page' },
  { value: 'cash', label: 'Cash at the desk' },
  { value: 'split', label: 'Split: some cash, the rest by card' },
];

/**
 * The desk's checkout: the "from" price within its range, products, a discount, the tip and how the client pays,
 * with the receipt shown as it will be. The server works every amount out again from its own records.
 */
/** A "from" price with room to set it: quoted above where its range starts (booked at the start, there is nothing to set). */
const hasRange = (s: { priceCents: number; upToCents: number | null }): s is { priceCents: number; upToCents: number } =>
  s.upToCents !== null && s.upToCents > s.priceCents;

export function CheckoutForm({ visit }: Props) {
  const [draft, setDraft] = useState<CheckoutDraft>(() => emptyDraft(visit));
  const [productId, setProductId] = useState(visit.products[0]?.id ?? '');
  const [quantity, setQuantity] = useState('1');
  const checkOut = useCheckOut(visit.bookingId);
  const money = (cents: number) => formatMoney(cents, visit.currency);
  const parseAmount = (text: string) => parseMoney(text, visit.currency);
  const preview = previewOf(draft, visit);
  const receipt = 'receipt' in preview ? preview.receipt : null;
  const serverFields = checkOut.error instanceof ApiError ? (checkOut.error.fields ?? {}) : {};
  const problem = (field: string) => ('field' in preview && preview.field === field ? preview.message : serverFields[field]);
  const set = (change: Partial<CheckoutDraft>) => setDraft((d) => ({ ...d, ...change }));

  const addProduct = () => {
    const n = Number(quantity);
    if (!productId || !Number.isInteger(n) || n < 1) return;
    set({ retail: [...draft.retail.filter((r) => r.productId !== productId), { productId, quantity: n }] });
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!receipt) return;
    checkOut.mutate(draftBody(draft, visit, receipt));
  };
  const nameOf = (id: string) => visit.products.find((p) => p.id === id)?.name ?? 'Product';
  const tipNames = visit.stylists.map((s) => s.name).join(', ');

  return (
    <form onSubmit={submit} className="grid grid-cols-1 gap-6 lg:grid-cols-[3fr_2fr]" aria-label="Checkout">
      <div className="flex flex-col gap-6">
        <SectionCard title="Services">
          <ul className="flex flex-col gap-4">
            {visit.services.map((s, i) => (
              <li key={s.label} className="flex flex-col gap-2">
                <p className="flex justify-between gap-4">
                  <span>{s.label}</span>
                  <span className="tabular">{hasRange(s) ? `${money(s.priceCents)} to ${money(s.upToCents)}` : money(s.priceCents)}</span>
                </p>
                {hasRange(s) && (
                  <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
                    <AmountInput
                      label={`Price set (${visit.currency})`}
                      initial={moneyInputText(s.priceCents, visit.currency)}
                      parse={parseAmount}
                      hint={`Within the range quoted, ${money(s.priceCents)} to ${money(s.upToCents)}`}
                      error={problem(`services.${i}.fromPrice.chargedCents`)}
                      onValue={(v) => set({ services: draft.services.map((x, j) => (j === i ? { ...x, chargedCents: v } : x)) })}
                    />
                    <TextField
                      label="Why this price"
                      value={draft.services[i]?.reason ?? ''}
                      error={problem(`services.${i}.fromPrice.reason`)}
                      onChange={(e) => set({ services: draft.services.map((x, j) => (j === i ? { ...x, reason: e.target.value } : x)) })}
                    />
                  </div>
                )}
              </li>
            ))}
          </ul>
        </SectionCard>

        <SectionCard title="Products">
          {visit.products.length === 0 ? (
            <p>The salon has no products on sale (the owner adds them under Set-up → Products).</p>
          ) : (
            <div className="flex flex-col gap-3">
              <div className="grid grid-cols-1 items-end gap-3 sm:grid-cols-[2fr_1fr_auto]">
                <SelectField
                  label="Product"
                  value={productId}
                  onChange={(e) => setProductId(e.target.value)}
                  options={visit.products.map((p) => ({ value: p.id, label: `${p.name}, ${money(p.priceCents)} (${p.stock} left)` }))}
                />
                <TextField label="How many" inputMode="numeric" value={quantity} onChange={(e) => setQuantity(e.target.value)} />
                <Button variant="secondary" onClick={addProduct}>
                  Add product
                </Button>
              </div>
              {draft.retail.length > 0 && (
                <ul aria-label="Products sold" className="flex flex-col gap-1">
                  {draft.retail.map((r, i) => (
                    <li key={r.productId} className="flex items-center justify-between gap-3 rounded-lg bg-linen px-3 py-1">
                      <span>
                        {r.quantity} × {nameOf(r.productId)}
                        {serverFields[`retail.${i}.quantity`] && <span className="block text-sm text-brick">{serverFields[`retail.${i}.quantity`]}</span>}
                      </span>
                      <Button variant="quiet" onClick={() => set({ retail: draft.retail.filter((x) => x.productId !== r.productId) })}>
                        Remove
                      </Button>
                    </li>
                  ))}
                </ul>
              )}
            </div>
          )}
        </SectionCard>

        <SectionCard title="Discount and tip">
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
            <SelectField
              label="Discount"
              value={draft.discount?.kind ?? 'none'}
              onChange={(e) => {
                const kind = e.target.value;
                const reason = draft.discount?.reason ?? '';
                set({ discount: kind === 'amount' ? { kind, cents: 0, reason } : kind === 'percent' ? { kind, milliPercent: 0, reason } : null });
              }}
              options={[
                { value: 'none', label: 'No discount' },
                { value: 'amount', label: 'An amount off' },
                { value: 'percent', label: 'A percentage off' },
              ]}
            />
            {draft.discount?.kind === 'amount' && (
              <AmountInput
                key="amount"
                label={`Discount (${visit.currency})`}
                initial=""
                parse={parseAmount}
                error={problem('discount.cents')}
                onValue={(v) => set({ discount: { kind: 'amount', cents: v, reason: draft.discount?.reason ?? '' } })}
              />
            )}
            {draft.discount?.kind === 'percent' && (
              <AmountInput
                key="percent"
                label="Discount (%)"
                initial=""
                parse={parsePercent}
                error={problem('discount.milliPercent')}
                onValue={(v) => set({ discount: { kind: 'percent', milliPercent: v, reason: draft.discount?.reason ?? '' } })}
              />
            )}
            {draft.discount && (
              <TextField
                label="Why the discount"
                className="sm:col-span-2"
                value={draft.discount.reason}
                error={problem('discount.reason')}
                onChange={(e) => draft.discount && set({ discount: { ...draft.discount, reason: e.target.value } })}
              />
            )}
            <AmountInput
              label={`Tip (${visit.currency})`}
              initial=""
              parse={parseAmount}
              hint={`Shared equally by ${tipNames}`}
              error={problem('tip.cents') ?? problem('tipCents')}
              onValue={(v) => set({ tipCents: v })}
            />
          </div>
        </SectionCard>
      </div>

      <div className="flex flex-col gap-6">
        <SectionCard title="Receipt">
          {receipt && <ReceiptTable receipt={receipt} stylists={visit.stylists} caption="The receipt as it will be" />}
          {'message' in preview && <FormAlert>{preview.message}</FormAlert>}
        </SectionCard>
        <SectionCard title="Payment">
          <div className="flex flex-col gap-3">
            <SelectField label="Paid by" value={draft.pay} onChange={(e) => set({ pay: e.target.value as CheckoutDraft['pay'] })} options={payChoices} />
            {draft.pay === 'split' && (
              <AmountInput
                label={`Cash part (${visit.currency})`}
                initial=""
                parse={parseAmount}
                hint="The cash pays the balance; the card pays the rest and the tip"
                error={serverFields['pay.cashCents']}
                onValue={(v) => set({ cashCents: v })}
              />
            )}
            {checkOut.error && <FormAlert>{checkOut.error.message}</FormAlert>}
            <Button type="submit" busy={checkOut.isPending} disabled={!receipt}>
              {receipt ? `Take ${money(receipt.toPayCents)}` : 'Take payment'}
            </Button>
          </div>
        </SectionCard>
      </div>
    </form>
  );
}
