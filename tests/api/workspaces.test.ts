import { describe, expect, it } from 'vitest';
import {
  memberListResponseSchema,
  workspaceListResponseSchema,
  workspaceResponseSchema,
} from '../../server/contract/workspaces.js';
import { addMember, createTestApp, makeTeam, makeUser, makeWorkspace } from './helpers.js';

const app = createTestApp();

describe('workspaces', () => {
  it('creates a workspace with 201 and makes the creator its owner', async () => {
    const { agent } = await makeUser(app);
    const res = await agent.post('/api/workspaces').send({ name: '  Knot Floer reading group ', description: 'Tuesdays' });
    expect(res.status).toBe(201);
    expect(workspaceResponseSchema.parse(res.body).workspace).toMatchObject({
      name: 'Knot Floer reading group',
      description: 'Tuesdays',
      role: 'owner',
    });
  });

  it('lists only my workspaces, with my role and the member count', async () => {
    const me = await makeUser(app);
    const other = await makeUser(app);
    const mine = await makeWorkspace(me.agent, { name: 'A mine' });
    const shared = await makeWorkspace(other.agent, { name: 'B shared' });
    await makeWorkspace(other.agent, { name: 'C not mine' });
    await addMember(app, shared.id, me.user.id, 'viewer');
    const res = await me.agent.get('/api/workspaces');
    expect(res.status).toBe(200);
    const list = workspaceListResponseSchema.parse(res.body).workspaces;
    expect(list.map((w) => [w.id, w.role, w.memberCount])).toEqual([
      [mine.id, 'owner', 1],
      [shared.id, 'viewer', 2],
    ]);
  });

  it('reads one workspace for a member and renames it for the owner', async () => {
    const { agent } = await makeUser(app);
    const ws = await makeWorkspace(agent, { name: 'Old name' });
    expect((await agent.get(`/api/workspaces/${ws.id}`)).body.workspace).toMatchObject({ id: ws.id, name: 'Old name', role: 'owner' });
    const res = await agent.patch(`/api/workspaces/${ws.id}`).send({ name: 'New name', description: 'Lens spaces' });
    expect(res.status).toBe(200);
    expect(res.body.workspace).toMatchObject({ name: 'New name', description: 'Lens spaces' });
  });

  it('rejects an empty name and an empty update with 400 validation', async () => {
    const { agent } = await makeUser(app);
    expect((await agent.post('/api/workspaces').send({ name: '   ' })).status).toBe(400);
    const ws = await makeWorkspace(agent);
    expect((await agent.patch(`/api/workspaces/${ws.id}`).send({})).status).toBe(400);
  });

  it('answers 404 for a malformed or unknown workspace id', async () => {
    const { agent } = await makeUser(app);
    expect((await agent.get('/api/workspaces/not-a-uuid')).status).toBe(404);
    expect((await agent.get('/api/workspaces/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });
});

describe('members', () => {
  it('lists members with name, email, role and joinedAt', async () => {
    const { workspace, owner, editor, viewer } = await makeTeam(app);
    const res = await viewer.agent.get(`/api/workspaces/${workspace.id}/members`);
    expect(res.status).toBe(200);
    const members = memberListResponseSchema.parse(res.body).members;
    expect(members.map((m) => [m.userId, m.role])).toEqual([
      [owner.user.id, 'owner'],
      [editor.user.id, 'editor'],
      [viewer.user.id, 'viewer'],
    ]);
    expect(members[0].email).toBe(owner.email);
  });

  it('lets the owner change a role', async () => {
    const { workspace, owner, viewer } = await makeTeam(app);
    const res = await owner.agent.patch(`/api/workspaces/${workspace.id}/members/${viewer.user.id}`).send({ role: 'editor' });
    expect(res.status).toBe(200);
    expect(res.body.member).toMatchObject({ userId: viewer.user.id, role: 'editor' });
  });

  it('refuses to demote the last owner with 409 conflict', async () => {
    const { workspace, owner } = await makeTeam(app);
    const res = await owner.agent.patch(`/api/workspaces/${workspace.id}/members/${owner.user.id}`).send({ role: 'editor' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
  });

  it('lets an owner step down once there is a second owner', async () => {
    const { workspace, owner, editor } = await makeTeam(app);
    await owner.agent.patch(`/api/workspaces/${workspace.id}/members/${editor.user.id}`).send({ role: 'owner' }).expect(200);
    const res = await owner.agent.patch(`/api/workspaces/${workspace.id}/members/${owner.user.id}`).send({ role: 'viewer' });
    expect(res.status).toBe(200);
    expect(res.body.member.role).toBe('viewer');
  });

  it('refuses to remove the last owner with 409 conflict', async () => {
    const { workspace, owner } = await makeTeam(app);
    expect((await owner.agent.delete(`/api/workspaces/${workspace.id}/members/${owner.user.id}`)).status).toBe(409);
  });

  it('lets a member leave and the owner remove a member', async () => {
    const { workspace, owner, editor, viewer } = await makeTeam(app);
    expect((await viewer.agent.delete(`/api/workspaces/${workspace.id}/members/${viewer.user.id}`)).status).toBe(204);
    expect((await viewer.agent.get(`/api/workspaces/${workspace.id}`)).status).toBe(404);
    expect((await owner.agent.delete(`/api/workspaces/${workspace.id}/members/${editor.user.id}`)).status).toBe(204);
    const members = (await owner.agent.get(`/api/workspaces/${workspace.id}/members`)).body.members as unknown[];
    expect(members).toHaveLength(1);
  });

  it('answers 404 when changing someone who is not a member', async () => {
    const { workspace, owner, stranger } = await makeTeam(app);
    const res = await owner.agent.patch(`/api/workspaces/${workspace.id}/members/${stranger.user.id}`).send({ role: 'viewer' });
    expect(res.status).toBe(404);
  });
});

/**
 * Role matrix (common practice: least privilege). Each workspace route × each caller → exact status.
 * Columns: owner, editor, viewer, stranger (signed in, not a member: 404 hides existence), anonymous (401).
 */
type Caller = 'owner' | 'editor' | 'viewer' | 'stranger' | 'anonymous';
const CALLERS: Caller[] = ['owner', 'editor', 'viewer', 'stranger', 'anonymous'];
interface Row {
  route: string;
  method: 'get' | 'post' | 'patch' | 'delete';
  path: (ids: { ws: string; target: string }) => string;
  body?: object;
  expected: Record<Caller, number>;
}
const MATRIX: Row[] = [
  { route: 'read workspace', method: 'get', path: ({ ws }) => `/api/workspaces/${ws}`, expected: { owner: 200, editor: 200, viewer: 200, stranger: 404, anonymous: 401 } },
  { route: 'rename workspace', method: 'patch', path: ({ ws }) => `/api/workspaces/${ws}`, body: { name: 'Renamed' }, expected: { owner: 200, editor: 403, viewer: 403, stranger: 404, anonymous: 401 } },
  { route: 'list members', method: 'get', path: ({ ws }) => `/api/workspaces/${ws}/members`, expected: { owner: 200, editor: 200, viewer: 200, stranger: 404, anonymous: 401 } },
  { route: 'change a role', method: 'patch', path: ({ ws, target }) => `/api/workspaces/${ws}/members/${target}`, body: { role: 'viewer' }, expected: { owner: 200, editor: 403, viewer: 403, stranger: 404, anonymous: 401 } },
  { route: 'remove another member', method: 'delete', path: ({ ws, target }) => `/api/workspaces/${ws}/members/${target}`, expected: { owner: 204, editor: 403, viewer: 403, stranger: 404, anonymous: 401 } },
  { route: 'invite', method: 'post', path: ({ ws }) => `/api/workspaces/${ws}/invitations`, body: { email: 'guest@kestrel-point.test', role: 'viewer' }, expected: { owner: 201, editor: 403, viewer: 403, stranger: 404, anonymous: 401 } },
  { route: 'list invitations', method: 'get', path: ({ ws }) => `/api/workspaces/${ws}/invitations`, expected: { owner: 200, editor: 403, viewer: 403, stranger: 404, anonymous: 401 } },
  { route: 'list my workspaces', method: 'get', path: () => '/api/workspaces', expected: { owner: 200, editor: 200, viewer: 200, stranger: 200, anonymous: 401 } },
  { route: 'create workspace', method: 'post', path: () => '/api/workspaces', body: { name: 'Another' }, expected: { owner: 201, editor: 201, viewer: 201, stranger: 201, anonymous: 401 } },
];

describe('role matrix for workspace routes', () => {
  for (const row of MATRIX) {
    for (const caller of CALLERS) {
      it(`${row.route}: ${caller} gets ${row.expected[caller]}`, async () => {
        const team = await makeTeam(app);
        // A fourth member as the target of member changes, so nobody edits themself.
        const target = await makeUser(app, { name: 'Target' });
        await addMember(app, team.workspace.id, target.user.id, 'editor');
        const agent = caller === 'anonymous' ? team.anonymous : team[caller].agent;
        let req = agent[row.method](row.path({ ws: team.workspace.id, target: target.user.id }));
        if (row.body) req = req.send(row.body);
        const res = await req;
        expect(res.status, JSON.stringify(res.body)).toBe(row.expected[caller]);
        if (res.status >= 400) expect(res.body.error.code).toBeTypeOf('string');
      });
    }
  }
});
