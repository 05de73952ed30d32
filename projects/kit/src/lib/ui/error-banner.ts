import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';

/** A failed request, said plainly, with a way to try again when that makes sense. */
@Component({
  selector: 'tw-error-banner',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIcon, MatButton],
  host: { role: 'alert' },
  template: `
    <mat-icon aria-hidden="true">error</mat-icon>
    <span class="message">{{ message() }}</span>
    @if (retryable()) {
      <button mat-button type="button" (click)="retry.emit()">Try again</button>
    }
  `,
  styles: `
    :host { display: flex; align-items: center; gap: 12px; padding: 8px 8px 8px 16px; margin: 0 0 16px; border-radius: var(--mat-sys-corner-medium, 12px);
      background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); font: var(--mat-sys-body-medium); }
    .message { flex: 1; }
    button { --mat-button-text-label-text-color: var(--mat-sys-on-error-container); }
  `,
})
export class ErrorBanner {
  readonly message = input.required<string>();
  readonly retryable = input(false);
  readonly retry = output<void>();
}
