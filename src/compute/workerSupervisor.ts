// Keeps one background worker alive behind a comlink API: the worker starts on first use; when it
// throws an uncaught error, fails to read a message, or is terminated, every call still waiting
// on it rejects at once with a WorkerLostError (comlink alone would leave them pending forever),
// and the next call starts a fresh worker.
import * as Comlink from 'comlink';

/** What the supervisor needs of a Worker (a MessagePort-backed stand-in works in tests). */
export interface WorkerLike extends Comlink.Endpoint {
  terminate(): void;
}

export class WorkerLostError extends Error {
  override name = 'WorkerLostError';
}

export interface SupervisedWorker<T> {
  /** The API of the live worker (started if needed); calls reject with WorkerLostError if it dies. */
  api(): Comlink.Remote<T>;
  /** Stop the worker now; waiting calls reject with `reason`. The next call starts a new one. */
  terminate(reason?: string): void;
  /** Debug aid: terminate the worker right after the next call has been sent to it. */
  terminateAfterNextCall(reason?: string): void;
  /** How many workers have been started so far. */
  starts(): number;
  /** Calls sent and not yet answered. */
  pendingCalls(): number;
}

interface Live<T> {
  worker: WorkerLike;
  remote: Comlink.Remote<T>;
  guarded: Comlink.Remote<T>;
  lost: Promise<never>;
  fail: (e: WorkerLostError) => void;
}

export function superviseWorker<T>(create: () => WorkerLike, what: string): SupervisedWorker<T> {
  let live: Live<T> | undefined;
  let started = 0;
  let pending = 0;
  let killAfterNextCall: string | null = null;

  const drop = (l: Live<T>, message: string) => {
    if (live !== l) return;
    live = undefined;
    l.fail(new WorkerLostError(message));
    l.remote[Comlink.releaseProxy]();
    l.worker.terminate();
  };

  const start = (): Live<T> => {
    const worker = create();
    started++;
    let fail!: (e: WorkerLostError) => void;
    const lost = new Promise<never>((_, reject) => (fail = reject));
    lost.catch(() => undefined); // observed through the calls; never an unhandled rejection
    const remote = Comlink.wrap<T>(worker);
    const l: Live<T> = { worker, remote, guarded: undefined as never, lost, fail };
    worker.addEventListener('error', (ev) => {
      const detail = (ev as ErrorEvent).message;
      ev.preventDefault();
      drop(
        l,
        `The ${what} worker stopped with an error${detail ? ` (${detail})` : ''}; it has been restarted.`,
      );
    });
    worker.addEventListener('messageerror', () =>
      drop(l, `The ${what} worker sent a message that could not be read; it has been restarted.`),
    );
    l.guarded = new Proxy({} as Comlink.Remote<T>, {
      get(_target, key) {
        // Not a thenable, and no symbol-keyed comlink internals through this door.
        if (typeof key !== 'string' || key === 'then') return undefined;
        return (...args: unknown[]) => {
          const call = (
            l.remote as unknown as Record<string, (...a: unknown[]) => Promise<unknown>>
          )[key]!(...args);
          pending++;
          const settled = Promise.race([call, l.lost]).finally(() => pending--);
          if (killAfterNextCall !== null) {
            const reason = killAfterNextCall;
            killAfterNextCall = null;
            drop(l, reason);
          }
          return settled;
        };
      },
    });
    return l;
  };

  return {
    api() {
      live ??= start();
      return live.guarded;
    },
    terminate(reason = `The ${what} worker was stopped; it will be restarted when needed.`) {
      if (live) drop(live, reason);
    },
    terminateAfterNextCall(reason = `The ${what} worker was stopped during a calculation.`) {
      killAfterNextCall = reason;
    },
    starts: () => started,
    pendingCalls: () => pending,
  };
}
