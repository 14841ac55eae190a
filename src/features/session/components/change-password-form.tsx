import { useState, type FormEvent } from 'react';
import { MIN_PASSWORD_LENGTH, changePasswordSchema } from '@shared/schemas/session';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CheckIcon } from '../../../components/ui/icons';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { useChangePassword } from '../api/change-password';
import { PasswordInput } from '../../../components/ui/password-input';

export function ChangePasswordForm() {
  const changePassword = useChangePassword();
  const [currentPassword, setCurrentPassword] = useState('');
  const [newPassword, setNewPassword] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  // A wrong current password comes back as a 400 with fields.currentPassword, so it lands next to
  // that field; a 429 rate_limited (too many wrong ones) has no fields and shows in the notice.
  const errors = mergeFieldErrors(clientErrors, changePassword.error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = parseForm(changePasswordSchema, { currentPassword, newPassword });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    changePassword.mutate(parsed.data, {
      onSuccess: () => {
        setCurrentPassword('');
        setNewPassword('');
      },
    });
  }

  return (
    <Card aria-labelledby="change-password-title">
      <h2 id="change-password-title" className="mb-4 text-2xl font-bold">
        Change my password
      </h2>
      <form noValidate onSubmit={submit} className="flex max-w-xl flex-col gap-5">
        {changePassword.isError && <ErrorNotice error={changePassword.error} title="Password not changed" />}
        {changePassword.isSuccess && (
          <p role="status" className="flex items-center gap-2 rounded-xl bg-ok-soft p-3 font-semibold text-ok">
            <CheckIcon /> Password changed.
          </p>
        )}
        <PasswordInput
          label="Current password"
          autoComplete="current-password"
          value={currentPassword}
          onChange={setCurrentPassword}
          error={errors.currentPassword}
        />
        <PasswordInput
          label="New password"
          autoComplete="new-password"
          value={newPassword}
          onChange={setNewPassword}
          error={errors.newPassword}
          hint={`At least ${MIN_PASSWORD_LENGTH} characters. A short sentence is easy to type and hard to guess.`}
        />
        <div>
          <Button type="submit" pending={changePassword.isPending}>
            Change password
          </Button>
        </div>
      </form>
    </Card>
  );
}
