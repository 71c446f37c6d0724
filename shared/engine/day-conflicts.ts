/**
 * The placement rules of the engine (resource-index.ts) checked for a few changed sittings of one day, naming what
 * each broken rule runs into: the stylist's hands (hands-on and basin steps never overlap), clients in chairs
 * (at most maxClientsAtOnce), a chair or basin held twice or out of service, the stylist's clock and salon hours.
 * Minutes where both sides are already finished are history and not counted.
 */
import { coverageAtLeast, intersect, subtract, type Span } from './intervals';
import type { DayCalendars, DaySitting, DayStep } from './replan-day';
import type { ConflictKind } from './replan-answer';

export interface DayConflict {
  kind: ConflictKind;
  booking: string;
  with?: string;
  minutes: number;
  start: number;
  end: number;
}

const KIND_ORDER: ConflictKind[] = ['hands', 'clients', 'chair', 'basin', 'hours', 'closing'];
const hands = (step: DayStep) => step.kind !== 'developing';
const live = (step: DayStep) => step.state !== 'finished';
const spanOf = (x: DaySitting): Span => [x.steps[0]!.start, x.steps[x.steps.length - 1]!.end];

/** A key that does not depend on which side is named: for comparing the conflicts before and after a fix. */
export const conflictKey = (c: { kind: ConflictKind; booking: string; with?: string }): string =>
  c.with === undefined ? `${c.kind}|${c.booking}` : `${c.kind}|${[c.booking, c.with].sort().join('|')}`;

/** The conflicts of the `subjects` (sitting ids) with each other, with every other sitting and with the calendars. */
export function dayConflicts(cal: DayCalendars, sittings: DaySitting[], subjects: ReadonlySet<string>): DayConflict[] {
  const found = new Map<string, DayConflict>();
  const add = (kind: ConflictKind, booking: string, other: string | undefined, pieces: Span) => {
    for (let i = 0; i < pieces.length; i += 2) {
      const key = `${kind}|${booking}|${other ?? ''}`;
      const c = found.get(key);
      if (c) {
        c.minutes += pieces[i + 1]! - pieces[i]!;
        c.start = Math.min(c.start, pieces[i]!);
        c.end = Math.max(c.end, pieces[i + 1]!);
      } else {
        found.set(key, {
          kind,
          booking,
          ...(other !== undefined ? { with: other } : {}),
          minutes: pieces[i + 1]! - pieces[i]!,
          start: pieces[i]!,
          end: pieces[i + 1]!,
        });
      }
    }
  };
  // Minutes a stylist has more clients in chairs than their cap, over the current sittings.
  const over = new Map<string, Span>();
  const overOf = (stylist: string) => {
    let set = over.get(stylist);
    if (!set) {
      const spans = sittings.filter((x) => x.stylist === stylist).flatMap(spanOf);
      set = coverageAtLeast(spans, (cal.maxClients.get(stylist) ?? 1) + 1);
      over.set(stylist, set);
    }
    return set;
  };
  const spans = sittings.map(spanOf);
  sittings.forEach((c, ci) => {
    if (!subjects.has(c.id)) return;
    const span = spans[ci]!;
    const cLive = c.steps.some(live);
    if (cLive) {
      add('hours', c.id, undefined, subtract(span, cal.clock.get(c.stylist) ?? []));
      add('closing', c.id, undefined, subtract(span, cal.salon));
      add('chair', c.id, undefined, intersect(span, cal.closedChairs.get(c.chair) ?? []));
      for (const step of c.steps)
        if (step.basin && live(step)) add('basin', c.id, undefined, intersect([step.start, step.end], cal.closedBasins.get(step.basin) ?? []));
    }
    sittings.forEach((x, xi) => {
      const xSpan = spans[xi]!;
      // Every rule needs the two sittings at once; a pair of two subjects is seen once.
      if (xi === ci || xSpan[0]! >= span[1]! || span[0]! >= xSpan[1]! || (xi < ci && subjects.has(x.id))) return;
      if (!cLive && !x.steps.some(live)) return;
      // Name the one that suffers: the unchanged side, or of two changed ones the later booked.
      const [named, other] = !subjects.has(x.id) || later(x, c) ? [x.id, c.id] : [c.id, x.id];
      if (x.stylist === c.stylist) {
        for (const a of c.steps)
          for (const b of x.steps) if (hands(a) && hands(b) && (live(a) || live(b))) add('hands', named, other, intersect([a.start, a.end], [b.start, b.end]));
        add('clients', named, other, intersect(intersect(span, xSpan), overOf(c.stylist)));
      }
      if (x.chair === c.chair) add('chair', named, other, intersect(span, xSpan));
      for (const a of c.steps)
        for (const b of x.steps)
          if (a.basin && a.basin === b.basin && (live(a) || live(b))) add('basin', named, other, intersect([a.start, a.end], [b.start, b.end]));
    });
  });
  return [...found.values()].sort(
    (a, b) =>
      a.start - b.start || compare(a.booking, b.booking) || KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || compare(a.with ?? '', b.with ?? ''),
  );
}

const compare = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Whether x was booked to start after y (then by id), so x is the later client of the two. */
function later(x: DaySitting, y: DaySitting): boolean {
  return x.bookedTimes[0]! > y.bookedTimes[0]! || (x.bookedTimes[0] === y.bookedTimes[0] && x.id > y.id);
}
