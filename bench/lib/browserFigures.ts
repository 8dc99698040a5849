// Figures measured in Debian's Chromium (launched with the flags of playwright.config.ts):
// cold page load to the first paint of the heading, of the first dose curves and of the full
// report, and edit-to-paint latency of keyboard nudges and pointer drags of a layer interface in
// the slab editor, up to the repaint of the depth-dose chart's curves (when the page has both).
import { chromium, type Browser, type Page } from '@playwright/test';
import playwrightConfig from '../../playwright.config';
import { errorRow, notMeasuredRow, type BenchRow } from './row';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export async function launchChromium(): Promise<Browser> {
  const args = playwrightConfig.use?.launchOptions?.args ?? [];
  return chromium.launch({ executablePath: CHROMIUM, args, headless: true });
}

type Probe = Window & {
  __laminaHeadingMs?: number;
  /** Cold load: first frame with dose curves, and with the full report's curves (ms). */
  __laminaCurvesMs?: number;
  __laminaFullCurvesMs?: number;
  __laminaLatencies?: number[];
  /** Input handled (capture listener) → the curves' paint (ms). */
  __laminaDispatchLatencies?: number[];
  /** Input event's timestamp → its listener running: the wait for the page to take the input (ms). */
  __laminaDispatchWaits?: number[];
  /** 'hover': pointer moves without a button count too (the crosshair reference). */
  __laminaProbeHover?: boolean;
  /** 1 when the new curves were painted in the first frame after the input was handled, else 0. */
  __laminaFirstFrame?: number[];
};

const CHART_SELECTOR = '[data-testid="dose-chart"]';

/**
 * Runs before any page script: notes the time (ms since navigation start) of the first frame
 * painted after each of these has appeared: an <h1> with text (__laminaHeadingMs); a dose curve
 * in the depth-dose chart (__laminaCurvesMs, the quick preview or the full report, whichever comes
 * first); the full report's curves, with the superposition drawn and no curve marked as updating
 * (__laminaFullCurvesMs). Each time is taken by requestAnimationFrame, then a message-channel task,
 * which runs after that frame's paint. Plain JavaScript text: functions compiled by tsx carry name
 * helpers that do not exist inside the page.
 */
const COLD_LOAD_PROBE = `(() => {
  const marks = [
    ['__laminaHeadingMs', () => { const h = document.querySelector('h1'); return !!(h && h.textContent); }],
    ['__laminaCurvesMs', () => !!document.querySelector('${CHART_SELECTOR} path.curve[d]')],
    ['__laminaFullCurvesMs', () =>
      !!document.querySelector('${CHART_SELECTOR} path.curve[data-method="superposition"]') &&
      !document.querySelector('${CHART_SELECTOR} path.curve.updating')],
  ];
  const check = () => {
    for (const m of marks) {
      if (m[2] || !m[1]()) continue;
      m[2] = true;
      requestAnimationFrame(() => {
        const ch = new MessageChannel();
        ch.port1.onmessage = () => { window[m[0]] = performance.now(); };
        ch.port2.postMessage(0);
      });
    }
    if (marks.every((m) => m[2])) obs.disconnect();
  };
  const obs = new MutationObserver(check);
  obs.observe(document, { childList: true, subtree: true, characterData: true, attributes: true });
})();`;

interface ColdLoad {
  heading: number;
  curves: number;
  fullCurves: number;
  fcp: number;
}

async function coldLoadOnce(browser: Browser, url: string): Promise<ColdLoad> {
  const context = await browser.newContext(); // fresh profile: empty cache
  try {
    const page = await context.newPage();
    await page.addInitScript({ content: COLD_LOAD_PROBE });
    await page.goto(url, { waitUntil: 'commit' });
    await page.waitForFunction(
      () => {
        const w = window as Probe;
        return (
          w.__laminaHeadingMs !== undefined &&
          w.__laminaCurvesMs !== undefined &&
          w.__laminaFullCurvesMs !== undefined
        );
      },
      null,
      { timeout: 30_000 },
    );
    const marks = await page.evaluate(() => {
      const w = window as Probe;
      return {
        heading: w.__laminaHeadingMs as number,
        curves: w.__laminaCurvesMs as number,
        fullCurves: w.__laminaFullCurvesMs as number,
      };
    });
    // The paint entry can be queued after the heading's frame: wait for it (at most 2 s).
    const fcp = await page.evaluate(
      () =>
        new Promise<number>((resolve) => {
          new PerformanceObserver((list) => {
            const e = list.getEntriesByName('first-contentful-paint')[0];
            if (e) resolve(e.startTime);
          }).observe({ type: 'paint', buffered: true });
          setTimeout(() => resolve(NaN), 2000);
        }),
    );
    return { ...marks, fcp };
  } finally {
    await context.close();
  }
}

