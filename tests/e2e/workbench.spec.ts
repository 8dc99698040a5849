// Journeys through the workbench as a user would take them, in Debian's Chromium.
import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { parseCaseText } from '../../src/io/caseFile';

async function expectNoNaN(page: Page) {
  const text = await page.locator('body').innerText();
  expect(text).not.toMatch(/\bNaN\b/);
  expect(text).not.toMatch(/\bundefined\b/);
}

/** Put the demo water table in the case and use it (from the Water data view). */
async function useDemoTable(page: Page) {
  await page.getByRole('tab', { name: 'Water data' }).click();
  await page.getByTestId('load-demo-water').click();
  await expect(page.getByTestId('source-table')).toBeChecked();
  await page.getByRole('tab', { name: 'Depth dose' }).click();
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
  // The view tabs are keyboard reachable: arrow keys move between them.
  await page.getByRole('tab', { name: 'Depth dose' }).focus();
  await page.keyboard.press('ArrowRight');
  await expect(page.getByRole('tab', { name: 'Correction factors' })).toHaveAttribute(
    'aria-selected',
    'true',
  );
  await expect(page.getByRole('tab', { name: 'Correction factors' })).toBeFocused();
  await expect(page.getByTestId('radiological-chart')).toBeVisible();
  await expectNoNaN(page);
});

test('builds a three-layer lung case by hand, saves it, and finds it restored after a reload', async ({
  page,
}, testInfo) => {
  await page.getByTestId('preset').selectOption('water');
  await expect(page.getByTestId('layer-2')).toHaveCount(0);
  await page.getByTestId('add-layer').click();
  await page.getByTestId('add-layer').click();
  await page.getByTestId('layer-2-material').selectOption('lung');
  await page.getByTestId('layer-1-thickness').fill('3');
  await page.getByTestId('layer-2-thickness').fill('6');
  await page.getByTestId('layer-3-thickness').fill('10');
  // A typed value that breaks a rule stays in the field, with a message naming the field.
  await page.getByTestId('layer-3-density').fill('-1');
  await expect(page.getByText('Layer 3 density: must be ≥ 0.001 g/cm³')).toBeVisible();
  await expect(page.getByTestId('layer-3-density')).toHaveValue('-1');
  await page.getByTestId('layer-3-density').fill('');
  // An SAD set-up marks the isocentre on the slab strip.
  await page.getByRole('radio', { name: 'SAD' }).check();
  await expect(page.getByTestId('isocentre')).toBeVisible();
  await page.getByRole('radio', { name: 'SSD' }).check();
  await expect(page.getByTestId('isocentre')).toHaveCount(0);
  await expect(page.getByTestId('slab-2')).toContainText('Lung');
  await page.screenshot({ path: testInfo.outputPath('built-case.png'), fullPage: true });

  const download = page.waitForEvent('download');
  await page.getByTestId('save').click();
  const file = await download;
  const saved = await file.path();
  const parsed = parseCaseText(readFileSync(saved, 'utf8'));
  expect(parsed.ok).toBe(true);
  if (parsed.ok) {
    expect(parsed.value.layers.map((l) => [l.materialId, l.thicknessCm])).toEqual([
      ['water', 3],
      ['lung', 6],
      ['water', 10],
    ]);
  }

  await page.waitForTimeout(600); // autosave is debounced (400 ms)
  await page.reload();
  await expect(page.getByTestId('layer-2-material')).toHaveValue('lung');
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('6');
  await expect(page.getByTestId('layer-3-thickness')).toHaveValue('10');
  await expectNoNaN(page);
});

test('opening an invalid case file lists its problems and keeps the current case', async ({
  page,
}) => {
  await page.getByTestId('open-file').setInputFiles({
    name: 'broken.json',
    mimeType: 'application/json',
    buffer: Buffer.from(
      JSON.stringify({
        format: 'lamina.case',
        version: 1,
        name: 'broken',
        beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
        layers: [{ materialId: 'lung', thicknessCm: -2 }],
        points: [],
      }),
    ),
  });
  await expect(page.getByTestId('file-notice')).toContainText('broken.json was not opened');
  await expect(page.getByTestId('file-notice')).toContainText('layers[0].thicknessCm');
  await expect(page.getByTestId('layer-3')).toBeVisible(); // the chest preset is still there
});

