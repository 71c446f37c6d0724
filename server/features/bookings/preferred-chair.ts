import type { Db } from '@server/db/database';
import type { PlacedSitting } from '../planning';
import { chairFreeBetween } from './bookings.repository';

/**
 * The chair for a sitting the engine placed: the wanted one (the chair the person saw, or the one a moved sitting
 * already has) when it is a live chair of the salon, in service and free for the whole sitting; else the engine's.
 * The engine picks any free chair, and a client moved from chair to chair for no reason is a worse day for both.
 */
export async function preferredChair(db: Db, salonId: string, sitting: PlacedSitting, wanted: string | undefined, exceptBookingId?: string): Promise<string> {
  if (!wanted || wanted === sitting.chair) return sitting.chair;
  // The engine places no empty sitting.
  const start = new Date(sitting.steps[0]!.start);
  const end = new Date(sitting.steps[sitting.steps.length - 1]!.end);
  return (await chairFreeBetween(db, salonId, wanted, start, end, exceptBookingId)) ? wanted : sitting.chair;
}
