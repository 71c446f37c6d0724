import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import type { ServiceFormInput, SetupService } from '@shared/schemas/setup.schemas';
import { PageHeader } from '@client/components/ui/page-header';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { setupQueries } from '@client/features/setup/api/setup-queries';
import { ServiceForm } from '@client/features/setup/components/service-form';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { queryClient } from '@client/lib/query-client';
import { stepOfKind } from '@client/features/bookings/step-plan-form';

export async function loader() {
  await Promise.all([queryClient.ensureQueryData(setupQueries.services()), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

const toForm = (s: SetupService): ServiceFormInput => ({
  name: s.name,
  description: s.description,
  category: s.category,
  skill: s.skill,
  priceCents: s.priceCents,
  priceIsFrom: s.priceIsFrom,
  onlineBookable: s.onlineBookable,
  needsSkinTest: s.needsSkinTest,
  depositKind: s.depositPercent === null ? 'fixed' : 'percent',
  depositCents: s.depositPercent === null ? s.depositCents : 0,
  depositPercent: s.depositPercent,
  stepPlan: s.stepPlan,
});

const blank = (skill: string): ServiceFormInput => ({
  name: '',
  description: '',
  category: 'colour',
  skill,
  priceCents: 0,
  priceIsFrom: false,
  onlineBookable: false,
  needsSkinTest: false,
  depositKind: 'fixed',
  depositCents: 0,
  depositPercent: null,
  stepPlan: { sittings: [{ steps: [stepOfKind('hands_on')] }] },
});

export function Component() {
  const { id = 'new' } = useParams();
  const { data } = useSuspenseQuery(setupQueries.services());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const service = data.services.find((s) => s.id === id);
  if (id !== 'new' && !service) throw new Response('That service was not found.', { status: 404 });
  return (
    <div>
      <PageHeader
        title={service ? service.name : 'New service'}
        subtitle={
          service && service.futureBookings > 0
            ? `${service.futureBookings} future ${service.futureBookings === 1 ? 'booking keeps' : 'bookings keep'} the plan and price they were made with.`
            : 'Bookings already made keep the plan and price they were made with.'
        }
      />
      <SetupNav />
      <ServiceForm
        key={id}
        id={service?.id ?? null}
        initial={service ? toForm(service) : blank(data.skills[0] ?? 'colour')}
        skills={data.skills}
        currency={salon.currency}
        active={service?.active ?? true}
        families={salon.skinTestFamilies}
      />
    </div>
  );
}
