/**
 * Escape-cone page, driven by role and label. Expected numbers are the computed check values of the
 * escape-cone formulas (Schubert, Light-Emitting Diodes, 2nd ed., ch. 5: from θc = asin(n2/n1), (1 − cos θc)/2 and the
 * Fresnel-weighted integral); the page prints four significant digits, so matching the printed text
 * is a tolerance of half a unit in the fourth digit.
 */
import { expect, test, type Page } from '@playwright/test';
import { inkedPixels } from './chart-pixels';

async function typeIndices(page: Page, nIn: string, nOut: string) {
  await page.getByLabel('Inside medium (light starts here)').selectOption('typed');
  await page.getByLabel('Inside index n').fill(nIn);
  await page.getByLabel('Surrounding medium (light escapes into)').selectOption('typed');
  await page.getByLabel('Surrounding index n').fill(nOut);
}

test.beforeEach(async ({ page }) => {
  await page.goto('/escape');
  await expect(page.getByRole('heading', { level: 1, name: 'Escape cone' })).toBeVisible();
  // The app has started once the scenario is in the link.
  await expect(page).toHaveURL(/[?&]s=4\./);
});

test('typed indices 2.5 → 1 give θc 23.58°, geometric 4.174 %, Fresnel-weighted 3.243 %', async ({ page }) => {
  await typeIndices(page, '2.5', '1');
  await expect(page.getByTestId('critical-angle')).toHaveText('23.58°');
  await expect(page.getByTestId('escape-geometric')).toHaveText('4.174 %');
  await expect(page.getByTestId('escape-fresnel')).toHaveText('3.243 %');
  // Normal-incidence reflectance ((2.5 − 1)/(2.5 + 1))² = 0.1837 (computed check value).
  await expect(page.getByRole('row', { name: /normal incidence/ })).toContainText('18.37 %');
  // θc < 45°: the six cones do not overlap, so no overlap note.
  await expect(page.getByTestId('overlap-note')).toHaveCount(0);
});

test('typed indices 2.5 → 1.5 give θc 36.87°, geometric 10.00 %, Fresnel-weighted 8.796 %', async ({ page }) => {
  await typeIndices(page, '2.5', '1.5');
  await expect(page.getByTestId('critical-angle')).toHaveText('36.87°');
  await expect(page.getByTestId('escape-geometric')).toHaveText('10.00 %');
  await expect(page.getByTestId('escape-fresnel')).toHaveText('8.796 %');
});

test('θc above 45° shows the overlap note on the cuboid estimate', async ({ page }) => {
  // 1.5 → 1.2: θc = asin(0.8) = 53.13° (computed), above 45°, so neighbouring cones overlap.
  await typeIndices(page, '1.5', '1.2');
  await expect(page.getByTestId('critical-angle')).toHaveText('53.13°');
  await expect(page.getByTestId('overlap-note')).toContainText('overlap');
});

