/**
 * The skin-test rule for oxidative colour over a client's whole record, as one pure function used at every door
 * (desk booking, quotes, moves, window fills and offers, online holds and payment, follow-up suggestions).
 *
 * - A positive result at any time blocks oxidative colour until an owner records a clearance after it (e.g. on
 *   written medical advice); even then colour needs a newer test read negative.
 * - A test counts as passed only when read negative, and only for colour starting at least the lead time after
 *   it was applied and within its validity. The allergy alert test is read about 48 hours after it is applied
 *   (Cosmetics Europe Recommendation No 27, 2023): the lead time is never less than 48 hours.
 * - An unclear result needs a new test.
 * - A test applied but not yet read (or a skin-test appointment in the book) lets the desk book colour as
 *   "waiting on a skin test" when it is applied at least the lead time before the colour; the colour cannot start
 *   until a negative reading is recorded. An unread test applied more than 7 days ago counts as nothing.
 * - Records are ordered by applied time, then by when they were recorded, so no tie is left to chance.
 */

export type SkinTestResult = 'pending' | 'negative' | 'positive' | 'unclear';

export interface SkinTestRecord {
  /** When the test was (or, for an appointment in the book, will be) applied. */
  appliedAt: Date;
  /** When the record was written: breaks ties between tests applied at the same moment. */
  recordedAt: Date;
  /** `pending`: applied (or booked) and not read yet. */
  result: SkinTestResult;
  /** A skin-test appointment in the book that has no recorded test yet. */
  booked?: boolean;
}

export interface SkinTestClearance {
  /** When the owner recorded the clearance. */
  at: Date;
}

export interface SkinTestPolicy {
  leadHours: number;
  validityDays: number;
}

/** The least lead time any salon may set, in hours (the test is read about 48 hours after it is applied). */
export const MIN_LEAD_HOURS = 48;
/** An unread test older than this counts as nothing (a test nobody read in a week was not read in time). */
export const UNREAD_COUNTS_DAYS = 7;

export type SkinTestStatus = 'not_needed' | 'passed' | 'waiting' | 'blocked';

/** A stretch of colour start times the record allows, and on what footing. */
export interface SkinTestWindow {
  status: 'passed' | 'waiting';
  from: Date;
  to: Date;
  /** The test the window rests on. */
  appliedAt: Date;
}

export interface SkinTestVerdict {
  required: boolean;
  /** `blocked` when nothing can allow colour now; otherwise what the best window rests on. */
  status: SkinTestStatus;
  message: string;
  /** Passed window first, then waiting window (either may be absent). */
  windows: SkinTestWindow[];
}

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const day = (d: Date) => d.toISOString().slice(0, 10);
const byTime = (a: SkinTestRecord, b: SkinTestRecord) => a.appliedAt.getTime() - b.appliedAt.getTime() || a.recordedAt.getTime() - b.recordedAt.getTime();

