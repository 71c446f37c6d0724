/**
 * Runs `stop` once on the first SIGINT or SIGTERM. Ctrl-C signals the whole process group and tsx passes
 * the signal on as well, so a second signal arrives while stopping; it must not end the process half-way.
 */
export function onShutdownSignal(stop: () => Promise<void> | void): void {
  let stopping = false;
  const handler = () => {
    if (stopping) return;
    stopping = true;
    Promise.resolve(stop()).finally(() => process.exit(0));
  };
  process.on('SIGINT', handler);
  process.on('SIGTERM', handler);
}
