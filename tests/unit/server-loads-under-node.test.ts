import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

// Vitest resolves modules its own way; `npm start` runs the server under Node's ESM loader (through tsx).
// A package whose named exports differ between the two (CommonJS interop) only fails in the second, so
// load the whole server graph the way `npm start` does.
describe('the server module graph', () => {
  // The child gets 60 s and the test a little longer: on a busy machine compiling the graph took 15 s.
  it('loads under Node with tsx, as npm start runs it', { timeout: 70_000 }, () => {
    const res = spawnSync(
      process.execPath,
      [
        '--import',
        'tsx',
        '--input-type=module',
        '--eval',
        "await import('./server/app.ts'); await import('./server/ops/local-database.ts'); console.log('loaded')",
      ],
      {
        cwd: process.cwd(),
        encoding: 'utf8',
        timeout: 60_000,
      },
    );
    expect(res.stderr).not.toMatch(/SyntaxError|Error:/);
    expect(res.stdout.trim()).toBe('loaded');
  });
});