test('surrounding index above the inside index: no critical angle, half the light reaches the face', async ({ page }) => {
  await typeIndices(page, '1.4', '1.6');
  await expect(page.getByTestId('critical-angle')).toHaveText('—');
  await expect(page.getByText(/no total internal reflection/).first()).toBeVisible();
  // The whole hemisphere facing the face: (1 − cos 90°)/2 = 50 % (exact).
  await expect(page.getByTestId('escape-geometric')).toHaveText('50.00 %');
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('both charts are drawn, labelled and exportable', async ({ page }) => {
  const figures = page.locator('figure.chart');
  await expect(figures).toHaveCount(2);
  await expect(page.getByRole('img', { name: /transmittance in percent against angle of incidence/ })).toBeVisible();
  await expect(page.getByRole('img', { name: /escape fraction through one flat face/ })).toBeVisible();
  await expect.poll(() => inkedPixels(page, 0)).toBeGreaterThan(2000);
  await expect.poll(() => inkedPixels(page, 1)).toBeGreaterThan(2000);

  const csv = page.waitForEvent('download');
  await page.getByRole('button', { name: /Save CSV: Transmittance/ }).click();
  const file = await csv;
  // Named by page, scenario and content (exportFileName)
  expect(file.suggestedFilename()).toMatch(/^outcouple-escape-[a-z0-9-]+-transmittance-vs-angle\.csv$/);
  const text = await (await file.createReadStream()).toArray();
  const lines = Buffer.concat(text).toString('utf8').trim().split('\r\n');
  expect(lines[0]).toContain('Angle of incidence');
  expect(lines).toHaveLength(182); // header + 181 angles, every 0.5° from 0° to 90°

  const png = page.waitForEvent('download');
  await page.getByRole('button', { name: /Save PNG: Escape through one face/ }).click();
  expect((await png).suggestedFilename()).toMatch(/^outcouple-escape-[a-z0-9-]+-escape-vs-surrounding-index\.png$/);
});

test('a bad index shows an error naming the field and range, and keeps the last good result', async ({ page }) => {
  await typeIndices(page, '2.5', '1');
  await expect(page.getByTestId('critical-angle')).toHaveText('23.58°');
  const before = await inkedPixels(page, 0);

  const field = page.getByLabel('Surrounding index n');
  for (const bad of ['0', 'abc', '-1', '7']) {
    await field.fill(bad);
    await expect(page.getByRole('alert').filter({ hasText: 'Surrounding index n must be between 1 and 6.' })).toBeVisible();
    await expect(field).toHaveAttribute('aria-invalid', 'true');
    await expect(page.getByTestId('critical-angle')).toHaveText('23.58°');
    await expect(page.getByTestId('escape-fresnel')).toHaveText('3.243 %');
    await expect(page.locator('main')).not.toContainText('NaN');
  }
  expect(await inkedPixels(page, 0)).toBeGreaterThan(2000);
  expect(before).toBeGreaterThan(2000);

  // Fixing the value clears the error and updates the result: 2.5 → 1.5 gives θc 36.87°.
  await field.fill('1.5');
  await expect(page.getByRole('alert')).toHaveCount(0);
  await expect(page.getByTestId('critical-angle')).toHaveText('36.87°');
});

test('defaults follow the scenario: GaN chip into the methyl silicone, or into air', async ({ page }) => {
  // Demo scenario: GaN, n(450 nm) = 2.4869 (computed from the formula of Barker & Ilegems, Phys. Rev. B 7, 743 (1973)),
  // into methyl silicone, n ≈ 1.41 (common practice; the library's dispersion gives a little more at 450 nm).
  // θc = asin(1.41/2.487) = 34.5°; 1.43 would give 35.1°. The window 33°–36° allows for that spread.
  const text = (await page.getByTestId('critical-angle').textContent()) ?? '';
  const deg = Number(text.replace('°', ''));
  expect(deg).toBeGreaterThan(33);
  expect(deg).toBeLessThan(36);

  await page.getByLabel('Surrounding medium (light escapes into)').selectOption('outside');
  // Into air: θc = asin(1/2.487) = 23.71°; the window 23.0°–24.2° covers GaN indices 2.45–2.55 (sources spread ±0.05).
  const air = Number(((await page.getByTestId('critical-angle').textContent()) ?? '').replace('°', ''));
  expect(air).toBeGreaterThan(23.0);
  expect(air).toBeLessThan(24.2);
});

test('the link reopens the same view, and the JSON export carries inputs, results and scenario', async ({ page, browser }) => {
  await typeIndices(page, '2.5', '1');
  await expect(page.getByTestId('critical-angle')).toHaveText('23.58°');
  await expect(page).toHaveURL(/into=n%3A1|into=n:1/);
  const url = page.url();

  const other = await browser.newContext();
  const fresh = await other.newPage();
  await fresh.goto(url);
  await expect(fresh.getByTestId('critical-angle')).toHaveText('23.58°');
  await expect(fresh.getByLabel('Surrounding index n')).toHaveValue('1');
  await other.close();

  const dl = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export results (JSON)' }).click();
  const file = await dl;
  const body = Buffer.concat(await (await file.createReadStream()).toArray()).toString('utf8');
  const doc = JSON.parse(body);
  expect(doc.view).toBe('escape-cone');
  expect(doc.inside.n).toBe(2.5);
  expect(doc.surrounding.n).toBe(1);
  expect(doc.results.criticalAngleDeg).toBeCloseTo(23.578, 2); // computed: asin(1/2.5) = 23.578°
  expect(doc.results.onePlanarFace.fresnelUnpolarised).toBeCloseTo(0.03243, 4); // computed check value
  expect(doc.results.cuboidChip).toHaveLength(3);
  // the scenario as the app writes it, at the version its link carries
  expect(doc.scenario.version).toBe(Number(new URL(page.url()).searchParams.get('s')!.split('.')[0]));
});

test('a library material with no index at the wavelength: a message beside the field, the scenario chip instead, no failure', async ({ page }) => {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto('/escape');
  const withChip = (await page.getByTestId('critical-angle').textContent()) ?? '';
  // GaAs's formula (library entry) has a pole at 874.6 nm, between 450 nm and its 970 nm data range
  await page.getByLabel('Inside medium (light starts here)').selectOption({ label: 'GaAs (transparent region)' });
  await expect(page.getByRole('alert').filter({ hasText: /pole at 874\.6 nm.*the scenario chip is used instead\./ })).toBeVisible();
  await expect(page.getByTestId('critical-angle')).toHaveText(withChip); // the scenario chip's result, unchanged
  expect(errors).toEqual([]);
});