export async function coldLoadRows(browser: Browser, url: string, runs = 5): Promise<BenchRow[]> {
  const all: ColdLoad[] = [];
  for (let i = 0; i < runs; i++) all.push(await coldLoadOnce(browser, url));
  const group = 'page (Chromium)';
  const rows: BenchRow[] = [
    {
      group,
      name: 'cold load: navigation → heading painted',
      unit: 'ms',
      samples: all.map((r) => r.heading),
      note: `fresh browser context each run, vite preview, ${runs} runs`,
    },
    {
      group,
      name: 'cold load: navigation → first dose curves painted',
      unit: 'ms',
      samples: all.map((r) => r.curves),
      note: 'depth-dose chart, demo case: the first curve drawn (quick preview or full report)',
    },
    {
      group,
      name: 'cold load: navigation → full report painted',
      unit: 'ms',
      samples: all.map((r) => r.fullCurves),
      note: 'superposition curve drawn and no curve marked as updating',
    },
  ];
  const fcp = all.map((r) => r.fcp).filter(Number.isFinite);
  if (fcp.length > 0)
    rows.push({ group, name: 'cold load: first contentful paint', unit: 'ms', samples: fcp });
  return rows;
}

const HANDLE = '[data-testid="boundary-1"]';
const EDIT_GROUP = 'page (Chromium)';
const EDIT_NAME = 'edit-to-paint, arrow-key nudge of a layer interface';
const DRAG_NAME = 'edit-to-paint, pointer drag of a layer interface';

/**
 * Listens for keydown and pointermove (while a button is held); when the depth-dose chart's
 * curve paths next change (a new result drawn), notes the time from the input event to the
 * paint that follows, the time from the input's handling to that paint, and whether that paint
 * was the first frame after the input was handled (the rAF callbacks of one frame share their
 * timestamp). (No named inner functions: see COLD_LOAD_PROBE.)
 */
function installLatencyProbe(chartSelector: string): void {
  const w = window as Probe;
  w.__laminaLatencies = [];
  w.__laminaDispatchLatencies = [];
  w.__laminaFirstFrame = [];
  w.__laminaDispatchWaits = [];
  let pending: { eventMs: number; handledMs: number; firstFrame: number } | null = null;
  const obs = new MutationObserver((records) => {
    if (pending === null) return;
    const inChart = records.some((r) => {
      const el = r.target instanceof Element ? r.target : r.target.parentElement;
      return (el?.closest(chartSelector) ?? null) !== null;
    });
    if (!inChart) return;
    const p = pending;
    pending = null;
    requestAnimationFrame((frameMs) => {
      const ch = new MessageChannel();
      ch.port1.onmessage = () => {
        const now = performance.now();
        w.__laminaDispatchLatencies?.push(now - p.handledMs);
        w.__laminaDispatchWaits?.push(p.handledMs - p.eventMs);
        w.__laminaFirstFrame?.push(p.firstFrame === frameMs ? 1 : 0);
        w.__laminaLatencies?.push(now - p.eventMs);
      };
      ch.port2.postMessage(0);
    });
  });
  obs.observe(document.body, {
    attributes: true,
    // 'd': curve paths; 'x1': the crosshair line (the hover reference).
    attributeFilter: ['d', 'x1'],
    childList: true,
    subtree: true,
  });
  for (const type of ['keydown', 'pointermove'])
    document.addEventListener(
      type,
      (e) => {
        const buttons = (e as PointerEvent).buttons;
        if (e.type === 'pointermove' && buttons === 0 && w.__laminaProbeHover !== true) return;
        const p = { eventMs: e.timeStamp, handledMs: performance.now(), firstFrame: -1 };
        pending = p;
        requestAnimationFrame((frameMs) => (p.firstFrame = frameMs));
      },
      { capture: true },
    );
}

