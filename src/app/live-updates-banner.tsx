import { useLiveBook } from '@client/lib/live-book';

export const LIVE_UPDATES_PAUSED = 'Live updates paused — reconnecting…';

/**
 * Keeps a staff member's screens up to date with changes made elsewhere, and says so plainly while it cannot.
 * The live region is always there (empty while connected), so a screen reader announces the words when they appear.
 */
export function LiveUpdatesBanner() {
  const { paused } = useLiveBook();
  return (
    <div role="status" aria-live="polite" className="sticky top-0 z-40">
      {paused && (
        <p className="border-b-4 border-amber bg-white px-4 py-2 text-center font-bold text-ink shadow-sm">
          <span aria-hidden="true" className="mr-2 inline-block size-2 animate-pulse rounded-full bg-amber align-middle" />
          {LIVE_UPDATES_PAUSED}
        </p>
      )}
    </div>
  );
}
