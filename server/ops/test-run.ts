// `npm test`: a throwaway PostgreSQL cluster, Chromium, the client build, the type-check, the lint, the boundary check and every suite,
// then one summary line. Exit status is non-zero on any failure; nothing is left running.
import { spawn } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { prepareLocalDatabase } from './local-database';
import { databaseUrl, stopCluster, type Cluster } from './postgres-cluster';
import { findChromium } from './chromium';
import { buildClientIfStale } from './client-build';
import { onShutdownSignal } from './shutdown';

const root = process.cwd();
const bin = (name: string) => join(root, 'node_modules', '.bin', name);

function run(cmd: string, args: string[], env: NodeJS.ProcessEnv = {}): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } });
    child.on('exit', (code) => resolve(code ?? 1));
  });
}

interface VitestReport {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numFailedTestSuites: number;
}

async function main(): Promise<number> {
  const started = Date.now();
  const scratch = mkdtempSync(join(tmpdir(), 'dwell-test-'));
  chmodSync(scratch, 0o755); // the postgres user must be able to enter it
  let cluster: Cluster | null = null;
  const stop = () => {
    if (cluster) stopCluster(cluster);
    rmSync(scratch, { recursive: true, force: true });
  };
  onShutdownSignal(stop);
  try {
    const port = 55000 + Math.floor(Math.random() * 4000);
    const prepared = await prepareLocalDatabase({ dataRoot: scratch, port, database: 'dwell_template', throwaway: true });
    cluster = prepared.cluster;
    const chromium = findChromium();
    // Only the browser suites need the built client; `npm test -- --project integration` skips the build.
    const projects = process.argv.slice(2).filter((_arg, i, all) => all[i - 1] === '--project');
    if (!projects.length || projects.includes('e2e')) buildClientIfStale(root);
    // The static checks run side by side, so the lint and the boundary check add little wall time;
    // DWELL_SKIP_TYPECHECK skips all three.
    const skipChecks = Boolean(process.env.DWELL_SKIP_TYPECHECK);
    const [typecheck, lint, boundaries] = skipChecks
      ? [0, 0, 0]
      : await Promise.all(['typecheck', 'lint', 'boundaries'].map((script) => run('npm', ['run', '--silent', script])));
    const reportFile = join(scratch, 'vitest-report.json');
    // Extra arguments pass through to Vitest, e.g. `npm test -- --project integration`.
    const tests = await run(bin('vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${reportFile}`, ...process.argv.slice(2)], {
      DWELL_TEST_TEMPLATE_URL: prepared.url,
      DWELL_TEST_ADMIN_URL: databaseUrl(cluster, 'postgres'),
      DWELL_CHROMIUM: chromium,
      DWELL_MODE: 'test',
    });
    const report: VitestReport | null = existsSync(reportFile) ? JSON.parse(readFileSync(reportFile, 'utf8')) : null;
    const ok = typecheck === 0 && lint === 0 && boundaries === 0 && tests === 0;
    const seconds = Math.round((Date.now() - started) / 1000);
    console.log(
      `\ndwell test: ${ok ? 'PASS' : 'FAIL'} — ` +
        (skipChecks
          ? 'typecheck, lint and boundaries skipped, '
          : `typecheck ${typecheck === 0 ? 'ok' : 'FAILED'}, lint ${lint === 0 ? 'ok' : 'FAILED'}, boundaries ${boundaries === 0 ? 'ok' : 'FAILED'}, `) +
        (report ? `${report.numPassedTests} tests passed, ${report.numFailedTests} failed, ${report.numPendingTests} skipped` : 'tests did not report') +
        ` in ${seconds}s`,
    );
    return ok ? 0 : 1;
  } catch (err) {
    console.error(`\ndwell test: FAIL — set-up failed: ${(err as Error).message}`);
    return 1;
  } finally {
    stop();
  }
}

process.exit(await main());
