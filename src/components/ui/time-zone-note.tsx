import { formatZone } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = { timeZone: string; date?: string };

/** Says which clock the times on the page use: the salon's, which may not be the device's. */
export function TimeZoneNote({ timeZone, date }: Props) {
  return <p className="text-sm text-ink/80">Times in salon time: {formatZone(formatFor(timeZone), date)}</p>;
}
