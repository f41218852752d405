import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { roleDescriptions } from '../api-types';
import { Icon } from '../shell/icon';
import { SafetyNotes } from '../shell/safety-notes';
import { workspaceFeatures } from '../shell/workspace-features';
import { WorkspaceContext } from './workspace-context';

@Component({
  selector: 'app-workspace-home-page',
  imports: [Icon, MatButtonModule, RouterLink, SafetyNotes],
  template: `
    @if (context.current(); as workspace) {
      <main class="page">
        <p class="page-lede">
          {{ roleDescriptions[workspace.role] }} — that is what your role as
          <strong>{{ workspace.role }}</strong> lets you do here.
        </p>

        <div class="grid">
          <a class="tile ready" routerLink="members" data-testid="home-members">
            <app-icon name="people" class="tile-icon" />
            <h2>Members</h2>
            <p>
              @if (context.isOwner()) {
                Invite engineers, reviewers and viewers, and set their roles.
              } @else {
                See who else works in this workspace and in which role.
              }
            </p>
            <span class="go">Open <app-icon name="arrow-right" /></span>
          </a>
          @for (feature of features; track feature.key) {
            <a class="tile" [class.ready]="feature.ready" [routerLink]="feature.path">
              <app-icon [name]="feature.icon" class="tile-icon" />
              <h2>{{ feature.label }}</h2>
              <p>{{ feature.summary }}</p>
              @if (feature.ready) {
                <span class="go">Open <app-icon name="arrow-right" /></span>
              } @else {
                <span class="later">Coming in a later release</span>
              }
            </a>
          }
        </div>

        <app-safety-notes />
      </main>
    }
  `,
  styleUrl: './workspace-home-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WorkspaceHomePage {
  protected readonly context = inject(WorkspaceContext);
  protected readonly features = workspaceFeatures;
  protected readonly roleDescriptions = roleDescriptions;
}
