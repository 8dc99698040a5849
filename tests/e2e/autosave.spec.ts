// Autosave journeys in Debian's Chromium: an edit followed at once by a reload (inside the save
// delay) is written when the page is left, and a case restored only in part says what it left out
// and keeps the entry under a backup key.
import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';

const AUTOSAVE_KEY = 'lamina.autosave.case';

test('an edit followed at once by a reload is not lost (saved when the page is left)', async ({
  page,
}) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await expect(page.getByTestId('layer-1-thickness')).not.toHaveValue('4.25');
  // Type into the field and reload in the same task: far inside the 400 ms save delay.
  const stored = await page.evaluate((key) => {
    const input = document.querySelector<HTMLInputElement>('[data-testid="layer-1-thickness"]')!;
    // React tracks the value it set; the prototype's setter makes the change visible to it.
    // eslint-disable-next-line @typescript-eslint/unbound-method -- called with the input as `this`
    const setValue = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!.set!;
    setValue.call(input, '4.25');
    input.dispatchEvent(new Event('input', { bubbles: true }));
    const before = localStorage.getItem(key);
    location.reload();
    return before;
  }, AUTOSAVE_KEY);
  // Nothing had been written by the debounced save when the reload began.
  expect(stored === null || !stored.includes('"thicknessCm":4.25')).toBe(true);
  await page.waitForLoadState('load');
  await expect(page.getByTestId('layer-1-thickness')).toHaveValue('4.25');
});

test('a case restored in part says what it left out and keeps the entry under a backup key', async ({
  page,
}, testInfo) => {
  const demo = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8')) as Record<
    string,
    unknown
  >;
  // Saved mid-edit (a point below a thinned phantom) with a water table that no longer reads.
  const entry = JSON.stringify({
    format: 'lamina.autosave',
    version: 2,
    savedAt: null,
    case: {
      ...demo,
      notes: 'kept notes',
      layers: (demo.layers as unknown[]).slice(0, 2),
      waterData: { kind: 'tmr', fileName: 'broken.csv', csv: 'depth,10\n0,abc\n' },
    },
  });
  await page.goto('/');
  await page.evaluate(
    ([key, text]) => {
      localStorage.clear();
      localStorage.setItem(key, text);
    },
    [AUTOSAVE_KEY, entry] as const,
  );
  await page.reload();
  const message = page.getByTestId('storage-message');
  await expect(message).toContainText(
    'The autosaved case was restored without the measured water table (broken.csv:',
  );
  const text = await message.innerText();
  const key = /"(lamina\.autosave\.backup\.[0-9a-f]{8})"/.exec(text)?.[1];
  expect(key).toBeDefined();
  expect(await page.evaluate((k) => localStorage.getItem(k), key as string)).toBe(entry);
  // The rest of the case is there: both layers and the points.
  await expect(page.getByTestId('layer-2-material')).toHaveValue('lung');
  await page.screenshot({ path: testInfo.outputPath('restored-in-part.png'), fullPage: true });
});
