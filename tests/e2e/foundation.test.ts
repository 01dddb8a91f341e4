/**
 * Foundation in a real browser against the real server and a freshly seeded database:
 * signing in, the demo workspace with its members, errors in place, and the 404 page.
 * Demo data (invented): the "Lattice Harbor Topology Group" with owner Mira Okonkwo-Hale,
 * editor Tobias Lindqvist-Arden and viewer Ilse Varga-Moreau (seeded by server/seed).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS, DEMO_WORKSPACE_NAME, launchBrowser, signIn, type BrowserSession } from './browser';

describe('the foundation in a browser', () => {
  let s: BrowserSession;

  beforeAll(async () => {
    s = await launchBrowser();
  });
  afterAll(async () => {
    await s?.close();
  });

  it('sends a signed-out visitor from a protected page to sign-in', async () => {
    await s.page.goto(s.url('/workspaces'));
    await s.page.waitForURL((u) => u.pathname === '/sign-in');
    expect(new URL(s.page.url()).searchParams.get('next')).toBe('/workspaces');
    await expect(s.page.getByRole('heading', { level: 1, name: 'Sign in' }).isVisible()).resolves.toBe(true);
  });

  it('shows validation messages in place for an empty form', async () => {
    await s.page.goto(s.url('/sign-in'));
    await s.page.getByRole('button', { name: 'Sign in' }).click();
    await s.page.getByText('Enter a valid email address.').waitFor();
    await expect(s.page.getByLabel('Email').getAttribute('aria-invalid')).resolves.toBe('true');
  });

  it('shows a wrong password as an error in place, without leaving the page', async () => {
    await s.page.goto(s.url('/sign-in'));
    await s.page.getByLabel('Email').fill(DEMO_USERS.owner.email);
    await s.page.getByLabel('Password').fill('not-the-password');
    await s.page.getByRole('button', { name: 'Sign in' }).click();
    const alert = s.page.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toContain('do not match');
    expect(new URL(s.page.url()).pathname).toBe('/sign-in');
    await s.screenshot('foundation-sign-in-error');
  });

  it('signs the demo owner in and lists the demo workspace', async () => {
    await signIn(s.page, s.baseUrl, 'owner');
    await s.page.waitForURL((u) => u.pathname === '/workspaces');
    await s.page.getByRole('heading', { level: 1, name: 'Workspaces' }).waitFor();
    await s.page.getByRole('link', { name: new RegExp(DEMO_WORKSPACE_NAME) }).waitFor();
    await s.page.getByRole('button', { name: `Account: ${DEMO_USERS.owner.name}` }).waitFor();
    await s.screenshot('foundation-workspaces');
  });

  it('opens the workspace and shows its three members with their roles', async () => {
    await s.page.getByRole('link', { name: new RegExp(DEMO_WORKSPACE_NAME) }).click();
    await s.page.getByRole('heading', { level: 1, name: DEMO_WORKSPACE_NAME }).waitFor();
    await expect.poll(() => s.page.title()).toBe(`${DEMO_WORKSPACE_NAME} · Quadrant`);
    await s.screenshot('foundation-workspace-library');
    await s.page.getByRole('navigation', { name: 'Workspace sections' }).getByRole('link', { name: 'Members' }).click();
    await s.page.waitForURL((u) => u.pathname.endsWith('/members'));
    const table = s.page.getByRole('table', { name: /Members of/ });
    await table.waitFor();
    const rows = table.getByRole('row');
    await expect.poll(() => rows.count()).toBe(4); // header + 3 members
    // The owner manages roles through one labelled select per member.
    const expected = [
      [DEMO_USERS.owner.name, 'owner'],
      [DEMO_USERS.editor.name, 'editor'],
      [DEMO_USERS.viewer.name, 'viewer'],
    ] as const;
    for (const [name, role] of expected) {
      await expect(s.page.getByRole('combobox', { name: `Role of ${name}` }).inputValue()).resolves.toBe(role);
    }
    await s.page.getByRole('heading', { name: 'Invite a colleague' }).waitFor();
    await s.screenshot('foundation-members');
  });

  it('asks for confirmation before removing a member, and cancelling keeps them', async () => {
    await s.page.getByRole('button', { name: `Remove ${DEMO_USERS.viewer.name}` }).click();
    const dialog = s.page.getByRole('dialog', { name: `Remove ${DEMO_USERS.viewer.name}?` });
    await dialog.waitFor();
    await s.screenshot('foundation-remove-confirm');
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await expect(s.page.getByRole('combobox', { name: `Role of ${DEMO_USERS.viewer.name}` }).isVisible()).resolves.toBe(true);
  });

  it('shows the 404 page for an unknown path', async () => {
    await s.page.goto(s.url('/no/such/page'));
    await s.page.getByRole('heading', { level: 1, name: 'Page not found' }).waitFor();
    await s.page.getByRole('link', { name: 'Go to your workspaces' }).waitFor();
    await s.screenshot('foundation-404');
  });

  it('offers a skip link as the first stop of the keyboard, and shows a focus ring', async () => {
    await s.page.keyboard.press('Tab');
    const skip = s.page.getByRole('link', { name: 'Skip to main content' });
    await expect(skip.evaluate((el) => el === document.activeElement)).resolves.toBe(true);
    await expect(skip.isVisible()).resolves.toBe(true);
    await s.page.keyboard.press('Tab');
    const outline = await s.page.evaluate(() => getComputedStyle(document.activeElement as Element).outlineStyle);
    expect(outline).toBe('solid');
    await s.screenshot('foundation-focus-ring');
  });

  it('fits a phone screen without sideways scrolling', async () => {
    await s.page.setViewportSize({ width: 390, height: 844 });
    await s.page.goto(s.url('/workspaces'));
    await s.page.getByRole('link', { name: new RegExp(DEMO_WORKSPACE_NAME) }).click();
    await s.page.getByRole('link', { name: 'Members' }).click();
    await s.page.getByRole('table', { name: /Members of/ }).waitFor();
    const overflow = await s.page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await s.screenshot('foundation-members-phone');
    await s.page.setViewportSize({ width: 1280, height: 860 });
  });

  it('signs out from the user menu', async () => {
    await s.page.goto(s.url('/workspaces'));
    await s.page.getByRole('button', { name: `Account: ${DEMO_USERS.owner.name}` }).click();
    await s.page.getByRole('button', { name: 'Sign out' }).click();
    await s.page.waitForURL((u) => u.pathname === '/sign-in');
  });

  it('threw no uncaught errors in the page', () => {
    expect(s.pageErrors).toEqual([]);
  });
});
