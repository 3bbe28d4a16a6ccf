// The discrepancy report: mailed to the site's purchasing users and the supplier with the PDF attached; its text and first page checked.
import { expect } from 'chai';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { Shipment } from '../../../database/models/index.js';
import { discrepancyReportPdf } from '../../../api/shipments/discrepancy-report.js';
import { loadShipmentView } from '../../../api/shipments/shipment-views.js';
import type { PhotoStore } from '../../../api/photos/photo-store.js';
import { resetDatabase } from '../../support/test-database.js';
import { caughtMail, clearCaughtMail } from '../../support/mail-catcher.js';
import { createSite, createTestUser, signInAs, testContext } from '../../support/test-app.js';
import { createCatalogue, createFridge, createPurchaseOrder, lineInput, makeJpeg, postShipment, shipmentInput } from '../../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../../support/receiving-state.js';

function pdfText(pdf: Buffer): string {
  const dir = mkdtempSync(join(tmpdir(), 'vy-report-'));
  writeFileSync(join(dir, 'report.pdf'), pdf);
  execFileSync('pdftotext', ['-layout', join(dir, 'report.pdf'), join(dir, 'report.txt')]);
  return readFileSync(join(dir, 'report.txt'), 'utf8');
}

async function firstPage(pdf: Buffer): Promise<Buffer> {
  const dir = mkdtempSync(join(tmpdir(), 'vy-report-'));
  writeFileSync(join(dir, 'report.pdf'), pdf);
  execFileSync('pdftoppm', ['-png', '-r', '60', '-f', '1', '-l', '1', join(dir, 'report.pdf'), join(dir, 'page')]);
  return readFileSync(join(dir, 'page-1.png'));
}

