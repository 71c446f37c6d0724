import { useSuspenseQuery } from '@tanstack/react-query';
import { PageHeader } from '@client/components/ui/page-header';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { retailProductQueries } from '@client/features/retail-products/api/retail-product-queries';
import { RetailProductsPanel } from '@client/features/retail-products/components/retail-products-panel';
import { SetupNav } from '@client/features/setup/components/setup-nav';
import { queryClient } from '@client/lib/query-client';

export async function loader() {
  await Promise.all([queryClient.ensureQueryData(retailProductQueries.list()), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

export function Component() {
  const { data } = useSuspenseQuery(retailProductQueries.list());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  return (
    <div className="flex flex-col gap-6">
      <div>
        <PageHeader title="Set-up" subtitle="Products: what the desk sells at checkout, with its price and the stock on the shelf." />
        <SetupNav />
      </div>
      <RetailProductsPanel products={data.products} currency={salon.currency} />
    </div>
  );
}
