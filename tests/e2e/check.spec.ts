// The point check as a user takes it: planning values in, verdicts out, print view, PDF record,
// a two-beam plan opened from a file and passed on through a link.
import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { pdfTextOf } from '../helpers/pdfTextOf';

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
});

async function openCheckWithWaterData(page: Page) {
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  // Type-A methods run on the modelled beam by default; offer it if the page asks for water data.
  const modelled = page.getByTestId('quick-modelled');
  if ((await modelled.count()) > 0) await modelled.click();
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await expect(page.getByTestId('check-panel')).toBeVisible();
  await expect(page.getByTestId('check-point-table')).toBeVisible();
}

/** The cells of the per-beam row for a point and method label, once the check is calculated. */
async function rowCells(page: Page, pointId: string, methodLabel: string): Promise<string[]> {
  // The check is calculated in the compute worker: wait for the one of the current inputs.
  await expect(page.getByTestId('check-pending')).toHaveCount(0);
  const rows = page.getByTestId('check-point-table').locator('tbody tr');
  const all = await rows.evaluateAll((trs) =>
    trs.map((tr) => Array.from(tr.querySelectorAll('td')).map((td) => td.textContent ?? '')),
  );
  const row = all.find((cells) => cells[1] === pointId && cells[3] === methodLabel);
  if (!row) throw new Error(`no row for ${pointId} / ${methodLabel}`);
  return row;
}

test('entering the planning dose and MU gives a verdict; print view and PDF record', async ({
  page,
}, testInfo) => {
  await openCheckWithWaterData(page);
  await expect(page.getByTestId('check-verdict')).toContainText('Not compared');
  // The path crosses lung: the superposition decides by default, and the page says so.
  await expect(page.getByTestId('check-deciding-method')).toContainText(
    'default for a path that crosses a heterogeneity',
  );
  await expect(page.getByTestId('check-spread')).toContainText('Spread between');

  // Planning dose 200 cGy at P1: the check gives the MU for it (column "check MU"); with no
  // planning MU for the beam the verdict says which number is missing.
  await page.getByTestId('plan-dose-beam-1-P1').fill('200');
  const rtmr = 'Ratio of TMR (effective depth)';
  const checkMu = Number((await rowCells(page, 'P1', rtmr))[5]);
  expect(checkMu).toBeGreaterThan(100);
  await expect(page.getByTestId('check-verdict-statement')).toContainText(
    'missing planning MU of beam beam-1',
  );

  // Decide with the ratio of TMR (chosen), then the planning system's MU for the beam 1 % above
  // its check MU: within the 5 % heterogeneous tolerance.
  await page.getByTestId('check-method').selectOption('rtmr');
  await expect(page.getByTestId('check-deciding-method')).toContainText('chosen');
  await page.getByTestId('plan-mu-beam-1').fill((checkMu * 1.01).toFixed(1));
  await expect(page.getByTestId('check-verdict')).toContainText('Within tolerance');
  expect((await rowCells(page, 'P1', rtmr))[12]).toBe('pass');

  // 10 % above: outside tolerance, shown in words, naming the deciding difference once.
  await page.getByTestId('plan-mu-beam-1').fill((checkMu * 1.1).toFixed(1));
  await expect(page.getByTestId('check-verdict')).toContainText('Outside tolerance');
  await expect(page.getByTestId('check-verdict-statement')).toHaveText(
    /^fail — Ratio of TMR \(effective depth\): (ΔMU −9\.\d\d|Δdose \+(9\.9\d|10\.\d\d)) % beyond ±5 % \(beam beam-1, point P1\)$/,
  );
  expect((await rowCells(page, 'P1', rtmr))[12]).toBe('FAIL');

  // A wider tolerance turns it back to a pass.
  await page.getByTestId('tol-heterogeneous').fill('12');
  await expect(page.getByTestId('check-verdict')).toContainText('Within tolerance');
  await page.screenshot({ path: testInfo.outputPath('check-panel.png'), fullPage: true });

  // Print: only the record is shown, with the point table and the signature line.
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByTestId('check-record')).toBeVisible();
  await expect(page.getByTestId('check-panel')).toBeHidden();
  await expect(page.getByTestId('check-record')).toContainText('Point check per beam');
  await expect(page.getByTestId('check-record')).toContainText('Checked by');
  await page.screenshot({ path: testInfo.outputPath('check-print.png'), fullPage: true });
  await page.emulateMedia({ media: 'screen' });
  await expect(page.getByTestId('check-record')).toBeHidden();

  // PDF record: ISO-dated name, PDF bytes, the point table inside.
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Download PDF' }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/^lamina-check-\d{4}-\d{2}-\d{2}\.pdf$/);
  const pdf = readFileSync(await download.path()).toString('latin1');
  expect(pdf.startsWith('%PDF-')).toBe(true);
  const pdfLines = pdfTextOf(pdf).split('\n');
  expect(pdfLines).toContain('Point check per beam');
  // The factor chain of the water data the page used (the modelled beam by default).
  expect(pdfLines.some((l) => l.startsWith('Water chain at P1: D/MU = '))).toBe(true);
  expect(pdfLines).toContain((checkMu * 1.1).toFixed(1));
  // Greek letters printed as written (embedded font), and the verdict in words (the 12 %
  // tolerance set above makes it a pass).
  expect(pdfLines.some((l) => l.includes('Verdict: pass — Ratio of TMR'))).toBe(true);
  expect(pdfLines.some((l) => l.includes('ΔMU'))).toBe(true);

  // The figure as SVG and PNG files.
  const [svg] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Figure: SVG' }).click(),
  ]);
  const svgText = readFileSync(await svg.path(), 'utf8');
  expect(svgText).toMatch(/^<\?xml/);
  // A standalone SVG file: the root declares the SVG namespace (written by the serialiser).
  expect(svgText).toMatch(/<svg[^>]* xmlns="[^"]*\/2000\/svg"/);
  expect(svgText).toContain('<polyline');
  const [png] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Figure: PNG' }).click(),
  ]);
  expect(png.suggestedFilename()).toMatch(/^lamina-depth-dose-\d{4}-\d{2}-\d{2}\.png$/);
  expect(
    readFileSync(await png.path())
      .subarray(1, 4)
      .toString('latin1'),
  ).toBe('PNG');

  // A second beam from a case file: the sum over beams appears.
  await page.getByTestId('check-add-beam').setInputFiles('public/cases/water-reference-6mv.json');
  await expect(page.getByTestId('check-beams').locator('tbody tr')).toHaveCount(2);
  await expect(page.getByTestId('check-total-table')).toBeVisible();
});

