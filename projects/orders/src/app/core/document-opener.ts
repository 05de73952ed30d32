import { DOCUMENT, Injectable, inject, signal } from '@angular/core';
import { describeApiError } from '@tubwright/kit';
import { OrdersApi } from './orders-api';

/**
 * Opens a signed-in PDF (quote, invoice) in a new tab. A plain link cannot send the bearer
 * token, so the bytes are fetched first; the tab is opened at the click so no popup blocker
 * stops it, and shows the PDF once it has arrived.
 */
@Injectable({ providedIn: 'root' })
export class DocumentOpener {
  private readonly api = inject(OrdersApi);
  private readonly window = inject(DOCUMENT).defaultView;
  readonly error = signal<string | null>(null);

  open(path: string, fileName: string): void {
    this.error.set(null);
    const tab = this.window?.open('', '_blank');
    this.api.blob(path).subscribe({
      next: (blob) => {
        const url = URL.createObjectURL(blob);
        if (tab && !tab.closed) {
          tab.location.href = url;
        } else {
          // No tab (blocked): save the file instead.
          const link = this.window!.document.createElement('a');
          link.href = url;
          link.download = fileName;
          link.click();
        }
        setTimeout(() => URL.revokeObjectURL(url), 60_000);
      },
      error: (error: unknown) => {
        tab?.close();
        this.error.set(describeApiError(error));
      },
    });
  }
}
