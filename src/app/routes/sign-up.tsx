import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { homeFor, paths, safeNext, salonSlugOf } from '@client/config/paths';
import { AuthPanel } from '@client/features/auth/components/auth-panel';
import { SignUpForm } from '@client/features/auth/components/sign-up-form';

export function Component() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  // Coming from a salon's booking flow: go back to it, and make the account that salon's client.
  const next = safeNext(params.get('next'));
  return (
    <AuthPanel
      title="Create your account"
      intro={
        next
          ? 'Create an account to finish your booking. Your time stays held; you will come straight back.'
          : 'An account lets you book consultations and skin tests and see your appointments.'
      }
      footer={
        <p>
          Already have an account?{' '}
          <Link to={paths.signIn(next ?? undefined)} className="text-link">
            Sign in
          </Link>
        </p>
      }
    >
      <SignUpForm salonSlug={salonSlugOf(next)} onSignedUp={(user) => navigate(next ?? homeFor(user.role), { replace: true })} />
    </AuthPanel>
  );
}
