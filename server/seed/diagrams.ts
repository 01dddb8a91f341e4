/**
 * Demo diagrams of the invented Lattice Harbor Topology Group (Kestrel Point Institute), built from
 * templates, authored by the invented demo people, with their analyses computed and a few named domains.
 * Idempotent: a diagram whose name already exists in the workspace (even in the trash) is left alone.
 */
import { and, eq } from 'drizzle-orm';
import { buildTemplate } from '../../geometry/index.js';
import type { AnalysisResult, TemplateSpec } from '../contract/diagrams.js';
import type { Role } from '../contract/workspaces.js';
import type { Db } from '../db/client.js';
import { analyses, diagramRevisions, diagrams } from '../db/schema.js';
import { AnalysisQueue } from '../jobs/analysis-queue.js';
import { appendRevision, createDiagram } from '../routes/diagrams/diagrams.service.js';
import { applyOperation } from '../routes/diagrams/operations.js';
import { storeDiagram } from '../routes/diagrams/storage.js';
import { saveDomain } from '../routes/domains/domains.service.js';
import type { DemoSeed } from './demo.js';

interface DemoDiagram {
  name: string;
  description: string;
  author: Role;
  template: TemplateSpec;
  /** A later revision by another person, to give the history something to show. */
  edit?: { by: Role; message: string; operation: Parameters<typeof applyOperation>[1] };
  /** Named domains chosen from the analysed regions. */
  domains?: { name: string; by: Role; pick: (r: AnalysisResult) => Record<string, number> | null }[];
}

/** The bigon without a basepoint, coefficient 1 (Lipshitz 2006: μ = 1). */
const bigon = (r: AnalysisResult) => {
  const b = r.regions.find((x) => x.corners === 2 && x.chi === 1 && x.basepoints.length === 0);
  return b ? { [b.id]: 1 } : null;
};
/** The first periodic domain of the analysis (Ozsváth–Szabó 2004: H_2(S^1×S^2) = Z). */
const periodic = (r: AnalysisResult) => {
  const p = r.floer?.periodicDomains[0];
  return p ? Object.fromEntries(p.coefficients.map((c, i) => [String(i), c]).filter(([, c]) => c !== 0)) : null;
};

export const DEMO_DIAGRAMS: readonly DemoDiagram[] = [
  {
    name: 'L(5,2) on the standard torus', author: 'owner', template: { kind: 'lens', p: 5, q: 2 },
    description: 'Genus-1 diagram of the lens space L(5,2): alpha a meridian, beta a (5,2) curve. Five rectangles, five generators.',
  },
  {
    name: 'Genus-2 sphere diagram', author: 'editor', template: { kind: 's3', genus: 2 },
    description: 'The standard genus-2 diagram of S^3: alpha_i meets beta_i once and misses beta_j.',
  },
  {
    name: 'S1×S2 with two bigons', author: 'editor', template: { kind: 's1xs2', genus: 1 },
    description: 'beta is a finger-moved copy of alpha, so the diagram is weakly admissible; two bigons between the two generators.',
    domains: [
      { name: 'Bigon of index 1', by: 'editor', pick: bigon },
      { name: 'Periodic domain', by: 'owner', pick: periodic },
    ],
  },
  {
    name: 'Trefoil grid (5×5)', author: 'owner', template: { kind: 'grid', x: [1, 2, 3, 4, 0], o: [4, 0, 1, 2, 3] },
    description: 'Grid diagram of the trefoil on the torus (X markings z, O markings w); 120 generators.',
  },
  {
    name: 'L(7,3)', author: 'owner', template: { kind: 'lens', p: 7, q: 3 },
    description: 'Seminar example: seven generators, each in its own spin^c structure.',
    edit: { by: 'editor', message: 'Midpoint subdivision for a smoother picture', operation: { type: 'subdivide', method: 'midpoint' } },
  },
];

/** Creates the demo diagrams that are missing, computes pending analyses and saves their domains. */
export async function seedDemoDiagrams(db: Db, demo: DemoSeed, log: (m: string) => void = () => undefined): Promise<void> {
  const created: { d: DemoDiagram; id: string }[] = [];
  for (const d of DEMO_DIAGRAMS) {
    const [existing] = await db.select({ id: diagrams.id }).from(diagrams)
      .where(and(eq(diagrams.workspaceId, demo.workspaceId), eq(diagrams.name, d.name))).limit(1);
    if (existing) continue;
    const built = buildTemplate(d.template);
    if (!built.ok) {
      log(`[seed] skipped “${d.name}”: ${built.errors[0]?.message}`);
      continue;
    }
    const id = await createDiagram(db, {
      workspaceId: demo.workspaceId, userId: demo.userIds[d.author], name: d.name, description: d.description,
      stored: storeDiagram(built.value), operation: { type: 'template', template: d.template }, message: 'Created from a template',
    });
    if (d.edit) {
      const next = applyOperation(built.value, d.edit.operation);
      if (next.ok) {
        await appendRevision(db, { diagramId: id, base: 1, userId: demo.userIds[d.edit.by], stored: storeDiagram(next.value), operation: d.edit.operation, message: d.edit.message });
      }
    }
    created.push({ d, id });
  }
  if (!created.length) return;
  const queue = new AnalysisQueue(db, { mode: 'inline', log });
  queue.kick();
  await queue.whenIdle();
  for (const { d, id } of created) {
    for (const dom of d.domains ?? []) {
      const [row] = await db.select({ result: analyses.result }).from(analyses)
        .innerJoin(diagramRevisions, eq(diagramRevisions.id, analyses.revisionId))
        .where(and(eq(diagramRevisions.diagramId, id), eq(diagramRevisions.number, 1), eq(analyses.status, 'done'))).limit(1);
      const result = row?.result as AnalysisResult | undefined;
      const coefficients = result ? dom.pick(result) : null;
      if (!result || !coefficients) continue;
      await saveDomain(db, id, demo.userIds[dom.by], { name: dom.name, revision: 1, coefficients }, result.regions.length, result.intersections.length);
    }
  }
  log(`[seed] ${created.length} demo diagrams`);
}
