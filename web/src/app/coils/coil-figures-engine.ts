import { DestroyRef, Injectable, inject } from '@angular/core';
import { Observable, Subject, filter, from, map, take } from 'rxjs';
import type { CoilFiguresAnswer, CoilFiguresRequest } from './coil-figures-request';

/**
 * Computes live coil figures off the page's thread: one web worker per editor, answers matched
 * to requests by id. Where there is no `Worker` (server rendering, the jsdom of the specs) it
 * answers inline. Specs replace this class with their own.
 */
@Injectable()
export class CoilFiguresEngine {
  private readonly worker: Worker | null = createWorker();
  private readonly answers = new Subject<CoilFiguresAnswer>();
  private nextId = 1;

  constructor() {
    if (this.worker) {
      this.worker.onmessage = (event: MessageEvent<CoilFiguresAnswer>) =>
        this.answers.next(event.data);
      this.worker.onerror = (event: ErrorEvent) => {
        event.preventDefault();
        this.answers.next({ id: -1, error: `The figures worker failed: ${event.message}` });
      };
    }
    inject(DestroyRef).onDestroy(() => this.worker?.terminate());
  }

  /** The figures of one spec; unsubscribe to drop an answer that is no longer wanted. */
  compute(request: Omit<CoilFiguresRequest, 'id'>): Observable<CoilFiguresAnswer> {
    const id = this.nextId++;
    if (!this.worker) {
      // Loaded only here, so the engine stays out of the page's bundle where a worker runs it.
      return from(import('./coil-figures-request')).pipe(
        map(({ answerCoilFigures }) => answerCoilFigures({ ...request, id })),
      );
    }
    const worker = this.worker;
    return new Observable<CoilFiguresAnswer>((subscriber) => {
      const subscription = this.answers
        .pipe(
          filter((answer) => answer.id === id || answer.id === -1),
          take(1),
          map((answer) => ({ ...answer, id })),
        )
        .subscribe(subscriber);
      worker.postMessage({ ...request, id } satisfies CoilFiguresRequest);
      return subscription;
    });
  }
}

function createWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  return new Worker(new URL('./coil-figures.worker', import.meta.url), { type: 'module' });
}
