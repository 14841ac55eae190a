import type { Sequelize } from 'sequelize';
import { Event } from './event';
import { FieldMark } from './field-mark';
import { Match } from './match';
import { Membership } from './membership';
import { hashScreenToken, newScreenToken, ScreenToken } from './screen-token';
import { SessionRecord } from './session-record';
import { Team } from './team';
import { User } from './user';

export { Event, FieldMark, Match, Membership, ScreenToken, SessionRecord, Team, User };
export { hashScreenToken, newScreenToken };

let boundTo: Sequelize | undefined;

/** Binds every model to one connection; a process talks to one database. */
export function initModels(sequelize: Sequelize) {
  if (boundTo === sequelize) return;
  if (boundTo) throw new Error('Models are already bound to another database connection');
  boundTo = sequelize;
  for (const model of [Team, User, Membership, Event, SessionRecord, Match, FieldMark, ScreenToken]) model.initModel(sequelize);
  Membership.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Team.hasMany(Membership, { foreignKey: 'teamId', as: 'memberships' });
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Event.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  Match.belongsTo(Event, { foreignKey: 'eventId', as: 'event' });
  FieldMark.belongsTo(Match, { foreignKey: 'matchId', as: 'match' });
  FieldMark.belongsTo(Event, { foreignKey: 'eventId', as: 'event' });
  FieldMark.belongsTo(User, { foreignKey: 'markedById', as: 'markedBy' });
  ScreenToken.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
}
