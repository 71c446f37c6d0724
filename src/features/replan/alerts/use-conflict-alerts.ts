import { useEffect } from 'react';
import type { ConflictView } from '@shared/schemas/replan.schemas';
import { chime, showNotice } from '@client/features/day-of-service';

// Raised once per page load and conflict (the later sitting, what causes it, and the rule broken).
const raised = new Set<string>();

/** Chimes and shows a browser notice (when allowed on this device) for each conflict the screen has not raised yet. */
export function useConflictAlerts(conflicts: ConflictView[]): void {
  useEffect(() => {
    for (const c of conflicts) {
      const key = `running-late:${c.sitting.sittingId}:${c.cause?.sittingId ?? ''}:${c.kind}`;
      if (raised.has(key)) continue;
      raised.add(key);
      chime();
      showNotice(`Running late: ${c.sitting.clientName}`, c.words, key);
    }
  }, [conflicts]);
}
