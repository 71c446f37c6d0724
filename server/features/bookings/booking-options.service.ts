import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { BookingOptionsRequest, BookingOptionsResponse } from '../../../shared/schemas/booking.schemas';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import { planOptions } from '../../../shared/engine/engine';
import { checkSkinTest } from '../../../shared/rules/skin-test-rule';
import { AppError, notFound } from '../../lib/app-error';
import { findClient } from '../clients/clients.repository';
import { findService } from '../services/services.repository';
import { skinTestRecords } from '../skin-tests/skin-tests.repository';
import { loadSalonCalendars } from '../planning/salon-calendars.repository';
import { horizonFor, localEarliest, toBookingOption, toEngineSittings } from '../planning/engine-request';
import { loadNames } from '../planning/names.repository';

/** How many days of first sittings the desk's search looks through. */
const SEARCH_DAYS = 42;

/** Options for a (possibly edited) service for a client, earliest first, one per stylist and day. */
export async function findBookingOptions(db: Db, salon: Salon, body: Required<BookingOptionsRequest>, now: Date): Promise<BookingOptionsResponse> {
  const [client, service] = await Promise.all([findClient(db, salon.id, body.clientId), findService(db, salon.id, body.serviceId)]);
  if (!client) throw notFound('That client');
  if (!service) throw notFound('That service');
  const verdict = checkSkinTest(service.needsSkinTest, await skinTestRecords(db, client.id), { leadHours: salon.skinTestLeadHours, validityDays: salon.skinTestValidityDays }, now);
  const skinTest = { required: verdict.required, ok: verdict.ok, message: verdict.message, earliestAllowed: verdict.earliestAllowed?.toISOString() ?? null };
  if (!verdict.ok) return { timeZone: salon.timeZone, skinTest, options: [] };

  const earliest = new Date(Math.max(now.getTime(), DateTime.fromISO(body.earliestDate, { zone: salon.timeZone }).toMillis(), verdict.earliestAllowed?.getTime() ?? 0));
  const fromDate = DateTime.fromJSDate(earliest, { zone: salon.timeZone }).toISODate()!;
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
      limit: body.limit,
      spread: 'day',
    },
  });
  const names = await loadNames(db, salon.id);
  const inValidity = (o: (typeof answer.options)[number]) =>
    !verdict.latestAllowed || o.sittings.every((s) => Date.parse(s.steps[0].start) <= verdict.latestAllowed!.getTime());
  return { timeZone: salon.timeZone, skinTest, options: answer.options.filter(inValidity).map((o) => toBookingOption(o, body.stepPlan as StepPlan, names)) };
}
