/**
 * Domain checks (synchronous, from the cached analysis; Ozsváth–Szabó 2004 §2.4, Lipshitz 2006 §4) and
 * named saved domains of a diagram.
 */
import { and, eq, sql } from 'drizzle-orm';
import { checkDomain } from '../../../geometry/index.js';
import type {
  AnalysisResult, CreateDomainRequest, DomainCheckRequest, DomainCheckResponse, DomainCoefficients, SavedDomain,
} from '../../contract/diagrams.js';
import type { Db } from '../../db/client.js';
import { diagramRevisions, domains } from '../../db/schema.js';
import { HttpError } from '../../http/errors.js';
import { combinatorialFromResult } from '../../jobs/compute-analysis.js';
import { isUuid } from '../../auth/index.js';

/** Dense coefficient array (one per region) from the sparse request map; 400 for unknown regions. */
export function denseCoefficients(coeffs: DomainCoefficients, regions: number): number[] {
  const out = new Array<number>(regions).fill(0);
  for (const [k, v] of Object.entries(coeffs)) {
    const id = Number(k);
    if (!(id >= 0 && id < regions)) throw new HttpError('validation', `coefficients: region ${k} does not exist (regions are 0 to ${regions - 1}).`);
    out[id] = v;
  }
  return out;
}

function checkPoints(pts: number[] | undefined, n: number, name: string): void {
  for (const p of pts ?? []) {
    if (p >= n) throw new HttpError('validation', `${name}: intersection ${p} does not exist (there are ${n}).`);
  }
}

/** Runs checkDomain on the cached analysis. O(points + regions). */
export function runDomainCheck(result: AnalysisResult, input: DomainCheckRequest): DomainCheckResponse {
  const comb = combinatorialFromResult(result);
  const coeffs = denseCoefficients(input.coefficients, comb.regions.length);
  checkPoints(input.from, comb.points.length, 'from');
  checkPoints(input.to, comb.points.length, 'to');
  const c = checkDomain(comb, coeffs, { ...(input.from ? { from: input.from } : {}), ...(input.to ? { to: input.to } : {}) });
  return {
    isDomain: c.isDomain,
    reason: c.reason,
    from: c.from,
    to: c.to,
    undetermined: c.undetermined ?? null,
    corners: c.corners,
    periodic: c.corners.length > 0 ? c.corners.every((j) => j === 0) : true,
    eulerMeasure: c.eulerMeasure,
    geometricEulerMeasure: c.geometricEulerMeasure,
    nx: c.nx,
    ny: c.ny,
    nBasepoints: c.nz.map((n, i) => ({ name: result.basepoints[i]?.name ?? `z_${i + 1}`, n })),
    maslovIndex: c.maslovIndex,
    positive: c.positive,
  };
}

type DomainRow = {
  id: string; name: string; revision: number; coefficients: DomainCoefficients; from_points: number[] | null; to_points: number[] | null;
  created_by: string | null; created_by_name: string | null; created_at: Date;
};

const toSaved = (r: DomainRow): SavedDomain => ({
  id: r.id,
  name: r.name,
  revision: r.revision,
  coefficients: r.coefficients,
  from: r.from_points,
  to: r.to_points,
  createdBy: r.created_by ? { id: r.created_by, name: r.created_by_name ?? '' } : { id: '00000000-0000-4000-8000-000000000000', name: 'Former member' },
  createdAt: (r.created_at instanceof Date ? r.created_at : new Date(r.created_at)).toISOString(),
});

async function selectDomains(db: Db, where: ReturnType<typeof sql>): Promise<SavedDomain[]> {
  const res = await db.execute<DomainRow>(sql`
    SELECT d.id, d.name, r.number AS revision, d.coefficients, d.from_points, d.to_points, d.created_by, u.name AS created_by_name, d.created_at
    FROM domains d JOIN diagram_revisions r ON r.id = d.revision_id LEFT JOIN users u ON u.id = d.created_by
    WHERE ${where} ORDER BY d.created_at, d.name`);
  return res.rows.map(toSaved);
}

export function listDomains(db: Db, diagramId: string): Promise<SavedDomain[]> {
  return selectDomains(db, sql`d.diagram_id = ${diagramId}`);
}

/** Saves a named domain on a revision (coefficients are checked against that revision's regions). */
export async function saveDomain(db: Db, diagramId: string, userId: string, input: CreateDomainRequest, revisionRegions: number, revisionPoints: number): Promise<SavedDomain> {
  denseCoefficients(input.coefficients, revisionRegions);
  checkPoints(input.from, revisionPoints, 'from');
  checkPoints(input.to, revisionPoints, 'to');
  const rev = await db.select({ id: diagramRevisions.id }).from(diagramRevisions)
    .where(and(eq(diagramRevisions.diagramId, diagramId), eq(diagramRevisions.number, input.revision))).limit(1);
  if (!rev[0]) throw new HttpError('not_found', `Revision ${input.revision} does not exist.`);
  const [row] = await db.insert(domains).values({
    diagramId, revisionId: rev[0].id, name: input.name, coefficients: input.coefficients,
    fromPoints: input.from ?? null, toPoints: input.to ?? null, createdBy: userId,
  }).returning({ id: domains.id });
  const [saved] = await selectDomains(db, sql`d.id = ${row.id}`);
  return saved;
}

export async function deleteDomain(db: Db, diagramId: string, domainId: unknown): Promise<void> {
  if (!isUuid(domainId)) throw new HttpError('not_found', 'Saved domain not found.');
  const gone = await db.delete(domains).where(and(eq(domains.id, domainId), eq(domains.diagramId, diagramId))).returning({ id: domains.id });
  if (!gone.length) throw new HttpError('not_found', 'Saved domain not found.');
}

