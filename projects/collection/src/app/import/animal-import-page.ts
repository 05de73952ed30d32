import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { ErrorBanner, PageHeader, describeApiError } from '@tubwright/kit';
import { CollectionApi } from '../core/collection-api';
import type { ImportPreview, ImportResult } from '../core/collection-types';
import { ShellLink } from '../core/shell-link';
import { ANIMAL_CSV_COLUMNS, previewRows, templateCsv } from './animal-csv';

/** The records service reads up to 2 MB of CSV; larger files are refused here before sending. */
const MAX_BYTES = 2 * 1024 * 1024;

/** Animals from a CSV file: every row checked first, then all imported together or none. */
@Component({
  selector: 'tw-animal-import',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon, ErrorBanner, PageHeader, ShellLink],
  templateUrl: './animal-import-page.html',
  styleUrl: './animal-import-page.scss',
})
export class AnimalImportPage {
  private readonly api = inject(CollectionApi);
  private readonly destroyRef = inject(DestroyRef);

  protected readonly fileName = signal('');
  /** The text the preview checked: the import sends exactly this, not the file as it is now. */
  private readonly csv = signal('');
  protected readonly preview = signal<ImportPreview | null>(null);
  protected readonly rows = computed(() => {
    const preview = this.preview();
    return preview ? previewRows(preview, this.csv()) : [];
  });
  protected readonly badRows = computed(() => this.rows().filter((r) => r.problems.length).length);
  protected readonly canImport = computed(() => this.preview()?.ok === true && !this.result() && !this.busy());
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly result = signal<{ imported: number; animals: { id: number; code: string }[] } | null>(null);
  protected readonly columns = ANIMAL_CSV_COLUMNS;

  protected async choose(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    input.value = ''; // choosing the same (corrected) file again fires change again
    if (!file) return;
    this.fileName.set(file.name);
    this.preview.set(null);
    this.result.set(null);
    this.failure.set(null);
    if (file.size > MAX_BYTES) return this.failure.set(`${file.name} is larger than 2 MB; split it into smaller files.`);
    const text = await file.text();
    this.csv.set(text);
    this.check();
  }

  protected check(): void {
    this.busy.set(true);
    this.failure.set(null);
    this.api
      .postCsv<ImportPreview>('/collection/animals/import/preview', this.csv())
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (preview) => {
          this.busy.set(false);
          this.preview.set(preview);
        },
        error: (error: unknown) => {
          this.busy.set(false);
          this.failure.set(describeApiError(error));
        },
      });
  }

  protected importAll(): void {
    const preview = this.preview();
    if (!preview?.ok || this.busy()) return;
    this.busy.set(true);
    this.failure.set(null);
    this.api
      .postCsv<ImportResult>('/collection/animals/import', this.csv())
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (result) => {
          this.busy.set(false);
          // Ids come back in file order, as the preview listed the rows.
          this.result.set({ imported: result.imported, animals: result.ids.map((id, i) => ({ id, code: preview.animals[i]?.code ?? `#${id}` })) });
        },
        error: (error: unknown) => {
          this.busy.set(false);
          this.failure.set(`${describeApiError(error)} Nothing was imported.`);
        },
      });
  }

  protected downloadTemplate(): void {
    const url = URL.createObjectURL(new Blob([templateCsv()], { type: 'text/csv' }));
    Object.assign(document.createElement('a'), { href: url, download: 'animals-template.csv' }).click();
    setTimeout(() => URL.revokeObjectURL(url), 1000);
  }

  protected startOver(): void {
    this.fileName.set('');
    this.csv.set('');
    this.preview.set(null);
    this.result.set(null);
    this.failure.set(null);
  }
}
