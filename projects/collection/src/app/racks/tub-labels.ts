import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, effect, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { ErrorBanner, Page } from '@tubwright/kit';
import { Animal, sexLabel } from '../animals/animal';
import { CollectionApi } from '../core/collection-api';
import type { RackMap, Tub } from '../core/collection-types';
import { MODULE_BASE, ShellLink } from '../core/shell-link';

type QrEncoder = Pick<typeof import('qrcode'), 'toString'>;

interface Label {
  tub: Tub;
  animal: Animal | null;
  url: string;
}

/**
 * Printable tub labels for one rack: the tub's label, its animal and a QR code that opens the
 * animal's page (or the rack map for an empty tub). The QR encoder loads only on this page.
 * The API has no labels PDF; the browser's print dialog makes one ("Save as PDF").
 */
@Component({
  selector: 'tw-tub-labels',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [MatButton, MatIcon, ErrorBanner, ShellLink],
  template: `
    <div class="tw-labels-controls">
      <a [twLink]="'racks/' + rackId()" class="back"><mat-icon aria-hidden="true">arrow_back</mat-icon>Back to the rack</a>
      <div class="tw-labels-head">
        <h1>Tub labels{{ rack.hasValue() ? ' · rack ' + rack.value().name : '' }}</h1>
        <label class="tw-labels-empty"><input type="checkbox" [checked]="withEmpty()" (change)="withEmpty.set(!withEmpty())" /> Empty tubs too</label>
        <button mat-flat-button type="button" (click)="print()" [disabled]="!labels().length"><mat-icon>print</mat-icon>Print or save as PDF</button>
      </div>
      <p class="muted">Scan a label's code with a phone signed in to the console to open the animal.</p>
    </div>
    @if (rack.error()) {
      <tw-error-banner message="The rack could not be loaded." [retryable]="true" (retry)="rack.reload()" />
    }
    <div class="tw-label-sheet">
      @for (label of labels(); track label.tub.id) {
        <article class="tw-label">
          <div class="tw-label-text">
            <p class="tw-label-tub">{{ label.tub.label }}</p>
            @if (label.animal; as a) {
              <p class="tw-label-code">{{ a.code }}{{ a.name ? ' · ' + a.name : '' }}</p>
              <p><i>{{ a.species }}</i></p>
              <p>{{ sexLabel(a.sex) }}{{ a.hatchDate ? ' · hatched ' + a.hatchDate : '' }}</p>
              @if (a.morph) {
                <p>{{ a.morph }}</p>
              }
            } @else if (label.tub.occupant; as o) {
              <p class="tw-label-code">{{ o.code }}{{ o.name ? ' · ' + o.name : '' }}</p>
              <p><i>{{ o.species }}</i></p>
            } @else {
              <p class="muted">empty</p>
            }
          </div>
          @if (qr()[label.tub.id]; as src) {
            <img class="tw-label-qr" [src]="src" [alt]="'QR code for ' + label.url" />
          }
        </article>
      }
    </div>
  `,
  styles: `
    tw-tub-labels { display: block; }
    .tw-labels-head { display: flex; flex-wrap: wrap; align-items: center; gap: 12px 24px; }
    .tw-labels-head h1 { margin: 0; font: var(--mat-sys-headline-small); flex: 1 1 auto; }
    .tw-label-sheet { display: grid; grid-template-columns: repeat(auto-fill, minmax(3.5in, 1fr)); gap: 12px; margin-top: 16px; }
    .tw-label { display: flex; justify-content: space-between; gap: 8px; padding: 10px 12px; border: 1px solid #000; border-radius: 6px; background: #fff; color: #000; break-inside: avoid; min-height: 1.5in; }
    .tw-label p { margin: 0; font: 12px/1.35 var(--mat-sys-body-small-font, sans-serif); }
    .tw-label .tw-label-tub { font: 700 22px/1.1 var(--mat-sys-title-large-font, sans-serif); letter-spacing: 0.02em; }
    .tw-label .tw-label-code { font-weight: 600; font-size: 14px; margin: 2px 0; }
    .tw-label-qr { width: 1.1in; height: 1.1in; flex: none; image-rendering: pixelated; }
    @media print {
      body:has(.tw-label-sheet) * { visibility: hidden; }
      body:has(.tw-label-sheet) .tw-label-sheet, body:has(.tw-label-sheet) .tw-label-sheet * { visibility: visible; }
      .tw-label-sheet { position: absolute; left: 0; top: 0; width: 100%; margin: 0; grid-template-columns: repeat(2, 1fr); }
      .tw-labels-controls { display: none; }
    }
  `,
})
export class TubLabels {
  readonly rackId = input.required<number>();

  private readonly api = inject(CollectionApi);
  protected readonly rack = rxResource({ params: () => this.rackId(), stream: ({ params }) => this.api.get<RackMap>(`/racks/${params}`) });
  private readonly animals = rxResource({ stream: () => this.api.get<Page<Animal>>('/animals', { limit: 200, sort: 'code' }) });
  protected readonly withEmpty = signal(false);
  protected readonly qr = signal<Record<number, string>>({});
  protected readonly sexLabel = sexLabel;

  protected readonly labels = computed<Label[]>(() => {
    if (!this.rack.hasValue()) return [];
    const byId = new Map((this.animals.hasValue() ? this.animals.value().items : []).map((a) => [a.id, a]));
    const origin = typeof location === 'undefined' ? '' : location.origin;
    return this.rack
      .value()
      .tubs.filter((t) => t.occupant || this.withEmpty())
      .map((tub) => ({
        tub,
        animal: tub.occupant ? (byId.get(tub.occupant.animalId) ?? null) : null,
        url: `${origin}${MODULE_BASE}/${tub.occupant ? `animals/${tub.occupant.animalId}` : `racks/${tub.rackId}`}`,
      }));
  });

  /** QR images by URL; the encoder is a separate chunk, fetched on this page only. */
  private readonly drawn = new Map<string, string>();
  private encoder: Promise<QrEncoder> | null = null;

  constructor() {
    effect(() => void this.draw(this.labels()));
  }

  private async draw(labels: Label[]): Promise<void> {
    // qrcode is CommonJS: its `toString` lives on the default export, not on the namespace.
    this.encoder ??= import('qrcode').then((m) => ((m as { default?: QrEncoder }).default ?? m) as QrEncoder);
    const qrcode = await this.encoder;
    const next: Record<number, string> = {};
    for (const { tub, url } of labels) {
      let src = this.drawn.get(url);
      if (!src) {
        const svg = await qrcode.toString(url, { type: 'svg', margin: 1, errorCorrectionLevel: 'M' });
        src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
        this.drawn.set(url, src);
      }
      next[tub.id] = src;
    }
    this.qr.set(next);
  }

  protected print(): void {
    window.print();
  }
}
