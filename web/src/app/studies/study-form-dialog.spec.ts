import { HttpTestingController } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatButtonToggleHarness } from '@angular/material/button-toggle/testing';
import { MatDialog } from '@angular/material/dialog';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { StudyResponse } from '../api-types';
import {
  BlankPage,
  configurePageTest,
  resetAndVerify,
  settle,
  testWorkspace,
} from '../testing/page-test-bed';
import { StudyFormDialog, StudyFormDialogData } from './study-form-dialog';
import { libraryCoil, rxCoil, testStudy, txCoil } from './study-test-data';

const workspaceId = testWorkspace.id;
const base = `/api/v1/workspaces/${workspaceId}`;

// Dialog harnesses take seconds on a busy two-core machine; the default 5 s is too tight.
describe('StudyFormDialog', { timeout: 20_000 }, () => {
  let http: HttpTestingController;
  let loader: HarnessLoader;
  let closed: StudyResponse | undefined;

  async function open(study?: StudyResponse): Promise<void> {
    http = configurePageTest();
    closed = undefined;
    const ref = TestBed.inject(MatDialog).open<StudyFormDialog, StudyFormDialogData, StudyResponse>(
      StudyFormDialog,
      { data: { workspaceId, study } },
    );
    ref.afterClosed().subscribe((s) => (closed = s));
    loader = TestbedHarnessEnvironment.documentRootLoader(TestBed.createComponent(BlankPage));
    await settle();
    http.expectOne(`${base}/coils`).flush({
      items: [libraryCoil(txCoil, workspaceId), libraryCoil(rxCoil, workspaceId)],
    });
    await settle();
  }

  const form = (): HTMLElement => document.querySelector('[data-testid=study-form]') as HTMLElement;
  /** Types into a unit-aware field the way a user does, then leaves it. */
  function type(control: string, text: string): void {
    const input = form().querySelector<HTMLInputElement>(`[data-testid=field-${control}] input`);
    if (!input) throw new Error(`no field ${control}`);
    input.value = text;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  }
  function typeName(text: string): void {
    const input = form().querySelector<HTMLInputElement>('[data-testid=study-form-name]');
    input!.value = text;
    input!.dispatchEvent(new Event('input'));
  }
  const save = async () =>
    (await loader.getHarness(MatButtonHarness.with({ selector: '[data-testid=study-form-save]' })))
      .click()
      .then(settle);

  afterEach(() => {
    TestBed.inject(MatDialog).closeAll();
    resetAndVerify(http);
  });

  it('refuses an incomplete form, saying at each field what is allowed, and sends nothing', async () => {
    await open();
    type('frequencyHz', '500 Hz');
    type('thresholdValue', '1.5');
    await save();

    const text = form().textContent ?? '';
    expect(text).toContain('Give the study a name (1 to 80 characters).');
    expect(text).toContain('Pick a coil from the library.');
    expect(text).toContain('Allowed: from 1 kHz to 100 MHz');
    expect(text).toContain('k_min: above 0 and at most 1');
    // The η rule differs: 0.95 is a fine k but the toggle decides.
    type('thresholdValue', '1');
    const eta = await loader.getHarness(MatButtonToggleHarness.with({ text: 'ηmin' }));
    await eta.check();
    await settle();
    expect(form().textContent).toContain('η_min: a fraction above 0 and below 1');
    http.expectNone(`${base}/studies`);
  });

  it('creates a study from typed units and closes with it', async () => {
    await open();
    typeName('  Dock pad at 4 mm ');
    const selects = await loader.getAllHarnesses(MatSelectHarness);
    await selects[0].open();
    await selects[0].clickOptions({ text: 'Dock Tx 50 mm' });
    await selects[1].open();
    await selects[1].clickOptions({ text: 'Tag Rx 36 mm' });
    type('frequencyHz', '140 kHz');
    type('txCurrentA', '2');
    type('thresholdValue', '0.2');
    type('z', '4');
    type('x', '0.1 in');
    const sp = await loader.getHarness(MatButtonToggleHarness.with({ text: 'Series–parallel' }));
    await sp.check();
    await save();

    const post = http.expectOne(`${base}/studies`);
    expect(post.request.method).toBe('POST');
    const body = post.request.body as Record<string, unknown>;
    expect(body).toEqual({
      name: 'Dock pad at 4 mm',
      txCoilId: txCoil.id,
      rxCoilId: rxCoil.id,
      frequencyHz: 140e3,
      txCurrentA: 2,
      threshold: { kind: 'k', value: 0.2 },
      compensation: 'series-parallel',
      notes: '',
      nominalPose: { z: 0.004, x: expect.closeTo(0.00254, 12), y: 0, tiltX: 0, tiltY: 0 },
    });
    const saved = testStudy(workspaceId);
    post.flush(saved);
    await settle();
    expect(closed).toEqual(saved);
  });

  it('puts a server problem on the field it names', async () => {
    await open(testStudy(workspaceId));
    await save();
    http
      .expectOne(`${base}/studies/${testStudy(workspaceId).id}`)
      .flush(
        { code: 'validation_failed', message: 'gap must be at least 0 m', field: 'nominalPose.z' },
        { status: 400, statusText: 'Bad Request' },
      );
    await settle();
    const gap = form().querySelector('[data-testid=field-z]');
    expect(gap?.textContent).toContain('gap must be at least 0 m');
    expect(closed).toBeUndefined();
  });

  it('keeps every edit on a stale save, shows what changed, and saves on the new version', async () => {
    const study = testStudy(workspaceId);
    await open(study);
    type('frequencyHz', '150 kHz');
    await save();

    const put = http.expectOne(`${base}/studies/${study.id}`);
    expect(put.request.method).toBe('PUT');
    expect((put.request.body as { version: number }).version).toBe(3);
    put.flush(
      {
        code: 'stale_version',
        message: 'The study was changed',
        field: 'version',
        currentVersion: 4,
      },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    expect(document.querySelector('[data-testid=stale-notice]')?.textContent).toContain(
      'nothing has been saved or lost',
    );
    expect(closed).toBeUndefined();

    await (
      await loader.getHarness(MatButtonHarness.with({ text: 'Reload the latest version' }))
    )
      .click()
      .then(settle);
    const latest = testStudy(workspaceId, {
      version: 4,
      notes: 'Sleeve is 0.5 mm thicker',
      updatedBy: { userId: 'u2', displayName: 'Marta Okafor' },
    });
    http.expectOne(`${base}/studies/${study.id}`).flush(latest);
    await settle();
    const changed = document.querySelector('[data-testid=stale-changed]')?.textContent ?? '';
    expect(changed.replace(/\s+/g, ' ')).toContain('Version 4 by Marta Okafor changed: Notes.');
    // My frequency is still in the form.
    const field = form().querySelector<HTMLInputElement>('[data-testid=field-frequencyHz] input');
    expect(field?.value).toBe('150 kHz');

    await save();
    const again = http.expectOne(`${base}/studies/${study.id}`);
    expect(again.request.body).toMatchObject({ version: 4, frequencyHz: 150e3 });
    again.flush({ ...latest, version: 5, frequencyHz: 150e3 });
    await settle();
    expect(closed?.version).toBe(5);
  });
});
