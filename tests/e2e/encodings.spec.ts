// Files in other encodings, opened in the page and given to the command line: both read the
// same bytes the same way (src/io/textDecoding) and name the encoding when it is not plain UTF-8.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from '@playwright/test';

const demo = readFileSync('public/cases/water-reference-6mv.json', 'utf8');

function utf16le(s: string): Buffer {
  return Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(s, 'utf16le')]);
}

/** The command line's reading of the same bytes: its case name, and its note on stderr. */
function cliOf(
  name: string,
  bytes: Buffer,
): { caseName: string; err: string; code: number | null } {
  const file = join(mkdtempSync(join(tmpdir(), 'lamina-e2e-enc-')), name);
  writeFileSync(file, bytes);
  const r = spawnSync(
    process.execPath,
    ['--import', 'tsx', 'src/cli/calc.ts', file, '--json', '--methods', 'water'],
    { encoding: 'utf8' },
  );
  const caseName = r.status === 0 ? (JSON.parse(r.stdout) as { caseName: string }).caseName : '';
  return { caseName, err: r.stderr, code: r.status };
}

test('a case file in UTF-16 LE or Latin-1 opens as on the command line, naming the encoding', async ({
  page,
}, testInfo) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  const named = demo.replace('"name": "Demo:', '"name": "Démo € µ:');
  const files: [string, Buffer, string][] = [
    ['utf16.json', utf16le(named), 'read as UTF-16 LE (byte-order mark)'],
    // Windows-1252 bytes: é 0xE9, € 0x80, µ 0xB5; every other character is ASCII.
    [
      'latin1.json',
      Buffer.from([...named].map((ch) => (ch === '€' ? 0x80 : ch.charCodeAt(0)))),
      'read as Latin-1 (Windows-1252): the file is not valid UTF-8',
    ],
  ];
  for (const [name, bytes, note] of files) {
    const cli = cliOf(name, bytes);
    expect(cli.code).toBe(0);
    expect(cli.err).toContain(note);
    await page
      .getByTestId('open-file')
      .setInputFiles({ name, mimeType: 'application/json', buffer: bytes });
    const notice = page.getByTestId('file-notice');
    await expect(notice).toContainText(`Opened ${name}`);
    await expect(notice).toContainText(note);
    await expect(page.locator('#case-name')).toHaveValue(cli.caseName);
    expect(cli.caseName).toMatch(/^Démo € µ:/);
  }
  await page.screenshot({ path: testInfo.outputPath('latin1-opened.png'), fullPage: true });
});

test('a UTF-16 file without a byte-order mark is refused by both, with the same reason', async ({
  page,
}) => {
  await page.goto('/');
  const bytes = Buffer.from(demo, 'utf16le');
  const cli = cliOf('nomark.json', bytes);
  expect(cli.code).toBe(2);
  const reason = 'the file holds NUL bytes: UTF-16 without a byte-order mark, or not a text file';
  expect(cli.err).toContain(reason);
  await page.getByTestId('open-file').setInputFiles({
    name: 'nomark.json',
    mimeType: 'application/json',
    buffer: bytes,
  });
  const notice = page.getByTestId('file-notice');
  await expect(notice).toContainText('nomark.json was not opened; the current case is unchanged.');
  await expect(notice).toContainText(reason);
});
