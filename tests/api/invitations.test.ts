import { describe, expect, it } from 'vitest';
import { invitationListResponseSchema, invitationResponseSchema } from '../../server/contract/workspaces.js';
import { createTestApp, makeUser, makeWorkspace, uniqueEmail } from './helpers.js';

const app = createTestApp();

/** Pull the accept token out of a received invitation mail. */
function tokenFrom(text: string): string {
  const m = /\/invitations\/accept\?token=([A-Za-z0-9_%-]+)/.exec(text);
  if (!m) throw new Error(`no accept link in mail:\n${text}`);
  return decodeURIComponent(m[1]);
}

async function inviteAndReceive(role: 'viewer' | 'editor' | 'owner' = 'editor') {
  const owner = await makeUser(app, { name: 'Mira Okonkwo-Hale' });
  const ws = await makeWorkspace(owner.agent, { name: 'Lens space seminar' });
  const inviteeEmail = uniqueEmail('invitee');
  const res = await owner.agent.post(`/api/workspaces/${ws.id}/invitations`).send({ email: inviteeEmail, role });
  expect(res.status).toBe(201);
  const smtp = await app.deps.mailer.fakeSmtp();
  if (!smtp) throw new Error('fake SMTP server is not running');
  const mail = await smtp.waitFor((m) => m.to.includes(inviteeEmail));
  return { owner, ws, inviteeEmail, invitation: invitationResponseSchema.parse(res.body).invitation, mail };
}

describe('invitations', () => {
  it('sends the accept link by email through a real SMTP conversation', async () => {
    const { mail, ws, inviteeEmail, invitation } = await inviteAndReceive('editor');
    expect(invitation).toMatchObject({ email: inviteeEmail, role: 'editor', invitedBy: 'Mira Okonkwo-Hale', acceptedAt: null });
    expect(mail.subject).toContain('Lens space seminar');
    expect(mail.text).toContain('http://quadrant.test/invitations/accept?token=');
    expect(mail.raw).toMatch(/^Message-ID:/im);
    expect(ws.id).toBeTruthy();
  });

  it('lets the invited person accept once and join with the invited role', async () => {
    const { mail, ws, inviteeEmail } = await inviteAndReceive('editor');
    const invitee = await makeUser(app, { email: inviteeEmail });
    const token = tokenFrom(mail.text);
    const res = await invitee.agent.post('/api/invitations/accept').send({ token });
    expect(res.status).toBe(200);
    expect(res.body.workspace).toMatchObject({ id: ws.id, role: 'editor' });
    expect((await invitee.agent.get(`/api/workspaces/${ws.id}`)).body.workspace.role).toBe('editor');
    const again = await invitee.agent.post('/api/invitations/accept').send({ token });
    expect(again.status).toBe(404);
  });

  it('lists invitations for the owner with their state', async () => {
    const { owner, ws, mail, inviteeEmail } = await inviteAndReceive('viewer');
    const invitee = await makeUser(app, { email: inviteeEmail });
    await invitee.agent.post('/api/invitations/accept').send({ token: tokenFrom(mail.text) }).expect(200);
    const res = await owner.agent.get(`/api/workspaces/${ws.id}/invitations`);
    const list = invitationListResponseSchema.parse(res.body).invitations;
    expect(list).toHaveLength(1);
    expect(list[0].acceptedAt).not.toBeNull();
  });

  it('refuses a token sent to another email address with 403', async () => {
    const { mail } = await inviteAndReceive('viewer');
    const someoneElse = await makeUser(app);
    const res = await someoneElse.agent.post('/api/invitations/accept').send({ token: tokenFrom(mail.text) });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('answers 404 for an unknown token and 401 when not signed in', async () => {
    const { agent } = await makeUser(app);
    expect((await agent.post('/api/invitations/accept').send({ token: 'x'.repeat(43) })).status).toBe(404);
    const { mail } = await inviteAndReceive('viewer');
    const anonymous = (await import('./helpers.js')).agentFor(app);
    expect((await anonymous.post('/api/invitations/accept').send({ token: tokenFrom(mail.text) })).status).toBe(401);
  });

  it('refuses to invite an existing member with 409', async () => {
    const owner = await makeUser(app);
    const ws = await makeWorkspace(owner.agent);
    const res = await owner.agent.post(`/api/workspaces/${ws.id}/invitations`).send({ email: owner.email, role: 'viewer' });
    expect(res.status).toBe(409);
  });

  it('shows caught mail on the development outbox', async () => {
    const { inviteeEmail } = await inviteAndReceive('viewer');
    const res = await (await makeUser(app)).agent.get('/api/dev/mail');
    expect(res.status).toBe(200);
    expect(res.body.messages.some((m: { to: string[] }) => m.to.includes(inviteeEmail))).toBe(true);
  });
});
