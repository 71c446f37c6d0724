import type { Db } from '@server/db/database';
import { LIMITED_FAMILIES, limitedFamilyNames, processingLimitIssues, type LimitedFamily, type ProcessingLimits } from '@shared/rules/processing-limits';
import { AppError } from '@server/lib/app-error';
import { listServices } from '../services';

/**
 * A changed limit must not leave a service on the menu that its own plan breaks (the desk could no longer book
 * it as it stands): refused with 409, naming each limit and the services to change first.
 */
export async function assertServicesWithinNewLimits(db: Db, salonId: string, before: ProcessingLimits, next: ProcessingLimits | undefined): Promise<void> {
  if (!next || LIMITED_FAMILIES.every((f) => before[f] === next[f])) return;
  const over = new Map<LimitedFamily, string[]>();
  for (const service of await listServices(db, salonId)) {
    for (const issue of processingLimitIssues(service.stepPlan, next))
      over.set(issue.family, [...(over.get(issue.family) ?? []), `${service.name} (${issue.where})`]);
  }
  const [family] = over.keys();
  if (family === undefined) return;
  const fields = Object.fromEntries(
    [...over].map(([family, services]) => [
      `processingLimits.${family}`,
      `Too short for ${services.join('; ')}: change ${services.length === 1 ? 'that service' : 'those services'} first.`,
    ]),
  );
  throw new AppError(
    'CONFLICT',
    409,
    `The ${limitedFamilyNames[family].toLowerCase()} limit is too short for services on the menu. ${fields[`processingLimits.${family}`]}`,
    fields,
  );
}
