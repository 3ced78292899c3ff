import { useState } from 'react';
import { roleLabels, roles, type MemberView, type Role } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';

interface MemberRoleProps {
  member: MemberView;
  isSelf: boolean;
  isSaving: boolean;
  onSave: (role: Role) => Promise<unknown>;
}

/**
 * A member's role: choosing in the select only drafts the change, and Save sends it. Arrow keys
 * on a closed select change its value step by step, so committing on change would send a PATCH
 * (and a notice) for every role passed on the way.
 */
export function MemberRole({ member, isSelf, isSaving, onSave }: MemberRoleProps) {
  const [draft, setDraft] = useState<Role>(member.role);
  const isChanged = draft !== member.role;
  const selectId = `role-${member.id}`;

  return (
    <form
      aria-label={`Change the role of ${member.name}`}
      className="flex flex-wrap items-center gap-2"
      onSubmit={(event) => {
        event.preventDefault();
        if (isChanged) void onSave(draft);
      }}
    >
      <label className="sr-only" htmlFor={selectId}>
        Role of {member.name}
      </label>
      <select
        id={selectId}
        value={draft}
        disabled={isSelf || isSaving}
        onChange={(event) => setDraft(roles.find((r) => r === event.target.value) ?? member.role)}
        className="min-h-11 rounded-md border border-line-strong bg-white px-2"
      >
        {roles.map((r) => (
          <option key={r} value={r}>
            {roleLabels[r]}
          </option>
        ))}
      </select>
      {isChanged ? (
        <>
          <Button type="submit" isBusy={isSaving} aria-label={`Save role of ${member.name}`}>
            Save
          </Button>
          <Button
            variant="quiet"
            disabled={isSaving}
            onClick={() => setDraft(member.role)}
            aria-label={`Cancel the role change for ${member.name}`}
          >
            Cancel
          </Button>
        </>
      ) : null}
    </form>
  );
}
