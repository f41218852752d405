import { DatePipe, TitleCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { Router, RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import { roleDescriptions } from '../api-types';
import { AuthCard } from '../auth/auth-card';
import { AuthSession } from '../auth/auth-session';
import { Icon } from '../shell/icon';
import { ProblemBanner } from '../shell/problem-banner';
import { StatusPanel } from '../shell/status-panel';
import { WorkspaceList } from '../workspaces/workspace-list';
import { InvitationsApi } from './invitations-api';

@Component({
  selector: 'app-accept-invitation-page',
  imports: [
    AuthCard,
    DatePipe,
    Icon,
    MatButtonModule,
    ProblemBanner,
    RouterLink,
    StatusPanel,
    TitleCasePipe,
  ],
  templateUrl: './accept-invitation-page.html',
  styleUrl: './accept-invitation-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitationPage {
  /** The secret from the e-mailed link (route parameter). */
  readonly token = input.required<string>();

  private readonly api = inject(InvitationsApi);
  private readonly workspaces = inject(WorkspaceList);
  private readonly router = inject(Router);
  protected readonly session = inject(AuthSession);

  protected readonly preview = this.api.previewResource(() => this.token());
  protected readonly roleDescriptions = roleDescriptions;
  protected readonly accepting = signal(false);
  protected readonly banner = signal<string | null>(null);

  protected readonly problem = computed(() => {
    const error = this.preview.error();
    return error ? apiProblem(error) : null;
  });
  /** Where sign-in and sign-up come back to. */
  protected readonly here = computed(() => `/invitations/${encodeURIComponent(this.token())}`);
  protected readonly otherAddress = computed(() => {
    const user = this.session.user();
    const invited = this.preview.hasValue() ? this.preview.value().email : null;
    return !!user && !!invited && user.email.toLowerCase() !== invited.toLowerCase();
  });

  protected accept(): void {
    this.banner.set(null);
    this.accepting.set(true);
    this.api.accept(this.token()).subscribe({
      next: ({ workspace }) => {
        this.workspaces.reload();
        void this.router.navigate(['/w', workspace.id]);
      },
      error: (error: unknown) => {
        this.accepting.set(false);
        const problem = apiProblem(error);
        if (problem.status === 409) {
          // Used, expired or revoked meanwhile: the preview says which.
          this.preview.reload();
        } else {
          this.banner.set(problem.message);
        }
      },
    });
  }
}
