import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, describeApiError } from '@tubwright/kit';
import { Observable } from 'rxjs';
import { CollectionApi } from '../core/collection-api';
import type { EmptyTubList, PlacementHistory, Tub } from '../core/collection-types';

/** Moves an animal into an empty tub (or places it in its first one); the old placement is kept in history. */
@Component({
  selector: 'tw-move-animal',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, ErrorBanner],
  template: `
    @if (error(); as message) {
      <tw-error-banner [message]="message" />
    }
    @if (loading()) {
      <p class="hint">Finding empty tubs…</p>
    } @else if (tubs().length === 0) {
      <p class="hint">Every tub is taken. Build a rack or free a tub first.</p>
    } @else {
      <form (submit)="$event.preventDefault(); move()" class="row">
        <mat-form-field appearance="outline" subscriptSizing="dynamic">
          <mat-label>{{ currentLabel() ? 'Move to' : 'Place in' }}</mat-label>
          <select matNativeControl [value]="tubId()" (change)="tubId.set($any($event.target).value)" required>
            <option value="">Pick an empty tub</option>
            @for (group of groups(); track group.rack) {
              <optgroup [label]="'Rack ' + group.rack">
                @for (tub of group.tubs; track tub.id) {
                  <option [value]="tub.id">{{ tub.label }}</option>
                }
              </optgroup>
            }
          </select>
        </mat-form-field>
        <button mat-flat-button type="submit" [disabled]="!tubId() || saving()">{{ currentLabel() ? 'Move' : 'Place' }}</button>
        @if (currentLabel()) {
          <button mat-button type="button" (click)="takeOut()" [disabled]="saving()">Take out of {{ currentLabel() }}</button>
        }
      </form>
    }
  `,
  styles: `
    :host { display: block; }
    .row { display: flex; flex-wrap: wrap; align-items: center; gap: 12px; }
    mat-form-field { flex: 1 1 200px; max-width: 280px; }
    .hint { margin: 0; color: var(--mat-sys-on-surface-variant); }
  `,
})
export class MoveAnimal {
  readonly animalId = input.required<number>();
  readonly currentLabel = input<string | null>(null);
  readonly moved = output<void>();

  private readonly api = inject(CollectionApi);
  protected readonly tubs = signal<Tub[]>([]);
  protected readonly loading = signal(true);
  protected readonly saving = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly tubId = signal('');
  protected readonly groups = computed(() => {
    const byRack = new Map<string, Tub[]>();
    for (const tub of this.tubs()) byRack.set(tub.rackName, [...(byRack.get(tub.rackName) ?? []), tub]);
    return [...byRack].map(([rack, tubs]) => ({ rack, tubs }));
  });

  constructor() {
    this.loadEmpty();
  }

  protected move(): void {
    this.run(this.api.put<PlacementHistory>(`/animals/${this.animalId()}/tub`, { tubId: Number(this.tubId()) }));
  }

  protected takeOut(): void {
    this.run(this.api.delete(`/animals/${this.animalId()}/tub`));
  }

  private run(request: Observable<unknown>): void {
    this.saving.set(true);
    this.error.set(null);
    request.subscribe({
      next: () => {
        this.saving.set(false);
        this.tubId.set('');
        this.loadEmpty();
        this.moved.emit();
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(describeApiError(error));
        this.loadEmpty();
      },
    });
  }

  private loadEmpty(): void {
    this.api.get<EmptyTubList>('/tubs/empty').subscribe({
      next: (list) => {
        this.tubs.set(list.items);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.loading.set(false);
        this.error.set(describeApiError(error));
      },
    });
  }
}
