/**
 * The user's own materials in the scenario: chosen in the panel, carried by a link to a browser that
 * does not have them, and kept there on request. Also what happens to a saved scenario the app cannot
 * read, and to one saved by the previous scenario version.
 * Index check: a Cauchy formula n = 1.5 + 0.004/λ² (λ in µm) gives n = 1.52 at 450 nm (1.5198, exact
 * arithmetic), printed to four digits.
 */
import { expect, test, type Browser, type Page } from '@playwright/test';

async function addCauchySilicone(page: Page, name: string) {
  await page.goto('/materials');
  const form = page.getByRole('form', { name: 'Add a user material' });
  await form.getByLabel('Name', { exact: true }).fill(name);
  await form.getByLabel('Category').selectOption('encapsulant');
  await form.getByLabel(/Cauchy/).check();
  await form.getByLabel('A', { exact: true }).fill('1.5');
  await form.getByLabel('B (µm²)').fill('0.004');
  await form.getByLabel('C (µm⁴)').fill('0');
  await form.getByLabel('Valid from (nm)').fill('400');
  await form.getByLabel('Valid to (nm)').fill('800');
  await page.getByRole('button', { name: 'Add material' }).click();
  await expect(page.getByRole('status').filter({ hasText: `Added ${name}` })).toBeVisible();
}

/** Puts `value` under `key` before the app's first script runs, once (an init script runs on every navigation). */
async function seedStorageOnce(page: Page, key: string, value: string) {
  await page.addInitScript(
    ([k, v]) => {
      if (sessionStorage.getItem('seeded')) return;
      sessionStorage.setItem('seeded', '1');
      localStorage.setItem(k, v);
    },
    [key, value]
  );
}

function panel(page: Page) {
  return page.getByRole('region', { name: 'Scenario', exact: true });
}

test('a user material is chosen as encapsulant, travels in a link and can be kept by the receiver', async ({ page, browser }) => {
  await addCauchySilicone(page, 'Bench silicone');
  await page.goto('/dome');
  const picker = page.getByLabel('Encapsulant material');
  await expect(picker.locator('optgroup[label="Your materials (user)"] option')).toHaveText(['Bench silicone (user)']);
  await picker.selectOption({ label: 'Bench silicone (user)' });
  await expect(panel(page)).toContainText('Bench silicone (user) n 1.52');
  await expect(page.locator('#sc-enc-material-index')).toContainText('n = 1.52');
  await expect(page.locator('main')).not.toContainText('NaN');

  // A fresh browser profile: no user materials stored, yet the link's scenario works
  const link = page.url();
  const other = await browser.newContext();
  const receiver = await other.newPage();
  await receiver.goto(link);
  await expect(panel(receiver)).toContainText('Bench silicone (user) n 1.52');
  const theirs = receiver.getByLabel('Encapsulant material');
  await expect(theirs.locator('option:checked')).toHaveText('Bench silicone (user, in this scenario only)');
  await receiver.getByRole('button', { name: 'Keep it in my materials' }).click();
  await expect(receiver.getByRole('status').filter({ hasText: 'Bench silicone is now in your materials.' })).toBeVisible();
  await receiver.goto('/materials');
  await expect(receiver.getByRole('row').filter({ hasText: 'Bench silicone' })).toContainText('user');
  await other.close();
});

test('a saved scenario that cannot be read is set aside, not overwritten, and the user is told', async ({ page }) => {
  await seedStorageOnce(page, 'outcouple.scenario.v4', '{"version": 4, "name": 42}');
  await page.goto('/');
  const alert = panel(page).getByRole('alert').filter({ hasText: 'Your saved scenario could not be read' });
  await expect(alert).toContainText('outcouple.scenario.v4.unreadable');
  await expect(alert).toContainText('Showing the demo scenario.');
  expect(await page.evaluate(() => localStorage.getItem('outcouple.scenario.v4.unreadable'))).toBe('{"version": 4, "name": 42}');
  await alert.getByRole('button', { name: 'Dismiss' }).click();
  await expect(alert).toHaveCount(0);
});

