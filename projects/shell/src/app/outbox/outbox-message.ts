import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatAnchor } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { ApiClient, ErrorBanner, describeApiError } from '@tubwright/kit';
import { MailMessage, recipients } from './mail';

/**
 * One caught message. Only its plain text is shown: rendering the HTML part could load
 * images from other hosts, and the console talks to its own host only.
 */
@Component({
  selector: 'tw-outbox-message',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterLink, MatAnchor, MatIcon, MatProgressBar, ErrorBanner, DatePipe],
  template: `
    <div class="page">
      <a mat-button routerLink="/outbox"><mat-icon>arrow_back</mat-icon> Outbox</a>
      @if (message.isLoading()) {
        <mat-progress-bar mode="indeterminate" aria-label="Loading the message" />
      }
      @if (failure(); as failure) {
        <tw-error-banner [message]="failure" [retryable]="true" (retry)="message.reload()" />
      }
      @if (message.hasValue()) {
        @let m = message.value();
        <article aria-labelledby="subject">
          <h1 id="subject">{{ m.subject || '(no subject)' }}</h1>
          <dl>
            <dt>From</dt>
            <dd>{{ m.from }}</dd>
            <dt>To</dt>
            <dd>{{ recipients(m.to) }}</dd>
            <dt>Sent</dt>
            <dd>{{ m.receivedAt | date: 'full' }}</dd>
          </dl>
          <pre class="body">{{ m.text || 'This message has no plain-text part.' }}</pre>
        </article>
      }
    </div>
  `,
  styles: `
    .page { padding: 16px 24px 24px; max-width: 860px; }
    article { margin-top: 12px; padding: 24px; border-radius: var(--mat-sys-corner-large); border: 1px solid var(--mat-sys-outline-variant); background: var(--mat-sys-surface); }
    h1 { margin: 0 0 16px; font: var(--mat-sys-headline-small); }
    dl { display: grid; grid-template-columns: max-content 1fr; gap: 4px 16px; margin: 0 0 20px; }
    dt { color: var(--mat-sys-on-surface-variant); }
    dd { margin: 0; }
    .body { margin: 0; padding-top: 16px; border-top: 1px solid var(--mat-sys-outline-variant); white-space: pre-wrap; overflow-wrap: anywhere; font: var(--mat-sys-body-large); }
  `,
})
export class OutboxMessage {
  /** From the route parameter. */
  readonly id = input.required<string>();

  private readonly api = inject(ApiClient);
  protected readonly message = rxResource({
    params: () => this.id(),
    stream: ({ params: id }) => this.api.get<MailMessage>(`/mail/messages/${encodeURIComponent(id)}`),
  });
  protected readonly failure = computed(() => (this.message.error() ? describeApiError(this.message.error()) : null));
  protected readonly recipients = recipients;
}
