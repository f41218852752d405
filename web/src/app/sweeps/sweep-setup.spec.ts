import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonToggleHarness } from '@angular/material/button-toggle/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import type { CreateSweepRequest } from '../api-types';
import { configurePageTest, resetAndVerify, settle } from '../testing/page-test-bed';
import { SweepSetup, estimateDebounceMs } from './sweep-setup';
import { testStudy, testWorkspaceId } from './sweep-test-data';

const estimateUrl = `/api/v1/workspaces/${testWorkspaceId}/studies/${testStudy.id}/sweeps/estimate`;

describe('SweepSetup', () => {
  let http: HttpTestingController;
  let fixture: ComponentFixture<SweepSetup>;
  let loader: HarnessLoader;
  let runs: CreateSweepRequest[];

  beforeEach(async () => {
    http = configurePageTest();
    fixture = TestBed.createComponent(SweepSetup);
    fixture.componentRef.setInput('workspaceId', testWorkspaceId);
    fixture.componentRef.setInput('study', testStudy);
    runs = [];
    fixture.componentInstance.run.subscribe((r) => runs.push(r));
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
  });

  afterEach(() => resetAndVerify(http));

  const el = (testId: string): HTMLElement | null =>
    fixture.nativeElement.querySelector(`[data-testid=${testId}]`);
  const text = (testId: string) => el(testId)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  const runButton = () => el('sweep-run') as HTMLButtonElement;
  const pause = async () => {
    await new Promise((resolve) => setTimeout(resolve, estimateDebounceMs + 50));
    await settle();
  };
  const input = async (label: string): Promise<MatInputHarness> => {
    const field = await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
    return (await field.getControl(MatInputHarness)) as MatInputHarness;
  };
  const estimate = (seconds: number, poses = 1681) => ({
    poses,
    prepareSeconds: 0.5,
    perPoseMicroseconds: 1000,
    estimatedSeconds: seconds,
  });

  it('warns about a long run, and asks again when a range changes', async () => {
    await pause();
    http.expectOne(estimateUrl).flush({
      poses: 1681,
      prepareSeconds: 1,
      perPoseMicroseconds: 56_000,
      estimatedSeconds: 95,
    });
    await settle();
    expect(text('sweep-estimate')).toContain('1,681 poses · about 1 min 35 s on the server');
    expect(el('sweep-slow')).not.toBeNull();
    expect(runButton().disabled).toBe(false);

    const xSteps = await input('x steps');
    await xSteps.setValue('21');
    await pause();
    // Typed one key at a time: a slow machine may have asked for "2" steps on the way.
    const asked = http.match(estimateUrl).filter((r) => !r.cancelled);
    const again = asked[asked.length - 1];
    asked.slice(0, -1).forEach((r) => r.flush(estimate(1)));
    expect(again.request.body.grid.x).toEqual({ from: -0.02, to: 0.02, steps: 21 });
    again.flush({ poses: 861, prepareSeconds: 1, perPoseMicroseconds: 1000, estimatedSeconds: 2 });
    await settle();
    expect(el('sweep-slow')).toBeNull();
    runButton().click();
    await settle();
    expect(runs).toEqual([again.request.body]);
  });

  it('refuses a grid above the storage cap without asking the server', async () => {
    await pause();
    http.expectOne(estimateUrl).flush(estimate(3));
    await (await input('x steps')).setValue('1000');
    await (await input('y steps')).setValue('1000');
    await pause();
    // A slow machine may have asked for 1000 × 41 in between; never for the refused grid.
    const asked = http.match(estimateUrl);
    for (const r of asked.filter((r) => !r.cancelled)) r.flush(estimate(30, 41_000));
    expect(asked.map((r) => r.request.body.grid.y.steps)).not.toContain(1000);
    await settle();
    expect(text('sweep-estimate')).toContain('1,000,000 poses is more than one run may store');
    expect(runButton().disabled).toBe(true);
  });

  it('shows the server’s reason when the estimate is refused', async () => {
    await pause();
    http
      .expectOne(estimateUrl)
      .flush(
        { status: 422, code: 'invalid_grid', message: 'gap: the coils would touch at 0 mm' },
        { status: 422, statusText: 'Unprocessable' },
      );
    await settle();
    expect(text('sweep-estimate')).toBe('gap: the coils would touch at 0 mm');
  });

  it('switches kinds and keeps the nominal offset for a gap sweep', async () => {
    await pause();
    http
      .expectOne(estimateUrl)
      .flush({ poses: 1681, prepareSeconds: 0, perPoseMicroseconds: 1, estimatedSeconds: 1 });
    const gap = await loader.getHarness(MatButtonToggleHarness.with({ text: 'Gap sweep' }));
    await gap.check();
    await pause();
    const request = http.expectOne(estimateUrl);
    expect(request.request.body).toEqual({
      kind: 'gap',
      grid: { z: { from: 0.002, to: 0.024, steps: 31 } },
    });
    request.flush({ poses: 31, prepareSeconds: 0, perPoseMicroseconds: 1, estimatedSeconds: 0.2 });
    await settle();
    expect(text('sweep-estimate')).toBe('31 poses · under 1 s on the server');
  });

  it('disables Run while another sweep of the study is running', async () => {
    fixture.componentRef.setInput('busy', true);
    await pause();
    http
      .expectOne(estimateUrl)
      .flush({ poses: 1681, prepareSeconds: 0, perPoseMicroseconds: 1, estimatedSeconds: 1 });
    await settle();
    expect(runButton().disabled).toBe(true);
    expect(fixture.nativeElement.textContent).toContain('A sweep of this study is running');
  });
});
