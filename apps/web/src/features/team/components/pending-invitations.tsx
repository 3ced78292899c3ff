import { roleLabels } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../components/ui/region-error';
import { useToast } from '../../../components/ui/toast';
import { formatDate } from '../../../lib/format';
import { useSession } from '../../../lib/session';
import { useInvitations } from '../api/get-invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';

export function PendingInvitations() {
  const invitations = useInvitations();
  const revoke = useRevokeInvitation();
  const { company } = useSession();
  const toast = useToast();

  if (invitations.length === 0) {
    return (
      <p className="text-ink-muted">
        No invitations waiting. People you invite show here until they join.
      </p>
    );
  }
  return (
    <ul className="divide-y divide-line rounded-lg border border-line bg-white">
      {invitations.map((invitation) => (
        <li key={invitation.id} className="flex flex-wrap items-center justify-between gap-3 p-4">
          <div>
            <p className="break-all font-semibold">{invitation.email}</p>
            <p className="text-sm text-ink-muted">
              {roleLabels[invitation.role]} · link works until{' '}
              {formatDate(invitation.expiresAt, company.timeZone)}
            </p>
          </div>
          <Button
            variant="secondary"
            aria-label={`Revoke the invitation for ${invitation.email}`}
            onClick={() =>
              void revoke.mutateAsync(invitation.id).then(
                () => toast.show(`Invitation for ${invitation.email} revoked.`),
                (error: unknown) => toast.show(describeError(error).detail),
              )
            }
          >
            Revoke
          </Button>
        </li>
      ))}
    </ul>
  );
}
