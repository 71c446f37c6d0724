import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkStarts, skinTestVerdict, type SkinTestRecord } from './skin-test-rule';

// Lead time 48 h: Cosmetics Europe Recommendation No 27 "Allergy Alert Test for hair colouring products"
// (24 Apr 2023): the test is read 48 hours after it is applied; colour follows only when it showed no reaction.
// Validity 182 days: common practice (re-test when the last test is over about 6 months old); product makers ask
// for a test before every colouring.
const policy = { leadHours: 48, validityDays: 182 };
const now = new Date('2027-03-01T12:00:00Z');
const at = (iso: string) => new Date(iso);
const rec = (applied: string, result: SkinTestRecord['result'], recorded = applied): SkinTestRecord => ({
  appliedAt: at(applied),
  recordedAt: at(recorded),
  result,
});
const verdict = (records: SkinTestRecord[], clearances: { at: Date }[] = []) => skinTestVerdict(true, records, clearances, policy, now);
const startAt = (records: SkinTestRecord[], start: string, clearances: { at: Date }[] = []) => checkStarts(verdict(records, clearances), [at(start)]).status;

describe('skinTestVerdict', () => {
  it('steps that put no tested product on the hair need no test', () => {
    expect(skinTestVerdict(false, [], [], policy, now)).toMatchObject({ required: false, status: 'not_needed' });
  });

  it('with no test on record, blocks and says to book one first', () => {
    expect(verdict([])).toMatchObject({ status: 'blocked', message: expect.stringMatching(/Book a skin test first/) });
  });

  it('a test read negative allows colour from exactly 48 h after it was applied, for 182 days', () => {
    const v = verdict([rec('2027-02-27T15:00:00Z', 'negative', '2027-03-01T15:10:00Z')]);
    expect(v.status).toBe('passed');
    // 2027-02-27 15:00 + 48 h = 2027-03-01 15:00; + 182 days = 2027-08-28 15:00 (counted by hand: Feb 27 → Aug 28).
    expect(v.windows[0]).toMatchObject({ from: at('2027-03-01T15:00:00Z'), to: at('2027-08-28T15:00:00Z') });
    expect(startAt([rec('2027-02-27T15:00:00Z', 'negative')], '2027-03-01T14:55:00Z')).toBe('refused');
    expect(startAt([rec('2027-02-27T15:00:00Z', 'negative')], '2027-03-01T15:00:00Z')).toBe('passed');
    expect(startAt([rec('2027-02-27T15:00:00Z', 'negative')], '2027-08-29T09:00:00Z')).toBe('refused');
  });

  it('a positive result stays a block when a newer test is merely booked or applied', () => {
    const history = [rec('2026-12-01T10:00:00Z', 'positive', '2026-12-03T10:00:00Z'), rec('2027-02-28T10:00:00Z', 'pending')];
    expect(verdict(history).status).toBe('blocked');
    expect(verdict([...history, { ...rec('2027-03-05T10:00:00Z', 'pending'), booked: true }]).status).toBe('blocked');
  });

  it('a positive result is lifted only by a clearance recorded after it, and colour still needs a newer negative test', () => {
    const positive = rec('2026-12-01T10:00:00Z', 'positive', '2026-12-03T10:00:00Z');
    expect(verdict([positive], [{ at: at('2026-12-02T10:00:00Z') }]).status).toBe('blocked'); // cleared before it was read
    expect(verdict([positive], [{ at: at('2027-01-10T10:00:00Z') }]).status).toBe('blocked'); // cleared, no newer test
    expect(verdict([positive, rec('2027-02-01T10:00:00Z', 'negative', '2027-02-03T10:00:00Z')], [{ at: at('2027-01-10T10:00:00Z') }]).status).toBe('passed');
  });

  it('an unread test applied five months ago counts as nothing; one applied two days ago lets the desk wait on it', () => {
    expect(verdict([rec('2026-10-01T10:00:00Z', 'pending')]).status).toBe('blocked');
    const waiting = verdict([rec('2027-02-27T10:00:00Z', 'pending')]);
    expect(waiting.status).toBe('waiting');
    expect(startAt([rec('2027-02-27T10:00:00Z', 'pending')], '2027-03-02T09:00:00Z')).toBe('waiting');
    // An unread test is counted for 7 days only: applied 2027-02-21 10:00 is 8 days before now.
    expect(verdict([rec('2027-02-21T10:00:00Z', 'pending')]).status).toBe('blocked');
  });

  it('a skin-test appointment in the book lets the desk book colour 48 h after it, as waiting', () => {
    const v = verdict([{ ...rec('2027-03-03T16:00:00Z', 'pending'), booked: true }]);
    expect(v.status).toBe('waiting');
    expect(startAt([{ ...rec('2027-03-03T16:00:00Z', 'pending'), booked: true }], '2027-03-05T15:00:00Z')).toBe('refused'); // 47 h later
    expect(startAt([{ ...rec('2027-03-03T16:00:00Z', 'pending'), booked: true }], '2027-03-05T16:00:00Z')).toBe('waiting');
  });

  it('an unclear result needs a new test; the older negative no longer counts', () => {
    expect(verdict([rec('2027-01-10T10:00:00Z', 'negative'), rec('2027-02-20T10:00:00Z', 'unclear', '2027-02-22T10:00:00Z')]).status).toBe('blocked');
  });

  it('a positive and an unread test applied at the same moment: the order they were recorded in decides, and the positive blocks either way', () => {
    const same = '2027-02-27T10:00:00Z';
    const a = [rec(same, 'positive', '2027-03-01T10:00:00Z'), rec(same, 'pending', '2027-02-27T10:05:00Z')];
    expect(verdict(a).status).toBe('blocked');
    expect(verdict([...a].reverse()).status).toBe('blocked');
  });

  it('never lets a salon set less than 48 h of lead time', () => {
    const v = skinTestVerdict(true, [rec('2027-02-27T10:00:00Z', 'negative')], [], { leadHours: 0, validityDays: 182 }, now);
    expect(v.windows[0]?.from).toEqual(at('2027-03-01T10:00:00Z'));
  });
});

