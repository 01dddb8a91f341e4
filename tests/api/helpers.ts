/**
 * Shared helpers for API tests (real PostgreSQL, real HTTP through supertest). Importing this file
 * registers an afterAll that closes every app and the pool it created.
 *
 *   const app = createTestApp();                 // createApp on the test database
 *   const { agent, user } = await makeUser(app);  // signed-in supertest agent with the right Origin
 *   const ws = await makeWorkspace(agent);        // the user owns it
 *   await addMember(app, ws.id, other.user.id, 'editor');
 */
import { randomBytes } from 'node:crypto';
import type pg from 'pg';
import supertest from 'supertest';
import { afterAll, inject } from 'vitest';
import { createApp, type QuadrantApp } from '../../server/app.js';
import type { User } from '../../server/contract/auth.js';
import type { Role, Workspace } from '../../server/contract/workspaces.js';
import { createDb, createPool, type Db } from '../../server/db/client.js';
import { parseEnv, type Env } from '../../server/env.js';
import { addMembership } from '../../server/routes/workspaces/workspaces.service.js';

/** The origin the test apps believe they are served from; `agentFor` sends it on every request. */
export const TEST_ORIGIN = 'http://quadrant.test';
export const TEST_PASSWORD = 'correct horse battery';

export type Agent = ReturnType<typeof supertest.agent>;

let pool: pg.Pool | null = null;
const apps: QuadrantApp[] = [];

/** URL of the API test database (prepared by tests/api/global-setup.ts). */
export function testDatabaseUrl(): string {
  const url = process.env.QUADRANT_TEST_DATABASE_URL ?? inject('testDatabaseUrl');
  if (!url) throw new Error('test database URL missing; run through vitest --project api');
  return url;
}

/** One pool per test file, closed after the file. */
export function testPool(): pg.Pool {
  pool ??= createPool(testDatabaseUrl(), 5);
  return pool;
}

/** Drizzle handle on the test database. */
export function testDb(): Db {
  return createDb(testPool());
}

/** Environment for test apps; cheap password hashing, generous sign-in limit unless overridden. */
export function testEnv(overrides: Record<string, string> = {}): Env {
  return parseEnv({
    NODE_ENV: 'test',
    DATABASE_URL: testDatabaseUrl(),
    PUBLIC_ORIGIN: TEST_ORIGIN,
    PASSWORD_SCRYPT_LOG_N: '10',
    LOGIN_RATE_LIMIT: '1000',
    ...overrides,
  });
}

/** createApp on the test database (closed automatically after the file). */
export function createTestApp(envOverrides: Record<string, string> = {}): QuadrantApp {
  const p = testPool();
  const app = createApp({ pool: p, db: createDb(p), env: testEnv(envOverrides), serveClient: false, log: () => {} });
  apps.push(app);
  return app;
}

/** A cookie-keeping supertest agent that sends the app's Origin on every request. */
export function agentFor(app: QuadrantApp): Agent {
  return supertest.agent(app).set('Origin', TEST_ORIGIN);
}

/** A unique, valid email address. */
export function uniqueEmail(prefix = 'user'): string {
  return `${prefix}-${randomBytes(5).toString('hex')}@kestrel-point.test`;
}

export interface TestUser {
  agent: Agent;
  user: User;
  email: string;
  password: string;
}

/** Sign up a fresh account through the API; the returned agent is signed in. */
export async function makeUser(
  app: QuadrantApp,
  opts: { email?: string; name?: string; password?: string } = {},
): Promise<TestUser> {
  const agent = agentFor(app);
  const email = opts.email ?? uniqueEmail();
  const password = opts.password ?? TEST_PASSWORD;
  const res = await agent.post('/api/auth/signup').send({ email, password, name: opts.name ?? 'Test Researcher' });
  if (res.status !== 201) throw new Error(`signup failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, user: res.body.user as User, email, password };
}

/** Create a workspace through the API as the agent's user (who becomes owner). */
export async function makeWorkspace(agent: Agent, opts: { name?: string; description?: string } = {}): Promise<Workspace> {
  const res = await agent
    .post('/api/workspaces')
    .send({ name: opts.name ?? `Seminar ${randomBytes(3).toString('hex')}`, description: opts.description ?? '' });
  if (res.status !== 201) throw new Error(`create workspace failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.workspace as Workspace;
}

/** Give a user a role in a workspace directly in the database (no invitation round trip). */
export async function addMember(app: QuadrantApp, workspaceId: string, userId: string, role: Role): Promise<void> {
  await addMembership(app.deps.db, workspaceId, userId, role);
}

/**
 * A workspace with one signed-in user per role plus a signed-in stranger and an anonymous agent — for
 * role-matrix tests.
 */
export async function makeTeam(app: QuadrantApp): Promise<{
  workspace: Workspace;
  owner: TestUser;
  editor: TestUser;
  viewer: TestUser;
  stranger: TestUser;
  anonymous: Agent;
}> {
  const owner = await makeUser(app, { name: 'Owner' });
  const editor = await makeUser(app, { name: 'Editor' });
  const viewer = await makeUser(app, { name: 'Viewer' });
  const stranger = await makeUser(app, { name: 'Stranger' });
  const workspace = await makeWorkspace(owner.agent);
  await addMember(app, workspace.id, editor.user.id, 'editor');
  await addMember(app, workspace.id, viewer.user.id, 'viewer');
  return { workspace, owner, editor, viewer, stranger, anonymous: agentFor(app) };
}

afterAll(async () => {
  for (const app of apps.splice(0)) await app.close();
  if (pool) {
    await pool.end();
    pool = null;
  }
});
