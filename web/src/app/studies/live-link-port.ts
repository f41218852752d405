import { InjectionToken } from '@angular/core';
import type { LiveLinkRequest, LiveLinkResponse } from './live-link-messages';

/** A two-way channel to a live-link engine: a web worker, or a fake in specs. */
export interface LiveLinkPort {
  send(request: LiveLinkRequest): void;
  listen(handler: (response: LiveLinkResponse) => void): void;
  close(): void;
}

/** The worker, or (where a browser has none) the engine on the page, loaded on demand. */
export async function openLiveLinkPort(): Promise<LiveLinkPort> {
  if (typeof Worker !== 'undefined') {
    // This exact form lets the build bundle the worker as its own file.
    const worker = new Worker(new URL('./live-link.worker', import.meta.url), { type: 'module' });
    return {
      send: (request) => worker.postMessage(request),
      listen: (handler) => {
        worker.onmessage = (event: MessageEvent<LiveLinkResponse>) => handler(event.data);
      },
      close: () => worker.terminate(),
    };
  }
  const { LiveLinkEngine } = await import('./live-link-engine');
  const engine = new LiveLinkEngine();
  let handler: ((response: LiveLinkResponse) => void) | null = null;
  let closed = false;
  return {
    // Answer on a later task, as a worker would.
    send: (request) =>
      setTimeout(() => {
        if (!closed) handler?.(engine.handle(request));
      }),
    listen: (h) => (handler = h),
    close: () => (closed = true),
  };
}

/** Opens the channel the workbench computes through; specs provide a fake. */
export const LIVE_LINK_PORT = new InjectionToken<() => Promise<LiveLinkPort>>('LIVE_LINK_PORT', {
  providedIn: 'root',
  factory: () => openLiveLinkPort,
});
