import { formatDuration } from '@shared/format/date-time';
import type { StylistFigures } from '@shared/schemas/utilisation.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { FigureTable, type FigureColumn } from './figure-table';
import { percentText, percentValue } from './chart-labels';
import { ShareBars } from './share-bars';
import { formatMoney, minorToUnits } from '@shared/money/money';

type Props = { stylists: StylistFigures[]; currency: string; filename: string };

/** Hands-on share per stylist as bars, and every per-stylist figure in the table. */
export function StylistBars({ stylists, currency, filename }: Props) {
  const columns: FigureColumn<StylistFigures>[] = [
    { id: 'name', header: 'Stylist', value: (s) => s.name },
    { id: 'share', header: 'Hands-on share', value: (s) => percentValue(s.handsOnShare), format: (s) => percentText(s.handsOnShare), numeric: true, unit: '%' },
    { id: 'handsOn', header: 'Hands-on minutes', value: (s) => s.handsOnMinutes, format: (s) => formatDuration(s.handsOnMinutes), numeric: true },
    { id: 'clock', header: 'Minutes on the clock', value: (s) => s.onClockMinutes, format: (s) => formatDuration(s.onClockMinutes), numeric: true },
    { id: 'bookings', header: 'Bookings', value: (s) => s.bookings, numeric: true },
    { id: 'noShows', header: 'No-shows', value: (s) => s.noShows, numeric: true },
    {
      id: 'revenue',
      header: 'Revenue',
      value: (s) => minorToUnits(s.revenueCents, currency),
      format: (s) => formatMoney(s.revenueCents, currency),
      numeric: true,
      unit: currency,
    },
    {
      id: 'perHour',
      header: 'Revenue per hour on the clock',
      value: (s) => (s.revenuePerHourCents === null ? null : minorToUnits(s.revenuePerHourCents, currency)),
      format: (s) => (s.revenuePerHourCents === null ? '—' : formatMoney(s.revenuePerHourCents, currency)),
      numeric: true,
      unit: currency,
    },
  ];
  return (
    <SectionCard title="Stylists">
      <ShareBars
        rows={stylists.map((s) => ({ name: s.name, share: s.handsOnShare }))}
        series="Hands-on share"
        label="Bar chart of hands-on share per stylist; the numbers are in the table below"
        fill="#B5532A"
      />
      <FigureTable caption="Figures per stylist" columns={columns} rows={stylists} filename={filename} />
    </SectionCard>
  );
}
