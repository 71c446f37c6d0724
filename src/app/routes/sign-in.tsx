import { Link, redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { demoSalonSlug, homeFor, paths, safeNext } from '@client/config/paths';
import { AuthPanel } from '@client/features/auth/components/auth-panel';
import { SignInForm } from '@client/features/auth/components/sign-in-form';
import { DemoSalonLink } from '@client/features/public-salon/components/demo-salon-link';
import { currentUser } from '../require-role';

/** Someone already signed in goes straight on. */
export async function loader({ request }: LoaderFunctionArgs) {
  const user = await currentUser();
  if (user) return redirect(safeNext(new URL(request.url).searchParams.get('next')) ?? homeFor(user.role));
  return null;
}

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  return (
    <AuthPanel
      title="Sign in"
      intro={next ? 'Sign in to open that page.' : 'Welcome back to Dwell.'}
      footer={
        <>
          <Link to={paths.forgotPassword} className="text-link">
            Forgot your password?
          </Link>
          <p>
            New client?{' '}
            <Link to={paths.signUp(next ?? undefined)} className="text-link">
              Create an account
            </Link>
          </p>
          {!next && <DemoSalonLink slug={demoSalonSlug} />}
        </>
      }
    >
      <SignInForm onSignedIn={(user) => navigate(next ?? homeFor(user.role), { replace: true })} />
    </AuthPanel>
  );
}
