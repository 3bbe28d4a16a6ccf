// Shapes catalogue rows for the API: suppliers, products with their presentations.
import type { ProductView } from '../../shared/catalogue/product-schemas.js';
import type { PresentationView } from '../../shared/catalogue/presentation-schemas.js';
import type { SupplierView } from '../../shared/catalogue/supplier-schemas.js';
import type { Presentation, Product, Supplier } from '../../database/models/index.js';

export function toSupplierView(supplier: Supplier): SupplierView {
  return { id: supplier.id, name: supplier.name, orderEmail: supplier.orderEmail, leadTimeDays: supplier.leadTimeDays, notes: supplier.notes };
}

export function toPresentationView(presentation: Presentation, proposers: ReadonlyMap<number, string> = new Map()): PresentationView {
  return {
    id: presentation.id,
    productId: presentation.productId,
    dosesPerVial: presentation.dosesPerVial,
    vialsPerPack: presentation.vialsPerPack,
    packGtin: presentation.packGtin,
    vialGtin: presentation.vialGtin,
    unitPrice: presentation.unitPrice,
    status: presentation.status,
    proposedBy: presentation.proposedBy === null ? null : (proposers.get(presentation.proposedBy) ?? null),
  };
}

export function toProductView(product: Product, proposers: ReadonlyMap<number, string> = new Map()): ProductView {
  return {
    id: product.id,
    name: product.name,
    maker: product.maker,
    kind: product.kind,
    route: product.route,
    storageLow: product.storageLow,
    storageHigh: product.storageHigh,
    storageUnit: product.storageUnit,
    freezeSensitive: product.freezeSensitive,
    useWithinMinutes: product.useWithinMinutes,
    timeOutLimitMinutes: product.timeOutLimitMinutes,
    withdrawalDays: product.withdrawalDays,
    notes: product.notes,
    status: product.status,
    presentations: [...(product.presentations ?? [])].sort((a, b) => a.dosesPerVial - b.dosesPerVial || a.id - b.id).map((p) => toPresentationView(p, proposers)),
  };
}
