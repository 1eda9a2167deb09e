/**
 * Materials page and user materials, driven by role and label. Index checks:
 * GaN n(450 nm) = 2.4869 computed from Barker & Ilegems (1973); fused silica from
 * Malitson (1965), n(450 nm) = 1.46557 computed from the published formula. The table prints four
 * significant digits, so matching the printed text is a tolerance of half a unit in the fourth digit.
 */
import { expect, test, type Page } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inkedPixels } from './chart-pixels';

function row(page: Page, name: string | RegExp) {
  return page.getByRole('row').filter({ has: page.getByRole('rowheader', { name }) });
}

/** Fills the add form with fused silica's Sellmeier coefficients (Malitson 1965, C in µm). */
function addForm(page: Page) {
  return page.getByRole('form', { name: 'Add a user material' });
}

async function addSilica(page: Page, name: string) {
  const form = addForm(page);
  await form.getByLabel('Name', { exact: true }).fill(name);
  await form.getByLabel('Category').selectOption('layer');
  await form.getByLabel(/Sellmeier, C in µm:/).check();
  const B = ['0.6961663', '0.4079426', '0.8974794'];
  const C = ['0.0684043', '0.1162414', '9.896161'];
  for (let i = 0; i < 3; i++) {
    await page.getByLabel(`B${i + 1}`, { exact: true }).fill(B[i]);
    await page.getByLabel(`C${i + 1} (µm)`).fill(C[i]);
  }
  await page.getByLabel('Valid from (nm)').fill('210');
  await page.getByLabel('Valid to (nm)').fill('3710');
  await page.getByLabel('Source of the numbers').fill('Malitson 1965 coefficients, typed in');
  await page.getByRole('button', { name: 'Add material' }).click();
}

test.beforeEach(async ({ page }) => {
  await page.goto('/materials');
  await expect(page.getByRole('heading', { level: 1, name: 'Materials' })).toBeVisible();
  await expect(page).toHaveURL(/[?&]s=4\./);
});

