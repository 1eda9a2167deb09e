/**
 * White-light page, phosphor region: choosing a conformal layer shows its thickness field, the trace
 * gives a colour, and a layer too thick for the dome is refused beside the field naming the range.
 */
import { expect, test } from '@playwright/test';

test('white light: a conformal phosphor layer, its thickness checked against the package', async ({ page }) => {
  test.setTimeout(180_000);
  await page.goto('/white');
  // a choice made before the page has hydrated would reach no handler
  await page.locator('html[data-ready="true"]').waitFor({ state: 'attached' });
  await page.getByLabel('Region').selectOption('conformal');
  const thickness = page.getByLabel('Layer thickness');
  await expect(thickness).toBeVisible();
  await thickness.fill('0.3');
  await thickness.press('Enter');
  await page.getByLabel('Phosphor load', { exact: true }).fill('60');
  await page.getByLabel('Phosphor load', { exact: true }).press('Enter');
  await expect(page).toHaveURL(/[?&]s=4\./);
  await expect(page.getByTestId('cct')).toHaveText(/^\d{4,5} ± \d+ K$|^— K$/, { timeout: 90_000 });
  await expect(page.getByRole('table').filter({ hasText: 'Share of chip photons' })).toContainText('conformal phosphor');

  await thickness.fill('3');
  await thickness.press('Enter');
  await expect(page.getByText(/Phosphor layer thickness must be from 0\.005 mm to below 1\.05 mm for a conformal layer/)).toBeVisible();
  await expect(page.locator('body')).not.toContainText('NaN');
  await page.screenshot({ path: 'test-results/white-region.png', fullPage: true });
});
