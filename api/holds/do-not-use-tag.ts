// The printable "do not use" tag for a held lot: lot, product, causes, since when, and who to ask.
import { Op } from 'sequelize';
import { Lot, Presentation, Product, Site, User, UserSite } from '../../database/models/index.js';
import { AppError } from '../http/app-error.js';
import { addPageFooters, createPdf, pdfFonts, pdfToBuffer } from '../pdf/pdf-document.js';
import { formatSiteTime } from '../pdf/site-time.js';
import { undecidedHoldsByLot } from '../lots/holds.js';
import { lotSiteId } from '../exposure/lot-exposure-service.js';

const causeWords: Record<string, string> = {
  arrival: 'arrived outside its range',
  excursion: 'fridge excursion',
  freeze: 'possible freezing',
  transfer: 'too long out of a fridge',
  return: 'returned from a vaccination',
  recall: 'recall',
};

/** Veterinarians who can see the lot's site: the people to ask. */
async function veterinariansFor(siteId: number): Promise<User[]> {
  const limited = (await UserSite.findAll({ where: { siteId } })).map((row) => row.userId);
  return User.findAll({
    where: { active: true, roles: { [Op.contains]: ['veterinarian'] }, [Op.or]: [{ allSites: true }, { id: limited }] },
    order: [['name', 'ASC']],
  });
}

export async function doNotUseTag(lotId: number, now = new Date()): Promise<{ fileName: string; pdf: Buffer }> {
  const lot = await Lot.findByPk(lotId, { include: [{ model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] }] });
  const product = lot?.presentation?.product;
  const siteId = await lotSiteId(lotId);
  if (!lot || !product || siteId === null) throw AppError.notFound('No such lot.');
  const holds = (await undecidedHoldsByLot([lotId])).get(lotId) ?? [];
  if (!holds.length) throw AppError.conflict('This lot has no undecided hold, so it needs no "do not use" tag.');
  const site = (await Site.findByPk(siteId))!;
  const vets = await veterinariansFor(siteId);
  const since = holds.map((h) => h.openedAt).sort()[0];

  const doc = createPdf({ title: `Do not use: lot ${lot.lotNumber}`, subject: 'Lot on hold' });
  const width = doc.page.width - 100;
  doc.rect(50, 50, width, 90).fill('#8c1d18');
  doc.fillColor('#ffffff').font(pdfFonts.bold).fontSize(44).text('DO NOT USE', 50, 68, { width, align: 'center' });
  doc.fillColor('#1a1a1a').font(pdfFonts.semibold).fontSize(20).text(`Lot ${lot.lotNumber}`, 50, 170);
  doc.font(pdfFonts.regular).fontSize(14)
    .text(`${product.name}, ${lot.presentation!.dosesPerVial.toLocaleString('en-US')} doses per vial`)
    .text(`Expiry ${lot.expiry}`)
    .text(`Site ${site.name}`)
    .moveDown()
    .font(pdfFonts.semibold).text('On hold because')
    .font(pdfFonts.regular);
  for (const hold of holds) doc.text(`• ${causeWords[hold.cause] ?? hold.cause}${hold.reason ? `: ${hold.reason}` : ''}`);
  doc.moveDown().text(`On hold since ${formatSiteTime(since, site.timeZone)}`);
  doc.moveDown().font(pdfFonts.semibold).text('Ask before using or discarding')
    .font(pdfFonts.regular).text(vets.length ? vets.map((v) => `${v.name} (${v.email})`).join('\n') : 'The flock veterinarian');
  doc.moveDown(2).fontSize(11).fillColor('#333333')
    .text('Keep these vials in the fridge at proper temperature. Do not discard them unless the veterinarian directs it. '
      + 'The veterinarian decides; the product label and local rules apply.');
  addPageFooters(doc, `Do-not-use tag · lot ${lot.lotNumber}`, { at: now, timeZone: site.timeZone });
  return { fileName: `do-not-use-${lot.lotNumber}.pdf`, pdf: await pdfToBuffer(doc) };
}
