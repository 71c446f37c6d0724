import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { paths } from '@client/config/paths';
import { FormAlert } from '@client/components/ui/form-alert';
import { AuthPanel } from '@client/features/auth/components/auth-panel';
import { ResetPasswordForm } from '@client/features/auth/components/reset-password-form';

export function Component() {
  const [params] = useSearchParams();
  const [done, setDone] = useState(false);
  const token = params.get('token') ?? '';
  return (
    <AuthPanel
      title="Choose a new password"
      footer={
        <Link to={paths.forgotPassword} className="text-link">
          Request a new reset link
        </Link>
      }
    >
      {done ? (
        <div className="flex flex-col gap-4">
          <FormAlert tone="success">Your password has been changed.</FormAlert>
          <Link to={paths.signIn()} className="text-link">
            Sign in with your new password
          </Link>
        </div>
      ) : token ? (
        <ResetPasswordForm token={token} onReset={() => setDone(true)} />
      ) : (
        <FormAlert>This page needs the link from your reset e-mail. Open the link again, or request a new one.</FormAlert>
      )}
    </AuthPanel>
  );
}
