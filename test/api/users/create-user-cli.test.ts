// `npm run cli -- create-user`, run as a real process with the password on stdin.
import { expect } from 'chai';
import { spawn } from 'node:child_process';
import { User } from '../../../database/models/index.js';
import { projectRoot } from '../../../database/scripts/runtime-dir.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signIn } from '../../support/test-app.js';

function runCli(args: string[], stdin: string): Promise<{ code: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'api/cli/main.ts', ...args], { cwd: projectRoot, env: process.env });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (chunk) => (stdout += chunk));
    child.stderr.on('data', (chunk) => (stderr += chunk));
    child.on('close', (code) => resolve({ code, stdout, stderr }));
    child.stdin.end(stdin);
  });
}

describe('cli create-user', function () {
  this.timeout(30_000);
  beforeEach(resetDatabase);

  it('creates a user limited to the given sites with the password read from stdin, who can then sign in', async () => {
    await createSite('LKN');
    const result = await runCli(['create-user', '--email', 'Vet@Test.example', '--name', 'Vet One', '--roles', 'veterinarian,storage', '--sites', 'lkn'], 'heron willow copper lantern\n');
    expect(result.code, result.stderr).to.equal(0);
    expect(JSON.parse(result.stdout)).to.include({ email: 'vet@test.example', allSites: false });
    const user = await User.findOne({ where: { email: 'vet@test.example' } });
    expect(user?.roles).to.deep.equal(['veterinarian', 'storage']);
    await signIn('vet@test.example', 'heron willow copper lantern');
  });

  it('exits 2 naming the problem for an unknown role, a weak password, or an unknown site, and creates nobody', async () => {
    const role = await runCli(['create-user', '--email', 'a@test.example', '--name', 'A', '--roles', 'wizard'], 'heron willow copper lantern\n');
    expect(role.code).to.equal(2);
    expect(role.stderr).to.match(/--roles\.0/);
    const weak = await runCli(['create-user', '--email', 'a@test.example', '--name', 'A', '--roles', 'crew'], 'short\n');
    expect(weak.code).to.equal(2);
    expect(weak.stderr).to.match(/at least 15 characters/);
    const site = await runCli(['create-user', '--email', 'a@test.example', '--name', 'A', '--roles', 'crew', '--sites', 'NOPE'], 'heron willow copper lantern\n');
    expect(site.code).to.equal(2);
    expect(site.stderr).to.match(/unknown site code\(s\): NOPE/);
    expect(await User.count()).to.equal(0);
  });
});
