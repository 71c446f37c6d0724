import { Bar, BarChart, CartesianGrid, LabelList, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { percentValue } from './chart-labels';

type Props = {
  /** One bar per row: a name and a share from 0 to 1 (null: no bar, "—"). */
  rows: Array<{ name: string; share: number | null }>;
  /** The series' name in the tooltip, e.g. "Hands-on share". */
  series: string;
  /** What the chart shows, for screen readers. */
  label: string;
  fill: string;
};

/** A share per person as horizontal bars from 0 to 100 %; the numbers are in the table beside it. */
export function ShareBars({ rows, series, label, fill }: Props) {
  const data = rows.map((r) => ({ name: r.name, share: percentValue(r.share) }));
  return (
    <figure className="mb-4" style={{ height: 60 + rows.length * 44 }} role="img" aria-label={label}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} layout="vertical" margin={{ top: 10, right: 50, bottom: 10, left: 20 }}>
          <CartesianGrid strokeDasharray="3 3" stroke="#1E2A3622" horizontal={false} />
          <XAxis type="number" unit=" %" domain={[0, 100]} />
          <YAxis type="category" dataKey="name" width={120} />
          <Tooltip formatter={(v) => `${v} %`} />
          <Bar dataKey="share" name={series} fill={fill} isAnimationActive={false}>
            <LabelList dataKey="share" position="right" formatter={(v: unknown) => (v === null || v === undefined ? '—' : `${v} %`)} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
