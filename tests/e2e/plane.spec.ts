// The Dose plane tab: colour map with isodose lines under the slab strip, a lateral profile that
// follows the chosen depth, and the difference between two methods, in Debian's Chromium.
import { expect, test, type Page } from '@playwright/test';

async function expectNoNaN(page: Page) {
  const text = await page.locator('body').innerText();
  expect(text).not.toMatch(/\bNaN\b/);
  expect(text).not.toMatch(/\bundefined\b/);
}

async function openPlane(page: Page, preset: string) {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await page.getByTestId('preset').selectOption(preset);
  await page.getByRole('tab', { name: 'Dose plane' }).click();
  await expect(page.getByTestId('plane-status')).toHaveText('up to date');
}

test('shows the dose map with isodose lines, a profile that follows the depth, and a difference', async ({
  page,
}, testInfo) => {
  await openPlane(page, 'chest');
  const map = page.getByTestId('plane-map');
  await expect(map).toBeVisible();
  // The raster is a PNG data URL, and isodose lines are drawn with labels.
  const href = await page.getByTestId('plane-map-raster').getAttribute('href');
  expect(href ?? '').toMatch(/^data:image\/png;base64,/);
  expect((href ?? '').length).toBeGreaterThan(500);
  const lines = map.locator('g.isodose path.isodose-line');
  expect(await lines.count()).toBeGreaterThanOrEqual(5);
  const d50 = await map.locator('g.isodose[data-level="50"] path.isodose-line').getAttribute('d');
  expect((d50 ?? '').length).toBeGreaterThan(50);
  await expect(map.locator('text.isodose-label')).not.toHaveCount(0);
  await expect(page.getByTestId('plane-map-bar')).toContainText('% of CAX max');
  await expect(page.getByTestId('plane-isodose-note')).toContainText('20, 50, 80, 90, 95, 100 %');
  await page.screenshot({ path: testInfo.outputPath('plane-chest.png'), fullPage: true });
  // The colour bar follows the chosen unit.
  await page.getByTestId('plane-unit').selectOption('dose');
  await expect(page.getByTestId('plane-map-bar')).toContainText('cGy/MU');
  await expect(page.getByTestId('plane-profile')).toContainText('Dose per MU (cGy/MU)');
  await page.getByTestId('plane-unit').selectOption('percent');

  // Moving the profile depth changes the superposition profile.
  const profile = page.getByTestId('plane-profile');
  const curve = profile.locator('path[data-method="superposition"]');
  await page.getByTestId('profile-depth').fill('2');
  await expect(page.getByTestId('profile-note')).toContainText('2.0 cm');
  const shallow = await curve.getAttribute('d');
  await page.getByTestId('profile-depth').fill('18');
  await expect(page.getByTestId('profile-note')).toContainText('18.0 cm');
  const deep = await curve.getAttribute('d');
  expect(deep).not.toEqual(shallow);
  await expect(profile.locator('path[data-method="pencil-beam"]')).toHaveCount(1);
  // Hovering the profile reads out every method's value at that x.
  await profile.locator('rect.hit').scrollIntoViewIfNeeded();
  const pbox = await profile.locator('rect.hit').boundingBox();
  if (!pbox) throw new Error('no profile area');
  await page.mouse.move(pbox.x + pbox.width / 2, pbox.y + pbox.height / 2);
  await expect(page.getByTestId('plane-profile-readout')).toContainText(/Superposition\s*\d+\.\d/);

  // A click on the map sets the profile depth near where it was clicked.
  await map.locator('rect.plane-frame').scrollIntoViewIfNeeded();
  const box = await map.locator('rect.plane-frame').boundingBox();
  if (!box) throw new Error('no map frame');
  await page.mouse.click(box.x + box.width * 0.25, box.y + box.height / 2);
  await expect(page.getByTestId('profile-note')).toContainText(
    /Profiles at (4\.[6-9]|5\.[0-4]) cm/,
  );

  // Monte Carlo has not been run here: an explicit message for its plane.
  await page.getByTestId('plane-method').selectOption('monte-carlo');
  await expect(page.getByTestId('plane-map-missing')).toContainText('No plane for Monte Carlo');
  await page.getByTestId('plane-method').selectOption('superposition');

  // Superposition minus pencil beam: a diverging map with its colour bar.
  await page.getByTestId('diff-a').selectOption('superposition');
  await page.getByTestId('diff-b').selectOption('pencil-beam');
  await expect(page.getByTestId('plane-diff')).toBeVisible();
  await expect(page.getByTestId('plane-diff-bar')).toContainText('% of Pencil beam CAX max');
  await expect(page.getByTestId('plane-diff-note')).toContainText('largest difference');
  await page.getByTestId('plane-diff').scrollIntoViewIfNeeded();
  await page.screenshot({ path: testInfo.outputPath('plane-diff.png'), fullPage: true });

  // Against Monte Carlo without a run: the explicit message instead of a map.
  await page.getByTestId('diff-b').selectOption('monte-carlo');
  await expect(page.getByTestId('plane-diff-missing')).toContainText('No plane for Monte Carlo');
  await expectNoNaN(page);
  await page.getByRole('combobox', { name: 'Theme' }).selectOption('dark');
  await page.getByTestId('plane-map').scrollIntoViewIfNeeded();
  await page.screenshot({ path: testInfo.outputPath('plane-dark.png') });
});

