import { DestroyRef, Injectable, inject, signal } from '@angular/core';
import type { Coil, FilamentSet } from '../../../../physics/src/index';
import type { StudyPose } from '../api-types';
import type {
  LiveFigures,
  LiveLinkPoseRequest,
  LiveLinkRequest,
  LiveLinkResponse,
  LiveOperatingPoint,
} from './live-link-messages';
import { LIVE_LINK_PORT, type LiveLinkPort } from './live-link-port';

/** How many round trips the timing summary keeps. */
const TIMING_WINDOW = 50;

/**
 * The workbench's side of the live link: prepares the pair in the worker once per coil pair,
 * then asks for one pose at a time. The latest pose wins: while one is being computed, newer
 * poses replace each other and only the last is sent next, so a fast slider never builds a
 * backlog; answers for an older pair or an older pose are dropped. Round trips are timed with
 * `performance.now()`. Provided per workbench, closed with it.
 */
@Injectable()
export class LiveLink {
  private readonly openPort = inject(LIVE_LINK_PORT);
  private port: LiveLinkPort | null = null;
  private readonly queue: LiveLinkRequest[] = [];
  private closed = false;

  private setupId = 0;
  private nextId = 0;
  private ready = false;
  private inFlight: { id: number; sentAt: number } | null = null;
  private pending: Omit<LiveLinkPoseRequest, 'type' | 'id' | 'setupId'> | null = null;
  private shownId = -1;
  private readonly trips: number[] = [];

  /** The pair's filaments (local frames, m) once prepared. */
  readonly filaments = signal<{ tx: FilamentSet; rx: FilamentSet } | null>(null);
  readonly figures = signal<LiveFigures | null>(null);
  /** Why the latest pose could not be computed (coils intersecting, say). */
  readonly poseError = signal<string | null>(null);
  /** Why the pair could not be prepared. */
  readonly setupError = signal<string | null>(null);
  readonly preparing = signal(false);
  readonly prepareMs = signal<number | null>(null);
  /** Latest round trip, page → worker → page, ms. */
  readonly roundTripMs = signal<number | null>(null);
  /** Median and maximum of the recent round trips, ms. */
  readonly timing = signal<{ median: number; max: number; count: number } | null>(null);

  constructor() {
    void this.openPort().then((port) => {
      if (this.closed) {
        port.close();
        return;
      }
      port.listen((response) => this.receive(response));
      this.port = port;
      for (const request of this.queue.splice(0)) port.send(request);
    });
    inject(DestroyRef).onDestroy(() => {
      this.closed = true;
      this.port?.close();
    });
  }

  /** Prepares a new coil pair; figures of the old one are cleared. */
  prepare(tx: Coil, rx: Coil, warmPose?: StudyPose): void {
    this.setupId += 1;
    this.ready = false;
    this.inFlight = null;
    this.shownId = -1;
    this.filaments.set(null);
    this.figures.set(null);
    this.setupError.set(null);
    this.poseError.set(null);
    this.preparing.set(true);
    this.send({ type: 'setup', setupId: this.setupId, tx, rx, warmPose });
  }

  /** Asks for the figures of a pose; sent now, or as soon as the pose in flight comes back. */
  evaluate(pose: StudyPose, point: LiveOperatingPoint): void {
    this.pending = { ...point, pose: { ...pose } };
    this.flush();
  }

  private flush(): void {
    if (!this.ready || this.inFlight || !this.pending) return;
    const id = ++this.nextId;
    const request: LiveLinkPoseRequest = {
      type: 'pose',
      id,
      setupId: this.setupId,
      ...this.pending,
    };
    this.pending = null;
    this.inFlight = { id, sentAt: performance.now() };
    this.send(request);
  }

  private send(request: LiveLinkRequest): void {
    if (this.port) this.port.send(request);
    else this.queue.push(request);
  }

  private receive(response: LiveLinkResponse): void {
    // An answer about a pair that has since been replaced.
    if (response.setupId !== this.setupId) return;
    if (response.type === 'ready') {
      this.ready = true;
      this.preparing.set(false);
      this.prepareMs.set(response.prepareMs);
      this.filaments.set({ tx: response.tx, rx: response.rx });
      this.flush();
      return;
    }
    if (response.type === 'error' && response.id === null) {
      this.preparing.set(false);
      this.setupError.set(response.message);
      return;
    }
    if (response.id === null) return;
    if (this.inFlight?.id === response.id) {
      this.record(performance.now() - this.inFlight.sentAt);
      this.inFlight = null;
    }
    if (response.id > this.shownId) {
      this.shownId = response.id;
      if (response.type === 'figures') {
        this.figures.set(response.figures);
        this.poseError.set(null);
      } else {
        this.poseError.set(response.message);
      }
    }
    this.flush();
  }

  private record(ms: number): void {
    this.roundTripMs.set(ms);
    this.trips.push(ms);
    if (this.trips.length > TIMING_WINDOW) this.trips.shift();
    const sorted = [...this.trips].sort((a, b) => a - b);
    this.timing.set({
      median: sorted[Math.floor(sorted.length / 2)],
      max: sorted[sorted.length - 1],
      count: sorted.length,
    });
  }
}
