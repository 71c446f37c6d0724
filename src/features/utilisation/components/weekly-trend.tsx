import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { SectionCard } from '@client/components/ui/section-card';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import { FigureTable, type FigureColumn } from './figure-table';
import { percentText, percentValue } from './chart-labels';
import { formatMoney, minorToUnits } from '@shared/money/money';

export interface TrendWeek {
  from: string;
  to: string;
  bookings: number;
  chairOccupancy: number | null;
  windowUse: number | null;
  handsOnShare?: number | null;
  revenueCents?: number;
}

type Props = { weeks: TrendWeek[]; filename: string; currency?: string };

// Lines differ by dash pattern as well as colour, so the chart reads in print and without colour.
const LINES = [
  { key: 'chairOccupancy', name: 'Chair occupancy', color: '#B5532A', dash: undefined },
  { key: 'windowUse', name: 'Window use', color: '#5E8066', dash: '6 4' },
  { key: 'handsOnShare', name: 'Hands-on share (all stylists)', color: '#1E2A36', dash: '2 3' },
] as const;

/** Week by week: chair occupancy, window use (and, for the owner, hands-on share and revenue). */
export function WeeklyTrend({ weeks, filename, currency }: Props) {
  const owner = weeks.some((w) => w.handsOnShare !== undefined);
  const lines = LINES.filter((l) => owner || l.key !== 'handsOnShare');
  const data = weeks.map((w) => ({
    week: formatDate(w.from, zonelessFormat),
    ...Object.fromEntries(lines.map((l) => [l.key, percentValue(w[l.key] ?? null)])),
  }));
  const columns: FigureColumn<TrendWeek>[] = [
    { id: 'from', header: 'Week from', value: (w) => w.from, format: (w) => formatDate(w.from, zonelessFormat) },
    { id: 'bookings', header: 'Bookings', value: (w) => w.bookings, numeric: true },
    ...lines.map((l) => ({
      id: l.key,
      header: l.name,
      value: (w: TrendWeek) => percentValue(w[l.key] ?? null),
      format: (w: TrendWeek) => percentText(w[l.key]),
      numeric: true,
      unit: '%',
    })),
    ...(currency
      ? [
          {
            id: 'revenue',
            header: 'Revenue',
            value: (w: TrendWeek) => minorToUnits(w.revenueCents ?? 0, currency),
            format: (w: TrendWeek) => formatMoney(w.revenueCents ?? 0, currency),
            numeric: true,
            unit: currency,
          },
        ]
      : []),
  ];
  return (
    <SectionCard title="Week by week">
      <figure className="mb-4 h-72" role="img" aria-label="Line chart of the weekly figures; the numbers are in the table below">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 10, right: 20, bottom: 10, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="#1E2A3622" />
            <XAxis dataKey="week" />
            <YAxis unit=" %" domain={[0, 100]} />
            <Tooltip formatter={(v) => `${v} %`} />
            <Legend />
            {lines.map((l) => (
              <Line
                key={l.key}
                type="monotone"
                dataKey={l.key}
                name={l.name}
                stroke={l.color}
                strokeDasharray={l.dash}
                strokeWidth={2}
                connectNulls
                isAnimationActive={false}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </figure>
      <FigureTable caption="Weekly figures" columns={columns} rows={weeks} filename={filename} />
    </SectionCard>
  );
}
