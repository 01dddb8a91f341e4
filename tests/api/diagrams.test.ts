import { sql } from 'drizzle-orm';
import { buildTemplate, writeStl } from '../../geometry/index.js';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  DIAGRAM_PATHS, diagramListResponseSchema, domainCheckResponseSchema, generatorsPageResponseSchema,
  publicShareResponseSchema, revisionListResponseSchema, revisionResponseSchema, savedDomainListResponseSchema,
  type AnalysisResult,
} from '../../server/contract/diagrams.js';
import { decodeInt32Base64, decodeMeshBinary } from '../../server/contract/mesh-binary.js';
import { AnalysisQueue } from '../../server/jobs/analysis-queue.js';
import { createTestApp, makeTeam, testDb } from './helpers.js';
import { binaryParser, createFromTemplate, templateObj, waitForAnalysis } from './diagrams-helpers.js';

const app = createTestApp();
let team: Awaited<ReturnType<typeof makeTeam>>;

beforeAll(async () => {
  team = await makeTeam(app);
});

describe('a lens space diagram from a template', () => {
  let id: string;
  let result: AnalysisResult;

  beforeAll(async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 5, q: 2 }, 'L(5,2)');
    id = d.id;
    expect(d).toMatchObject({ headRevision: 1, genus: 1, curveCount: 1, role: 'editor' });
    const a = await waitForAnalysis(team.viewer.agent, id, 1);
    expect(a.status).toBe('done');
    result = a.result!;
  });

  it('has 5 intersection points, one per generator (Ozsváth–Szabó 2004: genus-1 diagram of L(p,q) meets p times)', () => {
    expect(result.intersections).toHaveLength(5);
    expect(result.floer?.generatorCount).toBe('5');
  });

  it('has 5 rectangles of Euler measure 0 by the corner formula and by Gauss–Bonnet (Lipshitz 2006, §4)', () => {
    expect(result.regions).toHaveLength(5);
    for (const r of result.regions) {
      expect(r.chi).toBe(1);
      expect(r.corners).toBe(4);
      expect(r.eulerMeasure).toBe(0);
      expect(Math.abs(r.geometricEulerMeasure)).toBeLessThan(1e-9);
    }
  });

  it('gives H_1 = Z/5 and HF-hat of rank 5, one generator per spin^c class (Ozsváth–Szabó 2004)', () => {
    expect(result.floer?.h1).toBe('Z/5');
    expect(result.floer?.homology?.rank).toBe(5);
    expect(result.floer?.homology?.bySpinc).toHaveLength(5);
    expect(result.floer?.weaklyAdmissible).toBe(true);
    expect(result.floer?.nice).toBe(true);
  });

  it('maps every face to a region in the compact faceRegion array', () => {
    const faceRegion = decodeInt32Base64(result.faceRegion);
    expect(faceRegion.length).toBe(result.stats.faces);
    expect(new Set(faceRegion).size).toBe(5);
  });

  it('shows the analysis fields in the library row', async () => {
    const res = await team.viewer.agent.get(DIAGRAM_PATHS.list(team.workspace.id));
    const row = diagramListResponseSchema.parse(res.body).diagrams.find((d) => d.id === id)!;
    expect(row).toMatchObject({ h1: 'Z/5', generatorCount: '5', intersectionCount: 5, nice: true, weaklyAdmissible: true, analysisStatus: 'done' });
    expect(row.createdBy.name).toBe('Editor');
  });

  it('lists generators with distinct spin^c classes (Ozsváth–Szabó 2004: each generator of L(p,q) is its own class)', async () => {
    const res = await team.viewer.agent.get(DIAGRAM_PATHS.generators(id, 1)).query({ offset: 0, limit: 10 });
    expect(res.status).toBe(200);
    const page = generatorsPageResponseSchema.parse(res.body);
    expect(page.total).toBe('5');
    expect(new Set(page.generators.map((g) => g.spinc)).size).toBe(5);
  });

  it('serves the mesh as an immutable QDM1 binary with ETag and 304', async () => {
    const res = await team.viewer.agent.get(DIAGRAM_PATHS.mesh(id, 1)).buffer(true).parse(binaryParser);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('application/octet-stream');
    expect(res.headers['cache-control']).toContain('immutable');
    const mesh = decodeMeshBinary(res.body as Buffer);
    expect(mesh.positions.length).toBe(3 * result.stats.vertices);
    expect(mesh.triangles.length).toBe(3 * result.stats.faces);
    expect(mesh.curves.map((c) => c.family).sort()).toEqual(['alpha', 'beta']);
    const again = await team.viewer.agent.get(DIAGRAM_PATHS.mesh(id, 1)).set('If-None-Match', res.headers.etag);
    expect(again.status).toBe(304);
  });

  it('exports OBJ, PLY, OFF and STL as downloads', async () => {
    for (const format of ['obj', 'ply', 'off', 'stl'] as const) {
      const res = await team.viewer.agent.get(DIAGRAM_PATHS.export(id, 1, format)).buffer(true).parse(binaryParser);
      expect(res.status).toBe(200);
      expect(res.headers['content-disposition']).toContain(`.${format}`);
      expect((res.body as Buffer).length).toBeGreaterThan(100);
    }
  });
});

