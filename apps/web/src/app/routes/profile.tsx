import { PageHeader } from '../../components/ui/page-header';
import { MyProfilePage } from '../../features/session/components/my-profile';
import { RouteError } from './route-error';

export function Component() {
  return (
    <>
      <PageHeader title="Your profile" subtitle="Your name, e-mail, role and password." />
      <MyProfilePage />
    </>
  );
}

export const ErrorBoundary = RouteError;
