import { useId, useState } from 'react';
import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';
import { Button } from '@client/components/ui/button';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { FillWindowPanel } from './fill-window-panel';
import { SentOffers } from './sent-offers';

type Props = { window: HandsFreeWindowView; timeZone: string; stylistName?: string; onDone: (message: string) => void };

/** One hands-free window: when, how long, what fits, who on the standby list wants it; opens to fill it. */
export function WindowCard({ window: win, timeZone, stylistName, onDone }: Props) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const times = formatRange(win.start, win.end, formatFor(timeZone));
  return (
    <article aria-label={`Hands free ${win.minutes} min, ${times}`} className="flex flex-col gap-3 rounded-2xl border-2 border-dashed border-sage bg-white p-4">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 className="text-lg font-bold tabular">{times}</h3>
          <p>
            Hands free {win.minutes} min{stylistName && ` · ${stylistName}`}
            {win.freed && <span className="font-bold"> · freed as the day runs</span>}
          </p>
        </div>
        {win.fits.length > 0 && !win.freed && (
          <Button variant={open ? 'quiet' : 'secondary'} aria-expanded={open} aria-controls={panelId} onClick={() => setOpen(!open)}>
            {open ? 'Close' : 'Fill window'}
          </Button>
        )}
      </div>
      <p className="text-sm">
        <span className="font-bold">Fits: </span>
        {win.fits.length ? win.fits.map((f) => `${f.name} (${f.minutes} min)`).join(', ') : 'none this short'}
      </p>
      <p className="text-sm">
        <span className="font-bold">Standby: </span>
        {win.standby.length ? win.standby.map((s) => s.clientName).join(', ') : 'nobody waiting for these'}
      </p>
      {win.freed && (
        <p className="text-sm">
          Freed by a sitting that finished early: ring a standby client who wants a fit. It is not filled from here, as the book keeps the finished sitting’s
          booked time.
        </p>
      )}
      {win.offers.length > 0 && (
        <div className="text-sm">
          <p className="font-bold">Offers sent</p>
          <SentOffers offers={win.offers} timeZone={timeZone} label={`Offers sent for ${times}`} />
        </div>
      )}
      <div id={panelId} hidden={!open}>
        {open && (
          <FillWindowPanel
            window={win}
            timeZone={timeZone}
            onDone={(message) => {
              setOpen(false);
              onDone(message);
            }}
          />
        )}
      </div>
    </article>
  );
}
