import { ChangeDetectionStrategy, Component, ElementRef, afterNextRender, computed, inject, input, output } from '@angular/core';
import { Clipboard } from '@angular/cdk/clipboard';
import { DOCUMENT } from '@angular/common';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatSnackBar } from '@angular/material/snack-bar';
import { CreatedApiKey } from './api-key';
import { widgetSnippet } from './key-text';

/** The key, shown this once, with copy buttons; for a website key, the two lines to paste. */
@Component({
  selector: 'tw-new-key-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatIcon],
  templateUrl: './new-key-panel.html',
  styleUrl: './new-key-panel.scss',
})
export class NewKeyPanel {
  readonly key = input.required<CreatedApiKey>();
  readonly showPrices = input(true);
  readonly done = output<void>();

  private readonly clipboard = inject(Clipboard);
  private readonly snackBar = inject(MatSnackBar);
  private readonly origin = inject(DOCUMENT).location.origin;
  protected readonly snippet = computed(() => widgetSnippet(this.origin, this.key().key, { showPrices: this.showPrices() }));

  constructor() {
    // Focus lands on the warning so a screen reader says "copy it now" first.
    const host: HTMLElement = inject(ElementRef).nativeElement;
    afterNextRender(() => host.querySelector<HTMLElement>('h2')?.focus());
  }

  protected copy(text: string, what: string): void {
    const copied = this.clipboard.copy(text);
    this.snackBar.open(copied ? `${what} copied.` : `Could not copy: select the ${what.toLowerCase()} and copy it by hand.`, 'OK', { duration: 4000 });
  }
}
