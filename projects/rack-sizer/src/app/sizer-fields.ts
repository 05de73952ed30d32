import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import type { SizerField } from './calculations/sizer-input';
import { SizerStore } from './sizer-store';

interface FieldView {
  key: SizerField;
  label: string;
  hint: string;
}

/** The tub's outside size with measuring guidance, then levels and columns. */
@Component({
  selector: 'tw-sizer-fields',
  changeDetection: ChangeDetectionStrategy.OnPush,
  templateUrl: './sizer-fields.html',
})
export class SizerFields {
  protected readonly store = inject(SizerStore);
  protected readonly unit = this.store.unit;
  protected readonly text = this.store.text;

  protected readonly sizeFields = computed<FieldView[]>(() => {
    const example = this.unit() === 'in' ? { length: '23', width: '16 1/4', height: '6 1/2' } : { length: '584', width: '413', height: '165' };
    return [
      { key: 'length', label: 'Tub length', hint: `Front to back, e.g. ${example.length}` },
      { key: 'width', label: 'Tub width', hint: `Side to side, e.g. ${example.width}` },
      { key: 'height', label: 'Tub height', hint: `Rim included, e.g. ${example.height}` },
    ];
  });
  protected readonly countFields: FieldView[] = [
    { key: 'levels', label: 'Levels', hint: 'Rows of tubs, 1 to 30' },
    { key: 'columns', label: 'Columns', hint: 'Tubs side by side, 1 to 12' },
  ];

  protected describedBy(key: SizerField): string {
    return `${key}-hint ${key}-error`;
  }

  protected input(key: SizerField, event: Event): void {
    this.store.update(key, (event.target as HTMLInputElement).value);
  }
}
