import { useState, type FormEvent } from 'react';
import { accountLinkUseSchema, type AccountLinkJson } from '@shared/schemas/mail';
import { MIN_PASSWORD_LENGTH, passwordField, type SessionJson } from '@shared/schemas/session';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PasswordInput } from '../../../components/ui/password-input';
import { signedOutPanelClass } from '../../../components/ui/signed-out-page';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/dates';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { useRedeemAccountLink } from '../api/redeem-account-link';

// A new password follows the same rules as everywhere else; an existing one is only checked by the server.
const newPasswordSchema = accountLinkUseSchema.extend({ password: passwordField });

interface Wording {
  title: string;
  intro: string;
  label: string;
  submit: string;
}

function wordingOf(link: AccountLinkJson): Wording {
  const team = link.teamName ?? 'the team';
  if (link.purpose === 'reset') {
    return {
      title: 'Choose a new password',
      intro: `For ${link.email}. Saving it signs you in here and out on your other devices.`,
      label: 'New password',
      submit: 'Save and sign in',
    };
  }
  if (!link.hasAccount) {
    return {
      title: `Join ${team}`,
      intro: `${team} invited ${link.email} to Pitwright. Choose a password to finish your account.`,
      label: 'Choose a password',
      submit: 'Join the team',
    };
  }
  return {
    title: `Join ${team}`,
    intro: `${link.email} has a Pitwright account already. Enter its password to add ${team} to it.`,
    label: 'Your password',
    submit: 'Join the team',
  };
}

interface AccountLinkFormProps {
  token: string;
  link: AccountLinkJson;
  onSignedIn: (session: SessionJson) => void;
  /**
   * The link was used or ran out between the check and the send; `afterLostAnswer` when the send
   * before this one got no answer, so that one may well have used it.
   */
  onLinkGone: (afterLostAnswer: boolean) => void;
}

export function AccountLinkForm({ token, link, onSignedIn, onLinkGone }: AccountLinkFormProps) {
  const redeem = useRedeemAccountLink();
  const [password, setPassword] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, redeem.error);
  const choosesPassword = link.purpose === 'reset' || !link.hasAccount;
  const wording = wordingOf(link);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = parseForm(choosesPassword ? newPasswordSchema : accountLinkUseSchema, { token, password });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    const lostBefore = isApiError(redeem.error) && (redeem.error.status === 0 || redeem.error.status >= 500);
    redeem.mutate(parsed.data, {
      onSuccess: onSignedIn,
      onError: (error) => {
        if (isApiError(error, 'link_not_valid')) onLinkGone(lostBefore);
      },
    });
  }

  return (
    <form noValidate onSubmit={submit} aria-labelledby="account-link-title" className={signedOutPanelClass}>
      <h1 id="account-link-title" className="text-2xl font-bold break-words">
        {wording.title}
      </h1>
      <p className="text-lg break-words">{wording.intro}</p>
      {/* Lets a password manager file the new password under the right address. */}
      <input type="email" autoComplete="username" value={link.email} readOnly hidden />
      {redeem.isError && !errors.password && <ErrorNotice error={redeem.error} />}
      <PasswordInput
        label={wording.label}
        autoComplete={choosesPassword ? 'new-password' : 'current-password'}
        value={password}
        onChange={setPassword}
        error={errors.password}
        hint={choosesPassword ? `At least ${MIN_PASSWORD_LENGTH} characters. A short sentence is easy to type and hard to guess.` : undefined}
      />
      <Button type="submit" size="lg" pending={redeem.isPending} className="w-full">
        {wording.submit}
      </Button>
      <p className="text-sm text-ink-muted">This link works once, until {formatDateTime(link.expiresAt)}.</p>
      {!choosesPassword && (
        <LinkButton to="/forgot-password" state={{ email: link.email }} variant="quiet" className="underline">
          Forgot your password?
        </LinkButton>
      )}
    </form>
  );
}
