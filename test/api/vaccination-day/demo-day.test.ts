// The demo's vaccination day (database/seeders/demo-vaccination-day.ts): what `npm start` shows the crew lead and the veterinarian.
import { expect } from 'chai';
import type { Test } from 'supertest';
import { demoAccounts } from '../../../database/seeders/demo-scenario.js';
import { Flock, Site } from '../../../database/models/index.js';
import { signIn } from '../../support/test-app.js';
import { seedDemoForSuite } from '../../support/demo-seed.js';
import { siteDay } from '../../support/flock-fixtures.js';
import { pdfText } from '../../support/pdf-pages.js';

const binary = ((res: NodeJS.ReadableStream, done: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}) as unknown as Parameters<Test['parse']>[0];

const account = (email: string) => demoAccounts.find((a) => a.email === email)!;

describe('demo data: the vaccination day', function () {
  this.timeout(60_000);
  seedDemoForSuite('demo-day');

  it('gives the crew lead today’s sheet with a vaccination on each site, water entered and vials to take', async () => {
    const crew = account('crew@larkmoor.example');
    const lead = await signIn(crew.email, crew.password);
    const north = (await Site.findOne({ where: { code: 'LKN' } }))!;
    const sheet = await lead.agent.get(`/api/vaccination-day/sheet?day=${siteDay(north, 0)}`).expect(200);
    expect(sheet.body.leadName).to.equal(crew.name);
    expect(sheet.body.entries.map((e: { siteName: string }) => e.siteName).sort()).to.deep.equal(['Fennel Creek (pullets)', 'Larkmoor North (layers)']);
    for (const entry of sheet.body.entries) {
      expect(entry.status).to.equal('confirmed');
      expect(entry.waterMl, `${entry.flockName} water`).to.be.a('number').greaterThan(0);
      // Every dose is either in a fridge to take or named as awaited from an order: none go missing.
      const planned = [...entry.lotsToTake, ...entry.awaited].reduce((sum: number, l: { doses: number }) => sum + l.doses, 0);
      expect(planned + entry.shortfallDoses, entry.flockName).to.be.at.least(entry.dosesNeeded);
    }
    expect(sheet.body.entries.some((e: { lotsToTake: unknown[] }) => e.lotsToTake.length > 0)).to.equal(true);
  });

  it('has a finished, signed vaccination in a pullet flock’s history (CSV and PDF)', async () => {
    const vet = account('vet@larkmoor.example');
    const agent = await signIn(vet.email, vet.password);
    const flock = (await Flock.findOne({ where: { name: 'PA-2026-03' } }))!;
    const csv = await agent.agent.get(`/api/vaccination-day/flocks/${flock.id}/history.csv`).expect(200);
    const lines = csv.text.trim().split(/\r?\n/);
    expect(lines).to.have.length(2);
    expect(lines[1]).to.include('Fernhollow IB drinking-water vaccine').and.include('FIB1203').and.include('Joel Brandt');
    const pdf = await agent.agent.get(`/api/vaccination-day/flocks/${flock.id}/history.pdf`).buffer(true).parse(binary).expect(200);
    expect(pdf.headers['content-type']).to.match(/application\/pdf/);
    // A drinking-water vaccination: the sprayer's cleaning steps do not belong in its record.
    const text = pdfText(pdf.body as Buffer).replace(/\s+/g, ' ');
    expect(text).to.include('(drinking water)');
    expect(text).to.not.include('Sprayer').and.not.include('NOT done');
    const leads = await agent.agent.get(`/api/vaccination-day/leads?day=${siteDay((await Site.findOne({ where: { code: 'FCP' } }))!, 0)}`).expect(200);
    expect(leads.body.items.map((l: { name: string }) => l.name)).to.deep.equal(['Joel Brandt']);
  });
});
