// `npm run seed-demo`: load the demo projects into the configured database (skips ones already there).
import { readEnv, describeDatabase } from '../src/env';
import { openDatabase } from '../src/db/client';
import { seedDemo } from './index';

const env = readEnv(process.env);
const database = await openDatabase(env.databaseUrl, env.databaseAuthToken);
console.log(`Database: ${describeDatabase(env.databaseUrl, env.databaseIsDefault)}`);
const inserted = await seedDemo(database, new Date().toISOString());
console.log(inserted.length ? `Loaded: ${inserted.join('; ')}` : 'Demo projects already present; nothing changed.');
database.close();
