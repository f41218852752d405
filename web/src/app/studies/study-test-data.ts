// Test support for the study specs (invented coils and people of our own): a study, its coils,
// revisions, and a fake live-link port the specs answer by hand. Not used by the app.
import type {
  CoilResponse,
  RevisionResponse,
  RevisionSummaryResponse,
  StudyCoil,
  StudyResponse,
  StudySummaryResponse,
} from '../api-types';
import type {
  LiveFigures,
  LiveLinkPoseRequest,
  LiveLinkRequest,
  LiveLinkResponse,
  LiveLinkSetup,
} from './live-link-messages';
import type { LiveLinkPort } from './live-link-port';

export const txCoilId = 'c0000000-0000-4000-8000-00000000000a';
export const rxCoilId = 'c0000000-0000-4000-8000-00000000000b';
export const studyId = 'd0000000-0000-4000-8000-000000000001';

const figures = (L: number): StudyCoil['figures'] => ({
  L,
  Rdc: 0.05,
  Rac: 0.08,
  Q: 120,
  storedEnergy: L / 2,
  timeConstant: L / 0.05,
  wireLength: 0.6,
  skinDepth: 1.7e-4,
});

export const txCoil: StudyCoil = {
  id: txCoilId,
  name: 'Dock Tx 50 mm',
  kind: 'ring',
  spec: { kind: 'ring', radius: 0.025, wireRadius: 5e-4 },
  version: 2,
  figures: figures(1.4e-7),
};

export const rxCoil: StudyCoil = {
  id: rxCoilId,
  name: 'Tag Rx 36 mm',
  kind: 'ring',
  spec: { kind: 'ring', radius: 0.018, wireRadius: 4e-4 },
  version: 1,
  figures: figures(9.6e-8),
};

const person = { userId: 'a0000000-0000-4000-8000-000000000001', displayName: 'Inês Ferreira' };

export function testStudy(
  workspaceId: string,
  changes: Partial<StudyResponse> = {},
): StudyResponse {
  return {
    id: studyId,
    workspaceId,
    name: 'Dock pad at 4 mm',
    txCoil,
    rxCoil,
    frequencyHz: 140e3,
    txCurrentA: 2,
    threshold: { kind: 'k', value: 0.2 },
    compensation: 'series-series',
    notes: 'Halden dock, tag in its sleeve.',
    nominalPose: { x: 0, y: 0, z: 0.004, tiltX: 0, tiltY: 0 },
    inputsHash: 'h1',
    version: 3,
    latestRevision: null,
    createdBy: person,
    updatedBy: person,
    createdAt: '2026-12-01T09:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
    ...changes,
  };
}

export function testSummary(changes: Partial<StudySummaryResponse> = {}): StudySummaryResponse {
  return {
    id: studyId,
    name: 'Dock pad at 4 mm',
    txCoil: { id: txCoilId, name: txCoil.name },
    rxCoil: { id: rxCoilId, name: rxCoil.name },
    frequencyHz: 140e3,
    threshold: { kind: 'k', value: 0.2 },
    revisionCount: 2,
    lastRun: null,
    updatedAt: '2026-12-01T10:00:00.000Z',
    ...changes,
  };
}

export function libraryCoil(coil: StudyCoil, workspaceId: string): CoilResponse {
  return {
    id: coil.id,
    workspaceId,
    name: coil.name,
    description: '',
    kind: coil.kind,
    spec: coil.spec,
    operatingFrequencyHz: 140e3,
    ratedCurrentA: null,
    figures: coil.figures,
    usedBy: [],
    version: coil.version,
    createdBy: person,
    updatedBy: person,
    createdAt: '2026-12-01T09:00:00.000Z',
    updatedAt: '2026-12-01T09:00:00.000Z',
  };
}

export const revisionSummary: RevisionSummaryResponse = {
  id: 'e0000000-0000-4000-8000-000000000001',
  number: 1,
  summary: 'First look before the housing review',
  engineVersion: '0.4.0',
  inputsHash: 'h0',
  resultKinds: [],
  createdBy: person,
  createdAt: '2026-12-01T11:00:00.000Z',
};

export function testRevision(workspaceId: string): RevisionResponse {
  const s = testStudy(workspaceId);
  return {
    ...revisionSummary,
    inputs: {
      name: s.name,
      frequencyHz: 120e3,
      txCurrentA: 1.5,
      threshold: s.threshold,
      compensation: s.compensation,
      notes: 'Frozen notes',
      nominalPose: s.nominalPose,
    },
    coilSnapshots: { tx: txCoil, rx: rxCoil },
    results: { runs: [] },
  };
}

/** Figures as the worker would send them (values invented for the display, not physics). */
export function fakeFigures(changes: Partial<LiveFigures> = {}): LiveFigures {
  return {
    M: 2.1e-8,
    k: 0.182,
    L1: 1.4e-7,
    L2: 9.6e-8,
    R1: 0.08,
    R2: 0.07,
    Q1: 120,
    Q2: 110,
    etaMax: 0.921,
    optimalLoad: 1.3,
    inducedVoltage: 0.037,
    resonantVoltageTx: 0.246,
    C1: 9.2e-6,
    C2: 1.35e-5,
    compensation: 'series-series',
    tx: { L: 1.4e-7, R: 0.08, Q: 120 },
    rx: { L: 9.6e-8, R: 0.07, Q: 110 },
    ...changes,
  };
}

/** A live-link port the spec answers by hand. */
export class FakeLiveLinkPort implements LiveLinkPort {
  readonly sent: LiveLinkRequest[] = [];
  closed = false;
  private handler: ((response: LiveLinkResponse) => void) | null = null;

  send(request: LiveLinkRequest): void {
    this.sent.push(request);
  }
  listen(handler: (response: LiveLinkResponse) => void): void {
    this.handler = handler;
  }
  close(): void {
    this.closed = true;
  }
  reply(response: LiveLinkResponse): void {
    this.handler?.(response);
  }
  setups(): LiveLinkSetup[] {
    return this.sent.filter((r): r is LiveLinkSetup => r.type === 'setup');
  }
  poses(): LiveLinkPoseRequest[] {
    return this.sent.filter((r): r is LiveLinkPoseRequest => r.type === 'pose');
  }
  /** Answers the set-up with one ring filament per coil. */
  ready(setupId: number): void {
    const ring = (radius: number) => ({
      rings: [
        {
          center: { x: 0, y: 0, z: 0 },
          normal: { x: 0, y: 0, z: 1 },
          radius,
          wireRadius: 5e-4,
          weight: 1,
        },
      ],
      paths: [],
    });
    this.reply({ type: 'ready', setupId, tx: ring(0.025), rx: ring(0.018), prepareMs: 1 });
  }
}
