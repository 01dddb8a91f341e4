/**
 * A worker thread that runs geometry tasks one at a time (FIFO), so the HTTP event loop never waits on
 * geometry. The thread starts on first use and is restarted after a crash or a timeout (the task at hand
 * fails with a worded error). `inline: true` runs tasks on the calling thread instead (scripts).
 */
import { Worker } from 'node:worker_threads';
import type { ProgressFn } from './compute-analysis.js';
import { runGeometryTask, type GeometryTask, type TaskOutcome } from './geometry-tasks.js';

export class GeometryTaskError extends Error {}

type Message = { id: number; type: 'progress'; fraction: number } | { id: number; type: 'done'; outcome: unknown } | { id: number; type: 'error'; message: string };

interface Pending {
  id: number;
  task: GeometryTask;
  progress: ProgressFn;
  resolve: (v: unknown) => void;
  reject: (e: Error) => void;
}

export class GeometryWorker {
  private worker: Worker | null = null;
  private queue: Pending[] = [];
  private current: Pending | null = null;
  private timer: NodeJS.Timeout | null = null;
  private nextId = 1;
  private closed = false;

  constructor(private readonly opts: { timeoutMs?: number; inline?: boolean } = {}) {}

  /** Runs a task; resolves with its outcome, rejects with GeometryTaskError on a crash or timeout. */
  run<T extends GeometryTask>(task: T, progress: ProgressFn = () => undefined): Promise<TaskOutcome<T>> {
    if (this.opts.inline) {
      try {
        return Promise.resolve(runGeometryTask(task, progress) as TaskOutcome<T>);
      } catch (e) {
        return Promise.reject(new GeometryTaskError(e instanceof Error ? e.message : String(e)));
      }
    }
    if (this.closed) return Promise.reject(new GeometryTaskError('the server is shutting down'));
    return new Promise((resolve, reject) => {
      this.queue.push({ id: this.nextId++, task, progress, resolve: resolve as (v: unknown) => void, reject });
      this.pump();
    });
  }

  /** Ends the thread; queued tasks fail. */
  async close(): Promise<void> {
    this.closed = true;
    for (const p of this.queue.splice(0)) p.reject(new GeometryTaskError('the server is shutting down'));
    if (this.current) this.finish(new GeometryTaskError('the server is shutting down'));
    const w = this.worker;
    this.worker = null;
    if (w) await w.terminate();
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const w = new Worker(new URL('./geometry-worker-boot.mjs', import.meta.url), { execArgv: [] });
    w.unref();
    w.on('message', (m: Message) => this.onMessage(w, m));
    w.on('error', (err) => this.onCrash(w, `The computation stopped: ${err.message}`));
    w.on('exit', (code) => this.onCrash(w, `The computation ran out of resources (worker exit ${code}); the diagram may be too large.`));
    this.worker = w;
    return w;
  }

  private pump(): void {
    if (this.current || this.closed) return;
    const next = this.queue.shift();
    if (!next) return;
    this.current = next;
    const timeout = this.opts.timeoutMs ?? 10 * 60_000;
    this.timer = setTimeout(() => {
      const w = this.worker;
      this.worker = null;
      this.finish(new GeometryTaskError(`The computation took longer than ${Math.round(timeout / 1000)} s and was stopped.`));
      if (w) void w.terminate();
    }, timeout);
    this.timer.unref();
    this.ensureWorker().postMessage({ id: next.id, task: next.task });
  }

  private finish(err: Error | null, value?: unknown): void {
    const p = this.current;
    if (!p) return;
    this.current = null;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    if (err) p.reject(err);
    else p.resolve(value);
    queueMicrotask(() => this.pump());
  }

  private onMessage(w: Worker, m: Message): void {
    if (w !== this.worker || !this.current || m.id !== this.current.id) return;
    if (m.type === 'progress') this.current.progress(m.fraction, 'running');
    else if (m.type === 'done') this.finish(null, m.outcome);
    else this.finish(new GeometryTaskError(`The computation stopped on an internal error: ${m.message}`));
  }

  private onCrash(w: Worker, message: string): void {
    if (w !== this.worker) return;
    this.worker = null;
    this.finish(new GeometryTaskError(message));
  }
}
