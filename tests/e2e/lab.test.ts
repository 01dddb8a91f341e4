/**
 * The lab in real Chromium (WebGL on SwiftShader) against the real server and the seeded demo workspace of the
 * invented "Lattice Harbor Topology Group": templates, the linked 3D view and tables, domains built by clicking
 * the surface, uploads with line-numbered problems, edits and restoring an older revision.
 * Screenshots of the workspace go to test-artifacts/lab-*.png.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DEMO_WORKSPACE_NAME, launchBrowser, openSignedIn, type BrowserSession } from './browser';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const ANALYSIS_TIMEOUT = 90_000;

interface RegionFacts { id: number; corners: number; basepoints: string[]; eulerMeasure: number }

/** The diagram id in the current /w/:ws/d/:id URL. */
const diagramIdOf = (page: Page) => new URL(page.url()).pathname.split('/d/')[1]?.split('/')[0] ?? '';

/** Opens the demo workspace's library. */
async function openLibrary(s: BrowserSession, libraryUrl: string) {
  await s.page.goto(libraryUrl);
  await s.page.getByRole('heading', { name: 'Diagrams' }).waitFor();
}

/** Creates a diagram from the template form and waits for the lab page. */
async function createFromTemplate(s: BrowserSession, fill: (page: Page) => Promise<void>) {
  await s.page.getByRole('button', { name: 'New from template' }).click();
  const form = s.page.getByRole('form', { name: 'Create from a template' });
  await form.waitFor();
  await fill(s.page);
  await form.getByRole('button', { name: 'Create diagram' }).click();
  await s.page.waitForURL((u) => u.pathname.includes('/d/'));
}

/** Waits until the Regions table has rows (the analysis is done) and returns the row locator. */
async function regionRows(page: Page) {
  const rows = page.getByRole('table', { name: 'Regions' }).getByTestId('region-row');
  await rows.first().waitFor({ timeout: ANALYSIS_TIMEOUT });
  return rows;
}

/** The analysis of the shown diagram's head revision, read through the API with the page's session. */
async function analysisRegions(page: Page, diagramId: string, revision: number): Promise<RegionFacts[]> {
  return page.evaluate(async ({ id, rev }) => {
    const r = await fetch(`/api/diagrams/${id}/revisions/${rev}/analysis`, { credentials: 'same-origin' });
    const body = await r.json();
    return body.result.regions;
  }, { id: diagramId, rev: revision });
}

/** A visible screen point inside region `id`, turning the camera until the region faces it; null if it never does. */
async function regionPoint(page: Page, id: number): Promise<{ x: number; y: number } | null> {
  type Lab = { __quadrantLab?: { regionScreenPoint(r: number): { x: number; y: number } | null } };
  const look = () => page.evaluate((r) => (window as unknown as Lab).__quadrantLab?.regionScreenPoint(r) ?? null, id);
  await expect.poll(() => page.evaluate(() => Boolean((window as unknown as Lab).__quadrantLab)), { timeout: 20_000 }).toBe(true);
  let point = await look();
  for (let i = 0; i < 12 && !point; i++) {
    await page.getByRole('button', { name: 'Orbit right' }).click();
    point = await look();
  }
  return point;
}

