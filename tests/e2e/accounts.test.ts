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
