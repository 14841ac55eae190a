import { useState } from 'react';
import type { InviteJson } from '@shared/schemas/mail';
import type { CreatedMemberJson, MemberJson } from '@shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CheckIcon, PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCan, useViewer } from '../../../lib/authorization';
import { useMembers } from '../api/get-members';
import { useTeam } from '../api/get-team';
import { AddMemberForm } from './add-member-form';
import { AlertRulesCard } from './alert-rules-card';
import { MailFailuresCard } from './mail-failures-card';
import { MemberCard } from './member-card';
import { PendingInvitesCard } from './pending-invites-card';
import { PitScreensCard } from './pit-screens-card';
import { TemporaryPasswordDialog } from './temporary-password-dialog';

// Active people first, then by name, so the list reads like a roll call.
function byActiveThenName(a: MemberJson, b: MemberJson): number {
  if (a.active !== b.active) return a.active ? -1 : 1;
  return a.name.localeCompare(b.name);
}

export function TeamPage() {
  const team = useTeam();
  const members = useMembers();
  const { membership } = useViewer();
  const canManage = useCan('members:manage');
  const canManageScreens = useCan('screens:manage');
  const canManageAlerts = useCan('alerts:manage');
  const [adding, setAdding] = useState(false);
  const [added, setAdded] = useState<CreatedMemberJson | null>(null);
  const [invited, setInvited] = useState<InviteJson | null>(null);

  const title = team.data ? `Team ${team.data.number}` : 'Team';
  return (
    <>
      <PageHeader
        title={title}
        description={team.data?.name}
        actions={
          canManage &&
          !adding && (
            <Button
              icon={<PlusIcon />}
              onClick={() => {
                setInvited(null);
                setAdding(true);
              }}
            >
              Add a member
            </Button>
          )
        }
      />
      {team.isError && (
        <div className="mb-6">
          <ErrorNotice
            title="Could not load the team"
            error={team.error}
            onRetry={() => team.refetch()}
            retrying={team.isFetching}
          />
        </div>
      )}

      {canManageAlerts && <MailFailuresCard />}

      {adding && (
        <Card className="mb-6">
          <AddMemberForm
            onInvited={(invite) => {
              setAdding(false);
              setInvited(invite);
            }}
            onAdded={(member) => {
              setAdding(false);
              setAdded(member);
            }}
            onCancel={() => setAdding(false)}
          />
        </Card>
      )}
      {invited && (
        <p role="status" className="mb-6 flex items-start gap-2 rounded-xl bg-ok-soft p-4 text-lg font-semibold text-ok">
          <CheckIcon className="mt-0.5 size-6" />
          <span className="min-w-0 break-words">
            Invite sent to {invited.name} ({invited.email}). They appear among the members once they have used the link.
          </span>
        </p>
      )}

      <section aria-labelledby="members-title" className="mb-8">
        <h2 id="members-title" className="mb-3 text-2xl font-bold">
          Members
        </h2>
        {!canManage && <p className="mb-3 text-ink-muted">Mentors add members and change their roles.</p>}
        {members.isPending && <Loading label="Loading the members" />}
        {members.isError && (
          <ErrorNotice
            title="Could not load the members"
            error={members.error}
            onRetry={() => members.refetch()}
            retrying={members.isFetching}
          />
        )}
        {members.isSuccess && (
          <ul className="grid gap-4 lg:grid-cols-2">
            {[...members.data].sort(byActiveThenName).map((member) => (
              <MemberCard key={member.id} member={member} isSelf={member.id === membership.id} canManage={canManage} />
            ))}
          </ul>
        )}
      </section>

      {canManage && <PendingInvitesCard />}
      {canManageAlerts && <AlertRulesCard />}
      {canManageScreens && <PitScreensCard />}

      <TemporaryPasswordDialog member={added} onClose={() => setAdded(null)} />
    </>
  );
}
