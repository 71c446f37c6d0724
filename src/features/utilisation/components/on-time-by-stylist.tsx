import type { StylistTimekeeping } from '@shared/schemas/utilisation.schemas';
import { FigureTable, type FigureColumn } from './figure-table';
import { hoursText, percentText, rounded } from './chart-labels';
import { ShareBars } from './share-bars';

type Props = { stylists: StylistTimekeeping[]; filename: string };

const minutesText = (m: number | null) => (m === null ? '—' : `${Math.round(m)} min`);

const columns: FigureColumn<StylistTimekeeping>[] = [
  { id: 'name', header: 'Stylist', value: (s) => s.name },
  { id: 'sittings', header: 'Timed sittings', value: (s) => s.sittings, numeric: true },
  { id: 'onTime', header: 'On time', value: (s) => s.onTime, numeric: true },
  { id: 'onTimeRate', header: 'On-time rate', value: (s) => rounded(s.onTimeRate, 4), format: (s) => percentText(s.onTimeRate), numeric: true },
  { id: 'lateArrivals', header: 'Late starts after a late arrival', value: (s) => s.lateArrivals, numeric: true },
  { id: 'overrun', header: 'Overrun minutes', value: (s) => rounded(s.overrunMinutes, 1), format: (s) => minutesText(s.overrunMinutes), numeric: true },
  {
    id: 'overrunPerSitting',
    header: 'Overrun minutes per sitting',
    value: (s) => rounded(s.overrunPerSitting, 1),
    format: (s) => minutesText(s.overrunPerSitting),
    numeric: true,
  },
  { id: 'planned', header: 'Planned chair hours', value: (s) => rounded(s.plannedChairHours, 2), format: (s) => hoursText(s.plannedChairHours), numeric: true },
  { id: 'actual', header: 'Actual chair hours', value: (s) => rounded(s.actualChairHours, 2), format: (s) => hoursText(s.actualChairHours), numeric: true },
];

/** On-time rate per stylist as bars, and every timekeeping figure per stylist in the table. */
export function OnTimeByStylist({ stylists, filename }: Props) {
  return (
    <>
      <ShareBars
        rows={stylists.map((s) => ({ name: s.name, share: s.onTimeRate }))}
        series="On-time rate"
        label="Bar chart of the on-time rate per stylist; the numbers are in the table below"
        fill="#5E8066"
      />
      <FigureTable caption="On time and overruns per stylist" columns={columns} rows={stylists} filename={filename} />
    </>
  );
}
