import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { PublicSalon } from '../../../../shared/schemas/online-booking.schemas';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { FreeTimePicker } from '../../../components/ui/free-time-picker';
import { LoadingState } from '../../../components/ui/loading-state';
import { SelectField } from '../../../components/ui/select-field';
import { TimeZoneNote } from '../../../components/ui/time-zone-note';
import { dayAfterLast, freeTimeKey, type FreeTime } from '../../../lib/free-times';
import { useCreateHold } from '../api/hold-mutations';
import { onlineBookingQueries } from '../api/online-booking-queries';
import { StepHeading } from './step-heading';

type Held = { holdId: string; holdSecret: string };
type Props = { salon: PublicSalon; serviceId: string; focusOnMount: boolean; onHeld: (hold: Held) => void };

/** Step 1: a stylist or any, the free times by day, and one button to hold the chosen time. */
export function ChooseTimeStep({ salon, serviceId, focusOnMount, onHeld }: Props) {
  const [stylistId, setStylistId] = useState('');
  const [from, setFrom] = useState<string | undefined>(undefined);
  const [picked, setPicked] = useState<FreeTime | null>(null);
  const [nothingPicked, setNothingPicked] = useState(false);
  const ask = { serviceId, stylistId: stylistId || undefined, from };
  const free = useQuery(onlineBookingQueries.availability(salon.slug, ask));
  const createHold = useCreateHold();

  const hold = () => {
    if (!picked) return setNothingPicked(true);
    createHold.mutate(
      { salonSlug: salon.slug, serviceId, stylistId: picked.stylistId, start: picked.start },
      { onSuccess: onHeld, onError: () => setPicked(null) },
    );
  };
  const laterFrom = free.data && dayAfterLast(free.data.times, free.data.timeZone);

  return (
    <section className="flex flex-col gap-4">
      <StepHeading focusOnMount={focusOnMount}>Choose a time</StepHeading>
      <SelectField
        label="Stylist"
        value={stylistId}
        onChange={(event) => {
          setStylistId(event.target.value);
          setPicked(null);
        }}
        options={[{ value: '', label: 'Any stylist' }, ...salon.stylists.map((s) => ({ value: s.id, label: s.name }))]}
      />
      <TimeZoneNote timeZone={salon.timeZone} />
      {createHold.isError && (
        <FormAlert>
          {createHold.error.code === 'CONFLICT' ? 'Someone has just taken that time. Please pick another one.' : createHold.error.message}
        </FormAlert>
      )}
      {free.isPending && <LoadingState label="Finding free times…" />}
      {free.isError && <FormAlert>{free.error.message}</FormAlert>}
      {free.data && (
        <FreeTimePicker
          key={`${stylistId}|${from ?? ''}`}
          times={free.data.times}
          timeZone={free.data.timeZone}
          selectedKey={picked ? freeTimeKey(picked) : null}
          onSelect={(time) => {
            setPicked(time);
            setNothingPicked(false);
          }}
          onLater={laterFrom ? () => setFrom(laterFrom) : undefined}
          showStylist={!stylistId}
        />
      )}
      {from && (
        <Button variant="quiet" className="self-start" onClick={() => setFrom(undefined)}>
          Back to the earliest times
        </Button>
      )}
      {nothingPicked && <FormAlert>Pick a time first.</FormAlert>}
      <Button onClick={hold} busy={createHold.isPending} className="w-full sm:w-auto sm:self-start">
        {createHold.isPending ? 'Holding…' : 'Hold this time'}
      </Button>
    </section>
  );
}
