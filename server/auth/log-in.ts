import type { Request } from 'express';
import type { User } from '../models';

/** Signs the user in on this request; passport gives the session a new id first. */
export const logIn = (req: Request, user: User) =>
  new Promise<void>((resolve, reject) => req.logIn(user, (error) => (error ? reject(error) : resolve())));
