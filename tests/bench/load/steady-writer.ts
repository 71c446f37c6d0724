import type { HttpSession } from './http-session';

/**
 * Writes at a steady pace while a read scenario runs, so the reads are measured with their cache being
 * invalidated (every change to a salon's book moves its version). Returns what the writes answered.
 */
export function startSteadyWriter(opts: { url: string; session: HttpSession; everyMs: number; path: string; body: (i: number) => object }) {
  const statuses: Record<string, number> = {};
  let stopped = false;
  const loop = (async () => {
    for (let i = 0; !stopped; i++) {
      const res = await fetch(`${opts.url}${opts.path}`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', cookie: opts.session.cookie, 'x-csrf-token': opts.session.csrf },
        body: JSON.stringify(opts.body(i)),
      });
      await res.arrayBuffer();
      statuses[res.status] = (statuses[res.status] ?? 0) + 1;
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
