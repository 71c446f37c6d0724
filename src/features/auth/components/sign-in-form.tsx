import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { SignInBodySchema, type SessionUser } from '@shared/schemas/auth.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { showServerErrors } from '@client/lib/form-errors';
import { useSignIn } from '../api/session-mutations';

type Props = { onSignedIn: (user: SessionUser) => void };

export function SignInForm({ onSignedIn }: Props) {
  const signIn = useSignIn();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(SignInBodySchema),
    defaultValues: { email: '', password: '' },
  });
  const { errors } = formState;

  const onSubmit = handleSubmit((body) =>
    signIn.mutateAsync(body).then(
      ({ user }) => onSignedIn(user),
      (error) => showServerErrors(error, setError, ['email', 'password']),
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Sign in" className="flex flex-col gap-4">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password && 'Enter your password'} {...register('password')} />
      <Button type="submit" busy={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
