import {
  Link,
  useNavigate,
  useParams,
  useRouteError,
  type LoaderFunctionArgs,
} from 'react-router-dom';
import { PublicCard } from '../../components/ui/public-card';
import { describeError } from '../../components/ui/region-error';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { ApiError } from '../../lib/api-error';
import {
  invitationPreviewQueryOptions,
  useInvitationPreview,
} from '../../features/invitations/api/get-invitation-preview';
import { AcceptInvitationForm } from '../../features/invitations/components/accept-invitation-form';

export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(invitationPreviewQueryOptions(params.token ?? ''));
  return null;
}

export function Component() {
  const { token = '' } = useParams();
  const preview = useInvitationPreview(token);
  const navigate = useNavigate();
  return (
    <PublicCard
      title={`Join ${preview.companyName}`}
      intro="You have been invited to work in Seamwright with this company."
    >
      <AcceptInvitationForm
        token={token}
        preview={preview}
        onAccepted={() => void navigate(paths.today, { replace: true })}
      />
    </PublicCard>
  );
}

/** An expired, revoked or used link is the common case here; say so plainly. */
export function ErrorBoundary() {
  const error = useRouteError();
  const isDeadLink = error instanceof ApiError && (error.status === 404 || error.status === 410);
  return (
    <PublicCard
      title={isDeadLink ? 'This invitation link no longer works' : describeError(error).title}
      footer={<Link to={paths.signIn()}>Go to sign in</Link>}
    >
      <p>
        {isDeadLink
          ? 'It may have expired, been revoked, or already been used. Ask the person who invited you to send a new one.'
          : describeError(error).detail}
      </p>
    </PublicCard>
  );
}
