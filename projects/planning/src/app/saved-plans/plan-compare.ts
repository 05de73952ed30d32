import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { ErrorBanner, describeApiError } from '@tubwright/kit';
import { Subscription } from 'rxjs';
import { comparePath } from '../planning-routes';
import { PlanApi } from '../shared/plan-api';
import type { PlanComparison } from '../shared/plan-types';
import { compareGroups } from './compare-rows';

/** Two saved plans side by side: rack, key dimensions, sheets and cost, with what differs marked. Read only. */
@Component({
  selector: 'tw-plan-compare',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, MatProgressBar, ErrorBanner],
  templateUrl: './plan-compare.html',
  styleUrl: './plan-compare.scss',
})
export class PlanCompare {
  readonly a = input.required<number>();
  readonly b = input.required<number>();
  readonly navigate = input.required<(path: string, options?: { replace?: boolean }) => void>();

  private readonly api = inject(PlanApi);
  private readonly destroyRef = inject(DestroyRef);
  protected readonly comparison = signal<PlanComparison | null>(null);
  protected readonly loading = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly groups = computed(() => {
    const c = this.comparison();
    return c ? compareGroups(c) : [];
  });
  protected readonly differences = computed(() => this.groups().reduce((n, g) => n + g.rows.filter((r) => r.differs).length, 0));
  /** Said when the plans were drawn in different units: B's lengths are converted to A's. */
  protected readonly unitNote = computed(() => {
    const c = this.comparison();
    if (!c) return '';
    const unitName = c.unit === 'in' ? 'inches' : 'millimetres';
    return c.a.unit === c.b.unit ? `Lengths in ${unitName}.` : `Lengths in ${unitName}, plan A's unit; plan B's are converted.`;
  });
  private request: Subscription | null = null;

  constructor() {
    effect(() => {
      const [a, b] = [this.a(), this.b()];
      untracked(() => this.load(a, b));
    });
  }

  protected load(a = this.a(), b = this.b()): void {
    this.request?.unsubscribe();
    this.loading.set(true);
    this.failure.set(null);
    this.request = this.api
      .compare(a, b)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (comparison) => {
          this.loading.set(false);
          this.comparison.set(comparison);
        },
        error: (error: unknown) => {
          this.loading.set(false);
          this.comparison.set(null);
          this.failure.set(describeApiError(error));
        },
      });
  }

  protected go(event: MouseEvent, path: string): void {
    if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey || event.altKey) return;
    event.preventDefault();
    this.navigate()(path);
  }

  protected swap(): void {
    this.navigate()(comparePath(this.b(), this.a()));
  }
}
