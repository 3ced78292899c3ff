import { Link, useNavigate } from 'react-router-dom';
import { PublicCard } from '../../components/ui/public-card';
import { paths } from '../../config/paths';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { RouteError } from './route-error';

export function Component() {
  const navigate = useNavigate();
  return (
    <PublicCard
      title="Set up your company"
      intro="You become the owner. Invite your office, bookkeeper and crew leads once you are in."
      footer={
        <p>
          Already using Seamwright? <Link to={paths.signIn()}>Sign in</Link>
        </p>
      }
    >
      <SignUpForm onSignedUp={() => void navigate(paths.today, { replace: true })} />
    </PublicCard>
  );
}

export const ErrorBoundary = RouteError;
