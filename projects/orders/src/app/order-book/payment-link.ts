import { Clipboard } from '@angular/cdk/clipboard';
import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';

let nextId = 0;

/** The provider's payment page for the customer: the address to copy into a message, and a way to open it. */
@Component({
  selector: 'tw-payment-link',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon],
  template: `
    <label class="label" [for]="uid">Payment page for the customer</label>
    <div class="row">
      <input [id]="uid" class="url" readonly [value]="url()" (focus)="select($event)" />
      <button mat-stroked-button type="button" (click)="copy()"><mat-icon>content_copy</mat-icon>{{ copied() ? 'Copied' : 'Copy link' }}</button>
      <a mat-button [href]="url()" target="_blank" rel="noopener noreferrer"><mat-icon>open_in_new</mat-icon>Open payment page</a>
    </div>
    <span class="tw-visually-hidden" aria-live="polite">{{ copied() ? 'Link copied' : '' }}</span>
  `,
  styles: `
    :host { display: block; margin: 8px 0; }
    .label { display: block; margin-bottom: 4px; font: var(--mat-sys-label-medium); color: var(--mat-sys-on-surface-variant); }
    .row { display: flex; flex-wrap: wrap; gap: 8px; align-items: center; }
    .url { flex: 1 1 260px; min-width: 0; padding: 8px 10px; border: 1px solid var(--mat-sys-outline); border-radius: 8px;
      background: var(--mat-sys-surface); color: var(--mat-sys-on-surface); font: var(--mat-sys-body-small); font-family: ui-monospace, monospace; }
    .url:focus-visible { outline: 2px solid var(--mat-sys-primary); outline-offset: 1px; }
  `,
})
export class PaymentLink {
  readonly url = input.required<string>();

  private readonly clipboard = inject(Clipboard);
  protected readonly uid = `payment-link-${nextId++}`;
  protected readonly copied = signal(false);

  protected copy(): void {
    this.copied.set(this.clipboard.copy(this.url()));
  }

  protected select(event: FocusEvent): void {
    (event.target as HTMLInputElement).select();
  }
}
