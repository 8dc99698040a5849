// Size of the built JavaScript: raw and gzip (node:zlib, level 9) of every dist/assets/*.js,
// and of the entry chunk the page loads first.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { BenchRow } from './row';

const GROUP = 'bundle';

export function bundleSizeRows(distDir: string): BenchRow[] {
  const assets = join(distDir, 'assets');
  const files = readdirSync(assets).filter((f) => f.endsWith('.js'));
  if (files.length === 0) throw new Error(`no .js files in ${assets}`);
  const html = readFileSync(join(distDir, 'index.html'), 'utf8');
  let raw = 0;
  let gz = 0;
  let entryGz = 0;
  let entryName = '';
  for (const f of files) {
    const bytes = readFileSync(join(assets, f));
    const g = gzipSync(bytes, { level: 9 }).length;
    raw += bytes.length;
    gz += g;
    if (html.includes(`assets/${f}`)) {
      entryGz += g;
      entryName = entryName ? `${entryName}, ${f}` : f;
    }
  }
  const kB = (n: number) => n / 1024;
  return [
    {
      group: GROUP,
      name: 'all JS, gzip',
      unit: 'kB',
      samples: [kB(gz)],
      note: `${files.length} files, ${kB(raw).toFixed(0)} kB raw`,
    },
    {
      group: GROUP,
      name: 'entry JS, gzip',
      unit: 'kB',
      samples: [kB(entryGz)],
      note: entryName || 'entry chunk not found in index.html',
    },
  ];
}
