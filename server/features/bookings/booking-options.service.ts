import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { BookingOptionsRequest, BookingOptionsResponse } from '@shared/schemas/booking.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { checkStarts, type SkinTestVerdict } from '@shared/rules/skin-test-rule';
import { notFound } from '@server/lib/app-error';
import { findClient } from '../clients';
import { findService } from '../services';
import { skinTestVerdictFor, testedSittings, testedSittingStarts } from '../skin-tests';
import { horizonFor, optionsFor, toBookingOption, type PlacedOption, type StartLimit } from '../planning';
import { assertWithinProcessingLimits } from '../planning';
import { localDateOf } from '@shared/time/salon-time';

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
  const skinTest = {
    required: verdict.required,
    ok: verdict.status !== 'blocked',
    status: verdict.status,
    message: verdict.message,
    earliestAllowed: firstAllowed?.toISOString() ?? null,
  };
  if (verdict.status === 'blocked') return { timeZone: salon.timeZone, skinTest, options: [] };

  const earliest = new Date(Math.max(now.getTime(), DateTime.fromISO(body.earliestDate, { zone: salon.timeZone }).toMillis(), firstAllowed?.getTime() ?? 0));
  const fromDate = localDateOf(earliest, salon.timeZone);
  /** What an option would rest on: passed or waiting (on a test not read yet), or no test needed. */
  const footing = (option: PlacedOption) => {
    const check = checkStarts(
      verdict,
      testedSittingStarts(
        plan,
        option.sittings.map((s) => new Date(s.steps[0]!.start)), // the engine places no empty sitting
        salon,
        service.needsSkinTest,
      ),
    );
    // The engine searched within the same stretches, so the rule cannot refuse what it found.
    if (check.status === 'refused') throw new Error(`The engine offered a start the skin-test rule refuses: ${check.message}`);
    return check.status;
  };
  const { options, names } = await optionsFor(db, salon, {
    skill: service.skill,
    stylistId: body.stylistId,
    plan,
    earliest,
    horizons: [horizonFor(fromDate, plan, SEARCH_DAYS)],
    limit: body.limit,
    spread: 'day',
    allowedStarts: skinTestLimits(verdict, testedSittings(plan, salon, service.needsSkinTest)),
  });
  return { timeZone: salon.timeZone, skinTest, options: options.map((o) => toBookingOption(o, names, footing(o))) };
}

/**
 * Where each sitting may start under the skin-test rule: a sitting that puts tested product on the hair, inside one
 * of the stretches the client's record allows (passed, or waiting on a test not read yet); any other sitting, anywhere.
 * The engine searches within them, so the options asked for are all ones the rule allows.
 */
function skinTestLimits(verdict: SkinTestVerdict, tested: boolean[]): Array<StartLimit[] | null> | undefined {
  if (verdict.status === 'not_needed') return undefined;
  const stretches = verdict.windows.map((w) => ({ from: w.from, to: w.to }));
  return tested.map((t) => (t ? stretches : null));
}
