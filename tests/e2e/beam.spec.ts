/**
 * /beam: the three optics over a 1 × 1 mm Lambertian source traced side by side, the cross-section drawn,
 * bad input refused beside its field with the last good result kept, a target beam below the étendue limit named.
 * The étendue limit of a 1 mm² source through a 20 mm exit is 2·asin(√(1/(π·10²))) = 6.47° (W. T. Welford,
 * R. Winston, High Collection Nonimaging Optics, 1989, ch. 2; computed).
 */
import { expect, test } from '@playwright/test';

test('three optics traced side by side, drawn, and bad input refused beside the field', async ({ page }) => {
  await page.goto('/beam');
  await expect(page.getByRole('heading', { level: 1, name: 'Beam optics' })).toBeVisible();
  await expect(page.getByTestId('source-in-use')).toContainText('6.47°');
  const table = page.getByTestId('beam-results');
  await expect(table).toBeVisible({ timeout: 45_000 });
  await expect(table).toContainText('cd/klm');
  await expect(page.locator('svg.section polyline').first()).toBeVisible();
  await expect(page.locator('svg.section polyline')).toHaveCount(50 + 2 * 5);

  // a reflectance outside [0, 1]: one line beside the field, the table stays
  await page.getByLabel('Reflector reflectance').fill('1.5');
  await expect(page.locator('#beam-reflectance-error')).toContainText('Reflector reflectance');
  await expect(table).toBeVisible();

  // a 3° target beam from this source is below the étendue limit
  await page.getByLabel('Target beam (full angle)').fill('3');
  await expect(page.getByTestId('target-note')).toContainText('the limit is 6.47°');
  await expect(page.locator('main')).not.toContainText('NaN');
});
