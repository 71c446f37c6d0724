import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import { RetailProductInputSchema, type RetailProduct, type RetailProductInput } from '@shared/schemas/retail-product.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { MoneyField } from '@client/components/ui/money-field';
import { TextField } from '@client/components/ui/text-field';
import { isApiError } from '@client/lib/api-error';
import { fieldError, showServerErrors } from '@client/lib/form-errors';
import { useAddRetailProduct, useChangeRetailProduct, useListedStock } from '../api/retail-product-queries';

type Props = { product?: RetailProduct; currency: string; onSaved: (saved: RetailProduct) => void };
const fieldNames = ['name', 'priceCents', 'stock'] as const;

/** Adds a product, or changes one's name, price and counted stock (remounted for each, so it starts afresh). */
export function RetailProductForm({ product, currency, onSaved }: Props) {
  const add = useAddRetailProduct();
  const change = useChangeRetailProduct();
  const listedStock = useListedStock();
  // The stock this form showed: a new count is written only over that, never over a sale made meanwhile.
  const [seen, setSeen] = useState(product?.stock ?? 0);
  const form = useForm<RetailProductInput>({
    resolver: zodResolver(RetailProductInputSchema),
    defaultValues: product ? { name: product.name, priceCents: product.priceCents, stock: product.stock } : { name: '', stock: 0 },
  });
  // Picking a product to change takes the eye and the keyboard to the form (below the list on a phone).
  const opensForChange = product !== undefined;
  const { setFocus } = form;
  useEffect(() => {
    if (opensForChange) setFocus('name');
  }, [opensForChange, setFocus]);
  const { errors, isSubmitting } = form.formState;
  const err = (name: string) => fieldError(errors, name);
  const label = product ? `Change ${product.name}` : 'New product';
  const submit = form.handleSubmit(async (values) => {
    try {
      const saved = product
        ? await change.mutateAsync({ id: product.id, body: { ...values, stockSeen: seen, active: product.active } })
        : await add.mutateAsync(values);
      onSaved(saved);
    } catch (error) {
      showServerErrors(error, form.setError, fieldNames);
      // A sale moved the stock: the next save counts over the stock as it now stands.
      const now = product && isApiError(error, 'CONFLICT') ? listedStock(product.id) : undefined;
      if (now !== undefined) setSeen(now);
    }
  });
  return (
    <form aria-label={label} noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-3">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Name" className="sm:col-span-2" error={err('name')} {...form.register('name')} />
        <MoneyField control={form.control} name="priceCents" label="Price" currency={currency} error={err('priceCents')} />
        <TextField
          label="In stock"
          hint={product ? `Stock read as ${seen}; sales at checkout lower it.` : 'Sales at checkout lower it.'}
          type="number"
          inputMode="numeric"
          min={0}
          error={err('stock')}
          {...form.register('stock', { valueAsNumber: true })}
        />
      </div>
      <div>
        <Button type="submit" variant={product ? 'primary' : 'secondary'} busy={isSubmitting}>
          {product ? 'Save product' : 'Add product'}
        </Button>
      </div>
    </form>
  );
}
