import { useCallback, useState } from 'react';
import { z } from 'zod';
import { CautionsSchema, type ResumedHoldSchema } from '@shared/schemas/online-booking.schemas';

/*
 * The hold in progress, kept in sessionStorage: it survives the trip to sign in or
 * sign up (a full page change) and a reload, but not the tab, so the secret that
 * claims the hold never outlives the visit.
 */
const STORAGE_KEY = 'dwell.online-hold';

const StoredHoldSchema = z.object({
  holdId: z.string(),
  secret: z.string(),
  slug: z.string(),
  serviceId: z.string(),
  /** Filled once claimed: the cautions to read, from the claim answer. */
  cautions: CautionsSchema.nullable().default(null),
  detailsDone: z.boolean().default(false),
  cautionsAccepted: z.boolean().default(false),
});
export type StoredHold = z.infer<typeof StoredHoldSchema>;

export function readStoredHold(): StoredHold | null {
  try {
    const parsed = StoredHoldSchema.safeParse(JSON.parse(sessionStorage.getItem(STORAGE_KEY) ?? 'null'));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export function writeStoredHold(hold: StoredHold | null): void {
  try {
    if (hold) sessionStorage.setItem(STORAGE_KEY, JSON.stringify(hold));
    else sessionStorage.removeItem(STORAGE_KEY);
  } catch {
    // Private modes may refuse storage: the flow still works within this page.
  }
}

/** A resumed hold as the flow keeps it: the steps before the one it goes back to count as done. */
export function storedFromResumed(resumed: z.output<typeof ResumedHoldSchema>): StoredHold {
  return {
    holdId: resumed.holdId,
    secret: resumed.holdSecret,
    slug: resumed.salonSlug,
    serviceId: resumed.serviceId,
    cautions: resumed.cautions,
    detailsDone: resumed.step !== 'details',
    cautionsAccepted: resumed.step === 'deposit',
  };
}

/** Forgets the stored hold when it is this one (released or paid elsewhere). */
export function forgetStoredHold(holdId: string): void {
  if (readStoredHold()?.holdId === holdId) writeStoredHold(null);
}

/** The stored hold for this salon and service (another one is ignored), and a setter that writes through. */
export function useStoredHold(slug: string, serviceId: string) {
  const [hold, setHold] = useState(() => {
    const stored = readStoredHold();
    return stored && stored.slug === slug && stored.serviceId === serviceId ? stored : null;
  });
  const save = useCallback((next: StoredHold | null) => {
    writeStoredHold(next);
    setHold(next);
  }, []);
  return [hold, save] as const;
}
