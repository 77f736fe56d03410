import 'reflect-metadata';
import path from 'node:path';
import { loadConfig } from '../src/config';
import { startServer } from '../src/server';
import { PostgresCluster, developmentClusterDir } from './postgres-cluster';
import { startMailCatcher, startObjectStoreFake } from './local-fakes';
import { prepareDatabase } from './prepare-database';
import { requireFreePort } from './free-port';
import { ng } from './angular-cli';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../seeds-demo/demo-accounts';

/** `npm start`: a private PostgreSQL, the local fakes, migrations, demo data, the client build and the API. */
async function main(): Promise<void> {
  const projectDir = process.cwd();
  const config = loadConfig();
  await requireFreePort(config.port, 'the Kelvindex app — is `npm start` already running?', 'PORT');

  const stops: (() => Promise<void>)[] = [];
  const stopAll = async () => {
    for (const stop of stops.reverse()) await stop().catch((e: Error) => console.error(e.message));
  };
  let stopping = false;
  const onSignal = (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`\n${signal}: stopping Kelvindex…`);
    stopAll().then(() => process.exit(0));
  };
  process.on('SIGINT', () => onSignal('SIGINT'));
  process.on('SIGTERM', () => onSignal('SIGTERM'));

  try {
    if (!process.env.DATABASE_URL) {
      const cluster = new PostgresCluster({ dir: developmentClusterDir(projectDir), port: Number(process.env.KELVINDEX_PG_PORT ?? 54329) });
      await cluster.ensureInstalled();
      await cluster.init();
      await cluster.start();
      stops.push(() => cluster.stop());
      await cluster.ensureDatabase();
      config.databaseUrl = cluster.url();
      console.log(`PostgreSQL on 127.0.0.1:${cluster.port} (data in ${cluster.dataDir})`);
    }
    const dataDir = path.join(projectDir, '.data');
    const mail = await startMailCatcher(config.smtp.port, path.resolve(config.mailOutboxDir));
    stops.push(() => mail.close());
    const s3Port = Number(new URL(config.s3.endpoint).port);
    const objects = await startObjectStoreFake(s3Port, path.join(dataDir, 'objects'), config.s3.bucket);
    stops.push(() => objects.close());

    await prepareDatabase(config, { demo: true });
    if (process.env.KELVINDEX_SKIP_CLIENT_BUILD !== '1') await ng(['build']);

    const server = await startServer(config);
    stops.push(() => server.close());
    printWelcome(server.url);
  } catch (error) {
    console.error(`\nKelvindex could not start: ${(error as Error).message}`);
    await stopAll();
    process.exit(1);
  }
}

function printWelcome(url: string): void {
  const accounts = DEMO_ACCOUNTS.map((a) => `  ${a.email.padEnd(28)} ${a.roles.join(', ')}`).join('\n');
  console.log(`
Kelvindex is running at ${url}
Demo accounts (password: ${DEMO_PASSWORD}):
${accounts}
E-mail sent by the app is captured locally (admin: Outbox page). Press Ctrl+C to stop.`);
}

main();
