// The workbench's live-link worker: the physics engine off the page's thread, so the sliders
// stay smooth while a pose is computed. One engine per worker; messages in live-link-messages.ts.
// Written against the DOM typings (the app's tsconfig): addEventListener and postMessage(message)
// mean the same in a worker's global scope.
import { LiveLinkEngine } from './live-link-engine';
import type { LiveLinkRequest } from './live-link-messages';

const engine = new LiveLinkEngine();

addEventListener('message', (event: MessageEvent<LiveLinkRequest>) => {
  postMessage(engine.handle(event.data));
});
