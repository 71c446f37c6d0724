import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@client/config/paths';
import { PageHeader } from '@client/components/ui/page-header';
import { TimeZoneNote } from '@client/components/ui/time-zone-note';
import { bookingQueries } from '@client/features/bookings/api/booking-queries';
import { BookingList } from '@client/features/bookings/components/booking-list';
import { MyBookingActions } from '@client/features/bookings/components/my-bookings/my-booking-actions';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { MyQuotes } from '@client/features/consultations/components/my-quotes';
import { SalonCard } from '@client/features/salon/components/salon-card';
import { queryClient } from '@client/lib/query-client';
import { SectionCard } from '@client/components/ui/section-card';
import { preferenceQueries } from '@client/features/clients/api/preference-queries';
import { MyPreferencesForm } from '@client/features/clients/components/my-preferences-form';
import { DateOfBirthForm } from '@client/features/clients/components/date-of-birth-form';
import { skinTestWords } from '@shared/rules/skin-test-words';
import { onlineBookingQueries } from '@client/features/online-booking/api/online-booking-queries';
import { WaitingForPayment } from '@client/features/online-booking/components/waiting-for-payment';

export async function loader() {
  await Promise.all([
    queryClient.ensureQueryData(bookingQueries.mine()),
    queryClient.ensureQueryData(salonQueries.current()),
    queryClient.ensureQueryData(preferenceQueries.mine()),
    queryClient.ensureQueryData(onlineBookingQueries.myHolds()),
  ]);
  return null;
}

export function Component() {
  const { data: mine } = useSuspenseQuery(bookingQueries.mine());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const { data: preferences } = useSuspenseQuery(preferenceQueries.mine());
  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_20rem]">
      <div>
        <PageHeader title="My bookings" subtitle={<TimeZoneNote timeZone={mine.timeZone} />} />
        <WaitingForPayment />
        <MyQuotes currency={salon.currency} />
        <BookingList
          // An unpaid hold is not a booking yet: it is listed above, waiting for payment.
          bookings={mine.bookings.filter((b) => b.status !== 'held')}
          timeZone={mine.timeZone}
          currency={salon.currency}
          actions={(booking) => <MyBookingActions booking={booking} />}
        />
      </div>
      <aside aria-label="Your salon" className="flex flex-col gap-4">
        <SalonCard salon={salon} />
        <SectionCard title="Messages">
          <MyPreferencesForm current={preferences} />
        </SectionCard>
        <SectionCard title="Date of birth">
          <p className="mb-3 text-sm text-ink/80">Optional. Colour mixed with developer is not for anyone under 16, so the salon needs to know.</p>
          <DateOfBirthForm owner="me" />
        </SectionCard>
        <Link to={paths.salon(salon.slug)} className="text-link">
          Book online at {salon.name}
        </Link>
        <p className="text-sm text-ink/80">{skinTestWords(salon.skinTestLeadHours)} Tell the salon about any reaction, allergy or recent colour at home.</p>
      </aside>
    </div>
  );
}
