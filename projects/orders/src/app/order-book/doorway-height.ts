import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { ErrorBanner, formatLength } from '@tubwright/kit';
import { FieldCheck } from '../core/field-check';
import { lengthInputText, lengthProblem, readLengthIn } from '../core/length-text';
import { OrdersApi } from '../core/orders-api';
import type { Order } from '../core/orders-types';
import { Action } from '../core/remote';
import { DEFAULT_DOORWAY_IN } from './calculations/doorway';

/** The API's ceiling for a doorway: 20 ft. */
const MAX_DOORWAY_IN = 240;

/** The customer's lowest doorway on the way in, as measured; sales enter it, the doorway check reads it. */
@Component({
  selector: 'tw-doorway-height',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatFormFieldModule, MatInput, MatButton, MatIcon, ErrorBanner],
  template: `
    @if (!editing()) {
      <p class="shown">
        @if (order().doorwayHeightIn; as height) {
          <span>Customer’s doorway: <strong>{{ both(height) }}</strong></span>
        } @else {
          <span class="tw-muted">Doorway not measured yet: the check uses the plan’s clearance ({{ both(defaultIn) }} unless the plan sets one).</span>
        }
        @if (canEdit()) {
          <button mat-button type="button" (click)="start()"><mat-icon>straighten</mat-icon>{{ order().doorwayHeightIn ? 'Change' : 'Enter the doorway height' }}</button>
        }
      </p>
    } @else {
      <form class="edit" (submit)="$event.preventDefault(); save()" novalidate aria-label="Doorway height">
        <mat-form-field appearance="outline" subscriptSizing="dynamic" class="field" [class.tw-invalid]="check.problem('doorwayHeightIn')">
          <mat-label>Customer’s doorway height</mat-label>
          <input matInput class="height" inputmode="decimal" [value]="text()" (input)="edit($event)" [attr.aria-invalid]="!!check.problem('doorwayHeightIn')" placeholder="79 1/2" />
          @if (check.problem('doorwayHeightIn'); as problem) {
            <mat-hint class="tw-field-error">{{ problem }}</mat-hint>
          } @else {
            <mat-hint>{{ preview() ?? 'The lowest door on the way in: 79 1/2, 6 ft 8 in or 2020 mm' }}</mat-hint>
          }
        </mat-form-field>
        @if (action.error(); as message) {
          <tw-error-banner [message]="message" />
        }
        <div class="tw-actions">
          <button mat-flat-button type="submit" [disabled]="action.busy()">Save</button>
          @if (order().doorwayHeightIn) {
            <button mat-button type="button" (click)="clear()" [disabled]="action.busy()">Forget it</button>
          }
          <button mat-button type="button" (click)="editing.set(false)">Cancel</button>
        </div>
      </form>
    }
  `,
  styles: `
    :host { display: block; margin-bottom: 8px; }
    .shown { display: flex; flex-wrap: wrap; gap: 4px 12px; align-items: center; margin: 0; }
    .field { width: 340px; max-width: 100%; margin-bottom: 8px; }
  `,
})
export class DoorwayHeight {
  readonly order = input.required<Order>();
  readonly canEdit = input(false);
  readonly saved = output<Order>();

  private readonly api = inject(OrdersApi);
  protected readonly editing = signal(false);
  protected readonly text = signal('');
  protected readonly action = new Action();
  protected readonly defaultIn = DEFAULT_DOORWAY_IN;
  protected readonly check = new FieldCheck<'doorwayHeightIn'>({
    doorwayHeightIn: computed(() => (this.text().trim() ? lengthProblem(this.text(), MAX_DOORWAY_IN, 'the doorway height') : 'Enter the doorway height')),
  });
  /** What the typed text reads as, in both units, so a slip (mm typed as inches) shows before saving. */
  protected readonly preview = computed(() => {
    const value = readLengthIn(this.text());
    return value !== null && value > 0 && this.text().trim() ? `Reads as ${this.both(value)}` : null;
  });

  protected both(valueIn: number): string {
    return `${formatLength(valueIn)} (${formatLength(valueIn, 'mm')})`;
  }

  protected start(): void {
    this.text.set(lengthInputText(this.order().doorwayHeightIn));
    this.check.tried.set(false);
    this.editing.set(true);
  }

  protected edit(event: Event): void {
    this.text.set((event.target as HTMLInputElement).value);
    this.check.edited('doorwayHeightIn');
  }

  protected save(): void {
    if (!this.check.ready()) return;
    this.send(readLengthIn(this.text()));
  }

  protected clear(): void {
    this.send(null);
  }

  private send(doorwayHeightIn: number | null): void {
    const order = this.order();
    this.action.run(
      this.api.patch<Order>(`/orders/${order.id}`, { doorwayHeightIn }),
      (changed) => {
        this.editing.set(false);
        this.saved.emit(changed);
      },
      (error) => this.check.placeServerError(error),
    );
  }
}
