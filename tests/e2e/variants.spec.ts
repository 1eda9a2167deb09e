/**
 * /variants: keep the demo as A, switch the encapsulant to the phenyl silicone, keep as B; the page
 * traces both in the background and shows them side by side with the ratio to A; the CSV and JSON
 * exports hold both; the link and the browser keep the variants. The expected order (phenyl above
 * methyl) follows the closed form: η_F rises with the encapsulant index for a GaN chip (computed;
 * escape cone ½∫T(θ) sin θ dθ, common practice).
 */
import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';

const panel = (page: Page) => page.getByRole('complementary', { name: 'Scenario' });
const keeper = (page: Page) => page.getByRole('group', { name: 'Keep variants' });
const cell = (page: Page, row: string, column: number) => page.locator(`tr[data-row="${row}"] td`).nth(column);

async function keepAandB(page: Page) {
  await page.goto('/dome');
  await expect(page).toHaveURL(/[?&]s=\d+\./);
  await keeper(page).getByRole('button', { name: 'Keep as variant A' }).click();
  await expect(keeper(page).getByRole('status')).toHaveText('Kept as variant A.');
  await page.getByLabel('Encapsulant material').selectOption({ label: 'Phenyl silicone (n ≈ 1.53)' });
  await keeper(page).getByRole('button', { name: 'Keep as variant B' }).click();
  await expect(keeper(page).getByRole('status')).toHaveText('Kept as variant B.');
  await keeper(page).getByRole('link', { name: 'Compare 2 variants' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Variants side by side' })).toBeVisible();
}

test('two kept variants are traced side by side with the ratio to the first, and every export holds both', async ({ page }) => {
  await keepAandB(page);
  await expect(page.getByTestId('variant-column')).toHaveCount(2);
  // both traced in the background: a number ± σ in percent in each column
  await expect(cell(page, 'extraction', 0)).toHaveText(/^\d+\.\d+ ± 0\.\d+ %$/, { timeout: 30_000 });
  await expect(cell(page, 'extraction', 1)).toHaveText(/^\d+\.\d+ ± 0\.\d+ %$/, { timeout: 30_000 });
  await expect(cell(page, 'ratio', 0)).toHaveText('1 ×');
  await expect(cell(page, 'ratio', 1)).toHaveText(/^1\.\d+ ± 0\.\d+ ×$/);
  const a = parseFloat(await cell(page, 'extraction', 0).innerText());
  const b = parseFloat(await cell(page, 'extraction', 1).innerText());
  expect(b).toBeGreaterThan(a);
  await expect(page.locator('main')).not.toContainText('NaN');
  await expect(page.getByText('Every variant is in each file')).toBeVisible();

  // the link carries the variants
  expect(new URL(page.url()).searchParams.get('v')).toMatch(/^1\./);

  const [csv] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save comparison (CSV)' }).click()]);
  const csvText = await readFile((await csv.path())!, 'utf8');
  expect(csvText.split('\r\n')[0]).toBe('Figure,Unit,A,A ±1σ,B,B ±1σ,Notes');
  expect(csvText).toMatch(/"Package extraction, traced",%,\d+\.\d+,0\.\d+,\d+\.\d+,0\.\d+,/);
  expect(csvText).not.toMatch(/\d\.\d*0{6,}\d/);

  const [json] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save comparison (JSON)' }).click()]);
  const doc = JSON.parse(await readFile((await json.path())!, 'utf8'));
  expect(doc.view).toBe('variants');
  expect(doc.variants.map((v: { name: string }) => v.name)).toEqual(['A', 'B']);
  expect(doc.variants[1].scenario.encapsulant.medium).toEqual({ kind: 'material', id: 'silicone-phenyl' });
  expect(doc.variants[0].results.package.rays).toBe(250_000);
  expect(doc.variants[1].results.bareChip.extraction).toBeGreaterThan(0);

  const [png] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save charts (PNG)' }).click()]);
  // page, the scenario both variants were kept from, the variants, the content
  expect(png.suggestedFilename()).toBe('outcouple-variants-demo-blue-1-mm-chip-silicone-choice-a-vs-b-charts.png');
  const bytes = await readFile((await png.path())!);
  expect(bytes.readUInt32BE(16)).toBe(1600); // PNG IHDR width
  await png.saveAs('test-results/variants-charts.png');
});

test('rename, load into the panel, remove; a reload keeps the variants', async ({ page }) => {
  await keepAandB(page);
  await page.getByLabel('Name of variant 2').fill('Phenyl');
  await page.getByLabel('Name of variant 2').press('Enter');
  await expect(page.getByTestId('variant-column').nth(1)).toContainText('Phenyl');
  await page.getByLabel('Name of variant 2').fill('a');
  await page.getByLabel('Name of variant 2').press('Enter');
  await expect(page.getByRole('alert')).toContainText('Variant name "a" is already used');
  await page.getByRole('button', { name: 'Load A into the panel' }).click();
  await expect(panel(page)).toContainText(/Methyl silicone/);
  await page.reload();
  await expect(page.getByTestId('variant-column')).toHaveCount(2);
  await page.getByRole('button', { name: 'Remove A' }).click();
  await expect(page.getByTestId('variant-column')).toHaveCount(1);
  await expect(page.getByTestId('variant-column')).toContainText('Phenyl');
});

test('the link carries the variants to another browser; kept variants it replaces can be brought back', async ({ page, browser }) => {
  await keepAandB(page);
  const link = page.url();
  const other = await browser.newContext();
  const there = await other.newPage();
  await there.goto('/dome');
  await keeper(there).getByRole('button', { name: 'Keep as variant A' }).click();
  await there.goto(link);
  await expect(there.getByTestId('variant-column')).toHaveCount(2);
  await expect(there.getByRole('note').filter({ hasText: 'replace the 1 you had kept (A)' })).toBeVisible();
  await there.getByRole('button', { name: 'Bring back my variants' }).click();
  await expect(there.getByTestId('variant-column')).toHaveCount(1);
  await other.close();
});

test('an unreadable saved set is set aside with a message', async ({ page }) => {
  await page.addInitScript(() => {
    if (sessionStorage.getItem('seeded')) return;
    sessionStorage.setItem('seeded', '1');
    localStorage.setItem('outcouple.variants.v1', '{"version":1,"variants":[{"name":"A","scenario":{"version":2}}]}');
  });
  await page.goto('/variants');
  await expect(page.getByRole('alert').first()).toContainText('Your saved variants could not be read');
  const aside = await page.evaluate(() => localStorage.getItem('outcouple.variants.v1.unreadable'));
  expect(aside).toContain('"name":"A"');
});

for (const [w, h] of [[1366, 900], [390, 844]] as const) {
  test(`screenshot at ${w}×${h}: the table scrolls inside its card`, async ({ page }) => {
    await keepAandB(page);
    await page.setViewportSize({ width: w, height: h });
    await expect(cell(page, 'extraction', 1)).toHaveText(/±/, { timeout: 30_000 });
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: `test-results/variants-${w}x${h}.png`, fullPage: true });
    await page.locator('section', { has: page.getByRole('heading', { name: 'Headline figures' }) }).screenshot({ path: `test-results/variants-table-${w}x${h}.png` });
  });
}
