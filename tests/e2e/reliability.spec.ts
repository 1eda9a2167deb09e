/**
 * Reliability of the built site in Chromium: every page works under the Content-Security-Policy (no
 * violation reported, charts drawn, the trace worker runs); hostile link parameters give a message and
 * the demo scenario; the app works without storage and says it cannot save; a trace whose workers are
 * killed or cannot load leaves the page usable and the next run completes; a second tab sees the
 * scenario. Driven by role and label like the other browser tests.
 */
import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { drawnPixels } from './chart-pixels';

const PAGES = ['/', '/escape', '/stack', '/dome', '/materials', '/compare', '/claim', '/report'];

const panel = (page: Page) => page.getByRole('complementary', { name: 'Scenario' });

/** Collects CSP violations two ways: the DOM event and Chromium's console report. */
async function watchCsp(context: BrowserContext, page: Page): Promise<string[]> {
  const violations: string[] = [];
  await context.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      console.error(`CSP violation: ${e.violatedDirective} blocked ${e.blockedURI}`);
    });
  });
  page.on('console', (msg) => {
    const text = msg.text();
    if (/Content Security Policy|CSP violation|Refused to (load|execute|apply|create|evaluate)/i.test(text)) violations.push(text);
  });
  return violations;
}

/** Opens a page and waits until the app has started (it writes the scenario into the link). */
async function open(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await expect(page).toHaveURL(/[?&]s=4\./);
}

function b64url(text: string): string {
  return Buffer.from(text, 'utf8').toString('base64url');
}

/**
 * Opens `path?s=param`. A link longer than the local server's header limit (Node: 16 KB) never reaches
 * the page through it, so for those the page's own HTML is handed to the browser directly; the app then
 * reads the whole link as it would from any host that accepts it (browsers take links up to 2 MB).
 */
async function openWithParam(page: Page, path: string, param: string): Promise<void> {
  if (param.length > 8000) {
    const html = await (await page.request.get(path)).text();
    await page.route(`**${path}?s=*`, (route) => route.fulfill({ body: html, contentType: 'text/html; charset=utf-8' }));
  }
  await page.goto(`${path}?s=${param}`);
}

/** Sets the ray count; the page starts the trace by itself. */
async function runTrace(page: Page, rays: number): Promise<void> {
  await page.getByRole('textbox', { name: 'Rays', exact: true }).fill(String(rays));
}

test.describe('Content-Security-Policy', () => {
  test('every page carries the policy and runs without a violation', async ({ context, page }) => {
    const violations = await watchCsp(context, page);
    for (const path of PAGES) {
      await open(page, path);
      const policy = await page.locator('meta[http-equiv="content-security-policy"]').getAttribute('content');
      expect(policy, path).toContain("script-src 'self' 'sha256-");
      expect(policy, path).toContain("object-src 'none'");
      expect(policy, path).not.toContain('unsafe-eval');
      await expect(page.locator('main h1')).toBeVisible();
      await expect(page.locator('main')).not.toContainText('NaN');
    }
    expect(violations).toEqual([]);
  });

  test('charts draw and the trace worker runs under the policy', async ({ context, page }) => {
    const violations = await watchCsp(context, page);
    await open(page, '/escape');
    const canvas = page.locator('main canvas').first();
    await expect(canvas).toBeVisible();
    await expect.poll(() => drawnPixels(canvas)).toBeGreaterThan(1000);

    await open(page, '/dome');
    await runTrace(page, 100_000);
    await expect(page.getByTestId('trace-extraction')).toContainText('±', { timeout: 60_000 });
    const ledger = page.locator('figure', { hasText: 'Fate of every launched ray' }).locator('canvas');
    await expect.poll(() => drawnPixels(ledger)).toBeGreaterThan(1000);
    expect(violations).toEqual([]);
  });

  test('a script injected through a scenario name stays text and does not run', async ({ context, page }) => {
    const violations = await watchCsp(context, page);
    await open(page, '/');
    const name = panel(page).getByLabel('Name');
    await name.fill('<img src=x onerror="window.__pwned=1"><script>window.__pwned=2</script>');
    await expect(name).toHaveValue(/<img src=x/);
    await open(page, `/report?${new URL(page.url()).search.slice(1)}`);
    await expect(page.locator('body')).toContainText('<img src=x');
    expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    expect(violations).toEqual([]);
  });
});

