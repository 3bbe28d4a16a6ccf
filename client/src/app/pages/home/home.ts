// The home page: a greeting and the cards for the user's roles (each feature adds its cards here).
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatChipsModule } from '@angular/material/chips';
import { roleLabels } from '@shared/auth/roles.js';
import { AuthStore } from '../../core/auth/auth-store';
import { PurchasingCard } from './purchasing-card';
import { PurchasingOutlookCard } from './purchasing-outlook-card';
import { ReceivingCard } from './receiving-card';
import { SitesCard } from './sites-card';
import { StorageCard } from './storage-card';
import { UsersCard } from './users-card';
import { ReviewCard } from './review-card';
import { CrewCard } from './crew-card';

@Component({
  selector: 'vy-home',
  imports: [MatChipsModule, SitesCard, UsersCard, ReceivingCard, PurchasingCard, PurchasingOutlookCard, StorageCard, ReviewCard, CrewCard],
  templateUrl: './home.html',
  styleUrl: './home.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Home {
  private readonly auth = inject(AuthStore);
  protected readonly user = this.auth.user;
  protected readonly isAdmin = computed(() => {
    this.user();
    return this.auth.hasRole('admin');
  });
  protected readonly roleNames = computed(() => (this.user()?.roles ?? []).map((role) => roleLabels[role]));
  protected readonly greeting = computed(() => {
    const hour = new Date().getHours();
    const part = hour < 12 ? 'Good morning' : hour < 18 ? 'Good afternoon' : 'Good evening';
    // "Dr. Imani Castell" is greeted as Imani: a title ending in a full stop is not a first name.
    const first = (this.user()?.name ?? '').split(/\s+/).find((word) => word && !word.endsWith('.')) ?? '';
    return `${part}, ${first}`;
  });
}
