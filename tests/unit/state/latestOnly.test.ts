import { describe, expect, it } from 'vitest';
import { makeLatestOnly } from '../../../src/state/latestOnly';

function deferred<T>() {
  let resolve!: (v: T) => void;
  const promise = new Promise<T>((r) => (resolve = r));
  return { promise, resolve };
}

const flush = async () => {
  for (let i = 0; i < 4; i++) await Promise.resolve();
};

function harness() {
  const pending: ReturnType<typeof deferred<number>>[] = [];
  const started: number[] = [];
  const delivered: { value: number; superseded: boolean }[] = [];
  const runner = makeLatestOnly(
    (input: number) => {
      const d = deferred<number>();
      pending.push(d);
      started.push(input);
      return d.promise;
    },
    (r, _id, superseded) => {
      if (r.ok) delivered.push({ value: r.value, superseded });
    },
  );
  return { pending, started, delivered, runner };
}

describe('makeLatestOnly(...)', () => {
  it('replaces a waiting request with a newer one, so edits never queue', async () => {
    const h = harness();
    h.runner.request(1);
    h.runner.request(2);
    h.runner.request(3); // replaces 2 while 1 runs
    expect(h.started).toEqual([1]);
    h.pending[0]!.resolve(10);
    await flush();
    expect(h.started).toEqual([1, 3]); // 2 never ran
    expect(h.delivered).toEqual([{ value: 10, superseded: true }]); // repaint during a drag
    h.pending[1]!.resolve(30);
    await flush();
    expect(h.delivered.at(-1)).toEqual({ value: 30, superseded: false });
  });

  it('cancel() drops the result of a request already running and anything waiting', async () => {
    const h = harness();
    h.runner.request(1);
    h.runner.request(2);
    h.runner.cancel();
    h.pending[0]!.resolve(5);
    await flush();
    expect(h.delivered).toEqual([]);
    expect(h.started).toEqual([1]);
  });

  it('never shows an older result after a newer one', async () => {
    const h = harness();
    const first = h.runner.request(1);
    h.pending[0]!.resolve(1);
    await flush();
    const second = h.runner.request(2);
    expect(second).toBeGreaterThan(first);
    h.pending[1]!.resolve(2);
    await flush();
    expect(h.delivered.map((d) => d.value)).toEqual([1, 2]);
  });
});
