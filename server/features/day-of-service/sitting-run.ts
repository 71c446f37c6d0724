import { DateTime } from 'luxon';
import type { SittingRun } from '@shared/schemas/day-of-service.schemas';
import type { TapAction } from '@shared/schemas/day-of-service.schemas';
import { UNDO_MS } from '@shared/rules/sitting-status';
import type { SittingForTap, SittingState, TapBefore } from './sitting-run.repository';

const iso = (d: Date, zone: string) => DateTime.fromJSDate(d, { zone }).toISO({ suppressMilliseconds: true })!;
const isoOrNull = (d: Date | null, zone: string) => (d ? iso(d, zone) : null);

/** The answer of every tap: the sitting planned and actual, in the salon's zone, with the undo it allows. */
export function toSittingRun(found: SittingForTap, zone: string, undo: { action: TapAction; at: Date } | null): SittingRun {
  const { booking, sitting, steps } = found;
  const planned = booking.stepPlan.sittings[sitting.seq - 1]?.steps ?? [];
  return {
    booking: { id: booking.id, status: booking.status },
    sitting: {
      seq: sitting.seq,
      of: sitting.of,
      status: sitting.status,
      plannedStart: iso(sitting.start, zone),
      plannedEnd: iso(sitting.end, zone),
      arrivedAt: isoOrNull(sitting.arrivedAt, zone),
      lateMinutes: sitting.lateMinutes,
      leftOpenReason: sitting.leftOpenReason,
      steps: steps.map((s) => {
        const plan = planned[s.seq - 1];
        return {
          seq: s.seq,
          kind: s.kind,
          label: s.label,
          product: plan?.product ?? 'none',
          plannedStart: iso(s.start, zone),
          plannedEnd: iso(s.end, zone),
          actualStart: isoOrNull(s.actualStart, zone),
          actualEnd: isoOrNull(s.actualEnd, zone),
          minMinutes: plan?.kind === 'developing' ? plan.minMinutes : null,
          maxMinutes: plan?.kind === 'developing' ? plan.maxMinutes : null,
        };
      }),
    },
    undo: undo && { action: undo.action, until: iso(new Date(undo.at.getTime() + UNDO_MS), zone) },
  };
}

/** The sitting's own day fields. */
export const sittingState = ({ sitting }: SittingForTap): SittingState => ({
  status: sitting.status,
  arrivedAt: sitting.arrivedAt,
  lateMinutes: sitting.lateMinutes,
  leftOpenReason: sitting.leftOpenReason,
});

/** What a tap may change, as it was: kept with the tap so an undo can put it back. */
export const tapBefore = (found: SittingForTap): TapBefore => ({
  sitting: sittingState(found),
  bookingStatus: found.booking.status,
  steps: found.steps.map(({ id, actualStart, actualEnd, startedBy, finishedBy }) => ({ id, actualStart, actualEnd, startedBy, finishedBy })),
});

/** The sitting's day state as an audit entry keeps it before and after a tap. */
export const auditDay = (found: SittingForTap) => ({
  sitting: found.sitting.seq,
  status: found.sitting.status,
  arrivedAt: found.sitting.arrivedAt?.toISOString() ?? null,
  lateMinutes: found.sitting.lateMinutes,
  ...(found.sitting.leftOpenReason ? { leftOpenReason: found.sitting.leftOpenReason } : {}),
  steps: found.steps.map((s) => ({ step: s.seq, actualStart: s.actualStart?.toISOString() ?? null, actualEnd: s.actualEnd?.toISOString() ?? null })),
});
