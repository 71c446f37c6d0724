import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import type { DayRunSittingView } from '@shared/schemas/replan.schemas';
import { replanQueries } from './replan-queries';

/** The signed-in stylist's day as it now runs: each open sitting's re-planned steps, by booking and sitting number. */
export function useDayRun(date: string): (bookingId: string, seq: number) => DayRunSittingView | undefined {
  const run = useQuery(replanQueries.stylistRun(date));
  return useMemo(() => {
    const bySitting = new Map((run.data?.sittings ?? []).map((s) => [`${s.bookingId}:${s.seq}`, s]));
    return (bookingId, seq) => bySitting.get(`${bookingId}:${seq}`);
  }, [run.data]);
}