test('a two-beam plan opened from a file shows the total, and travels through a link', async ({
  page,
}, testInfo) => {
  // A long journey: two page loads and every beam calculated in the worker after each change.
  test.setTimeout(120_000);
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  await page
    .getByTestId('check-open-plan')
    .setInputFiles('public/cases/opposed-pair-chest-6mv.plan.json');
  await expect(page.getByTestId('check-total-table')).toBeVisible();
  await expect(page.getByTestId('check-verdict')).toContainText('Within tolerance');
  await expect(page.getByTestId('check-beam-verdicts').locator('tbody tr')).toHaveCount(3); // AP, PA, all
  const totals = await page
    .getByTestId('check-total-table')
    .locator('tbody tr')
    .first()
    .innerText();
  expect(totals).toMatch(/iso/);
  await page.screenshot({ path: testInfo.outputPath('check-plan.png'), fullPage: true });

  // CSV of the point check parses back with one row per beam and method.
  const [csv] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'CSV: point check' }).click(),
  ]);
  const lines = readFileSync(await csv.path(), 'utf8')
    .trim()
    .split(/\r?\n/);
  expect(lines[0]).toMatch(/^beam,point,depth_cm,method/);
  expect(lines.filter((l) => l.startsWith('AP,')).length).toBeGreaterThan(3);

  await page.getByRole('button', { name: 'Copy share link' }).click();
  const link = await page.getByTestId('share-link').inputValue();
  expect(link).toMatch(/#plan=[A-Za-z0-9_-]+$/);

  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.goto(link);
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  // A fresh page: its compute worker starts cold and calculates every beam before the total.
  await expect(page.getByTestId('check-total-table')).toBeVisible({ timeout: 45_000 });
  await expect(page.getByTestId('check-beams')).toContainText('PA');
  const doc = JSON.parse(readFileSync('public/cases/opposed-pair-chest-6mv.plan.json', 'utf8')) as {
    name: string;
    beams: { id: string; case: { name: string } }[];
  };
  const pa = doc.beams.find((b) => b.id === 'PA')!;
  await expect(page.getByTestId('check-record')).toHaveCount(1);
  await expect(page.locator('body')).toContainText(doc.name.slice(0, 20));

  // The PA beam is edited with the full editor: it becomes beam 1, the editor's case takes its row,
  // and the total is formed again over both beams.
  const total = await page.getByTestId('check-total-table').innerText();
  await page.getByTestId('check-edit-beam-PA').click();
  await expect(page.getByLabel('Beam 1 id')).toHaveValue('PA');
  await expect(page.getByTestId('check-beams').locator('tbody tr').nth(1)).toContainText('AP');
  await expect(page.locator('#case-name')).toHaveValue(pa.case.name);
  await expect(page.getByTestId('check-total-table')).toBeVisible();
  // Same two beams, same weights: the sum at the shared point is unchanged.
  await expect.poll(() => page.getByTestId('check-total-table').innerText()).toBe(total);
});
