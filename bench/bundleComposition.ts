// `npm run bench:bundle`: what the built JavaScript is made of. Builds the page with source maps
// into a temporary directory, attributes every minified byte of every dist/assets/*.js to the
// source it came from (the chunk's source map), and prints per chunk the packages and src/
// folders that make it up, raw and gzip. A part's gzip figure is the chunk's gzip size shared out
// in proportion to raw bytes (an estimate: parts compress differently). JSON modules carry no source map: their bytes
// show as '(unmapped)'. Options: --top N (parts
// per chunk, default 12), --files (list source files instead of packages and folders).
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { spawnSync } from 'node:child_process';
import { table } from '../src/cli/formatReport';
import { decodeMappings } from './lib/sourceMapMappings';

interface SourceMap {
  sources: string[];
  mappings: string;
}

function option(argv: string[], name: string): string | undefined {
  const i = argv.indexOf(name);
  return i >= 0 ? argv[i + 1] : undefined;
}

/** A source path grouped: its npm package, its src/ folder (two levels), or itself. */
function partOf(source: string, files: boolean): string {
  const pkg = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(source);
  if (pkg) return pkg[1] as string;
  const inTree = /(?:^|\/)((?:src|workers|public)\/.*)$/.exec(source.replace(/\?.*$/, ''));
  const clean = inTree ? (inTree[1] as string) : source;
  if (files) return clean;
  const dir = /^(src\/[^/]+(?:\/[^/]+(?=\/))?|workers|public)/.exec(clean);
  return dir ? (dir[1] as string) : clean;
}

/** Bytes of `code` per source of its source map (unmapped bytes under '(unmapped)'). */
function bytesBySource(code: string, map: SourceMap, files: boolean): Map<string, number> {
  const out = new Map<string, number>();
  const add = (k: string, n: number) => out.set(k, (out.get(k) ?? 0) + n);
  const lines = code.split('\n');
  const mapped = decodeMappings(map.mappings);
  lines.forEach((line, i) => {
    const segs = mapped[i] ?? [];
    let col = 0;
    let owner = '(unmapped)';
    for (const s of segs) {
      add(owner, Buffer.byteLength(line.slice(col, s.column)));
      col = s.column;
      owner = s.source !== undefined ? partOf(map.sources[s.source] ?? '?', files) : '(unmapped)';
    }
    add(owner, Buffer.byteLength(line.slice(col)) + 1);
  });
  return out;
}

function main(argv: string[]): number {
  const top = Number(option(argv, '--top') ?? 12);
  const files = argv.includes('--files');
  const outDir = mkdtempSync(join(tmpdir(), 'lamina-bundle-'));
  try {
    const r = spawnSync(
      'npx',
      ['vite', 'build', '--sourcemap', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'],
      { encoding: 'utf8' },
    );
    if (r.status !== 0) {
      process.stderr.write(`vite build failed:\n${r.stderr}${r.stdout}`);
      return 1;
    }
    const html = readFileSync(join(outDir, 'index.html'), 'utf8');
    const assets = join(outDir, 'assets');
    const chunks = readdirSync(assets)
      .filter((f) => f.endsWith('.js'))
      .map((f) => {
        const code = readFileSync(join(assets, f), 'utf8');
        const gz = gzipSync(code, { level: 9 }).length;
        const mapFile = join(assets, `${f}.map`);
        const parts = existsSync(mapFile)
          ? bytesBySource(code, JSON.parse(readFileSync(mapFile, 'utf8')) as SourceMap, files)
          : new Map([['(no source map)', Buffer.byteLength(code)]]);
        return { f, raw: Buffer.byteLength(code), gz, parts };
      })
      .sort((a, b) => b.gz - a.gz);
    const kB = (n: number) => (n / 1024).toFixed(1);
    let totalGz = 0;
    let entryGz = 0;
    const rows: string[][] = [];
    for (const c of chunks) {
      const entry = html.includes(`assets/${c.f}`);
      const worker = c.f.includes('.worker-');
      totalGz += c.gz;
      if (entry) entryGz += c.gz;
      const kind = entry ? 'entry' : worker ? 'worker' : 'lazy';
      rows.push([`${c.f} (${kind})`, kB(c.raw), kB(c.gz), '']);
      const parts = [...c.parts].sort((a, b) => b[1] - a[1]);
      for (const [name, bytes] of parts.slice(0, top))
        rows.push([`  ${name}`, kB(bytes), kB((c.gz * bytes) / c.raw), '']);
      const rest = parts.slice(top).reduce((s, p) => s + p[1], 0);
      if (rest > 0)
        rows.push([`  (${parts.length - top} more)`, kB(rest), kB((c.gz * rest) / c.raw), '']);
    }
    rows.push(['all JS', '', kB(totalGz), `${chunks.length} files`]);
    rows.push(['entry (index.html script and module preloads)', '', kB(entryGz), '']);
    process.stdout.write(`${table(['chunk / part', 'raw kB', 'gzip kB', ''], rows)}\n`);
    return 0;
  } finally {
    rmSync(outDir, { recursive: true, force: true });
  }
}

process.exit(main(process.argv.slice(2)));
