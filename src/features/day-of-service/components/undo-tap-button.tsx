import { DateTime } from 'luxon';
import { Button } from '@client/components/ui/button';
import { useNow } from '@client/lib/use-now';

type Props = { until: string; what: string; busy: boolean; onUndo: () => void };

/** "Undo" for the minute after a tap, with the seconds left; gone once the minute is over. */
export function UndoTapButton({ until, what, busy, onUndo }: Props) {
  const now = useNow(1000);
  const left = Math.ceil(DateTime.fromISO(until).diff(now, 'seconds').seconds);
  if (left <= 0) return null;
  return (
    <Button variant="secondary" className="min-h-12 text-lg" busy={busy} onClick={onUndo}>
      Undo<span className="sr-only"> {what}</span> <span className="tabular text-sm font-normal">({left} s)</span>
    </Button>
  );
}
