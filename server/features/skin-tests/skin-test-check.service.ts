import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { checkStarts, skinTestVerdict, type SkinTestVerdict } from '@shared/rules/skin-test-rule';
import { ALWAYS_TESTED, planNeedsSkinTest, testedFamilies } from '@shared/rules/skin-test-need';
import { underAgeOnAny } from '@shared/rules/age-rule';
import { AppError } from '@server/lib/app-error';
import { clientAgeRecord, skinTestClearances, skinTestClearancesOf, skinTestRecords, skinTestRecordsOf } from './skin-tests.repository';
import { formatDate, formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { localDateOf } from '@shared/time/salon-time';

type SalonRule = Pick<Salon, 'timeZone' | 'skinTestLeadHours' | 'skinTestValidityDays' | 'skinTestFamilies'>;

/** What the client's whole skin-test record allows for this plan (and the service's own box, which only adds). */
export async function skinTestVerdictFor(
  db: Db,
  salon: SalonRule,
  clientId: string,
  plan: StepPlan,
  serviceAsks: boolean,
  now: Date,
): Promise<SkinTestVerdict> {
  const needs = planNeedsSkinTest(plan, salon.skinTestFamilies, serviceAsks);
  if (!needs) return skinTestVerdict(false, [], [], salonPolicy(salon), now);
  const [records, clearances] = await Promise.all([skinTestRecords(db, clientId), skinTestClearances(db, clientId)]);
  return skinTestVerdict(true, records, clearances, salonPolicy(salon), now);
}

export const salonPolicy = (salon: SalonRule) => ({ leadHours: salon.skinTestLeadHours, validityDays: salon.skinTestValidityDays });

/** Per sitting, whether it puts tested product on the hair (every sitting when the service itself asks). */
export function testedSittings(plan: StepPlan, salon: SalonRule, serviceAsks: boolean): boolean[] {
  const tested = testedFamilies(salon.skinTestFamilies);
  return plan.sittings.map((s) => serviceAsks || s.steps.some((st) => tested.has(st.product)));
}

/** The starts of the sittings that put tested product on the hair (every sitting when the service itself asks). */
export function testedSittingStarts(plan: StepPlan, starts: readonly Date[], salon: SalonRule, serviceAsks: boolean): Date[] {
  const tested = testedSittings(plan, salon, serviceAsks);
  return starts.filter((_, i) => tested[i] ?? serviceAsks);
}

export interface SkinTestDoor {
  clientId: string;
  plan: StepPlan;
  serviceAsks: boolean;
  /** Each sitting's start, in order. */
  starts: readonly Date[];
  /**
   * A desk door (staff booking, moving, filling): may book on an applied, unread test ("waiting on a skin test") and
   * for a client under 16 with a guardian's consent on record. Online and link doors may do neither.
   */
  atDesk: boolean;
}

/**
 * The one check every door that books, moves, fills or accepts colour work goes through. Answers the footing the
 * booking rests on, or throws 409 SKIN_TEST with the reason.
 */
export async function assertSkinTestAllows(db: Db, salon: SalonRule, door: SkinTestDoor, now: Date): Promise<'passed' | 'waiting' | 'not_needed'> {
  const verdict = await skinTestVerdictFor(db, salon, door.clientId, door.plan, door.serviceAsks, now);
  const zoneDay = (d: Date) => formatDateTime(d, formatFor(salon.timeZone), { width: 'short', year: false });
  const check = checkStarts(verdict, testedSittingStarts(door.plan, door.starts, salon, door.serviceAsks), zoneDay);
  if (check.status === 'refused') throw new AppError('SKIN_TEST', 409, check.message);
  if (check.status === 'waiting' && !door.atDesk) {
    throw new AppError('SKIN_TEST', 409, `This colour needs a skin test read negative first. ${verdict.message} Please book a consultation or call the salon.`);
  }
  await assertAgeAllows(db, salon, door);
  return check.status;
}

export interface BookingForSkinTest {
  clientId: string | null;
  status: string;
  plan: StepPlan;
  serviceAsks: boolean;
  starts: readonly Date[];
}

export interface BookingSkinTestState {
  status: 'not_needed' | 'passed' | 'waiting' | 'blocked';
  message: string;
}

const LIVE_FOR_TESTS = ['held', 'booked', 'checked_in'];

/**
 * The skin-test state of several bookings at once (a day's book), read from their clients' whole records in two
 * queries: `waiting` rests on an unread test, `blocked` means the record no longer allows the colour (a reaction
 * recorded since, a test that lapsed): the desk must cancel or change the plan.
 */
export async function bookingSkinTestStates(db: Db, salon: SalonRule, bookings: readonly BookingForSkinTest[], now: Date): Promise<BookingSkinTestState[]> {
  const live = (b: BookingForSkinTest) => b.clientId && LIVE_FOR_TESTS.includes(b.status) && planNeedsSkinTest(b.plan, salon.skinTestFamilies, b.serviceAsks);
  const clientIds = [...new Set(bookings.filter(live).map((b) => b.clientId!))];
  const [records, clearances] = await Promise.all([skinTestRecordsOf(db, clientIds), skinTestClearancesOf(db, clientIds)]);
  const zoneDay = (d: Date) => formatDate(d, formatFor(salon.timeZone), { width: 'short', year: false });
  return bookings.map((b) => {
    if (!live(b)) return { status: 'not_needed', message: '' };
    const verdict = skinTestVerdict(true, records.get(b.clientId!) ?? [], clearances.get(b.clientId!) ?? [], salonPolicy(salon), now);
    const check = checkStarts(verdict, testedSittingStarts(b.plan, b.starts, salon, b.serviceAsks), zoneDay);
    if (check.status === 'refused') return { status: 'blocked', message: check.message };
    if (check.status === 'waiting') return { status: 'waiting', message: 'Waiting on a skin test: the colour cannot start until the test reads negative.' };
    return { status: check.status, message: '' };
  });
}

/**
 * Oxidative colour for a client under 16 on the day of a sitting (EU label: "not intended for use on persons under
 * the age of 16"): refused online; at the desk only with a guardian's consent on record.
 */
async function assertAgeAllows(db: Db, salon: SalonRule, door: SkinTestDoor): Promise<void> {
  const oxidative = door.starts.filter((_, i) => door.plan.sittings[i]?.steps.some((s) => (ALWAYS_TESTED as readonly string[]).includes(s.product)));
  if (oxidative.length === 0) return;
  const age = await clientAgeRecord(db, door.clientId);
  const dates = oxidative.map((d) => localDateOf(d, salon.timeZone));
  if (!underAgeOnAny(age.dateOfBirth, dates)) return;
  if (!door.atDesk) {
    throw new AppError('AGE_CONSENT', 409, 'Oxidative colour is not booked online for anyone under 16. Please call the salon or book a consultation.');
  }
  if (!age.hasGuardianConsent) {
    throw new AppError(
      'AGE_CONSENT',
      409,
      'This client is under 16 on the day: oxidative colour needs a guardian’s consent on record first (client card → Age and consent).',
    );
  }
}
