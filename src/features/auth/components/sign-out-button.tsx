import { Button } from '@client/components/ui/button';
import { useSignOut } from '../api/session-mutations';

type Props = { onSignedOut: () => void };

export function SignOutButton({ onSignedOut }: Props) {
  const signOut = useSignOut();
  return (
    <Button variant="secondary" busy={signOut.isPending} onClick={() => signOut.mutate(undefined, { onSuccess: onSignedOut })}>
      Sign out
    </Button>
  );
}
