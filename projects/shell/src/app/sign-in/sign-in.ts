import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressSpinner } from '@angular/material/progress-spinner';
import { Router, RouterLink } from '@angular/router';
import { AuthApi, ErrorBanner, describeApiError, toApiError } from '@tubwright/kit';
import { homeFor } from '../core/areas';
import { safeReturnUrl } from '../core/module-url';

@Component({
  selector: 'tw-sign-in',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatButton, MatProgressSpinner, ErrorBanner, RouterLink],
  templateUrl: './sign-in.html',
  styleUrl: './sign-in.scss',
})
export class SignIn {
  /** Where to go afterwards (query parameter, set by the sign-in guard). */
  readonly returnUrl = input<string | undefined>();

  private readonly authApi = inject(AuthApi);
  private readonly router = inject(Router);

  protected readonly form = inject(FormBuilder).nonNullable.group({
    email: ['', [Validators.required, Validators.email]],
    password: ['', Validators.required],
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected submit(): void {
    if (this.busy()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { email, password } = this.form.getRawValue();
    this.busy.set(true);
    this.failure.set(null);
    this.authApi.signIn(email.trim(), password).subscribe({
      next: (session) => {
        this.busy.set(false);
        void this.router.navigateByUrl(safeReturnUrl(this.returnUrl()) ?? homeFor(session.user.role));
      },
      error: (error: unknown) => {
        this.busy.set(false);
        const apiError = toApiError(error);
        this.failure.set(
          apiError.status === 401 ? 'That e-mail and password do not match an active account.' : describeApiError(apiError),
        );
      },
    });
  }
}
