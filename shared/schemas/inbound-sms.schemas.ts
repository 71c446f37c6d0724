import { z } from 'zod';
import { PhoneSchema } from './contact.schemas';

/** The provider's form post; it carries many more fields (AccountSid, NumMedia…), which are kept but unused. */
export const InboundSmsSchema = z.looseObject({
  From: z.string().min(1).max(40),
  Body: z.string().max(1600),
  MessageSid: z.string().min(1).max(64),
});

/** Demo/dev: the desk makes the SMS fake deliver a text "from" a client's phone. */
export const SimulateInboundSmsSchema = z.object({ from: PhoneSchema, body: z.string().trim().min(1, 'Enter the text').max(160) }).strict();
export const SimulateInboundSmsResultSchema = z.object({ webhookStatus: z.number().int() });

/**
 * Opt-out and opt-in keywords, matched on the whole message, case-insensitive (the CTIA short-code handbook's
 * standard set, which SMS providers also apply; from memory).
 */
export const STOP_WORDS = ['STOP', 'STOPALL', 'UNSUBSCRIBE', 'CANCEL', 'END', 'QUIT'];
export const START_WORDS = ['START', 'YES', 'UNSTOP'];
