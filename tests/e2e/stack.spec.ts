/**
 * Layer-stack page, driven by role and label. Expected numbers are check values of the project's
 * stack formulas (Macleod, Thin-Film Optical Filters, 4th ed., ch. 2): incoherent 2.5 → 1.5 → 1.0 gives T = 90.23 % against a bare
 * 81.63 % (computed); a quarter-wave MgF2 layer (1.38) on glass (1.52) gives R = 1.260 % at its design
 * wavelength (published as "1.3 %" in optics course notes; 1.260 % computed). The page prints four
 * significant digits, so matching the printed text is a tolerance of half a unit in the fourth digit.
 */
import { expect, test, type Page } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inkedPixels } from './chart-pixels';

/** The canvas as a data URL, to tell whether a chart was redrawn with different data. */
function canvasImage(page: Page, index: number): Promise<string> {
  return page.locator('figure.chart canvas').nth(index).evaluate((el) => (el as HTMLCanvasElement).toDataURL());
}

async function downloadText(page: Page, button: RegExp | string): Promise<{ name: string; text: string }> {
  const dl = page.waitForEvent('download');
  await page.getByRole('button', { name: button }).click();
  const file = await dl;
  const path = await file.path();
  return { name: file.suggestedFilename(), text: await readFile(path, 'utf8') };
}

/** Scenario: typed chip index, air outside, the stack exiting into the outside medium. */
async function typedChipIntoAir(page: Page, nChip: string) {
  await page.getByLabel('Chip material').selectOption('typed');
  await page.getByLabel('Chip index n').fill(nChip);
  await page.getByLabel(/Outside: /).check();
}

/** Makes layer `i` (1-based) a typed index with the given thickness. */
async function typedLayer(page: Page, i: number, n: string, thickness: string) {
  await page.getByLabel(`Layer ${i} material`).selectOption('typed');
  await page.getByLabel(`Layer ${i} index n`).fill(n);
  await page.getByLabel(`Layer ${i} thickness`).fill(thickness);
}

test.beforeEach(async ({ page }) => {
  await page.goto('/stack');
  await expect(page.getByRole('heading', { level: 1, name: 'Layer stack' })).toBeVisible();
  // The page has started once the stack is in the link.
  await expect(page).toHaveURL(/[?&]stack=2\./);
});

