// The local stand-in for a mail service: accepts every message on loopback and keeps it as an .eml file.
import { SMTPServer } from 'smtp-server';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';

export interface FakeSmtp {
  port: number;
  close(): Promise<void>;
}

export async function startFakeSmtp(folder: string, port: number, host = '127.0.0.1'): Promise<FakeSmtp> {
  mkdirSync(folder, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    // The built-in certificate has expired; a loopback-only fake needs no TLS.
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: 30 * 1024 * 1024,
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const name = `${new Date().toISOString().replace(/[:.]/g, '-')}-${randomUUID().slice(0, 8)}.eml`;
        writeFileSync(join(folder, name), Buffer.concat(chunks));
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.server.address();
  return {
    port: typeof address === 'object' && address ? address.port : port,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
