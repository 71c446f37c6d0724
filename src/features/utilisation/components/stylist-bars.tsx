import { formatDuration } from '@shared/format/date-time';
import { Bar, BarChart, CartesianGrid, LabelList, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { StylistFigures } from '@shared/schemas/utilisation.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { FigureTable, type FigureColumn } from './figure-table';
import { percentText, percentValue } from './chart-labels';
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
  const data = stylists.map((s) => ({ name: s.name, share: percentValue(s.handsOnShare) }));
  return (
    <SectionCard title="Stylists">
      <figure
        className="mb-4"
        style={{ height: 60 + stylists.length * 44 }}
        role="img"
        aria-label="Bar chart of hands-on share per stylist; the numbers are in the table below"
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} layout="vertical" margin={{ top: 10, right: 50, bottom: 10, left: 20 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="#1E2A3622" horizontal={false} />
            <XAxis type="number" unit=" %" domain={[0, 100]} />
            <YAxis type="category" dataKey="name" width={120} />
            <Tooltip formatter={(v) => `${v} %`} />
            <Bar dataKey="share" name="Hands-on share" fill="#B5532A" isAnimationActive={false}>
              <LabelList dataKey="share" position="right" formatter={(v: unknown) => (v === null || v === undefined ? '—' : `${v} %`)} />
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </figure>
      <FigureTable caption="Figures per stylist" columns={columns} rows={stylists} filename={filename} />
    </SectionCard>
  );
}
