import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  computed,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { toObservable } from '@angular/core/rxjs-interop';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { Subscription, timer } from 'rxjs';
import { apiProblem } from '../api-problem';
import type {
  CreateSweepRequest,
  StudyResponse,
  SweepKind,
  SweepProgressEvent,
  SweepRunResponse,
} from '../api-types';
import { ProblemBanner } from '../shell/problem-banner';
import { StatusPanel } from '../shell/status-panel';
import { CouplingCurveView } from './coupling-curve-view';
import { CouplingMapView } from './coupling-map-view';
import { formatDuration } from './format-duration';
import type { SelectedPose } from './selected-pose';
import { isActiveStatus, sweepKindLabels, sweepKindOrder, sweepStatusLabels } from './sweep-labels';
import { SweepProgress } from './sweep-progress';
import { SweepRunList } from './sweep-run-list';
import { SweepSetup } from './sweep-setup';
import { SweepsApi, isStreamEnd } from './sweeps-api';

/** A progress stream that drops is opened again this many times, a little later each time. */
const streamAttempts = 5;
const streamRetryMs = 1500;

/**
 * The sweeps of a study in the workbench: set-up with its cost (editors), the running sweep's
 * progress, the run list, and the newest result of each kind as coupling maps and curves.
 * Opening a study shows its stored results at once and follows a run that is still going.
 */
