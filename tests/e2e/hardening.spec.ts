// Hardening journeys in Debian's Chromium: the compute worker killed mid-run and recovered, full
// and damaged browser storage, no request leaving the page's origin, and imported text never
// rendered as HTML.
import { readFileSync } from 'node:fs';
import { expect, test, type Page, type Request } from '@playwright/test';
import { parseCaseText } from '../../src/io/caseFile';
import { shareHashOf } from '../../src/io/shareLink';

const AUTOSAVE_KEY = 'lamina.autosave.case';

interface DebugHooks {
  killComputeWorker(): void;
  killComputeWorkerDuringNextCalculation(): void;
  computeWorkerStarts(): number;
  killMonteCarloWorkers(): Promise<number>;
}
type DebugWindow = Window & { __laminaDebug?: DebugHooks; __pwned?: unknown };

/** Put the demo water table (invented data) in the case, from the Water data view. */
async function useDemoTable(page: Page) {
  await page.getByRole('tab', { name: 'Water data' }).click();
  await page.getByTestId('load-demo-water').click();
  await expect(page.getByTestId('water-in-case')).toBeVisible();
  await page.getByRole('tab', { name: 'Depth dose' }).click();
}

async function freshPage(page: Page, path = '/') {
  await page.goto(path);
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
}

test('a compute worker killed mid-run is replaced: the page says so, Retry recovers', async ({
  page,
}, testInfo) => {
  // Three compute workers start cold in this journey (module load, kernels, first calculation).
  test.setTimeout(120_000);
  await freshPage(page, '/?debug=1');
  expect(
    await page.evaluate(() => (window as DebugWindow).__laminaDebug?.computeWorkerStarts()),
  ).toBe(1);
  await page.evaluate(() =>
    (window as DebugWindow).__laminaDebug?.killComputeWorkerDuringNextCalculation(),
  );
  await page.getByTestId('layer-1-thickness').fill('4');
  const alert = page.getByRole('alert').filter({ hasText: 'The calculation failed' });
  await expect(alert).toContainText('The compute worker stopped during the calculation');
  await expect(page.getByTestId('calc-retry')).toBeVisible();
  await expect(page.getByTestId('calc-status')).not.toContainText('calculated in');
  // The page stays usable while the worker is gone: the edit is kept.
  await expect(page.getByTestId('layer-1-thickness')).toHaveValue('4');
  await page.screenshot({ path: testInfo.outputPath('worker-lost.png'), fullPage: true });

  await page.getByTestId('calc-retry').click();
  await expect(alert).toHaveCount(0);
  await expect(page.getByTestId('calc-status')).toContainText('calculated in', { timeout: 45_000 });
  expect(
    await page.evaluate(() => (window as DebugWindow).__laminaDebug?.computeWorkerStarts()),
  ).toBe(2);

  // Killed while idle: the next edit simply starts a fresh worker.
  await page.evaluate(() => (window as DebugWindow).__laminaDebug?.killComputeWorker());
  await page.getByTestId('layer-1-thickness').fill('5');
  await expect(page.getByTestId('calc-status')).toContainText('calculated in', { timeout: 45_000 });
  await expect(page.getByRole('alert').filter({ hasText: 'The calculation failed' })).toHaveCount(
    0,
  );
  expect(
    await page.evaluate(() => (window as DebugWindow).__laminaDebug?.computeWorkerStarts()),
  ).toBe(3);
  await page.screenshot({ path: testInfo.outputPath('worker-recovered.png'), fullPage: true });
});

test('the debug hooks exist only with ?debug=1', async ({ page }) => {
  await freshPage(page);
  expect(await page.evaluate(() => typeof (window as DebugWindow).__laminaDebug)).toBe('undefined');
});

test('full storage: a clear message, the edit stays, and the case still saves to a file', async ({
  page,
}, testInfo) => {
  await page.addInitScript(() => {
    Storage.prototype.setItem = function () {
      throw new DOMException(
        "Failed to execute 'setItem' on 'Storage': Setting the value exceeded the quota.",
        'QuotaExceededError',
      );
    };
  });
  await page.goto('/');
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await page.getByTestId('layer-1-thickness').fill('4.5');
  await expect(page.getByTestId('storage-message')).toContainText(
    'Autosave failed: local storage is full. Your case is still here; save it to a file.',
  );
  await expect(page.getByTestId('layer-1-thickness')).toHaveValue('4.5');
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await page.screenshot({ path: testInfo.outputPath('storage-full.png'), fullPage: true });

  const download = page.waitForEvent('download');
  await page.getByTestId('save').click();
  const saved = parseCaseText(readFileSync(await (await download).path(), 'utf8'));
  expect(saved.ok).toBe(true);
  if (saved.ok) expect(saved.value.layers[0]?.thicknessCm).toBe(4.5);
});

