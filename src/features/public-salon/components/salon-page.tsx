import { formatZone } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { telHref } from '@shared/format/dial';
import type { PublicSalon } from '@shared/schemas/online-booking.schemas';
import { SectionCard } from '@client/components/ui/section-card';
import { SalonPolicies } from './salon-policies';
import { ServiceCard } from './service-card';

type Props = { salon: PublicSalon };

/** The salon's public page: menu first (that is what people came for), then hours, policies and stylists. */
export function SalonPage({ salon }: Props) {
  return (
    <div className="flex flex-col gap-8">
      <div>
        <h1 className="text-3xl font-extrabold tracking-tight">{salon.name}</h1>
        <p className="mt-1">{salon.address}</p>
        <p>
          <a href={telHref(salon.phone)} className="text-link">
            {salon.phoneText}
          </a>
        </p>
      </div>
      <div className="grid gap-8 lg:grid-cols-[1fr_22rem]">
        <section aria-labelledby="services-heading" className="flex flex-col gap-3">
          <h2 id="services-heading" className="text-xl font-bold">
            Services
          </h2>
          {salon.services.map((service) => (
            <ServiceCard key={service.id} service={service} slug={salon.slug} currency={salon.currency} phone={salon.phone} phoneText={salon.phoneText} />
          ))}
        </section>
        <div className="flex flex-col gap-4">
          <SectionCard title="Opening hours">
            <ul className="flex flex-col gap-1 tabular">
              {salon.openingHours.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
            <p className="mt-2 text-sm text-ink/80">Salon time: {formatZone(formatFor(salon.timeZone))}</p>
          </SectionCard>
          <SalonPolicies policies={salon.policies} />
          <SectionCard title="Stylists">
            <ul className="flex flex-col gap-2">
              {salon.stylists.map((stylist) => (
                <li key={stylist.id}>
                  <span className="font-bold">{stylist.name}</span>
                  {stylist.skills.length > 0 && <span className="block text-sm text-ink/80">{stylist.skills.join(', ')}</span>}
                </li>
              ))}
            </ul>
          </SectionCard>
        </div>
      </div>
    </div>
  );
}
