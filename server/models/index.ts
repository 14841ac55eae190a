import type { Sequelize } from 'sequelize';
import { Battery } from './battery';
import { BatteryReading } from './battery-reading';
import { BatterySetting } from './battery-setting';
import { BatteryUse } from './battery-use';
import { Charger } from './charger';
import { ChargingSession } from './charging-session';
import { ChecklistItemState, decodeMarkValue, encodeMarkValue } from './checklist-item-state';
import { ChecklistMark } from './checklist-mark';
import { ChecklistRun } from './checklist-run';
import { ChecklistTemplate } from './checklist-template';
import { ChecklistTemplateVersion } from './checklist-template-version';
import { Event } from './event';
import { FieldMark } from './field-mark';
import { Match } from './match';
import { Repair } from './repair';
import { RepairChange } from './repair-change';
import { RepairPhoto } from './repair-photo';
import { RepairSetting } from './repair-setting';
import { Membership } from './membership';
import { hashScreenToken, newScreenToken, ScreenToken } from './screen-token';
import { SessionRecord } from './session-record';
import { Team } from './team';
import { User } from './user';

export { Event, FieldMark, Match, Membership, ScreenToken, SessionRecord, Team, User };
export { ChecklistItemState, ChecklistMark, ChecklistRun, ChecklistTemplate, ChecklistTemplateVersion };
export { Battery, BatteryReading, BatterySetting, BatteryUse, Charger, ChargingSession };
export { Repair, RepairChange, RepairPhoto, RepairSetting };
export { decodeMarkValue, encodeMarkValue, hashScreenToken, newScreenToken };

let boundTo: Sequelize | undefined;

/** Binds every model to one connection; a process talks to one database. */
export function initModels(sequelize: Sequelize) {
  if (boundTo === sequelize) return;
  if (boundTo) throw new Error('Models are already bound to another database connection');
  boundTo = sequelize;
  const models = [Team, User, Membership, Event, SessionRecord, Match, FieldMark, ScreenToken];
  const checklistModels = [ChecklistTemplate, ChecklistTemplateVersion, ChecklistRun, ChecklistItemState, ChecklistMark];
  const batteryModels = [Battery, BatteryReading, BatteryUse, Charger, ChargingSession, BatterySetting];
  const repairModels = [Repair, RepairPhoto, RepairChange, RepairSetting];
  for (const model of [...models, ...checklistModels, ...batteryModels, ...repairModels]) model.initModel(sequelize);
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
  ChecklistTemplate.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  ChecklistTemplateVersion.belongsTo(ChecklistTemplate, { foreignKey: 'templateId', as: 'template' });
  ChecklistRun.belongsTo(Event, { foreignKey: 'eventId', as: 'event' });
  ChecklistRun.belongsTo(ChecklistTemplate, { foreignKey: 'templateId', as: 'template' });
  ChecklistRun.belongsTo(ChecklistTemplateVersion, { foreignKey: 'templateVersionId', as: 'templateVersion' });
  Battery.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  BatteryReading.belongsTo(Battery, { foreignKey: 'batteryId', as: 'battery' });
  BatteryUse.belongsTo(Battery, { foreignKey: 'batteryId', as: 'battery' });
  Charger.belongsTo(Team, { foreignKey: 'teamId', as: 'team' });
  ChargingSession.belongsTo(Battery, { foreignKey: 'batteryId', as: 'battery' });
  ChargingSession.belongsTo(Charger, { foreignKey: 'chargerId', as: 'charger' });
  Repair.belongsTo(Event, { foreignKey: 'eventId', as: 'event' });
  RepairPhoto.belongsTo(Repair, { foreignKey: 'repairId', as: 'repair' });
  RepairChange.belongsTo(Repair, { foreignKey: 'repairId', as: 'repair' });
}
