// The catalogue for purchasing and admins: products with their packs, barcodes proposed at receiving to confirm, suppliers.
import { CurrencyPipe, DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import { MatTabsModule } from '@angular/material/tabs';
import { productKindLabels, productRouteLabels } from '@shared/catalogue/product-kinds.js';
import type { PresentationView } from '@shared/catalogue/presentation-schemas.js';
import type { ProductView } from '@shared/catalogue/product-schemas.js';
import type { SupplierView } from '@shared/catalogue/supplier-schemas.js';
import { RouterLink } from '@angular/router';
import { AuthStore } from '../../core/auth/auth-store';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { PresentationDialog, type PresentationDialogData } from './presentation-dialog';
import { ProductDialog } from './product-dialog';
import { SupplierDialog } from './supplier-dialog';

@Component({
  selector: 'vy-catalogue',
  imports: [MatTabsModule, MatTableModule, MatButtonModule, MatIconModule, MatFormFieldModule, MatInputModule, MatSlideToggleModule, RouterLink, DecimalPipe, CurrencyPipe],
  templateUrl: './catalogue.html',
  styleUrl: './catalogue.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Catalogue {
  private readonly api = inject(CatalogueApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  /** Water volumes are kept by admins and veterinarians (purchasing reads the catalogue only). */
  protected readonly keepsWater = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'veterinarian');
  });
  protected readonly kindLabels = productKindLabels;
  protected readonly routeLabels = productRouteLabels;
  protected readonly filter = signal('');
  protected readonly onlyProposed = signal(false);
  protected readonly products = rxResource({ stream: () => this.api.products() });
  protected readonly suppliers = rxResource({ stream: () => this.api.suppliers() });
  protected readonly supplierColumns = ['name', 'orderEmail', 'leadTimeDays', 'actions'];

  protected readonly proposedCount = computed(
    () => (this.products.value() ?? []).reduce((n, p) => n + (p.status === 'proposed' ? 1 : 0) + p.presentations.filter((x) => x.status === 'proposed').length, 0),
  );
  protected readonly shown = computed(() => {
    const text = this.filter().trim().toLowerCase();
    return (this.products.value() ?? []).filter(
      (p) =>
        (!text || `${p.name} ${p.maker}`.toLowerCase().includes(text) || p.presentations.some((x) => `${x.packGtin} ${x.vialGtin}`.includes(text))) &&
        (!this.onlyProposed() || p.status === 'proposed' || p.presentations.some((x) => x.status === 'proposed')),
    );
  });

  protected isProposed(product: ProductView): boolean {
    return product.status === 'proposed' || product.presentations.some((p) => p.status === 'proposed');
  }

  protected editProduct(product: ProductView | null): void {
    this.dialog.open(ProductDialog, { data: product, width: '600px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.products.reload());
  }

  protected editPresentation(product: ProductView, presentation: PresentationView | null): void {
    const data: PresentationDialogData = { productId: product.id, productName: product.name, presentation };
    this.dialog.open(PresentationDialog, { data, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.products.reload());
  }

  protected editSupplier(supplier: SupplierView | null): void {
    this.dialog.open(SupplierDialog, { data: supplier, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.suppliers.reload());
  }
}
