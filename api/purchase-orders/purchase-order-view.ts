// Shapes a purchase order for the API, with each line's label and vials, and whether it is due on the site's calendar.
import { presentationLabel } from '../../shared/catalogue/presentation-label.js';
import type { PurchaseOrderView } from '../../shared/receiving/purchase-order-schemas.js';
import { dueState, siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { Presentation, Product, PurchaseOrder, PurchaseOrderLine, Site, Supplier } from '../../database/models/index.js';

export const purchaseOrderIncludes = [
  { model: Supplier, as: 'supplier' },
  { model: Site, as: 'site' },
  {
    model: PurchaseOrderLine,
    as: 'lines',
    include: [{ model: Presentation, as: 'presentation', include: [{ model: Product, as: 'product' }] }],
  },
];

export function toPurchaseOrderView(order: PurchaseOrder, now = new Date()): PurchaseOrderView {
  const site = order.site!;
  return {
    id: order.id,
    siteId: order.siteId,
    siteName: site.name,
    supplierId: order.supplierId,
    supplierName: order.supplier?.name ?? '',
    reference: order.reference,
    expectedDate: order.expectedDate,
    carrier: order.carrier,
    trackingNumber: order.trackingNumber,
    notes: order.notes,
    status: order.status,
    due: order.status === 'open' ? dueState(order.expectedDate, siteLocalDate(now, site.timeZone)) : null,
    lines: [...(order.lines ?? [])]
      .sort((a, b) => a.lineNo - b.lineNo)
      .map((line) => {
        const presentation = line.presentation!;
        return {
          id: line.id,
          presentationId: line.presentationId,
          label: presentationLabel(presentation.product!.name, presentation),
          packs: line.packs,
          vials: line.packs * presentation.vialsPerPack,
        };
      }),
  };
}
