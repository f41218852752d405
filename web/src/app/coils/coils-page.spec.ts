import { HttpTestingController } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatDialogHarness } from '@angular/material/dialog/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatMenuHarness } from '@angular/material/menu/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { MatSortHarness } from '@angular/material/sort/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import { RouterTestingHarness } from '@angular/router/testing';
import type { Role } from '../api-types';
import { configurePageTest, resetAndVerify, settle, signInAs } from '../testing/page-test-bed';
import { WorkspaceLayout } from '../workspaces/workspace-layout';
import { CoilsPage } from './coils-page';
import {
  coilsBase,
  dockTx,
  handsetRx,
  libraryCoils,
  probeSolenoid,
  workspaceAs,
  workspaceBase,
  workspaceId,
} from './testing/coil-test-data';

describe('CoilsPage', () => {
  let harness: RouterTestingHarness;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  /** Opens the library inside its workspace layout with the caller in `role`. */
  async function open(role: Role): Promise<void> {
    http = configurePageTest({
      routes: [
        {
          path: 'w/:workspaceId',
          component: WorkspaceLayout,
          children: [{ path: 'coils', component: CoilsPage }],
        },
      ],
      routeInputs: true,
    });
    signInAs();
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/w/${workspaceId}/coils`);
    loader = TestbedHarnessEnvironment.loader(harness.fixture);
    await settle();
    http.expectOne(workspaceBase).flush(workspaceAs(role));
    await settle();
  }

  async function answer(items = libraryCoils): Promise<void> {
    http.expectOne({ method: 'GET', url: coilsBase }).flush({ items });
    await settle();
  }

  afterEach(() => resetAndVerify(http));

  const page = (): HTMLElement => harness.routeNativeElement ?? document.body;
  const text = (selector: string): string =>
    page().querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  const table = () => loader.getHarness(MatTableHarness);
  const nameLinks = () =>
    [...page().querySelectorAll('[data-testid=coils-table] a.name')].map((a) => a.textContent);
  const documentLoader = () => TestbedHarnessEnvironment.documentRootLoader(harness.fixture);

  it('shows loading, then the coils with their figures, newest change first', async () => {
    await open('editor');
    expect(text('[data-testid=status-loading]')).toBe('Loading the coil library…');
    await answer();

    expect(nameLinks()).toEqual([dockTx.name, handsetRx.name, probeSolenoid.name]);
    const cells = await (await table()).getCellTextByColumnName();
    expect(cells['kind'].text).toEqual(['Circular spiral', 'Rectangular spiral', 'Solenoid']);
    expect(cells['size'].text).toEqual(['Ø 43.0 mm', '30.0 × 20.0 mm', 'Ø 10.0 mm, 12.0 mm long']);
    expect(cells['turns'].text).toEqual(['10', '6', '12']);
    expect(cells['conductor'].text).toEqual([
      'Litz 105 × 80.0 µm',
      'Trace 500 µm × 35.0 µm',
      'Round Ø 500 µm',
    ]);
    expect(cells['L'].text).toEqual(['6.42 µH', '1.12 µH', '2.31 µH']);
    // Q at each coil's own frequency; a coil without one has DC figures only.
    expect(cells['Q'].text).toEqual(['79.7 at 128 kHz', '—', '30.7 at 85.0 kHz']);
    expect(cells['Rac'].text[0]).toBe('64.8 mΩ at 128 kHz');
    expect(cells['wireLength'].text).toEqual(['990 mm', '520 mm', '377 mm']);
    expect(cells['usedBy'].text).toEqual(['Dock alignment study', 'No study', 'No study']);
    expect(cells['updated'].text[1]).toContain('Couplet');
    expect(text('[data-testid=coil-count]')).toBe('3 of 3 coils');
    expect(page().querySelector('[data-testid=coils-table] a.name')?.getAttribute('href')).toBe(
      `/w/${workspaceId}/coils/${dockTx.id}`,
    );
  });

  it('filters by name or description and by kind, and says when nothing matches', async () => {
    await open('editor');
    await answer();
    const search = await loader.getHarness(
      MatInputHarness.with({ selector: '[data-testid=coil-search]' }),
    );
    await search.setValue('PICK-UP');
    expect(nameLinks()).toEqual([probeSolenoid.name]);
    expect(text('[data-testid=coil-count]')).toBe('1 of 3 coils');

    await search.setValue('');
    const kind = await loader.getHarness(MatSelectHarness);
    await kind.open();
    await kind.clickOptions({ text: 'Rectangular spiral' });
    expect(nameLinks()).toEqual([handsetRx.name]);

    await search.setValue('dock');
    expect(text('[data-testid=status-empty]')).toContain('No coil matches');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Show all' }))).click();
    expect(nameLinks()).toHaveLength(3);
  });

  it('sorts by a column, missing values last', async () => {
    await open('editor');
    await answer();
    const sort = await loader.getHarness(MatSortHarness);
    const [header] = await sort.getSortHeaders({ label: 'L' });
    await header.click();
    expect(nameLinks()).toEqual([handsetRx.name, probeSolenoid.name, dockTx.name]);
    await header.click();
    expect(nameLinks()).toEqual([dockTx.name, probeSolenoid.name, handsetRx.name]);

    const [q] = await sort.getSortHeaders({ label: 'Q' });
    await q.click();
    expect(nameLinks()).toEqual([probeSolenoid.name, dockTx.name, handsetRx.name]);
  });

  it('says when the library is empty, and offers a new coil to an editor', async () => {
    await open('editor');
    await answer([]);
    expect(text('[data-testid=status-empty]')).toContain('No coils yet.');
    expect(page().querySelector('[data-testid=new-coil]')?.getAttribute('href')).toBe(
      `/w/${workspaceId}/coils/new`,
    );
  });

  it('shows a failed load with a retry that loads the library', async () => {
    await open('viewer');
    http
      .expectOne(coilsBase)
      .flush(
        { code: 'internal', message: 'The library is unavailable.' },
        { status: 503, statusText: 'Unavailable' },
      );
    await settle();
    expect(text('[data-testid=status-error]')).toContain('The library is unavailable.');
    page().querySelector<HTMLButtonElement>('[data-testid=status-error] button')?.click();
    await settle();
    await answer();
    expect(nameLinks()).toHaveLength(3);
  });

  it.each<Role>(['viewer', 'reviewer'])('gives a %s no editing actions at all', async (role) => {
    await open(role);
    await answer();
    expect(page().querySelector('[data-testid=new-coil]')).toBeNull();
    expect(page().querySelector('[data-testid=coil-actions]')).toBeNull();
    expect(
      await (await table()).getHeaderRows().then((rows) => rows[0].getCellTextByIndex()),
    ).not.toContain('Actions');
    expect(text('.page-lede')).toContain('Your role reads the library');
  });

  it('refuses to delete a coil in use and names the studies that use it', async () => {
    await open('owner');
    await answer();
    const [menu] = await loader.getAllHarnesses(MatMenuHarness);
    await menu.clickItem({ text: 'Delete…' });
    const confirm = await documentLoader().getHarness(MatDialogHarness);
    expect(await confirm.getTitleText()).toBe(`Delete “${dockTx.name}”?`);
    await (await confirm.getHarness(MatButtonHarness.with({ text: 'Delete' }))).click();

    const request = http.expectOne({
      method: 'DELETE',
      url: `${coilsBase}/${dockTx.id}?version=3`,
    });
    request.flush(
      {
        type: 'about:blank',
        status: 409,
        title: 'Conflict',
        code: 'in_use',
        message: 'The coil is used by 1 study.',
        usedBy: dockTx.usedBy,
      },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    const dialogs = await documentLoader().getAllHarnesses(MatDialogHarness);
    const refusal = dialogs[dialogs.length - 1];
    expect(await refusal.getTitleText()).toBe(`“${dockTx.name}” is in use`);
    expect(await refusal.getContentText()).toContain('Dock alignment study');
    const link = document.querySelector('[data-testid=coil-used-by] a');
    expect(link?.getAttribute('href')).toBe(`/w/${workspaceId}/studies/${dockTx.usedBy[0].id}`);
    // Nothing was deleted, so the list is not asked again.
    http.expectNone({ method: 'GET', url: coilsBase });
    expect(nameLinks()).toHaveLength(3);
  });

  it('duplicates a coil and shows the copy', async () => {
    await open('editor');
    await answer();
    const menus = await loader.getAllHarnesses(MatMenuHarness);
    await menus[1].clickItem({ text: 'Duplicate' });
    const copy = {
      ...handsetRx,
      id: 'c0000000-0000-4000-8000-0000000000a9',
      name: `${handsetRx.name} (copy)`,
    };
    const post = http.expectOne({ method: 'POST', url: `${coilsBase}/${handsetRx.id}/duplicate` });
    expect(post.request.body).toEqual({});
    post.flush(copy);
    await settle();
    await answer([...libraryCoils, { ...copy, updatedAt: '2026-12-02T08:00:00.000Z' }]);
    expect(nameLinks()[0]).toBe(copy.name);
  });
});