@Component({
  selector: 'app-sweep-panel',
  imports: [
    CouplingCurveView,
    CouplingMapView,
    MatButtonToggleModule,
    ProblemBanner,
    StatusPanel,
    SweepProgress,
    SweepRunList,
    SweepSetup,
  ],
  templateUrl: './sweep-panel.html',
  styleUrl: './sweep-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepPanel {
  private readonly api = inject(SweepsApi);

  readonly workspaceId = input.required<string>();
  readonly study = input.required<StudyResponse>();
  readonly canEdit = input(false);
  /** A map point the user clicked: the workbench moves the Rx there (m, degrees). */
  readonly poseSelected = output<SelectedPose>();

  protected readonly runs = signal<SweepRunResponse[] | null>(null);
  protected readonly listProblem = signal<string | null>(null);
  /** Results on screen: one run with its result per kind. */
  protected readonly shown = signal<Partial<Record<SweepKind, SweepRunResponse>>>({});
  protected readonly loadingKinds = signal<SweepKind[]>([]);
  protected readonly resultKind = signal<SweepKind | null>(null);
  protected readonly progress = signal<SweepProgressEvent | null>(null);
  protected readonly starting = signal(false);
  protected readonly banner = signal<string | null>(null);

  protected readonly kindLabels = sweepKindLabels;
  protected readonly active = computed(
    () => this.runs()?.find((r) => isActiveStatus(r.status)) ?? null,
  );
  protected readonly latest = computed(() => this.runs()?.[0] ?? null);
  protected readonly latestStatus = computed(() => {
    const run = this.latest();
    if (!run) return null;
    const progress = this.progress();
    return progress?.runId === run.id ? progress.status : run.status;
  });
  protected readonly latestText = computed(() => {
    const run = this.latest();
    const status = this.latestStatus();
    if (!run || !status) return '';
    const time =
      run.computeTimeS === null ? '' : ` · computed in ${formatDuration(run.computeTimeS)}`;
    const label = `${sweepKindLabels[run.kind]}: ${sweepStatusLabels[status]}`;
    return status === 'succeeded' ? label + time : label;
  });
  protected readonly resultKinds = computed(() => {
    const shown = this.shown();
    const loading = this.loadingKinds();
    return sweepKindOrder.filter((k) => shown[k] || loading.includes(k));
  });
  protected readonly result = computed(() => {
    const kind = this.resultKind();
    return kind ? (this.shown()[kind] ?? null) : null;
  });
  protected readonly shownIds = computed(() =>
    Object.values(this.shown()).map((r) => (r as SweepRunResponse).id),
  );

  /** Every request of the open study; cancelled when another study opens. */
  private session = new Subscription();
  private stream: Subscription | null = null;

  constructor() {
    const key = computed(
      () => ({ ws: this.workspaceId(), id: this.study().id, hash: this.study().inputsHash }),
      { equal: (a, b) => a.ws === b.ws && a.id === b.id && a.hash === b.hash },
    );
    let opened: { ws: string; id: string } | null = null;
    const watch = toObservable(key).subscribe((k) => {
      if (opened?.ws === k.ws && opened.id === k.id) {
        // Same study, new inputs: the runs' "current" flags changed.
        this.refreshList();
      } else {
        opened = { ws: k.ws, id: k.id };
        this.open();
      }
    });
    inject(DestroyRef).onDestroy(() => {
      watch.unsubscribe();
      this.session.unsubscribe();
      this.stream?.unsubscribe();
    });
  }

  protected reload(): void {
    this.open();
  }

  protected startRun(request: CreateSweepRequest): void {
    this.banner.set(null);
    this.starting.set(true);
    this.session.add(
      this.api.create(this.workspaceId(), this.study().id, request).subscribe({
        next: (run) => {
          this.starting.set(false);
          this.runs.update((runs) => [run, ...(runs ?? []).filter((r) => r.id !== run.id)]);
          this.follow(run);
        },
        error: (error: unknown) => {
          this.starting.set(false);
          this.banner.set(apiProblem(error).message);
        },
      }),
    );
  }

  protected cancelRun(): void {
    const run = this.active();
    if (!run) return;
    this.banner.set(null);
    this.session.add(
      this.api.cancel(this.workspaceId(), this.study().id, run.id).subscribe({
        next: (updated) => this.replace(updated),
        error: (error: unknown) => this.banner.set(apiProblem(error).message),
      }),
    );
  }

  protected showRun(run: SweepRunResponse): void {
    this.loadResult(run, true);
  }

  protected selectKind(kind: SweepKind): void {
    this.resultKind.set(kind);
  }

  /** Loads the runs of the study, draws the newest result of each kind, follows a live run. */
  private open(): void {
    this.session.unsubscribe();
    this.session = new Subscription();
    this.stream?.unsubscribe();
    this.stream = null;
    this.runs.set(null);
    this.listProblem.set(null);
    this.shown.set({});
    this.loadingKinds.set([]);
    this.resultKind.set(null);
    this.progress.set(null);
    this.banner.set(null);
    this.session.add(
      this.api.list(this.workspaceId(), this.study().id).subscribe({
        next: ({ items }) => {
          this.runs.set(items);
          const newest = sweepKindOrder
            .map((kind) => items.find((r) => r.kind === kind && r.status === 'succeeded'))
            .filter((r): r is SweepRunResponse => r !== undefined);
          const first = items.find((r) => r.status === 'succeeded');
          for (const run of newest) this.loadResult(run, run === first);
          const live = items.find((r) => isActiveStatus(r.status));
          if (live) this.follow(live);
        },
        error: (error: unknown) => this.listProblem.set(apiProblem(error).message),
      }),
    );
  }

  private refreshList(): void {
    this.session.add(
      this.api.list(this.workspaceId(), this.study().id).subscribe({
        next: ({ items }) => {
          this.runs.set(items);
          this.shown.update((shown) => {
            const next = { ...shown };
            for (const [kind, run] of Object.entries(shown) as [SweepKind, SweepRunResponse][]) {
              const listed = items.find((r) => r.id === run.id);
              if (listed) next[kind] = { ...run, current: listed.current };
            }
            return next;
          });
        },
        error: () => undefined,
      }),
    );
  }

  private loadResult(run: SweepRunResponse, select: boolean): void {
    if (select) this.resultKind.set(run.kind);
    if (this.shown()[run.kind]?.id === run.id) return;
    this.loadingKinds.update((kinds) => [...kinds.filter((k) => k !== run.kind), run.kind]);
    const done = () => this.loadingKinds.update((kinds) => kinds.filter((k) => k !== run.kind));
    this.session.add(
      this.api.get(this.workspaceId(), this.study().id, run.id).subscribe({
        next: (full) => {
          done();
          if (!full.result) return;
          this.shown.update((shown) => ({ ...shown, [full.kind]: full }));
        },
        error: (error: unknown) => {
          done();
          this.banner.set(`The result could not be loaded. ${apiProblem(error).message}`);
        },
      }),
    );
  }

  /** Streams a run's progress until it ends; a dropped stream is opened again a few times. */
  private follow(run: SweepRunResponse, attempt = 0): void {
    this.stream?.unsubscribe();
    if (attempt === 0) this.progress.set(null);
    let ended = false;
    const reconnect = () => {
      if (ended) return;
      if (attempt + 1 >= streamAttempts) {
        this.banner.set('Progress stopped arriving. Reload to see where the sweep is.');
        return;
      }
      // The stream closed early: ask where the run is, and listen again if it still runs.
      this.session.add(
        timer(streamRetryMs * (attempt + 1)).subscribe(() =>
          this.session.add(
            this.api.get(this.workspaceId(), this.study().id, run.id).subscribe({
              next: (now) =>
                isActiveStatus(now.status) ? this.follow(now, attempt + 1) : this.finished(now),
              error: () => this.follow(run, attempt + 1),
            }),
          ),
        ),
      );
    };
    this.stream = this.api.events(this.workspaceId(), this.study().id, run.id).subscribe({
      next: (event) => {
        if (isStreamEnd(event)) {
          ended = true;
          this.finished(event.end);
          return;
        }
        this.progress.set(event);
        this.patch(event.runId, {
          status: event.status,
          pointsDone: event.pointsDone,
          pointsTotal: event.pointsTotal,
          progressFraction: event.fraction,
        });
      },
      error: reconnect,
      complete: reconnect,
    });
  }

  private finished(run: SweepRunResponse): void {
    this.progress.set(null);
    this.replace(run);
    if (run.status === 'succeeded') this.loadResult(run, true);
  }

  private replace(run: SweepRunResponse): void {
    this.runs.update((runs) => (runs ?? []).map((r) => (r.id === run.id ? { ...r, ...run } : r)));
  }

  private patch(id: string, change: Partial<SweepRunResponse>): void {
    this.runs.update((runs) => (runs ?? []).map((r) => (r.id === id ? { ...r, ...change } : r)));
  }
}
