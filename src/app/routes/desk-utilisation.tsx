import type { LoaderFunctionArgs } from 'react-router-dom';
import { queryFromSearch, utilisationQueries } from '@client/features/utilisation/api/utilisation-queries';
import { DeskUtilisationView } from '@client/features/utilisation/components/utilisation-page';
import { queryClient } from '@client/lib/query-client';

export async function loader({ request }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(utilisationQueries.desk(queryFromSearch(new URL(request.url).searchParams)));
  return null;
}

export const Component = DeskUtilisationView;
