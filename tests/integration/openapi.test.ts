import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, startTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('GET /api/openapi.json', () => {
  it('is an OpenAPI 3 document that lists every route the app serves, with who may call it', async () => {
    const res = await (await anonymousAgent(t.app)).get('/api/openapi.json');
    expect(res.status).toBe(200);
    expect(res.body.openapi).toMatch(/^3\./);
    const documented = new Set(
      Object.entries(res.body.paths as Record<string, Record<string, unknown>>).flatMap(([path, ops]) => Object.keys(ops).map((m) => `${m} ${path}`)),
    );
    // Routes declared outside apiRoute (file downloads) are recorded for access checks but have no JSON body.
    const missing = t.app.apiRoutes.map((r) => `${r.method} ${r.path.replace(/:(\w+)/g, '{$1}')}`).filter((r) => !documented.has(r) && !r.endsWith('.ics'));
    expect(missing).toEqual([]);
    expect(t.app.apiRoutes.length).toBeGreaterThan(40);
  });

  it('documents the SMS provider webhook with the form body the provider posts, and JSON elsewhere (the payment provider’s webhook too)', async () => {
    const doc = (await (await anonymousAgent(t.app)).get('/api/openapi.json')).body;
    expect(Object.keys(doc.paths['/webhooks/sms'].post.requestBody.content)).toEqual(['application/x-www-form-urlencoded']);
    // The payment provider posts JSON; the signature covers its raw bytes.
    expect(Object.keys(doc.paths['/webhooks/payments'].post.requestBody.content)).toEqual(['application/json']);
    expect(Object.keys(doc.paths['/api/bookings'].post.requestBody.content)).toEqual(['application/json']);
  });
});
