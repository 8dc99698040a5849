// A worker API whose methods each wait for the worker's start-up work (loading the generated
// data) before they run: the worker can expose its API at once, so no message sent while it loads
// is lost. If the start-up failed, every call rejects with that error.

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- any function signature
type Method = (...args: any[]) => unknown;

export type ReadyApi<T extends Record<string, Method>> = {
  [K in keyof T]: (...args: Parameters<T[K]>) => Promise<Awaited<ReturnType<T[K]>>>;
};

export function whenReady<T extends Record<string, Method>>(
  api: T,
  ready: Promise<unknown>,
): ReadyApi<T> {
  const out: Record<string, Method> = {};
  for (const [name, fn] of Object.entries(api))
    out[name] = async (...args: unknown[]) => {
      await ready;
      return fn(...args);
    };
  return out as ReadyApi<T>;
}