test('an edit shows "updating…" and the map follows the new slabs', async ({ page }) => {
  await openPlane(page, 'chest');
  const d50 = page.locator(
    '[data-testid="plane-map"] g.isodose[data-level="50"] path.isodose-line',
  );
  const before = await d50.getAttribute('d');
  // Record every text the status shows: a new plane may take only a few hundred ms.
  await page.evaluate(() => {
    const el = document.querySelector('[data-testid="plane-status"]');
    const seen: string[] = [];
    (window as unknown as { __planeStatus: string[] }).__planeStatus = seen;
    if (el)
      new MutationObserver(() => seen.push(el.textContent ?? '')).observe(el, {
        childList: true,
        characterData: true,
        subtree: true,
      });
  });
  await page.getByTestId('layer-2-thickness').fill('4');
  await expect
    .poll(() =>
      page.evaluate(() => (window as unknown as { __planeStatus: string[] }).__planeStatus),
    )
    .toContain('updating…');
  await expect(page.getByTestId('plane-status')).toHaveText('up to date');
  await expect.poll(async () => d50.getAttribute('d')).not.toEqual(before);
  const after = await d50.getAttribute('d');
  // Back from another tab: the remembered planes are shown again without a new calculation.
  await page.getByRole('tab', { name: 'Depth dose' }).click();
  await page.getByRole('tab', { name: 'Dose plane' }).click();
  await expect(page.getByTestId('plane-status')).toHaveText('up to date');
  expect(await d50.getAttribute('d')).toEqual(after);
  await expectNoNaN(page);
});

test('a Monte Carlo run adds its plane, its profile and the superposition − Monte Carlo difference', async ({
  page,
}, testInfo) => {
  test.setTimeout(150_000);
  await openPlane(page, 'chest');
  await page.getByRole('tab', { name: 'Monte Carlo run' }).click();
  await page.getByTestId('mc-preset-50000').click();
  await page.getByTestId('mc-start').click();
  await expect(page.getByTestId('mc-status')).toContainText('Finished', { timeout: 120_000 });
  await page.getByRole('tab', { name: 'Dose plane' }).click();
  await expect(page.getByTestId('plane-status')).toHaveText('up to date');

  await page.getByTestId('plane-method').selectOption('monte-carlo');
  const map = page.getByTestId('plane-map');
  await expect(map).toBeVisible();
  await expect(map.locator('g.isodose path.isodose-line')).not.toHaveCount(0);
  await expect(
    page.getByTestId('plane-profile').locator('path[data-method="monte-carlo"]'),
  ).toHaveCount(1);

  await page.getByTestId('diff-a').selectOption('superposition');
  await page.getByTestId('diff-b').selectOption('monte-carlo');
  await expect(page.getByTestId('plane-diff')).toBeVisible();
  await expect(page.getByTestId('plane-diff-note')).toContainText(
    'resampled (bilinear) onto the Monte Carlo grid',
  );
  // Hovering the difference map reads out a signed percentage.
  const frame = page.getByTestId('plane-diff').locator('rect.plane-frame');
  await frame.scrollIntoViewIfNeeded();
  const box = await frame.boundingBox();
  if (!box) throw new Error('no difference frame');
  await page.mouse.move(box.x + box.width * 0.6, box.y + box.height / 2);
  await expect(page.getByTestId('plane-diff-readout')).toContainText(
    /x -?0\.\d\d cm: [+−]\d+\.\d %/,
  );
  await page.screenshot({ path: testInfo.outputPath('plane-mc.png'), fullPage: true });

  // Another slab stack: the run no longer belongs to the case, and the page says so.
  await page.getByTestId('layer-2-thickness').fill('5');
  await expect(page.getByTestId('plane-diff-missing')).toContainText('another beam or slab stack');
  await expectNoNaN(page);
});
