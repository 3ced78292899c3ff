import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { PublicCard } from '../../components/ui/public-card';
import { paths, safeReturnPath } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { RouteError } from './route-error';

export function Component() {
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const next = safeReturnPath(search.get('next'));
  return (
    <PublicCard
      title="Sign in"
      intro={search.get('next') ? 'Sign in to continue where you were.' : 'Welcome back.'}
      footer={
        <p className="flex flex-col gap-2">
          <Link to={paths.forgotPassword}>Forgot your password?</Link>
          <span>
            New to Seamwright? <Link to={paths.signUp}>Set up your company</Link>
          </span>
        </p>
      }
    >
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
    </PublicCard>
  );
}

export const ErrorBoundary = RouteError;
