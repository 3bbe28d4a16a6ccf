// Shown for any address the client does not know.
import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

@Component({
  selector: 'vy-not-found',
  imports: [RouterLink, MatButtonModule],
  template: `
    <div class="vy-page">
      <h1 class="vy-page-title">Page not found</h1>
      <p>There is no page at this address, or you do not have access to it.</p>
      <a mat-flat-button routerLink="/">Go to the home page</a>
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFound {}
