import { ChangeDetectionStrategy, Component, computed, effect, input, viewChild } from '@angular/core';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { materialName } from '../shared/material-names';
import type { RackPlanResponse, RackPart } from '../shared/plan-types';
import { showLength } from '../shared/plan-units';

interface PartRow extends RackPart {
  /** The number the cutting diagrams print on the part (its place in the list, from 1). */
  no: number;
}

/** Parts to cut, numbered as on the cutting diagrams and sortable by any column; then the hardware. */
@Component({
  selector: 'tw-parts-list',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule],
  template: `
    <div class="scroller">
      <table mat-table [dataSource]="parts" matSort aria-label="Parts to cut" class="dense">
        <ng-container matColumnDef="no">
          <th mat-header-cell *matHeaderCellDef mat-sort-header class="tw-num" arrowPosition="before">No.</th>
          <td mat-cell *matCellDef="let p" class="tw-num">{{ p.no }}</td>
        </ng-container>
        <ng-container matColumnDef="name">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Part</th>
          <td mat-cell *matCellDef="let p">
            <span class="name">{{ p.name }}</span>
            @if (p.note) {
              <span class="note">{{ p.note }}</span>
            }
          </td>
        </ng-container>
        <ng-container matColumnDef="section">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Section</th>
          <td mat-cell *matCellDef="let p">{{ p.section === null ? 'base' : p.section }}</td>
        </ng-container>
        <ng-container matColumnDef="material">
          <th mat-header-cell *matHeaderCellDef mat-sort-header>Material</th>
          <td mat-cell *matCellDef="let p">{{ material(p.material) }}</td>
        </ng-container>
        <ng-container matColumnDef="length">
          <th mat-header-cell *matHeaderCellDef mat-sort-header class="tw-num" arrowPosition="before">Length</th>
          <td mat-cell *matCellDef="let p" class="tw-num">{{ length(p.length) }}</td>
        </ng-container>
        <ng-container matColumnDef="width">
          <th mat-header-cell *matHeaderCellDef mat-sort-header class="tw-num" arrowPosition="before">Width</th>
          <td mat-cell *matCellDef="let p" class="tw-num">{{ length(p.width) }}</td>
        </ng-container>
        <ng-container matColumnDef="thickness">
          <th mat-header-cell *matHeaderCellDef mat-sort-header class="tw-num" arrowPosition="before">Thickness</th>
          <td mat-cell *matCellDef="let p" class="tw-num">{{ length(p.thickness) }}</td>
        </ng-container>
        <ng-container matColumnDef="quantity">
          <th mat-header-cell *matHeaderCellDef mat-sort-header class="tw-num" arrowPosition="before">Qty</th>
          <td mat-cell *matCellDef="let p" class="tw-num">{{ p.quantity }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns()"></tr>
        <tr mat-row *matRowDef="let row; columns: columns()"></tr>
      </table>
    </div>

    <h3 class="sub">Hardware</h3>
    <div class="scroller">
      <table mat-table [dataSource]="result().hardware" aria-label="Hardware" class="dense">
        <ng-container matColumnDef="item">
          <th mat-header-cell *matHeaderCellDef>Item</th>
          <td mat-cell *matCellDef="let h">
            <span class="name">{{ h.name }}</span>
            @if (h.note) {
              <span class="note">{{ h.note }}</span>
            }
          </td>
        </ng-container>
        <ng-container matColumnDef="quantity">
          <th mat-header-cell *matHeaderCellDef class="tw-num">Qty</th>
          <td mat-cell *matCellDef="let h" class="tw-num">{{ h.quantity }} {{ h.unit === 'each' ? '' : h.unit }}</td>
        </ng-container>
        <ng-container matColumnDef="basis">
          <th mat-header-cell *matHeaderCellDef>How it is counted</th>
          <td mat-cell *matCellDef="let h" class="basis">{{ h.basis }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="hardwareColumns"></tr>
        <tr mat-row *matRowDef="let row; columns: hardwareColumns"></tr>
      </table>
    </div>
  `,
  styles: `
    :host { display: block; }
    .scroller { overflow-x: auto; }
    table { width: 100%; min-width: max-content; background: transparent; }
    .name { display: block; }
    .note, .basis { color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    .note { display: block; max-width: 240px; white-space: normal; }
    .dense .mat-mdc-cell, .dense .mat-mdc-header-cell { padding: 4px 8px; }
    .dense .mat-mdc-cell:first-child, .dense .mat-mdc-header-cell:first-child { padding-left: 4px; }
    .sub { margin: 20px 0 4px; font: var(--mat-sys-title-small); }
  `,
})
export class PartsList {
  readonly result = input.required<RackPlanResponse>();

  /** The section column only says something when the rack stacks in sections. */
  protected readonly columns = computed(() => [
    'no',
    'name',
    ...(this.result().sections.length > 1 ? ['section'] : []),
    'material',
    'length',
    'width',
    'thickness',
    'quantity',
  ]);
  protected readonly hardwareColumns = ['item', 'quantity', 'basis'];
  protected readonly parts = new MatTableDataSource<PartRow>([]);
  private readonly sort = viewChild(MatSort);
  private readonly rows = computed(() => this.result().parts.map((p, i) => ({ ...p, no: i + 1 })));

  constructor() {
    // The base's parts (section null) sort after every section.
    this.parts.sortingDataAccessor = (row, column) => {
      if (column === 'section') return row.section ?? Number.MAX_SAFE_INTEGER;
      if (column === 'material') return materialName(row.material);
      const value = row[column as keyof PartRow];
      return typeof value === 'number' ? value : String(value ?? '');
    };
    effect(() => {
      this.parts.data = this.rows();
    });
    effect(() => {
      const sort = this.sort();
      if (sort && this.parts.sort !== sort) this.parts.sort = sort;
    });
  }

  protected length(value: number): string {
    return showLength(value, this.result().unit);
  }

  protected material(key: string): string {
    return materialName(key);
  }
}
