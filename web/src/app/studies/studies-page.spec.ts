import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatTableHarness } from '@angular/material/table/testing';
import type { Role } from '../api-types';
import {
  configurePageTest,
  resetAndVerify,
  settle,
  signInAs,
  testWorkspace,
} from '../testing/page-test-bed';
import { WorkspaceContext } from '../workspaces/workspace-context';
import { StudiesPage } from './studies-page';
import { testSummary } from './study-test-data';

const workspaceId = testWorkspace.id;
const base = `/api/v1/workspaces/${workspaceId}`;

describe('StudiesPage', () => {
  let fixture: ComponentFixture<StudiesPage>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  async function open(role: Role): Promise<void> {
    http = configurePageTest({ providers: [WorkspaceContext] });
    signInAs();
    TestBed.inject(WorkspaceContext).bind(() => workspaceId);
    fixture = TestBed.createComponent(StudiesPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
    http.expectOne(base).flush({ ...testWorkspace, role });
    await settle();
  }

  const page = (): HTMLElement => fixture.nativeElement as HTMLElement;
  const text = (): string => page().textContent ?? '';

  afterEach(() => resetAndVerify(http));

  it('shows loading, then the studies with pair, frequency, threshold, revisions, last run', async () => {
    await open('editor');
    expect(page().querySelector('[data-testid=status-loading]')).not.toBeNull();

    http.expectOne(`${base}/studies`).flush({
      items: [
        testSummary(),
        testSummary({
          id: 'd0000000-0000-4000-8000-000000000002',
          name: 'Dock pad, η target',
          frequencyHz: 85e3,
          threshold: { kind: 'eta', value: 0.85 },
          revisionCount: 0,
          lastRun: { id: 'r1', kind: 'xy-map', status: 'failed', finishedAt: null },
        }),
      ],
    });
    await settle();

    const table = await loader.getHarness(MatTableHarness);
    const rows = await table.getCellTextByColumnName();
    expect(rows['pair'].text).toEqual(['Dock Tx 50 mm→Tag Rx 36 mm', 'Dock Tx 50 mm→Tag Rx 36 mm']);
    expect(rows['frequency'].text).toEqual(['140 kHz', '85.0 kHz']);
    expect(rows['threshold'].text).toEqual(['k ≥ 0.2', 'η ≥ 85 %']);
    expect(rows['revisions'].text).toEqual(['2', '0']);
    expect(rows['run'].text).toEqual(['None yet', 'Failed']);
    const link = page().querySelector<HTMLAnchorElement>('[data-testid=study-link]');
    expect(link?.textContent?.trim()).toBe('Dock pad at 4 mm');
    expect(link?.getAttribute('href')).toBe(`/${'d0000000-0000-4000-8000-000000000001'}`);
    expect(page().querySelector('[data-testid=new-study]')).not.toBeNull();
  });

  it('says when there are no studies, and offers an editor to start one', async () => {
    await open('owner');
    http.expectOne(`${base}/studies`).flush({ items: [] });
    await settle();
    expect(page().querySelector('[data-testid=status-empty]')).not.toBeNull();
    expect(text()).toContain('No studies yet. Pick a Tx and an Rx');
    expect(
      await loader.getAllHarnesses(MatButtonHarness.with({ text: 'Start a study' })),
    ).toHaveLength(1);
  });

  it('shows a viewer the list without any way to create a study', async () => {
    await open('viewer');
    http.expectOne(`${base}/studies`).flush({ items: [] });
    await settle();
    expect(text()).toContain('An editor of this workspace starts them.');
    expect(page().querySelector('[data-testid=new-study]')).toBeNull();
    expect(await loader.getAllHarnesses(MatButtonHarness)).toHaveLength(0);
  });

  it('shows a failed load with a retry that asks again', async () => {
    await open('reviewer');
    http
      .expectOne(`${base}/studies`)
      .flush(
        { code: 'internal', message: 'Database unavailable' },
        { status: 500, statusText: 'x' },
      );
    await settle();
    expect(page().querySelector('[data-testid=status-error]')?.textContent).toContain(
      'Database unavailable',
    );
    // A native click: a harness would wait for the reload's pending request to settle.
    page().querySelector<HTMLButtonElement>('[data-testid=status-error] button')?.click();
    await settle();
    http.expectOne(`${base}/studies`).flush({ items: [testSummary()] });
    await settle();
    expect(page().querySelectorAll('[data-testid=study-row]')).toHaveLength(1);
  });
});
