// The receiving form: mobile-first, one-handed; the draft is kept on the phone and survives a reload or a lost connection.
// Its times are the site's clock's, typed and hinted with the zone's name, wherever the phone's clock is set.
import { BreakpointObserver } from '@angular/cdk/layout';
import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, Injector, OnInit, afterNextRender, computed, inject, input, signal, viewChild, viewChildren } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';
import { debounceTime, firstValueFrom, fromEvent, map, merge } from 'rxjs';
import { presentationLabel } from '@shared/catalogue/presentation-label.js';
import type { ProductView } from '@shared/catalogue/product-schemas.js';
import type { SupplierView } from '@shared/catalogue/supplier-schemas.js';
import { allChecksFine, outcomeLabels, outcomes, readingPlaceLabels, readingPlaces, type ShipmentOutcome } from '@shared/receiving/arrival-checks.js';
import { placeScan } from '@shared/receiving/place-scan.js';
import type { PurchaseOrderView } from '@shared/receiving/purchase-order-schemas.js';
import type { ReceivingContext } from '@shared/receiving/shipment-view.js';
import type { SiteView } from '@shared/sites/site-schemas.js';
import { siteWallTime } from '@shared/sites/site-clock.js';
import { AuthStore } from '../../core/auth/auth-store';
import { SitesApi } from '../../core/sites/sites-api';
import { ApiError } from '../../core/http/api-error';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { ReceivingApi } from '../../shared/receiving/receiving-api';
import { siteClockHint } from '../../shared/sites/site-clock-hint';
import { readerTimeZone } from '../../shared/sites/site-time-pipe';
import { ArrivalChecks } from './arrival-checks';
import type { DraftPhoto } from './draft-photo-db';
import { newDraftKey } from './draft-key';
import { liveAssessment } from './live-assessment';
import { LotScanner } from './lot-scanner';
import { PhotoPicker, type PickedPhoto } from './photo-picker';
import { ProposePresentationDialog, type ProposeData, type ProposeResult } from './propose-presentation-dialog';
import { ReceivingDraftStore } from './receiving-draft-store';
import { createShipmentForm, lineGroup, toShipmentBody, type LineValue, type ShipmentFormValue } from './shipment-form';
import { ShipmentLineCard, type PresentationChoice } from './shipment-line-card';

type HeldPhoto = DraftPhoto & { url: string };

