import { Router, type Request, type Response } from 'express';
import type { CsrfSync } from 'csrf-sync';
import type { createPassport } from '../auth/passport';
import { passwordResetRequestSchema, RESET_VALID_MINUTES } from '../../shared/schemas/mail';
import { changePasswordSchema, signInSchema, switchTeamSchema, type FeaturesJson } from '../../shared/schemas/session';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { logIn } from '../auth/log-in';
import { authOf, requireAuth } from '../auth/require-auth';
import { endSessionsOf } from '../auth/session-store';
import { passwordChangeLimiter, passwordResetLimiter, signInLimiters } from '../auth/failure-limits';
import { requestPasswordReset } from '../commands/request-password-reset';
import { HttpError, notFound } from '../errors';
import type { User } from '../models';
import { presentSession } from '../presenters/session';
import { disconnectSessions } from '../realtime/broadcast';

type Passport = ReturnType<typeof createPassport>;

const invalidCredentials = () => new HttpError(401, 'invalid_credentials', 'Wrong e-mail or password');

function authenticate(passport: Passport, req: Request, res: Response) {
  return new Promise<User | null>((resolve, reject) => {
    passport.authenticate('local', { session: false }, (error: unknown, user: User | false) =>
      error ? reject(error) : resolve(user || null),
    )(req, res, reject);
  });
}

const RESET_REQUESTED = `If this address belongs to a Pitwright account, an e-mail with a link to choose a new password is on its way. The link works for ${RESET_VALID_MINUTES} minutes.`;

export function sessionRouter({
  passport,
  csrf,
  cookieName,
  features,
  publicUrl,
}: {
  passport: Passport;
  csrf: CsrfSync;
  cookieName: string;
  features: FeaturesJson;
  publicUrl: string;
}) {
  const router = Router();

  router.post('/', ...signInLimiters(), async (req, res) => {
    req.body = signInSchema.parse(req.body);
    const user = await authenticate(passport, req, res);
    if (!user) throw invalidCredentials();
    const memberships = user.memberships ?? [];
    if (memberships.length === 0) {
      throw new HttpError(403, 'no_active_membership', 'Your account is not active in any team: ask a mentor');
    }
    await logIn(req, user); // passport regenerates the session id here
    req.session.activeTeamId = memberships[0].teamId;
    const auth = { user, membership: memberships[0], memberships };
    res.json(presentSession(auth, csrf.generateToken(req, true), features));
  });

  router.get('/', requireAuth, (req, res) => {
    res.json(presentSession(authOf(req), csrf.generateToken(req), features));
  });

  router.patch('/', requireAuth, (req, res) => {
    const { teamId } = switchTeamSchema.parse(req.body);
    const auth = authOf(req);
    const membership = auth.memberships.find((m) => m.teamId === teamId);
    if (!membership) throw notFound('Team');
    req.session.activeTeamId = teamId;
    // Its sockets sit in the old team's rooms; the client opens a new one for the new team.
    disconnectSessions([req.sessionID]);
    res.json(presentSession({ ...auth, membership }, csrf.generateToken(req), features));
  });

  router.delete('/', (req, res, next) => {
    disconnectSessions([req.sessionID]);
    req.logout((logoutError) => {
      if (logoutError) return next(logoutError);
      req.session.destroy((destroyError) => {
        if (destroyError) return next(destroyError);
        res.clearCookie(cookieName).status(204).end();
      });
    });
  });

  // The same answer whether or not the address has an account: nobody learns who does.
  router.post('/password-reset', passwordResetLimiter(), async (req, res) => {
    const { email } = passwordResetRequestSchema.parse(req.body);
    await requestPasswordReset(email, publicUrl);
    res.status(202).json({ message: RESET_REQUESTED });
  });

  router.put('/password', requireAuth, passwordChangeLimiter(), async (req, res) => {
    const { currentPassword, newPassword } = changePasswordSchema.parse(req.body);
    const { user } = authOf(req);
    if (!(await verifyPassword(currentPassword, user.passwordHash))) {
      throw new HttpError(400, 'invalid', 'Your current password is not right', {
        fields: { currentPassword: 'Not your current password' },
      });
    }
    await user.update({ passwordHash: await hashPassword(newPassword) });
    // Other devices signed in with the old password are signed out; this one stays.
    await endSessionsOf(user.id, { except: req.sessionID });
    res.status(204).end();
  });

  return router;
}
