import { HttpTestingController } from '@angular/common/http/testing';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import type { Role, StudyResponse } from '../api-types';
import { SweepPanel } from '../sweeps/sweep-panel';
import type { SelectedPose } from '../sweeps/selected-pose';
import {
  configurePageTest,
  resetAndVerify,
  settle,
  signInAs,
  testWorkspace,
} from '../testing/page-test-bed';
import { WorkspaceContext } from '../workspaces/workspace-context';
import { LIVE_LINK_PORT } from './live-link-port';
import { StudyWorkbenchPage } from './study-workbench-page';
import {
  FakeLiveLinkPort,
  fakeFigures,
  revisionSummary,
  studyId,
  testRevision,
  testStudy,
} from './study-test-data';

const workspaceId = testWorkspace.id;
const base = `/api/v1/workspaces/${workspaceId}`;
const studyUrl = `${base}/studies/${studyId}`;

/** Stands in for the sweeps helper's panel: the workbench only places it and hears its clicks. */
@Component({
  selector: 'app-sweep-panel',
  template: '<span data-testid="fake-sweep-panel">{{ study().name }}</span>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class FakeSweepPanel {
  readonly workspaceId = input.required<string>();
  readonly study = input.required<StudyResponse>();
  readonly canEdit = input(false);
  readonly poseSelected = output<SelectedPose>();
}

// The first render of the whole workbench takes seconds on a busy two-core machine.
describe('StudyWorkbenchPage', { timeout: 20_000 }, () => {
  let fixture: ComponentFixture<StudyWorkbenchPage>;
  let http: HttpTestingController;
  let port: FakeLiveLinkPort;

  async function open(role: Role, study = testStudy(workspaceId)): Promise<void> {
    port = new FakeLiveLinkPort();
    TestBed.overrideComponent(StudyWorkbenchPage, {
      remove: { imports: [SweepPanel] },
      add: { imports: [FakeSweepPanel] },
    });
    http = configurePageTest({
      providers: [WorkspaceContext, { provide: LIVE_LINK_PORT, useValue: async () => port }],
    });
    signInAs();
    TestBed.inject(WorkspaceContext).bind(() => workspaceId);
    fixture = TestBed.createComponent(StudyWorkbenchPage);
    fixture.componentRef.setInput('studyId', studyId);
    await settle();
    http.expectOne(base).flush({ ...testWorkspace, role });
    await settle();
    http.expectOne(studyUrl).flush(study);
    await settle();
    http.expectOne(`${studyUrl}/revisions`).flush({ items: [revisionSummary] });
    await settle();
  }

  const page = (): HTMLElement => fixture.nativeElement as HTMLElement;
  const byId = (id: string) => page().querySelector<HTMLElement>(`[data-testid=${id}]`);
  const textOf = (id: string) => byId(id)?.textContent?.trim() ?? null;

  afterEach(() => {
    TestBed.inject(MatDialog).closeAll();
    resetAndVerify(http);
  });

  it('prepares the pair once, asks for the nominal pose and shows the worker’s figures', async () => {
    await open('editor');
    expect(textOf('study-name')).toBe('Dock pad at 4 mm');
    const [setup] = port.setups();
    expect(port.setups()).toHaveLength(1);
    expect(setup.tx).toEqual(testStudy(workspaceId).txCoil.spec);
    expect(setup.rx).toEqual(testStudy(workspaceId).rxCoil.spec);
    expect(setup.warmPose).toEqual(testStudy(workspaceId).nominalPose);
    // No pose is sent before the pair is ready.
    expect(port.poses()).toHaveLength(0);
    expect(textOf('live-k')).toBe('—');

    port.ready(setup.setupId);
    await settle();
    const [first] = port.poses();
    expect(first).toMatchObject({
      pose: { x: 0, y: 0, z: 0.004, tiltX: 0, tiltY: 0 },
      frequency: 140e3,
      current: 2,
      compensation: 'series-series',
    });
    port.reply({
      type: 'figures',
      id: first.id,
      setupId: setup.setupId,
      figures: fakeFigures(),
      computeMs: 2,
    });
    await settle();
    expect(textOf('live-k')).toBe('0.182');
    expect(textOf('live-M')).toBe('21.0 nH');
    expect(textOf('live-eta')).toBe('92.1 %');
    expect(textOf('live-verdict')).toContain('Below k ≥ 0.2');
    expect(textOf('live-timing')).toMatch(/^computed in \d+(\.\d)? ms$/);
    expect(textOf('coil-figures-tx')).toContain('140 nH');
    expect(page().querySelector('[data-testid=pair-view]')).not.toBeNull();
    // jsdom has no WebGL: the view says so and everything else works.
    expect(byId('pair-view-unsupported')).not.toBeNull();
    expect(textOf('fake-sweep-panel')).toBe('Dock pad at 4 mm');
  });

  it('sends a new pose when the gap is typed, keeps only the latest, and updates k', async () => {
    await open('editor');
    const setupId = port.setups()[0].setupId;
    port.ready(setupId);
    await settle();
    const first = port.poses()[0];

    const gap = byId('pose-gap') as HTMLInputElement;
    expect(gap.value).toBe('4');
    for (const text of ['6', '7', '8']) {
      gap.value = text;
      gap.dispatchEvent(new Event('input'));
      await settle();
    }
    // The nominal pose is still in flight: nothing more is sent yet.
    expect(port.poses()).toHaveLength(1);
    port.reply({ type: 'figures', id: first.id, setupId, figures: fakeFigures(), computeMs: 1 });
    await settle();
    // Only the latest of the three gaps goes next.
    expect(port.poses()).toHaveLength(2);
    const latest = port.poses()[1];
    expect(latest.pose.z).toBeCloseTo(0.008, 12);

    port.reply({
      type: 'figures',
      id: latest.id,
      setupId,
      figures: fakeFigures({ k: 0.251, etaMax: 0.95 }),
      computeMs: 1,
    });
    await settle();
    expect(textOf('live-k')).toBe('0.251');
    expect(textOf('live-verdict')).toContain('Meets k ≥ 0.2');
  });

  it('drops an answer about a replaced pair and shows why a pose fails', async () => {
    await open('editor');
    const setupId = port.setups()[0].setupId;
    port.ready(setupId);
    await settle();
    const first = port.poses()[0];
    // An answer from an older set-up is ignored.
    port.reply({
      type: 'figures',
      id: first.id,
      setupId: setupId - 1,
      figures: fakeFigures({ k: 0.9 }),
      computeMs: 1,
    });
    await settle();
    expect(textOf('live-k')).toBe('—');
    port.reply({
      type: 'error',
      id: first.id,
      setupId,
      message: 'the coils intersect at this pose',
    });
    await settle();
    expect(textOf('live-pose-error')).toBe('the coils intersect at this pose');
  });

  it('moves the Rx to a point picked on a map', async () => {
    await open('editor');
    const setupId = port.setups()[0].setupId;
    port.ready(setupId);
    await settle();
    port.reply({
      type: 'figures',
      id: port.poses()[0].id,
      setupId,
      figures: fakeFigures(),
      computeMs: 1,
    });
    await settle();
    const panel = fixture.debugElement.query((d) => d.componentInstance instanceof FakeSweepPanel);
    (panel.componentInstance as FakeSweepPanel).poseSelected.emit({
      x: 0.01,
      y: -0.005,
      z: 0.004,
      tiltX: 0,
      tiltY: 0,
    });
    await settle();
    expect(port.poses()[1].pose).toEqual({ x: 0.01, y: -0.005, z: 0.004, tiltX: 0, tiltY: 0 });
    expect((byId('pose-x') as HTMLInputElement).value).toBe('10');
    expect((byId('pose-y') as HTMLInputElement).value).toBe('-5');
  });

  it('shows the cautions, raising the tank voltage above 60 V with the computed value', async () => {
    await open('editor');
    const setupId = port.setups()[0].setupId;
    port.ready(setupId);
    await settle();
    expect(textOf('caution-exposure')).toContain('27 µT');
    expect(textOf('caution-exposure')).toContain('ICNIRP 2010');
    expect(textOf('study-cautions')).toContain('filament models');
    expect(textOf('study-cautions')).not.toContain('infinite plate');
    expect(textOf('study-cautions')).toContain('licensed practice');
    port.reply({
      type: 'figures',
      id: port.poses()[0].id,
      setupId,
      figures: fakeFigures({ resonantVoltageTx: 412 }),
      computeMs: 1,
    });
    await settle();
    const voltage = byId('caution-voltage');
    expect(voltage?.textContent).toContain('412 V rms');
    expect(voltage?.textContent).toContain('583 V peak');
    expect(voltage?.classList).toContain('raised');
  });

  it('names the infinite-plate approximation when the Tx has a ferrite backing', async () => {
    const study = testStudy(workspaceId);
    const backed = { ...study.txCoil.spec, backing: { mur: 2000, distance: 0.001 } };
    await open('editor', { ...study, txCoil: { ...study.txCoil, spec: backed } });
    expect(textOf('study-cautions')).toContain('infinite plate (method of images)');
  });

  it('gives a viewer the figures and revisions without any edit action', async () => {
    await open('viewer');
    for (const id of ['edit-study', 'save-revision']) expect(byId(id)).toBeNull();
    expect(textOf('revision-item')).toContain('First look before the housing review');
    expect(textOf('revision-item')).toContain('engine 0.4.0');
    expect(textOf('revision-item')).toContain('inputs changed since');
    expect(textOf('study-inputs')).toContain('140 kHz');
  });

  it('opens a revision read-only with its frozen inputs and coil snapshots', async () => {
    await open('reviewer');
    byId('revision-item')?.click();
    await settle();
    http.expectOne(`${studyUrl}/revisions/${revisionSummary.id}`).flush(testRevision(workspaceId));
    await settle();
    const view = document.querySelector('[data-testid=revision-view]');
    expect(view?.textContent).toContain('120 kHz');
    expect(view?.textContent).toContain('Frozen notes');
    expect(document.querySelector('[data-testid=revision-coil-Tx]')?.textContent).toContain(
      'Dock Tx 50 mm',
    );
    expect(view?.querySelectorAll('input, textarea, select')).toHaveLength(0);
  });

  it('saves a revision with the study version on screen', async () => {
    await open('owner');
    byId('save-revision')?.click();
    await settle();
    const summary = document.querySelector<HTMLTextAreaElement>('[data-testid=revision-summary]');
    summary!.value = 'Gap raised to 4 mm';
    summary!.dispatchEvent(new Event('input'));
    document.querySelector<HTMLButtonElement>('[data-testid=revision-save]')?.click();
    await settle();
    const post = http.expectOne(`${studyUrl}/revisions`);
    expect(post.request.body).toEqual({ summary: 'Gap raised to 4 mm', studyVersion: 3 });
    post.flush({ ...revisionSummary, id: 'e0000000-0000-4000-8000-000000000002', number: 2 });
    await settle();
    http.expectOne(`${studyUrl}/revisions`).flush({ items: [revisionSummary] });
    await settle();
  });
});
