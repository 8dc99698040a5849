// What an edit's frame redraws, counted through the debug hooks (?debug=1), in Debian's Chromium:
// the depth-dose chart lays its curves out once for each new result and never again for the same
// one. A hover readout, the tables that follow an edit (deferred) or a status change must not
// redraw the curves: each such redraw costs the frame of the next edit (bench: edit-to-paint).
import { expect, test, type Page } from '@playwright/test';

type Draws = Record<string, { layouts: number; repeated: number }>;
type Debug = {
  __laminaDebug?: {
    chartDraws(): Draws;
    speculation(): { prepared: number; hits: number };
  };
};
const draws = async (page: Page, id = 'dose-chart') =>
  (await page.evaluate(() => (window as unknown as Debug).__laminaDebug!.chartDraws()))[id] ?? {
    layouts: 0,
    repeated: 0,
  };
const speculation = (page: Page) =>
  page.evaluate(() => (window as unknown as Debug).__laminaDebug!.speculation());

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.goto('/?debug=1');
  await page.getByTestId('preset').selectOption('chest');
  await expect(page.getByTestId('dose-chart')).toHaveAttribute('data-samples', '401');
  await expect(page.getByTestId('calc-status')).toContainText('calculated in', {
    timeout: 45_000,
  });
});

test('the crosshair follows the pointer without laying out the curves again', async ({ page }) => {
  const before = await draws(page);
  expect(before.layouts).toBeGreaterThan(0);
  const hit = page.getByTestId('dose-chart').locator('rect.hit');
  const box = (await hit.boundingBox())!;
  for (let i = 1; i <= 6; i++) {
    await page.mouse.move(box.x + (box.width * i) / 7, box.y + box.height / 2);
    await expect(page.getByTestId('dose-chart').locator('line.crosshair')).toHaveCount(1);
  }
  await expect(page.getByTestId('dose-chart').locator('.readout')).toContainText('depth');
  expect(await draws(page)).toEqual(before);
});

test('a key nudge draws the new curves once; the deferred tables and the full result add no repeat', async ({
  page,
}) => {
  const handle = page.getByTestId('boundary-2');
  await handle.focus();
  await expect.poll(async () => (await speculation(page)).prepared).toBeGreaterThanOrEqual(4);
  const before = await draws(page);
  const rtmr = page.getByTestId('dose-chart').locator('path.curve[data-method="rtmr"]');
  const d0 = await rtmr.getAttribute('d');

  await page.keyboard.press('ArrowRight');
  await expect(handle).toHaveAttribute('aria-valuenow', '11.1');
  // The deferred layer list has caught up, and the curves are the nudged case's.
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('8.1');
  await expect(rtmr).not.toHaveAttribute('d', d0 ?? '');
  const nudged = await draws(page);
  expect(nudged.layouts).toBeGreaterThan(before.layouts);
  expect(nudged.repeated).toBe(before.repeated);

  // The full calculation replaces the preview: one more layout, still no repeat.
  await expect(page.getByTestId('dose-chart')).toHaveAttribute('data-samples', '401', {
    timeout: 45_000,
  });
  await expect(page.getByTestId('calc-status')).toContainText('calculated in', {
    timeout: 45_000,
  });
  await expect(page.getByTestId('dose-superposition-P1')).toHaveText(/^\d+\.\d{3}/);
  const settled = await draws(page);
  expect(settled.layouts).toBeGreaterThan(nudged.layouts);
  expect(settled.repeated).toBe(before.repeated);
});

test('a pointer drag redraws the curves only for new results', async ({ page }) => {
  const before = await draws(page);
  const handle = page.getByTestId('boundary-2').locator('rect.handle-hit');
  const box = (await handle.boundingBox())!;
  const lungBox = (await page.getByTestId('slab-2').locator('rect').boundingBox())!;
  const pxPerCm = lungBox.width / 8;
  const x0 = box.x + box.width / 2;
  const y0 = box.y + box.height / 2;
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  for (let i = 1; i <= 5; i++) await page.mouse.move(x0 + (pxPerCm * i) / 5, y0);
  await expect(page.getByTestId('dose-chart')).toHaveAttribute('data-samples', '101');
  // Moves within one snapped position change nothing: no layout for them either.
  for (let i = 0; i < 4; i++) await page.mouse.move(x0 + pxPerCm + (i % 2), y0);
  await page.mouse.up();
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('9');
  await expect(page.getByTestId('dose-chart')).toHaveAttribute('data-samples', '401', {
    timeout: 45_000,
  });
  await expect(page.getByTestId('calc-status')).toContainText('calculated in', {
    timeout: 45_000,
  });
  const after = await draws(page);
  expect(after.layouts).toBeGreaterThan(before.layouts);
  expect(after.repeated).toBe(before.repeated);
});
