import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, Page, PageHeader, describeApiError, injectShellNavigate } from '@tubwright/kit';
import { ChartBand, ChartSeries, LineChart } from '../charts/line-chart';
import { CollectionApi } from '../core/collection-api';
import type { EnvironmentReading, EnvironmentReadingPage, Probe, Rack, RangeSet } from '../core/collection-types';
import { formatMoment, formatShortDay, fromLocalInput, toLocalInput } from '../core/format';
import { toCelsius } from './environment-range';

interface UploadResult {
  imported: number;
  alerts: number;
}

/** Temperature and humidity per rack against the ranges the shop keeps, with a caution when out of range. */
@Component({
  selector: 'tw-environment-view',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, MatFormFieldModule, MatInput, ErrorBanner, PageHeader, LineChart],
  templateUrl: './environment-view.html',
  styles: `
    :host { display: block; }
    .top { margin-bottom: 16px; }
    .top mat-form-field { flex: 0 1 320px !important; }
    .ranges { display: flex; flex-wrap: wrap; gap: 8px 24px; margin: 0 0 12px; padding: 0; list-style: none; }
    .ranges b { font-variant-numeric: tabular-nums; }
    .alert-box { display: flex; gap: 12px; align-items: flex-start; padding: 12px 16px; margin: 0 0 16px; border-radius: 12px; background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }
    .alert-box p { margin: 0; }
    .alert-box ul { margin: 4px 0 0; padding-left: 18px; }
    tr.out td { background: color-mix(in srgb, var(--mat-sys-error-container) 55%, transparent); }
    .num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
    form .form-row { margin-bottom: 12px; }
    .upload input { position: absolute; width: 1px; height: 1px; opacity: 0; pointer-events: none; }
    .notice { padding: 8px 16px; border-radius: 12px; background: var(--mat-sys-tertiary-container); color: var(--mat-sys-on-tertiary-container); }
  `,
})
export class EnvironmentView {
  readonly rackId = input<number | null>(null);

  private readonly api = inject(CollectionApi);
  private readonly navigate = injectShellNavigate();
  protected readonly racks = rxResource({ stream: () => this.api.get<Page<Rack>>('/racks', { limit: 200, sort: 'name' }) });
  protected readonly ranges = rxResource({ stream: () => this.api.get<RangeSet>('/environment/ranges') });
  protected readonly readings = rxResource({
    params: () => this.rackId(),
    stream: ({ params }) => this.api.get<EnvironmentReadingPage>('/environment-readings', { rackId: params, sort: '-takenAt', limit: 200 }),
  });

  protected readonly rackName = computed(() => {
    const id = this.rackId();
    const rack = this.racks.hasValue() ? this.racks.value().items.find((r) => r.id === id) : undefined;
    return rack?.name ?? null;
  });
  protected readonly items = computed(() => (this.readings.hasValue() ? this.readings.value().items : []));
  protected readonly outOfRange = computed(() => this.items().filter((r) => r.alerts.length > 0));
  protected readonly tempSeries = computed<ChartSeries[]>(() => {
    const byProbe = (probe: Probe) =>
      this.items()
        .filter((r) => r.probe === probe && r.tempF !== null)
        .map((r) => ({ x: Date.parse(r.takenAt), y: r.tempF! }))
        .sort((a, b) => a.x - b.x);
    return [
      { label: 'Warm side (°F)', points: byProbe('warm'), color: 'var(--mat-sys-primary)' },
      { label: 'Cool side (°F)', points: byProbe('cool'), color: 'var(--mat-sys-tertiary)' },
    ].filter((s) => s.points.length);
  });
  protected readonly tempBands = computed<ChartBand[]>(() => {
    if (!this.ranges.hasValue()) return [];
    const r = this.ranges.value();
    return [
      { from: r.warmF[0], to: r.warmF[1], label: `warm ${r.warmF[0]}–${r.warmF[1]} °F`, color: 'var(--mat-sys-primary)' },
      { from: r.coolF[0], to: r.coolF[1], label: `cool ${r.coolF[0]}–${r.coolF[1]} °F`, color: 'var(--mat-sys-tertiary)' },
    ];
  });

  protected readonly probe = signal<Probe>('warm');
  protected readonly takenAt = signal(toLocalInput(new Date()));
  protected readonly tempF = signal('');
  protected readonly humidity = signal('');
  protected readonly error = signal<string | null>(null);
  protected readonly notice = signal('');
  protected readonly saving = signal(false);
  protected readonly formatMoment = formatMoment;
  protected readonly formatShortDay = (ms: number) => formatShortDay(new Date(ms).toISOString());
  protected readonly formatF = (f: number) => `${f} °F`;
  protected readonly toCelsius = toCelsius;
  protected readonly errorText = (error: unknown) => describeApiError(error);

  protected rackLabel(id: number): string {
    return (this.racks.hasValue() ? this.racks.value().items.find((r) => r.id === id)?.name : undefined) ?? `#${id}`;
  }

  protected pickRack(value: string): void {
    this.navigate(value ? `environment?rackId=${value}` : 'environment', { replace: true });
  }

  protected save(): void {
    const rackId = this.rackId();
    const takenAt = fromLocalInput(this.takenAt());
    if (!rackId) return this.error.set('Pick a rack first.');
    if (!takenAt) return this.error.set('Taken at: give a date and time.');
    if (this.tempF() === '' && this.humidity() === '') return this.error.set('Give a temperature, a humidity or both.');
    const body = {
      rackId,
      takenAt,
      probe: this.probe(),
      tempF: this.tempF() === '' ? null : Number(this.tempF()),
      humidityPct: this.humidity() === '' ? null : Number(this.humidity()),
    };
    this.saving.set(true);
    this.error.set(null);
    this.api.post<EnvironmentReading>('/environment-readings', body).subscribe({
      next: (reading) => {
        this.saving.set(false);
        this.tempF.set('');
        this.humidity.set('');
        this.notice.set(reading.alerts.length ? `Recorded, and out of range: ${reading.alerts.join('; ')}` : 'Recorded; within range.');
        this.readings.reload();
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(describeApiError(error));
      },
    });
  }

  protected async upload(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    input.value = '';
    const rackId = this.rackId();
    if (!file || !rackId) return;
    const csv = await file.text();
    this.error.set(null);
    this.api.postCsv<UploadResult>('/environment-readings/upload', csv, { rackId }).subscribe({
      next: (r) => {
        this.notice.set(`Imported ${r.imported} readings from ${file.name}; ${r.alerts} out of range.`);
        this.readings.reload();
      },
      error: (error: unknown) => this.error.set(describeApiError(error)),
    });
  }
}
