import express from 'express';
import twilio from 'twilio';
import { messagesApi } from '@shared/api/messages.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { AppError } from '@server/lib/app-error';
import { FAKE_TWILIO } from '@server/services';
import { handleInboundSms, simulateInboundSms } from './inbound-sms.service';

/** The SMS provider's webhook for texts to the salon's number (STOP/START), and the demo's way to send one. */
export function registerInboundSmsRoutes({ table, db, config, smsFake }: AppDeps): void {
  const authToken = config.twilio?.authToken ?? (config.useFakes ? FAKE_TWILIO.authToken : null);
  const webhook = messagesApi.inboundSms;
  apiRoute(
    table,
    webhook,
    async ({ req, res, body }) => {
      // Only the provider knows the auth token: a request it did not sign is refused before anything changes.
      const url = config.publicUrl ? `${config.publicUrl}${webhook.path}` : `${req.protocol}://${req.get('host')}${req.originalUrl}`;
      const signature = req.get('x-twilio-signature') ?? '';
      if (!authToken || !twilio.validateRequest(authToken, signature, url, req.body as Record<string, string>)) {
        throw new AppError('FORBIDDEN', 403, 'The request is not signed by the SMS provider.');
      }
      await handleInboundSms(db, body, new Date());
      res.type('text/xml').send('<?xml version="1.0" encoding="UTF-8"?><Response></Response>');
    },
    [express.urlencoded({ extended: false, limit: '20kb' })],
  );
  apiRoute(table, messagesApi.simulateInboundSms, async ({ user, body }) => simulateInboundSms(db, smsFake, user.salonId, body));
}
