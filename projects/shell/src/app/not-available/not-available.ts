import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { toSignal } from '@angular/core/rxjs-interop';
import { NavigationEnd, Router, RouterLink } from '@angular/router';
import { filter, map } from 'rxjs';
import { AuthSession, EmptyState } from '@tubwright/kit';
import { AREAS, ROLE_LABELS, areasFor, homeFor } from '../core/areas';
import { splitConsoleUrl } from '../core/module-url';

/** A page the role may not open, or a page that does not exist: said plainly, with a way on. */
@Component({
  selector: 'tw-not-available',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [EmptyState, MatAnchor, RouterLink],
  template: `
    @if (area(); as area) {
      <tw-empty-state
        icon="lock"
        [heading]="area.label + ' is not available for your role'"
        [hint]="'As ' + roleLabel() + ' you can use ' + allowed() + '. The shop owner can change your role if you need ' + area.purpose + '.'"
      >
        <a mat-flat-button [routerLink]="home()">Go to {{ homeLabel() }}</a>
      </tw-empty-state>
    } @else {
      <tw-empty-state icon="explore_off" heading="There is no page here" [hint]="'Nothing lives at ' + url() + '.'">
        <a mat-flat-button [routerLink]="home()">Go to {{ homeLabel() }}</a>
      </tw-empty-state>
    }
  `,
  styles: `
    :host { display: block; padding: 48px 24px; }
  `,
})
export class NotAvailable {
  private readonly auth = inject(AuthSession);
  private readonly router = inject(Router);
  /** The same component stays while the address moves between unknown pages. */
  protected readonly url = toSignal(
    this.router.events.pipe(
      filter((e) => e instanceof NavigationEnd),
      map(() => this.router.url),
    ),
    { initialValue: this.router.url },
  );
  protected readonly area = computed(() => {
    const { area } = splitConsoleUrl(this.url());
    return area ? AREAS[area] : null;
  });
  protected readonly roleLabel = computed(() => {
    const role = this.auth.role();
    return role ? ROLE_LABELS[role].toLowerCase() : 'a visitor';
  });
  protected readonly allowed = computed(() => joinWords(areasFor(this.auth.role()).map((a) => a.label)));
  protected readonly home = computed(() => homeFor(this.auth.role()));
  protected readonly homeLabel = computed(() => areasFor(this.auth.role())[0]?.label ?? 'sign-in');
}

function joinWords(words: string[]): string {
  if (words.length <= 1) return words[0] ?? 'nothing yet';
  return `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
}
