// Entry of the geometry worker thread: registers tsx's TypeScript loader in this thread, then loads the
// worker. (On Node 20, `execArgv: ['--import', 'tsx']` does not reach ESM imports inside a worker.)
import { register } from 'tsx/esm/api';

register();
await import('./geometry-worker.ts');
