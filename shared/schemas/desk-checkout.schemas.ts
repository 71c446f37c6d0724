import { z } from 'zod';
import { BookingStatusSchema, IdSchema, InstantSchema, typedText } from './common.schemas';

/*
 * Checkout at the desk: what the desk chooses (a "from" price within its range, products, a discount, the tip, how
 * the client pays) and what the server answers. Every amount the client pays is the server's, worked out with
 * computeCheckout (shared/money/checkout.ts) from the booking, the product list and the salon's tax.
 */

const minor = (what: string) =>
  z
    .number({ error: `Enter ${what}` })
    .int('Whole minor units')
    .min(0, 'Not below zero')
    .max(100_000_000, 'Too large');

const reason = typedText(300);

export const DeskCheckoutBodySchema = z
  .object({
    /** One per service line of the visit, in the order GET …/checkout lists them; `chargedCents` only for a "from" price. */
    services: z.array(z.object({ chargedCents: minor('the price set').optional(), reason: reason.optional() }).strict()).max(10),
    retail: z
      .array(
        z
          .object({
            productId: IdSchema,
            quantity: z.number({ error: 'Enter how many' }).int('Whole items').min(1, 'At least 1').max(1000, 'At most 1000'),
          })
          .strict(),
      )
      .max(50),
    discount: z
      .discriminatedUnion('kind', [
        z.object({ kind: z.literal('amount'), cents: minor('the discount'), reason }).strict(),
        z.object({ kind: z.literal('percent'), milliPercent: z.number().int().min(0).max(100_000), reason }).strict(),
      ])
      .nullable(),
    tipCents: minor('the tip'),
    /** Card on the hosted page, cash at the desk, or split: `cashCents` in cash now, the rest on the hosted page. */
    pay: z.discriminatedUnion('method', [
      z.object({ method: z.literal('card') }).strict(),
      z.object({ method: z.literal('cash') }).strict(),
      z.object({ method: z.literal('split'), cashCents: minor('the cash part') }).strict(),
    ]),
    /** What the desk's screen showed the client would pay; ignored (the server works out every amount itself). */
    shownToPayCents: z.number().int().optional(),
  })
  .strict();
export type DeskCheckoutBody = z.infer<typeof DeskCheckoutBodySchema>;

const ReceiptLineSchema = z.object({
  kind: z.enum(['service', 'retail']),
  label: z.string(),
  quantity: z.number().int(),
  unitCents: z.number().int(),
  amountCents: z.number().int(),
  discountCents: z.number().int(),
  chargedCents: z.number().int(),
  reason: z.string().nullable(),
});

/** The receipt as computeCheckout answers it, with the tip's stylists named. */
export const ReceiptSchema = z.object({
  currency: z.string(),
  lines: z.array(ReceiptLineSchema),
  subtotalCents: z.number().int(),
  discountCents: z.number().int(),
  discountReason: z.string().nullable(),
  taxRateMilliPercent: z.number().int(),
  taxInclusive: z.boolean(),
  taxCents: z.number().int(),
  netCents: z.number().int(),
  totalCents: z.number().int(),
  depositPaidCents: z.number().int(),
  dueCents: z.number().int(),
  tipCents: z.number().int(),
  tipShares: z.array(z.object({ stylistId: IdSchema, name: z.string(), cents: z.number().int() })),
  toPayCents: z.number().int(),
});
export type Receipt = z.infer<typeof ReceiptSchema>;

export const CheckoutPaymentSchema = z.object({
  kind: z.enum(['balance', 'tip']),
  method: z.enum(['card', 'cash']),
  amountCents: z.number().int(),
  stylistName: z.string().nullable(),
  at: InstantSchema,
});

/** A visit's checkout at the desk: what it can charge, and the checkout once made (its receipt and money). */
export const DeskCheckoutSchema = z.object({
  bookingId: IdSchema,
  bookingStatus: BookingStatusSchema,
  clientName: z.string(),
  clientEmail: z.string().nullable(),
  salonName: z.string(),
  currency: z.string(),
  tax: z.object({ rateMilliPercent: z.number().int(), inclusive: z.boolean() }),
  /** Whether the visit can be checked out now, and why not. */
  ready: z.boolean(),
  notReadyReason: z.string().nullable(),
  services: z.array(
    z.object({
      label: z.string(),
      priceCents: z.number().int(),
      /** A "from" price: set at checkout from `priceCents` up to `upToCents` (the price quoted), with a reason. */
      upToCents: z.number().int().nullable(),
    }),
  ),
  /** The stylists who worked on the visit: the tip is split equally between them. */
  stylists: z.array(z.object({ id: IdSchema, name: z.string() })),
  depositPaidCents: z.number().int(),
  /** The owner's products on sale. */
  products: z.array(z.object({ id: IdSchema, name: z.string(), priceCents: z.number().int(), stock: z.number().int() })),
  checkout: z
    .object({
      id: IdSchema,
      status: z.enum(['open', 'paid']),
      receipt: ReceiptSchema,
      /** The cash part taken at the desk and the card part on the hosted page. */
      cashCents: z.number().int(),
      cardCents: z.number().int(),
      /** The hosted payment page for the card part while it is unpaid. */
      checkoutUrl: z.string().nullable(),
      payments: z.array(CheckoutPaymentSchema),
      createdAt: InstantSchema,
      paidAt: InstantSchema.nullable(),
    })
    .nullable(),
});
export type DeskCheckout = z.infer<typeof DeskCheckoutSchema>;