test('the table lists the library with n and k at the scenario wavelength, model, range and source', async ({ page }) => {
  const gan = row(page, /GaN \(ordinary ray\)/);
  await expect(gan).toContainText('2.487'); // Barker & Ilegems 1973 formula at 450 nm: 2.4869 (computed)
  await expect(gan).toContainText('Sellmeier (C in µm)');
  await expect(gan).toContainText('350–10000');
  await expect(gan).toContainText('computed from published formula');
  // GaAs data start at 970 nm: flagged, and its formula's pole (874.6 nm) means no value at 450 nm.
  const gaas = row(page, /GaAs/);
  await expect(gaas).toContainText('outside at 450 nm');
  await expect(gaas).toContainText('no index here');
  // Metals have n < 1 and k > 0.
  await expect(row(page, /Silver/)).toContainText(/0\.0\d+/);
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('filters by text and by category', async ({ page }) => {
  await page.getByLabel('Filter by name, alias or source').fill('silicone');
  await expect(page.getByText(/^2 of \d+ materials shown\.$/)).toBeVisible();
  await page.getByLabel('Filter by name, alias or source').fill('');
  await page.locator('#mat-category').selectOption('metal');
  await expect(page.getByText(/^3 of \d+ materials shown\.$/)).toBeVisible();
  await expect(row(page, /Gold/)).toBeVisible();
  await page.getByLabel('Filter by name, alias or source').fill('zzz-nothing');
  await expect(page.getByText('No material matches the filter.')).toBeVisible();
});

test('ticked materials are plotted as n against wavelength, with k for absorbing ones', async ({ page }) => {
  // The scenario's chip and encapsulant start ticked.
  await expect(page.getByRole('checkbox', { name: 'Plot GaN (ordinary ray)' })).toBeChecked();
  await expect(page.locator('figure.chart')).toHaveCount(1);
  await expect.poll(() => inkedPixels(page, 0)).toBeGreaterThan(2000);
  await expect(page.getByText(/k is 0 for every plotted material/)).toBeVisible();

  await page.getByRole('checkbox', { name: 'Plot Silver (Ag)' }).check();
  await expect(page.locator('figure.chart')).toHaveCount(2);
  await expect(page.getByRole('img', { name: /extinction coefficient k against wavelength .* Silver/ })).toBeVisible();
  await expect.poll(() => inkedPixels(page, 1)).toBeGreaterThan(2000);

  // A bad plotting range is refused with the range named; the chart stays.
  await page.getByLabel('To', { exact: true }).fill('300');
  await expect(page.getByRole('alert').filter({ hasText: 'To must be more than From (350 nm)' })).toBeVisible();
  expect(await inkedPixels(page, 0)).toBeGreaterThan(2000);

  const dl = page.waitForEvent('download');
  await page.getByRole('button', { name: /Save CSV: Refractive index n against wavelength/ }).click();
  const csv = await readFile(await (await dl).path(), 'utf8');
  const lines = csv.trim().split('\r\n');
  expect(lines[0]).toContain('wavelength (nm),GaN (ordinary ray) n,GaN (ordinary ray) in valid range');
  expect(lines).toHaveLength(201); // header + 200 samples from 350 to 1000 nm
});

test('a user material is validated, marked "user", survives a reload and is offered on the stack page', async ({ page }) => {
  // Field-level errors first: nothing typed, then a negative C and a missing range.
  await page.getByRole('button', { name: 'Add material' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'Name must be 1 to 120 characters.' })).toBeVisible();
  await expect(page.getByRole('alert').filter({ hasText: 'Give at least one Sellmeier term' })).toBeVisible();
  await page.getByLabel('Name', { exact: true }).fill('Bad oxide');
  await page.getByLabel('B1', { exact: true }).fill('1');
  await page.getByLabel('C1 (µm)').fill('-0.1');
  await page.getByRole('button', { name: 'Add material' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'C1 (µm) must be a number ≥ 0.' })).toBeVisible();
  await expect(page.getByRole('alert').filter({ hasText: 'Valid from must be a wavelength between 100 and 20000 nm.' })).toBeVisible();
  // A pole inside the range: resonance at C = 0.5 µm → 500 nm, range 400–900 nm.
  await page.getByLabel('C1 (µm)').fill('0.5');
  await page.getByLabel('Valid from (nm)').fill('400');
  await page.getByLabel('Valid to (nm)').fill('900');
  await page.getByRole('button', { name: 'Add material' }).click();
  await expect(page.getByRole('alert').filter({ hasText: /pole at 500 nm/ })).toBeVisible();
  await expect(row(page, /Bad oxide/)).toHaveCount(0);

  await page.reload();
  await addSilica(page, 'My silica');
  await expect(page.getByRole('status').filter({ hasText: 'Added My silica' })).toBeVisible();
  const mine = row(page, /My silica/);
  await expect(mine).toContainText('user');
  await expect(mine).toContainText('1.466'); // Malitson 1965 at 450 nm: 1.46557 (computed from the published formula)

  await page.reload();
  await expect(row(page, /My silica/)).toContainText('user');
  await page.getByLabel('Show', { exact: true }).selectOption('user');
  await expect(page.getByText(/^1 of \d+ materials shown\.$/)).toBeVisible();

  await page.goto('/stack');
  const picker = page.getByLabel('Layer 1 material');
  await expect(picker.locator('optgroup[label="Your materials (user)"] option')).toHaveText(['My silica (user)']);
  await picker.selectOption({ label: 'My silica (user)' });
  await expect(page.getByText('n = 1.466 at 450 nm')).toBeVisible();
});

test('an n,k table and the glass form of Sellmeier are both accepted', async ({ page }) => {
  await page.getByLabel('Name', { exact: true }).fill('Pasted film');
  await page.getByLabel(/Table of wavelength, n, k/).check();
  await page.getByLabel('Rows of wavelength, n, k').fill('wavelength n k\n400, 1.52, 0.001\n600, 1.50, 0.0005\n800 1.49 0');
  await page.getByRole('button', { name: 'Add material' }).click();
  await expect(row(page, /Pasted film/)).toContainText('400–800');

  // PMMA, N. Sultanova et al., Acta Phys. Pol. A 116, 585 (2009), C in µm²: n² − 1 = 1.1819λ²/(λ² − 0.011313);
  // at 450 nm it gives 1.5006 (computed).
  await page.getByLabel('Name', { exact: true }).fill('My acrylic');
  await page.getByLabel(/C in µm² \(glass-catalogue form\)/).check();
  await page.getByLabel('B1', { exact: true }).fill('1.1819');
  await page.getByLabel('C1 (µm²)').fill('0.011313');
  await page.getByLabel('Valid from (nm)').fill('437');
  await page.getByLabel('Valid to (nm)').fill('1052');
  await page.getByRole('button', { name: 'Add material' }).click();
  // Same value as the library's PMMA row (same paper, same form).
  await expect(row(page, /My acrylic/).locator('td.num').first()).toHaveText('1.501');
  await expect(row(page, /^PMMA/).locator('td.num').first()).toHaveText('1.501');
});

