import type { Request, RequestHandler } from 'express';
import { Membership, Team } from '../models';
import { unauthenticated } from '../errors';
import type { AuthContext } from './types';

export function activeMembershipsOf(userId: string) {
  return Membership.findAll({
    where: { userId, active: true },
    include: [{ model: Team, as: 'team' }],
    order: [['createdAt', 'ASC']],
  });
}

/** Resolves the caller's user and working team, or answers 401. */
export const requireAuth: RequestHandler = async (req, _res, next) => {
  if (!req.user) throw unauthenticated();
  const memberships = await activeMembershipsOf(req.user.id);
  if (memberships.length === 0) {
    // Deactivated everywhere since this session began: the session ends here.
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    throw unauthenticated();
  }
  const membership = memberships.find((m) => m.teamId === req.session.activeTeamId) ?? memberships[0];
  req.auth = { user: req.user, membership, memberships };
  next();
};

/** The caller, for handlers mounted behind `requireAuth`. */
export function authOf(req: Request): AuthContext {
  if (!req.auth) throw unauthenticated();
  return req.auth;
}
