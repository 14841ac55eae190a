import { ChangePasswordForm } from '../../features/session/components/change-password-form';
import { TeamPage } from '../../features/team/components/team-page';

/** The team page plus the person's own password, which belongs to the session feature. */
export function TeamRoute() {
  return (
    <>
      <TeamPage />
      <ChangePasswordForm />
    </>
  );
}
