import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { availableParallelism } from 'node:os';

const here = (dir: string) => fileURLToPath(new URL(dir, import.meta.url));

/**
 * rrule's ES build names source maps whose sources the package does not ship, so the test runner (which loads
 * that build through Vite) warned once per file. Its files are read here without the map comment.
 */
const rruleWithoutSourceMaps = {
  name: 'rrule-without-source-maps',
  enforce: 'pre' as const,
  load(id: string) {
    return /\/node_modules\/rrule\/dist\/esm\/.+\.js$/.test(id) ? readFileSync(id, 'utf8').replace(/\/\/# sourceMappingURL=\S+\s*$/, '') : null;
  },
};

/**
 * FullCalendar's styles (injected by its script) declare its icon font inline, as a data: URL, which the app's
 * content security policy refuses (fonts only from the app itself), so each calendar page logged a refused font.
 * The week view shows no FullCalendar icons (its own toolbar is off), so the declaration is left out of the build.
 */
const fullCalendarWithoutIconFont = {
  name: 'fullcalendar-without-icon-font',
  transform(code: string, id: string) {
    return /\/@fullcalendar\/core\/internal-common\.js$/.test(id) ? code.replace(/@font-face\{font-family:fcicons;[^}]*\}/, '') : null;
  },
};

/** Chunks of pages only staff open (src/app/routes: owner-…, desk-…, stylist-…, consultation…, outbox). */
const STAFF_PAGE_CHUNK = /(^|\/)(owner-|desk-|stylist-|consultation|outbox)[^/]*\.js$/;

// One config for the client build, the dev server and the three test projects.
export default defineConfig({
  plugins: [react(), tailwindcss(), rruleWithoutSourceMaps, fullCalendarWithoutIconFont],
  // The same aliases as tsconfig.base.json's paths (tsx reads those for the server).
  resolve: { alias: { '@shared': here('./shared'), '@server': here('./server'), '@client': here('./src') } },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    // Browsers Dwell supports preload modules themselves; the polyfill would ride in every first load.
    modulePreload: {
      polyfill: false,
      // Staff pages fetch their shared pieces when opened (one more round trip on the salon's own network, with the
      // app already cached); only pages a client reaches from a link list theirs ahead. The lists ride in the first
      // file every visitor loads, and the public page's first load is held to 120 KB of JavaScript.
      resolveDependencies: (filename, deps) => (STAFF_PAGE_CHUNK.test(filename) ? [] : deps),
    },
    // Our own modules only declare things (schemas, contracts, components): one that nothing uses is left out, so a
    // page that needs one contract does not carry every schema of the modules it sits beside.
    rolldownOptions: { treeshake: { moduleSideEffects: [{ test: /\/(shared|src)\/.+\.tsx?$/, sideEffects: false }] } },
  },
  server: {
    port: 5173,
    host: '127.0.0.1',
    // The dev server forwards API calls to Express (started by `npm run dev`).
    proxy: { '/api': `http://127.0.0.1:${process.env.PORT ?? 3000}` },
  },
  test: {
    // Vitest's default is one worker fewer than the cores: on a two-core CI machine, one worker for every suite. Two
    // let the unit and integration files (a database each) run two at a time; the browser files, one at a time
    // (fileParallelism below), run after them.
    maxWorkers: Math.max(2, availableParallelism() - 1),
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          environment: 'node',
          include: ['shared/**/*.test.ts', 'src/**/*.test.{ts,tsx}', 'server/**/*.test.ts', 'tests/unit/**/*.test.ts', 'tests/engine/**/*.test.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          environment: 'node',
          include: ['tests/integration/**/*.test.ts'],
          globalSetup: ['tests/setup/integration-global-setup.ts'],
          testTimeout: 20_000,
          hookTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/setup/e2e-global-setup.ts'],
          fileParallelism: false,
          // A file's concurrent tests (the accessibility walk's read-only walks) run two at a time, for two cores.
          maxConcurrency: 2,
          // Journeys click through many screens and run axe several times; CI machines may be busy.
          testTimeout: 180_000,
          hookTimeout: 90_000,
        },
      },
    ],
  },
});
