import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatMenuHarness } from '@angular/material/menu/testing';
import { Router } from '@angular/router';
import type { WorkspaceResponse } from '../api-types';
import {
  configurePageTest,
  resetAndVerify,
  settle,
  signInAs,
  testWorkspace,
} from '../testing/page-test-bed';
import { WorkspaceSwitcher } from './workspace-switcher';

const list = '/api/v1/workspaces';
const dockPad = testWorkspace;
const scooter: WorkspaceResponse = {
  id: '7a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
  name: 'Kestrel scooter charger',
  role: 'viewer',
  createdAt: '2026-10-02T09:00:00.000Z',
};

describe('WorkspaceSwitcher', () => {
  let fixture: ComponentFixture<WorkspaceSwitcher>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  beforeEach(async () => {
    http = configurePageTest();
    signInAs();
    fixture = TestBed.createComponent(WorkspaceSwitcher);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
  });

  afterEach(() => resetAndVerify(http));

  const trigger = (): HTMLButtonElement =>
    (fixture.nativeElement as HTMLElement).querySelector('[data-testid=workspace-switcher]')!;
  const menu = () => loader.getHarness(MatMenuHarness);
  /** The open menu's items, read without a harness (which would wait for pending loads). */
  const overlayItems = (): HTMLElement[] => [
    ...document.querySelectorAll<HTMLElement>('.mat-mdc-menu-panel [mat-menu-item]'),
  ];
  /** Each item as read: a workspace as "name (role)"; name and role are set apart by a gap. */
  const itemTexts = (): string[] =>
    overlayItems().map((item) => {
      const role = item.querySelector('.role');
      const name = role?.previousElementSibling?.textContent;
      return role ? `${name} (${role.textContent})` : (item.textContent?.trim() ?? '');
    });

  async function answer(items: WorkspaceResponse[]): Promise<void> {
    http.expectOne(list).flush({ items });
    await settle();
  }

  it('says it is loading while the list is on its way', async () => {
    trigger().click();
    await settle();
    const loading = overlayItems()[0];
    expect(loading.textContent?.trim()).toBe('Loading workspaces…');
    expect(loading.getAttribute('aria-disabled')).toBe('true');
    await answer([dockPad]);
    expect(itemTexts()).toEqual(['Halden dock pad (Owner)', 'New workspace', 'All workspaces']);
  });

  it('lists each workspace with my role, then a new one and all of them', async () => {
    await answer([dockPad, scooter]);
    expect(trigger().textContent?.trim()).toBe('Choose a workspace');
    await (await menu()).open();

    expect(itemTexts()).toEqual([
      'Halden dock pad (Owner)',
      'Kestrel scooter charger (Viewer)',
      'New workspace',
      'All workspaces',
    ]);
    const links = overlayItems().map((a) => a.getAttribute('href'));
    expect(links).toEqual([
      `/w/${dockPad.id}`,
      `/w/${scooter.id}`,
      '/workspaces?new=',
      '/workspaces',
    ]);
  });

  it('names the workspace the address is in, and marks it in the menu', async () => {
    await answer([dockPad, scooter]);
    await TestBed.inject(Router).navigateByUrl(`/w/${scooter.id}/members`);
    await settle();

    expect(trigger().textContent?.trim()).toBe('Kestrel scooter charger');
    expect(trigger().getAttribute('aria-label')).toBe('Workspace: Kestrel scooter charger. Switch');
    await (await menu()).open();
    const current = overlayItems().filter((item) => item.classList.contains('current'));
    expect(current.map((item) => item.getAttribute('href'))).toEqual([`/w/${scooter.id}`]);
  });

  it('says when there are no workspaces yet, still offering a new one', async () => {
    await answer([]);
    await (await menu()).open();
    expect(itemTexts()).toEqual(['No workspaces yet', 'New workspace', 'All workspaces']);
  });

  it('offers a retry when the list cannot be loaded, and the retry loads it', async () => {
    http
      .expectOne(list)
      .flush({ code: 'internal', message: 'down' }, { status: 500, statusText: 'Error' });
    await settle();
    await (await menu()).open();
    expect(itemTexts()).toEqual([
      'Could not load workspaces — retry',
      'New workspace',
      'All workspaces',
    ]);

    // A plain click: a harness click would wait for the reload, which this test answers below.
    overlayItems()[0].click();
    await settle();
    await answer([dockPad]);
    await (await menu()).open();
    expect(itemTexts()).toEqual(['Halden dock pad (Owner)', 'New workspace', 'All workspaces']);
  });
});
