import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { ApiClient, ErrorBanner, Role, describeApiError, toApiError } from '@tubwright/kit';
import { User } from './user';

type FieldName = 'name' | 'email' | 'role' | 'password';

/** Adds a person who may sign in; server-side problems land on the field they concern. */
@Component({
  selector: 'tw-user-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatSelectModule, MatButton, ErrorBanner],
  templateUrl: './user-form.html',
  styleUrl: './user-form.scss',
})
export class UserForm {
  readonly roles = input.required<Array<[Role, string]>>();
  readonly created = output<User>();
  readonly cancelled = output<void>();

  private readonly api = inject(ApiClient);
  protected readonly form = inject(FormBuilder).nonNullable.group({
    name: ['', [Validators.required, Validators.maxLength(120)]],
    email: ['', [Validators.required, Validators.email]],
    role: ['builder' as Role, Validators.required],
    password: ['', [Validators.required, Validators.minLength(10)]],
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected submit(): void {
    if (this.busy()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    const value = this.form.getRawValue();
    this.api.post<User>('/users', { ...value, name: value.name.trim(), email: value.email.trim() }).subscribe({
      next: (user) => {
        this.busy.set(false);
        this.created.emit(user);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        const apiError = toApiError(error);
        const control = apiError.field ? this.form.get(apiError.field as FieldName) : null;
        if (control) {
          control.setErrors({ server: apiError.message });
          control.markAsTouched();
        } else {
          this.failure.set(describeApiError(apiError));
        }
      },
    });
  }
}
