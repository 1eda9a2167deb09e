/**
 * The dome page in a real browser: the package trace that runs by itself on open and after every change
 * (progress, cancel, kept across reloads), the ideal one-face reference beside it, the charts, the sweeps
 * and the export. Drives the page by role and label.
 */
import { expect, test, type Locator, type Page } from '@playwright/test';
import { drawnPixels } from './chart-pixels';

/** Opens /dome on the demo scenario and waits until the app has started (it writes the scenario into the link). */
async function openDome(page: Page): Promise<void> {
  await page.goto('/dome');
  await expect(page).toHaveURL(/[?&]s=/);
}

/** The first number in an element's text ("7.525 %" → 7.525). */
async function numberIn(locator: Locator): Promise<number> {
  const text = (await locator.textContent()) ?? '';
  const m = text.replace(/,/g, '').match(/-?\d+(\.\d+)?/);
  return m ? Number(m[0]) : Number.NaN;
}

async function setRays(page: Page, rays: number): Promise<void> {
  await page.getByRole('textbox', { name: 'Rays', exact: true }).fill(String(rays));
}

test.describe('dome page', () => {
  test('shows the closed form for the demo scenario', async ({ page }) => {
    await openDome(page);
    await expect(page.getByRole('heading', { name: 'Dome encapsulant', level: 1 })).toBeVisible();
    await expect(page.getByTestId('closed-eta-dome')).toHaveText(/^\d+\.\d+ %$/);
    // computed; dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: GaN n 2.5 under a 1.41 / 1.50 dome gains 2.26 / 2.60; the demo's methyl
    // silicone (n 1.419 at 450 nm) must lie between them.
    const gain = await numberIn(page.getByTestId('closed-gain'));
    expect(gain).toBeGreaterThan(2.26);
    expect(gain).toBeLessThan(2.6);
    // dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: a 1 × 1 mm chip under n 1.41 needs R ≥ 0.997 mm; n 1.419 needs a hair more (≤ 1.01 mm).
    const minRadius = await numberIn(page.getByTestId('closed-min-radius'));
    expect(minRadius).toBeGreaterThanOrEqual(0.997);
    expect(minRadius).toBeLessThan(1.01);
    await expect(page.getByTestId('closed-tir-mark')).toHaveText(/large enough/);
  });

  test('shows a traced package extraction within seconds of opening, with no click, and the reference beside it', async ({ page }) => {
    await openDome(page);
    // No button is pressed: the trace starts by itself.
    await expect(page.getByTestId('trace-extraction')).toHaveText(/^\d+\.\d+ % ± \d+(\.\d+)? %$/, { timeout: 15_000 });
    await expect(page.getByTestId('trace-rays')).toContainText('250,000');
    await expect(page.getByTestId('trace-bare')).toHaveText(/^\d+\.\d+ % ± /);
    await expect(page.getByTestId('trace-gain')).toHaveText(/\d ± \d/);
    await expect(page.getByTestId('trace-speed')).toContainText('rays/s');
    await expect(page.getByRole('heading', { name: 'Ideal one-face reference', level: 2, exact: true })).toBeVisible();
    // The traced package extracts several times the one-face reference (side faces, light returned by the base).
    expect(await numberIn(page.getByTestId('trace-extraction'))).toBeGreaterThan(2 * (await numberIn(page.getByTestId('closed-eta-dome'))));

    // A finite chip whose sides emit beats the one-face point-source closed form by far: the page says why.
    await expect(page.getByTestId('gap-headline')).toContainText('higher than the closed form');
    await expect(page.locator('[data-reason="finite-chip"]')).toBeVisible();
    for (const name of ['Fate of every launched ray', 'Far field: intensity against polar angle', 'Far field: polar plot']) {
      const canvas = page.locator('figure', { hasText: name }).locator('canvas');
      await expect(canvas).toBeVisible();
      expect(await drawnPixels(canvas), `${name} has something drawn`).toBeGreaterThan(1000);
    }
    await expect(page.getByTestId('beam-angle')).toHaveText(/^\d+(\.\d+)?°$/);
    await expect(page.locator('main')).not.toContainText('NaN');
  });

  test('keeps the trace across a reload, and a new ray count is a new trace of the same scenario', async ({ page }) => {
    await openDome(page);
    const extraction = page.getByTestId('trace-extraction');
    await expect(extraction).toContainText('±', { timeout: 15_000 });
    const first = await extraction.textContent();
    await page.reload();
    await expect(extraction).toHaveText(first!, { timeout: 10_000 });
    await expect(page.getByTestId('trace-speed')).toContainText('kept from an earlier run');

    await setRays(page, 100_000);
    await expect(page.getByTestId('trace-rays')).toContainText('100,000', { timeout: 30_000 });
    await expect(page.getByText('The scenario has changed since this trace')).toBeHidden();
    await expect(extraction).toContainText('±');
  });

  test('cancels a run, keeps the page usable, and Run again completes', async ({ page }) => {
    await openDome(page);
    await setRays(page, 4_000_000);
    const bar = page.getByRole('progressbar', { name: 'Trace progress' });
    await expect(bar).toBeVisible({ timeout: 15_000 });
    await page.getByRole('button', { name: 'Cancel', exact: true }).click();
    await expect(page.getByRole('status').filter({ hasText: 'Trace cancelled' })).toBeVisible();
    await expect(bar).toBeHidden();

    await setRays(page, 100_000);
    await expect(page.getByTestId('trace-rays')).toContainText('100,000', { timeout: 30_000 });
    await page.getByRole('button', { name: 'Run again' }).click();
    await expect(page.getByTestId('trace-extraction')).toContainText('±', { timeout: 30_000 });
    await expect(bar).toBeHidden({ timeout: 30_000 });
  });

  test('a changed scenario re-runs the trace by itself', async ({ page }) => {
    await openDome(page);
    await setRays(page, 100_000);
    const extraction = page.getByTestId('trace-extraction');
    await expect(page.getByTestId('trace-rays')).toContainText('100,000', { timeout: 30_000 });
    const first = await extraction.textContent();
    // The alternative silicone of the demo: a higher index, so a different (higher) extraction.
    await page.getByLabel('Encapsulant material').selectOption({ label: 'Phenyl silicone (n ≈ 1.53)' });
    await expect(extraction).not.toHaveText(first!, { timeout: 60_000 });
    await expect(extraction).toContainText('±');
    await expect(page.getByText('The scenario has changed since this trace')).toBeHidden({ timeout: 30_000 });
  });

  test('changing the encapsulant index updates the closed form at once', async ({ page }) => {
    await openDome(page);
    const eta = page.getByTestId('closed-eta-dome');
    const before = await numberIn(eta);
    await page.getByLabel('Encapsulant material').selectOption({ label: 'Typed index n + ik…' });
    await page.getByRole('textbox', { name: 'Encapsulant index n' }).fill('1.53');
    await expect(eta).not.toHaveText(`${before} %`);
    expect(await numberIn(eta)).toBeGreaterThan(before);
    // computed; dome: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5; sine rule, Born & Wolf §4.2.3: GaN 2.5 under 1.50 gains 2.60 and under 1.53 gains 2.73 (±0.02 for n_chip 2.487).
    const gain = await numberIn(page.getByTestId('closed-gain'));
    expect(gain).toBeGreaterThan(2.6);
    expect(gain).toBeLessThan(2.75);
  });

  test('bad input shows the panel error and keeps the last good numbers, never NaN', async ({ page }) => {
    await openDome(page);
    const eta = page.getByTestId('closed-eta-dome');
    const before = await eta.textContent();
    const radius = page.getByRole('textbox', { name: 'Encapsulant radius' });
    await radius.fill('abc');
    await expect(page.getByRole('alert').filter({ hasText: 'Encapsulant radius must be' })).toBeVisible();
    await radius.fill('0.5');
    await expect(page.getByRole('alert').filter({ hasText: "chip's corners" })).toBeVisible();
    await expect(eta).toHaveText(before!);
    await expect(page.locator('main')).not.toContainText('NaN');
  });

  test('asks before a very large run, with an estimated time, instead of starting it', async ({ page }) => {
    await openDome(page);
    await setRays(page, 10_000_000);
    const ask = page.getByRole('alertdialog');
    await expect(ask).toContainText('10,000,000 rays is a large run');
    await expect(ask).toContainText(/about \d/);
    await ask.getByRole('button', { name: 'Not now' }).click();
    await expect(ask).toBeHidden();
    await expect(page.getByRole('progressbar', { name: 'Trace progress' })).toBeHidden();
  });

  test('runs a sweep in the background with progress, draws it, and cancels another', async ({ page }) => {
    await openDome(page);
    const sweep = page.getByTestId('sweep-index');
    await page.getByRole('textbox', { name: 'Rays per point' }).fill('20000');
    await sweep.getByRole('button', { name: /^Run sweep/ }).click();
    await expect(sweep.getByRole('status')).toHaveText('11 points, 20,000 rays each.', { timeout: 60_000 });
    expect(await drawnPixels(sweep.locator('canvas'))).toBeGreaterThan(1000);

    const shape = page.getByTestId('sweep-shape');
    await page.getByRole('textbox', { name: 'Rays per point' }).fill('400000');
    await shape.getByRole('button', { name: /^Run sweep/ }).click();
    await expect(shape.getByRole('progressbar')).toBeVisible();
    await shape.getByRole('button', { name: /^Cancel sweep/ }).click();
    await expect(shape.getByRole('status')).toContainText('Cancelled after');
  });

  test('exports the trace and the reference with the scenario as JSON', async ({ page }) => {
    await openDome(page);
    await expect(page.getByTestId('trace-extraction')).toContainText('±', { timeout: 15_000 });
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export results (JSON)' }).click()
    ]);
    const path = await download.path();
    const { readFile } = await import('node:fs/promises');
    const doc = JSON.parse(await readFile(path, 'utf8'));
    expect(doc.view).toBe('dome');
    expect(doc.scenario.encapsulant.shape).toBe('dome');
    expect(doc.closedForm.etaDome).toBeGreaterThan(0);
    expect(doc.trace.stale).toBe(false);
    expect(doc.trace.package.rays).toBe(250_000);
    expect(doc.trace.package.extraction).toBeGreaterThan(doc.closedForm.etaDome);
  });
});
