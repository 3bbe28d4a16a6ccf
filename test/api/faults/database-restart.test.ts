// The database restarted under a running server: clean 503s while it is down, and recovery without a restart of the server.
import { expect } from 'chai';
import { LocalCluster } from '../../../database/scripts/local-cluster.js';
import { resetDatabase, testEnv } from '../../support/test-database.js';
import { createTestUser, signIn } from '../../support/test-app.js';

describe('database restart under the running server', function () {
  this.timeout(90_000);

  it('answers 503 with a clear message while the database is down, then serves again by itself', async () => {
    await resetDatabase();
    const user = await createTestUser({ roles: ['veterinarian'] });
    const { agent } = await signIn(user.email);
    expect((await agent.get('/api/sites')).status).to.equal(200);

    const cluster = new LocalCluster({ name: 'test', port: Number(new URL(testEnv('DATABASE_URL')).port) });
    cluster.stop();
    try {
      for (const path of ['/api/sites', '/api/auth/session', '/api/health']) {
        const response = await agent.get(path);
        expect(response.status, path).to.equal(503);
        expect(response.body.error.message).to.match(/database is not reachable/);
      }
    } finally {
      cluster.start();
    }

    const deadline = Date.now() + 20_000;
    let status = 0;
    while (Date.now() < deadline) {
      status = (await agent.get('/api/sites')).status;
      if (status === 200) break;
      expect(status, 'only 503 while reconnecting').to.equal(503);
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    expect(status).to.equal(200);
  });
});
