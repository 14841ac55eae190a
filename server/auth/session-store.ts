import session from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import { Op, type Sequelize } from 'sequelize';
import { SessionRecord } from '../models';
import { disconnectSessions } from '../realtime/broadcast';

const SequelizeStore = connectSessionSequelize(session.Store);

/**
 * Sessions in MariaDB (table made by a migration, never by `sync()`), each row tagged with
 * its user so that deactivating a member can end all of that member's sessions at once.
 */
export class SessionStore extends SequelizeStore {
  constructor(sequelize: Sequelize, idleMs: number) {
    super({
      db: sequelize,
      table: SessionRecord.name,
      expiration: idleMs,
      checkExpirationInterval: 15 * 60_000,
      extendDefaultFields: (defaults: { data: string; expires: Date }, data: { passport?: { user?: string } }) => ({
        ...defaults,
        userId: data.passport?.user ?? null,
      }),
    });
  }

  // The parent returns a row whose idle time ran out until its cleanup pass runs.
  override get(sid: string, callback: (error: unknown, data?: session.SessionData | null) => void) {
    SessionRecord.findOne({ where: { sid, expires: { [Op.gt]: new Date() } } }).then(
      (row) => callback(null, row ? JSON.parse(row.data) : null),
      (error) => callback(error),
    );
  }

  close() {
    this.stopExpiringSessions();
  }
}

/**
 * Ends every session of one user (password change elsewhere), or those working in one team
 * (deactivation), and closes their live sockets.
 */
export async function endSessionsOf(userId: string, { except, teamId }: { except?: string; teamId?: string } = {}) {
  const sids = await sessionsOf(userId, { except, teamId });
  if (sids.length) await SessionRecord.destroy({ where: { sid: sids } });
  disconnectSessions(sids);
}

/** The ids of one user's sessions, or of those working in one team. */
export async function sessionsOf(userId: string, { except, teamId }: { except?: string; teamId?: string } = {}) {
  const where = { userId, ...(except ? { sid: { [Op.ne]: except } } : {}) };
  const rows = await SessionRecord.findAll({ where, attributes: ['sid', 'data'] });
  return rows.filter((row) => !teamId || JSON.parse(row.data).activeTeamId === teamId).map((row) => row.sid);
}
