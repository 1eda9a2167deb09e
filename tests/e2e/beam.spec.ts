/**
 * /beam: the three optics over a 1 × 1 mm Lambertian source traced side by side, the cross-section drawn,
 * bad input refused beside its field with the last good result kept, a target beam below the étendue limit named.
 * The étendue limit of a 1 mm² source through a 20 mm exit is 2·asin(√(1/(π·10²))) = 6.47° (W. T. Welford,
 * R. Winston, High Collection Nonimaging Optics, 1989, ch. 2; computed).
 */
import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';

test('three optics traced side by side, drawn, and bad input refused beside the field', async ({ page }) => {
  await page.goto('/beam');
  await expect(page.getByRole('heading', { level: 1, name: 'Beam optics' })).toBeVisible();
  await expect(page.getByTestId('source-in-use')).toContainText('6.47°');
  const table = page.getByTestId('beam-results');
  await expect(table).toBeVisible({ timeout: 45_000 });
  await expect(table).toContainText('cd/klm');
  // traced on the worker pool, its speed stated
  await expect(page.getByText(/traced in [\d.]+ s on \d+ workers? \([\d.]+ million rays\/s\)/)).toBeVisible();
  await expect(page.locator('svg.section polyline').first()).toBeVisible();
  await expect(page.locator('svg.section polyline')).toHaveCount(50 + 2 * 5);

  // a reflectance outside [0, 1]: one line beside the field, the table stays
  await page.getByLabel('Reflector reflectance').fill('1.5');
  await expect(page.locator('#beam-reflectance-error')).toContainText('Reflector reflectance');
  await expect(table).toBeVisible();

  // a 3° target beam from this source is below the étendue limit: refused beside its field in one line
  await page.getByLabel('Target beam (full angle)').fill('3');
  await expect(page.locator('#beam-target-error')).toContainText('no optic of this size can make a 3° beam from this source; the limit is 6.47°');
  // … and sizing the exit for it gives an exit the étendue allows: 2·√(1/π)/sin 1.5° = 43.1 mm, +15 %
  await page.getByRole('button', { name: 'Size the exit for this beam' }).click();
  await expect(page.getByTestId('target-note')).toContainText('at least 43.1 mm');
  await expect(page.getByLabel('Exit diameter')).toHaveValue('49.6');
  await page.reload(); // the design form is the page's own: back to its defaults
  await expect(table).toBeVisible({ timeout: 45_000 });

  // an optic smaller than the source: every design refuses, one line beside the field, the table stays
  await page.getByLabel('Exit diameter').fill('1');
  await expect(page.locator('#beam-exit-error')).toHaveText(/^Exit diameter must exceed the source's diameter 1.41 mm: the optic is smaller than the source/);
  await expect(table).toBeVisible();
  await page.getByLabel('Exit diameter').fill('20');

  // a height the TIR collimator cannot hold: it says why beside the Height field, the other optics are traced
  await page.getByLabel('Height', { exact: true }).fill('3');
  await expect(page.locator('#beam-height-hint')).toContainText('TIR collimator: Height: a TIR collimator 20 mm wide');
  await expect(page.getByText(/traced in [\d.]+ s on \d+ worker/)).toBeVisible({ timeout: 45_000 });
  await expect(page.locator('main')).not.toContainText('NaN');
});

/** Clicks and returns the download's name and text. */
async function saved(page: import('@playwright/test').Page, name: string | RegExp): Promise<{ file: string; text: string }> {
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name }).first().click()]);
  return { file: download.suggestedFilename(), text: readFileSync((await download.path())!, 'latin1') };
}

test('exports: profile CSV, IES LM-63 of the beam, results JSON, chart PNG', async ({ page }) => {
  await page.goto('/beam');
  await expect(page.getByText(/traced in [\d.]+ s on \d+ worker/)).toBeVisible({ timeout: 45_000 });
  const profile = await saved(page, 'Save the profile (CSV)');
  expect(profile.file).toMatch(/^outcouple-beam-.*tir-profile\.csv$/);
  expect(profile.text).toMatch(/^r_mm,z_mm,surface$/m);
  const ies = await saved(page, /beam \(IES LM-63\)/);
  expect(ies.text.startsWith('IES:LM-63-2019')).toBe(true);
  expect(ies.text).toMatch(/^TILT=NONE$/m);
  const json = await saved(page, 'Save results (JSON)');
  const doc = JSON.parse(json.text);
  for (const k of ['reflector', 'lens', 'tir']) expect(Number.isFinite(doc.optics[k].results.efficiency)).toBe(true);
  expect(doc.raysPerOptic).toBe(250_000);
  const png = await saved(page, 'Save PNG');
  expect(png.file).toMatch(/\.png$/);
  expect(png.text.slice(1, 4)).toBe('PNG');
});
