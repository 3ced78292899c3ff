import { Link } from 'react-router-dom';
import { PublicCard } from '../../components/ui/public-card';
import { paths } from '../../config/paths';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { RouteError } from './route-error';

export function Component() {
  return (
    <PublicCard
      title="Forgot your password?"
      intro="Enter the e-mail you sign in with and we will send a link to choose a new one."
      footer={<Link to={paths.signIn()}>Back to sign in</Link>}
    >
      <ForgotPasswordForm />
    </PublicCard>
  );
}

export const ErrorBoundary = RouteError;
