import { loadConfig } from './config';
import { createApp } from './app';
import { createSequelize } from './db/sequelize';

const config = loadConfig();
const sequelize = createSequelize(config.databaseUrl);
const { app, close } = createApp({ config, sequelize });

const server = app.listen(config.port, config.host, () => {
  console.log(`Pitwright server listening on http://${config.host}:${config.port}`);
});
server.on('error', (error) => {
  console.error(`The server could not start: ${error.message}`);
  process.exit(1);
});

let stopping = false;
function shutdown() {
  if (stopping) return;
  stopping = true;
  close();
  server.close(() => sequelize.close().finally(() => process.exit(0)));
  server.closeAllConnections();
}
process.on('SIGTERM', shutdown);
// Started by `npm start`: when that process is gone, so is the reason to run.
process.on('disconnect', shutdown);
process.on('SIGINT', shutdown);
