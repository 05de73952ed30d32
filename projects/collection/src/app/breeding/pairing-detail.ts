import { ChangeDetectionStrategy, Component, Injector, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ApiError, ErrorBanner, Page, describeApiError, injectShellNavigate } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import type { Clutch, ObservationKind, Pairing, PairingOutcomesView, PairingStatus } from '../core/collection-types';
import { formatDay, formatPercent, todayUtc } from '../core/format';
import { ShellLink } from '../core/shell-link';
import { PAIRING_STATUSES, PAIRING_STATUS_LABELS, expectedHatchPreview } from './breeding-text';
import { ClutchTable } from './clutch-table';
import { openHatchDialog } from './open-hatch-dialog';

/** One pairing: its progress, what it can produce (exact genetics), and its clutches. */
@Component({
  selector: 'tw-pairing-detail',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, MatFormFieldModule, MatInput, ErrorBanner, ShellLink, ClutchTable],
  templateUrl: './pairing-detail.html',
  styles: `
    :host { display: block; }
    h1 { margin: 0 0 4px; font: var(--mat-sys-headline-small); }
    .layout { display: grid; grid-template-columns: minmax(0, 1fr) minmax(280px, 380px); gap: 0 16px; align-items: start; }
    @media (max-width: 960px) { .layout { grid-template-columns: minmax(0, 1fr); } }
    .sub { margin: 0 0 16px; color: var(--mat-sys-on-surface-variant); }
    .bar { display: inline-block; height: 8px; border-radius: 4px; background: var(--mat-sys-primary); vertical-align: middle; margin-right: 8px; min-width: 2px; }
    .fraction { font-variant-numeric: tabular-nums; white-space: nowrap; }
    .facts { display: grid; grid-template-columns: auto 1fr; gap: 6px 16px; margin: 0 0 12px; }
    .facts dt { color: var(--mat-sys-on-surface-variant); }
    .facts dd { margin: 0; }
    .stack { display: flex; flex-direction: column; gap: 12px; }
    .observe { display: flex; flex-wrap: wrap; align-items: center; gap: 12px; }
    .observe mat-form-field { flex: 1 1 120px; }
    .observations { list-style: none; margin: 12px 0 0; padding: 0; }
    .observations li { padding: 4px 0; border-top: 1px solid var(--mat-sys-outline-variant); }
    .preview { margin: 0; padding: 8px 12px; border-radius: 8px; background: var(--mat-sys-surface-container); }
    .notice { padding: 8px 16px; border-radius: 12px; background: var(--mat-sys-tertiary-container); color: var(--mat-sys-on-tertiary-container); }
  `,
})
export class PairingDetail {
  readonly pairingId = input.required<number>();

  private readonly api = inject(CollectionApi);
  private readonly injector = inject(Injector);
  private readonly navigate = injectShellNavigate();
  protected readonly pairing = rxResource({ params: () => this.pairingId(), stream: ({ params }) => this.api.get<Pairing>(`/pairings/${params}`) });
  protected readonly outcomes = rxResource({ params: () => this.pairingId(), stream: ({ params }) => this.api.get<PairingOutcomesView>(`/pairings/${params}/outcomes`) });
  protected readonly clutches = rxResource({
    params: () => this.pairingId(),
    stream: ({ params }) => this.api.get<Page<Clutch>>('/clutches', { pairingId: params, sort: '-laidOn', limit: 50 }),
  });

  protected readonly outcomesProblem = computed(() => {
    const error = this.outcomes.error();
    if (!error) return null;
    // 422: the pair carries no recorded gene, so there is nothing to compute.
    return error instanceof ApiError && error.status === 422 ? { soft: true, text: error.message } : { soft: false, text: describeApiError(error) };
  });

  protected readonly statuses = PAIRING_STATUSES;
  protected readonly statusLabels = PAIRING_STATUS_LABELS;
  protected readonly formatDay = formatDay;
  protected readonly formatPercent = formatPercent;
  protected readonly today = todayUtc();
  protected readonly error = signal<string | null>(null);
  protected readonly notice = signal('');

  // Progress form
  protected readonly observationKind = signal<ObservationKind>('lock');
  protected readonly observedOn = signal(todayUtc());

  // Clutch form
  protected readonly laidOn = signal(todayUtc());
  protected readonly fertileEggs = signal('');
  protected readonly slugs = signal('0');
  protected readonly incubationTempF = signal('89');
  protected readonly humidityPct = signal('');
  protected readonly hatchPreview = computed(() => expectedHatchPreview(this.laidOn()));
  protected readonly savingClutch = signal(false);
  protected readonly clutchNotice = signal('');

  protected hetText(chances: Record<string, number>): string {
    return Object.entries(chances)
      .map(([trait, p]) => `${formatPercent(p)} het ${trait}`)
      .join(', ');
  }

  protected recordHatch(clutch: Clutch, p: Pairing): void {
    openHatchDialog(this.injector, clutch, `${p.sire.code} × ${p.dam.code}`).subscribe((result) => {
      this.clutches.reload();
      if (result?.hatch) this.clutchNotice.set(`Hatch recorded: ${result.hatch.hatchlings.map((h) => h.code).join(', ')}.`);
      if (result?.open) this.navigate(result.open);
    });
  }

  protected setStatus(status: PairingStatus): void {
    this.patch({ status }, `Status set to ${PAIRING_STATUS_LABELS[status].toLowerCase()}.`);
  }

  protected setDate(field: 'ovulationDate' | 'preLayShedDate', value: string): void {
    this.patch({ [field]: value || null }, value ? 'Date saved; the laying window follows it.' : 'Date cleared.');
  }

  protected addObservation(): void {
    this.error.set(null);
    this.api.post<Pairing>(`/pairings/${this.pairingId()}/observations`, { kind: this.observationKind(), observedOn: this.observedOn() }).subscribe({
      next: () => {
        this.notice.set(`Recorded: ${this.observationKind()} on ${formatDay(this.observedOn())}.`);
        this.pairing.reload();
      },
      error: (error: unknown) => this.error.set(describeApiError(error)),
    });
  }

  protected recordClutch(): void {
    const fertile = Number(this.fertileEggs());
    if (this.fertileEggs() === '' || !Number.isInteger(fertile) || fertile < 0) return this.error.set('Fertile eggs: give a whole number, 0 or more.');
    const body = {
      pairingId: this.pairingId(),
      laidOn: this.laidOn(),
      fertileEggs: fertile,
      slugs: Number(this.slugs() || 0),
      incubationTempF: this.incubationTempF() === '' ? null : Number(this.incubationTempF()),
      humidityPct: this.humidityPct() === '' ? null : Number(this.humidityPct()),
    };
    this.savingClutch.set(true);
    this.error.set(null);
    this.api.post<Clutch>('/clutches', body).subscribe({
      next: (clutch) => {
        this.savingClutch.set(false);
        this.clutchNotice.set(`Clutch recorded: expected to hatch ${formatDay(clutch.expectedHatchFrom)} to ${formatDay(clutch.expectedHatchTo)}.`);
        this.fertileEggs.set('');
        this.clutches.reload();
        this.pairing.reload();
      },
      error: (error: unknown) => {
        this.savingClutch.set(false);
        this.error.set(describeApiError(error));
      },
    });
  }

  private patch(body: Record<string, unknown>, message: string): void {
    this.error.set(null);
    this.api.patch<Pairing>(`/pairings/${this.pairingId()}`, body).subscribe({
      next: () => {
        this.notice.set(message);
        this.pairing.reload();
      },
      error: (error: unknown) => this.error.set(describeApiError(error)),
    });
  }
}
