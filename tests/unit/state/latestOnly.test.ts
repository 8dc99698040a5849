import { describe, expect, it } from 'vitest';
import { makeLatestOnly } from '../../../src/state/latestOnly';

function deferred<T>() {
  let resolve!: (v: T) => void;
  const promise = new Promise<T>((r) => (resolve = r));
  return { promise, resolve };
}

describe('makeLatestOnly(...)', () => {
  it('drops stale results and replaces waiting requests so the newest edit wins', async () => {
    const pending: { input: number; d: ReturnType<typeof deferred<number>> }[] = [];
    const started: number[] = [];
    const delivered: number[] = [];
    const runner = makeLatestOnly(
      (input: number) => {
        const d = deferred<number>();
        pending.push({ input, d });
        started.push(input);
        return d.promise;
      },
      (r) => {
        if (r.ok) delivered.push(r.value);
      },
    );
    runner.request(1);
    runner.request(2);
    runner.request(3); // replaces 2 while 1 runs
    expect(started).toEqual([1]);
    pending[0]!.d.resolve(10);
    await Promise.resolve();
    await Promise.resolve();
    expect(delivered).toEqual([]); // 1 is stale
    expect(started).toEqual([1, 3]); // 2 never ran
    pending[1]!.d.resolve(30);
    await Promise.resolve();
    await Promise.resolve();
    expect(delivered).toEqual([30]);
  });

  it('cancel() ignores the result of a request already running', async () => {
    const d = deferred<number>();
    const delivered: number[] = [];
    const runner = makeLatestOnly(
      () => d.promise,
      (r) => {
        if (r.ok) delivered.push(r.value);
      },
    );
    runner.request(1);
    runner.cancel();
    d.resolve(5);
    await Promise.resolve();
    await Promise.resolve();
    expect(delivered).toEqual([]);
  });
});
