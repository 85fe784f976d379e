// The only module with side effects: read the environment, open the database, load the demo, serve.
import { serve } from '@hono/node-server';
import { readEnv, isLoopback, describeDatabase } from './env';
import { openDatabase } from './db/client';
import { countProjects } from './db/projects';
import { seedDemo } from '../seed-demo/index';
import { buildApp } from './app';

const env = (() => {
  try {
    return readEnv(process.env);
  } catch (e) {
    console.error(`${(e as Error).message}. Nothing was started.`);
    process.exit(2);
  }
})();
if (!isLoopback(env.host) && !env.accessSecret) {
  console.error(
    `Refusing to listen on ${env.host}: anyone on that network could read and change the projects. ` +
      'Set RIGWRIGHT_SECRET to a password (the browser will ask for it; any user name) or bind to 127.0.0.1.',
  );
  process.exit(2);
}
const database = await openDatabase(env.databaseUrl, env.databaseAuthToken).catch((e: Error) => {
  console.error(`Cannot open the database ${env.databaseUrl} (DATABASE_URL): ${e.message}`);
  process.exit(2);
});
if (env.loadDemo && (await countProjects(database.db)) === 0) {
  const names = await seedDemo(database, new Date().toISOString());
  if (names.length) console.log(`Loaded the demo projects: ${names.join('; ')}`);
}
const databaseName = describeDatabase(env.databaseUrl, env.databaseIsDefault);
const app = buildApp({ database, now: () => new Date(), accessSecret: env.accessSecret });
const server = serve({ fetch: app.fetch, port: env.port, hostname: env.host }, (info) => {
  console.log(`Rigwright is serving on http://${env.host}:${info.port}, database ${databaseName}`);
});
// A port already taken is one line naming PORT, not a stack trace.
server.on('error', (e: NodeJS.ErrnoException) => {
  const why =
    e.code === 'EADDRINUSE'
      ? `port ${env.port} on ${env.host} is already in use (EADDRINUSE): stop the other program or choose another ` +
        `port, e.g. PORT=${env.port === 65535 ? env.port - 1 : env.port + 1} npm start`
      : e.code === 'EACCES'
        ? `no permission to listen on port ${env.port} (EACCES): choose a PORT above 1023`
        : `cannot listen on ${env.host}:${env.port} (${e.code ?? e.message})`;
  console.error(`Rigwright did not start: ${why}.`);
  database.close();
  process.exit(2);
});
const stop = () => {
  server.close();
  database.close();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
