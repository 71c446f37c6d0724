import { zoneLabel } from '@client/lib/time';

type Props = { timeZone: string; date?: string };

/** Says which clock the times on the page use: the salon's, which may not be the device's. */
export function TimeZoneNote({ timeZone, date }: Props) {
  return <p className="text-sm text-ink/80">Times in salon time: {zoneLabel(timeZone, date)}</p>;
}
