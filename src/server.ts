// The only module with side effects: read the environment, open the database, load the demo, serve.
import { serve } from '@hono/node-server';
import { readEnv, isLoopback } from './env';
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
const app = buildApp({ database, now: () => new Date(), accessSecret: env.accessSecret });
const server = serve({ fetch: app.fetch, port: env.port, hostname: env.host }, (info) => {
  console.log(`Rigwright is serving on http://${env.host}:${info.port} (database ${env.databaseUrl})`);
});
const stop = () => {
  server.close();
  database.close();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
