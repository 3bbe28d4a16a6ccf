// A project-local PostgreSQL cluster on 127.0.0.1, owned by a non-root user, started and stopped by our scripts.
import { spawnSync, type SpawnSyncOptions } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { appendFileSync, existsSync, mkdirSync, readFileSync, rmSync, writeFileSync, chownSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';
import { ensurePostgresBinaries } from './postgres-binaries.js';
import { fallbackClusterRoot, runtimeDir } from './runtime-dir.js';

export interface ClusterOptions {
  /** Names the cluster's folder: "demo" for npm start, "test" for npm test. */
  name: string;
  port: number;
  /** Throwaway clusters trade durability for speed. */
  throwaway?: boolean;
  log?: (line: string) => void;
}

export interface DatabaseCredentials {
  database: string;
  ownerUser: string;
  ownerPassword: string;
  appUser: string;
  appPassword: string;
  host: string;
  port: number;
}

const isRoot = process.getuid?.() === 0;

function systemUserCanTraverse(dir: string): boolean {
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}

export class LocalCluster {
  readonly dataDir: string;
  readonly socketDir: string;
  private readonly bin: string;
  private readonly log: (line: string) => void;
  startedByUs = false;

  constructor(private readonly options: ClusterOptions) {
    this.log = options.log ?? (() => {});
    this.bin = ensurePostgresBinaries(this.log);
    const preferred = runtimeDir('pg');
    const root = !isRoot || systemUserCanTraverse(preferred) ? preferred : fallbackClusterRoot();
    this.dataDir = join(root, options.name);
    this.socketDir = `/tmp/vialyard-pg-${options.port}`;
  }

  get port(): number {
    return this.options.port;
  }

  /** Runs a server binary as the cluster's owner (postgres when we are root: PostgreSQL refuses root). */
  private run(tool: string, args: string[], options: SpawnSyncOptions = {}): { status: number | null; output: string } {
    const command = join(this.bin, tool);
    const result = isRoot
      ? spawnSync('runuser', ['-u', 'postgres', '--', command, ...args], { encoding: 'utf8', ...options })
      : spawnSync(command, args, { encoding: 'utf8', ...options });
    return { status: result.status, output: `${result.stdout ?? ''}${result.stderr ?? ''}` };
  }

  private prepareFolder(dir: string): void {
    mkdirSync(dir, { recursive: true, mode: 0o700 });
    if (isRoot) {
      const uid = Number(spawnSync('id', ['-u', 'postgres'], { encoding: 'utf8' }).stdout.trim());
      const gid = Number(spawnSync('id', ['-g', 'postgres'], { encoding: 'utf8' }).stdout.trim());
      chownSync(dir, uid, gid);
    }
  }

  /** Deletes the cluster's files (throwaway clusters only). */
  destroy(): void {
    this.stop();
    rmSync(this.dataDir, { recursive: true, force: true });
  }

  private initialise(): void {
    this.log(`Creating PostgreSQL cluster in ${this.dataDir}`);
    this.prepareFolder(this.dataDir);
    // Trust on the local socket for the superuser only; the socket folder is ours alone (mode 0700 below).
    const init = this.run('initdb', ['-D', this.dataDir, '-U', 'postgres', '-E', 'UTF8', '--no-locale',
      '--auth-local=trust', '--auth-host=scram-sha-256']);
    if (init.status !== 0) throw new Error(`initdb failed:\n${init.output}`);
    const settings = [
      `listen_addresses = '127.0.0.1'`,
      `port = ${this.options.port}`,
      `unix_socket_directories = '${this.socketDir}'`,
      `unix_socket_permissions = 0700`,
      `max_connections = 100`,
      `logging_collector = off`,
      ...(this.options.throwaway ? ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off'] : []),
    ];
    appendFileSync(join(this.dataDir, 'postgresql.conf'), `\n# Vialyard\n${settings.join('\n')}\n`);
  }

  isRunning(): boolean {
    return this.run('pg_ctl', ['-D', this.dataDir, 'status']).status === 0;
  }

  /** Creates the cluster when missing and starts it unless it already runs. */
  start(): void {
    if (!existsSync(join(this.dataDir, 'PG_VERSION'))) this.initialise();
    this.prepareFolder(this.socketDir);
    if (this.isRunning()) {
      this.log(`PostgreSQL already running on 127.0.0.1:${this.options.port}`);
      return;
    }
    const logFile = join(this.dataDir, 'server.log');
    const started = this.run('pg_ctl', ['-D', this.dataDir, '-l', logFile, '-w', '-t', '60', 'start']);
    if (started.status !== 0) {
      const tail = existsSync(logFile) ? readFileSync(logFile, 'utf8').split('\n').slice(-15).join('\n') : '';
      throw new Error(`PostgreSQL did not start on port ${this.options.port}:\n${started.output}\n${tail}`);
    }
    this.startedByUs = true;
    this.log(`PostgreSQL listening on 127.0.0.1:${this.options.port}`);
  }

  stop(): void {
    if (existsSync(join(this.dataDir, 'PG_VERSION')) && this.isRunning()) {
      this.run('pg_ctl', ['-D', this.dataDir, '-m', 'fast', '-w', 'stop']);
    }
  }

  /** Runs SQL as the superuser over the private socket. */
  async superuserQuery(sql: string, database = 'postgres'): Promise<pg.QueryResult> {
    const client = new pg.Client({ host: this.socketDir, port: this.options.port, user: 'postgres', database });
    await client.connect();
    try {
      return await client.query(sql);
    } finally {
      await client.end();
    }
  }

  /**
   * Makes the database with two roles: an owner that runs migrations and owns every table, and the
   * application role, which gets only the privileges the migrations grant it (so the audit log stays append-only).
   */
  async ensureDatabase(database: string): Promise<DatabaseCredentials> {
    const credentialsFile = join(runtimeDir('credentials'), `${this.options.name}.json`);
    const stored: DatabaseCredentials | undefined = existsSync(credentialsFile)
      ? JSON.parse(readFileSync(credentialsFile, 'utf8'))
      : undefined;
    const credentials: DatabaseCredentials = stored?.database === database && stored.port === this.options.port
      ? stored
      : {
          database,
          ownerUser: `${database}_owner`,
          ownerPassword: randomBytes(18).toString('base64url'),
          appUser: `${database}_app`,
          appPassword: randomBytes(18).toString('base64url'),
          host: '127.0.0.1',
          port: this.options.port,
        };
    writeFileSync(credentialsFile, JSON.stringify(credentials, null, 2), { mode: 0o600 });
    const literal = (value: string) => `'${value.replace(/'/g, "''")}'`;
    for (const [role, password] of [[credentials.ownerUser, credentials.ownerPassword], [credentials.appUser, credentials.appPassword]]) {
      const exists = await this.superuserQuery(`SELECT 1 FROM pg_roles WHERE rolname = ${literal(role)}`);
      const verb = exists.rowCount ? 'ALTER' : 'CREATE';
      await this.superuserQuery(`${verb} ROLE "${role}" WITH LOGIN PASSWORD ${literal(password)}`);
    }
    const dbExists = await this.superuserQuery(`SELECT 1 FROM pg_database WHERE datname = ${literal(database)}`);
    if (!dbExists.rowCount) {
      await this.superuserQuery(`CREATE DATABASE "${database}" OWNER "${credentials.ownerUser}" ENCODING 'UTF8' TEMPLATE template0`);
    }
    await this.superuserQuery(`GRANT CONNECT ON DATABASE "${database}" TO "${credentials.appUser}"`);
    return credentials;
  }
}

export function databaseUrl(credentials: DatabaseCredentials, as: 'owner' | 'app'): string {
  const user = as === 'owner' ? credentials.ownerUser : credentials.appUser;
  const password = as === 'owner' ? credentials.ownerPassword : credentials.appPassword;
  return `postgres://${encodeURIComponent(user)}:${encodeURIComponent(password)}@${credentials.host}:${credentials.port}/${credentials.database}`;
}
