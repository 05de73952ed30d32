import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { ApiKey } from './api-key';

/** Revoking cannot be undone, and a website key's widget stops at once: the owner confirms. */
@Component({
  selector: 'tw-revoke-key-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatDialogModule, MatButton],
  template: `
    <h2 mat-dialog-title>Revoke “{{ key.name }}”?</h2>
    <mat-dialog-content>
      <p>
        Every call with the key {{ key.prefix }}… is refused from now on.
        @if (key.kind === 'publishable') {
          The rack sizer on {{ key.origins.join(', ') }} stops working until the website gets a new key.
        } @else {
          The partner's system stops working until it gets a new key.
        }
        This cannot be undone.
      </p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false" cdkFocusInitial>Keep it</button>
      <button mat-flat-button type="button" class="danger" [mat-dialog-close]="true">Revoke key</button>
    </mat-dialog-actions>
  `,
  styles: `
    .danger { --mat-button-filled-container-color: var(--mat-sys-error); --mat-button-filled-label-text-color: var(--mat-sys-on-error); }
  `,
})
export class RevokeKeyDialog {
  protected readonly key = inject<ApiKey>(MAT_DIALOG_DATA);
}
