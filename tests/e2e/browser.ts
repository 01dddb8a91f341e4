/**
 * Browser helper for e2e tests: headless Debian Chromium through playwright-core, with the flags proven in
 * STACK.md (WebGL 2 on the CPU through SwiftShader). Each session gets a fresh persistent profile in a
 * temp folder; screenshots go to test-artifacts/.
 *
 *   const s = await openSignedIn('owner');       // page signed in as the demo owner, on /workspaces
 *   await s.page.goto(s.url('/w/…'));
 *   await s.screenshot('lab-torus');            // → test-artifacts/lab-torus.png
 *   await s.close();
 */
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const ARTIFACTS_DIR = path.join(ROOT, 'test-artifacts');

export const CHROMIUM_PATH = '/usr/bin/chromium';
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--enable-unsafe-swiftshader',
  '--use-angle=swiftshader',
];

/** The demo accounts created by the server's seed (password for all: quadrant-demo). */
export const DEMO_USERS = {
  owner: { email: 'owner@demo.quadrant.test', password: 'quadrant-demo', name: 'Mira Okonkwo-Hale' },
  editor: { email: 'editor@demo.quadrant.test', password: 'quadrant-demo', name: 'Tobias Lindqvist-Arden' },
  viewer: { email: 'viewer@demo.quadrant.test', password: 'quadrant-demo', name: 'Ilse Varga-Moreau' },
} as const;
export type DemoUser = keyof typeof DEMO_USERS;
export const DEMO_WORKSPACE_NAME = 'Lattice Harbor Topology Group';

/** Base URL of the server under test (provided by tests/e2e/global-setup.ts). */
export function baseUrl(): string {
  let url: string | undefined;
  try {
    url = inject('baseUrl');
  } catch {
    url = undefined;
  }
  url ??= process.env.QUADRANT_E2E_BASE_URL;
  if (!url) throw new Error('No e2e base URL: run through the e2e project (its global setup starts the server).');
  return url;
}

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  baseUrl: string;
  /** Absolute URL for an app path, e.g. url('/workspaces'). */
  url(pathname: string): string;
  /** Full-page screenshot into test-artifacts/<name>.png; returns the file path. */
  screenshot(name: string, page?: Page): Promise<string>;
  /** Uncaught page errors seen so far (console errors are in `consoleErrors`). */
  pageErrors: string[];
  consoleErrors: string[];
  close(): Promise<void>;
}

export interface LaunchOptions {
  viewport?: { width: number; height: number };
  /** Extra Chromium flags (e.g. to simulate no WebGL). */
  extraArgs?: string[];
}

/** Starts Chromium with a fresh profile and one page. Close it in afterAll/finally. */
export async function launchBrowser(options: LaunchOptions = {}): Promise<BrowserSession> {
  const profile = mkdtempSync(path.join(tmpdir(), 'quadrant-e2e-'));
  mkdirSync(ARTIFACTS_DIR, { recursive: true });
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [...CHROMIUM_ARGS, ...(options.extraArgs ?? [])],
    viewport: options.viewport ?? { width: 1280, height: 860 },
    deviceScaleFactor: 1,
    locale: 'en-GB',
    timezoneId: 'UTC',
  });
  context.setDefaultTimeout(20_000);
  const page = context.pages()[0] ?? (await context.newPage());
  const base = baseUrl();
  const pageErrors: string[] = [];
  const consoleErrors: string[] = [];
  page.on('pageerror', (err) => pageErrors.push(err.message));
  page.on('console', (msg) => {
    if (msg.type() === 'error') consoleErrors.push(msg.text());
  });
  return {
    context,
    page,
    baseUrl: base,
    pageErrors,
    consoleErrors,
    url: (pathname) => new URL(pathname, base).toString(),
    async screenshot(name, p = page) {
      const file = path.join(ARTIFACTS_DIR, `${name.replace(/[^a-z0-9._-]+/gi, '-')}.png`);
      await p.screenshot({ path: file, fullPage: true });
      return file;
    },
    async close() {
      await context.close().catch(() => undefined);
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Signs `page` in through the sign-in form and waits until the app has left /sign-in. */
export async function signIn(page: Page, base: string, user: DemoUser | { email: string; password: string } = 'owner', next?: string): Promise<void> {
  const creds = typeof user === 'string' ? DEMO_USERS[user] : user;
  await page.goto(new URL(next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in', base).toString());
  await page.getByLabel('Email').fill(creds.email);
  await page.getByLabel('Password').fill(creds.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
}

/** A fresh browser signed in as a demo user, on `next` (default /workspaces). */
export async function openSignedIn(user: DemoUser = 'owner', next?: string, options?: LaunchOptions): Promise<BrowserSession> {
  const session = await launchBrowser(options);
  try {
    await signIn(session.page, session.baseUrl, user, next);
  } catch (err) {
    await session.screenshot(`sign-in-failed-${user}`).catch(() => undefined);
    await session.close();
    throw err;
  }
  return session;
}
