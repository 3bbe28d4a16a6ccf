// Starts the API as a separate Node process (as in production) and waits until it answers.
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { projectRoot } from '../../database/scripts/runtime-dir.js';

export interface ServerProcess {
  url: string;
  child: ChildProcess;
  output(): string;
  stop(signal?: NodeJS.Signals): Promise<void>;
}

/** A port that was free a moment ago (so parallel test runs do not collide on fixed numbers). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

export async function startServerProcess(port: number, env: NodeJS.ProcessEnv = {}): Promise<ServerProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'api/server.ts'], {
    cwd: projectRoot,
    env: { ...process.env, VIALYARD_PORT: String(port), LOG_LEVEL: 'warn', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (chunk) => (output += chunk));
  child.stderr!.on('data', (chunk) => (output += chunk));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server on ${port} exited (${child.exitCode}):\n${output}`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`server on ${port} did not answer in 30 s:\n${output}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return {
    url,
    child,
    output: () => output,
    stop: (signal = 'SIGTERM') =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill(signal);
      }),
  };
}
