import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const instant = (allowNull = false) => ({ type: DataTypes.DATE(3), allowNull });
// A fresh object per column: Sequelize writes each column's name into its definition.
const user = (allowNull = false) => ({ type: DataTypes.UUID, allowNull, references: { model: 'users', key: 'id' } });
const team = (allowNull = false) => ({ type: DataTypes.UUID, allowNull, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' });

/**
 * The safety log (incidents and their photos), the team's alert rules, the outbox every e-mail
 * goes through, what the local SMTP fake received, and the one-time links of invites and
 * password resets.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('incidents', {
    id,
    teamId: team(),
    // A safety record outlives the event it happened at.
    eventId: { type: DataTypes.UUID, allowNull: true, references: { model: 'events', key: 'id' }, onDelete: 'SET NULL' },
    occurredAt: instant(),
    location: { type: DataTypes.STRING(16), allowNull: false },
    kind: { type: DataTypes.STRING(24), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false },
    // [{initials, role}] as JSON: never names.
    involved: { type: DataTypes.TEXT, allowNull: false },
    // Treatment codes as JSON.
    treatments: { type: DataTypes.TEXT, allowNull: false },
    immediateActions: { type: DataTypes.TEXT, allowNull: true },
    batteryId: { type: DataTypes.UUID, allowNull: true, references: { model: 'batteries', key: 'id' }, onDelete: 'SET NULL' },
    // Kept with the row for lists and exports; recomputed from the treatments on every write.
    incidentClass: { type: DataTypes.STRING(20), allowNull: false },
    // The most serious alert rule the safety contacts have been told of, so an escalation tells them again.
    alertedRule: { type: DataTypes.STRING(16), allowNull: true },
    // [{id, text, ownerId, dueOn, done, doneAt}] as JSON.
    followUps: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.STRING(8), allowNull: false },
    closingNote: { type: DataTypes.TEXT, allowNull: true },
    closedAt: instant(true),
    closedById: user(true),
    reporterId: user(),
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: instant(),
    updatedAt: instant(),
  });
  await qi.addIndex('incidents', ['teamId', 'occurredAt'], { name: 'incidents_team_occurred' });
  await qi.addIndex('incidents', ['eventId', 'occurredAt'], { name: 'incidents_event_occurred' });

  await qi.createTable('incident_photos', {
    id,
    incidentId: { type: DataTypes.UUID, allowNull: false, references: { model: 'incidents', key: 'id' }, onDelete: 'CASCADE' },
    uploadedById: user(),
    contentType: { type: DataTypes.STRING(16), allowNull: false },
    byteSize: { type: DataTypes.INTEGER, allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: true },
    height: { type: DataTypes.INTEGER, allowNull: true },
    hasThumb: { type: DataTypes.BOOLEAN, allowNull: false },
    createdAt: instant(),
  });
  await qi.addIndex('incident_photos', ['incidentId', 'createdAt'], { name: 'incident_photos_incident_created' });

  await qi.createTable('alert_rules', {
    teamId: { ...team(), primaryKey: true },
    key: { type: DataTypes.STRING(16), allowNull: false, primaryKey: true },
    // Role names and extra addresses as JSON.
    roles: { type: DataTypes.TEXT, allowNull: false },
    extraAddresses: { type: DataTypes.TEXT, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: instant(),
    updatedAt: instant(),
  });

  await qi.createTable('mail_outbox', {
    id,
    teamId: team(true),
    kind: { type: DataTypes.STRING(16), allowNull: false },
    incidentId: { type: DataTypes.UUID, allowNull: true, references: { model: 'incidents', key: 'id' }, onDelete: 'SET NULL' },
    toAddress: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    // pending → sent, or failed after the last retry (and pending again when retried by hand).
    status: { type: DataTypes.STRING(8), allowNull: false },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    lastError: { type: DataTypes.TEXT, allowNull: true },
    nextAttemptAt: instant(),
    // The process sending it holds it until then; a row whose claim ran out (a crash) is picked up again.
    claimedUntil: instant(true),
    sentAt: instant(true),
    failedAt: instant(true),
    createdAt: instant(),
    updatedAt: instant(),
  });
  await qi.addIndex('mail_outbox', ['status', 'nextAttemptAt'], { name: 'mail_outbox_status_next' });
  await qi.addIndex('mail_outbox', ['teamId', 'status'], { name: 'mail_outbox_team_status' });

  await qi.createTable('mail_messages', {
    id,
    // From the X-Pitwright-Team header: whose admins see it in the Mailbox.
    teamId: { type: DataTypes.UUID, allowNull: true },
    fromAddress: { type: DataTypes.STRING(254), allowNull: false },
    toAddresses: { type: DataTypes.STRING(2000), allowNull: false },
    subject: { type: DataTypes.STRING(500), allowNull: false },
    text: { type: DataTypes.TEXT('medium'), allowNull: false },
    receivedAt: instant(),
  });
  await qi.addIndex('mail_messages', ['teamId', 'receivedAt'], { name: 'mail_messages_team_received' });

  await qi.createTable('account_links', {
    id,
    purpose: { type: DataTypes.STRING(8), allowNull: false },
    // SHA-256 of the token, hex: the token itself is only ever in the e-mail.
    tokenHash: { type: 'CHAR(64) CHARACTER SET ascii COLLATE ascii_bin', allowNull: false, unique: true },
    email: { type: DataTypes.STRING(254), allowNull: false },
    userId: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    teamId: team(true),
    // For an invite: the name and roles the member gets.
    name: { type: DataTypes.STRING(80), allowNull: true },
    roles: { type: DataTypes.TEXT, allowNull: true },
    createdById: user(true),
    expiresAt: instant(),
    usedAt: instant(true),
    revokedAt: instant(true),
    createdAt: instant(),
  });
  await qi.addIndex('account_links', ['teamId', 'purpose'], { name: 'account_links_team_purpose' });
  await qi.addIndex('account_links', ['email', 'purpose'], { name: 'account_links_email_purpose' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('account_links');
  await qi.dropTable('mail_messages');
  await qi.dropTable('mail_outbox');
  await qi.dropTable('alert_rules');
  await qi.dropTable('incident_photos');
  await qi.dropTable('incidents');
}
