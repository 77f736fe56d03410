import 'reflect-metadata';
import { loadConfig } from './config';
import { startServer } from './server';

/** Production entry: serve with the configured database; migrations are a separate step. */
async function main(): Promise<void> {
  const running = await startServer(loadConfig());
  console.log(`Kelvindex API listening on ${running.url}`);
  const stop = async () => {
    await running.close();
    process.exit(0);
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((error: Error) => {
  console.error(error.message);
  process.exit(1);
});