/** The demo scenario as the app writes it into its link ("2." + base64url JSON), read in a throw-away profile. */
async function demoFromLink(browser: Browser): Promise<Record<string, unknown>> {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto('/');
  await expect(page).toHaveURL(/[?&]s=4\./);
  const param = new URL(page.url()).searchParams.get('s')!;
  await context.close();
  return JSON.parse(Buffer.from(param.slice(2), 'base64url').toString('utf8'));
}

test('a saved layer stack that cannot be read is set aside too, and the starting stack shown', async ({ page }) => {
  await seedStorageOnce(page, 'outcouple.stack.v2', '{"version": 2, "mode": "sideways"}');
  await page.goto('/stack');
  const alert = page.getByRole('alert').filter({ hasText: 'Your saved layer stack could not be read' });
  await expect(alert).toContainText('outcouple.stack.v2.unreadable');
  await expect(alert).toContainText('Showing the starting stack.');
  expect(await page.evaluate(() => localStorage.getItem('outcouple.stack.v2.unreadable'))).toBe('{"version": 2, "mode": "sideways"}');
  await expect(page.getByLabel('Layer 1 thickness')).toHaveValue('100');
});

test('a scenario saved by the previous version is read, and the old entry is left in place', async ({ page, browser }) => {
  const v1 = JSON.stringify({ ...(await demoFromLink(browser)), version: 1, name: 'Saved before the upgrade' });
  await seedStorageOnce(page, 'outcouple.scenario.v1', v1);
  await page.goto('/');
  await expect(panel(page)).toContainText('Saved before the upgrade');
  expect(await page.evaluate(() => localStorage.getItem('outcouple.scenario.v1'))).toBe(v1);
  await expect.poll(() => page.evaluate(() => JSON.parse(localStorage.getItem('outcouple.scenario.v4') ?? '{}').version)).toBe(4);
});

test('a chip that emits elsewhere moves the wavelength with a notice; a wavelength with no index for it is refused beside the field', async ({ page }) => {
  await page.goto('/dome');
  const picker = page.getByLabel('Chip material');
  // GaAs emits in the infrared (about 850–980 nm): at 450 nm its formula's pole (874.6 nm) leaves no index,
  // so choosing it moves the wavelength to 940 nm in the same edit and the main area says so.
  await picker.selectOption({ label: 'GaAs (transparent region)' });
  await expect(page.getByTestId('wavelength-moved')).toContainText('from 450 nm to 940 nm');
  await expect(panel(page).getByLabel('Wavelength')).toHaveValue('940');
  await expect(panel(page)).toContainText('GaAs (transparent region), 1 × 1 × 0.15 mm');
  // Back to 450 nm is refused with the formula's reason (library entry: pole at 874.6 nm).
  await page.getByLabel('Wavelength').fill('450');
  await page.getByLabel('Wavelength').press('Tab');
  await expect(page.getByRole('alert').filter({ hasText: /pole at 874\.6 nm/ })).toBeVisible();
  await expect(picker.locator('option:checked')).toHaveText('GaAs (transparent region)');
  await expect(page.locator('main')).not.toContainText('NaN');
});

test('a stack link carries the user material of its layer to a browser that does not have it', async ({ page, browser }) => {
  await addCauchySilicone(page, 'Bench film');
  await page.goto('/stack');
  await page.getByLabel('Layer 1 material').selectOption({ label: 'Bench film (user)' });
  // Cauchy n = 1.5 + 0.004/λ² (λ in µm) at 450 nm: 1.5198 (exact arithmetic), shown to four digits
  await expect(page.getByText('n = 1.520 at 450 nm')).toBeVisible();
  const link = page.url();

  const other = await browser.newContext();
  const receiver = await other.newPage();
  await receiver.goto(link);
  const picker = receiver.getByLabel('Layer 1 material');
  await expect(picker.locator('option:checked')).toHaveText('Bench film (user)');
  await expect(picker.locator('optgroup[label="In this stack only (user)"] option')).toHaveText(['Bench film (user)']);
  await expect(receiver.getByText('n = 1.520 at 450 nm')).toBeVisible();
  await expect(receiver.locator('main')).not.toContainText('Missing material');
  await expect(receiver.locator('main')).not.toContainText('NaN');
  await other.close();
});
