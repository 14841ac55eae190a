import { ROLE_LABELS, type Role } from '../../shared/roles';
import { INVITE_VALID_DAYS, RESET_VALID_MINUTES } from '../../shared/schemas/mail';

/**
 * The invite. The same words whether or not the address has an account already: the Mailbox
 * page shows it to the team's mentors, who must not learn that from it.
 */
export function composeInvite({ name, teamName, teamNumber, invitedBy, roles, link }: {
  name: string;
  teamName: string;
  teamNumber: number;
  invitedBy: string;
  roles: readonly Role[];
  link: string;
}) {
  return {
    subject: `Join ${teamName} on Pitwright`,
    text: [
      `Hello ${name},`,
      '',
      `${invitedBy} invites you to join ${teamName} (team ${teamNumber}) on Pitwright, the team's pit board, as ${roles.map((role) => ROLE_LABELS[role]).join(', ')}.`,
      '',
      `Open this link to accept (it works once, for ${INVITE_VALID_DAYS} days):`,
      link,
      '',
      'If you have a Pitwright account with this address already, you accept with its password; otherwise you choose one.',
      'If you did not expect this invite, ignore this e-mail.',
    ].join('\n'),
  };
}

export function composePasswordReset({ link }: { link: string }) {
  return {
    subject: 'Choose a new Pitwright password',
    text: [
      'Someone, probably you, asked to reset the password of the Pitwright account of this e-mail address.',
      '',
      `Open this link to choose a new password (it works once, for ${RESET_VALID_MINUTES} minutes):`,
      link,
      '',
      'Choosing a new password signs out every device signed in with the old one.',
      'If you did not ask for this, ignore this e-mail: your password stays as it is.',
    ].join('\n'),
  };
}
