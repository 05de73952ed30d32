import { DOCUMENT, DatePipe } from '@angular/common';
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { Clipboard } from '@angular/cdk/clipboard';
import { MatButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIcon } from '@angular/material/icon';
import { MatSlideToggle, MatSlideToggleChange } from '@angular/material/slide-toggle';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { API_BASE, ApiClient, DataTable, ListQuery, PageHeader, describeApiError, fromSortParam, pagedList, toSortParam } from '@tubwright/kit';
import { ApiKeyForm } from './api-key-form';
import { ApiKey, CreatedApiKey, KIND_LABELS, SCOPE_LABELS } from './api-key';
import { widgetSnippet } from './key-text';
import { NewKeyPanel } from './new-key-panel';
import { RevokeKeyDialog } from './revoke-key-dialog';

/** The owner's API keys: website keys for the rack sizer, secret keys for partners; shown once, revocable. */
@Component({
  selector: 'tw-api-keys-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatButton, MatIcon, MatSlideToggle, DataTable, PageHeader, ApiKeyForm, NewKeyPanel, DatePipe],
  templateUrl: './api-keys-page.html',
  styleUrl: './api-keys-page.scss',
})
export class ApiKeysPage {
  private readonly api = inject(ApiClient);
  private readonly http = inject(HttpClient);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly clipboard = inject(Clipboard);
  private readonly origin = inject(DOCUMENT).location.origin;

  protected readonly query = signal<ListQuery>({ q: '', sort: '-createdAt', offset: 0, limit: 25 });
  protected readonly list = pagedList(this.query, (q) => this.api.list<ApiKey>('/api-keys', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['name', 'scopes', 'origins', 'lastUsedAt', 'createdAt', 'state'];
  protected readonly creating = signal(false);
  protected readonly created = signal<CreatedApiKey | null>(null);
  protected readonly revoking = signal<number | null>(null);
  protected readonly showPrices = signal(true);
  protected readonly savingSettings = signal(false);
  protected readonly genericSnippet = computed(() => widgetSnippet(this.origin, 'tw_pk_…', { showPrices: this.showPrices() }));

  constructor() {
    this.api.get<{ showPrices: boolean }>('/widget-settings').subscribe({ next: (s) => this.showPrices.set(s.showPrices), error: () => undefined });
  }

  protected kindLabel(key: ApiKey): string {
    return KIND_LABELS[key.kind];
  }

  protected scopeLabels(key: ApiKey): string {
    return key.scopes.map((s) => SCOPE_LABELS[s]).join(', ');
  }

  protected sortBy(sort: Sort): void {
    this.query.update((q) => ({ ...q, sort: toSortParam(sort.active, sort.direction), offset: 0 }));
  }

  protected keyCreated(key: CreatedApiKey): void {
    this.creating.set(false);
    this.created.set(key);
    this.list.reload();
  }

  protected revoke(key: ApiKey): void {
    this.dialog
      .open<RevokeKeyDialog, ApiKey, boolean>(RevokeKeyDialog, { data: key, width: '440px' })
      .afterClosed()
      .subscribe((confirmed) => {
        if (!confirmed) return;
        this.revoking.set(key.id);
        this.http.delete(`${API_BASE}/api-keys/${key.id}`).subscribe({
          next: () => {
            this.revoking.set(null);
            this.snackBar.open(`“${key.name}” is revoked.`, 'OK', { duration: 5000 });
            this.list.reload();
          },
          error: (error: unknown) => {
            this.revoking.set(null);
            this.snackBar.open(describeApiError(error), 'Dismiss', { duration: 8000 });
            this.list.reload();
          },
        });
      });
  }

  protected copySnippet(): void {
    const copied = this.clipboard.copy(this.genericSnippet());
    this.snackBar.open(copied ? 'Snippet copied: put your website key in place of tw_pk_….' : 'Could not copy: select the snippet and copy it by hand.', 'OK', {
      duration: 5000,
    });
  }

  protected setShowPrices(change: MatSlideToggleChange): void {
    this.savingSettings.set(true);
    this.http.put<{ showPrices: boolean }>(`${API_BASE}/widget-settings`, { showPrices: change.checked }).subscribe({
      next: (s) => {
        this.savingSettings.set(false);
        this.showPrices.set(s.showPrices);
      },
      error: (error: unknown) => {
        this.savingSettings.set(false);
        change.source.checked = this.showPrices();
        this.snackBar.open(describeApiError(error), 'Dismiss', { duration: 8000 });
      },
    });
  }
}
