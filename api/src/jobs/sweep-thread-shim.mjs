// Worker-thread entry when Couplet runs from its TypeScript sources (vitest, tsx): Node 20 cannot
// load .ts files by itself, so tsx's loader is registered for this thread and the task module is
// imported through it. The bundled server uses dist/api/sweep-worker.mjs instead.
import { tsImport } from 'tsx/esm/api';

const task = await tsImport('./sweep-thread.ts', import.meta.url);

export default task.default;
