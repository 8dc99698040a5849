// Build the page into a temporary directory (outside the working tree, so a running e2e suite's
// dist/ is left alone) and serve it with `vite preview` on 127.0.0.1:4191. Port 4190 (ManageSieve)
// is on the Fetch standard's blocked-port list: Node's fetch refuses it ("bad port") and Chromium
// refuses to navigate to it, so the next port is used; BENCH_PORT overrides.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const PREVIEW_PORT = Number(process.env.BENCH_PORT ?? 4191);
export const PREVIEW_URL = `http://127.0.0.1:${PREVIEW_PORT}/`;

export function buildPage(): string {
  const outDir = mkdtempSync(join(tmpdir(), 'lamina-bench-dist-'));
  const r = spawnSync('npx', ['vite', 'build', '--outDir', outDir, '--emptyOutDir'], {
    encoding: 'utf8',
  });
  if (r.status !== 0) {
    const tail = `${r.stderr}\n${r.stdout}`.trim().split('\n').slice(-5).join(' | ');
    rmSync(outDir, { recursive: true, force: true });
    throw new Error(`vite build failed: ${tail}`);
  }
  return outDir;
}

export interface PreviewServer {
  url: string;
  stop(): void;
}

export async function startPreview(outDir: string, timeoutMs = 30_000): Promise<PreviewServer> {
  // detached: the server gets its own process group, so stop() ends npx and vite together.
  const child: ChildProcess = spawn(
    'npx',
    [
      'vite',
      'preview',
      '--host',
      '127.0.0.1',
      '--port',
      String(PREVIEW_PORT),
      '--strictPort',
      '--outDir',
      outDir,
    ],
    { stdio: ['ignore', 'ignore', 'pipe'], detached: true },
  );
  let stderr = '';
  child.stderr?.on('data', (d: Buffer) => (stderr += d.toString()));
  const stop = () => {
    if (child.pid !== undefined && child.exitCode === null) {
      try {
        process.kill(-child.pid, 'SIGTERM');
      } catch {
        /* already gone */
      }
    }
  };
  const t0 = Date.now();
  while (Date.now() - t0 < timeoutMs) {
    if (child.exitCode !== null) throw new Error(`vite preview exited: ${stderr.trim()}`);
    try {
      const res = await fetch(PREVIEW_URL);
      if (res.ok) return { url: PREVIEW_URL, stop };
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  stop();
  throw new Error(`vite preview did not answer on ${PREVIEW_URL} within ${timeoutMs} ms`);
}
