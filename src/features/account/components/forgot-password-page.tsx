import { useState, type FormEvent } from 'react';
import { useLocation } from 'react-router';
import { passwordResetRequestSchema, RESET_VALID_MINUTES } from '@shared/schemas/mail';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { TextField } from '../../../components/ui/field';
import { CheckIcon } from '../../../components/ui/icons';
import { SignedOutPage, signedOutPanelClass } from '../../../components/ui/signed-out-page';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

/** The sign-in page passes what was typed there, so nobody types their address twice. */
function emailFromState(state: unknown): string {
  if (state && typeof state === 'object' && 'email' in state && typeof state.email === 'string') return state.email;
  return '';
}

/**
 * Asks for a new-password link. The answer reads the same whatever the address, so the page
 * never tells a stranger whether someone has an account.
 */
export function ForgotPasswordPage() {
  const location = useLocation();
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState(() => emailFromState(location.state));
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, request.error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = parseForm(passwordResetRequestSchema, { email });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    request.mutate(parsed.data.email, { onSuccess: () => setSentTo(parsed.data.email) });
  }

  if (sentTo) {
    return (
      <SignedOutPage>
        <section aria-labelledby="sent-title" className={signedOutPanelClass}>
          <h1 id="sent-title" className="flex items-center gap-2 text-2xl font-bold">
            <CheckIcon className="size-7 text-ok" /> Check your e-mail
          </h1>
          <p role="status" className="text-lg">
            If <strong className="break-all">{sentTo}</strong> belongs to a Pitwright account, a link to choose a new
            password is on its way. It works once, for {RESET_VALID_MINUTES} minutes.
          </p>
          <p className="text-ink-muted">
            Nothing after a few minutes? Look in the spam folder, or ask a mentor: they can give you a temporary
            password from the team page.
          </p>
          <div className="flex flex-wrap gap-3">
            <LinkButton to="/sign-in">Back to sign-in</LinkButton>
            <Button
              variant="secondary"
              onClick={() => {
                request.reset();
                setSentTo(null);
              }}
            >
              Use another address
            </Button>
          </div>
        </section>
      </SignedOutPage>
    );
  }

  return (
    <SignedOutPage>
      <form noValidate onSubmit={submit} aria-labelledby="forgot-title" className={signedOutPanelClass}>
        <h1 id="forgot-title" className="text-2xl font-bold">
          Forgot your password?
        </h1>
        <p>Give the e-mail address you sign in with. We send it a link to choose a new password.</p>
        {request.isError && <ErrorNotice error={request.error} title="Nothing was sent" />}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="username"
          inputMode="email"
          autoCapitalize="none"
          spellCheck={false}
          className="min-h-14"
          value={email}
          onChange={(event) => setEmail(event.target.value)}
          error={errors.email}
        />
        <Button type="submit" size="lg" pending={request.isPending} className="w-full">
          Send me a link
        </Button>
        <LinkButton to="/sign-in" variant="quiet" className="self-center">
          Back to sign-in
        </LinkButton>
      </form>
    </SignedOutPage>
  );
}
