import { describe, expect, it } from 'vitest';
import { describeHoursRule, describeWeekdays } from './describe-hours';
import { composeWeeklyRule, ruleProblem } from './weekly-rule';

describe('describeHoursRule', () => {
  it('puts the weekday editor’s rules into plain words', () => {
    expect(describeHoursRule('FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA')).toBe('Tuesday to Saturday');
    expect(describeWeekdays(['FR', 'MO', 'WE'])).toBe('Monday, Wednesday and Friday');
    expect(describeWeekdays(['SA', 'SU'])).toBe('Saturday and Sunday');
  });

  it('names closed dates from the given day on, and leaves out those already past', () => {
    const text = composeWeeklyRule({ weekdays: ['TU', 'WE'], everyOtherWeek: false, startsOn: null, closedDates: ['2026-12-29', '2026-11-03'] });
    // 2026-12-29 is a Tuesday (checked against any calendar).
    expect(describeHoursRule(text, '2026-12-01')).toBe('Tuesday and Wednesday; closed on Tue 29 Dec 2026');
  });

  it('says every other week and from which week it counts', () => {
    const text = composeWeeklyRule({ weekdays: ['SA'], everyOtherWeek: true, startsOn: '2027-01-02', closedDates: [] });
    expect(describeHoursRule(text)).toBe('Every other week (counting from the week of Sat 2 Jan 2027): Saturday');
  });

  it('falls back to the recurrence text’s own words, and never throws on anything stored', () => {
    // RFC 5545 §3.3.10 example rule "monthly on the first Friday" (FREQ=MONTHLY;BYDAY=1FR).
    expect(describeHoursRule('FREQ=MONTHLY;BYDAY=1FR')).toMatch(/^Every month on the 1st Friday/);
    for (const junk of ['', 'nonsense', 'RRULE:FREQ=WEEKLY;BYDAY=XX', 'EXDATE;VALUE=DATE:20270101', '\u0000']) {
      expect(() => describeHoursRule(junk)).not.toThrow();
    }
  });
});

describe('ruleProblem (what Set-up checks before storing hours)', () => {
  it('accepts what the hours editor writes, closed dates included', () => {
    const text = composeWeeklyRule({
      weekdays: ['TU', 'WE', 'TH', 'FR', 'SA'],
      everyOtherWeek: false,
      startsOn: null,
      closedDates: ['2027-12-24', '2027-12-25'],
    });
    expect(ruleProblem(text)).toBeNull();
  });

  it('refuses an EXDATE value that is not an iCalendar date (RFC 5545 §3.3.4: DATE is YYYYMMDD)', () => {
    expect(ruleProblem('RRULE:FREQ=WEEKLY;BYDAY=TU\nEXDATE;VALUE=DATE:2027013')).toMatch(/not an iCalendar date/);
  });
});
