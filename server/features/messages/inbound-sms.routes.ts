import express from 'express';
import twilio from 'twilio';
import { InboundSmsSchema, SimulateInboundSmsResultSchema, SimulateInboundSmsSchema, inboundSmsWebhookPath, simulateInboundSmsPath } from '../../../shared/schemas/inbound-sms.schemas';
import type { AppDeps } from '../../app-deps';
import { DESK } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { storedPhone } from '../../lib/stored-phone';
import { salonCountry } from '../salon/salon.repository';
import { AppError, notFound } from '../../lib/app-error';
import { FAKE_TWILIO } from '../../services';
import { handleInboundSms } from './inbound-sms.service';

/** The SMS provider's webhook for texts to the salon's number (STOP/START), and the demo's way to send one. */
export function registerInboundSmsRoutes({ table, db, config, smsFake }: AppDeps): void {
  const authToken = config.twilio?.authToken ?? (config.useFakes ? FAKE_TWILIO.authToken : null);
  table.router.use(inboundSmsWebhookPath, express.urlencoded({ extended: false, limit: '20kb' }));
  apiRoute(
    table,
    { method: 'post', path: inboundSmsWebhookPath, access: 'public', summary: 'SMS provider webhook: a text to the salon (STOP turns SMS off, START on)', body: InboundSmsSchema, bodyType: 'form' },
    async ({ req, res, body }) => {
      // Only the provider knows the auth token: a request it did not sign is refused before anything changes.
      const url = config.publicUrl ? `${config.publicUrl}${inboundSmsWebhookPath}` : `${req.protocol}://${req.get('host')}${req.originalUrl}`;
      const signature = req.get('x-twilio-signature') ?? '';
      if (!authToken || !twilio.validateRequest(authToken, signature, url, req.body as Record<string, string>)) {
        throw new AppError('FORBIDDEN', 403, 'The request is not signed by the SMS provider.');
      }
      await handleInboundSms(db, body, new Date());
      res.type('text/xml').send('<?xml version="1.0" encoding="UTF-8"?><Response></Response>');
    },
  );
  apiRoute(
    table,
    { method: 'post', path: simulateInboundSmsPath, access: DESK, summary: 'Demo/dev: the SMS fake delivers a text from a phone to the webhook', body: SimulateInboundSmsSchema, response: SimulateInboundSmsResultSchema },
    async ({ user, body }) => {
      if (!smsFake) throw notFound('The demo SMS service');
      const from = storedPhone(body.from, await salonCountry(db, user.salonId), 'from');
      return { webhookStatus: await smsFake.simulateInbound(from, body.body) };
    },
  );
}
