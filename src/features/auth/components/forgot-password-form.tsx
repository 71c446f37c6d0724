import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { PasswordResetRequestSchema } from '@shared/schemas/auth.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useRequestPasswordReset } from '../api/password-reset-mutations';

export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordReset();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(PasswordResetRequestSchema),
    defaultValues: { email: '' },
  });
  const { errors } = formState;

  if (requestReset.isSuccess) {
    // The same answer whether or not the address has an account, so nobody can probe for accounts.
    return (
      <FormAlert tone="success">
        If an account uses {requestReset.variables.email}, an e-mail with a reset link is on its way. The link works once and expires soon.
      </FormAlert>
    );
  }

  const onSubmit = handleSubmit((body) => requestReset.mutateAsync(body).catch((error) => showServerErrors(error, setError, ['email'])));

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Request a password reset" className="flex flex-col gap-4">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register('email')} />
      <Button type="submit" busy={requestReset.isPending}>
        Send reset link
      </Button>
    </form>
  );
}
