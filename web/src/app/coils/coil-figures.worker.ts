// The figures worker: computes a coil's live figures away from the page's thread, so typing in
// the editor stays smooth while the filament model sums its mutual terms. Typed without the
// webworker lib so that the app's own type check (DOM lib) reads this file too.
import { answerCoilFigures, type CoilFiguresRequest } from './coil-figures-request';

const scope = globalThis as unknown as {
  addEventListener(type: 'message', listener: (event: MessageEvent) => void): void;
  postMessage(message: unknown): void;
};

scope.addEventListener('message', (event: MessageEvent<CoilFiguresRequest>) => {
  scope.postMessage(answerCoilFigures(event.data));
});
