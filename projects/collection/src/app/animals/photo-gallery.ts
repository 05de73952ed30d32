import { ChangeDetectionStrategy, Component, DestroyRef, effect, inject, input, signal } from '@angular/core';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { ErrorBanner, describeApiError } from '@tubwright/kit';
import { forkJoin, map, of } from 'rxjs';
import { CollectionApi } from '../core/collection-api';
import type { AnimalPhoto, AnimalPhotoList } from '../core/collection-types';
import { formatDay } from '../core/format';

/** What the server accepts (checked again there by the file's bytes). */
const ACCEPTED_TYPES = ['image/jpeg', 'image/png', 'image/gif', 'image/webp'];
const MAX_BYTES = 5 * 1024 * 1024;

interface ShownPhoto extends AnimalPhoto {
  objectUrl: string;
}

/**
 * An animal's photos. The image URLs need the bearer token, so the bytes are fetched through the
 * API client and shown from object URLs (released when the list changes or the page closes).
 */
@Component({
  selector: 'tw-photo-gallery',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIconButton, MatIcon, ErrorBanner],
  template: `
    @if (error(); as message) {
      <tw-error-banner [message]="message" />
    }
    @if (photos().length) {
      <ul class="photos">
        @for (photo of photos(); track photo.id) {
          <li>
            <img [src]="photo.objectUrl" [alt]="'Photo of ' + animalCode() + ', ' + formatDay(photo.createdAt)" loading="lazy" />
            <div class="caption">
              <span>{{ formatDay(photo.createdAt) }}</span>
              <button matIconButton type="button" [attr.aria-label]="'Remove the photo of ' + formatDay(photo.createdAt)" (click)="remove(photo)">
                <mat-icon>delete</mat-icon>
              </button>
            </div>
          </li>
        }
      </ul>
    } @else if (!loading()) {
      <p class="none">No photos yet.</p>
    }
    <label class="upload">
      <input #file type="file" [accept]="accepted" (change)="upload(file)" [disabled]="uploading()" />
      <button mat-stroked-button type="button" (click)="file.click()" [disabled]="uploading()">
        <mat-icon>add_a_photo</mat-icon>{{ uploading() ? 'Uploading…' : 'Add a photo' }}
      </button>
      <span class="hint">JPEG, PNG, GIF or WebP, up to 5 MB.</span>
    </label>
  `,
  styles: `
    :host { display: block; }
    .photos { display: grid; grid-template-columns: repeat(auto-fill, minmax(140px, 1fr)); gap: 12px; list-style: none; margin: 0 0 12px; padding: 0; }
    li { border: 1px solid var(--mat-sys-outline-variant); border-radius: 12px; overflow: hidden; background: var(--mat-sys-surface-container-low); }
    img { display: block; width: 100%; aspect-ratio: 4 / 3; object-fit: cover; }
    .caption { display: flex; align-items: center; justify-content: space-between; padding: 0 4px 0 10px; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .upload { display: flex; flex-wrap: wrap; align-items: center; gap: 12px; }
    .upload input { position: absolute; width: 1px; height: 1px; opacity: 0; pointer-events: none; }
    .hint, .none { font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .none { margin: 0 0 12px; }
  `,
})
export class PhotoGallery {
  readonly animalId = input.required<number>();
  readonly animalCode = input('');

  private readonly api = inject(CollectionApi);
  protected readonly photos = signal<ShownPhoto[]>([]);
  protected readonly loading = signal(false);
  protected readonly uploading = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly accepted = ACCEPTED_TYPES.join(',');
  protected readonly formatDay = formatDay;

  constructor() {
    effect(() => this.load(this.animalId()));
    inject(DestroyRef).onDestroy(() => this.release(this.photos()));
  }

  protected upload(input: HTMLInputElement): void {
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    if (!ACCEPTED_TYPES.includes(file.type)) {
      this.error.set(`${file.name} is not a JPEG, PNG, GIF or WebP image.`);
      return;
    }
    if (file.size > MAX_BYTES) {
      this.error.set(`${file.name} is larger than 5 MB.`);
      return;
    }
    this.uploading.set(true);
    this.error.set(null);
    this.api.upload<AnimalPhoto>(`/animals/${this.animalId()}/photos`, 'photo', file).subscribe({
      next: () => {
        this.uploading.set(false);
        this.load(this.animalId());
      },
      error: (error: unknown) => {
        this.uploading.set(false);
        this.error.set(describeApiError(error));
      },
    });
  }

  protected remove(photo: ShownPhoto): void {
    this.api.delete(`/animal-photos/${photo.id}`).subscribe({
      next: () => {
        URL.revokeObjectURL(photo.objectUrl);
        this.photos.update((list) => list.filter((p) => p.id !== photo.id));
      },
      error: (error: unknown) => this.error.set(describeApiError(error)),
    });
  }

  private load(animalId: number): void {
    this.loading.set(true);
    this.api.get<AnimalPhotoList>(`/animals/${animalId}/photos`).subscribe({
      next: (list) => {
        const fetches = list.items.map((photo) => this.api.blob(photo.url).pipe(map((blob) => ({ ...photo, objectUrl: URL.createObjectURL(blob) }))));
        (fetches.length ? forkJoin(fetches) : of([])).subscribe({
          next: (shown) => {
            this.release(this.photos());
            this.photos.set(shown);
            this.loading.set(false);
          },
          error: (error: unknown) => {
            this.loading.set(false);
            this.error.set(describeApiError(error));
          },
        });
      },
      error: (error: unknown) => {
        this.loading.set(false);
        this.error.set(describeApiError(error));
      },
    });
  }

  private release(photos: ShownPhoto[]): void {
    for (const p of photos) URL.revokeObjectURL(p.objectUrl);
  }
}
