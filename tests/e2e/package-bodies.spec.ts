/**
 * Package bodies in the browser: presets from the scenario panel, the cup and chip fields with their
 * fit messages beside the field, and the to-scale cross-section on the pages that show a package.
 * SHOTS=dir also saves a picture of the drawing for each preset on a laptop and a phone.
 */
import { expect, test, type Page } from '@playwright/test';

const panel = (page: Page) => page.getByRole('complementary', { name: 'Scenario' });
const drawing = (page: Page) => page.getByRole('img', { name: /^Cross-section of/ });

async function choosePreset(page: Page, label: RegExp) {
  // a choice made before the page has hydrated would reach no handler
  await page.locator('html[data-ready="true"]').waitFor({ state: 'attached' });
  const select = panel(page).getByLabel('Start from a preset');
  const option = await select.locator('option', { hasText: label }).getAttribute('value');
  await select.selectOption(option!);
}

test('the mid-power cup preset draws a cup with a diffuse wall and a layered chip, and the link keeps it', async ({ page }) => {
  await page.setViewportSize({ width: 1366, height: 900 });
  await page.goto('/dome');
  await choosePreset(page, /Mid-power cup/);
  await expect(panel(page)).toContainText('Mid-power cup');
  const section = page.getByRole('region', { name: 'The package, in section' });
  await expect(drawing(page)).toHaveAttribute('aria-label', /3\.00 mm wide, 0\.800 mm tall/);
  await expect(section).toContainText('diffuse reflector');
  await expect(section).toContainText('specular mirror');
  await expect(section).toContainText('GaN: n = ');
  await expect(section).toContainText('sapphire: n = ');
  await expect(section.locator('path.stroke.diffuse').first()).toBeAttached();
  await page.reload();
  await expect(panel(page)).toContainText('Mid-power cup');
  await expect(section).toContainText('diffuse reflector');
});

test('a cup floor narrower than the chip is refused beside the field; the last good package stays', async ({ page }) => {
  await page.setViewportSize({ width: 1366, height: 900 });
  await page.goto('/dome');
  await choosePreset(page, /Mid-power cup/);
  await panel(page).locator('summary', { hasText: /^Base and outside/ }).click();
  const floor = panel(page).getByLabel('Cup floor radius');
  await floor.fill('0.5');
  await expect(panel(page).getByRole('alert')).toHaveText(
    "Cup floor radius must be more than the chip's half-diagonal (0.708 mm) so the chip fits on the floor, and at most 1000 mm."
  );
  await expect(drawing(page)).toHaveAttribute('aria-label', /3\.00 mm wide/);
  await floor.fill('1.4');
  await expect(panel(page).getByRole('alert')).toHaveCount(0);
});

test('a textured top fraction outside 0–1 is refused with its range', async ({ page }) => {
  await page.goto('/dome');
  await panel(page).locator('summary', { hasText: 'Structure, emitter and surfaces' }).click();
  await panel(page).getByLabel('Textured top fraction').fill('1.5');
  await expect(panel(page).getByRole('alert')).toHaveText('Textured top fraction must be between 0 and 1.');
});

test('the compare and report pages show the same drawing', async ({ page }) => {
  for (const path of ['/compare', '/report']) {
    await page.goto(path);
    await expect(drawing(page), path).toHaveAttribute('aria-label', /5\.00 mm wide, 2\.50 mm tall/);
  }
});

for (const [width, height] of [[1366, 900], [390, 844]] as const) {
  test(`each preset's drawing at ${width} × ${height} fits the page`, async ({ page }) => {
    await page.setViewportSize({ width, height });
    await page.goto('/dome');
    for (const preset of [/Dome demo/, /Mid-power cup/, /Chip-scale/]) {
      if (width < 600) await panel(page).getByRole('button', { name: 'Edit' }).click();
      await choosePreset(page, preset);
      if (width < 600) await panel(page).getByRole('button', { name: 'Hide' }).click();
      const figure = page.locator('figure.section');
      await figure.scrollIntoViewIfNeeded();
      const box = await drawing(page).boundingBox();
      expect(box!.width).toBeGreaterThan(100);
      expect(box!.x + box!.width).toBeLessThanOrEqual(width);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      if (process.env.SHOTS) await figure.screenshot({ path: `${process.env.SHOTS}/${String(preset.source).replace(/\W+/g, '-')}-${width}.png` });
    }
  });
}
