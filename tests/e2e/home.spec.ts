/**
 * Home page, layout and the shared scenario: navigation keeps the scenario, the panel edits it in
 * place with clear errors, it survives a reload, follows a second tab, survives storage being
 * unavailable, and a damaged or newer link falls back to the demo with a message.
 */
import { expect, test } from '@playwright/test';

const panel = (page: import('@playwright/test').Page) => page.getByRole('complementary', { name: 'Scenario' });

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await expect(page).toHaveURL(/[?&]s=4\./);
});

test('home introduces the tool and the demo scenario, with the cautions in the footer', async ({ page }) => {
  await expect(page.getByRole('heading', { level: 1 })).toContainText('How much light gets out');
  await expect(page.getByRole('heading', { name: 'The demo scenario' })).toBeVisible();
  await expect(page.getByText(/1 × 1 × 0\.15 mm blue GaN chip/)).toBeVisible();
  await expect(page.getByRole('contentinfo')).toContainText('IEC 62471');
  await expect(page.getByRole('contentinfo')).toContainText('verify against measurements and follow local codes and licensed practice');
  await expect(page.getByRole('banner')).toContainText('Outcouple');
  await expect(page.locator('body')).not.toContainText('NaN');
});

test('navigation keeps the scenario in the link', async ({ page }) => {
  await panel(page).getByLabel('Wavelength').fill('530');
  await expect(panel(page)).toContainText('530 nm');
  const s = new URL(page.url()).searchParams.get('s');
  const link = page.getByRole('navigation', { name: 'Pages' }).getByRole('link', { name: 'Escape cone' });
  await expect(link).toHaveAttribute('href', `/escape?s=${s}`);
  await link.click();
  await expect(page).toHaveURL(/\/escape\?/);
  expect(new URL(page.url()).searchParams.get('s')).toBe(s);
  await expect(page.getByRole('heading', { name: /Media at 530 nm/ })).toBeVisible();
  await expect(link).toHaveAttribute('aria-current', 'page');
});

test('panel errors name the field and range, and keep the last valid value', async ({ page }) => {
  const wl = panel(page).getByLabel('Wavelength');
  await wl.fill('abc');
  await expect(panel(page).getByRole('alert')).toHaveText('Wavelength must be between 200 and 2500 nm.');
  await wl.fill('9000');
  await expect(panel(page).getByRole('alert')).toHaveText('Wavelength must be between 200 and 2500 nm.');
  await expect(panel(page)).toContainText('450 nm'); // the summary keeps the last valid value
  await wl.fill('450');
  await expect(panel(page).getByRole('alert')).toHaveCount(0);

  const width = panel(page).getByLabel('Chip width');
  await width.fill('0');
  await expect(panel(page).getByRole('alert').first()).toHaveText('Chip width must be between 0.001 and 1000 mm.');
  // A chip too wide for the 2.5 mm dome is refused with the rule it breaks.
  await width.fill('5');
  await expect(panel(page).getByRole('alert').first()).toContainText('Encapsulant radius must be more than');
  await width.fill('1.2');
  await expect(panel(page).getByRole('alert')).toHaveCount(0);
  await expect(panel(page)).toContainText('1.2 × 1 × 0.15 mm');
});

test('the scenario is remembered across a reload and reaches a second tab', async ({ page, context }) => {
  const second = await context.newPage();
  await second.goto('/');
  await expect(second).toHaveURL(/[?&]s=4\./);

  await panel(page).getByLabel('Wavelength').fill('505');
  await expect(panel(page)).toContainText('505 nm');
  await expect(panel(second)).toContainText('505 nm');
  expect(new URL(second.url()).searchParams.get('s')).toBe(new URL(page.url()).searchParams.get('s'));

  await page.goto('/'); // no s= in the link: the saved scenario is used
  await expect(panel(page)).toContainText('505 nm');
  await panel(page).getByRole('button', { name: 'Reset to demo' }).click();
  await expect(panel(page)).toContainText('450 nm');
});

test('without storage the app keeps working and says it cannot save', async ({ browser }) => {
  const context = await browser.newContext();
  await context.addInitScript(() => {
    Object.defineProperty(window, 'localStorage', {
      get() {
        throw new DOMException('blocked', 'SecurityError');
      }
    });
  });
  const page = await context.newPage();
  await page.goto('/');
  await expect(page.getByText('Cannot save in this browser')).toBeVisible();
  await panel(page).getByLabel('Wavelength').fill('600');
  await expect(panel(page)).toContainText('600 nm');
  await expect(page).toHaveURL(/[?&]s=4\./);
  await context.close();
});

test('a damaged or newer link shows a clear message and the demo scenario', async ({ page }) => {
  await page.goto('/?s=1.not-a-scenario');
  await expect(page.getByRole('alert')).toContainText('could not be read');
  await expect(page.getByRole('alert')).toContainText('Showing the demo scenario');
  await expect(panel(page)).toContainText('450 nm');

  await page.goto('/?s=7.eyJ2ZXJzaW9uIjo3fQ');
  await expect(page.getByRole('alert')).toContainText('newer version of Outcouple (scenario version 7)');
  await page.getByRole('button', { name: 'Dismiss' }).click();
  await expect(page.getByRole('alert')).toHaveCount(0);
});

test('keyboard: the first Tab reaches the skip link, which moves to the content', async ({ page }) => {
  await page.keyboard.press('Tab');
  const skip = page.getByRole('link', { name: 'Skip to content' });
  await expect(skip).toBeFocused();
  await page.keyboard.press('Enter');
  await expect(page).toHaveURL(/#main$/);
});

test('no horizontal overflow at 1280×800 and 800×1000', async ({ page }) => {
  for (const size of [
    { width: 1280, height: 800 },
    { width: 800, height: 1000 }
  ]) {
    await page.setViewportSize(size);
    for (const path of ['/', '/escape']) {
      await page.goto(path);
      await expect(page).toHaveURL(/[?&]s=4\./);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow, `${path} at ${size.width}×${size.height}`).toBeLessThanOrEqual(0);
    }
  }
});
