import type { Salon } from '@shared/schemas/salon.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { telHref } from '@shared/format/dial';
import { formatPhone } from '@shared/format/phone';

type Props = { salon: Salon };

/** Where the salon is and how to reach it. */
export function SalonCard({ salon }: Props) {
  return (
    <SectionCard title={salon.name}>
      <address className="not-italic">
        <p>{salon.address}</p>
        <p>
          <a href={telHref(salon.phone)} className="text-link">
            {formatPhone(salon.phone, salon.country)}
          </a>
        </p>
      </address>
    </SectionCard>
  );
}
