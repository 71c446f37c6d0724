/**
 * `npm run bench:web`: the public salon page's first load, as a new client on a slow phone connection sees it.
 * The client is built (when stale) and served by the real app on a throwaway copy of the demo salon (or, with
 * DWELL_URL, an app already running, e.g. `npm start`'s). Headless Chromium opens the page RUNS times (default 5),
 * each in a fresh profile (an empty cache) under Chrome DevTools' throttling: 1.6 Mbps down, 750 kbps up, 150 ms
 * round trip and a 4× slower CPU (Lighthouse's "slow 4G" mobile settings). It prints the JavaScript the page
 * loads (gzip, level 6, summed over every script file), the first contentful paint (the Paint Timing API's
 * `first-contentful-paint`) and when the salon's name is on screen, as medians. Targets: JavaScript ≤ 120 KB
 * gzip and first contentful paint ≤ 1.5 s. Never run by `npm test`; the last line is the figure to report.
 */
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium, type Browser } from 'playwright-core';
import { loadConfig } from '@server/config';
import { createDb, createPool } from '@server/db/database';
import { loadDemoSalon } from '@server/demo/load-demo-salon';
import { findChromium } from '@server/ops/chromium';
import { buildClientIfStale } from '@server/ops/client-build';
import { prepareLocalDatabase } from '@server/ops/local-database';
import { stopCluster, type Cluster } from '@server/ops/postgres-cluster';
import { onShutdownSignal } from '@server/ops/shutdown';
import { startServer, type RunningServer } from '@server/main';

const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const PAGE = '/salon/kestrel-and-pine';
const SALON_NAME = 'Kestrel & Pine Hair Studio';
const TARGET_JS_KB = 120;
const TARGET_FCP_MS = 1_500;
// Chrome DevTools' throttling as Lighthouse sets it for a mobile page: bytes per second and the added round trip.
const NETWORK = { offline: false, latency: 150, downloadThroughput: (1_600 * 1024) / 8, uploadThroughput: (750 * 1024) / 8 };
const CPU_SLOWDOWN = 4;

interface Run {
  fcpMs: number;
  nameShownMs: number;
  scripts: { url: string; gzipBytes: number }[];
}

/** One first visit in a fresh profile: the page's scripts and its paint times. */
async function visit(browser: Browser, url: string): Promise<Run> {
  const context = await browser.newContext({ viewport: { width: 375, height: 800 }, isMobile: true });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', NETWORK);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_SLOWDOWN });
  const scripts: Promise<{ url: string; gzipBytes: number }>[] = [];
  page.on('response', (response) => {
    if (response.request().resourceType() !== 'script') return;
    scripts.push(response.body().then((body) => ({ url: new URL(response.url()).pathname, gzipBytes: gzipSync(body, { level: 6 }).length })));
  });
  await page.goto(url, { waitUntil: 'load' });
  await page.getByRole('heading', { level: 1, name: SALON_NAME }).waitFor({ timeout: 60_000 });
  // Performance entries are in the page's own clock, from the start of the navigation.
  const nameShownMs = await page.evaluate(() => performance.now());
  const fcpMs = await page.evaluate(
    () =>
      new Promise<number>((resolve) =>
        new PerformanceObserver((list) => {
          const fcp = list.getEntriesByName('first-contentful-paint')[0];
          if (fcp) resolve(fcp.startTime);
        }).observe({ type: 'paint', buffered: true }),
      ),
  );
  await page.waitForLoadState('networkidle');
  const run = { fcpMs, nameShownMs, scripts: await Promise.all(scripts) };
  await context.close();
  return run;
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)] ?? NaN;

/** The app to measure: DWELL_URL, or the demo salon on a throwaway cluster served by an app started here. */
async function appUnderTest(scratch: string, onCluster: (c: Cluster) => void): Promise<{ url: string; server: RunningServer | null }> {
  if (process.env.DWELL_URL) return { url: process.env.DWELL_URL.replace(/\/$/, ''), server: null };
  buildClientIfStale(process.cwd());
  const prepared = await prepareLocalDatabase({ dataRoot: scratch, port: 57000 + Math.floor(Math.random() * 2000), database: 'dwell_web', throwaway: true });
  onCluster(prepared.cluster);
  const db = createDb(createPool(prepared.url));
  await loadDemoSalon(db, new Date());
  await db.destroy();
  const server = await startServer(loadConfig({ DATABASE_URL: prepared.url, DWELL_MODE: 'test', PORT: '0' }));
  return { url: server.url, server };
}

async function main(): Promise<number> {
  const scratch = mkdtempSync(join(tmpdir(), 'dwell-web-'));
  chmodSync(scratch, 0o755); // the postgres user must be able to enter it
  let cluster: Cluster | null = null;
  let server: RunningServer | null = null;
  let browser: Browser | null = null;
  const cleanUp = async () => {
    await browser?.close();
    await server?.close();
    if (cluster) stopCluster(cluster);
    rmSync(scratch, { recursive: true, force: true });
  };
  onShutdownSignal(cleanUp);
  try {
    const app = await appUnderTest(scratch, (c) => (cluster = c));
    server = app.server;
    browser = await chromium.launch({ executablePath: findChromium(), headless: true, args: ['--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'] });
    console.log(`dwell web: ${app.url}${PAGE}, ${RUNS} first visits at 375 px, 1.6 Mbps / 150 ms RTT / ${CPU_SLOWDOWN}× CPU`);
    const runs: Run[] = [];
    for (let i = 0; i < RUNS; i++) {
      const run = await visit(browser, `${app.url}${PAGE}`);
      runs.push(run);
      console.log(`  visit ${i + 1}: first contentful paint ${Math.round(run.fcpMs)} ms, salon name shown ${Math.round(run.nameShownMs)} ms`);
    }
    const scripts = runs[0]?.scripts ?? [];
    for (const s of [...scripts].sort((a, b) => b.gzipBytes - a.gzipBytes)) console.log(`  ${(s.gzipBytes / 1024).toFixed(1).padStart(6)} KB  ${s.url}`);
    // Throttling slows the page's CPU 4× on top of whatever else the machine is doing: say how busy it was.
    console.log(`  load average during the visits: ${loadavg()[0]?.toFixed(1)} on this machine`);
    const jsKb = scripts.reduce((sum, s) => sum + s.gzipBytes, 0) / 1024;
    const fcp = median(runs.map((r) => r.fcpMs));
    const shown = median(runs.map((r) => r.nameShownMs));
    const ok = jsKb <= TARGET_JS_KB && fcp <= TARGET_FCP_MS;
    console.log(
      `\ndwell web: ${ok ? 'PASS' : 'FAIL'} — public salon page: ${jsKb.toFixed(1)} KB gzip JavaScript in ${scripts.length} files (target ≤ ${TARGET_JS_KB} KB), first contentful paint ${(fcp / 1000).toFixed(2)} s (target ≤ ${TARGET_FCP_MS / 1000} s), salon name shown ${(shown / 1000).toFixed(2)} s (medians of ${runs.length})`,
    );
    return ok ? 0 : 1;
  } catch (err) {
    console.error(`dwell web: failed — ${(err as Error).stack ?? err}`);
    return 1;
  } finally {
    await cleanUp();
  }
}

process.exit(await main());
