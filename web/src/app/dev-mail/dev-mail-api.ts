import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject, signal } from '@angular/core';
import type { ListCapturedMailResponse } from '../api-types';

export const devMailUrl = '/api/v1/dev/mail';

/**
 * The development mail catcher. The server answers 404 outside development and tests, so the
 * page and the hints that point to it ask first whether it is there.
 */
@Injectable({ providedIn: 'root' })
export class DevMailApi {
  private readonly http = inject(HttpClient);
  private readonly availableState = signal<boolean | null>(null);
  private probing = false;

  /** null until known; then whether this server captures mail. */
  readonly available = this.availableState.asReadonly();

  mailResource() {
    return httpResource<ListCapturedMailResponse>(() => devMailUrl);
  }

  /** Asks once per page load. */
  probe(): void {
    if (this.probing) return;
    this.probing = true;
    this.http.get<ListCapturedMailResponse>(devMailUrl).subscribe({
      next: () => this.availableState.set(true),
      error: () => this.availableState.set(false),
    });
  }
}
