import { HttpTestingController } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { TestBed } from '@angular/core/testing';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatButtonToggleHarness } from '@angular/material/button-toggle/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { Router } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { Observable, of } from 'rxjs';
import type { CoilResponse, Role } from '../api-types';
import { configurePageTest, resetAndVerify, settle, signInAs } from '../testing/page-test-bed';
import { formatQuantity } from '../units/format-quantity';
import { WorkspaceLayout } from '../workspaces/workspace-layout';
import { CoilEditorPage } from './coil-editor-page';
import { CoilFiguresEngine } from './coil-figures-engine';
import { CoilSaver } from './coil-saver';
import {
  answerCoilFigures,
  type CoilFiguresAnswer,
  type CoilFiguresRequest,
} from './coil-figures-request';
import {
  coilsBase,
  dockTx,
  probeSolenoid,
  workspaceAs,
  workspaceBase,
  workspaceId,
} from './testing/coil-test-data';

/** The figures engine without a worker: the real physics, inline, with the requests recorded. */
class InlineFigures {
  readonly requests: Omit<CoilFiguresRequest, 'id'>[] = [];
  compute(request: Omit<CoilFiguresRequest, 'id'>): Observable<CoilFiguresAnswer> {
    this.requests.push(request);
    return of(answerCoilFigures({ ...request, id: this.requests.length }));
  }
}

/** Longer than the editor's 150 ms debounce. */
const pause = () => new Promise((resolve) => setTimeout(resolve, 200));

