import type { Server } from 'node:http';
import type { DataSource } from 'typeorm';
import { createApp } from './app';
import type { AppConfig } from './config';
import { openDataSource } from './db/data-source';
import { ObjectStore } from './storage/object-store';
import { MailQueue } from './mail/mail-queue';

export interface RunningServer {
  url: string;
  dataSource: DataSource;
  close(): Promise<void>;
}

/** Connects to PostgreSQL and the object store, then listens; `close()` undoes both. */
export async function startServer(config: AppConfig): Promise<RunningServer> {
  const dataSource = await openDataSource(config.databaseUrl, config.databaseReplicaUrls);
  const store = new ObjectStore(config.s3);
  const mail = new MailQueue(config);
  await mail.start();
  const app = createApp({ config, dataSource, store, mail });
  const server = await listen(app, config.port, config.host);
  // PORT=0: the port the kernel chose.
  const address = server.address();
  return {
    url: `http://${config.host}:${typeof address === 'object' && address ? address.port : config.port}`,
    dataSource,
    async close() {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await mail.stop();
      store.destroy();
      await dataSource.destroy();
    },
  };
}

function listen(app: ReturnType<typeof createApp>, port: number, host: string): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = app.listen(port, host);
    server.once('listening', () => resolve(server));
    server.once('error', (error: NodeJS.ErrnoException) => {
      if (error.code === 'EADDRINUSE') {
        reject(new Error(`Port ${port} on ${host} is already in use: stop the other program or set PORT to a free port`));
      } else {
        reject(error);
      }
    });
  });
}
