import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { PublicSalon } from '@shared/schemas/online-booking.schemas';
import { ActionBar } from '@client/components/ui/action-bar';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { FreeTimePicker } from '@client/components/ui/free-time-picker';
import { LoadingState } from '@client/components/ui/loading-state';
import { SelectField } from '@client/components/ui/select-field';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { dayAfterLast, freeTimeKey, freeTimeLabel, type FreeTime } from '@client/lib/free-times';
import { useCreateHold } from '../api/hold-mutations';
import { onlineBookingQueries } from '../api/online-booking-queries';
import type { StoredHold } from '../hold-store';
import { OpenHoldCard } from './open-hold-card';
import { StepHeading } from './step-heading';

type Held = { holdId: string; holdSecret: string };
type Props = {
  salon: PublicSalon;
  serviceId: string;
  /** A signed-in client: their own open hold, if any, is offered instead of holding another time. */
  signedInClient: boolean;
  focusOnMount: boolean;
  onHeld: (hold: Held) => void;
  onResumed: (stored: StoredHold) => void;
};

/** Step 1: a stylist with the service's skill or any, the free times by day, and one button to hold the chosen time. */
export function ChooseTimeStep({ salon, serviceId, signedInClient, focusOnMount, onHeld, onResumed }: Props) {
  const [stylistId, setStylistId] = useState('');
  const [from, setFrom] = useState<string | undefined>(undefined);
  const [picked, setPicked] = useState<FreeTime | null>(null);
  const [nothingPicked, setNothingPicked] = useState(false);
  const ask = { serviceId, stylistId: stylistId || undefined, from };
  const myHolds = useQuery({ ...onlineBookingQueries.myHolds(), enabled: signedInClient });
  const free = useQuery(onlineBookingQueries.availability(salon.slug, ask));
  const createHold = useCreateHold();
  const skill = salon.services.find((s) => s.id === serviceId)?.skill;
  const stylists = salon.stylists.filter((s) => skill !== undefined && s.skills.includes(skill));

  const hold = () => {
    if (!picked) return setNothingPicked(true);
    createHold.mutate(
      { salonSlug: salon.slug, serviceId, stylistId: picked.stylistId, start: picked.start },
      { onSuccess: onHeld, onError: () => setPicked(null) },
    );
  };
  const laterFrom = free.data && dayAfterLast(free.data.times, free.data.timeZone);

  const open = myHolds.data?.holds[0];
  if (open) {
    return (
      <section className="flex flex-col gap-4">
        <StepHeading focusOnMount={focusOnMount}>You already have a time held</StepHeading>
        <p>One time can be held at a time. Go back to booking the time you hold, or release it to pick another.</p>
        <OpenHoldCard hold={open} onResumed={onResumed} />
      </section>
    );
  }
  if (myHolds.isLoading) return <LoadingState label="Checking your held times…" />;

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
        options={[{ value: '', label: 'Any stylist' }, ...stylists.map((s) => ({ value: s.id, label: s.name }))]}
      />
      <TimeZoneNote timeZone={salon.timeZone} />
      {createHold.isError && (
        <FormAlert>{createHold.error.code === 'CONFLICT' ? 'Someone has just taken that time. Please pick another one.' : createHold.error.message}</FormAlert>
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
      <ActionBar>
        <p aria-live="polite" className="text-sm">
          {picked ? (
            <>
              Your pick: <strong>{freeTimeLabel(picked, salon.timeZone)}</strong>
            </>
          ) : (
            'Pick a time to hold it.'
          )}
        </p>
        {nothingPicked && <FormAlert>Pick a time first.</FormAlert>}
        <Button onClick={hold} busy={createHold.isPending} className="w-full sm:w-auto sm:self-start">
          {createHold.isPending ? 'Holding…' : 'Hold this time'}
        </Button>
      </ActionBar>
    </section>
  );
}
