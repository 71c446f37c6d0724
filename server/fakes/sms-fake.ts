import express from 'express';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { CapturedSms } from '../../shared/schemas/sms.schemas';

export interface SmsFake {
  url: string;
  messages: CapturedSms[];
  /** The next `n` requests answer 503, to exercise retries. */
  failNext(n: number): void;
  close(): Promise<void>;
}

/**
 * A local stand-in for the SMS provider's Messages API, reached through the official Twilio SDK:
 * `POST /2010-04-01/Accounts/:sid/Messages.json` with a form body (To, From, Body). Keeps every message.
 */
export async function startSmsFake(port = 0): Promise<SmsFake> {
  const messages: CapturedSms[] = [];
  let failures = 0;
  const app = express();
  app.use(express.urlencoded({ extended: true }));
  app.post('/2010-04-01/Accounts/:sid/Messages.json', (req, res) => {
    if (failures > 0) {
      failures--;
      return void res.status(503).json({ code: 20503, message: 'Service unavailable (fake)', status: 503 });
    }
    const { To, From, Body } = req.body as Record<string, string>;
    if (!To || !Body) return void res.status(400).json({ code: 21604, message: "A 'To' and a 'Body' are required", status: 400 });
    const sid = `SM${String(messages.length + 1).padStart(32, '0')}`;
    messages.push({ id: messages.length + 1, sid, to: To, from: From ?? '', body: Body, receivedAt: new Date().toISOString() });
    res.status(201).json({ sid, account_sid: req.params.sid, to: To, from: From, body: Body, status: 'queued', date_created: new Date().toUTCString() });
  });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
  });
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    messages,
    failNext: (n) => {
      failures = n;
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