test('dragging the lung’s lower boundary 2 cm deeper thickens the lung, and undo restores it', async ({
  page,
}, testInfo) => {
  await page.getByTestId('preset').selectOption('chest');
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('8');
  await useDemoTable(page);
  const rtmrCell = page.getByTestId('dose-rtmr-P1');
  await expect(rtmrCell).toHaveText(/^\d+\.\d{3}/);
  const before = await rtmrCell.innerText();

  const handle = page.getByTestId('boundary-2').locator('rect.handle-hit');
  const box = (await handle.boundingBox())!;
  const lungBox = (await page.getByTestId('slab-2').locator('rect').boundingBox())!;
  const pxPerCm = lungBox.width / 8;
  const x0 = box.x + box.width / 2;
  const y0 = box.y + box.height / 2;
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  for (let i = 1; i <= 10; i++) await page.mouse.move(x0 + (2 * pxPerCm * i) / 10, y0);
  await page.mouse.up();
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('10');
  await expect(page.getByTestId('layer-3-thickness')).toHaveValue('7');
  await expect(rtmrCell).not.toHaveText(before);
  // Curves are coarse (0.2 cm) while dragging and back to 0.05 cm once the drag ends: 20 cm → 401.
  await expect(page.getByTestId('dose-chart')).toHaveAttribute('data-samples', '401');
  await page.screenshot({ path: testInfo.outputPath('after-drag.png'), fullPage: true });

  // Keyboard: Shift+ArrowLeft moves the focused boundary 1 cm shallower.
  await page.getByTestId('boundary-2').focus();
  await page.keyboard.press('Shift+ArrowLeft');
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('9');
  await page.keyboard.press('ArrowRight');
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('9.1');

  await page.getByTestId('undo').click();
  await page.getByTestId('undo').click();
  await page.getByTestId('undo').click();
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('8');
  await page.getByTestId('redo').click();
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('10');
  await expectNoNaN(page);
});

test('with the demo water table every method is plotted and a method can be toggled off', async ({
  page,
}, testInfo) => {
  await useDemoTable(page);
  const chart = page.getByTestId('dose-chart');
  await expect(chart.locator('path.curve[data-method="rtmr"]')).toHaveCount(1);
  const curves = await chart.locator('path.curve').count();
  expect(curves).toBeGreaterThanOrEqual(5);
  for (const d of await chart
    .locator('path.curve')
    .evaluateAll((ps) => ps.map((p) => p.getAttribute('d'))))
    expect(d).toMatch(/^M[\d.]+,[\d.]+L/); // a drawn line, not an empty path
  await page.getByTestId('toggle-rtmr').uncheck();
  await expect(chart.locator('path.curve[data-method="rtmr"]')).toHaveCount(0);
  await expect(chart.locator('path.curve')).toHaveCount(curves - 1);
  await expect(page.getByTestId('dose-rtmr-P1')).toHaveCount(0);
  // Crosshair readout lists every shown method at the hovered depth.
  const box = (await chart.locator('rect.hit').boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.4, box.y + box.height / 2);
  await expect(chart.locator('.readout')).toContainText('depth');
  await expect(chart.locator('.readout-row')).toHaveCount(curves - 1);
  await page.screenshot({ path: testInfo.outputPath('dose-view.png'), fullPage: true });
  await page.getByRole('tab', { name: 'Correction factors' }).click();
  await expect(page.getByTestId('cf-chart')).toBeVisible();
  await expect(page.getByTestId('radiological-chart')).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('cf-view.png'), fullPage: true });
  await page.getByRole('tab', { name: 'Water data' }).click();
  await expect(page.getByTestId('water-chart')).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('water-view.png'), fullPage: true });
  await expectNoNaN(page);
});

test('a pasted water table with a bad cell is reported by row and column', async ({ page }) => {
  await page.getByRole('tab', { name: 'Water data' }).click();
  await page
    .getByLabel('Depth table CSV')
    .fill('depth cm \\ field cm,5,10\n0,0.5,0.5\n1.5,1.0,abc\n5,0.9,0.92\n');
  await expect(page.getByTestId('water-problems')).toContainText('row 3');
  await expect(page.getByTestId('water-problems')).toContainText('column 3 (C)');
  await expect(page.getByTestId('use-water')).toHaveCount(0);
});

test('a share link carries the case: opening it restores the layers', async ({ page, context }) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  await page.getByTestId('preset').selectOption('sinus');
  await expect(page.getByTestId('layer-2-material')).toHaveValue('air');
  await page.getByTestId('share').click();
  await expect(page.getByTestId('file-notice')).toContainText('Link copied');
  const url = await page.evaluate(() => navigator.clipboard.readText());
  expect(url).toMatch(/#case=[A-Za-z0-9_-]+$/);
  await page.evaluate(() => localStorage.clear());
  await page.goto('/');
  await page.getByTestId('preset').selectOption('water');
  await expect(page.getByTestId('layer-2')).toHaveCount(0);
  await page.goto(url);
  await page.reload();
  await expect(page.getByTestId('layer-2-material')).toHaveValue('air');
  await expect(page.getByTestId('file-notice')).toContainText('from the link');
});

