import { describe, expect, it } from 'vitest';
import { loadConfig } from './config';

const env = (over: Record<string, string>) => ({ DATABASE_URL: 'postgres://x/y', SESSION_SECRET: 'x'.repeat(40), ...over });

describe('TRUST_PROXY', () => {
  it('believes no forwarding headers in production unless told, and loopback in local development', () => {
    expect(loadConfig(env({ DWELL_MODE: 'production' })).trustProxy).toBe(false);
    expect(loadConfig(env({ DWELL_MODE: 'dev' })).trustProxy).toEqual(['loopback']);
    expect(loadConfig(env({ DWELL_MODE: 'demo', TRUST_PROXY: 'none' })).trustProxy).toBe(false);
  });

  it('takes a load balancer by address or network, and refuses anything else at start-up', () => {
    expect(loadConfig(env({ DWELL_MODE: 'production', TRUST_PROXY: '10.0.0.0/8, 192.168.1.5' })).trustProxy).toEqual(['10.0.0.0/8', '192.168.1.5']);
    expect(() => loadConfig(env({ TRUST_PROXY: 'true' }))).toThrow(/TRUST_PROXY/);
    expect(() => loadConfig(env({ TRUST_PROXY: '2' }))).toThrow(/TRUST_PROXY/);
  });
});