@Component({
  selector: 'vy-receive-shipment',
  imports: [
    ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatButtonToggleModule, MatIconModule,
    MatExpansionModule, ArrivalChecks, LotScanner, PhotoPicker, ShipmentLineCard,
  ],
  templateUrl: './receive-shipment.html',
  styleUrl: './receive-shipment.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReceiveShipment implements OnInit {
  /** Query parameters: the site, and the order being received (none for an unannounced shipment). */
  readonly site = input<string>();
  readonly order = input<string>();

  private readonly fb = inject(NonNullableFormBuilder);
  private readonly auth = inject(AuthStore);
  private readonly api = inject(ReceivingApi);
  private readonly catalogue = inject(CatalogueApi);
  private readonly sitesApi = inject(SitesApi);
  private readonly drafts = inject(ReceivingDraftStore);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly router = inject(Router);
  private readonly destroyRef = inject(DestroyRef);
  private readonly injector = inject(Injector);
  private readonly document = inject(DOCUMENT);
  private readonly scanner = viewChild.required(LotScanner);
  private readonly lineCards = viewChildren(ShipmentLineCard);
  private readonly readingField = viewChild<ElementRef<HTMLInputElement>>('readingField');

  protected readonly form = createShipmentForm(this.fb, this.auth.displayUnit());
  protected readonly products = signal<ProductView[]>([]);
  protected readonly context = signal<ReceivingContext | null>(null);
  protected readonly suppliers = signal<SupplierView[]>([]);
  protected readonly orderView = signal<PurchaseOrderView | null>(null);
  protected readonly photos = signal<HeldPhoto[]>([]);
  protected readonly scanMessage = signal<string | null>(null);
  protected readonly showErrors = signal(false);
  protected readonly sending = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly loaded = signal(false);
  protected readonly online = toSignal(merge(fromEvent(window, 'online'), fromEvent(window, 'offline')).pipe(map(() => navigator.onLine)), { initialValue: navigator.onLine });
  /** On a phone the "Read from" and "Outcome" choices stack, one full-width row each, instead of wrapping unevenly. */
  protected readonly narrow = toSignal(inject(BreakpointObserver).observe('(max-width: 599.98px)').pipe(map((state) => state.matches)), { initialValue: false });
  protected readonly outcomes = outcomes;
  protected readonly outcomeLabels = outcomeLabels;
  protected readonly readingPlaces = readingPlaces;
  protected readonly readingPlaceLabels = readingPlaceLabels;

  private clientKey = newDraftKey();
  private readonly value = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });
  /** Chosen on the page when the link named no site (a bookmark of /receiving/new). */
  private readonly chosenSite = signal<number | null>(null);
  private readonly siteId = computed(() => Number(this.site()) || this.chosenSite() || 0);
  /** The person's sites, when the link named none and they have several: they choose before the form. */
  protected readonly siteChoices = signal<SiteView[] | null>(null);
  protected readonly sitesError = signal<string | null>(null);
  private readonly orderId = computed(() => (this.order() ? Number(this.order()) : null));
  /** The site's zone: every time on the form is read on its clock. */
  protected readonly timeZone = computed(() => this.context()?.timeZone ?? null);
  protected readonly arrivedHint = computed(() => siteClockHint(this.value().arrivedAt, this.timeZone()));
  protected readonly shippedHint = computed(() => siteClockHint(this.value().shippedAt, this.timeZone()));
  protected readonly storedHint = computed(() => siteClockHint(this.value().storedAt, this.timeZone()));

  protected readonly choices = computed<PresentationChoice[]>(() =>
    this.products().flatMap((product) =>
      product.presentations.map((p) => ({ id: p.id, label: presentationLabel(product.name, p), proposed: p.status === 'proposed' || product.status === 'proposed' })),
    ),
  );
  private readonly suggested = computed<ShipmentOutcome>(() => this.assess('accepted').suggestedOutcome);
  protected readonly outcome = computed<ShipmentOutcome>(() => this.value().outcome ?? this.suggested());
  protected readonly assessment = computed(() => this.assess(this.outcome()));
  protected readonly photoItems = computed<PickedPhoto[]>(() => this.photos().map(({ id, name, url }) => ({ id, name, url })));

  private assess(outcome: ShipmentOutcome) {
    return liveAssessment(this.value(), this.products(), this.context()?.storeWithinMinutes ?? 30, outcome, this.timeZone() ?? readerTimeZone());
  }

  async ngOnInit(): Promise<void> {
    // No site in the link: the person's only site, or their choice among theirs; never a context call for site 0.
    if (!this.siteId()) {
      const sites = await firstValueFrom(this.sitesApi.list()).catch(() => null);
      if (sites?.length === 1) {
        this.chosenSite.set(sites[0].id);
      } else {
        this.siteChoices.set(sites ?? []);
        this.sitesError.set(sites === null ? 'Your sites could not be loaded: open this form from the Receiving page.' : sites.length ? null : 'You have no site to receive at.');
        return;
      }
    }
    await this.load();
  }

  /** The site chosen before the form: the address names it (a reload keeps it), then the form loads for it. */
  protected async chooseSite(siteId: number): Promise<void> {
    this.chosenSite.set(siteId);
    this.siteChoices.set(null);
    await this.router.navigate([], { queryParams: { site: siteId }, queryParamsHandling: 'merge', replaceUrl: true });
    await this.load();
  }

  private async load(): Promise<void> {
    const siteId = this.siteId();
    const [context, products] = await Promise.all([firstValueFrom(this.api.context(siteId)), firstValueFrom(this.catalogue.productsForReceiving())]);
    this.context.set(context);
    this.products.set(products);
    this.catalogue.suppliers().subscribe({ next: (list) => this.suppliers.set(list), error: () => undefined });
    const draft = this.drafts.peek();
    if (draft && draft.siteId === siteId && draft.orderId === this.orderId()) {
      await this.restore(draft.clientKey, draft.value);
    } else {
      await this.startNew(context);
    }
    this.loaded.set(true);
    this.form.valueChanges.pipe(debounceTime(250), takeUntilDestroyed(this.destroyRef)).subscribe(() => this.saveDraft());
    // Once the reading is placed, scanning comes next: the scan field takes the focus (a hand scanner types into it).
    this.form.controls.readingPlace.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe((place) => {
      if (place !== null && this.lotsToScan()) this.scanner().focus();
    });
    // A draft reopened past the checks and the reading opens on the lots: ready for the next carton.
    if (this.onLotsStep()) this.focusScanUnlessBusy();
  }

  /** Lines still waiting for their lot, or none yet: scanning is what is left to do. */
  private lotsToScan(): boolean {
    const lines = this.form.controls.lines.getRawValue();
    return lines.length === 0 || lines.some((line) => !line.lotNumber);
  }

  /** The checks answered and the reading placed: the form is at its lots (another carton may still come). */
  private onLotsStep(): boolean {
    const { checks, readingPlace } = this.form.getRawValue();
    return readingPlace !== null && Object.values(checks).every((answer) => answer !== null);
  }

  /**
   * The scan field takes the focus, unless the person is in another field (typing there while the page loaded): the
   * focus is theirs. Only a field they chose keeps it; nothing focused, or a button that went away, does not.
   */
  private focusScanUnlessBusy(): void {
    const active = this.document.activeElement;
    const typing = active instanceof HTMLElement && active.matches('input, textarea, select, [contenteditable="true"], [role="combobox"]');
    if (!typing) this.scanner().focus();
  }

  private async startNew(context: ReceivingContext | null): Promise<void> {
    this.form.controls.fridgeId.setValue(context?.fridges[0]?.id ?? null);
    this.form.controls.arrivedAt.setValue(siteWallTime(new Date(), context?.timeZone ?? readerTimeZone()));
    const orderId = this.orderId();
    if (orderId === null) return;
    try {
      const order = await firstValueFrom(this.api.purchaseOrder(orderId));
      this.orderView.set(order);
      this.form.patchValue({ purchaseOrderId: order.id, supplierId: order.supplierId, carrier: order.carrier, trackingNumber: order.trackingNumber });
      for (const line of order.lines) this.form.controls.lines.push(lineGroup(this.fb, { presentationId: line.presentationId, vialsExpected: line.vials }));
    } catch {
      this.formError.set('The order could not be loaded; receive the lots by scanning them.');
    }
  }

  private async restore(clientKey: string, value: ShipmentFormValue): Promise<void> {
    this.clientKey = clientKey;
    for (const line of value.lines) {
      const group = lineGroup(this.fb, line);
      if (line.vialsIntact !== Math.max(0, line.vialsExpected - line.vialsBroken - line.vialsMissing)) group.controls.vialsIntact.markAsDirty();
      this.form.controls.lines.push(group);
    }
    this.form.patchValue({ ...value, lines: undefined });
    if (value.purchaseOrderId !== null) this.api.purchaseOrder(value.purchaseOrderId).subscribe({ next: (o) => this.orderView.set(o), error: () => undefined });
    const photos = await this.drafts.photos(clientKey);
    this.photos.set(photos.map((photo) => ({ ...photo, url: URL.createObjectURL(photo.blob) })));
  }

  private saveDraft(): void {
    if (!this.siteId()) return;
    this.drafts.save({ clientKey: this.clientKey, siteId: this.siteId(), orderId: this.orderId(), value: this.form.getRawValue(), photoCount: this.photos().length });
  }

  private async savePhotos(): Promise<void> {
    await this.drafts.savePhotos(this.clientKey, this.photos().map(({ id, name, blob }) => ({ id, name, blob })));
    this.saveDraft();
  }

  protected answerAllFine(): void {
    this.form.controls.checks.setValue({ ...allChecksFine });
    this.readingField()?.nativeElement.focus();
  }

  protected lineGroups() {
    return this.form.controls.lines.controls;
  }

  protected async scan(text: string): Promise<void> {
    this.scanMessage.set(null);
    const lines = this.form.controls.lines.getRawValue();
    const placement = placeScan(text, lines, this.products());
    switch (placement.kind) {
      case 'error':
      case 'no-gtin':
        this.scanMessage.set(placement.message);
        return;
      case 'already-listed':
        this.scanMessage.set(`Lot ${lines[placement.line]!.lotNumber} is already on line ${placement.line + 1}.`);
        return;
      case 'fill':
        this.form.controls.lines.at(placement.line).patchValue(placement.fields);
        break;
      case 'add':
        this.addLine({ presentationId: placement.presentationId, vialsExpected: placement.vialsExpected, ...placement.fields });
        break;
      case 'unknown-gtin': {
        const data: ProposeData = { gtin: placement.gtin, products: this.products() };
        const result = await firstValueFrom(this.dialog.open<ProposePresentationDialog, ProposeData, ProposeResult>(ProposePresentationDialog, { data, width: '520px', maxWidth: '95vw' }).afterClosed());
        if (!result) {
          this.scanMessage.set('That barcode is not in the catalogue; the lot was not added.');
          return;
        }
        this.products.update((list) => [...list.filter((p) => p.id !== result.product.id), result.product]);
        const presentation = result.product.presentations.find((p) => p.id === result.presentationId)!;
        const vialLevel = presentation.vialGtin === placement.gtin;
        this.addLine({ presentationId: result.presentationId, vialsExpected: vialLevel ? 1 : presentation.vialsPerPack, ...placement.fields });
        break;
      }
    }
    this.scanner().focus();
  }

  protected addLine(value: Partial<LineValue> = {}): void {
    this.form.controls.lines.push(lineGroup(this.fb, value));
  }

  /** "Add a lot by hand": there is no barcode to scan, so the focus goes to the new line's first field, once drawn. */
  protected addLineByHand(): void {
    this.addLine();
    afterNextRender(() => this.lineCards().at(-1)?.focusFirstField(), { injector: this.injector });
  }

  /** The removed line's button goes with it; rather than leave the focus nowhere, it returns to the scan field. */
  protected removeLine(index: number): void {
    this.form.controls.lines.removeAt(index);
    afterNextRender(() => this.focusScanUnlessBusy(), { injector: this.injector });
  }

  protected addPhotos(files: File[]): void {
    const room = Math.max(0, 8 - this.photos().length);
    const added = files.slice(0, room).map((file) => ({ id: newDraftKey(), name: file.name || 'photo.jpg', blob: file as Blob, url: URL.createObjectURL(file) }));
    this.photos.update((list) => [...list, ...added]);
    void this.savePhotos();
  }

  protected removePhoto(id: string): void {
    const photo = this.photos().find((p) => p.id === id);
    if (photo) URL.revokeObjectURL(photo.url);
    this.photos.update((list) => list.filter((p) => p.id !== id));
    void this.savePhotos();
  }

  protected chooseOutcome(outcome: ShipmentOutcome): void {
    this.form.controls.outcome.setValue(outcome);
  }

  protected async discardDraft(): Promise<void> {
    await this.drafts.discard();
    await this.router.navigate(['/receiving']);
  }

  private missingAnswers(): string | null {
    const value = this.form.getRawValue();
    if (value.readingValue !== null && value.readingPlace === null) return 'Say where the temperature was read.';
    if (this.form.invalid) return 'Some answers are missing or not valid: see the marked fields.';
    if (value.lines.length === 0 && this.outcome() !== 'refused') return 'Scan at least one lot, or refuse the shipment.';
    return null;
  }

  protected async send(): Promise<void> {
    this.showErrors.set(true);
    this.form.markAllAsTouched();
    const problem = this.missingAnswers();
    if (problem) {
      this.formError.set(problem);
      return;
    }
    this.sending.set(true);
    this.formError.set(null);
    try {
      const body = toShipmentBody(this.form.getRawValue(), this.clientKey, this.outcome(), this.timeZone() ?? readerTimeZone());
      const shipment = await firstValueFrom(this.api.receive(this.siteId(), body, this.photos().map(({ blob, name }) => ({ blob, name }))));
      await this.drafts.discard();
      for (const photo of this.photos()) URL.revokeObjectURL(photo.url);
      this.snackBar.open(`Shipment ${shipment.id} recorded.`, undefined, { duration: 4000 });
      await this.router.navigate(['/shipments', shipment.id]);
    } catch (error) {
      this.showServerError(ApiError.from(error));
    } finally {
      this.sending.set(false);
    }
  }

  private showServerError(error: ApiError): void {
    if (error.status === 0) {
      this.formError.set('No connection. Your shipment is kept on this phone: send it again when you are back online.');
      return;
    }
    const unplaced: string[] = [];
    for (const { field, message } of error.fields) {
      const path = field === 'reading.value' ? 'readingValue' : field === 'reading.place' ? 'readingPlace' : field;
      const control = this.form.get(path);
      if (control && path !== 'outcome') {
        control.setErrors({ server: message });
        control.markAsTouched();
      } else {
        unplaced.push(message);
      }
    }
    this.formError.set(unplaced.length ? unplaced.join(' ') : error.message);
  }
}