test('the starting stack shows R, T, A, extraction against bare, the trapped-light sentences and three drawn charts', async ({ page }) => {
  await expect(page.getByTestId('normal-R')).toHaveText(/^\d+\.\d+ %$/);
  await expect(page.getByTestId('extraction')).toHaveText(/^\d+\.\d+ %$/);
  await expect(page.getByTestId('gain')).toContainText('×');
  await expect(page.getByText(/A planar stack cannot widen the .* escape cone/)).toBeVisible();
  await expect(page.locator('figure.chart')).toHaveCount(3);
  for (let i = 0; i < 3; i++) await expect.poll(() => inkedPixels(page, i)).toBeGreaterThan(2000);
  await expect(page.getByRole('img', { name: /stack transmittance in percent against the angle of incidence/ })).toBeVisible();
  await expect(page.getByRole('img', { name: /refractive index against depth/ })).toBeVisible();
  await expect(page.getByRole('img', { name: /reflectance at normal incidence in percent against wavelength/ })).toBeVisible();
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('incoherent 2.5 → 1.5 → air gives T = 90.23 % against a bare 81.63 % (computed; incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2)', async ({ page }) => {
  await typedChipIntoAir(page, '2.5');
  await page.getByLabel(/Thick layers \(incoherent/).check();
  await typedLayer(page, 1, '1.5', '1000');
  await expect(page.getByLabel('Layer 1 thickness')).toHaveValue('1000');
  await expect(page.getByLabel('Layer 1 thickness').locator('xpath=following-sibling::span')).toHaveText('µm');
  await expect(page.getByTestId('normal-T')).toHaveText('90.23 %');
  await expect(page.getByRole('row', { name: /Transmittance T/ })).toContainText('81.63 %');
  await expect(page.getByTestId('normal-A')).toHaveText('0 %');
  // Escape cone into air asin(1/2.5) = 23.58° (computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5), unchanged by the stack.
  await expect(page.getByRole('row', { name: /Escape cone/ })).toContainText('23.58°');
  // Bare Fresnel-weighted escape 2.5 → 1: 3.243 % (computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5).
  await expect(page.getByTestId('extraction-bare')).toHaveText('3.243 %');
  // Thick mode draws no R(λ) chart and says why.
  await expect(page.locator('figure.chart')).toHaveCount(2);
  await expect(page.getByText(/drawn in thin-film mode only/)).toBeVisible();
  // Where the light goes: between 23.6° and 36.9° (asin(1.5/2.5) = 36.87°) trapped in the layer.
  await expect(page.getByText(/between 23\.6° and 36\.9° pass into layer 1 \(n 1\.5\) and are totally reflected at its top face/)).toBeVisible();
  await expect(page.getByText(/Beyond 36\.9°, rays are totally reflected back into the chip/)).toBeVisible();
});

test('quarter-wave MgF2 (1.38) on glass (1.52) gives R = 1.260 % at its design wavelength (incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2)', async ({ page }) => {
  await typedChipIntoAir(page, '1.52');
  // d = λ/(4n) = 450 nm / (4 · 1.38) = 81.5217… nm at the scenario wavelength 450 nm.
  await typedLayer(page, 1, '1.38', String(450 / (4 * 1.38)));
  await expect(page.getByTestId('normal-R')).toHaveText('1.260 %');
  // Bare glass: ((1.52 − 1)/(1.52 + 1))² = 4.258 % (computed; incoherent and thin-film stacks: Macleod, Thin-Film Optical Filters, 4th ed., ch. 2).
  await expect(page.getByRole('row', { name: /Reflectance R/ })).toContainText('4.258 %');
});

test('the quarter-wave button adds n = √(n_chip·n_exit), which cancels normal reflection (Hecht, thin-film section)', async ({ page }) => {
  await typedChipIntoAir(page, '1.52');
  await page.getByRole('button', { name: 'Remove item 1' }).click();
  await expect(page.getByText(/No layers: the chip meets the exit medium directly/)).toBeVisible();
  // With no layers the stack is the bare interface (exact identity).
  await expect(page.getByTestId('extraction')).toHaveText(await page.getByTestId('extraction-bare').innerText());
  // √1.52 = 1.2329 (ideal single-layer coating index √(n₀·nₛ): E. Hecht, Optics, thin-film section)
  await page.getByRole('button', { name: /Add quarter-wave layer n = √\(n.*\) = 1\.233/ }).click();
  await expect(page.getByLabel('Layer 1 index n')).toHaveValue('1.233');
  // n is rounded to 4 digits, so R is not exactly 0: ((1.52 − 1.233²)/(1.52 + 1.233²))² ≈ 9e-9. Below 0.001 %.
  const r = await page.getByTestId('normal-R').innerText();
  expect(r).toMatch(/^< 0\.001 %$|^0 %$/); // shares below 0.001 % print as "< 0.001 %", never a power of ten
});

test('adding, reordering and removing layers updates results and charts', async ({ page }) => {
  await typedChipIntoAir(page, '2.5');
  await typedLayer(page, 1, '1.8', '80');
  const extraction1 = await page.getByTestId('extraction').innerText();
  await expect.poll(() => inkedPixels(page, 1)).toBeGreaterThan(2000);
  const profile1 = await canvasImage(page, 1);

  await page.getByRole('button', { name: 'Add layer' }).click();
  await expect(page.getByLabel('Layer 2 material')).toBeVisible();
  await typedLayer(page, 2, '1.4', '100');
  await expect(page.getByTestId('extraction')).not.toHaveText(extraction1);
  await expect.poll(() => canvasImage(page, 1)).not.toBe(profile1);
  const extraction2 = await page.getByTestId('extraction').innerText();

  // Move layer 2 towards the chip with the keyboard: the order flips and focus follows the moved layer.
  await page.getByRole('button', { name: 'Move item 2 towards the chip' }).focus();
  await page.keyboard.press('Enter');
  await expect(page.getByLabel('Layer 1 index n')).toHaveValue('1.4');
  await expect(page.getByLabel('Layer 2 index n')).toHaveValue('1.8');
  await expect(page.getByRole('button', { name: 'Move item 1 towards the chip' })).toBeDisabled();
  await expect(page.getByRole('button', { name: 'Move item 1 away from the chip' })).toBeFocused();
  await expect(page.getByTestId('extraction')).not.toHaveText(extraction2);

  await page.getByRole('button', { name: 'Remove item 1' }).click();
  await expect(page.getByLabel('Layer 2 material')).toHaveCount(0);
  await expect(page.getByLabel('Layer 1 index n')).toHaveValue('1.8');
  await expect(page.getByTestId('extraction')).toHaveText(extraction1);
  for (let i = 0; i < 3; i++) expect(await inkedPixels(page, i)).toBeGreaterThan(2000);
});

test('a bad value shows an alert naming the field and range and keeps the last result', async ({ page }) => {
  const r = await page.getByTestId('normal-R').innerText();
  const x = await page.getByTestId('extraction').innerText();
  const field = page.getByLabel('Layer 1 thickness');
  for (const bad of ['abc', '-5', '200000', '']) {
    await field.fill(bad);
    await expect(page.getByRole('alert').filter({ hasText: 'Layer 1 thickness must be between 0 and 100000 nm.' })).toBeVisible();
    await expect(field).toHaveAttribute('aria-invalid', 'true');
    await expect(page.getByTestId('normal-R')).toHaveText(r);
    await expect(page.getByTestId('extraction')).toHaveText(x);
  }
  await expect(page.locator('main')).not.toContainText('NaN');
  await field.fill('120');
  await expect(page.getByRole('alert')).toHaveCount(0);
  await expect(page.getByTestId('normal-R')).not.toHaveText(r);
});

test('graded sections expand into sublayers, and the 200-layer limit is stated', async ({ page }) => {
  await page.getByRole('button', { name: 'Add graded-index section' }).click();
  const subs = page.getByLabel('Graded section 2: number of sublayers');
  await expect(subs).toHaveValue('10');
  await expect(page.getByText('11 of at most 200 layers')).toBeVisible();
  await subs.fill('250');
  await expect(page.getByRole('alert').filter({ hasText: 'Graded section 2: number of sublayers must be a whole number between 1 and 200 sublayers.' })).toBeVisible();
  await subs.fill('150');
  await expect(page.getByText('151 of at most 200 layers')).toBeVisible();
  await page.getByRole('button', { name: 'Add graded-index section' }).click();
  await page.getByLabel('Graded section 3: number of sublayers').fill('60');
  await expect(page.getByRole('alert').filter({ hasText: 'The stack would have 211 layers' })).toContainText('at most 200 are allowed');
  await expect(page.getByText('161 of at most 200 layers')).toBeVisible();
  // A graded section's trapped light is told as one band, not one per sublayer.
  await expect(page.getByText(/pass into the graded section \(item 2\)/).first()).toBeVisible();
});

test('switching to thin-film mode refuses a layer thicker than 100 µm, with the reason', async ({ page }) => {
  await page.getByLabel(/Thick layers \(incoherent/).check();
  await page.getByLabel('Layer 1 thickness').fill('500');
  await page.getByLabel(/Thin films \(coherent/).click();
  await expect(page.getByRole('alert').filter({ hasText: 'Item 1 is 500 µm thick; thin-film mode takes layers between 0 and 100000 nm' })).toBeVisible();
  await expect(page.getByLabel(/Thick layers \(incoherent/)).toBeChecked();
  await expect(page.getByLabel(/Thin films \(coherent/)).not.toBeChecked();
  await expect(page.getByLabel('Layer 1 thickness')).toHaveValue('500');
  await expect(page.getByLabel('Layer 1 thickness').locator('xpath=following-sibling::span')).toHaveText('µm');
});

test('the link reopens the same stack, and a reload keeps it', async ({ page, browser }) => {
  await typedChipIntoAir(page, '2.5');
  await typedLayer(page, 1, '1.9', '65');
  await page.getByRole('button', { name: 'Add graded-index section' }).click();
  await page.getByLabel('Graded section 2 profile').selectOption('quintic');
  const extraction = await page.getByTestId('extraction').innerText();
  await expect(page).toHaveURL(/stack=2\./);
  const url = page.url();

  const other = await browser.newContext();
  const fresh = await other.newPage();
  await fresh.goto(url);
  await expect(fresh.getByLabel('Layer 1 index n')).toHaveValue('1.9');
  await expect(fresh.getByLabel('Layer 1 thickness')).toHaveValue('65');
  await expect(fresh.getByLabel('Graded section 2 profile')).toHaveValue('quintic');
  await expect(fresh.getByTestId('extraction')).toHaveText(extraction);
  await other.close();

  // A plain reload (and a visit without the link) finds the stack in storage.
  await page.reload();
  await expect(page.getByLabel('Layer 1 index n')).toHaveValue('1.9');
  await page.goto('/stack');
  await expect(page.getByLabel('Graded section 2 profile')).toHaveValue('quintic');
  await expect(page.getByTestId('extraction')).toHaveText(extraction);
});

test('a damaged stack link says so and shows the last stack instead', async ({ page }) => {
  await page.goto('/stack?stack=1.not-json');
  await expect(page.getByRole('alert').filter({ hasText: 'could not be read' })).toBeVisible();
  await expect(page.getByLabel('Layer 1 material')).toBeVisible();
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('results export as JSON with the scenario; charts save PNG and CSV', async ({ page }) => {
  await typedChipIntoAir(page, '2.5');
  await typedLayer(page, 1, '1.5', '100');
  const shown = await page.getByTestId('extraction').innerText();

  const json = await downloadText(page, 'Export results (JSON, with the scenario)');
  // Named by page, scenario and content (exportFileName)
  expect(json.name).toMatch(/^outcouple-stack-[a-z0-9-]+-results\.json$/);
  const doc = JSON.parse(json.text);
  expect(doc.format).toBe('outcouple-stack-results');
  // the scenario as the app writes it, at the version its link carries
  expect(doc.scenario.version).toBe(Number(new URL(page.url()).searchParams.get('s')!.split('.')[0]));
  expect(doc.scenario.chip.medium).toEqual({ kind: 'index', n: 2.5, k: 0 });
  expect(doc.stack.items[0]).toEqual({ kind: 'layer', medium: { kind: 'index', n: 1.5, k: 0 }, thicknessNm: 100 });
  expect(`${(doc.results.extraction.stack.unpolarised * 100).toPrecision(4)} %`).toBe(shown);
  expect(doc.results.extraction.bare.unpolarised).toBeCloseTo(0.03243, 5); // computed; escape cone ½∫T sin θ dθ: Schubert, Light-Emitting Diodes, 2nd ed., ch. 5
  expect(doc.results.escapeConeDeg).toBeCloseTo(23.578, 3); // asin(1/2.5), computed
  expect(doc.results.whereTheLightGoes.join(' ')).toContain('cannot widen');

  const csv = await downloadText(page, /Save CSV: Stack transmittance against angle/);
  expect(csv.name).toMatch(/^outcouple-stack-[a-z0-9-]+-stack-transmittance-vs-angle\.csv$/);
  const lines = csv.text.trim().split('\r\n');
  expect(lines[0]).toContain('Angle of incidence in the chip θ (°)');
  expect(lines[0]).toContain('Unpolarised — Transmittance T (%)');
  expect(lines).toHaveLength(182); // header + 181 angles, every 0.5°

  const profile = await downloadText(page, /Save CSV: Index profile/);
  expect(profile.text.split('\r\n')[0]).toBe('region,from depth (nm),to depth (nm),n,k');

  const dl = page.waitForEvent('download');
  await page.getByRole('button', { name: /Save PNG: Stack reflectance against wavelength/ }).click();
  const png = await dl;
  expect(png.suggestedFilename()).toMatch(/^outcouple-stack-[a-z0-9-]+-stack-reflectance-vs-wavelength\.png$/);
  const bytes = await readFile(await png.path());
  expect(bytes.subarray(1, 4).toString('ascii')).toBe('PNG');
});

test('screenshots at 1280×800 and 800×1000 (saved to the temp folder), no sideways overflow', async ({ page }) => {
  for (const size of [
    { width: 1280, height: 800 },
    { width: 800, height: 1000 }
  ]) {
    await page.setViewportSize(size);
    await page.goto('/stack');
    await expect.poll(() => inkedPixels(page, 0)).toBeGreaterThan(2000);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: join(tmpdir(), `h6-stack-${size.width}x${size.height}.png`), fullPage: true });
  }
  await page.getByLabel('Layer 1 thickness').fill('x');
  await page.screenshot({ path: join(tmpdir(), 'h6-stack-800-error.png') });
});
