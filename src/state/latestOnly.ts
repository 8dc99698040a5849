// Latest-wins scheduling for background calculations: at most one request in flight and at most
// one waiting; a newer request replaces the waiting one, and a result that is no longer the
// newest is dropped. A newer edit therefore always wins, and edits never pile up in a queue.

export interface LatestOnly<I> {
  /** Ask for a calculation of `input`; returns its request id. */
  request(input: I): number;
  /** Id of the newest request. */
  latestId(): number;
  /** Forget anything waiting and ignore results of requests made so far. */
  cancel(): void;
}

export function makeLatestOnly<I, R>(
  run: (input: I) => Promise<R>,
  deliver: (result: { ok: true; value: R } | { ok: false; error: unknown }, id: number) => void,
  onStart?: (id: number) => void,
): LatestOnly<I> {
  let nextId = 0;
  let newest = 0;
  let inFlight = false;
  let waiting: { id: number; input: I } | null = null;

  const start = (id: number, input: I) => {
    inFlight = true;
    onStart?.(id);
    run(input).then(
      (value) => finish(id, { ok: true, value }),
      (error: unknown) => finish(id, { ok: false, error }),
    );
  };
  const finish = (id: number, result: { ok: true; value: R } | { ok: false; error: unknown }) => {
    inFlight = false;
    if (id === newest) deliver(result, id);
    const w = waiting;
    waiting = null;
    if (w) start(w.id, w.input);
  };
  return {
    request(input: I) {
      nextId += 1;
      newest = nextId;
      if (inFlight) waiting = { id: nextId, input };
      else start(nextId, input);
      return nextId;
    },
    latestId: () => newest,
    cancel() {
      waiting = null;
      nextId += 1;
      newest = nextId;
    },
  };
}