describe('uploads', () => {
  it('accepts an OBJ written from a template and analyses it like the template (H_1(L(3,1)) = Z/3, Ozsváth–Szabó 2004)', async () => {
    const res = await team.editor.agent.post(DIAGRAM_PATHS.upload(team.workspace.id))
      .field('name', 'Uploaded L(3,1)').attach('file', Buffer.from(templateObj({ kind: 'lens', p: 3, q: 1 })), 'lens31.obj');
    expect(res.status).toBe(201);
    const a = await waitForAnalysis(team.editor.agent, res.body.diagram.id, 1);
    expect(a.result?.floer?.h1).toBe('Z/3');
  });

  it('rejects a broken OBJ with 422 invalid_file naming the line', async () => {
    const lines = templateObj({ kind: 'lens', p: 3, q: 1 }).split('\n');
    const at = lines.findIndex((l) => l.startsWith('f '));
    lines[at] = 'f 1 2 99999999';
    const res = await team.editor.agent.post(DIAGRAM_PATHS.upload(team.workspace.id))
      .field('name', 'Broken').attach('file', Buffer.from(lines.join('\n')), 'broken.obj');
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('invalid_file');
    expect(res.body.error.details[0].line).toBe(at + 1);
  });

  it('rejects an upload without a file with 400 validation', async () => {
    const res = await team.editor.agent.post(DIAGRAM_PATHS.upload(team.workspace.id)).field('name', 'Nothing');
    expect(res.status).toBe(400);
  });
});

