/**
 * Worker thread running geometry tasks (geometry-tasks.ts) off the HTTP event loop. In: { id, task }.
 * Out: { id, type: 'progress', fraction } while running, then { id, type: 'done', outcome } or
 * { id, type: 'error', message } for an internal failure.
 */
import { parentPort } from 'node:worker_threads';
import { runGeometryTask, type GeometryTask } from './geometry-tasks.js';

const port = parentPort;
if (!port) throw new Error('geometry-worker must run in a worker thread');

port.on('message', (msg: { id: number; task: GeometryTask }) => {
  try {
    const outcome = runGeometryTask(msg.task, (fraction) => port.postMessage({ id: msg.id, type: 'progress', fraction }));
    port.postMessage({ id: msg.id, type: 'done', outcome });
  } catch (err) {
    port.postMessage({ id: msg.id, type: 'error', message: err instanceof Error ? err.message : String(err) });
  }
});
