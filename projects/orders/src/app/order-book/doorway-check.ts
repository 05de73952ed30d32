import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner, LengthPipe } from '@tubwright/kit';
import { forkJoin, of } from 'rxjs';
import type { OrderRack, RackCheckItem, RackPlanResponse } from '../core/orders-types';
import { RackResults } from '../core/rack-results';
import { remote } from '../core/remote';
import { checkDoorway } from './calculations/doorway';

/** Before delivery: does every rack of the order pass the customer's doorway (as stored on the order), section by section? */
@Component({
  selector: 'tw-doorway-check',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatIcon, MatProgressBar, ErrorBanner, LengthPipe],
  template: `
    @if (results.loading()) {
      <mat-progress-bar mode="indeterminate" aria-label="Checking the racks" />
    }
    @if (results.error(); as message) {
      <tw-error-banner [message]="message" [retryable]="true" (retry)="results.reload()" />
    }
    <ul class="racks">
      @for (row of rows(); track $index) {
        <li>
          <span class="verdict" [class.fails]="!row.check.passes">
            <mat-icon aria-hidden="true">{{ row.check.passes ? 'check_circle' : 'block' }}</mat-icon>
            {{ row.check.passes ? 'Passes' : 'Does not pass' }}
          </span>
          <span>
            <strong>{{ row.rack.quantity }} x {{ row.rack.description }}</strong><br />
            @if (row.check.sections === 1) {
              One section, {{ row.check.tallestSectionIn | length }} tall,
            } @else {
              {{ row.check.sections }} sections, the tallest {{ row.check.tallestSectionIn | length }},
            }
            through a doorway of {{ row.check.doorwayIn | length }}
            ({{ row.check.passes ? (row.check.spareIn | length) + ' to spare' : (-row.check.spareIn | length) + ' too tall: build it in the room or split it into more sections' }}).
            @for (c of row.cautions; track c.code) {
              <span class="caution" [class.danger]="c.severity === 'danger'">{{ c.message }}</span>
            }
          </span>
        </li>
      } @empty {
        @if (!results.loading()) {
          <li class="tw-muted">This order has no rack to check.</li>
        }
      }
    </ul>
  `,
  styles: `
    :host { display: block; }
    .racks { margin: 8px 0 0; padding: 0; list-style: none; }
    li { display: grid; grid-template-columns: 150px 1fr; gap: 12px; padding: 8px 0; border-top: 1px solid var(--mat-sys-outline-variant); }
    .verdict { display: inline-flex; gap: 6px; align-items: flex-start; font-weight: 500; color: var(--mat-sys-tertiary); }
    .verdict.fails { color: var(--mat-sys-error); }
    .caution { display: block; margin-top: 4px; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .caution.danger { color: var(--mat-sys-error); }
  `,
})
export class DoorwayCheck {
  readonly racks = input.required<OrderRack[]>();
  /** The customer's doorway, inches; null: the plan's own clearance. */
  readonly doorwayIn = input<number | null>(null);

  private readonly rackResults = inject(RackResults);
  protected readonly results = remote(
    () => this.racks(),
    (racks) => (racks.length ? forkJoin(racks.map((r) => this.rackResults.resultFor(r.spec ?? {}))) : of<RackPlanResponse[]>([])),
  );
  protected readonly rows = computed(() => {
    const results = this.results.value() ?? [];
    return results.map((result, i) => {
      const rack = this.racks()[i]!;
      return {
        rack,
        check: checkDoorway(result, rack.spec, this.doorwayIn()),
        // What matters when moving and standing the rack up; the rest is the builder's business.
        cautions: result.checks.filter((c: RackCheckItem) => ['tipping', 'ceiling_clearance', 'ceiling_tilt'].includes(c.code) && c.severity !== 'info'),
      };
    });
  });
}
