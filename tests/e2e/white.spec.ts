/**
 * White-light page: the trace of the demo dome with a yellow garnet phosphor shows a colour with its
 * unit, the charts draw, a bad load is refused beside the field while the last result stays, and the
 * load search for 4000 K gives an answer with its cost. Expected ranges: a blue chip under a yellow
 * garnet phosphor gives a CCT between 2500 K and 10000 K for loads of this order (common practice).
 */
import { expect, test } from '@playwright/test';

test('white light: colour, charts, bad input beside the field, load for 4000 K', async ({ page }) => {
  test.setTimeout(180_000);
  await page.goto('/white');
  await expect(page.getByRole('heading', { level: 1, name: 'White light' })).toBeVisible();
  await expect(page).toHaveURL(/[?&]s=4\./);
  const cct = page.getByTestId('cct');
  await expect(cct).toHaveText(/^\d{4,5} ± \d+ K$/, { timeout: 90_000 });
  const k = Number((await cct.textContent())!.split(' ')[0]);
  expect(k).toBeGreaterThan(2500);
  expect(k).toBeLessThan(10000);
  await expect(page.getByRole('figure').filter({ hasText: 'Escaped spectrum' })).toBeVisible();
  await expect(page.getByRole('figure').filter({ hasText: 'Chromaticity (CIE 1931)' })).toBeVisible();

  // Bad input: the message names the field and range; the last result is kept
  await page.getByLabel('Phosphor load').fill('120');
  await expect(page.getByText(/Phosphor load must be between 0 and 60 wt%/)).toBeVisible();
  await expect(cct).toHaveText(/^\d{4,5} ± \d+ K$/);
  await expect(page.locator('body')).not.toContainText('NaN');
  await page.screenshot({ path: 'test-results/white-page.png', fullPage: true });

  await page.getByRole('button', { name: 'Find the load for this CCT' }).click();
  const answer = page.getByTestId('load-answer');
  await expect(answer).toContainText(/wt% gives \d{4} ± \d+ K/, { timeout: 150_000 });
  await expect(answer).toContainText(/It costs \d+\.\d % of the photons/);
  await page.screenshot({ path: 'test-results/white-page-load.png', fullPage: true });
});
