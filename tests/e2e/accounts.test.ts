/**
 * Accounts and workspaces in a real browser: signing up, creating and renaming a workspace, returning to
 * the requested page after sign-in, and the full-page state when the API cannot be reached.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS, DEMO_WORKSPACE_NAME, launchBrowser, signIn, type BrowserSession } from './browser';

describe('accounts and workspaces in a browser', () => {
  let s: BrowserSession;
  const stamp = Date.now().toString(36);
  const email = `new.member.${stamp}@example.test`;

  beforeAll(async () => {
    s = await launchBrowser();
  });
  afterAll(async () => {
    await s?.close();
  });

  it('rejects a short password on sign-up with a message beside the field', async () => {
    await s.page.goto(s.url('/sign-up'));
    await s.page.getByLabel('Name').fill('Noor Feldspar-Quill');
    await s.page.getByLabel('Email').fill(email);
    await s.page.getByLabel('Password').fill('short');
    await s.page.getByRole('button', { name: 'Create account' }).click();
    await s.page.getByText('Password must be at least 10 characters.').waitFor();
    await s.screenshot('accounts-sign-up-invalid');
  });

  it('signs up and starts with no workspaces', async () => {
    await s.page.getByLabel('Password').fill('a-long-enough-passphrase');
    await s.page.getByRole('button', { name: 'Create account' }).click();
    await s.page.waitForURL((u) => u.pathname === '/workspaces');
    await s.page.getByText('No workspaces yet').waitFor();
  });

  it('creates a workspace and lands on it as its owner', async () => {
    await s.page.getByLabel('Workspace name').fill('Knot Floer reading group');
    await s.page.getByLabel('Description').fill('Working through examples on genus-one diagrams.');
    await s.page.getByRole('button', { name: 'Create workspace' }).click();
    await s.page.getByRole('heading', { level: 1, name: 'Knot Floer reading group' }).waitFor();
    expect(new URL(s.page.url()).pathname).toMatch(/^\/w\/[0-9a-f-]{36}$/);
  });

  it('lets the owner rename the workspace', async () => {
    await s.page.getByRole('button', { name: 'Rename' }).click();
    const name = s.page.getByLabel('Workspace name');
    await name.fill('');
    await s.page.getByRole('button', { name: 'Save changes' }).click();
    await s.page.getByText('Enter a name.').waitFor();
    await name.fill('Genus-one reading group');
    await s.page.getByRole('button', { name: 'Save changes' }).click();
    await s.page.getByRole('heading', { level: 1, name: 'Genus-one reading group' }).waitFor();
  });

  it('does not show a workspace it was not invited to', async () => {
    await s.page.goto(s.url('/w/00000000-0000-4000-8000-000000000000'));
    await s.page.getByRole('heading', { level: 1, name: 'Workspace not found' }).waitFor();
  });

  it('returns to the requested page after signing in', async () => {
    await s.page.getByRole('button', { name: /^Account:/ }).click();
    await s.page.getByRole('button', { name: 'Sign out' }).click();
    await s.page.waitForURL((u) => u.pathname === '/sign-in');

    await s.page.goto(s.url('/workspaces'));
    await s.page.waitForURL((u) => u.pathname === '/sign-in');
    await signIn(s.page, s.baseUrl, 'owner', '/workspaces?from=test');
    await s.page.waitForURL((u) => u.pathname === '/workspaces' && u.search === '?from=test');
    await s.page.getByRole('button', { name: `Account: ${DEMO_USERS.owner.name}` }).waitFor();
  });

  it('sends the user to sign-in when the session ends while the app is open', async () => {
    await s.context.clearCookies();
    await s.page.getByRole('link', { name: new RegExp(DEMO_WORKSPACE_NAME) }).click();
    await s.page.waitForURL((u) => u.pathname === '/sign-in' && (u.searchParams.get('next') ?? '').startsWith('/w/'));
    await signIn(s.page, s.baseUrl, 'owner', '/workspaces');
  });

  it('shows a full-page retry state while the API is unreachable, and recovers', async () => {
    await s.context.route('**/api/**', (route) => route.abort('connectionrefused'));
    await s.page.goto(s.url('/workspaces'));
    await s.page.getByRole('heading', { level: 1, name: 'Quadrant’s server is not answering' }).waitFor();
    await s.screenshot('accounts-api-down');
    await s.context.unroute('**/api/**');
    await s.page.getByRole('button', { name: 'Try again' }).click();
    await s.page.getByRole('heading', { level: 1, name: 'Workspaces' }).waitFor();
  });
});

describe('invitations in a browser', () => {
  let owner: BrowserSession;
  let invitee: BrowserSession;
  const stamp = Date.now().toString(36);
  const ownerEmail = `host.${stamp}@example.test`;
  const inviteeEmail = `guest.${stamp}@example.test`;
  let acceptLink = '';

  beforeAll(async () => {
    owner = await launchBrowser();
    invitee = await launchBrowser();
  });
  afterAll(async () => {
    await owner?.close();
    await invitee?.close();
  });

  it('lets a new owner invite a colleague, listing the invitation as pending', async () => {
    const p = owner.page;
    await p.goto(owner.url('/sign-up'));
    await p.getByLabel('Name').fill('Rowan Ashgrove-Pell');
    await p.getByLabel('Email').fill(ownerEmail);
    await p.getByLabel('Password').fill('a-long-enough-passphrase');
    await p.getByRole('button', { name: 'Create account' }).click();
    await p.getByLabel('Workspace name').fill('Seifert seminar');
    await p.getByRole('button', { name: 'Create workspace' }).click();
    await p.getByRole('heading', { level: 1, name: 'Seifert seminar' }).waitFor();
    await p.getByRole('link', { name: 'Members' }).click();
    await p.getByLabel('Email address').fill(inviteeEmail);
    await p.getByLabel('Role', { exact: true }).selectOption('viewer');
    await p.getByRole('button', { name: 'Send invitation' }).click();
    await p.getByText(`Invitation sent to ${inviteeEmail}.`).waitFor();
    await p.getByRole('region', { name: 'Pending invitations' }).getByText(inviteeEmail).waitFor();
    await owner.screenshot('accounts-invitation-pending');
  });

  it('mails an accept link (read from the development outbox)', async () => {
    const res = await fetch(new URL('/api/dev/mail', owner.baseUrl));
    expect(res.status).toBe(200);
    const { messages } = (await res.json()) as { messages: { to: string[]; text: string }[] };
    const mail = messages.find((m) => m.to.includes(inviteeEmail));
    expect(mail).toBeDefined();
    acceptLink = /https?:\/\/\S+\/invitations\/accept\?token=\S+/.exec(mail!.text)?.[0] ?? '';
    expect(acceptLink).not.toBe('');
  });

  it('takes the invitee through sign-up back to the invitation, and into the workspace', async () => {
    const p = invitee.page;
    await p.goto(acceptLink);
    await p.waitForURL((u) => u.pathname === '/sign-in');
    await p.getByRole('link', { name: 'Create an account' }).click();
    await p.getByLabel('Name').fill('Ada Quillon-Marsh');
    await p.getByLabel('Email').fill(inviteeEmail);
    await p.getByLabel('Password').fill('another-long-passphrase');
    await p.getByRole('button', { name: 'Create account' }).click();
    await p.getByRole('heading', { level: 1, name: 'Join a workspace' }).waitFor();
    await invitee.screenshot('accounts-invitation-accept');
    await p.getByRole('button', { name: 'Accept invitation' }).click();
    await p.getByRole('heading', { level: 1, name: 'Seifert seminar' }).waitFor();
    await p.getByRole('link', { name: 'Members' }).click();
    const table = p.getByRole('table', { name: /Members of/ });
    await table.getByRole('row', { name: /Ada Quillon-Marsh/ }).getByText('Viewer').waitFor();
    // A viewer sees roles but no controls to change them.
    await expect(p.getByRole('combobox').count()).resolves.toBe(0);
  });
});
