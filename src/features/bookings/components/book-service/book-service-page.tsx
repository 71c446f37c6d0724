import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import type { BookingOption, BookingOptionsRequest, CreateBooking } from '@shared/schemas/booking.schemas';
import type { ClientSummary } from '@shared/schemas/client.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { withinProcessingLimits } from '@shared/rules/processing-limits';
import { FormAlert } from '@client/components/ui/form-alert';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { paths } from '@client/config/paths';
import { isApiError, problemText } from '@client/lib/api-error';
import { useIdempotencyKeys } from '@client/lib/use-idempotency-keys';
import { useCreateBooking } from '@client/features/bookings/api/booking-mutations';
import { bookingQueries } from '@client/features/bookings/api/booking-queries';
import { freeTimesTaken } from '@client/lib/cache-rules';
import { salonQueries } from '@client/features/salon';
import { BookFormSchema, toOptionsRequest, type BookFormInput, type BookFormValues } from '@client/features/bookings/book-form-schema';
import { BookServiceForm } from './book-service-form';
import { OptionList, optionKey } from './option-list';
import { SkinTestNotice } from './skin-test-notice';

/** A saved consultation quote being booked: its client, service and edited step plan fill the form. */
export type QuoteToBook = { quoteId: string; client: ClientSummary; serviceId: string; stepPlan: StepPlan; summary: string };

/** A client to book, with the service and stylist they asked for when known (e.g. their standby entry). */
export type BookingStart = { client: ClientSummary; serviceId: string | null; stylistId: string | null };

type Props = {
  services: ServiceSummary[];
  stylists: { id: string; name: string; skills: string[] }[];
  today: string;
  quote?: QuoteToBook;
  start?: BookingStart;
};

/** The form's first values: a quote's, a started booking's, or blank. */
function firstValues(services: ServiceSummary[], today: string, quote?: QuoteToBook, start?: BookingStart): BookFormInput {
  if (quote) return { clientId: quote.client.id, serviceId: quote.serviceId, stylistId: '', earliestDate: today, stepPlan: structuredClone(quote.stepPlan) };
  const service = services.find((s) => s.id === start?.serviceId);
  return {
    clientId: start?.client.id ?? '',
    serviceId: service?.id ?? '',
    stylistId: start?.stylistId ?? '',
    earliestDate: today,
    stepPlan: structuredClone(service?.stepPlan ?? { sittings: [] }),
  };
}

/** The desk's booking flow: fill in the request, find times, book one option. */
export function BookServicePage({ services, stylists, today, quote, start }: Props) {
  const navigate = useNavigate();
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const form = useForm<BookFormInput, unknown, BookFormValues>({
    // This booking's plan is held to the salon's processing limits, as the server holds it.
    resolver: zodResolver(BookFormSchema.superRefine(withinProcessingLimits(salon.processingLimits))),
    defaultValues: firstValues(services, today, quote, start),
  });
  const [client, setClient] = useState<ClientSummary | null>(quote?.client ?? start?.client ?? null);
  const [request, setRequest] = useState<BookingOptionsRequest | null>(null);
  const [booking, setBooking] = useState<string | null>(null);
  const queryClient = useQueryClient();
  // Options are a query keyed by the request: no request, no options (a changed client or service clears them).
  const findTimes = useQuery({ ...bookingQueries.options(request!), enabled: request !== null });
  const create = useCreateBooking();
  const keys = useIdempotencyKeys();
  const skinTestService = services.find((s) => s.category === 'skin_test') ?? null;

  const ask = (next: BookingOptionsRequest) => {
    setRequest(next);
    // Asking again for the same request reads it fresh (someone may have booked meanwhile).
    void queryClient.invalidateQueries({ queryKey: bookingQueries.options(next).queryKey });
  };
  const chooseClient = (next: ClientSummary | null) => {
    setClient(next);
    form.setValue('clientId', next?.id ?? '', { shouldValidate: form.formState.isSubmitted });
    setRequest(null);
  };
  const chooseService = (service: ServiceSummary | null) => {
    form.setValue('serviceId', service?.id ?? '');
    form.setValue('stepPlan', structuredClone(service?.stepPlan ?? { sittings: [] }));
    setRequest(null);
    create.reset();
  };
  const book = (option: BookingOption) => {
    if (!request || !option.sittings[0]) return;
    const action = optionKey(option);
    setBooking(action);
    const body: CreateBooking = {
      clientId: request.clientId,
      serviceId: request.serviceId,
      stepPlan: request.stepPlan,
      stylistId: option.stylistId,
      start: option.sittings[0].start,
      chairIds: option.sittings.map((sitting) => sitting.chairId),
      idempotencyKey: keys.keyFor(action),
      // The quote holds only while its client is the one being booked.
      ...(quote && request.clientId === quote.client.id ? { quoteId: quote.quoteId } : {}),
    };
    create.mutate(body, {
      onSuccess: (created) => {
        keys.settle(action);
        navigate(paths.deskBooking(created.id));
      },
      onError: (error) => {
        keys.settle(action, error);
        // Someone took the time meanwhile: show why and look again.
        if (isApiError(error, 'CONFLICT')) void freeTimesTaken(queryClient);
      },
      onSettled: () => setBooking(null),
    });
  };

  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Book a service" subtitle="Pick the client and the service, find times, and book one option." />
      {quote && (
        <Notice tone="info" title={`Booking ${quote.client.name}'s quote`}>
          {quote.summary} The quote's step plan is filled in below; its price and deposit apply to the booking.
        </Notice>
      )}
      <FormProvider {...form}>
        <BookServiceForm
          services={services}
          stylists={stylists}
          client={client}
          onClient={chooseClient}
          onService={chooseService}
          onFind={form.handleSubmit((values) => ask(toOptionsRequest(values)))}
          finding={findTimes.isFetching}
          primary={!request || !findTimes.data}
        />
      </FormProvider>
      {request && findTimes.isError && <FormAlert>{problemText(findTimes.error)}</FormAlert>}
      {create.isError && <FormAlert>{problemText(create.error)}</FormAlert>}
      {request && findTimes.data && (
        <SkinTestNotice
          check={findTimes.data.skinTest}
          timeZone={findTimes.data.timeZone}
          earliestDate={request?.earliestDate ?? today}
          onBookSkinTest={skinTestService ? () => chooseService(skinTestService) : null}
        />
      )}
      {request && findTimes.data && <OptionList answer={findTimes.data} bookingKey={booking} onBook={book} />}
    </div>
  );
}
