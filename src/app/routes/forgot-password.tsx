import { Link } from 'react-router-dom';
import { paths } from '@client/config/paths';
import { AuthPanel } from '@client/features/auth/components/auth-panel';
import { ForgotPasswordForm } from '@client/features/auth/components/forgot-password-form';

export function Component() {
  return (
    <AuthPanel
      title="Reset your password"
      intro="Enter the e-mail address of your account and we will send you a link to choose a new password."
      footer={
        <Link to={paths.signIn()} className="text-link">
          Back to sign in
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthPanel>
  );
}
