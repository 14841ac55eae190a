import { useState, type FormEvent } from 'react';
import type { Role } from '@shared/roles';
import { createMemberSchema, type CreatedMemberJson } from '@shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { TextField } from '../../../components/ui/field';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import { useCreateMember } from '../api/create-member';
import { RoleCheckboxes } from './role-checkboxes';

interface AddMemberFormProps {
  onAdded: (member: CreatedMemberJson) => void;
  onCancel: () => void;
}

export function AddMemberForm({ onAdded, onCancel }: AddMemberFormProps) {
  const createMember = useCreateMember();
  // One id per member being added, kept through failed attempts so that a resend after a lost
  // answer finds the member already made instead of adding them twice.
  const [id, setId] = useState(newId);
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [roles, setRoles] = useState<Role[]>(['crew']);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, createMember.error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = parseForm(createMemberSchema, { id, name, email, roles });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    createMember.mutate(
      { ...parsed.data, id },
      {
        onSuccess: (member) => {
          setId(newId());
          setName('');
          setEmail('');
          setRoles(['crew']);
          onAdded(member);
        },
      },
    );
  }

  return (
    <form noValidate onSubmit={submit} aria-labelledby="add-member-title" className="flex flex-col gap-5">
      <h2 id="add-member-title" className="text-2xl font-bold">
        Add a member
      </h2>
      {createMember.isError && <ErrorNotice error={createMember.error} title="The member was not added" />}
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
        <Button type="submit" pending={createMember.isPending}>
          Add member
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
