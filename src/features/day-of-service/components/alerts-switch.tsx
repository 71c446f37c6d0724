import { useState } from 'react';
import { Button } from '@client/components/ui/button';
import { alreadyAsked, askForNotices, noticePermission } from '../alerts/notices';

/**
 * Asks once, after a click and in plain words, whether this device may show developing alerts as browser notices.
 * Once answered it only says how alerts reach this device.
 */
export function AlertsSwitch() {
  const [permission, setPermission] = useState(noticePermission);
  const [asked, setAsked] = useState(alreadyAsked);
  if (permission === 'default' && !asked) {
    return (
      <div className="flex flex-wrap items-center gap-3 rounded-lg border-l-4 border-sage bg-white px-4 py-3">
        <p className="min-w-60 flex-1">
          <span className="font-bold">Developing alerts.</span> Dwell can chime and show a notice on this device when a developing step reaches its least time,
          5 minutes before its most time, and if it reaches the product's processing limit. Your browser will ask once.
        </p>
        <Button
          variant="secondary"
          onClick={async () => {
            setPermission(await askForNotices());
            setAsked(true);
          }}
        >
          Turn on alerts
        </Button>
      </div>
    );
  }
  const words =
    permission === 'granted'
      ? 'Developing alerts on this device: chime and notice.'
      : 'Developing alerts on this device: chime only (notices are off in this browser’s settings).';
  return <p className="text-sm text-ink/80">{words}</p>;
}
