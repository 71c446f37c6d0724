import { useState } from 'react';
import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { useIdempotencyKeys } from '@client/lib/use-idempotency-keys';
import { useFillWindow, useOfferWindow } from '../api/window-mutations';
import { StandbyOffer } from './standby-offer';
import { WalkInFill } from './walk-in-fill';
import { WindowFitPicker } from './window-fit-picker';

type Props = { window: HandsFreeWindowView; timeZone: string; onDone: (message: string) => void };
type Who = { clientId: string; standbyEntryId: string; name: string } | { walkIn: { name: string; phone?: string } };

/** Put a window fit into the window: book a standby client or a walk-in, or offer it to standby clients. */
export function FillWindowPanel({ window: win, timeZone, onDone }: Props) {
  const [fitId, setFitId] = useState(win.fits[0]?.serviceId ?? '');
  const fill = useFillWindow();
  const offer = useOfferWindow();
  const keys = useIdempotencyKeys();
  const fit = win.fits.find((f) => f.serviceId === fitId);
  const wanting = win.standby.filter((s) => s.serviceIds.includes(fitId));
  const at = formatTime(win.start, formatFor(timeZone));
  // The server books the earliest free start inside the window, so a fit need not start at its first minute.
  const latestStart = fit ? new Date(Date.parse(win.end) - fit.minutes * 60_000).toISOString() : win.start;
  const base = { stylistId: win.stylistId, serviceId: fitId, start: win.start };

  const book = (who: Who) => {
    const name = 'walkIn' in who ? who.walkIn.name : who.name;
    const action = `${win.start}/${fitId}/${'walkIn' in who ? 'walk-in' : who.clientId}`;
    const body = { ...base, latestStart, ...('walkIn' in who ? { walkIn: who.walkIn } : { clientId: who.clientId, standbyEntryId: who.standbyEntryId }) };
    // Awaited, not mutate() callbacks: the refreshed list may drop this window (and this panel) before
    // per-call callbacks would run, and the notice lives in the list so it must still be set.
    fill
      .mutateAsync({ ...body, idempotencyKey: keys.keyFor(action) })
      .then(() => {
        keys.settle(action);
        onDone(`Booked ${name} for ${fit?.name ?? 'the window fit'} at ${at}.`);
      })
      .catch((error: Error) => keys.settle(action, error));
  };
  const sendOffers = (standbyEntryIds: string[]) =>
    offer
      .mutateAsync({ ...base, standbyEntryIds })
      .then(({ offers }) => onDone(`Offer sent to ${offers} ${offers === 1 ? 'client' : 'clients'}.`))
      .catch(() => {}); // the error is shown from offer.error

  if (win.fits.length === 0) return <p>No window fit is short enough for this window.</p>;
  const error = fill.error ?? offer.error;
  return (
    <div className="flex flex-col gap-4">
      {error && <FormAlert>{error.message}</FormAlert>}
      <WindowFitPicker fits={win.fits} value={fitId} onChange={setFitId} />
      {wanting.length > 0 && (
        <div className="flex flex-col gap-2">
          <h4 className="font-bold">Standby clients who want this</h4>
          <ul className="flex flex-wrap gap-2">
            {wanting.map((s) => (
              <li key={s.entryId}>
                <Button busy={fill.isPending} onClick={() => book({ clientId: s.clientId, standbyEntryId: s.entryId, name: s.clientName })}>
                  Book {s.clientName}
                </Button>
              </li>
            ))}
          </ul>
          <StandbyOffer key={fitId} wanting={wanting} busy={offer.isPending} onOffer={sendOffers} />
        </div>
      )}
      <WalkInFill busy={fill.isPending} onBook={(walkIn) => book({ walkIn })} />
    </div>
  );
}
