import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';

/** What a list shows when there is nothing to list, and what to do about it. */
@Component({
  selector: 'tw-empty-state',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIcon],
  template: `
    <mat-icon aria-hidden="true">{{ icon() }}</mat-icon>
    <p class="title">{{ heading() }}</p>
    @if (hint()) {
      <p class="hint">{{ hint() }}</p>
    }
    <div class="actions"><ng-content /></div>
  `,
  styles: `
    :host { display: flex; flex-direction: column; align-items: center; gap: 4px; padding: 40px 16px; text-align: center; color: var(--mat-sys-on-surface-variant); }
    mat-icon { width: 40px; height: 40px; font-size: 40px; color: var(--mat-sys-tertiary); }
    .title { margin: 8px 0 0; font: var(--mat-sys-title-medium); color: var(--mat-sys-on-surface); }
    .hint { margin: 0; font: var(--mat-sys-body-medium); }
    .actions { margin-top: 16px; }
    .actions:empty { display: none; }
  `,
})
export class EmptyState {
  readonly icon = input('inventory_2');
  readonly heading = input.required<string>();
  readonly hint = input('');
}
