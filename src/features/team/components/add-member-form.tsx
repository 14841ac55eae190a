import { useState, type FormEvent } from 'react';
import type { Role } from '@shared/roles';
import { createInviteSchema, INVITE_VALID_DAYS, type InviteJson } from '@shared/schemas/mail';
import { createMemberSchema, type CreatedMemberJson } from '@shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup, ChoiceRadio } from '../../../components/ui/choice-radio';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { TextField } from '../../../components/ui/field';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import { useCreateInvite } from '../api/create-invite';
import { useCreateMember } from '../api/create-member';
import { RoleCheckboxes } from './role-checkboxes';

/** An e-mailed link is the usual way; a temporary password handed over in person is for a pit without mail. */
type Way = 'invite' | 'password';

const WAY_HINTS: Record<Way, string> = {
  invite: `They get a link to choose their own password. It works once, for ${INVITE_VALID_DAYS} days. Someone who has a Pitwright account already joins with its password.`,
  password: 'You get a temporary password to hand over in person; they choose their own after signing in.',
};

interface AddMemberFormProps {
  onInvited: (invite: InviteJson) => void;
  onAdded: (member: CreatedMemberJson) => void;
  onCancel: () => void;
}

export function AddMemberForm({ onInvited, onAdded, onCancel }: AddMemberFormProps) {
  const createInvite = useCreateInvite();
  const createMember = useCreateMember();
  const [way, setWay] = useState<Way>('invite');
  // One id per invite and per member being added, kept through failed attempts so that a resend
  // after a lost answer finds the first one instead of sending or adding twice.
  const [inviteId, setInviteId] = useState(newId);
  const [memberId, setMemberId] = useState(newId);
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [roles, setRoles] = useState<Role[]>(['crew']);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const sending = way === 'invite' ? createInvite : createMember;
  const errors = mergeFieldErrors(clientErrors, sending.error);

  function clear() {
    setName('');
    setEmail('');
    setRoles(['crew']);
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const id = way === 'invite' ? inviteId : memberId;
    const parsed = parseForm(way === 'invite' ? createInviteSchema : createMemberSchema, { id, name, email, roles });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    if (way === 'invite') {
      createInvite.mutate(
        { ...parsed.data, id },
        {
          onSuccess: ({ invite }) => {
            setInviteId(newId());
            clear();
            onInvited(invite);
          },
        },
      );
    } else {
      createMember.mutate(
        { ...parsed.data, id },
        {
          onSuccess: (member) => {
            setMemberId(newId());
            clear();
            onAdded(member);
          },
        },
      );
    }
  }

  return (
    <form noValidate onSubmit={submit} aria-labelledby="add-member-title" className="flex flex-col gap-5">
      <h2 id="add-member-title" className="text-2xl font-bold">
        Add a member
      </h2>
      <ChoiceGroup legend="How they join" hint={WAY_HINTS[way]} className="grid gap-2 sm:grid-cols-2">
        <ChoiceRadio name="join-way" checked={way === 'invite'} onChange={() => setWay('invite')}>
          Invite by e-mail
        </ChoiceRadio>
        <ChoiceRadio name="join-way" checked={way === 'password'} onChange={() => setWay('password')}>
          Give a first password
        </ChoiceRadio>
      </ChoiceGroup>
      {/* A refusal about a field is said beside it; the notice is for the rest (the network, a lost session). */}
      {sending.isError && !(errors.name || errors.email || errors.roles) && (
        <ErrorNotice error={sending.error} title={way === 'invite' ? 'The invite was not sent' : 'The member was not added'} />
      )}
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField
          label="Name"
          autoComplete="off"
          value={name}
          onChange={(event) => setName(event.target.value)}
          error={errors.name}
        />
        <TextField
          label="E-mail"
          type="email"
          inputMode="email"
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          value={email}
          onChange={(event) => setEmail(event.target.value)}
          error={errors.email}
        />
      </div>
      <RoleCheckboxes value={roles} onChange={setRoles} error={errors.roles} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={sending.isPending}>
          {way === 'invite' ? 'Send invite' : 'Add member'}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
