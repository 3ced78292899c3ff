import { useState } from 'react';
import { roleLabels, type MemberView, type Role } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { describeError } from '../../../components/ui/region-error';
import { ShowMore } from '../../../components/ui/show-more';
import { useToast } from '../../../components/ui/toast';
import { formatDate } from '../../../lib/format';
import { largestPageSize } from '../../../lib/paged-list';
import { useSession } from '../../../lib/session';
import { useMembers } from '../api/get-members';
import { useUpdateMember } from '../api/update-member';
import { useRemoveMember } from '../api/remove-member';
import { MemberRole } from './member-role';

/** The company's people, their roles, and removal; the owner cannot demote or remove themself here. */
export function MembersList() {
  const members = useMembers();
  const { user, company } = useSession();
  const update = useUpdateMember();
  const remove = useRemoveMember();
  const toast = useToast();
  const [leaving, setLeaving] = useState<MemberView | null>(null);

  const changeRole = (member: MemberView, role: Role) =>
    update.mutateAsync({ memberId: member.id, input: { role } }).then(
      () => toast.show(`${member.name} is now ${roleLabels[role].toLowerCase()}.`),
      (error: unknown) => toast.show(describeError(error).detail),
    );

  return (
    <>
      <ul
        id="team-members"
        tabIndex={-1}
        aria-label="Team members"
        className="divide-y divide-line rounded-lg border border-line bg-white"
      >
        {members.items.map((member) => {
          const isSelf = member.userId === user.id;
          return (
            <li key={member.id} className="flex flex-wrap items-center justify-between gap-3 p-4">
              <div>
                <p className="font-semibold">
                  {member.name}{' '}
                  {isSelf ? <span className="font-normal text-ink-muted">(you)</span> : null}
                </p>
                <p className="break-all text-ink-muted">{member.email}</p>
                <p className="text-sm text-ink-muted">
                  Joined {formatDate(member.createdAt, company.timeZone)}
                </p>
              </div>
              <div className="flex flex-wrap items-center gap-2">
                <MemberRole
                  member={member}
                  isSelf={isSelf}
                  isSaving={update.isPending}
                  onSave={(role) => changeRole(member, role)}
                />
                {isSelf ? null : (
                  <Button
                    variant="quietDanger"
                    onClick={() => setLeaving(member)}
                    aria-label={`Remove ${member.name}`}
                  >
                    Remove
                  </Button>
                )}
              </div>
            </li>
          );
        })}
      </ul>
      <ShowMore
        shown={members.items.length}
        total={members.total}
        noun="people"
        pageSize={largestPageSize}
        hasMore={members.hasMore}
        isLoading={members.isLoadingMore}
        onShowMore={members.loadMore}
      />
      <ConfirmDialog
        isOpen={leaving !== null}
        title={`Remove ${leaving?.name ?? ''} from ${company.name}?`}
        confirmLabel="Remove from company"
        isBusy={remove.isPending}
        fallbackFocus={() => document.getElementById('team-members')}
        onCancel={() => setLeaving(null)}
        onConfirm={() => {
          if (!leaving) return;
          void remove
            .mutateAsync(leaving.id)
            .then(
              () => toast.show(`${leaving.name} was removed.`),
              (error: unknown) => toast.show(describeError(error).detail),
            )
            .finally(() => setLeaving(null));
        }}
      >
        They will no longer be able to sign in to this company. Their account and other companies
        are not touched. You can invite them again later.
      </ConfirmDialog>
    </>
  );
}
