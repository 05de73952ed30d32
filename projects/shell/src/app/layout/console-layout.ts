import { ChangeDetectionStrategy, Component, DOCUMENT, DestroyRef, computed, effect, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { NavigationEnd, Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { AuthSession } from '@tubwright/kit';
import { filter } from 'rxjs';
import { ROLE_LABELS, areasFor } from '../core/areas';

const NARROW_QUERY = '(max-width: 840px)';

/**
 * The console frame: top bar, the role's navigation, the user menu, and the page.
 * Plain CSS layout rather than MatSidenav/MatToolbar/MatList: the frame is on every first load.
 */
@Component({
  selector: 'tw-console-layout',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterOutlet, RouterLink, RouterLinkActive, MatIcon, MatIconButton, MatMenuModule],
  templateUrl: './console-layout.html',
  styleUrl: './console-layout.scss',
  host: { '(keydown.escape)': 'navOpen.set(false)' },
})
export class ConsoleLayout {
  private readonly auth = inject(AuthSession);
  private readonly router = inject(Router);

  protected readonly user = this.auth.user;
  protected readonly roleLabel = computed(() => {
    const role = this.auth.role();
    return role ? ROLE_LABELS[role] : '';
  });
  protected readonly initial = computed(() => (this.user()?.name || this.user()?.email || '?').charAt(0).toUpperCase());
  protected readonly areas = computed(() => areasFor(this.auth.role()));
  protected readonly narrow = signal(false);
  protected readonly navOpen = signal(false);

  constructor() {
    this.watchWidth();
    // Close the drawer on narrow screens after every navigation.
    this.router.events
      .pipe(
        filter((e) => e instanceof NavigationEnd),
        takeUntilDestroyed(),
      )
      .subscribe(() => this.navOpen.set(false));
    // Signed out elsewhere (another tab, a failed refresh in an element): back to sign-in.
    effect(() => {
      if (!this.auth.signedIn()) {
        void this.router.navigate(['/sign-in'], { queryParams: { returnUrl: this.router.url } });
      }
    });
  }

  protected signOut(): void {
    this.auth.clear();
    void this.router.navigateByUrl('/sign-in');
  }

  private watchWidth(): void {
    const media = inject(DOCUMENT).defaultView?.matchMedia?.(NARROW_QUERY);
    if (!media) return;
    this.narrow.set(media.matches);
    const onChange = (event: MediaQueryListEvent) => {
      this.narrow.set(event.matches);
      if (!event.matches) this.navOpen.set(false);
    };
    media.addEventListener('change', onChange);
    inject(DestroyRef).onDestroy(() => media.removeEventListener('change', onChange));
  }
}
