import { Scatter, ScatterChart, XAxis, YAxis } from 'recharts';
import type { HeatCell } from '@shared/schemas/utilisation.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { FigureTable, type FigureColumn } from './figure-table';
import { hourLabel, percentText, percentValue, weekdayName } from './chart-labels';

type Props = { cells: HeatCell[]; filename: string };

const CELL = 46;
const MARGIN = { top: 10, right: 10, bottom: 30, left: 90 };

const columns: FigureColumn<HeatCell>[] = [
  { id: 'weekday', header: 'Weekday', value: (c) => weekdayName(c.weekday) },
  { id: 'hour', header: 'Hour', value: (c) => hourLabel(c.hour) },
  {
    id: 'occupancy',
    header: 'Chair occupancy',
    value: (c) => percentValue(c.chairOccupancy),
    format: (c) => percentText(c.chairOccupancy),
    numeric: true,
    unit: '%',
  },
  { id: 'held', header: 'Chair minutes with a client', value: (c) => c.chairHeldMinutes, numeric: true },
  { id: 'open', header: 'Chair minutes open', value: (c) => c.chairOpenMinutes, numeric: true },
];

/** Chair occupancy by hour of day and weekday: each square shows its percentage, darker when fuller. */
export function OccupancyHeatMap({ cells, filename }: Props) {
  const hours = cells.map((c) => c.hour);
  const days = [...new Set(cells.map((c) => c.weekday))].sort();
  const first = Math.min(...hours);
  const last = Math.max(...hours);
  const width = MARGIN.left + MARGIN.right + (last - first + 1) * CELL;
  const height = MARGIN.top + MARGIN.bottom + days.length * CELL;
  const row = (weekday: number) => days.indexOf(weekday);
  return (
    <SectionCard title="When the chairs are full">
      {cells.length > 0 && (
        <figure className="mb-4 overflow-x-auto">
          <ScatterChart
            width={width}
            height={height}
            margin={MARGIN}
            role="img"
            aria-label="Heat map of chair occupancy by weekday and hour; the numbers are in the table below"
          >
            <XAxis
              type="number"
              dataKey="hour"
              domain={[first - 0.5, last + 0.5]}
              ticks={[...new Set(hours)]}
              tickFormatter={hourLabel}
              interval={0}
              fontSize={12}
            />
            <YAxis
              type="number"
              dataKey="row"
              domain={[-0.5, days.length - 0.5]}
              ticks={days.map((_, i) => i)}
              tickFormatter={(i: number) => weekdayName(days[i])}
              reversed
              interval={0}
            />
            <Scatter
              data={cells.map((c) => ({ ...c, row: row(c.weekday) }))}
              isAnimationActive={false}
              shape={(props: { cx?: number; cy?: number; payload?: HeatCell }) => {
                const { cx = 0, cy = 0, payload } = props;
                const share = payload?.chairOccupancy ?? 0;
                return (
                  <g>
                    <rect
                      x={cx - CELL / 2 + 1}
                      y={cy - CELL / 2 + 1}
                      width={CELL - 2}
                      height={CELL - 2}
                      rx={4}
                      fill="#B5532A"
                      fillOpacity={0.08 + 0.92 * share}
                      stroke="#1E2A36"
                      strokeOpacity={0.15}
                    />
                    <text x={cx} y={cy + 4} textAnchor="middle" fontSize={12} fill={share > 0.5 ? '#FFFFFF' : '#1E2A36'}>
                      {percentText(payload?.chairOccupancy)}
                    </text>
                  </g>
                );
              }}
            />
          </ScatterChart>
          <figcaption className="mt-1 text-sm text-ink/80">Salon time; each square is one opening hour of that weekday over the whole period.</figcaption>
        </figure>
      )}
      <FigureTable caption="Chair occupancy by weekday and hour" columns={columns} rows={cells} filename={filename} />
    </SectionCard>
  );
}
