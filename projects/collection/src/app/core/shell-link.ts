import { Directive, computed, input } from '@angular/core';
import { injectShellNavigate } from '@tubwright/kit';

/** Where the console shows this module; only used to give links a real href. */
export const MODULE_BASE = '/collection';

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
  protected readonly href = computed(() => {
    const path = this.twLink().replace(/^\/+/, '');
    if (!path) return MODULE_BASE;
    return path.startsWith('?') ? MODULE_BASE + path : `${MODULE_BASE}/${path}`;
  });

  protected follow(event: MouseEvent): void {
    if (event.button !== 0 || event.ctrlKey || event.metaKey || event.shiftKey || event.altKey) return;
    event.preventDefault();
    this.navigate(this.twLink(), { replace: this.twLinkReplace() });
  }
}
