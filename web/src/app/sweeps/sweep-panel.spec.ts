import { HttpEventType } from '@angular/common/http';
import { HttpTestingController, TestRequest } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import type { SweepProgressEvent, SweepRunResponse } from '../api-types';
import { configurePageTest, resetAndVerify, settle } from '../testing/page-test-bed';
import { FakePlotRenderer, provideFakePlotRenderer } from './fake-plot-renderer';
import { SweepPanel } from './sweep-panel';
import { estimateDebounceMs } from './sweep-setup';
import {
  testGapResult,
  testMapResult,
  testRun,
  testStudy,
  testWorkspaceId,
} from './sweep-test-data';

const base = `/api/v1/workspaces/${testWorkspaceId}/studies/${testStudy.id}/sweeps`;

describe('SweepPanel', () => {
  let http: HttpTestingController;
  let fixture: ComponentFixture<SweepPanel>;
  let plots: FakePlotRenderer;

  beforeEach(() => {
    http = configurePageTest({ providers: [provideFakePlotRenderer()] });
    plots = TestBed.inject(FakePlotRenderer);
  });

  afterEach(() => resetAndVerify(http));

  async function open(canEdit: boolean): Promise<void> {
    fixture = TestBed.createComponent(SweepPanel);
    fixture.componentRef.setInput('workspaceId', testWorkspaceId);
    fixture.componentRef.setInput('study', testStudy);
    fixture.componentRef.setInput('canEdit', canEdit);
    await settle();
  }

  const el = (testId: string): HTMLElement | null =>
    fixture.nativeElement.querySelector(`[data-testid=${testId}]`);
  const text = (testId: string): string =>
    el(testId)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';

  /** The estimate the editor's set-up asks for after its debounce; answered. */
  async function answerEstimate(seconds = 3, poses = 1681): Promise<TestRequest> {
    await new Promise((resolve) => setTimeout(resolve, estimateDebounceMs + 50));
    await settle();
    const request = http.expectOne({ method: 'POST', url: `${base}/estimate` });
    request.flush({
      poses,
      prepareSeconds: 0.4,
      perPoseMicroseconds: 1500,
      estimatedSeconds: seconds,
    });
    await settle();
    return request;
  }

  /** Sends server-sent events on an open stream, as the fetch backend reports a growing body. */
  function stream(request: TestRequest, sent: string[]): void {
    const partialText = sent.join('');
    request.event({
      type: HttpEventType.DownloadProgress,
      loaded: partialText.length,
      partialText,
    });
  }
  const progressEvent = (run: SweepRunResponse, done: number, remainingS: number | null) =>
    `event: progress\ndata: ${JSON.stringify({
      runId: run.id,
      status: 'running',
      pointsDone: done,
      pointsTotal: run.pointsTotal,
      fraction: done / run.pointsTotal,
      elapsedS: 4,
      remainingS,
    } satisfies SweepProgressEvent)}\n\n`;
  const endEvent = (run: SweepRunResponse) => `event: end\ndata: ${JSON.stringify(run)}\n\n`;

  it('draws the stored results at once when a study opens, the newest of each kind', async () => {
    await open(false);
    const map = testRun({ kind: 'xy-map', queuedAt: '2026-12-01T12:00:00.000Z' });
    const gap = testRun({ kind: 'gap', current: false });
    const olderMap = testRun({ kind: 'xy-map', queuedAt: '2026-12-01T08:00:00.000Z' });
    http.expectOne({ method: 'GET', url: base }).flush({ items: [map, gap, olderMap] });
    await settle();
    // The newest succeeded run of each kind, with its result; not the older map.
    http.expectOne(`${base}/${map.id}`).flush(testMapResult(map));
    http.expectOne(`${base}/${gap.id}`).flush(testGapResult(gap));
    await settle();

    const figure = plots.latest('coupling-map');
    expect(figure, 'the map was drawn').toBeDefined();
    // Grid order x fastest: rows are y, columns x.
    expect((figure!.data[0] as { z: number[][] }).z).toEqual([
      [0.1, 0.2, 0.3],
      [0.4, 0.5, 0.6],
      [0.7, 0.8, 0.9],
    ]);
    expect((figure!.data[0] as { x: number[] }).x).toEqual([-10, 0, 10]);
    // The envelope outline in mm, closed, as a line.
    const outline = figure!.data[2] as { x: number[]; y: number[]; mode: string };
    expect(outline.mode).toBe('lines');
    expect(outline.x).toEqual([-5, 5, 5, -5, -5]);
    expect(outline.y).toEqual([-5, -5, 5, 5, -5]);
    expect(text('envelope-area')).toBe('100 mm²');
    expect(text('envelope-radius')).toContain('5.00 mm');
    expect(text('envelope-radius')).toContain('limited by the map');
    expect(text('envelope-threshold')).toBe('k ≥ 0.2');
    expect(text('sweep-status')).toContain('x–y map: Succeeded');

    // The viewer reads; nothing to set up, run or cancel.
    expect(el('sweep-setup')).toBeNull();
    expect(el('sweep-run')).toBeNull();
    expect(el('sweep-kind')).toBeNull();
    expect(el('sweep-cancel')).toBeNull();
    expect(fixture.nativeElement.querySelectorAll('[data-testid=run-stale]')).toHaveLength(1);
  });

  it('marks a stale result, and draws a gap sweep with its threshold line', async () => {
    await open(false);
    const gap = testRun({ kind: 'gap', current: false });
    http.expectOne(base).flush({ items: [gap] });
    await settle();
    http.expectOne(`${base}/${gap.id}`).flush(testGapResult(gap));
    await settle();
    expect(el('result-stale')).not.toBeNull();
    const curve = plots.latest('gap-curve');
    expect((curve!.data[0] as { x: number[] }).x).toEqual([2, 4, 6, 8]);
    expect((curve!.data[1] as { y: number[] }).y.map((v) => Math.round(v))).toEqual([
      90, 87, 83, 79,
    ]);
    // k_min 0.2 on the k axis.
    expect(curve!.layout.shapes?.[0]).toMatchObject({ yref: 'y', y0: 0.2, y1: 0.2 });
  });

  it('follows a running sweep to a viewer without offering Cancel', async () => {
    await open(false);
    const running = testRun({
      status: 'running',
      pointsDone: 3,
      pointsTotal: 9,
      progressFraction: 0.3,
    });
    http.expectOne(base).flush({ items: [running] });
    await settle();
    const events = http.expectOne(`${base}/${running.id}/events`);
    stream(events, [progressEvent(running, 6, 2)]);
    await settle();
    expect(text('sweep-progress')).toContain('6 of 9 poses');
    expect(el('sweep-cancel')).toBeNull();
    events.flush(
      progressEvent(running, 6, 2) +
        endEvent({ ...running, status: 'failed', error: 'Worker stopped' }),
    );
    await settle();
    expect(el('sweep-progress')).toBeNull();
    expect(el('sweep-status')?.getAttribute('data-status')).toBe('failed');
    expect(text('sweep-runs')).toContain('Worker stopped');
  });

  it('shows the estimate, runs the sweep and streams its progress to the map', async () => {
    await open(true);
    http.expectOne(base).flush({ items: [] });
    await settle();
    const estimate = await answerEstimate(12);
    // The defaults: ± the larger coil's half size (20 mm) in 41 steps, at the nominal gap.
    expect(estimate.request.body).toEqual({
      kind: 'xy-map',
      grid: {
        x: { from: -0.02, to: 0.02, steps: 41 },
        y: { from: -0.02, to: 0.02, steps: 41 },
        z: 0.004,
      },
    });
    expect(text('sweep-estimate')).toBe('1,681 poses · about 12 s on the server');
    expect(el('sweep-slow')).toBeNull();

    el('sweep-run')!.click();
    await settle();
    const create = http.expectOne({ method: 'POST', url: base });
    expect(create.request.body).toEqual(estimate.request.body);
    const queued = testRun({
      status: 'queued',
      pointsTotal: 1681,
      pointsDone: 0,
      progressFraction: 0,
      startedAt: null,
      finishedAt: null,
      computeTimeS: null,
    });
    create.flush(queued);
    await settle();
    expect(el('sweep-status')?.getAttribute('data-status')).toBe('queued');
    expect((el('sweep-run') as HTMLButtonElement).disabled).toBe(true);

    const events = http.expectOne(`${base}/${queued.id}/events`);
    expect(events.request.headers.get('Accept')).toBe('text/event-stream');
    expect(events.request.responseType).toBe('text');
    const sent = [progressEvent(queued, 840, 6)];
    stream(events, sent);
    await settle();
    expect(text('sweep-progress')).toContain('840 of 1,681 poses');
    expect(text('sweep-progress')).toContain('elapsed 4 s');
    expect(text('sweep-remaining')).toBe('about 6 s to go');
    expect(el('sweep-status')?.getAttribute('data-status')).toBe('running');

    // The rest arrives split in the middle of an event.
    const done = { ...queued, status: 'succeeded' as const, pointsDone: 1681, computeTimeS: 11 };
    const rest = progressEvent(queued, 1681, 0) + endEvent(done);
    sent.push(rest.slice(0, 30));
    stream(events, sent);
    await settle();
    expect(text('sweep-progress')).toContain('840 of 1,681 poses');
    events.flush(sent.join('') + rest.slice(30));
    await settle();

    http.expectOne(`${base}/${queued.id}`).flush(testMapResult(done));
    await settle();
    expect(el('sweep-progress')).toBeNull();
    expect(el('sweep-status')?.getAttribute('data-status')).toBe('succeeded');
    expect(text('sweep-status')).toContain('computed in 11 s');
    expect(plots.drawCount('coupling-map')).toBe(1);
  });

  it('cancels a running sweep', async () => {
    await open(true);
    const running = testRun({ status: 'running', pointsDone: 3, pointsTotal: 9 });
    http.expectOne(base).flush({ items: [running] });
    await settle();
    const events = http.expectOne(`${base}/${running.id}/events`);
    await answerEstimate();
    el('sweep-cancel')!.click();
    await settle();
    http
      .expectOne({ method: 'POST', url: `${base}/${running.id}/cancel` })
      .flush({ ...running, cancelRequested: true });
    await settle();
    expect(text('sweep-cancel')).toBe('Cancelling…');
    expect((el('sweep-cancel') as HTMLButtonElement).disabled).toBe(true);
    events.flush(endEvent({ ...running, status: 'cancelled', cancelRequested: true }));
    await settle();
    expect(el('sweep-progress')).toBeNull();
    expect(el('sweep-status')?.getAttribute('data-status')).toBe('cancelled');
    // Nothing to fetch for a cancelled run.
    http.expectNone(`${base}/${running.id}`);
  });

  it('moves the Rx to a clicked map point', async () => {
    await open(false);
    const map = testRun();
    http.expectOne(base).flush({ items: [map] });
    await settle();
    http.expectOne(`${base}/${map.id}`).flush(testMapResult(map));
    await settle();
    const picked: unknown[] = [];
    fixture.componentInstance.poseSelected.subscribe((pose) => picked.push(pose));
    plots.click('coupling-map', { x: 10, y: -10, trace: 0 });
    // A click on the envelope's markers is a read-out, not a move.
    plots.click('coupling-map', { x: 0, y: 0, trace: 4 });
    expect(picked).toEqual([{ x: 0.01, y: -0.01, z: 0.004, tiltX: 0, tiltY: 0 }]);
  });

  it('says when a study has no sweeps, and offers a retry when the list fails', async () => {
    await open(false);
    http
      .expectOne(base)
      .flush({ code: 'internal', message: 'Try later.' }, { status: 500, statusText: 'Error' });
    await settle();
    expect(text('status-error')).toContain('Try later.');
    (
      fixture.nativeElement.querySelector('[data-testid=status-error] button') as HTMLButtonElement
    ).click();
    await settle();
    http.expectOne(base).flush({ items: [] });
    await settle();
    expect(text('status-empty')).toBe('No sweeps yet. An editor of the workspace runs them.');
  });
});
