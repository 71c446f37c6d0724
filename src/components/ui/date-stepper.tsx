import { Link } from 'react-router-dom';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import { shiftLocalDate } from '@shared/time/salon-time';
import { buttonClasses } from './button';

type Props = {
  date: string;
  today: string;
  /** Where a given date's page lives, e.g. `/desk?date=…`. */
  hrefFor: (date: string) => string;
  onPick: (date: string) => void;
};

/** Previous day, next day, back to today, or any date: one day of the book at a time. */
export function DateStepper({ date, today, hrefFor, onPick }: Props) {
  return (
    <nav aria-label="Choose a day" className="flex flex-wrap items-center gap-2">
      <Link to={hrefFor(shiftLocalDate(date, -1))} className={buttonClasses('secondary')}>
        <span aria-hidden="true">←</span> Previous day
      </Link>
      <label className="flex items-center gap-2">
        <span className="sr-only">Date</span>
        <input
          type="date"
          value={date}
          onChange={(event) => event.target.value && onPick(event.target.value)}
          className="min-h-11 rounded-lg border border-edge bg-white px-3 tabular"
          aria-describedby="date-stepper-long"
        />
      </label>
      <span id="date-stepper-long" className="sr-only">
        {formatDate(date, zonelessFormat)}
      </span>
      <Link to={hrefFor(shiftLocalDate(date, 1))} className={buttonClasses('secondary')}>
        Next day <span aria-hidden="true">→</span>
      </Link>
      {date !== today && (
        <Link to={hrefFor(today)} className={buttonClasses('quiet')}>
          Back to today
        </Link>
      )}
    </nav>
  );
}