test.describe('hostile link parameters', () => {
  const cases: [string, string, RegExp][] = [
    ['damaged base64', '1.%%%not-base64', /could not be read/],
    ['cut short', '1.eyJ2ZXJzaW9uIjox', /could not be read|not valid/],
    ['newer version', `9.${b64url('{"version":9}')}`, /newer version of Outcouple/],
    ['prototype pollution', `1.${b64url('{"__proto__":{"polluted":true},"version":1}')}`, /not valid/],
    ['negative sizes', `1.${b64url(JSON.stringify({ version: 1, name: 'x', chip: { widthMm: -1 } }))}`, /not valid/],
    ['deep nesting', `1.${b64url('['.repeat(50_000) + ']'.repeat(50_000))}`, /not valid/],
    ['a megabyte of text', `1.${'A'.repeat(1_000_000)}`, /could not be read|not valid/]
  ];
  for (const [label, param, message] of cases) {
    test(`${label}: a message and the demo scenario, and the page works`, async ({ page }) => {
      await openWithParam(page, '/dome', param);
      const alert = page.getByRole('alert').filter({ hasText: 'Showing the demo scenario' });
      await expect(alert).toBeVisible();
      await expect(alert).toContainText(message);
      await expect(panel(page)).toContainText('450 nm');
      await expect(page.getByTestId('closed-eta-dome')).toHaveText(/^\d+\.\d+ %$/);
      expect(await page.evaluate(() => ({} as Record<string, unknown>).polluted)).toBeUndefined();
      await expect(page.locator('main')).not.toContainText('NaN');
    });
  }

  test('a damaged stack link gives its own message and the starting stack', async ({ page }) => {
    await page.goto('/stack?stack=1.@@@');
    await expect(page.getByText('The layer stack in this link could not be read')).toBeVisible();
    await expect(page.locator('main')).not.toContainText('NaN');
  });
});

test.describe('without storage', () => {
  test('every page works, the scenario edits, and the app says it cannot save', async ({ browser }) => {
    const context = await browser.newContext();
    await context.addInitScript(() => {
      Object.defineProperty(window, 'localStorage', {
        get() {
          throw new DOMException('blocked', 'SecurityError');
        }
      });
    });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    for (const path of PAGES) {
      await open(page, path);
      await expect(page.getByText('Cannot save in this browser').first(), path).toBeVisible();
    }
    await open(page, '/dome');
    await panel(page).getByLabel('Wavelength').fill('460');
    await expect(panel(page)).toContainText('460 nm');
    await runTrace(page, 50_000);
    await expect(page.getByTestId('trace-extraction')).toContainText('±', { timeout: 60_000 });
    expect(errors).toEqual([]);
    await context.close();
  });
});

test.describe('trace workers that die', () => {
  test('workers killed mid-trace: the page stays usable, cancel works, and the next run completes', async ({ context, page }) => {
    // Keep a handle on every worker the page starts, so the test can kill them as a crash would.
    await context.addInitScript(() => {
      const Native = window.Worker;
      const started: Worker[] = [];
      (window as unknown as { __workers: Worker[] }).__workers = started;
      window.Worker = class extends Native {
        constructor(url: string | URL, options?: WorkerOptions) {
          super(url, options);
          started.push(this);
        }
      } as typeof Worker;
    });
    await open(page, '/dome');
    await runTrace(page, 5_000_000);
    const bar = page.getByRole('progressbar', { name: 'Trace progress' });
    await expect.poll(async () => Number(await bar.getAttribute('aria-valuenow')), { timeout: 30_000 }).toBeGreaterThan(0);
    const killed = await page.evaluate(() => {
      const workers = (window as unknown as { __workers: Worker[] }).__workers;
      workers.forEach((w) => w.terminate());
      return workers.length;
    });
    expect(killed).toBeGreaterThan(0);

    // The page still answers: the scenario edits (which restarts the trace on fresh workers), and the run can be cancelled.
    await panel(page).getByLabel('Wavelength').fill('455');
    await expect(panel(page)).toContainText('455 nm');
    await expect(bar).toBeVisible();
    await page.getByRole('button', { name: 'Cancel', exact: true }).click();
    await expect(page.getByRole('status').filter({ hasText: 'Trace cancelled' })).toBeVisible();
    await expect(bar).toBeHidden();

    await runTrace(page, 100_000);
    await expect(page.getByTestId('trace-extraction')).toContainText('±', { timeout: 60_000 });
    await expect(page.getByTestId('trace-rays')).toContainText('100,000');
    await expect(page.locator('main')).not.toContainText('NaN');
  });

  test('a worker script that cannot load: a clear error, and the next run completes', async ({ page }) => {
    await page.route('**/workers/trace-worker*', (route) => route.abort('failed'));
    await open(page, '/dome'); // the trace starts by itself, and fails
    await expect(page.getByRole('alert').filter({ hasText: 'The trace failed' })).toBeVisible({ timeout: 30_000 });
    await expect(page.getByRole('button', { name: 'Run again' })).toBeEnabled();

    await page.unroute('**/workers/trace-worker*');
    await page.getByRole('button', { name: 'Run again' }).click();
    await expect(page.getByTestId('trace-extraction')).toContainText('±', { timeout: 60_000 });
    await expect(page.getByRole('alert').filter({ hasText: 'The trace failed' })).toBeHidden();
  });
});

test.describe('two tabs', () => {
  test('a second tab on another page sees a scenario change', async ({ context, page }) => {
    await open(page, '/escape');
    const second = await context.newPage();
    await open(second, '/dome');
    await panel(page).getByLabel('Wavelength').fill('520');
    await expect(panel(page)).toContainText('520 nm');
    await expect(panel(second)).toContainText('520 nm');
    expect(new URL(second.url()).searchParams.get('s')).toBe(new URL(page.url()).searchParams.get('s'));
    await expect(second.getByTestId('closed-eta-dome')).toHaveText(/^\d+\.\d+ %$/);
  });
});
