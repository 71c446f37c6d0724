import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { BookingOptionsRequest, BookingOptionsResponse } from '../../../shared/schemas/booking.schemas';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import { planOptions } from '../../../shared/engine/engine';
import { checkStarts } from '../../../shared/rules/skin-test-rule';
import { AppError, notFound } from '../../lib/app-error';
import { findClient } from '../clients/clients.repository';
import { findService } from '../services/services.repository';
import { skinTestVerdictFor, testedSittingStarts } from '../skin-tests/skin-test-check.service';
import { loadSalonCalendars } from '../planning/salon-calendars.repository';
import { horizonFor, localEarliest, toBookingOption, toEngineSittings } from '../planning/engine-request';
import { loadNames } from '../planning/names.repository';
import { assertWithinProcessingLimits } from '../planning/processing-limits-check';
import { localDateOf } from '../../../shared/time/salon-time';

/** How many days of first sittings the desk's search looks through. */
const SEARCH_DAYS = 42;

/** Options for a (possibly edited) service for a client, earliest first, one per stylist and day. */
export async function findBookingOptions(db: Db, salon: Salon, body: Required<BookingOptionsRequest>, now: Date): Promise<BookingOptionsResponse> {
  const [client, service] = await Promise.all([findClient(db, salon.id, body.clientId), findService(db, salon.id, body.serviceId)]);
  if (!client) throw notFound('That client');
  if (!service) throw notFound('That service');
  const plan = body.stepPlan as StepPlan;
  assertWithinProcessingLimits(plan, salon.processingLimits);
  // The rule follows the steps as edited here, whatever service they are booked under.
  const verdict = await skinTestVerdictFor(db, salon, client.id, plan, service.needsSkinTest, now);
  const firstAllowed = verdict.windows.reduce<Date | null>((a, w) => (!a || w.from < a ? w.from : a), null);
  const skinTest = { required: verdict.required, ok: verdict.status !== 'blocked', status: verdict.status, message: verdict.message, earliestAllowed: firstAllowed?.toISOString() ?? null };
  if (verdict.status === 'blocked') return { timeZone: salon.timeZone, skinTest, options: [] };

  const earliest = new Date(Math.max(now.getTime(), DateTime.fromISO(body.earliestDate, { zone: salon.timeZone }).toMillis(), firstAllowed?.getTime() ?? 0));
  const fromDate = localDateOf(earliest, salon.timeZone);
  const calendars = await loadSalonCalendars(db, salon.id, horizonFor(fromDate, body.stepPlan, SEARCH_DAYS));
  if (body.stylistId && !calendars.stylists.some((s) => s.id === body.stylistId)) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { stylistId: 'No such stylist in this salon.' });
  }
  const answer = planOptions({
    ...calendars,
    request: {
      skill: service.skill,
      stylist: body.stylistId,
      earliest: localEarliest(earliest, salon.timeZone, salon.granularityMinutes),
      sittings: toEngineSittings(body.stepPlan),
      // Some options may fall outside what the skin test allows (a later sitting after its validity): ask for more.
      limit: verdict.required ? Math.min(60, body.limit * 3) : body.limit,
      spread: 'day',
    },
  });
  const names = await loadNames(db, salon.id);
  const options = answer.options
    .map((o) => ({ o, check: checkStarts(verdict, testedSittingStarts(plan, o.sittings.map((s) => new Date(s.steps[0].start)), salon, service.needsSkinTest)) }))
    .filter((x) => x.check.status !== 'refused')
    .slice(0, body.limit)
    .map(({ o, check }) => toBookingOption(o, plan, names, check.status as 'not_needed' | 'passed' | 'waiting'));
  return { timeZone: salon.timeZone, skinTest, options };
}
