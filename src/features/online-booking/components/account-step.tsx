import { Link } from 'react-router-dom';
import { buttonClasses } from '@client/components/ui/button';
import { paths } from '@client/config/paths';
import { StepHeading } from './step-heading';

type Props = { returnTo: string; focusOnMount: boolean };

/** Step 2 for a signed-out visitor: an account is needed to book; both ways come back here with the hold. */
export function AccountStep({ returnTo, focusOnMount }: Props) {
  return (
    <section className="flex flex-col gap-4">
      <StepHeading focusOnMount={focusOnMount}>Sign in to book</StepHeading>
      <p>Your time stays held while you create an account or sign in. You will come straight back here.</p>
      <div className="flex flex-col gap-3 sm:flex-row">
        <Link to={paths.signUp(returnTo)} className={buttonClasses('primary')}>
          Create an account
        </Link>
        <Link to={paths.signIn(returnTo)} className={buttonClasses('secondary')}>
          I have an account: sign in
        </Link>
      </div>
    </section>
  );
}
