// The Monte Carlo in the point check: a short run from the default case shows in the check with
// its 1σ beside dose per MU, MU and dose; once the case is edited the run is stale and its row
// leaves the check.
import { expect, test, type Page } from '@playwright/test';

/** The cells of every per-beam row of the check table. */
async function tableRows(page: Page): Promise<string[][]> {
  return page
    .getByTestId('check-point-table')
    .locator('tbody tr')
    .evaluateAll((trs) =>
      trs.map((tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent ?? '')),
    );
}

test('a finished Monte Carlo run is checked with ± 1σ and leaves the check when stale', async ({
  page,
}, testInfo) => {
  test.setTimeout(120_000);
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  // Type-A methods run on the modelled beam by default; offer it if the page asks for water data.
  const modelled = page.getByTestId('quick-modelled');
  if ((await modelled.count()) > 0) await modelled.click();

  await page.getByRole('tab', { name: 'Monte Carlo run' }).click();
  await page.getByTestId('mc-preset-50000').click();
  await page.getByTestId('mc-start').click();
  await expect(page.getByTestId('mc-status')).toContainText('Finished', { timeout: 90_000 });

  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await expect(page.getByTestId('check-point-table')).toBeVisible();
  // Planning values at P1 so the Monte Carlo gets differences and a verdict.
  await page.getByTestId('plan-dose-beam-1-P1').fill('200');
  await page.getByTestId('plan-mu-beam-1').fill('300');
  const table = page.getByTestId('check-point-table');
  await expect(table.locator('tbody tr', { hasText: 'Monte Carlo' })).not.toHaveCount(0);
  const mc = (await tableRows(page)).find((r) => r[1] === 'P1' && r[3] === 'Monte Carlo');
  expect(mc).toBeDefined();
  const cells = mc as string[];
  // D/MU, check MU, ΔMU, dose and Δdose all carry their 1σ.
  expect(cells[4]).toMatch(/^\d\.\d{4} ± \d\.\d{4}$/);
  expect(cells[5]).toMatch(/^\d+\.\d ± \d+\.\d$/);
  expect(cells[7]).toMatch(/^[+-]?\d+\.\d{2} ± \d+\.\d{2}$/);
  expect(cells[8]).toMatch(/^\d+\.\d ± \d+\.\d$/);
  expect(['pass', 'FAIL', 'run longer (±2σ)']).toContain(cells[12]);
  // Deterministic methods stay without ±.
  const rtmr = (await tableRows(page)).find(
    (r) => r[1] === 'P1' && r[3] === 'Ratio of TMR (effective depth)',
  );
  expect(rtmr?.[4]).toMatch(/^\d\.\d{4}$/);
  // A current run decides the check of a heterogeneous path by default, and says so.
  await expect(page.getByTestId('check-verdict-statement')).toContainText('Monte Carlo');
  await expect(page.getByTestId('check-deciding-method')).toContainText(
    'default for a path that crosses a heterogeneity',
  );
  await page.screenshot({ path: testInfo.outputPath('mc-check.png'), fullPage: true });

  // An edit of the case makes the run stale: the Monte Carlo row leaves the check.
  await page.getByRole('tab', { name: 'Depth dose' }).click();
  await page.getByTestId('layer-1-thickness').fill('4');
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await expect(table).toBeVisible();
  await expect(table.locator('tbody tr', { hasText: 'Ratio of TMR' })).not.toHaveCount(0);
  await expect(table.locator('tbody tr', { hasText: 'Monte Carlo' })).toHaveCount(0);
  await expect(page.getByTestId('check-beam-verdicts')).not.toContainText('monte-carlo');
  await page.screenshot({ path: testInfo.outputPath('mc-check-stale.png'), fullPage: true });
});
