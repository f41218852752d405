import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import type { StudyPose, StudyResponse } from '../api-types';
import { Icon } from '../shell/icon';
import { StatusPanel } from '../shell/status-panel';
import { SweepPanel } from '../sweeps/sweep-panel';
import type { SelectedPose } from '../sweeps/selected-pose';
import { formatQuantity } from '../units/format-quantity';
import { WorkspaceContext } from '../workspaces/workspace-context';
import { CoilFiguresTable } from './coil-figures-table';
import { LiveFiguresPanel } from './live-figures-panel';
import { LiveLink } from './live-link';
import { pairDrawing } from './pair-geometry';
import { PairView } from './pair-view';
import { PoseControls } from './pose-controls';
import { poseRanges, type PoseRanges } from './pose-ranges';
import { RevisionsPanel } from './revisions-panel';
import { StudiesApi } from './studies-api';
import { StudyCautions } from './study-cautions';
import { StudyFormDialog, StudyFormDialogData } from './study-form-dialog';
import { StudyInputsSummary } from './study-inputs-summary';
import { thresholdText } from './threshold-text';

/** Slider ranges until the pair's size is known: a phone-size pad. */
const defaultRanges: PoseRanges = poseRanges(
  { min: { x: -0.025, y: -0.025, z: 0 }, max: { x: 0.025, y: 0.025, z: 0 } },
  { min: { x: -0.025, y: -0.025, z: 0 }, max: { x: 0.025, y: 0.025, z: 0 } },
);

/**
 * The study workbench: the pair in 3D to scale, the Rx's pose under the user's hand with the
 * link figures following every slider movement (computed in a web worker), the cautions that go
 * with them, the sweeps, the study's inputs and its revisions.
 */
@Component({
  selector: 'app-study-workbench-page',
  imports: [
    CoilFiguresTable,
    Icon,
    LiveFiguresPanel,
    MatButtonModule,
    PairView,
    PoseControls,
    RevisionsPanel,
    RouterLink,
    StatusPanel,
    StudyCautions,
    StudyInputsSummary,
    SweepPanel,
  ],
  providers: [LiveLink],
  templateUrl: './study-workbench-page.html',
  styleUrl: './study-workbench-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyWorkbenchPage {
  /** Route parameter. */
  readonly studyId = input.required<string>();

  private readonly api = inject(StudiesApi);
  private readonly dialog = inject(MatDialog);
  protected readonly context = inject(WorkspaceContext);
  protected readonly live = inject(LiveLink);

  protected readonly study = this.api.studyResource(() => {
    const workspaceId = this.context.id();
    return workspaceId ? { workspaceId, studyId: this.studyId() } : undefined;
  });
  protected readonly current = computed(() => (this.study.hasValue() ? this.study.value() : null));
  protected readonly problem = computed(() => {
    const error = this.study.error();
    return error ? apiProblem(error) : null;
  });
  protected readonly canEdit = computed(() => {
    const role = this.context.role();
    return role === 'owner' || role === 'editor';
  });

  /** The Rx pose on screen (m, degrees); starts at the study's nominal pose. */
  protected readonly pose = signal<StudyPose>({ x: 0, y: 0, z: 0.005, tiltX: 0, tiltY: 0 });

  protected readonly drawing = computed(() => {
    const filaments = this.live.filaments();
    const study = this.current();
    if (!filaments || !study) return null;
    return pairDrawing(filaments.tx, filaments.rx, {
      tx: study.txCoil.spec.backing,
      rx: study.rxCoil.spec.backing,
    });
  });
  protected readonly ranges = computed(() => {
    const drawing = this.drawing();
    return drawing ? poseRanges(drawing.tx.bounds, drawing.rx.bounds) : defaultRanges;
  });

  protected readonly headline = computed(() => {
    const s = this.current();
    if (!s) return '';
    const f = formatQuantity(s.frequencyHz, 'Hz', { digits: 4, trim: true });
    return `${f} · ${thresholdText(s.threshold)} · version ${s.version}`;
  });

  constructor() {
    // A new pair (or a changed coil) is prepared once; the pose returns to the nominal one.
    let preparedKey = '';
    let nominalKey = '';
    effect(() => {
      const study = this.current();
      if (!study) return;
      const key = JSON.stringify([study.txCoil.spec, study.rxCoil.spec]);
      if (key !== preparedKey) {
        preparedKey = key;
        untracked(() => this.live.prepare(study.txCoil.spec, study.rxCoil.spec, study.nominalPose));
      }
      const nominal = JSON.stringify(study.nominalPose);
      if (nominal !== nominalKey) {
        nominalKey = nominal;
        this.pose.set({ ...study.nominalPose });
      }
    });
    // Every pose (and operating point) asks the worker; the newest wins.
    effect(() => {
      const study = this.current();
      const pose = this.pose();
      if (!study) return;
      untracked(() =>
        this.live.evaluate(pose, {
          frequency: study.frequencyHz,
          current: study.txCurrentA,
          compensation: study.compensation,
        }),
      );
    });
  }

  protected edit(): void {
    const study = this.current();
    const workspaceId = this.context.id();
    if (!study || !workspaceId) return;
    this.dialog
      .open<StudyFormDialog, StudyFormDialogData, StudyResponse>(StudyFormDialog, {
        data: { workspaceId, study },
        width: '760px',
        maxWidth: '96vw',
      })
      .afterClosed()
      .subscribe((saved) => {
        if (saved) this.study.set(saved);
      });
  }

  protected mapPoint(selected: SelectedPose): void {
    this.pose.set({ ...selected });
  }
}
