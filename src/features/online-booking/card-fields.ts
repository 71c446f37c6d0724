import { z } from 'zod';

/** What the card form holds: text as typed (spaces, one-digit months and two-digit years allowed). */
export type CardFields = { number: string; month: string; year: string; cvc: string };
/** What the pay call sends (the server's CardSchema). */
export type Card = { number: string; expMonth: number; expYear: number; cvc: string };

/** Digits only: people type card numbers in groups, with spaces or dashes. */
export function cardDigits(text: string): string {
  return text.replace(/[\s-]/g, '');
}

/** The Luhn check digit test every card number passes; it catches most single-digit typos before a round trip. */
export function passesLuhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let digit = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      digit *= 2;
      if (digit > 9) digit -= 9;
    }
    sum += digit;
  }
  return digits.length > 0 && sum % 10 === 0;
}

/** "7" or "07" → 7; "27" → 2027 (a two-digit year is read as this century). */
function readYear(text: string): number {
  const value = Number(text.trim());
  return text.trim().length === 2 ? 2000 + value : value;
}

/**
 * The card form's schema, for the month `today` is in (a card that expired before
 * this month is refused here rather than by the payment service). Parses the typed
 * text into the Card the pay call sends.
 */
export function cardFieldsSchema(today: { year: number; month: number }) {
  return z
    .object({
      number: z
        .string()
        .transform(cardDigits)
        .pipe(
          z
            .string()
            .regex(/^\d{12,19}$/, 'Enter the card number')
            .refine(passesLuhn, 'Check the card number'),
        ),
      month: z
        .string()
        .trim()
        .regex(/^(0?[1-9]|1[0-2])$/, 'Enter the month, 1 to 12')
        .transform(Number),
      year: z
        .string()
        .trim()
        .regex(/^(\d{2}|\d{4})$/, 'Enter the year, e.g. 2030')
        .transform(readYear),
      cvc: z
        .string()
        .trim()
        .regex(/^\d{3,4}$/, 'Enter the 3 or 4 digits on the back'),
    })
    .superRefine((card, ctx) => {
      // zod still runs this when a field failed above (with its raw text): judge expiry only on a real month and year.
      if (!Number.isInteger(card.year) || !Number.isInteger(card.month)) return;
      const expired = card.year < today.year || (card.year === today.year && card.month < today.month);
      if (expired || card.year > today.year + 30) {
        ctx.addIssue({ code: 'custom', path: ['year'], message: expired ? 'This card has expired' : 'Check the year' });
      }
    })
    .transform((card): Card => ({ number: card.number, expMonth: card.month, expYear: card.year, cvc: card.cvc }));
}

export const emptyCardFields: CardFields = { number: '', month: '', year: '', cvc: '' };
