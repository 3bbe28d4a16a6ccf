// Every malformed logger file of the corpus (test/fixtures/bad-logs) through the real upload API of a server in its own process:
// the expected answer for each, the rows stored, never a 5xx, the server up throughout and under 512 MB resident.
import { expect } from 'chai';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { projectRoot } from '../../../database/scripts/runtime-dir.js';
import type { Logger } from '../../../database/models/index.js';
import { badLogGenerators } from '../../support/bad-log-generators.js';
import { createFridge, createLogger } from '../../support/fridge-fixtures.js';
import { RssWatch, signInRemote, type RemoteSession } from '../../support/remote-session.js';
import { freePort, startServerProcess, type ServerProcess } from '../../support/server-process.js';
import { createSite, createTestUser, testApp, testConfig } from '../../support/test-app.js';
import { ownerConnection, resetDatabase } from '../../support/test-database.js';

interface CorpusEntry {
  file?: string;
  generate?: string;
  outcome: 'fatal' | 'recoverable';
  problem?: string;
  stored?: number;
  warningLines?: number[];
  warningCount?: number;
  firstWarningLines?: number[];
  mapping?: object;
  unit?: 'F' | 'C';
  why: string;
}

const corpusDir = join(projectRoot, 'test/fixtures/bad-logs');
const manifest = JSON.parse(readFileSync(join(corpusDir, 'manifest.json'), 'utf8')) as { files: CorpusEntry[] };
const MEMORY_CEILING = 512 * 1024 * 1024;

const nameOf = (entry: CorpusEntry) => entry.file ?? `${entry.generate}.csv`;
const contentOf = (entry: CorpusEntry) => (entry.file ? readFileSync(join(corpusDir, entry.file)) : badLogGenerators[entry.generate!]());

async function countFor(table: 'readings' | 'log_imports', loggerId: number): Promise<number> {
  const [rows] = await ownerConnection().query(`SELECT count(*)::int AS n FROM ${table} WHERE logger_id = :loggerId`, { replacements: { loggerId } });
  return (rows as { n: number }[])[0].n;
}

const incomingDir = () => join(testConfig().UPLOADS_DIR, 'incoming');
const incomingFiles = () => (existsSync(incomingDir()) ? readdirSync(incomingDir()).length : 0);

describe('logger-file corpus through the import API of a separate server process', function () {
  this.timeout(120_000);
  let server: ServerProcess;
  let session: RemoteSession;
  let rss: RssWatch;
  const loggers = new Map<CorpusEntry, Logger>();
  let incomingAtStart = 0;

  before(async () => {
    testApp(); // models bind when the test process's context is made
    await resetDatabase();
    const site = await createSite('CORPUS', 'UTC');
    for (const entry of manifest.files) loggers.set(entry, await createLogger(await createFridge(site)));
    const user = await createTestUser({ roles: ['storage'] });
    incomingAtStart = incomingFiles();
    server = await startServerProcess(await freePort());
    rss = new RssWatch(server.child.pid!);
    session = await signInRemote(server.url, user.email);
  });
  after(async () => {
    rss?.stop();
    await server?.stop();
  });

  it('holds at least 30 files, each with an expected outcome', () => {
    expect(manifest.files.length).to.be.at.least(30);
    for (const entry of manifest.files) {
      expect(entry.file ?? badLogGenerators[entry.generate ?? ''], `${nameOf(entry)} exists`).to.not.equal(undefined);
      if (entry.file) expect(existsSync(join(corpusDir, entry.file)), entry.file).to.equal(true);
      expect(entry.outcome === 'fatal' ? entry.problem : entry.stored, nameOf(entry)).to.not.equal(undefined);
    }
  });

  for (const entry of manifest.files) {
    it(`${nameOf(entry)} (${entry.why}): ${entry.outcome === 'fatal' ? `422 "${entry.problem}", nothing stored` : `${entry.stored} stored`}`, async () => {
      const logger = loggers.get(entry)!;
      const content = contentOf(entry);
      const call = request(server.url).post(`/api/log-imports/loggers/${logger.id}`).set('Cookie', session.cookie).set('X-XSRF-TOKEN', session.csrf);
      if (entry.mapping) call.field('mapping', JSON.stringify(entry.mapping));
      const response = await call.attach('file', content, nameOf(entry));
      expect(response.status, `never a 5xx: ${JSON.stringify(response.body).slice(0, 300)}`).to.be.below(500);
      const kept = join(testConfig().UPLOADS_DIR, 'log-files', `${createHash('sha256').update(content).digest('hex')}.csv`);

      if (entry.outcome === 'fatal') {
        expect(response.status, JSON.stringify(response.body).slice(0, 300)).to.equal(422);
        expect(response.body.error.message).to.match(/^The file cannot be imported: /);
        expect(response.body.error.message).to.match(new RegExp(entry.problem!));
        expect(await countFor('readings', logger.id), 'no reading stored').to.equal(0);
        expect(await countFor('log_imports', logger.id), 'no import recorded').to.equal(0);
        expect(existsSync(kept), 'the file is not kept').to.equal(false);
      } else {
        expect(response.status, JSON.stringify(response.body).slice(0, 300)).to.equal(201);
        const result = response.body.import;
        expect(result.readingsStored).to.equal(entry.stored);
        expect(await countFor('readings', logger.id), 'rows in the readings table').to.equal(entry.stored);
        expect(await countFor('log_imports', logger.id)).to.equal(1);
        const lines = (result.warnings as { line: number; message: string }[]).map((w) => w.line);
        if (entry.warningLines) {
          expect(lines, 'one warning per bad line, naming it').to.deep.equal(entry.warningLines);
          expect(result.warningCount).to.equal(entry.warningLines.length);
        } else {
          expect(result.warningCount).to.equal(entry.warningCount);
          expect(lines.slice(0, entry.firstWarningLines!.length)).to.deep.equal(entry.firstWarningLines);
          expect(lines).to.have.length(500);
        }
        expect(result.rowsRead).to.equal(result.readingsStored + result.duplicates + result.conflicts + result.skipped);
        if (entry.unit) expect(result.unit).to.equal(entry.unit);
        expect(existsSync(kept), 'the original file is kept').to.equal(true);
      }
      expect(server.child.exitCode, 'the server is still running').to.equal(null);
      expect((await request(server.url).get('/api/health')).status).to.equal(200);
    });
  }

  it('leaves no upload behind in the incoming folder', async () => {
    // Each upload is removed right after its answer is sent.
    const deadline = Date.now() + 5_000;
    while (incomingFiles() > incomingAtStart && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 100));
    expect(incomingFiles()).to.equal(incomingAtStart);
  });

  it('keeps the server under 512 MB resident through the whole corpus', () => {
    const peak = rss.stop();
    expect(peak, 'RSS was sampled').to.be.above(0);
    console.log(`      peak resident memory of the server: ${(peak / 1024 / 1024).toFixed(1)} MB`);
    expect(peak).to.be.below(MEMORY_CEILING);
  });
});
