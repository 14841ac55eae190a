import { loadConfig } from './config';
import { createApp } from './app';
import { createSequelize } from './db/sequelize';
import { attachRealtime } from './realtime/io';

const config = loadConfig();
const sequelize = createSequelize(config.databaseUrl);
const built = createApp({ config, sequelize });
const { app, close } = built;

const server = app.listen(config.port, config.host, () => {
  console.log(`Pitwright server listening on http://${config.host}:${config.port}`);
});
const io = attachRealtime(server, built);
server.on('error', (error) => {
  console.error(`The server could not start: ${error.message}`);
  process.exit(1);
});

let stopping = false;
function shutdown() {
  if (stopping) return;
  stopping = true;
  close();
  void io.close();
  server.close(() => sequelize.close().finally(() => process.exit(0)));
  server.closeAllConnections();
}
process.on('SIGTERM', shutdown);
// Started by `npm start`: when that process is gone, so is the reason to run.
process.on('disconnect', shutdown);
process.on('SIGINT', shutdown);
