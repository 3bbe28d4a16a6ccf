// My account: the display unit (°F or °C) and changing one's own password.
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import { firstValueFrom } from 'rxjs';
import { passwordShapeProblem } from '@shared/auth/password-policy.js';
import { roleLabels } from '@shared/auth/roles.js';
import type { DisplayUnit, SessionUser } from '@shared/users/user-schemas.js';
import { AuthStore } from '../../core/auth/auth-store';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { handlesOwnErrors } from '../../core/http/error-interceptor';

@Component({
  selector: 'vy-account',
  imports: [ReactiveFormsModule, MatCardModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatButtonToggleModule],
  templateUrl: './account.html',
  styleUrl: './account.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Account {
  private readonly http = inject(HttpClient);
  private readonly auth = inject(AuthStore);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly user = this.auth.user;
  protected readonly roleLabels = roleLabels;
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);

  protected readonly passwordForm = inject(NonNullableFormBuilder).group(
    {
      currentPassword: ['', Validators.required],
      newPassword: ['', [Validators.required, (c: AbstractControl<string>): ValidationErrors | null => {
        const problem = passwordShapeProblem(c.value, { email: this.user()?.email, name: this.user()?.name });
        return problem ? { server: problem } : null;
      }]],
      repeatPassword: ['', Validators.required],
    },
    {
      validators: (group: AbstractControl) => {
        const repeat = group.get('repeatPassword')!;
        const differs = repeat.value && repeat.value !== group.get('newPassword')!.value;
        repeat.setErrors(differs ? { server: 'The two new passwords differ.' } : repeat.value ? null : repeat.errors);
        return null;
      },
    },
  );

  protected async setUnit(displayUnit: DisplayUnit): Promise<void> {
    const { user } = await firstValueFrom(this.http.patch<{ user: SessionUser }>('/api/auth/preferences', { displayUnit }));
    this.auth.replaceUser(user);
    this.snackBar.open(`Temperatures now show in °${displayUnit}.`, undefined, { duration: 3000 });
  }

  protected async changePassword(): Promise<void> {
    if (this.passwordForm.invalid) {
      this.passwordForm.markAllAsTouched();
      return;
    }
    const { currentPassword, newPassword } = this.passwordForm.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.http.post('/api/auth/password', { currentPassword, newPassword }, { context: handlesOwnErrors() }));
      this.passwordForm.reset();
      this.snackBar.open('Your password has been changed.', undefined, { duration: 4000 });
    } catch (error) {
      this.formError.set(applyServerErrors(this.passwordForm, error));
    } finally {
      this.saving.set(false);
    }
  }
}
