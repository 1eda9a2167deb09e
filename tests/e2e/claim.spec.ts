/**
 * /claim: plain fields for a claim, a clearly labelled verdict with its reason and numbers. Verdicts
 * checked are the physics of the decisions core: 85 % extraction for a planar GaN chip in silicone is
 * beyond what light outside the escape cones allows (impossible); a 2.5× gain for planar GaN under
 * n ≈ 1.5 is within the closed-form dome gain (≈ 2.6, computed) — consistent; a flat coating cannot widen
 * the escape cone (n·sin θ conserved), so +40 % on bare GaN is impossible (limit +27.8 %, computed).
 */
import { expect, test } from '@playwright/test';

test.beforeEach(async ({ page }) => {
  await page.goto('/claim');
  await expect(page.getByRole('heading', { level: 1, name: 'Claim check' })).toBeVisible();
  await expect(page).toHaveURL(/[?&]s=\d+\./);
});

test('the default claim, 85 % extraction for the demo planar GaN chip in methyl silicone, is impossible', async ({ page }) => {
  await expect(page.getByLabel('Claimed extraction')).toHaveValue('85');
  await expect(page.getByTestId('verdict')).toHaveText(/Impossible/);
  await expect(page.getByTestId('verdict-reason')).toContainText('85 %');
  await expect(page.getByTestId('verdict-reason')).toContainText('trapped');
  await expect(page.getByTestId('verdict-numbers')).toContainText('Ideal dome');
  await expect(page.getByTestId('verdict-requires')).toBeVisible();
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('a 2.5× gain for planar GaN under a typed n = 1.5 encapsulant is consistent', async ({ page }) => {
  await page.getByRole('radio', { name: /Gain from an encapsulant/ }).check();
  await page.getByLabel('Claimed gain').fill('2.5');
  await page.getByLabel('Encapsulant', { exact: true }).selectOption('typed');
  await page.getByLabel('Encapsulant index n').fill('1.5');
  await expect(page.getByTestId('verdict')).toHaveText(/Consistent/);
  await expect(page.getByTestId('verdict-reason')).toContainText('2.5×');
  await expect(page).toHaveURL(/[?&]kind=gain/);
  await expect(page).toHaveURL(/[?&]enc=1\.5/);
});

test('a flat coating said to add 40 % on the bare chip is impossible: it cannot widen the escape cone', async ({ page }) => {
  await page.getByRole('radio', { name: /flat coating/ }).check();
  await page.getByLabel('Claimed change from the coating').fill('40');
  await page.getByLabel('Encapsulant', { exact: true }).selectOption('none');
  await expect(page.getByTestId('verdict')).toHaveText(/Impossible/);
  await expect(page.getByTestId('verdict-reason')).toContainText('cannot widen the escape cone');
  await page.screenshot({ path: test.info().outputPath('claim.png'), fullPage: true });
});

test('a thin-film chip above the best reported extraction is optimistic and cites its source', async ({ page }) => {
  await page.getByLabel('Chip structure').selectOption('thin-film');
  await page.getByLabel('Claimed extraction').fill('90');
  await expect(page.getByTestId('verdict')).toHaveText(/Optimistic/);
  await expect(page.getByRole('heading', { name: /Best reported figures/ })).toBeVisible();
  await expect(page.locator('main')).toContainText('Appl. Phys. Lett. 89, 071109 (2006)');
  await expect(page.locator('main')).toContainText('from memory');
});

test('an invalid value clears the verdict and the chart, and says why', async ({ page }) => {
  const field = page.getByLabel('Claimed extraction');
  await field.fill('120');
  await expect(page.getByRole('alert').first()).toContainText('Claimed extraction must be more than 0 and at most 100 %.');
  await expect(page.getByTestId('verdict')).toHaveCount(0);
  await expect(page.getByTestId('verdict-problem')).toHaveText('Claimed extraction must be more than 0 and at most 100 %.');
  await expect(page.getByRole('heading', { name: 'Where the claim falls' })).toHaveCount(0);
  await field.fill('abc');
  await expect(page.getByTestId('verdict-problem')).toContainText('Claimed extraction');
  await field.fill('30');
  await expect(page.getByTestId('verdict')).toHaveText(/Consistent|Optimistic/);
  await expect(page.getByRole('heading', { name: 'Where the claim falls' })).toBeVisible();
});

test('a negative coating "increase" is named a decrease and judged as one', async ({ page }) => {
  await page.getByRole('radio', { name: /flat coating/ }).check();
  await page.getByLabel('Claimed change from the coating').fill('-5');
  await expect(page.getByTestId('verdict')).toHaveText(/Consistent/);
  await expect(page.getByTestId('verdict-reason')).toContainText('This is a decrease of 5 %, not an increase');
  await expect(page.getByTestId('verdict-numbers')).toContainText('Claimed decrease from a flat coating');
});

test('an outside index of 5, which the panel accepts, gives a verdict here and computes on every page', async ({ page }) => {
  // the outside medium sits in the panel's collapsible "Base and outside" group
  const panel = page.getByRole('complementary', { name: 'Scenario' });
  await panel.locator('summary', { hasText: 'Base and outside' }).click();
  await panel.getByLabel('Outside material').selectOption('typed');
  await page.getByLabel('Outside index n').first().fill('5');
  await expect(page.getByTestId('verdict')).toBeVisible();
  await expect(page.getByLabel('Outside medium', { exact: true })).toContainText('n 5');
  for (const name of ['Escape cone', 'Layer stack', 'Dome', 'Compare', 'Report']) {
    await page.getByRole('navigation', { name: 'Pages' }).getByRole('link', { name, exact: true }).click();
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    await expect(page.getByTestId('page-failure')).toHaveCount(0);
    await expect(page.locator('main')).not.toContainText('NaN');
  }
});

test('the claim page at laptop and phone width', async ({ page }) => {
  for (const [width, height] of [[1366, 900], [390, 844]]) {
    await page.setViewportSize({ width, height });
    await page.goto('/claim');
    await expect(page.getByRole('heading', { name: 'Where the claim falls' })).toBeVisible();
    await page.screenshot({ path: test.info().outputPath(`claim-${width}.png`), fullPage: true });
  }
});

test('the link reopens the same claim', async ({ page }) => {
  await page.getByLabel('Chip structure').selectOption('unknown');
  // 30 % is within the ideal single-pass dome bound for five faces (≈ 38 %, computed)
  await page.getByLabel('Claimed extraction').fill('30');
  await expect(page).toHaveURL(/[?&]value=30(&|$)/);
  const url = page.url();
  await page.goto(url);
  await expect(page.getByLabel('Claimed extraction')).toHaveValue('30');
  await expect(page.getByLabel('Chip structure')).toHaveValue('unknown');
  await expect(page.getByTestId('verdict')).toHaveText(/Consistent/);
});
