import { describe, expect, it } from 'vitest';
import { whenReady } from '../../../src/compute/whenReady';

describe('whenReady', () => {
  it('whenReady(api, ready) runs each method only after ready has resolved, with its arguments', async () => {
    const calls: string[] = [];
    let resolve = () => {};
    const ready = new Promise<void>((r) => (resolve = r));
    const api = whenReady({ add: (a: number, b: number) => (calls.push('add'), a + b) }, ready);
    const answer = api.add(2, 3);
    await Promise.resolve();
    expect(calls).toEqual([]);
    resolve();
    await expect(answer).resolves.toBe(5);
    expect(calls).toEqual(['add']);
  });

  it('rejects every call with the start-up error when ready rejects', async () => {
    const ready = Promise.reject(new Error('generated data beamKernels.bin: HTTP 404'));
    const api = whenReady({ f: () => 1 }, ready);
    await expect(api.f()).rejects.toThrow('HTTP 404');
    await expect(api.f()).rejects.toThrow('HTTP 404');
  });
});
