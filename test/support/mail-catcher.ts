// The fake SMTP server for a test run: started on a free port before the app, messages read back as parsed mail.
import { mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';
import { startFakeSmtp, type FakeSmtp } from '../../api/mail/fake-smtp-server.js';
import { runtimeDir } from '../../database/scripts/runtime-dir.js';

let server: FakeSmtp | undefined;
const folder = join(runtimeDir('test-mail'), String(process.pid));

/** Starts the catcher and points the app's SMTP settings at it (call before the app context is created). */
export async function startMailCatcher(): Promise<void> {
  mkdirSync(folder, { recursive: true });
  server = await startFakeSmtp(folder, 0);
  process.env.SMTP_HOST = '127.0.0.1';
  process.env.SMTP_PORT = String(server.port);
  process.env.MAIL_CAPTURE_DIR = folder;
}

export async function stopMailCatcher(): Promise<void> {
  await server?.close();
  rmSync(folder, { recursive: true, force: true });
}

export function clearCaughtMail(): void {
  rmSync(folder, { recursive: true, force: true });
  mkdirSync(folder, { recursive: true });
}

export async function caughtMail(): Promise<ParsedMail[]> {
  const names = readdirSync(folder).filter((name) => name.endsWith('.eml')).sort();
  return Promise.all(names.map((name) => simpleParser(readFileSync(join(folder, name)))));
}
