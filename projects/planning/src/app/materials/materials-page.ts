import { ChangeDetectionStrategy, Component, DestroyRef, ElementRef, Injector, afterNextRender, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, PageHeader, describeApiError } from '@tubwright/kit';
import { formatMoney } from '../shared/money';
import { PlanApi } from '../shared/plan-api';
import type { ShopMaterial } from '../shared/plan-types';
import { showLength } from '../shared/plan-units';
import { MaterialForm } from './material-form';

/** The sheets and boards the calculator plans with: the owner edits one at a time, others read. */
@Component({
  selector: 'tw-materials-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatProgressBar, ErrorBanner, PageHeader, MaterialForm],
  templateUrl: './materials-page.html',
  styleUrl: './materials-page.scss',
})
export class MaterialsPage {
  private readonly api = inject(PlanApi);
  private readonly destroyRef = inject(DestroyRef);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly injector = inject(Injector);
  private readonly auth = inject(AuthSession);
  /** The route's own rule (PUT /materials/{key}: owner); the server checks again. */
  protected readonly canEdit = computed(() => this.auth.role() === 'owner');

  protected readonly materials = signal<ShopMaterial[]>([]);
  protected readonly loading = signal(true);
  protected readonly failure = signal<string | null>(null);
  protected readonly editing = signal<string | null>(null);
  protected readonly saved = signal<string | null>(null);
  protected readonly columnCount = computed(() => (this.canEdit() ? 8 : 7));

  constructor() {
    this.load();
  }

  protected load(): void {
    this.loading.set(true);
    this.failure.set(null);
    this.api
      .materials()
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (items) => {
          this.materials.set(items);
          this.loading.set(false);
        },
        error: (error: unknown) => {
          this.loading.set(false);
          this.failure.set(describeApiError(error));
        },
      });
  }

  protected edit(material: ShopMaterial): void {
    this.saved.set(null);
    this.editing.set(material.key);
  }

  protected closed(key: string): void {
    this.editing.set(null);
    // Back to the button that opened the form, so keyboard users keep their place.
    afterNextRender(() => this.host.nativeElement.querySelector<HTMLElement>(`#edit-${key}`)?.focus(), { injector: this.injector });
  }

  protected stored(material: ShopMaterial): void {
    this.materials.update((list) => list.map((m) => (m.key === material.key ? material : m)));
    this.saved.set(`Saved ${material.label}. New plans and recalculations use it.`);
    this.closed(material.key);
  }

  protected inches(value: number): string {
    return showLength(value, 'in');
  }

  protected money(value: number): string {
    return formatMoney(value);
  }
}
