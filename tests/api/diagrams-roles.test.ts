/**
 * Every lab route × owner / editor / viewer / stranger (signed in, not a member) / anonymous, with exact
 * statuses. Rule (common practice, DESIGN.md): viewers read, editors write content, non-members 404,
 * anonymous 401. Routes that change state get a fresh diagram per call.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { DIAGRAM_PATHS } from '../../server/contract/diagrams.js';
import { createTestApp, makeTeam, type Agent } from './helpers.js';
import { createFromTemplate, templateObj, waitForAnalysis } from './diagrams-helpers.js';

const app = createTestApp();
type Team = Awaited<ReturnType<typeof makeTeam>>;
type Who = 'owner' | 'editor' | 'viewer' | 'stranger' | 'anonymous';
const WHO: Who[] = ['owner', 'editor', 'viewer', 'stranger', 'anonymous'];

let team: Team;
/** A diagram with a finished analysis, a saved domain and a share link, for the read-only rows. */
let shared: { id: string; domainId: string; shareId: string; token: string };

const agentOf = (who: Who): Agent => (who === 'anonymous' ? team.anonymous : team[who].agent);

interface Ctx { id: string; domainId: string; shareId: string; token: string; obj: string }

/** A fresh diagram (by the owner) with an analysis, a domain and a share link: for rows that change state. */
async function fresh(): Promise<Ctx> {
  const d = await createFromTemplate(team.owner.agent, team.workspace.id, { kind: 'lens', p: 3, q: 1 }, 'matrix');
  const a = await waitForAnalysis(team.owner.agent, d.id, 1);
  const dom = await team.owner.agent.post(DIAGRAM_PATHS.domains(d.id)).send({ name: 'r1', revision: 1, coefficients: { [a.result!.regions[0].id]: 1 } });
  const sh = await team.owner.agent.post(DIAGRAM_PATHS.shares(d.id)).send({});
  return { id: d.id, domainId: dom.body.domain.id, shareId: sh.body.share.id, token: sh.body.token, obj: '' };
}

type Call = (a: Agent, c: Ctx) => Promise<{ status: number }>;
interface Row { name: string; call: Call; expect: [number, number, number, number, number]; mutates?: boolean; trashed?: boolean }

const READ = [200, 200, 200, 404, 401] as [number, number, number, number, number];
const WRITE = (ok: number) => [ok, ok, 403, 404, 401] as [number, number, number, number, number];
let obj = '';

const ROWS: Row[] = [
  { name: 'GET list', call: (a) => a.get(DIAGRAM_PATHS.list(team.workspace.id)), expect: READ },
  { name: 'POST create', call: (a) => a.post(DIAGRAM_PATHS.create(team.workspace.id)).send({ name: 'x', template: { kind: 's3', genus: 1 } }), expect: WRITE(201) },
  { name: 'POST upload', call: (a) => a.post(DIAGRAM_PATHS.upload(team.workspace.id)).field('name', 'u').attach('file', Buffer.from(obj), 'u.obj'), expect: WRITE(201) },
  { name: 'GET one', call: (a, c) => a.get(DIAGRAM_PATHS.one(c.id)), expect: READ },
  { name: 'PATCH rename', call: (a, c) => a.patch(DIAGRAM_PATHS.one(c.id)).send({ name: 'renamed' }), expect: WRITE(200) },
  { name: 'DELETE', call: (a, c) => a.delete(DIAGRAM_PATHS.one(c.id)), expect: WRITE(204), mutates: true },
  { name: 'POST undelete', call: (a, c) => a.post(DIAGRAM_PATHS.undelete(c.id)), expect: WRITE(200), mutates: true, trashed: true },
  { name: 'POST duplicate', call: (a, c) => a.post(DIAGRAM_PATHS.duplicate(c.id)).send({}), expect: WRITE(201) },
  { name: 'GET revisions', call: (a, c) => a.get(DIAGRAM_PATHS.revisions(c.id)), expect: READ },
  { name: 'GET mesh', call: (a, c) => a.get(DIAGRAM_PATHS.mesh(c.id, 1)), expect: READ },
  { name: 'GET analysis', call: (a, c) => a.get(DIAGRAM_PATHS.analysis(c.id, 1)), expect: READ },
  { name: 'GET generators', call: (a, c) => a.get(DIAGRAM_PATHS.generators(c.id, 1)), expect: READ },
  { name: 'GET export', call: (a, c) => a.get(DIAGRAM_PATHS.export(c.id, 1, 'off')), expect: READ },
  { name: 'POST domain-check', call: (a, c) => a.post(DIAGRAM_PATHS.domainCheck(c.id, 1)).send({ coefficients: { 0: 1 } }), expect: READ },
  { name: 'GET domains', call: (a, c) => a.get(DIAGRAM_PATHS.domains(c.id)), expect: READ },
  { name: 'POST domain', call: (a, c) => a.post(DIAGRAM_PATHS.domains(c.id)).send({ name: 'd', revision: 1, coefficients: { 0: 1 } }), expect: WRITE(201) },
  { name: 'DELETE domain', call: (a, c) => a.delete(DIAGRAM_PATHS.domain(c.id, c.domainId)), expect: WRITE(204), mutates: true },
  { name: 'POST edit', call: (a, c) => a.post(DIAGRAM_PATHS.edits(c.id)).send({ baseRevision: 1, operation: { type: 'smooth', iterations: 1 } }), expect: WRITE(201), mutates: true },
  { name: 'POST restore', call: (a, c) => a.post(DIAGRAM_PATHS.restore(c.id)).send({ revision: 1, baseRevision: 1 }), expect: WRITE(201), mutates: true },
  { name: 'GET shares', call: (a, c) => a.get(DIAGRAM_PATHS.shares(c.id)), expect: [200, 200, 403, 404, 401] },
  { name: 'POST share', call: (a, c) => a.post(DIAGRAM_PATHS.shares(c.id)).send({}), expect: WRITE(201) },
  { name: 'DELETE share', call: (a, c) => a.delete(DIAGRAM_PATHS.share(c.id, c.shareId)), expect: WRITE(204), mutates: true },
  { name: 'GET public share', call: (a, c) => a.get(DIAGRAM_PATHS.publicShare(c.token)), expect: [200, 200, 200, 200, 200] },
  { name: 'GET public share mesh', call: (a, c) => a.get(DIAGRAM_PATHS.publicShareMesh(c.token)), expect: [200, 200, 200, 200, 200] },
];

beforeAll(async () => {
  team = await makeTeam(app);
  obj = templateObj({ kind: 's3', genus: 1 });
  shared = await fresh();
});

describe('lab routes by role', () => {
  for (const row of ROWS) {
    it(`${row.name}: owner ${row.expect[0]}, editor ${row.expect[1]}, viewer ${row.expect[2]}, stranger ${row.expect[3]}, anonymous ${row.expect[4]}`, async () => {
      const got: number[] = [];
      for (const who of WHO) {
        const ctx = row.mutates ? await fresh() : { ...shared, obj };
        if (row.trashed) await team.owner.agent.delete(DIAGRAM_PATHS.one(ctx.id)).expect(204);
        got.push((await row.call(agentOf(who), ctx)).status);
      }
      expect(got).toEqual(row.expect);
    });
  }
});