describe('revisions', () => {
  it('refuses an edit on a stale base revision with 409 conflict', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    const ok = await team.editor.agent.post(DIAGRAM_PATHS.edits(d.id)).send({ baseRevision: 1, operation: { type: 'smooth', iterations: 1 } });
    expect(ok.status).toBe(201);
    const stale = await team.owner.agent.post(DIAGRAM_PATHS.edits(d.id)).send({ baseRevision: 1, operation: { type: 'smooth', iterations: 1 } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.error.message).toContain('revision 2 is now current');
  });

  it('answers 422 invalid_operation for a curve that does not exist', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    const res = await team.editor.agent.post(DIAGRAM_PATHS.edits(d.id))
      .send({ baseRevision: 1, operation: { type: 'delete-curve', curve: { family: 'alpha', index: 4 } } });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('invalid_operation');
    expect(res.body.error.message).toContain('alpha_5');
  });

  it('restores an old revision as a new one and keeps the history', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    const first = await waitForAnalysis(team.editor.agent, d.id, 1);
    await team.editor.agent.post(DIAGRAM_PATHS.edits(d.id)).send({ baseRevision: 1, operation: { type: 'subdivide', method: 'midpoint' } }).expect(201);
    const res = await team.editor.agent.post(DIAGRAM_PATHS.restore(d.id)).send({ revision: 1, baseRevision: 2 });
    expect(res.status).toBe(201);
    const body = revisionResponseSchema.parse(res.body);
    expect(body.revision).toMatchObject({ number: 3, parentNumber: 2, operation: { type: 'restore', revision: 1 } });
    expect(body.diagram.headRevision).toBe(3);
    const history = revisionListResponseSchema.parse((await team.viewer.agent.get(DIAGRAM_PATHS.revisions(d.id))).body).revisions;
    expect(history.map((r) => r.number)).toEqual([3, 2, 1]);
    expect(history[0].authorName).toBe('Editor');
    const restored = await waitForAnalysis(team.viewer.agent, d.id, 3);
    expect(restored.result?.stats).toEqual(first.result?.stats);
  });

  it('a Dehn twist of beta along alpha keeps the 3-manifold: H_1(L(3,1)) = Z/3, HF-hat rank 3 (twists along alpha extend over the alpha handlebody, Farb–Margalit 2012 ch. 3; Ozsváth–Szabó 2004)', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    const res = await team.editor.agent.post(DIAGRAM_PATHS.edits(d.id))
      .send({ baseRevision: 1, operation: { type: 'twist', curve: { family: 'beta', index: 0 }, along: { family: 'alpha', index: 0 } } });
    expect(res.status).toBe(201);
    expect(res.body.revision.message).toContain('Dehn twist of beta_1 along alpha_1');
    const a = await waitForAnalysis(team.viewer.agent, d.id, 2);
    expect(a.result?.floer?.h1).toBe('Z/3');
    expect(a.result?.intersections).toHaveLength(3);
    expect(a.result?.floer?.homology?.rank).toBe(3);
  });

  it('subdivision keeps the invariants: H_1(L(3,1)) = Z/3 and every region still a rectangle (Lipshitz 2006)', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    await team.editor.agent.post(DIAGRAM_PATHS.edits(d.id)).send({ baseRevision: 1, operation: { type: 'subdivide', method: 'midpoint' } }).expect(201);
    const a = await waitForAnalysis(team.viewer.agent, d.id, 2);
    expect(a.result?.floer?.h1).toBe('Z/3');
    expect(a.result?.regions.every((r) => r.eulerMeasure === 0)).toBe(true);
  });
});

describe('domains', () => {
  let id: string;
  let result: AnalysisResult;
  beforeAll(async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 's1xs2', genus: 1 }, 'S1xS2');
    id = d.id;
    result = (await waitForAnalysis(team.editor.agent, id, 1)).result!;
  });

  it('finds μ = 1 for a bigon on S^1×S^2 (Lipshitz 2006: e = 1/2, n_x = n_y = 1/4)', async () => {
    const bigon = result.regions.find((r) => r.corners === 2 && r.chi === 1)!;
    const res = await team.viewer.agent.post(DIAGRAM_PATHS.domainCheck(id, 1)).send({ coefficients: { [bigon.id]: 1 } });
    expect(res.status).toBe(200);
    const c = domainCheckResponseSchema.parse(res.body);
    expect(c).toMatchObject({ isDomain: true, eulerMeasure: '1/2', nx: '1/4', ny: '1/4', maslovIndex: '1', positive: true });
  });

  it('gives HF-hat(S^1×S^2) rank 2 with a periodic domain (Ozsváth–Szabó 2004)', () => {
    expect(result.floer?.homology?.rank).toBe(2);
    expect(result.floer?.b1).toBe(1);
    expect(result.floer?.periodicDomains).toHaveLength(1);
  });

  it('saves, lists and deletes a named domain', async () => {
    const bigon = result.regions.find((r) => r.corners === 2)!;
    const res = await team.editor.agent.post(DIAGRAM_PATHS.domains(id)).send({ name: 'bigon', revision: 1, coefficients: { [bigon.id]: 1 } });
    expect(res.status).toBe(201);
    const list = savedDomainListResponseSchema.parse((await team.viewer.agent.get(DIAGRAM_PATHS.domains(id))).body).domains;
    expect(list.map((d) => d.name)).toEqual(['bigon']);
    await team.editor.agent.delete(DIAGRAM_PATHS.domain(id, res.body.domain.id)).expect(204);
  });

  it('answers 400 for a region that does not exist', async () => {
    const res = await team.viewer.agent.post(DIAGRAM_PATHS.domainCheck(id, 1)).send({ coefficients: { 999: 1 } });
    expect(res.status).toBe(400);
  });
  it('removes the empty bigon as an edit: alpha and beta become disjoint, which is not weakly admissible (Ozsváth–Szabó 2004)', async () => {
    const bigon = result.regions.find((r) => r.corners === 2 && r.chi === 1 && r.basepoints.length === 0)!;
    const res = await team.editor.agent.post(DIAGRAM_PATHS.edits(id)).send({ baseRevision: 1, operation: { type: 'remove-bigon', region: bigon.id } });
    expect(res.status).toBe(201);
    const a = await waitForAnalysis(team.viewer.agent, id, 2);
    expect(a.result?.intersections).toHaveLength(0);
    expect(a.result?.floer?.weaklyAdmissible).toBe(false);
  });

  it('refuses to remove a region that is not an empty bigon, with the reason (422)', async () => {
    const annulus = result.regions.find((r) => r.basepoints.length > 0)!;
    const res = await team.editor.agent.post(DIAGRAM_PATHS.edits(id)).send({ baseRevision: 2, operation: { type: 'remove-bigon', region: annulus.id } });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('invalid_operation');
  });

  it('smooths the curves as a new revision with the same invariants (common practice: curve smoothing is an isotopy)', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    await team.editor.agent.post(DIAGRAM_PATHS.edits(d.id)).send({ baseRevision: 1, operation: { type: 'smooth-curves', iterations: 5 } }).expect(201);
    const a = await waitForAnalysis(team.viewer.agent, d.id, 2);
    expect(a.result?.floer?.h1).toBe('Z/3'); // Ozsváth–Szabó 2004: H_1(L(3,1)) = Z/3
    expect(a.result?.intersections).toHaveLength(3);
  });
});

