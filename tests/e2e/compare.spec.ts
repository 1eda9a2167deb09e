/**
 * /compare: every encapsulant of the demo scenario traced in the background and ranked by the trace,
 * the reference column, the optic-material filter, the chart, "use this encapsulant", cancel, and the
 * far-field IES/CSV downloads. Expected orderings: a higher encapsulant index widens the GaN chip's
 * escape cone (sin θc = n_enc/n_chip; E. F. Schubert, Light-Emitting Diodes, 2nd ed., ch. 5).
 * The downloaded IES file is read back with our own parser: its flux must match the lumens asked for
 * within 1 % (ANSI/IES LM-63-2019 structure; flux 2π ∫ I sin θ dθ).
 */
import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import { parseIes } from '../../src/lib/export/ies';
import { inkedPixels } from './chart-pixels';

const ranking = (page: Page) => page.getByTestId('ranking-table');
const rowOf = (page: Page, name: RegExp) => ranking(page).getByRole('row').filter({ has: page.getByRole('rowheader', { name }) });

test.beforeEach(async ({ page }) => {
  await page.goto('/compare');
  await expect(page.getByRole('heading', { level: 1, name: 'Compare encapsulants' })).toBeVisible();
  await expect(page).toHaveURL(/[?&]s=4\./);
});

const traced = (page: Page) => ranking(page).getByTestId('traced-extraction');

/** The first number in a text ("40.12 % ± 0.11 %" → 40.12). */
const first = (text: string) => Number(text.replace(/,/g, '').match(/-?\d+(\.\d+)?/)![0]);

test('ranks the encapsulants by the trace with no click, each with ± σ, phenyl above methyl silicone', async ({ page }) => {
  await expect(page.getByTestId('best-candidate')).toContainText('× the current', { timeout: 30_000 });
  const names = await ranking(page).locator('tbody th[scope="row"]').allInnerTexts();
  expect(names.length).toBe(3); // the library's three potting materials; optics only on request
  expect(names.join(' ')).not.toMatch(/PMMA|Polycarbonate|glass/i);
  const cells = await traced(page).allInnerTexts();
  expect(cells.every((c) => /\d+\.\d+ % ± /.test(c))).toBe(true);
  const values = cells.map(first);
  for (let i = 1; i < values.length; i++) expect(values[i]).toBeLessThanOrEqual(values[i - 1]);
  const idx = (re: RegExp) => names.findIndex((n) => re.test(n));
  expect(idx(/Phenyl silicone/)).toBeLessThan(idx(/Methyl silicone/));
  // the traced package figure is several times the ideal one-face reference column
  await expect(ranking(page).getByRole('columnheader', { name: 'Ideal one-face reference' })).toBeVisible();
  await expect(rowOf(page, /Methyl silicone/)).toContainText('current');
  await expect(rowOf(page, /Methyl silicone/)).toContainText('1.000 ± 0 ×');
  await expect(rowOf(page, /Epoxy/)).toContainText('120 °C');
  await expect(page.locator('main')).not.toContainText('NaN');
  expect(await inkedPixels(page, 0)).toBeGreaterThan(500);
});

test('shows the optic materials only when asked, and keeps that choice in the link', async ({ page }) => {
  await page.getByLabel(/Also rank optic materials/).check();
  await expect(rowOf(page, /PMMA/)).toBeVisible();
  await expect(rowOf(page, /Polycarbonate/)).toBeVisible();
  await expect(page).toHaveURL(/[?&]optics=1/);
  await expect(traced(page)).toHaveCount(7);
  await expect(page.getByTestId('best-candidate')).toBeVisible({ timeout: 60_000 });
});

test('"Use" makes a candidate the scenario encapsulant', async ({ page }) => {
  await rowOf(page, /Phenyl silicone/).getByRole('button', { name: /Use Phenyl silicone/ }).click();
  await expect(rowOf(page, /Phenyl silicone/)).toContainText('current');
  await expect(page.getByRole('complementary', { name: 'Scenario' })).toContainText(/Phenyl silicone/);
});

test('a Gaussian band adds the band-weighted columns and the order choice', async ({ page }) => {
  await page.getByRole('complementary', { name: 'Scenario' }).getByLabel('Emission').selectOption('gaussian');
  await expect(ranking(page).getByRole('columnheader', { name: /luminous/ })).toBeVisible();
  await page.getByLabel('Order the reference by extraction').selectOption('luminous');
  await expect(page).toHaveURL(/[?&]order=luminous/);
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('downloads an IES file of a traced candidate with the asked flux', async ({ page }) => {
  await page.getByLabel('Rays per candidate').fill('20000');
  await expect(page.getByTestId('trace-status')).toHaveText(/3 candidates traced, 20,000 rays each/, { timeout: 30_000 });
  const firstRow = page.locator('.file-row').first();
  await firstRow.getByLabel('Flux for the files').fill('250');
  const [download] = await Promise.all([page.waitForEvent('download'), firstRow.getByRole('button', { name: /Download IES file/ }).click()]);
  expect(download.suggestedFilename()).toMatch(/\.ies$/);
  const text = await readFile((await download.path())!, 'utf8');
  expect(text.startsWith('IES:LM-63-2019\r\n')).toBe(true);
  expect(text).toContain('\r\nTILT=NONE\r\n');
  expect(text).toContain('[TEST] Monte Carlo trace 20000 rays seed');
  const parsed = parseIes(text);
  expect(Math.abs(parsed.fluxLm - 250) / 250).toBeLessThan(0.01);

  const [csv] = await Promise.all([page.waitForEvent('download'), firstRow.getByRole('button', { name: /Download far-field CSV/ }).click()]);
  const csvText = await readFile((await csv.path())!, 'utf8');
  expect(csvText.split('\r\n')[0]).toBe('theta (deg),relative intensity,intensity (cd)');
});

test('a long traced ranking can be cancelled and traced again', async ({ page }) => {
  await page.getByLabel('Rays per candidate').fill('3000000');
  await expect(page.getByRole('progressbar', { name: 'Trace progress' })).toBeVisible({ timeout: 15_000 });
  await page.getByRole('button', { name: 'Cancel', exact: true }).click();
  await expect(page.getByRole('main').getByRole('status')).toContainText('Cancelled');
  await expect(page.getByRole('button', { name: 'Trace again' })).toBeEnabled();
});
