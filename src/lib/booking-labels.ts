import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { BookingStatus, StepKind } from '@shared/schemas/common.schemas';
import type { SittingStatus } from '@shared/schemas/day-of-service.schemas';
import { formatMoney } from '@shared/money/money';
import { SALON_LOCALE } from '@shared/format/locale';
import type { Deposit } from '@shared/schemas/payments.schemas';

/** The words the UI uses for the API's enum values (docs/glossary.md). */
export const stepKindLabels: Record<StepKind, string> = {
  hands_on: 'Hands-on',
  developing: 'Developing',
  basin: 'Basin',
};

export const bookingStatusLabels: Record<BookingStatus, string> = {
  held: 'Held',
  booked: 'Booked',
  checked_in: 'Checked in',
  finished: 'Finished',
  checked_out: 'Checked out',
  cancelled: 'Cancelled',
  no_show: 'No-show',
};

/** Where one sitting stands on the day (docs/glossary.md, "Sitting statuses"). */
export const sittingStatusLabels: Record<SittingStatus, string> = {
  booked: 'Booked',
  arrived: 'Arrived',
  in_progress: 'In progress',
  finished: 'Finished',
  no_show: 'No-show',
};

/** "Sitting 1 of 2", or nothing for a one-sitting booking. */
export function sittingLabel(seq: number, of: number): string | null {
  return of > 1 ? `Sitting ${seq} of ${of}` : null;
}

/** "Jordan Avery's sitting 1 of 2", or "Jordan Avery's sitting" for a one-sitting booking: what a move names. */
export function whoseSitting(clientName: string, seq: number, of: number): string {
  return `${clientName}'s ${sittingLabel(seq, of)?.toLowerCase() ?? 'sitting'}`;
}

export function formatPercent(share: number | null): string {
  return share === null ? '—' : new Intl.NumberFormat(SALON_LOCALE, { style: 'percent', maximumFractionDigits: 0 }).format(share);
}

/** A cancelled booking's deposit outcome in words: "The $25.00 deposit was refunded to the client.", or nothing. */
export function depositOutcomeText(booking: Pick<BookingView, 'depositCents' | 'depositOutcome'>, currency: string): string {
  if (booking.depositOutcome === null || booking.depositCents <= 0) return '';
  const amount = formatMoney(booking.depositCents, currency);
  return booking.depositOutcome === 'kept' ? `The ${amount} deposit was kept by the salon.` : `The ${amount} deposit was refunded to the client.`;
}

/** Where a deposit stands, in words: "Deposit due $65.00", "Deposit paid", "Deposit refunded", "Deposit kept"; none asked: nothing. */
export function depositStatusText(deposit: Deposit, currency: string): string | null {
  switch (deposit.status) {
    case 'none':
      return null;
    case 'due':
      return `Deposit due ${formatMoney(deposit.dueCents, currency)}`;
    case 'paid':
      return 'Deposit paid';
    case 'refunded':
      return 'Deposit refunded';
    case 'kept':
      return 'Deposit kept';
  }
}
