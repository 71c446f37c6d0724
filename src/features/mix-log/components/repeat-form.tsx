import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/select-field';
import { isApiError } from '../../../lib/api-error';
import { formatDay } from '../../../lib/time';
import { clientQueries } from '../../clients/api/client-queries';
import { useRepeatMixLog } from '../api/mix-log-queries';

type Props = {
  bookingId: string;
  /** Sittings of this booking with bowls written (copy sources inside the booking). */
  loggedSittings: number[];
  /** Sittings of this booking that have started (copy targets). */
  startedSittings: number[];
  /** When known, the client's other bookings are offered as sources too. */
  clientId?: string;
  timeZone: string;
};

/** "Repeat last time": start a sitting's bowls from an earlier sitting of the same client. */
export function RepeatForm({ bookingId, loggedSittings, startedSittings, clientId, timeZone }: Props) {
  const repeat = useRepeatMixLog(bookingId);
  const client = useQuery({ ...clientQueries.detail(clientId ?? ''), enabled: Boolean(clientId) });
  const sources = [
    ...loggedSittings.map((seq) => ({ value: `${bookingId}|${seq}`, label: `This booking, sitting ${seq}` })),
    ...(client.data?.bookings ?? [])
      .filter((b) => b.id !== bookingId)
      .flatMap((b) => b.sittings.map((s) => ({ value: `${b.id}|${s.seq}`, label: `${b.service.name}, ${formatDay(s.start, timeZone)} (sitting ${s.seq})` }))),
  ];
  const [source, setSource] = useState('');
  const [into, setInto] = useState(String(startedSittings[startedSittings.length - 1] ?? ''));
  const chosen = source || sources[0]?.value || '';
  if (sources.length === 0 || startedSittings.length === 0) return null;

  const onRepeat = () => {
    const [fromBookingId, seq] = chosen.split('|');
    repeat.mutate({ fromBookingId, sitting: Number(seq), intoSitting: Number(into) });
  };
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <SelectField label="Repeat from" options={sources} value={chosen} onChange={(e) => setSource(e.target.value)} />
        <SelectField label="Into sitting" options={startedSittings.map((s) => ({ value: String(s), label: `Sitting ${s}` }))} value={into} onChange={(e) => setInto(e.target.value)} />
        <Button variant="secondary" busy={repeat.isPending} onClick={onRepeat}>
          Repeat last time
        </Button>
      </div>
      {repeat.isError && <FormAlert>{isApiError(repeat.error) ? repeat.error.message : 'The bowls could not be copied.'}</FormAlert>}
      {repeat.isSuccess && <FormAlert tone="success">Copied {repeat.data.copied} bowls; fill in the actual minutes and results as you go.</FormAlert>}
    </div>
  );
}