/** The record as the rule reads it at `now`, with the salon's policy. */
export function skinTestVerdict(
  needsTest: boolean,
  records: readonly SkinTestRecord[],
  clearances: readonly SkinTestClearance[],
  policy: SkinTestPolicy,
  now: Date,
): SkinTestVerdict {
  if (!needsTest) return { required: false, status: 'not_needed', message: 'These steps need no skin test.', windows: [] };
  const lead = Math.max(policy.leadHours, MIN_LEAD_HOURS) * HOUR;
  const validity = policy.validityDays * DAY;
  const blocked = (message: string): SkinTestVerdict => ({ required: true, status: 'blocked', message, windows: [] });
  const sorted = [...records].sort(byTime);
  const read = sorted.filter((r) => r.result !== 'pending');

  const positive = read.filter((r) => r.result === 'positive').at(-1);
  if (positive && !clearances.some((c) => c.at.getTime() >= positive.recordedAt.getTime())) {
    return blocked(
      `The skin test of ${day(positive.appliedAt)} showed a reaction. No oxidative colour until an owner records a clearance (for example on written medical advice).`,
    );
  }
  const latestRead = read.at(-1);
  const windows: SkinTestWindow[] = [];
  if (latestRead?.result === 'negative') {
    const from = new Date(latestRead.appliedAt.getTime() + lead);
    const to = new Date(latestRead.appliedAt.getTime() + validity);
    if (to > now) windows.push({ status: 'passed', from, to, appliedAt: latestRead.appliedAt });
  }
  // Only a test newer than the latest reading can be waited on; one nobody read within a week counts as nothing.
  const unread = sorted
    .filter((r) => r.result === 'pending' && (!latestRead || byTime(r, latestRead) > 0))
    .filter((r) => r.appliedAt.getTime() > now.getTime() - UNREAD_COUNTS_DAYS * DAY)
    .at(-1);
  if (unread) {
    const from = new Date(unread.appliedAt.getTime() + lead);
    const to = new Date(unread.appliedAt.getTime() + validity);
    windows.push({ status: 'waiting', from, to, appliedAt: unread.appliedAt });
  }
  const [best] = windows;
  if (!best) return blocked(noWindowReason(latestRead, sorted.filter((r) => r.result === 'pending').at(-1), policy));
  const message =
    best.status === 'passed'
      ? `Negative skin test of ${day(best.appliedAt)}: colour from ${day(best.from)} until ${day(best.to)}.`
      : `A skin test ${best.appliedAt > now ? 'is booked for' : 'was applied on'} ${day(best.appliedAt)} and is not read yet: colour may be booked from ${day(best.from)} as waiting on a skin test, and cannot start until the test reads negative.`;
  return { required: true, status: best.status, message, windows };
}

function noWindowReason(latestRead: SkinTestRecord | undefined, staleUnread: SkinTestRecord | undefined, policy: SkinTestPolicy): string {
  if (staleUnread && (!latestRead || byTime(staleUnread, latestRead) > 0)) {
    return `The skin test of ${day(staleUnread.appliedAt)} was never read, and an unread test counts for ${UNREAD_COUNTS_DAYS} days only. Book a new skin test first.`;
  }
  if (!latestRead) return 'No skin test is on record. Book a skin test first: colour can follow once it has been read negative.';
  if (latestRead.result === 'unclear') return `The skin test of ${day(latestRead.appliedAt)} was unclear. A new test is needed before oxidative colour.`;
  if (latestRead.result === 'positive')
    return `The reaction of ${day(latestRead.appliedAt)} was cleared, but a new skin test must read negative before oxidative colour.`;
  return `The last skin test (${day(latestRead.appliedAt)}) is older than ${policy.validityDays} days. Book a new skin test first.`;
}

export type StartCheck = { status: 'passed' | 'waiting' | 'not_needed' } | { status: 'refused'; message: string };

/**
 * Whether colour may start at each of `starts` (the sittings that put tested product on the hair). Every start
 * must fall in one window; a booking rests on the weakest footing any of its sittings has.
 */
export function checkStarts(verdict: SkinTestVerdict, starts: readonly Date[], zoneDay: (d: Date) => string = day): StartCheck {
  if (verdict.status === 'not_needed' || starts.length === 0) return { status: 'not_needed' };
  if (verdict.status === 'blocked') return { status: 'refused', message: verdict.message };
  let footing: 'passed' | 'waiting' = 'passed';
  for (const start of starts) {
    const window = verdict.windows.find((w) => start >= w.from && start <= w.to);
    if (!window) {
      const [head] = verdict.windows;
      // skinTestVerdict gives every verdict that is neither not_needed nor blocked a window; without one, nothing allows the start.
      if (!head) return { status: 'refused', message: verdict.message };
      const first = verdict.windows.reduce((a, w) => (w.from < a ? w.from : a), head.from);
      const last = verdict.windows.reduce((a, w) => (w.to > a ? w.to : a), head.to);
      const message =
        start < first
          ? `Colour can start from ${zoneDay(first)}, at least the lead time after the skin test is applied. ${verdict.message}`
          : start > last
            ? `A colour sitting on ${zoneDay(start)} falls after the skin test stops being valid (${zoneDay(last)}). Book a new skin test for it.`
            : `A colour sitting on ${zoneDay(start)} falls between what the skin tests allow. ${verdict.message}`;
      return { status: 'refused', message };
    }
    if (window.status === 'waiting') footing = 'waiting';
  }
  return { status: footing };
}
