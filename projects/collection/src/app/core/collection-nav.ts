import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import { Section } from './collection-routes';
import { ShellLink } from './shell-link';

const ENTRIES: { section: Section; path: string; label: string; icon: string }[] = [
  { section: 'animals', path: 'animals', label: 'Animals', icon: 'pets' },
  { section: 'racks', path: 'racks', label: 'Racks', icon: 'shelves' },
  { section: 'feeding', path: 'feeding', label: 'Feeding day', icon: 'restaurant' },
  { section: 'breeding', path: 'breeding', label: 'Breeding', icon: 'egg' },
  { section: 'traits', path: 'traits', label: 'Traits', icon: 'genetics' },
  { section: 'environment', path: 'environment', label: 'Environment', icon: 'thermostat' },
  { section: 'species', path: 'species', label: 'Species', icon: 'menu_book' },
];

/** The module's own sections, as links (the shell's address bar follows). */
@Component({
  selector: 'tw-collection-nav',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ShellLink, MatIcon],
  template: `
    <nav aria-label="Collection">
      @for (entry of entries; track entry.section) {
        <a [twLink]="entry.path" [attr.aria-current]="entry.section === active() ? 'page' : null" [class.active]="entry.section === active()">
          <mat-icon aria-hidden="true">{{ entry.icon }}</mat-icon>{{ entry.label }}
        </a>
      }
    </nav>
  `,
  styles: `
    :host { display: block; margin: 0 0 20px; }
    nav { display: flex; flex-wrap: wrap; gap: 4px; border-bottom: 1px solid var(--mat-sys-outline-variant); }
    a { display: inline-flex; align-items: center; gap: 6px; padding: 10px 14px; color: var(--mat-sys-on-surface-variant); text-decoration: none;
      font: var(--mat-sys-title-small); border-bottom: 3px solid transparent; margin-bottom: -1px; border-radius: 8px 8px 0 0; }
    a:hover { background: var(--mat-sys-surface-container); color: var(--mat-sys-on-surface); }
    a:focus-visible { outline: 2px solid var(--mat-sys-primary); outline-offset: -2px; }
    a.active { color: var(--mat-sys-primary); border-bottom-color: var(--mat-sys-primary); }
    mat-icon { width: 20px; height: 20px; font-size: 20px; }
  `,
})
export class CollectionNav {
  readonly active = input<Section | null>(null);
  protected readonly entries = ENTRIES;
}
