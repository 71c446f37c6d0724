import type { OwnerOverview } from '@shared/schemas/owner.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { StatTile } from './stat-tile';

type Props = { counts: OwnerOverview['counts'] };

/** What the salon is set up with. */
export function SalonCounts({ counts }: Props) {
  const tiles = [
    ['Stylists', counts.stylists],
    ['Chairs', counts.chairs],
    ['Basins', counts.basins],
    ['Services', counts.services],
    ['Clients', counts.clients],
  ] as const;
  return (
    <SectionCard title="The salon">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-5">
        {tiles.map(([label, value]) => (
          <StatTile key={label} label={label} value={String(value)} />
        ))}
      </dl>
    </SectionCard>
  );
}