test('user materials export to a file and import back; a bad or oversized file changes nothing', async ({ page }) => {
  await addSilica(page, 'Round trip');
  await expect(row(page, /Round trip/)).toBeVisible();

  const dl = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export my materials (JSON)' }).click();
  const file = await dl;
  expect(file.suggestedFilename()).toBe('outcouple-user-materials.json');
  const text = await readFile(await file.path(), 'utf8');
  const doc = JSON.parse(text);
  expect(doc.format).toBe('outcouple-user-materials');
  expect(doc.materials).toHaveLength(1);
  expect(doc.materials[0].dispersion.terms[2]).toEqual({ B: 0.8974794, C: 9.896161 });
  expect(doc.materials[0].provenance).toBe('user supplied');

  await page.getByRole('button', { name: 'Delete user material Round trip' }).click();
  await expect(row(page, /Round trip/)).toHaveCount(0);

  const input = page.getByLabel('Import materials file…');
  await input.setInputFiles({ name: 'mine.json', mimeType: 'application/json', buffer: Buffer.from(text) });
  await expect(page.getByRole('status').filter({ hasText: 'Imported mine.json: 1 added' })).toBeVisible();
  await expect(row(page, /Round trip/)).toContainText('1.466');

  // A file with a bad entry: clear message, nothing lost, nothing added.
  const bad = JSON.parse(text);
  bad.materials[0].id = 'another-one';
  bad.materials[0].dispersion.terms[0].C = -1;
  await input.setInputFiles({ name: 'bad.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
  await expect(page.getByRole('alert').filter({ hasText: 'bad.json: Material 1 (Round trip)' })).toContainText('Nothing was imported');
  await input.setInputFiles({ name: 'notes.json', mimeType: 'application/json', buffer: Buffer.from('not json {') });
  await expect(page.getByRole('alert').filter({ hasText: 'notes.json: The file is not valid JSON' })).toBeVisible();
  await input.setInputFiles({ name: 'big.json', mimeType: 'application/json', buffer: Buffer.alloc(2 * 1024 * 1024 + 10, 32) });
  await expect(page.getByRole('alert').filter({ hasText: 'must be at most 2 MB' })).toBeVisible();
  await page.getByLabel('Show', { exact: true }).selectOption('user');
  await expect(page.getByText(/^1 of \d+ materials shown\.$/)).toBeVisible();

  // Importing the same file again adds nothing: the entry is already there.
  await input.setInputFiles({ name: 'mine.json', mimeType: 'application/json', buffer: Buffer.from(text) });
  await expect(page.getByRole('status').filter({ hasText: '0 added, 1 already present' })).toBeVisible();
});

test('without storage the page says it cannot save and keeps working', async ({ browser }) => {
  const context = await browser.newContext();
  await context.addInitScript(() => {
    Storage.prototype.setItem = () => {
      throw new Error('QuotaExceededError');
    };
  });
  const page = await context.newPage();
  await page.goto('/materials');
  await expect(page.getByText(/Cannot save in this browser: your materials work for this visit only/)).toBeVisible();
  await addSilica(page, 'Visit only');
  await expect(row(page, /Visit only/)).toContainText('user');
  await context.close();
});

test('screenshots at 1280×800 and 800×1000 (saved to the temp folder), no sideways overflow', async ({ page }) => {
  for (const size of [
    { width: 1280, height: 800 },
    { width: 800, height: 1000 }
  ]) {
    await page.setViewportSize(size);
    await page.goto('/materials');
    await expect.poll(() => inkedPixels(page, 0)).toBeGreaterThan(2000);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: join(tmpdir(), `h6-materials-${size.width}x${size.height}.png`), fullPage: true });
  }
  await page.getByRole('button', { name: 'Add material' }).click();
  await page.getByRole('heading', { name: 'Add your own material' }).scrollIntoViewIfNeeded();
  await page.screenshot({ path: join(tmpdir(), 'h6-materials-800-errors.png') });
});
