import { describe, expect, it } from 'vitest';
import { baseUrl } from '../setup/browser';

// The built client as the app serves it: files named after their content are cached for good (RFC 8246,
// immutable), the app shell is revalidated on every load (RFC 9111 §5.2.2.4, no-cache), and both travel
// compressed when the browser asks (RFC 9110 §12.5.3).
describe('the built client', () => {
  it('serves the app shell revalidated every time, and hashed scripts, styles and fonts cached for a year, compressed', async () => {
    const shell = await fetch(`${baseUrl()}/sign-in`, { headers: { 'accept-encoding': 'br, gzip' } });
    expect(shell.headers.get('cache-control')).toBe('no-cache');
    const html = await shell.text();
    const script = /<script[^>]+src="(\/assets\/[^"]+\.js)"/.exec(html)?.[1];
    const style = /<link[^>]+href="(\/assets\/[^"]+\.css)"/.exec(html)?.[1];
    expect(script).toBeDefined();
    expect(style).toBeDefined();

    // fetch decodes the body itself; the headers still say how it travelled.
    const js = await fetch(`${baseUrl()}${script}`, { headers: { 'accept-encoding': 'br, gzip' } });
    expect(js.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
    expect(js.headers.get('content-encoding')).toBe('br');
    const css = await fetch(`${baseUrl()}${style}`, { headers: { 'accept-encoding': 'gzip' } });
    expect(css.headers.get('content-encoding')).toBe('gzip');
    const cssText = await css.text();

    // Fonts come from the app itself (the CSP allows no other source): hashed files under /assets/, none inlined.
    expect(cssText).not.toMatch(/url\(["']?data:font/);
    const font = /url\(["']?(\/assets\/[^"')]+\.woff2)/.exec(cssText)?.[1];
    expect(font).toBeDefined();
    const woff2 = await fetch(`${baseUrl()}${font}`);
    expect(woff2.status).toBe(200);
    expect(woff2.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
    expect(shell.headers.get('content-security-policy')).toMatch(/font-src 'self'(;|$)/);
  });
});