test('at 1280×720 every view fits the width, labels do not overlap and no NaN shows', async ({
  page,
}, testInfo) => {
  await page.setViewportSize({ width: 1280, height: 720 });
  await useDemoTable(page);
  await expect(page.getByTestId('dose-chart')).toBeVisible();
  // A click on the depth ruler places a new point of interest.
  const ruler = (await page.getByTestId('depth-ruler').boundingBox())!;
  await page.mouse.click(ruler.x + ruler.width * 0.25, ruler.y + ruler.height / 2);
  await expect(page.getByTestId('point-P2-depth')).toHaveValue('5');
  for (const tab of [
    'Depth dose',
    'Correction factors',
    'Water data',
    'Dose plane',
    'Monte Carlo run',
  ]) {
    await page.getByRole('tab', { name: tab }).click();
    await page.waitForTimeout(300);
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - window.innerWidth,
    );
    expect(overflow, `${tab}: page wider than the window`).toBeLessThanOrEqual(0);
    const overlaps = await page.evaluate(() => {
      const found: string[] = [];
      for (const svg of Array.from(document.querySelectorAll('svg'))) {
        const boxes = Array.from(svg.querySelectorAll('text.tick-label, text.slab-label')).map(
          (t) => ({
            text: t.textContent ?? '',
            r: t.getBoundingClientRect(),
          }),
        );
        for (let i = 0; i < boxes.length; i++)
          for (let j = i + 1; j < boxes.length; j++) {
            const a = boxes[i]!.r;
            const b = boxes[j]!.r;
            if (
              a.left < b.right - 1 &&
              b.left < a.right - 1 &&
              a.top < b.bottom - 1 &&
              b.top < a.bottom - 1
            )
              found.push(`${boxes[i]!.text} / ${boxes[j]!.text}`);
          }
      }
      return found;
    });
    expect(overlaps, `${tab}: overlapping labels`).toEqual([]);
    await page.screenshot({
      path: testInfo.outputPath(`1280-${tab.split(' ')[0]!.toLowerCase()}.png`),
    });
    await expectNoNaN(page);
  }
});

test('the modelled beam is the default water data; a loaded table replaces it until modelled is chosen again', async ({
  page,
}) => {
  const line = page.getByTestId('water-line');
  await expect(line).toContainText('modelled beam (6MV');
  const cell = page.getByTestId('dose-rtmr-P1');
  await expect(cell).toHaveText(/^\d+\.\d{3}/);
  const modelled = await cell.innerText();
  await useDemoTable(page);
  await expect(line).toContainText('measured table: demo-6mv-tmr.csv');
  await expect(cell).not.toHaveText(modelled); // the invented table differs from the model
  await page.getByRole('tab', { name: 'Water data' }).click();
  await page.getByTestId('source-modelled').check();
  await page.getByRole('tab', { name: 'Depth dose' }).click();
  await expect(line).toContainText('modelled beam (6MV');
  await expect(cell).toHaveText(modelled);
  await expectNoNaN(page);
});

test('dragging the bottom boundary 2 cm shallower thins the last layer by 2 cm (axis holds still)', async ({
  page,
}) => {
  await page.getByTestId('preset').selectOption('chest');
  await expect(page.getByTestId('layer-3-thickness')).toHaveValue('9');
  const handle = page.getByTestId('boundary-3').locator('rect.handle-hit');
  const box = (await handle.boundingBox())!;
  const lungBox = (await page.getByTestId('slab-2').locator('rect').boundingBox())!;
  const pxPerCm = lungBox.width / 8;
  const x0 = box.x + box.width / 2;
  const y0 = box.y + box.height / 2;
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  for (let i = 1; i <= 10; i++) await page.mouse.move(x0 - (2 * pxPerCm * i) / 10, y0);
  await page.mouse.up();
  await expect(page.getByTestId('layer-3-thickness')).toHaveValue('7');
  await expect(page.getByTestId('layer-2-thickness')).toHaveValue('8');
});

test('a case file dropped on the page opens it', async ({ page }) => {
  const text = JSON.stringify({
    format: 'lamina.case',
    version: 1,
    name: 'Dropped bone slab',
    beam: { energy: '10MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 8, fieldYCm: 8 },
    layers: [
      { materialId: 'water', thicknessCm: 4 },
      { materialId: 'corticalBone', thicknessCm: 2 },
      { materialId: 'water', thicknessCm: 12 },
    ],
    points: [{ id: 'P1', depthCm: 10 }],
  });
  const dataTransfer = await page.evaluateHandle((t) => {
    const dt = new DataTransfer();
    dt.items.add(new File([t], 'dropped.json', { type: 'application/json' }));
    return dt;
  }, text);
  await page.locator('.app').dispatchEvent('drop', { dataTransfer });
  await expect(page.getByTestId('layer-2-material')).toHaveValue('corticalBone');
  await expect(page.getByLabel('Energy')).toHaveValue('10MV');
  await expect(page.getByTestId('file-notice')).toContainText('Opened dropped.json');
});
