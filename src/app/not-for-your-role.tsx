import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import type { Role } from '@shared/schemas/common.schemas';
import { homeFor } from '../config/paths';
import { sessionQueries } from '../features/auth/api/session-queries';
import { roleLabels } from '../lib/role-labels';

type Props = { allowed?: readonly Role[] };

/** Shown instead of a page that belongs to another role. */
export function NotForYourRole({ allowed }: Props) {
  const { data: user } = useQuery(sessionQueries.current());
  return (
    <div className="mx-auto max-w-xl py-12">
      <h1 className="text-3xl font-extrabold">Not for your role</h1>
      <p className="mt-3">
        {allowed?.length ? `This page is for the ${allowed.map((role) => roleLabels[role]).join(' and ')}.` : 'This page belongs to another role.'}{' '}
        {user && `You are signed in as ${user.name} (${roleLabels[user.role]}).`}
      </p>
      {user && (
        <Link to={homeFor(user.role)} className="mt-6 inline-block text-link">
          Go to your home page
        </Link>
      )}
    </div>
  );
}
