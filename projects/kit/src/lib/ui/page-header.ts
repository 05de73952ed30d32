import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/** The title line of a page, with room on the right for its actions. */
@Component({
  selector: 'tw-page-header',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <div class="text">
      <h1>{{ heading() }}</h1>
      @if (subheading()) {
        <p>{{ subheading() }}</p>
      }
    </div>
    <div class="actions"><ng-content /></div>
  `,
  styles: `
    :host { display: flex; flex-wrap: wrap; align-items: flex-end; justify-content: space-between; gap: 12px 24px; margin: 0 0 20px; }
    h1 { margin: 0; font: var(--mat-sys-headline-small); color: var(--mat-sys-on-surface); }
    p { margin: 4px 0 0; font: var(--mat-sys-body-medium); color: var(--mat-sys-on-surface-variant); }
    .actions { display: flex; gap: 8px; align-items: center; }
  `,
})
export class PageHeader {
  readonly heading = input.required<string>();
  readonly subheading = input('');
}
