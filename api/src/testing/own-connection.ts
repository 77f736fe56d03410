import { Client } from 'pg';
import { testApp } from './test-app';

/**
 * A pg connection of the spec's own to the test database, beside the app's pool (for COPY and
 * transactions a spec drives itself): opened before the specs of the describe it is called in,
 * closed after them.
 */
export function ownConnection(): { readonly client: Client } {
  const holder = {} as { client: Client };
  beforeAll(async () => {
    await testApp();
    holder.client = new Client({ connectionString: process.env.DATABASE_URL });
    await holder.client.connect();
  });
  afterAll(async () => {
    await holder.client?.end();
  });
  return holder;
}
