// Mails the discrepancy report to the site's purchasing users and the supplier's order address, after the commit.
import { Op } from 'sequelize';
import { Shipment, Supplier, User, UserSite } from '../../database/models/index.js';
import { outcomeLabels } from '../../shared/receiving/arrival-checks.js';
import type { ShipmentView } from '../../shared/receiving/shipment-view.js';
import type { AppContext } from '../app-context.js';
import { PhotoStore } from '../photos/photo-store.js';
import { discrepancyReportPdf } from './discrepancy-report.js';
import { loadShipmentView } from './shipment-views.js';
import { formatSiteTime } from '../pdf/site-time.js';

export async function reportRecipients(shipment: ShipmentView): Promise<string[]> {
  const onSite = (await UserSite.findAll({ where: { siteId: shipment.siteId }, attributes: ['userId'] })).map((row) => row.userId);
  const purchasing = await User.findAll({
    where: { active: true, roles: { [Op.contains]: ['purchasing'] }, [Op.or]: [{ allSites: true }, { id: onSite }] },
    attributes: ['email'],
    order: [['email', 'ASC']],
  });
  const supplier = shipment.supplierId === null ? null : await Supplier.findByPk(shipment.supplierId, { attributes: ['orderEmail'] });
  return [...new Set([...purchasing.map((user) => user.email), ...(supplier ? [supplier.orderEmail] : [])])];
}

export function reportFileName(shipmentId: number): string {
  return `shipment-${shipmentId}-discrepancy-report.pdf`;
}

function mailText(shipment: ShipmentView): string {
  const held = shipment.lines.filter((line) => line.holds.length);
  return [
    `Shipment ${shipment.id} arrived at ${shipment.siteName} on ${formatSiteTime(shipment.arrivedAt, shipment.siteTimeZone)}` +
      `${shipment.supplierName ? ` from ${shipment.supplierName}` : ''}${shipment.purchaseOrderReference ? ` (order ${shipment.purchaseOrderReference})` : ''}.`,
    `Outcome: ${outcomeLabels[shipment.outcome]}.`,
    '',
    'Findings:',
    ...shipment.discrepancies.map((d) => `- ${d.message}`),
    ...shipment.warnings.map((w) => `- Note: ${w.message}`),
    ...(held.length
      ? ['', 'Held "do not use" until the flock veterinarian decides (the product label governs):', ...held.map((l) => `- Lot ${l.lotNumber}, ${l.label}`)]
      : []),
    '',
    'The attached report has the checks, the lines and the photos.',
    'Sent by Vialyard on behalf of the receiving team.',
  ].join('\n');
}

/** Sends the report; returns the addresses it went to (none when the mail server refused it). */
export async function mailDiscrepancyReport(context: AppContext, shipmentId: number): Promise<string[]> {
  try {
    const shipment = await loadShipmentView(shipmentId);
    const to = await reportRecipients(shipment);
    const pdf = await discrepancyReportPdf(shipment, new PhotoStore(context.config.UPLOADS_DIR));
    const sent = await context.mailer.send({
      to,
      subject: `Discrepancy report: shipment ${shipment.id} at ${shipment.siteName} (${outcomeLabels[shipment.outcome].toLowerCase()})`,
      text: mailText(shipment),
      attachments: [{ filename: reportFileName(shipment.id), content: pdf, contentType: 'application/pdf' }],
    });
    if (!sent) return [];
    await Shipment.update({ reportMailedAt: new Date(), reportMailedTo: to }, { where: { id: shipmentId } });
    return to;
  } catch (error) {
    // The shipment is already committed; a report that cannot be made now can be mailed again from its page.
    context.logger.error({ err: error, shipmentId }, 'discrepancy report not mailed');
    return [];
  }
}
