/**
 * /compare: the encapsulant ranking for the demo scenario, its chart, "use this encapsulant", the
 * trace of the top three with progress and cancel, and the far-field IES/CSV downloads. Expected
 * orderings follow the closed form (η_dome rises with index over 1.4–1.6 for a GaN chip; computed).
 * The downloaded IES file is read back with our own parser: its flux must match the lumens asked for
 * within 1 % (ANSI/IES LM-63-2019 structure; flux 2π ∫ I sin θ dθ).
 */
import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { parseIes } from '../../src/lib/export/ies';

async function inkedPixels(page: Page, index: number): Promise<number> {
  return page.locator('figure.chart canvas').nth(index).evaluate((el) => {
    const c = el as HTMLCanvasElement;
    const ctx = c.getContext('2d');
    if (!ctx || c.width === 0 || c.height === 0) return 0;
    const d = ctx.getImageData(0, 0, c.width, c.height).data;
    let n = 0;
    for (let i = 0; i < d.length; i += 4) if (Math.abs(d[i] - d[0]) + Math.abs(d[i + 1] - d[1]) + Math.abs(d[i + 2] - d[2]) > 30) n++;
    return n;
  });
}

const ranking = (page: Page) => page.getByTestId('ranking-table');
const rowOf = (page: Page, name: RegExp) => ranking(page).getByRole('row').filter({ has: page.getByRole('rowheader', { name }) });

test.beforeEach(async ({ page }) => {
  await page.goto('/compare');
  await expect(page.getByRole('heading', { level: 1, name: 'Compare encapsulants' })).toBeVisible();
  await expect(page).toHaveURL(/[?&]s=3\./);
});

test('ranks the library encapsulants for the demo GaN chip, phenyl silicone above methyl silicone', async ({ page }) => {
  const names = await ranking(page).locator('tbody th[scope="row"]').allInnerTexts();
  const idx = (re: RegExp) => names.findIndex((n) => re.test(n));
  expect(names.length).toBeGreaterThanOrEqual(5);
  expect(idx(/Phenyl silicone/)).toBeLessThan(idx(/Methyl silicone/));
  await expect(rowOf(page, /Methyl silicone/)).toContainText('current');
  await expect(rowOf(page, /Methyl silicone/)).toContainText('1.000 ×');
  await expect(rowOf(page, /Epoxy/)).toContainText('120 °C');
  await expect(page.getByTestId('best-candidate')).toContainText('× the current');
  await expect(page.locator('main')).not.toContainText('NaN');
  expect(await inkedPixels(page, 0)).toBeGreaterThan(500);
});

test('"Use" makes a candidate the scenario encapsulant', async ({ page }) => {
  await rowOf(page, /Phenyl silicone/).getByRole('button', { name: /Use Phenyl silicone/ }).click();
  await expect(rowOf(page, /Phenyl silicone/)).toContainText('current');
  await expect(page.getByRole('complementary', { name: 'Scenario' })).toContainText(/Phenyl silicone/);
});

test('a Gaussian band adds the band-weighted columns and the order choice', async ({ page }) => {
  await page.getByRole('complementary', { name: 'Scenario' }).getByLabel('Emission').selectOption('gaussian');
  await expect(ranking(page).getByRole('columnheader', { name: /luminous/ })).toBeVisible();
  await page.getByLabel('Rank by extraction').selectOption('luminous');
  await expect(page).toHaveURL(/[?&]order=luminous/);
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('traces the top three, shows extraction ± standard error, and downloads an IES file with the asked flux', async ({ page }) => {
  await page.getByLabel('Rays per candidate').fill('2000');
  await page.getByRole('button', { name: 'Trace top 3' }).click();
  const table = page.getByTestId('trace-table');
  await expect(table).toBeVisible({ timeout: 30_000 });
  await expect(table.getByTestId('trace-extraction')).toHaveCount(3);
  await expect(table).toContainText('±');
  await expect(page.getByTestId('trace-agreement')).toContainText(/closed-form order|reverses the order/);

  const first = page.locator('.file-row').first();
  await first.getByLabel('Flux for the files').fill('250');
  const [download] = await Promise.all([page.waitForEvent('download'), first.getByRole('button', { name: /Download IES file/ }).click()]);
  expect(download.suggestedFilename()).toMatch(/\.ies$/);
  const text = await readFile((await download.path())!, 'utf8');
  expect(text.startsWith('IES:LM-63-2019\r\n')).toBe(true);
  expect(text).toContain('\r\nTILT=NONE\r\n');
  expect(text).toContain('[TEST] Monte Carlo trace 2000 rays seed');
  const parsed = parseIes(text);
  expect(Math.abs(parsed.fluxLm - 250) / 250).toBeLessThan(0.01);

  const [csv] = await Promise.all([page.waitForEvent('download'), first.getByRole('button', { name: /Download far-field CSV/ }).click()]);
  const csvText = await readFile((await csv.path())!, 'utf8');
  expect(csvText.split('\r\n')[0]).toBe('theta (deg),relative intensity,intensity (cd)');
  await page.screenshot({ path: test.info().outputPath('compare.png'), fullPage: true });
});

test('a long trace can be cancelled', async ({ page }) => {
  await page.getByLabel('Rays per candidate').fill('2000000');
  await page.getByRole('button', { name: 'Trace top 3' }).click();
  await expect(page.getByRole('progressbar', { name: 'Trace progress' })).toBeVisible();
  await page.getByRole('button', { name: 'Cancel' }).click();
  await expect(page.getByRole('main').getByRole('status')).toContainText('Cancelled');
  await expect(page.getByRole('button', { name: 'Trace top 3' })).toBeEnabled();
});
