import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { gunzipSync, brotliDecompressSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { signIn } from '../bench/load/http-session';

// Answers are compressed as the browser asks (RFC 9110 §12.5.3 Accept-Encoding; gzip RFC 1952, brotli RFC 7932),
// except the live event stream, which must reach the screen as it is written.
let t: TestApp;
let server: Server;
let url: string;
let desk: UserFixture;

beforeAll(async () => {
  t = await startTestApp();
  const salon = await insertSalon(t.testDb.db);
  desk = await insertUser(t.testDb.db, salon.salonId, 'front_desk');
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(async () => {
  server.closeAllConnections();
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

/** The raw answer, undecoded (node's http, since fetch would decode it). */
async function raw(path: string, acceptEncoding: string) {
  const { request } = await import('node:http');
  return new Promise<{ headers: Record<string, string | string[] | undefined>; body: Buffer }>((resolve, reject) => {
    request(`${url}${path}`, { headers: { 'accept-encoding': acceptEncoding } }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
    })
      .on('error', reject)
      .end();
  });
}

describe('compression', () => {
  it('compresses a large API answer with brotli or gzip, whichever the client takes, to the same JSON', async () => {
    const plain = await raw('/api/openapi.json', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    const gzip = await raw('/api/openapi.json', 'gzip');
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gzip.body).equals(plain.body)).toBe(true);
    const br = await raw('/api/openapi.json', 'br, gzip');
    expect(br.headers['content-encoding']).toBe('br');
    expect(brotliDecompressSync(br.body).equals(plain.body)).toBe(true);
    expect(br.body.length).toBeLessThan(plain.body.length / 4);
    expect(gzip.headers.vary).toMatch(/Accept-Encoding/i);
  });

  it('never compresses the live event stream, which opens at once even when the client accepts compression', async () => {
    const session = await signIn(url, desk.email, desk.password);
    const abort = new AbortController();
    const res = await fetch(`${url}/api/events`, { headers: { cookie: session.cookie, 'accept-encoding': 'gzip, deflate, br' }, signal: abort.signal });
    try {
      expect(res.headers.get('content-type')).toMatch(/^text\/event-stream/);
      expect(res.headers.get('content-encoding')).toBeNull();
      // The stream's opening (its retry hint) arrives without waiting for a buffer to fill.
      const reader = res.body!.getReader();
      const first = await Promise.race([reader.read(), new Promise<null>((r) => setTimeout(() => r(null), 3_000))]);
      expect(first && new TextDecoder().decode(first.value)).toMatch(/retry:/);
    } finally {
      abort.abort();
    }
  });
});
