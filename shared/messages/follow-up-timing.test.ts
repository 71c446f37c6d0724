import { describe, expect, it } from 'vitest';
import { composeFollowUpTiming, describeFollowUpRule, readFollowUpTiming } from './follow-up-timing';

// RFC 5545 §3.3.10: FREQ is the unit, INTERVAL how many of it between occurrences (1 when left out), COUNT how many.
describe('follow-up timing in words', () => {
  it('reads and writes the simple shape', () => {
    expect(readFollowUpTiming('FREQ=WEEKLY;INTERVAL=6;COUNT=1')).toEqual({ every: 6, unit: 'WEEKLY', times: 1 });
    expect(readFollowUpTiming('RRULE:FREQ=MONTHLY;COUNT=3')).toEqual({ every: 1, unit: 'MONTHLY', times: 3 });
    expect(composeFollowUpTiming({ every: 6, unit: 'WEEKLY', times: 1 })).toBe('FREQ=WEEKLY;INTERVAL=6;COUNT=1');
  });
  it('says it as people do', () => {
    expect(describeFollowUpRule('FREQ=WEEKLY;INTERVAL=6;COUNT=1')).toBe('once, 6 weeks after the last sitting');
    expect(describeFollowUpRule('FREQ=MONTHLY;INTERVAL=1;COUNT=3')).toBe('3 times, every month after the last sitting');
    expect(describeFollowUpRule('FREQ=WEEKLY;INTERVAL=4;COUNT=2')).toBe('2 times, every 4 weeks after the last sitting');
  });
  it('leaves any other rule to its calendar text', () => {
    expect(readFollowUpTiming('FREQ=WEEKLY;BYDAY=TU;COUNT=2')).toBeNull();
    expect(readFollowUpTiming('FREQ=WEEKLY;UNTIL=20270101T000000Z')).toBeNull();
    expect(describeFollowUpRule('not a rule')).toBeNull();
  });
});
