import { useSuspenseQuery } from '@tanstack/react-query';
import { PageHeader } from '@client/components/ui/page-header';
import { setupQueries } from '@client/features/setup/api/setup-queries';
import { SalonSettingsForm } from '@client/features/setup/components/salon-settings-form';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await queryClient.ensureQueryData(setupQueries.salon());
  return null;
}

export function Component() {
  const { data: settings } = useSuspenseQuery(setupQueries.salon());
  return (
    <div>
      <PageHeader title="Set-up" subtitle="How the salon works: changes apply to new bookings; bookings already made keep their own plan." />
      <SetupNav />
      <SalonSettingsForm settings={settings} />
    </div>
  );
}
