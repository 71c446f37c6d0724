/**
 * `npm run plan -- options|windows|occupancy <scenario.json>`: one JSON answer on stdout.
 * Bad input exits 2 with the field named on stderr and nothing on stdout. The only engine file
 * (kept on the server side) that touches the file system or the process.
 */
import { readFileSync } from 'node:fs';
import { findWindows, measureOccupancy, parseScenario, planOptions, ScenarioError } from '@shared/engine/engine';

const queries = { options: planOptions, windows: findWindows, occupancy: measureOccupancy } as const;
const usage = 'usage: npm run plan -- options|windows|occupancy <scenario.json>';

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(2);
}

function main(argv: string[]): void {
  const [query, file] = argv;
  if (!query || !file || !(query in queries)) fail(usage);
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    fail(`cannot read ${file}: ${(e as Error).message}`);
  }
  try {
    const answer = queries[query as keyof typeof queries](parseScenario(text));
    process.stdout.write(`${JSON.stringify(answer, null, 2)}\n`);
  } catch (e) {
    if (e instanceof ScenarioError) fail(`invalid scenario: ${e.message}`);
    throw e;
  }
}

main(process.argv.slice(2));
