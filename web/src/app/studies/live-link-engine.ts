import {
  coilFilaments,
  compensationCapacitors,
  linkFigures,
  parseCoil,
  preparePair,
  qualityFactor,
  type Coil,
  type PreparedPair,
} from '../../../../physics/src/index';
import type { StudyPose } from '../api-types';
import type {
  LiveCoilFigures,
  LiveLinkPoseRequest,
  LiveLinkRequest,
  LiveLinkResponse,
} from './live-link-messages';

/**
 * The live-link worker's logic, without the worker: prepares a coil pair once, then answers each
 * pose with physics' link figures computed on the prepared pair, plus the compensation
 * capacitors of the study's topology. Kept apart from the worker file so that it can be tested
 * (and run on the page where workers are missing).
 */
export class LiveLinkEngine {
  private setupId = -1;
  private tx: Coil | null = null;
  private rx: Coil | null = null;
  private pair: PreparedPair | null = null;

  handle(request: LiveLinkRequest): LiveLinkResponse {
    return request.type === 'setup' ? this.setup(request) : this.pose(request);
  }

  private setup(request: Extract<LiveLinkRequest, { type: 'setup' }>): LiveLinkResponse {
    const start = performance.now();
    this.setupId = request.setupId;
    this.pair = null;
    try {
      const tx = parseCoil(request.tx, 'tx');
      const rx = parseCoil(request.rx, 'rx');
      const pair = preparePair(tx, rx);
      // Reading L1 and L2 builds the self terms now rather than on the first pose; the nominal
      // pose builds the field tables a polygon coil needs near it and the Rx image term of a
      // backed Tx (measured in Node for a backed spiral against a PCB rectangle: 33 ms and
      // 141 ms the first time, then a few ms per pose).
      void pair.L1;
      void pair.L2;
      if (request.warmPose) warmUp(pair, request.warmPose);
      this.tx = tx;
      this.rx = rx;
      this.pair = pair;
      return {
        type: 'ready',
        setupId: request.setupId,
        tx: coilFilaments(tx),
        rx: coilFilaments(rx),
        prepareMs: performance.now() - start,
      };
    } catch (error) {
      return { type: 'error', id: null, setupId: request.setupId, message: messageOf(error) };
    }
  }

  private pose(request: LiveLinkPoseRequest): LiveLinkResponse {
    const start = performance.now();
    const { id, setupId } = request;
    if (setupId !== this.setupId || !this.pair || !this.tx || !this.rx) {
      return { type: 'error', id, setupId, message: 'The coil pair is not prepared yet.' };
    }
    try {
      const { frequency, current, compensation } = request;
      const f = linkFigures(this.tx, this.rx, request.pose, {
        frequency,
        current,
        pair: this.pair,
      });
      const { C1, C2 } = compensationCapacitors(compensation, f.L1, f.L2, f.M, frequency);
      const alone = (L: number, R: number): LiveCoilFigures => ({
        L,
        R,
        Q: qualityFactor(L, R, frequency),
      });
      return {
        type: 'figures',
        id,
        setupId,
        figures: {
          ...f,
          C1,
          C2,
          compensation,
          tx: alone(f.L1, f.R1),
          rx: alone(this.pair.L2, f.R2),
        },
        computeMs: performance.now() - start,
      };
    } catch (error) {
      return { type: 'error', id, setupId, message: messageOf(error) };
    }
  }
}

/** Evaluates a pose once for its side effects on the pair's caches; the answer is not kept. */
function warmUp(pair: PreparedPair, pose: StudyPose): void {
  try {
    pair.mutual(pose);
    // With a Tx backing, the Rx's own image (cached per gap) costs more than M itself.
    pair.L2At(pose);
  } catch {
    // Only a cache; the real poses report their own problems.
  }
}

/** The engine's RangeErrors name the field and what is allowed: worth showing as they are. */
function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : 'The computation failed.';
}
