import { Sequelize } from 'sequelize';

/** A Sequelize connection to MariaDB that stores every instant in UTC. */
export function createSequelize(databaseUrl: string) {
  return new Sequelize(databaseUrl, {
    dialect: 'mariadb',
    // A zone name would be turned into a fixed offset at connect time; UTC never shifts.
    timezone: '+00:00',
    logging: false,
    dialectOptions: { connectTimeout: 5_000 },
    pool: { max: 10, min: 0, acquire: 10_000, idle: 10_000 },
    define: { underscored: false },
  });
}
