import type { SkinTestCheck } from '@shared/schemas/booking.schemas';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { localDateOf } from '@shared/time/salon-time';

type Props = { check: SkinTestCheck; timeZone: string; earliestDate: string; onBookSkinTest: (() => void) | null };

/** The skin-test rule's answer for this client and service, when it blocks the booking or limits its dates. */
export function SkinTestNotice({ check, timeZone, earliestDate, onBookSkinTest }: Props) {
  if (!check.required) return null;
  // It limits the options only when it allows a first start later than the asked date.
  const limits = check.ok && check.earliestAllowed !== null && localDateOf(check.earliestAllowed, timeZone) > earliestDate;
  const from = check.earliestAllowed
    ? `${formatDate(check.earliestAllowed, formatFor(timeZone), { width: 'short' })}, ${formatTime(check.earliestAllowed, formatFor(timeZone))}`
    : null;
  return (
    <Notice
      tone={check.ok && !limits ? 'info' : 'caution'}
      title={!check.ok ? 'Skin test needed before this colour service' : limits ? 'Skin test: the earliest date is limited' : 'Skin test on record'}
      action={
        !check.ok &&
        onBookSkinTest && (
          <div>
            <Button variant="secondary" onClick={onBookSkinTest}>
              Book a skin test first
            </Button>
          </div>
        )
      }
    >
      <p>{check.message}</p>
      {limits && from && <p className="tabular">Options start from {from}.</p>}
      <p className="mt-1 text-sm">
        Oxidative colour can cause allergic reactions. Follow your salon&apos;s skin-test practice, local regulations and the judgement of a licensed
        professional.
      </p>
    </Notice>
  );
}
