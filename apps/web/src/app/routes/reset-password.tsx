import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { FormNotice } from '../../components/ui/form-alert';
import { PublicCard } from '../../components/ui/public-card';
import { paths } from '../../config/paths';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';
import { RouteError } from './route-error';

export function Component() {
  const { token = '' } = useParams();
  const [isDone, setIsDone] = useState(false);
  return (
    <PublicCard
      title="Choose a new password"
      footer={<Link to={paths.signIn()}>Back to sign in</Link>}
    >
      {isDone ? (
        <FormNotice>
          Your password is changed. <Link to={paths.signIn()}>Sign in with it now</Link>.
        </FormNotice>
      ) : (
        <ResetPasswordForm token={token} onDone={() => setIsDone(true)} />
      )}
    </PublicCard>
  );
}

export const ErrorBoundary = RouteError;
