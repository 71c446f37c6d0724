import type { OwnerOverview } from '@shared/schemas/owner.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { formatPercent } from '@client/lib/booking-labels';

type Props = { rows: OwnerOverview['week']['handsOnShare'] };

/** Hands-on share per stylist this week: hands-on and basin minutes ÷ minutes on the clock. */
export function HandsOnShareTable({ rows }: Props) {
  return (
    <SectionCard title="Hands-on share">
      <table className="w-full text-left">
        <caption className="mb-2 text-left text-sm text-ink/80">
          Hands-on and basin minutes as a share of each stylist's minutes on the clock this week.
        </caption>
        <thead>
          <tr className="border-b border-ink/20">
            <th scope="col" className="py-2 pr-4">
              Stylist
            </th>
            <th scope="col" className="py-2 text-right">
              Hands-on share
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.stylist} className="border-b border-ink/10 last:border-0">
              <th scope="row" className="py-2 pr-4 font-normal">
                {row.stylist}
              </th>
              <td className="py-2 text-right tabular">{formatPercent(row.share)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {rows.length === 0 && <p className="mt-2">No stylists on the clock this week.</p>}
    </SectionCard>
  );
}
