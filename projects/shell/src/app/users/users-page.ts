import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import {
  ApiClient,
  AuthSession,
  DataTable,
  ListQuery,
  PageHeader,
  Role,
  describeApiError,
  fromSortParam,
  pagedList,
  toSortParam,
} from '@tubwright/kit';
import { ROLE_LABELS } from '../core/areas';
import { UserForm } from './user-form';
import { User } from './user';

/** The owner's list of people who may sign in: create, change role, deactivate. */
@Component({
  selector: 'tw-users-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatTableModule, MatSortModule, MatSelectModule, MatButton, MatIcon, DataTable, PageHeader, UserForm, DatePipe],
  templateUrl: './users-page.html',
  styleUrl: './users-page.scss',
})
export class UsersPage {
  private readonly api = inject(ApiClient);
  private readonly snackBar = inject(MatSnackBar);
  private readonly me = inject(AuthSession).user;

  protected readonly query = signal<ListQuery>({ q: '', sort: 'name', offset: 0, limit: 25 });
  protected readonly list = pagedList(this.query, (q) => this.api.list<User>('/users', q));
  protected readonly sort = computed(() => fromSortParam(this.query().sort));
  protected readonly columns = ['name', 'email', 'role', 'createdAt', 'active'];
  protected readonly roles = Object.entries(ROLE_LABELS) as Array<[Role, string]>;
  protected readonly creating = signal(false);
  protected readonly saving = signal<number | null>(null);

  protected roleLabel(user: User): string {
    return ROLE_LABELS[user.role];
  }

  protected isMe(user: User): boolean {
    return user.email === this.me()?.email;
  }

  protected sortBy(sort: Sort): void {
    this.query.update((q) => ({ ...q, sort: toSortParam(sort.active, sort.direction), offset: 0 }));
  }

  protected created(user: User): void {
    this.creating.set(false);
    this.snackBar.open(`${user.name} can now sign in as ${ROLE_LABELS[user.role].toLowerCase()}.`, 'OK', { duration: 5000 });
    this.list.reload();
  }

  protected changeRole(user: User, role: Role): void {
    if (role === user.role) return;
    this.save(user, { role }, `${user.name} is now ${ROLE_LABELS[role].toLowerCase()}.`);
  }

  protected toggleActive(user: User): void {
    const active = !user.active;
    this.save(user, { active }, active ? `${user.name} can sign in again.` : `${user.name} can no longer sign in.`);
  }

  private save(user: User, change: Partial<Pick<User, 'role' | 'active'>>, done: string): void {
    this.saving.set(user.id);
    this.api.patch<User>(`/users/${user.id}`, change).subscribe({
      next: () => {
        this.saving.set(null);
        this.snackBar.open(done, 'OK', { duration: 4000 });
        this.list.reload();
      },
      error: (error: unknown) => {
        this.saving.set(null);
        this.snackBar.open(describeApiError(error), 'Dismiss', { duration: 8000 });
        this.list.reload();
      },
    });
  }
}
