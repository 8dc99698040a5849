// The worker supervisor with an in-process stand-in for a Worker (comlink over a MessageChannel):
// waiting calls reject with a clear WorkerLostError when the worker dies or is terminated, the
// next call starts a fresh worker, and latest-wins scheduling carries on after a loss.
import * as Comlink from 'comlink';
import { afterEach, describe, expect, it } from 'vitest';
import { debugFlagIsSet } from '../../../src/compute/debugHooks';
import {
  superviseWorker,
  WorkerLostError,
  type WorkerLike,
} from '../../../src/compute/workerSupervisor';
import { makeLatestOnly, type LatestResult } from '../../../src/state/latestOnly';

const api = {
  double: (x: number) => 2 * x,
  /** Never answers: a calculation still running when the worker goes. */
  hang: () => new Promise<number>(() => undefined),
  fail: (): number => {
    throw new Error('bad input');
  },
};
type Api = typeof api;

const made: FakeWorker[] = [];

class FakeWorker extends EventTarget implements WorkerLike {
  private readonly channel = new MessageChannel();
  terminated = false;
  constructor() {
    super();
    Comlink.expose(api, this.channel.port1);
    this.channel.port2.addEventListener('message', (e) =>
      this.dispatchEvent(new MessageEvent('message', { data: e.data })),
    );
    this.channel.port2.start();
    made.push(this);
  }
  postMessage(message: unknown, transfer?: Transferable[]): void {
    if (!this.terminated) this.channel.port2.postMessage(message, transfer ?? []);
  }
  start(): void {}
  terminate(): void {
    this.terminated = true;
    this.channel.port1.close();
    this.channel.port2.close();
  }
  /** An uncaught error inside the worker, as the page sees it. */
  crash(message: string): void {
    const ev = new Event('error', { cancelable: true });
    Object.assign(ev, { message });
    this.dispatchEvent(ev);
  }
}

afterEach(() => {
  for (const w of made.splice(0)) w.terminate();
});

describe('superviseWorker(...)', () => {
  it('starts one worker on first use and answers through it', async () => {
    const s = superviseWorker<Api>(() => new FakeWorker(), 'test');
    expect(s.starts()).toBe(0);
    expect(await s.api().double(21)).toBe(42);
    expect(await s.api().double(2)).toBe(4);
    expect(s.starts()).toBe(1);
  });

  it('terminate() rejects the waiting call with WorkerLostError and the next call gets a fresh worker', async () => {
    const s = superviseWorker<Api>(() => new FakeWorker(), 'test');
    const waiting = s.api().hang();
    expect(s.pendingCalls()).toBe(1);
    s.terminate('stopped by the test');
    await expect(waiting).rejects.toThrow(WorkerLostError);
    await expect(waiting).rejects.toThrow('stopped by the test');
    expect(made[0]?.terminated).toBe(true);
    expect(s.pendingCalls()).toBe(0);
    expect(await s.api().double(5)).toBe(10);
    expect(s.starts()).toBe(2);
  });

  it('an uncaught error in the worker rejects every waiting call, naming the error', async () => {
    const s = superviseWorker<Api>(() => new FakeWorker(), 'compute');
    const a = s.api().hang();
    const b = s.api().hang();
    made[0]?.crash('out of memory');
    await expect(a).rejects.toThrow(
      'The compute worker stopped with an error (out of memory); it has been restarted.',
    );
    await expect(b).rejects.toThrow(WorkerLostError);
    expect(made[0]?.terminated).toBe(true);
    expect(await s.api().double(1)).toBe(2);
    expect(s.starts()).toBe(2);
  });

  it('an error thrown by an API function rejects that call only and keeps the worker', async () => {
    const s = superviseWorker<Api>(() => new FakeWorker(), 'test');
    await expect(s.api().fail()).rejects.toThrow('bad input');
    expect(await s.api().double(3)).toBe(6);
    expect(s.starts()).toBe(1);
  });

  it('terminateAfterNextCall() kills the worker with that call in flight, once', async () => {
    const s = superviseWorker<Api>(() => new FakeWorker(), 'test');
    s.terminateAfterNextCall('killed mid-run');
    await expect(s.api().double(1)).rejects.toThrow('killed mid-run');
    expect(await s.api().double(4)).toBe(8);
    expect(s.starts()).toBe(2);
  });

  it('the API handle is not a thenable (awaiting it does not call the worker)', async () => {
    const s = superviseWorker<Api>(() => new FakeWorker(), 'test');
    const handle = s.api();
    expect(await Promise.resolve(handle)).toBe(handle);
    expect(s.pendingCalls()).toBe(0);
  });

  it('with latest-wins scheduling, the request waiting behind a lost one runs on the new worker', async () => {
    const s = superviseWorker<Api>(() => new FakeWorker(), 'test');
    const delivered: { id: number; result: LatestResult<number> }[] = [];
    const runner = makeLatestOnly(
      (x: number) => (x < 0 ? s.api().hang() : s.api().double(x)),
      (result, id) => delivered.push({ id, result }),
    );
    runner.request(-1); // hangs until the worker is lost
    runner.request(7); // waits behind it
    s.terminate('lost');
    await expect.poll(() => delivered.length).toBe(2);
    expect(delivered[0]?.id).toBe(1);
    expect(delivered[0]?.result.ok).toBe(false);
    expect(delivered[1]).toEqual({ id: 2, result: { ok: true, value: 14 } });
    expect(s.starts()).toBe(2);
  });
});

describe('debug hooks', () => {
  it('are registered only for "?debug=1"', () => {
    expect(debugFlagIsSet('?debug=1')).toBe(true);
    expect(debugFlagIsSet('?x=2&debug=1')).toBe(true);
    expect(debugFlagIsSet('')).toBe(false);
    expect(debugFlagIsSet('?debug=0')).toBe(false);
    expect(debugFlagIsSet('?debug')).toBe(false);
  });
});
