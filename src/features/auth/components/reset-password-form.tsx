import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { PASSWORD_MIN_LENGTH, PasswordResetConfirmSchema } from '@shared/schemas/auth.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useConfirmPasswordReset } from '../api/password-reset-mutations';

type Props = { token: string; onReset: () => void };

export function ResetPasswordForm({ token, onReset }: Props) {
  const confirmReset = useConfirmPasswordReset();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(PasswordResetConfirmSchema),
    defaultValues: { token, password: '' },
  });
  const { errors } = formState;
  // The token comes from the link, not from a field: a bad one is about the link.
  const linkProblem = errors.token && 'This reset link is incomplete. Request a new one below.';

  const onSubmit = handleSubmit((body) => confirmReset.mutateAsync(body).then(onReset, (error) => showServerErrors(error, setError, ['password'])));

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Choose a new password" className="flex flex-col gap-4">
      {(linkProblem || errors.root?.server) && <FormAlert>{linkProblem ?? errors.root?.server?.message}</FormAlert>}
      <input type="hidden" {...register('token')} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" busy={confirmReset.isPending}>
        Save new password
      </Button>
    </form>
  );
}
