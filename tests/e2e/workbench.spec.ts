// Journeys through the workbench as a user would take them, in Debian's Chromium.
import { expect, test, type Page } from '@playwright/test';

async function expectNoNaN(page: Page) {
  const text = await page.locator('body').innerText();
  expect(text).not.toMatch(/\bNaN\b/);
  expect(text).not.toMatch(/\bundefined\b/);
}

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
});

test('shows the title, the cautions and the slab strip of the starting case', async ({
  page,
}, testInfo) => {
  await expect(page.getByRole('heading', { name: 'Lamina' })).toBeVisible();
  const cautions = page.getByTestId('cautions');
  await expect(cautions).toContainText('modelled beam is not a commissioned beam');
  await expect(cautions).toContainText('licensed medical physicist');
  await expect(page.getByTestId('slab-strip')).toBeVisible();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await page.screenshot({ path: testInfo.outputPath('start.png'), fullPage: true });
  await expectNoNaN(page);
});
