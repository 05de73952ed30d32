import { Directive, InjectionToken, computed, inject, input } from '@angular/core';
import { injectShellNavigate } from './module-element';

/** Where the console shows the current module (`/orders` for `<tw-orders>`); set when the element is defined. */
export const MODULE_BASE_PATH = new InjectionToken<string>('MODULE_BASE_PATH', { providedIn: 'root', factory: () => '' });

/**
 * A link to another page of this module. It carries a real href (open in a new tab, copy link),
 * but a plain click asks the shell to navigate instead of reloading the console.
 */
@Directive({
  selector: 'a[twLink]',
  host: { '[attr.href]': 'href()', '(click)': 'follow($event)' },
})
export class ShellLink {
  readonly twLink = input.required<string>();
  /** Replace the history entry (filters, tabs) rather than add one. */
  readonly twLinkReplace = input(false);

  private readonly navigate = injectShellNavigate();
  private readonly base = inject(MODULE_BASE_PATH);
  protected readonly href = computed(() => {
    const path = this.twLink().replace(/^\/+/, '');
    if (!path) return this.base || '/';
    return path.startsWith('?') ? this.base + path : `${this.base}/${path}`;
  });

  protected follow(event: MouseEvent): void {
    if (event.button !== 0 || event.ctrlKey || event.metaKey || event.shiftKey || event.altKey) return;
    event.preventDefault();
    this.navigate(this.twLink(), { replace: this.twLinkReplace() });
  }
}
