import type { Checkout } from '@shared/money/checkout';
import { receiptRows } from '@shared/money/receipt-text';
import type { ClientMessage } from '../messages';

/** The receipt by e-mail, once per checkout (its key), through the send log like every other message. */
export function receiptMessage(r: {
  salonId: string;
  salonName: string;
  clientId: string;
  checkoutId: string;
  serviceName: string;
  receipt: Checkout;
  paidBy: string;
  stylistName: (id: string) => string;
}): ClientMessage {
  const rows = receiptRows(r.receipt, r.stylistName).map((row) => `${row.label}: ${row.amount}`);
  return {
    salonId: r.salonId,
    clientId: r.clientId,
    kind: 'receipt',
    key: `receipt:${r.checkoutId}`,
    subject: `${r.salonName}: your receipt`,
    email: `Hello,\n\nThank you for your visit to ${r.salonName} (${r.serviceName}). Your receipt:\n\n${rows.join('\n')}\n\nPaid by ${r.paidBy}.\n`,
    sms: `${r.salonName}: your receipt was sent by e-mail.`,
    channels: ['email'],
  };
}
