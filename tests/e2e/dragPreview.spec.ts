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

type Debug = { __laminaDebug?: { speculation(): { prepared: number; hits: number } } };
const speculation = (page: import('@playwright/test').Page) =>
  page.evaluate(() => (window as unknown as Debug).__laminaDebug!.speculation());

test('a boundary taken hold of with the keyboard has its nearby previews ready: a nudge is drawn from them, then the full curves follow', async ({
  page,
}) => {
  await page.goto('/?debug=1');
  await page.getByTestId('preset').selectOption('chest');
  const chart = page.getByTestId('dose-chart');
  await expect(chart).toHaveAttribute('data-samples', '401');
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  const rtmr = chart.locator('path.curve[data-method="rtmr"]');
  const before = await rtmr.getAttribute('d');

  // Focus the lung's lower boundary (11 cm): the previews within 2 cm are prepared in a worker.
  await page.getByTestId('boundary-2').focus();
  await expect.poll(async () => (await speculation(page)).prepared).toBeGreaterThanOrEqual(10);
  const hitsBefore = (await speculation(page)).hits;

  await page.keyboard.press('ArrowRight');
  await expect(page.getByTestId('boundary-2')).toHaveAttribute('aria-valuenow', '11.1');
  // Drawn from the prepared preview (no worker round trip) with the edit itself: the new curve.
  expect((await speculation(page)).hits).toBe(hitsBefore + 1);
  await expect(rtmr).not.toHaveAttribute('d', before ?? '');
  // Once the keys settle the full calculation replaces the preview.
  await expect(chart).toHaveAttribute('data-samples', '401');
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('8.1');
});
