/**
 * The scenario panel on a laptop and a phone, the chip's emission range, the base's reflectance and
 * the term tooltips, driven by role and label.
 */
import { expect, test, type Page } from '@playwright/test';

const panel = (page: Page) => page.getByRole('complementary', { name: 'Scenario' });

test('at 1366 × 900 the open scenario panel fits its column without a scroll of its own', async ({ page }) => {
  await page.setViewportSize({ width: 1366, height: 900 });
  await page.goto('/dome');
  await expect(panel(page).getByLabel('Wavelength')).toBeVisible();
  const [scroll, client] = await page.locator('aside.side').evaluate((e) => [e.scrollHeight, e.clientHeight]);
  expect(scroll).toBeLessThanOrEqual(client);
});

test('at 390 px wide the home, dome and escape pages do not scroll sideways', async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  for (const path of ['/', '/dome', '/escape']) {
    await page.goto(path);
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    expect(await page.evaluate(() => document.documentElement.scrollWidth), path).toBeLessThanOrEqual(390);
  }
});

test('a red chip (GaP, standing for AlGaInP on its GaP window) moves the wavelength from 450 to 620 nm with a notice, and "Keep 450 nm" undoes it', async ({ page }) => {
  await page.goto('/escape');
  await panel(page).getByLabel('Chip material').selectOption({ label: 'GaP' });
  const moved = page.getByTestId('wavelength-moved');
  await expect(moved).toContainText('from 450 nm to 620 nm');
  await expect(moved).toContainText('555–700 nm');
  await expect(panel(page).getByLabel('Wavelength')).toHaveValue('620');
  await moved.getByRole('button', { name: 'Keep 450 nm' }).click();
  await expect(panel(page).getByLabel('Wavelength')).toHaveValue('450');
  await expect(page.getByTestId('wavelength-offer')).toHaveCount(0);
});

test("a silvered base shows the reflectance its n + ik gives (about 0.97 into the silicone at 450 nm)", async ({ page }) => {
  await page.goto('/escape');
  await panel(page).locator('summary', { hasText: 'Base and outside' }).click();
  await panel(page).getByLabel('Base under the chip').selectOption({ label: 'Silver (Ag) (n + ik at λ)' });
  // R = ((n − n₀)² + k²)/((n + n₀)² + k²) (Born & Wolf §14.2) with the library's silver; printed to 3 digits
  await expect(panel(page).getByTestId('base-reflectance')).toContainText(/R ≈ 0\.9\d\d at 450 nm into the encapsulant/);
});

test('a term explains itself in a tooltip on keyboard focus', async ({ page }) => {
  await page.goto('/dome');
  const term = page.getByRole('button', { name: /Fresnel-weighted escape fraction \(ηF\)/ });
  await term.focus();
  const tip = page.getByRole('tooltip').filter({ hasText: 'leaves through one flat face' }).first();
  await expect(tip).toBeVisible();
  await term.press('Escape');
  await expect(tip).toBeHidden();
});
