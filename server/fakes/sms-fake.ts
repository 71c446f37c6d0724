import express from 'express';
import twilio from 'twilio';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { CapturedSms } from '@shared/schemas/sms.schemas';
import { FaultPlan, pause, type FaultControls } from './fault-plan';

export interface SmsFake extends FaultControls {
  url: string;
  messages: CapturedSms[];
  /**
   * The next `n` requests are held open and never answered or kept: a provider that has not accepted the
   * message yet, so a worker killed meanwhile has claimed a message that nobody received.
   */
  stallNext(n: number): void;
  /** How many requests are being held by stallNext. */
  stalled(): number;
  /** Where inbound texts are posted (the app's webhook), signed as the provider signs them. */
  setInboundWebhook(url: string, authToken: string): void;
  /** A text from a phone to the salon's number, delivered to the webhook; resolves with the webhook's status. */
  simulateInbound(from: string, body: string): Promise<number>;
  close(): Promise<void>;
}

/**
 * A local stand-in for the SMS provider's Messages API, reached through the official Twilio SDK:
 * `POST /2010-04-01/Accounts/:sid/Messages.json` with a form body (To, From, Body). Keeps every message.
 */
export async function startSmsFake(port = 0): Promise<SmsFake> {
  const messages: CapturedSms[] = [];
  const faults = new FaultPlan();
  let held = 0;
  let webhook: { url: string; authToken: string } | null = null;
  const app = express();
  app.use(express.urlencoded({ extended: true }));
  app.post('/2010-04-01/Accounts/:sid/Messages.json', async (req, res) => {
    const fault = faults.take();
    if (fault?.kind === 'stall') {
      held++;
      req.socket.once('close', () => held--);
      return; // never answered, never kept
    }
    if (fault?.kind === 'fail') return void res.status(503).json({ code: 20503, message: 'Service unavailable (fake)', status: 503 });
    if (fault?.kind === 'slow') await pause(fault.ms);
    const { To, From, Body } = req.body as Record<string, string>;
    if (!To || !Body) return void res.status(400).json({ code: 21604, message: "A 'To' and a 'Body' are required", status: 400 });
    const sid = `SM${String(messages.length + 1).padStart(32, '0')}`;
    messages.push({ id: messages.length + 1, sid, to: To, from: From ?? '', body: Body, receivedAt: new Date().toISOString() });
    res.status(201).json({ sid, account_sid: req.params.sid, to: To, from: From, body: Body, status: 'queued', date_created: new Date().toUTCString() });
  });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
  });
  let inbound = 0;
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    messages,
    failNext: (n) => faults.failNext(n),
    slowNext: (n, ms) => faults.slowNext(n, ms),
    stallNext: (n) => faults.stallNext(n),
    stalled: () => held,
    setInboundWebhook: (url, authToken) => {
      webhook = { url, authToken };
    },
    async simulateInbound(from, body) {
      if (!webhook) throw new Error('The SMS fake has no inbound webhook yet');
      const params = {
        MessageSid: `SMIN${String(++inbound).padStart(30, '0')}`,
        AccountSid: `AC${'0'.repeat(32)}`,
        From: from,
        To: '+19705550100',
        Body: body,
        NumMedia: '0',
      };
      // The provider signs each webhook request with the account's auth token (HMAC-SHA1 of URL + sorted params).
      const signature = twilio.getExpectedTwilioSignature(webhook.authToken, webhook.url, params);
      const res = await fetch(webhook.url, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-twilio-signature': signature },
        body: new URLSearchParams(params),
      });
      return res.status;
    },
    close: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