// Property tests: random histories of up to 8 records over the past year, in any order.
const HOUR = 3_600_000;
const results = fc.constantFrom<SkinTestRecord['result']>('pending', 'negative', 'positive', 'unclear');
const record = fc.record({
  appliedHoursAgo: fc.integer({ min: -24 * 10, max: 24 * 365 }),
  readDelay: fc.integer({ min: 0, max: 24 * 5 }),
  result: results,
  booked: fc.boolean(),
});
const toRecord = (r: { appliedHoursAgo: number; readDelay: number; result: SkinTestRecord['result']; booked: boolean }): SkinTestRecord => {
  const appliedAt = new Date(now.getTime() - r.appliedHoursAgo * HOUR);
  return { appliedAt, recordedAt: new Date(appliedAt.getTime() + r.readDelay * HOUR), result: r.result, booked: r.result === 'pending' && r.booked };
};
const start = fc.integer({ min: 0, max: 24 * 200 }).map((h) => new Date(now.getTime() + h * HOUR));

describe('skin-test rule properties', () => {
  it('a positive anywhere without a clearance after it never allows colour', () => {
    fc.assert(
      fc.property(fc.array(record, { maxLength: 8 }), start, (raw, s) => {
        const records = raw.map(toRecord);
        fc.pre(records.some((r) => r.result === 'positive'));
        expect(checkStarts(skinTestVerdict(true, records, [], policy, now), [s]).status).toBe('refused');
      }),
    );
  });

  it('colour counts as passed only on the newest reading being negative, applied at least 48 h before and within validity', () => {
    fc.assert(
      fc.property(fc.array(record, { maxLength: 8 }), start, (raw, s) => {
        const records = raw.map(toRecord);
        const status = checkStarts(skinTestVerdict(true, records, [], policy, now), [s]).status;
        if (status !== 'passed') return;
        const read = records
          .filter((r) => r.result !== 'pending')
          .sort((a, b) => a.appliedAt.getTime() - b.appliedAt.getTime() || a.recordedAt.getTime() - b.recordedAt.getTime());
        const newest = read.at(-1)!;
        expect(newest.result).toBe('negative');
        expect(s.getTime() - newest.appliedAt.getTime()).toBeGreaterThanOrEqual(48 * HOUR);
        expect(s.getTime() - newest.appliedAt.getTime()).toBeLessThanOrEqual(182 * 24 * HOUR);
        expect(records.some((r) => r.result === 'positive')).toBe(false);
      }),
    );
  });

  it('waiting rests only on an unread test newer than every reading, applied within the last 7 days or booked ahead, at least 48 h before', () => {
    fc.assert(
      fc.property(fc.array(record, { maxLength: 8 }), start, (raw, s) => {
        const records = raw.map(toRecord);
        if (checkStarts(skinTestVerdict(true, records, [], policy, now), [s]).status !== 'waiting') return;
        const basis = records.filter(
          (r) => r.result === 'pending' && r.appliedAt.getTime() > now.getTime() - 7 * 24 * HOUR && s.getTime() - r.appliedAt.getTime() >= 48 * HOUR,
        );
        expect(basis.length).toBeGreaterThan(0);
      }),
    );
  });

  it('the answer does not depend on the order records are given in', () => {
    fc.assert(
      fc.property(fc.array(record, { maxLength: 8 }), start, (raw, s) => {
        const records = raw.map(toRecord);
        const a = checkStarts(skinTestVerdict(true, records, [], policy, now), [s]).status;
        const b = checkStarts(skinTestVerdict(true, [...records].reverse(), [], policy, now), [s]).status;
        expect(b).toBe(a);
      }),
    );
  });
});
