import { ChangeDetectionStrategy, Component, DOCUMENT, ElementRef, afterNextRender, computed, effect, inject, input, signal, viewChild } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NavigationEnd, Router } from '@angular/router';
import { AuthSession, ErrorBanner, NavigateDetail, Session } from '@tubwright/kit';
import { filter, map } from 'rxjs';
import { AREAS, ModuleName } from '../core/areas';
import { ElementLoader, elementTag } from '../core/element-loader';
import { moduleUrl, splitConsoleUrl } from '../core/module-url';

type ModuleElement = HTMLElement & { session?: Session | null };

/**
 * Hosts one module element. Loads its bundle on the first visit, hands it the sub-path
 * (`path` attribute) and the session (`session` property), and turns its `tw-navigate`
 * events into console navigation, so the shell alone owns the address bar.
 */
@Component({
  selector: 'tw-module-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ErrorBanner],
  template: `
    @if (status() === 'loading') {
      <div class="loading" role="progressbar" [attr.aria-label]="'Loading ' + label()"></div>
    } @else if (status() === 'failed') {
      <div class="failed">
        <tw-error-banner [message]="failure()" [retryable]="true" (retry)="mount()" />
      </div>
    }
    <div #slot class="slot" (tw-navigate)="onNavigate($event)"></div>
  `,
  styles: `
    :host { display: block; position: relative; }
    /* A CSS bar rather than MatProgressBar: this page is part of every first load. */
    .loading { position: absolute; inset: 0 0 auto; height: 4px; overflow: hidden; background: var(--mat-sys-secondary-container); }
    .loading::after { content: ''; position: absolute; inset: 0; width: 40%; background: var(--mat-sys-primary); animation: tw-loading 1.1s ease-in-out infinite; }
    @keyframes tw-loading { from { transform: translateX(-100%); } to { transform: translateX(250%); } }
    @media (prefers-reduced-motion: reduce) { .loading::after { animation: none; width: 100%; opacity: 0.5; } }
    .failed { padding: 24px; }
  `,
})
export class ModulePage {
  /** From the route's data. */
  readonly module = input.required<ModuleName>();

  private readonly router = inject(Router);
  private readonly auth = inject(AuthSession);
  private readonly loader = inject(ElementLoader);
  private readonly document = inject(DOCUMENT);
  private readonly slot = viewChild.required<ElementRef<HTMLElement>>('slot');

  private readonly url = toSignal(
    this.router.events.pipe(
      filter((e) => e instanceof NavigationEnd),
      map(() => this.router.url),
    ),
    { initialValue: this.router.url },
  );
  protected readonly subPath = computed(() => splitConsoleUrl(this.url()).subPath);
  protected readonly label = computed(() => AREAS[this.module()].label);
  protected readonly status = signal<'loading' | 'ready' | 'failed'>('loading');
  protected readonly failure = signal('');
  private readonly element = signal<ModuleElement | null>(null);

  constructor() {
    afterNextRender(() => this.mount());
    effect(() => this.element()?.setAttribute('path', this.subPath()));
    effect(() => {
      const element = this.element();
      const session = this.auth.session();
      if (element && session && element.session !== session) element.session = session;
    });
  }

  protected async mount(): Promise<void> {
    const module = this.module();
    this.status.set('loading');
    try {
      await this.loader.load(module);
    } catch (error) {
      this.failure.set(error instanceof Error ? error.message : `The ${module} module could not be loaded.`);
      this.status.set('failed');
      return;
    }
    const element = this.document.createElement(elementTag(module)) as ModuleElement;
    element.setAttribute('path', this.subPath());
    element.session = this.auth.session();
    this.slot().nativeElement.replaceChildren(element);
    this.element.set(element);
    this.status.set('ready');
  }

  protected onNavigate(event: Event): void {
    const detail = (event as CustomEvent<NavigateDetail>).detail;
    if (!detail || typeof detail.path !== 'string') return;
    event.stopPropagation();
    void this.router.navigateByUrl(moduleUrl(this.module(), detail.path), { replaceUrl: !!detail.replace });
  }
}
