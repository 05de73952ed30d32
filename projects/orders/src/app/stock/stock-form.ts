import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, PageHeader, injectShellNavigate } from '@tubwright/kit';
import { FieldCheck, wholeProblem } from '../core/field-check';
import { lengthInputText, lengthProblem, readLengthIn } from '../core/length-text';
import { OrdersApi } from '../core/orders-api';
import type { StockItem, StockKind, StockReservation } from '../core/orders-types';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { KIND_LABELS, STOCK_KINDS, materialName, materialsFor, stockSize } from '../core/stock-materials';
import { StockApi } from './stock-api';

type Field = 'material' | 'description' | 'lengthIn' | 'widthIn' | 'quantity' | 'location';

/** Stock sizes stop at 20 ft, as the API does. */
const MAX_LENGTH_IN = 240;

/**
 * Adds a stock item (or records an offcut), or changes one. Kind, material, size and the offcut
 * mark are fixed once recorded (the API changes only description, count and place); a wrong one
 * is removed and entered again. The server's complaints land on the field they name.
 */
@Component({
  selector: 'tw-stock-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PageHeader, ErrorBanner, MatFormFieldModule, MatInput, MatButton, MatIcon, MatProgressBar, ShellLink, DatePipe],
  templateUrl: './stock-form.html',
  styleUrl: './stock-form.scss',
})
export class StockForm {
  readonly id = input<number | null>(null);
  /** For a new item: the kind to start with and whether it is an offcut (from the address). */
  readonly startKind = input<StockKind | null>(null);
  readonly startOffcut = input(false);

  private readonly api = inject(OrdersApi);
  private readonly stock = inject(StockApi);
  private readonly navigate = injectShellNavigate();
  private readonly role = inject(AuthSession).role;
  protected readonly writes = computed(() => this.role() === 'owner' || this.role() === 'builder');

  protected readonly item = remote(() => this.id(), (id) => this.api.get<StockItem>(`/stock/${id}`));
  protected readonly held = remote(() => this.id(), (stockItemId) => this.stock.reservations({ stockItemId }));
  protected readonly save = new Action();
  protected readonly remove = new Action();
  protected readonly release = new Action();
  protected readonly confirmingRemove = signal(false);

  protected readonly kind = signal<StockKind>('sheet');
  protected readonly material = signal<string>('pvc-rigid');
  protected readonly description = signal('');
  protected readonly lengthText = signal('');
  protected readonly widthText = signal('');
  protected readonly quantityText = signal('1');
  protected readonly offcut = signal(false);
  protected readonly location = signal('');

  protected readonly editing = computed(() => this.id() !== null);
  protected readonly kinds = STOCK_KINDS;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly materials = computed(() => materialsFor(this.kind()));
  protected readonly materialName = materialName;
  protected readonly size = stockSize;
  protected readonly heldTotal = computed(() => (this.held.value() ?? []).reduce((sum, r) => sum + r.quantity, 0));

  private readonly isNew = () => !this.editing();
  protected readonly check = new FieldCheck<Field>({
    material: computed(() => {
      if (!this.isNew()) return null;
      const material = this.material().trim();
      if (this.kind() === 'hardware') return material ? null : 'Name the item, e.g. Caster, 3 in';
      return this.materials().includes(material) ? null : 'Pick a material';
    }),
    description: computed(() => null),
    lengthIn: computed(() => {
      if (!this.isNew() || this.kind() === 'hardware') return null;
      return this.lengthText().trim() ? lengthProblem(this.lengthText(), MAX_LENGTH_IN) : 'Enter the length';
    }),
    widthIn: computed(() => {
      if (!this.isNew() || this.kind() !== 'sheet') return null;
      return this.widthText().trim() ? lengthProblem(this.widthText(), MAX_LENGTH_IN) : 'Enter the width';
    }),
    quantity: computed(() => wholeProblem(this.quantityText(), 0, 100_000, 'pieces')),
    location: computed(() => null),
  });

  constructor() {
    effect(() => {
      if (this.editing()) return;
      const kind = this.startKind() ?? 'sheet';
      for (const field of [this.description, this.lengthText, this.widthText, this.location]) field.set('');
      this.quantityText.set('1');
      this.pickKind(kind);
      this.offcut.set(this.startOffcut() && kind !== 'hardware');
    });
    effect(() => {
      const item = this.item.value();
      if (!item) return;
      this.kind.set(item.kind);
      this.material.set(item.material);
      this.description.set(item.description);
      this.lengthText.set(lengthInputText(item.lengthIn));
      this.widthText.set(lengthInputText(item.widthIn));
      this.quantityText.set(String(item.quantity));
      this.offcut.set(item.offcut);
      this.location.set(item.location);
    });
  }

  protected heading(): string {
    if (this.editing()) return this.item.value() ? `Change ${materialName(this.item.value()!.material)}` : 'Stock item';
    return this.offcut() ? 'Record an offcut' : 'Add stock';
  }

  protected pickKind(kind: StockKind): void {
    this.kind.set(kind);
    this.material.set(materialsFor(kind)[0] ?? '');
    if (kind === 'hardware') this.offcut.set(false);
    if (kind !== 'sheet') this.widthText.set('');
  }

  protected text(event: Event): string {
    return (event.target as HTMLInputElement).value;
  }

  protected edit(field: Field, target: { set(value: string): void }, event: Event): void {
    target.set(this.text(event));
    this.check.edited(field);
  }

  protected listPath(): string {
    return `stock?kind=${this.kind()}`;
  }

  protected submit(): void {
    if (!this.writes() || !this.check.ready()) return;
    const id = this.id();
    const quantity = Number(this.quantityText().trim());
    const request = id
      ? this.api.patch<StockItem>(`/stock/${id}`, { description: this.description().trim(), quantity, location: this.location().trim() })
      : this.api.post<StockItem>('/stock', {
          kind: this.kind(),
          material: this.material().trim(),
          description: this.description().trim(),
          lengthIn: this.kind() === 'hardware' ? null : readLengthIn(this.lengthText()),
          widthIn: this.kind() === 'sheet' ? readLengthIn(this.widthText()) : null,
          quantity,
          offcut: this.offcut(),
          location: this.location().trim(),
        });
    this.save.run(
      request,
      (saved) => this.navigate(`stock?kind=${saved.kind}`),
      (error) => this.check.placeServerError(error),
    );
  }

  protected removeItem(item: StockItem): void {
    this.remove.run(this.api.delete(`/stock/${item.id}`), () => this.navigate(`stock?kind=${item.kind}`, { replace: true }));
  }

  protected releaseHold(hold: StockReservation): void {
    this.release.run(this.api.delete(`/stock-reservations/${hold.id}`), () => this.held.reload());
  }
}
