import { Link, useNavigate } from 'react-router-dom';
import { homeFor, paths } from '../../config/paths';
import { AuthPanel } from '../../features/auth/components/auth-panel';
import { SignUpForm } from '../../features/auth/components/sign-up-form';

export function Component() {
  const navigate = useNavigate();
  return (
    <AuthPanel
      title="Create your account"
      intro="An account lets you book consultations and skin tests and see your appointments."
      footer={
        <p>
          Already have an account?{' '}
          <Link to={paths.signIn()} className="text-link">
            Sign in
          </Link>
        </p>
      }
    >
      <SignUpForm onSignedUp={(user) => navigate(homeFor(user.role), { replace: true })} />
    </AuthPanel>
  );
}
