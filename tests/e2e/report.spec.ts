/**
 * /report: a printable one-page summary. Checks the scenario and closed-form results are listed, the
 * trace can be run on request and shows extraction ± standard error, the cautions (IEC 62471, thermal
 * limit, "estimates — verify with measurements") are present, and in print media the report stays
 * visible while the navigation, scenario panel and buttons are hidden.
 */
import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';
import { parseIes } from '../../src/lib/export/ies';

test.beforeEach(async ({ page }) => {
  await page.goto('/report');
  await expect(page.getByRole('heading', { level: 1, name: /^Report: / })).toBeVisible();
  await expect(page).toHaveURL(/[?&]s=4\./);
});

test('lists the scenario, closed-form results, assumptions and cautions', async ({ page }) => {
  await expect(page.getByTestId('report-scenario')).toContainText('GaN');
  await expect(page.getByTestId('report-scenario')).toContainText('1 × 1 × 0.15 mm');
  // critical angle GaN (n 2.487 at 450 nm) → air: asin(1/2.487) = 23.71° (computed)
  await expect(page.getByTestId('report-closed')).toContainText('23.71°');
  await expect(page.getByTestId('report-closed')).toContainText('Dome gain, ideal one-face reference');
  // every encapsulant, ranked by the trace once it has run (by itself, no click)
  await expect(page.getByTestId('report-ranking').getByRole('row')).toHaveCount(3);
  await expect(page.getByTestId('report-ranking')).toContainText('Methyl silicone (n ≈ 1.41) (current)');
  await expect(page.getByTestId('report-ranking')).toContainText(/1\. .* ± /, { timeout: 30_000 });
  const cautions = page.getByTestId('report-cautions');
  await expect(cautions).toContainText('IEC 62471');
  await expect(cautions).toContainText('180 °C');
  await expect(cautions).toContainText('estimates — verify with measurements and follow local codes and licensed practice');
  await expect(page.getByRole('button', { name: 'Print' })).toBeVisible();
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('runs the trace by itself, the same figures as /dome, and offers the IES file of its far field', async ({ page }) => {
  // a small run keeps the test short: the link's scenario ("<version>." + base64url JSON) with 5000 rays
  const param = new URL(page.url()).searchParams.get('s')!;
  const scenario = JSON.parse(Buffer.from(param.slice(2), 'base64url').toString('utf8'));
  scenario.trace.rays = 5000;
  const link = `s=${param.split('.')[0]}.${Buffer.from(JSON.stringify(scenario)).toString('base64url')}`;
  await page.goto(`/dome?${link}`);
  await expect(page.getByTestId('trace-extraction')).toContainText('±', { timeout: 30_000 });
  const onDome = (await page.getByTestId('trace-extraction').textContent())!.replace(/\s+/g, ' ').trim();
  await page.goto(`/report?${link}`);
  await expect(page.getByTestId('report-extraction')).toContainText('±', { timeout: 30_000 });
  expect((await page.getByTestId('report-extraction').textContent())!.replace(/\s+/g, ' ').trim()).toBe(onDome);
  await expect(page.getByTestId('report-gain')).toHaveText(/\d ± \d/);
  await expect(page.getByTestId('report-trace')).toContainText('5,000 rays');
  await expect(page.locator('figure.chart')).toHaveCount(2);
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download IES file' }).click()]);
  const parsed = parseIes(await readFile((await download.path())!, 'utf8'));
  expect(Math.abs(parsed.fluxLm - 100) / 100).toBeLessThan(0.01); // default 100 lm, flux round trip within 1 %
  await page.screenshot({ path: test.info().outputPath('report.png'), fullPage: true });
});

test('print view shows the report and hides navigation, scenario panel and buttons', async ({ page }) => {
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByRole('heading', { level: 1, name: /^Report: / })).toBeVisible();
  await expect(page.getByTestId('report-scenario')).toBeVisible();
  await expect(page.getByTestId('report-closed')).toBeVisible();
  await expect(page.getByTestId('report-cautions')).toBeVisible();
  await expect(page.getByRole('navigation', { name: 'Pages' })).toBeHidden();
  await expect(page.locator('aside.side')).toBeHidden();
  await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
  // the trace starts by itself; until it has finished, print says the figures are the reference only
  await expect(page.getByTestId('report-extraction').or(page.getByText('No trace was run for this report'))).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('report-print.png'), fullPage: true });
  const pdfPage = await page.pdf({ format: 'A4' });
  expect(pdfPage.byteLength).toBeGreaterThan(1000);
});
