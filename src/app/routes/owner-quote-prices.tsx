import { useSuspenseQuery } from '@tanstack/react-query';
import { PageHeader } from '@client/components/ui/page-header';
import { SectionCard } from '@client/components/ui/section-card';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { quotePriceQueries } from '@client/features/quote-prices/api/quote-price-queries';
import { QuotePricesForm } from '@client/features/quote-prices/components/quote-prices-form';
import { queryClient } from '@client/lib/query-client';
import { salonQueries } from '@client/features/salon/api/salon-queries';

export async function loader() {
  await Promise.all([queryClient.ensureQueryData(quotePriceQueries.current()), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

export function Component() {
  const { data } = useSuspenseQuery(quotePriceQueries.current());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Set-up" subtitle="Quote prices: what Dwell prices proposed quotes and mix-log product estimates from." />
      <SetupNav />
      <SectionCard title="Rates and product costs">
        <QuotePricesForm initial={data} currency={salon.currency} />
      </SectionCard>
    </div>
  );
}
