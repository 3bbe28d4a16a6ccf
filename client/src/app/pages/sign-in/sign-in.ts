// The sign-in page: e-mail and password, one generic message on failure.
import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router } from '@angular/router';
import { AuthStore } from '../../core/auth/auth-store';
import { ApiError } from '../../core/http/api-error';

@Component({
  selector: 'vy-sign-in',
  imports: [ReactiveFormsModule, MatCardModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './sign-in.html',
  styleUrl: './sign-in.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);
  /** Where to go after signing in (set by the guard that sent us here; router input binding makes it undefined when absent). */
  readonly next = input<string | undefined>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    password: ['', Validators.required],
  });
  protected readonly busy = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly showPassword = signal(false);

  protected async signIn(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.failure.set(null);
    try {
      const { email, password } = this.form.getRawValue();
      await this.auth.signIn(email, password);
      // Only paths inside the app: never an absolute or protocol-relative URL from the address bar.
      const next = this.next() ?? '/';
      const target = next.startsWith('/') && !next.startsWith('//') ? next : '/';
      await this.router.navigateByUrl(target);
    } catch (error) {
      this.failure.set(ApiError.from(error).message);
      this.form.controls.password.reset();
    } finally {
      this.busy.set(false);
    }
  }
}
