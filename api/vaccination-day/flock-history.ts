// A flock's vaccination history from the signed records, as rows, CSV and a PDF record for audits.
import { QueryTypes } from 'sequelize';
import { Flock, House, Site } from '../../database/models/index.js';
import { cleaningItems } from '../../shared/vaccination-day/day-schemas.js';
import { historyCsv, type HistoryRow } from '../../shared/vaccination-day/history-csv.js';
import { usesSprayer } from '../../shared/vaccination-day/sprayer.js';
import type { AppContext } from '../app-context.js';
import { AppError } from '../http/app-error.js';
import { addPageFooters, createPdf, pdfFonts, pdfToBuffer } from '../pdf/pdf-document.js';
import { formatSiteTime } from '../pdf/site-time.js';
import { recordSignatureMeaning } from './record-service.js';

interface RecordRow {
  id: number;
  planned_date: string;
  product_name: string;
  route: string;
  hatch_date: string;
  birds_vaccinated: number;
  started_at: Date;
  ended_at: Date;
  crew: { name: string; lead: boolean }[];
  deviations: string;
  cleaning: Record<string, boolean>;
  signer_name: string;
  signed_at: Date;
}

export async function flockHistory(context: AppContext, flockId: number): Promise<{ flock: Flock; site: Site; rows: (HistoryRow & { cleaning: Record<string, boolean> })[] }> {
  const flock = await Flock.findByPk(flockId);
  if (!flock) throw AppError.notFound('No such flock.');
  const site = (await Site.findByPk((await House.findByPk(flock.houseId))!.siteId))!;
  const records = await context.sequelize.query<RecordRow>(
    `SELECT r.*, v.planned_date, v.route, p.name AS product_name, f.hatch_date
     FROM vaccination_records r JOIN vaccinations v ON v.id = r.vaccination_id JOIN products p ON p.id = v.product_id JOIN flocks f ON f.id = v.flock_id
     WHERE v.flock_id = :flockId ORDER BY v.planned_date, r.id`,
    { replacements: { flockId }, type: QueryTypes.SELECT },
  );
  const lots = await context.sequelize.query<{ record_id: number; lot_number: string; vials_used: number; doses_used: number; vials_returned: number }>(
    `SELECT rl.record_id, l.lot_number, rl.vials_used, rl.doses_used, rl.vials_returned FROM vaccination_record_lots rl JOIN lots l ON l.id = rl.lot_id
     WHERE rl.record_id IN (:ids) ORDER BY l.lot_number`,
    { replacements: { ids: records.length ? records.map((r) => r.id) : [0] }, type: QueryTypes.SELECT },
  );
  const rows = records.map((r) => ({
    date: r.planned_date,
    product: r.product_name,
    route: r.route,
    ageDays: Math.round((Date.parse(r.planned_date) - Date.parse(r.hatch_date)) / 86_400_000),
    birdsVaccinated: r.birds_vaccinated,
    lots: lots.filter((l) => l.record_id === r.id).map((l) => ({ lotNumber: l.lot_number, vialsUsed: l.vials_used, dosesUsed: l.doses_used, vialsReturned: l.vials_returned })),
    startedAt: r.started_at.toISOString(),
    endedAt: r.ended_at.toISOString(),
    crewLead: r.crew.find((c) => c.lead)?.name ?? r.signer_name,
    crew: r.crew.filter((c) => !c.lead).map((c) => c.name),
    deviations: r.deviations,
    signedAt: r.signed_at.toISOString(),
    cleaning: r.cleaning,
  }));
  return { flock, site, rows };
}

export async function flockHistoryCsv(context: AppContext, flockId: number): Promise<{ fileName: string; csv: string }> {
  const { flock, rows } = await flockHistory(context, flockId);
  return { fileName: `vaccinations-${flock.name.replace(/[^A-Za-z0-9-]+/g, '-')}.csv`, csv: historyCsv(rows) };
}

export async function flockHistoryPdf(context: AppContext, flockId: number, now = new Date()): Promise<{ fileName: string; pdf: Buffer }> {
  const { flock, site, rows } = await flockHistory(context, flockId);
  const time = (iso: string) => formatSiteTime(iso, site.timeZone);
  const doc = createPdf({ title: `Vaccination record: flock ${flock.name}`, subject: 'Vaccination history for audits' });
  doc.font(pdfFonts.bold).fontSize(20).text('Vaccination record');
  doc.font(pdfFonts.regular).fontSize(12).text(`Flock ${flock.name} · ${site.name} · hatched ${flock.hatchDate} · placed ${flock.placementDate} · ${flock.birdsPlaced.toLocaleString('en-US')} birds placed`);
  if (!rows.length) doc.moveDown().text('No vaccination has been recorded for this flock yet.');
  for (const row of rows) {
    doc.moveDown().font(pdfFonts.semibold).fontSize(13).text(`${row.date} · ${row.product} (${row.route.replace('_', ' ')}) · age ${row.ageDays} days`);
    doc.font(pdfFonts.regular).fontSize(11)
      .text(`Birds vaccinated: ${row.birdsVaccinated.toLocaleString('en-US')}    From ${time(row.startedAt)} to ${time(row.endedAt)}`)
      .text(`Lots: ${row.lots.map((l) => `${l.lotNumber} (${l.vialsUsed} vials used, ${l.dosesUsed.toLocaleString('en-US')} doses; ${l.vialsReturned} returned)`).join('; ') || 'none'}`)
      .text(`Crew lead: ${row.crewLead}${row.crew.length ? `; crew: ${row.crew.join(', ')}` : ''}`);
    // The cleaning checklist is the sprayer's: a vaccination by any other route used none, so "NOT done" would be false.
    if (usesSprayer(row.route)) doc.text(`Sprayer cleaning: ${Object.entries(cleaningItems).map(([item, label]) => `${label}: ${row.cleaning[item] ? 'done' : 'NOT done'}`).join('; ')}`);
    doc.text(`Deviations: ${row.deviations || 'none'}`)
      .text(`Signed by ${row.crewLead} on ${time(row.signedAt)}: "${recordSignatureMeaning}"`);
  }
  addPageFooters(doc, `Vaccination record · flock ${flock.name}`, { at: now, timeZone: site.timeZone });
  return { fileName: `vaccination-record-${flock.name.replace(/[^A-Za-z0-9-]+/g, '-')}.pdf`, pdf: await pdfToBuffer(doc) };
}
