import path from 'node:path';
import express, { type Express } from 'express';

// Vite names every built script, style sheet, font and image after its content (assets/name-<hash>.ext), so a
// file there never changes under its name: browsers may keep it a year without asking. Everything else, the app
// shell above all, is revalidated on every load, so a new release is seen at once.
const FOREVER = 'public, max-age=31536000, immutable';
const REVALIDATE = 'no-cache';

/** Serves the built client from `dir`: hashed assets cached for good, index.html (every page route's answer) never. */
export function serveClient(app: Express, dir: string): void {
  const assets = path.join(dir, 'assets') + path.sep;
  app.use(
    express.static(dir, {
      index: false,
      cacheControl: false,
      setHeaders: (res, file) => res.setHeader('Cache-Control', file.startsWith(assets) ? FOREVER : REVALIDATE),
    }),
  );
  // Client-side routes: every other GET answers the app shell.
  app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dir, 'index.html'), { cacheControl: false, headers: { 'Cache-Control': REVALIDATE } }));
}
