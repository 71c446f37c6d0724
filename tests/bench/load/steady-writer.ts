import { sendJson, type HttpSession } from './http-session';

/**
 * Writes at a steady pace while a read scenario runs, so the reads are measured with their cache being
 * invalidated (every change to a salon's book moves its version). Returns what the writes answered.
 */
export function startSteadyWriter(opts: { url: string; session: HttpSession; everyMs: number; path: string; body: (i: number) => object }) {
  const statuses: Record<string, number> = {};
  let stopped = false;
  const loop = (async () => {
    for (let i = 0; !stopped; i++) {
      const { status } = await sendJson(opts.url, opts.session, 'POST', opts.path, opts.body(i));
      statuses[status] = (statuses[status] ?? 0) + 1;
      await new Promise((resolve) => setTimeout(resolve, opts.everyMs));
    }
  })();
  return {
    async stop() {
      stopped = true;
      await loop;
      return statuses;
    },
  };
}
