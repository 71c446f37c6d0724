import { Link } from 'react-router-dom';
import type { ConflictView, FixView } from '@shared/schemas/replan.schemas';
import { shiftLocalDate } from '@shared/time/salon-time';
import { Button, buttonClasses } from '@client/components/ui/button';
import { paths } from '@client/config/paths';

type Props = {
  conflict: ConflictView;
  /** Today, in the salon's zone: another day's free times start the day after. */
  date: string;
  busy: boolean;
  onApply: (fix: FixView) => void;
};

/**
 * A conflict's fixes, best first, each one action: the desk applies it here, except another day, which opens the
 * booking's move form with the engine's free times from tomorrow.
 */
export function FixList({ conflict, date, busy, onApply }: Props) {
  if (conflict.fixes.length === 0) {
    return <p className="text-sm">No change in the book solves this: the stylist and the client decide (stay late, or stop a step).</p>;
  }
  return (
    <ol className="flex flex-col gap-2" aria-label={`Fixes for ${conflict.sitting.clientName}, best first`}>
      {conflict.fixes.map((f) => (
        <li key={JSON.stringify(f.fix)}>
          {f.fix.kind === 'another_day' ? (
            <Link
              className={`${buttonClasses('secondary')} min-h-12 w-full justify-start text-left`}
              to={paths.deskBooking(f.bookingId, { sitting: conflict.sitting.seq, from: shiftLocalDate(date, 1) })}
            >
              {f.words}…
            </Link>
          ) : (
            <Button variant="secondary" className="min-h-12 w-full justify-start text-left" busy={busy} onClick={() => onApply(f)}>
              {f.words}
            </Button>
          )}
        </li>
      ))}
    </ol>
  );
}
