// Patient import journeys in Debian's Chromium: a synthetic CT series and RT Plan (written by the
// test generator, tests/helpers/dicomFixtures.ts) dropped on the page, each beam's density
// profile looked at, a slab edited, the plan checked; files that cannot be read refused with
// messages; no request leaves the page's origin.
import { expect, test, type Page } from '@playwright/test';
import { join } from 'node:path';
import { BOX_BEAMS, BOX_SPACING, boxPlanFiles, writeFiles } from '../helpers/dicomFixtures';
import { writeRtPlan } from '../helpers/dicomPhantom';
import type { NamedBytes } from '../helpers/dicomPhantom';

async function openImport(page: Page) {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByTestId('calc-status')).toContainText('calculated in');
  await page.getByRole('tab', { name: 'Patient import (DICOM)' }).click();
  await expect(page.getByTestId('dicom-panel')).toBeVisible();
}

/** Drop files on the drop zone as a person dragging them from a file manager would. */
async function dropFiles(page: Page, files: readonly NamedBytes[]) {
  const payload = files.map((f) => ({
    name: f.name,
    b64: Buffer.from(f.bytes).toString('base64'),
  }));
  const dt = await page.evaluateHandle((list) => {
    const t = new DataTransfer();
    for (const f of list) {
      const bin = atob(f.b64);
      const bytes = new Uint8Array(bin.length);
      for (let i = 0; i < bin.length; i++) bytes[i] = bin.charCodeAt(i);
      t.items.add(new File([bytes], f.name, { type: 'application/dicom' }));
    }
    return t;
  }, payload);
  await page.getByTestId('dicom-drop').dispatchEvent('dragover', { dataTransfer: dt });
  await page.getByTestId('dicom-drop').dispatchEvent('drop', { dataTransfer: dt });
}

test('a dropped CT series and RT Plan become a checked plan of slab beams', async ({
  page,
}, testInfo) => {
  // A long journey (import, edits, a four-beam check, a beam swap): room for a loaded machine.
  test.setTimeout(120_000);
  const origin = new URL(testInfo.project.use.baseURL ?? 'http://127.0.0.1').origin;
  const outside: string[] = [];
  page.on('request', (r) => {
    if (!r.url().startsWith(origin) && !r.url().startsWith('data:') && !r.url().startsWith('blob:'))
      outside.push(r.url());
  });
  await openImport(page);
  await expect(page.getByTestId('dicom-calibration-note')).toContainText('generic, from memory');
  await dropFiles(page, boxPlanFiles());
  await expect(page.getByTestId('dicom-summary')).toContainText('RT Plan “BOX 4F”: 4 beams');
  await expect(page.getByTestId('dicom-calibration-caution')).toContainText(
    'generic and from memory',
  );
  await expect(page.getByTestId('dicom-summary')).toContainText('31 slices');
  // SSD and isocentre depth within one voxel (4 mm) of the box geometry (tests/helpers/dicomFixtures.ts).
  for (const b of BOX_BEAMS) {
    const ssd = Number(await page.getByTestId(`dicom-ssd-beam-${b.number}`).innerText());
    const depth = Number(await page.getByTestId(`dicom-isodepth-beam-${b.number}`).innerText());
    expect(Math.abs(ssd - b.ssdCm)).toBeLessThanOrEqual(BOX_SPACING.rowMm / 10);
    expect(Math.abs(depth - b.isoDepthCm)).toBeLessThanOrEqual(BOX_SPACING.rowMm / 10);
  }
  // The lateral beam crosses the lung box: water, lung, water.
  const left = page.getByTestId('dicom-slabs-beam-2');
  await expect(left.locator('tbody tr')).toHaveCount(3);
  await expect(left.getByTestId('dicom-slab-beam-2-1-material')).toHaveValue('lung');
  const profile = page.getByTestId('dicom-profile-beam-2');
  await expect(profile.locator('path.profile-ct')).toHaveAttribute('d', /^M/);
  await expect(profile.locator('rect.profile-slab')).toHaveCount(3);
  await page
    .getByTestId('dicom-beam-beam-2')
    .screenshot({ path: testInfo.outputPath('profile-left.png') });
  await page.screenshot({ path: testInfo.outputPath('import.png'), fullPage: true });

  // Edit the lung slab to cortical bone: the chart follows, the table says edited.
  await page.getByTestId('dicom-slab-beam-2-1-material').selectOption('corticalBone');
  await expect(left.locator('caption')).toContainText('(edited)');
  // A new material starts at its default density: cortical bone, ρe = 1.92 g/cm³ × Z/A 0.51478 /
  // 0.55508 (water) = 1.781 (NIST SRD 126 Table 2, ICRU-44 compositions).
  await expect(page.getByTestId('dicom-slab-beam-2-1-density')).toHaveValue('');
  await expect(left.locator('tbody tr').nth(1).locator('td').last()).toHaveText('1.781');
  await page
    .getByTestId('dicom-beam-beam-2')
    .screenshot({ path: testInfo.outputPath('profile-edited.png') });
  await page.getByTestId('dicom-reset-beam-2').click();
  await expect(left.locator('caption')).toContainText('(from the CT)');
  await page.getByTestId('dicom-slab-beam-2-0-thickness').fill('5');
  await expect(left.locator('caption')).toContainText('(edited)');

  // The imported plan opens like a plan file: settings it does not carry go back to their
  // defaults (the dose convention chosen before is not kept).
  await page.getByTestId('dose-to').selectOption('medium');
  await page.getByTestId('dicom-use').click();
  await expect(page.getByRole('tab', { name: 'Point check & report' })).toHaveAttribute(
    'aria-selected',
    'true',
  );
  await expect(page.getByTestId('file-notice')).toContainText('4 beams at point ISO');
  await expect(page.getByTestId('check-beams').locator('tbody tr')).toHaveCount(4);
  await expect(page.getByTestId('check-total-table')).toBeVisible();
  await expect(page.getByTestId('check-total-table')).toContainText('ISO');
  await expect(page.getByTestId('check-verdict')).toBeVisible();
  await expect(page.getByTestId('dose-to')).toHaveValue('water');
  await expect(page.getByTestId('check-method')).toHaveValue('');
  // Case version 2: each RT Plan beam meterset is that beam's planning MU, and the beam dose of
  // the fraction group the planning dose at ISO (tests/helpers/dicomFixtures.ts).
  for (const b of BOX_BEAMS) {
    await expect(page.getByTestId(`plan-mu-beam-${b.number}`)).toHaveValue(String(b.meterset));
    await expect(page.getByTestId(`plan-dose-beam-${b.number}-ISO`)).toHaveValue(
      String(b.doseGy * 100),
    );
  }
  await page.screenshot({ path: testInfo.outputPath('checked.png'), fullPage: true });
  await expect(page.locator('#case-name')).toHaveValue('BOX 4F — AP');
  // The edited slab went into the plan: beam 2's first layer is 5 cm.
  await page.getByTestId('check-edit-beam-beam-2').click();
  await expect(page.locator('#case-name')).toHaveValue('BOX 4F — LEFT');
  await expect(page.getByTestId('layer-1-thickness')).toHaveValue('5');
  expect(outside).toEqual([]);
});