/** The figures of the samples `from` … `from + count`. */
async function latencyRows(
  page: Page,
  name: string,
  from: number,
  count: number,
  note: string,
): Promise<BenchRow[]> {
  const all = await page.evaluate(() => {
    const w = window as Probe;
    return {
      event: w.__laminaLatencies ?? [],
      handled: w.__laminaDispatchLatencies ?? [],
      first: w.__laminaFirstFrame ?? [],
      wait: w.__laminaDispatchWaits ?? [],
    };
  });
  const samples = all.event.slice(from, from + count);
  const handled = all.handled.slice(from, from + count);
  const first = all.first.slice(from, from + count);
  const wait = all.wait.slice(from, from + count);
  const share = first.length ? (100 * first.reduce((a, b) => a + b, 0)) / first.length : NaN;
  return [
    { group: EDIT_GROUP, name: `${name} (p50)`, unit: 'ms', samples, note },
    { group: EDIT_GROUP, name: `${name} (p95)`, unit: 'ms', samples, stat: 'p95' },
    {
      group: EDIT_GROUP,
      name: `${name}, input handled → painted (p50)`,
      unit: 'ms',
      samples: handled,
    },
    {
      group: EDIT_GROUP,
      name: `${name}, input handled → painted (p95)`,
      unit: 'ms',
      samples: handled,
      stat: 'p95',
      note: 'from the input listener running to the paint; excludes the wait for the input to be dispatched',
    },
    {
      group: EDIT_GROUP,
      name: `${name}, input event → input handled (p50)`,
      unit: 'ms',
      samples: wait,
      note: name.includes('key')
        ? 'key presses are dispatched at once; the wait for the next frame falls after the input is handled'
        : 'the browser holds pointer moves for the next frame (rAF-aligned input): up to one frame of waiting before the page sees the input',
    },
    {
      group: EDIT_GROUP,
      name: `${name}, painted in the first frame after the input`,
      unit: '%',
      samples: [share],
      note: `${first.reduce((a, b) => a + b, 0)} of ${first.length} edits`,
    },
  ];
}

async function waitForSamples(page: Page, expected: number) {
  await page.waitForFunction(
    (n) => ((window as Probe).__laminaLatencies?.length ?? 0) >= n,
    expected,
    { timeout: 5_000 },
  );
}

async function nudge(page: Page, key: 'ArrowRight' | 'ArrowLeft', expected: number) {
  await page.keyboard.press(key);
  await waitForSamples(page, expected);
}

async function keyboardRows(page: Page, nudges: number): Promise<BenchRow[]> {
  const handle = await page.waitForSelector(HANDLE, { timeout: 10_000 });
  await handle.focus();
  const before = await handle.getAttribute('aria-valuenow');
  const warmUp = 4; // even, like the nudges: the boundary ends where it started
  const start = await page.evaluate(() => (window as Probe).__laminaLatencies?.length ?? 0);
  let count = start;
  for (let i = 0; i < warmUp + nudges; i++) {
    // Alternate directions so the geometry stays put.
    await nudge(page, i % 2 === 0 ? 'ArrowRight' : 'ArrowLeft', ++count);
  }
  const after = await page.getAttribute(HANDLE, 'aria-valuenow');
  const note = `${nudges} nudges (±0.1 cm) after ${warmUp} warm-up; keydown → dose curves repainted; boundary ${before} → ${after} cm`;
  return latencyRows(page, EDIT_NAME, start + warmUp, nudges, note);
}

/** Holds the handle and moves the pointer back and forth (±2 px), one move per repaint. */
async function dragRows(page: Page, moves: number): Promise<BenchRow[]> {
  const box = await (await page.waitForSelector(HANDLE, { timeout: 10_000 })).boundingBox();
  if (!box) return [notMeasuredRow(EDIT_GROUP, DRAG_NAME, 'the handle has no box')];
  const x0 = box.x + box.width / 2;
  const y0 = box.y + box.height / 2;
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  const warmUp = 4;
  const start = await page.evaluate(() => (window as Probe).__laminaLatencies?.length ?? 0);
  let count = start;
  try {
    for (let i = 0; i < warmUp + moves; i++) {
      await page.mouse.move(x0 + (i % 2 === 0 ? 3 : -3), y0);
      await waitForSamples(page, ++count);
    }
  } finally {
    await page.mouse.move(x0, y0);
    await page.mouse.up();
  }
  const note = `${moves} pointer moves (±3 px) after ${warmUp} warm-up; pointermove → dose curves repainted`;
  return latencyRows(page, DRAG_NAME, start + warmUp, moves, note);
}

