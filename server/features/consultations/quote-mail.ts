import type { ConsultationView } from '@shared/schemas/consultation.schemas';
import { sittingMaxMinutes } from '@shared/schemas/step-plan.schemas';
import type { OutgoingMail } from '@server/mail/mailer';
import { formatMoney } from '@shared/money/money';
import { formatDuration } from '@shared/format/date-time';

/** The quote as the client reads it: sittings, steps, price, deposit, the cautions, and where to accept it. */
export function quoteMail(view: ConsultationView, to: string, salon: { name: string; currency: string }, acceptUrl: string): OutgoingMail {
  const q = view.quote;
  const hours = sittingMaxMinutes(q.stepPlan).map(formatDuration);
  const sittings = q.stepPlan.sittings.map((s, i) => {
    const gap = s.daysAfterPrevious ? ` (${s.daysAfterPrevious.min}–${s.daysAfterPrevious.max} days after the previous one)` : '';
    return `Sitting ${i + 1} of ${q.stepPlan.sittings.length}${gap}, up to ${hours[i]}: ${s.steps.map((st) => st.label).join(', ')}.`;
  });
  const text = [
    `Hello ${view.clientName},`,
    '',
    `Here is your quote from ${salon.name} for ${q.serviceName}, following your consultation.`,
    '',
    ...sittings,
    '',
    `Price: ${formatMoney(q.priceCents, salon.currency)}. Deposit to book: ${formatMoney(q.depositCents, salon.currency)}.`,
    ...(q.notes ? ['', q.notes] : []),
    '',
    'Colour work needs a skin test read before the appointment. The plan may change on the day if your hair needs it: your colourist decides what is safe.',
    '',
    `Accept the quote online (sign in first): ${acceptUrl}`,
  ].join('\n');
  return { to, subject: `Your quote from ${salon.name}`, text };
}
