// The Monte Carlo run in Debian's Chromium: a small run from a preset with progress and a live
// 1σ, its curve (with a ±1σ band) in the depth-dose and CF views, stale once the case is edited,
// and a long run cancelled mid-way with the page responding at once.
import { expect, test, type Page } from '@playwright/test';

async function freshPage(page: Page) {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
}

async function openMcTab(page: Page) {
  await page.getByRole('tab', { name: 'Monte Carlo run' }).click();
  await expect(page.getByRole('heading', { name: 'Monte Carlo run' })).toBeVisible();
}

test('a small run from a preset shows progress, a live 1σ and its curve in both views', async ({
  page,
}, testInfo) => {
  test.setTimeout(120_000);
  await freshPage(page);
  await openMcTab(page);
  // A typed value that breaks the rule is kept, with a message naming the field.
  await page.getByTestId('mc-histories').fill('12abc');
  await expect(page.getByText('Histories: "12abc" is not a number')).toBeVisible();
  await expect(page.getByTestId('mc-start')).toBeDisabled();
  await page.getByTestId('mc-preset-50000').click();
  await expect(page.getByTestId('mc-histories')).toHaveValue('50000');
  await page.getByTestId('mc-start').click();
  await expect(page.getByTestId('mc-status')).toContainText('Running', { timeout: 5_000 });
  // Live: the 1σ at the first point shows up while the run is still going or just after.
  await expect(page.getByTestId('mc-sigma-P1')).toHaveText(/^\d+\.\d+ %$/, { timeout: 60_000 });
  await expect(page.getByTestId('mc-dose-P1')).toHaveText(/^\d\.\d{3} ± \d\.\d{3} cGy\/MU$/);
  await expect(page.getByTestId('mc-status')).toContainText('Finished', { timeout: 90_000 });
  await expect(page.getByTestId('mc-histories-done')).toHaveText('50 000 of 50 000');
  const rel = Number((await page.getByTestId('mc-sigma-P1').innerText()).replace(' %', ''));
  // 5 × 10⁴ histories in 0.25 cm bins at 15 cm: a few per cent at most, never zero.
  expect(rel).toBeGreaterThan(0);
  expect(rel).toBeLessThan(10);
  await page.screenshot({ path: testInfo.outputPath('mc-finished.png'), fullPage: true });
  await page.getByLabel('Theme').selectOption('dark');
  await page.screenshot({ path: testInfo.outputPath('mc-finished-dark.png'), fullPage: true });
  await page.getByLabel('Theme').selectOption('auto');

  await page.getByRole('tab', { name: 'Depth dose' }).click();
  const chart = page.getByTestId('dose-chart');
  await expect(chart.locator('path[data-method="monte-carlo"]')).toHaveCount(1);
  await expect(chart.locator('path.sigma-band')).not.toHaveCount(0);
  await expect(page.getByTestId('dose-monte-carlo-P1')).toContainText('±');
  await page.screenshot({ path: testInfo.outputPath('mc-dose-chart.png'), fullPage: true });

  await page.getByRole('tab', { name: 'Correction factors' }).click();
  await expect(page.getByTestId('cf-chart').locator('path[data-method="monte-carlo"]')).toHaveCount(
    1,
  );
  await expect(page.getByTestId('cf-chart').locator('path.sigma-band')).not.toHaveCount(0);
  await page.screenshot({ path: testInfo.outputPath('mc-cf-chart.png'), fullPage: true });

  // Editing the case makes the run stale: the curve leaves the views, the panel says why.
  await page.getByTestId('layer-1-thickness').fill('4');
  await expect(page.getByTestId('cf-chart').locator('path[data-method="monte-carlo"]')).toHaveCount(
    0,
  );
  await openMcTab(page);
  await expect(page.getByTestId('mc-stale')).toContainText(
    'stale (case, water data or dose convention changed)',
  );
  await page.screenshot({ path: testInfo.outputPath('mc-stale.png'), fullPage: true });
  // Undo brings the case back: the run matches it again.
  await page.getByTestId('layer-1-thickness').fill('3');
  await expect(page.getByTestId('mc-stale')).toHaveCount(0);
});

test('a long run is cancelled mid-way and the page responds to an edit at once', async ({
  page,
}, testInfo) => {
  test.setTimeout(120_000);
  await freshPage(page);
  await openMcTab(page);
  await page.getByTestId('mc-preset-5000000').click();
  await page.getByTestId('mc-start').click();
  // Wait for the first estimate, so Cancel keeps a partial result.
  await expect(page.getByTestId('mc-sigma-P1')).toHaveText(/^\d+\.\d+ %$/, { timeout: 60_000 });
  await expect(page.getByTestId('mc-remaining')).toHaveText(/\d+(\.\d)? s|min/);
  await page.screenshot({ path: testInfo.outputPath('mc-running.png'), fullPage: true });
  // The curve keeps drawing as batches arrive: its path changes while the run goes on.
  await page.getByRole('tab', { name: 'Depth dose' }).click();
  const mcPath = page.getByTestId('dose-chart').locator('path[data-method="monte-carlo"]');
  await expect(mcPath).toHaveCount(1);
  await expect(page.getByTestId('toggle-monte-carlo')).toBeVisible();
  await expect(page.locator('.chart-controls')).toContainText('Monte Carlo (running, partial)');
  const first = await mcPath.getAttribute('d');
  await expect.poll(() => mcPath.getAttribute('d'), { timeout: 30_000 }).not.toBe(first);
  await page
    .getByTestId('dose-chart')
    .screenshot({ path: testInfo.outputPath('mc-live-dose-chart.png') });
  await openMcTab(page);
  await expect(page.getByTestId('mc-status')).toContainText('Running');
  await expect(page.getByTestId('mc-cancel')).toBeEnabled();
  await page.getByTestId('mc-cancel').click();
  await expect(page.getByTestId('mc-status')).toContainText('Cancelled', { timeout: 5_000 });
  await expect(page.getByTestId('mc-status')).toContainText('Showing what was merged');
  const done = await page.getByTestId('mc-histories-done').innerText();
  expect(done).toMatch(/of 5 000 000$/);
  expect(done).not.toMatch(/^5 000 000 of/);
  await page.screenshot({ path: testInfo.outputPath('mc-cancelled.png'), fullPage: true });
  // The page responds right after Cancel: the edit shows at once and the run is marked stale
  // (a re-render on a free main thread; 3 s is generous for a loaded test machine).
  const t0 = Date.now();
  await page.getByTestId('layer-1-thickness').fill('5');
  await expect(page.getByTestId('layer-1-thickness')).toHaveValue('5');
  await expect(page.getByTestId('mc-stale')).toBeVisible();
  expect(Date.now() - t0).toBeLessThan(3_000);
  await page.getByRole('tab', { name: 'Depth dose' }).click();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await expect(
    page.getByTestId('dose-chart').locator('path[data-method="monte-carlo"]'),
  ).toHaveCount(0);
  await page.screenshot({ path: testInfo.outputPath('mc-after-cancel-edit.png'), fullPage: true });
});
