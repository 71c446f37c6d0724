import { useState } from 'react';
import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';
import { Button } from '@client/components/ui/button';

type Standby = HandsFreeWindowView['standby'][number];
type Props = { wanting: Standby[]; busy: boolean; onOffer: (entryIds: string[]) => void };

/** Tick standby clients to offer the window to; the first to accept gets it. */
export function StandbyOffer({ wanting, busy, onOffer }: Props) {
  const [picked, setPicked] = useState<string[]>(() => wanting.map((s) => s.entryId));
  const toggle = (id: string) => setPicked((now) => (now.includes(id) ? now.filter((x) => x !== id) : [...now, id]));
  return (
    <fieldset className="flex flex-col gap-2 rounded-lg bg-linen p-3">
      <legend className="font-bold">Offer by SMS and e-mail (the first to accept gets it)</legend>
      {wanting.map((s) => (
        <label key={s.entryId} className="flex min-h-11 items-center gap-3">
          <input type="checkbox" checked={picked.includes(s.entryId)} onChange={() => toggle(s.entryId)} className="size-5 accent-oxide" />
          {s.clientName}
        </label>
      ))}
      <div>
        <Button variant="secondary" busy={busy} disabled={picked.length === 0} onClick={() => onOffer(picked)}>
          Offer to standby clients
        </Button>
      </div>
    </fieldset>
  );
}