const HOVER_NAME = 'reference: crosshair follows the pointer over the chart (no calculation)';

/**
 * The floor of the harness: the same probe for the cheapest possible change, the chart's crosshair
 * line following a hovering pointer (one React state update, no calculation). Its event → paint
 * time is what any edit would cost at best, frame wait included.
 */
async function hoverRows(page: Page, moves: number): Promise<BenchRow[]> {
  const box = await (
    await page.waitForSelector(`${CHART_SELECTOR} rect.hit`, { timeout: 10_000 })
  ).boundingBox();
  if (!box) return [notMeasuredRow(EDIT_GROUP, HOVER_NAME, 'the chart has no hit area')];
  const x0 = box.x + box.width / 2;
  const y0 = box.y + box.height / 2;
  await page.mouse.move(x0, y0);
  await page.evaluate(() => ((window as Probe).__laminaProbeHover = true));
  const warmUp = 4;
  const start = await page.evaluate(() => (window as Probe).__laminaLatencies?.length ?? 0);
  let count = start;
  try {
    for (let i = 0; i < warmUp + moves; i++) {
      // ±12 px: the readout moves by a few 0.05 cm samples each time.
      await page.mouse.move(x0 + (i % 2 === 0 ? 12 : -12), y0);
      await waitForSamples(page, ++count);
    }
  } finally {
    await page.evaluate(() => ((window as Probe).__laminaProbeHover = false));
  }
  const note = `${moves} pointer moves (±12 px) after ${warmUp} warm-up; pointermove → crosshair repainted`;
  return latencyRows(page, HOVER_NAME, start + warmUp, moves, note);
}

/** The page's main-thread JS heap in use after a garbage collection (MB), via the DevTools protocol. */
async function pageHeapMb(page: Page): Promise<number> {
  const cdp = await page.context().newCDPSession(page);
  try {
    await cdp.send('HeapProfiler.collectGarbage');
    await cdp.send('Performance.enable');
    const { metrics } = await cdp.send('Performance.getMetrics');
    const used = metrics.find((m) => m.name === 'JSHeapUsedSize')?.value ?? NaN;
    return used / 1e6;
  } finally {
    await cdp.detach();
  }
}

export async function editToPaintRows(
  browser: Browser,
  url: string,
  nudges = 60,
): Promise<BenchRow[]> {
  const context = await browser.newContext();
  try {
    const page = await context.newPage();
    await page.goto(url);
    await page.waitForSelector('h1', { timeout: 30_000 });
    const handle = await page.waitForSelector(HANDLE, { timeout: 10_000 }).catch(() => null);
    const chart = await page.waitForSelector(CHART_SELECTOR, { timeout: 10_000 }).catch(() => null);
    if (!handle || !chart)
      return [
        notMeasuredRow(
          EDIT_GROUP,
          EDIT_NAME,
          `the page exposes no slab-editor interface handle (${HANDLE}) or depth-dose chart (${CHART_SELECTOR})`,
        ),
      ];
    await page.evaluate(installLatencyProbe, CHART_SELECTOR);
    const heapAfterLoad = await pageHeapMb(page);
    const rows = await keyboardRows(page, nudges);
    // Let the last full calculation land before the drag starts.
    await page.waitForTimeout(500);
    rows.push(...(await dragRows(page, nudges)));
    await page.waitForTimeout(500);
    rows.push(...(await hoverRows(page, nudges)));
    const heapAfterEdits = await pageHeapMb(page);
    rows.push(
      {
        group: EDIT_GROUP,
        name: 'page JS heap after load (main thread, after GC)',
        unit: 'MB',
        samples: [heapAfterLoad],
        note: 'workers have their own heaps, not counted',
      },
      {
        group: EDIT_GROUP,
        name: 'page JS heap after the edits above (previews cached, after GC)',
        unit: 'MB',
        samples: [heapAfterEdits],
      },
    );
    return rows;
  } catch (e) {
    return [errorRow(EDIT_GROUP, EDIT_NAME, e)];
  } finally {
    await context.close();
  }
}
