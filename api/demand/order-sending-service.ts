// Sends a purchase order to its supplier (PDF attached, through the mail server) and records the sending; creates one from suggestions first.
import { Presentation, Product, PurchaseOrder, PurchaseOrderSending, Site, Supplier, User } from '../../database/models/index.js';
import type { SentOrderView } from '../../shared/demand/sent-order-view.js';
import type { PurchaseOrderInput } from '../../shared/receiving/purchase-order-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { siteToday } from '../flocks/site-today.js';
import { AppError } from '../http/app-error.js';
import { createPurchaseOrder, loadPurchaseOrderView } from '../purchase-orders/purchase-orders-service.js';
import { withSendings } from './order-sendings.js';
import { purchaseOrderPdf, type OrderPdfData } from './purchase-order-pdf.js';

function storageText(product: Product): string {
  const unit = product.storageUnit === 'F' ? '°F' : '°C';
  return `${product.name}: store at ${product.storageLow}–${product.storageHigh} ${unit} (label)`;
}

async function pdfData(orderId: number, actorId: number): Promise<{ data: OrderPdfData; to: string }> {
  const view = await loadPurchaseOrderView(orderId);
  if (view.status !== 'open') throw AppError.conflict(`This order is ${view.status}; only open orders are sent.`);
  const order = (await PurchaseOrder.findByPk(orderId, { include: [{ model: Supplier, as: 'supplier' }, { model: Site, as: 'site' }] }))!;
  const presentations = new Map(
    (await Presentation.findAll({ where: { id: view.lines.map((l) => l.presentationId) }, include: [{ model: Product, as: 'product' }] })).map((p) => [p.id, p]),
  );
  const actor = (await User.findByPk(actorId))!;
  return {
    to: order.supplier!.orderEmail,
    data: {
      reference: view.reference,
      issuedOn: siteToday(order.site!),
      expectedDate: view.expectedDate,
      siteName: view.siteName,
      siteCode: order.site!.code,
      siteTimeZone: order.site!.timeZone,
      supplierName: view.supplierName,
      supplierEmail: order.supplier!.orderEmail,
      orderedBy: { name: actor.name, email: actor.email },
      carrier: view.carrier,
      notes: view.notes,
      lines: view.lines.map((line) => {
        const presentation = presentations.get(line.presentationId)!;
        return {
          label: line.label,
          packs: line.packs,
          vials: line.vials,
          doses: line.vials * presentation.dosesPerVial,
          unitPrice: presentation.unitPrice,
          storage: storageText(presentation.product!),
        };
      }),
    },
  };
}

export async function renderPurchaseOrderPdf(orderId: number, actorId: number): Promise<{ reference: string; pdf: Buffer }> {
  const { data } = await pdfData(orderId, actorId);
  return { reference: data.reference, pdf: await purchaseOrderPdf(data) };
}

function mailText(data: OrderPdfData): string {
  const lines = data.lines.map((line) => `  - ${line.label}: ${line.packs} pack${line.packs === 1 ? '' : 's'} (${line.vials} vials, ${line.doses.toLocaleString('en-US')} doses)`);
  return [
    `Hello ${data.supplierName},`,
    '',
    `Please find attached purchase order ${data.reference} from ${data.siteName}, to be delivered by ${data.expectedDate}:`,
    '',
    ...lines,
    '',
    'Please ship refrigerated with coolant, never frozen. Each shipment is checked cold on arrival.',
    `Please confirm the order and its delivery date by replying to ${data.orderedBy.email}.`,
    '',
    data.orderedBy.name,
    data.siteName,
  ].join('\n');
}

/** The mail goes first; the sending is then recorded with whether the mail server took it, so a failure can be sent again. */
export async function sendPurchaseOrder(context: AppContext, actorId: number, orderId: number): Promise<SentOrderView> {
  const { data, to } = await pdfData(orderId, actorId);
  const pdf = await purchaseOrderPdf(data);
  const mailed = await context.mailer.send({
    to: [to],
    subject: `Purchase order ${data.reference} from ${data.siteName}`,
    text: mailText(data),
    attachments: [{ filename: `purchase-order-${data.reference}.pdf`, content: pdf, contentType: 'application/pdf' }],
  });
  await context.sequelize.transaction(async (transaction) => {
    const sending = await PurchaseOrderSending.create({ purchaseOrderId: orderId, sentTo: to, mailed, pdfBytes: pdf.length, sentBy: actorId }, { transaction });
    await recordAudit({ actorId, action: 'purchase_order.send', entity: 'purchase_order', entityId: orderId, after: sending.get({ plain: true }) }, transaction);
  });
  const [view] = await withSendings([await loadPurchaseOrderView(orderId)]);
  return view!;
}

/** The order is created by receiving's own service (same checks as one entered by hand), then sent. */
export async function createAndSendOrder(context: AppContext, actorId: number, siteId: number, input: PurchaseOrderInput): Promise<SentOrderView> {
  const order = await createPurchaseOrder(context, actorId, siteId, input);
  return sendPurchaseOrder(context, actorId, order.id);
}
