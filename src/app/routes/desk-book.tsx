import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { IdSchema } from '@shared/schemas/common.schemas';
import { BookServicePage } from '@client/features/bookings/components/book-service/book-service-page';
import { catalogueQueries } from '@client/features/catalogue/api/catalogue-queries';
import { clientQueries } from '@client/features/clients/api/client-queries';
import { consultationQueries } from '@client/features/consultations/api/consultation-queries';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';
import { todayIn } from '@client/lib/time';
import { formatMoney } from '@shared/money/money';

/** An id in the page's query (`?consultation=`, `?client=`, …), or null when missing or not an id. */
const idParam = (search: URLSearchParams, name: string) => {
  const id = search.get(name);
  return IdSchema.safeParse(id).success ? id : null;
};

/** `?consultation=<id>` books that consultation's saved quote; `?client=<id>&service=&stylist=` starts with that client. */
export async function loader({ request }: LoaderFunctionArgs) {
  const search = new URL(request.url).searchParams;
  const consultation = idParam(search, 'consultation');
  const client = idParam(search, 'client');
  await Promise.all([
    queryClient.ensureQueryData(catalogueQueries.services()),
    queryClient.ensureQueryData(catalogueQueries.stylists()),
    queryClient.ensureQueryData(salonQueries.current()),
    consultation ? queryClient.ensureQueryData(consultationQueries.detail(consultation)) : null,
    client ? queryClient.ensureQueryData(clientQueries.detail(client)) : null,
  ]);
  return null;
}

export function Component() {
  const [search] = useSearchParams();
  const consultationId = idParam(search, 'consultation');
  const clientId = idParam(search, 'client');
  const { data: services } = useSuspenseQuery(catalogueQueries.services());
  const { data: stylists } = useSuspenseQuery(catalogueQueries.stylists());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const { data: view } = useQuery({ ...consultationQueries.detail(consultationId ?? ''), enabled: consultationId !== null });
  const { data: person } = useQuery({ ...clientQueries.detail(clientId ?? ''), enabled: clientId !== null });
  const start = person && {
    client: { id: person.id, name: person.name, email: person.email, phone: person.phone },
    serviceId: idParam(search, 'service'),
    stylistId: idParam(search, 'stylist'),
  };
  const quote = view && {
    quoteId: view.quote.id,
    client: { id: view.clientId, name: view.clientName, email: null, phone: null },
    serviceId: view.quote.serviceId,
    stepPlan: view.quote.stepPlan,
    summary: `${view.quote.serviceName}, ${view.quote.stepPlan.sittings.length} sitting(s), ${formatMoney(view.quote.priceCents, salon.currency)} with a ${formatMoney(view.quote.depositCents, salon.currency)} deposit.`,
  };
  return (
    <BookServicePage
      key={consultationId ?? clientId ?? 'new'}
      services={services.services}
      stylists={stylists.stylists}
      today={todayIn(salon.timeZone)}
      quote={quote}
      start={start}
    />
  );
}
