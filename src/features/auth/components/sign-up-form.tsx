import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { PASSWORD_MIN_LENGTH, SignUpBodySchema, type SessionUser } from '@shared/schemas/auth.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { TextField } from '@client/components/ui/text-field';
import { isApiError } from '@client/lib/api-error';
import { showServerErrors } from '@client/lib/form-errors';
import { useSignUp } from '../api/session-mutations';

/** `salonSlug`: the salon whose client the account becomes (when signing up from its booking flow). */
type Props = { onSignedUp: (user: SessionUser) => void; salonSlug?: string };

export function SignUpForm({ onSignedUp, salonSlug }: Props) {
  const signUp = useSignUp();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(SignUpBodySchema),
    defaultValues: { name: '', email: '', phone: '', password: '' },
  });
  const { errors } = formState;

  const onSubmit = handleSubmit((body) =>
    signUp.mutateAsync({ ...body, salonSlug }).then(
      ({ user }) => onSignedUp(user),
      (error) => {
        // A taken address is about the e-mail field, so say it there.
        if (isApiError(error, 'EMAIL_TAKEN')) setError('email', { type: 'server', message: error.message });
        else showServerErrors(error, setError, ['name', 'email', 'phone', 'password']);
      },
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Create your account" className="flex flex-col gap-4">
      {errors.root?.server && <FormAlert>{errors.root.server.message}</FormAlert>}
      <TextField label="Name" autoComplete="name" error={errors.name?.message} {...register('name')} />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register('email')} />
      <TextField
        label="Mobile phone"
        type="tel"
        autoComplete="tel"
        hint="For reminders before your appointments."
        error={errors.phone?.message}
        {...register('phone')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters; a phrase of a few words works well.`}
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" busy={signUp.isPending}>
        {signUp.isPending ? 'Creating your account…' : 'Create account'}
      </Button>
    </form>
  );
}
