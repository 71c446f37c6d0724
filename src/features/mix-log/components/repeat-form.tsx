import { useState } from 'react';
import type { RepeatSource } from '@shared/schemas/mix-log.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SelectField } from '@client/components/ui/select-field';
import { isApiError } from '@client/lib/api-error';
import { formatDate } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { useRepeatMixLog } from '../api/mix-log-queries';

type Props = {
  bookingId: string;
  /** Sittings of this client with bowls written, as the server lists them for the caller. */
  sources: RepeatSource[];
  /** Sittings of this booking that bowls can be written into. */
  targets: number[];
  /** The sitting picked for the bowl form, offered first. */
  target: number;
  timeZone: string;
};

/** "Repeat last time": start a sitting's bowls from an earlier sitting of the same client. */
export function RepeatForm({ bookingId, sources, targets, target, timeZone }: Props) {
  const repeat = useRepeatMixLog(bookingId);
  const options = sources.map((s) => ({
    value: `${s.bookingId}|${s.sittingSeq}`,
    label: `${s.bookingId === bookingId ? 'This booking' : `${s.serviceName}, ${formatDate(s.start, formatFor(timeZone), { width: 'short' })}`} (sitting ${s.sittingSeq}, ${s.bowls} ${s.bowls === 1 ? 'bowl' : 'bowls'})`,
  }));
  const [source, setSource] = useState('');
  const [into, setInto] = useState<number | null>(null);
  const chosen = source || options[0]?.value || '';
  if (options.length === 0 || targets.length === 0) return null;

  const onRepeat = () => {
    const [fromBookingId = '', seq] = chosen.split('|');
    repeat.mutate({ fromBookingId, sitting: Number(seq), intoSitting: into ?? target });
  };
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <SelectField label="Repeat from" options={options} value={chosen} onChange={(e) => setSource(e.target.value)} />
        <SelectField
          label="Into sitting"
          options={targets.map((s) => ({ value: String(s), label: `Sitting ${s}` }))}
          value={String(into ?? target)}
          onChange={(e) => setInto(Number(e.target.value))}
        />
        <Button variant="secondary" busy={repeat.isPending} onClick={onRepeat}>
          Repeat last time
        </Button>
      </div>
      {repeat.isError && <FormAlert>{isApiError(repeat.error) ? repeat.error.message : 'The bowls could not be copied.'}</FormAlert>}
      {repeat.isSuccess && <FormAlert tone="success">Copied {repeat.data.copied} bowls; fill in the actual minutes and results as you go.</FormAlert>}
    </div>
  );
}
