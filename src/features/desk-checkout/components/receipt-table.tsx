import type { Checkout } from '@shared/money/checkout';
import { receiptRows } from '@shared/money/receipt-text';

type Props = { receipt: Checkout; stylists: { id: string; name: string }[]; caption: string };

/** A receipt's lines, discount, tax, deposit, tips and what is paid today, as label and amount (screen and print). */
export function ReceiptTable({ receipt, stylists, caption }: Props) {
  const rows = receiptRows(receipt, (id) => stylists.find((s) => s.id === id)?.name ?? 'Stylist');
  return (
    <table className="w-full border-collapse text-left">
      <caption className="sr-only">{caption}</caption>
      <tbody>
        {rows.map((row, i) => {
          const strong = row.label === 'Total' || row.label === 'Paid today';
          return (
            <tr key={`${row.label}-${i}`} className={strong ? 'border-t border-edge font-bold' : ''}>
              <th scope="row" className="py-1 pr-4 font-normal">
                {strong ? <strong>{row.label}</strong> : row.label}
              </th>
              <td className="tabular py-1 text-right">{row.amount}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
