// A boundary drag redraws the fast methods at once and shows the slower ones as updating until
// the drag ends, in Debian's Chromium.
import { expect, test } from '@playwright/test';

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
});

test('while a boundary is held the slower curves show as updating, and the release brings the full curves', async ({
  page,
}) => {
  await page.getByTestId('preset').selectOption('chest');
  const chart = page.getByTestId('dose-chart');
  await expect(chart.locator('path.curve[data-method="superposition"]')).toHaveCount(1);
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await expect(chart).toHaveAttribute('data-samples', '401');

  const handle = page.getByTestId('boundary-2').locator('rect.handle-hit');
  const box = (await handle.boundingBox())!;
  const lungBox = (await page.getByTestId('slab-2').locator('rect').boundingBox())!;
  const pxPerCm = lungBox.width / 8;
  const x0 = box.x + box.width / 2;
  const y0 = box.y + box.height / 2;
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  for (let i = 1; i <= 5; i++) await page.mouse.move(x0 + (pxPerCm * i) / 5, y0);
  // Held: the preview grid (0.2 cm over 20 cm → 101 depths); the superposition is carried over
  // dimmed, the type-A methods (ETAR included) and the pencil beam are not.
  await expect(chart).toHaveAttribute('data-samples', '101');
  await expect(page.getByTestId('updating-note')).toContainText('updating…');
  await expect(chart.locator('path.curve.updating[data-method="superposition"]')).toHaveCount(1);
  await expect(chart.locator('path.curve.updating[data-method="etar"]')).toHaveCount(0);
  await expect(chart.locator('path.curve.updating[data-method="rtmr"]')).toHaveCount(0);
  await expect(chart.locator('path.curve.updating[data-method="pencil-beam"]')).toHaveCount(0);

  await page.mouse.up();
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('9');
  await expect(chart).toHaveAttribute('data-samples', '401');
  await expect(page.getByTestId('updating-note')).toHaveCount(0);
  await expect(chart.locator('path.curve.updating')).toHaveCount(0);
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await expect(page.getByTestId('dose-superposition-P1')).toHaveText(/^\d+\.\d{3}/);
});
