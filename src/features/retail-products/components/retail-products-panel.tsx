import { useState } from 'react';
import type { RetailProduct } from '@shared/schemas/retail-product.schemas';
import { formatMoney } from '@shared/money/money';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SectionCard } from '@client/components/ui/section-card';
import { problemText } from '@client/lib/api-error';
import { useChangeRetailProduct } from '../api/retail-product-queries';
import { RetailProductForm } from './retail-product-form';

/** The owner's product list beside one form (add, or change the product picked); retire and put back on sale. */
export function RetailProductsPanel({ products, currency }: { products: RetailProduct[]; currency: string }) {
  const change = useChangeRetailProduct();
  const [editing, setEditing] = useState<string | null>(null);
  const [formKey, setFormKey] = useState(0);
  const [notice, setNotice] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const picked = products.find((p) => p.id === editing);
  // Retiring or returning leaves the count alone: the stock is sent as the list shows it, and so never written.
  const setOnSale = (p: RetailProduct, active: boolean) =>
    change.mutate(
      { id: p.id, body: { name: p.name, priceCents: p.priceCents, stock: p.stock, stockSeen: p.stock, active } },
      {
        onSuccess: () => setNotice({ tone: 'success', text: active ? `${p.name} is on sale again.` : `${p.name} is retired: checkout no longer offers it.` }),
        onError: (e) => setNotice({ tone: 'error', text: problemText(e) }),
      },
    );
  const done = (text: string) => {
    setNotice({ tone: 'success', text });
    setEditing(null);
    setFormKey((k) => k + 1);
  };
  return (
    <div className="flex flex-col gap-4">
      {notice && <FormAlert tone={notice.tone}>{notice.text}</FormAlert>}
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <SectionCard title="Products">
          {products.length === 0 ? (
            <p>No products yet.</p>
          ) : (
            <ul aria-label="Products" className="flex flex-col gap-3">
              {products.map((p) => (
                <li key={p.id} className="flex flex-wrap items-center justify-between gap-3 border-b border-ink/10 pb-3">
                  <div>
                    <p className="font-bold">
                      {p.name} {!p.active && <span className="font-normal text-ink/80">· retired</span>}
                    </p>
                    <p className="tabular">
                      {formatMoney(p.priceCents, currency)} · {p.stock} in stock
                    </p>
                  </div>
                  <div className="flex flex-wrap gap-2">
                    <Button variant="secondary" aria-label={`Change ${p.name}`} onClick={() => setEditing(p.id)}>
                      Change
                    </Button>
                    <Button
                      variant="secondary"
                      aria-label={p.active ? `Retire ${p.name}` : `Put ${p.name} back on sale`}
                      busy={change.isPending && change.variables.id === p.id}
                      onClick={() => setOnSale(p, !p.active)}
                    >
                      {p.active ? 'Retire' : 'Put back on sale'}
                    </Button>
                  </div>
                </li>
              ))}
            </ul>
          )}
        </SectionCard>
        <SectionCard title={picked ? `Change ${picked.name}` : 'Add a product'}>
          <RetailProductForm
            key={picked ? picked.id : `new-${formKey}`}
            product={picked}
            currency={currency}
            onSaved={(saved) => done(picked ? `${saved.name} is saved.` : `${saved.name} is added.`)}
          />
          {picked && (
            <Button variant="quiet" className="mt-2" onClick={() => setEditing(null)}>
              Add a product instead
            </Button>
          )}
        </SectionCard>
      </div>
    </div>
  );
}
