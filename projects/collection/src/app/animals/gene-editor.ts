import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, Page, describeApiError } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import type { AnimalGene, Trait } from '../core/collection-types';
import { GeneRow, GeneState, STATE_LABELS, rowsFromGenes, statesFor, toSetGenesRequest } from './gene-rows';
import { ShellLink } from '../core/shell-link';
import { geneLabel } from './gene-text';

/** An animal's genes: shown as keepers write them, edited against the shop's trait list. */
@Component({
  selector: 'tw-gene-editor',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIconButton, MatIcon, MatFormFieldModule, MatInput, ErrorBanner, ShellLink],
  template: `
    @if (!editing()) {
      @if (genes().length) {
        <ul class="genes">
          @for (gene of genes(); track gene.traitId) {
            <li [class]="'gene gene-' + gene.state">{{ geneLabel(gene) }} <span class="muted">{{ gene.mode.replace('-', ' ') }}</span></li>
          }
        </ul>
      } @else {
        <p class="none">No genes recorded: normal for every trait of the list.</p>
      }
      <button mat-button type="button" (click)="edit()"><mat-icon>edit</mat-icon>Edit genes</button>
    } @else {
      <form (submit)="$event.preventDefault(); save()" aria-label="Genes">
        @for (row of rows(); track $index; let i = $index) {
          <div class="row">
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Trait</mat-label>
              <select matNativeControl [value]="row.traitId ?? ''" (change)="setTrait(i, $any($event.target).value)">
                <option value="">Pick a trait</option>
                @for (t of traitList(); track t.id) {
                  <option [value]="t.id">{{ t.name }} ({{ t.mode.replace('-', ' ') }})</option>
                }
              </select>
            </mat-form-field>
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>State</mat-label>
              <select matNativeControl [value]="row.state" (change)="update(i, { state: $any($event.target).value })">
                @for (s of statesOf(row); track s) {
                  <option [value]="s">{{ stateLabels[s] }}</option>
                }
              </select>
            </mat-form-field>
            @if (row.state === 'possible-het') {
              <mat-form-field appearance="outline" subscriptSizing="dynamic" class="pct">
                <mat-label>Chance het (%)</mat-label>
                <input matInput type="number" min="0.01" max="99.99" step="0.01" [value]="row.hetPercent" (input)="update(i, { hetPercent: $any($event.target).value })" />
              </mat-form-field>
            }
            <button matIconButton type="button" [attr.aria-label]="'Remove row ' + (i + 1)" (click)="remove(i)"><mat-icon>close</mat-icon></button>
          </div>
        }
        @if (error(); as message) {
          <tw-error-banner [message]="message" />
        }
        <div class="actions">
          <button mat-button type="button" (click)="add()"><mat-icon>add</mat-icon>Add a trait</button>
          <span class="spacer"></span>
          <button mat-button type="button" (click)="editing.set(false)">Cancel</button>
          <button mat-flat-button type="submit" [disabled]="saving()">Save genes</button>
        </div>
        <p class="muted">A trait left out is normal. Pairing outcomes use these genes. Traits and their modes come from the <a class="link" twLink="traits">trait list</a>.</p>
      </form>
    }
  `,
  styles: `
    :host { display: block; }
    .genes { display: flex; flex-wrap: wrap; gap: 6px; list-style: none; margin: 0 0 8px; padding: 0; }
    .gene { padding: 4px 10px; border-radius: 8px; background: var(--mat-sys-surface-container-high); }
    .gene .muted { margin-left: 4px; }
    .gene-visual, .gene-single, .gene-super { background: var(--mat-sys-primary-container); color: var(--mat-sys-on-primary-container); }
    .row { display: flex; flex-wrap: wrap; align-items: center; gap: 8px; margin-bottom: 8px; }
    .row mat-form-field { flex: 1 1 120px; }
    .row .pct { flex: 0 1 120px; }
    .actions { display: flex; flex-wrap: wrap; align-items: center; gap: 4px; }
    .spacer { flex: 1; }
  `,
})
export class GeneEditor {
  readonly animalId = input.required<number>();
  readonly genes = input.required<readonly AnimalGene[]>();
  readonly saved = output<void>();

  private readonly api = inject(CollectionApi);
  protected readonly editing = signal(false);
  protected readonly rows = signal<GeneRow[]>([]);
  protected readonly saving = signal(false);
  protected readonly error = signal<string | null>(null);
  private readonly traits = rxResource({
    params: () => (this.editing() ? true : undefined),
    stream: () => this.api.get<Page<Trait>>('/traits', { limit: 200, sort: 'name' }),
  });
  protected readonly traitList = computed(() => (this.traits.hasValue() ? this.traits.value().items : []));
  protected readonly stateLabels = STATE_LABELS;
  protected readonly geneLabel = geneLabel;

  protected edit(): void {
    this.rows.set(rowsFromGenes(this.genes()));
    this.error.set(null);
    this.editing.set(true);
  }

  protected statesOf(row: GeneRow): GeneState[] {
    const trait = this.traitList().find((t) => t.id === row.traitId);
    return trait ? statesFor(trait.mode) : [row.state];
  }

  protected setTrait(index: number, value: string): void {
    const trait = this.traitList().find((t) => t.id === Number(value));
    const states = trait ? statesFor(trait.mode) : [];
    this.update(index, { traitId: trait?.id ?? null, ...(states.includes(this.rows()[index]!.state) ? {} : { state: states[0] ?? 'het' }) });
  }

  protected update(index: number, change: Partial<GeneRow>): void {
    this.rows.update((rows) => rows.map((r, i) => (i === index ? { ...r, ...change } : r)));
  }

  protected add(): void {
    this.rows.update((rows) => [...rows, { traitId: null, state: 'het', hetPercent: '' }]);
  }

  protected remove(index: number): void {
    this.rows.update((rows) => rows.filter((_, i) => i !== index));
  }

  protected save(): void {
    const body = toSetGenesRequest(this.rows(), this.traitList());
    if (typeof body === 'string') return this.error.set(body);
    this.saving.set(true);
    this.error.set(null);
    this.api.put(`/animals/${this.animalId()}/genes`, body).subscribe({
      next: () => {
        this.saving.set(false);
        this.editing.set(false);
        this.saved.emit();
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(describeApiError(error));
      },
    });
  }
}
