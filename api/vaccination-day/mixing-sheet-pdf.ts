// The printable mixing sheet of one vaccination: vials per lot, doses, water, the use-within time, the cautions.
import { followLabel, mixingCautions } from '../../shared/vaccination-day/mixing-cautions.js';
import type { RunView } from '../../shared/vaccination-day/day-views.js';
import { addPageFooters, createPdf, pdfFonts, pdfToBuffer } from '../pdf/pdf-document.js';
import { formatSiteClock } from '../pdf/site-time.js';

const n = (value: number) => value.toLocaleString('en-US');

export async function mixingSheetPdf(run: RunView, now = new Date()): Promise<Buffer> {
  const clock = (iso: string) => formatSiteClock(iso, run.timeZone);
  const doc = createPdf({ title: `Mixing sheet: ${run.flockName}, ${run.plannedDate}`, subject: 'Vaccination day mixing sheet' });
  doc.font(pdfFonts.bold).fontSize(20).text('Mixing sheet');
  doc.font(pdfFonts.regular).fontSize(12)
    .text(`${run.siteName} · ${run.houseName} · flock ${run.flockName} · ${run.plannedDate}`)
    .text(`${run.productName} (${run.route.replace('_', ' ')}), flock age ${run.ageDays} days`)
    .moveDown(0.5)
    .text(`Birds: ${n(run.birds)}    Doses needed: ${n(run.dosesNeeded)}`);
  doc.moveDown().font(pdfFonts.semibold).text('Vials');
  doc.font(pdfFonts.regular);
  const lots = run.lotsOut.length
    ? run.lotsOut.map((l) => `Lot ${l.lotNumber}: ${l.out} vials out × ${n(l.dosesPerVial)} doses = ${n(l.out * l.dosesPerVial)} doses`)
    : run.lotsToTake.map((l) => `Lot ${l.lotNumber} (expiry ${l.expiry}): take ${l.vials} vials × ${n(l.dosesPerVial)} doses = ${n(l.doses)} doses`);
  for (const line of lots.length ? lots : ['No vials planned or issued yet.']) doc.text(`• ${line}`);
  doc.moveDown().font(pdfFonts.semibold).text('Water');
  doc.font(pdfFonts.regular).text(
    run.waterMl === null
      ? 'No water volume is recorded for this product and age: take it from the label or ask the veterinarian.'
      : `${n(run.waterMl)} mL (${n(run.waterMlPer1000!)} mL per 1,000 birds, from the ${run.waterSource === 'label' ? 'label' : 'veterinarian'}).`,
  );
  doc.moveDown().font(pdfFonts.semibold).text('Use within');
  doc.font(pdfFonts.regular).text(
    run.useWithinMinutes === null
      ? 'The label\'s use-within time is not recorded: read it on the label before mixing.'
      : `${run.useWithinMinutes} minutes from mixing${run.useBy ? ` (mixed ${clock(run.mixedAt!)}, use by ${clock(run.useBy)})` : '. Mixed at: ________  Use by: ________'}.`,
  );
  doc.moveDown().font(pdfFonts.semibold).text('Cautions');
  doc.font(pdfFonts.regular);
  for (const caution of mixingCautions) doc.text(`• ${caution}`);
  doc.moveDown().font(pdfFonts.bold).text(followLabel);
  addPageFooters(doc, `Mixing sheet · vaccination ${run.vaccinationId}`, { at: now, timeZone: run.timeZone });
  return pdfToBuffer(doc);
}
