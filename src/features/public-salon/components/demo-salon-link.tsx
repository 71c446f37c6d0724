import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@client/config/paths';
import { publicSalonQueries } from '../api/public-salon-queries';

type Props = { slug: string };

/** For signed-out visitors: the way to a salon's public page. Shown only when that salon exists. */
export function DemoSalonLink({ slug }: Props) {
  const salon = useQuery(publicSalonQueries.bySlug(slug));
  if (!salon.data) return null;
  return (
    <p className="mt-2 rounded-lg bg-white px-4 py-3 ring-1 ring-ink/10">
      <Link to={paths.salon(slug)} className="text-link">
        See {salon.data.name}&apos;s services and book online
      </Link>
    </p>
  );
}
