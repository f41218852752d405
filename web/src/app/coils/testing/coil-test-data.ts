// Coils of our own invented demo scenario (Halden Robotics' dock pad) for the web specs. The
// figures are what the API would send; the specs check how the page shows them, not the physics.
// Test support only: nothing in the app imports this file.
import type { CoilResponse, WorkspaceResponse } from '../../api-types';

/** The id of `testWorkspace` in web/src/app/testing/page-test-bed.ts. */
export const workspaceId = '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e';
export const workspaceBase = `/api/v1/workspaces/${workspaceId}`;
export const coilsBase = `${workspaceBase}/coils`;

export function workspaceAs(role: WorkspaceResponse['role']): WorkspaceResponse {
  return { id: workspaceId, name: 'Halden dock pad', role, createdAt: '2026-11-30T09:00:00.000Z' };
}

/** `testUser` of the shared test bed. */
const author = { userId: 'a0000000-0000-4000-8000-000000000001', displayName: 'Inês Ferreira' };

export const dockTx: CoilResponse = {
  id: 'c0000000-0000-4000-8000-0000000000a1',
  workspaceId,
  name: 'Dock pad Tx, 10 turns',
  description: 'Litz transmitter under the dock plate',
  kind: 'circular-spiral',
  spec: {
    kind: 'circular-spiral',
    turns: 10,
    innerDiameter: 0.02,
    outerDiameter: 0.043,
    model: 'rings',
    conductor: { type: 'litz', strands: 105, strandDiameter: 8e-5 },
  },
  operatingFrequencyHz: 128e3,
  ratedCurrentA: 1.5,
  figures: {
    L: 6.42e-6,
    Rdc: 0.0612,
    Rac: 0.0648,
    Q: 79.7,
    storedEnergy: 7.2e-6,
    timeConstant: 1.05e-4,
    wireLength: 0.99,
    skinDepth: 1.83e-4,
  },
  usedBy: [{ id: 'd0000000-0000-4000-8000-0000000000b1', name: 'Dock alignment study' }],
  version: 3,
  createdBy: author,
  updatedBy: author,
  createdAt: '2026-11-30T09:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
};

export const handsetRx: CoilResponse = {
  id: 'c0000000-0000-4000-8000-0000000000a2',
  workspaceId,
  name: 'Handset Rx on the flex board',
  description: '',
  kind: 'rectangular-spiral',
  spec: {
    kind: 'rectangular-spiral',
    outerWidth: 0.03,
    outerHeight: 0.02,
    cornerRadius: 0.002,
    pitch: 0.0008,
    turns: 6,
    conductor: { type: 'trace', width: 0.0005, thickness: 3.5e-5 },
  },
  operatingFrequencyHz: null,
  ratedCurrentA: null,
  figures: {
    L: 1.12e-6,
    Rdc: 0.412,
    Rac: null,
    Q: null,
    storedEnergy: 5.6e-7,
    timeConstant: 2.7e-6,
    wireLength: 0.52,
    skinDepth: null,
  },
  usedBy: [],
  version: 1,
  createdBy: author,
  updatedBy: null,
  createdAt: '2026-11-30T11:00:00.000Z',
  updatedAt: '2026-11-30T11:00:00.000Z',
};

export const probeSolenoid: CoilResponse = {
  id: 'c0000000-0000-4000-8000-0000000000a3',
  workspaceId,
  name: 'Bench probe solenoid',
  description: 'Pick-up coil for field checks',
  kind: 'solenoid',
  spec: {
    kind: 'solenoid',
    radius: 0.005,
    length: 0.012,
    turns: 12,
    conductor: { type: 'round', diameter: 0.0005 },
  },
  operatingFrequencyHz: 85e3,
  ratedCurrentA: null,
  figures: {
    L: 2.31e-6,
    Rdc: 0.0331,
    Rac: 0.0402,
    Q: 30.7,
    storedEnergy: 1.16e-6,
    timeConstant: 6.98e-5,
    wireLength: 0.377,
    skinDepth: 2.24e-4,
  },
  usedBy: [],
  version: 2,
  createdBy: author,
  updatedBy: author,
  createdAt: '2026-11-29T08:00:00.000Z',
  updatedAt: '2026-11-29T08:30:00.000Z',
};

export const libraryCoils = [dockTx, handsetRx, probeSolenoid];