describe('library housekeeping', () => {
  it('renames, duplicates (with the analysis copied), deletes to the trash and undeletes', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 's3', genus: 1 }, 'Sphere');
    await waitForAnalysis(team.editor.agent, d.id, 1);
    const renamed = await team.editor.agent.patch(DIAGRAM_PATHS.one(d.id)).send({ name: 'Round sphere' });
    expect(renamed.body.diagram.name).toBe('Round sphere');
    const dup = await team.editor.agent.post(DIAGRAM_PATHS.duplicate(d.id)).send({});
    expect(dup.status).toBe(201);
    expect(dup.body.diagram).toMatchObject({ name: 'Round sphere (copy)', analysisStatus: 'done', h1: '0' });
    await team.editor.agent.delete(DIAGRAM_PATHS.one(d.id)).expect(204);
    expect((await team.viewer.agent.get(DIAGRAM_PATHS.one(d.id))).status).toBe(404);
    const trash = diagramListResponseSchema.parse((await team.viewer.agent.get(DIAGRAM_PATHS.list(team.workspace.id)).query({ deleted: 'true' })).body);
    expect(trash.diagrams.map((x) => x.id)).toContain(d.id);
    await team.editor.agent.post(DIAGRAM_PATHS.undelete(d.id)).expect(200);
    expect((await team.viewer.agent.get(DIAGRAM_PATHS.one(d.id))).status).toBe(200);
  });
});

describe('share links', () => {
  it('shows the head revision to anyone with the token until it is revoked', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 5, q: 2 }, 'Shared');
    await waitForAnalysis(team.editor.agent, d.id, 1);
    const created = await team.editor.agent.post(DIAGRAM_PATHS.shares(d.id)).send({});
    expect(created.status).toBe(201);
    const { token, url, share } = created.body;
    expect(url).toContain(token);
    const pub = await team.anonymous.get(DIAGRAM_PATHS.publicShare(token));
    expect(pub.status).toBe(200);
    const body = publicShareResponseSchema.parse(pub.body);
    expect(body.analysis.result?.floer?.h1).toBe('Z/5');
    const mesh = await team.anonymous.get(`/api${body.meshPath.replace(/^\/api/, '')}`).buffer(true).parse(binaryParser);
    expect(decodeMeshBinary(mesh.body as Buffer).triangles.length).toBeGreaterThan(0);
    const list = await team.editor.agent.get(DIAGRAM_PATHS.shares(d.id));
    expect(JSON.stringify(list.body)).not.toContain(token);
    await team.editor.agent.delete(DIAGRAM_PATHS.share(d.id, share.id)).expect(204);
    expect((await team.anonymous.get(DIAGRAM_PATHS.publicShare(token))).status).toBe(404);
  });
});

