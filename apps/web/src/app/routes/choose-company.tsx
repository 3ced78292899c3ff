import { PublicCard } from '../../components/ui/public-card';
import { ChooseCompany } from '../../features/session/components/choose-company';
import { RouteError } from './route-error';

/** Where a person lands when the company they were working in removed them. */
export function Component() {
  return (
    <PublicCard
      title="Choose a company"
      intro="Your access to the company you were working in has ended. Continue in one of your other companies."
    >
      <ChooseCompany />
    </PublicCard>
  );
}

export const ErrorBoundary = RouteError;
