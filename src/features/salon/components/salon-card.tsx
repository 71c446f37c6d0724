import type { Salon } from '@shared/schemas/salon.schemas';
import { SectionCard } from '@client/components/ui/section-card';

type Props = { salon: Salon };

/** Where the salon is and how to reach it. */
export function SalonCard({ salon }: Props) {
  return (
    <SectionCard title={salon.name}>
      <address className="not-italic">
        <p>{salon.address}</p>
        <p>
          <a href={`tel:${salon.phone}`} className="text-link">
            {salon.phone}
          </a>
        </p>
      </address>
    </SectionCard>
  );
}
