/** Working hours, salon hours and time off → UTC interval sets inside the horizon. */
import { clockMinutes, instant, type CompileContext } from './compile-context';
import { intersect, normalize, type Span } from './intervals';
import { RecurrenceError, ruleDays } from './recurrence';
import { ScenarioError } from './scenario-error';
import type { HoursRule } from './scenario.schemas';

/** Expands hours rules (one local start/end per occurrence date) into merged UTC intervals. */
export function expandHours(ctx: CompileContext, rules: HoursRule[], field: string): Span {
  const raw: Span = [];
  rules.forEach((rule, i) => {
    const start = clockMinutes(ctx, rule.start, `${field}[${i}].start`);
    const end = clockMinutes(ctx, rule.end, `${field}[${i}].end`);
    if (end <= start) throw new ScenarioError(`${field}[${i}].end`, 'must be after start');
    let days: number[];
    try {
      days = ruleDays(rule.rrule, ctx.fromDay, ctx.toDay, ctx.clock);
    } catch (e) {
      if (e instanceof RecurrenceError) throw new ScenarioError(`${field}[${i}].rrule`, e.message);
      throw e;
    }
    for (const day of days) {
      // Recurring wall-clock times in a gap take the offset before it (RFC 5545 §3.3.5).
      raw.push(ctx.clock.toUtc(day * 1440 + start, 'shift') as number, ctx.clock.toUtc(day * 1440 + end, 'shift') as number);
    }
  });
  return intersect(normalize(raw), [ctx.start, ctx.end]);
}

/** Time-off periods → merged UTC intervals. */
export function expandPeriods(ctx: CompileContext, periods: Array<{ start: string; end: string }>, field: string): Span {
  const raw: Span = [];
  periods.forEach((p, i) => {
    const start = instant(ctx, p.start, `${field}[${i}].start`);
    const end = instant(ctx, p.end, `${field}[${i}].end`);
    if (end <= start) throw new ScenarioError(`${field}[${i}].end`, 'must be after start');
    raw.push(start, end);
  });
  return normalize(raw);
}
