import { INVITE_VALID_DAYS, RESET_VALID_MINUTES } from '@shared/schemas/mail';
import { LinkButton } from '../../../components/ui/button';
import { AlertIcon, CheckIcon } from '../../../components/ui/icons';
import { signedOutPanelClass } from '../../../components/ui/signed-out-page';

/**
 * One message for an unknown, used, revoked or expired link: the server does not say which either.
 * `afterLostAnswer`: the send before got no answer (the Wi-Fi dropped), so most likely it was that
 * send which used the link, and the password typed is already the account's.
 */
export function LinkNotValid({ afterLostAnswer = false }: { afterLostAnswer?: boolean }) {
  if (afterLostAnswer) {
    return (
      <section aria-labelledby="not-valid-title" className={signedOutPanelClass}>
        <h1 id="not-valid-title" className="flex items-center gap-2 text-2xl font-bold">
          <CheckIcon className="size-7 text-ok" /> Your first try most likely went through
        </h1>
        <p className="text-lg">
          The connection dropped before the answer came back, and the link has been used since: most likely by that try. Sign in with the password you just
          entered.
        </p>
        <p className="text-ink-muted">If it does not work, get a new password link, or ask a mentor of the team to send a new invite.</p>
        <div className="flex flex-wrap gap-3">
          <LinkButton to="/sign-in">Sign in</LinkButton>
          <LinkButton to="/forgot-password" variant="secondary">
            Get a new password link
          </LinkButton>
        </div>
      </section>
    );
  }
  return (
    <section aria-labelledby="not-valid-title" className={signedOutPanelClass}>
      <h1 id="not-valid-title" className="flex items-center gap-2 text-2xl font-bold">
        <AlertIcon className="size-7 text-danger" /> This link is no longer valid
      </h1>
      <p className="text-lg">
        Each link from Pitwright works once: a new-password link for {RESET_VALID_MINUTES} minutes, an invite for{' '}
        {INVITE_VALID_DAYS} days. This one was used already, replaced by a newer one, or has run out.
      </p>
      <p className="text-ink-muted">Invited to a team? Ask a mentor of the team to send a new invite.</p>
      <div className="flex flex-wrap gap-3">
        <LinkButton to="/forgot-password">Get a new password link</LinkButton>
        <LinkButton to="/sign-in" variant="secondary">
          Sign in
        </LinkButton>
      </div>
    </section>
  );
}