test('a damaged autosave entry is kept under a backup key and the page says where', async ({
  page,
}, testInfo) => {
  await page.goto('/');
  await page.evaluate((key) => {
    localStorage.clear();
    localStorage.setItem(key, '{"format":"lamina.autosave","version":2,"case":{"na');
  }, AUTOSAVE_KEY);
  await page.reload();
  const message = page.getByTestId('storage-message');
  await expect(message).toContainText('The autosaved case could not be opened (not valid JSON');
  const text = await message.innerText();
  const key = /"(lamina\.autosave\.backup\.[0-9a-f]{8})"/.exec(text)?.[1];
  expect(key).toBeDefined();
  expect(await page.evaluate((k) => localStorage.getItem(k), key as string)).toBe(
    '{"format":"lamina.autosave","version":2,"case":{"na',
  );
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await page.screenshot({ path: testInfo.outputPath('storage-damaged.png'), fullPage: true });
});

test('no request leaves the page’s origin during a full journey, under a strict CSP', async ({
  page,
  context,
  baseURL,
}, testInfo) => {
  const origin = new URL(baseURL as string).origin;
  const requests: string[] = [];
  const record = (r: Request) => requests.push(r.url());
  context.on('request', record);
  const cspViolations: string[] = [];
  page.on('console', (m) => {
    if (/Content Security Policy/i.test(m.text())) cspViolations.push(m.text());
  });
  page.on('websocket', (ws) => requests.push(ws.url()));

  await freshPage(page);
  const csp = await page
    .locator('meta[http-equiv="Content-Security-Policy"]')
    .getAttribute('content');
  expect(csp).toContain("default-src 'self'");
  expect(csp).toContain("connect-src 'self'");
  expect(csp).toContain("script-src 'self'");
  expect(csp).not.toMatch(/https?:|\*|unsafe-eval/);

  await page.getByTestId('layer-1-thickness').fill('3');
  await useDemoTable(page);
  await expect(page.getByTestId('dose-chart').locator('path.curve')).not.toHaveCount(0);
  const download = page.waitForEvent('download');
  await page.getByTestId('save').click();
  await download;
  for (const tab of ['Correction factors', 'Water data', 'Dose plane', 'Monte Carlo run'])
    await page.getByRole('tab', { name: tab }).click();
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  const pdf = page.getByRole('button', { name: 'Download PDF' });
  if ((await pdf.count()) > 0) {
    const report = page.waitForEvent('download');
    await pdf.click();
    await report;
  }
  await page.waitForTimeout(500);
  await page.screenshot({ path: testInfo.outputPath('journey-end.png'), fullPage: true });

  const outside = requests.filter((u) => {
    if (u.startsWith('data:') || u.startsWith('blob:')) return false;
    return new URL(u).origin !== origin;
  });
  expect(outside).toEqual([]);
  expect(requests.length).toBeGreaterThan(2); // the recorder really saw the page load
  expect(cspViolations).toEqual([]);
});

test('a case whose name and point id are HTML shows them as text and injects nothing', async ({
  page,
}, testInfo) => {
  await freshPage(page);
  const evilName = '<img src=x onerror="window.__pwned=1"><b>bold</b>';
  const evilPoint = '<img src=x onerror=window.__pwned=2>';
  await page.getByTestId('open-file').setInputFiles({
    name: '<script>x</script>.json',
    mimeType: 'application/json',
    buffer: Buffer.from(
      JSON.stringify({
        format: 'lamina.case',
        version: 1,
        name: evilName,
        beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
        layers: [
          { materialId: 'water', thicknessCm: 3, label: '<svg onload=window.__pwned=3>' },
          { materialId: 'lung', thicknessCm: 6 },
          { materialId: 'water', thicknessCm: 10 },
        ],
        points: [{ id: evilPoint, depthCm: 12 }],
      }),
    ),
  });
  await expect(page.locator('#case-name')).toHaveValue(evilName);
  await useDemoTable(page);
  await expect(page.getByTestId('point-table')).toContainText(evilPoint);
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await page.waitForTimeout(500);
  await page.screenshot({ path: testInfo.outputPath('html-as-text.png'), fullPage: true });
  await page.getByRole('tab', { name: 'Depth dose' }).click();
  await page.screenshot({ path: testInfo.outputPath('html-as-text-dose.png'), fullPage: true });
  expect(await page.locator('img[src="x"], b:text("bold"), svg[onload]').count()).toBe(0);
  expect(await page.evaluate(() => (window as DebugWindow).__pwned)).toBeUndefined();
});

