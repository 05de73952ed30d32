import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, signal } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { formatLength } from '@tubwright/kit';
import { levelOpeningIn, readTubSize } from './calculations/level-opening';

type Dimension = 'length' | 'width' | 'height';

/** `<tw-rack-sizer>`: the public widget a shop puts on its own site (a first placeholder). */
@Component({
  selector: 'tw-rack-sizer-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [MatCardModule, MatFormFieldModule, MatInput],
  styleUrl: './rack-sizer.scss',
  templateUrl: './rack-sizer.html',
})
export class RackSizer {
  protected readonly dimensions: ReadonlyArray<{ key: Dimension; label: string; hint: string }> = [
    { key: 'length', label: 'Tub length', hint: 'Front to back' },
    { key: 'width', label: 'Tub width', hint: 'Side to side' },
    { key: 'height', label: 'Tub height', hint: 'With the rim' },
  ];
  protected readonly text = signal<Record<Dimension, string>>({ length: '', width: '', height: '' });
  protected readonly touched = signal<Record<Dimension, boolean>>({ length: false, width: false, height: false });
  protected readonly read = computed(() => {
    const t = this.text();
    return { length: readTubSize(t.length), width: readTubSize(t.width), height: readTubSize(t.height) };
  });
  protected readonly opening = computed(() => {
    const height = this.read().height;
    return 'valueIn' in height ? formatLength(levelOpeningIn(height.valueIn)) : null;
  });

  protected errorOf(key: Dimension): string | null {
    const result = this.read()[key];
    return this.touched()[key] && 'error' in result ? result.error : null;
  }

  protected update(key: Dimension, event: Event): void {
    const value = (event.target as HTMLInputElement).value;
    this.text.update((t) => ({ ...t, [key]: value }));
  }

  protected touch(key: Dimension): void {
    this.touched.update((t) => ({ ...t, [key]: true }));
  }
}
