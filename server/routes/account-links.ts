import { Router } from 'express';
import type { CsrfSync } from 'csrf-sync';
import { accountLinkCheckSchema, accountLinkUseSchema, type AccountLinkJson } from '../../shared/schemas/mail';
import type { FeaturesJson } from '../../shared/schemas/session';
import { usableLink } from '../auth/link-tokens';
import { accountLinkLimiters } from '../auth/failure-limits';
import { logIn } from '../auth/log-in';
import { findUserWithMemberships } from '../auth/require-auth';
import { endSessionsOf } from '../auth/session-store';
import { useAccountLink } from '../commands/use-account-link';
import { HttpError } from '../errors';
import { Team, User } from '../models';
import { presentSession } from '../presenters/session';

/**
 * The one-time links of invites and password resets, opened signed out: what a link is for,
 * then using it, which signs its holder in.
 */
export function accountLinksRouter({ csrf, features }: { csrf: CsrfSync; features: FeaturesJson }) {
  const router = Router();

  router.post('/check', ...accountLinkLimiters(), async (req, res) => {
    const { token } = accountLinkCheckSchema.parse(req.body);
    const link = await usableLink(token);
    const team = link.purpose === 'invite' && link.teamId ? await Team.findByPk(link.teamId) : null;
    const body: AccountLinkJson = {
      purpose: link.purpose,
      email: link.email,
      teamName: team?.name ?? null,
      hasAccount: link.purpose === 'reset' || (await User.count({ where: { email: link.email } })) > 0,
      expiresAt: link.expiresAt.toISOString(),
    };
    res.json(body);
  });

  router.post('/use', ...accountLinkLimiters(), async (req, res) => {
    const { token, password } = accountLinkUseSchema.parse(req.body);
    const used = await useAccountLink(token, password);
    // Devices signed in with the old password are signed out, this one included if it was.
    if (used.purpose === 'reset') await endSessionsOf(used.userId);
    const user = await findUserWithMemberships({ id: used.userId });
    const memberships = user?.memberships ?? [];
    const membership = memberships.find((m) => m.teamId === used.teamId) ?? memberships[0];
    if (!user || !membership) {
      throw new HttpError(403, 'no_active_membership', 'Your password is set, but your account is not active in any team: ask a mentor');
    }
    await logIn(req, user);
    req.session.activeTeamId = membership.teamId;
    res.json(presentSession({ user, membership, memberships }, csrf.generateToken(req, true), features));
  });

  return router;
}
