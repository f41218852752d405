import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { Router } from '@angular/router';
import { apiProblem } from '../api-problem';
import type { CapturedMail } from '../api-types';
import { Icon } from '../shell/icon';
import { StatusPanel } from '../shell/status-panel';
import { DevMailApi } from './dev-mail-api';
import { TextSegment, linkifyText } from './linkify-text';

interface MailView {
  mail: CapturedMail;
  segments: TextSegment[];
}

@Component({
  selector: 'app-dev-mail-page',
  imports: [DatePipe, Icon, MatButtonModule, StatusPanel],
  templateUrl: './dev-mail-page.html',
  styleUrl: './dev-mail-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DevMailPage {
  private readonly router = inject(Router);
  protected readonly mail = inject(DevMailApi).mailResource();

  protected readonly problem = computed(() => {
    const error = this.mail.error();
    return error ? apiProblem(error) : null;
  });
  protected readonly messages = computed<MailView[]>(() =>
    this.mail.hasValue()
      ? this.mail.value().items.map((mail) => ({ mail, segments: linkifyText(mail.text) }))
      : [],
  );

  /** Links back into Couplet open in this tab through the router; others in a new tab. */
  protected follow(event: MouseEvent, href: string): void {
    const url = new URL(href, window.location.href);
    if (url.origin !== window.location.origin) return;
    if (event.button !== 0 || event.ctrlKey || event.metaKey || event.shiftKey) return;
    event.preventDefault();
    void this.router.navigateByUrl(url.pathname + url.search + url.hash);
  }

  protected isInternal(href: string): boolean {
    return new URL(href, window.location.href).origin === window.location.origin;
  }
}
