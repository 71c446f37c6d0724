import { onlineManager } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';

export const CONNECTION_LOST = 'No connection. Dwell shows what it last loaded; what you save now is sent when the connection is back.';

/**
 * Says plainly when the device has lost its connection, for everyone (staff and clients). The query cache's online
 * state is the one that pauses reads and saves meanwhile and resumes them after, so the words and the app agree.
 */
export function ConnectionBanner() {
  const online = useSyncExternalStore(
    (changed) => onlineManager.subscribe(changed),
    () => onlineManager.isOnline(),
  );
  return (
    <div role="status" aria-live="polite" className="sticky top-0 z-40">
      {!online && <p className="border-b-4 border-brick bg-white px-4 py-2 text-center font-bold text-ink shadow-sm">{CONNECTION_LOST}</p>}
    </div>
  );
}
