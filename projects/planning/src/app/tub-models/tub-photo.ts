import { ChangeDetectionStrategy, Component, DestroyRef, effect, inject, input, signal } from '@angular/core';
import { Subscription } from 'rxjs';
import { PlanApi } from '../shared/plan-api';

/**
 * A tub model's photo. Its URL needs the bearer token, so the bytes come through the API client
 * and show from an object URL, released when the photo changes or the view closes.
 */
@Component({
  selector: 'tw-tub-photo',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class.failed]': 'failed()' },
  template: `
    @if (url(); as src) {
      <img [src]="src" [alt]="alt()" />
    } @else if (failed()) {
      <span class="missing" role="img" [attr.aria-label]="alt() + ' (could not load)'">?</span>
    }
  `,
  styles: `
    :host { display: block; overflow: hidden; background: var(--mat-sys-surface-container); }
    img { display: block; width: 100%; height: 100%; object-fit: cover; }
    .missing { display: grid; place-items: center; width: 100%; height: 100%; color: var(--mat-sys-on-surface-variant); }
  `,
})
export class TubPhoto {
  readonly photoId = input.required<number>();
  /** `thumbnail` for lists; `file` for the original. */
  readonly size = input<'thumbnail' | 'file'>('thumbnail');
  readonly alt = input.required<string>();

  private readonly api = inject(PlanApi);
  protected readonly url = signal<string | null>(null);
  protected readonly failed = signal(false);
  private request: Subscription | null = null;

  constructor() {
    effect(() => this.load(this.photoId(), this.size()));
    inject(DestroyRef).onDestroy(() => {
      this.request?.unsubscribe();
      this.release();
    });
  }

  private load(id: number, size: 'thumbnail' | 'file'): void {
    this.request?.unsubscribe();
    this.failed.set(false);
    this.request = this.api.file(`/tub-model-photos/${id}/${size}`).subscribe({
      next: (blob) => {
        this.release();
        this.url.set(URL.createObjectURL(blob));
      },
      error: () => {
        this.release();
        this.failed.set(true);
      },
    });
  }

  private release(): void {
    const current = this.url();
    if (current) URL.revokeObjectURL(current);
    this.url.set(null);
  }
}
