import { lazy, Suspense } from 'react';
import { Link, NavLink, useNavigate } from 'react-router-dom';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { buttonClasses } from '../components/ui/button';
import { paths } from '../config/paths';
import { navLinks } from './nav-links';

// Signing out renews the whole cache (cache-rules.ts, with every contract): loaded only once someone is signed in,
// so a signed-out visitor's first page does not carry it.
const SignOutButton = lazy(() => import('../features/auth/components/sign-out-button').then((m) => ({ default: m.SignOutButton })));

type Props = { user: SessionUser | null };

export function SiteHeader({ user }: Props) {
  const navigate = useNavigate();
  return (
    <header className="border-b border-ink/10 bg-white print:hidden">
      <div className="mx-auto flex w-full max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
        <Link to={paths.home} className="text-2xl font-extrabold tracking-tight text-oxide">
          Dwell
        </Link>
        {user && (
          <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto">
            <ul className="flex flex-wrap gap-1">
              {navLinks[user.role].map((link) => (
                <li key={link.to}>
                  <NavLink
                    to={link.to}
                    end
                    className="inline-flex min-h-11 items-center rounded-lg px-3 font-bold hover:bg-linen aria-[current=page]:bg-linen aria-[current=page]:underline aria-[current=page]:decoration-oxide aria-[current=page]:decoration-2 aria-[current=page]:underline-offset-8"
                  >
                    {link.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
        )}
        <div className="ml-auto flex items-center gap-3">
          {user ? (
            <>
              <span className="hidden text-sm sm:inline">{user.name}</span>
              {/* Its place is kept while it loads, so the header does not jump. */}
              <Suspense
                fallback={
                  <span aria-hidden="true" className={buttonClasses('secondary')}>
                    Sign out
                  </span>
                }
              >
                <SignOutButton onSignedOut={() => navigate(paths.signIn(), { replace: true })} />
              </Suspense>
            </>
          ) : (
            <Link to={paths.signIn()} className="text-link">
              Sign in
            </Link>
          )}
        </div>
      </div>
    </header>
  );
}
