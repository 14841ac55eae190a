import type { Request, RequestHandler } from 'express';
import { Membership, Team, User } from '../models';
import { unauthenticated } from '../errors';
import type { AuthContext } from './types';

const activeMemberships = { model: Membership, as: 'memberships', where: { active: true }, required: false, include: [{ model: Team, as: 'team' }] };

/** A user with their active memberships and teams, in one query (this runs on every request). */
export function findUserWithMemberships(where: { id: string } | { email: string }) {
  return User.findOne({ where, include: [activeMemberships], order: [[activeMemberships, 'createdAt', 'ASC']] });
}

/** Resolves the caller's user and working team, or answers 401. */
export const requireAuth: RequestHandler = async (req, _res, next) => {
  if (!req.user) throw unauthenticated();
  const memberships = req.user.memberships ?? [];
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
