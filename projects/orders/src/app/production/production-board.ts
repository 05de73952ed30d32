import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { AuthSession, ErrorBanner, Page, PageHeader, injectShellNavigate } from '@tubwright/kit';
import { forkJoin, map } from 'rxjs';
import { OrdersApi } from '../core/orders-api';
import { sectionsFor } from '../core/orders-routes';
import type { Order, OrderStatus, OrderSummary } from '../core/orders-types';
import { Action, remote } from '../core/remote';
import { ShellLink } from '../core/shell-link';
import { BOARD_STAGES, moveLabel, nextBoardStage, statusLabel } from '../core/statuses';

/** Stages whose orders still have their sheets to cut: they can join a batch. */
const CUTTABLE: readonly OrderStatus[] = ['deposit_paid', 'cutting'];

/** Orders in production, one column per stage, each moved on with one click. */
@Component({
  selector: 'tw-production-board',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [PageHeader, ErrorBanner, MatButton, MatIcon, MatProgressBar, ShellLink, DatePipe],
  templateUrl: './production-board.html',
  styleUrl: './production-board.scss',
})
export class ProductionBoard {
  private readonly api = inject(OrdersApi);
  private readonly navigate = injectShellNavigate();
  private readonly role = inject(AuthSession).role;

  protected readonly board = remote(
    () => true,
    () =>
      forkJoin(
        BOARD_STAGES.map((status) =>
          this.api.get<Page<OrderSummary>>('/orders', { status, sort: 'deliveryDate', limit: 100 }).pipe(map((page) => ({ status, orders: page.items, total: page.total }))),
        ),
      ),
  );
  protected readonly move = new Action();
  protected readonly moved = signal<string | null>(null);
  protected readonly selected = signal<ReadonlySet<number>>(new Set());
  protected readonly canBatch = computed(() => sectionsFor(this.role()).includes('cutting'));
  protected readonly label = statusLabel;
  protected readonly moveLabel = moveLabel;
  protected readonly nextStage = nextBoardStage;

  protected cuttable(status: OrderStatus): boolean {
    return this.canBatch() && CUTTABLE.includes(status);
  }

  protected toggle(id: number, event: Event): void {
    const on = (event.target as HTMLInputElement).checked;
    this.selected.update((set) => {
      const next = new Set(set);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });
  }

  protected advance(order: OrderSummary, stage: OrderStatus): void {
    this.moved.set(null);
    this.move.run(this.api.post<Order>(`/orders/${order.id}/stage`, { stage, note: '' }), (changed) => {
      this.moved.set(`${changed.number} moved to ${statusLabel(changed.status).toLowerCase()}.`);
      this.board.reload();
    });
  }

  protected planCutting(): void {
    this.navigate(`cutting?orders=${[...this.selected()].join(',')}`);
  }
}
