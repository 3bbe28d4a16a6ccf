// Finds the presentation a scanned GTIN belongs to, at pack or single-vial level, in a loaded catalogue.
import type { ProductView } from './product-schemas.js';
import type { PresentationView } from './presentation-schemas.js';

export interface GtinMatch {
  product: ProductView;
  presentation: PresentationView;
  level: 'pack' | 'vial';
}

export function findPresentationByGtin(products: readonly ProductView[], gtin: string): GtinMatch | null {
  for (const product of products) {
    for (const presentation of product.presentations) {
      if (presentation.packGtin === gtin) return { product, presentation, level: 'pack' };
      if (presentation.vialGtin === gtin) return { product, presentation, level: 'vial' };
    }
  }
  return null;
}
