import { sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { userResponseSchema } from '../../server/contract/auth.js';
import { TEST_ORIGIN, TEST_PASSWORD, agentFor, createTestApp, makeUser, testDb, uniqueEmail } from './helpers.js';
import supertest from 'supertest';

const app = createTestApp();

describe('sign-up', () => {
  beforeAll(async () => {
    // This file checks the first-account rule, so it starts from an empty users table.
    await testDb().execute(sql`truncate users cascade`);
  });

  it('makes the first account on an empty installation site administrator, and later ones not', async () => {
    const first = await makeUser(app, { name: 'Mira' });
    const second = await makeUser(app, { name: 'Tobias' });
    expect(first.user.isAdmin).toBe(true);
    expect(second.user.isAdmin).toBe(false);
  });

  it('answers 201 with the user and signs the new account in', async () => {
    const agent = agentFor(app);
    const email = uniqueEmail('New.Person');
    const res = await agent.post('/api/auth/signup').send({ email: `  ${email.toUpperCase()} `, password: TEST_PASSWORD, name: ' Ilse ' });
    expect(res.status).toBe(201);
    expect(userResponseSchema.parse(res.body).user).toMatchObject({ email: email.toLowerCase(), name: 'Ilse', isAdmin: false });
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email.toLowerCase());
  });

  it('sets an httpOnly SameSite=Lax session cookie', async () => {
    const res = await agentFor(app).post('/api/auth/signup').send({ email: uniqueEmail(), password: TEST_PASSWORD, name: 'C' });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/quadrant\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('rejects a duplicate email with 409 conflict', async () => {
    const { email } = await makeUser(app);
    const res = await agentFor(app).post('/api/auth/signup').send({ email, password: TEST_PASSWORD, name: 'Again' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
  });

  it('rejects a password shorter than 10 characters with 400 validation', async () => {
    const res = await agentFor(app).post('/api/auth/signup').send({ email: uniqueEmail(), password: 'short', name: 'X' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation');
    expect(res.body.error.message).toMatch(/10 characters/);
  });

  it('rejects a malformed email with 400 validation', async () => {
    const res = await agentFor(app).post('/api/auth/signup').send({ email: 'not-an-email', password: TEST_PASSWORD, name: 'X' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation');
  });
});

describe('sign-in', () => {
  it('signs in with the right password and answers the user', async () => {
    const { email, user } = await makeUser(app);
    const agent = agentFor(app);
    const res = await agent.post('/api/auth/login').send({ email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual(user);
    expect((await agent.get('/api/auth/me')).body.user.id).toBe(user.id);
  });

  it('accepts the email in any letter case', async () => {
    const { email } = await makeUser(app);
    const res = await agentFor(app).post('/api/auth/login').send({ email: email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
  });

  it('answers 401 invalid_credentials for a wrong password', async () => {
    const { email } = await makeUser(app);
    const res = await agentFor(app).post('/api/auth/login').send({ email, password: 'wrong password!' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
  });

  it('answers the same 401 for an unknown email', async () => {
    const res = await agentFor(app).post('/api/auth/login').send({ email: uniqueEmail(), password: TEST_PASSWORD });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
  });

  it('answers 429 rate_limited after too many failed attempts for one email', async () => {
    const limited = createTestApp({ LOGIN_RATE_LIMIT: '3' });
    const { email } = await makeUser(limited);
    const agent = agentFor(limited);
    for (let i = 0; i < 3; i++) {
      expect((await agent.post('/api/auth/login').send({ email, password: 'wrong password!' })).status).toBe(401);
    }
    const blocked = await agent.post('/api/auth/login').send({ email, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    // Another email from the same address is still allowed.
    const other = await makeUser(limited);
    expect((await agent.post('/api/auth/login').send({ email: other.email, password: TEST_PASSWORD })).status).toBe(200);
  });
});

describe('me and sign-out', () => {
  it('answers 401 unauthenticated to an anonymous me', async () => {
    const res = await agentFor(app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'unauthenticated', message: expect.any(String) } });
  });

  it('signs out with 204 and forgets the session', async () => {
    const { agent } = await makeUser(app);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });
});

describe('origin check on state-changing requests', () => {
  const body = { email: uniqueEmail(), password: TEST_PASSWORD, name: 'Origin' };

  it('answers 403 bad_origin without Origin or Referer', async () => {
    const res = await supertest(app).post('/api/auth/signup').send(body);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('bad_origin');
  });

  it('answers 403 bad_origin for a foreign Origin', async () => {
    const res = await supertest(app).post('/api/auth/signup').set('Origin', 'https://evil.example').send(body);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('bad_origin');
  });

  it('answers 403 bad_origin for a foreign Referer when Origin is absent', async () => {
    const res = await supertest(app).post('/api/auth/login').set('Referer', 'https://evil.example/page').send(body);
    expect(res.status).toBe(403);
  });

  it('accepts a Referer from the public origin when Origin is absent', async () => {
    const res = await supertest(app).post('/api/auth/signup').set('Referer', `${TEST_ORIGIN}/signup`).send({ ...body, email: uniqueEmail() });
    expect(res.status).toBe(201);
  });

  it("accepts the request's own host as origin", async () => {
    const res = await supertest(app)
      .post('/api/auth/signup')
      .set('Host', 'lab.kestrel-point.test:8080')
      .set('Origin', 'http://lab.kestrel-point.test:8080')
      .send({ ...body, email: uniqueEmail() });
    expect(res.status).toBe(201);
  });

  it('lets GET requests through without an Origin', async () => {
    expect((await supertest(app).get('/api/health')).status).toBe(200);
  });
});
