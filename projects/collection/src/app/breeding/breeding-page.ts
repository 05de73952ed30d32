import { ChangeDetectionStrategy, Component, Injector, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, Page, PageHeader, describeApiError, injectShellNavigate } from '@tubwright/kit';
import { Animal } from '../animals/animal';
import { CollectionApi } from '../core/collection-api';
import type { Clutch, Pairing } from '../core/collection-types';
import { formatDay } from '../core/format';
import { ShellLink } from '../core/shell-link';
import { PAIRING_STATUS_LABELS, seasonOf } from './breeding-text';
import { ClutchTable } from './clutch-table';
import { openHatchDialog } from './open-hatch-dialog';

/** Pairings of the season and the clutches in the incubator; plan a new pairing here. */
@Component({
  selector: 'tw-breeding-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatAnchor, MatIcon, MatFormFieldModule, MatInput, ErrorBanner, PageHeader, ShellLink, ClutchTable],
  template: `
    <tw-page-header heading="Breeding" subheading="Pairings, what they can produce, and clutches with their expected hatch.">
      <a mat-button twLink="traits"><mat-icon>genetics</mat-icon>Trait list</a>
      <button mat-stroked-button type="button" (click)="adding.set(!adding())" [attr.aria-expanded]="adding()"><mat-icon>add</mat-icon>Plan a pairing</button>
    </tw-page-header>

    @if (adding()) {
      <section class="card" aria-labelledby="new-pairing-heading">
        <h2 id="new-pairing-heading">Plan a pairing</h2>
        <form class="form-row" (submit)="$event.preventDefault(); create()">
          <mat-form-field appearance="outline" subscriptSizing="dynamic">
            <mat-label>Male (sire)</mat-label>
            <select matNativeControl [value]="sireId()" (change)="sireId.set($any($event.target).value)" required>
              <option value="">Pick a male</option>
              @for (a of males(); track a.id) {
                <option [value]="a.id">{{ a.code }} {{ a.name }} · {{ a.morph || a.species }}</option>
              }
            </select>
          </mat-form-field>
          <mat-form-field appearance="outline" subscriptSizing="dynamic">
            <mat-label>Female (dam)</mat-label>
            <select matNativeControl [value]="damId()" (change)="damId.set($any($event.target).value)" required>
              <option value="">Pick a female</option>
              @for (a of females(); track a.id) {
                <option [value]="a.id">{{ a.code }} {{ a.name }} · {{ a.morph || a.species }}</option>
              }
            </select>
          </mat-form-field>
          <mat-form-field appearance="outline" subscriptSizing="dynamic" class="narrow">
            <mat-label>Season</mat-label>
            <input matInput [value]="season()" (input)="season.set($any($event.target).value)" maxlength="20" required />
          </mat-form-field>
          <button mat-flat-button type="submit" [disabled]="saving() || !sireId() || !damId()">Plan it</button>
        </form>
        @if (createError(); as message) {
          <tw-error-banner [message]="message" />
        }
      </section>
    }

    <section class="card" aria-labelledby="pairings-heading">
      <h2 id="pairings-heading">Pairings</h2>
      @if (pairings.error()) {
        <tw-error-banner [message]="errorText(pairings.error())" [retryable]="true" (retry)="pairings.reload()" />
      }
      @if (pairings.hasValue()) {
        @if (pairings.value().items.length) {
          <div class="table-scroll">
            <table class="simple-table" aria-label="Pairings, newest first">
              <thead>
                <tr><th scope="col">Pairing</th><th scope="col">Season</th><th scope="col">Status</th><th scope="col">Laying window</th><th scope="col">Last seen</th></tr>
              </thead>
              <tbody>
                @for (p of pairings.value().items; track p.id) {
                  <tr>
                    <td><a class="link" [twLink]="'breeding/pairings/' + p.id">{{ p.sire.code }} × {{ p.dam.code }}</a> <span class="muted">{{ p.sire.name }} × {{ p.dam.name }}</span></td>
                    <td>{{ p.season }}</td>
                    <td><span class="status">{{ statusLabels[p.status] }}</span></td>
                    <td>{{ p.layingWindow ? formatDay(p.layingWindow.from) + ' – ' + formatDay(p.layingWindow.to) : '—' }}</td>
                    <td>{{ lastObservation(p) }}</td>
                  </tr>
                }
              </tbody>
            </table>
          </div>
        } @else {
          <p class="none">No pairings yet.</p>
        }
      }
    </section>

    <section class="card" aria-labelledby="clutches-heading">
      <h2 id="clutches-heading">Clutches</h2>
      @if (clutches.hasValue()) {
        @if (clutches.value().items.length) {
          <tw-clutch-table [clutches]="clutches.value().items" label="Clutches" [pairingName]="pairingLabel" (hatch)="recordHatch($event)" />
        } @else {
          <p class="none">No clutches yet. Record one from its pairing.</p>
        }
      }
    </section>
  `,
  styles: `
    :host { display: block; }
    .narrow { flex: 0 1 140px !important; }
  `,
})
export class BreedingPage {
  private readonly api = inject(CollectionApi);
  private readonly navigate = injectShellNavigate();
  private readonly injector = inject(Injector);

  protected readonly pairings = rxResource({ stream: () => this.api.get<Page<Pairing>>('/pairings', { limit: 100, sort: '-createdAt' }) });
  protected readonly clutches = rxResource({ stream: () => this.api.get<Page<Clutch>>('/clutches', { limit: 100, sort: '-laidOn' }) });
  private readonly adults = rxResource({
    params: () => this.adding(),
    stream: ({ params }) => this.api.get<Page<Animal>>('/animals', params ? { limit: 200, sort: 'code', status: 'active' } : { limit: 1 }),
  });
  protected readonly males = computed(() => (this.adults.hasValue() ? this.adults.value().items.filter((a) => a.sex === 'male') : []));
  protected readonly females = computed(() => (this.adults.hasValue() ? this.adults.value().items.filter((a) => a.sex === 'female') : []));

  protected readonly adding = signal(false);
  protected readonly sireId = signal('');
  protected readonly damId = signal('');
  protected readonly season = signal(seasonOf(new Date()));
  protected readonly saving = signal(false);
  protected readonly createError = signal<string | null>(null);
  protected readonly statusLabels = PAIRING_STATUS_LABELS;
  protected readonly formatDay = formatDay;
  protected readonly pairingLabel = (id: number) => this.pairingName(id);
  protected readonly errorText = (error: unknown) => describeApiError(error);

  protected lastObservation(p: Pairing): string {
    const last = [...p.observations].sort((a, b) => b.observedOn.localeCompare(a.observedOn))[0];
    return last ? `${last.kind} ${formatDay(last.observedOn)}` : '—';
  }

  protected pairingName(id: number): string {
    const p = this.pairings.hasValue() ? this.pairings.value().items.find((x) => x.id === id) : undefined;
    return p ? `${p.sire.code} × ${p.dam.code}` : `Pairing ${id}`;
  }

  protected recordHatch(clutch: Clutch): void {
    openHatchDialog(this.injector, clutch, this.pairingName(clutch.pairingId)).subscribe((result) => {
      this.clutches.reload();
      if (result?.open) this.navigate(result.open);
    });
  }

  protected create(): void {
    this.saving.set(true);
    this.createError.set(null);
    const body = { sireId: Number(this.sireId()), damId: Number(this.damId()), season: this.season().trim() };
    this.api.post<Pairing>('/pairings', body).subscribe({
      next: (pairing) => {
        this.saving.set(false);
        this.navigate(`breeding/pairings/${pairing.id}`);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.createError.set(describeApiError(error));
      },
    });
  }
}