test('files the import cannot read are refused with messages naming the problem', async ({
  page,
}) => {
  await openImport(page);
  const files = boxPlanFiles();
  // A CT slice cut short, and a plan in a compressed transfer syntax.
  const cut = { name: 'CT.cut.dcm', bytes: files[3]!.bytes.slice(0, files[3]!.bytes.length - 100) };
  await page.getByTestId('dicom-files-input').setInputFiles(
    [...files.slice(0, 3), cut].map((f) => ({
      name: f.name,
      mimeType: 'application/dicom',
      buffer: Buffer.from(f.bytes),
    })),
  );
  await expect(page.getByTestId('dicom-problems')).toContainText('CT.cut.dcm: file is truncated');
  const jpeg = writeRtPlan({ label: 'X', patientPosition: 'HFS', beams: [] });
  const relabelled = Buffer.from(jpeg.bytes);
  await page.getByTestId('dicom-files-input').setInputFiles([
    { name: 'notdicom.txt', mimeType: 'text/plain', buffer: Buffer.from('hello') },
    { name: 'plan.dcm', mimeType: 'application/dicom', buffer: relabelled },
  ]);
  await expect(page.getByTestId('dicom-problems')).toContainText('no Beam Sequence');
});

test('a folder picked with the folder input is read with its subfolders', async ({
  page,
}, testInfo) => {
  await openImport(page);
  const dir = testInfo.outputPath('patient');
  writeFiles(join(dir, 'CT'), boxPlanFiles().slice(0, -1));
  writeFiles(join(dir, 'plan'), boxPlanFiles().slice(-1));
  await page.getByTestId('dicom-folder-input').setInputFiles(dir);
  await expect(page.getByTestId('dicom-summary')).toContainText('RT Plan “BOX 4F”: 4 beams');
  await expect(page.getByTestId('dicom-profile-beam-4')).toBeVisible();
});