describe('analysis queue', () => {
  it('picks up an analysis left running by a stopped server when the next server starts', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    await waitForAnalysis(team.editor.agent, d.id, 1);
    // As if the server stopped in the middle of the job.
    await testDb().execute(sql`UPDATE analyses SET status = 'running', result = NULL, progress = 0.3, finished_at = NULL
      WHERE revision_id = (SELECT id FROM diagram_revisions WHERE diagram_id = ${d.id} AND number = 1)`);
    const running = await team.viewer.agent.get(DIAGRAM_PATHS.analysis(d.id, 1));
    expect(running.body).toMatchObject({ status: 'running', result: null });
    createTestApp();
    const a = await waitForAnalysis(team.viewer.agent, d.id, 1);
    expect(a.status).toBe('done');
    expect(a.result?.floer?.h1).toBe('Z/3');
  });

  it('leaves a running job alone while another live server holds its lock, and requeues it once that server is gone', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    await waitForAnalysis(team.editor.agent, d.id, 1);
    const rev = await testDb().execute<{ id: string }>(sql`SELECT id FROM diagram_revisions WHERE diagram_id = ${d.id} AND number = 1`);
    const id = rev.rows[0].id;
    await testDb().execute(sql`UPDATE analyses SET status = 'running', result = NULL WHERE revision_id = ${id}`);
    const other = await testDb().$client.connect(); // the "other server": holds the job's lock
    await other.query('SELECT pg_advisory_lock(7453022, hashtext($1))', [id]);
    const queue = new AnalysisQueue(testDb(), { log: () => undefined });
    await queue.start();
    const status = async () => (await testDb().execute<{ status: string }>(sql`SELECT status FROM analyses WHERE revision_id = ${id}`)).rows[0].status;
    expect(await status()).toBe('running');
    await other.query('SELECT pg_advisory_unlock(7453022, hashtext($1))', [id]); // that server stops
    other.release(true);
    await queue.start();
    await queue.whenIdle();
    await queue.stop();
    expect(await status()).toBe('done');
  });

  it('leaves a job cut short by shutdown pending for the next start, never failed', async () => {
    const d = await createFromTemplate(team.editor.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 });
    await waitForAnalysis(team.editor.agent, d.id, 1);
    const where = sql`revision_id = (SELECT id FROM diagram_revisions WHERE diagram_id = ${d.id} AND number = 1)`;
    await testDb().execute(sql`UPDATE analyses SET status = 'pending', result = NULL, progress = 0 WHERE ${where}`);
    const queue = new AnalysisQueue(testDb(), { log: () => undefined });
    queue.kick();
    await queue.stop();
    const rows = await testDb().execute<{ status: string }>(sql`SELECT status FROM analyses WHERE ${where}`);
    expect(rows.rows[0].status).toBe('pending');
  });
});

describe('a bare surface', () => {
  it('uploads as STL and fails its analysis with the reason in words (a genus-1 surface needs g = 1 pair of curves)', async () => {
    const d = buildTemplate({ kind: 'lens', p: 3, q: 1 });
    if (!d.ok) throw new Error('template');
    const res = await team.editor.agent.post(DIAGRAM_PATHS.upload(team.workspace.id))
      .field('name', 'Bare torus').attach('file', Buffer.from(writeStl(d.value.mesh)), 'torus.stl');
    expect(res.status).toBe(201);
    const a = await waitForAnalysis(team.editor.agent, res.body.diagram.id, 1);
    expect(a.status).toBe('failed');
    expect(a.error?.message).toContain('genus 1');
    expect(a.error?.problems?.length).toBeGreaterThan(0);
  });
});
