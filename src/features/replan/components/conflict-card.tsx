import type { ConflictKind, ConflictView } from '@shared/schemas/replan.schemas';
import { formatRange, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { Button } from '@client/components/ui/button';
import { FixList } from './fix-list';
import type { FixView } from '@shared/schemas/replan.schemas';

type Props = {
  conflict: ConflictView;
  date: string;
  timeZone: string;
  busy: boolean;
  onApply: (fix: FixView) => void;
  onTell: (conflict: ConflictView, minutes: number) => void;
};

const kindWords: Record<ConflictKind, string> = {
  hands: 'Hands',
  clients: 'Clients at once',
  chair: 'Chair',
  basin: 'Basin',
  hours: 'Working hours',
  closing: 'Closing time',
};

/** One conflict from an overrun: what happens in words, when, who was told, and its fixes best first. */
export function ConflictCard({ conflict: c, date, timeZone, busy, onApply, onTell }: Props) {
  const zone = formatFor(timeZone);
  const told = c.told.at(-1);
  return (
    <article
      aria-label={`Running late: ${c.sitting.clientName}`}
      className="flex flex-col gap-3 rounded-2xl border-l-8 border-amber bg-white p-4 shadow-sm ring-1 ring-ink/15"
    >
      <p className="font-bold">{c.words}</p>
      <p className="text-sm text-ink/80">
        <span className="font-bold">{kindWords[c.kind]}</span> · {c.minutes} min · <span className="tabular">{formatRange(c.start, c.end, zone)}</span>
      </p>
      {told && (
        <p className="text-sm">
          {c.sitting.clientName} was told about {told.minutesLate} minutes late at <span className="tabular">{formatTime(told.at, zone)}</span>.
        </p>
      )}
      <FixList conflict={c} date={date} busy={busy} onApply={onApply} />
      {c.tellMinutes !== null && !c.told.some((t) => t.minutesLate === c.tellMinutes) && (
        <Button variant="quiet" className="min-h-12 self-start" busy={busy} onClick={() => onTell(c, c.tellMinutes!)}>
          Tell {c.sitting.clientName}: about {c.tellMinutes} minutes late
        </Button>
      )}
    </article>
  );
}
