/**
 * The analysis queue: a small in-process queue persisted in the `analyses` table (one row per revision,
 * status pending → running → done | failed). Jobs are claimed with `FOR UPDATE SKIP LOCKED`, so several
 * server processes may share one database. Computation runs in a worker thread (geometry-pool.ts) so big
 * meshes never block the HTTP event loop; progress goes to analyses.progress. While a job runs, its process
 * holds a session-level advisory lock on the revision (taken in the claiming statement itself); at start,
 * rows left `running` whose lock nobody holds (their process stopped) go back to `pending`, and everything
 * pending is picked up again.
 */
import { and, eq } from 'drizzle-orm';
import type pg from 'pg';
import type { Db } from '../db/client.js';
import { analyses, analysisSummaries, diagramRevisions } from '../db/schema.js';
import type { AppDeps } from '../deps.js';
import type { AnalysisOutcome, ProgressFn } from './compute-analysis.js';
import { GeometryWorker } from './geometry-pool.js';

export interface AnalysisQueueOptions {
  /** 'worker' (default) computes in a worker thread; 'inline' on the calling thread (scripts). */
  mode?: 'worker' | 'inline';
  /** A job running longer than this fails (the worker is restarted). */
  jobTimeoutMs?: number;
  log?: (msg: string) => void;
}

/** Advisory lock namespace of running analyses (key 2 is hashtext(revision id)). */
const LOCK_NS = 7453022;

/** Inserts the pending analysis row of a revision (idempotent). Call inside the revision's transaction. */
export async function insertPendingAnalysis(db: Pick<Db, 'insert'>, revisionId: string): Promise<void> {
  await db.insert(analyses).values({ revisionId, status: 'pending', progress: 0 }).onConflictDoNothing();
}

export class AnalysisQueue {
  private readonly geo: GeometryWorker;
  private loopPromise: Promise<void> | null = null;
  private stopped = false;
  private again = false;
  private readonly log: (msg: string) => void;

  constructor(private readonly db: Db, opts: AnalysisQueueOptions = {}) {
    this.geo = new GeometryWorker({ inline: opts.mode === 'inline', timeoutMs: opts.jobTimeoutMs ?? 10 * 60_000 });
    this.log = opts.log ?? ((m) => console.log(m));
  }

  /** Requeues analyses left running by a stopped process, then works through everything pending. */
  async start(): Promise<void> {
    const client = await this.db.$client.connect();
    try {
      const running = await client.query<{ revision_id: string }>(`SELECT revision_id FROM analyses WHERE status = 'running'`);
      for (const { revision_id: id } of running.rows) {
        const free = await client.query<{ ok: boolean }>('SELECT pg_try_advisory_lock($1, hashtext($2)) AS ok', [LOCK_NS, id]);
        if (!free.rows[0]?.ok) continue; // a live process is computing it
        await client.query(`UPDATE analyses SET status = 'pending', progress = 0, started_at = NULL WHERE revision_id = $1 AND status = 'running'`, [id]);
        await client.query('SELECT pg_advisory_unlock($1, hashtext($2))', [LOCK_NS, id]);
      }
    } finally {
      client.release();
    }
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

  /**
   * Stops claiming jobs and ends the worker thread at once; a job cut short goes back to pending, so the
   * next start computes it (shutdown never waits for a long analysis).
   */
  async stop(): Promise<void> {
    this.stopped = true;
    await this.geo.close();
    await this.whenIdle();
  }

  private async loop(): Promise<void> {
    for (;;) {
      this.again = false;
      if (this.stopped) return;
      const client = await this.db.$client.connect();
      try {
        const id = await this.claim(client);
        if (!id) return;
        try {
          await this.runJob(id);
        } finally {
          await client.query('SELECT pg_advisory_unlock($1, hashtext($2))', [LOCK_NS, id]);
        }
      } finally {
        client.release();
      }
    }
  }

  /**
   * Claims the oldest pending analysis on `client` and takes its advisory lock in the same statement, so no
   * other process ever sees it running without the lock. O(log n) with the primary key.
   */
  private async claim(client: pg.PoolClient): Promise<string | null> {
    const res = await client.query<{ revision_id: string }>(`
      UPDATE analyses SET status = 'running', progress = 0, started_at = now(), error = NULL
      WHERE revision_id = (
        SELECT a.revision_id FROM analyses a JOIN diagram_revisions r ON r.id = a.revision_id
        WHERE a.status = 'pending' ORDER BY r.created_at LIMIT 1 FOR UPDATE OF a SKIP LOCKED)
      RETURNING revision_id, pg_advisory_lock(${LOCK_NS}, hashtext(revision_id::text)) AS locked`);
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
    const outcome: AnalysisOutcome | null = await this.geo.run({ type: 'analyze', row: rows[0] }, progress)
      .catch((e: Error) => (this.stopped ? null : { ok: false as const, error: { message: e.message, problems: [] } }));
    if (outcome) await this.finish(revisionId, outcome);
    else {
      await this.db.update(analyses).set({ status: 'pending', progress: 0, startedAt: null })
        .where(and(eq(analyses.revisionId, revisionId), eq(analyses.status, 'running')));
    }
  }

  private async finish(revisionId: string, outcome: AnalysisOutcome): Promise<void> {
    const where = and(eq(analyses.revisionId, revisionId), eq(analyses.status, 'running'));
    if (outcome.ok) {
      const r = outcome.result;
      await this.db.transaction(async (tx) => {
        const done = await tx.update(analyses).set({ status: 'done', progress: 1, result: r, error: null, finishedAt: new Date() })
          .where(where).returning({ id: analyses.revisionId });
        if (!done.length) return;
        const summary = {
          intersectionCount: r.intersections.length, generatorCount: r.floer?.generatorCount ?? null, nice: r.floer?.nice ?? null,
          weaklyAdmissible: r.floer?.weaklyAdmissible ?? null, h1: r.floer?.h1 ?? null,
        };
        await tx.insert(analysisSummaries).values({ revisionId, ...summary })
          .onConflictDoUpdate({ target: analysisSummaries.revisionId, set: summary });
      });
    } else {
      await this.db.update(analyses).set({ status: 'failed', progress: 1, result: null, error: outcome.error, finishedAt: new Date() }).where(where);
    }
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

const workers = new WeakMap<Db, GeometryWorker>();

/** The app's worker for interactive geometry (templates, uploads, edits, exports), apart from analyses. */
export function geometryWorkerFor(deps: Pick<AppDeps, 'db' | 'onClose'>): GeometryWorker {
  let w = workers.get(deps.db);
  if (!w) {
    const worker = new GeometryWorker({ timeoutMs: 5 * 60_000 });
    w = worker;
    workers.set(deps.db, worker);
    deps.onClose(() => worker.close());
  }
  return w;
}
