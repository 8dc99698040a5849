// The "Factors & sweeps" view as a person uses it: reached from the results with the keyboard,
// a point picked, each method's factors read (their product is the CF shown), another depth typed,
// a sweep of the lung density run at 6 and 18 MV, exported as CSV, and a long sweep cancelled.
import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';

async function expectNoNaN(page: Page) {
  const text = await page.locator('body').innerText();
  expect(text).not.toMatch(/\bNaN\b/);
  expect(text).not.toMatch(/\bundefined\b/);
}

async function openExplain(page: Page) {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await page.getByTestId('preset').selectOption('chest');
  // From the results' tabs with the keyboard: focus the first tab, End goes to the last one.
  await page.getByRole('tab', { name: 'Depth dose' }).focus();
  await page.keyboard.press('End');
  await expect(page.getByRole('tab', { name: 'Factors & sweeps' })).toHaveAttribute(
    'aria-selected',
    'true',
  );
  await expect(page.getByTestId('explain-view')).toBeVisible();
}

const cfText = async (page: Page, id: string) =>
  (await page.getByTestId(`factor-cf-${id}`).innerText()).replace(/^CF = /, '');

test('reads every method’s factors at a point and at a typed depth', async ({ page }, testInfo) => {
  test.setTimeout(120_000);
  await openExplain(page);
  await expect(page.getByTestId('explain-where')).toContainText('Depth 15.00 cm', {
    timeout: 45_000,
  });
  for (const id of [
    'water',
    'rtmr',
    'epl-pdd',
    'batho',
    'batho-modified',
    'etar',
    'pencil-beam',
    'superposition',
  ]) {
    const cf = await cfText(page, id);
    expect(Number(cf), id).toBeGreaterThan(0.5);
    // The written-out product ends with the CF the method reports (same digits).
    if (id !== 'water')
      await expect(page.getByTestId(`factor-product-${id}`)).toContainText(`= ${cf}`);
  }
  // Batho lists one row per layer down to the point's layer; the superposition its parts.
  await expect(page.getByTestId('batho-layers-batho').locator('tbody tr')).toHaveCount(3);
  await expect(page.getByTestId('parts-superposition')).toContainText('Primary');
  await expect(page.getByTestId('origin-superposition').locator('tbody tr')).toHaveCount(3);
  await expectNoNaN(page);
  await page.screenshot({ path: testInfo.outputPath('explain-factors.png'), fullPage: true });

  // Another depth, in the lung.
  await page.getByTestId('explain-point').selectOption('depth');
  await page.getByTestId('explain-depth').fill('7');
  await expect(page.getByTestId('explain-where')).toContainText('Depth 7.000 cm in layer 2');
  await page.getByTestId('explain-depth').fill('999');
  await expect(page.getByRole('alert')).toContainText('Depth: enter a number from 0 to');
  await expectNoNaN(page);
});

test('runs a lung-density sweep at 6 and 18 MV, exports it as CSV, and cancels a long one', async ({
  page,
}, testInfo) => {
  test.setTimeout(180_000);
  await openExplain(page);
  await expect(page.getByTestId('explain-where')).toBeVisible({ timeout: 45_000 });
  await expect(page.getByTestId('sweep-layer')).toHaveValue('1');
  await page.getByTestId('sweep-run').click();
  const chart = page.getByTestId('sweep-chart');
  await expect(chart).toBeVisible({ timeout: 90_000 });
  await expect(chart.locator('text.panel-title')).toHaveText(['6 MV', '18 MV']);
  await expect(chart).toContainText('Density of layer 2, Lung (g/cm³)');
  await expect(chart).toContainText('CF (D_het/D_water)');
  await expect(page.getByTestId('sweep-conditions')).toContainText('point at 15 cm');
  await expectNoNaN(page);
  await chart.scrollIntoViewIfNeeded();
  await page.screenshot({ path: testInfo.outputPath('explain-sweep.png'), fullPage: true });

  const download = page.waitForEvent('download');
  await page.getByTestId('sweep-export').click();
  const file = await (await download).path();
  const lines = readFileSync(file, 'utf8').trim().split(/\r?\n/);
  expect(lines[0]).toMatch(/^density_g_per_cm3,water_6MV_cf,water_18MV_cf,rtmr_6MV_cf,/);
  expect(lines).toHaveLength(1 + 19);
  // First row: 0.1 g/cm³, the type-A CFs beyond the lung well above 1 (common practice).
  const header = lines[0]?.split(',') ?? [];
  const first = lines[1]?.split(',') ?? [];
  expect(Number(first[header.indexOf('rtmr_6MV_cf')])).toBeGreaterThan(1.1);

  // A long sweep, cancelled; the view stays usable and a new sweep runs.
  await page.getByTestId('sweep-variable').selectOption('field');
  await page.getByTestId('sweep-count').fill('101');
  for (const e of ['Co-60', '4 MV', '10 MV', '15 MV'])
    await page.getByLabel(e, { exact: true }).check();
  await page.getByTestId('sweep-run').click();
  await page.getByTestId('sweep-cancel').click();
  await expect(page.getByTestId('sweep-status')).toHaveText('Cancelled.');
  await page.getByTestId('sweep-count').fill('4');
  await page.getByTestId('sweep-count').press('Enter');
  await expect(chart.locator('text.panel-title')).toHaveCount(6, { timeout: 90_000 });
  await expectNoNaN(page);
});
