import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { AuthApi, ErrorBanner, describeApiError, toApiError } from '@tubwright/kit';

/** `/reset-password`: ask for a link by e-mail, or (with `?token=` from that link) choose a new password. */
@Component({
  selector: 'tw-password-reset',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatButton, RouterLink, ErrorBanner],
  templateUrl: './password-reset.html',
  styleUrl: '../sign-in/sign-in.scss',
})
export class PasswordReset {
  /** From the e-mailed link (query parameter). */
  readonly token = input<string | undefined>();

  private readonly authApi = inject(AuthApi);
  private readonly fb = inject(FormBuilder).nonNullable;

  protected readonly choosing = computed(() => Boolean(this.token()));
  protected readonly askForm = this.fb.group({ email: ['', [Validators.required, Validators.email]] });
  protected readonly chooseForm = this.fb.group({ password: ['', [Validators.required, Validators.minLength(10)]] });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly done = signal<string | null>(null);

  protected ask(): void {
    if (this.askForm.invalid) return this.askForm.markAllAsTouched();
    this.run(this.authApi.requestPasswordReset(this.askForm.getRawValue().email.trim()));
  }

  protected choose(): void {
    if (this.chooseForm.invalid) return this.chooseForm.markAllAsTouched();
    this.run(this.authApi.resetPassword(this.token()!, this.chooseForm.getRawValue().password));
  }

  private run(request: ReturnType<AuthApi['requestPasswordReset']>): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.failure.set(null);
    request.subscribe({
      next: (answer) => {
        this.busy.set(false);
        this.done.set(answer.message);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.failure.set(describeApiError(toApiError(error)));
      },
    });
  }
}
