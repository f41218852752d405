import type { Response } from 'express';
import type { Logger } from 'pino';
import type { SweepEventHub } from './sweep-event-hub';
import type { SweepProgressEvent, SweepRunResponse } from './sweeps-dto';

export interface SweepStreamTiming {
  /** Progress events at most this often, ms (sweeps-dto: 250). */
  progressMs: number;
  /** A comment line this often keeps proxies from closing an idle stream, ms. */
  heartbeatMs: number;
  /** Re-read the run this often even without a notification (a lost NOTIFY), ms. */
  fallbackMs: number;
}

export const defaultStreamTiming: SweepStreamTiming = {
  progressMs: 250,
  heartbeatMs: 15_000,
  fallbackMs: 2_000,
};

export interface SweepStreamSource {
  runId: string;
  /** The run's progress now, or null once the run (or its study) is gone. */
  progress(): Promise<SweepProgressEvent | null>;
  /** The finished run as the `end` event carries it (no result). */
  final(): Promise<SweepRunResponse | null>;
}

const finished = (status: SweepProgressEvent['status']) =>
  status === 'succeeded' || status === 'failed' || status === 'cancelled';

/**
 * Writes a run's server-sent events until it ends or the client leaves: `progress` whenever the
 * stored progress or status changed (at most every `progressMs`), then `end` with the run, then
 * the stream closes. Woken by the run's NOTIFY (SweepEventHub), with a slow re-read as a safety
 * net; a `: heartbeat` comment every `heartbeatMs`. Resolves when the stream is closed.
 */
export async function streamSweepEvents(
  res: Response,
  source: SweepStreamSource,
  hub: SweepEventHub,
  logger: Logger | undefined,
  timing: SweepStreamTiming = defaultStreamTiming,
): Promise<void> {
  res.writeHead(200, {
    'Content-Type': 'text/event-stream; charset=utf-8',
    'Cache-Control': 'no-store',
    Connection: 'keep-alive',
    // Reverse proxies (nginx and the like) would otherwise buffer the stream.
    'X-Accel-Buffering': 'no',
  });
  res.write(': stream open\n\n');

  let closed = false;
  let wake: () => void = () => {};
  let changed = true;
  const nudge = () => {
    changed = true;
    wake();
  };
  const onClose = () => {
    closed = true;
    wake();
  };
  // The response's 'close' (not the request's, which fires once the request is read) marks a
  // client that went away.
  res.on('close', onClose);
  const unsubscribe = hub.subscribe(source.runId, nudge);
  const heartbeat = setInterval(() => res.write(': heartbeat\n\n'), timing.heartbeatMs);
  const send = (event: string, data: unknown) =>
    res.write(`event: ${event}\ndata: ${JSON.stringify(data)}\n\n`);
  const pause = (ms: number, untilChanged: boolean) =>
    new Promise<void>((resolve) => {
      const timer = setTimeout(done, ms);
      function done() {
        clearTimeout(timer);
        wake = () => {};
        resolve();
      }
      wake = untilChanged ? done : () => closed && done();
      if (closed || (untilChanged && changed)) done();
    });

  try {
    let lastKey = '';
    while (!closed && !hub.closed) {
      changed = false;
      const progress = await source.progress();
      if (!progress) break;
      if (finished(progress.status)) {
        const run = await source.final();
        if (run && !closed) send('end', run);
        break;
      }
      const key = `${progress.status}|${progress.pointsDone}`;
      if (key !== lastKey) {
        send('progress', progress);
        lastKey = key;
        await pause(timing.progressMs, false);
      }
      if (!changed) await pause(timing.fallbackMs, true);
    }
  } catch (err) {
    logger?.warn({ err, runId: source.runId }, 'sweep event stream failed');
  } finally {
    clearInterval(heartbeat);
    unsubscribe();
    res.off('close', onClose);
    res.end();
  }
}
