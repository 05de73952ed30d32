import { ChangeDetectionStrategy, Component, DestroyRef, inject, input, output, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { ErrorBanner, describeApiError } from '@tubwright/kit';
import { from, switchMap } from 'rxjs';
import { PlanApi } from '../shared/plan-api';
import { PHOTO_TYPES, makeThumbnail, photoProblem } from './photo-thumbnail';
import { TubPhoto } from './tub-photo';

/** Add, replace or remove the one photo of a tub model; each action is saved at once. */
@Component({
  selector: 'tw-tub-model-photo-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, ErrorBanner, TubPhoto],
  template: `
    <h2 id="photo-title">Photo</h2>
    @if (error(); as message) {
      <tw-error-banner [message]="message" />
    }
    @if (photoId(); as id) {
      <tw-tub-photo class="picture" [photoId]="id" size="file" [alt]="'Photo of ' + name()" />
    } @else {
      <p class="none">No photo yet. One helps tell look-alike tubs apart at the store.</p>
    }
    @if (canWrite()) {
      <div class="actions">
        <input #file type="file" [accept]="accepted" (change)="upload(file)" [disabled]="busy()" tabindex="-1" aria-hidden="true" />
        <button mat-stroked-button type="button" (click)="file.click()" [disabled]="busy()">
          <mat-icon>add_a_photo</mat-icon>{{ uploading() ? 'Uploading…' : photoId() ? 'Replace photo' : 'Add a photo' }}
        </button>
        @if (photoId()) {
          @if (confirmRemove()) {
            <span class="confirm" role="alert">Remove the photo?</span>
            <button mat-flat-button type="button" class="danger" (click)="remove()" [disabled]="busy()">Remove</button>
            <button mat-button type="button" (click)="confirmRemove.set(false)">Keep it</button>
          } @else {
            <button mat-button type="button" (click)="confirmRemove.set(true)" [disabled]="busy()">Remove photo…</button>
          }
        }
      </div>
      <p class="hint">JPEG, PNG, GIF or WebP, up to 5 MB. A new photo replaces the old one.</p>
    }
  `,
  styles: `
    :host { display: block; }
    h2 { margin: 0 0 8px; font: var(--mat-sys-title-medium); }
    .picture { width: 100%; max-width: 360px; aspect-ratio: 4 / 3; border-radius: var(--mat-sys-corner-medium, 12px); border: 1px solid var(--mat-sys-outline-variant); }
    .picture ::ng-deep img { object-fit: contain; background: var(--mat-sys-surface-container-lowest); }
    .none { margin: 0; font: var(--mat-sys-body-medium); color: var(--mat-sys-on-surface-variant); }
    .actions { display: flex; flex-wrap: wrap; align-items: center; gap: 8px; margin-top: 12px; }
    .actions input { position: absolute; width: 1px; height: 1px; opacity: 0; pointer-events: none; }
    .confirm { font: var(--mat-sys-body-medium); }
    .danger { --mat-button-filled-container-color: var(--mat-sys-error); --mat-button-filled-label-text-color: var(--mat-sys-on-error); }
    .hint { margin: 8px 0 0; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
  `,
  host: { role: 'region', 'aria-labelledby': 'photo-title' },
})
export class TubModelPhotoPanel {
  readonly tubModelId = input.required<number>();
  readonly name = input.required<string>();
  readonly photoId = input<number | null>(null);
  readonly canWrite = input(false);
  /** The new photo id, or null once removed. */
  readonly photoChange = output<number | null>();

  private readonly api = inject(PlanApi);
  private readonly destroyRef = inject(DestroyRef);
  protected readonly accepted = PHOTO_TYPES.join(',');
  protected readonly busy = signal(false);
  protected readonly uploading = signal(false);
  protected readonly confirmRemove = signal(false);
  protected readonly error = signal<string | null>(null);

  protected upload(input: HTMLInputElement): void {
    const file = input.files?.[0];
    input.value = '';
    if (!file || this.busy()) return;
    const problem = photoProblem(file);
    this.error.set(problem);
    if (problem) return;
    this.busy.set(true);
    this.uploading.set(true);
    from(makeThumbnail(file))
      .pipe(
        switchMap((thumbnail) => this.api.uploadTubModelPhoto(this.tubModelId(), file, file.name, thumbnail)),
        takeUntilDestroyed(this.destroyRef),
      )
      .subscribe({
        next: (photo) => {
          this.busy.set(false);
          this.uploading.set(false);
          this.photoChange.emit(photo.id);
        },
        error: (error: unknown) => {
          this.busy.set(false);
          this.uploading.set(false);
          this.error.set(describeApiError(error));
        },
      });
  }

  protected remove(): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    this.api
      .removeTubModelPhoto(this.tubModelId())
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: () => {
          this.busy.set(false);
          this.confirmRemove.set(false);
          this.photoChange.emit(null);
        },
        error: (error: unknown) => {
          this.busy.set(false);
          this.confirmRemove.set(false);
          this.error.set(describeApiError(error));
        },
      });
  }
}
