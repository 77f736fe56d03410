import { Client, type ClientConfig } from 'pg';

/**
 * A pg Client that is never without an 'error' listener. pg-pool listens on the clients it holds
 * idle, and a running query hears its own failure, but a client checked out between two
 * statements (by TypeORM, which adds no listener) had none: PostgreSQL shutting down then ended
 * the whole process with an uncaught 'error' event. The next statement on such a client fails
 * anyway, and the pool drops it; this only logs the cause.
 */
export class GuardedClient extends Client {
  constructor(config?: string | ClientConfig) {
    super(config);
    this.on('error', (error: Error) => console.error(`database connection: ${error.message}`));
  }
}
