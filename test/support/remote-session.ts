// Signs in to a server running as a child process (startServerProcess): a cookie header and its XSRF token for supertest.
import { readFileSync } from 'node:fs';
import request from 'supertest';
import { cookieValue, testPassword } from './test-app.js';

export interface RemoteSession {
  cookie: string;
  csrf: string;
}

export function cookieHeader(setCookie: string[] | string | undefined): string {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  return list.map((cookie) => cookie.split(';')[0]).join('; ');
}

export async function signInRemote(url: string, email: string, password = testPassword): Promise<RemoteSession> {
  const anonymous = await request(url).get('/api/auth/session');
  const signedIn = await request(url)
    .post('/api/auth/sign-in')
    .set('Cookie', cookieHeader(anonymous.headers['set-cookie']))
    .set('X-XSRF-TOKEN', cookieValue(anonymous.headers['set-cookie'], 'XSRF-TOKEN')!)
    .send({ email, password });
  if (signedIn.status !== 200) throw new Error(`sign-in on ${url} failed: ${signedIn.status} ${JSON.stringify(signedIn.body)}`);
  return { cookie: cookieHeader(signedIn.headers['set-cookie']), csrf: cookieValue(signedIn.headers['set-cookie'], 'XSRF-TOKEN')! };
}

/** Samples a process's resident memory (VmRSS in /proc) every `everyMs`, keeping the peak. */
export class RssWatch {
  peakBytes = 0;
  private readonly timer: NodeJS.Timeout;

  constructor(private readonly pid: number, everyMs = 50) {
    this.sample();
    this.timer = setInterval(() => this.sample(), everyMs);
  }

  sample(): number {
    try {
      const status = readFileSync(`/proc/${this.pid}/status`, 'utf8');
      const kb = Number(/^VmRSS:\s+(\d+) kB/m.exec(status)?.[1] ?? 0);
      this.peakBytes = Math.max(this.peakBytes, kb * 1024);
      return kb * 1024;
    } catch {
      return 0; // the process has gone; the tests that need it say so
    }
  }

  stop(): number {
    clearInterval(this.timer);
    this.sample();
    return this.peakBytes;
  }
}
