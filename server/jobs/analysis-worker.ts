/**
 * Worker thread that computes analyses off the HTTP event loop. Messages in: { id, row } (stored revision
 * columns; Buffers arrive as Uint8Arrays). Messages out: { id, type: 'progress', fraction, stage } and
 * { id, type: 'done', outcome }. One job at a time; the queue keeps the thread alive between jobs.
 */
import { parentPort } from 'node:worker_threads';
import { analyzeStored } from './compute-analysis.js';
import type { WorkerRequest, WorkerMessage } from './worker-protocol.js';

const port = parentPort;
if (!port) throw new Error('analysis-worker must run in a worker thread');

const asBuffer = (u: Uint8Array | null): Buffer | null => (u ? Buffer.from(u.buffer, u.byteOffset, u.byteLength) : null);

port.on('message', (msg: WorkerRequest) => {
  const send = (m: WorkerMessage) => port.postMessage(m);
  try {
    const outcome = analyzeStored(
      { mesh: asBuffer(msg.row.mesh)!, curves: msg.row.curves, basepoints: msg.row.basepoints, vertexLabels: asBuffer(msg.row.vertexLabels) },
      (fraction, stage) => send({ id: msg.id, type: 'progress', fraction, stage }),
    );
    send({ id: msg.id, type: 'done', outcome });
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    send({ id: msg.id, type: 'done', outcome: { ok: false, error: { message: `The analysis stopped on an internal error: ${message}`, problems: [] } } });
  }
});