test('a share link whose case name and point id are HTML opens them as text', async ({ page }) => {
  await freshPage(page);
  const evilName = '<img src=x onerror="window.__pwned=4">';
  const evilPoint = '<iframe src=x></iframe>';
  const hash = await shareHashOf({
    kind: 'case',
    value: {
      format: 'lamina.case',
      version: 2,
      name: evilName,
      beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
      layers: [{ materialId: 'water', thicknessCm: 20 }],
      points: [{ id: evilPoint, depthCm: 10 }],
    },
  });
  await page.goto('about:blank');
  await page.goto(`/${hash}`);
  await expect(page.locator('#case-name')).toHaveValue(evilName);
  await expect(page.getByTestId('point-table')).toContainText(evilPoint);
  expect(await page.locator('img[src="x"], iframe').count()).toBe(0);
  expect(await page.evaluate(() => (window as DebugWindow).__pwned)).toBeUndefined();
});

test('a file far too large for a case is refused without reading it, and the case stays', async ({
  page,
}) => {
  await freshPage(page);
  await page.getByTestId('preset').selectOption('chest');
  await expect(page.getByTestId('layer-3')).toBeVisible();
  await page.getByTestId('open-file').setInputFiles({
    name: 'huge.json',
    mimeType: 'application/json',
    buffer: Buffer.alloc(9 * 1024 * 1024, 0x20),
  });
  await expect(page.getByTestId('file-notice')).toContainText('huge.json was not opened');
  await expect(page.getByTestId('file-notice')).toContainText('too large for a case file');
  await expect(page.getByTestId('layer-3')).toBeVisible();
});

test('Monte Carlo workers that die mid-run end the run with a message; the page stays usable', async ({
  page,
}, testInfo) => {
  test.setTimeout(120_000);
  await freshPage(page, '/?debug=1');
  await page.getByRole('tab', { name: 'Monte Carlo run' }).click();
  await page.getByTestId('mc-preset-5000000').click();
  await page.getByTestId('mc-start').click();
  // Wait for the first estimate: the workers are then certainly busy with batches.
  await expect(page.getByTestId('mc-sigma-P1')).toHaveText(/^\d+\.\d+ %$/, { timeout: 60_000 });
  const killed = await page.evaluate(() =>
    (window as DebugWindow).__laminaDebug!.killMonteCarloWorkers(),
  );
  expect(killed).toBeGreaterThan(0);
  await expect(page.getByTestId('mc-status')).toContainText('Failed.', { timeout: 5_000 });
  await expect(page.getByTestId('mc-status')).toContainText(
    'A Monte Carlo worker stopped during the run',
  );
  await expect(page.getByTestId('mc-start')).toBeEnabled();
  await page.screenshot({ path: testInfo.outputPath('mc-worker-lost.png'), fullPage: true });
  // The rest of the page carries on: an edit is calculated by the compute worker.
  await page.getByTestId('layer-1-thickness').fill('5');
  await page.getByRole('tab', { name: 'Depth dose' }).click();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await expect(page.getByRole('alert').filter({ hasText: 'The calculation failed' })).toHaveCount(
    0,
  );
});

test('a check beam whose calculation is lost with the worker says so, and Retry calculates it', async ({
  page,
}) => {
  await freshPage(page, '/?debug=1');
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await expect(page.getByTestId('check-beams')).toBeVisible();
  await page.evaluate(() =>
    (window as DebugWindow).__laminaDebug?.killComputeWorkerDuringNextCalculation(),
  );
  await page.getByTestId('check-add-beam').setInputFiles('public/cases/water-reference-6mv.json');
  const second = page.getByTestId('check-beams').locator('tbody tr').nth(1);
  await expect(second).toContainText('The compute worker stopped during the calculation');
  await second.getByTestId('calc-retry').click();
  await expect(second).toContainText('calculated');
  await expect(second).not.toContainText('stopped');
  await expect(page.getByTestId('check-total-table')).toBeVisible();
});

test('a water-table file far too large is refused with a notice, nothing else changes', async ({
  page,
}) => {
  await freshPage(page);
  await page.getByRole('tab', { name: 'Water data' }).click();
  await page.getByTestId('water-file').setInputFiles({
    name: 'huge.csv',
    mimeType: 'text/csv',
    buffer: Buffer.alloc(3 * 1024 * 1024, 0x31),
  });
  await expect(page.getByTestId('file-notice')).toContainText('huge.csv was not read.');
  await expect(page.getByTestId('file-notice')).toContainText('too large for a water table');
  await expect(page.getByTestId('water-in-case')).toHaveCount(0);
});
