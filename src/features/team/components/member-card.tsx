import { useState } from 'react';
import { ROLE_LABELS, type Role } from '@shared/roles';
import { updateMemberSchema, type MemberJson } from '@shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CheckIcon, PauseIcon, PencilIcon } from '../../../components/ui/icons';
import { StatusTag } from '../../../components/ui/status-tag';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { useUpdateMember } from '../api/update-member';
import { ResetPasswordButton } from './reset-password-button';
import { RoleCheckboxes } from './role-checkboxes';

interface MemberCardProps {
  member: MemberJson;
  isSelf: boolean;
  canManage: boolean;
}

export function MemberCard({ member, isSelf, canManage }: MemberCardProps) {
  const update = useUpdateMember();
  const [editingRoles, setEditingRoles] = useState<Role[] | null>(null);
  const [confirmingDeactivate, setConfirmingDeactivate] = useState(false);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, update.error);

  function saveRoles() {
    const parsed = parseForm(updateMemberSchema, { roles: editingRoles, version: member.version });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    update.mutate({ id: member.id, ...parsed.data }, { onSuccess: () => setEditingRoles(null) });
  }

  function startEditing() {
    update.reset();
    setEditingRoles(member.roles);
  }

  function stopEditing() {
    update.reset();
    setClientErrors({});
    setEditingRoles(null);
  }

  function askToDeactivate() {
    update.reset();
    setConfirmingDeactivate(true);
  }

  function setActive(active: boolean) {
    update.mutate({ id: member.id, active, version: member.version }, { onSuccess: () => setConfirmingDeactivate(false) });
  }

  return (
    <li className={`flex flex-col gap-3 rounded-2xl border border-line bg-surface p-5 ${member.active ? '' : 'opacity-80'}`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 className="text-xl font-bold break-words">
            {member.name}
            {isSelf && <span className="font-normal text-ink-muted"> (you)</span>}
          </h3>
          {/* Only admins are sent e-mail addresses. */}
          {member.email && <p className="break-all text-ink-muted">{member.email}</p>}
        </div>
        {member.active ? (
          <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>
            Active
          </StatusTag>
        ) : (
          <StatusTag tone="neutral" icon={<PauseIcon className="size-4" />}>
            Deactivated
          </StatusTag>
        )}
      </div>

      {editingRoles === null ? (
        <ul className="flex flex-wrap gap-2" aria-label={`Roles of ${member.name}`}>
          {member.roles.map((role) => (
            <li key={role} className="rounded-lg bg-sunken px-2.5 py-1 text-sm font-semibold">
              {ROLE_LABELS[role]}
            </li>
          ))}
        </ul>
      ) : (
        <RoleCheckboxes
          legend={`Roles of ${member.name}`}
          value={editingRoles}
          onChange={setEditingRoles}
          error={errors.roles}
        />
      )}

      {update.isError && !confirmingDeactivate && <ErrorNotice error={update.error} />}

      {canManage && (
        <div className="mt-auto flex flex-wrap gap-3 pt-1">
          {editingRoles === null ? (
            <>
              <Button variant="secondary" icon={<PencilIcon className="size-5" />} onClick={startEditing}>
                Change roles
              </Button>
              {member.active && !isSelf && (
                <>
                  <ResetPasswordButton member={member} />
                  <Button variant="secondary" onClick={askToDeactivate}>
                    Deactivate
                  </Button>
                </>
              )}
              {!member.active && (
                <Button variant="secondary" pending={update.isPending} onClick={() => setActive(true)}>
                  Reactivate
                </Button>
              )}
            </>
          ) : (
            <>
              <Button pending={update.isPending} onClick={saveRoles}>
                Save roles
              </Button>
              <Button variant="secondary" onClick={stopEditing}>
                Cancel
              </Button>
            </>
          )}
        </div>
      )}

      <Dialog
        open={confirmingDeactivate}
        title={`Deactivate ${member.name}?`}
        onClose={() => setConfirmingDeactivate(false)}
        actions={
          <>
            <Button variant="secondary" onClick={() => setConfirmingDeactivate(false)}>
              Keep active
            </Button>
            <Button variant="danger" pending={update.isPending} onClick={() => setActive(false)}>
              Deactivate
            </Button>
          </>
        }
      >
        <p>
          This signs {member.name} out of this team on every tablet and phone, and they can no longer sign in to this
          team. You can reactivate them later.
        </p>
        {update.isError && <ErrorNotice error={update.error} />}
      </Dialog>
    </li>
  );
}
