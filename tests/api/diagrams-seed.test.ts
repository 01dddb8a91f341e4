import { sql } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import type { AnalysisResult } from '../../server/contract/diagrams.js';
import { seedDemo } from '../../server/seed/demo.js';
import { DEMO_DIAGRAMS, seedDemoDiagrams } from '../../server/seed/diagrams.js';
import { runDomainCheck } from '../../server/routes/domains/domains.service.js';
import { testDb } from './helpers.js';

describe('demo diagrams seed', () => {
  it('creates the demo diagrams once, with analyses done and named domains', { timeout: 120_000 }, async () => {
    const db = testDb();
    const demo = await seedDemo(db, { passwordLogN: 10 });
    await seedDemoDiagrams(db, demo);
    await seedDemoDiagrams(db, demo);
    const rows = await db.execute<{ name: string; head_revision: number; status: string; result: AnalysisResult }>(sql`
      SELECT d.name, d.head_revision, a.status, a.result FROM diagrams d
      JOIN diagram_revisions r ON r.diagram_id = d.id AND r.number = d.head_revision
      JOIN analyses a ON a.revision_id = r.id WHERE d.workspace_id = ${demo.workspaceId} ORDER BY d.name`);
    expect(rows.rows.map((r) => r.name).sort()).toEqual(DEMO_DIAGRAMS.map((d) => d.name).sort());
    expect(rows.rows.every((r) => r.status === 'done')).toBe(true);
    const by = (n: string) => rows.rows.find((r) => r.name === n)!;
    // Ozsváth–Szabó 2004: H_1(L(p,q)) = Z/p and HF-hat(L(p,q)) has rank p.
    expect(by('L(5,2) on the standard torus').result.floer?.h1).toBe('Z/5');
    expect(by('L(7,3)').head_revision).toBe(2);
    expect(by('L(7,3)').result.floer?.homology?.rank).toBe(7);
    // Manolescu–Ozsváth–Sarkar 2009: a 5×5 grid has 5! = 120 generators.
    expect(by('Trefoil grid (5×5)').result.floer?.generatorCount).toBe('120');
    const doms = await db.execute<{ name: string; coefficients: Record<string, number> }>(sql`
      SELECT dm.name, dm.coefficients FROM domains dm JOIN diagrams d ON d.id = dm.diagram_id
      WHERE d.workspace_id = ${demo.workspaceId} AND d.name = 'S1×S2 with two bigons' ORDER BY dm.name`);
    expect(doms.rows.map((d) => d.name)).toEqual(['Bigon of index 1', 'Periodic domain']);
    // Lipshitz 2006: a bigon has Maslov index 1.
    const check = runDomainCheck(by('S1×S2 with two bigons').result, { coefficients: doms.rows[0].coefficients });
    expect(check.maslovIndex).toBe('1');
    expect(runDomainCheck(by('S1×S2 with two bigons').result, { coefficients: doms.rows[1].coefficients }).periodic).toBe(true);
  });
});