describe('the lab in a browser', () => {
  let s: BrowserSession;
  let libraryUrl = '';

  beforeAll(async () => {
    s = await openSignedIn('owner', undefined, { viewport: { width: 1440, height: 900 } });
    await s.page.getByRole('link', { name: new RegExp(DEMO_WORKSPACE_NAME) }).click();
    await s.page.getByRole('heading', { name: 'Diagrams' }).waitFor();
    libraryUrl = s.page.url();
  });
  afterAll(async () => {
    await s?.close();
  });

  it('creates L(5,2) from the template and shows five rectangles with Euler measure 0 in both columns', async () => {
    await openLibrary(s, libraryUrl);
    // The form's defaults are the lens space L(5,2).
    await createFromTemplate(s, async (page) => {
      await expect(page.getByLabel('p', { exact: true }).inputValue()).resolves.toBe('5');
      await expect(page.getByLabel('q', { exact: true }).inputValue()).resolves.toBe('2');
    });
    const rows = await regionRows(s.page);
    // Genus-1 diagram of L(p,q): beta meets alpha p times, cutting the torus into p rectangles (REFERENCE.md).
    await expect.poll(() => rows.count()).toBe(5);
    for (let i = 0; i < 5; i++) {
      const row = rows.nth(i);
      // Lipshitz 2006: a rectangle has Euler measure e = 1 − 4/4 = 0; Gauss–Bonnet agrees (REFERENCE.md).
      expect(await row.locator('[data-col="euler"]').textContent()).toBe('0');
      const gb = Number((await row.locator('[data-col="euler-gb"]').getAttribute('title')) ?? 'NaN');
      expect(Math.abs(gb)).toBeLessThan(1e-6);
    }
    await s.page.getByRole('tab', { name: 'Homology' }).click();
    // Ozsváth–Szabó 2004: H_1(L(5,2)) = Z/5 and rank HF-hat(L(5,2)) = 5.
    await expect.poll(() => s.page.getByTestId('h1').textContent()).toContain('5');
    await expect.poll(() => s.page.getByTestId('hf-rank').textContent()).toBe('5');
    // χ(HF-hat) = ±|H_1| (Ozsváth–Szabó 2004): the signed count of the 5 generators is ±5.
    expect(await s.page.getByTestId('signed-count').textContent()).toMatch(/Σ sign\(x\) = -?5 .*agrees/);
    await s.page.getByRole('tab', { name: 'Regions' }).click();
    await s.page.waitForTimeout(500);
    await s.screenshot('lab-lens-L52-regions');
  });

  it('saves the view as a PNG figure at twice the screen resolution', async () => {
    const [download] = await Promise.all([
      s.page.waitForEvent('download'),
      s.page.getByRole('button', { name: 'Save image' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^L\(5,2\).*\.png$/);
    const file = path.join(ROOT, 'test-artifacts', 'lab-figure-L52.png');
    await download.saveAs(file);
    const png = readFileSync(file);
    // PNG signature and IHDR width (W3C PNG specification, 2003, §5.2 and §11.2.2).
    expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
    const canvasWidth = await s.page.locator('canvas').first().evaluate((c) => (c as HTMLCanvasElement).clientWidth);
    expect(png.readUInt32BE(16)).toBeGreaterThanOrEqual(2 * canvasWidth - 2);
  });

  it('applies an edit as a new revision and restores the older revision', async () => {
    await s.page.getByRole('tab', { name: 'Draw & edit' }).click();
    await s.page.getByRole('button', { name: 'Midpoint subdivision' }).click();
    await s.page.getByText('Revision 2 (latest)').waitFor({ timeout: 30_000 });
    await s.page.getByRole('tab', { name: 'History' }).click();
    await s.page.getByRole('button', { name: 'Restore revision 1' }).click();
    await s.page.getByText('Revision 3 (latest)').waitFor({ timeout: 30_000 });
    const history = s.page.getByRole('list', { name: 'Revisions, newest first' });
    await expect.poll(() => history.getByTestId('revision-row').count()).toBe(3);
    expect(await history.getByTestId('revision-row').first().textContent()).toContain('Restored revision 1');
    // The restored revision is the original L(5,2) diagram: again five regions (common practice: restore copies).
    await s.page.getByRole('tab', { name: 'Regions' }).click();
    const rows = await regionRows(s.page);
    await expect.poll(() => rows.count()).toBe(5);
    await s.page.getByRole('tab', { name: 'History' }).click();
    await s.screenshot('lab-history-restored');
  });

  it('shows a stale edit’s conflict clearly and reloads the latest revision', async () => {
    const id = diagramIdOf(s.page);
    // Someone else changes the diagram first (revision 3 → 4), behind this page's back.
    const status = await s.page.evaluate(async (diagramId) => {
      const r = await fetch(`/api/diagrams/${diagramId}/edits`, {
        method: 'POST', credentials: 'same-origin', headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ baseRevision: 3, operation: { type: 'smooth', iterations: 1 } }),
      });
      return r.status;
    }, id);
    expect(status).toBe(201);
    await s.page.getByRole('tab', { name: 'Draw & edit' }).click();
    await s.page.getByRole('button', { name: 'Midpoint subdivision' }).click();
    // common practice: optimistic concurrency answers 409 Conflict to a stale base revision
    const alert = s.page.getByRole('alert').filter({ hasText: 'Someone changed this diagram first' });
    await alert.waitFor();
    await s.screenshot('lab-edit-conflict');
    await alert.getByRole('button', { name: 'Reload the latest revision' }).click();
    await s.page.getByText('Revision 4 (latest)').waitFor({ timeout: 30_000 });
    expect(await alert.count()).toBe(0);
  });

  it('creates a read-only share link that opens without signing in', async () => {
    const name = (await s.page.getByRole('heading', { level: 1 }).first().textContent()) ?? '';
    await s.page.getByRole('button', { name: 'Create a share link' }).click();
    const link = s.page.getByLabel('Share link');
    await link.waitFor();
    const url = await link.inputValue();
    expect(url).toContain('/s/');
    const anon = await launchBrowser({ viewport: { width: 1280, height: 800 } });
    try {
      await anon.page.goto(url);
      await anon.page.getByRole('heading', { level: 1, name }).waitFor();
      // The shared page shows the cached analysis: the five rectangles of L(5,2) (REFERENCE.md, lens spaces).
      const table = anon.page.getByRole('table', { name: 'Regions' });
      await table.waitFor({ timeout: ANALYSIS_TIMEOUT });
      await expect.poll(() => table.locator('tbody tr').count()).toBe(5);
      expect(await anon.page.getByRole('button', { name: 'Midpoint subdivision' }).count()).toBe(0);
      await anon.screenshot('lab-share-read-only');
    } finally {
      await anon.close();
    }
  });

  it('places a w basepoint by clicking the surface, as a new revision', async () => {
    const id = diagramIdOf(s.page);
    await s.page.getByRole('tab', { name: 'Draw & edit' }).click();
    await s.page.getByLabel('Basepoint kind').selectOption('w');
    await s.screenshot('lab-edit-panel');
    await s.page.getByRole('button', { name: 'Place a basepoint' }).click();
    const before = await analysisRegions(s.page, id, 4);
    const empty = before.find((r) => r.basepoints.length === 0)!;
    const point = await regionPoint(s.page, empty.id);
    expect(point).not.toBeNull();
    await s.page.mouse.click(point!.x, point!.y);
    await s.page.getByRole('button', { name: 'Finish' }).click();
    await s.page.getByText('Revision 5 (latest)').waitFor({ timeout: 30_000 });
    // One w basepoint in the one component of the complement of each family (REFERENCE.md, multi-pointed diagrams).
    await s.page.getByRole('tab', { name: 'Regions' }).click();
    await regionRows(s.page);
    const after = await analysisRegions(s.page, id, 5);
    expect(after.find((r) => r.id === empty.id)!.basepoints.some((b) => b.startsWith('w'))).toBe(true);
  });

  it('builds a bigon domain on S¹×S² by clicking the surface and reads μ = 1', async () => {
    await openLibrary(s, libraryUrl);
    await createFromTemplate(s, async (page) => {
      await page.getByLabel('Template', { exact: true }).selectOption('s1xs2');
      await expect(page.getByLabel('Genus g').inputValue()).resolves.toBe('1');
    });
    await regionRows(s.page);
    const id = diagramIdOf(s.page);
    const regions = await analysisRegions(s.page, id, 1);
    // OS04: the genus-1 diagram of S^1×S^2 has α, β isotopic meeting twice; two bigons, one holding no basepoint.
    const bigon = regions.find((r) => r.corners === 2 && r.basepoints.length === 0);
    expect(bigon).toBeDefined();
    await s.page.getByRole('tab', { name: 'Domains' }).click();
    // A screen point inside the bigon, computed from the region's faces and the camera (the view's own projection).
    const point = await regionPoint(s.page, bigon!.id);
    expect(point).not.toBeNull();
    await s.page.mouse.click(point!.x, point!.y);
    const coefficient = s.page.getByRole('table', { name: 'Domain coefficients' }).getByTestId('domain-row').nth(bigon!.id).locator('output');
    await expect.poll(() => coefficient.textContent()).toBe('1');
    // Lipshitz 2006: a bigon has e = 1/2, n_x = n_y = 1/4, so μ = 1.
    await expect.poll(() => s.page.getByTestId('maslov-index').textContent(), { timeout: 20_000 }).toBe('1');
    expect(await s.page.getByTestId('domain-status').textContent()).toContain('This is a domain.');
    // Naming the wrong start generator: the boundary of this bigon leaves x1, so "from x2" is refused
    // (Ozsváth–Szabó 2004: ∂(∂D ∩ α) = y − x), and clearing the field lets the boundary decide again.
    const start = await s.page.getByTestId('domain-x').textContent();
    const wrong = start?.includes('x₁') ? 'x2' : 'x1';
    await s.page.getByLabel('x (start)').fill(wrong);
    await expect.poll(() => s.page.getByTestId('domain-status').textContent(), { timeout: 20_000 }).toContain('Not a domain.');
    await s.page.getByLabel('x (start)').fill('');
    await expect.poll(() => s.page.getByTestId('domain-status').textContent(), { timeout: 20_000 }).toContain('This is a domain.');
    await s.page.mouse.move(point!.x, point!.y);
    await s.page.waitForTimeout(400);
    await s.screenshot('lab-s1xs2-bigon-domain');
    // Saved with a name, cleared, and loaded again from the list.
    await s.page.getByLabel('Save this domain as').fill('bigon from x1 to x2');
    await s.page.getByRole('button', { name: 'Save', exact: true }).click();
    const saved = s.page.getByRole('listitem').filter({ hasText: 'bigon from x1 to x2' });
    await saved.waitFor();
    await s.page.getByRole('button', { name: 'Clear' }).click();
    await expect.poll(() => coefficient.textContent()).toBe('0');
    await saved.getByRole('button', { name: 'Load' }).click();
    await expect.poll(() => coefficient.textContent()).toBe('1');
    await expect.poll(() => s.page.getByTestId('maslov-index').textContent(), { timeout: 20_000 }).toBe('1');
  });

  it('shows a broken OBJ upload’s problem with its line number', async () => {
    await openLibrary(s, libraryUrl);
    // Built from a valid fixture by breaking one vertex line (common practice: one deliberate defect).
    const lines = readFileSync(path.join(ROOT, 'tests/fixtures/genus1-standard.obj'), 'utf8').split('\n');
    const k = lines.findIndex((l) => l.startsWith('v ')) + 3;
    lines[k] = 'v 1 zero 0';
    await s.page.getByRole('button', { name: 'Upload a file' }).click();
    await s.page.getByLabel('Mesh file (OBJ, PLY, OFF or STL)').setInputFiles({ name: 'broken-torus.obj', mimeType: 'text/plain', buffer: Buffer.from(lines.join('\n')) });
    await s.page.getByRole('form', { name: 'Upload a diagram file' }).getByRole('button', { name: 'Upload' }).click();
    const errors = s.page.getByTestId('upload-errors');
    await errors.waitFor();
    expect(await errors.textContent()).toContain(`Line ${k + 1}`);
    await s.screenshot('lab-upload-broken-obj');
  });

  it('uploads a valid OBJ and opens its analysis', async () => {
    await openLibrary(s, libraryUrl);
    await s.page.getByRole('button', { name: 'Upload a file' }).click();
    await s.page.getByLabel('Mesh file (OBJ, PLY, OFF or STL)').setInputFiles(path.join(ROOT, 'tests/fixtures/genus1-standard.obj'));
    await s.page.getByRole('form', { name: 'Upload a diagram file' }).getByRole('button', { name: 'Upload' }).click();
    await s.page.waitForURL((u) => u.pathname.includes('/d/'));
    // tests/fixtures/README.md: a torus with alpha_1 and beta_1 meeting once. REFERENCE.md: Σ_R χ(R) = 2 − 2g + 1 = 1
    // and Σ_R e(R) = 2 − 2g = 0, so one region, a disk with its four corners at the one point (Lipshitz 2006: e = 1 − 4/4 = 0).
    const rows = await regionRows(s.page);
    await expect.poll(() => rows.count()).toBe(1);
    expect(await rows.first().locator('[data-col="euler"]').textContent()).toBe('0');
  });

  it('duplicates, renames and deletes a diagram, and Undo brings it back', async () => {
    await openLibrary(s, libraryUrl);
    const rows = s.page.getByTestId('diagram-row');
    await rows.first().waitFor(); // the list loads after the heading; count only once it is there
    const before = await rows.count();
    const l52 = rows.filter({ has: s.page.getByRole('link', { name: 'L(5,2)', exact: true }) }).first();
    await l52.getByRole('button', { name: 'Duplicate L(5,2)' }).click();
    await expect.poll(() => rows.count()).toBe(before + 1);
    const copy = rows.filter({ has: s.page.getByRole('link', { name: 'L(5,2) (copy)' }) });
    await copy.getByRole('button', { name: /^Rename/ }).click();
    const input = s.page.getByLabel('New name for L(5,2) (copy)');
    await input.fill('L(5,2) scratch');
    await input.press('Enter');
    const scratch = rows.filter({ has: s.page.getByRole('link', { name: 'L(5,2) scratch' }) });
    await scratch.waitFor();
    await scratch.getByRole('button', { name: 'Delete L(5,2) scratch' }).click();
    await expect.poll(() => rows.count()).toBe(before);
    const toast = s.page.getByRole('status').filter({ hasText: 'Deleted “L(5,2) scratch”.' });
    await toast.waitFor();
    await s.screenshot('lab-library-undo-toast');
    await toast.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => rows.count()).toBe(before + 1);
    await scratch.waitFor();
  });

  it('explains a missing WebGL context in place of the view and keeps the tables working, read-only for a viewer', async () => {
    // Without the software rasterizer Chromium has no WebGL at all (STACK.md).
    const v = await openSignedIn('viewer', undefined, { extraArgs: ['--disable-software-rasterizer'] });
    try {
      await v.page.getByRole('link', { name: new RegExp(DEMO_WORKSPACE_NAME) }).click();
      await v.page.getByTestId('diagram-row').first().getByRole('link').click();
      await v.page.getByText('The 3D view needs WebGL').waitFor();
      await (await regionRows(v.page)).first().waitFor();
      expect(await v.page.getByRole('tab', { name: 'Draw & edit' }).count()).toBe(0);
      await v.screenshot('lab-no-webgl-viewer');
    } finally {
      await v.close();
    }
  });

  it('sorts the library by a header button (aria-sort) and filters it', async () => {
    await openLibrary(s, libraryUrl);
    const header = s.page.getByRole('columnheader', { name: /Name/ });
    await header.getByRole('button').click();
    await expect.poll(() => header.getAttribute('aria-sort')).toBe('ascending');
    await header.getByRole('button').press('Enter');
    await expect.poll(() => header.getAttribute('aria-sort')).toBe('descending');
    await s.page.getByLabel('Filter diagrams').fill('L(5,2)');
    await expect.poll(() => s.page.getByTestId('diagram-row').count()).toBeGreaterThan(0);
    for (const name of await s.page.getByTestId('diagram-row').getByRole('link').allTextContents()) expect(name).toContain('L(5,2)');
    await s.page.getByLabel('Filter diagrams').fill('');
    await s.screenshot('lab-library');
    expect(s.pageErrors).toEqual([]);
  });
});
