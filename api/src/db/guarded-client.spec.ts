import { testApp } from '../testing/test-app';

/** The failure seen when PostgreSQL shut down under a running API (FATAL 57P01), made on purpose for one connection. */
describe('pooled database connections', () => {
  it('outlive the server ending a connection that is checked out between statements, and the pool goes on', async () => {
    const t = await testApp();
    const runner = t.dataSource.createQueryRunner();
    await runner.connect();
    const [{ pid }] = await runner.query('SELECT pg_backend_pid() AS pid');
    const logged: string[] = [];
    spyOn(console, 'error').and.callFake((message: unknown) => logged.push(String(message)));
    await t.dataSource.query('SELECT pg_terminate_backend($1)', [pid]);
    const deadline = Date.now() + 5000;
    while (!logged.some((m) => m.includes('terminating connection')) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 20));
    expect(logged).toContain(jasmine.stringMatching(/^database connection: terminating connection due to administrator command/));
    await expectAsync(runner.query('SELECT 1')).toBeRejected();
    await runner.release();
    expect((await t.dataSource.query('SELECT 1 AS one'))[0].one).toBe(1);
  });
});
