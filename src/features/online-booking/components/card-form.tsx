import { zodResolver } from '@hookform/resolvers/zod';
import { DateTime } from 'luxon';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { cardFieldsSchema, emptyCardFields, type Card, type CardFields } from '../card-fields';

type Props = { amount: string; paying: boolean; problem: string | null; onPay: (card: Card) => void };

/** The deposit card: number, month, year, code. Numbers only leave the page in the pay call. */
export function CardForm({ amount, paying, problem, onPay }: Props) {
  const [schema] = useState(() => {
    const now = DateTime.now();
    return cardFieldsSchema({ year: now.year, month: now.month });
  });
  const { register, handleSubmit, formState } = useForm<CardFields, unknown, Card>({
    resolver: zodResolver(schema),
    defaultValues: emptyCardFields,
  });
  const { errors } = formState;
  return (
    <form onSubmit={handleSubmit(onPay)} noValidate aria-label="Card details" className="flex flex-col gap-4">
      <p className="rounded-lg bg-white px-3 py-2 text-sm ring-1 ring-ink/10">
        This demo uses a local test payment service, not a real bank: card <span className="tabular">4242 4242 4242 4242</span> succeeds and{' '}
        <span className="tabular">4000 0000 0000 0002</span> is declined. Any future date and any 3 digits work.
      </p>
      {problem && <FormAlert>{problem}</FormAlert>}
      <TextField label="Card number" inputMode="numeric" autoComplete="cc-number" error={errors.number?.message} {...register('number')} />
      <div className="grid grid-cols-3 gap-3">
        <TextField label="Month (MM)" inputMode="numeric" autoComplete="cc-exp-month" maxLength={2} error={errors.month?.message} {...register('month')} />
        <TextField label="Year (YYYY)" inputMode="numeric" autoComplete="cc-exp-year" maxLength={4} error={errors.year?.message} {...register('year')} />
        <TextField label="CVC" inputMode="numeric" autoComplete="cc-csc" maxLength={4} error={errors.cvc?.message} {...register('cvc')} />
      </div>
      <Button type="submit" busy={paying} className="w-full sm:w-auto sm:self-start">
        {paying ? 'Paying…' : `Pay deposit of ${amount}`}
      </Button>
    </form>
  );
}