// Each test drives a whole page through harnesses; on a busy shared machine that takes seconds.
describe('CoilEditorPage', { timeout: 30_000 }, () => {
  let harness: RouterTestingHarness;
  let loader: HarnessLoader;
  let http: HttpTestingController;
  let engine: InlineFigures;

  async function open(path: string, role: Role = 'editor', coil?: CoilResponse): Promise<void> {
    engine = new InlineFigures();
    TestBed.overrideComponent(CoilEditorPage, {
      set: { providers: [CoilSaver, { provide: CoilFiguresEngine, useValue: engine }] },
    });
    http = configurePageTest({
      routes: [
        {
          path: 'w/:workspaceId',
          component: WorkspaceLayout,
          children: [
            { path: 'coils', children: [] },
            { path: 'coils/new', component: CoilEditorPage },
            { path: 'coils/:coilId', component: CoilEditorPage },
          ],
        },
      ],
      routeInputs: true,
    });
    signInAs();
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/w/${workspaceId}/${path}`);
    loader = TestbedHarnessEnvironment.loader(harness.fixture);
    await settle();
    http.expectOne(workspaceBase).flush(workspaceAs(role));
    await settle();
    if (coil) {
      http.expectOne({ method: 'GET', url: `${coilsBase}/${coil.id}` }).flush(coil);
      await settle();
    }
    await pause();
    await settle();
  }

  afterEach(() => resetAndVerify(http));

  const page = (): HTMLElement => harness.routeNativeElement ?? document.body;
  const text = (testId: string): string =>
    page().querySelector(`[data-testid=${testId}]`)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  /** The value of one figure in the figures panel. */
  const figure = (id: string): string =>
    page().querySelector(`[data-testid=figure-${id}] dd`)?.textContent?.trim() ?? '';
  const field = (name: string) =>
    loader.getHarness(MatFormFieldHarness.with({ ancestor: `[data-testid=field-${name}]` }));
  const input = (name: string) =>
    loader.getHarness(MatInputHarness.with({ ancestor: `[data-testid=field-${name}]` }));
  const type = async (name: string, value: string) => {
    const harness = await input(name);
    await harness.setValue(value);
    await harness.blur();
  };
  const errors = async (name: string) => (await field(name)).getTextErrors();
  const button = (testId: string) =>
    loader.getHarness(MatButtonHarness.with({ selector: `[data-testid=${testId}]` }));
  const chooseKind = async (label: string) => {
    const select = await loader.getHarness(
      MatSelectHarness.with({ selector: '[data-testid=coil-kind]' }),
    );
    await select.open();
    await select.clickOptions({ text: label });
    await pause();
    await settle();
  };
  const documentLoader = () => TestbedHarnessEnvironment.documentRootLoader(harness.fixture);

  it('reads lengths typed with units into metres and refuses a frequency in a length', async () => {
    await open('coils/new');
    await type('outerDiameter', '45 mm');
    expect(page().querySelector('[data-testid=field-outerDiameter]')?.textContent).toContain(
      '= 0.045 m',
    );
    // 1 in = 25.4 mm exactly (international inch, 1959): 0.2 in = 5.08 mm.
    await type('innerDiameter', '0.2 in');
    expect(page().querySelector('[data-testid=field-innerDiameter]')?.textContent).toContain(
      '= 0.00508 m',
    );
    await type('outerDiameter', '45 kHz');
    expect(await errors('outerDiameter')).toEqual([
      '“45 kHz” is a frequency; expected a length, e.g. 45 mm',
    ]);
  });

  it('marks a pitch below the wire diameter at the field before saving', async () => {
    await open('coils/new');
    await (
      await loader.getHarness(MatButtonToggleHarness.with({ text: 'Inner radius and pitch' }))
    ).check();
    await (await loader.getHarness(MatButtonToggleHarness.with({ text: 'Round wire' }))).check();
    await type('innerRadius', '10 mm');
    await type('pitch', '0.5 mm');
    await type('wireDiameter', '0.8 mm');
    await pause();
    await settle();

    // The engine writes lengths below 1 mm in micrometres.
    expect(await errors('pitch')).toEqual([
      '500 µm is below the conductor width 800 µm (turns would overlap); allowed: pitch ≥ ' +
        'conductor width',
    ]);
    // The engine's own message, with the field's path, in the figures panel.
    expect(text('figures-error')).toBe(
      'coil.pitch: 500 µm is below the conductor width 800 µm (turns would overlap); allowed: ' +
        'pitch ≥ conductor width',
    );
    await (await input('pitch')).setValue('1 mm');
    await pause();
    await settle();
    expect(await errors('pitch')).toEqual([]);
    expect(figure('L')).toMatch(/^[\d.]+ µH$/);
  });

  it('saves nothing while a field is wrong, and says so', async () => {
    await open('coils/new');
    await (await input('outerDiameter')).setValue('15 mm');
    await (
      await loader.getHarness(MatInputHarness.with({ selector: '[data-testid=coil-name]' }))
    ).setValue('Too small');
    await (await button('coil-save')).click();
    await settle();
    // 15 mm is below the inner diameter of the starting values (20 mm).
    expect(await errors('outerDiameter')).toEqual([
      '15 mm is not above innerDiameter 20 mm; allowed: outerDiameter > innerDiameter',
    ]);
    expect(text('problem-banner')).toContain('Some fields need attention');
    http.expectNone({ method: 'POST', url: coilsBase });
  });

  it('computes the live figures of a single ring as Rosa and Grover give them', async () => {
    await open('coils/new');
    await chooseKind('Single ring');
    await type('radius', '20 mm');
    await type('wireRadius', '0.5 mm');
    await pause();
    await settle();
    // L = mu0 R (ln(8R/a) - 7/4) for a ring of round wire, uniform current: Rosa & Grover,
    // Bull. Bureau of Standards 8 (1912) (from memory), evaluated here independently.
    const R = 0.02;
    const a = 0.5e-3;
    const expected = 4e-7 * Math.PI * R * (Math.log((8 * R) / a) - 7 / 4);
    expect(figure('L')).toBe(formatQuantity(expected, 'H'));
    expect(text('figure-Q')).toContain('Quality factor Q at 128 kHz');
    // Typing settles before the engine is asked: one request per pause, the latest values.
    const last = engine.requests[engine.requests.length - 1];
    expect(last.spec).toEqual({ kind: 'ring', radius: 0.02, wireRadius: 0.0005 });
    expect(last.frequency).toBe(128e3);
    expect(page().querySelector('[data-testid=coil-top-view] circle')?.getAttribute('r')).toBe(
      '20',
    );
  });

  it('asks the engine once for a burst of typing (latest wins)', async () => {
    await open('coils/new');
    const before = engine.requests.length;
    const outer = await input('outerDiameter');
    await outer.setValue('44 mm');
    await outer.setValue('46 mm');
    await outer.setValue('48 mm');
    await pause();
    await settle();
    expect(engine.requests.length - before).toBe(1);
    expect(
      (engine.requests[engine.requests.length - 1].spec as { outerDiameter: number }).outerDiameter,
    ).toBeCloseTo(0.048, 12);
  });

  it('creates a coil and opens it', async () => {
    await open('coils/new');
    await (
      await loader.getHarness(MatInputHarness.with({ selector: '[data-testid=coil-name]' }))
    ).setValue('  Cradle Tx  ');
    await pause();
    await settle();
    await (await button('coil-save')).click();
    const post = http.expectOne({ method: 'POST', url: coilsBase });
    expect(post.request.body).toEqual({
      name: 'Cradle Tx',
      description: '',
      spec: {
        kind: 'circular-spiral',
        turns: 10,
        innerDiameter: 0.02,
        outerDiameter: 0.043,
        model: 'rings',
        conductor: { type: 'litz', strands: 105, strandDiameter: 8e-5 },
      },
      operatingFrequencyHz: 128e3,
      ratedCurrentA: null,
    });
    post.flush({ ...dockTx, name: 'Cradle Tx', version: 1 });
    await settle();
    expect(TestBed.inject(Router).url).toBe(`/w/${workspaceId}/coils/${dockTx.id}`);
    http.expectOne({ method: 'GET', url: `${coilsBase}/${dockTx.id}` }).flush(dockTx);
    await settle();
  });

  it('loads a stored coil into the form, in the units it is shown in', async () => {
    await open(`coils/${dockTx.id}`, 'editor', dockTx);
    expect(await (await input('outerDiameter')).getValue()).toBe('43 mm');
    expect(await (await input('strandDiameter')).getValue()).toBe('0.08 mm');
    expect(await (await input('operatingFrequencyHz')).getValue()).toBe('128 kHz');
    expect(text('coil-meta')).toContain('Version 3');
    expect(text('coil-meta')).toContain('used by 1 study');
    expect(await (await button('coil-save')).isDisabled()).toBe(true);
  });

  it('keeps the edits when someone else saved first, and reloads on request', async () => {
    await open(`coils/${dockTx.id}`, 'editor', dockTx);
    const name = await loader.getHarness(
      MatInputHarness.with({ selector: '[data-testid=coil-name]' }),
    );
    await name.setValue('Dock pad Tx, mine');
    await (await button('coil-save')).click();
    const put = http.expectOne({ method: 'PUT', url: `${coilsBase}/${dockTx.id}` });
    expect(put.request.body.version).toBe(3);
    expect(put.request.body.name).toBe('Dock pad Tx, mine');
    put.flush(
      {
        type: 'about:blank',
        status: 409,
        title: 'Conflict',
        code: 'stale_version',
        message: 'The coil was changed since version 3.',
        field: 'version',
        currentVersion: 4,
      },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    expect(text('coil-stale')).toContain('Changed by someone else; reload.');
    expect(text('coil-stale')).toContain('now version 4');
    expect(await name.getValue()).toBe('Dock pad Tx, mine');

    await (await button('coil-reload')).click();
    const theirs = { ...dockTx, name: 'Dock pad Tx, theirs', version: 4 };
    http.expectOne({ method: 'GET', url: `${coilsBase}/${dockTx.id}` }).flush(theirs);
    await settle();
    expect(await name.getValue()).toBe('Dock pad Tx, theirs');
    expect(text('coil-stale')).toBe('');
    expect(text('coil-meta')).toContain('Version 4');
  });

  it('can save over a newer version when the user says so', async () => {
    await open(`coils/${dockTx.id}`, 'editor', dockTx);
    await type('turns', '11');
    await (await button('coil-save')).click();
    http
      .expectOne({ method: 'PUT', url: `${coilsBase}/${dockTx.id}` })
      .flush(
        { code: 'stale_version', message: 'Stale.', currentVersion: 5 },
        { status: 409, statusText: 'Conflict' },
      );
    await settle();
    await (await button('coil-overwrite')).click();
    const put = http.expectOne({ method: 'PUT', url: `${coilsBase}/${dockTx.id}` });
    expect(put.request.body.version).toBe(5);
    expect(put.request.body.spec.turns).toBe(11);
    put.flush({ ...dockTx, version: 6, spec: { ...dockTx.spec, turns: 11 } });
    await settle();
    expect(text('coil-stale')).toBe('');
    expect(text('coil-meta')).toContain('Version 6');
  });

  it('refuses to delete a coil that studies use, naming them', async () => {
    await open(`coils/${dockTx.id}`, 'owner', dockTx);
    await (await button('coil-delete')).click();
    const confirm = await documentLoader().getHarness(MatDialogHarness);
    await (await confirm.getHarness(MatButtonHarness.with({ text: 'Delete' }))).click();
    http
      .expectOne({ method: 'DELETE', url: `${coilsBase}/${dockTx.id}?version=3` })
      .flush(
        { code: 'in_use', message: 'In use.', usedBy: dockTx.usedBy },
        { status: 409, statusText: 'Conflict' },
      );
    await settle();
    expect(document.querySelector('[data-testid=coil-used-by]')?.textContent).toContain(
      'Dock alignment study',
    );
    expect(TestBed.inject(Router).url).toBe(`/w/${workspaceId}/coils/${dockTx.id}`);
  });

  it('duplicates the saved coil and opens the copy', async () => {
    await open(`coils/${dockTx.id}`, 'editor', dockTx);
    await (await button('coil-duplicate')).click();
    const copy = { ...dockTx, id: 'c0000000-0000-4000-8000-0000000000a7', name: 'Copy' };
    http.expectOne({ method: 'POST', url: `${coilsBase}/${dockTx.id}/duplicate` }).flush(copy);
    await settle();
    http.expectOne({ method: 'GET', url: `${coilsBase}/${copy.id}` }).flush(copy);
    await settle();
    expect(TestBed.inject(Router).url).toBe(`/w/${workspaceId}/coils/${copy.id}`);
  });

  it.each<Role>(['viewer', 'reviewer'])('shows a %s the coil read only', async (role) => {
    await open(`coils/${probeSolenoid.id}`, role, probeSolenoid);
    for (const id of ['coil-save', 'coil-duplicate', 'coil-delete']) {
      expect(page().querySelector(`[data-testid=${id}]`)).toBeNull();
    }
    expect(await (await input('radius')).isDisabled()).toBe(true);
    expect(text('coil-read-only')).toContain('Read only');
    // The figures and the drawing are there to read, the solenoid seen from the side too.
    expect(figure('L')).toMatch(/^[\d.]+ [nµ]H$/);
    expect(page().querySelector('[data-testid=coil-side-view]')).not.toBeNull();
  });

  it('tells a viewer that new coils are for editors', async () => {
    await open('coils/new', 'viewer');
    expect(text('status-error')).toContain('editors and owners add coils');
    expect(page().querySelector('[data-testid=coil-save]')).toBeNull();
  });

  it("shows a solenoid's inductance close to Wheeler's formula", async () => {
    await open(`coils/${probeSolenoid.id}`, 'editor', probeSolenoid);
    // Wheeler, Proc. IRE 16(10), 1928: L[µH] = r² n² / (9r + 10l), r and l in inches, within
    // about 1 % for l > 0.8 r (here l = 2.4 r). The 3 % tolerance adds the round-wire spacing
    // correction (Rosa, Bull. Bureau of Standards 2, 1906) that a current-sheet formula leaves
    // out, for 0.5 mm wire at 1 mm pitch, and the panel's three significant digits.
    const inch = 0.0254;
    const [r, l, n] = [0.005 / inch, 0.012 / inch, 12];
    const wheeler = ((r * r * n * n) / (9 * r + 10 * l)) * 1e-6;
    const match = /^([\d.]+) ([nµ])H$/.exec(figure('L'));
    expect(match).not.toBeNull();
    const shown = Number(match![1]) * (match![2] === 'n' ? 1e-9 : 1e-6);
    expect(Math.abs(shown - wheeler) / wheeler).toBeLessThan(0.03);
  });
});
