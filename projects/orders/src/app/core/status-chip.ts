import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { statusLabel, statusTone } from './statuses';

/** A status as a small coloured label; the word carries the meaning, the colour only helps. */
@Component({
  selector: 'tw-status-chip',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class]': '"tone-" + tone()' },
  template: `{{ label() }}`,
  styles: `
    :host { display: inline-block; padding: 2px 10px; border-radius: 999px; font: var(--mat-sys-label-medium); white-space: nowrap;
      background: var(--mat-sys-surface-container-high); color: var(--mat-sys-on-surface); }
    :host(.tone-progress) { background: var(--mat-sys-secondary-container); color: var(--mat-sys-on-secondary-container); }
    :host(.tone-good) { background: var(--mat-sys-tertiary-container); color: var(--mat-sys-on-tertiary-container); }
    :host(.tone-warn) { background: var(--mat-sys-primary-container); color: var(--mat-sys-on-primary-container); }
    :host(.tone-bad) { background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }
  `,
})
export class StatusChip {
  readonly status = input.required<string>();
  /** Overrides the status word, e.g. for payment states. */
  readonly text = input<string | null>(null);
  protected readonly label = computed(() => this.text() ?? labelFor(this.status()));
  protected readonly tone = computed(() => statusTone(this.status()));
}

function labelFor(status: string): string {
  const known = statusLabel(status);
  return known === status ? status.charAt(0).toUpperCase() + status.slice(1).replace(/_/g, ' ') : known;
}
