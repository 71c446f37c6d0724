import type { Deposit } from '@shared/schemas/payments.schemas';
import { depositStatusText } from '@client/lib/booking-labels';

// Words carry the meaning (due, paid, refunded, kept); the border only adds emphasis.
const looks: Record<Deposit['status'], string> = {
  none: '',
  due: 'border-amber',
  paid: 'border-sage',
  refunded: 'border-ink/40',
  kept: 'border-oxide',
};

type Props = { deposit: Deposit; currency: string };

/** A booking's deposit where the book shows it: due (with the amount), paid, refunded or kept; nothing when none is asked. */
export function DepositBadge({ deposit, currency }: Props) {
  const text = depositStatusText(deposit, currency);
  if (!text) return null;
  return <span className={`inline-block rounded-full border-2 bg-white px-2 py-0.5 text-xs font-bold tabular ${looks[deposit.status]}`}>{text}</span>;
}
