import { describe, expect, it } from 'vitest';
import { baseUrl } from '../setup/browser';

// The built client as the app serves it: a strict Content-Security-Policy only works if the page needs no
// inline script, so the built index.html must load every script from a file.
describe('the built app shell', () => {
  it('has no inline script and is served with a script-src of self only', async () => {
    const res = await fetch(`${baseUrl()}/sign-in`);
    const html = await res.text();
    expect(html).toMatch(/<div id="root">/);
    const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
    expect(scripts.length).toBeGreaterThan(0);
    for (const [, attrs, body] of scripts) {
      expect(attrs).toMatch(/\bsrc="\/assets\//);
      expect(body!.trim()).toBe('');
    }
    expect(html).not.toMatch(/\son[a-z]+=/i);
    const csp = res.headers.get('content-security-policy') ?? '';
    const scriptSrc = csp
      .split(';')
      .map((d) => d.trim())
      .find((d) => d.startsWith('script-src '));
    expect(scriptSrc).toBe("script-src 'self'");
  });
});