describe('the discrepancy report', () => {
  // Registers the models first, so the file also runs alone or first.
  before(() => void testContext());
  beforeEach(async () => {
    await resetDatabase();
    clearCaughtMail();
    clearPhotoFiles();
  });

  async function receiveWithDamage() {
    const site = await createSite('NORTH');
    const other = await createSite('SOUTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const catalogue = await createCatalogue({ name: 'Brightwing spray vaccine', supplierEmail: 'orders@coldline.example' });
    const order = await createPurchaseOrder(site, catalogue);
    await createTestUser({ email: 'buyer.north@test.example', roles: ['purchasing'], sites: [site] });
    await createTestUser({ email: 'buyer.all@test.example', roles: ['purchasing'] });
    await createTestUser({ email: 'buyer.south@test.example', roles: ['purchasing'], sites: [other] });
    await createTestUser({ email: 'gone@test.example', roles: ['purchasing'], active: false });
    const clerk = await signInAs(['receiving'], [site]);
    const lines = [
      lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id, lotNumber: 'BW2207', expiry: '2028-05', expected: 20, broken: 2, missing: 1 }),
      lineInput({ presentationId: catalogue.presentation.id, fridgeId: null, lotNumber: 'BW2208', expected: 10, accepted: false }),
    ];
    const response = await postShipment(clerk, site.id, shipmentInput(lines, { purchaseOrderId: order.id, outcome: 'accepted_with_discrepancies', reading: { value: 51, unit: 'F', place: 'shipping_monitor' } }), [
      { content: await makeJpeg(900, 600), name: 'crushed-corner.jpg' },
    ]);
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    return { clerk, shipment: response.body, order };
  }

  it('is mailed once, to the purchasing users of the site and the supplier, with the PDF attached', async () => {
    const { shipment } = await receiveWithDamage();
    const mail = await caughtMail();
    expect(mail).to.have.length(1);
    const [message] = mail;
    const to = (Array.isArray(message!.to) ? message!.to : [message!.to]).flatMap((a) => a!.value.map((v) => v.address)).sort();
    expect(to).to.deep.equal(['buyer.all@test.example', 'buyer.north@test.example', 'orders@coldline.example']);
    expect(message!.subject).to.match(new RegExp(`shipment ${shipment.id} at Site NORTH`));
    expect(message!.text).to.match(/2 vial\(s\) broken or damaged/);
    expect(message!.text).to.match(/until the flock veterinarian decides/);
    const [attachment] = message!.attachments;
    expect(attachment!.contentType).to.equal('application/pdf');
    expect(attachment!.filename).to.equal(`shipment-${shipment.id}-discrepancy-report.pdf`);
    expect(attachment!.content.subarray(0, 5).toString()).to.equal('%PDF-');
    const stored = await Shipment.findByPk(shipment.id);
    expect(stored!.reportMailedTo).to.have.members(['buyer.all@test.example', 'buyer.north@test.example', 'orders@coldline.example']);
  });

  it('holds the shipment, the checks, the lines with their differences and the hold, as a PDF text extractor reads it', async () => {
    const { clerk, shipment, order } = await receiveWithDamage();
    const response = await clerk.agent.get(`/api/shipments/${shipment.id}/report`).buffer(true).parse((res, callback) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => callback(null, Buffer.concat(chunks)));
    });
    expect(response.status).to.equal(200);
    expect(response.headers['content-type']).to.equal('application/pdf');
    const text = pdfText(response.body as Buffer);
    for (const expected of [
      `Shipment ${shipment.id} at Site NORTH`,
      'Accepted with discrepancies',
      order.reference,
      'Brightwing spray vaccine',
      'BW2207',
      'BW2208',
      'Refused',
      'ON HOLD',
      '51 °F is above Brightwing spray vaccine',
      '51 °F, shipping monitor in the box',
      'do not use them until the flock veterinarian decides',
      'Photos (1)',
    ]) {
      expect(text, expected).to.include(expected);
    }
    // The first line's row: expected 20, intact 17, broken 2, missing 1, difference -3 (hand-computed).
    // A month/year expiry prints as the label gives it.
    expect(text).to.match(/BW2207\s+2028-05\s+20\s+17\s+2\s+1\s+-3/);

    const png = await firstPage(response.body as Buffer);
    const stats = await sharp(png).stats();
    // A blank page is one flat colour; ours has text and ruled tables, so its channels vary.
    expect(stats.channels[0]!.stdev).to.be.above(10);
    expect(stats.channels[0]!.min).to.be.below(80);
  });

  it('keeps the closing caution on the page of the held lots before it, wherever the page ends', async function () {
    this.timeout(60_000);
    const { shipment } = await receiveWithDamage();
    const view = await loadShipmentView(shipment.id);
    // Without the refused line, the findings and the photos the held lots end the first page with a few lines to
    // spare; longer and longer notes (a line each step, shorter than the caution's two) push them past its end.
    const base = { ...view, lines: view.lines.filter((line) => line.holds.length), discrepancies: [], warnings: [], photos: [] };
    const placements: number[] = [];
    for (let lines = 0; lines <= 10; lines++) {
      const notes = Array.from({ length: lines }, (_, i) => `Note line ${i + 1}.`).join('\n');
      const pages = pdfText(await discrepancyReportPdf({ ...base, notes }, {} as PhotoStore, new Date('2026-12-04T18:58:00Z'))).split('\f');
      const pageOf = (needle: string) => pages.findIndex((page) => page.includes(needle));
      const heading = pageOf('Lots on hold: do not use');
      expect(heading, `${lines} lines of notes`).to.be.at.least(0);
      for (const part of ['Lot BW2207 (', 'Keep these vials refrigerated', 'govern; Vialyard only records.']) {
        expect(pageOf(part), `${lines} lines of notes: "${part}"`).to.equal(heading);
      }
      placements.push(heading);
    }
    // The sweep crossed the page end: the block sat on the first page, then whole on the second.
    expect(placements[0]).to.equal(0);
    expect(placements[placements.length - 1]).to.equal(1);
  });

  it('ends every page with the one footer wording, on the site’s clock', async () => {
    const { shipment } = await receiveWithDamage();
    const view = await loadShipmentView(shipment.id);
    const text = pdfText(await discrepancyReportPdf({ ...view, photos: [] }, {} as PhotoStore, new Date('2026-12-04T18:58:00Z')));
    // 18:58 UTC is 12:58 CST in Chicago (hand-converted).
    expect(text).to.contain(`Discrepancy report · shipment ${shipment.id} · Made by Vialyard on 2026-12-04 12:58 CST`);
    expect(text).to.not.match(/UTC|generated/);
  });

  it('can be mailed again from the shipment page', async () => {
    const { clerk, shipment } = await receiveWithDamage();
    clearCaughtMail();
    const response = await clerk.agent.post(`/api/shipments/${shipment.id}/report/mail`).set('X-XSRF-TOKEN', clerk.csrf);
    expect(response.status).to.equal(200);
    expect(await caughtMail()).to.have.length(1);
  });

  it('is not mailed for a clean shipment', async () => {
    const site = await createSite('NORTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const catalogue = await createCatalogue();
    await createTestUser({ roles: ['purchasing'] });
    const clerk = await signInAs(['receiving'], [site]);
    const response = await postShipment(clerk, site.id, shipmentInput([lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id })]));
    expect(response.status).to.equal(201);
    expect(await caughtMail()).to.have.length(0);
  });
});
