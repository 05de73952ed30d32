import { ChangeDetectionStrategy, Component, DestroyRef, inject, output, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { AbstractControl, FormBuilder, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { ApiClient, ErrorBanner, describeApiError, toApiError } from '@tubwright/kit';
import { ApiKeyKind, ApiScope, CreatedApiKey, SCOPE_LABELS } from './api-key';
import { ALL_SCOPES, readOrigins, scopesFor } from './key-text';

const SCOPE_HINTS: Record<ApiScope, string> = {
  calculations: 'Rack plans and cutting plans',
  'quote-requests': 'Turn a visitor or partner request into a draft quote',
  'order-status': 'Look up quotes and orders made with this key',
};

function originsValidator(control: AbstractControl<string>): ValidationErrors | null {
  const { errors } = readOrigins(control.value ?? '');
  return errors.length ? { origins: errors[0] } : null;
}

function someOrigin(control: AbstractControl<string>): ValidationErrors | null {
  return readOrigins(control.value ?? '').origins.length ? null : { required: true };
}

/** Issues a key: a publishable one for the shop's website (origins), or a secret one for a partner (scopes). */
@Component({
  selector: 'tw-api-key-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInput, MatRadioModule, MatCheckbox, MatButton, ErrorBanner],
  templateUrl: './api-key-form.html',
  styleUrl: './api-key-form.scss',
})
export class ApiKeyForm {
  readonly created = output<CreatedApiKey>();
  readonly cancelled = output<void>();

  private readonly api = inject(ApiClient);
  private readonly fb = inject(FormBuilder).nonNullable;
  protected readonly form = this.fb.group({
    name: ['', [Validators.required, Validators.maxLength(120)]],
    kind: ['publishable' as ApiKeyKind, Validators.required],
    origins: [''],
    scopes: this.fb.group({ calculations: [true], 'quote-requests': [true], 'order-status': [false] } satisfies Record<ApiScope, unknown>),
  });
  protected readonly scopeChoices = ALL_SCOPES.map((scope) => ({ scope, label: SCOPE_LABELS[scope], hint: SCOPE_HINTS[scope] }));
  protected readonly kind = signal<ApiKeyKind>('publishable');
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly scopeError = signal<string | null>(null);

  constructor() {
    this.form.controls.kind.valueChanges.pipe(takeUntilDestroyed(inject(DestroyRef))).subscribe((kind) => this.kindChanged(kind));
    this.kindChanged(this.kind());
  }

  protected allowed(scope: ApiScope): boolean {
    return scopesFor(this.kind()).includes(scope);
  }

  protected submit(): void {
    if (this.busy()) return;
    const value = this.form.getRawValue();
    const scopes = ALL_SCOPES.filter((s) => value.scopes[s] && this.allowed(s));
    const { origins } = readOrigins(value.origins);
    this.scopeError.set(scopes.length ? null : 'Choose at least one scope');
    if (this.form.invalid || !scopes.length) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    const body = { name: value.name.trim(), kind: value.kind, origins: value.kind === 'publishable' ? origins : [], scopes };
    this.api.post<CreatedApiKey>('/api-keys', body).subscribe({
      next: (key) => {
        this.busy.set(false);
        this.created.emit(key);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        const apiError = toApiError(error);
        const field = apiError.field?.split('.')[0];
        if (field === 'name' || field === 'origins') {
          this.form.controls[field].setErrors({ server: apiError.message });
          this.form.controls[field].markAsTouched();
        } else if (field === 'scopes') {
          this.scopeError.set(apiError.message);
        } else {
          this.failure.set(describeApiError(apiError));
        }
      },
    });
  }

  private kindChanged(kind: ApiKeyKind): void {
    this.kind.set(kind);
    // A website key cannot read order status: anyone who opens the page has the key.
    const orderStatus = this.form.controls.scopes.controls['order-status'];
    // Only a website key needs origins; a partner key's server has none.
    const origins = this.form.controls.origins;
    origins.setValidators(kind === 'publishable' ? [someOrigin, originsValidator] : [originsValidator]);
    origins.updateValueAndValidity({ emitEvent: false });
    if (kind === 'publishable') {
      orderStatus.setValue(false);
      orderStatus.disable({ emitEvent: false });
    } else {
      orderStatus.enable({ emitEvent: false });
    }
  }
}
