import { useState } from 'react';
import type { Cautions } from '@shared/schemas/online-booking.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { useAcceptCautions } from '../api/hold-mutations';
import { StepHeading } from './step-heading';

type Props = { holdId: string; secret: string; cautions: Cautions; focusOnMount: boolean; onAccepted: () => void };

/** Step 4: each caution read and ticked (all are required) before any money moves; the version is stored with the booking. */
export function CautionsStep({ holdId, secret, cautions, focusOnMount, onAccepted }: Props) {
  const [ticked, setTicked] = useState<ReadonlySet<string>>(new Set());
  const [tried, setTried] = useState(false);
  const accept = useAcceptCautions(holdId);
  const missing = cautions.items.filter((item) => !ticked.has(item.id));

  const toggle = (id: string, on: boolean) => {
    const next = new Set(ticked);
    if (on) next.add(id);
    else next.delete(id);
    setTicked(next);
  };
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    setTried(true);
    const firstMissing = missing[0];
    if (firstMissing) return document.getElementById(`caution-${firstMissing.id}`)?.focus();
    accept.mutate({ version: cautions.version, secret }, { onSuccess: onAccepted });
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <StepHeading focusOnMount={focusOnMount}>Before you pay</StepHeading>
      <p>Please read each of these and tick it to say you have. They are part of your booking.</p>
      {tried && missing.length > 0 && <FormAlert>Tick each caution to go on ({missing.length} left).</FormAlert>}
      {accept.isError && <FormAlert>{accept.error.message}</FormAlert>}
      <fieldset className="flex flex-col gap-3">
        <legend className="sr-only">Cautions to accept</legend>
        {cautions.items.map((item) => (
          <div key={item.id} className="flex gap-3 rounded-xl bg-white p-4 ring-1 ring-ink/15">
            <input
              id={`caution-${item.id}`}
              type="checkbox"
              checked={ticked.has(item.id)}
              onChange={(event) => toggle(item.id, event.target.checked)}
              aria-describedby={`caution-${item.id}-text`}
              aria-invalid={tried && !ticked.has(item.id) ? true : undefined}
              required
              className="mt-1 size-6 shrink-0 accent-oxide"
            />
            <div>
              <label htmlFor={`caution-${item.id}`} className="font-bold">
                I have read: {item.title}
              </label>
              <p id={`caution-${item.id}-text`} className="mt-1">
                {item.text}
              </p>
            </div>
          </div>
        ))}
      </fieldset>
      <Button type="submit" busy={accept.isPending} className="w-full sm:w-auto sm:self-start">
        Accept and continue
      </Button>
    </form>
  );
}
