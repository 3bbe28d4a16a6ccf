// Create or edit a user: name, roles, sites, status and (optionally) a new password. Server field errors show beside each field.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { firstValueFrom } from 'rxjs';
import { passwordShapeProblem } from '@shared/auth/password-policy.js';
import { roleLabels, roles, type Role } from '@shared/auth/roles.js';
import type { SiteView } from '@shared/sites/site-schemas.js';
import type { UserSummary } from '@shared/users/user-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { UsersApi } from './users-api';

export interface UserDialogData {
  user: UserSummary | null;
  sites: SiteView[];
}

function passwordPolicy(optional: boolean) {
  return (control: AbstractControl<string>): ValidationErrors | null => {
    if (optional && !control.value) return null;
    const problem = passwordShapeProblem(control.value);
    return problem ? { server: problem } : null;
  };
}

@Component({
  selector: 'vy-user-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatCheckboxModule, MatSelectModule, MatSlideToggleModule],
  templateUrl: './user-dialog.html',
  styleUrl: './user-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UserDialog {
  protected readonly data = inject<UserDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(UsersApi);
  private readonly dialogRef = inject(MatDialogRef<UserDialog, boolean>);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly roles = roles;
  protected readonly roleLabels = roleLabels;
  protected readonly editing = this.data.user !== null;
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);

  protected readonly form = this.fb.group({
    email: [{ value: this.data.user?.email ?? '', disabled: this.editing }, [Validators.required, Validators.email]],
    name: [this.data.user?.name ?? '', [Validators.required, Validators.maxLength(120)]],
    roles: this.fb.group(
      Object.fromEntries(roles.map((role) => [role, this.data.user?.roles.includes(role) ?? false])) as Record<Role, boolean>,
      { validators: (group: AbstractControl) => (Object.values(group.value as Record<string, boolean>).some(Boolean) ? null : { server: 'Choose at least one role.' }) },
    ),
    allSites: [this.data.user?.allSites ?? true],
    siteIds: [this.data.user?.siteIds ?? ([] as number[])],
    active: [this.data.user?.active ?? true],
    password: ['', this.editing ? [passwordPolicy(true)] : [Validators.required, passwordPolicy(false)]],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const chosenRoles = roles.filter((role) => value.roles[role]);
    this.saving.set(true);
    this.formError.set(null);
    try {
      if (this.data.user) {
        await firstValueFrom(
          this.api.update(this.data.user.id, {
            name: value.name,
            roles: chosenRoles,
            allSites: value.allSites,
            siteIds: value.allSites ? [] : value.siteIds,
            active: value.active,
            ...(value.password && { password: value.password }),
          }),
        );
      } else {
        await firstValueFrom(
          this.api.create({ email: value.email, name: value.name, roles: chosenRoles, allSites: value.allSites, siteIds: value.allSites ? [] : value.siteIds, password: value.password }),
        );
      }
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
