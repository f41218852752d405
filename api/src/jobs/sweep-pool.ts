import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import type { Coil, SweepSpec } from '../../../physics/src/index';
import type { FrozenSweepSpec } from '../sweeps/sweeps-dto';
import type {
  ComputeOutcome,
  ComputeTask,
  EstimateOutcome,
  EstimateTask,
  SweepThreadControl,
  SweepThreadProgress,
} from './sweep-thread';

/**
 * Where the thread entry is. From the sources (vitest, tsx) this module is a .ts file and the
 * threads load a small shim that registers tsx; in the esbuild bundle (dist/api/main.mjs or
 * dist/api/worker.mjs) import.meta.url is the bundle's own URL and the thread entry was bundled
 * beside it as sweep-worker.mjs.
 */
export function sweepThreadFile(moduleUrl = import.meta.url): string {
  const fromSource = moduleUrl.endsWith('.ts');
  return new URL(fromSource ? './sweep-thread-shim.mjs' : './sweep-worker.mjs', moduleUrl).href;
}

export interface SweepPoolOptions {
  /** Threads at most (the run concurrency of this process). */
  threads: number;
  /** Idle threads exit after this long, so an idle server holds no compute threads, ms. */
  idleTimeoutMs?: number;
}

/** A running compute: its outcome, and a way to stop it at its next chunk. */
export interface ComputeHandle {
  outcome: Promise<ComputeOutcome>;
  abort(): void;
}

/**
 * The worker threads that compute sweeps (and time estimate samples) off the event loop. Each
 * compute gets a MessageChannel: the thread posts progress after every chunk and listens for
 * 'abort'.
 */
export class SweepPool {
  private readonly piscina: Piscina;

  constructor(options: SweepPoolOptions) {
    this.piscina = new Piscina({
      filename: sweepThreadFile(),
      minThreads: 0,
      maxThreads: Math.max(1, options.threads),
      idleTimeout: options.idleTimeoutMs ?? 30_000,
    });
  }

  compute(
    spec: FrozenSweepSpec,
    onProgress: (progress: SweepThreadProgress) => void,
    chunkSize?: number,
  ): ComputeHandle {
    const { port1, port2 } = new MessageChannel();
    port1.on('message', onProgress);
    const task: ComputeTask = { type: 'compute', spec, port: port2, chunkSize };
    const outcome = (
      this.piscina.run(task, { transferList: [port2] }) as Promise<ComputeOutcome>
    ).finally(() => port1.close());
    return {
      outcome,
      abort: () => port1.postMessage('abort' satisfies SweepThreadControl),
    };
  }

  estimate(tx: Coil, rx: Coil, grid: SweepSpec, sample: number): Promise<EstimateOutcome> {
    const task: EstimateTask = { type: 'estimate', tx, rx, grid, sample };
    return this.piscina.run(task) as Promise<EstimateOutcome>;
  }

  /** Stops every thread; tasks still running are rejected. */
  async destroy(): Promise<void> {
    await this.piscina.destroy();
  }
}
