// The check's settings travel with the case: prescription, tolerances, deciding method and the
// page-wide dose convention are saved in the case file and restored when it is opened; an older
// file whose points disagree on the planning MU is refused with the fields named; switching the
// dose convention changes the superposition in bone and is printed with the check.
import { expect, test } from '@playwright/test';
import { readFileSync, writeFileSync } from 'node:fs';

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
});

test('Save keeps the check settings and the dose convention; Open restores them', async ({
  page,
}, testInfo) => {
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await expect(page.getByTestId('check-panel')).toBeVisible();
  await page.getByTestId('rx-point').selectOption('P1');
  await page.getByTestId('rx-dose').fill('180');
  await page.getByTestId('tol-heterogeneous').fill('4');
  await page.getByTestId('check-method').selectOption('batho-modified');
  await page.getByTestId('dose-to').selectOption('medium');
  await page.getByTestId('plan-mu-beam-1').fill('250');
  await expect(page.getByTestId('check-deciding-method')).toContainText('dose to medium');

  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByTestId('save').click(),
  ]);
  const saved = JSON.parse(readFileSync(await download.path(), 'utf8')) as {
    version: number;
    beam: { planningMu?: number };
    check?: unknown;
  };
  expect(saved.version).toBe(2);
  expect(saved.beam.planningMu).toBe(250);
  expect(saved.check).toEqual({
    tolerances: { homogeneousPercent: 2, heterogeneousPercent: 4 },
    doseTo: 'medium',
    prescription: { pointId: 'P1', doseCGy: 180 },
    checkMethodId: 'batho-modified',
  });
  const file = testInfo.outputPath('saved-case.json');
  writeFileSync(file, readFileSync(await download.path()));

  // A fresh page has the defaults; opening the file brings every setting back.
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByTestId('dose-to')).toHaveValue('water');
  await page.getByTestId('open-file').setInputFiles(file);
  await expect(page.getByTestId('dose-to')).toHaveValue('medium');
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await expect(page.getByTestId('rx-point')).toHaveValue('P1');
  await expect(page.getByTestId('rx-dose')).toHaveValue('180');
  await expect(page.getByTestId('tol-heterogeneous')).toHaveValue('4');
  await expect(page.getByTestId('check-method')).toHaveValue('batho-modified');
  await expect(page.getByTestId('plan-mu-beam-1')).toHaveValue('250');
  await expect(page.getByTestId('check-verdict-statement')).toContainText(
    'Modified Batho (build-up shift): ΔMU',
  );
  await page.screenshot({ path: testInfo.outputPath('check-settings.png'), fullPage: true });
});

test('a version-1 file whose points disagree on the planning MU is refused, naming the fields', async ({
  page,
}, testInfo) => {
  const doc = {
    format: 'lamina.case',
    version: 1,
    name: 'old file',
    beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
    layers: [{ materialId: 'water', thicknessCm: 20 }],
    points: [
      { id: 'A', depthCm: 5, planningMu: 150 },
      { id: 'B', depthCm: 10, planningMu: 160 },
    ],
  };
  const file = testInfo.outputPath('old-case.json');
  writeFileSync(file, JSON.stringify(doc));
  const name = await page.locator('#case-name').inputValue();
  await page.getByTestId('open-file').setInputFiles(file);
  const notice = page.locator('.notice.error');
  await expect(notice).toContainText('points[0].planningMu, points[1].planningMu');
  await expect(notice).toContainText('150, 160');
  // Nothing changed.
  await expect(page.locator('#case-name')).toHaveValue(name);
});

test('the dose convention is one page-wide choice and changes the superposition in bone', async ({
  page,
}) => {
  await page.getByTestId('open-file').setInputFiles('public/cases/rib-and-bone-6mv.json');
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  const cell = async () => {
    const rows = await page
      .getByTestId('check-point-table')
      .locator('tbody tr')
      .evaluateAll((trs) =>
        trs.map((tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent ?? '')),
      );
    return Number(rows.find((r) => r[3]?.startsWith('Superposition'))?.[4]);
  };
  await expect(page.getByTestId('check-deciding-method')).toContainText('dose to water');
  const water = await cell();
  await page.getByTestId('dose-to').selectOption('medium');
  await expect(page.getByTestId('check-deciding-method')).toContainText('dose to medium');
  // The point lies in soft tissue beyond the bone: dose to water = dose to medium × s_w,tissue
  // (1.004 for 6 MV, ESTAR; derived in src/engine/dose/stoppingPowerRatio.ts).
  await expect.poll(cell).toBeLessThan(water);
  expect(water / (await cell())).toBeCloseTo(1.004, 3);
  // The Monte Carlo panel shows the page's choice instead of its own.
  await page.getByRole('tab', { name: 'Monte Carlo run' }).click();
  await expect(page.getByTestId('mc-dose-to')).toContainText('dose to medium');
});
