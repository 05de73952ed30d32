import { ChangeDetectionStrategy, Component, ViewEncapsulation, computed, inject, input } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { AuthSession, EmptyState, ListQuery, Session, adoptShellSession, injectShellNavigate } from '@tubwright/kit';
import { OrdersView, Section, listPath, parseOrdersPath, sectionOf, sectionsFor } from './core/orders-routes';
import { ShellLink } from './core/shell-link';
import { BatchCutting } from './cutting/batch-cutting';
import { CustomerDetail } from './customers/customer-detail';
import { CustomerForm } from './customers/customer-form';
import { CustomerList } from './customers/customer-list';
import { OrderDetail } from './order-book/order-detail';
import { OrderList } from './order-book/order-list';
import { ProductionBoard } from './production/production-board';
import { QuoteDetail } from './quotes/quote-detail';
import { QuoteForm } from './quotes/quote-form';
import { QuoteList } from './quotes/quote-list';
import { OrderSettingsPage } from './settings/order-settings-page';
import { StockForm } from './stock/stock-form';
import { StockPage } from './stock/stock-page';

const SECTION_LABELS: Record<Section, { label: string; icon: string }> = {
  customers: { label: 'Customers', icon: 'groups' },
  quotes: { label: 'Quotes', icon: 'request_quote' },
  orders: { label: 'Orders', icon: 'receipt_long' },
  production: { label: 'Production', icon: 'view_kanban' },
  cutting: { label: 'Batch cutting', icon: 'content_cut' },
  stock: { label: 'Stock', icon: 'inventory_2' },
  settings: { label: 'Settings', icon: 'tune' },
};

/** `<tw-orders>`: customers, quotes, orders, the production board, batch cutting, stock and settings. */
@Component({
  selector: 'tw-orders-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  encapsulation: ViewEncapsulation.None,
  imports: [
    ShellLink, MatIcon, MatButton, EmptyState,
    CustomerList, CustomerDetail, CustomerForm, QuoteList, QuoteDetail, QuoteForm,
    OrderList, OrderDetail, ProductionBoard, BatchCutting, StockPage, StockForm, OrderSettingsPage,
  ],
  styleUrl: './orders-element.scss',
  template: `
    @if (sections().length > 1) {
      <nav class="tw-sections" aria-label="Orders sections">
        @for (section of sections(); track section) {
          <a [twLink]="section" [class.active]="current() === section" [attr.aria-current]="current() === section ? 'page' : null">
            <mat-icon aria-hidden="true">{{ labels[section].icon }}</mat-icon>{{ labels[section].label }}
          </a>
        }
      </nav>
    }
    @let v = view();
    @if (!allowed()) {
      <tw-empty-state icon="block" heading="Not part of your role" hint="Ask the owner if you need this page.">
        <button mat-flat-button type="button" (click)="navigate('')">Go to the start</button>
      </tw-empty-state>
    } @else {
      @switch (v.page) {
        @case ('customers') {
          <tw-customer-list [query]="v.query" (queryChange)="showList('customers', $event)" />
        }
        @case ('customer') {
          @defer {
            <tw-customer-detail [id]="v.id" />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @case ('customer-form') {
          @defer {
            <tw-customer-form [id]="v.id" />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @case ('quotes') {
          <tw-quote-list [query]="v.query" [status]="v.status" (queryChange)="showList('quotes', $event, v.status)" />
        }
        @case ('quote') {
          @defer {
            <tw-quote-detail [id]="v.id" />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @case ('quote-form') {
          @defer {
            <tw-quote-form [id]="v.id" [customerId]="v.customerId" />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @case ('orders') {
          <tw-order-list [query]="v.query" [status]="v.status" (queryChange)="showList('orders', $event, v.status)" />
        }
        @case ('order') {
          <tw-order-detail [id]="v.id" />
        }
        @case ('production') {
          <tw-production-board />
        }
        @case ('cutting') {
          @defer {
            <tw-batch-cutting [orderIds]="v.orderIds" />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @case ('stock') {
          @defer {
            <tw-stock-page [kind]="v.kind" />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @case ('stock-item') {
          @defer {
            <tw-stock-form [id]="v.id" [startKind]="v.kind" [startOffcut]="v.offcut" />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @case ('settings') {
          @defer {
            <tw-order-settings-page />
          } @placeholder {
            <p class="tw-muted" role="status">Loading…</p>
          }
        }
        @default {
          <tw-empty-state icon="explore_off" heading="Orders has no page here" [hint]="'Nothing lives at “' + missingRoute(v) + '”.'">
            <button mat-flat-button type="button" (click)="navigate('')">Go to the start</button>
          </tw-empty-state>
        }
      }
    }
  `,
})
export class OrdersElement {
  readonly path = input<string | null>('');
  readonly session = input<Session | null>(null);

  protected readonly navigate = injectShellNavigate();
  private readonly auth = inject(AuthSession);
  protected readonly labels = SECTION_LABELS;
  protected readonly sections = computed(() => sectionsFor(this.auth.role()));
  protected readonly view = computed(() => parseOrdersPath(this.path() ?? '', this.auth.role()));
  protected readonly current = computed(() => sectionOf(this.view()));
  protected readonly allowed = computed(() => {
    const section = this.current();
    return section === null || this.sections().includes(section);
  });

  constructor() {
    adoptShellSession(this.session);
  }

  protected showList(route: 'customers' | 'quotes' | 'orders', query: ListQuery, status: string | null = null): void {
    const view = this.view();
    const onlyFilter = 'query' in view && query.q !== view.query.q;
    this.navigate(listPath(route, query, status), { replace: onlyFilter });
  }

  protected missingRoute(view: OrdersView): string {
    return view.page === 'missing' ? view.route : '';
  }
}
