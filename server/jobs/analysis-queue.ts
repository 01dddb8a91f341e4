/**
 * The analysis queue: a small in-process queue persisted in the `analyses` table (one row per revision,
 * status pending → running → done | failed). Jobs are claimed with `FOR UPDATE SKIP LOCKED`, so several
 * server processes may share one database. Computation runs in a worker thread (analysis-worker.ts) so big
 * meshes never block the HTTP event loop; progress goes to analyses.progress. At start, rows left
 * `running` by a stopped process go back to `pending` and everything pending is picked up again.
 */
import { Worker } from 'node:worker_threads';
import { and, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/client.js';
import { analyses, diagramRevisions } from '../db/schema.js';
import type { AppDeps } from '../deps.js';
import { analyzeStored, type AnalysisOutcome, type ProgressFn } from './compute-analysis.js';
import type { WorkerMessage, WorkerRequest } from './worker-protocol.js';

export interface AnalysisQueueOptions {
  /** 'worker' (default) computes in a worker thread; 'inline' on the calling thread (scripts). */
  mode?: 'worker' | 'inline';
  /** A job running longer than this fails (the worker is restarted). */
  jobTimeoutMs?: number;
  log?: (msg: string) => void;
}

type Row = { mesh: Buffer; curves: unknown; basepoints: unknown; vertexLabels: Buffer | null };

/** Inserts the pending analysis row of a revision (idempotent). Call inside the revision's transaction. */
export async function insertPendingAnalysis(db: Pick<Db, 'insert'>, revisionId: string): Promise<void> {
  await db.insert(analyses).values({ revisionId, status: 'pending', progress: 0 }).onConflictDoNothing();
}

export class AnalysisQueue {
  private worker: Worker | null = null;
  private loopPromise: Promise<void> | null = null;
  private stopped = false;
  private again = false;
  private readonly mode: 'worker' | 'inline';
  private readonly timeoutMs: number;
  private readonly log: (msg: string) => void;

  constructor(private readonly db: Db, opts: AnalysisQueueOptions = {}) {
    this.mode = opts.mode ?? 'worker';
    this.timeoutMs = opts.jobTimeoutMs ?? 10 * 60_000;
    this.log = opts.log ?? ((m) => console.log(m));
  }

  /** Requeues analyses left running by a stopped process, then works through everything pending. */
  async start(): Promise<void> {
    await this.db.update(analyses).set({ status: 'pending', progress: 0, startedAt: null }).where(eq(analyses.status, 'running'));
    this.kick();
  }

  /** Marks a revision's analysis pending (if it has no row yet) and wakes the queue. */
  async enqueue(revisionId: string): Promise<void> {
    await insertPendingAnalysis(this.db, revisionId);
    this.kick();
  }

  /** Wakes the queue (cheap; safe to call often). */
  kick(): void {
    if (this.stopped) return;
    if (this.loopPromise) {
      this.again = true;
      return;
    }
    this.loopPromise = this.loop()
      .catch((err: unknown) => this.log(`[analysis] queue loop failed: ${err instanceof Error ? err.message : String(err)}`))
      .finally(() => {
        this.loopPromise = null;
        if (this.again && !this.stopped) {
          this.again = false;
          this.kick();
        }
      });
  }

  /** Resolves when no job is running (tests, seed). */
  async whenIdle(): Promise<void> {
    while (this.loopPromise) await this.loopPromise;
  }

  /** Stops claiming jobs, waits for the current one, ends the worker thread. */
  async stop(): Promise<void> {
    this.stopped = true;
    await this.whenIdle();
    const w = this.worker;
    this.worker = null;
    if (w) await w.terminate();
  }

  private async loop(): Promise<void> {
    for (;;) {
      this.again = false;
      if (this.stopped) return;
      const id = await this.claim();
      if (!id) return;
      await this.runJob(id);
    }
  }

  /** Claims the oldest pending analysis. O(log n) with the primary key. */
  private async claim(): Promise<string | null> {
    const res = await this.db.execute<{ revision_id: string }>(sql`
      UPDATE analyses SET status = 'running', progress = 0, started_at = now(), error = NULL
      WHERE revision_id = (
        SELECT a.revision_id FROM analyses a JOIN diagram_revisions r ON r.id = a.revision_id
        WHERE a.status = 'pending' ORDER BY r.created_at LIMIT 1 FOR UPDATE OF a SKIP LOCKED)
      RETURNING revision_id`);
    return res.rows[0]?.revision_id ?? null;
  }

  private async runJob(revisionId: string): Promise<void> {
    const rows = await this.db
      .select({ mesh: diagramRevisions.mesh, curves: diagramRevisions.curves, basepoints: diagramRevisions.basepoints, vertexLabels: diagramRevisions.vertexLabels })
      .from(diagramRevisions)
      .where(eq(diagramRevisions.id, revisionId));
    if (!rows[0]) return;
    let lastWrite = 0;
    const progress: ProgressFn = (fraction) => {
      const now = Date.now();
      if (now - lastWrite < 250) return;
      lastWrite = now;
      void this.db.update(analyses).set({ progress: fraction })
        .where(and(eq(analyses.revisionId, revisionId), eq(analyses.status, 'running')))
        .catch(() => undefined);
    };
    const outcome = this.mode === 'inline' ? analyzeStored(rows[0], progress) : await this.inWorker(revisionId, rows[0], progress);
    await this.finish(revisionId, outcome);
  }

  private async finish(revisionId: string, outcome: AnalysisOutcome): Promise<void> {
    const where = and(eq(analyses.revisionId, revisionId), eq(analyses.status, 'running'));
    if (outcome.ok) {
      await this.db.update(analyses).set({ status: 'done', progress: 1, result: outcome.result, error: null, finishedAt: new Date() }).where(where);
    } else {
      await this.db.update(analyses).set({ status: 'failed', progress: 1, result: null, error: outcome.error, finishedAt: new Date() }).where(where);
    }
  }

  private ensureWorker(): Worker {
    if (this.worker) return this.worker;
    const w = new Worker(new URL('./analysis-worker-boot.mjs', import.meta.url), { execArgv: [] });
    w.unref();
    this.worker = w;
    return w;
  }

  /** Runs one job on the worker thread; a crash or timeout fails the job and restarts the thread. */
  private inWorker(id: string, row: Row, progress: ProgressFn): Promise<AnalysisOutcome> {
    const w = this.ensureWorker();
    return new Promise<AnalysisOutcome>((resolve) => {
      const failWith = (message: string) => {
        cleanup();
        if (this.worker === w) this.worker = null;
        void w.terminate();
        resolve({ ok: false, error: { message, problems: [] } });
      };
      const onMessage = (m: WorkerMessage) => {
        if (m.id !== id) return;
        if (m.type === 'progress') progress(m.fraction, m.stage);
        else {
          cleanup();
          resolve(m.outcome);
        }
      };
      const onError = (err: Error) => failWith(`The analysis stopped: ${err.message}`);
      const onExit = (code: number) => failWith(`The analysis worker exited (code ${code}); the diagram may be too large.`);
      const timer = setTimeout(() => failWith(`The analysis took longer than ${Math.round(this.timeoutMs / 1000)} s and was stopped.`), this.timeoutMs);
      timer.unref();
      const cleanup = () => {
        clearTimeout(timer);
        w.off('message', onMessage);
        w.off('error', onError);
        w.off('exit', onExit);
      };
      w.on('message', onMessage);
      w.on('error', onError);
      w.on('exit', onExit);
      const req: WorkerRequest = { id, row: { mesh: row.mesh, curves: row.curves, basepoints: row.basepoints, vertexLabels: row.vertexLabels } };
      w.postMessage(req);
    });
  }
}

const queues = new WeakMap<Db, AnalysisQueue>();

/** The app's analysis queue (one per database handle); started on first use, stopped when the app closes. */
export function analysisQueueFor(deps: Pick<AppDeps, 'db' | 'onClose'>): AnalysisQueue {
  let q = queues.get(deps.db);
  if (!q) {
    const queue = new AnalysisQueue(deps.db);
    q = queue;
    queues.set(deps.db, queue);
    deps.onClose(() => queue.stop());
    void queue.start().catch((err: unknown) => console.error(`[analysis] start failed: ${err instanceof Error ? err.message : String(err)}`));
  }
  return q;
}
