import { z } from 'zod';
import { IdSchema, InstantSchema, typedText } from './common.schemas';

/** Where a booking's deposit stands (shared/rules/deposit-state.ts): due, paid, refunded, kept, or none asked. */
export const DepositStatusSchema = z.enum(['none', 'due', 'paid', 'refunded', 'kept']);
export const DepositSchema = z.object({
  status: DepositStatusSchema,
  /** Taken and not given back. */
  paidCents: z.number().int(),
  /** Still to pay (nothing once paid, or for a booking that no longer runs). */
  dueCents: z.number().int(),
  /** When the booking is released if its deposit is still unpaid (the salon's setting); null when it is not. */
  dueBy: InstantSchema.nullable(),
});
export type Deposit = z.infer<typeof DepositSchema>;

/** Where to send the client to pay on the payment provider's hosted page; null when nothing is to be paid. */
export const CheckoutAnswerSchema = z.object({ checkoutUrl: z.string().nullable() });
export type CheckoutAnswer = z.infer<typeof CheckoutAnswerSchema>;

/** One movement of a booking's deposit money: in (online card, card terminal, cash) or a refund back. */
export const DepositMovementSchema = z.object({
  id: IdSchema,
  kind: z.enum(['deposit', 'refund']),
  method: z.enum(['card', 'cash']),
  /** Through the payment provider's hosted page (or its refund); false at the desk's card terminal or in cash. */
  online: z.boolean(),
  amountCents: z.number().int(),
  /** A refund Dwell has decided on and is sending to the provider is pending until the provider has made it. */
  status: z.enum(['pending', 'succeeded']),
  at: InstantSchema,
  /** Who took it at the desk. */
  byName: z.string().nullable(),
  note: z.string(),
});

export const DepositRequestChannelSchema = z.enum(['sms', 'email']);

/** A booking's deposit as the desk sees it: where it stands, every movement, the requests sent and how they can go. */
export const DepositDetailsSchema = z.object({
  bookingId: IdSchema,
  currency: z.string(),
  depositCents: z.number().int(),
  deposit: DepositSchema,
  movements: z.array(DepositMovementSchema),
  requests: z.array(z.object({ channel: DepositRequestChannelSchema, amountCents: z.number().int(), at: InstantSchema, byName: z.string().nullable() })),
  /** Whether the client can be reached for a request: a mobile without STOP, an e-mail address. */
  reach: z.object({ sms: z.boolean(), email: z.boolean() }),
});
export type DepositDetails = z.infer<typeof DepositDetailsSchema>;

export const DepositRequestBodySchema = z.object({ channel: DepositRequestChannelSchema }).strict();
/** Taken at the desk: cash, or a card on the salon's own terminal (never typed into Dwell). */
export const DepositTakenBodySchema = z.object({ method: z.enum(['cash', 'card']), note: typedText(200).trim().default('') }).strict();

export const DepositTokenParamsSchema = z.object({ token: z.string().min(20).max(100) }).strict();

/** A deposit request as its link opens it: anyone holding the token may read it and pay it. */
export const PublicDepositSchema = z.object({
  salonName: z.string(),
  clientName: z.string(),
  serviceName: z.string(),
  stylistName: z.string(),
  /** The sitting the deposit is for: the first still to come. */
  start: InstantSchema,
  timeZone: z.string(),
  currency: z.string(),
  depositCents: z.number().int(),
  deposit: DepositSchema,
  /** False once the booking was cancelled or is over: nothing can be paid then. */
  open: z.boolean(),
});
export type PublicDeposit = z.infer<typeof PublicDepositSchema>;
export const PayDepositRequestSchema = z.object({}).strict();

/** The provider's webhook body, as documented (the raw bytes are what its signature covers). */
export const PaymentWebhookBodySchema = z.object({ id: z.string(), type: z.string(), data: z.object({ object: z.record(z.string(), z.unknown()) }) });
export const PaymentWebhookAnswerSchema = z.object({ received: z.literal(true), duplicate: z.boolean() });

/** One payment in of a booking (its deposit, balance or a stylist's tip) and what of it can still be refunded. */
export const BookingPaymentSchema = z.object({
  id: IdSchema,
  kind: z.enum(['deposit', 'balance', 'tip']),
  method: z.enum(['card', 'cash']),
  /** Through the payment provider (refunded through it); false at the desk's card terminal or in cash. */
  online: z.boolean(),
  amountCents: z.number().int(),
  /** Refunded already or on its way back. */
  refundedCents: z.number().int(),
  /** What a refund may still return. */
  leftCents: z.number().int(),
  at: InstantSchema,
  byName: z.string().nullable(),
  /** A tip's stylist. */
  stylistName: z.string().nullable(),
});
export const BookingRefundSchema = z.object({
  id: IdSchema,
  refundOf: IdSchema,
  ofKind: z.enum(['deposit', 'balance', 'tip']),
  method: z.enum(['card', 'cash']),
  amountCents: z.number().int(),
  status: z.enum(['pending', 'succeeded']),
  reason: z.string(),
  at: InstantSchema,
  byName: z.string().nullable(),
});
/** A booking's money as the desk refunds from it: every payment in and every refund. */
export const BookingPaymentsSchema = z.object({
  bookingId: IdSchema,
  currency: z.string(),
  payments: z.array(BookingPaymentSchema),
  refunds: z.array(BookingRefundSchema),
});
export type BookingPayments = z.infer<typeof BookingPaymentsSchema>;

/** A refund at the desk: of which payment, how much (in the currency's minor unit) and why. */
export const RefundBodySchema = z
  .object({
    paymentId: IdSchema,
    amountCents: z.number().int().min(1, 'Refund at least one cent').max(100_000_000),
    reason: typedText(200).trim().min(1, 'Say why the money goes back'),
  })
  .strict();
