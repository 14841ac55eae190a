import { useState, type FormEvent } from 'react';
import { useNavigate, useSearchParams } from 'react-router';
import { signInSchema } from '@shared/schemas/session';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { TextField } from '../../../components/ui/field';
import { PasswordInput } from '../../../components/ui/password-input';
import { SignedOutPage, signedOutPanelClass } from '../../../components/ui/signed-out-page';
import { isApiError } from '../../../lib/api-client';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { safeNext } from '../../../lib/safe-next';
import { useSignIn } from '../api/sign-in';

function explain(error: unknown): unknown {
  if (isApiError(error, 'rate_limited') && error.retryAfterSeconds) {
    const minutes = Math.max(1, Math.ceil(error.retryAfterSeconds / 60));
    return new Error(`Too many attempts, try again in ${minutes} ${minutes === 1 ? 'minute' : 'minutes'}.`);
  }
  return error;
}

export function SignInPage() {
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const signIn = useSignIn();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, signIn.error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = parseForm(signInSchema, { email, password });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    signIn.mutate(parsed.data, {
      onSuccess: () => navigate(safeNext(searchParams.get('next')), { replace: true }),
    });
  }

  return (
    <SignedOutPage>
      <form noValidate onSubmit={submit} aria-labelledby="sign-in-title" className={signedOutPanelClass}>
        <h1 id="sign-in-title" className="text-2xl font-bold">
          Sign in to your team
        </h1>
        {signIn.isError && <ErrorNotice error={explain(signIn.error)} />}
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
        <PasswordInput
          label="Password"
          autoComplete="current-password"
          value={password}
          onChange={setPassword}
          error={errors.password}
        />
        <Button type="submit" size="lg" pending={signIn.isPending} className="mt-2 w-full">
          Sign in
        </Button>
        <LinkButton to="/forgot-password" state={{ email }} variant="quiet" className="underline">
          Forgot your password?
        </LinkButton>
      </form>
      <p className="max-w-md text-center text-sm text-ink-muted">
        No account yet? A mentor invites you by e-mail from the team page, or gives you a first password.
      </p>
    </SignedOutPage>
  );
}
